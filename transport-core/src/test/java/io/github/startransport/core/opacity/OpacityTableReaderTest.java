package io.github.startransport.core.opacity;

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

    @Test
    void readsAGoodFile() {
        OpacityTableSet set = OpacityTableReader.parse(GOOD, "t.csv");
        assertEquals(1, set.tableCount());
        assertEquals(6, set.tabulatedValues());
        OpacityResult r = new OpacityResult();
        set.evaluateLogs(4.5, -2.5, 0, 0, 0.7, 0.02, OutOfRangePolicy.REFUSE, -1, r);
        assertEquals(0.6, Math.log10(r.kappa), 1e-12);
    }

    @Test
    void wrongHeader() {
        assertRefused("# c\nX,Z,logT,log_R,log_kappa\n0.7,0.02,4,-3,1\n", 2, 5, "wrong header");
        assertRefused("X,Z,log_T,log_R\n", 1, 16, "wrong header");
    }

    @Test
    void nonNumericValue() {
        assertRefused(HEADER + "0.7,0.02,4.0,abc,1.0\n", 2, 14, "log_R is not a number");
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,1.0d\n", 2, 19, "log_kappa is not a number");
    }

    @Test
    void nonFiniteValue() {
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,NaN\n", 2, 19, "log_kappa is not finite");
        assertRefused(HEADER + "0.7,0.02,-Infinity,-3.0,1\n", 2, 10, "log_T is not finite");
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,1e400\n", 2, 19, "not finite");
    }

    @Test
    void wrongFieldCount() {
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0\n", 2, 18, "too few fields");
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,1,2\n", 2, 21, "too many fields");
    }

    @Test
    void duplicatePoint() {
        assertRefused(GOOD + "0.7,0.02,4.5,-2.5,0.9\n", 9, 1, "duplicate point");
        assertTrue(refused(GOOD + "0.7,0.02,4.5,-2.5,0.9\n").reason().contains("line 7"));
    }

    @Test
    void notRectangular() {
        String missing = GOOD.replace("0.7,0.02,4.5,-2.5,0.6\n", "");
        // the first row with log_T = 4.5 is line 6; its log_R field starts at column 14
        assertRefused(missing, 6, 14, "not rectangular");
        assertTrue(refused(missing).reason().contains("log_R=-2.5"));
    }

    @Test
    void singlePointAxis() {
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,1\n0.7,0.02,4.0,-2.0,1\n", 2, 10, "single log_T value");
        assertRefused(HEADER + "0.7,0.02,4.0,-3.0,1\n0.7,0.02,4.5,-3.0,1\n", 2, 14, "single log_R value");
    }

    @Test
    void impossibleComposition() {
        assertRefused(HEADER + "0.9,0.2,4.0,-3.0,1\n", 2, 5, "exceeds 1");
        assertRefused(HEADER + "-0.1,0.02,4.0,-3.0,1\n", 2, 1, "X = -0.1 is negative");
        assertRefused(HEADER + "0.7,-0.02,4.0,-3.0,1\n", 2, 5, "Z = -0.02 is negative");
    }

    @Test
    void missingHeaderOrRows() {
        assertRefused("# only comments\n", 0, 0, "no header");
        assertRefused("# c\n" + HEADER, 0, 0, "no data rows");
    }

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
