package io.github.startransport.core.gradient;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.ThermoResult;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The adiabatic exponents of a mixture of ideal gas and black-body radiation in Chandrasekhar's own form, for a
 * gas of any ratio of specific heats gamma (Chandrasekhar 1939, <i>An Introduction to the Study of Stellar
 * Structure</i>, ch. II, eqs. for Gamma_1, Gamma_2, Gamma_3; reproduced by Cox &amp; Giuli 1968 §9.15; written here
 * from memory), evaluated at gamma = 5/3:
 * <pre>
 *   Gamma_3 - 1 = (4 - 3 beta)(gamma - 1) / (beta + 12 (gamma - 1)(1 - beta))
 *   Gamma_1     = beta + (4 - 3 beta) (Gamma_3 - 1)
 *   Gamma_2 - 1 = (4 - 3 beta)(gamma - 1) / (beta^2 + 3 (gamma - 1)(1 - beta)(4 + beta))
 * </pre>
 * These are not the simplified polynomials in beta the code uses (it has gamma = 5/3 folded in), so a slip in
 * the simplification shows up here. nabla_ad = (Gamma_2 - 1) / Gamma_2 = (Gamma_3 - 1) / Gamma_1.
 */
class ChandrasekharExponentsTest {
    private static final double GAMMA = 5.0 / 3.0;
    private static final double[] BETAS = {0.9999, 0.95, 0.8, 0.6, 0.4, 0.2, 0.05};

    private static double gamma3(double beta) {
        return 1.0 + (4.0 - 3.0 * beta) * (GAMMA - 1.0) / (beta + 12.0 * (GAMMA - 1.0) * (1.0 - beta));
    }

    private static double gamma1(double beta) {
        return beta + (4.0 - 3.0 * beta) * (gamma3(beta) - 1.0);
    }

