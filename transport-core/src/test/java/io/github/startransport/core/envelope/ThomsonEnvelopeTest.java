package io.github.startransport.core.envelope;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.EnvelopeSolution;
import io.github.startransport.spi.EnvelopeStar;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A radiative envelope of constant (electron-scattering) opacity, which has an exact first integral: with m = M
 * and L constant, dP/dr = -G M rho / r^2 and dT/dr = -3 kappa rho L / (16 pi a c r^2 T^3) give dP/dT^4 =
 * 4 pi a c G M / (3 kappa L) = B, whatever the equation of state; the grey atmosphere (T^4 = 3/4 T_eff^4 (tau +
 * 2/3), dP/dtau = g / kappa) has the same dP/dT^4 = 4 g / (3 kappa T_eff^4) = B, since L = pi R^2 a c T_eff^4.
 * So P = B T^4 + a T_eff^4 / 6 - 2 g / (3 kappa) from the top (P = a T(0)^4 / 3, T(0)^4 = T_eff^4 / 2) down
 * (Kippenhahn, Weigert &amp; Weiss 2012, §11.2-11.3, the radiative envelope; Mihalas 1978, §3-3; from memory).
 */
class ThomsonEnvelopeTest {
    private static final double G = 6.67430e-8;                      // CODATA 2018
    private static final double AC = 4 * 5.670374419e-5;            // a c = 4 sigma, CODATA 2018
    private static final double A = AC / 2.99792458e10;
    private static final EnvelopeStar STAR = new EnvelopeStar(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS,
            Iau2015.SOLAR_LUMINOSITY, 0.7, 0.02);

    @Test
    @Tag(CheckKind.EXTERNAL)
    void pressureIsALinearFunctionOfTToTheFourThroughAtmosphereAndEnvelope() {
        double kappa = 0.2 * 1.7;   // Thomson, 0.2 (1 + X) cm^2/g
        EnvelopeSetup setup = new EnvelopeSetup(new LocalMixingLength(),
                new TextbookModels.PowerLawOpacity(kappa, 0.0, 0.0), new TextbookModels.PerfectGas(0.6));
        EnvelopeSolution s = GreyAtmosphereEnvelope.DEFAULT.integrate(STAR, setup);
        assertTrue(s.convectiveZones().isEmpty(), "nabla <= 1/4 < 2/5 everywhere: radiative");
        double m = STAR.mass();
        double r = STAR.radius();
        double l = STAR.luminosity();
        double teff = Math.pow(l / (Math.PI * r * r * AC), 0.25);
        double g = G * m / (r * r);
        double b = 4 * Math.PI * AC * G * m / (3 * kappa * l);
        Profile p = s.profile().orElseThrow();
        for (int k = 0; k < p.size(); k++) {
            double t = p.value(ProfileColumn.TEMPERATURE, k);
            double expected = b * Math.pow(t, 4) + A * Math.pow(teff, 4) / 6 - 2 * g / (3 * kappa);
            assertEquals(1.0, p.value(ProfileColumn.PRESSURE, k) / expected, 1e-7,
                    "P(T) at T = " + t + ", r = " + p.value(ProfileColumn.RADIUS, k) / r + " R");
        }
        assertTrue(p.size() > 50, "points: " + p.size());
    }
}
