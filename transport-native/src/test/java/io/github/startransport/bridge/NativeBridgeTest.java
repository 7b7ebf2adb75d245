package io.github.startransport.bridge;

import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.StabilityColumns;
import io.github.startransport.spi.StabilityModel;
import io.github.startransport.spi.ThermodynamicsModel;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneMajorJacobian;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.DoubleBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The Java half of the C interface, without the C half: its constants are the ones the C header
 * and the Fortran module declare, its workspace has the layout startransport.c expects, a chunk's
 * results are the Java API's, a refused zone is renumbered for the host, and a call allocates
 * nothing once warm. Runs on every machine, with or without a C compiler.
 */
class NativeBridgeTest {
    private static final Pattern CONSTANT = Pattern.compile("\\b(STT_\\w+|A_\\w+)\\s*=\\s*(\\d+)");

    private static Transport transport;
    private static ZoneColumns zones;

    @BeforeAll
    static void open() throws IOException {
        assertEquals(NativeBridge.OK, NativeBridge.open(new Workspace()));
        transport = Transport.discover();
        Path dir = NativeTools.exampleFiles(800);
        zones = ExampleData.readProfile(dir.resolve("profile.csv"));
        ExampleData.complete(zones, (ThermodynamicsModel) ExampleData.model(transport, 0),
                (OpacityModel) ExampleData.model(transport, 1), null, null);
    }

    private static Map<String, Integer> constants(String relative) throws IOException {
        String text = Files.readString(NativeTools.MODULE.resolve(relative));
        Map<String, Integer> found = new HashMap<>();
        Matcher m = CONSTANT.matcher(text);
        while (m.find()) {
            found.putIfAbsent(m.group(1), Integer.parseInt(m.group(2)));
        }
        return found;
    }

    @Test
    void headerAndFortranModuleDeclareTheBridgesCodes() throws IOException {
        Map<String, Integer> c = constants("src/main/c/startransport.h");
        Map<String, Integer> f = constants("src/main/fortran/startransport.f90");
        Map<String, Integer> java = Map.ofEntries(Map.entry("STT_OK", NativeBridge.OK),
                Map.entry("STT_INVALID_INPUT", NativeBridge.INVALID_INPUT),
                Map.entry("STT_INVALID_OPTION", NativeBridge.INVALID_OPTION),
                Map.entry("STT_UNKNOWN_MODEL", NativeBridge.UNKNOWN_MODEL),
                Map.entry("STT_DATA_FORMAT", NativeBridge.DATA_FORMAT), Map.entry("STT_NO_JVM", NativeBridge.NO_JVM),
                Map.entry("STT_NO_CLASSES", NativeBridge.NO_CLASSES),
                Map.entry("STT_BAD_ARGUMENT", NativeBridge.BAD_ARGUMENT),
                Map.entry("STT_JAVA_ERROR", NativeBridge.JAVA_ERROR),
                Map.entry("STT_RADIATIVE", NativeBridge.RADIATIVE), Map.entry("STT_CONVECTIVE", NativeBridge.CONVECTIVE),
                Map.entry("STT_SEMICONVECTIVE", NativeBridge.SEMICONVECTIVE),
                Map.entry("STT_THERMOHALINE", NativeBridge.THERMOHALINE), Map.entry("STT_INSIDE", NativeBridge.INSIDE),
                Map.entry("STT_CLAMPED", NativeBridge.CLAMPED), Map.entry("STT_EXTRAPOLATED", NativeBridge.EXTRAPOLATED));
        java.forEach((name, value) -> {
            assertEquals(value, c.get(name), name + " in startransport.h");
            assertEquals(value, f.get(name), name + " in startransport.f90");
        });
        assertEquals(c.get("STT_NO_MEMORY"), f.get("STT_NO_MEMORY"));
        assertEquals(c.get("STT_NO_THREAD"), f.get("STT_NO_THREAD"));
        // derivative indices: the SPI's, 0-based in C and 1-based in Fortran
        Map<String, Integer> inputs = Map.ofEntries(Map.entry("STT_T", ZoneInput.T), Map.entry("STT_RHO", ZoneInput.RHO),
                Map.entry("STT_P", ZoneInput.P), Map.entry("STT_L", ZoneInput.L), Map.entry("STT_M", ZoneInput.M),
                Map.entry("STT_R", ZoneInput.R), Map.entry("STT_KAPPA", ZoneInput.KAPPA),
                Map.entry("STT_CP", ZoneInput.CP), Map.entry("STT_NABLA_AD", ZoneInput.NABLA_AD),
                Map.entry("STT_DELTA", ZoneInput.DELTA), Map.entry("STT_NABLA_MU", ZoneInput.NABLA_MU),
                Map.entry("STT_PHI", ZoneInput.PHI), Map.entry("STT_ALPHA", ZoneInput.ALPHA),
                Map.entry("STT_D_NABLA", ZoneMajorJacobian.NABLA), Map.entry("STT_D_VELOCITY", ZoneMajorJacobian.VELOCITY),
                Map.entry("STT_D_CONVECTIVE_FRACTION", ZoneMajorJacobian.CONVECTIVE_FRACTION),
                Map.entry("STT_D_DIFFUSION", ZoneMajorJacobian.DIFFUSION));
        inputs.forEach((name, value) -> {
            assertEquals(value, c.get(name), name + " in startransport.h");
            assertEquals(value + 1, f.get(name), name + " in startransport.f90 (1-based)");
        });
        assertEquals(ZoneInput.COUNT, c.get("STT_INPUTS"));
        assertEquals(ZoneInput.COUNT, f.get("STT_INPUTS"));
        assertEquals(ZoneMajorJacobian.OUTPUTS, c.get("STT_CONVECTION_OUTPUTS"));
        assertEquals(ZoneMajorJacobian.OUTPUTS, f.get("STT_CONVECTION_OUTPUTS"));
    }

