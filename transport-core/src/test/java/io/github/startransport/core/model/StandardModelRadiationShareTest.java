package io.github.startransport.core.model;

import io.github.startransport.core.checks.CheckKind;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Temperature through Eddington's standard model of a ten-solar-mass star. The model's assumption is a constant
 * ratio beta = P_gas / P, so at every radius a T^4 / 3 = (1 - beta) P and T = beta mu m_u P / (k rho) (Eddington
 * 1926; Chandrasekhar 1939, ch. VI; from memory). beta is solved here from Eddington's quartic in its exact form,
 * M = 4 pi omega_3 (K / (pi G))^(3/2) with K^3 = (3 / a)(k / (mu m_u))^4 (1 - beta) / beta^4, i.e.
 * (1 - beta) / beta^4 = (a / 3)(mu m_u / k)^4 (pi G)^3 (M / (4 pi omega_3))^2, omega_3 = 2.01824 (Chandrasekhar's
 * table, six figures), with Commons Math's Brent solver; 1 / mu = 2X + 3Y/4 + Z/2 (fully ionised).
 */
class StandardModelRadiationShareTest {
    private static final double A_RAD = 4 * 5.670374419e-5 / 2.99792458e10;   // 4 sigma / c, CODATA 2018
    private static final double K = 1.380649e-16;                              // CODATA 2018
    private static final double M_U = 1.66053906660e-24;                       // CODATA 2018
    private static final double G = 6.67430e-8;                                // CODATA 2018
    private static final double M_SUN = 1.98840987e33;   // IAU 2015 B3 nominal GM_sun / G (CODATA 2018 G)

    @Test
    @Tag(CheckKind.EXTERNAL)
    void radiationCarriesTheSameShareOfThePressureEverywhere() {
        double m = 10 * M_SUN;
        double x = 0.7;
        double z = 0.02;
        double mu = 1 / (2 * x + 0.75 * (1 - x - z) + 0.5 * z);
        double rhs = A_RAD / 3 * Math.pow(mu * M_U / K, 4) * Math.pow(Math.PI * G, 3)
                * Math.pow(m / (4 * Math.PI * 2.01824), 2);
        double beta = new BrentSolver(1e-15, 1e-15).solve(200, b -> Math.log((1 - b) / Math.pow(b, 4) / rhs),
                0.01, 1 - 1e-12);
        // omega_3 to six figures gives beta to ~1e-5 relative; 1 - beta (~0.2 here) to ~3e-5
        EddingtonStandardModel star = new EddingtonStandardModel(m, 4 * 6.957e10, 5e37, x, z, 16);
        double[] s = new double[5];
        for (double f : new double[] {0.05, 0.2, 0.4, 0.6, 0.8, 0.95}) {
            star.state(f * star.radius(), s);
            double t = s[0];
            double rho = s[1];
            double p = s[2];
            String at = "r = " + f + " R, beta = " + beta;
            assertEquals(1 - beta, A_RAD * Math.pow(t, 4) / (3 * p), 1e-4 * (1 - beta), at);
            assertEquals(beta * mu * M_U * p / (K * rho), t, 3e-5 * t, at);
        }
    }
}
