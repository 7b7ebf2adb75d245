package io.github.startransport.cli;

import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileDiagnoser;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Transport;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

/**
 * A profile file of a million zones (the demo star resampled, eight columns, ~150 MB): reading
 * it; reading and diagnosing it on one thread; and the whole tool, {@code diagnose FILE --out
 * DIR} (read, diagnose, write zones.csv, summary.json and the four plots, replace the previous
 * output). Time per file in milliseconds; zones per second = zones / time. One shot per
 * iteration: each is seconds long.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2)
@Measurement(iterations = 3)
@Fork(value = 1, jvmArgs = {"-Xmx4g"})
public class ProfileFileBenchmark {
    @Param({"1000000"})
    public int zones;

    private Path dir;
    private Path file;
    private DiagnosisSetup setup;
    private ProfileDiagnoser diagnoser;
    private final PrintStream quiet = new PrintStream(OutputStream.nullOutputStream());

    @Setup(Level.Trial)
    public void setup() throws IOException {
        System.setProperty("java.awt.headless", "true");
        dir = Files.createTempDirectory("profile-bench");
        file = LargeProfiles.write(dir.resolve("star.csv"), zones);
        Transport t = Transport.discover();
        setup = new DiagnosisSetup(t.convection(null, ModelOptions.defaults()), t.opacity(null, ModelOptions.defaults()),
                t.thermodynamics(null, ModelOptions.defaults()));
        diagnoser = t.diagnoser(null, ModelOptions.defaults());
    }

    @TearDown(Level.Trial)
    public void tearDown() throws IOException {
        try (var s = Files.walk(dir)) {
            s.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }

    /** The streaming reader alone: file to a validated {@link Profile}. */
    @Benchmark
    public Profile read() {
        return ProfileCsvReader.read(file, ColumnMap.none()).profile();
    }

    /** Read and diagnose on one thread (kappa, nabla_ad, c_P and delta computed: the file has none). */
    @Benchmark
    public ProfileDiagnosis readAndDiagnose() {
        return diagnoser.diagnose(ProfileCsvReader.read(file, ColumnMap.none()).profile(), setup);
    }

    /** The whole tool, as a user runs it. */
    @Benchmark
    public int endToEnd() {
        int code = Main.run(new String[] {"diagnose", file.toString(), "--out", dir.resolve("out").toString()},
                quiet, quiet);
        if (code != 0) {
            throw new IllegalStateException("exit " + code);
        }
        return code;
    }
}
