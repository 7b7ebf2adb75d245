package io.github.startransport.core.envelope;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.convection.EddySpectrumConvection;
import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.core.thermo.IonisingGas;
import io.github.startransport.spi.AlphaCalibration;
import io.github.startransport.spi.CalibrationStep;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.EnvelopeStar;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.InvalidOptionException;
import io.github.startransport.spi.ModelOptions;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The alpha calibration, its sensitivity, the law it relies on, and the refusals. */
class EnvelopeCalibrationTest {

    private static double base(EnvelopeStar star, EnvelopeSetup setup, double alpha) {
        return GreyAtmosphereEnvelope.DEFAULT.integrate(star, setup.withAlpha(alpha)).surfaceConvectionBase()
                .orElseThrow().radiusFraction();
    }

    /**
     * A more efficient convection (larger alpha) carries the flux on a smaller superadiabatic excess, so the
     * deep adiabat has a lower entropy and the zone reaches deeper (Kippenhahn, Weigert &amp; Weiss 2012, §7.3 and
     * §11.3.2 [from memory]; the reason alpha is calibrated on the solar convection-zone depth).
     */
    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 12, seed = "16016")
    void largerAlphaGivesADeeperBase(@ForAll @DoubleRange(min = 0.8, max = 3.0) @Scale(6) double a,
                                     @ForAll @DoubleRange(min = 0.05, max = 1.0) @Scale(6) double step,
                                     @ForAll @DoubleRange(min = 0.85, max = 1.15) @Scale(4) double massSolar) {
        EnvelopeStar star = new EnvelopeStar(massSolar * Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS * massSolar,
                Iau2015.SOLAR_LUMINOSITY * Math.pow(massSolar, 4), Stars.SUN_X, Stars.SUN_Z);
        EnvelopeSetup setup = Stars.defaults();
        double shallow = base(star, setup, a);
        double deep = base(star, setup, a + step);
        assertTrue(deep < shallow, "alpha " + a + " -> r_b/R " + shallow + ", alpha " + (a + step) + " -> " + deep);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void calibrationPutsTheBaseOnTheTargetAndItsSensitivityMatchesNeighbouringCalibrations() {
        EnvelopeStar sun = Stars.sun();
        EnvelopeSetup setup = Stars.defaults();
        // a target inside the reachable range: halfway between the bases of alpha = 1.2 and 2.4
        double target = 0.5 * (base(sun, setup, 1.2) + base(sun, setup, 2.4));
        List<CalibrationStep> told = new ArrayList<>();
        AlphaCalibration c = GreyAtmosphereEnvelope.DEFAULT.calibrate(sun, setup, target, told::add);
        assertEquals(told, c.steps());
        assertTrue(c.alpha() > 1.2 && c.alpha() < 2.4, "alpha " + c.alpha());
        // the requested target is met by an independent integration at the calibrated alpha
        assertEquals(target, base(sun, setup, c.alpha()), 1e-8);
        assertEquals(target, c.envelope().surfaceConvectionBase().orElseThrow().radiusFraction(), 1e-8);
        // d alpha / d(r_b/R) against calibrations to target -+ delta (a central difference of the inverse)
        double delta = 2e-5;
        double up = GreyAtmosphereEnvelope.DEFAULT.calibrate(sun, setup, target + delta, null).alpha();
        double down = GreyAtmosphereEnvelope.DEFAULT.calibrate(sun, setup, target - delta, null).alpha();
        assertEquals((up - down) / (2 * delta), c.sensitivity(), 0.02 * Math.abs(c.sensitivity()));
        assertTrue(c.sensitivity() < 0.0, "a deeper base (smaller r_b) needs a larger alpha");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void targetsOutsideTheReachableRangeAreRefusedWithTheRange() {
        EnvelopeStar sun = Stars.sun();
        EnvelopeSetup setup = Stars.defaults();
        double deepest = base(sun, setup, GreyAtmosphereEnvelope.DEFAULT_ALPHA_HIGH);
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> GreyAtmosphereEnvelope.DEFAULT.calibrate(sun, setup, deepest - 0.01, null));
        assertEquals("target base r/R", e.field());
        assertTrue(e.getMessage().contains("r_b/R from"), e.getMessage());
        assertThrows(InvalidInputException.class,
                () -> GreyAtmosphereEnvelope.DEFAULT.calibrate(sun, setup, 1.0, null));
        assertThrows(InvalidInputException.class,
                () -> GreyAtmosphereEnvelope.DEFAULT.calibrate(sun, setup, Double.NaN, null));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void badStarsAndOptionsAreRefusedByName() {
        double m = Iau2015.SOLAR_MASS;
        double r = Iau2015.SOLAR_RADIUS;
        double l = Iau2015.SOLAR_LUMINOSITY;
        assertEquals("luminosity", assertThrows(InvalidInputException.class,
                () -> new EnvelopeStar(m, r, 0.0, 0.7, 0.02)).field());
        assertEquals("radius", assertThrows(InvalidInputException.class,
                () -> new EnvelopeStar(m, -r, l, 0.7, 0.02)).field());
        assertEquals("mass", assertThrows(InvalidInputException.class,
                () -> new EnvelopeStar(Double.NaN, r, l, 0.7, 0.02)).field());
        assertEquals("metals", assertThrows(InvalidInputException.class,
                () -> new EnvelopeStar(m, r, l, 0.9, 0.2)).field());
        // 1e6 L_sun from 1 M_sun, 1 R_sun: radiation pressure exceeds gravity in the atmosphere
        // (the Eddington limit of a 1 M_sun star is ~3e4 L_sun for kappa = 0.34; Eddington 1926)
        EnvelopeStar bright = new EnvelopeStar(m, r, 1e6 * l, 0.7, 0.02);
        assertEquals("luminosity", assertThrows(InvalidInputException.class,
                () -> GreyAtmosphereEnvelope.DEFAULT.integrate(bright, Stars.defaults())).field());
        assertThrows(InvalidOptionException.class,
                () -> GreyAtmosphereEnvelope.fromOptions(ModelOptions.parse("inner-radius=1.5")));
        assertThrows(InvalidOptionException.class,
                () -> GreyAtmosphereEnvelope.fromOptions(ModelOptions.parse("alpha-low=3,alpha-high=2")));
        assertThrows(InvalidOptionException.class,
                () -> GreyAtmosphereEnvelope.fromOptions(ModelOptions.parse("depth=3")));
        // a length taken from the distance to the zone's edges is not known while integrating from the surface
        EnvelopeSetup edges = new EnvelopeSetup(
                EddySpectrumConvection.fromOptions(ModelOptions.parse("length-scale=edge-distance")),
                AnalyticOpacity.DEFAULT, IonisingGas.INSTANCE);
        InvalidOptionException e = assertThrows(InvalidOptionException.class,
                () -> GreyAtmosphereEnvelope.DEFAULT.integrate(Stars.sun(), edges));
        assertTrue(e.getMessage().contains("length-scale=scale-height"), e.getMessage());
        assertThrows(InvalidOptionException.class,
                () -> GreyAtmosphereEnvelope.DEFAULT.calibrate(Stars.sun(), edges, 0.713, null));
    }
}
