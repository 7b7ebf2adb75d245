package io.github.startransport.core.model;

import io.github.startransport.core.checks.CheckKind;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.GraggBulirschStoerIntegrator;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The interior of Eddington's standard model (an n = 3 polytrope) against the published constants of the n = 3
 * solution and an independent integration of the Lane-Emden equation: rho = rho_c theta^3 with rho_c = 54.1825
 * times the mean density, P = P_c theta^4 with P_c = 11.0507 G M^2 / R^4, m = M phi(xi) / 2.01824 with
 * phi = -xi^2 theta' (Chandrasekhar 1939, ch. IV, table 4; W_3 = 11.0507 as in Hansen, Kawaler &amp; Trimble 2004,
 * table 7.1; values from memory, six figures: 1e-4), and r = R xi / 6.89685.
 */
class StandardModelInteriorTest {
    private static final double G = 6.67430e-8;                 // CODATA 2018
    private static final double M = 1.3271244e26 / G;            // IAU 2015 nominal GM_sun / G
    private static final double R = 6.957e10;                    // IAU 2015 nominal
    private static final double L = 3.828e33;                    // IAU 2015 nominal
    private static final double XI1 = 6.89685;
    private static final double OMEGA = 2.01824;

    /** theta and phi = -xi^2 theta' of n = 3 at xi, by Commons Math's Gragg-Bulirsch-Stoer integrator. */
    private static double[] laneEmdenThree(double xi) {
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public void computeDerivatives(double x, double[] y, double[] dy) {
                dy[0] = y[1];
                dy[1] = -Math.pow(Math.max(y[0], 0.0), 3) - 2 * y[1] / x;
            }
        };
        double x0 = 1e-3;
        double s = x0 * x0;
        // the series about the centre, theta = 1 - xi^2/6 + n xi^4/120 (Chandrasekhar 1939, ch. IV)
        double[] y = {1 - s / 6 + 3 * s * s / 120, -x0 / 3 + 3 * 4 * s * x0 / 120};
        new GraggBulirschStoerIntegrator(1e-12, 0.05, 1e-14, 1e-13).integrate(ode, x0, y, xi, y);
        return new double[] {y[0], -xi * xi * y[1]};
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void densityPressureAndMassInsideTheSunAsAStandardModel() {
        EddingtonStandardModel model = new EddingtonStandardModel(M, R, L, 0.7, 0.02, 16.0);
        double rhoC = 54.1825 * 3 * M / (4 * Math.PI * R * R * R);
        double pC = 11.0507 * G * M * M / Math.pow(R, 4);
        double[] out = new double[5];
        for (double x : new double[] {0.05, 0.2, 0.5, 0.8}) {
            double[] le = laneEmdenThree(x * XI1);
            model.state(x * R, out);
            String at = "r = " + x + " R";
            double theta3 = le[0] * le[0] * le[0];
            assertEquals(rhoC * theta3, out[1], 1e-4 * rhoC * theta3, at + ": density");
            assertEquals(pC * theta3 * le[0], out[2], 1e-4 * pC * theta3 * le[0], at + ": pressure");
            assertEquals(M * le[1] / OMEGA, out[3], 1e-4 * M * le[1] / OMEGA, at + ": mass");
        }
    }
}
