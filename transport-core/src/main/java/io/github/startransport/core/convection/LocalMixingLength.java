package io.github.startransport.core.convection;

import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;

/**
 * The textbook local mixing-length theory: Böhm-Vitense (1958) in the U, W formulation of
 * Kippenhahn, Weigert &amp; Weiss (2012, ch. 7), with the geometry constants as a parameter set
 * ({@link MixingLengthGeometry}). Radiative losses of an element follow the optically thick
 * (diffusion) estimate throughout. Kernel: {@link MixingLengthZone}.
 *
 * <p>Immutable and thread-safe; {@link #solve} allocates nothing.
 */
public final class LocalMixingLength extends MixingLengthModel {
    /** Name to ask for this model by. */
    public static final String NAME = "local-mixing-length";

    /** Describes this model and its options. */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.CONVECTION, NAME,
            "local mixing-length theory (Böhm-Vitense 1958; U, W cubic of Kippenhahn, Weigert & Weiss 2012 ch. 7) "
                    + "with selectable geometry constants, exact Jacobian, and convective, semiconvective, "
                    + "thermohaline and overshoot mixing coefficients",
            ConvectionSettings.OPTIONS);

    /** The model with every option at its default. */
    public LocalMixingLength() {
        this(ConvectionSettings.defaults());
    }

    /**
     * @param alpha    mixing-length parameter l / H_P (dimensionless), &gt; 0
     * @param criterion stability criterion
     * @param geometry geometry constants
     */
    public LocalMixingLength(double alpha, Criterion criterion, MixingLengthGeometry geometry) {
        this(new ConvectionSettings(alpha, criterion, geometry, CentreLimit.RADIUS,
                ConvectionSettings.DEFAULT_SEMICONVECTION, ConvectionSettings.DEFAULT_THERMOHALINE,
                ConvectionSettings.DEFAULT_OVERSHOOT));
    }

    LocalMixingLength(ConvectionSettings settings) {
        super(settings, 0.0);
    }

    /**
     * @param options see {@link #INFO}
     * @return the model
     */
    public static LocalMixingLength fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        return new LocalMixingLength(ConvectionSettings.parse(NAME, options));
    }

    /**
     * @param alpha another mixing-length parameter (dimensionless), &gt; 0
     * @return this model with that alpha and every other setting kept
     */
    public LocalMixingLength withAlpha(double alpha) {
        return new LocalMixingLength(settings.withAlpha(alpha));
    }

    @Override
    public String toString() {
        return NAME + "(" + settings.describe() + ")";
    }
}
