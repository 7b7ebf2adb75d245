package io.github.startransport.core.thermo;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The equation of state's own e^x against the JDK's {@link StrictMath#exp} (the fdlibm algorithm,
 * an independent implementation with an error below one ulp): at most one ulp apart everywhere,
 * and the special values and range ends the same.
 */
class ExponentialTest {

    private static double ulps(double ours, double reference) {
        return Math.abs(ours - reference) / Math.ulp(reference);
    }

    @Tag("external")
    @Test
    void withinOneUlpOfStrictMathOverTheWholeRange() {
        SplittableRandom random = new SplittableRandom(1989);
        double worst = 0.0;
        double worstAt = Double.NaN;
        for (int i = 0; i < 2_000_000; i++) {
            double x = switch (i % 4) {
                case 0 -> random.nextDouble(-745.2, 709.8);
                case 1 -> random.nextDouble(-1.0, 1.0);
                case 2 -> random.nextDouble(-1e-3, 1e-3);
                default -> -Math.pow(10, random.nextDouble(-8, 2.6)); // the Saha ratios' arguments: -theta / T + ...
            };
            double u = ulps(Exponential.exp(x), StrictMath.exp(x));
            if (u > worst) {
                worst = u;
                worstAt = x;
            }
        }
        assertTrue(worst <= 1.0, "largest difference " + worst + " ulp at x = " + worstAt);
    }

    @Tag("external")
    @Test
    void exactPointsSpecialValuesAndTheEndsOfTheRange() {
        assertEquals(1.0, Exponential.exp(0.0));
        assertEquals(1.0, Exponential.exp(-0.0));
        // multiples of ln 2 / 64 land on the table; e^(j ln 2) = 2^j to within an ulp
        for (int j = -1000; j <= 1000; j += 37) {
            double x = j * Math.log(2.0);
            assertTrue(ulps(Exponential.exp(x), StrictMath.exp(x)) <= 1.0, "x = " + x);
        }
        for (double x : new double[] {-708.0, Math.nextDown(-708.0), -707.9, 708.9, Math.nextDown(709.0), 709.0, 709.7,
            -745.0, -746.0, 710.0, 1e300, -1e300}) {
            double reference = StrictMath.exp(x);
            double ours = Exponential.exp(x);
            if (reference == 0.0 || Double.isInfinite(reference)) {
                assertEquals(reference, ours, "x = " + x);
            } else {
                assertTrue(ulps(ours, reference) <= 1.0, "x = " + x + ": " + ours + " against " + reference);
            }
        }
        assertEquals(Double.POSITIVE_INFINITY, Exponential.exp(Double.POSITIVE_INFINITY));
        assertEquals(0.0, Exponential.exp(Double.NEGATIVE_INFINITY));
        assertTrue(Double.isNaN(Exponential.exp(Double.NaN)));
    }
}
