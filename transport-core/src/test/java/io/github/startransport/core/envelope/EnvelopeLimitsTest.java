package io.github.startransport.core.envelope;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.EnvelopeStar;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The envelope model at two published limits: the photosphere of the nominal Sun and the Eddington luminosity of a
 * grey atmosphere with constant opacity.
 */
class EnvelopeLimitsTest {
    private static final double G = 6.67430e-8;            // CODATA 2018
    private static final double C = 2.99792458e10;         // CODATA 2018 (exact)

    @Test
    @Tag(CheckKind.EXTERNAL)
    void outermostPointOfTheNominalSunIsThePhotosphereAtFiftySevenSeventyTwoKelvin() {
        // IAU 2015 Resolution B3: nominal T_eff = 5772 K for the nominal L and R (rounded to 1 K); the Eddington grey
        // atmosphere has T = T_eff at tau = 2/3, which the envelope places at r = R (Mihalas 1978, §3-3, from memory)
        EnvelopeStar sun = new EnvelopeStar(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS, Iau2015.SOLAR_LUMINOSITY,
                0.7, 0.02);
        EnvelopeSetup setup = new EnvelopeSetup(new LocalMixingLength(),
                new TextbookModels.PowerLawOpacity(0.34, 0.0, 0.0), new TextbookModels.PerfectGas(0.6));
        Profile p = GreyAtmosphereEnvelope.DEFAULT.integrate(sun, setup).profile().orElseThrow();
        int top = p.value(ProfileColumn.RADIUS, 0) > p.value(ProfileColumn.RADIUS, p.size() - 1) ? 0 : p.size() - 1;
        assertEquals(6.957e10, p.value(ProfileColumn.RADIUS, top), 1e-9 * 6.957e10, "R (IAU 2015 B3 nominal)");
        assertEquals(5772.0, p.value(ProfileColumn.TEMPERATURE, top), 0.5, "T at the photosphere");
        for (int k = 0; k < p.size(); k++) {
            assertTrue(p.value(ProfileColumn.RADIUS, k) <= p.value(ProfileColumn.RADIUS, top), "nothing above R");
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void atmosphereIsRefusedAboveTheEddingtonLuminosityAndAcceptedBelow() {
        // Radiation force kappa L / (4 pi r^2 c) equals gravity G M / r^2 at L_Edd = 4 pi c G M / kappa (Eddington
        // 1926; Kippenhahn, Weigert & Weiss 2012, §22.4, from memory): with kappa = 0.34 cm^2/g and one solar mass,
        // L_Edd = 1.47e38 erg/s. A hot compact star (R = R_sun / 2, so T_eff ~ 1.2e5 K) 1 % either side.
        double kappa = 0.34;
        double m = Iau2015.SOLAR_MASS;
        double lEdd = 4 * Math.PI * C * G * m / kappa;
        EnvelopeSetup setup = new EnvelopeSetup(new LocalMixingLength(),
                new TextbookModels.PowerLawOpacity(kappa, 0.0, 0.0), new TextbookModels.PerfectGas(0.6));
        double r = 0.5 * Iau2015.SOLAR_RADIUS;
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> GreyAtmosphereEnvelope.DEFAULT
                .photosphericPressure(new EnvelopeStar(m, r, 1.01 * lEdd, 0.7, 0.02), setup));
        assertEquals("luminosity", e.field());
        double p = GreyAtmosphereEnvelope.DEFAULT.photosphericPressure(new EnvelopeStar(m, r, 0.99 * lEdd, 0.7, 0.02),
                setup);
        assertTrue(p > 0 && Double.isFinite(p), "photospheric pressure below L_Edd: " + p);
    }
}
