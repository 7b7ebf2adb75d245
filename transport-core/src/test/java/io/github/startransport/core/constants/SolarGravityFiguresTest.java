package io.github.startransport.core.constants;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Figures of the Sun's gravity and energy budget that textbooks and fact sheets quote, rebuilt from our
 * IAU 2015 nominal values and CODATA 2018 constants. A wrong exponent, a mistyped digit of G, GM_sun, R_sun,
 * L_sun or c shows up in at least one of them.
 */
class SolarGravityFiguresTest {
    private static final double G = Codata2018.GRAVITATIONAL_CONSTANT;
    private static final double C = Codata2018.SPEED_OF_LIGHT;
    private static final double M = Iau2015.SOLAR_MASS;
    private static final double R = Iau2015.SOLAR_RADIUS;

    @Test
    @Tag(CheckKind.EXTERNAL)
    void escapeVelocityFromTheSolarSurface() {
        // v_esc = sqrt(2 G M / R) = 617.6 km/s (NASA Sun fact sheet; value from memory)
        double v = Math.sqrt(2.0 * G * M / R);
        assertEquals(617.6e5, v, 0.2e5);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void schwarzschildRadiusOfTheSun() {
        // r_s = 2 G M / c^2 = 2.953 km (value from memory:
        // 2.95325 km for GM_sun = 1.3271244e20 m^3 s^-2 of IAU 2015 B3)
        double rs = 2.0 * G * M / (C * C);
        assertEquals(2.9533e5, rs, 0.0002e5);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void freeFallTimeOfTheSunIsAboutHalfAnHour() {
        // tau_ff ~ (R^3 / (G M))^(1/2): "about 27 minutes for the Sun" (Kippenhahn, Weigert & Weiss 2012 §2.4,
        // the hydrostatic timescale; from memory); the figure has two digits, so +-0.5 min
        double tau = Math.sqrt(R * R * R / (G * M));
        assertEquals(27.0 * 60.0, tau, 0.5 * 60.0);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void massTheSunRadiatesAwayEachSecond() {
        // dM/dt = L / c^2 = 4.26 million tonnes per second (a figure quoted throughout introductory texts, e.g.
        // Carroll & Ostlie 2007 ch. 10; value from memory): 4.26e12 g/s
        double rate = Iau2015.SOLAR_LUMINOSITY / (C * C);
        assertEquals(4.26e12, rate, 0.005e12);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void lowerBoundOfTheSolarCentralPressure() {
        // Hydrostatic equilibrium dP/dm = -G m / (4 pi r^4) with r <= R gives P_c > G M^2 / (8 pi R^4)
        // (Kippenhahn, Weigert & Weiss 2012 §2.3, derivation: integrate G m dm / (4 pi R^4) from 0 to M):
        // "P_c > 4.5e14 dyn cm^-2" for the Sun (same place; value from memory, two digits)
        double bound = G * M * M / (8.0 * Math.PI * R * R * R * R);
        assertEquals(4.5e14, bound, 0.05e14);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void nuclearTimescaleOfTheSunIsTenBillionYears() {
        // tau_nuc = 0.007 q M c^2 / L with 0.7 % of the rest mass released by hydrogen burning and q = 0.1 of the
        // mass burnt on the main sequence: "about 1e10 years" for the Sun (Kippenhahn, Weigert & Weiss 2012 ch. 1;
        // Carroll & Ostlie 2007 ch. 10; from memory, one digit, so 10 %)
        double tau = 0.007 * 0.1 * M * C * C / Iau2015.SOLAR_LUMINOSITY;
        assertEquals(1e10, tau / Iau2015.JULIAN_YEAR, 0.1e10);
    }
}
