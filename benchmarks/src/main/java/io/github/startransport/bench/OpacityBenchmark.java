package io.github.startransport.bench;

import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.core.opacity.DemoTable;
import io.github.startransport.core.opacity.TabulatedOpacity;
import io.github.startransport.spi.OpacityGridSpec;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OutOfRangePolicy;
import org.apache.commons.math3.analysis.BivariateFunction;
import org.apache.commons.math3.analysis.interpolation.BicubicInterpolator;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

/**
 * One opacity lookup (kappa with d ln kappa / d ln rho and d ln kappa / d ln T, blended across X and Z)
 * on the demo table (9 (X, Z) tables, 101 x 81 nodes), against Commons Math's
 * {@link BicubicInterpolator} functions built on the same nodes and blended with the same quadratic
 * weights in X and Z. Commons Math's functions give values only, so the peer's derivatives are
 * central differences (5 value calls per table); {@link #peerValueOnly} shows the value alone.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class OpacityBenchmark {
    private static final int POINTS = 1024;

    private TabulatedOpacity ours;
    private final OpacityResult result = new OpacityResult();
    private BivariateFunction[][] peer; // [z][x]
    private double[] xs;
    private double[] zs;
    private double[] temperature;
    private double[] density;
    private double[] logT;
    private double[] logR;
    private double[] hydrogen;
    private double[] metals;
    private int next;

    @Setup
    public void setup() {
        ours = new TabulatedOpacity(DemoTable.set(), OutOfRangePolicy.REFUSE);
        OpacityGridSpec grid = DemoTable.grid();
        xs = grid.hydrogen();
        zs = grid.metals();
        double[] t = grid.logT();
        double[] r = grid.logR();
        OpacityResult tmp = new OpacityResult();
        peer = new BivariateFunction[zs.length][xs.length];
        for (int iz = 0; iz < zs.length; iz++) {
            for (int ix = 0; ix < xs.length; ix++) {
                double[][] v = new double[t.length][r.length];
                for (int i = 0; i < t.length; i++) {
                    for (int j = 0; j < r.length; j++) {
                        AnalyticOpacity.DEFAULT.evaluate(Math.pow(10, t[i]), Math.pow(10, r[j] + 3 * t[i] - 18),
                                xs[ix], zs[iz], -1, tmp);
                        v[i][j] = Math.log10(tmp.kappa);
                    }
                }
                peer[iz][ix] = new BicubicInterpolator().interpolate(t, r, v);
            }
        }
        SplittableRandom rnd = new SplittableRandom(20261203L);
        temperature = new double[POINTS];
        density = new double[POINTS];
        logT = new double[POINTS];
        logR = new double[POINTS];
        hydrogen = new double[POINTS];
        metals = new double[POINTS];
        for (int k = 0; k < POINTS; k++) {
            logT[k] = rnd.nextDouble(3.7, 8.3);
            logR[k] = rnd.nextDouble(-8.5, 0.5);
            temperature[k] = Math.pow(10, logT[k]);
            density[k] = Math.pow(10, logR[k] + 3 * logT[k] - 18);
            logT[k] = Math.log10(temperature[k]);
            logR[k] = Math.log10(density[k]) - 3 * logT[k] + 18;
            hydrogen[k] = rnd.nextDouble(0.0, 0.7);
            metals[k] = rnd.nextDouble(0.01, 0.04);
        }
    }

    /** Ours: kappa and both log-derivatives, blended across X and Z. */
    @Benchmark
    public double oursLookup() {
        int k = next++ & (POINTS - 1);
        ours.evaluate(temperature[k], density[k], hydrogen[k], metals[k], -1, result);
        return result.kappa + result.dLnKappaDLnRho + result.dLnKappaDLnT;
    }

    /** The analytic composite (no table): kappa and both log-derivatives at the same random points. */
    @Benchmark
    public double oursAnalyticComposite() {
        int k = next++ & (POINTS - 1);
        AnalyticOpacity.DEFAULT.evaluate(temperature[k], density[k], hydrogen[k], metals[k], -1, result);
        return result.kappa + result.dLnKappaDLnRho + result.dLnKappaDLnT;
    }

    /** Commons Math: value and central-difference derivatives of each table, blended the same way. */
    @Benchmark
    public double peerLookup() {
        int k = next++ & (POINTS - 1);
        double x = logT[k];
        double y = logR[k];
        double h = 1e-4;
        double f = 0;
        double fx = 0;
        double fy = 0;
        for (int iz = 0; iz < 3; iz++) {
            double wz = quadratic(zs, metals[k], iz);
            for (int ix = 0; ix < 3; ix++) {
                double w = wz * quadratic(xs, hydrogen[k], ix);
                BivariateFunction g = peer[iz][ix];
                f += w * g.value(x, y);
                fx += w * (g.value(x + h, y) - g.value(x - h, y)) / (2 * h);
                fy += w * (g.value(x, y + h) - g.value(x, y - h)) / (2 * h);
            }
        }
        return Math.pow(10, f) + fy + (fx - 3 * fy);
    }

    /** Commons Math, value only (no derivatives), blended the same way: a lower bound for the peer. */
    @Benchmark
    public double peerValueOnly() {
        int k = next++ & (POINTS - 1);
        double f = 0;
        for (int iz = 0; iz < 3; iz++) {
            double wz = quadratic(zs, metals[k], iz);
            for (int ix = 0; ix < 3; ix++) {
                f += wz * quadratic(xs, hydrogen[k], ix) * peer[iz][ix].value(logT[k], logR[k]);
            }
        }
        return Math.pow(10, f);
    }

    /** Lagrange basis of node m of a three-node axis at q: the same weights our blend uses for three nodes. */
    private static double quadratic(double[] a, double q, int m) {
        double w = 1;
        for (int k = 0; k < 3; k++) {
            if (k != m) {
                w *= (q - a[k]) / (a[m] - a[k]);
            }
        }
        return w;
    }
}
