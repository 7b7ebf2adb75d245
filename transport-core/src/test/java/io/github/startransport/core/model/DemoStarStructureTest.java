package io.github.startransport.core.model;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The demo star's polytrope (Eddington's standard model, surface=polytrope) obeys the structure
 * equations and its equation of state, checked zone by zone from its own columns; and Eddington's
 * quartic solved here independently for the masses of a textbook table.
 */
class DemoStarStructureTest {
    private static final double G = Codata2018.GRAVITATIONAL_CONSTANT;
    private static final double K = Codata2018.BOLTZMANN;
    private static final double M_U = Codata2018.ATOMIC_MASS_UNIT;
    private static final double A_RAD = Codata2018.RADIATION_CONSTANT;
    /** mu of the fully ionised X = 0.70, Z = 0.02 mixture: 1 / (2X + 3Y/4 + Z/2) = 1 / 1.62. */
    private static final double MU = 1.0 / 1.62;

    private static final Profile STAR = new DemoStar(2000).profile();

    private static double[] col(ProfileColumn c) {
        return STAR.column(c);
    }

    @Test
    @Tag(CheckKind.LAW)
    void hydrostaticEquilibrium() {
        // dP/dr = -G m rho / r^2 (Kippenhahn, Weigert & Weiss 2012 eq. 2.4), centred differences between
        // zones with the right-hand side averaged over the pair; the O(h^2) error of that is the tolerance
        double[] r = col(ProfileColumn.RADIUS);
        double[] m = col(ProfileColumn.MASS);
        double[] rho = col(ProfileColumn.DENSITY);
        double[] p = col(ProfileColumn.PRESSURE);
        int checked = 0;
        for (int k = 1; k < r.length; k++) {
            double h = r[k] - r[k - 1];
            if (h > 2e-3 * r[r.length - 1]) {
                continue; // the few widest steps (the xi-uniform half near the surface) have larger errors
            }
            double lhs = (p[k] - p[k - 1]) / h;
            double rhs = -0.5 * (G * m[k] * rho[k] / (r[k] * r[k]) + G * m[k - 1] * rho[k - 1] / (r[k - 1] * r[k - 1]));
            assertEquals(rhs, lhs, 2e-3 * Math.abs(rhs), "zone " + k + " at r/R = " + r[k] / r[r.length - 1]);
            checked++;
        }
        assertTrue(checked > 1000, checked + " zone pairs");
    }

    @Test
    @Tag(CheckKind.LAW)
    void massContinuity() {
        // dm/dr = 4 pi r^2 rho (Kippenhahn, Weigert & Weiss 2012 eq. 1.3), trapezoid between zones: its error
        // -h^3 f''/12 on f = 4 pi r^2 rho ~ r^2 rho_c near the centre is (h / r)^2 / 6 of the step's mass
        double[] r = col(ProfileColumn.RADIUS);
        double[] m = col(ProfileColumn.MASS);
        double[] rho = col(ProfileColumn.DENSITY);
        for (int k = 1; k < r.length; k++) {
            double h = r[k] - r[k - 1];
            if (h > 2e-3 * r[r.length - 1]) {
                continue;
            }
            double dm = 0.5 * h * 4.0 * Math.PI * (r[k] * r[k] * rho[k] + r[k - 1] * r[k - 1] * rho[k - 1]);
            double trapezoid = h * h / (6.0 * r[k - 1] * r[k - 1]);
            assertEquals(dm, m[k] - m[k - 1], (2e-3 + trapezoid) * dm + 1e-9 * m[k], "zone " + k);
        }
    }

