package io.github.startransport.core.gradient;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ZoneState;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * nabla_rad = 3 kappa L P / (16 pi a c G m T^4) (Kippenhahn, Weigert &amp; Weiss 2012 eq. 5.28) in stellar states
 * where textbooks give its value in closed form by another route, and the stability decision that follows.
 */
class RadiativeGradientTextbookStatesTest {
    private static final double A = Codata2018.RADIATION_CONSTANT;
    private static final double C = Codata2018.SPEED_OF_LIGHT;
    private static final double G = Codata2018.GRAVITATIONAL_CONSTANT;
    private static final double K = Codata2018.BOLTZMANN;
    private static final double M_U = Codata2018.ATOMIC_MASS_UNIT;

    private static StabilityResult evaluate(Criterion criterion, ZoneState z) {
        StabilityResult out = new StabilityResult();
        new GradientStability(criterion).evaluate(z, out);
        return out;
    }

    private static ZoneState zone(double r, double m, double t, double rho, double p, double kappa, double l,
                                  double nablaAd, double delta) {
        ZoneState z = new ZoneState();
        z.radius = r;
        z.mass = m;
        z.temperature = t;
        z.density = rho;
        z.pressure = p;
        z.opacity = kappa;
        z.luminosity = l;
        z.cp = 3e8;
        z.nablaAd = nablaAd;
        z.delta = delta;
        z.phi = 1.0;
        z.nablaMu = 0.0;
        return z;
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void greyEddingtonAtmosphereHasNablaRadTauOverFourTimesTauPlusTwoThirds() {
        // Grey atmosphere in the Eddington approximation: T^4 = (3/4) T_eff^4 (tau + 2/3) (Mihalas 1978, Stellar
        // Atmospheres, §3.3; Kippenhahn, Weigert & Weiss 2012 §4.3; from memory); with constant kappa hydrostatic
        // equilibrium gives P = g tau / kappa. Then d ln T / d ln P = tau / (4 (tau + 2/3)): 1/8 at the photosphere
        // (tau = 2/3, T = T_eff), tending to 1/4 at depth. The Sun's nominal values (IAU 2015 B3) and
        // L = 4 pi R^2 sigma T_eff^4.
        double r = Iau2015.SOLAR_RADIUS;
        double m = Iau2015.SOLAR_MASS;
        double teff = Iau2015.SOLAR_EFFECTIVE_TEMPERATURE;
        double l = 4.0 * Math.PI * r * r * Codata2018.STEFAN_BOLTZMANN * Math.pow(teff, 4);
        double g = G * m / (r * r);
        double kappa = 0.3;
        for (double tau : new double[] {1e-3, 2.0 / 3.0, 1.0, 10.0, 1e4}) {
            double t = teff * Math.pow(0.75 * (tau + 2.0 / 3.0), 0.25);
            double p = g * tau / kappa;
            double expected = tau / (4.0 * (tau + 2.0 / 3.0));
            assertEquals(expected, RadiativeGradient.value(kappa, l, p, m, t), 1e-13 * expected, "tau = " + tau);
            // always below 1/4 < nabla_ad = 2/5 of a monatomic gas: a grey atmosphere of constant opacity is radiative
            ZoneState z = zone(r, m, t, 1e-7, p, kappa, l, 0.4, 1.0);
            assertEquals(Regime.RADIATIVE, evaluate(Criterion.SCHWARZSCHILD, z).regime, "tau = " + tau);
        }
        double photosphere = RadiativeGradient.value(kappa, l, g * (2.0 / 3.0) / kappa, m, teff);
        assertEquals(0.125, photosphere, 1e-14);
    }

    /**
     * beta of Eddington's standard model, the root of 1 - beta = C (M/M_sun)^2 mu^4 beta^4 with
     * C = pi G^3 a m_u^4 M_sun^2 / (48 omega_3^2 k^4) (Eddington 1926; Chandrasekhar 1939 ch. VI; omega_3 = 2.01824,
     * Chandrasekhar's table for n = 3, from memory), found by Commons Math's Brent solver.
     */
    private static double standardModelBeta(double solarMasses, double mu) {
        double ms = Iau2015.SOLAR_MASS;
        double cq = Math.PI * G * G * G * A * Math.pow(M_U, 4) * ms * ms / (48.0 * 2.01824 * 2.01824 * Math.pow(K, 4));
        double x = solarMasses * solarMasses * Math.pow(mu, 4) * cq;
        return new BrentSolver(1e-15).solve(200, b -> 1.0 - b - x * Math.pow(b, 4), 1e-9, 1.0);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void eddingtonStandardModelHasNablaRadOneQuarterAndIsRadiative() {
        // In Eddington's standard model kappa L(m) / m = 4 pi c G (1 - beta) with 1 - beta = P_rad / P the same
        // everywhere (Eddington 1926; Chandrasekhar 1939 ch. VI; from memory):
        // then nabla_rad = 1 / (n + 1) = 1/4 for n = 3 at every point, whatever T. Since nabla_ad of gas plus radiation
        // exceeds 1/4 for every beta > 0 (Chandrasekhar 1939, ch. II), the model is radiative throughout.
        double mu = 0.61;
        for (double mass : new double[] {1.0, 10.0, 100.0}) {
            double beta = standardModelBeta(mass, mu);
            assertTrue(beta > 0.0 && beta < 1.0, "beta = " + beta);
            for (double t : new double[] {1e6, 1e7, 3e7}) {
                double p = A * Math.pow(t, 4) / (3.0 * (1.0 - beta));
                double rho = beta * p * mu * M_U / (K * t);
                double kappa = 0.34;
                double m = 0.3 * mass * Iau2015.SOLAR_MASS;
                double l = 4.0 * Math.PI * C * G * m * (1.0 - beta) / kappa;
                assertEquals(0.25, RadiativeGradient.value(kappa, l, p, m, t), 1e-12, "M = " + mass + ", T = " + t);
                double nablaAd = 2.0 * (4.0 - 3.0 * beta) / (32.0 - 24.0 * beta - 3.0 * beta * beta);
                ZoneState z = zone(1e10, m, t, rho, p, kappa, l, nablaAd, (4.0 - 3.0 * beta) / beta);
                StabilityResult out = evaluate(Criterion.SCHWARZSCHILD, z);
                assertEquals(Regime.RADIATIVE, out.regime, "M = " + mass + ", beta = " + beta);
                assertEquals(nablaAd - 0.25, -out.marginSchwarzschild, 1e-12);
            }
        }
        // the familiar figures: beta(1 M_sun) within 1e-3 of 1, beta(100 M_sun) near one half (Chandrasekhar 1939;
        // Eddington's "1 - beta = 0.003 M^2 mu^4 beta^4"; from memory)
        assertEquals(1.0, standardModelBeta(1.0, 0.61), 1e-3);
        assertEquals(0.5, standardModelBeta(100.0, 0.61), 0.1);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void massiveStarCoreNablaRadIsTheEddingtonRatioOverFourTimesTheRadiationShare() {
        // nabla_rad = Gamma_Edd / (4 (1 - beta)) with Gamma_Edd = kappa L / (4 pi c G m), the local Eddington factor,
        // and 1 - beta = a T^4 / (3 P) (Maeder 2009, Physics, Formation and Evolution of Rotating Stars, §5.1; from
        // memory): eq. 5.28 rewritten. A massive star's core (m = 5 M_sun, L = 1e5 L_sun, T = 4e7 K, rho = 3,
        // Thomson opacity 0.2 (1 + X) = 0.34 for X = 0.7; orders of magnitude from memory) has a large Eddington
        // factor and a low nabla_ad: it convects (massive main-sequence stars have convective cores, Kippenhahn,
        // Weigert & Weiss 2012 §22.1, from memory).
        double t = 4e7;
        double rho = 3.0;
        double mu = 1.0 / 1.62;
        double pg = rho * K * t / (mu * M_U);
        double pr = A * Math.pow(t, 4) / 3.0;
        double p = pg + pr;
        double beta = pg / p;
        double m = 5.0 * Iau2015.SOLAR_MASS;
        double l = 1e5 * Iau2015.SOLAR_LUMINOSITY;
        double kappa = 0.2 * (1.0 + 0.7);
        double eddington = kappa * l / (4.0 * Math.PI * C * G * m);
        double expected = eddington / (4.0 * (1.0 - beta));
        assertEquals(expected, RadiativeGradient.value(kappa, l, p, m, t), 1e-13 * expected);
        double nablaAd = 2.0 * (4.0 - 3.0 * beta) / (32.0 - 24.0 * beta - 3.0 * beta * beta);
        ZoneState z = zone(3e10, m, t, rho, p, kappa, l, nablaAd, (4.0 - 3.0 * beta) / beta);
        assertEquals(Regime.CONVECTIVE, evaluate(Criterion.SCHWARZSCHILD, z).regime);
        assertEquals(Regime.CONVECTIVE, evaluate(Criterion.LEDOUX, z).regime);
    }
}
