package io.github.startransport.bench;

import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.gradient.GradientStability;
import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.StabilityColumns;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneMajorJacobian;
import io.github.startransport.spi.ZoneState;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.util.concurrent.TimeUnit;

/**
 * Per-zone against batch calls on exactly {@value #ZONES} convective zones of the demo star (the
 * star as the tool's {@code --demo} builds it, with its integrated envelope; thermodynamics from
 * the ideal gas with radiation, kappa from the analytic opacity, nabla_mu = 0, the default
 * Schwarzschild model), in profile order: the call patterns a host's Newton iteration uses inside
 * its convection zones. Every benchmark reports ns per zone. The per-zone calls keep their result
 * in the reused {@link ConvectionResult}; the batch calls write every value (and the Jacobian) into
 * caller-owned columns or a zone-major block.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ConvectiveZonesBenchmark {
    /** Convective zones per call. */
    static final int ZONES = 2000;

    private ZoneColumns in;
    private ConvectionColumns columns;
    private double[] block;
    private StabilityColumns stabilityColumns;
    private final LocalMixingLength convection = new LocalMixingLength();
    private final GradientStability stability = new GradientStability(Criterion.LEDOUX);
    private final ZoneState zone = new ZoneState();
    private final ConvectionResult result = new ConvectionResult();
    private final StabilityResult stabilityResult = new StabilityResult();

    @Setup
    public void setup() {
        in = convectiveZones(ZONES);
        columns = new ConvectionColumns(ZONES);
        block = new double[ZONES * ZoneMajorJacobian.PER_ZONE];
        stabilityColumns = new StabilityColumns(ZONES);
    }

    /**
     * The first {@code count} convective zones (under the default model) of the demo star, centre
     * outwards, taken from a profile fine enough to hold them.
     *
     * @param count zones wanted
     * @return their columns
     */
    static ZoneColumns convectiveZones(int count) {
        LocalMixingLength model = new LocalMixingLength();
        ThermoResult th = new ThermoResult();
        OpacityResult op = new OpacityResult();
        ZoneState z = new ZoneState();
        ConvectionResult r = new ConvectionResult();
        for (int total = 2 * count; ; total += count / 2) {
            Profile p = new DemoStar(total, true).profile();
            ZoneColumns c = new ZoneColumns(count);
            int taken = 0;
            for (int k = 0; k < p.size() && taken < count; k++) {
                z.zone = taken;
                z.radius = p.value(ProfileColumn.RADIUS, k);
                z.mass = p.value(ProfileColumn.MASS, k);
                z.temperature = p.value(ProfileColumn.TEMPERATURE, k);
                z.density = p.value(ProfileColumn.DENSITY, k);
                z.pressure = p.value(ProfileColumn.PRESSURE, k);
                z.luminosity = p.value(ProfileColumn.LUMINOSITY, k);
                z.hydrogen = p.value(ProfileColumn.HYDROGEN, k);
                z.metals = p.value(ProfileColumn.METALS, k);
                IdealGasRadiation.INSTANCE.evaluate(z.temperature, z.density, z.hydrogen, z.metals, k, th);
                z.cp = th.cp;
                z.nablaAd = th.nablaAd;
                z.delta = th.delta;
                z.phi = 1.0;
                z.nablaMu = 0.0;
                AnalyticOpacity.DEFAULT.evaluate(z.temperature, z.density, z.hydrogen, z.metals, k, op);
                z.opacity = op.kappa;
                model.solve(z, r);
                if (r.regime == Regime.CONVECTIVE) {
                    c.store(taken++, z);
                }
            }
            if (taken == count) {
                return c;
            }
        }
    }

    /** Convection per zone with the full Jacobian (52 partial derivatives in the reused result). */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double perZoneWithJacobian() {
        double s = 0;
        for (int k = 0; k < ZONES; k++) {
            convection.solve(in.load(k, zone), result);
            s += result.nabla + result.dNabla[0];
        }
        return s;
    }

    /** Convection per zone, values only. */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double perZoneValues() {
        double s = 0;
        for (int k = 0; k < ZONES; k++) {
            convection.solveValues(in.load(k, zone), result);
            s += result.nabla;
        }
        return s;
    }

    /** Convection batch with the Jacobian in the column layout ({@code solveColumns(..., true)}). */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double batchColumnsWithJacobian() {
        convection.solveColumns(in, 0, ZONES, columns, true);
        return columns.nabla[ZONES / 2] + columns.dNabla[0][ZONES / 2];
    }

    /** Convection batch with the Jacobian in the zone-major layout ({@code solveZoneMajor}). */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double batchZoneMajor() {
        convection.solveZoneMajor(in, 0, ZONES, columns, block);
        return columns.nabla[ZONES / 2] + block[ZONES / 2];
    }

    /** Convection batch, values only ({@code solveColumns(..., false)}). */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double batchValues() {
        convection.solveColumns(in, 0, ZONES, columns, false);
        return columns.nabla[ZONES / 2];
    }

    /** The Ledoux stability test per zone (both gradients with their derivatives, the regime). */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double stabilityPerZone() {
        double s = 0;
        for (int k = 0; k < ZONES; k++) {
            stability.evaluate(in.load(k, zone), stabilityResult);
            s += stabilityResult.marginLedoux;
        }
        return s;
    }

    /** The Ledoux stability test, batch call. */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double stabilityBatch() {
        stability.evaluateColumns(in, 0, ZONES, stabilityColumns);
        return stabilityColumns.marginLedoux[ZONES / 2];
    }
}
