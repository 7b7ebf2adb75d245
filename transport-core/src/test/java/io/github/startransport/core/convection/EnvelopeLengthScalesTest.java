package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The length scales and the loss parameter the mixing-length model reports, each recomputed here from the zone's
 * inputs alone (never from another output of the model), in a mid-envelope layer (r = 0.9 R_sun, T = 5e5 K,
 * rho = 0.02, kappa = 50; orders of magnitude from memory) where H_P &lt; r, so the centre cap is inactive.
 */
class EnvelopeLengthScalesTest {
    private static final double G = Codata2018.GRAVITATIONAL_CONSTANT;

    private static ZoneState midEnvelope() {
        return ConvectionOutputsTest.zone(0.9 * Iau2015.SOLAR_RADIUS, 0.99 * Iau2015.SOLAR_MASS, 5.0e5, 0.02, 50.0,
                1.0);
    }

    private static ConvectionResult solve(ZoneState z) {
        ConvectionResult out = new ConvectionResult();
        new LocalMixingLength().solve(z, out);
        return out;
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void pressureScaleHeightAndMixingLengthFromTheInputs() {
        // H_P = -dr / d ln P = P / (rho g) with g = G m / r^2 (hydrostatic equilibrium; Kippenhahn, Weigert & Weiss
        // 2012 §6.1) and l = alpha H_P with the default alpha = 1.8 (mixing-length theory, same book ch. 7)
        ZoneState z = midEnvelope();
        double g = G * z.mass / (z.radius * z.radius);
        double hp = z.pressure / (z.density * g);
        assertTrue(hp < 0.2 * z.radius, "H_P = " + hp);
        ConvectionResult out = solve(z);
        assertEquals(hp, out.scaleHeight, 1e-13 * hp);
        assertEquals(1.8 * hp, out.mixingLength, 1e-13 * hp);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void lossParameterIsTheTextbookU() {
        // U = 3 a c T^3 / (c_P rho^2 kappa l^2) sqrt(8 H_P / (g delta)) (Kippenhahn, Weigert & Weiss 2012 eq. 7.12,
        // from memory), with H_P, g and l written out from the inputs
        ZoneState z = midEnvelope();
        double g = G * z.mass / (z.radius * z.radius);
        double hp = z.pressure / (z.density * g);
        double l = 1.8 * hp;
        double t = z.temperature;
        double u = 3.0 * Codata2018.RADIATION_CONSTANT * Codata2018.SPEED_OF_LIGHT * t * t * t
                / (z.cp * z.density * z.density * z.opacity * l * l) * Math.sqrt(8.0 * hp / (g * z.delta));
        assertEquals(u, solve(z).lossParameter, 1e-12 * u);
    }
}
