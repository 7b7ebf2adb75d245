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
import net.jqwik.api.Tuple;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import net.jqwik.api.statistics.Statistics;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Garbage profiles: the only allowed outcomes are a valid profile (every value finite and in its
 * domain, r and m strictly increasing) or our own {@link InvalidInputException} with a message, and
 * which of the two is prescribed by the spoil (see the property). The shares of accepted and refused
 * profiles and of each spoil are printed and checked.
 */
class ProfileFuzzTest {

    @Provide
    Arbitrary<Double> cell() {
        return Arbitraries.frequencyOf(
                Tuple.of(6, Arbitraries.doubles().between(1e-3, 1e3).ofScale(6)),
                Tuple.of(1, Arbitraries.of(Double.NaN, Double.POSITIVE_INFINITY,
                        Double.NEGATIVE_INFINITY, 0.0, -0.0, -1.0, Double.MIN_VALUE, Double.MAX_VALUE, 1.0, 0.5)),
                Tuple.of(1, Arbitraries.doubles().between(-1e40, 1e40).ofScale(3)));
    }

    /** What is done to a valid profile before it is handed over. */
    enum Spoil { NONE, CELL, DROP_COLUMN, SHORT_COLUMN, DUPLICATE_ZONE, SWAP_ZONES, REVERSED }

    /** A valid profile of n zones, centre first: every column in its domain, r and m increasing, X + Z &lt; 1. */
    private static Map<ProfileColumn, double[]> valid(int n, double scale, int optional) {
        Map<ProfileColumn, double[]> cols = new EnumMap<>(ProfileColumn.class);
        int bit = 0;
        for (ProfileColumn col : ProfileColumn.values()) {
            if (!col.required() && (optional & (1 << bit++)) == 0) {
                continue;
            }
            double[] v = new double[n];
            for (int k = 0; k < n; k++) {
                v[k] = switch (col) {
                    case RADIUS, MASS -> scale * (k + 1);
                    case HYDROGEN -> 0.7 - 0.01 * k;
                    case METALS -> 0.02;
                    case NABLA_AD -> 0.4;
                    case NABLA_MU -> 0.01 * (k - 2);
                    case LUMINOSITY -> 3.8e33 * (k + 1) / n;
                    default -> 1.0e3 * scale / (k + 1);
                };
            }
            cols.put(col, v);
        }
        return cols;
    }

    /**
     * Whether a value belongs to its column, as the {@link Profile} contract states the domains: L and
     * nabla_mu finite, X and Z inside [0, 1], nabla_ad inside (0, 1), everything else finite and &gt; 0.
     */
    private static boolean inDomain(ProfileColumn col, double v) {
        return switch (col) {
            case LUMINOSITY, NABLA_MU -> Double.isFinite(v);
            case HYDROGEN, METALS -> v >= 0.0 && v <= 1.0;
            case NABLA_AD -> v > 0.0 && v < 1.0;
            default -> v > 0.0 && Double.isFinite(v);
        };
    }

