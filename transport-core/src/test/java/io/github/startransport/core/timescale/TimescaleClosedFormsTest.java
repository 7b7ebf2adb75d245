package io.github.startransport.core.timescale;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Timescales pinned to independent computations: the Kelvin-Helmholtz time of the nominal Sun from the IAU 2015
 * nominal values, and the photon-diffusion and turnover integrals of profiles with closed-form integrals, with
 * the quadrature's error bound (the textbook bounds of the trapezoidal and midpoint rules) as the tolerance.
 */
class TimescaleClosedFormsTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void kelvinHelmholtzTimeOfTheNominalSun() {
        // t_KH = G M^2 / (R L) (Kippenhahn, Weigert & Weiss 2012 eq. 3.18, from memory; the definition without a
        // structure factor) = (GM)_N^2 / (G R_N L_N) with IAU 2015 B3 values: 9.909e14 s = 3.140e7 Julian years
        double gm = 1.3271244e26;
        double expected = gm * gm / (Codata2018.GRAVITATIONAL_CONSTANT * 6.957e10 * 3.828e33);
        double t = Timescale.kelvinHelmholtz(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS, Iau2015.SOLAR_LUMINOSITY);
        assertEquals(expected, t, 1e-12 * expected);
        assertEquals(9.909e14, t, 0.001e14);
        assertEquals(3.140e7, t / 31_557_600.0, 0.001e7);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void photonDiffusionOfASphereWhoseDensityFallsLinearly() {
        // rho = rho_c (1 - r / R), kappa constant: t = (kappa / c) integral_0^R rho r dr = kappa rho_c R^2 / (6 c)
        // (Hansen, Kawaler & Trimble 2004 §1.3 for the integral's form). Trapezoids on the quadratic f = kappa rho r
        // (the segment [0, r_0] from f(0) = 0) err by exactly -R h^2 f'' / 12 = h^2 kappa rho_c / 6, divided by c
        // (the trapezoidal rule's error term, exact for a constant f'')
        int n = 200;
        double radius = 7e10;
        double kappa = 0.4;
        double rhoC = 90.0;
        double[] r = new double[n];
        double[] k = new double[n];
        double[] rho = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = radius * (i + 1.0) / n;
            k[i] = kappa;
            rho[i] = rhoC * (1 - r[i] / radius);
        }
        double c = Codata2018.SPEED_OF_LIGHT;
        double exact = kappa * rhoC * radius * radius / (6 * c);
        double h = radius / n;
        double trapezoidError = h * h * kappa * rhoC / (6 * c);
        assertEquals(exact - trapezoidError, Timescale.photonDiffusion(r, k, rho), 1e-12 * exact);
        assertEquals(true, trapezoidError < 1e-4 * exact);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void globalTurnoverOfAVelocityRisingLinearly() {
        // integral_b^t dr / (v0 + v1 r) = ln(v(t) / v(b)) / v1 (Gilliland 1985 for the definition, from memory). Each
        // zone owns the interval between the midpoints to its neighbours: a midpoint rule, whose error is at most
        // (t - b) h^2 max|f''| / 24 with f = 1 / v, f'' = 2 v1^2 / v^3, plus the two end half-intervals'
        // first-order error h^2 max|f'| / 8 each, f' = -v1 / v^2
        int n = 400;
        double[] r = new double[n];
        double[] v = new double[n];
        double v0 = 2e3;
        double v1 = 3e-7;
        for (int i = 0; i < n; i++) {
            r[i] = 1e10 + 1e8 * i;
            v[i] = v0 + v1 * r[i];
        }
        double bottom = r[10] - 0.3e8;
        double top = r[300] + 0.2e8;
        double expected = Math.log((v0 + v1 * top) / (v0 + v1 * bottom)) / v1;
        double h = 1e8;
        double vMin = v0 + v1 * bottom;
        double bound = (top - bottom) * h * h * 2 * v1 * v1 / (24 * Math.pow(vMin, 3)) + 2 * h * h * v1 / (8 * vMin * vMin);
        assertEquals(expected, Timescale.turnoverGlobal(r, v, 10, 300, bottom, top), bound);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void thermalDiffusionTimeExceedsThePhotonTimeByTheHeatContentRatio() {
        // uniform sphere: t_th / t_gamma = (R^2 / (6 chi)) / (kappa rho R^2 / (2 c)) = rho c_P T / (4 a T^4) with
        // chi = 4 a c T^3 / (3 kappa rho^2 c_P) (Kippenhahn, Weigert & Weiss 2012 §5.1; Stix 2003, Sol. Phys. 212, 3)
        int n = 100;
        double[] r = new double[n];
        double[] kappa = new double[n];
        double[] rho = new double[n];
        double[] t = new double[n];
        double[] cp = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = 7e10 * (i + 1.0) / n;
            kappa[i] = 1.0;
            rho[i] = 1.4;
            t[i] = 5e6;
            cp[i] = 3.4e8;
        }
        double ratio = Timescale.thermalDiffusion(r, kappa, rho, t, cp) / Timescale.photonDiffusion(r, kappa, rho);
        double expected = 1.4 * 3.4e8 * 5e6 / (4 * Codata2018.RADIATION_CONSTANT * Math.pow(5e6, 4));
        assertEquals(expected, ratio, 1e-12 * expected);
    }
}
