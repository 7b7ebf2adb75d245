package io.github.startransport.core.model;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Lane-Emden solutions against exact solutions (n = 0, 1) and Chandrasekhar's (1939) table
 * (n = 1.5, 3; <i>An Introduction to the Study of Stellar Structure</i>, ch. IV, table 4).
 */
class LaneEmdenTest {

    @Tag(CheckKind.EXTERNAL)
    @Test
    void indexZeroIsTheUniformSphere() {
        // theta = 1 - xi^2/6: xi_1 = sqrt(6), -xi_1^2 theta' = xi_1^3/3, rho_c / mean = 1
        LaneEmden le = LaneEmden.solve(0, 0);
        assertEquals(Math.sqrt(6), le.firstZero(), 1e-9);
        assertEquals(Math.pow(6, 1.5) / 3, le.massConstant(), 1e-8);
        assertEquals(1.0, le.centralToMeanDensity(), 1e-9);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void indexOneIsSinXOverX() {
        // theta = sin(xi)/xi: xi_1 = pi, -xi_1^2 theta'(xi_1) = pi, rho_c / mean = pi^2 / 3
        LaneEmden le = LaneEmden.solve(1, 0);
        assertEquals(Math.PI, le.firstZero(), 1e-9);
        assertEquals(Math.PI, le.massConstant(), 1e-8);
        assertEquals(Math.PI * Math.PI / 3, le.centralToMeanDensity(), 1e-8);
        double[] s = new double[3];
        le.sample(1.3, s);
        assertEquals(Math.sin(1.3) / 1.3, s[0], 1e-10);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void indexOneAndAHalf() {
        // Chandrasekhar 1939, table 4: xi_1 = 3.65375, -xi_1^2 theta' = 2.71406, rho_c/mean = 5.99071
        LaneEmden le = LaneEmden.solve(1.5, 0);
        assertEquals(3.65375, le.firstZero(), 1e-4 * 3.65375);
        assertEquals(2.71406, le.massConstant(), 1e-4 * 2.71406);
        assertEquals(5.99071, le.centralToMeanDensity(), 1e-4 * 5.99071);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void indexThree() {
        // Chandrasekhar 1939, table 4: xi_1 = 6.89685, -xi_1^2 theta' = 2.01824, rho_c/mean = 54.1825
        LaneEmden le = LaneEmden.solve(3, 0);
        assertEquals(6.89685, le.firstZero(), 1e-4 * 6.89685);
        assertEquals(2.01824, le.massConstant(), 1e-4 * 2.01824);
        assertEquals(54.1825, le.centralToMeanDensity(), 1e-4 * 54.1825);
    }
}
