package io.github.startransport.bridge;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static io.github.startransport.bridge.NativeTools.NATIVE;
import static io.github.startransport.bridge.NativeTools.WORK;
import static io.github.startransport.bridge.NativeTools.environment;
import static io.github.startransport.bridge.NativeTools.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

/**
 * The C interface from C programs (src/examples/c, src/test/c), each run as its own process
 * (a JVM, once started in a process, stays): the example host against the Java API bit for bit,
 * threads, allocation in steady state, where the JVM and the jars are looked for and what is said
 * when they are missing, refusals with the host's zone numbers, attaching to a running JVM.
 * Skipped when the library was not built (no C compiler).
 */
class NativeCTest {
    private static Path openTest;
    private static Path openTestNoRpath;

    @BeforeAll
    static void build() {
        assumeTrue(NativeTools.libraryBuilt(), "libstartransport.so was not built (no C compiler)");
        NativeTools.prepare();
        openTest = NativeTools.compileC("src/test/c/open_test.c", "open_test", true);
        openTestNoRpath = NativeTools.compileC("src/test/c/open_test.c", "open_test_lib_path", false);
    }

    private static String value(String line, String key) {
        Matcher m = Pattern.compile(key + "=(.*?)( \\w+=|$)").matcher(line);
        assertTrue(m.find(), "no " + key + " in " + line);
        return m.group(1);
    }

    @Test
    void exampleHostAgreesWithTheJavaApiBitForBitAndShowsARefusal() {
        Path host = NativeTools.compileC("src/examples/c/host.c", "c_host", true);
        Path files = NativeTools.exampleFiles(800);
        int n = NativeTools.zones(files);
        NativeTools.Run r = run(List.of(host.toString(), files.toString()), environment());
        assertEquals(0, r.exit(), r.out() + r.err());
        // n zones x 108 values, each compared bit for bit in the host
        String summary = r.lines().stream().filter(l -> l.startsWith("c-host:") && !l.startsWith("c-host: refused:"))
                .reduce((a, b) -> {
                    throw new AssertionError("two summary lines: " + a + " / " + b);
                }).orElseThrow();
        assertTrue(summary.endsWith(": ok"), summary);
        assertTrue(summary.contains(n + " zones through the bridge"), summary);
        assertTrue(summary.contains((108 * n) + " values compared bit for bit with the Java API, 0 differ"), summary);
        String refused = r.line("c-host: refused:");
        assertTrue(refused.contains("STT_INVALID_INPUT") && refused.contains("temperature = -1.0 K in zone 300:"),
                refused);
    }

    @Test
    void theReadmeSnippetRunsAndAgreesWithTheJavaApi() {
        Path exe = NativeTools.compileC("src/test/c/readme_snippet.c", "readme_snippet_c", true);
        NativeTools.assertSnippetZones(run(List.of(exe.toString()), environment()));
    }

    @Test
    void fourAndEightThreadsGiveBitForBitWhatOneThreadGives() {
        Path exe = NativeTools.compileC("src/test/c/threads_test.c", "threads_test", true);
        Path files = NativeTools.exampleFiles(800);
        int n = NativeTools.zones(files);
        for (String threads : new String[] {"4", "8"}) {
            NativeTools.Run r = run(List.of(exe.toString(), files.toString(), threads, "6"), environment());
            assertEquals(0, r.exit(), r.out() + r.err());
            String line = r.line("threads:");
            assertTrue(line.startsWith("threads: " + threads + " threads x 6 repetitions of " + n + " zones"), line);
            assertTrue(line.endsWith(", 0 differ"), line);
        }
    }

    @Test
    void steadyStateCallsAllocateNothingInCOrJava() {
        Path exe = NativeTools.compileC("src/test/c/allocation_test.c", "allocation_test", true);
        // 299 zones: a full chunk and a partial one per call
        NativeTools.Run r = run(List.of(exe.toString(), NativeTools.exampleFiles(300).toString(), "500", "500", "40"),
                environment());
        assertEquals(0, r.exit(), r.out() + r.err());
        List<String> rounds = r.lines().stream().filter(l -> l.startsWith("allocation: round")).toList();
        assertTrue(!rounds.isEmpty(), r.out());
        for (String round : rounds) {
            // the library itself never allocates after its first call on a thread
            assertTrue(round.contains(": library 0,"), round);
        }
        // and once the JIT has settled (it may recompile, and reallocate on the way, in the first
        // rounds), nothing on the calling thread allocates at all: no malloc by anyone in the
        // process, no byte on the Java heap
        String last = rounds.get(rounds.size() - 1);
        assertTrue(last.contains("thread mallocs 0,") && last.endsWith("java bytes 0"), String.join("\n", rounds));
    }