    /**
     * A valid profile with one spoil. The outcome the contract prescribes is worked out here from the
     * spoil: a valid or reversed profile must be accepted whole; a dropped required column, a short
     * column, a duplicate zone or two swapped zones of r or m must be refused; a garbage cell must be
     * refused exactly when it leaves its column's domain, makes X + Z exceed 1, or breaks the order of
     * r or m, naming its column and its zone as given.
     */
    @Tag("internal")
    @Property(tries = 2000, seed = "701")
    void garbageIsRefusedWithOurExceptionOrAcceptedWhole(@ForAll @IntRange(min = 3, max = 12) int n,
                                                         @ForAll Spoil spoil, @ForAll("cell") double garbage,
                                                         @ForAll @IntRange(min = 0, max = 14) int column,
                                                         @ForAll @IntRange(min = 0, max = 11) int at,
                                                         @ForAll @IntRange(min = 0, max = 127) int optional,
                                                         @ForAll @Scale(3) @DoubleRange(min = 0.1, max = 1e3) double scale) {
        Map<ProfileColumn, double[]> cols = valid(n, scale, optional);
        List<ProfileColumn> present = new ArrayList<>(cols.keySet());
        ProfileColumn col = present.get(column % present.size());
        int k = at % n;
        boolean accept;
        String field = null;
        int zone = InvalidInputException.NO_ZONE;
        switch (spoil) {
            case NONE -> accept = true;
            case REVERSED -> {
                for (double[] v : cols.values()) {
                    for (int i = 0, j = n - 1; i < j; i++, j--) {
                        double t = v[i];
                        v[i] = v[j];
                        v[j] = t;
                    }
                }
                accept = true;
            }
            case DROP_COLUMN -> {
                cols.remove(col);
                accept = !col.required();
                field = col.header();
            }
            case SHORT_COLUMN -> {
                cols.put(col, java.util.Arrays.copyOf(cols.get(col), n - 1));
                accept = false;
            }
            case DUPLICATE_ZONE, SWAP_ZONES -> {
                ProfileColumn axis = at % 2 == 0 ? ProfileColumn.RADIUS : ProfileColumn.MASS;
                double[] v = cols.get(axis);
                int j = Math.max(1, k);
                if (spoil == Spoil.DUPLICATE_ZONE) {
                    v[j] = v[j - 1];
                } else {
                    double t = v[j];
                    v[j] = v[j - 1];
                    v[j - 1] = t;
                }
                accept = false;
                field = axis.header();
            }
            default -> {
                double[] v = cols.get(col);
                v[k] = garbage;
                boolean ordered = true;
                if (col == ProfileColumn.RADIUS || col == ProfileColumn.MASS) {
                    for (int i = 1; i < n; i++) {
                        ordered &= v[i] > v[i - 1];
                    }
                    // a garbage first or last value may turn the order around: then the reversed order must hold
                    boolean reversedOrder = v[n - 1] < v[0];
                    if (reversedOrder) {
                        ordered = false;
                    }
                }
                double x = cols.get(ProfileColumn.HYDROGEN)[k];
                double z = cols.get(ProfileColumn.METALS)[k];
                boolean composition = !(col == ProfileColumn.HYDROGEN || col == ProfileColumn.METALS)
                        || !(x + z > 1.0 + 1e-12);
                accept = inDomain(col, garbage) && composition && ordered;
                if (!inDomain(col, garbage)) {
                    field = col.header();
                    zone = k;
                } else if (!composition) {
                    field = ProfileColumn.METALS.header(); // X + Z > 1 is reported on Z
                    zone = k;
                }
            }
        }
        Statistics.label("outcome").collect(accept ? "accepted" : "refused");
        Statistics.label("spoil").collect(spoil);
        Statistics.label("outcome").coverage(c -> {
            c.check("accepted").percentage(p -> p >= 25.0);
            c.check("refused").percentage(p -> p >= 25.0);
        });
        Statistics.label("spoil").coverage(c -> {
            for (Spoil each : Spoil.values()) {
                c.check(each).count(count -> count >= 100);
            }
        });
        try {
            Profile p = new Profile("fuzz", cols);
            assertTrue(accept, spoil + " of " + col + " at zone " + k + " = " + garbage + " was accepted");
            // accepted: it must be whole and valid, centre first
            assertEquals(n, p.size());
            assertEquals(spoil == Spoil.REVERSED, p.wasReversed());
            double[] r = p.column(ProfileColumn.RADIUS);
            double[] m = p.column(ProfileColumn.MASS);
            for (int i = 1; i < p.size(); i++) {
                assertTrue(r[i] > r[i - 1] && m[i] > m[i - 1]);
            }
            for (ProfileColumn c : ProfileColumn.values()) {
                assertEquals(cols.containsKey(c), p.has(c), c.header());
                if (p.has(c)) {
                    for (double x : p.column(c)) {
                        assertTrue(inDomain(c, x), c + " holds " + x);
                    }
                }
            }
        } catch (InvalidInputException e) {
            assertTrue(!accept, spoil + " of " + col + " at zone " + k + " was refused: " + e.getMessage());
            assertTrue(e.getMessage() != null && !e.getMessage().isBlank());
            assertTrue(e.field() != null && !e.field().isBlank());
            if (field != null) {
                assertEquals(field, e.field(), e.getMessage());
            }
            if (zone != InvalidInputException.NO_ZONE) {
                assertEquals(zone, e.zone(), e.getMessage());
            }
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
