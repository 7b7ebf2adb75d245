package io.github.startransport.core.batch;

import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.convection.MixingLengthGeometry;
import io.github.startransport.core.convection.TransparentEddyMixingLength;
import io.github.startransport.core.gradient.GradientStability;
import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.core.opacity.DemoTable;
import io.github.startransport.core.opacity.TabulatedOpacity;
import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.OpacityColumns;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OutOfRangePolicy;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.StabilityColumns;
import io.github.startransport.spi.StabilityModel;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneMajorJacobian;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Per-zone and batch calls give bit-identical results (every value and every derivative), over the
 * demo star's 2000 zones (all four regimes occur under Ledoux with nabla_mu mixed in) and over a
 * profile split across threads; a bad zone is refused with its column index.
 */
class BatchIdentityTest {

    /** The demo star's zones, completed by the ideal-gas thermodynamics and the analytic opacity, with a random nabla_mu. */
    static ZoneColumns demoColumns(int zones, long seed) {
        Profile p = new DemoStar(zones).profile();
        int n = p.size();
        ZoneColumns c = new ZoneColumns(n);
        ThermoResult th = new ThermoResult();
        OpacityResult op = new OpacityResult();
        SplittableRandom rnd = new SplittableRandom(seed);
        for (int k = 0; k < n; k++) {
            c.radius[k] = p.value(ProfileColumn.RADIUS, k);
            c.mass[k] = p.value(ProfileColumn.MASS, k);
            c.temperature[k] = p.value(ProfileColumn.TEMPERATURE, k);
            c.density[k] = p.value(ProfileColumn.DENSITY, k);
            // scaled so that stable and unstable zones alternate
            c.luminosity[k] = p.value(ProfileColumn.LUMINOSITY, k) * Math.pow(10.0, rnd.nextDouble(-2.0, 0.5));
            c.hydrogen[k] = p.value(ProfileColumn.HYDROGEN, k);
            c.metals[k] = p.value(ProfileColumn.METALS, k);
            IdealGasRadiation.INSTANCE.evaluate(c.temperature[k], c.density[k], c.hydrogen[k], c.metals[k], k, th);
            c.pressure[k] = p.value(ProfileColumn.PRESSURE, k);
            c.cp[k] = th.cp;
            c.nablaAd[k] = th.nablaAd;
            c.delta[k] = th.delta;
            AnalyticOpacity.DEFAULT.evaluate(c.temperature[k], c.density[k], c.hydrogen[k], c.metals[k], k, op);
            c.opacity[k] = op.kappa;
            c.nablaMu[k] = rnd.nextDouble(-0.05, 0.3);
        }
        return c;
    }

