package io.github.startransport.core.gradient;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Ideal gas plus radiation: the closed forms of {@link GasRadiation} against textbook limits,
 * Chandrasekhar's original expression, and an independent first-principles evaluation (entropy
 * and enthalpy of the mixture, adiabats solved with Commons Math's {@link BrentSolver}).
 */
class GasRadiationTest {
    private static final double K = Codata2018.BOLTZMANN;
    private static final double MU_G = Codata2018.ATOMIC_MASS_UNIT;
    private static final double A = Codata2018.RADIATION_CONSTANT;

    @Tag(CheckKind.EXTERNAL)
    @Test
    void nablaAdOfAMonatomicIdealGasIsTwoFifths() {
        // beta = 1: (Gamma - 1)/Gamma with Gamma = 5/3 (Kippenhahn, Weigert & Weiss 2012 §13.2)
        assertEquals(0.4, GasRadiation.nablaAd(1.0), 1e-15);
    }

    @Tag(CheckKind.LAW)
    @Test
    void nablaAdOfARadiationDominatedGasTendsToOneQuarter() {
        // beta -> 0: photon gas, nabla_ad -> 1/4 (Kippenhahn, Weigert & Weiss 2012 §13.2)
        assertEquals(0.25, GasRadiation.nablaAd(1e-9), 1e-9);
        assertEquals(0.25, GasRadiation.nablaAd(1e-6), 1e-6);
    }