    @Test
    void workspaceHasTheLayoutTheCLibraryReads() throws IOException {
        Map<String, Integer> c = constants("src/main/c/startransport.c");
        Object[] arrays = new Workspace().arrays();
        assertEquals(c.get("A_COUNT"), arrays.length);
        int chunk = Workspace.CHUNK;
        for (int i = 0; i < c.get("A_CODES"); i++) {
            assertEquals(chunk, ((double[]) arrays[i]).length, "array " + i);
        }
        assertEquals(chunk, ((int[]) arrays[c.get("A_CODES")]).length);
        assertEquals(chunk * ZoneMajorJacobian.PER_ZONE, ((double[]) arrays[c.get("A_CONV_JAC")]).length);
        assertEquals(chunk * 2 * ZoneInput.COUNT, ((double[]) arrays[c.get("A_STAB_JAC")]).length);
        // the input columns in stt_zones order
        Workspace ws = new Workspace();
        Object[] a = ws.arrays();
        assertTrue(a[c.get("A_IN")] == ws.in.radius && a[c.get("A_IN") + 2] == ws.in.temperature
                && a[c.get("A_IN") + 11] == ws.in.phi && a[c.get("A_IN") + 13] == ws.in.metals);
        assertTrue(a[c.get("A_CONV")] == ws.convection.nablaRad && a[c.get("A_CONV") + 10] == ws.convection.diffusion);
        assertTrue(a[c.get("A_STAB")] == ws.stability.nablaRad && a[c.get("A_OPAC")] == ws.opacity.kappa);
    }

    /** Loads zones [from, from + count) of the profile into a workspace, as the C side does. */
    private static void load(Workspace ws, int from, int count) {
        double[][] src = {zones.radius, zones.mass, zones.temperature, zones.density, zones.pressure,
            zones.luminosity, zones.opacity, zones.cp, zones.nablaAd, zones.delta, zones.nablaMu, zones.phi,
            zones.hydrogen, zones.metals};
        for (int j = 0; j < src.length; j++) {
            System.arraycopy(src[j], from, ws.inputColumns[j], 0, count);
        }
    }

    @Test
    void aChunkGivesTheJavaApisResultsBitForBit() {
        ConvectionModel convection = (ConvectionModel) ExampleData.model(transport, 3);
        StabilityModel stability = (StabilityModel) ExampleData.model(transport, 2);
        int n = zones.capacity;
        ConvectionColumns expected = new ConvectionColumns(n);
        convection.solveColumns(zones, 0, n, expected, true);
        StabilityColumns expectedStability = new StabilityColumns(n);
        stability.evaluateColumns(zones, 0, n, expectedStability);
        Workspace ws = new Workspace();
        int from = 300;
        int count = Workspace.CHUNK;
        load(ws, from, count);
        assertEquals(NativeBridge.OK, NativeBridge.convection(ws, convection, count, from, true, (1 << 14) - 1));
        for (int k = 0; k < count; k++) {
            assertEquals(Double.doubleToRawLongBits(expected.velocity[from + k]),
                    Double.doubleToRawLongBits(ws.convection.velocity[k]));
            assertEquals(expected.regime[from + k].ordinal(), ws.codes[k], "STT_ codes follow the Regime order");
            for (int i = 0; i < ZoneInput.COUNT; i++) {
                assertEquals(Double.doubleToRawLongBits(expected.dDiffusion[i][from + k]), Double.doubleToRawLongBits(
                        ws.convectionJacobian[ZoneMajorJacobian.index(k, ZoneMajorJacobian.DIFFUSION, i)]));
            }
        }
        assertEquals(NativeBridge.OK, NativeBridge.stability(ws, stability, count, from, true, (1 << 14) - 1));
        for (int k = 0; k < count; k++) {
            for (int i = 0; i < ZoneInput.COUNT; i++) {
                assertEquals(Double.doubleToRawLongBits(expectedStability.dNablaLedoux[i][from + k]),
                        Double.doubleToRawLongBits(ws.stabilityJacobian[(2 * k + 1) * ZoneInput.COUNT + i]));
            }
        }
    }

