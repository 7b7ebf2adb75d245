package io.github.startransport.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.TransportProvider;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
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

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The whole tool with the real physics, found through ServiceLoader: its files must agree with
 * what the library itself computes for the same profile and models. These need the core's
 * convection, opacity, diagnosis and demo-star models.
 */
class EndToEndTest {
    private static final List<String> FILES = List.of("zones.csv", "summary.json", "gradients.png",
            "velocity-mixing.png", "opacity.png", "propagation.png");

    private final Transport transport = Transport.discover();

    /** The library's own diagnosis with the tool's documented defaults, or the given criterion and alpha. */
    private ProfileDiagnosis library(Profile profile, String criterion, String alpha) {
        ModelOptions options = ModelOptions.defaults().with(ModelNames.CONVECTION_CRITERION, criterion);
        if (alpha != null) {
            options = options.with(ModelNames.CONVECTION_ALPHA, alpha);
        }
        DiagnosisSetup setup = new DiagnosisSetup(transport.convection(null, options),
                transport.opacity(null, ModelOptions.defaults()),
                transport.thermodynamics(null, ModelOptions.defaults()));
        return transport.diagnoser(null, ModelOptions.defaults()).diagnose(profile, setup);
    }

    private Profile demo() {
        return transport.star(null, ModelOptions.defaults()).profile();
    }

    private static List<CSVRecord> zones(Path dir) throws IOException {
        try (Reader in = Files.newBufferedReader(dir.resolve("zones.csv"));
             CSVParser csv = CSVParser.parse(in, CSVFormat.DEFAULT.builder().setHeader().get())) {
            return csv.getRecords();
        }
    }

    private static void assertZonesEqual(ProfileDiagnosis expected, Path dir) throws IOException {
        List<CSVRecord> rows = zones(dir);
        assertEquals(expected.size(), rows.size());
        Regime[] regimes = expected.regimes();
        for (int k = 0; k < rows.size(); k++) {
            for (DiagnosisColumn c : DiagnosisColumn.values()) {
                assertEquals(expected.value(c, k), Double.parseDouble(rows.get(k).get(c.header())),
                        c.header() + " in zone " + k);
            }
            assertEquals(regimes[k].label(), rows.get(k).get(ZoneTable.REGIME), "regime of zone " + k);
        }
    }

    private static JsonNode summary(Path dir) throws IOException {
        return new ObjectMapper().readTree(dir.resolve("summary.json").toFile());
    }

    /** Every maximal run of non-radiative zones in zones.csv is one region of summary.json, in order. */
    private static void assertRegionsMatchZones(Path dir) throws IOException {
        List<CSVRecord> rows = zones(dir);
        List<String> runs = new ArrayList<>();
        String previous = Regime.RADIATIVE.label();
        for (CSVRecord row : rows) {
            String regime = row.get(ZoneTable.REGIME);
            if (!regime.equals(previous) && !regime.equals(Regime.RADIATIVE.label())) {
                runs.add(regime);
            }
            previous = regime;
        }
        JsonNode regions = summary(dir).get("regions");
        List<String> listed = new ArrayList<>();
        for (JsonNode region : regions) {
            String regime = region.get("regime").asText();
            listed.add(regime);
            double bottom = region.get("r_bottom_cm").asDouble();
            double top = region.get("r_top_cm").asDouble();
            assertTrue(bottom < top, region.toString());
            for (CSVRecord row : rows) {
                double r = Double.parseDouble(row.get("r_cm"));
                if (r > bottom && r < top) {
                    assertEquals(regime, row.get(ZoneTable.REGIME), "zone at r = " + r + " inside " + region);
                }
            }
            boolean convective = regime.equals(Regime.CONVECTIVE.label());
            for (String key : List.of("turnover_time_global_days", "turnover_time_local_days", "max_v_conv_cm_s")) {
                assertEquals(convective, region.has(key), key + " in " + region);
            }
        }
        assertEquals(runs, listed);
    }

