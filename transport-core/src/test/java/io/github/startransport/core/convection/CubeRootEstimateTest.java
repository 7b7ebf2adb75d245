package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The bit-level cube-root estimate that starts the cubic's iteration, against the JDK's
 * Math.cbrt: within [0.9689, 1.0321] of the cube root, and above it once lifted, so that the start
 * stays an upper bound on the root (common practice, no source).
 */
class CubeRootEstimateTest {

    private static void check(double x) {
        double exact = Math.cbrt(x);
        double ratio = MixingLengthCubic.cubeRootEstimate(x) / exact;
        assertTrue(ratio >= 0.9689 && ratio <= 1.0321, "x = " + x + ", ratio " + ratio);
        assertTrue(MixingLengthCubic.CBRT_LIFT * MixingLengthCubic.cubeRootEstimate(x) >= exact, "x = " + x);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void withinItsBoundsOverOnePeriodOfTheExponent() {
        for (double x = 1.0; x < 8.0; x += 1e-5) {
            check(x);
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void withinItsBoundsAcrossTheNormalRange() {
        for (double e = -300; e <= 300; e += 0.0137) {
            check(Math.pow(10.0, e));
        }
        check(Double.MIN_NORMAL);
        check(Double.MAX_VALUE);
    }
}
