package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The mixing-length velocity in efficient convection from the flux it must carry. Kippenhahn, Weigert &amp; Weiss
 * (2012, ch. 7; from memory) give v^2 = g delta l^2 (nabla - nabla_e) / (8 H_P) and
 * F_conv = rho c_P T sqrt(g delta) l^2 H_P^(-3/2) (nabla - nabla_e)^(3/2) / (4 sqrt 2); eliminating
 * (nabla - nabla_e) gives v^3 = g delta l F_conv / (4 rho c_P T) (derivation here). Where convection is efficient
 * nabla -&gt; nabla_ad, so the radiative flux is F nabla_ad / nabla_rad and F_conv = F (1 - nabla_ad / nabla_rad),
 * with F = L / (4 pi r^2): v follows from the inputs alone, without the code's superadiabatic excess.
 */
class EfficientConvectionVelocityTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void velocityCubedIsGDeltaLTimesTheConvectiveFluxOverFourRhoCpT() {
        // base of a solar-like envelope (r = 0.72 R_sun, T = 2.2e6 K, rho = 0.19, kappa = 20; from memory) with
        // nabla_rad = 0.7, where U ~ 1e-9 and nabla - nabla_ad ~ 1e-7: the efficient limit holds to ~1e-6
        ZoneState z = ConvectionOutputsTest.zone(0.72 * Iau2015.SOLAR_RADIUS, 0.98 * Iau2015.SOLAR_MASS, 2.2e6, 0.19,
                20.0, 0.7);
        double g = Codata2018.GRAVITATIONAL_CONSTANT * z.mass / (z.radius * z.radius);
        double hp = z.pressure / (z.density * g);
        assertTrue(hp < z.radius);
        double l = 1.8 * hp; // alpha = 1.8, the default
        double nablaRad = 3.0 * z.opacity * z.luminosity * z.pressure / (16.0 * Math.PI * Codata2018.RADIATION_CONSTANT
                * Codata2018.SPEED_OF_LIGHT * Codata2018.GRAVITATIONAL_CONSTANT * z.mass * Math.pow(z.temperature, 4));
        double flux = z.luminosity / (4.0 * Math.PI * z.radius * z.radius);
        double fConv = flux * (1.0 - z.nablaAd / nablaRad);
        double expected = Math.cbrt(g * z.delta * l * fConv / (4.0 * z.density * z.cp * z.temperature));

        ConvectionResult out = new ConvectionResult();
        new LocalMixingLength().solve(z, out);
        assertEquals(Regime.CONVECTIVE, out.regime);
        assertEquals(expected, out.velocity, 1e-5 * expected);
    }
}
