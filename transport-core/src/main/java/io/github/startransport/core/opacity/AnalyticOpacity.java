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
 * <p><b>Bound-free guillotine factor.</b> By default t rises with temperature ({@link Kramers#guillotine}):
 * t = 1 (the published Kramers law) up to ~2.2 MK, 20 at the solar centre. A constant g_bf / t can be
 * chosen instead.
 *
 * <p><b>Where to trust it</b> (measured against tabulated Rosseland means quoted from memory; see
 * {@code AnalyticOpacityTest}): within a factor 1.5 at the solar centre (the one calibration point,
 * 1.25 cm^2/g) and, held out, at the base of the solar convection zone (18.4 against 20.8 from
 * radiative equilibrium) and at 1 MK, 0.1 g cm^-3 (154 against ~150); between these points (3-15 MK)
 * the law is smooth but unchecked. Electron scattering in hot, tenuous gas (T &gt; ~1e6.5 K) and conduction in
 * strongly degenerate matter (Wiedemann-Franz, Coulomb logarithm 1) follow their textbook forms. H-minus
 * in cool envelopes (3000-6000 K, 1e-10 to 1e-5 g cm^-3) is ~2.5x high at the solar photosphere
 * (1.0 against ~0.4 cm^2/g at 5800 K). Near the opacity peak (1e4-1e5.5 K), and wherever lines, molecules,
 * partial ionisation or partial degeneracy matter, it is an order-of-magnitude model. Use tables for
 * quantitative work.
 *
 * <p>Metal-free gas: H-minus and the molecular floor scale with Z; so that kappa stays positive
 * they use Z_eff = max(Z, 1e-4) (common practice, no source). Immutable, thread-safe,
 * allocation-free; status is always {@link OpacityStatus#INSIDE} (the model has no edges).
 */
public final class AnalyticOpacity implements OpacityModel {
    /** Name to ask for this model by. */
    public static final String NAME = "analytic-composite";

    /** Name of the option that chooses the bound-free guillotine factor. */
    public static final String BOUND_FREE_OPTION = "bound-free-gaunt-over-guillotine";

    /** Value of {@link #BOUND_FREE_OPTION} for the temperature-dependent factor {@link Kramers#guillotine}. */
    public static final String K_SHELL = "k-shell";

    /** Smallest Z used in the H-minus and molecular terms (dimensionless). */
    public static final double MIN_EFFECTIVE_METALS = 1e-4;

    /** Describes this model and its options. */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.OPACITY, NAME,
            "analytic composite: electron scattering (Buchler & Yueh 1976 correction), Kramers bound-free (with a "
                    + "guillotine factor rising as the K shells of C, N, O, Ne empty) and free-free (Carroll & Ostlie "
                    + "1996), H-minus (Hansen, Kawaler & Trimble 2004), molecular floor, degenerate-electron conduction "
                    + "(Wiedemann-Franz); within a factor 1.5 of tabulated Rosseland means at 1 MK, the solar "
                    + "convection-zone base and the solar centre, order of magnitude elsewhere; no data files",
            List.of(new OptionInfo(AnalyticOpacity.BOUND_FREE_OPTION, AnalyticOpacity.K_SHELL, "1",
                            "g_bf / t in Kramers' bound-free law (Carroll & Ostlie 1996 quote the guillotine factor t "
                                    + "between 1 and 100): 'k-shell' for t(T) = 1 + (T / 4.25e5 K) exp(-1.0105e7 K / T), "
                                    + "t within 6 % of 1 up to 2.2 MK, rising as the K shells of C, N, O, Ne empty "
                                    + "(20.4 at the solar centre); within a factor 1.5 of tabulated Rosseland means at "
                                    + "the solar centre (its calibration point), the solar convection-zone base and 1 MK; "
                                    + "or a number for a constant g_bf / t (1 = the published law, right from 1 to 3 MK "
                                    + "and ~10x high at the solar centre)"),
                    new OptionInfo("free-free-gaunt", "1.0", "1", "g_ff in Kramers' free-free law")));

    /** The model with its default options: the temperature-dependent guillotine factor, g_ff = 1. */
    public static final AnalyticOpacity DEFAULT = kShellGuillotine(1.0);

    /** g_bf / t when constant; NaN when the guillotine factor is {@link Kramers#guillotine}. */
    private final double boundFreeGauntOverGuillotine;
    private final boolean risingGuillotine;
    private final double freeFreeGaunt;

    /**
     * The composite with a constant bound-free g_bf / t.
     *
     * @param boundFreeGauntOverGuillotine g_bf / t (dimensionless), &gt; 0
     * @param freeFreeGaunt                g_ff (dimensionless), &gt; 0
     */
    public AnalyticOpacity(double boundFreeGauntOverGuillotine, double freeFreeGaunt) {
        this(Checks.positive("boundFreeGauntOverGuillotine", boundFreeGauntOverGuillotine, "1",
                InvalidInputException.NO_ZONE), false, freeFreeGaunt);
    }

    private AnalyticOpacity(double boundFreeGauntOverGuillotine, boolean risingGuillotine, double freeFreeGaunt) {
        this.boundFreeGauntOverGuillotine = boundFreeGauntOverGuillotine;
        this.risingGuillotine = risingGuillotine;
        this.freeFreeGaunt = Checks.positive("freeFreeGaunt", freeFreeGaunt, "1", InvalidInputException.NO_ZONE);
    }

    /**
     * The composite with the temperature-dependent guillotine factor {@link Kramers#guillotine} (g_bf = 1).
     *
     * @param freeFreeGaunt g_ff (dimensionless), &gt; 0
     * @return the model
     */
    public static AnalyticOpacity kShellGuillotine(double freeFreeGaunt) {
        return new AnalyticOpacity(Double.NaN, true, freeFreeGaunt);
    }

    /**
     * @param options {@code bound-free-gaunt-over-guillotine}, {@code free-free-gaunt}
     * @return the model
     */
    public static AnalyticOpacity fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        double ff = options.getDouble(NAME, "free-free-gaunt", DEFAULT.freeFreeGaunt);
        if (!(ff > 0)) {
            throw new io.github.startransport.spi.InvalidOptionException(NAME, "free-free-gaunt",
                    Double.toString(ff), "must be > 0");
        }
        String bfText = options.getString(NAME, BOUND_FREE_OPTION, K_SHELL).trim();
        if (bfText.equalsIgnoreCase(K_SHELL)) {
            return kShellGuillotine(ff);
        }
        double bf = options.getDouble(NAME, BOUND_FREE_OPTION, Double.NaN);
        if (!(bf > 0)) {
            throw new io.github.startransport.spi.InvalidOptionException(NAME, BOUND_FREE_OPTION,
                    bfText, "must be '" + K_SHELL + "' or a number > 0");
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
        double bf;
        double bfT; // d ln kappa_bf / d ln T
        if (risingGuillotine) {
            double rise = Kramers.rise(temperature);
            bf = Kramers.boundFree(temperature, density, hydrogen, metals, 1.0) / (1.0 + rise);
            bfT = rise == 0.0 ? Kramers.D_LN_T
                    : Kramers.D_LN_T - rise / (1.0 + rise) * (1.0 + Kramers.K_SHELL_TEMPERATURE / temperature);
        } else {
            bf = Kramers.boundFree(temperature, density, hydrogen, metals, boundFreeGauntOverGuillotine);
            bfT = Kramers.D_LN_T;
        }
        double ff = Kramers.freeFree(temperature, density, hydrogen, metals, freeFreeGaunt);
        double kr = bf + ff;
        double ion = es + kr;
        double ionRho = (es * ElectronScattering.dLnRho(temperature, density) + kr * Kramers.D_LN_RHO) / ion;
        double ionT = (es * ElectronScattering.dLnT(temperature, density) + bf * bfT + ff * Kramers.D_LN_T) / ion;

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

    /** @return the constant g_bf / t (dimensionless), or empty when t is {@link Kramers#guillotine} */
    public java.util.OptionalDouble boundFreeGauntOverGuillotine() {
        return risingGuillotine ? java.util.OptionalDouble.empty()
                : java.util.OptionalDouble.of(boundFreeGauntOverGuillotine);
    }

    /** @return g_ff (dimensionless) */
    public double freeFreeGaunt() {
        return freeFreeGaunt;
    }

    @Override
    public String toString() {
        return NAME + "(" + BOUND_FREE_OPTION + "=" + (risingGuillotine ? K_SHELL : Double.toString(
                boundFreeGauntOverGuillotine)) + ", free-free-gaunt=" + freeFreeGaunt + ")";
    }
}
