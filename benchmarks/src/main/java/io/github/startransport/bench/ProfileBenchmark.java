package io.github.startransport.bench;

import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.core.profile.LocalDiagnosis;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileDiagnosis;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * A whole profile end to end: the demo star through {@link LocalDiagnosis} with the default models
 * (local mixing length, analytic opacity, ideal gas plus radiation), on one thread; and a grid of
 * 16 such profiles through {@code diagnoseAll} on all cores. Time per profile diagnosis in
 * microseconds; zones per second = zones / time. No peer: Commons Math has nothing comparable.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ProfileBenchmark {
    @Param({"2000"})
    public int zones;

    private Profile profile;
    private List<Profile> grid;
    private final DiagnosisSetup setup = new DiagnosisSetup(new LocalMixingLength(), AnalyticOpacity.DEFAULT,
            IdealGasRadiation.INSTANCE);

    @Setup
    public void setup() {
        profile = new DemoStar(zones).profile();
        grid = new ArrayList<>();
        for (int i = 0; i < 16; i++) {
            grid.add(new DemoStar(zones - 8 * i).profile());
        }
    }

    /** One profile, one thread: the diagnosis of every zone, the regions and the timescales. */
    @Benchmark
    public ProfileDiagnosis oursProfileEndToEnd() {
        return LocalDiagnosis.INSTANCE.diagnose(profile, setup);
    }

    /** 16 profiles on all cores through diagnoseAll (time for the whole grid). */
    @Benchmark
    public List<ProfileDiagnosis> oursProfileGridAllCores() {
        return LocalDiagnosis.INSTANCE.diagnoseAll(grid, setup);
    }
}
