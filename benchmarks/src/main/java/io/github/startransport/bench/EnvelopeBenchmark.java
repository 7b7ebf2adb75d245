package io.github.startransport.bench;

import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.envelope.GreyAtmosphereEnvelope;
import io.github.startransport.spi.AlphaCalibration;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.EnvelopeSolution;
import io.github.startransport.spi.EnvelopeStar;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Transport;
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

import java.util.concurrent.TimeUnit;

/**
 * One envelope of the Sun (IAU 2015 nominal M, R, L; X = 0.7381, Z = 0.0134) with the provider's
 * default thermodynamics, opacity and convection models, from the grey atmosphere to r = 0.5 R with
 * the profile sampled (target: &lt; 50 ms); and one alpha calibration of the same star to a base
 * halfway between the bases of alpha = 1.2 and 2.4 (target: &lt; 1 s). Not a hot path: the figure
 * of interest is milliseconds per envelope. No peer.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class EnvelopeBenchmark {
    private EnvelopeStar sun;
    private EnvelopeSetup setup;
    private double target;

    @Setup
    public void setup() {
        Transport t = Transport.discover();
        sun = new EnvelopeStar(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS, Iau2015.SOLAR_LUMINOSITY, 0.7381, 0.0134);
        setup = new EnvelopeSetup(t.convection(null, ModelOptions.defaults()), t.opacity(null, ModelOptions.defaults()),
                t.thermodynamics(null, ModelOptions.defaults()));
        double shallow = GreyAtmosphereEnvelope.DEFAULT.integrate(sun, setup.withAlpha(1.2)).surfaceConvectionBase()
                .orElseThrow().radiusFraction();
        double deep = GreyAtmosphereEnvelope.DEFAULT.integrate(sun, setup.withAlpha(2.4)).surfaceConvectionBase()
                .orElseThrow().radiusFraction();
        target = 0.5 * (shallow + deep);
    }

    /** One Sun-like envelope with its profile (about a thousand points). */
    @Benchmark
    public EnvelopeSolution oursSunEnvelope() {
        return GreyAtmosphereEnvelope.DEFAULT.integrate(sun, setup);
    }

    /** One calibration of alpha to a target base: every envelope of Brent's method, the sensitivity, the result. */
    @Benchmark
    public AlphaCalibration oursSunCalibration() {
        return GreyAtmosphereEnvelope.DEFAULT.calibrate(sun, setup, target, null);
    }
}