    @Test
    void missingJvmSaysWhereItLookedAndHowToFix() throws IOException {
        Path emptyBin = Files.createDirectories(WORK.resolve("empty-bin"));
        Map<String, String> env = environment();
        env.remove("STARTRANSPORT_JVM");
        env.put("JAVA_HOME", "/nonexistent/jdk");
        env.put("PATH", emptyBin.toString());
        String line = run(List.of(openTest.toString(), "open", "-", "-"), env).line("open");
        assertEquals("STT_NO_JVM", value(line, "status"), line);
        for (String part : List.of("libjvm.so", "jvm_library argument: not given", "STARTRANSPORT_JVM: not set",
                "JAVA_HOME: /nonexistent/jdk does not exist", "java on PATH: none in PATH=" + emptyBin, "fix:",
                "apt-get install openjdk-17-jre-headless")) {
            assertTrue(line.contains(part), "'" + part + "' missing from " + line);
        }

        env.put("STARTRANSPORT_JVM", "/opt/nowhere/libjvm.so");
        line = run(List.of(openTest.toString(), "open", "-", "-"), env).line("open");
        assertEquals("STT_NO_JVM", value(line, "status"), line);
        assertTrue(line.contains("STARTRANSPORT_JVM: /opt/nowhere/libjvm.so does not exist"), line);

        // an explicit argument is the only place looked at
        line = run(List.of(openTest.toString(), "open", "/opt/nowhere/jdk", "-"), environment()).line("open");
        assertEquals("STT_NO_JVM", value(line, "status"), line);
        assertTrue(line.contains("jvm_library argument: /opt/nowhere/jdk does not exist") && line.contains("fix:"),
                line);

        // a file that is not a JVM
        env.put("STARTRANSPORT_JVM", MODULE_FILE.toString());
        line = run(List.of(openTest.toString(), "open", "-", "-"), env).line("open");
        assertEquals("STT_NO_JVM", value(line, "status"), line);
        assertTrue(line.contains("could not load it") && line.contains(MODULE_FILE.toString()), line);
    }

    private static final Path MODULE_FILE = NativeTools.MODULE.resolve("pom.xml");

    @Test
    void theJvmIsFoundThroughJavaHomeAndThroughJavaOnThePath() throws IOException {
        Path emptyBin = Files.createDirectories(WORK.resolve("empty-bin"));
        Map<String, String> env = environment();
        env.remove("STARTRANSPORT_JVM");
        env.put("JAVA_HOME", NativeTools.JAVA_HOME.toString());
        env.put("PATH", emptyBin.toString());
        NativeTools.Run r = run(List.of(openTest.toString(), "open", "-", "-"), env);
        assertEquals("STT_OK", value(r.line("open"), "status"), r.out());
        assertEquals("STT_OK", value(r.line("call"), "status"), r.out());

        Path bin = Files.createDirectories(WORK.resolve("java-bin"));
        Path java = bin.resolve("java");
        Files.deleteIfExists(java);
        Files.createSymbolicLink(java, NativeTools.JAVA_HOME.resolve("bin/java"));
        env.remove("JAVA_HOME");
        env.put("PATH", emptyBin + ":" + bin);
        r = run(List.of(openTest.toString(), "open", "-", "-"), env);
        assertEquals("STT_OK", value(r.line("open"), "status"), r.out());
        assertEquals("STT_OK", value(r.line("call"), "status"), r.out());
    }

    /** A directory holding the library and the given jars of target/native only. */
    private static Path installation(String name, String... jarPrefixes) throws IOException {
        Path dir = WORK.resolve(name);
        if (Files.exists(dir)) {
            try (var files = Files.list(dir)) {
                for (Path f : files.toList()) {
                    Files.delete(f);
                }
            }
        }
        Files.createDirectories(dir);
        Files.copy(NATIVE.resolve("libstartransport.so"), dir.resolve("libstartransport.so"),
                StandardCopyOption.REPLACE_EXISTING);
        try (var files = Files.list(NATIVE)) {
            for (Path jar : files.filter(f -> f.toString().endsWith(".jar")).toList()) {
                for (String prefix : jarPrefixes) {
                    if (jar.getFileName().toString().startsWith(prefix)) {
                        Files.copy(jar, dir.resolve(jar.getFileName()), StandardCopyOption.REPLACE_EXISTING);
                    }
                }
            }
        }
        return dir;
    }

    private static NativeTools.Run openFrom(Path libraryDir, String classPath, Map<String, String> env) {
        env.put("LD_LIBRARY_PATH", libraryDir.toString());
        return run(List.of(openTestNoRpath.toString(), "open", "-", classPath), env);
    }

    @Test
    void missingJarsSayWhereTheyWereLookedForAndHowToFix() throws IOException {
        Path alone = installation("library-alone");
        String line = openFrom(alone, "-", environment()).line("open");
        assertEquals("STT_NO_CLASSES", value(line, "status"), line);
        for (String part : List.of("class_path argument (not given)", "STARTRANSPORT_CLASSPATH (not set)",
                alone + ": no .jar file", "fix:", "beside libstartransport.so")) {
            assertTrue(line.contains(part), "'" + part + "' missing from " + line);
        }

        // the jars from the environment variable
        Map<String, String> env = environment();
        env.put("STARTRANSPORT_CLASSPATH", NATIVE.toString());
        NativeTools.Run r = openFrom(alone, "-", env);
        assertEquals("STT_OK", value(r.line("open"), "status"), r.out());
        assertEquals("STT_OK", value(r.line("call"), "status"), r.out());

        // an argument entry that does not exist is named
        line = openFrom(alone, "/no/such/dir:" + NATIVE, environment()).line("open");
        assertEquals("STT_NO_CLASSES", value(line, "status"), line);
        assertTrue(line.contains("class path entry /no/such/dir (from the class_path argument) does not exist"), line);
    }

