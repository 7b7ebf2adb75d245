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

    /** The example files (models.txt, profile.csv, reference.csv) for a demo star of that many points. */
    static synchronized Path exampleFiles(int points) {
        Path dir = WORK.resolve("example-" + points);
        if (!Files.exists(dir.resolve("reference.csv"))) {
            try {
                ExampleReference.main(new String[] {dir.toString(), Integer.toString(points)});
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        assertTrue(Files.exists(dir.resolve("reference.csv")));
        return dir;
    }

    static void prepare() {
        try {
            Files.createDirectories(WORK);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
