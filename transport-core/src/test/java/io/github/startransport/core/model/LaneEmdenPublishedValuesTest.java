package io.github.startransport.core.model;

import io.github.startransport.core.checks.CheckKind;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Lane-Emden solutions against what is known of them outside the project: the two indices of Chandrasekhar's
 * table (1939, <i>An Introduction to the Study of Stellar Structure</i>, ch. IV, table 4; values from memory)
 * not checked elsewhere, the power series about the centre (its first terms as printed in the same chapter, all
 * terms from the recurrence the equation implies), and the gravitational energy of a
 * polytrope, Omega = -3/(5 - n) G M^2 / R (Betti-Ritter; Chandrasekhar 1939, ch. IV), integrated here over the
 * sampled solution with Commons Math's Gauss-Legendre integrator.
 */
class LaneEmdenPublishedValuesTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexOneHalfFromChandrasekharsTable() {
        // n = 0.5: xi_1 = 2.75270, -xi_1^2 theta'(xi_1) = 3.78865, rho_c / mean = 1.83514 (six figures: 1e-5)
        LaneEmden le = LaneEmden.solve(0.5, 0.0);
        assertEquals(2.75270, le.firstZero(), 1e-5 * 2.75270);
        assertEquals(3.78865, le.massConstant(), 1e-5 * 3.78865);
        assertEquals(1.83514, le.centralToMeanDensity(), 1e-5 * 1.83514);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexThreeAndAHalfFromChandrasekharsTable() {
        // n = 3.5: xi_1 = 9.53581, -xi_1^2 theta'(xi_1) = 1.89056, rho_c / mean = 152.884 (six figures: 1e-5)
        LaneEmden le = LaneEmden.solve(3.5, 0.0);
        assertEquals(9.53581, le.firstZero(), 1e-5 * 9.53581);
        assertEquals(1.89056, le.massConstant(), 1e-5 * 1.89056);
        assertEquals(152.884, le.centralToMeanDensity(), 1e-5 * 152.884);
    }

    /**
     * theta = sum a_k xi^(2k) from the equation (xi^2 theta')' = -xi^2 theta^n: a_0 = 1, a_(k+1) = -b_k / ((2k + 2)
     * (2k + 3)) with b_k the coefficients of theta^n, b_0 = 1, b_k = (1/k) sum_(j=1..k) ((n + 1) j - k) a_j b_(k-j)
     * (the rule for a power of a power series, J. C. P. Miller; Knuth, TAOCP vol. 2, §4.7, from memory).
     */
    private static double[] seriesCoefficients(double n, int terms) {
        double[] a = new double[terms + 1];
        double[] b = new double[terms + 1];
        a[0] = 1;
        b[0] = 1;
        for (int k = 0; k < terms; k++) {
            if (k > 0) {
                double s = 0;
                for (int j = 1; j <= k; j++) {
                    s += ((n + 1) * j - k) * a[j] * b[k - j];
                }
                b[k] = s / k;
            }
            a[k + 1] = -b[k] / ((2.0 * k + 2) * (2.0 * k + 3));
        }
        return a;
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void solutionFollowsThePowerSeriesAboutTheCentre() {
        // the first coefficients as printed by Chandrasekhar (1939, ch. IV, from memory):
        // theta = 1 - xi^2/6 + n xi^4/120 - n (8n - 5) xi^6/15120 + n (122 n^2 - 183 n + 70) xi^8/3265920 - ...
        for (double n : new double[] {1.5, 3.0, 4.0}) {
            double[] a = seriesCoefficients(n, 40);
            assertEquals(-1.0 / 6, a[1], 1e-16);
            assertEquals(n / 120, a[2], 1e-16);
            assertEquals(-n * (8 * n - 5) / 15120, a[3], 1e-16);
            assertEquals(n * (122 * n * n - 183 * n + 70) / 3265920, a[4], 1e-16);
            // 40 terms converge to rounding at xi <= 1 for these indices (terms beyond the 30th change nothing
            // in the 16th digit there); the integrated solution must agree to 1e-12
            double[] out = new double[3];
            LaneEmden le = LaneEmden.solve(n, 0.0);
            for (double xi : new double[] {0.5, 1.0}) {
                double sum = 0;
                for (int k = a.length - 1; k >= 0; k--) {
                    sum = sum * xi * xi + a[k];
                }
                le.sample(xi, out);
                assertEquals(sum, out[0], 1e-12, "theta at xi = " + xi + ", n = " + n);
            }
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void gravitationalEnergyIsThreeOverFiveMinusNTimesGMSquaredOverR() {
        // With m = M phi / omega (phi = -xi^2 theta', omega = phi(xi_1)), r = R xi / xi_1 and dm = (M / omega)
        // xi^2 theta^n dxi, Omega = -integral G m dm / r = -(G M^2 / R)(xi_1 / omega^2) integral_0^xi_1 phi xi
        // theta^n dxi, which must be -3/(5 - n) G M^2 / R (Chandrasekhar 1939, ch. IV, from memory).
        double[] out = new double[3];
        for (double n : new double[] {1.0, 1.5, 3.0, 4.0}) {
            LaneEmden le = LaneEmden.solve(n, 0.0);
            IterativeLegendreGaussIntegrator gauss = new IterativeLegendreGaussIntegrator(8, 1e-11, 1e-13);
            double integral = gauss.integrate(100000, xi -> {
                le.sample(xi, out);
                return out[0] > 0 ? out[1] * xi * Math.pow(out[0], n) : 0.0;
            }, 1e-6, le.firstZero());
            double omega = le.massConstant();
            assertEquals(3.0 / (5.0 - n), le.firstZero() / (omega * omega) * integral, 1e-7, "n = " + n);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void momentOfInertiaOfUniformSinXOverXAndFullyConvectivePolytropes() {
        // I / (M R^2) = (2/3) integral r^2 dm / (M R^2) = (2/3) integral_0^xi_1 xi^4 theta^n dxi / (omega xi_1^2).
        // Closed forms: n = 0, the uniform sphere, 2/5; n = 1, rho ~ sin x / x on [0, pi]: (2/3) integral x^3 sin x dx
        // / (pi^2 integral x sin x dx) = (2/3)(pi^3 - 6 pi) / pi^3 = (2/3)(1 - 6 / pi^2) = 0.26138. n = 3/2: 0.205
        // (the radius of gyration of fully convective stars, e.g. in tidal-evolution papers; value from memory,
        // three figures: 0.5 %).
        double[] out = new double[3];
        double[][] cases = {{0.0, 0.4, 1e-8}, {1.0, 2.0 / 3 * (1 - 6 / (Math.PI * Math.PI)), 1e-8},
            {1.5, 0.205, 0.005}};
        for (double[] c : cases) {
            double n = c[0];
            LaneEmden le = LaneEmden.solve(n, 0.0);
            double integral = new IterativeLegendreGaussIntegrator(8, 1e-11, 1e-13).integrate(100000, xi -> {
                le.sample(xi, out);
                return out[0] > 0 ? Math.pow(xi, 4) * Math.pow(out[0], n) : 0.0;
            }, 1e-6, le.firstZero());
            double k2 = 2.0 / 3 * integral / (le.massConstant() * le.firstZero() * le.firstZero());
            assertEquals(c[1], k2, c[2] * c[1], "n = " + n);
        }
    }
}
