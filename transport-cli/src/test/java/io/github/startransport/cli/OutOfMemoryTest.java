package io.github.startransport.cli;

import io.github.startransport.spi.Transport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.BufferedWriter;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Running out of memory ends in one line, exit code 3, and no output folder. */
class OutOfMemoryTest {

    @Test
    void anOutOfMemoryErrorIsOneLineWithExitCodeThreeAndNoOutput(@TempDir Path dir) throws Exception {
        Path p = ProfileFiles.valid(dir, "p.csv");
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(new String[] {"diagnose", p.toString(), "--out", dir.resolve("out").toString()},
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8),
                false, () -> {
                    throw new OutOfMemoryError("Java heap space"); // injected where the physics is first needed
                });
        String text = err.toString(StandardCharsets.UTF_8);
        assertEquals(Main.OUT_OF_MEMORY, code, text);
        assertEquals(1, text.lines().count(), text);
        assertTrue(text.startsWith("startransport: out of memory") && text.contains("-Xmx"), text);
        assertFalse(Files.exists(dir.resolve("out")));
    }

    @Test
    void aProfileTooBigForTheHeapEndsTheSameWayInARealJvm(@TempDir Path dir) throws Exception {
        // 400,000 zones need ~100 MB at 250 bytes each: more than a 48 MB heap holds
        Path p = dir.resolve("big.csv");
        try (BufferedWriter w = Files.newBufferedWriter(p)) {
            w.write(ProfileFiles.HEADER + "\n");
            int n = 400_000;
            for (int k = 0; k < n; k++) {
                double f = (k + 1.0) / n;
                w.write((7e10 * f) + "," + (2e33 * f) + "," + (1.5e7 * (1.01 - f)) + "," + (150 * (1.0001 - f)) + ","
                        + (2e17 * (1.0001 - f)) + "," + (3.8e33 * f) + ",0.7,0.02\n");
            }
        }
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process proc = new ProcessBuilder(java, "-Xmx48m", "-XX:TieredStopAtLevel=1", "-cp",
                System.getProperty("java.class.path"), Main.class.getName(), "diagnose", p.toString(), "--out",
                dir.resolve("out").toString()).redirectErrorStream(true).start();
        String printed = new String(proc.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(proc.waitFor(120, TimeUnit.SECONDS));
        assertEquals(Main.OUT_OF_MEMORY, proc.exitValue(), printed);
        List<String> lines = printed.lines().toList();
        assertEquals(1, lines.size(), printed);
        assertTrue(lines.get(0).contains("big.csv") && lines.get(0).contains("-Xmx"), printed);
        assertFalse(Files.exists(dir.resolve("out")));
    }
}