    /** Gamma_2 = 1 + (4 - 3 beta)(gamma - 1) / (beta^2 + 3 (gamma - 1)(1 - beta)(4 + beta)) (Chandrasekhar 1939, ch. II). */
    private static double gamma2(double beta) {
        return 1.0 + (4.0 - 3.0 * beta) * (GAMMA - 1.0)
                / (beta * beta + 3.0 * (GAMMA - 1.0) * (1.0 - beta) * (4.0 + beta));
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void gamma1IsChandrasekharsExpressionWithGammaFiveThirds() {
        for (double b : BETAS) {
            assertEquals(gamma1(b), GasRadiation.gamma1(b), 1e-13 * gamma1(b), "beta = " + b);
        }
        // the two ends: 5/3 for a pure gas, 4/3 for pure radiation (Chandrasekhar 1939, ch. II)
        assertEquals(5.0 / 3.0, GasRadiation.gamma1(1.0), 1e-15);
        assertEquals(4.0 / 3.0, gamma1(0.0), 1e-15);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void nablaAdIsGammaTwoMinusOneOverGammaTwo() {
        for (double b : BETAS) {
            double g2 = gamma2(b);
            assertEquals((g2 - 1.0) / g2, GasRadiation.nablaAd(b), 1e-13, "beta = " + b);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void nablaAdIsGammaThreeMinusOneOverGammaOne() {
        // Gamma_1 / (Gamma_3 - 1) = Gamma_2 / (Gamma_2 - 1) (Chandrasekhar 1939, ch. II; Cox & Giuli 1968 eq. 9.88,
        // from memory): the gradient from the two other exponents
        for (double b : BETAS) {
            assertEquals((gamma3(b) - 1.0) / gamma1(b), GasRadiation.nablaAd(b), 1e-13, "beta = " + b);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void gamma1IsTheSlopeOfAnAdiabatSolvedFromTheEntropy() {
        // s = (k / mu m_u) ln(T^(3/2) / rho) + 4 a T^3 / (3 rho) + const per gram for ideal gas plus radiation (Clayton
        // 1968 §2.3; Kippenhahn, Weigert & Weiss 2012 §13.2; from memory). Compress by 1e-5 in ln rho at constant s,
        // T from Commons Math's Brent solver, and Gamma_1 = (d ln P / d ln rho)_s by the central difference.
        double k = Codata2018.BOLTZMANN;
        double mu = 0.62;
        double gas = k / (mu * Codata2018.ATOMIC_MASS_UNIT);
        double a = Codata2018.RADIATION_CONSTANT;
        double t = 3e7;
        for (double b : new double[] {0.95, 0.7, 0.4}) {
            double rho = b / (1.0 - b) * a * t * t * t / (3.0 * gas);
            java.util.function.DoubleBinaryOperator entropy =
                    (r, temp) -> gas * Math.log(Math.pow(temp, 1.5) / r) + 4.0 * a * temp * temp * temp / (3.0 * r);
            double s0 = entropy.applyAsDouble(rho, t);
            double h = 1e-5;
            double[] lnP = new double[2];
            for (int i = 0; i < 2; i++) {
                double r = rho * Math.exp(i == 0 ? h : -h);
                double temp = new BrentSolver(1e-14 * t).solve(200, x -> entropy.applyAsDouble(r, x) - s0, 0.9 * t, 1.1 * t);
                lnP[i] = Math.log(r * gas * temp + a * Math.pow(temp, 4) / 3.0);
            }
            double slope = (lnP[0] - lnP[1]) / (2.0 * h);
            assertEquals(slope, GasRadiation.gamma1(b), 1e-7, "beta = " + b);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void responseFunctionsOfAMassiveStarsCentreThroughTheThermodynamicsModel() {
        // T = 3.5e7 K, rho = 3 g cm^-3, X = 0.7, Z = 0.02 (a massive star's centre, order of magnitude from memory;
        // beta about 0.79):
        // beta from the written-out pressures, then Chandrasekhar's exponents above, c_P = P delta / (rho T nabla_ad)
        // (Kippenhahn, Weigert & Weiss 2012 eq. 4.21, from memory) and delta = (4 - 3 beta) / beta
        double t = 3.5e7;
        double rho = 3.0;
        double mu = 1.0 / 1.62;
        double pg = rho * Codata2018.BOLTZMANN * t / (mu * Codata2018.ATOMIC_MASS_UNIT);
        double pr = Codata2018.RADIATION_CONSTANT * Math.pow(t, 4) / 3.0;
        double b = pg / (pg + pr);
        ThermoResult out = new ThermoResult();
        IdealGasRadiation.INSTANCE.evaluate(t, rho, 0.7, 0.02, 0, out);
        assertEquals(b, out.beta, 1e-13);
        assertEquals(pg + pr, out.pressure, 1e-13 * (pg + pr));
        assertEquals(gamma1(b), out.gamma1, 1e-13);
        double nablaAd = (gamma3(b) - 1.0) / gamma1(b);
        assertEquals(nablaAd, out.nablaAd, 1e-13);
        double delta = (4.0 - 3.0 * b) / b;
        assertEquals(delta, out.delta, 1e-13 * delta);
        double cp = (pg + pr) * delta / (rho * t * nablaAd);
        assertEquals(cp, out.cp, 1e-12 * cp);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void pressureSlopesOfTheThermodynamicsModelAreThoseOfTheWrittenOutLaw() {
        // P = rho k T / (mu m_u) + a T^4 / 3 differentiated numerically here: chi_rho = (d ln P / d ln rho)_T = beta and
        // chi_T = 4 - 3 beta (Kippenhahn, Weigert & Weiss 2012 §13.1, from memory), and the model's dP/dT, dP/drho
        double mu = 1.0 / 1.62;
        double gas = Codata2018.BOLTZMANN / (mu * Codata2018.ATOMIC_MASS_UNIT);
        double a = Codata2018.RADIATION_CONSTANT;
        java.util.function.DoubleBinaryOperator pressure = (rho, t) -> rho * gas * t + a * Math.pow(t, 4) / 3.0;
        ThermoResult out = new ThermoResult();
        for (double[] state : new double[][] {{1e4, 1e-7}, {1e7, 100.0}, {4e7, 3.0}, {1e8, 1.0}}) {
            double t = state[0];
            double rho = state[1];
            IdealGasRadiation.INSTANCE.evaluate(t, rho, 0.7, 0.02, 0, out);
            // P is linear in rho, so a wide step is exact there and keeps the gas term above the rounding of P
            double hRho = 1e-3;
            double dRho = (pressure.applyAsDouble(rho * (1 + hRho), t) - pressure.applyAsDouble(rho * (1 - hRho), t))
                    / (2 * hRho * rho);
            double h = 1e-6;
            double dT = (pressure.applyAsDouble(rho, t * (1 + h)) - pressure.applyAsDouble(rho, t * (1 - h))) / (2 * h * t);
            String at = "T = " + t + ", rho = " + rho;
            assertEquals(dRho, out.dPressure[io.github.startransport.spi.ZoneInput.RHO], 1e-8 * dRho, at);
            assertEquals(dT, out.dPressure[io.github.startransport.spi.ZoneInput.T], 1e-8 * dT, at);
            double p = pressure.applyAsDouble(rho, t);
            assertEquals(dRho * rho / p, out.chiRho, 1e-8, at);
            assertEquals(dT * t / p, out.chiT, 1e-8, at);
        }
    }
}
