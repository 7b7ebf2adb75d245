package io.github.startransport.core.timescale;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class TimescaleTest {

    private static double[] grid(int n, double radius) {
        double[] r = new double[n];
        for (int k = 0; k < n; k++) {
            r[k] = radius * (k + 1) / n;
        }
        return r;
    }

    private static double[] constant(int n, double v) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, v);
        return a;
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void photonDiffusionOfAUniformSphereIsKappaRhoRSquaredOverTwoC() {
        // random walk with mean free path l = 1/(kappa rho): t = R^2 / (2 l c) (Hansen, Kawaler & Trimble 2004 §1.3)
        int n = 50;
        double radius = Iau2015.SOLAR_RADIUS;
        double kappa = 0.34;
        double rho = 1.41;
        double t = Timescale.photonDiffusion(grid(n, radius), constant(n, kappa), constant(n, rho));
        double closed = kappa * rho * radius * radius / (2 * Codata2018.SPEED_OF_LIGHT);
        assertEquals(closed, t, 1e-12 * closed);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void thermalDiffusionOfAUniformSphere() {
        // integral_0^R r / (3 chi) dr with chi = 4 a c T^3/(3 kappa rho^2 c_P) constant: R^2 / (6 chi)
        int n = 40;
        double radius = 1e11;
        double kappa = 2.0;
        double rho = 3.0;
        double temp = 2e6;
        double cp = 3e8;
        double chi = 4 * Codata2018.RADIATION_CONSTANT * Codata2018.SPEED_OF_LIGHT * Math.pow(temp, 3)
                / (3 * kappa * rho * rho * cp);
        double t = Timescale.thermalDiffusion(grid(n, radius), constant(n, kappa), constant(n, rho),
                constant(n, temp), constant(n, cp));
        double closed = radius * radius / (6 * chi);
        assertEquals(closed, t, 1e-12 * closed);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void kelvinHelmholtzTimeOfTheSunIsAboutThirtyMillionYears() {
        // ~3e7 yr for the Sun (Kippenhahn, Weigert & Weiss 2012 §3.3; Carroll & Ostlie 2007 §10.3; from memory)
        double t = Timescale.kelvinHelmholtz(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS, Iau2015.SOLAR_LUMINOSITY);
        double years = t / Iau2015.JULIAN_YEAR;
        assertEquals(3.1e7, years, 0.2e7);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void globalTurnoverOfUniformVelocityIsThicknessOverVelocity() {
        // integral dr / v with v constant (definition)
        double[] r = grid(20, 1e10);
        double[] v = constant(20, 3e4);
        double bottom = 2.2e9;
        double top = 7.7e9;
        assertEquals((top - bottom) / 3e4, Timescale.turnoverGlobal(r, v, 4, 14, bottom, top), 1e-9);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void localTurnoverIsMixingLengthOverVelocityHalfAMixingLengthAboveTheBase() {
        // Kim & Demarque (1996, ApJ 457, 340; from memory): tau_c = l / v half a mixing length above the base
        double[] r = grid(20, 1e10);
        double[] v = new double[20];
        double[] l = new double[20];
        for (int k = 0; k < 20; k++) {
            v[k] = 1e3 * r[k] / 1e8; // linear in r, so the interpolation is exact
            l[k] = 1.8e9;
        }
        double bottom = 2.2e9;
        double at = bottom + 0.9e9;
        double expected = 1.8e9 / (1e3 * at / 1e8);
        assertEquals(expected, Timescale.turnoverLocal(r, l, v, 2, 18, bottom, 9.6e9), 1e-12 * expected);
        // a core (bottom at the centre): half a mixing length below its top
        double top = 6.3e9;
        double atCore = top - 0.9e9;
        double expectedCore = 1.8e9 / (1e3 * atCore / 1e8);
        assertEquals(expectedCore, Timescale.turnoverLocal(r, l, v, 0, 12, 0.0, top), 1e-12 * expectedCore);
        // thinner than half a mixing length: the middle
        double mid = 0.5 * (2.2e9 + 2.9e9);
        assertEquals(1.8e9 / (1e3 * mid / 1e8), Timescale.turnoverLocal(r, l, v, 3, 5, 2.2e9, 2.9e9), 1e-3);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void coreTurnoverIsRadiusOverMassWeightedVelocity() {
        // uniform v: r_top / v, the same as the integral of dr / v (definition)
        int n = 30;
        double[] m = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            m[k] = 1e31 * (k + 0.5); // each zone at the middle of the mass it owns
            v[k] = 2e3;
        }
        assertEquals(4e10 / 2e3, Timescale.turnoverCore(m, v, 19, 4e10, 2.05e32), 1e-6);
        // v linear in m: <v>_m = v at half the mass, which the midpoint rule gets exactly (v = 1e3 m / 1e32)
        for (int k = 0; k < n; k++) {
            v[k] = 1e3 * m[k] / 1e32;
        }
        double topMass = 2.0e32;
        double mean = 1e3 * (topMass / 2) / 1e32;
        assertEquals(4e10 / mean, Timescale.turnoverCore(m, v, 19, 4e10, topMass), 1e-9 * 4e10 / mean);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void kelvinHelmholtzTimeIsUndefinedWhereTheStarLosesNoEnergy() {
        // t_KH = G M^2 / (R L) is the time the star's gravitational energy lasts at its luminosity
        // (Kippenhahn, Weigert & Weiss 2012 eq. 3.18, from memory): no such time for L <= 0
        for (double l : new double[] {0.0, -0.0, -Iau2015.SOLAR_LUMINOSITY, Double.NaN}) {
            assertTrue(Double.isNaN(Timescale.kelvinHelmholtz(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS, l)), "L = " + l);
        }
        assertTrue(Timescale.kelvinHelmholtz(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS, 1e-30) > 0);
    }
}
