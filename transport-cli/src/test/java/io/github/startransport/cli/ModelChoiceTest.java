package io.github.startransport.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Transport;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code --convection NAME} and {@code --opacity NAME} with every name {@code startransport models}
 * lists for those families, the defaults and the others: the run succeeds, summary.json and the
 * terminal name the model, zones.csv is the library's diagnosis with that model, and a model other
 * than the default changes the numbers (so a name that is read and then ignored fails).
 */
class ModelChoiceTest {
    private final Transport transport = Transport.discover();

    /** The model names the tool lists under "FAMILY models:", in order. */
    private static List<String> listed(String models, String family) {
        int from = models.indexOf("\n" + family + " models:\n");
        assertTrue(from >= 0, family + " missing from\n" + models);
        int to = models.indexOf("\n\n", from + 1);
        String section = models.substring(from, to < 0 ? models.length() : to);
        List<String> names = new ArrayList<>();
        Matcher m = Pattern.compile("(?m)^  (\\S+)  \\(provider ").matcher(section);
        while (m.find()) {
            names.add(m.group(1));
        }
        return names;
    }

    /** The name the tool marks "(default)" under "FAMILY models:". */
    private static String marked(String models, String family) {
        int from = models.indexOf("\n" + family + " models:\n");
        int to = models.indexOf("\n\n", from + 1);
        Matcher m = Pattern.compile("(?m)^  (\\S+)  \\(provider \\S+\\)  \\(default\\)$").matcher(models);
        assertTrue(from >= 0 && m.find(from) && (to < 0 || m.start() < to),
                "no default marked for " + family + " in\n" + models);
        return m.group(1);
    }

    private static List<CSVRecord> zones(Path dir) throws IOException {
        try (Reader in = Files.newBufferedReader(dir.resolve("zones.csv"));
             CSVParser csv = CSVParser.parse(in, CSVFormat.DEFAULT.builder().setHeader().get())) {
            return csv.getRecords();
        }
    }

    /** The library's diagnosis of the demo star with the named models and their own defaults. */
    private ProfileDiagnosis library(String convection, String opacity) {
        DiagnosisSetup setup = new DiagnosisSetup(
                transport.convection(convection, ModelOptions.defaults().with(ModelNames.CONVECTION_CRITERION,
                        "schwarzschild")),
                transport.opacity(opacity, ModelOptions.defaults()),
                transport.thermodynamics(null, ModelOptions.defaults()));
        return transport.diagnoser(null, ModelOptions.defaults())
                .diagnose(transport.star(null, ModelOptions.defaults()).profile(), setup);
    }

    /** Runs the tool with one option and checks it against the library; returns whether it differs from the default. */
    private boolean runWith(Path dir, String option, String name, String convection, String opacity,
                            ProfileDiagnosis dflt) throws IOException {
        Path out = dir.resolve(name);
        Runs r = Runs.run("diagnose", "--demo", option, name, "--out", out.toString());
        assertEquals(0, r.code(), option + " " + name + "\n" + r);
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertEquals(convection, s.get("convection_model").asText());
        assertEquals(opacity, s.get("opacity_model").asText());
        assertTrue(r.out().contains("convection " + convection + ", opacity " + opacity), r.out());
        ProfileDiagnosis expected = library(convection, opacity);
        List<CSVRecord> rows = zones(out);
        assertEquals(expected.size(), rows.size());
        boolean differs = false;
        for (int k = 0; k < rows.size(); k++) {
            for (DiagnosisColumn c : DiagnosisColumn.values()) {
                double v = Double.parseDouble(rows.get(k).get(c.header()));
                assertEquals(expected.value(c, k), v, option + " " + name + ": " + c.header() + " in zone " + k);
                differs |= Double.compare(v, dflt.value(c, k)) != 0;
            }
        }
        return differs;
    }

    @Test
    void everyListedConvectionAndOpacityModelRunsEndToEnd(@TempDir Path dir) throws Exception {
        Runs models = Runs.run("models");
        assertEquals(0, models.code(), models.toString());
        List<String> convection = listed(models.out(), "convection");
        List<String> opacity = listed(models.out(), "opacity");
        String defaultConvection = marked(models.out(), "convection");
        String defaultOpacity = marked(models.out(), "opacity");
        assertTrue(convection.contains(defaultConvection) && convection.size() >= 2, convection.toString());
        assertTrue(opacity.contains(defaultOpacity) && opacity.size() >= 2, opacity.toString());
        ProfileDiagnosis dflt = library(defaultConvection, defaultOpacity);
        for (String name : convection) {
            boolean differs = runWith(dir, "--convection", name, name, defaultOpacity, dflt);
            assertEquals(!name.equals(defaultConvection), differs, "--convection " + name + " changed nothing");
        }
        for (String name : opacity) {
            boolean differs = runWith(dir, "--opacity", name, defaultConvection, name, dflt);
            assertEquals(!name.equals(defaultOpacity), differs, "--opacity " + name + " changed nothing");
        }
    }
}
