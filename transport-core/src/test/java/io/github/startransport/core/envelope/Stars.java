package io.github.startransport.core.envelope;

import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.CoreProvider;
import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.EnvelopeStar;

/** The stars and model sets the envelope tests share. */
final class Stars {
    private Stars() {
    }

    /**
     * Solar surface composition X = 0.7381, Z = 0.0134 (Asplund, Grevesse, Sauval &amp; Scott 2009,
     * ARA&amp;A 47, 481, Table 4, present-day photosphere [values from memory]).
     */
    static final double SUN_X = 0.7381;
    /** See {@link #SUN_X}. */
    static final double SUN_Z = 0.0134;

    /** @return the Sun with the IAU 2015 B3 nominal M, R, L */
    static EnvelopeStar sun() {
        return new EnvelopeStar(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS, Iau2015.SOLAR_LUMINOSITY, SUN_X, SUN_Z);
    }

    /** @return the core provider's default models of each family, alpha 1.8 */
    static EnvelopeSetup defaults() {
        CoreProvider core = new CoreProvider();
        return new EnvelopeSetup(new LocalMixingLength(), AnalyticOpacity.DEFAULT,
                core.create(ModelFamily.THERMODYNAMICS, core.defaultModel(ModelFamily.THERMODYNAMICS),
                        ModelOptions.defaults()));
    }
}
