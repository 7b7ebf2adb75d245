package io.github.startransport.examples;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The README shows the code that this build compiles and runs: every tagged block of README.md
 * equals its marked region in a test source (see {@link Snippets} and DEVELOPERS.md).
 */
class ReadmeSnippetsTest {

    private static final Path ROOT = Path.of(System.getProperty("startransport.root", "..")).toAbsolutePath().normalize();
    private static final String VERSION = System.getProperty("startransport.version");

    @Test
    void everyReadmeCodeBlockIsACompiledSource() throws IOException {
        Path readme = ROOT.resolve("README.md");
        List<String> problems = new ArrayList<>();
        List<Snippets.Block> blocks = Snippets.markdownBlocks(ROOT.relativize(readme),
                Files.readAllLines(readme, StandardCharsets.UTF_8), problems);
        Map<String, Snippets.Block> regions = Snippets.projectRegions(ROOT, problems);
        Snippets.compare(blocks, regions, VERSION, problems);
        assertTrue(problems.isEmpty(), () -> problems.size() + " README snippet problem(s), in " + ROOT + ":\n"
                + String.join("\n", problems));
    }

    @Test
    void theReadmeShowsTheHostCodeAndTheBuildsVersion() throws IOException {
        // guards the guard: the host section's blocks are tagged, so the check above covers them
        List<String> problems = new ArrayList<>();
        List<Snippets.Block> blocks = Snippets.markdownBlocks(Path.of("README.md"),
                Files.readAllLines(ROOT.resolve("README.md"), StandardCharsets.UTF_8), problems);
        List<String> names = blocks.stream().map(Snippets.Block::name).toList();
        assertTrue(names.containsAll(List.of("host-dependencies", "host-zone-by-zone", "host-whole-profile")),
                names.toString());
        assertFalse(VERSION == null || VERSION.isBlank(), "the build passes startransport.version");
        Snippets.Block deps = blocks.stream().filter(b -> b.name().equals("host-dependencies")).findFirst().orElseThrow();
        long versions = deps.lines().stream().filter(l -> l.trim().equals("<version>" + VERSION + "</version>")).count();
        assertEquals(2, versions, "both dependencies of the README name version " + VERSION + ": " + deps.lines());
        String readme = Files.readString(ROOT.resolve("README.md"), StandardCharsets.UTF_8);
        String hostSection = readme.substring(readme.indexOf("## Using it from a host code"));
        assertTrue(hostSection.startsWith("## Using it from a host code\n\nVersion " + VERSION + ","),
                "the README's host section starts by naming version " + VERSION);
    }
}
