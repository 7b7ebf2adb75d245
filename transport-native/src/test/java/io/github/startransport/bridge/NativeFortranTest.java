package io.github.startransport.bridge;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;

import static io.github.startransport.bridge.NativeTools.environment;
import static io.github.startransport.bridge.NativeTools.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

/**
 * The Fortran module (src/main/fortran/startransport.f90, compiled as Fortran 2003 with warnings
 * as errors) from Fortran programs: the example host against the Java API bit for bit, and the
 * module's own checks (strided arrays, refusals numbered from 1). Skipped when the library was not
 * built or gfortran is absent; CI installs gfortran, so there it always runs.
 */
class NativeFortranTest {

    @BeforeAll
    static void build() {
        assumeTrue(NativeTools.libraryBuilt(), "libstartransport.so was not built (no C compiler)");
        assumeTrue(NativeTools.fortranPresent(), "gfortran is not installed");
        NativeTools.prepare();
        NativeTools.fortranModule();
    }

    @Test
    void exampleHostAgreesWithTheJavaApiBitForBitAndShowsARefusal() {
        Path host = NativeTools.compileFortran("src/examples/fortran/host.f90", "fortran_host");
        Path files = NativeTools.exampleFiles(800);
        int n = NativeTools.zones(files);
        NativeTools.Run r = run(List.of(host.toString(), files.toString()), environment());
        assertEquals(0, r.exit(), r.out() + r.err());
        List<String> summaries = r.lines().stream()
                .filter(l -> l.startsWith("fortran-host:") && !l.startsWith("fortran-host: refused:")).toList();
        assertEquals(1, summaries.size(), r.out());
        String summary = summaries.get(0);
        assertTrue(summary.endsWith(" ok"), summary);
        assertTrue(summary.contains(n + " zones through the bridge"), summary);
        assertTrue(summary.contains((108 * n) + " values compared bit for bit with the Java API, 0 differ"), summary);
        String refused = r.line("fortran-host: refused:");
        // the same zone as the C host's 300, counted from 1
        assertTrue(refused.contains("STT_INVALID_INPUT") && refused.contains("temperature = -1.0 K in zone 301:"),
                refused);
    }

    @Test
    void theReadmeSnippetRunsAndAgreesWithTheJavaApi() {
        Path exe = NativeTools.compileFortran("src/test/fortran/readme_snippet.f90", "readme_snippet_f");
        NativeTools.assertSnippetZones(run(List.of(exe.toString()), environment()));
    }

    @Test
    void moduleHandlesStridedArraysAndRefusesByName() {
        Path exe = NativeTools.compileFortran("src/test/fortran/fortran_test.f90", "fortran_test");
        NativeTools.Run r = run(List.of(exe.toString(), NativeTools.exampleFiles(800).toString()), environment());
        assertEquals(0, r.exit(), r.out() + r.err());
        List<String> failures = r.lines().stream().filter(l -> l.contains(": FAIL")).toList();
        assertTrue(failures.isEmpty(), String.join("\n", failures));
        assertEquals("fortran-test: 20 checks passed, 0 checks failed", r.line("fortran-test: 20 checks"));
    }
}