    @Test
    void aChunkWritesTheJacobianStraightIntoAHostBufferBitForBit() {
        ConvectionModel convection = (ConvectionModel) ExampleData.model(transport, 3);
        int n = zones.capacity;
        ConvectionColumns expected = new ConvectionColumns(n);
        convection.solveColumns(zones, 0, n, expected, true);
        // a host array of n zones outside the Java heap, as JNI's NewDirectByteBuffer gives it, filled
        // with a marker so that a store outside the chunks' blocks shows
        ByteBuffer host = ByteBuffer.allocateDirect(n * ZoneMajorJacobian.PER_ZONE * Double.BYTES);
        DoubleBuffer view = host.order(ByteOrder.nativeOrder()).asDoubleBuffer();
        for (int i = 0; i < view.capacity(); i++) {
            view.put(i, -7.0);
        }
        Workspace ws = new Workspace();
        // a whole chunk from zone 300, then an odd-sized last chunk ending at the array's end
        int[][] chunks = {{300, Workspace.CHUNK}, {n - 37, 37}};
        for (int[] chunk : chunks) {
            int from = chunk[0];
            int count = chunk[1];
            load(ws, from, count);
            assertEquals(NativeBridge.OK,
                    NativeBridge.convectionDirect(ws, convection, count, from, (1 << 14) - 1, host, from));
            for (int k = 0; k < count; k++) {
                assertEquals(Double.doubleToRawLongBits(expected.nabla[from + k]),
                        Double.doubleToRawLongBits(ws.convection.nabla[k]));
                assertEquals(expected.regime[from + k].ordinal(), ws.codes[k]);
                for (int i = 0; i < ZoneInput.COUNT; i++) {
                    int at = ZoneMajorJacobian.index(from + k, 0, i);
                    assertEquals(Double.doubleToRawLongBits(expected.dNabla[i][from + k]),
                            Double.doubleToRawLongBits(view.get(at)));
                    assertEquals(Double.doubleToRawLongBits(expected.dVelocity[i][from + k]),
                            Double.doubleToRawLongBits(view.get(at + ZoneInput.COUNT)));
                    assertEquals(Double.doubleToRawLongBits(expected.dConvectiveFraction[i][from + k]),
                            Double.doubleToRawLongBits(view.get(at + 2 * ZoneInput.COUNT)));
                    assertEquals(Double.doubleToRawLongBits(expected.dDiffusion[i][from + k]),
                            Double.doubleToRawLongBits(view.get(at + 3 * ZoneInput.COUNT)));
                }
            }
        }
        // nothing outside the two chunks' blocks was touched
        int untouched = 0;
        for (int i = 0; i < view.capacity(); i++) {
            int zone = i / ZoneMajorJacobian.PER_ZONE;
            boolean inChunk = (zone >= 300 && zone < 300 + Workspace.CHUNK) || zone >= n - 37;
            if (!inChunk) {
                assertEquals(-7.0, view.get(i), "entry " + i + " (zone " + zone + ") outside the chunks");
                untouched++;
            }
        }
        assertEquals((n - Workspace.CHUNK - 37) * ZoneMajorJacobian.PER_ZONE, untouched);
        // a refused zone in a direct call is renumbered like any other
        load(ws, 0, 20);
        ws.in.density[7] = -3.0;
        assertEquals(NativeBridge.INVALID_INPUT,
                NativeBridge.convectionDirect(ws, convection, 20, 513 + 1, (1 << 14) - 1, host, 0));
        assertEquals("invalid input density = -3.0 g cm^-3 in zone 521: must be finite and > 0", ws.message);
    }

