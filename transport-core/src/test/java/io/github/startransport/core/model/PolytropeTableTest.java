package io.github.startransport.core.model;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Lane-Emden constants of the indices not in {@code LaneEmdenTest}: xi_1, -xi_1^2 theta'(xi_1) and
 * rho_c / mean rho as tabulated by Chandrasekhar (1939, ch. IV, table 4; reproduced in Kippenhahn, Weigert
 * &amp; Weiss 2012, table 19.1; values from memory, five to six figures, so 1e-4 relative).
 */
class PolytropeTableTest {

    private static void check(double n, double xi1, double omega, double ratio) {
        LaneEmden le = LaneEmden.solve(n, 0.0);
        assertEquals(xi1, le.firstZero(), 1e-4 * xi1, "xi_1 of n = " + n);
        assertEquals(omega, le.massConstant(), 1e-4 * omega, "-xi_1^2 theta' of n = " + n);
        assertEquals(ratio, le.centralToMeanDensity(), 1e-4 * ratio, "rho_c / mean of n = " + n);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexTwo() {
        check(2.0, 4.35287, 2.41105, 11.40254);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexTwoAndAHalf() {
        check(2.5, 5.35528, 2.18720, 23.40646);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexFour() {
        check(4.0, 14.97155, 1.79723, 622.408);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void indexFourAndAHalf() {
        check(4.5, 31.83646, 1.73780, 6189.47);
    }
}
