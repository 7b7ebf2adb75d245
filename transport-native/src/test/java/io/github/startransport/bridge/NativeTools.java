package io.github.startransport.bridge;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * What the native tests share: where the built library is (target/native, laid out by the Maven
 * profile that builds it), compiling the C and Fortran test programs against it, running them as
 * child processes with a chosen environment, and the example files they read.
 */
final class NativeTools {
    private NativeTools() {
    }

    /** target/native: libstartransport.so, include/, fortran/ and the jars. */
    static final Path NATIVE = Path.of(System.getProperty("stt.native.dir", "target/native")).toAbsolutePath();
    /** The module's directory (sources of the test programs). */
    static final Path MODULE = Path.of(System.getProperty("stt.module.dir", ".")).toAbsolutePath();
    /** Where the test programs and their files go. */
    static final Path WORK = NATIVE.resolveSibling("native-tests");
    /** The JDK running the tests (its libjvm is the one the children load). */
    static final Path JAVA_HOME = Path.of(System.getProperty("java.home"));

    /**
     * @return true when the Maven profile built the library: a C compiler is present (the profile's
     *         own condition) and the library is there
     */
    static boolean libraryBuilt() {
        return Files.isExecutable(Path.of("/usr/bin/cc")) && Files.isRegularFile(NATIVE.resolve("libstartransport.so"));
    }

    /** @return true when gfortran is on the PATH */
    static boolean fortranPresent() {
        for (String dir : System.getenv().getOrDefault("PATH", "").split(":")) {
            if (!dir.isEmpty() && Files.isExecutable(Path.of(dir, "gfortran"))) {
                return true;
            }
        }
        return false;
    }

    /** A finished child process. */
    record Run(int exit, String out, String err) {
        List<String> lines() {
            return out.lines().toList();
        }

        /** @return the first line of standard output starting with the prefix */
        String line(String prefix) {
            return out.lines().filter(l -> l.startsWith(prefix)).findFirst()
                    .orElseThrow(() -> new AssertionError("no line starting '" + prefix + "' in:\n" + out + err));
        }
    }

    /** The environment children run in: this one, with the JVM named and no class path override. */
    static Map<String, String> environment() {
        Map<String, String> env = new HashMap<>(System.getenv());
        env.put("STARTRANSPORT_JVM", JAVA_HOME.toString());
        env.remove("STARTRANSPORT_CLASSPATH");
        env.remove("STARTRANSPORT_JVM_OPTIONS");
        return env;
    }

