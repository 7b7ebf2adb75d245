package io.github.startransport.core.thermo;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.ThermoResult;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The partial-ionisation equation of state where the gas is fully ionised, against the textbook closed forms
 * of an ideal gas plus black-body radiation written out here from the inputs (Chandrasekhar 1939, ch. II;
 * Kippenhahn, Weigert &amp; Weiss 2012, §13.2; Cox &amp; Giuli 1968, ch. 9; equation numbers not quoted, the
 * forms from memory and re-derived in the comments), and hydrogen in the solar photosphere against a worked
 * textbook example.
 *
 * <p>Four states where every nucleus is bare (each test first checks the electron count to 1e-12):
 * T = 3e8 K, rho = 500 g cm^-3 with X = 0.7, Z = 0 (beta near 1/2) and with pure helium (mu = 4/3, beta near
 * 0.31); T = 1e8 K, rho = 18 g cm^-3, pure hydrogen (beta near 0.54); and a radiation-dominated one, T = 1e9 K,
 * rho = 1e-8 g cm^-3, X = 0.7 (beta = 5e-13: Gamma_1 = 4/3, nabla_ad = 1/4 to that order). Constants are typed
 * here from CODATA 2018.
 */
class IonisedGasPlusRadiationTest {
    private static final double K = 1.380649e-16;          // erg/K, CODATA 2018 (exact)
    private static final double M_U = 1.66053906660e-24;   // g, CODATA 2018
    private static final double A_RAD = 4 * 5.670374419e-5 / 2.99792458e10; // erg cm^-3 K^-4, 4 sigma / c

    private static final double[][] STATES = {{3e8, 500.0, 0.7}, {1e8, 18.0, 1.0}, {3e8, 500.0, 0.0}, {1e9, 1e-8, 0.7}};

    private static ThermoResult evaluate(double[] s) {
        ThermoResult r = new ThermoResult();
        IonisingGas.INSTANCE.evaluate(s[0], s[1], s[2], 0.0, -1, r);
        // fully ionised H and He: X + Y/2 electrons per atomic mass unit
        assertEquals(s[2] + (1 - s[2]) / 2, r.freeElectrons, 1e-12, "not fully ionised at " + at(s));
        return r;
    }

    /** 1/mu = 2X + 3Y/4 for fully ionised hydrogen and helium (Kippenhahn, Weigert &amp; Weiss 2012, §4.2). */
    private static double mu(double x) {
        return 1.0 / (2 * x + 0.75 * (1 - x));
    }

    private static double gasPressure(double[] s) {
        return s[1] * K * s[0] / (mu(s[2]) * M_U);
    }

    private static double beta(double[] s) {
        double pg = gasPressure(s);
        return pg / (pg + A_RAD * Math.pow(s[0], 4) / 3);
    }

