package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The Newton iteration of the mixing-length cubic is bounded: over a dense log grid of a0 and S far
 * beyond any physical zone (a0 from 1e-100 to 1e3, S from 1e-300 to 1e100, where a0 Gamma^3 stays inside double range),
 * the root after {@link #BOUND} steps is already the root after {@link MixingLengthCubic#MAX_STEPS},
 * and that root satisfies the cubic to rounding. The start is an upper bound within a factor 3 of the
 * root (see the class comment), so Newton on the convex cubic needs few steps (common practice, no source).
 */
class CubicIterationBoundTest {
    static final int BOUND = 10;

    @Tag(CheckKind.INTERNAL)
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
                // a NaN, infinite or non-positive root fails here, before the step count is looked at
                assertTrue(root > 0.0 && Double.isFinite(root), "a0 = " + a0 + ", S = " + s + ": Gamma = " + root);
                int steps = 0;
                while (steps < MixingLengthCubic.MAX_STEPS
                        && Double.doubleToRawLongBits(MixingLengthCubic.efficiency(a0, s, steps))
                        != Double.doubleToRawLongBits(root)) {
                    steps++;
                }
                if (steps > worst) {
                    worst = steps;
                    worstA0 = a0;
                    worstS = s;
                }
                // residual relative to the largest term: rounding only
                double scale = Math.max(s, 1.0 * root);
                assertTrue(Math.abs(MixingLengthCubic.residual(a0, s, root)) <= 1e-12 * scale,
                        "a0 = " + a0 + ", S = " + s + ", Gamma = " + root);
            }
        }
        System.out.printf("mixing-length cubic: worst case %d Newton steps (a0 = %.3g, S = %.3g), bound %d%n",
                worst, worstA0, worstS, BOUND);
        assertTrue(worst <= BOUND, "worst " + worst + " steps at a0 = " + worstA0 + ", S = " + worstS);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void specialValuesStopAtOnce() {
        assertEquals(0.0, MixingLengthCubic.efficiency(2.25, 0.0));
        assertEquals(0.0, MixingLengthCubic.efficiency(2.25, -1.0));
        assertEquals(0.0, MixingLengthCubic.efficiency(2.25, Double.NaN));
        // infinite S: the root a0 Gamma^3 + Gamma^2 + Gamma = S is infinite; the loop still ends (at most
        // MAX_STEPS steps) with +infinity or a huge positive value, never NaN, a negative or a small number
        double g = MixingLengthCubic.efficiency(2.25, Double.POSITIVE_INFINITY);
        assertTrue(g > 1e100, "Gamma(S = infinity) = " + g);
        // the largest finite S: Gamma ~ (S / a0)^(1/3), finite and positive
        double big = MixingLengthCubic.efficiency(2.25, Double.MAX_VALUE);
        assertTrue(big > 0.0 && Double.isFinite(big), "Gamma(S = MAX_VALUE) = " + big);
        assertEquals(Math.cbrt(Double.MAX_VALUE / 2.25), big, 1e-6 * big);
    }
}
