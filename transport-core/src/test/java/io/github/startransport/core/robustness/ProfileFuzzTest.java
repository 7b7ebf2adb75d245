package io.github.startransport.core.robustness;

import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.Tag;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.statistics.Statistics;

import java.util.EnumMap;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Garbage profiles: the only allowed outcomes are a valid profile (every value finite and in its
 * domain, r and m strictly increasing) or our own {@link InvalidInputException} with a message.
 */
class ProfileFuzzTest {

    @Provide
    Arbitrary<Double> cell() {
        return Arbitraries.frequencyOf(
                net.jqwik.api.Tuple.of(6, Arbitraries.doubles().between(1e-3, 1e3).ofScale(6)),
                net.jqwik.api.Tuple.of(1, Arbitraries.of(Double.NaN, Double.POSITIVE_INFINITY,
                        Double.NEGATIVE_INFINITY, 0.0, -0.0, -1.0, Double.MIN_VALUE, Double.MAX_VALUE, 1.0, 0.5)),
                net.jqwik.api.Tuple.of(1, Arbitraries.doubles().between(-1e40, 1e40).ofScale(3)));
    }

    @Tag("internal")
    @Property(tries = 2000, seed = "701")
    void garbageIsRefusedWithOurExceptionOrAcceptedWhole(@ForAll @IntRange(min = 0, max = 12) int n,
                                                         @ForAll("cell") double a, @ForAll("cell") double b,
                                                         @ForAll @IntRange(min = 0, max = 1 << 14) int dropMask,
                                                         @ForAll("cell") double c, @ForAll("cell") double d) {
        Map<ProfileColumn, double[]> cols = new EnumMap<>(ProfileColumn.class);
        int i = 0;
        for (ProfileColumn col : ProfileColumn.values()) {
            if ((dropMask & (1 << i++)) != 0 && i % 3 == 0) {
                continue; // drop some columns, required ones included
            }
            double[] v = new double[n];
            for (int k = 0; k < n; k++) {
                // mostly plausible, increasing values with garbage mixed in
                double base = (k + 1) * Math.abs(a) + 1e-3;
                double pick = ((k + i) % 5 == 0) ? c : ((k * 7 + i) % 11 == 0 ? d : base);
                v[k] = (col == ProfileColumn.HYDROGEN || col == ProfileColumn.METALS || col == ProfileColumn.NABLA_AD)
                        ? (pick % 1.0) * 0.4 : pick * (b > 0 ? 1 : -1);
            }
            cols.put(col, v);
        }
        try {
            Profile p = new Profile("fuzz", cols);
            Statistics.collect("accepted");
            // accepted: it must be whole and valid
            double[] r = p.column(ProfileColumn.RADIUS);
            double[] m = p.column(ProfileColumn.MASS);
            for (int k = 1; k < p.size(); k++) {
                assertTrue(r[k] > r[k - 1] && m[k] > m[k - 1]);
            }
            for (ProfileColumn col : ProfileColumn.values()) {
                if (p.has(col)) {
                    for (double x : p.column(col)) {
                        assertTrue(Double.isFinite(x), col + " holds " + x);
                    }
                }
            }
        } catch (InvalidInputException e) {
            Statistics.collect("refused");
            assertTrue(e.getMessage() != null && !e.getMessage().isBlank());
            assertTrue(e.field() != null && !e.field().isBlank());
        }
    }

    @Tag("internal")
    @Property(tries = 200, seed = "702")
    void reversedInputGivesTheSameProfile(@ForAll @IntRange(min = 3, max = 50) int n) {
        Map<ProfileColumn, double[]> out = new EnumMap<>(ProfileColumn.class);
        Map<ProfileColumn, double[]> in = new EnumMap<>(ProfileColumn.class);
        for (ProfileColumn col : ProfileColumn.values()) {
            if (!col.required()) {
                continue;
            }
            double[] v = new double[n];
            for (int k = 0; k < n; k++) {
                v[k] = switch (col) {
                    case HYDROGEN -> 0.7;
                    case METALS -> 0.02;
                    case RADIUS, MASS -> k + 1.0;
                    default -> 100.0 - k;
                };
            }
            double[] rev = new double[n];
            for (int k = 0; k < n; k++) {
                rev[k] = v[n - 1 - k];
            }
            out.put(col, v);
            in.put(col, rev);
        }
        Profile forward = new Profile("a", out);
        Profile backward = new Profile("b", in);
        assertTrue(backward.wasReversed());
        assertTrue(forward.sameData(backward));
        assertEquals(n, backward.size());
    }
}
