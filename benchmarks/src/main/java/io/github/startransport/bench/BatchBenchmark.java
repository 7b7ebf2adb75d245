package io.github.startransport.bench;

import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.gradient.GradientStability;
import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.core.opacity.DemoTable;
import io.github.startransport.core.opacity.OpacityTableBuilder;
import io.github.startransport.core.opacity.OpacityTableReader;
import io.github.startransport.core.opacity.TabulatedOpacity;
import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.OpacityColumns;
import io.github.startransport.spi.OpacityGridSpec;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OutOfRangePolicy;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.StabilityColumns;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneMajorJacobian;
import io.github.startransport.spi.ZoneState;
import org.apache.commons.math3.analysis.BivariateFunction;
import org.apache.commons.math3.analysis.interpolation.BicubicInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.util.concurrent.TimeUnit;

/**
 * Batch (column) calls over the demo star's zones, centre to surface, in the order a host calls
 * them: convection with and without the Jacobian, the stability test, opacity on one table and
 * blended across the nine (X, Z) tables of the demo set. Each benchmark reports ns per zone
 * ({@code zones} operations per invocation). Peers (Commons Math) over the same zones: the
 * mixing-length cubic by LaguerreSolver (value only), and bicubic table lookups
 * (value with central-difference derivatives).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class BatchBenchmark {
    /** Zones in the column; the demo star with this many zones gives one fewer (the centre is not a zone). */
    @Param({"500", "2000"})
    public int size;

    private ZoneColumns in;
    private int zones;
    /** Repetitions so that every invocation handles 2000 zones ({@link OperationsPerInvocation}). */
    private int reps;
    private ConvectionColumns conv;
    private double[] block;
    private StabilityColumns stab;
    private OpacityColumns opac;
    private final LocalMixingLength convection = new LocalMixingLength();
    private final GradientStability stability = new GradientStability(Criterion.LEDOUX);
    private TabulatedOpacity blended;
    private TabulatedOpacity single;
    private BivariateFunction singlePeer;
    private double[] logT;
    private double[] logR;
    private double[] lossParameter;
    private double[] excess;
    private final ZoneState zone = new ZoneState();
    private final ConvectionResult result = new ConvectionResult();
    private final LaguerreSolver laguerre = new LaguerreSolver(1e-15, 1e-300, 1e-300);

    @Setup
    public void setup() {
        Profile p = new DemoStar(size + 1).profile();
        zones = p.size();
        reps = 2000 / zones;
        in = new ZoneColumns(zones);
        ThermoResult th = new ThermoResult();
        OpacityResult op = new OpacityResult();
        logT = new double[zones];
        logR = new double[zones];
        for (int k = 0; k < zones; k++) {
            in.radius[k] = p.value(ProfileColumn.RADIUS, k);
            in.mass[k] = p.value(ProfileColumn.MASS, k);
            in.temperature[k] = p.value(ProfileColumn.TEMPERATURE, k);
            in.density[k] = p.value(ProfileColumn.DENSITY, k);
            in.pressure[k] = p.value(ProfileColumn.PRESSURE, k);
            in.luminosity[k] = p.value(ProfileColumn.LUMINOSITY, k);
            in.hydrogen[k] = p.value(ProfileColumn.HYDROGEN, k);
            in.metals[k] = p.value(ProfileColumn.METALS, k);
            IdealGasRadiation.INSTANCE.evaluate(in.temperature[k], in.density[k], in.hydrogen[k], in.metals[k], k, th);
            in.cp[k] = th.cp;
            in.nablaAd[k] = th.nablaAd;
            in.delta[k] = th.delta;
            AnalyticOpacity.DEFAULT.evaluate(in.temperature[k], in.density[k], in.hydrogen[k], in.metals[k], k, op);
            in.opacity[k] = op.kappa;
            logT[k] = Math.log10(in.temperature[k]);
            logR[k] = Math.log10(in.density[k]) - 3.0 * logT[k] + 18.0;
        }
        conv = new ConvectionColumns(zones);
        block = new double[zones * ZoneMajorJacobian.PER_ZONE];
        stab = new StabilityColumns(zones);
        opac = new OpacityColumns(zones);
        blended = new TabulatedOpacity(DemoTable.set(), OutOfRangePolicy.CLAMP);
        OpacityGridSpec demo = DemoTable.grid();
        OpacityGridSpec one = new OpacityGridSpec(new double[] {0.7}, new double[] {0.02}, demo.logT(), demo.logR());
        single = new TabulatedOpacity(OpacityTableReader.parse(OpacityTableBuilder.text(AnalyticOpacity.DEFAULT, one),
                "one table"), OutOfRangePolicy.CLAMP);
        double[] t = demo.logT();
        double[] r = demo.logR();
        double[][] v = new double[t.length][r.length];
        for (int i = 0; i < t.length; i++) {
            for (int j = 0; j < r.length; j++) {
                AnalyticOpacity.DEFAULT.evaluate(Math.pow(10, t[i]), Math.pow(10, r[j] + 3 * t[i] - 18), 0.7, 0.02, -1, op);
                v[i][j] = Math.log10(op.kappa);
            }
        }
        singlePeer = new BicubicInterpolator().interpolate(t, r, v);
        lossParameter = new double[zones];
        excess = new double[zones];
        for (int k = 0; k < zones; k++) {
            convection.solve(in.load(k, zone), result);
            lossParameter[k] = result.lossParameter;
            excess[k] = Math.max(result.nablaRad - in.nablaAd[k], 1e-6);
            logT[k] = Math.min(Math.max(logT[k], t[1]), t[t.length - 2]);
            logR[k] = Math.min(Math.max(logR[k], r[1]), r[r.length - 2]);
        }
    }

    /** Convection per zone with the full Jacobian, through the per-zone call. */
    @Benchmark
    @OperationsPerInvocation(2000)
    public double oursConvectionPerZoneWithJacobian() {
        double sink = 0;
        for (int rep = 0; rep < reps; rep++) {
            double s = 0;
            for (int k = 0; k < zones; k++) {
                convection.solve(in.load(k, zone), result);
                s += result.nabla + result.dNabla[0];
            }
            sink += s;
        }
        return sink;
    }

    /** Convection per zone, values only. */
    @Benchmark
    @OperationsPerInvocation(2000)
    public double oursConvectionPerZoneValues() {
        double sink = 0;
        for (int rep = 0; rep < reps; rep++) {
            double s = 0;
            for (int k = 0; k < zones; k++) {
                convection.solveValues(in.load(k, zone), result);
                s += result.nabla;
            }
            sink += s;
        }
        return sink;
    }

    /** Convection, batch call with the full Jacobian. */
    @Benchmark
    @OperationsPerInvocation(2000)
    public double oursConvectionBatchWithJacobian() {
        double sink = 0;
        for (int rep = 0; rep < reps; rep++) {
            convection.solveColumns(in, 0, zones, conv, true);
            sink += conv.nabla[zones / 2] + conv.dNabla[0][zones / 2];
        }
        return sink;
    }

    /** Convection, batch call with the full Jacobian in the zone-major layout (one block per zone). */
    @Benchmark
    @OperationsPerInvocation(2000)
    public double oursConvectionBatchZoneMajor() {
        double sink = 0;
        for (int rep = 0; rep < reps; rep++) {
            convection.solveZoneMajor(in, 0, zones, conv, block);
            sink += conv.nabla[zones / 2] + block[zones / 2];
        }
        return sink;
    }

    /** Convection, batch call without the Jacobian. */
    @Benchmark
    @OperationsPerInvocation(2000)
    public double oursConvectionBatchValues() {
        double sink = 0;
        for (int rep = 0; rep < reps; rep++) {
            convection.solveColumns(in, 0, zones, conv, false);
            sink += conv.nabla[zones / 2];
        }
        return sink;
    }

    /** Peer: the same zones' cubic, value only, by Commons Math's LaguerreSolver. */
    @Benchmark
    @OperationsPerInvocation(2000)
    public double peerConvectionCubicLaguerre() {
        double sink = 0;
        for (int rep = 0; rep < reps; rep++) {
            double s = 0;
            double k9 = 8.0 / 9.0;
            for (int k = 0; k < zones; k++) {
                double u = lossParameter[k];
                double w = excess[k];
                PolynomialFunction cubic = new PolynomialFunction(new double[] {-k9 * u * w, 2.0 * k9 * u * u, k9 * u, 1.0});
                double x = laguerre.solve(1000, cubic, 0.0, Math.sqrt(w));
                s += x * x + 2.0 * u * x;
            }
            sink += s;
        }
        return sink;
    }

    /** The Ledoux stability test, batch call. */
    @Benchmark
    @OperationsPerInvocation(2000)
    public double oursStabilityBatch() {
        double sink = 0;
        for (int rep = 0; rep < reps; rep++) {
            stability.evaluateColumns(in, 0, zones, stab);
            sink += stab.marginLedoux[zones / 2];
        }
        return sink;
    }

    /** Opacity on the nine-table demo set, blended across X and Z, with both derivatives, batch call. */
    @Benchmark
    @OperationsPerInvocation(2000)
    public double oursOpacityBlendedBatch() {
        double sink = 0;
        for (int rep = 0; rep < reps; rep++) {
            blended.evaluateColumns(in, 0, zones, opac);
            sink += opac.kappa[zones / 2] + opac.dLnKappaDLnT[zones / 2];
        }
        return sink;
    }

    /** Opacity on one table, with both derivatives, batch call. */
    @Benchmark
    @OperationsPerInvocation(2000)
    public double oursOpacitySingleTableBatch() {
        double sink = 0;
        for (int rep = 0; rep < reps; rep++) {
            single.evaluateColumns(in, 0, zones, opac);
            sink += opac.kappa[zones / 2] + opac.dLnKappaDLnT[zones / 2];
        }
        return sink;
    }

    /** Peer: one Commons Math bicubic table, value and central-difference derivatives, same zones. */
    @Benchmark
    @OperationsPerInvocation(2000)
    public double peerOpacitySingleTable() {
        double sink = 0;
        for (int rep = 0; rep < reps; rep++) {
            double s = 0;
            double h = 1e-4;
            for (int k = 0; k < zones; k++) {
                double x = logT[k];
                double y = logR[k];
                double f = singlePeer.value(x, y);
                double fx = (singlePeer.value(x + h, y) - singlePeer.value(x - h, y)) / (2 * h);
                double fy = (singlePeer.value(x, y + h) - singlePeer.value(x, y - h)) / (2 * h);
                s += Math.pow(10, f) + fy + (fx - 3 * fy);
            }
            sink += s;
        }
        return sink;
    }
}
