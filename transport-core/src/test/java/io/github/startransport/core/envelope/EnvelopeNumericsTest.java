package io.github.startransport.core.envelope;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.profile.LocalDiagnosis;
import io.github.startransport.spi.ConvectiveBase;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.EnvelopeSolution;
import io.github.startransport.spi.EnvelopeStar;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.ode.ContinuousOutputModel;
import org.apache.commons.math3.ode.nonstiff.GraggBulirschStoerIntegrator;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Convergence, event accuracy against an independent integration, and thread safety. */
class EnvelopeNumericsTest {

    @Tag(CheckKind.INTERNAL)
    @Test
    void halvingTheTolerancesMovesTheBaseByLessThan1e5R() {
        // common practice, no source: a converged integration does not move when its tolerance is halved
        EnvelopeStar sun = Stars.sun();
        EnvelopeSetup setup = Stars.defaults();
        for (double scale : new double[] {1.0, 100.0}) {
            GreyAtmosphereEnvelope env = GreyAtmosphereEnvelope.DEFAULT.withToleranceScaled(scale);
            ConvectiveBase a = env.integrate(sun, setup).surfaceConvectionBase().orElseThrow();
            ConvectiveBase b = env.withToleranceScaled(0.5).integrate(sun, setup).surfaceConvectionBase().orElseThrow();
            assertTrue(Math.abs(a.radiusFraction() - b.radiusFraction()) < 1e-5,
                    "tolerance " + env.tolerance() + ": " + a.radiusFraction() + " vs " + b.radiusFraction());
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void theBaseEventAgreesWithAnIndependentIntegrationTo1e6R() {
        // Commons Math's Gragg-Bulirsch-Stoer integrator (a different method), no events, dense output, and
        // Brent's method on nabla_rad - nabla_ad along it: the same edge to 1e-6 R
        EnvelopeStar sun = Stars.sun();
        EnvelopeSetup setup = Stars.defaults();
        EnvelopeSolution s = GreyAtmosphereEnvelope.DEFAULT.integrate(sun, setup);
        ConvectiveBase base = s.surfaceConvectionBase().orElseThrow();

        double pPhot = GreyAtmosphereEnvelope.DEFAULT.photosphericPressure(sun, setup);
        EnvelopeEquations eq = new EnvelopeEquations(new EnvelopePoint(sun, setup), sun.mass(), sun.radius());
        GraggBulirschStoerIntegrator gbs = new GraggBulirschStoerIntegrator(1e-14, 1.0, 1e-12, 1e-12);
        ContinuousOutputModel dense = new ContinuousOutputModel();
        gbs.addStepHandler(dense);
        double t0 = Math.log(pPhot);
        double t1 = Math.log(base.pressure()) + 1.0;
        double[] y = {sun.radius(), Math.log(s.effectiveTemperature()), 0.0};
        gbs.integrate(eq, t0, y.clone(), t1, y);
        EnvelopeEquations probe = new EnvelopeEquations(new EnvelopePoint(sun, setup), sun.mass(), sun.radius());
        java.util.function.DoubleUnaryOperator g = t -> {
            dense.setInterpolatedTime(t);
            EnvelopePoint p = probe.evaluate(t, dense.getInterpolatedState(), false);
            return p.nablaRad - p.nablaAd;
        };
        // the last sign change from convective to radiative before t1
        double step = 0.01;
        double lo = Double.NaN;
        for (double t = t1 - step; t > t0; t -= step) {
            if (g.applyAsDouble(t) > 0.0 && g.applyAsDouble(t + step) <= 0.0) {
                lo = t;
                break;
            }
        }
        assertTrue(!Double.isNaN(lo), "the independent integration has a convective base");
        double tb = new BrentSolver(1e-15, 1e-13).solve(200, g::applyAsDouble, lo, lo + step);
        dense.setInterpolatedTime(tb);
        double rb = dense.getInterpolatedState()[EnvelopeEquations.R];
        assertEquals(base.radius() / sun.radius(), rb / sun.radius(), 1e-6);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void theProfileDiagnosesWithItsBaseWhereTheEventPutIt() {
        // the envelope profile goes through the library's own diagnosis, whose boundary is a linear
        // interpolation between zones: it must bracket the event's base within one output spacing
        EnvelopeStar sun = Stars.sun();
        EnvelopeSetup setup = Stars.defaults();
        EnvelopeSolution s = GreyAtmosphereEnvelope.DEFAULT.integrate(sun, setup);
        ProfileDiagnosis d = LocalDiagnosis.INSTANCE.diagnose(s.profile().orElseThrow(),
                new DiagnosisSetup(setup.convection(), setup.opacity(), setup.thermodynamics()));
        List<Region> convective = d.regions().stream().filter(r -> r.regime() == Regime.CONVECTIVE).toList();
        assertEquals(s.convectiveZones().size(), convective.size());
        Region outer = convective.get(convective.size() - 1);
        double rb = s.surfaceConvectionBase().orElseThrow().radius();
        double hp = sun.radius() * 0.01; // generous: the output spacing 0.02 in ln P is ~1e-4 R here
        assertEquals(rb, outer.bottomRadius(), hp);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void concurrentEnvelopesEqualSerialOnes() throws Exception {
        // common practice, no source: an immutable integrator gives bit-identical envelopes on any thread
        EnvelopeSetup setup = Stars.defaults();
        double[] alphas = {1.2, 1.6, 2.0, 2.4};
        double[] serial = new double[alphas.length];
        for (int i = 0; i < alphas.length; i++) {
            serial[i] = GreyAtmosphereEnvelope.DEFAULT.integrate(Stars.sun(), setup.withAlpha(alphas[i]))
                    .surfaceConvectionBase().orElseThrow().radius();
        }
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<Double>> futures = new ArrayList<>();
            for (double a : alphas) {
                futures.add(pool.submit(() -> GreyAtmosphereEnvelope.DEFAULT.integrate(Stars.sun(), setup.withAlpha(a))
                        .surfaceConvectionBase().orElseThrow().radius()));
            }
            for (int i = 0; i < alphas.length; i++) {
                assertEquals(serial[i], futures.get(i).get(), 0.0);
            }
        } finally {
            pool.shutdownNow();
        }
    }
}
