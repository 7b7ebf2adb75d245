package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.gradient.GradientStability;
import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The semiconvective and thermohaline coefficients with phi != 1 and delta != 1 (phi = 0.7, delta = 1.6, so
 * phi / delta = 0.4375 and a swapped ratio, 2.29, would fail every check), each against a statement of its
 * law written independently of the code's form: Langer, Sugimoto &amp; Fricke (1983, A&amp;A 126, 207) in
 * terms of the radiative conductivity K = 4acT^3 / (3 kappa rho); thermohaline mixing in terms of the density
 * ratio R0 (Kippenhahn, Ruschenplatt &amp; Thomas 1980, A&amp;A 91, 175; Charbonnel &amp; Zahn 2007, A&amp;A 467,
 * L15; the R0 form as in Brown et al. 2013, ApJ 768, 34; all from memory).
 */
class MixingCoefficientsLawsTest {
    private static final double A_RAD = Codata2018.RADIATION_CONSTANT;
    private static final double C = Codata2018.SPEED_OF_LIGHT;
    private static final double PHI = 0.7;
    private static final double DELTA = 1.6;

    /** A zone at T = 1.5e7 K, rho = 60 with nabla_ad = 0.4, phi and delta as above, nabla_rad as asked. */
    private static ZoneState zone(double nablaRad, double nablaMu) {
        ZoneState z = ConvectionOutputsTest.zone(0.1 * Iau2015.SOLAR_RADIUS, 0.2 * Iau2015.SOLAR_MASS, 1.5e7, 60.0,
                1.2, nablaRad);
        z.nablaAd = 0.4;
        z.phi = PHI;
        z.delta = DELTA;
        z.cp = 3.1e8;
        z.nablaMu = nablaMu;
        return z;
    }

    private static ConvectionResult solve(ConvectionModel m, ZoneState z) {
        ConvectionResult out = new ConvectionResult();
        m.solve(z, out);
        return out;
    }

    /** K = 4 a c T^3 / (3 kappa rho), the radiative conductivity (Kippenhahn, Weigert &amp; Weiss 2012 §5.1). */
    private static double conductivity(ZoneState z) {
        return 4.0 * A_RAD * C * Math.pow(z.temperature, 3) / (3.0 * z.opacity * z.density);
    }

