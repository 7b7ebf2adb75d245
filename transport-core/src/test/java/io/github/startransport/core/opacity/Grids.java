package io.github.startransport.core.opacity;

import java.util.List;
import java.util.SplittableRandom;
import java.util.function.DoubleBinaryOperator;

/** Test helpers: tables from functions, non-uniform axes. */
final class Grids {
    private Grids() {
    }

    static double[] uniform(double lo, double hi, int n) {
        double[] a = new double[n];
        for (int k = 0; k < n; k++) {
            a[k] = lo + (hi - lo) * k / (n - 1);
        }
        return a;
    }

    /** Strictly increasing, spacing varying by up to a factor ~3 (seeded). */
    static double[] nonUniform(double lo, double hi, int n, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] w = new double[n - 1];
        double sum = 0;
        for (int k = 0; k < n - 1; k++) {
            w[k] = rnd.nextDouble(0.5, 1.5);
            sum += w[k];
        }
        double[] a = new double[n];
        a[0] = lo;
        for (int k = 1; k < n; k++) {
            a[k] = a[k - 1] + (hi - lo) * w[k - 1] / sum;
        }
        a[n - 1] = hi;
        return a;
    }

    static OpacityGrid grid(double x, double z, double[] t, double[] r, DoubleBinaryOperator f) {
        double[][] v = new double[t.length][r.length];
        for (int i = 0; i < t.length; i++) {
            for (int j = 0; j < r.length; j++) {
                v[i][j] = f.applyAsDouble(t[i], r[j]);
            }
        }
        return new OpacityGrid(x, z, t, r, v);
    }

    static OpacityTableSet single(double[] t, double[] r, DoubleBinaryOperator f, boolean fast) {
        return new OpacityTableSet("test", List.of(grid(0.7, 0.02, t, r, f)), fast);
    }

    /** rho (g cm^-3) for given log T and log R. */
    static double rho(double logT, double logR) {
        return Math.pow(10, logR + 3 * logT - 18);
    }
}
