package io.github.startransport.cli;

import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.Transport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** {@code table build} and {@code table check} through the main entry point. */
class TableCommandTest {

    @Test
    void buildWritesTheModelsValuesAtEveryNodeAndCheckReportsTheGrid(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("k.csv");
        Runs r = Runs.run("table", "build", "--out", file.toString(), "--hydrogen", "0.2,0.7", "--metals", "0.02",
                "--log-t", "4:7:7", "--log-r", "-6,-3,0");
        assertEquals(0, r.code(), r.toString());
        assertTrue(r.out().contains("2 (X, Z) tables, 42 values"), r.out());
        // every row equals log10 of the model's own kappa at that node, where
        // rho = 10^(log_R + 3 log_T - 18) (the format's definition of log_R)
        OpacityModel model = Transport.discover().opacity(null, ModelOptions.defaults());
        OpacityResult k = new OpacityResult();
        List<String> rows = Files.readAllLines(file).stream().filter(l -> !l.startsWith("#")).toList();
        assertEquals("X,Z,log_T,log_R,log_kappa", rows.get(0));
        assertEquals(43, rows.size());
        for (String row : rows.subList(1, rows.size())) {
            String[] f = row.split(",");
            double x = Double.parseDouble(f[0]);
            double z = Double.parseDouble(f[1]);
            double logT = Double.parseDouble(f[2]);
            double logR = Double.parseDouble(f[3]);
            model.evaluate(Math.pow(10, logT), Math.pow(10, logR + 3 * logT - 18), x, z, -1, k);
            assertEquals(Math.log10(k.kappa), Double.parseDouble(f[4]), 1e-12, row);
        }
        Runs c = Runs.run("table", "check", file.toString());
        assertEquals(0, c.code(), c.toString());
        assertTrue(c.out().contains("0.7000 0.0200") && c.out().contains("100.00%"), c.out());
    }

