package io.github.startransport.core.model;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The Sun as Eddington's standard model (IAU 2015 nominal mass and radius, mu = 0.61) against the n = 3 formulas
 * evaluated here with Chandrasekhar's constants (1939, table 4; xi_1 = 6.89685, omega_3 = 2.01824):
 * rho_c = (xi_1^3 / (3 omega_3)) 3M / (4 pi R^3), P_c = G M^2 / (16 pi theta'_1^2 R^4), T_c = beta mu m_u P_c /
 * (k rho_c) (Kippenhahn, Weigert &amp; Weiss 2012 §19.4, from memory). The textbook's "about 1.2e7 K and 76 g/cm^3".
 */
class SolarStandardModelTest {
    private static final double XI1 = 6.896848619;
    private static final double OMEGA = 2.018235951;

    private static EddingtonStandardModel sun() {
        double x = (1.0 / 0.61 - 0.75 + 0.25 * 0.02) / 1.25;
        return new EddingtonStandardModel(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS, Iau2015.SOLAR_LUMINOSITY, x, 0.02, 4.0);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void centralDensityOfTheSun() {
        double mean = 3.0 * Iau2015.SOLAR_MASS / (4.0 * Math.PI * Math.pow(Iau2015.SOLAR_RADIUS, 3));
        double expected = XI1 * XI1 * XI1 / (3.0 * OMEGA) * mean;
        assertEquals(76.39, expected, 0.01);
        assertEquals(expected, sun().centralDensity(), 1e-7 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void centralTemperatureOfTheSun() {
        EddingtonStandardModel sun = sun();
        double thetaPrime = OMEGA / (XI1 * XI1);
        double pc = Codata2018.GRAVITATIONAL_CONSTANT * Iau2015.SOLAR_MASS * Iau2015.SOLAR_MASS
                / (16.0 * Math.PI * thetaPrime * thetaPrime * Math.pow(Iau2015.SOLAR_RADIUS, 4));
        double mean = 3.0 * Iau2015.SOLAR_MASS / (4.0 * Math.PI * Math.pow(Iau2015.SOLAR_RADIUS, 3));
        double rhoC = XI1 * XI1 * XI1 / (3.0 * OMEGA) * mean;
        double tc = sun.beta() * 0.61 * Codata2018.ATOMIC_MASS_UNIT * pc / (Codata2018.BOLTZMANN * rhoC);
        assertEquals(1.195e7, tc, 0.001e7);
        assertEquals(tc, sun.centralTemperature(), 1e-7 * tc);
        assertEquals(1.245e17, pc, 0.001e17);
    }
}
