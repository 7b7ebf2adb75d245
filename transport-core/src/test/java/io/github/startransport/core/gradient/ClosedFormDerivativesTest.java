package io.github.startransport.core.gradient;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.ZoneInput;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.function.DoubleUnaryOperator;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Derivatives against the textbook formulas themselves: the exponents of nabla_rad = 3 kappa L P / (16 pi a c G
 * m T^4) (Kippenhahn, Weigert &amp; Weiss 2012 eq. 5.28), the linear dependence of nabla_L = nabla_ad + (phi /
 * delta) nabla_mu (§6.1), and the beta-derivatives of the closed forms of gas plus radiation (ch. 13; from
 * memory), differenced here from the closed forms written in this test, not from the code's functions.
 */
class ClosedFormDerivativesTest {
    private static final double KM = Codata2018.BOLTZMANN / (Codata2018.ATOMIC_MASS_UNIT / 1.62);
    private static final double[] BETAS = {0.99, 0.8, 0.5, 0.2, 0.05};

    /** Central difference of a closed form, step 1e-5: truncation ~1e-10 f''', rounding ~1e-11 |f|. */
    private static double slope(DoubleUnaryOperator f, double b) {
        double h = 1e-5;
        return (f.applyAsDouble(b + h) - f.applyAsDouble(b - h)) / (2 * h);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void radiativeGradientScalesWithTheExponentsOfItsFormula() {
        // d ln nabla_rad / d ln (kappa, L, P, m, T) = (1, 1, 1, -1, -4)
        double kappa = 0.8;
        double l = 2e33;
        double p = 3e16;
        double m = 5e32;
        double t = 8e6;
        double[] d = new double[ZoneInput.COUNT];
        double v = RadiativeGradient.valueAndDerivatives(kappa, l, p, m, t, d);
        assertEquals(1.0, d[ZoneInput.KAPPA] * kappa / v, 1e-14);
        assertEquals(1.0, d[ZoneInput.L] * l / v, 1e-14);
        assertEquals(1.0, d[ZoneInput.P] * p / v, 1e-14);
        assertEquals(-1.0, d[ZoneInput.M] * m / v, 1e-14);
        assertEquals(-4.0, d[ZoneInput.T] * t / v, 1e-14);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void ledouxGradientIsLinearInEachOfItsTerms() {
        double[] d = new double[ZoneInput.COUNT];
        double v = LedouxGradient.valueAndDerivatives(0.4, 0.7, 1.6, 0.2, d);
        assertEquals(0.4 + 0.7 / 1.6 * 0.2, v, 1e-15);
        assertEquals(1.0, d[ZoneInput.NABLA_AD], 0.0);
        assertEquals(0.2 / 1.6, d[ZoneInput.PHI], 1e-15);
        assertEquals(-0.7 * 0.2 / (1.6 * 1.6), d[ZoneInput.DELTA], 1e-15);
        assertEquals(0.7 / 1.6, d[ZoneInput.NABLA_MU], 1e-15);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void nablaAdSlopeInBeta() {
        DoubleUnaryOperator f = b -> 2 * (4 - 3 * b) / (32 - 24 * b - 3 * b * b);
        for (double b : BETAS) {
            assertEquals(slope(f, b), GasRadiation.dNablaAdDBeta(b), 1e-8 * Math.abs(slope(f, b)) + 1e-9, "beta " + b);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void cpSlopeInBeta() {
        DoubleUnaryOperator f = b -> KM * (32 - 24 * b - 3 * b * b) / (2 * b * b);
        for (double b : BETAS) {
            double expected = slope(f, b);
            assertEquals(expected, GasRadiation.dCpDBeta(b, 1.0 / 1.62), 1e-7 * Math.abs(expected), "beta " + b);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void deltaSlopeInBeta() {
        DoubleUnaryOperator f = b -> (4 - 3 * b) / b;
        for (double b : BETAS) {
            double expected = slope(f, b);
            assertEquals(expected, GasRadiation.dDeltaDBeta(b), 1e-7 * Math.abs(expected), "beta " + b);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void gamma1SlopeInBeta() {
        DoubleUnaryOperator f = b -> (32 - 24 * b - 3 * b * b) / (24 - 21 * b);
        for (double b : BETAS) {
            double expected = slope(f, b);
            assertEquals(expected, GasRadiation.dGamma1DBeta(b), 1e-8 * Math.abs(expected) + 1e-9, "beta " + b);
        }
    }
}
