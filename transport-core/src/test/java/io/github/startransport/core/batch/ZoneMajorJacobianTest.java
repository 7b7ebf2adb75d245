package io.github.startransport.core.batch;

import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.convection.MixingLengthGeometry;
import io.github.startransport.core.convection.TransparentEddyMixingLength;
import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneMajorJacobian;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.DoubleBuffer;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The zone-major Jacobian ({@link ConvectionModel#solveZoneMajor}) holds bit for bit what the
 * per-zone call gives, in the layout {@link ZoneMajorJacobian} documents, both through the core
 * models' own loop and through the interface's default; it writes only the zones asked for.
 */
class ZoneMajorJacobianTest {
    /** A bit pattern no computation produces here: a NaN with a payload. */
    private static final double UNTOUCHED = Double.longBitsToDouble(0x7ff4_0000_dead_beefL);

    /** Hides the core models' override, so that the interface's default loop runs. */
    private record ThroughDefault(ConvectionModel inner) implements ConvectionModel {
        @Override
        public double alpha() {
            return inner.alpha();
        }

        @Override
        public Criterion criterion() {
            return inner.criterion();
        }

        @Override
        public void solve(ZoneState zone, ConvectionResult out) {
            inner.solve(zone, out);
        }

        @Override
        public void solveValues(ZoneState zone, ConvectionResult out) {
            inner.solveValues(zone, out);
        }
    }

    private static List<ConvectionModel> models() {
        List<ConvectionModel> core = List.of(new LocalMixingLength(),
                new LocalMixingLength(1.8, Criterion.LEDOUX, MixingLengthGeometry.BOHM_VITENSE_1958),
                new TransparentEddyMixingLength(),
                new TransparentEddyMixingLength(2.0, Criterion.LEDOUX, MixingLengthGeometry.BOHM_CASSINELLI_1971,
                        1.0 / 3.0));
        List<ConvectionModel> all = new ArrayList<>(core);
        for (ConvectionModel m : core) {
            all.add(new ThroughDefault(m));
        }
        return all;
    }

    private static void same(double expected, double actual, String what, int k) {
        assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(actual),
                what + " in zone " + k + ": " + expected + " vs " + actual);
    }

    private static double[] derivatives(ConvectionResult r, int output) {
        return switch (output) {
            case ZoneMajorJacobian.NABLA -> r.dNabla;
            case ZoneMajorJacobian.VELOCITY -> r.dVelocity;
            case ZoneMajorJacobian.CONVECTIVE_FRACTION -> r.dConvectiveFraction;
            case ZoneMajorJacobian.DIFFUSION -> r.dDiffusion;
            default -> throw new AssertionError(output);
        };
    }

    private static void assertValues(ConvectionResult r, ConvectionColumns c, int k) {
        assertEquals(r.regime, c.regime[k], "regime in zone " + k);
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
    }

    @Tag("internal")
    @Test
    void blockEqualsPerZoneCallsBitForBit() {
        ZoneColumns in = BatchIdentityTest.demoColumns(2000, 21);
        int n = in.capacity;
        EnumSet<Regime> seen = EnumSet.noneOf(Regime.class);
        for (ConvectionModel model : models()) {
            ConvectionColumns out = new ConvectionColumns(n);
            for (double[] column : out.dNabla) {
                Arrays.fill(column, UNTOUCHED);
            }
            double[] block = new double[n * ZoneMajorJacobian.PER_ZONE];
            model.solveZoneMajor(in, 0, n, out, block);
            ZoneState z = new ZoneState();
            ConvectionResult r = new ConvectionResult();
            for (int k = 0; k < n; k++) {
                model.solve(in.load(k, z), r);
                seen.add(r.regime);
                assertValues(r, out, k);
                for (int o = 0; o < ZoneMajorJacobian.OUTPUTS; o++) {
                    double[] d = derivatives(r, o);
                    for (int i = 0; i < ZoneInput.COUNT; i++) {
                        same(d[i], block[(k * 4 + o) * 13 + i],
                                "d " + ZoneMajorJacobian.name(o) + " / d " + ZoneInput.name(i) + " of " + model, k);
                    }
                }
                // the column layout is left alone
                same(UNTOUCHED, out.dNabla[ZoneInput.T][k], "dNabla column", k);
            }
        }
        assertEquals(EnumSet.allOf(Regime.class), seen, "regimes seen: " + seen);
    }

    @Tag("internal")
    @Test
    void valuesOnlyEqualPerZoneValues() {
        ZoneColumns in = BatchIdentityTest.demoColumns(600, 22);
        int n = in.capacity;
        for (ConvectionModel model : models()) {
            ConvectionColumns out = new ConvectionColumns(n);
            model.solveZoneMajor(in, 0, n, out, null);
            ZoneState z = new ZoneState();
            ConvectionResult r = new ConvectionResult();
            for (int k = 0; k < n; k++) {
                model.solveValues(in.load(k, z), r);
                assertValues(r, out, k);
            }
        }
    }

    @Tag("internal")
    @Test
    void aRangeWritesOnlyItsOwnBlocksAtTheirColumnIndex() {
        ZoneColumns in = BatchIdentityTest.demoColumns(400, 23);
        int n = in.capacity;
        int from = 100;
        int to = 250;
        for (ConvectionModel model : models()) {
            ConvectionColumns out = new ConvectionColumns(n);
            double[] block = new double[to * ZoneMajorJacobian.PER_ZONE];
            Arrays.fill(block, UNTOUCHED);
            model.solveZoneMajor(in, from, to, out, block);
            ConvectionResult r = new ConvectionResult();
            ZoneState z = new ZoneState();
            for (int j = 0; j < block.length; j++) {
                int k = j / ZoneMajorJacobian.PER_ZONE;
                if (k < from) {
                    same(UNTOUCHED, block[j], "block entry " + j + " before the range", k);
                }
            }
            for (int k = from; k < to; k++) {
                model.solve(in.load(k, z), r);
                same(r.dVelocity[ZoneInput.KAPPA],
                        block[ZoneMajorJacobian.index(k, ZoneMajorJacobian.VELOCITY, ZoneInput.KAPPA)], "dv/dkappa", k);
            }
        }
    }

    @Tag("internal")
    @Test
    void shortBlockAndBadZoneAreRefused() {
        ZoneColumns in = BatchIdentityTest.demoColumns(200, 24);
        int n = in.capacity;
        for (ConvectionModel model : models()) {
            ConvectionColumns out = new ConvectionColumns(n);
            InvalidInputException shortBlock = assertThrows(InvalidInputException.class,
                    () -> model.solveZoneMajor(in, 0, n, out, new double[n * ZoneMajorJacobian.PER_ZONE - 1]));
            assertEquals("jacobian.length", shortBlock.field());
            double saved = in.density[77];
            in.density[77] = -1.0;
            try {
                InvalidInputException bad = assertThrows(InvalidInputException.class,
                        () -> model.solveZoneMajor(in, 0, n, out, new double[n * ZoneMajorJacobian.PER_ZONE]));
                assertEquals(77, bad.zone());
                assertTrue(bad.getMessage().contains("zone 77"), bad.getMessage());
            } finally {
                in.density[77] = saved;
            }
        }
    }

    @Tag("internal")
    @Test
    void bufferEqualsPerZoneCallsBitForBitAndWritesOnlyItsRange() {
        // direct buffers in native order (what a native host's memory looks like: stored straight into
        // memory) and in the other order, and a heap buffer (both through the buffer's puts), each from
        // position 0 and from an odd position
        ZoneColumns in = BatchIdentityTest.demoColumns(1200, 25);
        int n = in.capacity;
        int from = 37;
        ByteOrder other = ByteOrder.nativeOrder() == ByteOrder.LITTLE_ENDIAN ? ByteOrder.BIG_ENDIAN
                : ByteOrder.LITTLE_ENDIAN;
        EnumSet<Regime> seen = EnumSet.noneOf(Regime.class);
        for (ConvectionModel model : models()) {
            for (int kind = 0; kind < 3; kind++) {
                for (int origin : new int[] {0, 3 * ZoneMajorJacobian.PER_ZONE + 5}) {
                    int length = origin + n * ZoneMajorJacobian.PER_ZONE + 7;
                    DoubleBuffer block = kind == 2 ? DoubleBuffer.allocate(length)
                            : ByteBuffer.allocateDirect(length * Double.BYTES)
                                    .order(kind == 0 ? ByteOrder.nativeOrder() : other).asDoubleBuffer();
                    for (int j = 0; j < length; j++) {
                        block.put(j, UNTOUCHED);
                    }
                    block.position(origin);
                    ConvectionColumns out = new ConvectionColumns(n);
                    model.solveZoneMajorInto(in, from, n, out, block);
                    String what = model + (kind == 0 ? " (direct)" : kind == 1 ? " (direct, " + other + ")" : " (heap)")
                            + " from " + origin;
                    assertEquals(origin, block.position(), "the position is not changed: " + what);
                    for (int j = 0; j < length; j++) {
                        int k = (j - origin) / ZoneMajorJacobian.PER_ZONE;
                        if (j < origin + from * ZoneMajorJacobian.PER_ZONE || j >= origin + n * ZoneMajorJacobian.PER_ZONE) {
                            same(UNTOUCHED, block.get(j), "entry " + j + " outside the range, " + what, k);
                        }
                    }
                    ZoneState z = new ZoneState();
                    ConvectionResult r = new ConvectionResult();
                    for (int k = from; k < n; k++) {
                        model.solve(in.load(k, z), r);
                        seen.add(r.regime);
                        assertValues(r, out, k);
                        for (int o = 0; o < ZoneMajorJacobian.OUTPUTS; o++) {
                            double[] d = derivatives(r, o);
                            for (int i = 0; i < ZoneInput.COUNT; i++) {
                                same(d[i], block.get(origin + ZoneMajorJacobian.index(k, o, i)),
                                        "d " + ZoneMajorJacobian.name(o) + " / d " + ZoneInput.name(i) + ", " + what, k);
                            }
                        }
                    }
                }
            }
        }
        assertEquals(EnumSet.allOf(Regime.class), seen, "regimes seen: " + seen);
    }

    @Tag("internal")
    @Test
    void shortReadOnlyOrMissingBufferIsRefusedBeforeAnythingIsWritten() {
        ZoneColumns in = BatchIdentityTest.demoColumns(200, 26);
        int n = in.capacity;
        for (ConvectionModel model : models()) {
            ConvectionColumns out = new ConvectionColumns(n);
            Arrays.fill(out.nabla, UNTOUCHED);
            DoubleBuffer tooShort = ByteBuffer.allocateDirect((n * ZoneMajorJacobian.PER_ZONE - 1) * Double.BYTES)
                    .order(ByteOrder.nativeOrder()).asDoubleBuffer();
            assertEquals("jacobian.limit", assertThrows(InvalidInputException.class,
                    () -> model.solveZoneMajorInto(in, 0, n, out, tooShort)).field());
            // a limit below the capacity counts: the buffer's own puts would refuse past it
            DoubleBuffer limited = ByteBuffer.allocateDirect(n * ZoneMajorJacobian.PER_ZONE * Double.BYTES)
                    .order(ByteOrder.nativeOrder()).asDoubleBuffer();
            limited.limit(n * ZoneMajorJacobian.PER_ZONE - 1);
            assertEquals("jacobian.limit", assertThrows(InvalidInputException.class,
                    () -> model.solveZoneMajorInto(in, 0, n, out, limited)).field());
            // and so does the position: the blocks start there
            DoubleBuffer moved = ByteBuffer.allocateDirect(n * ZoneMajorJacobian.PER_ZONE * Double.BYTES)
                    .order(ByteOrder.nativeOrder()).asDoubleBuffer();
            moved.position(1);
            assertEquals("jacobian.limit", assertThrows(InvalidInputException.class,
                    () -> model.solveZoneMajorInto(in, 0, n, out, moved)).field());
            DoubleBuffer readOnly = DoubleBuffer.allocate(n * ZoneMajorJacobian.PER_ZONE).asReadOnlyBuffer();
            assertEquals("jacobian.readOnly", assertThrows(InvalidInputException.class,
                    () -> model.solveZoneMajorInto(in, 0, n, out, readOnly)).field());
            assertEquals("jacobian", assertThrows(InvalidInputException.class,
                    () -> model.solveZoneMajorInto(in, 0, n, out, null)).field());
            for (int k = 0; k < n; k++) {
                same(UNTOUCHED, out.nabla[k], "nabla after a refused buffer", k);
            }
        }
    }
}
