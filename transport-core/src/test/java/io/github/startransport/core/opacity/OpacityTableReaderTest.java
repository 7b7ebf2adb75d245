package io.github.startransport.core.opacity;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityGridSpec;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OpacityStatus;
import io.github.startransport.spi.OpacityTableSummary;
import io.github.startransport.spi.OpacityTableTool;
import io.github.startransport.spi.OutOfRangePolicy;
import io.github.startransport.spi.Transport;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class OpacityTableReaderTest {
    private static final String HEADER = "X,Z,log_T,log_R,log_kappa\n";

    /** A valid 2 x 3 table for X = 0.7, Z = 0.02 (lines 3..8 after a comment and the header). */
    private static final String GOOD = "# a comment\n" + HEADER
            + "0.7,0.02,4.0,-3.0,1.0\n"
            + "0.7,0.02,4.0,-2.5,1.1\n"
            + "0.7,0.02,4.0,-2.0,1.2\n"
            + "0.7,0.02,4.5,-3.0,0.5\n"
            + "0.7,0.02,4.5,-2.5,0.6\n"
            + "0.7,0.02,4.5,-2.0,0.7\n";

    private static DataFormatException refused(String text) {
        return assertThrows(DataFormatException.class, () -> OpacityTableReader.parse(text, "t.csv"));
    }

    private static void assertRefused(String text, int line, int column, String reasonPart) {
        DataFormatException e = refused(text);
        assertEquals("t.csv", e.source());
        assertEquals(line, e.line(), e.getMessage());
        assertEquals(column, e.column(), e.getMessage());
        assertTrue(e.reason().contains(reasonPart), e.getMessage());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void readsAGoodFile() {
        OpacityTableSet set = OpacityTableReader.parse(GOOD, "t.csv");
        assertEquals(1, set.tableCount());
        assertEquals(6, set.tabulatedValues());
        OpacityResult r = new OpacityResult();
        set.evaluateLogs(4.5, -2.5, 0, 0, 0.7, 0.02, OutOfRangePolicy.REFUSE, -1, r);
        assertEquals(0.6, Math.log10(r.kappa), 1e-12);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void wrongHeader() {
        assertRefused("# c\nX,Z,logT,log_R,log_kappa\n0.7,0.02,4,-3,1\n", 2, 5, "wrong header");
        assertRefused("X,Z,log_T,log_R\n", 1, 16, "wrong header");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void nonNumericValue() {
        assertRefused(HEADER + "0.7,0.02,4.0,abc,1.0\n", 2, 14, "log_R is not a number");
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,1.0d\n", 2, 19, "log_kappa is not a number");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void nonFiniteValue() {
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,NaN\n", 2, 19, "log_kappa is not finite");
        assertRefused(HEADER + "0.7,0.02,-Infinity,-3.0,1\n", 2, 10, "log_T is not finite");
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,1e400\n", 2, 19, "not finite");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void logKappaBeyondADoubleIsRefusedAtItsCell() {
        // 10^510432 is no double: before, such a file loaded and a lookup inside it was refused as
        // "extrapolated"; now the cell is named when the file is read
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,510432\n", 2, 19, "|log_kappa| <= 300");
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,-300.5\n", 2, 19, "log_kappa = '-300.5'");
        // the limit itself is accepted: the text reads (here only one node, so only the parse is asked)
        String edge = GOOD.replace("4.5,-2.0,0.7", "4.5,-2.0,300");
        assertEquals(1, OpacityTableReader.parse(edge, "t.csv").tableCount());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void wrongFieldCount() {
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0\n", 2, 18, "too few fields");
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,1,2\n", 2, 21, "too many fields");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void duplicatePoint() {
        assertRefused(GOOD + "0.7,0.02,4.5,-2.5,0.9\n", 9, 1, "duplicate point");
        assertTrue(refused(GOOD + "0.7,0.02,4.5,-2.5,0.9\n").reason().contains("line 7"));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void notRectangular() {
        String missing = GOOD.replace("0.7,0.02,4.5,-2.5,0.6\n", "");
        // the first row with log_T = 4.5 is line 6; its log_R field starts at column 14
        assertRefused(missing, 6, 14, "not rectangular");
        assertTrue(refused(missing).reason().contains("log_R=-2.5"));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void singlePointAxis() {
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,1\n0.7,0.02,4.0,-2.0,1\n", 2, 10, "single log_T value");
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,1\n0.7,0.02,4.5,-3.0,1\n", 2, 14, "single log_R value");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void impossibleComposition() {
        assertRefused(HEADER + "0.9,0.2,4.0,-3.0,1\n", 2, 5, "exceeds 1");
        assertRefused(HEADER + "-0.1,0.02,4.0,-3.0,1\n", 2, 1, "X = -0.1 is negative");
        assertRefused(HEADER + "0.7,-0.02,4.0,-3.0,1\n", 2, 5, "Z = -0.02 is negative");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void missingHeaderOrRows() {
        assertRefused("# only comments\n", 0, 0, "no header");
        assertRefused("# c\n" + HEADER, 0, 0, "no data rows");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void declaredHolesAreAllowedAndOutOfRange() {
        // 3 x 4 grid without its high-T, high-R corner, declared
        String text = "# absent: X=0.7 Z=0.02 log_T=5.0 log_R=-1.0..0.0\n" + HEADER
                + "0.7,0.02,4.0,-3.0,1.0\n0.7,0.02,4.0,-2.0,1.1\n0.7,0.02,4.0,-1.0,1.2\n0.7,0.02,4.0,0.0,1.3\n"
                + "0.7,0.02,4.5,-3.0,0.5\n0.7,0.02,4.5,-2.0,0.6\n0.7,0.02,4.5,-1.0,0.7\n0.7,0.02,4.5,0.0,0.8\n"
                + "0.7,0.02,5.0,-3.0,0.2\n0.7,0.02,5.0,-2.0,0.3\n";
        OpacityTableSet set = OpacityTableReader.parse(text, "t.csv");
        assertEquals(10, set.tabulatedValues());
        OpacityResult r = new OpacityResult();
        set.evaluateLogs(4.2, -2.5, 0, 0, 0.7, 0.02, OutOfRangePolicy.REFUSE, -1, r);
        assertEquals(OpacityStatus.INSIDE, r.status);
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> set.evaluateLogs(4.7, -0.5, 0, 1, 0.7, 0.02, OutOfRangePolicy.REFUSE, 5, r));
        assertTrue(e.requirement().contains("hole"), e.getMessage());
        assertEquals(5, e.zone());
        OpacityResult edge = new OpacityResult();
        set.evaluateLogs(4.7, -2.0, 0, 1, 0.7, 0.02, OutOfRangePolicy.REFUSE, -1, edge);
        set.evaluateLogs(4.7, -0.5, 0, 1, 0.7, 0.02, OutOfRangePolicy.CLAMP, -1, r);
        assertEquals(OpacityStatus.CLAMPED, r.status);
        assertEquals(edge.kappa, r.kappa, 1e-12 * edge.kappa); // moved to the usable cell's edge at log R = -2
        assertEquals(0.0, r.dLnKappaDLnRho); // clamped along log R
        set.evaluateLogs(4.7, -0.5, 0, 1, 0.7, 0.02, OutOfRangePolicy.EXTRAPOLATE, -1, r);
        assertEquals(OpacityStatus.EXTRAPOLATED, r.status);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void undeclaredHoleAndBadDeclarations() {
        String body = HEADER + "0.7,0.02,4.0,-3.0,1.0\n0.7,0.02,4.0,-2.0,1.1\n0.7,0.02,4.5,-3.0,0.5\n";
        assertRefused(body, 4, 14, "not rectangular");
        assertRefused("# absent: X=0.7 Z=0.02 log_T=4.5 log_R=-2.0\n" + body + "0.7,0.02,4.5,-2.0,0.6\n",
                6, 10, "inside the hole declared on line 1");
        assertRefused("# absent: X=0.7 Z=0.02 log_T=4.5\n" + body, 1, 1, "needs all of");
        assertRefused("#absent: X=0.7 Z=0.02 log_T=4.5 log_R=x\n" + body, 1, 33, "not a number");
        assertRefused("# absent: X=0.3 Z=0.02 log_T=4.5 log_R=-2\n" + body, 1, 1, "no rows");
        assertRefused("# absent: X=0.7 Y=0.28 log_T=4.5 log_R=-2\n" + body, 1, 17, "not 'Y'");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void aRowSlightlyOffTheGridIsNamedAsSuch() {
        // the issue's case: one log_R off by 1e-12 (line 7, the 5th data row; log_R starts at column 14)
        String off = GOOD.replace("0.7,0.02,4.5,-2.5,0.6\n", "0.7,0.02,4.5,-2.499999999999,0.6\n");
        assertRefused(off, 7, 14, "off the grid");
        assertTrue(refused(off).reason().contains("log_R=-2.5"), refused(off).getMessage());
        String offT = GOOD.replace("0.7,0.02,4.5,-3.0,0.5\n", "0.7,0.02,4.500000000001,-3.0,0.5\n");
        assertRefused(offT, 6, 10, "log_T=4.500000000001 is off the grid");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void aMissingNodeIsNamedAtItsNeighbour() {
        String missing = GOOD.replace("0.7,0.02,4.5,-2.0,0.7\n", "");
        // the missing node is (4.5, -2.0); its nearest row in the log_T = 4.5 line is line 7
        assertRefused(missing, 7, 14, "no row for log_T=4.5, log_R=-2.0");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void fortyThousandSingleNodeHolesAreRead() {
        // log_T 0..400 x log_R 0..200; the nodes with log_T >= 201 and odd log_R are absent, each declared
        // on its own line, and every declaration given twice: 40,000 lines (the holes table build used to write)
        StringBuilder holes = new StringBuilder();
        for (int i = 201; i <= 400; i++) {
            for (int j = 1; j <= 200; j += 2) {
                holes.append("# absent: X=0.7 Z=0.02 log_T=").append(i).append(" log_R=").append(j).append('\n');
            }
        }
        StringBuilder b = new StringBuilder().append(holes).append(holes).append(HEADER);
        for (int i = 0; i <= 400; i++) {
            for (int j = 0; j <= 200; j++) {
                if (i <= 200 || j % 2 == 0) {
                    b.append("0.7,0.02,").append(i).append(',').append(j).append(",1.0\n");
                }
            }
        }
        OpacityTableSet set = OpacityTableReader.parse(b.toString(), "many");
        assertEquals(401 * 201 - 20_000, set.tabulatedValues());
        // a row inside a declared hole is found and named with the first line declaring it
        DataFormatException e = refused(b + "0.7,0.02,201,1,1.0\n");
        assertTrue(e.reason().contains("inside the hole declared on line 1"), e.getMessage());
        // and an undeclared missing node among them is still found
        String undeclared = b.toString().replace("0.7,0.02,300,4,1.0\n", "");
        assertTrue(refused(undeclared).reason().contains("no row for log_T=300.0, log_R=4.0"));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void builderWritesRectanglesOfRefusedNodesAsRanges() {
        // a model that refuses two blocks: log_T > 5 with log_R > -2, and log_T < 4.2 with log_R < -5
        OpacityModel blocks = (t, rho, x, z, zone, out) -> {
            double lt = Math.log10(t);
            double lr = Math.log10(rho) - 3 * lt + 18;
            if ((lt > 5.0001 && lr > -1.9999) || (lt < 4.1999 && lr < -5.0001)) {
                throw new InvalidInputException("T", t, "K", zone, "outside the test's blocks");
            }
            AnalyticOpacity.DEFAULT.evaluate(t, rho, x, z, zone, out);
        };
        OpacityGridSpec grid = new OpacityGridSpec(new double[] {0.0, 0.7}, new double[] {0.02},
                OpacityGridSpec.evenly(4.0, 6.0, 21), OpacityGridSpec.evenly(-6.0, -1.0, 21));
        StringBuilder text = new StringBuilder();
        long refusedNodes = OpacityTableBuilder.write(blocks, grid, "", text);
        // per table: log_T 5.1..6.0 (10 values) x log_R -1.75..-1.0 (4); log_T 4.0..4.1 (2) x log_R -6.0..-5.25 (4)
        assertEquals(2 * (10 * 4 + 2 * 4), refusedNodes);
        long absentLines = text.toString().lines().filter(l -> l.startsWith("# absent:")).count();
        assertEquals(4, absentLines, text.toString().lines().filter(l -> l.startsWith("#")).toList().toString());
        OpacityTableSet set = OpacityTableReader.parse(text.toString(), "blocks");
        assertEquals(2 * 21 * 21 - refusedNodes, set.tabulatedValues());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void aTooLargeGridIsRefusedBeforeAnythingIsWritten() {
        // the issue's grid: 2300 x 2200 log T, log R nodes, 9 compositions (45.5 million nodes; 48 * that overflows an int)
        OpacityGridSpec huge = new OpacityGridSpec(new double[] {0.0, 0.35, 0.7}, new double[] {0.01, 0.02, 0.03},
                OpacityGridSpec.evenly(3.0, 8.0, 2300), OpacityGridSpec.evenly(-9.0, 1.0, 2200));
        assertEquals(45_540_000L, huge.nodes());
        StringBuilder text = new StringBuilder();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> OpacityTableBuilder.write(AnalyticOpacity.DEFAULT, huge, "", text));
        assertTrue(e.getMessage().contains("45,540,000") && e.getMessage().contains("4,000,000"), e.getMessage());
        assertEquals(0, text.length());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void builderRoundTripIsExactAtNodes() {
        OpacityGridSpec grid = new OpacityGridSpec(new double[] {0.0, 0.7}, new double[] {0.02},
                OpacityGridSpec.evenly(4.0, 6.0, 9), OpacityGridSpec.evenly(-6.0, -1.0, 6));
        OpacityTableSet set = OpacityTableReader.parse(OpacityTableBuilder.text(AnalyticOpacity.DEFAULT, grid), "b");
        OpacityResult a = new OpacityResult();
        OpacityResult b = new OpacityResult();
        for (double x : grid.hydrogen()) {
            for (double lt : grid.logT()) {
                for (double lr : grid.logR()) {
                    set.evaluateLogs(lt, lr, 0, 0, x, 0.02, OutOfRangePolicy.REFUSE, -1, a);
                    AnalyticOpacity.DEFAULT.evaluate(Math.pow(10, lt), Grids.rho(lt, lr), x, 0.02, -1, b);
                    assertEquals(Math.log10(b.kappa), Math.log10(a.kappa), 1e-12);
                }
            }
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void builderWritesRefusedNodesAsHoles() {
        // a table model that refuses outside its range, tabulated on a wider grid
        OpacityModel inner = new TabulatedOpacity(OpacityTableReader.parse(GOOD, "inner"), OutOfRangePolicy.REFUSE);
        OpacityGridSpec wider = new OpacityGridSpec(new double[] {0.7}, new double[] {0.02},
                new double[] {4.0, 4.5, 5.0}, new double[] {-3.0, -2.5, -2.0});
        StringBuilder text = new StringBuilder();
        assertEquals(3, OpacityTableBuilder.write(inner, wider, "wider", text));
        OpacityTableSet set = OpacityTableReader.parse(text.toString(), "wider");
        assertEquals(6, set.tabulatedValues());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void toolThroughTheContractBuildsAndChecks(@TempDir Path dir) throws Exception {
        Transport transport = Transport.discover();
        OpacityModel analytic = transport.opacity(null, ModelOptions.defaults());
        assertTrue(analytic instanceof AnalyticOpacity, "the default opacity is the analytic composite");
        OpacityTableTool tool = transport.opacityTables(null, ModelOptions.defaults());
        Path file = dir.resolve("small.csv");
        OpacityGridSpec grid = new OpacityGridSpec(new double[] {0.0, 0.7}, new double[] {0.02},
                OpacityGridSpec.evenly(4.0, 6.0, 5), OpacityGridSpec.evenly(-6.0, -1.0, 6));
        OpacityTableSummary s = tool.build(analytic, grid, file);
        assertEquals(2, s.tables().size());
        assertEquals(60, s.values());
        assertEquals(5, s.tables().get(0).logTCount());
        assertEquals(1.0, s.tables().get(0).coverage());
        assertEquals(6.0, s.tables().get(1).logTMax());
        OpacityModel table = transport.opacity("table",
                ModelOptions.parse("file=" + file + ",out-of-range=clamp"));
        OpacityResult r = new OpacityResult();
        table.evaluate(1e7, 1.0, 0.7, 0.02, -1, r);
        assertEquals(OpacityStatus.CLAMPED, r.status);
        Files.writeString(file, Files.readString(file).replace("X,Z,log_T", "X,Z,logT"));
        assertEquals(file.toString(), assertThrows(DataFormatException.class, () -> tool.check(file)).source());
        // the demo table, by name with no file
        OpacityModel demo = transport.opacity("table", ModelOptions.defaults());
        demo.evaluate(1e6, 1e-3, 0.7, 0.02, -1, r);
        assertEquals(OpacityStatus.INSIDE, r.status);
    }
}
