package io.github.startransport.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Several profiles in one call: every file is attempted, the good ones are written, each refused
 * one is reported with file, line and column, a closing line counts them; and the timescales of
 * a star whose surface luminosity is not positive.
 */
class SeveralProfilesTest {

    private static Path bad(Path dir, String name) throws IOException {
        String[] rows = ProfileFiles.ROWS;
        return ProfileFiles.write(dir, name, ProfileFiles.HEADER, rows[0], rows[1],
                "2.0e10,1.2e33,6.0e6,5,3.0e15,3.5e33,0.7,zero", rows[3], rows[4]);
    }

    @Test
    void everyFileIsAttemptedTheGoodOnesWrittenTheBadOnesNamedAndCounted(@TempDir Path dir) throws IOException {
        Path a = ProfileFiles.valid(dir, "a.csv");
        Path b = bad(dir, "b.csv");
        Path c = ProfileFiles.valid(dir, "c.csv");
        Path d = ProfileFiles.write(dir, "d.csv", "r_cm,m_g", "1,2");
        Path out = dir.resolve("out");
        Runs r = Runs.run("diagnose", a.toString(), b.toString(), c.toString(), d.toString(), "--out", out.toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(Files.isRegularFile(out.resolve("a/summary.json")) && Files.isRegularFile(out.resolve("c/zones.csv")),
                r.toString());
        assertFalse(Files.exists(out.resolve("b")) || Files.exists(out.resolve("d")));
        assertTrue(r.err().contains("startransport: " + b + ":4:8: column Z (column 8): 'zero' is not a number"),
                r.err());
        assertTrue(r.err().contains("startransport: " + d + ":1: "), r.err());
        assertTrue(r.err().contains("4 profiles: 2 diagnosed into " + out + "/<file name>/, 2 refused"), r.err());
        assertEquals(2, Pattern.compile("written to ").matcher(r.out()).results().count(), r.out());
    }

    @Test
    void whenEveryFileIsRefusedThePreviousOutputStays(@TempDir Path dir) throws IOException {
        Path a = ProfileFiles.valid(dir, "a.csv");
        Path c = ProfileFiles.valid(dir, "c.csv");
        Path out = dir.resolve("out");
        assertEquals(0, Runs.run("diagnose", a.toString(), c.toString(), "--out", out.toString()).code());
        Path target = out.toRealPath();
        Runs r = Runs.run("diagnose", bad(dir, "a2.csv").toString(), bad(dir, "c2.csv").toString(), "--out",
                out.toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(r.err().contains("2 profiles: 0 diagnosed, 2 refused; " + out + " is left as it was"), r.err());
        assertEquals(target, out.toRealPath());
        assertTrue(Files.isRegularFile(out.resolve("a/summary.json")));
    }

    private static Path withSurfaceLuminosity(Path dir, String name, String luminosity) throws IOException {
        String[] rows = ProfileFiles.ROWS.clone();
        rows[4] = rows[4].replace(",3.8e33,", "," + luminosity + ",");
        return ProfileFiles.write(dir, name, ProfileFiles.HEADER, rows[0], rows[1], rows[2], rows[3], rows[4]);
    }

    @Test
    void withoutPositiveSurfaceLuminosityTheKelvinHelmholtzTimeIsNullEverywhereWithAWarning(@TempDir Path dir)
            throws IOException {
        for (String l : List.of("0", "-3.8e33")) {
            Path p = withSurfaceLuminosity(dir, "p.csv", l);
            Path out = dir.resolve("out" + l);
            Runs r = Runs.run("diagnose", p.toString(), "--out", out.toString());
            assertEquals(0, r.code(), r.toString());
            JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
            assertTrue(s.get("kelvin_helmholtz_time_yr").isNull(), s.toString());
            assertTrue(s.get("photon_diffusion_time_yr").asDouble() > 0);
            assertTrue(r.out().contains("Kelvin-Helmholtz n/a"), r.out());
            assertTrue(r.out().contains("warning: the surface luminosity is L = ") && r.out().contains("not > 0"),
                    r.out());
            // never a negative or infinite time on the terminal or in the summary
            assertFalse(r.out().matches("(?s).*timescales:[^\\n]*(-\\d|Infinity).*"), r.out());
            assertFalse(Files.readString(out.resolve("summary.json")).contains("Infinity"));
            Path track = dir.resolve("track" + l);
            assertEquals(0, Runs.run("track", p.toString(), "--out", track.toString()).code());
            String row = Files.readAllLines(track.resolve("track.csv")).get(1);
            assertTrue(row.endsWith(","), "the Kelvin-Helmholtz cell is empty: " + row);
        }
    }
}
