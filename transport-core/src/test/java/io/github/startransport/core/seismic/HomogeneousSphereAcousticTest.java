package io.github.startransport.core.seismic;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The acoustic radius of a homogeneous gas sphere. With rho uniform, hydrostatic equilibrium gives
 * P = P_c (1 - r^2 / R^2), so c_s = c_0 sqrt(1 - x^2) for a constant Gamma_1 (x = r / R): the n = 0 polytrope
 * (Chandrasekhar 1939, ch. IV). Then integral_0^X dr / c_s = (R / c_0) arcsin X, and over the whole sphere
 * pi R / (2 c_0), so Delta nu = c_0 / (pi R) (derived here; Delta nu = (2 integral dr / c)^-1 is Tassoul 1980).
 */
class HomogeneousSphereAcousticTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void acousticRadiusAndLargeSeparationOfAHomogeneousSphere() {
        double radius = 7e10;
        double c0 = 5e7;
        // the sound speed vanishes at the surface, so the zones stop at x = 0.999 (a finite acoustic radius)
        int n = 40001;
        double top = 0.999;
        double[] r = new double[n];
        double[] cs = new double[n];
        for (int k = 0; k < n; k++) {
            double x = top * (k + 1.0) / n;
            r[k] = x * radius;
            cs[k] = c0 * Math.sqrt(1 - x * x);
        }
        double tau = AsymptoticIntegrals.acousticRadius(r, cs);
        // the trapezoid's error ~ h^2 / 12 [f']_0^X = (2.5e-5)^2 / 12 * 1.1e4 ~ 6e-7 of R / c0 (estimated here)
        double exact = radius / c0 * Math.asin(top);
        assertEquals(exact, tau, 2e-6 * exact);
        assertEquals(1 / (2 * exact), AsymptoticIntegrals.largeSeparation(tau), 2e-6 / (2 * exact));
    }
}