    @Test
    @Tag(CheckKind.LAW)
    void luminosityGrowsByTheEnergyGenerationRate() {
        // dL/dr = 4 pi r^2 rho epsilon with epsilon = epsilon_0 rho T^16 (Kippenhahn, Weigert & Weiss 2012
        // eq. 4.22; the demo star's rate): L(r) by the trapezoidal rule, normalised to the surface L. Near the
        // centre the integrand goes as r^2, on which k equal trapezoids err by 1 / (2 k^2) relative: so compare
        // where L has reached 10 % of its surface value (beyond zone 40: < 3e-4)
        double[] r = col(ProfileColumn.RADIUS);
        double[] rho = col(ProfileColumn.DENSITY);
        double[] t = col(ProfileColumn.TEMPERATURE);
        double[] l = col(ProfileColumn.LUMINOSITY);
        double[] integral = new double[r.length];
        double[] f = new double[r.length];
        for (int k = 0; k < r.length; k++) {
            f[k] = 4.0 * Math.PI * r[k] * r[k] * rho[k] * rho[k] * Math.pow(t[k] / t[0], DemoStar.NU);
        }
        integral[0] = f[0] * r[0] / 3.0; // f ~ r^2 inside the first zone
        for (int k = 1; k < r.length; k++) {
            integral[k] = integral[k - 1] + 0.5 * (r[k] - r[k - 1]) * (f[k] + f[k - 1]);
        }
        double scale = l[r.length - 1] / integral[r.length - 1];
        assertEquals(DemoStar.LUMINOSITY_SOLAR * Iau2015.SOLAR_LUMINOSITY, l[r.length - 1], 1e-9 * l[r.length - 1]);
        for (int k = 0; k < r.length; k++) {
            if (l[k] > 0.1 * l[r.length - 1]) {
                assertEquals(scale * integral[k], l[k], 1e-3 * l[k], "zone " + k);
            }
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void equationOfStateIsIdealGasPlusRadiationWithTheExactMu() {
        // P = rho k T / (mu m_u) + a T^4 / 3 (Kippenhahn, Weigert & Weiss 2012 §13.1) with mu = 1/1.62
        double[] rho = col(ProfileColumn.DENSITY);
        double[] t = col(ProfileColumn.TEMPERATURE);
        double[] p = col(ProfileColumn.PRESSURE);
        for (int k = 0; k < p.length; k++) {
            double expected = rho[k] * K * t[k] / (MU * M_U) + A_RAD * Math.pow(t[k], 4) / 3.0;
            assertEquals(expected, p[k], 1e-10 * expected, "zone " + k);
        }
    }

    @Test
    @Tag(CheckKind.LAW)
    void gasPressureIsTheSameFractionOfThePressureEverywhere() {
        // Eddington's standard model: beta = P_gas / P constant (Eddington 1926), so P ~ rho^(4/3) and T^3 ~ rho
        double[] rho = col(ProfileColumn.DENSITY);
        double[] t = col(ProfileColumn.TEMPERATURE);
        double[] p = col(ProfileColumn.PRESSURE);
        double beta0 = rho[0] * K * t[0] / (MU * M_U) / p[0];
        for (int k = 0; k < p.length; k++) {
            double beta = rho[k] * K * t[k] / (MU * M_U) / p[k];
            assertEquals(beta0, beta, 1e-10, "zone " + k);
        }
        assertEquals(beta0, DemoStar.standardModel().beta(), 1e-10);
    }

    /** beta from 1 - beta = C (M/M_sun)^2 mu^4 beta^4, C = pi G^3 a m_u^4 M_sun^2 / (48 omega_3^2 k^4), by Brent. */
    private static double quarticBeta(double massSolar, double mu) {
        double omega = 2.018235951; // -xi_1^2 theta'_1 of n = 3 (Chandrasekhar 1939, table 4: 2.01824)
        double msun = Iau2015.SOLAR_MASS;
        double c = Math.PI * G * G * G * A_RAD * Math.pow(M_U, 4) * msun * msun / (48.0 * omega * omega * Math.pow(K, 4));
        double q = c * massSolar * massSolar * Math.pow(mu, 4);
        return new BrentSolver(1e-15, 1e-15).solve(500, b -> 1.0 - b - q * Math.pow(b, 4), 1e-6, 1.0);
    }

    /** X that gives the fully ionised mu with Z = 0.02: 1/mu = 2X + 3(1 - X - Z)/4 + Z/2. */
    private static double hydrogenFor(double mu) {
        return (1.0 / mu - 0.75 + 0.25 * 0.02) / 1.25;
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void eddingtonsQuarticConstantIsTheTextbookPointZeroZeroThree() {
        // 1 - beta = 0.003 (M/M_sun)^2 mu^4 beta^4 (Kippenhahn, Weigert & Weiss 2012 §19.4, "0.003" from memory):
        // the constant recomputed from CODATA 2018 and the IAU 2015 solar mass is 0.0029903
        double omega = 2.018235951;
        double msun = Iau2015.SOLAR_MASS;
        double c = Math.PI * G * G * G * A_RAD * Math.pow(M_U, 4) * msun * msun / (48.0 * omega * omega * Math.pow(K, 4));
        assertEquals(0.0029903, c, 1e-7);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void betaOfTheSunAsAStandardModel() {
        // mu = 0.61: beta = 0.99959 (the quartic; the textbook says radiation pressure is negligible in the Sun)
        double x = hydrogenFor(0.61);
        EddingtonStandardModel sun = new EddingtonStandardModel(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS,
                Iau2015.SOLAR_LUMINOSITY, x, 0.02, 4.0);
        assertEquals(quarticBeta(1.0, 0.61), sun.beta(), 1e-9);
        assertEquals(0.999587, sun.beta(), 1e-6);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void betaOfTenSolarMasses() {
        double x = hydrogenFor(0.61);
        EddingtonStandardModel star = new EddingtonStandardModel(10 * Iau2015.SOLAR_MASS, 4 * Iau2015.SOLAR_RADIUS,
                1e4 * Iau2015.SOLAR_LUMINOSITY, x, 0.02, 16.0);
        assertEquals(quarticBeta(10.0, 0.61), star.beta(), 1e-9);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void betaOfAHundredSolarMassesIsNearOneHalf() {
        // radiation pressure comparable to gas pressure near 100 M_sun (Eddington 1926; the textbook remark that
        // beta falls to about 1/2 there, from memory)
        double x = hydrogenFor(0.61);
        EddingtonStandardModel star = new EddingtonStandardModel(100 * Iau2015.SOLAR_MASS, 15 * Iau2015.SOLAR_RADIUS,
                1e6 * Iau2015.SOLAR_LUMINOSITY, x, 0.02, 16.0);
        double beta = quarticBeta(100.0, 0.61);
        assertEquals(beta, star.beta(), 1e-9);
        assertEquals(0.5, beta, 0.1);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void centralDensityIsFiftyFourTimesTheMean() {
        // rho_c / rho_mean = 54.18 for n = 3 (Chandrasekhar 1939, table 4)
        EddingtonStandardModel model = DemoStar.standardModel();
        double mean = 3.0 * model.mass() / (4.0 * Math.PI * Math.pow(model.radius(), 3));
        assertEquals(54.1825, model.centralDensity() / mean, 1e-4 * 54.18);
    }
}
