package io.github.startransport.bench;

import io.github.startransport.core.gradient.GasRadiation;
import io.github.startransport.core.gradient.GradientStability;
import io.github.startransport.core.gradient.RadiativeGradient;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ZoneState;
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

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

/**
 * The gradient kernels over a column of random zones: nabla_rad with its derivatives, the
 * ideal-gas-plus-radiation nabla_ad, and the whole stability test per zone.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class GradientBenchmark {
    @Param({"2000"})
    public int zones;

    private double[] kappa;
    private double[] lum;
    private double[] pres;
    private double[] mass;
    private double[] temp;
    private double[] beta;
    private final double[] deriv = new double[io.github.startransport.spi.ZoneInput.COUNT];
    private ZoneState[] states;
    private final StabilityResult result = new StabilityResult();
    private GradientStability ledoux;

    @Setup
    public void setup() {
        SplittableRandom rnd = new SplittableRandom(20261202L);
        kappa = new double[zones];
        lum = new double[zones];
        pres = new double[zones];
        mass = new double[zones];
        temp = new double[zones];
        beta = new double[zones];
        states = new ZoneState[zones];
        for (int i = 0; i < zones; i++) {
            kappa[i] = Math.pow(10, rnd.nextDouble(-1, 3));
            lum[i] = Math.pow(10, rnd.nextDouble(31, 36));
            pres[i] = Math.pow(10, rnd.nextDouble(4, 18));
            mass[i] = Math.pow(10, rnd.nextDouble(30, 34));
            temp[i] = Math.pow(10, rnd.nextDouble(3.5, 8));
            beta[i] = rnd.nextDouble(0.05, 1.0);
            ZoneState z = new ZoneState();
            z.temperature = temp[i];
            z.density = Math.pow(10, rnd.nextDouble(-10, 3));
            z.pressure = pres[i];
            z.luminosity = lum[i];
            z.mass = mass[i];
            z.radius = 1e10;
            z.opacity = kappa[i];
            z.nablaAd = GasRadiation.nablaAd(beta[i]);
            z.delta = GasRadiation.delta(beta[i]);
            z.nablaMu = rnd.nextDouble(-0.1, 0.3);
            states[i] = z;
        }
        ledoux = new GradientStability(Criterion.LEDOUX);
    }

    /** nabla_rad alone, per column. */
    @Benchmark
    public double oursNablaRadColumn() {
        double s = 0;
        for (int i = 0; i < zones; i++) {
            s += RadiativeGradient.value(kappa[i], lum[i], pres[i], mass[i], temp[i]);
        }
        return s;
    }

    /** nabla_rad with its five partial derivatives, per column. */
    @Benchmark
    public double oursNablaRadWithDerivativesColumn() {
        double s = 0;
        for (int i = 0; i < zones; i++) {
            s += RadiativeGradient.valueAndDerivatives(kappa[i], lum[i], pres[i], mass[i], temp[i], deriv);
        }
        return s + deriv[0];
    }

    /** nabla_ad of gas plus radiation, per column. */
    @Benchmark
    public double oursNablaAdColumn() {
        double s = 0;
        for (int i = 0; i < zones; i++) {
            s += GasRadiation.nablaAd(beta[i]);
        }
        return s;
    }

    /** The whole Ledoux stability test (validation, gradients, derivatives, regime), per zone. */
    @Benchmark
    public double oursStabilityTestColumn() {
        double s = 0;
        for (int i = 0; i < zones; i++) {
            ledoux.evaluate(states[i], result);
            s += result.marginLedoux;
        }
        return s;
    }
}
