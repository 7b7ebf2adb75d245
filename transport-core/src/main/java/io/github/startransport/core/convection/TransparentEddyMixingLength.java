package io.github.startransport.core.convection;

import io.github.startransport.spi.Checks;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OptionInfo;

import java.util.ArrayList;
import java.util.List;

/**
 * Local mixing-length theory with radiative losses of eddies that may be optically thin, after
 * Henyey, Vardya &amp; Bodenheimer (1965, ApJ 142, 841). This matters in the outer envelope,
 * where an eddy's optical thickness omega = kappa rho l falls below unity.
 *
 * <p>The element's cooling rate follows Spiegel's (1957) interpolation
 * 1/t_rad proportional to omega / (1 + y omega^2), which tends to the diffusion estimate of the
 * textbook theory for omega &gt;&gt; 1 and to optically thin emission for omega &lt;&lt; 1. Relative
 * to the textbook theory the losses are therefore multiplied by q = y omega^2 / (1 + y omega^2),
 * and the loss coefficient of the cubic becomes U' = q U while the flux term keeps U
 * ({@link MixingLengthCubic}); in Cox &amp; Giuli's variables a0 -&gt; a0 q and A -&gt; A / q.
 * y = 3 / (4 pi^2) corresponds to a sinusoidal temperature profile of the eddy (the value of
 * Henyey et al.; some authors use 1/3). The form of the correction is written from memory: the
 * normalisation of the original paper was not checked, so results agree with the textbook theory
 * for omega &gt;&gt; 1 by construction and otherwise follow the interpolation above.
 *
 * <p>Immutable and thread-safe; {@link #solve} allocates nothing. Kernel: {@link MixingLengthZone}.
 */
public final class TransparentEddyMixingLength extends MixingLengthModel {
    /** Name to ask for this model by. */
    public static final String NAME = "transparent-eddy-mixing-length";

    /** Default y = 3 / (4 pi^2) (Henyey, Vardya &amp; Bodenheimer 1965, from memory). */
    public static final double DEFAULT_EDDY_SHAPE = 3.0 / (4.0 * Math.PI * Math.PI);

    static final String EDDY_SHAPE = "eddy-shape-factor";

    /** Describes this model and its options. */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.CONVECTION, NAME,
            "local mixing-length theory with the radiative losses of optically thin eddies "
                    + "(Henyey, Vardya & Bodenheimer 1965): losses scaled by y w^2/(1 + y w^2), w = kappa rho l; "
                    + "exact Jacobian and the same mixing coefficients as " + LocalMixingLength.NAME,
            options());

    /** The model with every option at its default. */
    public TransparentEddyMixingLength() {
        this(ConvectionSettings.defaults(), DEFAULT_EDDY_SHAPE);
    }

    /**
     * @param alpha     mixing-length parameter l / H_P (dimensionless), &gt; 0
     * @param criterion stability criterion
     * @param geometry  geometry constants
     * @param eddyShape y (dimensionless), &gt; 0
     */
    public TransparentEddyMixingLength(double alpha, Criterion criterion, MixingLengthGeometry geometry,
                                       double eddyShape) {
        this(new ConvectionSettings(alpha, criterion, geometry, CentreLimit.RADIUS,
                ConvectionSettings.DEFAULT_SEMICONVECTION, ConvectionSettings.DEFAULT_THERMOHALINE,
                ConvectionSettings.DEFAULT_OVERSHOOT), eddyShape);
    }

    TransparentEddyMixingLength(ConvectionSettings settings, double eddyShape) {
        super(settings, Checks.positive(EDDY_SHAPE, eddyShape, "1", InvalidInputException.NO_ZONE));
    }

    private static List<OptionInfo> options() {
        List<OptionInfo> list = new ArrayList<>(ConvectionSettings.OPTIONS);
        list.add(new OptionInfo(EDDY_SHAPE, Double.toString(DEFAULT_EDDY_SHAPE), "1",
                "y in the loss factor y w^2/(1 + y w^2); 3/(4 pi^2) for a sinusoidal eddy (Henyey, Vardya & "
                        + "Bodenheimer 1965), some authors use 1/3"));
        return list;
    }

    /**
     * @param options see {@link #INFO}
     * @return the model
     */
    public static TransparentEddyMixingLength fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        return new TransparentEddyMixingLength(ConvectionSettings.parse(NAME, options),
                options.getDouble(NAME, EDDY_SHAPE, DEFAULT_EDDY_SHAPE));
    }

    /**
     * @param alpha another mixing-length parameter (dimensionless), &gt; 0
     * @return this model with that alpha and every other setting kept
     */
    public TransparentEddyMixingLength withAlpha(double alpha) {
        return new TransparentEddyMixingLength(settings.withAlpha(alpha), eddyShape);
    }

    /** @return y of the loss factor (dimensionless) */
    public double eddyShape() {
        return eddyShape;
    }

    @Override
    public String toString() {
        return NAME + "(" + settings.describe() + ", " + EDDY_SHAPE + "=" + eddyShape + ")";
    }
}