    @Test
    void checkOfAMalformedFileNamesLineAndColumn(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("bad.csv");
        Files.writeString(file, "X,Z,log_T,log_R,log_kappa\n0.7,0.02,4.0,-3,1.0\n0.7,0.02,4.0,x,1.0\n");
        Runs r = Runs.run("table", "check", file.toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(r.err().contains("bad.csv:3:"), r.err());
        assertTrue(r.err().contains("log_R"), r.err());
    }

    @Test
    void malformedAxisIsAUsageError(@TempDir Path dir) {
        Path file = dir.resolve("never.csv");
        Runs r = Runs.run("table", "build", "--out", file.toString(), "--log-t", "4:7");
        assertEquals(2, r.code(), r.toString());
        assertTrue(r.err().contains("--log-t"), r.err());
        assertFalse(Files.exists(file));
    }

    @Test
    void diagnoseReadsATableBuiltByTheTool(@TempDir Path dir) {
        Path file = dir.resolve("k.csv");
        assertEquals(0, Runs.run("table", "build", "--out", file.toString(), "--hydrogen", "0.6,0.7,0.8",
                "--metals", "0.01,0.02,0.03", "--log-t", "3.8:7.3:71", "--log-r", "-7:1:33").code());
        Runs r = Runs.run("diagnose", "--demo", "--opacity-table", file.toString(), "--out",
                dir.resolve("out").toString());
        assertEquals(0, r.code(), r.toString());
        assertTrue(Files.exists(dir.resolve("out/zones.csv")));
        assertTrue(r.out().contains("opacity table"), r.out());
    }

    @Test
    void aZoneTheOpacityTableRefusesIsReportedAtItsLineInTheFile(@TempDir Path dir) throws IOException {
        // a table that starts at log T = 5: cooler zones are outside it, and the table model refuses them
        Path table = dir.resolve("hot.csv");
        assertEquals(0, Runs.run("table", "build", "--out", table.toString(), "--hydrogen", "0.6,0.7,0.8",
                "--metals", "0.01,0.02,0.03", "--log-t", "5:7.3:47", "--log-r", "-7:1:33").code());
        io.github.startransport.spi.Profile p = Transport.discover().star(null, ModelOptions.parse("zones=40")).profile();
        int n = p.size();
        StringBuilder csv = new StringBuilder("# surface first\nr_cm,m_g,T_K,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z\n");
        int innermostCool = -1;
        for (int k = n - 1; k >= 0; k--) {
            double t = p.value(io.github.startransport.spi.ProfileColumn.TEMPERATURE, k);
            if (t < 1e5) {
                innermostCool = k;
            }
            csv.append(p.value(io.github.startransport.spi.ProfileColumn.RADIUS, k)).append(',')
                    .append(p.value(io.github.startransport.spi.ProfileColumn.MASS, k)).append(',')
                    .append(t).append(',')
                    .append(p.value(io.github.startransport.spi.ProfileColumn.DENSITY, k)).append(',')
                    .append(p.value(io.github.startransport.spi.ProfileColumn.PRESSURE, k)).append(',')
                    .append(p.value(io.github.startransport.spi.ProfileColumn.LUMINOSITY, k)).append(",0.7,0.02\n");
        }
        Path profile = dir.resolve("surface-first.csv");
        Files.writeString(profile, csv);
        Path out = dir.resolve("out");
        Runs r = Runs.run("diagnose", profile.toString(), "--opacity-table", table.toString(), "--out", out.toString());
        assertEquals(1, r.code(), r.toString());
        // the diagnosis walks centre to surface, so the first refusal is the innermost cool zone;
        // in this surface-first file it is data row n - innermostCool, on line 2 + that row
        int expectedLine = 2 + (n - innermostCool);
        assertTrue(r.err().contains("surface-first.csv:" + expectedLine + ":"), r.err() + " expected line " + expectedLine);
        assertFalse(Files.exists(out));
    }
    @Test
    void aGridBeyondTheLimitIsRefusedUpFrontAndTheExistingFileKept(@TempDir Path dir) throws IOException {
        // the issue's case: 2300 x 2200 nodes for 9 compositions into an existing file
        Path file = Files.writeString(dir.resolve("existing.csv"), "precious\n");
        Runs r = Runs.run("table", "build", "--out", file.toString(), "--hydrogen", "0,0.35,0.7", "--metals",
                "0.01,0.02,0.03", "--log-t", "3:8:2300", "--log-r", "-9:1:2200");
        assertEquals(2, r.code(), r.toString()); // a bad option value: a usage error
        assertTrue(r.err().contains("45,540,000") && r.err().contains("at most 4,000,000"), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
        assertEquals("precious\n", Files.readString(file));
        assertEquals(List.of("existing.csv"), OutputFolderTest.names(dir));
    }

    @Test
    void aBuildThatFailsLeavesTheExistingFileAsItWasAndNoTemporaryFile(@TempDir Path dir) throws IOException {
        Path small = dir.resolve("small.csv");
        assertEquals(0, Runs.run("table", "build", "--out", small.toString(), "--hydrogen", "0.7", "--metals", "0.02",
                "--log-t", "4:5:3", "--log-r", "-3:-2:3").code());
        Path file = Files.writeString(dir.resolve("existing.csv"), "precious\n");
        // a table model that refuses every node of a grid outside its own: no row at all can be written
        Runs r = Runs.run("table", "build", "--out", file.toString(), "--opacity", "table", "--model-options",
                "file=" + small + ",out-of-range=refuse", "--hydrogen", "0.7", "--metals", "0.02", "--log-t", "7:8:3",
                "--log-r", "0:1:3");
        assertEquals(1, r.code(), r.toString());
        assertEquals("precious\n", Files.readString(file));
        assertEquals(List.of("existing.csv", "small.csv"), OutputFolderTest.names(dir));
        // a build that succeeds replaces it whole
        Runs ok = Runs.run("table", "build", "--out", file.toString(), "--hydrogen", "0.7", "--metals", "0.02",
                "--log-t", "4:5:3", "--log-r", "-3:-2:3");
        assertEquals(0, ok.code(), ok.toString());
        assertEquals(Files.readString(small), Files.readString(file));
        assertEquals(List.of("existing.csv", "small.csv"), OutputFolderTest.names(dir));
    }

    @Test
    void checkNamesTheRowThatIsOffTheGrid(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("t.csv");
        StringBuilder b = new StringBuilder("X,Z,log_T,log_R,log_kappa\n");
        for (int i = 0; i < 5; i++) {
            for (int j = 0; j < 5; j++) {
                String logR = i == 3 && j == 2 ? "-2.000000000001" : String.valueOf(-4.0 + j);
                b.append("0.7,0.02,").append(4.0 + 0.5 * i).append(',').append(logR).append(",1.0\n");
            }
        }
        Files.writeString(file, b.toString());
        Runs r = Runs.run("table", "check", file.toString());
        assertEquals(1, r.code(), r.toString());
        // header on line 1, row (i, j) on line 2 + 5 i + j: the odd row is line 19, log_R from column 14
        assertTrue(r.err().contains("t.csv:19:14:") && r.err().contains("off the grid"), r.err());
    }
}