    @Test
    void aMissingJarIsNamed() throws IOException {
        // no core: discovery finds no provider and says which jar to add
        Path noCore = installation("library-without-core", "transport-native", "transport-spi", "commons-math3");
        String line = openFrom(noCore, "-", environment()).line("open");
        assertEquals("STT_NO_CLASSES", value(line, "status"), line);
        assertTrue(line.contains("transport-core") && line.contains(noCore.toString()), line);

        // no SPI: the bridge cannot link
        Path noSpi = installation("library-without-spi", "transport-native", "transport-core", "commons-math3");
        line = openFrom(noSpi, "-", environment()).line("open");
        assertEquals("STT_NO_CLASSES", value(line, "status"), line);
        assertTrue(line.contains("io/github/startransport/spi") && line.contains("fix:"), line);

        // no bridge jar
        Path noBridge = installation("library-without-bridge", "transport-spi", "transport-core", "commons-math3");
        line = openFrom(noBridge, "-", environment()).line("open");
        assertEquals("STT_NO_CLASSES", value(line, "status"), line);
        assertTrue(line.contains("NativeBridge") && line.contains(noBridge.toString()), line);
    }

    @Test
    void refusalsCarryTheLibraryMessageWithTheHostsZoneNumbers() {
        Path files = NativeTools.exampleFiles(800);
        for (int origin : new int[] {0, 1}) {
            NativeTools.Run r = run(List.of(openTest.toString(), "refusals", files.toString(),
                    Integer.toString(origin)), environment());
            assertEquals(0, r.exit(), r.out() + r.err());
            expect(r, "unknown-model", "STT_UNKNOWN_MODEL", "no-such-model", "local-mixing-length");
            expect(r, "unknown-option", "STT_INVALID_OPTION", "colour", "alpha");
            expect(r, "malformed-option", "STT_INVALID_OPTION", "alpha", "abc");
            expect(r, "family-without-hot-path", "STT_BAD_ARGUMENT", "diagnosis");
            expect(r, "default-model-is", "STT_OK", "local-mixing-length(alpha=1.8");
            expect(r, "null-model", "STT_BAD_ARGUMENT", "model is NULL");
            expect(r, "wrong-family", "STT_BAD_ARGUMENT", "stability model, not a convection model");
            expect(r, "negative-count", "STT_BAD_ARGUMENT", "n = -1");
            expect(r, "missing-column", "STT_BAD_ARGUMENT", "in->cp is NULL");
            expect(r, "zero-zones", "STT_OK");
            expect(r, "thermodynamics-bad-zone-260", "STT_INVALID_INPUT",
                    "temperature = -1.0 K in zone " + (260 + origin) + ":");
            expect(r, "opacity-bad-zone-5", "STT_INVALID_INPUT", "density = NaN g cm^-3 in zone " + (5 + origin) + ":");
            expect(r, "stability-bad-zone-511", "STT_INVALID_INPUT",
                    "opacity = 0.0 cm^2 g^-1 in zone " + (511 + origin) + ":");
            expect(r, "convection-bad-zone-700", "STT_INVALID_INPUT",
                    "cp = -Infinity erg g^-1 K^-1 in zone " + (700 + origin) + ":");
            assertEquals("small-buffer status=STT_INVALID_INPUT length=15 terminated=1", r.line("small-buffer "));
            expect(r, "no-buffer", "STT_INVALID_INPUT");
            expect(r, "after-refusals", "STT_OK");
        }
    }

    private static void expect(NativeTools.Run r, String name, String status, String... parts) {
        String line = r.line(name + " ");
        assertEquals(status, value(line, "status"), line);
        for (String part : parts) {
            assertTrue(line.contains(part), "'" + part + "' missing from " + line);
        }
    }

    @Test
    void attachesToAJvmAlreadyRunningInTheProcess() {
        Path exe = NativeTools.compileC("src/test/c/attach_test.c", "attach_test", true);
        Map<String, String> env = environment();
        env.remove("STARTRANSPORT_JVM");
        NativeTools.Run r = run(List.of(exe.toString(),
                NativeTools.JAVA_HOME.resolve("lib/server/libjvm.so").toString()), env);
        assertEquals(0, r.exit(), r.out() + r.err());
        String line = r.line("attach:");
        assertEquals("STT_OK", value(line, "open"), line);
        assertEquals("1", value(line, "vms"), line);
        assertEquals("1", value(line, "same"), line);
        assertEquals("STT_OK", value(line, "main"), line);
        assertEquals("STT_OK", value(line, "thread"), line);
        assertEquals(value(line, "v"), value(line, "v_thread"), line);
        assertTrue(Double.parseDouble(value(line, "v")) > 0, line);
    }
}
