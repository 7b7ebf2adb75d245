package io.github.startransport.core.opacity;

import java.util.Arrays;

/**
 * One (X, Z) opacity table prepared for bicubic Hermite interpolation of log10 kappa in
 * (x, y) = (log10 T, log10 R).
 *
 * <p>Per node it stores exactly four doubles, interleaved for locality: f, f_x, f_y, f_xy, with the
 * derivatives per dex from {@link HermiteSlopes} (f_x along log T on each row, f_y along log R on each
 * column, f_xy as the log-T slopes of f_y). A cell is usable when its four corners are present;
 * absent nodes (declared holes) make their cells unusable. For each unusable cell the nearest usable
 * cell in the same log-T column is precomputed, for the clamp and extrapolate policies.
 *
 * <p>Immutable after construction (arrays are never handed out), hence thread-safe.
 */
final class OpacityGrid {
    /** Hydrogen mass fraction X of this table (dimensionless). */
    final double hydrogen;
    /** Metal mass fraction Z of this table (dimensionless). */
    final double metals;
    /** log10 T nodes, strictly increasing (log K). May be shared with other grids of a set. */
    final double[] logT;
    /** log10 R nodes, strictly increasing, R = rho / T_6^3 (log g cm^-3 K^-3 10^18). May be shared. */
    final double[] logR;
    /**
     * f, f_x, f_y, f_xy for node (i, j) at 4 (i nR + j); {@code null} in a copy made by
     * {@link #withoutNodes} for a set that holds the node data itself.
     */
    final double[] node;
    /**
     * For cell (i, j) at i (nR - 1) + j: -1 if usable, else the row index j' of the nearest usable cell in
     * column i, or -2 if the column has none. {@code null} when every cell is usable.
     */
    final int[] fallback;
    /** Number of nodes present (tabulated values). */
    final int present;
    /** 1 / spacing of {@link #logT} if it is evenly spaced (see {@link #inverseStep}), else 0 (per dex). */
    final double logTInvStep;
    /** 1 / spacing of {@link #logR} if it is evenly spaced, else 0 (per dex). */
    final double logRInvStep;

    /**
     * @param hydrogen X
     * @param metals   Z
     * @param logT     log T axis, strictly increasing, length &gt;= 2 (kept, not copied)
     * @param logR     log R axis, strictly increasing, length &gt;= 2 (kept, not copied)
     * @param values   log10 kappa at [i][j]; NaN marks an absent node (not modified)
     */
    OpacityGrid(double hydrogen, double metals, double[] logT, double[] logR, double[][] values) {
        this.hydrogen = hydrogen;
        this.metals = metals;
        this.logT = logT;
        this.logR = logR;
        this.logTInvStep = inverseStep(logT);
        this.logRInvStep = inverseStep(logR);
        int nT = logT.length;
        int nR = logR.length;
        double[][] fx = new double[nT][nR];
        double[][] fy = new double[nT][nR];
        double[][] fxy = new double[nT][nR];
        int count = 0;
        for (double[] row : values) {
            for (double v : row) {
                if (!Double.isNaN(v)) {
                    count++;
                }
            }
        }
        present = count;
        // f_y along each column (fixed log T), over runs of present nodes
        for (int i = 0; i < nT; i++) {
            slopesAlongRuns(logR, values[i], fy[i]);
        }
        // f_x and f_xy along each row (fixed log R)
        double[] col = new double[nT];
        double[] colY = new double[nT];
        double[] out = new double[nT];
        for (int j = 0; j < nR; j++) {
            for (int i = 0; i < nT; i++) {
                col[i] = values[i][j];
                colY[i] = Double.isNaN(values[i][j]) ? Double.NaN : fy[i][j];
            }
            slopesAlongRuns(logT, col, out);
            for (int i = 0; i < nT; i++) {
                fx[i][j] = out[i];
            }
            slopesAlongRuns(logT, colY, out);
            for (int i = 0; i < nT; i++) {
                fxy[i][j] = out[i];
            }
        }
        node = new double[4 * nT * nR];
        for (int i = 0; i < nT; i++) {
            for (int j = 0; j < nR; j++) {
                int b = 4 * (i * nR + j);
                node[b] = values[i][j];
                node[b + 1] = fx[i][j];
                node[b + 2] = fy[i][j];
                node[b + 3] = fxy[i][j];
            }
        }
        fallback = count == nT * nR ? null : fallbacks(values, nT, nR);
    }

    /** A copy sharing everything but the node data, which it does not hold. */
    private OpacityGrid(OpacityGrid g) {
        hydrogen = g.hydrogen;
        metals = g.metals;
        logT = g.logT;
        logR = g.logR;
        node = null;
        fallback = g.fallback;
        present = g.present;
        logTInvStep = g.logTInvStep;
        logRInvStep = g.logRInvStep;
    }

    /**
     * @return this grid's description (composition, axes, coverage) without its node data, for a set that
     *         keeps the node data of all its tables in one array of its own (this grid is not modified)
     */
    OpacityGrid withoutNodes() {
        return new OpacityGrid(this);
    }