    /** Writes a profile's columns as a file, surface first, with a comment and a column the reader ignores. */
    private static Path writeProfile(Profile p, Path file) throws IOException {
        List<ProfileColumn> cols = new ArrayList<>();
        for (ProfileColumn c : ProfileColumn.values()) {
            if (p.has(c)) {
                cols.add(c);
            }
        }
        StringBuilder b = new StringBuilder("# written by a test from the built-in demo star\n");
        for (ProfileColumn c : cols) {
            b.append(c.header()).append(',');
        }
        b.append("zone_number\n");
        for (int k = p.size() - 1; k >= 0; k--) {
            for (ProfileColumn c : cols) {
                b.append(p.value(c, k)).append(',');
            }
            b.append(k).append('\n');
        }
        return Files.writeString(file, b.toString());
    }

    @Test
    void demoWritesEveryFileAndTheZoneTableEqualsTheLibrarysDiagnosis(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("out");
        Runs r = Runs.run("diagnose", "--demo", "--out", out.toString());
        assertEquals(0, r.code(), r.toString());
        for (String f : FILES) {
            assertTrue(Files.isRegularFile(out.resolve(f)), f);
        }
        ProfileDiagnosis expected = library(demo(), "schwarzschild", null);
        assertZonesEqual(expected, out);
        JsonNode s = summary(out);
        assertEquals(expected.mass(), s.get("mass_g").asDouble());
        assertEquals(expected.radius(), s.get("radius_cm").asDouble());
        assertEquals(expected.luminosity(), s.get("luminosity_erg_s").asDouble());
        assertEquals(expected.alpha(), s.get("alpha").asDouble());
        assertEquals("schwarzschild", s.get("criterion").asText());
        // the year of the summary is the Julian year, 365.25 d of 86400 s (IAU)
        assertEquals(expected.timescales().kelvinHelmholtz() / (365.25 * 86400),
                s.get("kelvin_helmholtz_time_yr").asDouble(), 1e-12 * s.get("kelvin_helmholtz_time_yr").asDouble());
        for (String png : List.of("gradients.png", "velocity-mixing.png", "opacity.png", "propagation.png")) {
            BufferedImage image = ImageIO.read(out.resolve(png).toFile());
            assertNotNull(image, png);
            assertEquals(1200, image.getWidth());
            assertEquals(800, image.getHeight());
        }
        assertTrue(r.out().contains("timescales"), r.out());
        assertRegionsMatchZones(out);
        assertEquals(OutputFolderTest.expectedBeside(dir, "out"), OutputFolderTest.names(dir));
    }

    @Test
    void aProfileFileGivesTheLibrarysDiagnosisOfTheSameNumbers(@TempDir Path dir) throws Exception {
        Profile demo = demo();
        Path file = writeProfile(demo, dir.resolve("demo-star.csv"));
        Path out = dir.resolve("out");
        Runs r = Runs.run("diagnose", file.toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.toString());
        assertTrue(r.err().contains("zone_number"), "no note about the ignored column:\n" + r.err());
        assertZonesEqual(library(demo, "schwarzschild", null), out);
        assertRegionsMatchZones(out);
    }

    @Test
    void criterionAndAlphaReachTheConvectionModel(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("out");
        Runs r = Runs.run("diagnose", "--demo", "--criterion", "ledoux", "--alpha", "2.0", "--out", out.toString());
        assertEquals(0, r.code(), r.toString());
        JsonNode s = summary(out);
        assertEquals("ledoux", s.get("criterion").asText());
        assertEquals(2.0, s.get("alpha").asDouble());
        assertZonesEqual(library(demo(), "ledoux", "2.0"), out);
    }

