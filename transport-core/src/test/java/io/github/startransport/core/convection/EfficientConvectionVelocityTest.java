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
 * with F = L / (4 pi r^2): v follows from the inputs alone, without the code's superadiabatic excess. The opposite,
 * inefficient limit is checked against the cubic's leading term.
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

    @Test
    @Tag(CheckKind.EXTERNAL)
    void velocityInTheInefficientLimitIsWOverTwoU() {
        // For U -> infinity the mixing-length cubic x^3 + (8/9) U x^2 + (16/9) U^2 x = (8/9) U W (Kippenhahn, Weigert
        // & Weiss 2012 eqs. 7.14-7.18, from memory; x = (nabla - nabla_e)^(1/2)) is dominated by its linear term:
        // x -> W / (2 U), W = nabla_rad - nabla_ad, with a relative correction x / (2U) = W / (4 U^2). Then
        // v = l sqrt(g delta / (8 H_P)) W / (2 U) (limit derived here). A thin layer just below a photosphere
        // (T = 1e4 K, rho = 1e-8, kappa = 2, nabla_rad = 3; illustrative), U written out from the inputs (eq. 7.12)
        ZoneState z = ConvectionOutputsTest.zone(Iau2015.SOLAR_RADIUS, Iau2015.SOLAR_MASS, 1.0e4, 1e-8, 2.0, 3.0);
        double g = Codata2018.GRAVITATIONAL_CONSTANT * z.mass / (z.radius * z.radius);
        double hp = z.pressure / (z.density * g);
        double l = 1.8 * hp;
        double t = z.temperature;
        double u = 3.0 * Codata2018.RADIATION_CONSTANT * Codata2018.SPEED_OF_LIGHT * t * t * t
                / (z.cp * z.density * z.density * z.opacity * l * l) * Math.sqrt(8.0 * hp / (g * z.delta));
        assertTrue(u > 100.0, "U = " + u);
        double w = 3.0 - z.nablaAd;
        double expected = l * Math.sqrt(g * z.delta / (8.0 * hp)) * w / (2.0 * u);

        ConvectionResult out = new ConvectionResult();
        new LocalMixingLength().solve(z, out);
        assertEquals(Regime.CONVECTIVE, out.regime);
        assertEquals(expected, out.velocity, (w / (u * u) + 1e-9) * expected);
    }
}
