package io.github.startransport.core.opacity;

import io.github.startransport.core.gradient.ZoneChecks;
import io.github.startransport.spi.Checks;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityColumns;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OpacityStatus;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.ZoneColumns;

import java.util.List;

/**
 * The analytic composite opacity: the default that needs no data file.
 *
 * <p><b>Parts</b> (each a static kernel with its source): {@link ElectronScattering} kappa_es,
 * {@link Kramers} kappa_bf + kappa_ff, {@link HMinus} kappa_H-, {@link MolecularFloor} kappa_mol,
 * {@link Conduction} kappa_cd.
 *
 * <p><b>Combination rule.</b>
 * <pre>
 *   kappa_ion = kappa_es + kappa_bf + kappa_ff                 radiative sources add
 *   kappa_env = [1/kappa_H- + 1/kappa_ion]^-1                  H-minus blended harmonically
 *   kappa_rad = kappa_mol + kappa_env                          molecular floor adds
 *   kappa     = [1/kappa_rad + 1/kappa_cd]^-1                  conduction: fluxes add
 * </pre>
 * The harmonic H-minus blend is the usual analytic envelope interpolation (from memory, attribution
 * unknown): kappa_H- rises as T^9 and takes over below ~6000 K where the ionised sources would
 * diverge as T^-3.5; above it the ionised sources win. The derivatives follow by the chain rule:
 * for a sum, d ln kappa = sum (kappa_i / kappa) d ln kappa_i; for a harmonic sum,
 * d ln kappa = sum (kappa / kappa_i) d ln kappa_i.
 *
 * <p><b>Where to trust it.</b> It reproduces the magnitudes and slopes of its parts where one part
 * dominates: electron scattering in hot, tenuous gas (T &gt; ~1e6.5 K, low density), Kramers'
 * laws in the ionised interior of Sun-like stars (~1e5.5 K &lt; T &lt; ~1e7.5 K), H-minus in cool
 * envelopes (3000-6000 K, 1e-10 to 1e-5 g cm^-3), conduction in strongly degenerate cores. It is
 * an order-of-magnitude model: expect factors of a few against tabulated Rosseland means, and
 * more near the opacity peak (1e4-1e5.5 K) and wherever lines, molecules or partial ionisation
 * matter. Use tables for quantitative work.
 *
 * <p>Metal-free gas: H-minus and the molecular floor scale with Z; so that kappa stays positive
 * they use Z_eff = max(Z, 1e-4) (common practice, no source). Immutable, thread-safe,
 * allocation-free; status is always {@link OpacityStatus#INSIDE} (the model has no edges).
 */
public final class AnalyticOpacity implements OpacityModel {
    /** Name to ask for this model by. */
    public static final String NAME = "analytic-composite";

    /** Smallest Z used in the H-minus and molecular terms (dimensionless). */
    public static final double MIN_EFFECTIVE_METALS = 1e-4;

