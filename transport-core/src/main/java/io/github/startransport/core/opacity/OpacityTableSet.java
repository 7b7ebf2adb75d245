package io.github.startransport.core.opacity;

import io.github.startransport.core.gradient.ZoneChecks;
import io.github.startransport.spi.Checks;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OpacityStatus;
import io.github.startransport.spi.OutOfRangePolicy;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * A loaded set of (X, Z) opacity tables and the interpolation across them.
 *
 * <p><b>In (log T, log R)</b>: bicubic Hermite interpolation of log10 kappa on each table
 * ({@link OpacityGrid}, slopes from {@link HermiteSlopes}): continuous in value and first derivatives
 * across cell seams, exact for bicubic data.
 *
 * <p><b>Across Z, then X</b>: the tables are grouped in rows of equal Z; within each row the X values
 * may differ. Along either axis with n nodes, the weights are: n = 1, constant; n = 2, linear;
 * n &gt;= 3, a blend of the two quadratics through the nodes around the interval [a_i, a_i+1],
 * p = (1 - s) q_(i-1,i,i+1) + s q_(i,i+1,i+2), s = (q - a_i) / (a_i+1 - a_i), with only the one
 * quadratic that exists in the end intervals. The blend is exact for quadratics (error O(h^3)),
 * continuous in composition, and uses at most four tables per axis. Because all of this is linear in
 * the table values, the weights are applied to the sixteen Hermite coefficients of the cell before one
 * bicubic evaluation when all tables share their axes and have no holes (the common case); otherwise
 * each table is evaluated on its own and the results are blended.
 *
 * <p><b>Out of range</b> (in log T, log R, X or Z, or in a declared hole) the caller's
 * {@link OutOfRangePolicy} decides: REFUSE throws {@link InvalidInputException}; CLAMP evaluates on the
 * nearest edge, with zero derivative along clamped axes; EXTRAPOLATE continues the edge cell's
 * polynomial (in a hole: the nearest usable cell of the same log-T column). The status says which.
 *
 * <p>Immutable and thread-safe; {@link #evaluate} allocates nothing (except the exception it throws).
 */
public final class OpacityTableSet {
    private static final double LN_10 = Math.log(10.0);

    private final String source;
    private final OpacityGrid[] grids;
    private final double[] zs;
    private final int[] rowStart;
    private final double[][] rowXs;
    private final double[] zInv;
    private final double[][] rowXInv;
    private final boolean fast;
    /** Whether every row of equal Z has the same X nodes (then the X weights are found once per lookup). */
    private final boolean sameX;
    private final double[] logT;
    private final double[] logR;
    private final double logTInvStep;
    private final double logRInvStep;
    /**
     * Fast path only: the node data of every table interleaved node by node, f, f_x, f_y, f_xy of table k
     * at node (i, j) at 4 ((i nR + j) T + k), T the number of tables, so that the corners a lookup needs lie
     * in two short runs of memory instead of 2 T scattered ones. {@code null} otherwise.
     */
    private final double[] packed;

    /**
     * @param source      where the tables came from, for messages
     * @param tables      the tables, at most one per (X, Z)
     * @param allowFast   whether the shared-axes fast path may be used (false only to test the general path)
     */
    OpacityTableSet(String source, List<OpacityGrid> tables, boolean allowFast) {
        this.source = source;
        List<OpacityGrid> sorted = new ArrayList<>(tables);
        sorted.sort(Comparator.comparingDouble((OpacityGrid g) -> g.metals).thenComparingDouble(g -> g.hydrogen));
        grids = sorted.toArray(new OpacityGrid[0]);
        List<Double> zList = new ArrayList<>();
        List<Integer> starts = new ArrayList<>();
        for (int k = 0; k < grids.length; k++) {
            if (k == 0 || grids[k].metals != grids[k - 1].metals) {
                zList.add(grids[k].metals);
                starts.add(k);
            }
        }
        starts.add(grids.length);
        zs = zList.stream().mapToDouble(Double::doubleValue).toArray();
        rowStart = starts.stream().mapToInt(Integer::intValue).toArray();
        rowXs = new double[zs.length][];
        for (int r = 0; r < zs.length; r++) {
            rowXs[r] = new double[rowStart[r + 1] - rowStart[r]];
            for (int k = 0; k < rowXs[r].length; k++) {
                rowXs[r][k] = grids[rowStart[r] + k].hydrogen;
            }
        }
        zInv = inverseDenominators(zs);
        rowXInv = new double[rowXs.length][];
        for (int r = 0; r < rowXs.length; r++) {
            rowXInv[r] = inverseDenominators(rowXs[r]);
        }
        boolean same = true;
        for (double[] r : rowXs) {
            same &= Arrays.equals(r, rowXs[0]);
        }
        sameX = same;
        boolean shared = allowFast;
        for (OpacityGrid g : grids) {
            shared &= g.complete() && g.logT == grids[0].logT && g.logR == grids[0].logR;
        }
        fast = shared;
        logT = grids[0].logT;
        logR = grids[0].logR;
        packed = fast ? interleave(grids) : null;
        if (fast) { // the node data now lives in packed only
            for (int k = 0; k < grids.length; k++) {
                grids[k] = grids[k].withoutNodes();
            }
        }
        logTInvStep = grids[0].logTInvStep;
        logRInvStep = grids[0].logRInvStep;
    }

    private static double[] interleave(OpacityGrid[] grids) {
        int tables = grids.length;
        int nodes = grids[0].logT.length * grids[0].logR.length;
        double[] d = new double[4 * tables * nodes];
        for (int k = 0; k < tables; k++) {
            double[] src = grids[k].node;
            for (int n = 0; n < nodes; n++) {
                System.arraycopy(src, 4 * n, d, 4 * (n * tables + k), 4);
            }
        }
        return d;
    }

    /** @return where the tables came from */
    public String source() {
        return source;
    }

    /** @return the number of (X, Z) tables */
    public int tableCount() {
        return grids.length;
    }

    /** @return the log10 kappa values tabulated (nodes present) over all tables */
    public long tabulatedValues() {
        long n = 0;
        for (OpacityGrid g : grids) {
            n += g.present;
        }
        return n;
    }

    /**
     * @return doubles held after loading: 4 per grid node (in the tables, or interleaved in this set on the
     *         fast path), the distinct axis arrays, X and Z of each table and the composition axes (the int
     *         fallback arrays of tables with holes count 1/2 each)
     */
    public long heldDoubles() {
        long n = packed == null ? 0 : packed.length;
        List<double[]> axes = new ArrayList<>();
        for (OpacityGrid g : grids) {
            n += g.nodeDoubles() + 2;
            if (g.fallback != null) {
                n += (g.fallback.length + 1) / 2;
            }
            for (double[] a : new double[][] {g.logT, g.logR}) {
                if (axes.stream().noneMatch(b -> b == a)) {
                    axes.add(a);
                    n += a.length;
                }
            }
        }
        n += zs.length;
        for (double[] r : rowXs) {
            n += r.length;
        }
        return n;
    }

    /** @return a description of every table: X, Z, grid sizes, ranges and coverage */
    public List<TableDescription> describe() {
        List<TableDescription> list = new ArrayList<>();
        for (OpacityGrid g : grids) {
            list.add(new TableDescription(g.hydrogen, g.metals, g.logT.clone(), g.logR.clone(), g.present));
        }
        return list;
    }

    /**
     * One table of the set.
     *
     * @param hydrogen X (mass fraction)
     * @param metals   Z (mass fraction)
     * @param logT     log10 T axis (log K)
     * @param logR     log10 R axis
     * @param present  nodes with a value (the rest are declared holes)
     */
    public record TableDescription(double hydrogen, double metals, double[] logT, double[] logR, int present) {
    }

    /** @return whether the shared-axes fast path is used */
    boolean usesFastPath() {
        return fast;
    }

    /**
     * Interpolates kappa and its logarithmic derivatives.
     *
     * @param temperature T (K), &gt; 0
     * @param density     rho (g cm^-3), &gt; 0
     * @param hydrogen    X (mass fraction)
     * @param metals      Z (mass fraction)
     * @param policy      what to do outside the tables
     * @param zone        zone index for messages
     * @param out         caller-owned result, overwritten
     */
    public void evaluate(double temperature, double density, double hydrogen, double metals,
                         OutOfRangePolicy policy, int zone, OpacityResult out) {
        Checks.positive("temperature", temperature, "K", zone);
        Checks.positive("density", density, "g cm^-3", zone);
        ZoneChecks.composition(hydrogen, metals, zone);
        double lt = Math.log10(temperature);
        double lr = Math.log10(density) - 3.0 * lt + 18.0;
        evaluateLogs(lt, lr, temperature, density, hydrogen, metals, policy, zone, out);
    }

    /**
     * The same with the table coordinates given directly (T and rho only for messages).
     *
     * @param lt log10 T (log K)
     * @param lr log10 R
     */
    void evaluateLogs(double lt, double lr, double temperature, double density, double hydrogen, double metals,
                      OutOfRangePolicy policy, int zone, OpacityResult out) {
        boolean outside = false;

        // metals axis
        int nz = zs.length;
        double zq = metals;
        if (metals < zs[0] || metals > zs[nz - 1]) {
            outside = true;
            zq = outOfRange(policy, "metals", metals, "1", zone, zs[0], zs[nz - 1], "Z");
        }
        int iz = nz == 1 ? 0 : OpacityGrid.interval(zs, zq);
        int kzLo = nz <= 2 ? 0 : Math.max(0, iz - 1);
        int kzHi = nz <= 2 ? nz - 1 : Math.min(nz - 1, iz + 2);

        if (fast) {
            // locate once on the shared axes
            double x = lt;
            double y = lr;
            boolean clampX = false;
            boolean clampY = false;
            if (x < logT[0] || x > logT[logT.length - 1]) {
                outside = true;
                x = outOfRange(policy, "temperature", temperature, "K", zone, logT[0], logT[logT.length - 1], "log_T");
                clampX = policy == OutOfRangePolicy.CLAMP;
            }
            if (y < logR[0] || y > logR[logR.length - 1]) {
                outside = true;
                y = outOfRangeR(policy, density, zone, lr);
                clampY = policy == OutOfRangePolicy.CLAMP;
            }
            int nR = logR.length;
            int ix = OpacityGrid.locate(logT, logTInvStep, x);
            int iy = OpacityGrid.locate(logR, logRInvStep, y);
            int tables = grids.length;
            int right = 4 * tables;            // from node (i, j) to (i, j + 1)
            int p0 = 4 * (ix * nR + iy) * tables;
            int q0 = p0 + 4 * nR * tables;     // node (i + 1, j)
            double[] d = packed;
            double c0 = 0, c1 = 0, c2 = 0, c3 = 0, c4 = 0, c5 = 0, c6 = 0, c7 = 0;
            double c8 = 0, c9 = 0, c10 = 0, c11 = 0, c12 = 0, c13 = 0, c14 = 0, c15 = 0;
            // weights along X: once for the set when every Z row has the same X nodes, else once per row
            double wx0 = 0, wx1 = 0, wx2 = 0, wx3 = 0;
            int kxLo = 0;
            int kxHi = -1;
            boolean xKnown = false;
            for (int kz = kzLo; kz <= kzHi; kz++) {
                double wz = weight(zs, zInv, iz, zq, kz);
                if (wz == 0.0) {
                    continue;
                }
                if (!xKnown) {
                    double[] xs = rowXs[kz];
                    int nx = xs.length;
                    double xq = hydrogen;
                    if (hydrogen < xs[0] || hydrogen > xs[nx - 1]) {
                        outside = true;
                        xq = outOfRange(policy, "hydrogen", hydrogen, "1", zone, xs[0], xs[nx - 1], "X at Z = " + zs[kz]);
                    }
                    int ixx = nx == 1 ? 0 : OpacityGrid.interval(xs, xq);
                    kxLo = nx <= 2 ? 0 : Math.max(0, ixx - 1);
                    kxHi = nx <= 2 ? nx - 1 : Math.min(nx - 1, ixx + 2); // at most 4 nodes
                    double[] inv = rowXInv[kz];
                    wx0 = weight(xs, inv, ixx, xq, kxLo);
                    wx1 = kxLo + 1 <= kxHi ? weight(xs, inv, ixx, xq, kxLo + 1) : 0.0;
                    wx2 = kxLo + 2 <= kxHi ? weight(xs, inv, ixx, xq, kxLo + 2) : 0.0;
                    wx3 = kxLo + 3 <= kxHi ? weight(xs, inv, ixx, xq, kxLo + 3) : 0.0;
                    xKnown = sameX;
                }
                int base = rowStart[kz];
                for (int kx = kxLo; kx <= kxHi; kx++) {
                    int m = kx - kxLo;
                    double w = wz * (m == 0 ? wx0 : m == 1 ? wx1 : m == 2 ? wx2 : wx3);
                    if (w == 0.0) {
                        continue;
                    }
                    int p = p0 + 4 * (base + kx);
                    int q = q0 + 4 * (base + kx);
                    c0 += w * d[p];
                    c1 += w * d[p + 1];
                    c2 += w * d[p + 2];
                    c3 += w * d[p + 3];
                    c4 += w * d[p + right];
                    c5 += w * d[p + right + 1];
                    c6 += w * d[p + right + 2];
                    c7 += w * d[p + right + 3];
                    c8 += w * d[q];
                    c9 += w * d[q + 1];
                    c10 += w * d[q + 2];
                    c11 += w * d[q + 3];
                    c12 += w * d[q + right];
                    c13 += w * d[q + right + 1];
                    c14 += w * d[q + right + 2];
                    c15 += w * d[q + right + 3];
                }
            }
            hermite(c0, c1, c2, c3, c4, c5, c6, c7, c8, c9, c10, c11, c12, c13, c14, c15,
                    x, y, logT[ix], logT[ix + 1], logR[iy], logR[iy + 1], out);
            double f = out.kappa;
            double fx = out.dLnKappaDLnT;
            double fy = out.dLnKappaDLnRho;
            finish(f, clampX ? 0.0 : fx, clampY ? 0.0 : fy, outside, policy, temperature, density, zone, out);
            return;
        }

        // general path: each table on its own axes, then blended
        double f = 0;
        double fx = 0;
        double fy = 0;
        for (int kz = kzLo; kz <= kzHi; kz++) {
            double wz = weight(zs, zInv, iz, zq, kz);
            if (wz == 0.0) {
                continue;
            }
            double[] xs = rowXs[kz];
            int nx = xs.length;
            double xq = hydrogen;
            if (hydrogen < xs[0] || hydrogen > xs[nx - 1]) {
                outside = true;
                xq = outOfRange(policy, "hydrogen", hydrogen, "1", zone, xs[0], xs[nx - 1], "X at Z = " + zs[kz]);
            }
            int ixx = nx == 1 ? 0 : OpacityGrid.interval(xs, xq);
            int kxLo = nx <= 2 ? 0 : Math.max(0, ixx - 1);
            int kxHi = nx <= 2 ? nx - 1 : Math.min(nx - 1, ixx + 2);
            for (int kx = kxLo; kx <= kxHi; kx++) {
                double w = wz * weight(xs, rowXInv[kz], ixx, xq, kx);
                if (w == 0.0) {
                    continue;
                }
                outside |= evaluateGrid(grids[rowStart[kz] + kx], lt, lr, temperature, density, policy, zone, out);
                f += w * out.kappa;
                fx += w * out.dLnKappaDLnT;
                fy += w * out.dLnKappaDLnRho;
            }
        }
        finish(f, fx, fy, outside, policy, temperature, density, zone, out);
    }

    private void finish(double f, double fx, double fy, boolean outside, OutOfRangePolicy policy,
                        double temperature, double density, int zone, OpacityResult out) {
        double kappa = Math.exp(f * LN_10);
        if (!(kappa > 0.0 && kappa < Double.POSITIVE_INFINITY && Double.isFinite(fx) && Double.isFinite(fy))) {
            // only an extrapolation far outside the tables gets here
            throw new InvalidInputException("temperature", temperature, "K", zone,
                    "close enough to the tables of " + source + " that the extrapolated opacity is finite and > 0 "
                            + "(got log10 kappa = " + f + " at rho = " + density + " g cm^-3; out-of-range="
                            + policy.name().toLowerCase(java.util.Locale.ROOT) + ")");
        }
        out.kappa = kappa;
        out.dLnKappaDLnRho = fy;
        out.dLnKappaDLnT = fx - 3.0 * fy;
        out.status = !outside ? OpacityStatus.INSIDE
                : policy == OutOfRangePolicy.CLAMP ? OpacityStatus.CLAMPED : OpacityStatus.EXTRAPOLATED;
    }

    /**
     * One table at (lt, lr); writes f into out.kappa, f_x into out.dLnKappaDLnT, f_y into out.dLnKappaDLnRho.
     *
     * @return whether the point was out of range (policy applied)
     */
    private boolean evaluateGrid(OpacityGrid g, double lt, double lr, double temperature, double density,
                                 OutOfRangePolicy policy, int zone, OpacityResult out) {
        double[] ax = g.logT;
        double[] ay = g.logR;
        boolean outside = false;
        boolean clampX = false;
        boolean clampY = false;
        double x = lt;
        double y = lr;
        if (x < ax[0] || x > ax[ax.length - 1]) {
            outside = true;
            x = outOfRange(policy, "temperature", temperature, "K", zone, ax[0], ax[ax.length - 1], "log_T");
            clampX = policy == OutOfRangePolicy.CLAMP;
        }
        if (y < ay[0] || y > ay[ay.length - 1]) {
            outside = true;
            y = outOfRangeR(policy, density, zone, lr, ay);
            clampY = policy == OutOfRangePolicy.CLAMP;
        }
        int ix = OpacityGrid.locate(ax, g.logTInvStep, x);
        int iy = OpacityGrid.locate(ay, g.logRInvStep, y);
        int fb = g.fallbackRow(ix, iy);
        // a point on the lower edge of an unusable cell may belong to the usable cell below it
        if (fb != -1 && y == ay[iy] && iy > 0 && g.fallbackRow(ix, iy - 1) == -1) {
            iy--;
            fb = -1;
        }
        if (fb != -1 && x == ax[ix] && ix > 0 && g.fallbackRow(ix - 1, iy) == -1) {
            ix--;
            fb = -1;
        }
        if (fb != -1) {
            outside = true;
            if (policy == OutOfRangePolicy.REFUSE || fb == -2) {
                throw new InvalidInputException("density", density, "g cm^-3", zone,
                        "outside the hole declared in " + source + " for X = " + g.hydrogen + ", Z = " + g.metals
                                + " (log_T = " + lt + ", log_R = " + lr + ", cell log_T " + ax[ix] + ".." + ax[ix + 1]
                                + ", log_R " + ay[iy] + ".." + ay[iy + 1] + (fb == -2
                                ? "; no usable cell in this log_T column)" : "; out-of-range=refuse)"));
            }
            if (policy == OutOfRangePolicy.CLAMP) {
                y = fb < iy ? ay[fb + 1] : ay[fb];
                clampY = true;
            }
            iy = fb;
        }
        cell(g.node, ay.length, ix, iy, x, y, ax, ay, out);
        if (clampX) {
            out.dLnKappaDLnT = 0.0;
        }
        if (clampY) {
            out.dLnKappaDLnRho = 0.0;
        }
        return outside;
    }

    /** Bicubic Hermite in cell (ix, iy): f to out.kappa, f_x to out.dLnKappaDLnT, f_y to out.dLnKappaDLnRho. */
    static void cell(double[] d, int nR, int ix, int iy, double x, double y, double[] ax, double[] ay,
                     OpacityResult out) {
        int p = 4 * (ix * nR + iy);
        int q = p + 4 * nR;
        hermite(d[p], d[p + 1], d[p + 2], d[p + 3], d[p + 4], d[p + 5], d[p + 6], d[p + 7],
                d[q], d[q + 1], d[q + 2], d[q + 3], d[q + 4], d[q + 5], d[q + 6], d[q + 7],
                x, y, ax[ix], ax[ix + 1], ay[iy], ay[iy + 1], out);
    }

    /**
     * The bicubic Hermite kernel on one cell [x0, x1] x [y0, y1] from its corner data, each corner as
     * (f, f_x, f_y, f_xy): node 00 = c0..c3, 01 = c4..c7 (at y1), 10 = c8..c11 (at x1), 11 = c12..c15.
     * Writes f to out.kappa, df/dx to out.dLnKappaDLnT and df/dy to out.dLnKappaDLnRho (the caller
     * turns them into kappa and its log-derivatives).
     */
    static void hermite(double c0, double c1, double c2, double c3, double c4, double c5, double c6, double c7,
                        double c8, double c9, double c10, double c11, double c12, double c13, double c14,
                        double c15, double x, double y, double x0, double x1, double y0, double y1,
                        OpacityResult out) {
        double hx = x1 - x0;
        double hy = y1 - y0;
        double t = (x - x0) / hx;
        double u = (y - y0) / hy;
        double t2 = t * t;
        double t3 = t2 * t;
        double a0 = 2 * t3 - 3 * t2 + 1;
        double a1 = 1 - a0;
        double e0 = hx * (t3 - 2 * t2 + t);
        double e1 = hx * (t3 - t2);
        double da0 = 6 * (t2 - t) / hx;
        double da1 = -da0;
        double de0 = 3 * t2 - 4 * t + 1;
        double de1 = 3 * t2 - 2 * t;
        double u2 = u * u;
        double u3 = u2 * u;
        double b0 = 2 * u3 - 3 * u2 + 1;
        double b1 = 1 - b0;
        double g0 = hy * (u3 - 2 * u2 + u);
        double g1 = hy * (u3 - u2);
        double db0 = 6 * (u2 - u) / hy;
        double db1 = -db0;
        double dg0 = 3 * u2 - 4 * u + 1;
        double dg1 = 3 * u2 - 2 * u;
        double rowB0 = c0 * b0 + c2 * g0 + c4 * b1 + c6 * g1;    // sum over y of f-like terms at x-node 0
        double rowE0 = c1 * b0 + c3 * g0 + c5 * b1 + c7 * g1;    // ... of f_x-like terms at x-node 0
        double rowB1 = c8 * b0 + c10 * g0 + c12 * b1 + c14 * g1;
        double rowE1 = c9 * b0 + c11 * g0 + c13 * b1 + c15 * g1;
        double dRowB0 = c0 * db0 + c2 * dg0 + c4 * db1 + c6 * dg1;
        double dRowE0 = c1 * db0 + c3 * dg0 + c5 * db1 + c7 * dg1;
        double dRowB1 = c8 * db0 + c10 * dg0 + c12 * db1 + c14 * dg1;
        double dRowE1 = c9 * db0 + c11 * dg0 + c13 * db1 + c15 * dg1;
        out.kappa = a0 * rowB0 + e0 * rowE0 + a1 * rowB1 + e1 * rowE1;
        out.dLnKappaDLnT = da0 * rowB0 + de0 * rowE0 + da1 * rowB1 + de1 * rowE1;
        out.dLnKappaDLnRho = a0 * dRowB0 + e0 * dRowE0 + a1 * dRowB1 + e1 * dRowE1;
    }

    /**
     * Per axis a: for each three-node stencil lo (0 .. n-3) the inverse Lagrange denominators
     * 1 / prod_{m != k} (a_k - a_m) of its nodes k = lo, lo+1, lo+2 at [3 lo + k - lo], then the inverse
     * interval widths at [3 (n-2) + i]. Lets {@link #weight} use multiplications only.
     */
    static double[] inverseDenominators(double[] a) {
        int n = a.length;
        int stencils = Math.max(0, n - 2);
        double[] inv = new double[3 * stencils + Math.max(0, n - 1)];
        for (int lo = 0; lo < stencils; lo++) {
            for (int k = lo; k <= lo + 2; k++) {
                double d = 1.0;
                for (int m = lo; m <= lo + 2; m++) {
                    if (m != k) {
                        d *= a[k] - a[m];
                    }
                }
                inv[3 * lo + k - lo] = 1.0 / d;
            }
        }
        for (int i = 0; i < n - 1; i++) {
            inv[3 * stencils + i] = 1.0 / (a[i + 1] - a[i]);
        }
        return inv;
    }

    /**
     * Weight of node k for query q in interval i of axis a: constant (n = 1), linear (n = 2), or the
     * blended quadratic (n &gt;= 3) described in the class comment.
     *
     * @param inv the axis' {@link #inverseDenominators}
     */
    static double weight(double[] a, double[] inv, int i, double q, int k) {
        int n = a.length;
        if (n == 1) {
            return 1.0;
        }
        if (n == 2) {
            double s = (q - a[0]) * inv[0];
            return k == 0 ? 1.0 - s : s;
        }
        boolean left = i >= 1;
        boolean right = i + 2 <= n - 1;
        if (left && right) {
            double s = (q - a[i]) * inv[3 * (n - 2) + i];
            return (1.0 - s) * quadratic(a, inv, i - 1, q, k) + s * quadratic(a, inv, i, q, k);
        }
        return left ? quadratic(a, inv, i - 1, q, k) : quadratic(a, inv, i, q, k);
    }

    /** Lagrange basis of node k for the quadratic through a[lo], a[lo+1], a[lo+2] (0 if k is not one of them). */
    private static double quadratic(double[] a, double[] inv, int lo, double q, int k) {
        if (k < lo || k > lo + 2) {
            return 0.0;
        }
        double w = inv[3 * lo + k - lo];
        for (int m = lo; m <= lo + 2; m++) {
            if (m != k) {
                w *= q - a[m];
            }
        }
        return w;
    }

    private double outOfRange(OutOfRangePolicy policy, String field, double value, String unit, int zone,
                              double lo, double hi, String axis) {
        double coordinate = "temperature".equals(field) ? Math.log10(value) : value;
        switch (policy) {
            case CLAMP:
                return Math.max(lo, Math.min(hi, coordinate));
            case EXTRAPOLATE:
                return coordinate;
            default:
                throw new InvalidInputException(field, value, unit, zone,
                        "inside the tables of " + source + ": " + axis + " in [" + lo + ", " + hi
                                + "] (out-of-range=refuse)");
        }
    }

    private double outOfRangeR(OutOfRangePolicy policy, double density, int zone, double lr) {
        return outOfRangeR(policy, density, zone, lr, logR);
    }

    private double outOfRangeR(OutOfRangePolicy policy, double density, int zone, double lr, double[] axis) {
        double lo = axis[0];
        double hi = axis[axis.length - 1];
        switch (policy) {
            case CLAMP:
                return Math.max(lo, Math.min(hi, lr));
            case EXTRAPOLATE:
                return lr;
            default:
                throw new InvalidInputException("density", density, "g cm^-3", zone,
                        "such that log_R = log10(rho) - 3 log10(T) + 18 = " + lr + " lies inside the tables of "
                                + source + ": log_R in [" + lo + ", " + hi + "] (out-of-range=refuse)");
        }
    }

    @Override
    public String toString() {
        return "OpacityTableSet[" + source + ", " + grids.length + " tables, " + Arrays.toString(zs) + "]";
    }
}
