package io.github.startransport.core.gradient;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** One shared model instance used from 8 threads gives bit-identical results to a serial run. */
class ConcurrentStabilityTest {

    @Tag(CheckKind.INTERNAL)
    @Test
    void sharedModelIsThreadSafe() throws Exception {
        GradientStability model = new GradientStability(Criterion.LEDOUX);
        int n = 20_000;
        ZoneState[] zones = new ZoneState[n];
        SplittableRandom rnd = new SplittableRandom(7);
        for (int i = 0; i < n; i++) {
            double beta = rnd.nextDouble(0.05, 1.0);
            zones[i] = GradientStabilityTest.zone(rnd.nextDouble(-0.5, 2.0), GasRadiation.nablaAd(beta),
                    rnd.nextDouble(-0.2, 0.5));
            zones[i].delta = GasRadiation.delta(beta);
        }
        long[] serial = new long[n * 3];
        StabilityResult r = new StabilityResult();
        for (int i = 0; i < n; i++) {
            model.evaluate(zones[i], r);
            serial[3 * i] = Double.doubleToRawLongBits(r.nablaRad);
            serial[3 * i + 1] = Double.doubleToRawLongBits(r.dNablaRad[0]);
            serial[3 * i + 2] = r.regime.ordinal();
        }
        ExecutorService pool = Executors.newFixedThreadPool(8);
        try {
            List<Future<long[]>> futures = new ArrayList<>();
            for (int t = 0; t < 8; t++) {
                final int offset = t;
                futures.add(pool.submit(() -> {
                    long[] mine = new long[n * 3];
                    StabilityResult own = new StabilityResult();
                    for (int k = 0; k < n; k++) {
                        int i = (k + offset * 2503) % n; // each thread walks the zones in its own order
                        model.evaluate(zones[i], own);
                        mine[3 * i] = Double.doubleToRawLongBits(own.nablaRad);
                        mine[3 * i + 1] = Double.doubleToRawLongBits(own.dNablaRad[0]);
                        mine[3 * i + 2] = own.regime.ordinal();
                    }
                    return mine;
                }));
            }
            for (Future<long[]> f : futures) {
                long[] got = f.get();
                for (int i = 0; i < got.length; i++) {
                    assertEquals(serial[i], got[i], "entry " + i);
                }
            }
        } finally {
            pool.shutdownNow();
        }
    }
}
