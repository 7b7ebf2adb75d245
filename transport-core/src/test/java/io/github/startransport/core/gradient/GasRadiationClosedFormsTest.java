package io.github.startransport.core.gradient;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.Regime;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The response functions of ideal gas plus radiation against their closed forms in beta = P_gas / P
 * (Chandrasekhar 1939, ch. II; Kippenhahn, Weigert &amp; Weiss 2012 ch. 13; from memory), written out here, and
 * against derivatives of P(rho, T) and u(rho, T) taken numerically in the test:
 * P = rho k T / (mu m_u) + a T^4 / 3, u = 3 k T / (2 mu m_u) + a T^4 / rho.
 */
class GasRadiationClosedFormsTest {
    private static final double K = Codata2018.BOLTZMANN;
    private static final double M_U = Codata2018.ATOMIC_MASS_UNIT;
    private static final double A = Codata2018.RADIATION_CONSTANT;
    private static final double MU = 1.0 / 1.62;
    private static final double[] BETAS = {0.999, 0.9, 0.7, 0.5, 0.3, 0.1, 0.02};

    private static double pressure(double rho, double t) {
        return rho * K * t / (MU * M_U) + A * t * t * t * t / 3.0;
    }

    private static double energy(double rho, double t) {
        return 1.5 * K * t / (MU * M_U) + A * t * t * t * t / rho;
    }