    @Test
    void absentColumnsTakeTheirDefaults() {
        ConvectionModel convection = (ConvectionModel) ExampleData.model(transport, 3);
        Workspace ws = new Workspace();
        load(ws, 0, 10);
        java.util.Arrays.fill(ws.in.phi, 7.0);
        java.util.Arrays.fill(ws.in.nablaMu, 7.0);
        int withoutPhiAndNablaMu = ((1 << 14) - 1) & ~(1 << 10) & ~(1 << 11);
        assertEquals(NativeBridge.OK, NativeBridge.convection(ws, convection, 10, 0, false, withoutPhiAndNablaMu));
        for (int k = 0; k < 10; k++) {
            assertEquals(1.0, ws.in.phi[k]);
            assertEquals(0.0, ws.in.nablaMu[k]);
        }
    }

    @Test
    void aRefusedZoneIsRenumberedForTheHost() {
        ConvectionModel convection = (ConvectionModel) ExampleData.model(transport, 3);
        Workspace ws = new Workspace();
        load(ws, 0, 20);
        ws.in.density[7] = -3.0;
        // a chunk starting at host zone 513 (0-based) of a Fortran host (origin 1): 7 + 513 + 1
        int status = NativeBridge.convection(ws, convection, 20, 513 + 1, true, (1 << 14) - 1);
        assertEquals(NativeBridge.INVALID_INPUT, status);
        assertEquals("invalid input density = -3.0 g cm^-3 in zone 521: must be finite and > 0", ws.message);
    }

    @Test
    void modelsAreMadeOrRefusedWithAStatus() {
        Workspace ws = new Workspace();
        assertNotNull(NativeBridge.create(ws, "convection", "local-mixing-length", "alpha=2"));
        assertEquals(NativeBridge.CONVECTION, ws.family);
        assertNotNull(NativeBridge.create(ws, "opacity", null, null));
        assertEquals(NativeBridge.OPACITY, ws.family);
        assertNull(NativeBridge.create(ws, "star", "corvina", ""));
        assertEquals(NativeBridge.BAD_ARGUMENT, ws.family);
        assertNull(NativeBridge.create(ws, "convection", "nope", ""));
        assertEquals(NativeBridge.UNKNOWN_MODEL, ws.family);
        assertNull(NativeBridge.create(ws, "convection", "local-mixing-length", "alpha"));
        assertEquals(NativeBridge.INVALID_OPTION, ws.family);
        assertNull(NativeBridge.create(ws, "opacity", "table", "file=/no/such/table.csv"));
        assertTrue(ws.family != NativeBridge.OK && ws.message.contains("/no/such/table.csv"), ws.message);
    }

    @Test
    void warmCallsAllocateNothingOnTheJavaSide() {
        com.sun.management.ThreadMXBean threads = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        ConvectionModel convection = (ConvectionModel) ExampleData.model(transport, 3);
        StabilityModel stability = (StabilityModel) ExampleData.model(transport, 2);
        OpacityModel opacity = (OpacityModel) ExampleData.model(transport, 1);
        ThermodynamicsModel thermo = (ThermodynamicsModel) ExampleData.model(transport, 0);
        Workspace ws = new Workspace();
        int count = Workspace.CHUNK;
        load(ws, 100, count);
        int all = (1 << 14) - 1;
        int some = all & ~(1 << 12) & ~(1 << 13);
        ByteBuffer host = ByteBuffer.allocateDirect(count * ZoneMajorJacobian.PER_ZONE * Double.BYTES);
        // rounds of 10000 chunk calls until one allocates nothing: the first rounds may see the JIT
        // recompile (and reallocate what it had scalar-replaced), a steady state allocates 0 bytes
        java.util.List<Long> rounds = new java.util.ArrayList<>();
        for (int round = 0; round < 12; round++) {
            long before = threads.getCurrentThreadAllocatedBytes();
            for (int i = 0; i < 2000; i++) {
                NativeBridge.thermodynamics(ws, thermo, count, 0);
                NativeBridge.opacity(ws, opacity, count, 0);
                NativeBridge.stability(ws, stability, count, 0, true, all);
                NativeBridge.convection(ws, convection, count, 0, true, some);
                NativeBridge.convectionDirect(ws, convection, count, 0, some, host, 0);
            }
            rounds.add(threads.getCurrentThreadAllocatedBytes() - before);
            if (round > 0 && rounds.get(round) == 0) {
                break;
            }
        }
        assertEquals(0L, rounds.get(rounds.size() - 1), "bytes allocated per round of 10000 chunk calls: " + rounds);
    }
}
