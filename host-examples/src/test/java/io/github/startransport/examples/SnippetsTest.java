package io.github.startransport.examples;

import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The README check finds what it must find. Marker lines are assembled from pieces here, so
 * that this file itself holds no region.
 */
class SnippetsTest {

    private static final Path README = Path.of("README.md");
    private static final Path SOURCE = Path.of("m/src/test/java/Example.java");
    private static final String FENCE = "```";

    private static String start(String opener, String name) {
        return opener + " snippet-" + "start: " + name;
    }

    private static String end(String opener, String name) {
        return opener + " snippet-" + "end: " + name;
    }

    private static List<String> problems(List<String> readme, List<String> source) {
        List<String> problems = new ArrayList<>();
        List<Snippets.Block> blocks = Snippets.markdownBlocks(README, readme, problems);
        Map<String, Snippets.Block> regions = new java.util.LinkedHashMap<>();
        for (Snippets.Block r : Snippets.regions(SOURCE, source, problems)) {
            regions.put(r.name(), r);
        }
        Snippets.compare(blocks, regions, "9.8.7", problems);
        return problems;
    }

    @Test
    void equalTextAtAnotherIndentationPasses() {
        List<String> readme = List.of("text", "- item:", "", "  <!-- snippet: a -->", "  " + FENCE + "java",
                "  if (x) {", "      y();", "  }", "  " + FENCE);
        List<String> source = List.of("class C {", "    void f() {", start("        //", "a"), "        if (x) {",
                "            y();   ", "        }", end("        //", "a"), "    }", "}");
        assertEquals(List.of(), problems(readme, source));
    }

    @Test
    void aChangedLineIsReportedWithBothPlacesAndTheTextToPaste() {
        List<String> readme = List.of("<!-- snippet: a -->", FENCE + "java", "int n = 1;", "call(n);", FENCE);
        List<String> source = List.of(start("//", "a"), "int n = 1;", "call(n, m);", end("//", "a"));
        List<String> p = problems(readme, source);
        assertEquals(1, p.size(), p.toString());
        assertTrue(p.get(0).startsWith("README.md:4: the block 'a' differs from " + SOURCE + ":3"), p.get(0));
        assertTrue(p.get(0).contains("'call(n);'") && p.get(0).contains("'call(n, m);'"), p.get(0));
        assertTrue(p.get(0).endsWith("int n = 1;\ncall(n, m);"), p.get(0));
    }

    @Test
    void relativeIndentationCounts() {
        List<String> readme = List.of("<!-- snippet: a -->", FENCE + "java", "if (x) {", "y();", "}", FENCE);
        List<String> source = List.of(start("//", "a"), "if (x) {", "    y();", "}", end("//", "a"));
        assertEquals(1, problems(readme, source).size());
    }

    @Test
    void aMissingOrExtraLineAtTheEndIsReported() {
        List<String> readme = List.of("<!-- snippet: a -->", FENCE, "one", FENCE);
        List<String> source = List.of(start("#", "a"), "one", "two", end("#", "a"));
        List<String> p = problems(readme, source);
        assertEquals(1, p.size(), p.toString());
        assertTrue(p.get(0).contains("(nothing: the block ends here)"), p.get(0));
    }

    @Test
    void anUntaggedJavaBlockIsRefusedAndOtherLanguagesAreNot() {
        List<String> readme = List.of(FENCE + "sh", "mvn -B verify", FENCE, "", FENCE + "java", "int x;", FENCE);
        List<String> p = problems(readme, List.of());
        assertEquals(1, p.size(), p.toString());
        assertTrue(p.get(0).startsWith("README.md:5: this java block is not tied"), p.get(0));
    }

    @Test
    void aTagWithoutItsRegionAndARegionWithoutItsTagAreReported() {
        List<String> readme = List.of("<!-- snippet: shown -->", FENCE + "java", "x();", FENCE);
        List<String> source = List.of(start("//", "other"), "x();", end("//", "other"));
        List<String> p = problems(readme, source);
        assertEquals(2, p.size(), p.toString());
        assertTrue(p.get(0).contains("no source region is named 'shown'"), p.get(0));
        assertTrue(p.get(1).contains("region 'other' is shown by no block"), p.get(1));
    }

    @Test
    void malformedRegionsAreReported() {
        List<String> p = new ArrayList<>();
        Snippets.regions(SOURCE, List.of(start("//", "a"), "x", end("//", "b")), p);
        Snippets.regions(SOURCE, List.of(start("//", "a"), "x"), p);
        Snippets.regions(SOURCE, List.of("x", end("//", "a")), p);
        Snippets.regions(SOURCE, List.of(start("//", "a"), start("//", "b"), end("//", "b")), p);
        assertEquals(4, p.size(), p.toString());
        assertTrue(p.get(0).contains("closes region 'a'"), p.get(0));
        assertTrue(p.get(1).contains("is never closed"), p.get(1));
        assertTrue(p.get(2).contains("without a matching"), p.get(2));
        assertTrue(p.get(3).contains("regions do not nest"), p.get(3));
    }

    @Test
    void markersWorkInTheCommentsOfOtherLanguagesAndTheVersionIsFilledIn() {
        List<String> readme = List.of("<!-- snippet: x -->", FENCE + "xml", "<version>9.8.7</version>", FENCE,
                "<!-- snippet: f -->", FENCE + "fortran", "call solve(z)", FENCE);
        List<String> source = List.of(start("<!--", "x") + " -->", "<version>${project.version}</version>",
                end("<!--", "x") + " -->", start("!", "f"), "call solve(z)", end("!", "f"));
        assertEquals(List.of(), problems(readme, source));
    }

    @Test
    void aTagThatIsNotFollowedByABlockIsReported() {
        List<String> p = problems(List.of("<!-- snippet: a -->", "some prose", FENCE + "sh", "ls", FENCE), List.of());
        assertEquals(1, p.size(), p.toString());
        assertTrue(p.get(0).startsWith("README.md:1: the tag"), p.get(0));
    }
}
