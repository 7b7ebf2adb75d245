package io.github.startransport.core.opacity;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.InvalidOptionException;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OpacityStatus;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class AnalyticOpacityTest {
    /** The published Kramers constants with g_bf / t = 1 (Carroll & Ostlie 1996), so the checks below see them unscaled. */
    private static final AnalyticOpacity MODEL = new AnalyticOpacity(1.0, 1.0);

    private static void assertRel(double expected, double actual, double rel, String what) {
        assertEquals(expected, actual, rel * Math.abs(expected), what);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void electronScatteringTendsToThomsonInCoolTenuousLimit() {
        // Thomson opacity of fully ionised matter sigma_T / (mu_e m_u), mu_e = 2 / (1 + X), with the
        // CODATA 2018 sigma_T = 6.6524587321e-25 cm^2 and m_u = 1.66053906660e-24 g.
        // At T = 1e4 K, rho = 1e-12 both correction terms are below 1.2e-4.
        for (double x : new double[] {0.0, 0.3, 0.7, 1.0}) {
            double thomson = 6.6524587321e-25 / ((2 / (1 + x)) * 1.66053906660e-24);
            assertRel(thomson, ElectronScattering.kappa(1e4, 1e-12, x), 2e-4, "X = " + x);
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void compositeIsPointTwoTimesOnePlusXInHotTenuousGas() {
        // kappa_es = 0.2 (1 + X) cm^2/g for fully ionised gas, the textbook Thomson value (e.g. Carroll & Ostlie
        // 1996, §9.2; equation number from memory).
        // At T = 2e6 K, rho = 1e-8 the Buchler & Yueh high-T factor is ~1%, Kramers' terms are ~1e-5 of
        // kappa_es, and 0.2 rounds sigma_T / 2 m_u = 0.2003: hence 1.5%.
        OpacityResult r = new OpacityResult();
        for (double x : new double[] {0.0, 0.7, 1.0}) {
            MODEL.evaluate(2e6, 1e-8, x, 0.0, -1, r);
            assertRel(0.2 * (1 + x), r.kappa, 0.015, "X = " + x);
            assertEquals(OpacityStatus.INSIDE, r.status);
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void electronScatteringCorrectionMatchesPublishedFit() {
        // Buchler & Yueh (1976) fit as given by Paczynski (1983), from memory:
        // 0.2 (1 + X) / [(1 + 2.7e11 rho / T^2)(1 + (T / 4.5e8)^0.86)]; at X = 0.7 it gives 0.32671 at
        // (rho, T) = (1, 1e7) and 0.072111 at (1e5, 1e8). We use sigma_T / 2 m_u instead of 0.2: rescale.
        double rescale = 0.2 / ElectronScattering.THOMSON_PER_ONE_PLUS_X;
        assertRel(0.32671, ElectronScattering.kappa(1e7, 1.0, 0.7) * rescale, 2e-5, "(1, 1e7)");
        assertRel(0.072111, ElectronScattering.kappa(1e8, 1e5, 0.7) * rescale, 2e-5, "(1e5, 1e8)");
        // The textbook remark: at 1e8 K and low density electron scattering is reduced by roughly 20%
        // (source not at hand; from memory). The fit gives 21%.
        double ratio = ElectronScattering.kappa(1e8, 1e-6, 0.7) / ElectronScattering.thomson(0.7);
        assertEquals(0.79, ratio, 0.02);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void kramersConstantsMatchCarrollOstlie() {
        // Carroll & Ostlie (1996, p. 274): kappa_bf = 4.34e25 (g/t) Z (1+X) rho T^-3.5 and
        // kappa_ff = 3.68e22 g (1-Z)(1+X) rho T^-3.5; at X = 0.7, Z = 0.02, rho = 1, T = 1e7, g/t = 1:
        // 0.46663 and 0.019388.
        assertRel(0.46663, Kramers.boundFree(1e7, 1.0, 0.7, 0.02, 1.0), 1e-4, "bound-free");
        assertRel(0.019388, Kramers.freeFree(1e7, 1.0, 0.7, 0.02, 1.0), 1e-4, "free-free");
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void hMinusMatchesHansenKawalerTrimble() {
        // Hansen, Kawaler & Trimble (2004): kappa_H- = 2.5e-31 (Z/0.02) rho^1/2 T^9; rho = 1e-7, T = 5000 K gives 0.15441.
        assertRel(0.15441, HMinus.kappa(5000, 1e-7, 0.02), 1e-4, "H-minus");
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void conductionCoefficientIsTheWiedemannFranzLorentzGasValue() {
        // Wiedemann-Franz for degenerate electrons, lambda = (pi^2/3) n_e k^2 T tau / m_e, with the Lorentz-gas
        // collision time 1/tau = 4 pi n_i Z^2 e^4 Lambda / (p_F^2 v_F), p_F^3 = 3 pi^2 hbar^3 n_e (Rutherford
        // transport cross-section; e.g. Yakovlev & Urpin 1980, from memory) and kappa = 4 a c T^3 / (3 rho lambda).
        // Evaluated here step by step from CODATA 2018 values for pure 12C (mu_e = 2, Z^2/A = 3) at
        // rho = 1e6 g/cm^3, T = 1e7 K, Lambda = 1.
        double c = 2.99792458e10;
        double a = 4 * 5.670374419e-5 / c;
        double me = 9.1093837015e-28;
        double mu = 1.66053906660e-24;
        double k = 1.380649e-16;
        double hbar = 6.62607015e-27 / (2 * Math.PI);
        double e = 1.602176634e-19 * c / 10; // statC
        double rho = 1e6;
        double t = 1e7;
        double ne = rho / (2 * mu);
        double ni = rho / (12 * mu);
        double pF = hbar * Math.cbrt(3 * Math.PI * Math.PI * ne);
        double vF = pF / me;
        double tau = pF * pF * vF / (4 * Math.PI * ni * 36 * Math.pow(e, 4));
        double lambda = Math.PI * Math.PI / 3 * ne * k * k * t * tau / me;
        double expected = 4 * a * c * t * t * t / (3 * rho * lambda);
        assertRel(expected, Conduction.kappa(t, rho, 2.0, 36.0 / 12.0), 1e-12, "conduction, 12C");
        // Hansen, Kawaler & Trimble's rounded coefficient 4e-8 gives 4.8e-5 here: ours is 3.2x larger, i.e. their
        // value corresponds to a Coulomb logarithm of 0.31, below the 0.6-1.5 of Yakovlev & Urpin (1980) for
        // white-dwarf conditions (from memory), which is why we take Lambda = 1.
        double impliedLambda = 4.8e-5 / Conduction.kappa(t, rho, 2.0, 3.0);
        assertEquals(0.31, impliedLambda, 0.01);
    }

    // ---- the default composite against tabulated Rosseland means ----
    // The default's one fitted constant, T_A of the guillotine factor, was fixed at the solar centre (the
    // calibration anchor below). Every other point here was NOT used to fix anything: held-out checks.

    private static double kappa(double t, double rho, double x, double z) {
        OpacityResult r = new OpacityResult();
        AnalyticOpacity.DEFAULT.evaluate(t, rho, x, z, -1, r);
        return r.kappa;
    }

    private static void assertWithinFactor(double expected, double actual, double factor, String what) {
        assertTrue(actual > expected / factor && actual < expected * factor,
                what + ": " + actual + " cm^2/g, expected " + expected + " within a factor " + factor);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void calibrationAnchorSolarCentre() {
        // CALIBRATION ANCHOR, not an independent check: T_A was chosen so that the composite gives 1.25 cm^2/g here,
        // the middle of the 1.2-1.3 cm^2/g of tabulated Rosseland means at the centre of standard solar models
        // (T = 1.57e7 K, rho = 150 g/cm^3, X = 0.34, Z = 0.02; values from memory). This only checks the arithmetic
        // of that calibration (T_A is rounded to three digits).
        assertRel(1.25, kappa(1.57e7, 150, 0.34, 0.02), 0.01, "solar centre");
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void heldOutBaseOfTheSolarConvectionZone() {
        // Held out. At the base of the solar convection zone (helioseismic r = 0.713 R_sun, Christensen-Dalsgaard,
        // Gough & Thompson 1991) nabla_rad = nabla_ad = 0.4, so kappa = 0.4 * 16 pi a c G m T^4 / (3 L P)
        // (Kippenhahn, Weigert & Weiss 2012 eq. 5.28). State from memory of standard solar models: T = 2.2e6 K,
        // rho = 0.19 g/cm^3, X = 0.74, Z = 0.02, m = 0.976 M_sun, L = L_sun; P = rho k T / (mu m_u) + a T^4 / 3 with
        // the fully ionised mu. This gives 20.8 cm^2/g, the "~20" of tabulated means there.
        double t = 2.2e6;
        double rho = 0.19;
        double mu = 1 / (2 * 0.74 + 0.75 * 0.24 + 0.5 * 0.02);
        double pressure = rho * Codata2018.BOLTZMANN * t / (mu * Codata2018.ATOMIC_MASS_UNIT)
                + Codata2018.RADIATION_CONSTANT * Math.pow(t, 4) / 3;
        double m = 0.976 * Iau2015.SOLAR_MASS;
        double expected = 0.4 * 16 * Math.PI * Codata2018.RADIATION_CONSTANT * Codata2018.SPEED_OF_LIGHT
                * Codata2018.GRAVITATIONAL_CONSTANT * m * Math.pow(t, 4) / (3 * Iau2015.SOLAR_LUMINOSITY * pressure);
        assertEquals(20.8, expected, 0.5, "the radiative-equilibrium estimate itself");
        assertWithinFactor(expected, kappa(t, rho, 0.74, 0.02), 1.5, "base of the solar convection zone");
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void heldOutOneMillionKelvin() {
        // Held out. T = 1e6 K, rho = 0.1 g/cm^3 (log R = -1), X = 0.7, Z = 0.02: ~150 cm^2/g in tabulated Rosseland
        // means (value from memory).
        assertWithinFactor(150, kappa(1e6, 0.1, 0.7, 0.02), 1.5, "1 MK");
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void heldOutPhotosphereIsWithinAFactorThree() {
        // Held out, and a known weakness. Near the solar photosphere (T = 5800 K, rho = 3e-7 g/cm^3, X = 0.7,
        // Z = 0.02) tabulated Rosseland means give ~0.3-0.5 cm^2/g (value from memory; optical depth 2/3 at
        // P = 1.1e5 dyn/cm^2 and g = 2.74e4 cm/s^2 needs kappa = tau g / P ~ 0.17). The H-minus law, ~ T^9, is ~2.5x
        // high there, at the top of its 3000-6000 K range: the README states a factor 3 for the photosphere.
        assertWithinFactor(0.4, kappa(5800, 3e-7, 0.7, 0.02), 3, "photosphere");
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void guillotineFactorHasBothPhysicalLimits() {
        // Kramers regime: t = 1 (the published law) while the light metals keep their K-shell electrons; with the
        // oxygen K-shell energy 64 Rydberg = 870.76 eV (CODATA 2018), t - 1 < 1e-4 at 1 MK.
        assertEquals(870.7643598716 / 8.617333262e-5, Kramers.K_SHELL_TEMPERATURE, 1e-3);
        assertEquals(1.0, Kramers.guillotine(1e6), 1e-4);
        // Stripped limit (Saha: bound fraction ~ rho T^-3/2 exp(chi/kT), cross-section ~ T^-3 above the edge):
        // kappa_bf ~ rho T^-4.5, i.e. d ln t / d ln T -> 1 for T >> theta_K.
        assertEquals(1.0, Kramers.dLnGuillotineDLnT(1e11), 2e-4);
        // monotonic in between
        double previous = 1.0;
        for (double lt = 5; lt <= 9; lt += 0.01) {
            double g = Kramers.guillotine(Math.pow(10, lt));
            assertTrue(g >= previous, "t decreases at log T = " + lt);
            previous = g;
        }
    }

    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 300, seed = "20261203")
    void defaultDerivativesMatchCentralDifferences(@ForAll @Scale(9) @DoubleRange(min = 3.3, max = 9.0) double logT,
                                                   @ForAll @Scale(9) @DoubleRange(min = -12, max = 8) double logRho,
                                                   @ForAll @Scale(9) @DoubleRange(min = 0, max = 1) double x,
                                                   @ForAll @Scale(9) @DoubleRange(min = 0, max = 0.1) double zFrac) {
        assertDerivativesMatch(AnalyticOpacity.DEFAULT, logT, logRho, x, zFrac * (1 - x));
    }

    @net.jqwik.api.Tag(CheckKind.EXTERNAL)
    @Property(tries = 300, seed = "20261204")
    void conductionIsNegligibleInNonDegenerateGas(@ForAll @Scale(9) @DoubleRange(min = 0, max = 1) double u,
                                                  @ForAll @Scale(9) @DoubleRange(min = 0, max = 1) double v,
                                                  @ForAll @Scale(9) @DoubleRange(min = 0, max = 3.99) double box) {
        // Conduction matters only where electrons are degenerate, rho / mu_e > ~2.4e-8 T^3/2 (Hansen, Kawaler &
        // Trimble 2004 §3.5, from memory). The four boxes of the Conduction javadoc lie at least 5x below that
        // density; there the stand-in conductive term must take < 1 % of 1/kappa.
        double[][] boxes = {{4.5, 9.0, -12, -3}, {5.5, 9.0, -12, -1}, {6.0, 9.0, -12, 0}, {7.0, 9.0, -12, 2}};
        double[] b = boxes[(int) box];
        double t = Math.pow(10, b[0] + u * (b[1] - b[0]));
        double rho = Math.pow(10, b[2] + v * (b[3] - b[2]));
        assertTrue(rho * 1.7 / 2 < 2.4e-8 * Math.pow(t, 1.5) / 5, "box not well non-degenerate");
        double cd = Conduction.kappa(t, rho, 2 / 1.7, Conduction.chargeSquaredPerMass(0.7, 0.02));
        double share = kappa(t, rho, 0.7, 0.02) / cd;
        assertTrue(share < 0.01, "conduction share " + share + " at T = " + t + ", rho = " + rho);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void kramersSlopesWhereFreeFreeDominates() {
        // Kramers' law kappa ~ rho T^-3.5 (Carroll & Ostlie 1996): d ln kappa/d ln rho = 1, d ln kappa/d ln T = -3.5.
        // Z = 0: no bound-free; at T = 1e5 K, rho = 1e-2 free-free exceeds electron scattering by 1e4 and
        // conduction's share is 4e-4, so the slopes hold to 2e-3.
        OpacityResult r = new OpacityResult();
        MODEL.evaluate(1e5, 1e-2, 0.7, 0.0, -1, r);
        assertEquals(1.0, r.dLnKappaDLnRho, 2e-3);
        assertEquals(-3.5, r.dLnKappaDLnT, 2e-3 * 3.5);
        // With metals, bound-free dominates with the same slopes: at T = 1e6 K, rho = 0.1, electron
        // scattering is 0.22% of kappa_bf and conduction 2.5e-5, hence 3e-3.
        MODEL.evaluate(1e6, 0.1, 0.7, 0.02, -1, r);
        assertEquals(1.0, r.dLnKappaDLnRho, 3e-3);
        assertEquals(-3.5, r.dLnKappaDLnT, 3e-3 * 3.5);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void hMinusSlopesWhereItDominates() {
        // kappa_H- ~ rho^1/2 T^9 (Hansen, Kawaler & Trimble 2004). At T = 6000 K, rho = 1e-7, X = 0.7,
        // Z = 0.02: the ionised sources are 5e4 times larger (harmonic blend: negligible) and the
        // molecular floor 0.1 Z is 0.25% of the total, so the slopes hold to 0.5%.
        OpacityResult r = new OpacityResult();
        MODEL.evaluate(6000, 1e-7, 0.7, 0.02, -1, r);
        assertEquals(0.5, r.dLnKappaDLnRho, 0.005 * 0.5);
        assertEquals(9.0, r.dLnKappaDLnT, 0.005 * 9);
        assertRel(HMinus.kappa(6000, 1e-7, 0.02), r.kappa, 0.005, "kappa");
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void conductionDominatesInDegenerateMatter() {
        // kappa_cd ~ (T/rho)^2 (Hansen, Kawaler & Trimble 2004): at rho = 1e8, T = 1e7 (white-dwarf core)
        // conduction is 1e-7 of the radiative opacity, so the slopes are -2 and +2.
        OpacityResult r = new OpacityResult();
        MODEL.evaluate(1e7, 1e8, 0.0, 0.02, -1, r);
        assertEquals(-2.0, r.dLnKappaDLnRho, 1e-3);
        assertEquals(2.0, r.dLnKappaDLnT, 1e-3);
    }

    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 300, seed = "20261201")
    void derivativesMatchCentralDifferences(@ForAll @Scale(9) @DoubleRange(min = 3.3, max = 9.0) double logT,
                                            @ForAll @Scale(9) @DoubleRange(min = -12, max = 8) double logRho,
                                            @ForAll @Scale(9) @DoubleRange(min = 0, max = 1) double x,
                                            @ForAll @Scale(9) @DoubleRange(min = 0, max = 0.1) double zFrac) {
        assertDerivativesMatch(MODEL, logT, logRho, x, zFrac * (1 - x));
    }

    private static void assertDerivativesMatch(AnalyticOpacity model, double logT, double logRho, double x, double z) {
        double t = Math.pow(10, logT);
        double rho = Math.pow(10, logRho);
        OpacityResult r = new OpacityResult();
        model.evaluate(t, rho, x, z, -1, r);
        double h = 1e-5; // in ln; central difference error ~ h^2 f(3) / 6 < 1e-7 here
        OpacityResult p = new OpacityResult();
        OpacityResult m = new OpacityResult();
        model.evaluate(t, rho * Math.exp(h), x, z, -1, p);
        model.evaluate(t, rho * Math.exp(-h), x, z, -1, m);
        double fdRho = (Math.log(p.kappa) - Math.log(m.kappa)) / (2 * h);
        model.evaluate(t * Math.exp(h), rho, x, z, -1, p);
        model.evaluate(t * Math.exp(-h), rho, x, z, -1, m);
        double fdT = (Math.log(p.kappa) - Math.log(m.kappa)) / (2 * h);
        assertEquals(fdRho, r.dLnKappaDLnRho, 1e-6 * Math.max(1, Math.abs(fdRho)), "d ln kappa / d ln rho");
        assertEquals(fdT, r.dLnKappaDLnT, 1e-6 * Math.max(1, Math.abs(fdT)), "d ln kappa / d ln T");
    }

    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 300, seed = "20261202")
    void conductionAndRadiationNeverExceedEither(@ForAll @Scale(9) @DoubleRange(min = 3.3, max = 9.0) double logT,
                                                 @ForAll @Scale(9) @DoubleRange(min = -12, max = 9) double logRho) {
        // Fluxes add, so 1/kappa = 1/kappa_rad + 1/kappa_cd: kappa is below kappa_cd (HKT 2004 §4.5).
        double t = Math.pow(10, logT);
        double rho = Math.pow(10, logRho);
        OpacityResult r = new OpacityResult();
        MODEL.evaluate(t, rho, 0.7, 0.02, -1, r);
        double cd = Conduction.kappa(t, rho, 2 / 1.7, Conduction.chargeSquaredPerMass(0.7, 0.02));
        assertTrue(r.kappa <= cd * (1 + 1e-12), "kappa " + r.kappa + " > kappa_cd " + cd);
        assertTrue(r.kappa > 0 && Double.isFinite(r.kappa));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void refusesBadInputNamingTheField() {
        OpacityResult r = new OpacityResult();
        assertEquals("temperature", assertThrows(InvalidInputException.class,
                () -> MODEL.evaluate(0, 1, 0.7, 0.02, 3, r)).field());
        assertEquals("density", assertThrows(InvalidInputException.class,
                () -> MODEL.evaluate(1e6, Double.NaN, 0.7, 0.02, 3, r)).field());
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> MODEL.evaluate(1e6, 1, 0.9, 0.2, 3, r));
        assertEquals("metals", e.field());
        assertEquals(3, e.zone());
        assertThrows(InvalidInputException.class, () -> new AnalyticOpacity(-1, 1));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void guillotineOptionTakesTheLawOrAConstant() {
        assertEquals(AnalyticOpacity.DEFAULT.toString(), AnalyticOpacity.fromOptions(ModelOptions.defaults()).toString());
        assertTrue(AnalyticOpacity.fromOptions(ModelOptions.parse("bound-free-gaunt-over-guillotine=k-shell"))
                .boundFreeGauntOverGuillotine().isEmpty());
        assertEquals(0.05, AnalyticOpacity.fromOptions(ModelOptions.parse("bound-free-gaunt-over-guillotine=0.05"))
                .boundFreeGauntOverGuillotine().getAsDouble());
        assertEquals("bound-free-gaunt-over-guillotine", assertThrows(InvalidOptionException.class,
                () -> AnalyticOpacity.fromOptions(ModelOptions.parse("bound-free-gaunt-over-guillotine=-2"))).option());
        assertThrows(InvalidOptionException.class,
                () -> AnalyticOpacity.fromOptions(ModelOptions.parse("bound-free-gaunt-over-guillotine=shell")));
    }

}
