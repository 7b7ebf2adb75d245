package io.github.startransport.core.convection;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.opentest4j.AssertionFailedError;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * The Newton iteration of the mixing-length cubic a0 Gamma^3 + Gamma^2 + Gamma = S is bounded: over
 * a dense log grid of a0 and S far beyond any physical zone (a0 from 1e-100 to 1e3, S from 1e-300 to
 * 1e100, where a0 Gamma^3 stays inside double range), the root after {@link #BOUND} steps is already
 * the root after {@link MixingLengthCubic#MAX_STEPS}, and that root is a finite positive number that
 * satisfies the cubic to rounding. The start is an upper bound within a factor 3 of the root (see the
 * class comment), so Newton on the convex cubic needs few steps (common practice, no source).
 *
 * <p>Every root is checked by {@link #assertRoot} before anything else is done with it, so a NaN, an
 * infinity, zero or a negative result fails the test at once instead of hanging the step count.
 */
class CubicIterationBoundTest {
    static final int BOUND = 10;

    /**
     * The root of the cubic for S &gt; 0 and a0 &gt; 0: the cubic's left side is 0 at Gamma = 0 and
     * increases without bound for Gamma &gt; 0, so there is exactly one root and it is finite and
     * positive; it satisfies the equation to rounding relative to its largest term (S).
     */
    static void assertRoot(double a0, double s, double root) {
        // the residual relative to S, written so that it cannot overflow near the largest double
        double residual = ((a0 * root + 1.0) * root + 1.0) * (root / s) - 1.0;
        if (!Double.isFinite(root) || !(root > 0.0) || !(Math.abs(residual) <= 1e-12)) {
            fail("not a finite positive root: a0 = " + a0 + ", S = " + s + ", Gamma = " + root + ", residual "
                    + residual);
        }
    }

    @Tag("law")
    @Test
    void everyRootOnTheGridIsFinitePositiveAndSolvesTheCubic() {
        int checked = 0;
        for (double la0 = -100; la0 <= 3; la0 += 0.137) {
            for (double ls = -300; ls <= 100; ls += 0.213) {
                double a0 = Math.pow(10, la0);
                double s = Math.pow(10, ls);
                assertRoot(a0, s, MixingLengthCubic.efficiency(a0, s));
                checked++;
            }
        }
        // both ends of the zone's range of S (a normal double up to the largest one) and below it (subnormal),
        // with a0 far beyond the grid on both sides (a tiny a0 is an optically very thin eddy)
        for (double a0 : new double[] {1e-300, 1e-100, 1e-30, 1e-3, 0.25, 2.25, 1e3, 1e30, 1e100, 1e300}) {
            for (double s : new double[] {Double.MIN_NORMAL, Double.MIN_VALUE, 1e-310, 1e150, 1e200, 1e300,
                Double.MAX_VALUE}) {
                assertRoot(a0, s, MixingLengthCubic.efficiency(a0, s));
                checked++;
            }
        }
        assertTrue(checked > 1_000_000, "grid of " + checked);
    }

    @Tag("internal")
    @Test
    void newtonConvergesWithinTheBoundOnTheWorstInputs() {
        int worst = 0;
        double worstA0 = 0;
        double worstS = 0;
        for (double la0 = -100; la0 <= 3; la0 += 0.137) {
            for (double ls = -300; ls <= 100; ls += 0.213) {
                double a0 = Math.pow(10, la0);
                double s = Math.pow(10, ls);
                double root = MixingLengthCubic.efficiency(a0, s, MixingLengthCubic.MAX_STEPS);
                assertRoot(a0, s, root);
                int steps = 0;
                while (steps <= MixingLengthCubic.MAX_STEPS && Double.doubleToRawLongBits(
                        MixingLengthCubic.efficiency(a0, s, steps)) != Double.doubleToRawLongBits(root)) {
                    steps++;
                }
                if (steps > worst) {
                    worst = steps;
                    worstA0 = a0;
                    worstS = s;
                }
            }
        }
        System.out.printf("mixing-length cubic: worst case %d Newton steps (a0 = %.3g, S = %.3g), bound %d%n",
                worst, worstA0, worstS, BOUND);
        assertTrue(worst <= BOUND, "worst " + worst + " steps at a0 = " + worstA0 + ", S = " + worstS);
    }

    /** The check above is not vacuous: NaN, infinities, zero, a negative or a wrong root fail it. */
    @Tag("internal")
    @Test
    void theRootCheckFailsOnNaNInfinityANegativeOrAWrongRoot() {
        double a0 = 2.25;
        double s = 1.0;
        for (double bad : new double[] {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 0.0, -0.5,
            -MixingLengthCubic.efficiency(a0, s), 1.001 * MixingLengthCubic.efficiency(a0, s)}) {
            assertThrows(AssertionFailedError.class, () -> assertRoot(a0, s, bad), "accepted " + bad);
        }
        assertRoot(a0, s, MixingLengthCubic.efficiency(a0, s));
    }

    /**
     * Documented: an infinite S gives an infinite root; the largest double gives the finite root
     * Gamma ~ (S / a0)^(1/3) of the cubic-dominated equation.
     */
    @Tag("law")
    @Test
    void infiniteAndLargestSGiveTheirRoots() {
        assertEquals(Double.POSITIVE_INFINITY, MixingLengthCubic.efficiency(2.25, Double.POSITIVE_INFINITY));
        double big = MixingLengthCubic.efficiency(2.25, Double.MAX_VALUE);
        assertRoot(2.25, Double.MAX_VALUE, big);
        assertEquals(Math.cbrt(Double.MAX_VALUE / 2.25), big, 1e-6 * big);
    }

    /** Documented: S &lt;= 0 has no positive root and gives 0 at once (a NaN S too: not &gt; 0). */
    @Tag("internal")
    @Test
    void nonPositiveSGivesZero() {
        assertEquals(0.0, MixingLengthCubic.efficiency(2.25, 0.0));
        assertEquals(0.0, MixingLengthCubic.efficiency(2.25, -0.0));
        assertEquals(0.0, MixingLengthCubic.efficiency(2.25, -1.0));
        assertEquals(0.0, MixingLengthCubic.efficiency(2.25, Double.NEGATIVE_INFINITY));
        assertEquals(0.0, MixingLengthCubic.efficiency(2.25, Double.NaN));
    }
}