    static Run run(List<String> command, Map<String, String> env) {
        try {
            ProcessBuilder pb = new ProcessBuilder(command).directory(WORK.toFile());
            pb.environment().clear();
            pb.environment().putAll(env);
            Process p = pb.start();
            CompletableFuture<String> out = read(p.getInputStream());
            CompletableFuture<String> err = read(p.getErrorStream());
            if (!p.waitFor(120, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                throw new AssertionError("timed out: " + command);
            }
            return new Run(p.exitValue(), out.join(), err.join());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError(e);
        }
    }

    private static CompletableFuture<String> read(InputStream in) {
        return CompletableFuture.supplyAsync(() -> {
            try (in) {
                return new String(in.readAllBytes(), StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
    }

    /** Runs a build step and fails the test with its output when it fails. */
    static void build(List<String> command) {
        Run r = run(command, new HashMap<>(System.getenv()));
        assertEquals(0, r.exit(), "build step failed: " + command + "\n" + r.out() + r.err());
    }

    /**
     * Compiles a C program against the library, with the flags the README gives a host (plus the
     * JDK's headers for programs that start a JVM themselves).
     *
     * @param source   path under the module directory
     * @param name     executable name under {@link #WORK}
     * @param rpath    whether to record the library's directory in the executable
     * @return the executable
     */
    static Path compileC(String source, String name, boolean rpath) {
        Path exe = WORK.resolve(name);
        List<String> cmd = new ArrayList<>(List.of("cc", "-std=c11", "-O2", "-Wall", "-Wextra", "-Werror", "-pthread",
                "-I" + NATIVE.resolve("include"), "-I" + MODULE.resolve("src/examples/c"),
                "-I" + JAVA_HOME.resolve("include"), "-I" + JAVA_HOME.resolve("include/linux"),
                MODULE.resolve(source).toString(), "-o", exe.toString(), "-L" + NATIVE, "-lstartransport", "-ldl",
                "-lm"));
        if (rpath) {
            cmd.add("-Wl,-rpath," + NATIVE);
        }
        build(cmd);
        return exe;
    }

    /** Compiles the Fortran module (as Fortran 2003) once; returns its object file. */
    static synchronized Path fortranModule() {
        Path object = WORK.resolve("startransport.o");
        if (!Files.exists(object)) {
            build(List.of("gfortran", "-std=f2003", "-Wall", "-Wextra", "-Werror", "-O2", "-c",
                    NATIVE.resolve("fortran/startransport.f90").toString(), "-J", WORK.toString(), "-o",
                    object.toString()));
        }
        return object;
    }

    /** Compiles a Fortran program with the module. */
    static Path compileFortran(String source, String name) {
        Path exe = WORK.resolve(name);
        build(List.of("gfortran", "-std=f2008", "-Wall", "-O2", "-I" + WORK, MODULE.resolve(source).toString(),
                fortranModule().toString(), "-o", exe.toString(), "-L" + NATIVE, "-lstartransport",
                "-Wl,-rpath," + NATIVE));
        return exe;
    }

    private static final java.util.Set<Integer> WRITTEN = new java.util.HashSet<>();

    /**
     * The example files (models.txt, profile.csv, reference.csv) for a demo star of that many points,
     * written once per test run by the library as it is now (never taken from an earlier build).
     */
    static synchronized Path exampleFiles(int points) {
        Path dir = WORK.resolve("example-" + points);
        if (WRITTEN.add(points)) {
            try {
                ExampleReference.main(new String[] {dir.toString(), Integer.toString(points)});
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        assertTrue(Files.exists(dir.resolve("reference.csv")));
        return dir;
    }

    /**
     * Checks the output of the README snippet programs (readme_snippet.c, readme_snippet.f90):
     * "zone K v=V dv_dkappa=D" for their three invented zones, against the Java API's per-zone call on
     * the same zones, bit for bit.
     */
    static void assertSnippetZones(Run r) {
        assertEquals(0, r.exit(), r.out() + r.err());
        io.github.startransport.spi.ConvectionModel mlt = io.github.startransport.spi.Transport.discover()
                .convection("local-mixing-length",
                        io.github.startransport.spi.ModelOptions.parse("alpha=1.8,criterion=ledoux"));
        double[][] zones = {  // r, m, T, rho, P, L, kappa, c_P, nabla_ad, delta: the programs' demo numbers
            {5e10, 1e33, 1e6, 0.1, 1.4e13, 3.8e33, 10.0, 3e8, 0.4, 1.0},
            {5e10, 1e33, 1e6, 0.1, 1.4e13, 3.8e32, 10.0, 3e8, 0.4, 1.0},
            {5e10, 1e33, 2e6, 0.2, 5.6e13, 7.6e33, 5.0, 3e8, 0.4, 1.0},
        };
        io.github.startransport.spi.ZoneState z = new io.github.startransport.spi.ZoneState();
        io.github.startransport.spi.ConvectionResult out = new io.github.startransport.spi.ConvectionResult();
        java.util.regex.Pattern line = java.util.regex.Pattern.compile("zone (\\d+) v=\\s*(\\S+) dv_dkappa=\\s*(\\S+)");
        int seen = 0;
        for (String l : r.lines()) {
            java.util.regex.Matcher m = line.matcher(l);
            if (!m.matches()) {
                continue;
            }
            double[] q = zones[Integer.parseInt(m.group(1))];
            z.radius = q[0]; z.mass = q[1]; z.temperature = q[2]; z.density = q[3]; z.pressure = q[4];
            z.luminosity = q[5]; z.opacity = q[6]; z.cp = q[7]; z.nablaAd = q[8]; z.delta = q[9];
            mlt.solve(z, out);
            // zones 0 and 2 convect (so the Jacobian entry is not a trivial zero), zone 1 does not
            assertEquals(!m.group(1).equals("1"), out.velocity > 0, l);
            assertEquals(Double.doubleToRawLongBits(out.velocity), Double.doubleToRawLongBits(Double.parseDouble(m.group(2))), l);
            assertEquals(Double.doubleToRawLongBits(out.dVelocity[io.github.startransport.spi.ZoneInput.KAPPA]),
                    Double.doubleToRawLongBits(Double.parseDouble(m.group(3))), l);
            seen++;
        }
        assertEquals(3, seen, r.out());
    }

    /** @return the number of zones in an example directory's profile.csv (lines after its header) */
    static int zones(Path dir) {
        try (var lines = Files.lines(dir.resolve("profile.csv"))) {
            return (int) lines.skip(1).filter(l -> !l.isBlank()).count();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static void prepare() {
        try {
            Files.createDirectories(WORK);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