    private static int[] fallbacks(double[][] v, int nT, int nR) {
        int cells = nR - 1;
        int[] fb = new int[(nT - 1) * cells];
        for (int i = 0; i < nT - 1; i++) {
            for (int j = 0; j < cells; j++) {
                fb[i * cells + j] = usable(v, i, j) ? -1 : -2;
            }
            for (int j = 0; j < cells; j++) {
                if (fb[i * cells + j] == -1) {
                    continue;
                }
                for (int dist = 1; dist < cells; dist++) {
                    if (j - dist >= 0 && usable(v, i, j - dist)) {
                        fb[i * cells + j] = j - dist;
                        break;
                    }
                    if (j + dist < cells && usable(v, i, j + dist)) {
                        fb[i * cells + j] = j + dist;
                        break;
                    }
                }
            }
        }
        return fb;
    }

    private static boolean usable(double[][] v, int i, int j) {
        return !Double.isNaN(v[i][j]) && !Double.isNaN(v[i + 1][j]) && !Double.isNaN(v[i][j + 1])
                && !Double.isNaN(v[i + 1][j + 1]);
    }

    /** Slopes over each maximal run of non-NaN values; isolated nodes get 0. */
    private static void slopesAlongRuns(double[] x, double[] f, double[] d) {
        int n = x.length;
        int i = 0;
        while (i < n) {
            if (Double.isNaN(f[i])) {
                d[i] = 0.0;
                i++;
                continue;
            }
            int end = i;
            while (end + 1 < n && !Double.isNaN(f[end + 1])) {
                end++;
            }
            if (end == i) {
                d[i] = 0.0;
            } else {
                double[] s = HermiteSlopes.slopes(Arrays.copyOfRange(x, i, end + 1), Arrays.copyOfRange(f, i, end + 1));
                System.arraycopy(s, 0, d, i, s.length);
            }
            i = end + 1;
        }
    }

    /** @return whether every cell is usable */
    boolean complete() {
        return fallback == null;
    }

    /**
     * @param i cell column (log T index)
     * @param j cell row (log R index)
     * @return -1 if the cell is usable, else the row of the nearest usable cell in the column, or -2
     */
    int fallbackRow(int i, int j) {
        return fallback == null ? -1 : fallback[i * (logR.length - 1) + j];
    }

    /** @return f at node (i, j) (log10 cm^2 g^-1); NaN when absent. Only on a grid that holds its nodes. */
    double value(int i, int j) {
        return node[4 * (i * logR.length + j)];
    }

    /** @return doubles held by this grid's node data (axes not included; 0 without node data) */
    int nodeDoubles() {
        return node == null ? 0 : node.length;
    }

    /**
     * Largest relative departure of a node from the even spacing a[0] + k h, h = (a[n-1] - a[0]) / (n - 1),
     * for which an axis still counts as evenly spaced (our own choice: decimal steps such as 0.05 are not
     * exact in binary, so rounding leaves departures of order 1e-16 h; anything up to a quarter step would
     * still keep {@link #locate} at one correction step).
     */
    static final double EVEN_TOLERANCE = 1e-9;

    /**
     * @param a axis, strictly increasing, length &gt;= 2 (not modified)
     * @return 1 / h when every node lies within {@link #EVEN_TOLERANCE} h of a[0] + k h, else 0 (units of 1/a)
     */
    static double inverseStep(double[] a) {
        int n = a.length;
        double h = (a[n - 1] - a[0]) / (n - 1);
        if (!(h > 0.0) || !Double.isFinite(h)) {
            return 0.0;
        }
        for (int k = 0; k < n; k++) {
            if (!(Math.abs(a[k] - (a[0] + k * h)) <= EVEN_TOLERANCE * h)) {
                return 0.0;
            }
        }
        return 1.0 / h;
    }

    /**
     * The same interval index as {@link #interval}, found in O(1) on an evenly spaced axis: the index
     * (q - a[0]) / h is guessed, clamped to [0, n-2], and then corrected against the stored nodes
     * themselves (at most one step when the axis is evenly spaced), so the result is identical to the binary
     * search whatever the rounding of the guess. Falls back to {@link #interval} when invStep is 0.
     *
     * @param a       axis, strictly increasing, length &gt;= 2 (not modified)
     * @param invStep {@link #inverseStep} of the axis (units of 1/a)
     * @param q       query (units of a), not NaN
     * @return i in [0, n-2] with a[i] &lt;= q &lt; a[i+1] inside the axis
     */
    static int locate(double[] a, double invStep, double q) {
        if (invStep == 0.0) {
            return interval(a, q);
        }
        int last = a.length - 2;
        double guess = (q - a[0]) * invStep;
        int i = guess <= 0.0 ? 0 : guess >= last ? last : (int) guess;
        while (i > 0 && a[i] > q) {
            i--;
        }
        while (i < last && a[i + 1] <= q) {
            i++;
        }
        return i;
    }

    /**
     * Index i of the interval [a[i], a[i+1]] holding q, clamped to [0, n-2]; q equal to a node
     * belongs to the interval starting at it (except the last node). Binary search, no allocation.
     */
    static int interval(double[] a, double q) {
        int lo = 0;
        int hi = a.length - 2;
        if (q <= a[0]) {
            return 0;
        }
        if (q >= a[hi]) {
            return hi;
        }
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (a[mid] <= q) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }
}