    @Test
    void overshootOptionsReachTheDiagnosisAndItsOutputs(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("out");
        Runs r = Runs.run("diagnose", "--demo", "--overshoot-f", "0.016", "--overshoot-f0", "0.004", "--out",
                out.toString());
        assertEquals(0, r.code(), r.toString());
        DiagnosisSetup setup = new DiagnosisSetup(transport.convection(null, ModelOptions.defaults()),
                transport.opacity(null, ModelOptions.defaults()), transport.thermodynamics(null, ModelOptions.defaults()));
        ProfileDiagnosis expected = transport.diagnoser(null, ModelOptions.parse("overshoot-f=0.016,overshoot-f0=0.004"))
                .diagnose(demo(), setup);
        assertZonesEqual(expected, out);
        JsonNode regions = summary(out).get("regions");
        assertEquals(expected.regions().get(0).overshootTop().orElseThrow(),
                regions.get(0).get("overshoot_top_cm").asDouble());
        assertTrue(regions.get(0).get("overshoot_bottom_cm").isNull(), regions.toString());
        assertTrue(zones(out).stream().anyMatch(z -> Double.parseDouble(z.get("D_overshoot_cm2_s")) > 0.0));
        // without the option the column is all zeros
        Path plain = dir.resolve("plain");
        assertEquals(0, Runs.run("diagnose", "--demo", "--out", plain.toString()).code());
        assertTrue(zones(plain).stream().allMatch(z -> Double.parseDouble(z.get("D_overshoot_cm2_s")) == 0.0));
    }

    @Test
    void severalProfilesGoEachIntoItsOwnFolderWithAProgressBarOnAConsole(@TempDir Path dir) throws Exception {
        Profile demo = demo();
        Path a = writeProfile(demo, dir.resolve("first.csv"));
        Path b = writeProfile(demo, dir.resolve("second.csv"));
        Path out = dir.resolve("out");
        Runs r = Runs.run(true, "diagnose", a.toString(), b.toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.toString());
        assertTrue(r.err().contains("2/2"), r.err());
        ProfileDiagnosis expected = library(demo, "schwarzschild", null);
        for (String stem : List.of("first", "second")) {
            for (String f : FILES) {
                assertTrue(Files.isRegularFile(out.resolve(stem).resolve(f)), stem + "/" + f);
            }
            assertZonesEqual(expected, out.resolve(stem));
        }
        Runs quiet = Runs.run(false, "diagnose", a.toString(), b.toString(), "--out", out.toString());
        assertEquals(0, quiet.code(), quiet.toString());
        assertFalse(quiet.err().contains("2/2"), quiet.err());
    }

    @Test
    void diagnoseHelpShowsTheConvectionModelsOwnAlphaDefault() {
        String dflt = null;
        TransportProvider first = transport.providers().stream()
                .filter(p -> p.defaultModel(ModelFamily.CONVECTION) != null).findFirst().orElseThrow();
        for (ModelInfo m : first.models()) {
            if (m.family() == ModelFamily.CONVECTION && m.name().equals(first.defaultModel(ModelFamily.CONVECTION))) {
                for (OptionInfo o : m.options()) {
                    if (o.name().equals(ModelNames.CONVECTION_ALPHA)) {
                        dflt = o.defaultValue();
                    }
                }
            }
        }
        assertNotNull(dflt, "the default convection model has no option " + ModelNames.CONVECTION_ALPHA);
        Runs r = Runs.run("diagnose", "--help");
        assertTrue(r.out().replaceAll("\\s+", " ").contains("(" + dflt + " for the default model)"), r.out());
    }

    @Test
    void modelsListsTheCoresConvectionAndOpacityModelsByName() {
        TransportProvider core = transport.provider("startransport-core");
        List<String> convection = new ArrayList<>();
        List<String> opacity = new ArrayList<>();
        for (ModelInfo m : core.models()) {
            if (m.family() == ModelFamily.CONVECTION) {
                convection.add(m.name());
            } else if (m.family() == ModelFamily.OPACITY) {
                opacity.add(m.name());
            }
        }
        assertFalse(convection.isEmpty(), "the core offers no convection model");
        assertFalse(opacity.isEmpty(), "the core offers no opacity model");
        Runs r = Runs.run("models");
        assertEquals(0, r.code(), r.toString());
        for (String name : convection) {
            assertTrue(r.out().contains(name), name + "\n" + r.out());
        }
        for (String name : opacity) {
            assertTrue(r.out().contains(name), name + "\n" + r.out());
        }
    }
}
