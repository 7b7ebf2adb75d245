package io.github.startransport.cli;

import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.TransportProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The command line through {@link Main}: usage errors (exit 2), and every bad-input case of the
 * issue (exit 1, the message names file, line and column, and nothing is written). None of
 * these needs a diagnosis: the input is refused before the physics is asked for anything.
 */
class MainTest {

    /**
     * Entries of the folder other than the given inputs: must be none after a refused run. The
     * output folder's lock file ({@code .out.lock}, documented to stay once made) is not output.
     */
    private static List<Path> leftovers(Path dir, Path... inputs) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> !List.of(inputs).contains(p) && !p.getFileName().toString().equals(".out.lock"))
                    .toList();
        }
    }

    private static void assertRefusedWithNothingWritten(Runs r, Path dir, Path... inputs) throws IOException {
        assertEquals(1, r.code(), r.toString());
        assertTrue(r.err().startsWith("startransport: "), r.toString());
        assertEquals(List.of(), leftovers(dir, inputs), r.toString());
    }

    @Test
    void helpListsTheCommandsAndExitsZero() {
        Runs r = Runs.run("--help");
        assertEquals(0, r.code(), r.toString());
        assertTrue(r.out().contains("diagnose") && r.out().contains("models"), r.out());
    }

    @Test
    void diagnoseHelpDocumentsFormatDefaultsAndExitCodes() {
        Runs r = Runs.run("diagnose", "--help");
        assertEquals(0, r.code(), r.toString());
        String help = r.out().replaceAll("\\s+", " ");
        for (String s : List.of("--out", "--alpha", "--criterion", "--convection", "--opacity", "--opacity-table",
                "--columns", "--demo", "--overshoot-f", "--overshoot-f0", "--overshoot-step", "Default: diagnosis", "Default: schwarzschild", "r_cm", "kappa_cm2_g",
                "Exit codes")) {
            assertTrue(help.contains(s), "help lacks " + s + ":\n" + r.out());
        }
    }

    @Test
    void usageErrorsExitWithTwo(@TempDir Path dir) throws IOException {
        Path p = ProfileFiles.valid(dir, "p.csv");
        String out = dir.resolve("out").toString();
        List<String[]> cases = List.of(
                new String[] {},
                new String[] {"nonsense"},
                new String[] {"diagnose", "--out", out},
                new String[] {"diagnose", "--demo", p.toString(), "--out", out},
                new String[] {"diagnose", p.toString(), "--criterion", "sideways", "--out", out},
                new String[] {"diagnose", p.toString(), "--alpha", "-1", "--out", out},
                new String[] {"diagnose", p.toString(), "--alpha", "many", "--out", out},
                new String[] {"diagnose", p.toString(), "--opacity", "x", "--opacity-table", p.toString(), "--out", out},
                new String[] {"diagnose", p.toString(), "--no-such-option", "--out", out},
                new String[] {"diagnose", "--demo", "--columns", "T=temperature", "--out", out},
                new String[] {"diagnose", p.toString(), "--overshoot-f", "-0.01", "--out", out},
                new String[] {"diagnose", p.toString(), "--overshoot-f", "0.016", "--overshoot-step", "0.2", "--out", out},
                new String[] {"diagnose", p.toString(), "--overshoot-f0", "0.01", "--out", out},
                new String[] {"diagnose", p.toString(), "--overshoot-f", "0.016", "--overshoot-f0", "1.5", "--out", out},
                new String[] {"diagnose", p.toString(), "--overshoot-step", "NaN", "--out", out},
                new String[] {"diagnose", p.toString(), "--columns", "temperature", "--out", out},
                new String[] {"diagnose", p.toString(), "--columns", "A=temperature,B=T_K", "--out", out},
                new String[] {"diagnose", p.toString(), "--delimiter", "pipe", "--out", out},
                new String[] {"diagnose", p.toString(), "--x-axis", "time", "--out", out},
                new String[] {"diagnose", p.toString(), "--convection", "no-such-model", "--out", out},
                new String[] {"track", p.toString(), "--ages", "1e9,2e9", "--out", out},
                new String[] {"track", p.toString(), "--ages", "young", "--out", out},
                new String[] {"track", p.toString(), "--criterion", "sideways", "--out", out},
                new String[] {"envelope", "--mass-msun", "1", "--radius-rsun", "1", "--luminosity-lsun", "1",
                    "--hydrogen", "0.7", "--metals", "0.02", "--alpha", "1.5", "--calibrate-base", "0.7", "--out", out},
                new String[] {"envelope", "--mass-msun", "1", "--radius-rsun", "1", "--luminosity-lsun", "1",
                    "--hydrogen", "0.7", "--metals", "0.02", "--opacity", "no-such-model", "--out", out},
                new String[] {"table", "build", "--out", out, "--log-t", "8.5:3.5:4"},
                new String[] {"table", "build", "--out", out, "--log-t", "3.5:8.5:4.5"},
                new String[] {"table", "build", "--out", out, "--hydrogen", "0.7", "--metals", "0.5"},
                new String[] {"table", "build", "--out", out, "--opacity", "no-such-model"});
        for (String[] args : cases) {
            Runs r = Runs.run(args);
            assertEquals(2, r.code(), String.join(" ", args) + "\n" + r);
            assertFalse(r.err().isBlank(), String.join(" ", args));
            assertFalse(r.err().contains("Exception") || r.err().contains("\tat "), r.toString());
            assertFalse(r.err().matches("(?s).*[ =(]\\d+\\.0[ ,;:)].*"), "a whole number printed as x.0: " + r.err());
        }
        assertEquals(List.of(), leftovers(dir, p));
    }

    @Test
    void missingRequiredColumnExitsOneNamingFileLineAndColumn(@TempDir Path dir) throws IOException {
        Path p = ProfileFiles.write(dir, "nokappa.csv", "# c", "r_cm,m_g,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z",
                "1e9,1e31,150,2e17,1e32,0.7,0.02");
        Runs r = Runs.run("diagnose", p.toString(), "--out", dir.resolve("out").toString());
        assertRefusedWithNothingWritten(r, dir, p);
        assertTrue(r.err().contains(p + ":2:") && r.err().contains("T_K"), r.err());
    }

    @Test
    void unknownColumnInColumnsOptionIsAUsageErrorNamingIt(@TempDir Path dir) throws IOException {
        Path p = ProfileFiles.valid(dir, "p.csv");
        Runs ours = Runs.run("diagnose", p.toString(), "--columns", "Temp=temprature", "--out",
                dir.resolve("out").toString());
        assertEquals(2, ours.code(), ours.toString());
        assertTrue(ours.err().contains("'temprature'"), ours.err());
        assertEquals(List.of(), leftovers(dir, p));
    }

    @Test
    void aColumnsMapNamingAColumnTheFileLacksIsBadInput(@TempDir Path dir) throws IOException {
        Path p = ProfileFiles.valid(dir, "p.csv");
        Runs theirs = Runs.run("diagnose", p.toString(), "--columns", "Temp=temperature", "--out",
                dir.resolve("out").toString());
        assertRefusedWithNothingWritten(theirs, dir, p);
        assertTrue(theirs.err().contains("'Temp'") && theirs.err().contains(p.toString()), theirs.err());
    }

    @Test
    void nonNumericCellExitsOneWithLineAndColumn(@TempDir Path dir) throws IOException {
        String[] rows = ProfileFiles.ROWS;
        Path p = ProfileFiles.write(dir, "p.csv", ProfileFiles.HEADER, rows[0], rows[1],
                "2.0e10,1.2e33,6.0e6,5,3.0e15,3.5e33,0.7,zero point two", rows[3], rows[4]);
        Runs r = Runs.run("diagnose", p.toString(), "--out", dir.resolve("out").toString());
        assertRefusedWithNothingWritten(r, dir, p);
        // line 4 (header on line 1), column Z is the 8th
        assertTrue(r.err().contains(p + ":4:8:") && r.err().contains("column Z (column 8)"), r.err());
    }

    @Test
    void unreadableFileExitsOne(@TempDir Path dir) throws IOException {
        Path missing = dir.resolve("missing.csv");
        Runs r = Runs.run("diagnose", missing.toString(), "--out", dir.resolve("out").toString());
        assertRefusedWithNothingWritten(r, dir);
        assertTrue(r.err().contains(missing.toString()) && r.err().contains("cannot be read"), r.err());
    }

    @Test
    void nonMonotonicRadiusExitsOneNamingTheLine(@TempDir Path dir) throws IOException {
        String[] rows = ProfileFiles.ROWS;
        Path p = ProfileFiles.write(dir, "p.csv", "# c", ProfileFiles.HEADER, rows[0], rows[1], rows[2],
                "1.0e10,1.9e33,1.0e6,0.1,1.0e13,3.8e33,0.7,0.02", rows[4]);
        Runs r = Runs.run("diagnose", p.toString(), "--out", dir.resolve("out").toString());
        assertRefusedWithNothingWritten(r, dir, p);
        assertTrue(r.err().contains(p + ":6:1:") && r.err().contains("r_cm"), r.err());
    }

    @Test
    void outputFolderUnderARegularFileExitsOneAndWritesNothing(@TempDir Path dir) throws IOException {
        Path p = ProfileFiles.valid(dir, "p.csv");
        Path file = Files.writeString(dir.resolve("not-a-folder"), "x");
        Runs r = Runs.run("diagnose", p.toString(), "--out", file.resolve("out").toString());
        assertRefusedWithNothingWritten(r, dir, p, file);
        assertEquals("x", Files.readString(file));
        Runs deeper = Runs.run("diagnose", p.toString(), "--out", file.resolve("a/b/out").toString());
        assertRefusedWithNothingWritten(deeper, dir, p, file);
        assertTrue(deeper.err().contains("not-a-folder"), deeper.err());
    }

    @Test
    void outputFolderHoldingOtherFilesIsLeftAlone(@TempDir Path dir) throws IOException {
        Path p = ProfileFiles.valid(dir, "p.csv");
        Path out = Files.createDirectory(dir.resolve("out"));
        Path mine = Files.writeString(out.resolve("notes.txt"), "keep me");
        Runs r = Runs.run("diagnose", p.toString(), "--out", out.toString());
        assertRefusedWithNothingWritten(r, dir, p, out);
        assertEquals("keep me", Files.readString(mine));
        try (Stream<Path> s = Files.list(out)) {
            assertEquals(List.of(mine), s.toList());
        }
    }

    @Test
    void twoProfilesWithTheSameStemAreRefused(@TempDir Path dir) throws IOException {
        Path a = Files.createDirectory(dir.resolve("a"));
        Path b = Files.createDirectory(dir.resolve("b"));
        Path pa = ProfileFiles.valid(a, "star.csv");
        Path pb = ProfileFiles.valid(b, "star.csv");
        Runs r = Runs.run("diagnose", pa.toString(), pb.toString(), "--out", dir.resolve("out").toString());
        assertRefusedWithNothingWritten(r, dir, a, b);
    }

    @Test
    void unknownModelNameIsAUsageErrorNamingItAndWritesNothing(@TempDir Path dir) throws IOException {
        Path p = ProfileFiles.valid(dir, "p.csv");
        for (String option : List.of("--convection", "--opacity")) {
            Runs r = Runs.run("diagnose", p.toString(), option, "no-such-model", "--out",
                    dir.resolve("out").toString());
            assertEquals(2, r.code(), r.toString());
            assertTrue(r.err().contains(option + " no-such-model"), r.err());
            assertEquals(List.of(), leftovers(dir, p));
        }
    }

    @Test
    void modelsListsEveryProviderAndModelWithOptionDefaults() {
        Runs r = Runs.run("models");
        assertEquals(0, r.code(), r.toString());
        Transport t = Transport.discover();
        for (TransportProvider p : t.providers()) {
            assertTrue(r.out().contains(p.name()), r.out());
            for (ModelInfo m : p.models()) {
                assertTrue(r.out().contains(m.name()), "no " + m.name() + " in\n" + r.out());
                for (OptionInfo o : m.options()) {
                    assertTrue(r.out().contains("option " + o.name() + " = " + o.defaultValue()),
                            "no " + o.name() + " of " + m.name() + " in\n" + r.out());
                }
            }
        }
    }
}
