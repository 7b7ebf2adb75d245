package io.github.startransport.core.gradient;

import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.StabilityColumns;
import io.github.startransport.spi.StabilityModel;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneState;

import java.util.List;

/**
 * The local stability test: nabla_rad from {@link RadiativeGradient}, nabla_L from
 * {@link LedouxGradient}, the regime from {@link StabilityClassifier}.
 *
 * <p>Immutable and thread-safe; {@link #evaluate} allocates nothing.
 */
public final class GradientStability implements StabilityModel {
    /** Name to ask for this model by. */
    public static final String NAME = "gradient-comparison";

    /** Describes this model and its options. */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.STABILITY, NAME,
            "local stability: nabla_rad = 3 kappa L P / (16 pi a c G m T^4) against nabla_ad (Schwarzschild) "
                    + "or nabla_L = nabla_ad + (phi/delta) nabla_mu (Ledoux)",
            List.of(new OptionInfo("criterion", "schwarzschild", "",
                    "schwarzschild or ledoux: which gradient decides convective instability")));

    private final Criterion criterion;

    /** @param criterion the criterion to judge by */
    public GradientStability(Criterion criterion) {
        this.criterion = java.util.Objects.requireNonNull(criterion, "criterion");
    }

    /**
     * @param options {@code criterion}
     * @return the model
     */
    public static GradientStability fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        return new GradientStability(options.getEnum(NAME, "criterion", Criterion.class, Criterion.SCHWARZSCHILD));
    }

    @Override
    public Criterion criterion() {
        return criterion;
    }

    @Override
    public void evaluate(ZoneState z, StabilityResult out) {
        ZoneChecks.forStability(z);
        double nablaRad = RadiativeGradient.valueAndDerivatives(z.opacity, z.luminosity, z.pressure, z.mass,
                z.temperature, out.dNablaRad);
        double nablaL = LedouxGradient.valueAndDerivatives(z.nablaAd, z.phi, z.delta, z.nablaMu, out.dNablaLedoux);
        double probe = nablaRad * 0.0 + nablaL * 0.0;
        for (int i = 0; i < out.dNablaRad.length; i++) {
            probe += out.dNablaRad[i] * 0.0 + out.dNablaLedoux[i] * 0.0;
        }
        ZoneChecks.finiteOutputs("nabla_rad", nablaRad, probe, z);
        out.nablaRad = nablaRad;
        out.nablaAd = z.nablaAd;
        out.nablaLedoux = nablaL;
        out.marginSchwarzschild = nablaRad - z.nablaAd;
        out.marginLedoux = nablaRad - nablaL;
        out.criterion = criterion;
        out.regime = StabilityClassifier.classify(criterion, nablaRad, z.nablaAd, nablaL, z.nablaMu);
    }

    /** A loop over the static kernels with the output's working space: no allocation, no per-zone dispatch. */
    @Override
    public void evaluateColumns(ZoneColumns in, int from, int to, StabilityColumns out) {
        in.checkRange(from, to, out.capacity);
        final ZoneState zone = out.workZone;
        final StabilityResult r = out.workResult;
        for (int k = from; k < to; k++) {
            evaluate(in.load(k, zone), r);
            out.store(k, r);
        }
    }

    @Override
    public String toString() {
        return NAME + "(criterion=" + criterion.label() + ")";
    }
}
