package io.github.startransport.cli;

import io.github.startransport.spi.TransportProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;
import java.io.File;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Discovery on the module path: a small host module that {@code requires} the spi module and
 * {@code uses} the provider type is compiled here and run in a child JVM with transport-spi and
 * transport-core on {@code --module-path}. There META-INF/services is ignored for named modules,
 * so this proves the {@code provides} clause of core's module-info. A second run with only the
 * spi module shows the error a host sees without the core jar.
 */
class ModulePathDiscoveryTest {

    private static final String PROBE_MODULE = """
            module probe.host {
                requires io.github.startransport.spi;
                uses io.github.startransport.spi.TransportProvider;
            }
            """;

    private static final String PROBE_MAIN = """
            package probe.host;

            import io.github.startransport.spi.*;

            public final class Probe {
                public static void main(String[] args) {
                    try {
                        Transport t = Transport.discover();
                        for (TransportProvider p : t.providers()) {
                            System.out.println("found " + p.name() + " in module " + p.getClass().getModule().getName());
                        }
                        StabilityModel m = t.stability("gradient-comparison", ModelOptions.parse("criterion=ledoux"));
                        System.out.println("model criterion " + m.criterion().label());
                    } catch (DiscoveryException e) {
                        System.out.println("error " + e.kind() + ": " + e.getMessage());
                        System.exit(3);
                    }
                }
            }
            """;

    private static String locationOf(Class<?> type) throws URISyntaxException {
        return Path.of(type.getProtectionDomain().getCodeSource().getLocation().toURI()).toString();
    }

    /** Class-path entries of this test JVM that belong to the physics: transport-core and its libraries. */
    private static List<String> coreEntries() {
        List<String> entries = new ArrayList<>();
        for (String entry : System.getProperty("java.class.path").split(File.pathSeparator)) {
            String name = Path.of(entry).toString();
            if (name.contains("transport-core") || name.contains("commons-math3") || name.contains("commons-csv")) {
                entries.add(entry);
            }
        }
        return entries;
    }

    private static Path compileProbe(Path dir, String spi) throws IOException {
        Path src = dir.resolve("src/probe.host");
        Files.createDirectories(src.resolve("probe/host"));
        Files.writeString(src.resolve("module-info.java"), PROBE_MODULE);
        Files.writeString(src.resolve("probe/host/Probe.java"), PROBE_MAIN);
        Path out = dir.resolve("mods/probe.host");
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        int rc = javac.run(null, null, null, "--module-path", spi, "-d", out.toString(),
                src.resolve("module-info.java").toString(), src.resolve("probe/host/Probe.java").toString());
        assertEquals(0, rc, "probe module did not compile");
        return out;
    }

    private static String[] run(String modulePath) throws IOException, InterruptedException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "--module-path", modulePath, "-m", "probe.host/probe.host.Probe")
                .redirectErrorStream(true).start();
        String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "child JVM did not finish");
        return new String[] {String.valueOf(p.exitValue()), output};
    }

    @Test
    void providerIsFoundThroughModuleInfoOnTheModulePath(@TempDir Path dir) throws Exception {
        String spi = locationOf(TransportProvider.class);
        Path probe = compileProbe(dir, spi);
        List<String> path = new ArrayList<>(List.of(probe.toString(), spi));
        path.addAll(coreEntries());
        String[] result = run(String.join(File.pathSeparator, path));
        assertEquals("0", result[0], result[1]);
        assertTrue(result[1].contains("found startransport-core in module io.github.startransport.core"), result[1]);
        assertTrue(result[1].contains("model criterion ledoux"), result[1]);
    }

    @Test
    void withoutCoreOnTheModulePathTheErrorNamesTheJar(@TempDir Path dir) throws Exception {
        String spi = locationOf(TransportProvider.class);
        Path probe = compileProbe(dir, spi);
        String[] result = run(probe + File.pathSeparator + spi);
        assertEquals("3", result[0], result[1]);
        assertTrue(result[1].contains("error NO_PROVIDER"), result[1]);
        assertTrue(result[1].contains("io.github.startransport:transport-core"), result[1]);
    }
}
