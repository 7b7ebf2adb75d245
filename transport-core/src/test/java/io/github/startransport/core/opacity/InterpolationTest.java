package io.github.startransport.core.opacity;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OpacityStatus;
import io.github.startransport.spi.OutOfRangePolicy;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import net.jqwik.api.constraints.IntRange;
import org.apache.commons.math3.analysis.BivariateFunction;
import org.apache.commons.math3.analysis.interpolation.BicubicInterpolator;
import org.apache.commons.math3.analysis.interpolation.PiecewiseBicubicSplineInterpolator;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.DoubleBinaryOperator;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class InterpolationTest {

    /** f, f_x (per dex log T), f_y (per dex log R) and status at (log T, log R). */
    static double[] eval(OpacityTableSet set, double x, double y, double hydrogen, double metals,
                         OutOfRangePolicy policy) {
        OpacityResult r = new OpacityResult();
        set.evaluateLogs(x, y, Math.pow(10, x), Grids.rho(x, y), hydrogen, metals, policy, -1, r);
        double fy = r.dLnKappaDLnRho;
        return new double[] {Math.log10(r.kappa), r.dLnKappaDLnT + 3 * fy, fy, r.status.ordinal()};
    }

    static double[] eval(OpacityTableSet set, double x, double y) {
        return eval(set, x, y, 0.7, 0.02, OutOfRangePolicy.REFUSE);
    }

    /** A random bicubic polynomial sum a_ij x^i y^j, i, j &lt;= 3, with its derivatives. */
    static final class Bicubic {
        final double[][] a = new double[4][4];

        Bicubic(long seed) {
            SplittableRandom rnd = new SplittableRandom(seed);
            for (double[] row : a) {
                for (int j = 0; j < 4; j++) {
                    row[j] = rnd.nextDouble(-1, 1);
                }
            }
        }

        double f(double x, double y) {
            double s = 0;
            for (int i = 0; i < 4; i++) {
                for (int j = 0; j < 4; j++) {
                    s += a[i][j] * Math.pow(x, i) * Math.pow(y, j);
                }
            }
            return s;
        }

        double fx(double x, double y) {
            double s = 0;
            for (int i = 1; i < 4; i++) {
                for (int j = 0; j < 4; j++) {
                    s += i * a[i][j] * Math.pow(x, i - 1) * Math.pow(y, j);
                }
            }
            return s;
        }

        double fy(double x, double y) {
            double s = 0;
            for (int i = 0; i < 4; i++) {
                for (int j = 1; j < 4; j++) {
                    s += j * a[i][j] * Math.pow(x, i) * Math.pow(y, j - 1);
                }
            }
            return s;
        }
    }

    /** A smooth analytic surface (not a polynomial) standing in for log kappa (log T in [4, 6], log R in [-4, 0]). */
    static final DoubleBinaryOperator SMOOTH = (x, y) -> Math.sin(1.7 * x) * Math.cos(1.3 * y) + 0.3 * Math.exp(0.4 * y) * x;

    @Tag(CheckKind.INTERNAL)
    @Test
    void reproducesEveryNode() {
        double[] t = Grids.nonUniform(3.5, 8.0, 23, 1);
        double[] r = Grids.nonUniform(-8.0, 1.0, 17, 2);
        SplittableRandom rnd = new SplittableRandom(3);
        double[][] v = new double[t.length][r.length];
        for (double[] row : v) {
            for (int j = 0; j < row.length; j++) {
                row[j] = rnd.nextDouble(-4, 6); // rough data: the limiter engages in places
            }
        }
        for (boolean fast : new boolean[] {true, false}) {
            OpacityTableSet set = new OpacityTableSet("nodes", List.of(new OpacityGrid(0.7, 0.02, t, r, v)), fast);
            for (int i = 0; i < t.length; i++) {
                for (int j = 0; j < r.length; j++) {
                    assertEquals(v[i][j], eval(set, t[i], r[j])[0], 1e-12, "node " + i + "," + j);
                }
            }
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void exactForBicubicPolynomials() {
        for (long seed = 10; seed < 14; seed++) {
            Bicubic p = new Bicubic(seed);
            // 5+ nodes per axis (five-node stencils with the limiter test) and 4 nodes (one cubic per axis)
            for (int n : new int[] {4, 5, 9}) {
                double[] t = Grids.nonUniform(-1.0, 1.5, n, seed);
                double[] r = Grids.nonUniform(-1.2, 1.0, n + 2, seed + 100);
                for (boolean fast : new boolean[] {true, false}) {
                    OpacityTableSet set = Grids.single(t, r, p::f, fast);
                    SplittableRandom rnd = new SplittableRandom(seed);
                    for (int k = 0; k < 200; k++) {
                        double x = rnd.nextDouble(-1.0, 1.5);
                        double y = rnd.nextDouble(-1.2, 1.0);
                        double[] e = eval(set, x, y);
                        assertEquals(p.f(x, y), e[0], 1e-11, "value");
                        assertEquals(p.fx(x, y), e[1], 1e-10, "d/d log T");
                        assertEquals(p.fy(x, y), e[2], 1e-10, "d/d log R");
                    }
                }
            }
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void extrapolationContinuesTheEdgeCellAndClampZeroesDerivatives() {
        Bicubic p = new Bicubic(42);
        double[] t = Grids.nonUniform(0, 1, 7, 5);
        double[] r = Grids.nonUniform(0, 1, 6, 6);
        OpacityTableSet set = Grids.single(t, r, p::f, true);
        double[] e = eval(set, 1.1, -0.05, 0.7, 0.02, OutOfRangePolicy.EXTRAPOLATE);
        assertEquals(p.f(1.1, -0.05), e[0], 1e-11); // the edge cell is the polynomial itself
        assertEquals(OpacityStatus.EXTRAPOLATED.ordinal(), (int) e[3]);
        double[] c = eval(set, 1.1, 0.5, 0.7, 0.02, OutOfRangePolicy.CLAMP);
        assertEquals(p.f(1.0, 0.5), c[0], 1e-11);
        assertEquals(0.0, c[1]); // SPI contract: derivative along the clamped axis is 0
        assertEquals(p.fy(1.0, 0.5), c[2], 1e-10);
        assertEquals(OpacityStatus.CLAMPED.ordinal(), (int) c[3]);
        InvalidInputException ex = assertThrows(InvalidInputException.class,
                () -> eval(set, 1.1, 0.5, 0.7, 0.02, OutOfRangePolicy.REFUSE));
        assertEquals("temperature", ex.field());
        assertEquals("density", assertThrows(InvalidInputException.class,
                () -> eval(set, 0.5, 1.2, 0.7, 0.02, OutOfRangePolicy.REFUSE)).field());
        assertEquals(OpacityStatus.INSIDE.ordinal(), (int) eval(set, 0.5, 0.5)[3]);
    }

    private static double maxError(int n) {
        double[] t = Grids.uniform(4.0, 6.0, n);
        double[] r = Grids.uniform(-4.0, 0.0, n);
        OpacityTableSet set = Grids.single(t, r, SMOOTH, true);
        SplittableRandom rnd = new SplittableRandom(7);
        double max = 0;
        for (int k = 0; k < 3000; k++) {
            double x = rnd.nextDouble(4.0, 6.0);
            double y = rnd.nextDouble(-4.0, 0.0);
            max = Math.max(max, Math.abs(eval(set, x, y)[0] - SMOOTH.applyAsDouble(x, y)));
        }
        return max;
    }

    @Tag(CheckKind.LAW)
    @Test
    void convergesAtFourthOrderUnderRefinement() {
        // Bicubic Hermite with exact slopes errs by O(h^4) (constant f^(4)/384, tiny here); our slopes carry
        // O(h^4) errors that enter the value times O(h), i.e. O(h^5) with a larger constant. So the error
        // must fall by at least 2^4 per halving of h (order >= 4, 3.7 allowed for the max-norm sampling)
        // and, pre-asymptotically, by about 2^5.
        double e1 = maxError(21);
        double e2 = maxError(41);
        double e3 = maxError(81);
        double order1 = Math.log(e1 / e2) / Math.log(2);
        double order2 = Math.log(e2 / e3) / Math.log(2);
        System.out.printf("max errors %.3e, %.3e, %.3e: observed orders %.2f, %.2f%n", e1, e2, e3, order1, order2);
        assertTrue(order1 > 3.7 && order1 < 6, "observed order " + order1 + " (" + e1 + " -> " + e2 + ")");
        assertTrue(order2 > 3.7 && order2 < 6, "observed order " + order2 + " (" + e2 + " -> " + e3 + ")");
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void agreesWithCommonsMathBicubicInterpolators() {
        // Same grid (h = 0.05 in log T, 0.1 in log R) and data for three schemes:
        // org.apache.commons.math3.analysis.interpolation.BicubicInterpolator (Hermite bicubic with
        // second-order finite-difference slopes, interior cells only) and
        // PiecewiseBicubicSplineInterpolator (Akima splines along each axis). Both are second-order in
        // their slopes: the slope error ~ h^2 |f'''| / 6 ~ 2e-3 (|f'''| &lt; 5 here) enters the value
        // through the Hermite basis (&lt;= 4h/27), so each should sit within ~1e-4 of the surface, and we
        // ask that ours and each peer agree to 2e-4 and that ours is the closer to the truth overall.
        int nT = 41;
        int nR = 41;
        double[] t = Grids.uniform(4.0, 6.0, nT);
        double[] r = Grids.uniform(-4.0, 0.0, nR);
        double[][] v = new double[nT][nR];
        for (int i = 0; i < nT; i++) {
            for (int j = 0; j < nR; j++) {
                v[i][j] = SMOOTH.applyAsDouble(t[i], r[j]);
            }
        }
        OpacityTableSet ours = Grids.single(t, r, SMOOTH, true);
        BivariateFunction bicubic = new BicubicInterpolator().interpolate(t, r, v);
        BivariateFunction akima = new PiecewiseBicubicSplineInterpolator().interpolate(t, r, v);
        SplittableRandom rnd = new SplittableRandom(8);
        double errOurs = 0;
        double errBicubic = 0;
        double errAkima = 0;
        for (int k = 0; k < 2000; k++) {
            double x = rnd.nextDouble(t[2], t[nT - 3]);
            double y = rnd.nextDouble(r[2], r[nR - 3]);
            double truth = SMOOTH.applyAsDouble(x, y);
            double o = eval(ours, x, y)[0];
            double b = bicubic.value(x, y);
            double a = akima.value(x, y);
            assertEquals(b, o, 2e-4, "vs BicubicInterpolator at " + x + ", " + y);
            assertEquals(a, o, 2e-4, "vs PiecewiseBicubicSplineInterpolator at " + x + ", " + y);
            errOurs = Math.max(errOurs, Math.abs(o - truth));
            errBicubic = Math.max(errBicubic, Math.abs(b - truth));
            errAkima = Math.max(errAkima, Math.abs(a - truth));
        }
        assertTrue(errOurs < errBicubic && errOurs < errAkima,
                "max errors: ours " + errOurs + ", bicubic " + errBicubic + ", akima " + errAkima);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void noOvershootAtASteepEdge() {
        // A step of 4 dex between two log T nodes, flat on both sides (the shape of an ionisation edge).
        double[] t = Grids.uniform(0, 1, 11);
        double[] r = Grids.uniform(0, 1, 6);
        DoubleBinaryOperator step = (x, y) -> x < 0.45 ? 0.0 : 4.0;
        OpacityTableSet set = Grids.single(t, r, step, true);
        for (int k = 0; k <= 1000; k++) {
            double x = k / 1000.0;
            double f = eval(set, x, 0.37)[0];
            assertTrue(f >= -1e-12 && f <= 4 + 1e-12, "overshoot " + f + " at x = " + x);
        }
        // Without the limiter the five-node slope next to the step is far from 0 and would overshoot.
        double[] vals = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            vals[i] = step.applyAsDouble(t[i], 0);
        }
        assertTrue(Math.abs(HermiteSlopes.lagrangeDerivative(t, vals, 2, 5, 4)) > 1.0);
        assertEquals(0.0, HermiteSlopes.slopes(t, vals)[4]);
    }

    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 300, seed = "20261203")
    void valueAndDerivativesContinuousAcrossSeams(@ForAll @IntRange(min = 1, max = 9) int seam,
                                                 @ForAll @Scale(9) @DoubleRange(min = 0, max = 1) double along,
                                                 @ForAll boolean alongLogT,
                                                 @ForAll @IntRange(min = 0, max = 1000) int dataSeed) {
        double[] t = Grids.nonUniform(3.5, 6.0, 11, 1000 + dataSeed);
        double[] r = Grids.nonUniform(-6.0, 0.0, 11, 2000 + dataSeed);
        SplittableRandom rnd = new SplittableRandom(dataSeed);
        double[][] v = new double[t.length][r.length];
        for (double[] row : v) {
            for (int j = 0; j < row.length; j++) {
                row[j] = rnd.nextDouble(-2, 4);
            }
        }
        OpacityGrid g = new OpacityGrid(0.7, 0.02, t, r, v);
        OpacityResult lo = new OpacityResult();
        OpacityResult hi = new OpacityResult();
        if (alongLogT) { // seam at log T = t[seam], evaluated from the cells on either side
            double y = r[0] + along * (r[10] - r[0]);
            int iy = OpacityGrid.interval(r, y);
            OpacityTableSet.cell(g.node, r.length, seam - 1, iy, t[seam], y, t, r, lo);
            OpacityTableSet.cell(g.node, r.length, seam, iy, t[seam], y, t, r, hi);
        } else {
            double x = t[0] + along * (t[10] - t[0]);
            int ix = OpacityGrid.interval(t, x);
            OpacityTableSet.cell(g.node, r.length, ix, seam - 1, x, r[seam], t, r, lo);
            OpacityTableSet.cell(g.node, r.length, ix, seam, x, r[seam], t, r, hi);
        }
        double scale = 1e-11 * 100;
        assertEquals(lo.kappa, hi.kappa, scale, "value");
        assertEquals(lo.dLnKappaDLnT, hi.dLnKappaDLnT, scale * 10, "d/d log T");
        assertEquals(lo.dLnKappaDLnRho, hi.dLnKappaDLnRho, scale * 10, "d/d log R");
    }

    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 200, seed = "20261204")
    void derivativesMatchCentralDifferences(@ForAll @Scale(9) @DoubleRange(min = 3.8, max = 7.8) double logT,
                                            @ForAll @Scale(9) @DoubleRange(min = -7.5, max = 0.5) double logR) {
        // The demo table; derivatives with respect to ln rho and ln T against central differences.
        TabulatedOpacity model = new TabulatedOpacity(DemoTable.set(), OutOfRangePolicy.REFUSE);
        double t = Math.pow(10, logT);
        double rho = Grids.rho(logT, logR);
        OpacityResult r = new OpacityResult();
        OpacityResult p = new OpacityResult();
        OpacityResult m = new OpacityResult();
        model.evaluate(t, rho, 0.5, 0.01, -1, r);
        double h = 1e-7; // small: the interpolant is C1, so a difference straddling a seam errs by ~h |jump f''|
        model.evaluate(t, rho * Math.exp(h), 0.5, 0.01, -1, p);
        model.evaluate(t, rho * Math.exp(-h), 0.5, 0.01, -1, m);
        double fdRho = (Math.log(p.kappa) - Math.log(m.kappa)) / (2 * h);
        model.evaluate(t * Math.exp(h), rho, 0.5, 0.01, -1, p);
        model.evaluate(t * Math.exp(-h), rho, 0.5, 0.01, -1, m);
        double fdT = (Math.log(p.kappa) - Math.log(m.kappa)) / (2 * h);
        assertEquals(fdRho, r.dLnKappaDLnRho, 1e-6 * Math.max(1, Math.abs(fdRho)));
        assertEquals(fdT, r.dLnKappaDLnT, 1e-6 * Math.max(1, Math.abs(fdT)));
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void compositionBlendIsExactForQuadratics() {
        // log kappa = c(x, y) + q(X, Z) with q quadratic in X and Z (cross term included): the blended
        // quadratics reproduce q exactly, for rows of Z with different X sets.
        DoubleBinaryOperator q = (hx, mz) -> 0.3 - 1.1 * hx + 0.8 * hx * hx + 6 * mz - 40 * mz * mz + 2.5 * hx * mz;
        double[] t = Grids.uniform(4, 5, 6);
        double[] r = Grids.uniform(-3, -1, 6);
        double[][] rows = {{0.0, 0.2, 0.5, 0.7}, {0.1, 0.35, 0.6, 0.75, 0.9}, {0.0, 0.4, 0.8}, {0.05, 0.5, 0.85}};
        double[] zs = {0.0, 0.01, 0.03, 0.06};
        List<OpacityGrid> grids = new ArrayList<>();
        for (int k = 0; k < zs.length; k++) {
            for (double hx : rows[k]) {
                double mz = zs[k];
                grids.add(Grids.grid(hx, mz, t, r, (x, y) -> SMOOTH.applyAsDouble(x, y) + q.applyAsDouble(hx, mz)));
            }
        }
        for (boolean fast : new boolean[] {true, false}) {
            OpacityTableSet set = new OpacityTableSet("blend", grids, fast);
            SplittableRandom rnd = new SplittableRandom(9);
            for (int k = 0; k < 300; k++) {
                double hx = rnd.nextDouble(0.1, 0.7);
                double mz = rnd.nextDouble(0.0, 0.06);
                double x = t[2];
                double y = r[3];
                double expected = SMOOTH.applyAsDouble(x, y) + q.applyAsDouble(hx, mz);
                double[] e = eval(set, x, y, hx, mz, OutOfRangePolicy.REFUSE);
                assertEquals(expected, e[0], 1e-12, "X = " + hx + ", Z = " + mz);
                assertEquals(OpacityStatus.INSIDE.ordinal(), (int) e[3]);
            }
            // outside the X range of a row
            assertEquals("hydrogen", assertThrows(InvalidInputException.class,
                    () -> eval(set, t[2], r[2], 0.95, 0.02, OutOfRangePolicy.REFUSE)).field());
            assertEquals(OpacityStatus.CLAMPED.ordinal(),
                    (int) eval(set, t[2], r[2], 0.95, 0.02, OutOfRangePolicy.CLAMP)[3]);
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void fastAndGeneralPathsAgree() {
        double[] t = Grids.nonUniform(3.5, 8.0, 15, 11);
        double[] r = Grids.nonUniform(-8.0, 1.0, 12, 12);
        List<OpacityGrid> grids = new ArrayList<>();
        for (double z : new double[] {0.001, 0.02, 0.04}) {
            for (double hx : new double[] {0.0, 0.35, 0.7}) {
                grids.add(Grids.grid(hx, z, t, r, (x, y) -> SMOOTH.applyAsDouble(x, y) * (1 + hx) + 10 * z * y));
            }
        }
        OpacityTableSet fast = new OpacityTableSet("fast", grids, true);
        OpacityTableSet general = new OpacityTableSet("general", grids, false);
        assertTrue(fast.usesFastPath());
        SplittableRandom rnd = new SplittableRandom(13);
        for (int k = 0; k < 500; k++) {
            double x = rnd.nextDouble(3.5, 8.0);
            double y = rnd.nextDouble(-8.0, 1.0);
            double hx = rnd.nextDouble(0, 0.7);
            double z = rnd.nextDouble(0.01, 0.04);
            double[] a = eval(fast, x, y, hx, z, OutOfRangePolicy.REFUSE);
            double[] b = eval(general, x, y, hx, z, OutOfRangePolicy.REFUSE);
            assertEquals(b[0], a[0], 1e-12);
            assertEquals(b[1], a[1], 1e-10);
            assertEquals(b[2], a[2], 1e-10);
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void demoTableInterpolatesTheAnalyticModel() {
        // The demo table: h = 0.05 dex in log T, 0.125 dex in log R, Z in {0.01, 0.02, 0.04}.
        // (1) At the table compositions only the (log T, log R) interpolation errs. The sharpest features
        // are the crossovers between parts: along log R conduction (slope -2) against Kramers (+1), a slope
        // change of 3 over ~1/(3 ln 10) = 0.14 dex, so the fourth derivative is ~3 / 0.14^3 ~ 1e3 per dex^4
        // and the cubic Hermite error h^4 f'''' / 384 is ~7e-4 dex at h = 0.125, times a few for
        // estimated slopes. Required: 5e-3 dex (1.2% in kappa).
        // (2) Between compositions log kappa goes as log Z (bound-free, H-minus): a quadratic in Z through
        // 0.01, 0.02, 0.04 misses log10 Z by up to h^3 f''' / (9 sqrt 3) with f''' = 2 / (Z^3 ln 10),
        // ~0.056 dex at Z = 0.01. Required: 0.06 dex.
        TabulatedOpacity table = new TabulatedOpacity(DemoTable.set(), OutOfRangePolicy.CLAMP);
        OpacityResult a = new OpacityResult();
        OpacityResult b = new OpacityResult();
        SplittableRandom rnd = new SplittableRandom(14);
        double[] hs = {0.0, 0.35, 0.7};
        double[] zs = {0.01, 0.02, 0.04};
        for (boolean onNodes : new boolean[] {true, false}) {
            double worst = 0;
            for (int k = 0; k < 4000; k++) {
                double lt = rnd.nextDouble(3.5, 8.5);
                double lr = rnd.nextDouble(-9, 1);
                double hx = onNodes ? hs[rnd.nextInt(3)] : rnd.nextDouble(0, 0.7);
                double z = onNodes ? zs[rnd.nextInt(3)] : rnd.nextDouble(0.01, 0.04);
                double t = Math.pow(10, lt);
                double rho = Grids.rho(lt, lr);
                table.evaluate(t, rho, hx, z, -1, a); // CLAMP only matters for points a rounding hair outside
                AnalyticOpacity.DEFAULT.evaluate(t, rho, hx, z, -1, b);
                worst = Math.max(worst, Math.abs(Math.log10(a.kappa) - Math.log10(b.kappa)));
            }
            double tolerance = onNodes ? 5e-3 : 0.06;
            assertTrue(worst < tolerance, (onNodes ? "at" : "between") + " table compositions: worst log kappa error "
                    + worst);
            System.out.printf("demo table vs analytic model %s table compositions: worst %.2e dex%n",
                    onNodes ? "at" : "between", worst);
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void eightThreadsGiveBitIdenticalResults() throws Exception {
        TabulatedOpacity model = new TabulatedOpacity(DemoTable.set(), OutOfRangePolicy.EXTRAPOLATE);
        int n = 20000;
        double[] ts = new double[n];
        double[] rhos = new double[n];
        double[] xs = new double[n];
        double[] zs = new double[n];
        SplittableRandom rnd = new SplittableRandom(15);
        for (int k = 0; k < n; k++) {
            double lt = rnd.nextDouble(3.4, 8.6);
            ts[k] = Math.pow(10, lt);
            rhos[k] = Grids.rho(lt, rnd.nextDouble(-9.5, 1.5));
            xs[k] = rnd.nextDouble(0, 0.75);
            zs[k] = rnd.nextDouble(0.0, 0.05);
        }
        double[] serial = run(model, ts, rhos, xs, zs, 0, 1);
        ExecutorService pool = Executors.newFixedThreadPool(8);
        try {
            List<Future<double[]>> parts = new ArrayList<>();
            for (int p = 0; p < 8; p++) {
                int offset = p;
                parts.add(pool.submit(() -> run(model, ts, rhos, xs, zs, offset, 8)));
            }
            double[] parallel = new double[3 * n];
            for (int p = 0; p < 8; p++) {
                double[] part = parts.get(p).get();
                for (int k = p; k < n; k += 8) {
                    System.arraycopy(part, 3 * k, parallel, 3 * k, 3);
                }
            }
            assertArrayEquals(serial, parallel); // exact equality, bit for bit
        } finally {
            pool.shutdownNow();
        }
    }

    private static double[] run(TabulatedOpacity model, double[] ts, double[] rhos, double[] xs, double[] zs,
                                int offset, int step) {
        OpacityResult r = new OpacityResult();
        double[] out = new double[3 * ts.length];
        for (int k = offset; k < ts.length; k += step) {
            model.evaluate(ts[k], rhos[k], xs[k], zs[k], -1, r);
            out[3 * k] = r.kappa;
            out[3 * k + 1] = r.dLnKappaDLnRho;
            out[3 * k + 2] = r.dLnKappaDLnT;
        }
        return out;
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void memoryIsFourDoublesPerNode() {
        OpacityTableSet set = DemoTable.set();
        long values = set.tabulatedValues();
        long held = set.heldDoubles();
        long axes = 101 + 81;
        long compositions = 2L * set.tableCount();
        // raw: the log kappa values plus the axes and (X, Z) that place them
        long raw = values + axes + compositions;
        assertEquals(9L * 101 * 81, values);
        assertTrue(held <= 4 * raw, "held " + held + " doubles for " + raw + " raw");
        System.out.printf("demo table set: %d log kappa values, %d raw doubles, %d held doubles (%.4f x raw, %.4f x values)%n",
                values, raw, held, held / (double) raw, held / (double) values);
    }
}
