package io.github.startransport.core.envelope;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.thermo.EvaluateOnly;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.EnvelopeSolution;
import io.github.startransport.spi.EnvelopeStar;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ThermodynamicsModel;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The envelope's density solve asks the equation of state for values only
 * ({@link ThermodynamicsModel#evaluateValues}), and the envelope is what it is when every state goes
 * through {@link ThermodynamicsModel#evaluate}: the same solution bit for bit.
 */
class EnvelopeThermoValuesTest {

    @Tag(CheckKind.INTERNAL)
    @Test
    void theSunsEnvelopeIsTheSameThroughEvaluate() {
        EnvelopeStar sun = Stars.sun();
        EnvelopeSetup setup = Stars.defaults();
        EvaluateOnly counting = new EvaluateOnly(setup.thermodynamics(), true);
        EnvelopeSetup through = new EnvelopeSetup(setup.convection(), setup.opacity(), counting);

        EnvelopeSolution a = GreyAtmosphereEnvelope.DEFAULT.integrate(sun, setup);
        EnvelopeSolution b = GreyAtmosphereEnvelope.DEFAULT.integrate(sun, through);

        assertEquals(0, counting.full.get(), "the envelope asked for derivatives");
        assertTrue(counting.values.get() > 100, "values-only calls: " + counting.values.get());
        assertEquals(a.evaluations(), b.evaluations());
        assertEquals(a.photosphericDensity(), b.photosphericDensity());
        assertEquals(a.innerRadius(), b.innerRadius());
        assertArrayEquals(a.nabla(), b.nabla());
        assertArrayEquals(a.nablaRad(), b.nablaRad());
        assertArrayEquals(a.velocity(), b.velocity());
        assertEquals(a.surfaceConvectionBase(), b.surfaceConvectionBase());
        assertEquals(a.warnings(), b.warnings());
        double[] rhoA = a.profile().orElseThrow().column(ProfileColumn.DENSITY);
        double[] rhoB = b.profile().orElseThrow().column(ProfileColumn.DENSITY);
        assertArrayEquals(rhoA, rhoB);
    }
}