    /** rho at which the gas has the given beta at T (P_gas = beta / (1 - beta) P_rad). */
    private static double density(double beta, double t) {
        return beta / (1.0 - beta) * A * Math.pow(t, 4) / 3.0 * MU * M_U / (K * t);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void nablaAdAtHalfGasPressure() {
        // 2 (4 - 3 beta) / (32 - 24 beta - 3 beta^2) = 5 / 19.25 at beta = 1/2
        assertEquals(5.0 / 19.25, GasRadiation.nablaAd(0.5), 1e-15);
        assertEquals(0.259740, GasRadiation.nablaAd(0.5), 1e-6);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void nablaAdAtNinetyPercentGasPressure() {
        assertEquals(2.6 / 7.97, GasRadiation.nablaAd(0.9), 1e-15);
        assertEquals(0.326223, GasRadiation.nablaAd(0.9), 1e-6);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void gamma1IsItsClosedForm() {
        // Gamma_1 = (32 - 24 beta - 3 beta^2) / (24 - 21 beta)
        for (double b : BETAS) {
            assertEquals((32 - 24 * b - 3 * b * b) / (24 - 21 * b), GasRadiation.gamma1(b), 1e-14, "beta = " + b);
        }
        assertEquals(19.25 / 13.5, GasRadiation.gamma1(0.5), 1e-15);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void deltaIsFourMinusThreeBetaOverBeta() {
        for (double b : BETAS) {
            assertEquals((4 - 3 * b) / b, GasRadiation.delta(b), 1e-13 * (4 - 3 * b) / b, "beta = " + b);
        }
        assertEquals(5.0, GasRadiation.delta(0.5), 1e-15);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void chiTIsTheLogarithmicTemperatureDerivativeOfThePressure() {
        // chi_T = (d ln P / d ln T)_rho from P(rho, T) by a central difference: 4 - 3 beta
        double t = 2e7;
        for (double b : BETAS) {
            double rho = density(b, t);
            double h = 1e-5;
            double chi = (Math.log(pressure(rho, t * Math.exp(h))) - Math.log(pressure(rho, t * Math.exp(-h)))) / (2 * h);
            assertEquals(chi, GasRadiation.chiT(b), 1e-8, "beta = " + b);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void cvIsTheTemperatureDerivativeOfTheInternalEnergy() {
        // c_V = (du / dT)_rho by a central difference of u(rho, T)
        double t = 3e7;
        for (double b : BETAS) {
            double rho = density(b, t);
            double dt = 1e-5 * t;
            double cv = (energy(rho, t + dt) - energy(rho, t - dt)) / (2 * dt);
            assertEquals(cv, GasRadiation.cv(b, MU), 1e-8 * cv, "beta = " + b);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void cpIsItsClosedForm() {
        // c_P = (k / mu m_u)(32 - 24 beta - 3 beta^2) / (2 beta^2)
        for (double b : BETAS) {
            double expected = K / (MU * M_U) * (32 - 24 * b - 3 * b * b) / (2 * b * b);
            assertEquals(expected, GasRadiation.cp(b, MU), 1e-13 * expected, "beta = " + b);
        }
    }

    @Test
    @Tag(CheckKind.LAW)
    void cpMinusCvIsTheThermodynamicIdentity() {
        // c_P - c_V = (P / (rho T)) chi_T^2 / chi_rho with chi_rho = beta (Kippenhahn, Weigert & Weiss 2012 §4.1,
        // from memory)
        double t = 1e7;
        for (double b : BETAS) {
            double rho = density(b, t);
            double p = pressure(rho, t);
            double chiT = 4 - 3 * b;
            double expected = p / (rho * t) * chiT * chiT / b;
            assertEquals(expected, GasRadiation.cp(b, MU) - GasRadiation.cv(b, MU), 1e-9 * expected, "beta = " + b);
        }
    }

    @Test
    @Tag(CheckKind.LAW)
    void gamma1IsChiRhoOverOneMinusChiTNablaAd() {
        // Gamma_1 = chi_rho / (1 - chi_T nabla_ad) (Kippenhahn, Weigert & Weiss 2012 §4.1, from memory)
        for (double b : BETAS) {
            double expected = b / (1 - (4 - 3 * b) * GasRadiation.nablaAd(b));
            assertEquals(expected, GasRadiation.gamma1(b), 1e-12 * expected, "beta = " + b);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void betaIsTheGasShareOfThePressure() {
        for (double b : BETAS) {
            double t = 5e6;
            assertEquals(b, GasRadiation.beta(t, density(b, t), MU), 1e-12, "beta = " + b);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void electronsPerNucleonOfFullyIonisedMatter() {
        // 1 / mu_e = (1 + X) / 2 for full ionisation (Kippenhahn, Weigert & Weiss 2012 §4.2, from memory)
        assertEquals(0.85, GasRadiation.electronsPerMassUnit(0.7), 1e-15);
        assertEquals(1.0, GasRadiation.electronsPerMassUnit(1.0), 1e-15);
        assertEquals(0.5, GasRadiation.electronsPerMassUnit(0.0), 1e-15);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void electronDegeneracyIsNeTimesTheThermalWavelengthCubedOverTwo() {
        // n_e lambda^3 / 2, lambda = h / sqrt(2 pi m_e k T) (Landau & Lifshitz, Statistical Physics, §56)
        double t = 1.57e7;
        double ne = 150.0 * 0.67 / M_U;
        double lambda = Codata2018.PLANCK / Math.sqrt(2 * Math.PI * Codata2018.ELECTRON_MASS * K * t);
        double expected = ne * lambda * lambda * lambda / 2;
        assertEquals(expected, GasRadiation.electronDegeneracy(t, ne), 1e-12 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void radiativeGradientOfASolarLikeInteriorPoint() {
        // nabla_rad = 3 kappa L P / (16 pi a c G m T^4) (Kippenhahn, Weigert & Weiss 2012 eq. 5.28) at kappa = 1,
        // L = L_sun, P = 1e16, m = 1e33 g, T = 5e6 K: 0.241471
        double expected = 3.0 * 1.0 * Iau2015.SOLAR_LUMINOSITY * 1e16
                / (16.0 * Math.PI * A * Codata2018.SPEED_OF_LIGHT * Codata2018.GRAVITATIONAL_CONSTANT * 1e33 * Math.pow(5e6, 4));
        assertEquals(0.241471, expected, 1e-6);
        assertEquals(expected, RadiativeGradient.value(1.0, Iau2015.SOLAR_LUMINOSITY, 1e16, 1e33, 5e6), 1e-14 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void ledouxRangeWithPhiAndDeltaNotOne() {
        // nabla_L = nabla_ad + (phi / delta) nabla_mu (Kippenhahn, Weigert & Weiss 2012 §6.1): with phi = 0.7,
        // delta = 1.6, nabla_mu = 0.2 the semiconvective range is (0.4, 0.4875), not (0.4, 0.857) as a swapped
        // ratio would give
        double nablaL = 0.4 + 0.7 / 1.6 * 0.2;
        assertEquals(0.4875, LedouxGradient.value(0.4, 0.7, 1.6, 0.2), 1e-15);
        assertEquals(Regime.SEMICONVECTIVE, StabilityClassifier.classify(Criterion.LEDOUX, 0.48, 0.4, nablaL, 0.2));
        assertEquals(Regime.CONVECTIVE, StabilityClassifier.classify(Criterion.LEDOUX, 0.49, 0.4,
                LedouxGradient.value(0.4, 0.7, 1.6, 0.2), 0.2));
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void radiationPressureAtTenMillionKelvin() {
        // P_rad = a T^4 / 3 (Kippenhahn, Weigert & Weiss 2012 §13.1) = 2.5219e13 dyn/cm^2 at 1e7 K
        assertEquals(2.5219e13, GasRadiation.radiationPressure(1e7), 0.0001e13);
        assertEquals(A * 1e28 / 3.0, GasRadiation.radiationPressure(1e7), 1e-15 * 2.5e13);
        // and the ideal gas: rho k T / (mu m_u)
        assertEquals(1.5 * K * 1e7 / (MU * M_U), GasRadiation.gasPressure(1e7, 1.5, MU), 1e-14 * 2e15);
    }
}