    private static void same(double expected, double actual, String what, int k) {
        assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(actual),
                what + " in zone " + k + ": " + expected + " vs " + actual);
    }

    private static void assertSameConvection(ConvectionResult r, ConvectionColumns c, int k, boolean jacobian) {
        assertEquals(r.regime, c.regime[k]);
        same(r.nablaRad, c.nablaRad[k], "nabla_rad", k);
        same(r.nabla, c.nabla[k], "nabla", k);
        same(r.nablaElement, c.nablaElement[k], "nabla_e", k);
        same(r.velocity, c.velocity[k], "v", k);
        same(r.convectiveFraction, c.convectiveFraction[k], "Fconv/F", k);
        same(r.radiativeFraction, c.radiativeFraction[k], "Frad/F", k);
        same(r.efficiency, c.efficiency[k], "Gamma", k);
        same(r.lossParameter, c.lossParameter[k], "U", k);
        same(r.scaleHeight, c.scaleHeight[k], "H_P", k);
        same(r.mixingLength, c.mixingLength[k], "l", k);
        same(r.diffusion, c.diffusion[k], "D", k);
        if (jacobian) {
            for (int i = 0; i < ZoneInput.COUNT; i++) {
                same(r.dNabla[i], c.dNabla[i][k], "dnabla/d" + ZoneInput.name(i), k);
                same(r.dVelocity[i], c.dVelocity[i][k], "dv/d" + ZoneInput.name(i), k);
                same(r.dConvectiveFraction[i], c.dConvectiveFraction[i][k], "dFconv/d" + ZoneInput.name(i), k);
                same(r.dDiffusion[i], c.dDiffusion[i][k], "dD/d" + ZoneInput.name(i), k);
            }
        }
    }

    private static List<ConvectionModel> convectionModels() {
        return List.of(new LocalMixingLength(),
                new LocalMixingLength(1.8, Criterion.LEDOUX, MixingLengthGeometry.BOHM_VITENSE_1958),
                new TransparentEddyMixingLength(),
                new TransparentEddyMixingLength(2.0, Criterion.LEDOUX, MixingLengthGeometry.BOHM_VITENSE_1958, 1.0 / 3.0));
    }

    @Tag("internal")
    @Test
    void convectionBatchEqualsPerZoneWithAndWithoutJacobian() {
        ZoneColumns in = demoColumns(2000, 11);
        int n = in.capacity;
        EnumSet<Regime> seen = EnumSet.noneOf(Regime.class);
        for (ConvectionModel model : convectionModels()) {
            for (boolean jacobian : new boolean[] {true, false}) {
                ConvectionColumns out = new ConvectionColumns(n);
                model.solveColumns(in, 0, n, out, jacobian);
                ZoneState z = new ZoneState();
                ConvectionResult r = new ConvectionResult();
                for (int k = 0; k < n; k++) {
                    model.solve(in.load(k, z), r);
                    assertSameConvection(r, out, k, jacobian);
                    seen.add(r.regime);
                    ConvectionResult values = new ConvectionResult();
                    model.solveValues(z, values);
                    assertSameConvection(values, out, k, false);
                }
            }
        }
        // the comparison covers every branch of the kernel
        assertEquals(EnumSet.allOf(Regime.class), seen, "regimes seen: " + seen);
    }

    @Tag("internal")
    @Test
    void stabilityBatchEqualsPerZone() {
        ZoneColumns in = demoColumns(2000, 12);
        int n = in.capacity;
        for (Criterion criterion : Criterion.values()) {
            StabilityModel model = new GradientStability(criterion);
            StabilityColumns out = new StabilityColumns(n);
            model.evaluateColumns(in, 0, n, out);
            ZoneState z = new ZoneState();
            StabilityResult r = new StabilityResult();
            for (int k = 0; k < n; k++) {
                model.evaluate(in.load(k, z), r);
                assertEquals(r.regime, out.regime[k]);
                same(r.nablaRad, out.nablaRad[k], "nabla_rad", k);
                same(r.nablaAd, out.nablaAd[k], "nabla_ad", k);
                same(r.nablaLedoux, out.nablaLedoux[k], "nabla_L", k);
                same(r.marginSchwarzschild, out.marginSchwarzschild[k], "margin S", k);
                same(r.marginLedoux, out.marginLedoux[k], "margin L", k);
                for (int i = 0; i < ZoneInput.COUNT; i++) {
                    same(r.dNablaRad[i], out.dNablaRad[i][k], "dnabla_rad", k);
                    same(r.dNablaLedoux[i], out.dNablaLedoux[i][k], "dnabla_L", k);
                }
            }
        }
    }

    @Tag("internal")
    @Test
    void opacityBatchEqualsPerZone() {
        ZoneColumns in = demoColumns(2000, 13);
        int n = in.capacity;
        List<OpacityModel> models = List.of(AnalyticOpacity.DEFAULT,
                new TabulatedOpacity(DemoTable.set(), OutOfRangePolicy.CLAMP),
                new TabulatedOpacity(DemoTable.set(), OutOfRangePolicy.EXTRAPOLATE));
        for (OpacityModel model : models) {
            OpacityColumns out = new OpacityColumns(n);
            model.evaluateColumns(in, 0, n, out);
            OpacityResult r = new OpacityResult();
            for (int k = 0; k < n; k++) {
                model.evaluate(in.temperature[k], in.density[k], in.hydrogen[k], in.metals[k], k, r);
                same(r.kappa, out.kappa[k], "kappa " + model, k);
                same(r.dLnKappaDLnRho, out.dLnKappaDLnRho[k], "dlnk/dlnrho " + model, k);
                same(r.dLnKappaDLnT, out.dLnKappaDLnT[k], "dlnk/dlnT " + model, k);
                assertEquals(r.status, out.status[k]);
            }
        }
    }

    @Tag("internal")
    @Test
    void oneProfileSplitAcrossThreadsEqualsOneCall() throws Exception {
        ZoneColumns in = demoColumns(2000, 14);
        int n = in.capacity;
        ConvectionModel model = new LocalMixingLength(1.8, Criterion.LEDOUX, MixingLengthGeometry.BOHM_VITENSE_1958);
        ConvectionColumns whole = new ConvectionColumns(n);
        model.solveColumns(in, 0, n, whole, true);
        int parts = 4;
        List<ConvectionColumns> outs = new ArrayList<>();
        ExecutorService pool = Executors.newFixedThreadPool(parts);
        try {
            List<Future<?>> futures = new ArrayList<>();
            for (int t = 0; t < parts; t++) {
                int from = t * n / parts;
                int to = (t + 1) * n / parts;
                ConvectionColumns own = new ConvectionColumns(n);
                outs.add(own);
                futures.add(pool.submit(() -> model.solveColumns(in, from, to, own, true)));
            }
            for (Future<?> f : futures) {
                f.get();
            }
        } finally {
            pool.shutdownNow();
        }
        ZoneState z = new ZoneState();
        ConvectionResult r = new ConvectionResult();
        for (int t = 0; t < parts; t++) {
            for (int k = t * n / parts; k < (t + 1) * n / parts; k++) {
                model.solve(in.load(k, z), r);
                assertSameConvection(r, outs.get(t), k, true);
                assertSameConvection(r, whole, k, true);
            }
        }
    }

    @Tag("internal")
    @Test
    void badZoneIsRefusedWithItsColumnIndex() {
        ZoneColumns in = demoColumns(100, 15);
        int n = in.capacity;
        in.density[37] = -1.0;
        ConvectionColumns conv = new ConvectionColumns(n);
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new LocalMixingLength().solveColumns(in, 0, n, conv, true));
        assertEquals(37, e.zone(), e.getMessage());
        assertEquals("density", e.field());
        e = assertThrows(InvalidInputException.class,
                () -> new GradientStability(Criterion.LEDOUX).evaluateColumns(in, 0, n, new StabilityColumns(n)));
        assertEquals(37, e.zone());
        e = assertThrows(InvalidInputException.class,
                () -> AnalyticOpacity.DEFAULT.evaluateColumns(in, 10, n, new OpacityColumns(n)));
        assertEquals(37, e.zone());
        // a range that avoids the bad zone goes through
        new LocalMixingLength().solveColumns(in, 38, n, conv, true);
        assertTrue(conv.velocity[n - 1] >= 0.0);
    }

    @Tag("internal")
    @Test
    void oddRangesAcrossChunkBoundariesEqualPerZoneInEveryLayout() {
        // the batch kernels stage chunks of zones: ranges of one zone, ranges that start or end inside a
        // chunk, cross one or several chunk boundaries, or hold an odd count, in the column layout (with
        // and without the Jacobian), the zone-major block and a direct buffer; zones outside stay untouched
        ZoneColumns in = demoColumns(300, 19);
        int n = in.capacity;
        int[][] ranges = {{0, 1}, {0, 31}, {5, 37}, {31, 33}, {32, 64}, {7, 7 + 3 * 32 + 1}, {n - 1, n}, {1, n - 2}};
        ZoneState z = new ZoneState();
        ConvectionResult r = new ConvectionResult();
        for (ConvectionModel model : convectionModels()) {
            for (int[] range : ranges) {
                int from = range[0];
                int to = range[1];
                for (int layout = 0; layout < 4; layout++) {
                    ConvectionColumns out = new ConvectionColumns(n);
                    java.util.Arrays.fill(out.nabla, -5.0);
                    for (double[] column : out.dVelocity) {
                        java.util.Arrays.fill(column, -5.0);
                    }
                    double[] block = new double[n * ZoneMajorJacobian.PER_ZONE];
                    java.util.Arrays.fill(block, -5.0);
                    java.nio.DoubleBuffer buffer = java.nio.ByteBuffer.allocateDirect(block.length * Double.BYTES)
                            .order(java.nio.ByteOrder.nativeOrder()).asDoubleBuffer();
                    buffer.put(0, block);
                    if (layout == 0 || layout == 1) {
                        model.solveColumns(in, from, to, out, layout == 0);
                    } else if (layout == 2) {
                        model.solveZoneMajor(in, from, to, out, block);
                    } else {
                        model.solveZoneMajorInto(in, from, to, out, buffer);
                        buffer.get(0, block);
                    }
                    for (int k = 0; k < n; k++) {
                        boolean inside = k >= from && k < to;
                        if (!inside) {
                            same(-5.0, out.nabla[k], "nabla outside [" + from + ", " + to + ")", k);
                            same(-5.0, out.dVelocity[ZoneInput.T][k], "dv/dT outside the range", k);
                            same(-5.0, block[ZoneMajorJacobian.index(k, ZoneMajorJacobian.DIFFUSION, 12)],
                                    "block outside the range", k);
                            continue;
                        }
                        model.solve(in.load(k, z), r);
                        assertSameConvection(r, out, k, layout == 0);
                        if (layout >= 2) {
                            for (int o = 0; o < ZoneMajorJacobian.OUTPUTS; o++) {
                                double[] row = o == 0 ? r.dNabla : o == 1 ? r.dVelocity
                                        : o == 2 ? r.dConvectiveFraction : r.dDiffusion;
                                for (int i = 0; i < ZoneInput.COUNT; i++) {
                                    same(row[i], block[ZoneMajorJacobian.index(k, o, i)], "block (" + o + ", " + i
                                            + ") in layout " + layout + " of [" + from + ", " + to + ")", k);
                                }
                            }
                        }
                    }
                }
            }
        }
    }

    @Tag("internal")
    @Test
    void zonesBeforeARefusedZoneKeepTheirWholeResult() {
        // the batch kernels work on chunks of zones: a refusal in the middle of one must leave every earlier
        // zone of the range written, values and Jacobian, as the per-zone calls give them
        ZoneColumns in = demoColumns(200, 17);
        int n = in.capacity;
        int from = 3;
        int bad = 58;
        in.temperature[bad] = Double.NaN;
        ZoneState z = new ZoneState();
        ConvectionResult r = new ConvectionResult();
        for (ConvectionModel model : convectionModels()) {
            for (int layout = 0; layout < 3; layout++) {
                ConvectionColumns out = new ConvectionColumns(n);
                double[] block = new double[n * ZoneMajorJacobian.PER_ZONE];
                int mode = layout;
                InvalidInputException e = assertThrows(InvalidInputException.class, () -> {
                    if (mode == 2) {
                        model.solveZoneMajor(in, from, n, out, block);
                    } else {
                        model.solveColumns(in, from, n, out, mode == 0);
                    }
                });
                assertEquals(bad, e.zone(), e.getMessage());
                assertEquals("temperature", e.field());
                for (int k = from; k < bad; k++) {
                    model.solve(in.load(k, z), r);
                    assertSameConvection(r, out, k, mode == 0);
                    if (mode == 2) {
                        for (int i = 0; i < ZoneInput.COUNT; i++) {
                            same(r.dNabla[i], block[ZoneMajorJacobian.index(k, ZoneMajorJacobian.NABLA, i)], "block", k);
                            same(r.dDiffusion[i], block[ZoneMajorJacobian.index(k, ZoneMajorJacobian.DIFFUSION, i)],
                                    "block", k);
                        }
                    }
                }
            }
        }
    }

    @Tag("internal")
    @Test
    void badRangesAreRefused() {
        ZoneColumns in = demoColumns(100, 16);
        int n = in.capacity;
        ConvectionModel model = new LocalMixingLength();
        assertEquals("to", assertThrows(InvalidInputException.class,
                () -> model.solveColumns(in, 0, n + 1, new ConvectionColumns(n), true)).field());
        assertEquals("to", assertThrows(InvalidInputException.class,
                () -> model.solveColumns(in, 0, 60, new ConvectionColumns(50), true)).field());
        assertEquals("from", assertThrows(InvalidInputException.class,
                () -> model.solveColumns(in, -1, 10, new ConvectionColumns(n), true)).field());
        assertEquals("from", assertThrows(InvalidInputException.class,
                () -> model.solveColumns(in, 20, 10, new ConvectionColumns(n), true)).field());
        // an empty range is fine
        model.solveColumns(in, 10, 10, new ConvectionColumns(n), true);
    }
}