    private static String at(double[] s) {
        return "T = " + s[0] + " K, rho = " + s[1] + ", X = " + s[2];
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void pressureIsTheIdealGasOfBareNucleiPlusRadiation() {
        // P = rho k T / (mu m_u) + a T^4 / 3, mu = 1 / (2X + 3Y/4): 1/1.625 for X = 0.7 and 1/2 for hydrogen
        for (double[] s : STATES) {
            ThermoResult r = evaluate(s);
            double p = gasPressure(s) + A_RAD * Math.pow(s[0], 4) / 3;
            // the hottest state keeps 6e-14 of its electrons bound (Saha at 1e9 K and 1e-8 g/cm^3): 1e-12
            assertEquals(mu(s[2]), r.mu, 1e-12, at(s));
            assertEquals(p, r.pressure, 1e-11 * p, at(s));
            assertEquals(beta(s), r.beta, 1e-11, at(s));
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void pressureExponentsAreBetaAndFourMinusThreeBeta() {
        // chi_rho = (d ln P / d ln rho)_T = beta (only the gas pressure depends on rho), chi_T = (d ln P / d ln T)_rho
        // = beta + 4 (1 - beta) = 4 - 3 beta, delta = chi_T / chi_rho = (4 - 3 beta) / beta
        // (Kippenhahn, Weigert & Weiss 2012, §13.2, from memory)
        for (double[] s : STATES) {
            ThermoResult r = evaluate(s);
            double b = beta(s);
            assertEquals(b, r.chiRho, 1e-11, at(s));
            assertEquals(4 - 3 * b, r.chiT, 1e-11, at(s));
            assertEquals((4 - 3 * b) / b, r.delta, 1e-10 * r.delta, at(s));
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void gammaOneIsChandrasekharsFormula() {
        // Gamma_1 = beta + (4 - 3 beta)^2 (gamma - 1) / (beta + 12 (gamma - 1)(1 - beta)), gamma = 5/3
        // (Chandrasekhar 1939, ch. II; Cox & Giuli 1968, ch. 9, from memory)
        for (double[] s : STATES) {
            ThermoResult r = evaluate(s);
            double b = beta(s);
            double g = 5.0 / 3.0 - 1.0;
            double gamma1 = b + (4 - 3 * b) * (4 - 3 * b) * g / (b + 12 * g * (1 - b));
            assertEquals(gamma1, r.gamma1, 1e-11, at(s));
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void adiabaticGradientIsTheTextbookFunctionOfBeta() {
        // nabla_ad = (1 + (1 - beta)(4 + beta) / beta^2) / (5/2 + 4 (1 - beta)(4 + beta) / beta^2)
        // (Kippenhahn, Weigert & Weiss 2012, §13.2, from memory; 2/5 at beta = 1, 1/4 as beta -> 0)
        for (double[] s : STATES) {
            ThermoResult r = evaluate(s);
            double b = beta(s);
            double q = (1 - b) * (4 + b) / (b * b);
            assertEquals((1 + q) / (2.5 + 4 * q), r.nablaAd, 1e-11, at(s));
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void specificHeatsFromTheEnergyAndTheGeneralIdentity() {
        // u = 3/2 k T / (mu m_u) + a T^4 / rho, so c_V = (du/dT)_rho = (k / mu m_u)(3/2 + 12 (1 - beta) / beta)
        // (a T^4 / rho = 3 (1 - beta) / beta times k T / mu m_u); and c_P - c_V = P chi_T^2 / (rho T chi_rho)
        // = (k / mu m_u)(4 - 3 beta)^2 / beta^2 (Cox & Giuli 1968, ch. 9, from memory)
        for (double[] s : STATES) {
            ThermoResult r = evaluate(s);
            double b = beta(s);
            double kOverMu = K / (mu(s[2]) * M_U);
            double cv = kOverMu * (1.5 + 12 * (1 - b) / b);
            double cp = cv + kOverMu * (4 - 3 * b) * (4 - 3 * b) / (b * b);
            assertEquals(cv, r.cv, 1e-10 * cv, at(s));
            assertEquals(cp, r.cp, 1e-10 * cp, at(s));
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void hydrogenInTheSolarPhotosphereIsOneAtomInThirteenThousandIonised() {
        // Carroll & Ostlie, An Introduction to Modern Astrophysics (2nd ed. 2007), Example 8.1.4 (from memory):
        // pure hydrogen at T = 5777 K with an electron pressure of 1.5 N m^-2 = 15 dyn cm^-2 has
        // N_II / N_I = 7.7e-5, about one ionised atom in 13 000. Quoted to two figures: 2 %.
        double t = 5777.0;
        double pe = 15.0;
        // electrons per atomic mass unit x: n_e = x rho / m_u and P_e = n_e k T
        double rho = new BrentSolver(1e-22, 1e-14).solve(200, d -> {
            ThermoResult r = new ThermoResult();
            IonisingGas.INSTANCE.evaluate(t, d, 1.0, 0.0, -1, r);
            return r.freeElectrons * d / M_U * K * t / pe - 1.0;
        }, 1e-9, 1e-4);
        ThermoResult r = new ThermoResult();
        IonisingGas.INSTANCE.evaluate(t, rho, 1.0, 0.0, -1, r);
        double x = r.freeElectrons;
        assertEquals(7.7e-5, x / (1 - x), 0.02 * 7.7e-5, "rho = " + rho);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void degeneracyIndicatorIsHalfTheElectronsPerThermalWavelengthCubed() {
        // n_e lambda_e^3 / 2 with lambda_e = h / sqrt(2 pi m_e k T) (Landau & Lifshitz, Statistical Physics, §56,
        // from memory), n_e = rho (X + Y/2) / m_u for the bare nuclei of these states
        double h = 6.62607015e-27;      // erg s, CODATA 2018 (exact)
        double me = 9.1093837015e-28;   // g, CODATA 2018
        for (double[] s : STATES) {
            ThermoResult r = evaluate(s);
            double ne = s[1] * (s[2] + (1 - s[2]) / 2) / M_U;
            double lambda = h / Math.sqrt(2 * Math.PI * me * K * s[0]);
            double expected = ne * lambda * lambda * lambda / 2;
            assertEquals(expected, r.degeneracy, 1e-10 * expected, at(s));
        }
    }
}
