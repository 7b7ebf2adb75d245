package io.github.startransport.cli;

import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileDiagnoser;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Transport;

import java.io.File;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * Memory per zone of a profile and its diagnosis, measured two ways on the demo star resampled
 * to N zones (default 1,000,000; eight columns in the file, so kappa, nabla_ad, c_P, delta,
 * nabla_mu are computed):
 *
 * <ol>
 * <li><b>Live</b>: heap in use after a full collection, with the profile read, then with the
 * profile and its diagnosis held, less the heap in use before; divided by N.</li>
 * <li><b>Needed</b>: the smallest {@code -Xmx} (serial collector, 8 MB steps) with which the
 * whole tool, {@code diagnose FILE --out DIR}, succeeds, for N zones and for 10,000 zones; the
 * difference divided by the difference in zones. This includes every transient array (the
 * reader's growing columns, the diagnosis's work arrays, the zone table's buffers).</li>
 * </ol>
 *
 * <p>Run: {@code java -cp benchmarks/target/benchmarks.jar io.github.startransport.cli.ZoneMemory [N]}
 */
public final class ZoneMemory {
    private ZoneMemory() {
    }

    public static void main(String[] args) throws Exception {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 1_000_000;
        int small = 10_000;
        Path dir = Files.createTempDirectory("zone-memory");
        try {
            Path big = LargeProfiles.write(dir.resolve("big.csv"), n);
            Path little = LargeProfiles.write(dir.resolve("small.csv"), small);
            live(big, little, n);
            long xBig = smallestHeapMb(big, dir.resolve("out-big"));
            long xSmall = smallestHeapMb(little, dir.resolve("out-small"));
            System.out.printf(Locale.ROOT, "needed: -Xmx%dm for %,d zones, -Xmx%dm for %,d zones: %.0f bytes per zone%n",
                    xBig, n, xSmall, small, (xBig - xSmall) * 1048576.0 / (n - small));
        } finally {
            try (var s = Files.walk(dir)) {
                s.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    private static void live(Path big, Path little, int n) {
        Transport t = Transport.discover();
        DiagnosisSetup setup = new DiagnosisSetup(t.convection(null, ModelOptions.defaults()),
                t.opacity(null, ModelOptions.defaults()), t.thermodynamics(null, ModelOptions.defaults()));
        ProfileDiagnoser diagnoser = t.diagnoser(null, ModelOptions.defaults());
        diagnoser.diagnose(ProfileCsvReader.read(little, ColumnMap.none()).profile(), setup); // load every class
        long before = used();
        Profile p = ProfileCsvReader.read(big, ColumnMap.none()).profile();
        long withProfile = used();
        ProfileDiagnosis d = diagnoser.diagnose(p, setup);
        long withDiagnosis = used();
        System.out.printf(Locale.ROOT, "live: profile %.1f bytes per zone (%d columns); profile and diagnosis %.1f bytes"
                        + " per zone (%d zones, %d diagnosis columns)%n", (withProfile - before) / (double) n,
                8, (withDiagnosis - before) / (double) n, d.size(),
                io.github.startransport.spi.DiagnosisColumn.values().length);
        if (p.size() + d.size() == 0) {
            System.out.println(); // keep both alive to here
        }
    }

    private static long used() {
        for (int i = 0; i < 3; i++) {
            System.gc();
        }
        return ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed();
    }

    private static long smallestHeapMb(Path file, Path out) throws IOException, InterruptedException {
        long lo = 16;
        long hi = 8192;
        if (!runs(file, out, hi)) {
            throw new IllegalStateException("the tool fails even with -Xmx" + hi + "m");
        }
        while (hi - lo > 8) {
            long mid = (lo + hi) / 2;
            if (runs(file, out, mid)) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return hi;
    }

    private static boolean runs(Path file, Path out, long mb) throws IOException, InterruptedException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(List.of(java, "-XX:+UseSerialGC", "-Xmx" + mb + "m", "-Djava.awt.headless=true",
                "-cp", System.getProperty("java.class.path"), Main.class.getName(), "diagnose", file.toString(),
                "--out", out.toString())).redirectErrorStream(true).redirectOutput(new File("/dev/null")).start();
        int code = p.waitFor();
        if (code != 0 && code != Main.OUT_OF_MEMORY) {
            throw new IllegalStateException("exit " + code + " with -Xmx" + mb + "m");
        }
        return code == 0;
    }
}
