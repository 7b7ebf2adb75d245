package io.github.startransport.bench;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.convection.EddySpectrumConvection;
import io.github.startransport.core.convection.LengthScale;
import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.convection.MixingLengthCubic;
import io.github.startransport.core.gradient.GasRadiation;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.ZoneState;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

/**
 * One convective zone: our mixing-length solve with the full Jacobian (13 inputs, four outputs), the
 * full-spectrum model's (Canuto &amp; Mazzitelli 1991) on the same zones with the same length (alpha H_P,
 * alpha = 1.8), and the mixing-length cubic against the same textbook cubic
 * x^3 + (8U/9) x^2 + (16U^2/9) x - (8U/9) W = 0 solved, value only, by Commons Math's LaguerreSolver on
 * the bracket [0, sqrt(W)].
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ConvectionBenchmark {
    private static final int ZONES = 64;

    private final ZoneState[] zones = new ZoneState[ZONES];
    private final double[] lossParameter = new double[ZONES];
    private final double[] excess = new double[ZONES];
    private final double[] nablaAd = new double[ZONES];
    private final ConvectionResult result = new ConvectionResult();
    private final LocalMixingLength model = new LocalMixingLength();
    private final EddySpectrumConvection spectrum = new EddySpectrumConvection(1.8, Criterion.SCHWARZSCHILD,
            LengthScale.SCALE_HEIGHT);
    private final LaguerreSolver laguerre = new LaguerreSolver(1e-15, 1e-300, 1e-300);
    private int next;

    @Setup
    public void setup() {
        SplittableRandom rnd = new SplittableRandom(20261203L);
        for (int i = 0; i < ZONES; i++) {
            ZoneState z = new ZoneState();
            double t = Math.pow(10, rnd.nextDouble(4, 7));
            double rho = Math.pow(10, rnd.nextDouble(-7, 0));
            double pg = GasRadiation.gasPressure(t, rho, 0.6);
            double p = pg + GasRadiation.radiationPressure(t);
            double beta = pg / p;
            z.temperature = t;
            z.density = rho;
            z.pressure = p;
            z.radius = Math.pow(10, rnd.nextDouble(10, 11));
            z.mass = 2e33;
            z.opacity = Math.pow(10, rnd.nextDouble(-0.5, 2));
            z.cp = GasRadiation.cp(beta, 0.6);
            z.delta = GasRadiation.delta(beta);
            z.nablaAd = GasRadiation.nablaAd(beta);
            double nablaRad = z.nablaAd + Math.pow(10, rnd.nextDouble(-4, 0.5));
            z.luminosity = nablaRad * 16.0 * Math.PI * Codata2018.RADIATION_CONSTANT * Codata2018.SPEED_OF_LIGHT
                    * Codata2018.GRAVITATIONAL_CONSTANT * z.mass * t * t * t * t / (3.0 * z.opacity * p);
            zones[i] = z;
            model.solve(z, result);
            lossParameter[i] = result.lossParameter;
            excess[i] = result.nablaRad - z.nablaAd;
            nablaAd[i] = z.nablaAd;
        }
    }

    /** Our solver: validation, nabla_rad, the cubic, nabla, v, F_conv/F, D and 52 partial derivatives. */
    @Benchmark
    public double oursZoneWithJacobian() {
        int i = next++ & (ZONES - 1);
        model.solve(zones[i], result);
        return result.nabla + result.dNabla[0] + result.dVelocity[5];
    }

    /** The full-spectrum model on the same zones: validation, nabla_rad, the flux equation's root, 52 partials. */
    @Benchmark
    public double oursEddySpectrumZoneWithJacobian() {
        int i = next++ & (ZONES - 1);
        spectrum.solve(zones[i], result);
        return result.nabla + result.dNabla[0] + result.dVelocity[5];
    }

    /** The full-spectrum model, values only. */
    @Benchmark
    public double oursEddySpectrumZoneValues() {
        int i = next++ & (ZONES - 1);
        spectrum.solveValues(zones[i], result);
        return result.nabla + result.velocity;
    }

    /** Our cubic alone, value only: the like-for-like counterpart of the peer below. */
    @Benchmark
    public double oursCubicOnly() {
        int i = next++ & (ZONES - 1);
        double u = lossParameter[i];
        double w = excess[i];
        double gamma = MixingLengthCubic.efficiency(9.0 / 4.0, w / (4.0 * u * u));
        return nablaAd[i] + w * MixingLengthCubic.superadiabaticShare(9.0 / 4.0, gamma);
    }

    /** The same cubic (value only, no derivatives) by Commons Math's Laguerre polynomial solver. */
    @Benchmark
    public double peerCommonsMathLaguerre() {
        int i = next++ & (ZONES - 1);
        double u = lossParameter[i];
        double w = excess[i];
        double k = 8.0 / 9.0;
        PolynomialFunction cubic = new PolynomialFunction(new double[] {-k * u * w, 2.0 * k * u * u, k * u, 1.0});
        double x = laguerre.solve(1000, cubic, 0.0, Math.sqrt(w));
        return nablaAd[i] + x * x + 2.0 * u * x;
    }
}
