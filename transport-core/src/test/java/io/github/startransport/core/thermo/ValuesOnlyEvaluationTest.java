package io.github.startransport.core.thermo;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ThermodynamicsModel;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * The values-only call of each equation of state that overrides it ({@link ThermodynamicsModel#evaluateValues}):
 * every scalar output bit for bit as {@link ThermodynamicsModel#evaluate} gives it, the same inputs refused
 * with the same message, and the derivative work really skipped where the models say so.
 */
class ValuesOnlyEvaluationTest {
    private static final List<ThermodynamicsModel> MODELS = List.of(IonisingGas.INSTANCE, IdealGasRadiation.INSTANCE);

    /** The scalar outputs of a result, in a fixed order, as raw bits. */
    private static long[] scalarBits(ThermoResult r) {
        double[] v = {r.mu, r.beta, r.pressure, r.nablaAd, r.cp, r.delta, r.phi, r.gamma1, r.cv, r.chiT, r.chiRho,
                r.freeElectrons, r.degeneracy, r.pressureIonisation};
        long[] bits = new long[v.length];
        for (int i = 0; i < v.length; i++) {
            bits[i] = Double.doubleToRawLongBits(v[i]);
        }
        return bits;
    }

    private static final String[] NAMES = {"mu", "beta", "pressure", "nablaAd", "cp", "delta", "phi", "gamma1", "cv",
            "chiT", "chiRho", "freeElectrons", "degeneracy", "pressureIonisation"};

    /** Every derivative entry set to NaN, so that a later check sees whether a call wrote any. */
    private static void poisonDerivatives(ThermoResult r) {
        for (double[] d : derivatives(r)) {
            java.util.Arrays.fill(d, Double.NaN);
        }
    }

    private static double[][] derivatives(ThermoResult r) {
        return new double[][] {r.dPressure, r.dNablaAd, r.dCp, r.dDelta, r.dPhi, r.dGamma1, r.dMu};
    }

    /**
     * Both calls on one state: either both refuse it with the same exception (field, value, zone and
     * message), or both accept it and agree bit for bit in every scalar output.
     *
     * @return the values-only result, or null when both refused
     */
    private static ThermoResult agree(ThermodynamicsModel m, double t, double rho, double x, double z, int zone) {
        ThermoResult full = new ThermoResult();
        ThermoResult values = new ThermoResult();
        poisonDerivatives(values);
        String where = m + " at T = " + t + " K, rho = " + rho + " g cm^-3, X = " + x + ", Z = " + z;
        InvalidInputException fullRefusal = null;
        InvalidInputException valuesRefusal = null;
        try {
            m.evaluate(t, rho, x, z, zone, full);
        } catch (InvalidInputException e) {
            fullRefusal = e;
        }
        try {
            m.evaluateValues(t, rho, x, z, zone, values);
        } catch (InvalidInputException e) {
            valuesRefusal = e;
        }
        if (fullRefusal != null || valuesRefusal != null) {
            if (fullRefusal == null || valuesRefusal == null) {
                fail(where + ": only one call refused: evaluate " + fullRefusal + ", evaluateValues " + valuesRefusal);
            }
            assertEquals(fullRefusal.getMessage(), valuesRefusal.getMessage(), where);
            assertEquals(fullRefusal.field(), valuesRefusal.field(), where);
            assertEquals(Double.doubleToRawLongBits(fullRefusal.value()), Double.doubleToRawLongBits(valuesRefusal.value()),
                    where);
            assertEquals(fullRefusal.zone(), valuesRefusal.zone(), where);
            return null;
        }
        long[] a = scalarBits(full);
        long[] b = scalarBits(values);
        for (int i = 0; i < a.length; i++) {
            if (a[i] != b[i]) {
                fail(where + ": " + NAMES[i] + " is " + Double.longBitsToDouble(a[i]) + " from evaluate but "
                        + Double.longBitsToDouble(b[i]) + " from evaluateValues");
            }
        }
        return values;
    }

    private static boolean derivativesUntouched(ThermoResult r) {
        for (double[] d : derivatives(r)) {
            for (double v : d) {
                if (!Double.isNaN(v)) {
                    return false;
                }
            }
        }
        return true;
    }

    /**
     * Bit-identical values over the states of stars and beyond (T 1e2 to 1e10 K, rho 1e-12 to 1e6 g cm^-3, any
     * valid composition), and no derivative written: the values-only path ran, not a call of evaluate
     * (common practice, no source).
     */
    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 3000, seed = "7101")
    void valuesAreBitIdenticalToEvaluate(@ForAll @Scale(12) @DoubleRange(min = 2, max = 10) double logT,
                                         @ForAll @Scale(12) @DoubleRange(min = -12, max = 6) double logRho,
                                         @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double xFrac,
                                         @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double zDrawn) {
        double x = xFrac * (1 - zDrawn);
        double z = Math.min(zDrawn, 1 - x);   // X + Z <= 1 as the models check it, after rounding
        double t = Math.pow(10, logT);
        double rho = Math.pow(10, logRho);
        for (ThermodynamicsModel m : MODELS) {
            ThermoResult values = agree(m, t, rho, x, z, 17);
            assertTrue(values != null, m + " refused T = " + t + ", rho = " + rho + ", X = " + x + ", Z = " + z);
            assertTrue(derivativesUntouched(values), m + " wrote derivatives at T = " + t + ", rho = " + rho);
        }
    }

    /**
     * The same over the whole range where the models skip the derivatives (1 to 1e11 K, 1e-20 to 1e10 g cm^-3,
     * with its corners, which jqwik draws as edge cases), and on either side of it, where they call evaluate:
     * every state accepted inside is accepted by both calls (common practice, no source).
     */
    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 3000, seed = "7102")
    void valuesAreBitIdenticalAcrossTheValuesOnlyRange(
            @ForAll @Scale(12) @DoubleRange(min = -2, max = 13) double logT,
            @ForAll @Scale(12) @DoubleRange(min = -23, max = 13) double logRho,
            @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double xFrac,
            @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double zDrawn) {
        double x = xFrac * (1 - zDrawn);
        double z = Math.min(zDrawn, 1 - x);   // X + Z <= 1 as the models check it, after rounding
        double t = Math.pow(10, logT);
        double rho = Math.pow(10, logRho);
        boolean inside = t >= 1.0 && t <= 1e11 && rho >= 1e-20 && rho <= 1e10;
        for (ThermodynamicsModel m : MODELS) {
            ThermoResult values = agree(m, t, rho, x, z, 5);
            if (inside) {
                assertTrue(values != null, m + " refused T = " + t + ", rho = " + rho);
                assertTrue(derivativesUntouched(values), m + " wrote derivatives at T = " + t + ", rho = " + rho);
            }
        }
    }

    /** Temperatures or densities of every kind: ordinary, extreme, zero, negative, NaN, infinite. */
    @Provide
    Arbitrary<Double> anyPositiveScale() {
        return Arbitraries.frequencyOf(
                net.jqwik.api.Tuple.of(6, Arbitraries.doubles().between(-60, 60).map(e -> Math.pow(10, e))),
                net.jqwik.api.Tuple.of(1, Arbitraries.doubles().between(-60, 60).map(e -> -Math.pow(10, e))),
                net.jqwik.api.Tuple.of(1, Arbitraries.of(0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY,
                        Double.NEGATIVE_INFINITY, Double.MIN_VALUE, Double.MAX_VALUE)));
    }

    /** Mass fractions, valid or not: mostly in [0, 1], some outside it, some NaN. */
    @Provide
    Arbitrary<Double> anyFraction() {
        return Arbitraries.frequencyOf(
                net.jqwik.api.Tuple.of(8, Arbitraries.doubles().between(0, 1)),
                net.jqwik.api.Tuple.of(1, Arbitraries.doubles().between(-0.5, 1.5)),
                net.jqwik.api.Tuple.of(1, Arbitraries.of(Double.NaN, -1e-300, 1.0 + 1e-15)));
    }

    /**
     * Any inputs at all, many refused (by the checks of the inputs, or because the outputs leave double precision):
     * both calls refuse the same ones with the same message, and agree bit for bit on the rest (common practice,
     * no source).
     */
    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 5000, seed = "7103")
    void refusalsAreTheSame(@ForAll("anyPositiveScale") double t, @ForAll("anyPositiveScale") double rho,
                            @ForAll("anyFraction") double x, @ForAll("anyFraction") double z) {
        for (ThermodynamicsModel m : MODELS) {
            agree(m, t, rho, x, z, 9);
        }
    }

    /**
     * One state of each kind of refusal, inside and outside the values-only range, so that each is seen to be
     * refused by both calls alike (common practice, no source).
     */
    @Tag(CheckKind.INTERNAL)
    @Test
    void eachKindOfRefusalIsTheSame() {
        ThermoResult probeValues = new ThermoResult();
        double[][] refused = {
                {-5e3, 1e-3, 0.7, 0.02},          // temperature not > 0
                {Double.NaN, 1e-3, 0.7, 0.02},
                {5e3, 0.0, 0.7, 0.02},            // density not > 0
                {5e3, Double.POSITIVE_INFINITY, 0.7, 0.02},
                {5e3, 1e-3, 1.2, 0.0},            // X outside [0, 1], inside the values-only range
                {5e3, 1e-3, 0.7, 0.4},            // X + Z > 1
                {1e15, 1e-3, -0.1, 0.0},          // X outside [0, 1], outside the values-only range
                {1e80, 1e-3, 0.7, 0.02},          // radiation pressure beyond double precision
        };
        // refused for a derivative alone: radiation dominates so far (beta ~ 1e-100 and below) that c_P ~ 1e209 to
        // 1e230 is finite but d c_P / d rho ~ c_P / rho is not; each call must still refuse it (outside the
        // values-only range, where evaluateValues defers to evaluate)
        SahaIonisation.evaluateValues(3.2e17, 1e-80, 0.7, 0.02, probeValues);
        assertTrue(Double.isFinite(probeValues.cp) && Double.isFinite(probeValues.cv), probeValues.toString());
        double[][] derivativeOnly = {{3.2e17, 1e-80, 0.7, 0.02}, {1.8e14, 1e-80, 0.7, 0.02}};
        for (int i = 0; i < MODELS.size(); i++) {
            ThermodynamicsModel m = MODELS.get(i);
            double[] s = derivativeOnly[i];
            assertThrows(InvalidInputException.class, () -> m.evaluate(s[0], s[1], s[2], s[3], 4, new ThermoResult()),
                    m + " " + java.util.Arrays.toString(s));
            assertEquals(null, agree(m, s[0], s[1], s[2], s[3], 4), m + " " + java.util.Arrays.toString(s));
        }
        for (ThermodynamicsModel m : MODELS) {
            for (double[] s : refused) {
                assertThrows(InvalidInputException.class, () -> m.evaluate(s[0], s[1], s[2], s[3], 4, new ThermoResult()),
                        m + " " + java.util.Arrays.toString(s));
                assertEquals(null, agree(m, s[0], s[1], s[2], s[3], 4), m + " " + java.util.Arrays.toString(s));
            }
        }
    }

    /**
     * No state is kept between calls: eight threads, each with its own result and its own order of the zones,
     * get every value of the values-only call bit for bit as evaluate gives it on one thread (common practice,
     * no source).
     */
    @Tag(CheckKind.INTERNAL)
    @Test
    void threadsGiveTheSameValues() throws Exception {
        int n = 4000;
        double[] t = new double[n];
        double[] rho = new double[n];
        SplittableRandom rnd = new SplittableRandom(7104);
        for (int i = 0; i < n; i++) {
            t[i] = Math.pow(10, rnd.nextDouble(3.5, 9));
            rho[i] = Math.pow(10, rnd.nextDouble(-11, 4));
        }
        for (ThermodynamicsModel m : MODELS) {
            long[][] expected = new long[n][];
            ThermoResult r = new ThermoResult();
            for (int i = 0; i < n; i++) {
                m.evaluate(t[i], rho[i], 0.7, 0.02, i, r);
                expected[i] = scalarBits(r);
            }
            ExecutorService pool = Executors.newFixedThreadPool(8);
            try {
                List<Future<Integer>> done = new ArrayList<>();
                for (int thread = 0; thread < 8; thread++) {
                    int offset = thread * 97;
                    done.add(pool.submit(() -> {
                        ThermoResult mine = new ThermoResult();
                        int same = 0;
                        for (int j = 0; j < n; j++) {
                            int i = (j + offset) % n;
                            m.evaluateValues(t[i], rho[i], 0.7, 0.02, i, mine);
                            same += java.util.Arrays.equals(expected[i], scalarBits(mine)) ? 1 : 0;
                        }
                        return same;
                    }));
                }
                for (Future<Integer> f : done) {
                    assertEquals(n, f.get(), m + ": zones bit-identical to evaluate on one thread");
                }
            } finally {
                pool.shutdownNow();
            }
        }
    }
}