    private static ConvectionModel ledoux(double semiconvection, double thermohaline) {
        return new LocalMixingLength(new ConvectionSettings(1.8, Criterion.LEDOUX, MixingLengthGeometry.BOHM_VITENSE_1958,
                CentreLimit.RADIUS, semiconvection, thermohaline, 0.016));
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void semiconvectiveCoefficientOfLangerSugimotoAndFricke() {
        // D_sc = alpha_sc K / (6 c_P rho) (nabla - nabla_ad) / (nabla_L - nabla), nabla = nabla_rad in a
        // semiconvective zone, nabla_L = nabla_ad + (phi / delta) nabla_mu (Kippenhahn, Weigert & Weiss 2012 §6.1)
        double nablaMu = 0.2;
        double nablaL = 0.4 + PHI / DELTA * nablaMu; // 0.4875
        ZoneState z = zone(0.45, nablaMu);
        ConvectionResult out = solve(ledoux(0.04, 1000.0), z);
        assertEquals(Regime.SEMICONVECTIVE, out.regime);
        double expected = 0.04 * conductivity(z) / (6.0 * z.cp * z.density) * (0.45 - 0.4) / (nablaL - 0.45);
        assertEquals(0.45, out.nablaRad, 1e-12);
        assertEquals(expected, out.diffusion, 1e-12 * expected);
        // the swapped ratio delta / phi would put nabla_L at 0.857 and give a coefficient ten times smaller
        double swapped = 0.04 * conductivity(z) / (6.0 * z.cp * z.density) * 0.05 / (0.4 + DELTA / PHI * nablaMu - 0.45);
        assertNotEquals(swapped, out.diffusion, 0.5 * expected);
    }

    @Test
    @Tag(CheckKind.LAW)
    void semiconvectionVanishesAtTheSchwarzschildMarginAndGrowsWithoutBoundTowardsTheLedouxMargin() {
        // (nabla - nabla_ad) / (nabla_L - nabla): 0 at nabla_ad, infinite at nabla_L (Langer, Sugimoto & Fricke 1983)
        double nablaMu = 0.2;
        double nablaL = 0.4 + PHI / DELTA * nablaMu;
        ConvectionModel m = ledoux(0.1, 1000.0);
        double near = solve(m, zone(Math.nextUp(0.4) + 1e-12, nablaMu)).diffusion;
        double far = solve(m, zone(nablaL - 1e-9, nablaMu)).diffusion;
        double middle = solve(m, zone(0.5 * (0.4 + nablaL), nablaMu)).diffusion;
        assertTrue(near < 1e-9 * middle, near + " vs " + middle);
        assertTrue(far > 1e6 * middle, far + " vs " + middle);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void thermohalineCoefficientWithPhiAndDelta() {
        // D_th = C_t K_T (phi / delta)(-nabla_mu) / (nabla_ad - nabla), K_T = K / (rho c_P), nabla = nabla_rad
        // (Charbonnel & Zahn 2007, eq. 4 as remembered)
        double nablaMu = -0.01;
        ZoneState z = zone(0.3, nablaMu);
        ConvectionResult out = solve(ledoux(0.1, 700.0), z);
        assertEquals(Regime.THERMOHALINE, out.regime);
        double kT = conductivity(z) / (z.density * z.cp);
        double expected = 700.0 * kT * (PHI / DELTA) * 0.01 / (0.4 - 0.3);
        assertEquals(expected, out.diffusion, 1e-12 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void thermohalineCoefficientIsCtKTOverTheDensityRatio() {
        // the same law written with the density ratio R0 = (nabla_ad - nabla) / ((phi / delta) |nabla_mu|), the
        // ratio of thermal to compositional stratification: D_th = C_t K_T / R0 (Brown et al. 2013, from memory)
        for (double nablaRad : new double[] {0.05, 0.2, 0.38}) {
            double nablaMu = -0.03;
            ZoneState z = zone(nablaRad, nablaMu);
            ConvectionResult out = solve(ledoux(0.1, 1000.0), z);
            assertEquals(Regime.THERMOHALINE, out.regime);
            double r0 = (0.4 - nablaRad) / ((PHI / DELTA) * 0.03);
            assertTrue(r0 > 1.0, "fingers need R0 > 1: " + r0);
            double expected = 1000.0 * conductivity(z) / (z.density * z.cp) / r0;
            assertEquals(expected, out.diffusion, 1e-12 * expected, "nabla_rad = " + nablaRad);
        }
    }

    @Test
    @Tag(CheckKind.LAW)
    void thermohalineMixingFadesWithTheCompositionGradientAndIsFiniteAtDensityRatioOne() {
        // D_th ~ |nabla_mu| at fixed nabla (linear) and at R0 = 1 (nabla_L = nabla_rad) it is C_t K_T, finite
        ConvectionModel m = ledoux(0.1, 1000.0);
        double d1 = solve(m, zone(0.3, -1e-3)).diffusion;
        double d2 = solve(m, zone(0.3, -2e-3)).diffusion;
        assertEquals(2.0 * d1, d2, 1e-12 * d2);
        double nablaMu = -0.08;
        ZoneState edge = zone(0.4 + PHI / DELTA * nablaMu, nablaMu); // R0 = 1
        ConvectionResult out = solve(m, edge);
        assertEquals(Regime.THERMOHALINE, out.regime);
        double ctKt = 1000.0 * conductivity(edge) / (edge.density * edge.cp);
        assertEquals(ctKt, out.diffusion, 1e-9 * ctKt);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void defaultFingerCoefficientCorrespondsToFingersSixTimesLongerThanWide() {
        // C_t = 8 pi^2 a^2 / 3 for fingers of aspect ratio a (Ulrich 1972; Charbonnel & Zahn 2007, from memory):
        // a = 6 gives 947, the "C_t ~ 1000" of Charbonnel & Zahn, which is the default here
        double ct = 8.0 * Math.PI * Math.PI * 36.0 / 3.0;
        assertEquals(947.48, ct, 0.01);
        assertEquals(1000.0, ConvectionSettings.defaults().thermohaline(), 0.06 * 1000.0);
        assertEquals(ct, ConvectionSettings.defaults().thermohaline(), 0.06 * ct);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void ledouxTermOfGasPlusRadiationIsMinusChiMuOverChiT() {
        // nabla_L = nabla_ad - (chi_mu / chi_T) nabla_mu (Kippenhahn, Weigert & Weiss 2012 §6.1, from memory) with,
        // for P = rho k T / (mu m_u) + a T^4 / 3, chi_mu = -beta and chi_T = 4 - 3 beta: the Ledoux term is
        // beta / (4 - 3 beta) nabla_mu, whatever phi and delta the equation of state writes it with
        for (double t : new double[] {1e6, 3e7, 2e8}) {
            ZoneState z = zone(0.45, 0.1);
            z.temperature = t;
            z.density = 10.0;
            ThermoResult th = new ThermoResult();
            IdealGasRadiation.INSTANCE.complete(z, th);
            z.phi = th.phi;
            StabilityResult st = new StabilityResult();
            new GradientStability(Criterion.LEDOUX).evaluate(z, st);
            double beta = th.beta;
            double expected = z.nablaAd + beta / (4.0 - 3.0 * beta) * 0.1;
            assertEquals(expected, st.nablaLedoux, 1e-13, "T = " + t + ", beta = " + beta);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void thermalDiffusivityIsTheRadiativeConductivityOverRhoCp() {
        // K_T = 4 a c T^3 / (3 kappa rho^2 c_P) (Kippenhahn, Weigert & Weiss 2012 §5.1, from memory), at a state
        // like the solar centre's (1.57e7 K, 150 g/cm^3, kappa 1.25 cm^2/g, c_P 3.4e8 erg/(g K))
        double expected = 4.0 * A_RAD * C * Math.pow(1.57e7, 3) / (3.0 * 1.25 * 150.0 * 150.0 * 3.4e8);
        assertEquals(expected, MixingCoefficients.thermalDiffusivity(1.57e7, 150.0, 1.25, 3.4e8), 1e-14 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void exponentialOvershootAtOneScaleHeight() {
        // D = D_0 exp(-2 z / (f H_P)) (Freytag, Ludwig & Steffen 1996; Herwig 2000, from memory): with f = 0.016
        // the coefficient falls by e^-125 over one H_P, and by e^-2 over f H_P
        assertEquals(1e15 * Math.exp(-125.0), MixingCoefficients.overshoot(1e15, 1e10, 0.016, 1e10), 1e-12 * 1e15 * Math.exp(-125.0));
        assertEquals(1e15 * Math.exp(-2.0), MixingCoefficients.overshoot(1e15, 0.016 * 1e10, 0.016, 1e10), 1e-3);
    }
}
