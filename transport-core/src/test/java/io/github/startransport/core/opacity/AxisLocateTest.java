package io.github.startransport.core.opacity;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The O(1) interval search on evenly spaced axes against the plain binary search (common practice, no source). */
class AxisLocateTest {

    @Tag(CheckKind.INTERNAL)
    @Test
    void evenAxesAreRecognisedAndUnevenOnesAreNot() {
        assertTrue(OpacityGrid.inverseStep(Grids.uniform(3.5, 8.5, 101)) > 0);
        assertTrue(OpacityGrid.inverseStep(Grids.uniform(-9.0, 1.0, 81)) > 0);
        assertTrue(OpacityGrid.inverseStep(new double[] {0.0, 1.0}) > 0);
        assertEquals(0.0, OpacityGrid.inverseStep(Grids.nonUniform(3.5, 8.0, 23, 1)));
        assertEquals(0.0, OpacityGrid.inverseStep(new double[] {0.0, 1.0, 2.0, 3.5}));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void sameIntervalAsBinarySearchOnEvenAndUnevenAxes() {
        double[][] axes = {Grids.uniform(3.5, 8.5, 101), Grids.uniform(-9.0, 1.0, 81), Grids.uniform(0, 1, 2),
                Grids.uniform(-1.2, 1.0, 11), Grids.nonUniform(-8.0, 1.0, 17, 2), Grids.nonUniform(0, 1, 5, 9)};
        SplittableRandom rnd = new SplittableRandom(31);
        for (double[] a : axes) {
            double inv = OpacityGrid.inverseStep(a);
            int n = a.length;
            double span = a[n - 1] - a[0];
            for (int k = 0; k < n; k++) { // on, just below and just above every node
                for (double q : new double[] {a[k], Math.nextDown(a[k]), Math.nextUp(a[k])}) {
                    assertEquals(OpacityGrid.interval(a, q), OpacityGrid.locate(a, inv, q), "q = " + q);
                }
            }
            for (int k = 0; k < 20000; k++) { // inside, and outside as extrapolation asks
                double q = a[0] + span * rnd.nextDouble(-0.5, 1.5);
                assertEquals(OpacityGrid.interval(a, q), OpacityGrid.locate(a, inv, q), "q = " + q);
            }
            for (double q : new double[] {-1e300, 1e300, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY}) {
                assertEquals(OpacityGrid.interval(a, q), OpacityGrid.locate(a, inv, q), "q = " + q);
            }
        }
    }
}
