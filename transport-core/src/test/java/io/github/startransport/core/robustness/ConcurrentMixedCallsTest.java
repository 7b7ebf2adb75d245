package io.github.startransport.core.robustness;

import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.convection.TransparentEddyMixingLength;
import io.github.startransport.core.gradient.GradientStability;
import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.core.opacity.DemoTable;
import io.github.startransport.core.opacity.TabulatedOpacity;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OutOfRangePolicy;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Stress: 8 threads share one instance of each model and make 10^6 mixed calls in total
 * (convection with and without Jacobian, both variants, stability, analytic and tabulated opacity),
 * each thread in its own order; every result is bit-identical to a serial run.
 */
class ConcurrentMixedCallsTest {
    private static final int THREADS = 8;
    private static final int CALLS = 1_000_000;
    private static final int KINDS = 6;

    private static final LocalMixingLength LOCAL = new LocalMixingLength();
    private static final TransparentEddyMixingLength TRANSPARENT = new TransparentEddyMixingLength();
    private static final GradientStability STABILITY = new GradientStability(Criterion.LEDOUX);
    private static final TabulatedOpacity TABLE = new TabulatedOpacity(DemoTable.set(), OutOfRangePolicy.CLAMP);

    /** One call of the given kind on zone k, folded into a 64-bit fingerprint of every output bit. */
    private static long call(int kind, ZoneColumns in, int k, ZoneState z, ConvectionResult c, StabilityResult s,
                             OpacityResult o) {
        in.load(k, z);
        long h = kind;
        switch (kind) {
            case 0, 1, 2 -> {
                if (kind == 0) {
                    LOCAL.solve(z, c);
                } else if (kind == 1) {
                    LOCAL.solveValues(z, c);
                } else {
                    TRANSPARENT.solve(z, c);
                }
                h = mix(h, c.nabla, c.velocity, c.diffusion, c.convectiveFraction);
                if (kind != 1) {
                    for (int i = 0; i < c.dNabla.length; i++) {
                        h = mix(h, c.dNabla[i], c.dVelocity[i], c.dDiffusion[i], c.dConvectiveFraction[i]);
                    }
                }
                h = 31 * h + c.regime.ordinal();
            }
            case 3 -> {
                STABILITY.evaluate(z, s);
                h = mix(h, s.nablaRad, s.nablaLedoux, s.dNablaRad[0], s.dNablaLedoux[9]);
                h = 31 * h + s.regime.ordinal();
            }
            case 4 -> {
                AnalyticOpacity.DEFAULT.evaluate(z.temperature, z.density, z.hydrogen, z.metals, k, o);
                h = mix(h, o.kappa, o.dLnKappaDLnRho, o.dLnKappaDLnT, 0.0);
            }
            default -> {
                TABLE.evaluate(z.temperature, z.density, z.hydrogen, z.metals, k, o);
                h = mix(h, o.kappa, o.dLnKappaDLnRho, o.dLnKappaDLnT, o.status.ordinal());
            }
        }
        return h;
    }

    private static long mix(long h, double a, double b, double c, double d) {
        h = h * 1_000_003L + Double.doubleToRawLongBits(a);
        h = h * 1_000_003L + Double.doubleToRawLongBits(b);
        h = h * 1_000_003L + Double.doubleToRawLongBits(c);
        return h * 1_000_003L + Double.doubleToRawLongBits(d);
    }

    @Tag("internal")
    @Test
    @Timeout(120)
    void eightThreadsMatchASerialRunBitForBit() throws Exception {
        ZoneColumns in = BatchColumns.demo();
        int n = in.capacity;
        long[] serial = new long[KINDS * n];
        ZoneState z = new ZoneState();
        ConvectionResult c = new ConvectionResult();
        StabilityResult s = new StabilityResult();
        OpacityResult o = new OpacityResult();
        for (int kind = 0; kind < KINDS; kind++) {
            for (int k = 0; k < n; k++) {
                serial[kind * n + k] = call(kind, in, k, z, c, s, o);
            }
        }
        ExecutorService pool = Executors.newFixedThreadPool(THREADS);
        try {
            List<Future<long[]>> futures = new ArrayList<>();
            for (int t = 0; t < THREADS; t++) {
                final long stride = 2 * t + 1; // odd, so each thread visits every (kind, zone) in its own order
                futures.add(pool.submit(() -> {
                    long[] mismatches = new long[2];
                    ZoneState zz = new ZoneState();
                    ConvectionResult cc = new ConvectionResult();
                    StabilityResult ss = new StabilityResult();
                    OpacityResult oo = new OpacityResult();
                    int cells = KINDS * n;
                    for (int q = 0; q < CALLS / THREADS; q++) {
                        int cell = (int) ((q * stride * 7919L) % cells);
                        long h = call(cell / n, in, cell % n, zz, cc, ss, oo);
                        if (h != serial[cell]) {
                            mismatches[0]++;
                            mismatches[1] = cell;
                        }
                    }
                    return mismatches;
                }));
            }
            for (Future<long[]> f : futures) {
                long[] m = f.get();
                assertEquals(0L, m[0], "mismatches; the last in cell " + m[1]);
            }
            assertEquals(THREADS, futures.size());
        } finally {
            pool.shutdownNow();
        }
    }
}
