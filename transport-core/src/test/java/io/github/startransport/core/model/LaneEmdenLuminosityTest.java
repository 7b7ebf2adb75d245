package io.github.startransport.core.model;

import io.github.startransport.core.checks.CheckKind;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.GraggBulirschStoerIntegrator;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The luminosity integral lambda(xi) = integral_0^xi s^2 theta(s)^(6 + nu) ds of {@link LaneEmden} with
 * nu != 0 (the demo star's L(r) for epsilon ~ rho T^nu), and the solution itself beyond the table values
 * of {@code LaneEmdenTest}: against the closed-form solutions of index 0 and 1 (Chandrasekhar 1939,
 * ch. IV: theta = 1 - xi^2/6 and theta = sin(xi)/xi), integrated here with Commons Math (products of its
 * polynomials, integrated term by term, Gauss-Legendre quadrature), and for n = 3 against an independent integration of the
 * Lane-Emden equation with Commons Math's Gragg-Bulirsch-Stoer integrator (a different method from the
 * library's Dormand-Prince).
 */
class LaneEmdenLuminosityTest {

    /** lambda(xi) for n = 0: the exact antiderivative of s^2 (1 - s^2/6)^(6 + nu) for whole nu. */
    private static double lambdaIndexZero(int nu, double xi) {
        PolynomialFunction theta = new PolynomialFunction(new double[] {1.0, 0.0, -1.0 / 6.0});
        PolynomialFunction integrand = new PolynomialFunction(new double[] {0.0, 0.0, 1.0});
        for (int i = 0; i < 6 + nu; i++) {
            integrand = integrand.multiply(theta);
        }
        // the antiderivative term by term, Horner's scheme from the highest power
        double[] c = integrand.getCoefficients();
        double sum = 0.0;
        for (int i = c.length - 1; i >= 0; i--) {
            sum = sum * xi + c[i] / (i + 1);
        }
        return sum * xi;
    }

    /** lambda(xi) for n = 1 by Gauss-Legendre quadrature of s^2 (sin s / s)^(6 + nu). */
    private static double lambdaIndexOne(double nu, double xi) {
        IterativeLegendreGaussIntegrator gauss = new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-16);
        return gauss.integrate(100_000, s -> s < 1e-300 ? 0.0 : s * s * Math.pow(Math.sin(s) / s, 6.0 + nu), 0.0, xi);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexZeroWithoutTemperatureDependence() {
        LaneEmden le = LaneEmden.solve(0.0, 0.0);
        double expected = lambdaIndexZero(0, Math.sqrt(6.0));
        assertEquals(expected, le.lambdaTotal(), 1e-9 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexZeroWithNuTwoAndItsProfile() {
        LaneEmden le = LaneEmden.solve(0.0, 2.0);
        double expected = lambdaIndexZero(2, Math.sqrt(6.0));
        assertEquals(expected, le.lambdaTotal(), 1e-9 * expected);
        double[] s = new double[3];
        for (double xi : new double[] {0.3, 1.0, 2.0}) {
            le.sample(xi, s);
            assertEquals(lambdaIndexZero(2, xi), s[2], 1e-9 * expected, "lambda at xi = " + xi);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexOneWithoutTemperatureDependence() {
        LaneEmden le = LaneEmden.solve(1.0, 0.0);
        double expected = lambdaIndexOne(0.0, Math.PI);
        assertEquals(expected, le.lambdaTotal(), 1e-9 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexOneWithACnoLikeExponent() {
        // nu = 16 (the demo star's): the integrand is concentrated near the centre
        LaneEmden le = LaneEmden.solve(1.0, 16.0);
        double expected = lambdaIndexOne(16.0, Math.PI);
        assertEquals(expected, le.lambdaTotal(), 1e-9 * expected);
        double[] s = new double[3];
        for (double xi : new double[] {0.2, 0.6, 1.3, 2.5}) {
            le.sample(xi, s);
            assertEquals(lambdaIndexOne(16.0, xi), s[2], 1e-9 * expected, "lambda at xi = " + xi);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexOneMassProfileIsSinMinusXiCos() {
        // -xi^2 theta' = sin xi - xi cos xi for theta = sin xi / xi
        LaneEmden le = LaneEmden.solve(1.0, 0.0);
        double[] s = new double[3];
        for (double xi : new double[] {0.4, 1.0, 2.2, 3.0}) {
            le.sample(xi, s);
            assertEquals(Math.sin(xi) - xi * Math.cos(xi), s[1], 1e-9, "at xi = " + xi);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexZeroSolutionIsTheParabola() {
        LaneEmden le = LaneEmden.solve(0.0, 0.0);
        double[] s = new double[3];
        for (double xi : new double[] {0.5, 1.5, 2.3}) {
            le.sample(xi, s);
            assertEquals(1.0 - xi * xi / 6.0, s[0], 1e-10, "theta at xi = " + xi);
            assertEquals(xi * xi * xi / 3.0, s[1], 1e-9, "-xi^2 theta' at xi = " + xi);
        }
    }

    /**
     * theta, theta' and lambda of index n up to the first zero of theta, by Commons Math's
     * Gragg-Bulirsch-Stoer integrator from the series start theta = 1 - xi^2/6 + n xi^4/120.
     */
    private static double[] independent(double n, double nu, double xiEnd) {
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 3;
            }

            @Override
            public void computeDerivatives(double xi, double[] y, double[] dy) {
                double theta = Math.max(y[0], 0.0);
                dy[0] = y[1];
                dy[1] = -Math.pow(theta, n) - 2.0 * y[1] / xi;
                dy[2] = xi * xi * Math.pow(theta, 6.0 + nu);
            }
        };
        double x0 = 1e-3;
        double[] y = {1.0 - x0 * x0 / 6.0 + n * Math.pow(x0, 4) / 120.0, -x0 / 3.0 + n * Math.pow(x0, 3) / 30.0,
                Math.pow(x0, 3) / 3.0};
        new GraggBulirschStoerIntegrator(1e-10, 0.1, 1e-14, 1e-14).integrate(ode, x0, y, xiEnd, y);
        return y;
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexThreeLuminosityIntegralAgreesWithAnIndependentIntegration() {
        LaneEmden le = LaneEmden.solve(3.0, 16.0);
        double[] y = independent(3.0, 16.0, le.firstZero());
        assertEquals(y[2], le.lambdaTotal(), 1e-8 * y[2]);
        double[] s = new double[3];
        for (double xi : new double[] {0.5, 1.0, 2.0}) {
            double[] at = independent(3.0, 16.0, xi);
            le.sample(xi, s);
            assertEquals(at[2], s[2], 1e-8 * y[2], "lambda at xi = " + xi);
            assertEquals(at[0], s[0], 1e-9, "theta at xi = " + xi);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexThreeConstantsToEightDigits() {
        // Horedt (1986, ApJS 60, 493) tabulates xi_1 = 6.89684862 and -xi_1^2 theta'_1 = 2.01823595 for n = 3
        // (values from memory; the last digits here, 6.896848619 and 2.018235951, also from memory)
        LaneEmden le = LaneEmden.solve(3.0, 0.0);
        assertEquals(6.896848619, le.firstZero(), 2e-9 * 6.9);
        assertEquals(2.018235951, le.massConstant(), 2e-9 * 2.0);
        assertEquals(54.18248111, le.centralToMeanDensity(), 2e-8 * 54.2);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexOneAndAHalfConstantsToEightDigits() {
        // Horedt (1986): xi_1 = 3.65375374, -xi_1^2 theta'_1 = 2.71405512 for n = 3/2 (values from memory;
        // rho_c / mean = xi_1^3 / (3 omega) = 5.990704516)
        LaneEmden le = LaneEmden.solve(1.5, 0.0);
        assertEquals(3.653753736, le.firstZero(), 2e-9 * 3.65);
        assertEquals(2.71405512, le.massConstant(), 1e-8 * 2.7);
        assertEquals(5.990704516, le.centralToMeanDensity(), 2e-8 * 6.0);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void centralPressureOfTheEddingtonModelIsElevenPointZeroFiveGMSquaredOverRToTheFour() {
        // P_c = G M^2 / (4 pi (n + 1) theta'_1^2 R^4) for a polytrope (Chandrasekhar 1939, ch. IV), with
        // theta'_1 = -omega_3 / xi_1^2 for n = 3: 11.050681 G M^2 / R^4 (the textbook "11.05")
        EddingtonStandardModel sun = new EddingtonStandardModel(1.989e33, 6.957e10, 3.828e33, 0.7, 0.02, 16.0);
        double thetaPrime = 2.018235951 / (6.896848619 * 6.896848619);
        double coefficient = 1.0 / (4.0 * Math.PI * 4.0 * thetaPrime * thetaPrime);
        assertEquals(11.050681, coefficient, 1e-6 * 11.05);
        double gm2r4 = 6.67430e-8 * 1.989e33 * 1.989e33 / Math.pow(6.957e10, 4);
        assertEquals(coefficient * gm2r4, sun.centralPressure(), 1e-7 * coefficient * gm2r4);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexOneProfileIsSinXiOverXi() {
        LaneEmden le = LaneEmden.solve(1.0, 0.0);
        double[] s = new double[3];
        for (double xi : new double[] {0.1, 0.9, 1.7, 2.6, 3.1}) {
            le.sample(xi, s);
            assertEquals(Math.sin(xi) / xi, s[0], 1e-10, "theta at xi = " + xi);
        }
    }
}
