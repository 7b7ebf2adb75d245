package io.github.startransport.core.timescale;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The local turnover time where half a mixing length does not fit inside the region: then the region's
 * middle is used (our rule, no source; the regular point half a mixing length from the base follows Kim
 * &amp; Demarque 1996 and is checked in {@code TimescaleTest}). l and v linear in r, so the interpolated
 * l / v at the middle is known exactly.
 */
class TurnoverFallbackTest {
    private static final double[] R = {1e9, 2e9, 3e9, 4e9, 5e9, 6e9, 7e9, 8e9};

    private static double[] linear(double a, double b) {
        double[] y = new double[R.length];
        for (int k = 0; k < R.length; k++) {
            y[k] = a + b * R[k];
        }
        return y;
    }

    @Test
    @Tag(CheckKind.INTERNAL)
    void aRegionThinnerThanHalfAMixingLengthUsesItsMiddle() {
        double[] l = linear(4e9, 0.5);      // l / 2 > 2e9 everywhere: more than the regions below are thick
        double[] v = linear(1e3, 2e-7);
        // an envelope between 3.3e9 and 4.9e9 (zones 2..4 inside): r_b + l(r_b)/2 is beyond the top
        double mid = 0.5 * (3.3e9 + 4.9e9);
        double expected = (4e9 + 0.5 * mid) / (1e3 + 2e-7 * mid);
        assertEquals(expected, Timescale.turnoverLocal(R, l, v, 2, 4, 3.3e9, 4.9e9), 1e-12 * expected);
        // a core from the centre to 2.5e9 (zones 0..1): r_t - l(r_t)/2 is below the centre
        double coreMid = 1.25e9;
        double expectedCore = (4e9 + 0.5 * coreMid) / (1e3 + 2e-7 * coreMid);
        assertEquals(expectedCore, Timescale.turnoverLocal(R, l, v, 0, 1, 0.0, 2.5e9), 1e-12 * expectedCore);
        // a velocity that vanishes at the middle gives no time (0), not a division by zero
        double[] still = new double[R.length];
        assertEquals(0.0, Timescale.turnoverLocal(R, l, still, 2, 4, 3.3e9, 4.9e9));
    }
}
