package io.github.startransport.cli;

import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.Transport;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.imageio.ImageIO;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code track} on an invented sequence ({@link TrackSequence}: the demo star with its core
 * hydrogen falling with age). {@code -Ddocs.dir=docs} (with {@code -Dtest=TrackCommandTest}) writes
 * the README's picture, an eight-profile Ledoux track, as {@code docs/demo-track.png}.
 */
class TrackCommandTest {
    private static final List<String> COLUMNS = List.of("model_number", "age_yr", "profile", "regime", "m_bottom_g",
            "m_top_g", "r_bottom_cm", "r_top_cm", "mass_g", "radius_cm", "luminosity_erg_s",
            "photon_diffusion_time_yr", "thermal_diffusion_time_yr", "kelvin_helmholtz_time_yr");

    @BeforeAll
    static void headless() {
        System.setProperty("java.awt.headless", "true");
    }

    private static List<CSVRecord> rows(Path csv) throws IOException {
        try (Reader r = Files.newBufferedReader(csv)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r).getRecords();
        }
    }

    private static List<String> header(Path csv) throws IOException {
        return List.of(Files.readAllLines(csv).get(0).split(","));
    }

    private static String[] args(List<Path> files, String... more) {
        List<String> a = new ArrayList<>(List.of("track"));
        files.forEach(f -> a.add(f.toString()));
        a.addAll(List.of(more));
        return a.toArray(new String[0]);
    }

    private static ProfileDiagnosis diagnose(Path file, String criterion) {
        Transport t = Transport.discover();
        ModelOptions none = ModelOptions.defaults();
        DiagnosisSetup setup = new DiagnosisSetup(t.convection(null, none.with("criterion", criterion)),
                t.opacity(null, none), t.thermodynamics(null, none));
        return t.diagnoser(null, none).diagnose(ProfileCsvReader.read(file, ColumnMap.none()).profile(), setup);
    }

    /** The rows of one model number. */
    private static List<CSVRecord> of(List<CSVRecord> rows, long model) {
        return rows.stream().filter(r -> Long.parseLong(r.get("model_number")) == model).toList();
    }

    @Test
    void agesInTheFilesGiveOneRowPerProfileAndRegionWithTheDiagnosisNumbersAndAPicture(@TempDir Path dir)
            throws IOException {
        List<Path> files = TrackSequence.write(dir, 5, true);
        Path out = dir.resolve("out");
        // given out of order: the track sorts by age
        Runs r = Runs.run(args(List.of(files.get(3), files.get(0), files.get(4), files.get(2), files.get(1)), "--out",
                out.toString()));
        assertEquals(0, r.code(), r.toString());
        assertTrue(r.out().contains("track of 5 profiles"), r.out());
        Path csv = out.resolve("track.csv");
        assertEquals(COLUMNS, header(csv));
        List<CSVRecord> rows = rows(csv);
        double previousAge = -1;
        for (CSVRecord row : rows) {
            double age = Double.parseDouble(row.get("age_yr"));
            assertTrue(age >= previousAge, "rows not in age order");
            previousAge = age;
        }
        for (int i = 0; i < files.size(); i++) {
            ProfileDiagnosis d = diagnose(files.get(i), "schwarzschild");
            List<CSVRecord> mine = of(rows, 100L * (i + 1));
            assertEquals(d.regions().size(), mine.size(), files.get(i).toString());
            for (int j = 0; j < mine.size(); j++) {
                CSVRecord row = mine.get(j);
                Region region = d.regions().get(j);
                assertEquals(TrackSequence.age(i, files.size()), Double.parseDouble(row.get("age_yr")));
                assertEquals(files.get(i).toString(), row.get("profile"));
                assertEquals(region.regime().label(), row.get("regime"));
                assertEquals(region.bottomMass(), Double.parseDouble(row.get("m_bottom_g")));
                assertEquals(region.topMass(), Double.parseDouble(row.get("m_top_g")));
                assertEquals(region.bottomRadius(), Double.parseDouble(row.get("r_bottom_cm")));
                assertEquals(region.topRadius(), Double.parseDouble(row.get("r_top_cm")));
                assertEquals(d.mass(), Double.parseDouble(row.get("mass_g")));
                // the summary's year is the Julian year, 365.25 d of 86400 s (IAU)
                assertEquals(d.timescales().kelvinHelmholtz() / (365.25 * 86400),
                        Double.parseDouble(row.get("kelvin_helmholtz_time_yr")), 1e-12 * 1e7);
            }
        }
        BufferedImage png = ImageIO.read(out.resolve("track.png").toFile());
        assertNotNull(png);
        assertEquals(1200, png.getWidth());
        assertEquals(800, png.getHeight());
    }

    @Test
    void theConvectiveCoreShrinksAsItsHydrogenIsBurnt(@TempDir Path dir) throws IOException {
        // nabla_rad = 3 kappa L P / (16 pi a c G m T^4) (Kippenhahn, Weigert & Weiss 2012 eq. 5.28) with electron
        // scattering and Kramers opacities both proportional to (1 + X): with L, P, T and m unchanged a lower X
        // lowers nabla_rad, so the Schwarzschild edge of the core moves inwards. X at a given m never rises with
        // age in this sequence (in the layers the core left it is the same in every later profile), so the core
        // top never rises, and it ends below where it started
        List<Path> files = TrackSequence.write(dir, 5, true);
        Path out = dir.resolve("out");
        assertEquals(0, Runs.run(args(files, "--out", out.toString())).code());
        List<Double> tops = new ArrayList<>();
        for (CSVRecord row : rows(out.resolve("track.csv"))) {
            if (row.get("regime").equals("convective") && Double.parseDouble(row.get("m_bottom_g")) == 0.0) {
                tops.add(Double.parseDouble(row.get("m_top_g")));
            }
        }
        assertEquals(files.size(), tops.size(), "one convective core per profile: " + tops);
        for (int i = 1; i < tops.size(); i++) {
            assertTrue(tops.get(i) <= tops.get(i - 1) * (1 + 1e-12), "core top rose: " + tops);
        }
        assertTrue(tops.get(tops.size() - 1) < tops.get(0), "core top did not fall: " + tops);
    }

    @Test
    void underLedouxTheLayersTheCoreLeftBehindAreSemiconvectiveAndTheInvertedShellThermohaline(@TempDir Path dir)
            throws IOException {
        // the README's rule table: nabla_mu > 0 with nabla_ad < nabla_rad < nabla_L is semiconvective under
        // Ledoux; nabla_mu < 0 and Ledoux-stable is thermohaline
        List<Path> files = TrackSequence.write(dir, 4, true);
        Path out = dir.resolve("out");
        Runs r = Runs.run(args(files, "--out", out.toString(), "--criterion", "ledoux"));
        assertEquals(0, r.code(), r.toString());
        List<CSVRecord> rows = rows(out.resolve("track.csv"));
        List<String> first = of(rows, 100).stream().map(x -> x.get("regime")).toList();
        assertFalse(first.contains("semiconvective") || first.contains("thermohaline"), first.toString());
        List<String> last = of(rows, 400).stream().map(x -> x.get("regime")).toList();
        assertTrue(last.contains("semiconvective") && last.contains("thermohaline"), last.toString());
        CSVRecord core = of(rows, 400).get(0);
        CSVRecord above = of(rows, 400).get(1);
        assertEquals("convective", core.get("regime"));
        assertEquals("semiconvective", above.get("regime"));
        assertEquals(core.get("m_top_g"), above.get("m_bottom_g"));
    }

    @Test
    void agesOnTheCommandLineReplaceTheFilesOnesAndMustBeOnePerProfile(@TempDir Path dir) throws IOException {
        List<Path> files = TrackSequence.write(dir, 3, true);
        Path out = dir.resolve("out");
        Runs r = Runs.run(args(files, "--out", out.toString(), "--ages", "3e9,2e9,1D9"));
        assertEquals(0, r.code(), r.toString());
        assertTrue(r.err().contains("replaced by --ages"), r.err());
        List<CSVRecord> rows = rows(out.resolve("track.csv"));
        // youngest first: the third file (1e9 yr) first
        assertEquals(files.get(2).toString(), rows.get(0).get("profile"));
        assertEquals(1e9, Double.parseDouble(rows.get(0).get("age_yr")));
        Runs wrong = Runs.run(args(files, "--out", dir.resolve("out2").toString(), "--ages", "1e9,2e9"));
        assertEquals(2, wrong.code(), wrong.toString());
        assertTrue(wrong.err().contains("2 ages for 3 profiles"), wrong.err());
        assertFalse(Files.exists(dir.resolve("out2")));
    }

    @Test
    void withoutAgesTheTrackFollowsTheModelNumbers(@TempDir Path dir) throws IOException {
        List<Path> files = TrackSequence.write(dir, 3, false);
        Path out = dir.resolve("out");
        Runs r = Runs.run(args(files, "--out", out.toString()));
        assertEquals(0, r.code(), r.toString());
        assertTrue(r.out().contains("model numbers 1 to 3"), r.out());
        for (CSVRecord row : rows(out.resolve("track.csv"))) {
            assertEquals("", row.get("age_yr"));
        }
        TrackCommand.Track track = TrackCommand.Track.of(List.of(
                point("a.csv", 1, null), point("b.csv", 2, 5e8), point("c.csv", 3, 1e9)));
        assertFalse(track.byAge());
        assertTrue(track.notes().get(0).contains("no age"), track.notes().toString());
        assertEquals("model number", TrackChart.chart(track).getXYPlot().getDomainAxis().getLabel());
    }

    private static TrackPoint point(String file, int position, Double age) {
        return new TrackPoint(file, position, null, age, 2e33, 7e10, 4e33,
                new io.github.startransport.spi.Timescales(1, 2, 3), List.of());
    }

    @Test
    void aRefusedProfileIsReportedWithItsLineAndTheOthersMakeTheTrack(@TempDir Path dir) throws IOException {
        List<Path> files = TrackSequence.write(dir, 4, true);
        List<String> lines = new ArrayList<>(Files.readAllLines(files.get(2)));
        int bad = 10; // 0-based: file line 11
        String[] cells = lines.get(bad).split(",");
        cells[2] = "warm";
        lines.set(bad, String.join(",", cells));
        Files.write(files.get(2), lines);
        Path out = dir.resolve("out");
        Runs r = Runs.run(args(files, "--out", out.toString()));
        assertEquals(1, r.code(), r.toString());
        assertTrue(r.err().contains(files.get(2) + ":11:3:") && r.err().contains("'warm'"), r.err());
        assertTrue(r.err().contains("4 profiles: 3 diagnosed, 1 refused"), r.err());
        List<CSVRecord> rows = rows(out.resolve("track.csv"));
        assertTrue(rows.stream().noneMatch(x -> x.get("profile").equals(files.get(2).toString())));
        assertEquals(List.of(100L, 200L, 400L), rows.stream().map(x -> Long.parseLong(x.get("model_number")))
                .distinct().toList());
    }

    @Test
    void aMalformedAgeLineIsRefusedWithItsLineAndColumn(@TempDir Path dir) throws IOException {
        List<Path> files = TrackSequence.write(dir, 2, true);
        List<String> lines = new ArrayList<>(Files.readAllLines(files.get(1)));
        lines.set(1, "# age_yr = soon");
        Files.write(files.get(1), lines);
        Runs r = Runs.run(args(files, "--out", dir.resolve("out").toString()));
        assertEquals(1, r.code(), r.toString());
        assertTrue(r.err().contains(files.get(1) + ":2:12:") && r.err().contains("soon"), r.err());
    }

    @Test
    void theProfilesAreDiagnosedWithAProgressBarOnAConsole(@TempDir Path dir) throws IOException {
        List<Path> files = TrackSequence.write(dir, 3, true);
        Runs r = Runs.run(true, args(files, "--out", dir.resolve("out").toString()));
        assertEquals(0, r.code(), r.toString());
        assertTrue(r.err().contains("3/3"), r.err());
        try (Stream<Path> s = Files.list(dir.resolve("out"))) {
            assertEquals(List.of("startransport-run.json", "track.csv", "track.png"),
                    s.map(p -> p.getFileName().toString()).sorted().toList());
        }
    }

    @Test
    void overshootLayersAreRowsOfTheirOwnBesideTheirRegionAndAreShaded(@TempDir Path dir) throws IOException {
        List<Path> files = TrackSequence.write(dir, 2, true);
        Path out = dir.resolve("out");
        Runs r = Runs.run(args(files, "--out", out.toString(), "--overshoot-f", "0.016"));
        assertEquals(0, r.code(), r.toString());
        List<CSVRecord> rows = of(rows(out.resolve("track.csv")), 100);
        assertEquals("convective", rows.get(0).get("regime"));
        assertEquals("overshoot", rows.get(1).get("regime"));
        // the layer above the core starts at the core's top and reaches further out
        assertEquals(rows.get(0).get("m_top_g"), rows.get(1).get("m_bottom_g"));
        assertTrue(Double.parseDouble(rows.get(1).get("m_top_g")) > Double.parseDouble(rows.get(1).get("m_bottom_g")));
        assertTrue(Double.parseDouble(rows.get(1).get("r_top_cm")) > Double.parseDouble(rows.get(1).get("r_bottom_cm")));
        TrackCommand.Track track = TrackCommand.Track.of(List.of(new TrackPoint("a.csv", 1, 1L, 0.0, 2e33, 7e10, 4e33,
                new io.github.startransport.spi.Timescales(1, 2, 3), List.of(
                        new TrackPoint.Layer("convective", 0, 4e32, 0, 1e10),
                        new TrackPoint.Layer("overshoot", 4e32, 5e32, 1e10, 1.2e10)))));
        org.jfree.chart.LegendItemCollection legend = TrackChart.chart(track).getXYPlot().getLegendItems();
        List<String> labels = new ArrayList<>();
        for (int i = 0; i < legend.getItemCount(); i++) {
            labels.add(legend.get(i).getLabel());
        }
        assertTrue(labels.contains("overshoot") && labels.contains("convective"), labels.toString());
    }

    @Test
    void theReadmesTrackIsDrawn(@TempDir Path dir) throws IOException {
        List<Path> files = TrackSequence.write(dir, 8, true);
        Path out = dir.resolve("out");
        Runs r = Runs.run(args(files, "--out", out.toString(), "--criterion", "ledoux"));
        assertEquals(0, r.code(), r.toString());
        String docs = System.getProperty("docs.dir");
        if (docs != null) {
            Path target = Path.of(docs).isAbsolute() ? Path.of(docs) : Path.of("..").resolve(docs);
            Files.createDirectories(target);
            Files.copy(out.resolve("track.png"), target.resolve("demo-track.png"),
                    java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