    @Tag(CheckKind.EXTERNAL)
    @ParameterizedTest
    @ValueSource(doubles = {0.999, 0.9, 0.7, 0.5, 0.3, 0.1, 0.01})
    void nablaAdEqualsChandrasekharsExpression(double beta) {
        // Chandrasekhar (1939), ch. II, as quoted by Kippenhahn, Weigert & Weiss 2012 ch. 13 (from memory):
        // nabla_ad = [1 + (1-b)(4+b)/b^2] / [5/2 + 4(1-b)(4+b)/b^2]
        double q = (1 - beta) * (4 + beta) / (beta * beta);
        double chandrasekhar = (1 + q) / (2.5 + 4 * q);
        assertEquals(chandrasekhar, GasRadiation.nablaAd(beta), 1e-14);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void meanMolecularWeightOfIonisedHydrogenIsOneHalf() {
        // fully ionised H: one proton and one electron per m_u (any stellar-structure text)
        assertEquals(0.5, GasRadiation.meanMolecularWeight(1.0, 0.0), 1e-15);
        // fully ionised He-4: 3 particles per 4 m_u
        assertEquals(4.0 / 3.0, GasRadiation.meanMolecularWeight(0.0, 0.0), 1e-15);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void meanMolecularWeightOfTheSolarMixtureIsNearSixTenths() {
        // X = 0.70, Z = 0.02: mu ~ 0.6 (Hansen, Kawaler & Trimble 2004 §1.4, from memory: "about 0.6"); exactly,
        // 1/mu = 2X + 3Y/4 + Z/2 = 1.62 for full ionisation with metals counted as A/2 particles per nucleon mass
        // (Kippenhahn, Weigert & Weiss 2012 §4.2, from memory)
        double mu = GasRadiation.meanMolecularWeight(0.70, 0.02);
        assertEquals(1.0 / 1.62, mu, 1e-15);
        assertTrue(mu > 0.59 && mu < 0.63, "mu = " + mu);
    }

    /** Specific entropy up to a constant: s = (k/mu m_u)(3/2 ln T - ln rho) + 4 a T^3 / (3 rho). */
    private static double entropy(double t, double rho, double mu) {
        return K / (mu * MU_G) * (1.5 * Math.log(t) - Math.log(rho)) + 4.0 * A * t * t * t / (3.0 * rho);
    }

    private static double pressure(double t, double rho, double mu) {
        return rho * K * t / (mu * MU_G) + A * t * t * t * t / 3.0;
    }

    /** Temperature on the adiabat through (t0, rho0) at density rho, by Brent's method. */
    private static double adiabatTemperature(double t0, double rho0, double rho, double mu) {
        double s0 = entropy(t0, rho0, mu);
        BrentSolver brent = new BrentSolver(1e-15, 1e-15 * t0);
        return brent.solve(200, t -> entropy(t, rho, mu) - s0, 0.5 * t0, 2.0 * t0);
    }

    /** T and rho at which an ideal gas of weight mu has the given beta (T fixed at 1e7 K). */
    private static double densityForBeta(double beta, double t, double mu) {
        // beta = Pg / (Pg + Pr) => Pg = beta/(1-beta) Pr
        double pr = A * t * t * t * t / 3.0;
        double pg = beta / (1.0 - beta) * pr;
        return pg * mu * MU_G / (K * t);
    }

    @Tag(CheckKind.EXTERNAL)
    @ParameterizedTest
    @ValueSource(doubles = {0.95, 0.7, 0.5, 0.2})
    void nablaAdAgreesWithAnAdiabatSolvedFromTheEntropy(double beta) {
        double mu = 0.62;
        double t0 = 1e7;
        double rho0 = densityForBeta(beta, t0, mu);
        double h = 1e-4;
        double rhoPlus = rho0 * Math.exp(h);
        double rhoMinus = rho0 * Math.exp(-h);
        double tPlus = adiabatTemperature(t0, rho0, rhoPlus, mu);
        double tMinus = adiabatTemperature(t0, rho0, rhoMinus, mu);
        double dlnT = Math.log(tPlus / tMinus);
        double dlnP = Math.log(pressure(tPlus, rhoPlus, mu) / pressure(tMinus, rhoMinus, mu));
        double dlnRho = 2 * h;
        assertEquals(dlnT / dlnP, GasRadiation.nablaAd(beta), 1e-6 * GasRadiation.nablaAd(beta));
        // Gamma_1 = (d ln P / d ln rho)_s
        assertEquals(dlnP / dlnRho, GasRadiation.gamma1(beta), 1e-6 * GasRadiation.gamma1(beta));
    }

    @Tag(CheckKind.EXTERNAL)
    @ParameterizedTest
    @ValueSource(doubles = {0.99, 0.7, 0.5, 0.2})
    void cpAndDeltaAgreeWithTheEnthalpyAtConstantPressure(double beta) {
        // h = (5/2) k T / (mu m_u) + 4 a T^4 / (3 rho); c_P = (dh/dT)_P; delta = -(d ln rho/d ln T)_P
        double mu = 0.62;
        double t0 = 1e7;
        double rho0 = densityForBeta(beta, t0, mu);
        double p = pressure(t0, rho0, mu);
        double dt = 1e-5 * t0;
        double[] rho = new double[2];
        double[] enth = new double[2];
        for (int s = 0; s < 2; s++) {
            double t = t0 + (s == 0 ? -dt : dt);
            rho[s] = (p - A * t * t * t * t / 3.0) * mu * MU_G / (K * t);
            enth[s] = 2.5 * K * t / (mu * MU_G) + 4.0 * A * t * t * t * t / (3.0 * rho[s]);
        }
        double cp = (enth[1] - enth[0]) / (2 * dt);
        double delta = -Math.log(rho[1] / rho[0]) / Math.log((t0 + dt) / (t0 - dt));
        assertEquals(cp, GasRadiation.cp(beta, mu), 1e-7 * cp);
        assertEquals(delta, GasRadiation.delta(beta), 1e-7 * delta);
    }

    @Tag(CheckKind.LAW)
    @Test
    void thermodynamicIdentityNablaAdEqualsPDeltaOverRhoTCp() {
        // nabla_ad = P delta / (rho T c_P) (Kippenhahn, Weigert & Weiss 2012 eq. 4.21, from memory)
        double mu = 0.6;
        for (double beta : new double[] {0.99, 0.8, 0.5, 0.25, 0.05}) {
            double t = 3e7;
            double rho = densityForBeta(beta, t, mu);
            double p = pressure(t, rho, mu);
            double identity = p * GasRadiation.delta(beta) / (rho * t * GasRadiation.cp(beta, mu));
            assertEquals(identity, GasRadiation.nablaAd(beta), 1e-12);
        }
    }

    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 2000, seed = "20261202")
    void nablaAdStaysBetweenOneQuarterAndTwoFifths(@ForAll @Scale(9) @DoubleRange(min = 1e-6, max = 1.0) double beta) {
        double n = GasRadiation.nablaAd(beta);
        assertTrue(n >= 0.25 && n <= 0.4 + 1e-15, "nabla_ad(" + beta + ") = " + n);
    }

    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 2000, seed = "20261203")
    void nablaAdGrowsWithBeta(@ForAll @Scale(9) @DoubleRange(min = 1e-6, max = 1.0) double b1,
                              @ForAll @Scale(9) @DoubleRange(min = 1e-6, max = 1.0) double b2) {
        double lo = Math.min(b1, b2);
        double hi = Math.max(b1, b2);
        assertTrue(GasRadiation.nablaAd(lo) <= GasRadiation.nablaAd(hi) + 1e-15);
    }
}
