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
 * Radiative envelopes and atmospheres with closed-form solutions. A constant (electron-scattering) opacity has an
 * exact first integral: with m = M
 * and L constant, dP/dr = -G M rho / r^2 and dT/dr = -3 kappa rho L / (16 pi a c r^2 T^3) give dP/dT^4 =
 * 4 pi a c G M / (3 kappa L) = B, whatever the equation of state; the grey atmosphere (T^4 = 3/4 T_eff^4 (tau +
 * 2/3), dP/dtau = g / kappa) has the same dP/dT^4 = 4 g / (3 kappa T_eff^4) = B, since L = pi R^2 a c T_eff^4.
 * So P = B T^4 + a T_eff^4 / 6 - 2 g / (3 kappa) from the top (P = a T(0)^4 / 3, T(0)^4 = T_eff^4 / 2) down
 * (Kippenhahn, Weigert &amp; Weiss 2012, §11.2-11.3, the radiative envelope; Mihalas 1978, §3-3; from memory).
 * An opacity kappa_0 rho^(1/2) T^9 gives the photospheric pressure as an elementary integral.
 */
class RadiativeEnvelopeClosedFormsTest {
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
        double[] nabla = s.nabla();
        for (int k = 0; k < p.size(); k++) {
            double t = p.value(ProfileColumn.TEMPERATURE, k);
            double expected = b * Math.pow(t, 4) + A * Math.pow(teff, 4) / 6 - 2 * g / (3 * kappa);
            String at = "T = " + t + ", r = " + p.value(ProfileColumn.RADIUS, k) / r + " R";
            assertEquals(1.0, p.value(ProfileColumn.PRESSURE, k) / expected, 1e-7, "P(T) at " + at);
            // and the gradient along it: nabla = d ln T / d ln P = P / (4 B T^4), 1/4 deep down
            assertEquals(expected / (4 * b * Math.pow(t, 4)), nabla[k], 1e-7, "nabla at " + at);
        }
        assertTrue(p.size() > 50, "points: " + p.size());
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void photosphericPressureUnderAnHMinusLikeOpacityInClosedForm() {
        // kappa = kappa_0 rho^(1/2) T^9 (H-minus, Hansen, Kawaler & Trimble 2004, kappa_0 = 2.5e-31 at Z = 0.02) in a
        // perfect gas rho = mu m_u P / (k T) through the Eddington atmosphere T^4 = 3/4 T_eff^4 (tau + 2/3):
        // dP/dtau = g / kappa gives P^(1/2) dP = (g / kappa_0)(k / mu m_u)^(1/2) T^(-8.5) dtau, so
        // P(2/3)^(3/2) = P(0)^(3/2) + (3/2)(g / kappa_0)(k / mu m_u)^(1/2) (3/4 T_eff^4)^(-17/8) (8/9)
        // [(2/3)^(-9/8) - (4/3)^(-9/8)], with P(0) = a T(0)^4 / 3 = a T_eff^4 / 6 as the envelope's top boundary
        // (Kippenhahn, Weigert & Weiss 2012, §11.2 [from memory]; the integral is elementary).
        double kappa0 = 2.5e-31;
        double mu = 0.6;
        double k = 1.380649e-16;             // CODATA 2018
        double mU = 1.66053906660e-24;       // CODATA 2018
        EnvelopeSetup setup = new EnvelopeSetup(new LocalMixingLength(),
                new TextbookModels.PowerLawOpacity(kappa0, 0.5, 9.0), new TextbookModels.PerfectGas(mu));
        double r = STAR.radius();
        double teff = Math.pow(STAR.luminosity() / (Math.PI * r * r * AC), 0.25);
        double g = G * STAR.mass() / (r * r);
        double integral = Math.pow(0.75 * Math.pow(teff, 4), -17.0 / 8) * 8.0 / 9
                * (Math.pow(2.0 / 3, -9.0 / 8) - Math.pow(4.0 / 3, -9.0 / 8));
        double p0 = A * Math.pow(teff, 4) / 6;
        double expected = Math.pow(Math.pow(p0, 1.5) + 1.5 * g / kappa0 * Math.sqrt(k / (mu * mU)) * integral, 2.0 / 3);
        // the atmosphere starts at tau = 1e-6 instead of 0, where the integrand is (3/2)^(17/8) = 2.4 times its
        // mean over [0, 2/3]: at most 4e-6 of the integral, 3e-6 of P: 1e-5
        assertEquals(expected, GreyAtmosphereEnvelope.DEFAULT.photosphericPressure(STAR, setup), 1e-5 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void photosphericPressureUnderAKramersOpacityInClosedForm() {
        // kappa = kappa_0 rho T^-3.5 (Kramers bound-free, Carroll & Ostlie 1996: kappa_0 = 4.34e25 Z (1 + X)) in a
        // perfect gas rho = mu m_u P / (k T) through the Eddington atmosphere T^4 = 3/4 T_eff^4 (tau + 2/3):
        // P dP = (g / kappa_0)(k / mu m_u) T^4.5 dtau, so P(2/3)^2 = P(0)^2 + 2 (g / kappa_0)(k / mu m_u)
        // (3/4 T_eff^4)^(9/8) (8/17) [(4/3)^(17/8) - (2/3)^(17/8)], P(0) = a T_eff^4 / 6 (the elementary integral
        // of the same atmosphere as above, with the opacity falling instead of rising with T)
        double kappa0 = 4.34e25 * 0.02 * 1.7;
        double mu = 0.6;
        double k = 1.380649e-16;             // CODATA 2018
        double mU = 1.66053906660e-24;       // CODATA 2018
        EnvelopeSetup setup = new EnvelopeSetup(new LocalMixingLength(),
                new TextbookModels.PowerLawOpacity(kappa0, 1.0, -3.5), new TextbookModels.PerfectGas(mu));
        double r = STAR.radius();
        double teff = Math.pow(STAR.luminosity() / (Math.PI * r * r * AC), 0.25);
        double g = G * STAR.mass() / (r * r);
        double integral = Math.pow(0.75 * Math.pow(teff, 4), 9.0 / 8) * 8.0 / 17
                * (Math.pow(4.0 / 3, 17.0 / 8) - Math.pow(2.0 / 3, 17.0 / 8));
        double p0 = A * Math.pow(teff, 4) / 6;
        double expected = Math.sqrt(p0 * p0 + 2 * g / kappa0 * k / (mu * mU) * integral);
        // the top at tau = 1e-6 instead of 0 leaves out less than 1e-6 of the integral (the integrand is smallest
        // there): 1e-5
        assertEquals(expected, GreyAtmosphereEnvelope.DEFAULT.photosphericPressure(STAR, setup), 1e-5 * expected);
    }
}
