package io.github.startransport.core.gradient;

import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.StabilityColumns;
import io.github.startransport.spi.StabilityModel;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneState;

import java.util.Arrays;
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

    /**
     * The batch call: one loop over the columns with the arithmetic of {@link #evaluate} (that of
     * {@link RadiativeGradient#valueAndDerivatives} and {@link LedouxGradient#valueAndDerivatives}, so bit
     * for bit the per-zone results), writing each zone's values and its eight derivatives that can be
     * nonzero straight into the columns; the derivative columns that are 0 (and d nabla_L / d nabla_ad = 1)
     * in every zone are filled once per call. No per-zone result, no allocation. A zone that
     * {@link #evaluate} would refuse is refused by it, after every earlier zone is written.
     */
    @Override
    public void evaluateColumns(ZoneColumns in, int from, int to, StabilityColumns out) {
        in.checkRange(from, to, out.capacity);
        final double[] temperature = in.temperature;
        final double[] density = in.density;
        final double[] pressure = in.pressure;
        final double[] luminosity = in.luminosity;
        final double[] mass = in.mass;
        final double[] opacity = in.opacity;
        final double[] nablaAd = in.nablaAd;
        final double[] delta = in.delta;
        final double[] phi = in.phi;
        final double[] nablaMu = in.nablaMu;
        final double[] radT = out.dNablaRad[ZoneInput.T];
        final double[] radP = out.dNablaRad[ZoneInput.P];
        final double[] radL = out.dNablaRad[ZoneInput.L];
        final double[] radM = out.dNablaRad[ZoneInput.M];
        final double[] radKappa = out.dNablaRad[ZoneInput.KAPPA];
        final double[] ledouxPhi = out.dNablaLedoux[ZoneInput.PHI];
        final double[] ledouxDelta = out.dNablaLedoux[ZoneInput.DELTA];
        final double[] ledouxMu = out.dNablaLedoux[ZoneInput.NABLA_MU];
        final double[] rad = out.nablaRad;
        final double[] ad = out.nablaAd;
        final double[] ledoux = out.nablaLedoux;
        final double[] marginS = out.marginSchwarzschild;
        final double[] marginL = out.marginLedoux;
        final Regime[] regime = out.regime;
        final double inf = Double.POSITIVE_INFINITY;
        for (int k = from; k < to; k++) {
            final double t = temperature[k];
            final double rho = density[k];
            final double p = pressure[k];
            final double l = luminosity[k];
            final double m = mass[k];
            final double kappa = opacity[k];
            final double nAd = nablaAd[k];
            final double d = delta[k];
            final double f = phi[k];
            final double mu = nablaMu[k];
            // the checks of ZoneChecks.forStability in one test; the per-zone call names the first bad field
            final boolean valid = (t > 0.0) & (t < inf) & (rho > 0.0) & (rho < inf) & (p > 0.0) & (p < inf)
                    & (Math.abs(l) < inf) & (m > 0.0) & (m < inf) & (kappa > 0.0) & (kappa < inf)
                    & (nAd > 0.0) & (nAd < 1.0) & (d > 0.0) & (d < inf) & (f > 0.0) & (f < inf)
                    & (Math.abs(mu) < inf);
            if (!valid) {
                refuse(in, from, k, out);
            }
            // RadiativeGradient.valueAndDerivatives
            final double t2 = t * t;
            final double perL = 3.0 * kappa * p / (RadiativeGradient.DENOMINATOR * m * (t2 * t2));
            final double nablaRad = perL * l;
            final double dKappa = nablaRad / kappa;
            final double dP = nablaRad / p;
            final double dM = -nablaRad / m;
            final double dT = -4.0 * nablaRad / t;
            // LedouxGradient.valueAndDerivatives
            final double ratio = f / d;
            final double dPhi = mu / d;
            final double dDelta = -ratio * mu / d;
            final double nablaL = nAd + ratio * mu;
            // every other derivative is 0 or 1: the sum of (output * 0) is NaN exactly when the per-zone probe is
            final double probe = ((nablaRad * 0.0 + nablaL * 0.0) + (perL * 0.0 + dKappa * 0.0))
                    + ((dP * 0.0 + dM * 0.0) + (dT * 0.0 + dPhi * 0.0)) + (dDelta * 0.0 + ratio * 0.0);
            if (probe != 0.0) {
                refuse(in, from, k, out);
            }
            radL[k] = perL;
            radKappa[k] = dKappa;
            radP[k] = dP;
            radM[k] = dM;
            radT[k] = dT;
            ledouxPhi[k] = dPhi;
            ledouxDelta[k] = dDelta;
            ledouxMu[k] = ratio;
            rad[k] = nablaRad;
            ad[k] = nAd;
            ledoux[k] = nablaL;
            marginS[k] = nablaRad - nAd;
            marginL[k] = nablaRad - nablaL;
            final Regime decided = StabilityClassifier.classify(criterion, nablaRad, nAd, nablaL, mu);
            if (regime[k] != decided) {
                // a reference store costs a garbage-collector barrier: skipped when the regime is unchanged
                regime[k] = decided;
            }
        }
        constants(out, from, to);
    }

    /** d nabla_rad / d (input) for the inputs it does not depend on. */
    private static final int[] RAD_ZEROS = {ZoneInput.RHO, ZoneInput.R, ZoneInput.CP, ZoneInput.NABLA_AD,
        ZoneInput.DELTA, ZoneInput.NABLA_MU, ZoneInput.PHI, ZoneInput.ALPHA};
    /** d nabla_L / d (input) for the inputs it does not depend on. */
    private static final int[] LEDOUX_ZEROS = {ZoneInput.T, ZoneInput.RHO, ZoneInput.P, ZoneInput.L, ZoneInput.M,
        ZoneInput.R, ZoneInput.KAPPA, ZoneInput.CP, ZoneInput.ALPHA};

    /** Fills the derivative columns that are the same in every zone: 0, and d nabla_L / d nabla_ad = 1. */
    private static void constants(StabilityColumns out, int from, int to) {
        for (int i : RAD_ZEROS) {
            Arrays.fill(out.dNablaRad[i], from, to, 0.0);
        }
        for (int i : LEDOUX_ZEROS) {
            Arrays.fill(out.dNablaLedoux[i], from, to, 0.0);
        }
        Arrays.fill(out.dNablaLedoux[ZoneInput.NABLA_AD], from, to, 1.0);
    }

    /** Completes the zones before k, then lets the per-zone call refuse zone k with its own message. */
    private void refuse(ZoneColumns in, int from, int k, StabilityColumns out) {
        constants(out, from, k);
        evaluate(in.load(k, out.workZone), out.workResult);
        throw new IllegalStateException("zone " + k + " failed the batch checks but not the per-zone ones");
    }

    @Override
    public String toString() {
        return NAME + "(criterion=" + criterion.label() + ")";
    }
}
