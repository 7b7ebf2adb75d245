package io.github.startransport.core.opacity;

/**
 * Node derivatives for piecewise cubic Hermite interpolation on a non-uniform axis, high-order
 * where the data is smooth and limited where it is not.
 *
 * <p><b>Estimate.</b> At node i the derivative of the Lagrange polynomial through the five nodes
 * nearest to i (window shifted inwards at the ends) is taken. It is exact for polynomials of degree
 * &lt;= 4, hence for cubics, which makes the Hermite interpolant exact for cubic data; on smooth data
 * it is fourth-order accurate, so the Hermite interpolant converges as h^4. With four nodes the
 * cubic through all of them is used (still exact for cubics); with three, the quadratic; with two,
 * the secant.
 *
 * <p><b>The conflict and how it is resolved.</b> Limiters that forbid overshoot (Fritsch &amp; Carlson
 * 1980, SIAM J. Numer. Anal. 17, 238; Hyman 1983, SIAM J. Sci. Stat. Comput. 4, 645) clip derivatives to
 * the box 0 &lt;= d / S &lt;= 3 (S the adjacent secants), and that box also clips the true derivatives
 * of some monotone cubics, so an always-on limiter is not exact for cubic data. We therefore limit
 * only where the data shows that it is not locally smooth: the two four-node sub-windows of the
 * stencil give two cubic estimates d_L and d_R; they agree to rounding for cubic data, differ by
 * O(h^3) on smooth data, and differ by a sizeable fraction of the local slope at an unresolved edge
 * or step. The limiter engages only when |d_L - d_R| &gt; {@link #ROUGHNESS} (|S_left| + |S_right|)
 * (threshold our own choice). Engaged, it applies Hyman's rule: at a monotone node (both secants of
 * one sign) d is clipped to [0, 3 min(|S|)] in the secants' sign; next to a plateau (a secant exactly
 * 0) d = 0; at a strict extremum |d| &lt;= 3 min(|S|); at an end node d is clipped to [0, 3 |S|] in
 * the sign of its one secant. Cubic data is thus never limited (exactness kept) and a step is
 * interpolated without overshoot. Axes with fewer than five nodes are never limited.
 *
 * <p>Runs when a table is loaded, not on the hot path; allocation is allowed here.
 */
public final class HermiteSlopes {
    private HermiteSlopes() {
    }

    /** Relative disagreement of the two cubic sub-estimates above which the limiter engages (our own choice). */
    public static final double ROUGHNESS = 0.1;

    /**
     * @param x nodes, strictly increasing, length n &gt;= 2 (not modified)
     * @param f values at the nodes, length n (not modified)
     * @return df/dx at each node (units of f per unit of x)
     */
    public static double[] slopes(double[] x, double[] f) {
        int n = x.length;
        double[] d = new double[n];
        if (n == 2) {
            double s = (f[1] - f[0]) / (x[1] - x[0]);
            d[0] = s;
            d[1] = s;
            return d;
        }
        int w = Math.min(n, 5);
        for (int i = 0; i < n; i++) {
            int lo = Math.max(0, Math.min(i - w / 2, n - w));
            double high = lagrangeDerivative(x, f, lo, w, i);
            if (w == 5) {
                double left = lagrangeDerivative(x, f, lo, 4, i);
                double right = lagrangeDerivative(x, f, lo + 1, 4, i);
                double sl = i > 0 ? (f[i] - f[i - 1]) / (x[i] - x[i - 1]) : Double.NaN;
                double sr = i < n - 1 ? (f[i + 1] - f[i]) / (x[i + 1] - x[i]) : Double.NaN;
                double scale = (i > 0 ? Math.abs(sl) : 0.0) + (i < n - 1 ? Math.abs(sr) : 0.0);
                if (Math.abs(left - right) > ROUGHNESS * scale) {
                    high = limit(high, sl, sr);
                }
            }
            d[i] = high;
        }
        return d;
    }

    /** Hyman's rule; a missing secant (end node) is NaN. */
    static double limit(double d, double sl, double sr) {
        if (Double.isNaN(sl) || Double.isNaN(sr)) {
            double s = Double.isNaN(sl) ? sr : sl;
            if (s == 0.0) {
                return 0.0;
            }
            double sign = Math.signum(s);
            return sign * Math.min(Math.max(0.0, sign * d), 3.0 * Math.abs(s));
        }
        if (sl == 0.0 || sr == 0.0) {
            return 0.0;
        }
        double bound = 3.0 * Math.min(Math.abs(sl), Math.abs(sr));
        if (sl * sr > 0) {
            double sign = Math.signum(sl);
            return sign * Math.min(Math.max(0.0, sign * d), bound);
        }
        return Math.max(-bound, Math.min(bound, d));
    }

    /**
     * Derivative at x[at] of the Lagrange polynomial through nodes lo .. lo+m-1 (x[at] need not be one of them):
     * L_j'(x) = sum_{q != j} prod_{k != j, q} (x - x_k) / prod_{k != j} (x_j - x_k).
     */
    static double lagrangeDerivative(double[] x, double[] f, int lo, int m, int at) {
        double xa = x[at];
        double sum = 0.0;
        for (int j = lo; j < lo + m; j++) {
            double den = 1.0;
            for (int k = lo; k < lo + m; k++) {
                if (k != j) {
                    den *= x[j] - x[k];
                }
            }
            double num = 0.0;
            for (int q = lo; q < lo + m; q++) {
                if (q == j) {
                    continue;
                }
                double prod = 1.0;
                for (int k = lo; k < lo + m; k++) {
                    if (k != j && k != q) {
                        prod *= xa - x[k];
                    }
                }
                num += prod;
            }
            sum += num / den * f[j];
        }
        return sum;
    }
}