    /** Describes this model and its options. */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.OPACITY, NAME,
            "analytic composite: electron scattering (Buchler & Yueh 1976 correction), Kramers bound-free and "
                    + "free-free (Carroll & Ostlie 1996), H-minus and conduction (Hansen, Kawaler & Trimble 2004), "
                    + "molecular floor; order-of-magnitude accuracy, no data files",
            List.of(new OptionInfo("bound-free-gaunt-over-guillotine", "0.05", "1",
                            "g_bf / t in Kramers' bound-free law; Carroll & Ostlie (1996) quote t between 1 and 100. "
                                    + "The default t = 20 makes the composite give ~1.3 cm^2/g at the centre of a "
                                    + "standard solar model (T = 1.57e7 K, rho = 150 g/cm^3, X = 0.34), close to the "
                                    + "~1.2-1.3 cm^2/g of tabulated Rosseland means there (from memory); t = 1 gives ~12"),
                    new OptionInfo("free-free-gaunt", "1.0", "1", "g_ff in Kramers' free-free law")));

    /** The model with its default options. */
    public static final AnalyticOpacity DEFAULT = new AnalyticOpacity(0.05, 1.0);

    private final double boundFreeGauntOverGuillotine;
    private final double freeFreeGaunt;

    /**
     * @param boundFreeGauntOverGuillotine g_bf / t (dimensionless), &gt; 0
     * @param freeFreeGaunt                g_ff (dimensionless), &gt; 0
     */
    public AnalyticOpacity(double boundFreeGauntOverGuillotine, double freeFreeGaunt) {
        this.boundFreeGauntOverGuillotine = Checks.positive("boundFreeGauntOverGuillotine",
                boundFreeGauntOverGuillotine, "1", InvalidInputException.NO_ZONE);
        this.freeFreeGaunt = Checks.positive("freeFreeGaunt", freeFreeGaunt, "1", InvalidInputException.NO_ZONE);
    }

    /**
     * @param options {@code bound-free-gaunt-over-guillotine}, {@code free-free-gaunt}
     * @return the model
     */
    public static AnalyticOpacity fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        double bf = options.getDouble(NAME, "bound-free-gaunt-over-guillotine", DEFAULT.boundFreeGauntOverGuillotine);
        double ff = options.getDouble(NAME, "free-free-gaunt", DEFAULT.freeFreeGaunt);
        if (!(bf > 0)) {
            throw new io.github.startransport.spi.InvalidOptionException(NAME, "bound-free-gaunt-over-guillotine",
                    Double.toString(bf), "must be > 0");
        }
        if (!(ff > 0)) {
            throw new io.github.startransport.spi.InvalidOptionException(NAME, "free-free-gaunt",
                    Double.toString(ff), "must be > 0");
        }
        return new AnalyticOpacity(bf, ff);
    }

    /** A loop over this model's own lookup with the output's working space: no allocation, no per-zone dispatch. */
    @Override
    public void evaluateColumns(ZoneColumns in, int from, int to, OpacityColumns out) {
        in.checkRange(from, to, out.capacity);
        final OpacityResult r = out.workResult;
        final double[] t = in.temperature;
        final double[] rho = in.density;
        final double[] x = in.hydrogen;
        final double[] z = in.metals;
        for (int k = from; k < to; k++) {
            evaluate(t[k], rho[k], x[k], z[k], k, r);
            out.store(k, r);
        }
    }

    @Override
    public void evaluate(double temperature, double density, double hydrogen, double metals, int zone,
                         OpacityResult out) {
        Checks.positive("temperature", temperature, "K", zone);
        Checks.positive("density", density, "g cm^-3", zone);
        ZoneChecks.composition(hydrogen, metals, zone);
        double zEff = Math.max(metals, MIN_EFFECTIVE_METALS);

        // ionised sources add
        double es = ElectronScattering.kappa(temperature, density, hydrogen);
        double bf = Kramers.boundFree(temperature, density, hydrogen, metals, boundFreeGauntOverGuillotine);
        double ff = Kramers.freeFree(temperature, density, hydrogen, metals, freeFreeGaunt);
        double kr = bf + ff;
        double ion = es + kr;
        double ionRho = (es * ElectronScattering.dLnRho(temperature, density) + kr * Kramers.D_LN_RHO) / ion;
        double ionT = (es * ElectronScattering.dLnT(temperature, density) + kr * Kramers.D_LN_T) / ion;

        // H-minus blended harmonically with the ionised sources
        double hm = HMinus.kappa(temperature, density, zEff);
        double wHm = 1.0 / (1.0 + hm / ion); // = kappa_env / kappa_H-
        double wIon = 1.0 / (1.0 + ion / hm); // = kappa_env / kappa_ion
        double env = hm * wHm;
        double envRho = wHm * HMinus.D_LN_RHO + wIon * ionRho;
        double envT = wHm * HMinus.D_LN_T + wIon * ionT;

        // molecular floor adds (its slopes are 0)
        double rad = MolecularFloor.kappa(zEff) + env;
        double radRho = env / rad * envRho;
        double radT = env / rad * envT;

        // conduction combines harmonically
        double muE = 2.0 / (1.0 + hydrogen);
        double cd = Conduction.kappa(temperature, density, muE, Conduction.chargeSquaredPerMass(hydrogen, metals));
        double wRad = 1.0 / (1.0 + rad / cd);
        double wCd = 1.0 / (1.0 + cd / rad);
        double kappa = rad * wRad;
        double dRho = wRad * radRho + wCd * Conduction.D_LN_RHO;
        double dT = wRad * radT + wCd * Conduction.D_LN_T;
        if (!(kappa > 0.0) || kappa == Double.POSITIVE_INFINITY || !Double.isFinite(dRho) || !Double.isFinite(dT)) {
            throw new InvalidInputException("temperature", temperature, "K", zone,
                    "such that the analytic opacity is finite and > 0 with finite slopes (got " + kappa
                            + " cm^2 g^-1, d ln kappa / d ln rho = " + dRho + ", d ln kappa / d ln T = " + dT
                            + " at rho = " + density + " g cm^-3)");
        }
        out.kappa = kappa;
        out.dLnKappaDLnRho = dRho;
        out.dLnKappaDLnT = dT;
        out.status = OpacityStatus.INSIDE;
    }

    /** @return g_bf / t (dimensionless) */
    public double boundFreeGauntOverGuillotine() {
        return boundFreeGauntOverGuillotine;
    }

    /** @return g_ff (dimensionless) */
    public double freeFreeGaunt() {
        return freeFreeGaunt;
    }

    @Override
    public String toString() {
        return NAME + "(bound-free-gaunt-over-guillotine=" + boundFreeGauntOverGuillotine + ", free-free-gaunt="
                + freeFreeGaunt + ")";
    }
}
