package io.github.startransport.core.envelope;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
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

/** The envelope against closed-form solutions of textbook atmospheres and envelopes. */
class EnvelopeAnalyticTest {
    private static final double MU = 0.6;
    private static final EnvelopeStar STAR = new EnvelopeStar(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS,
            Iau2015.SOLAR_LUMINOSITY, 0.7, 0.02);

    @Tag(CheckKind.EXTERNAL)
    @Test
    void eddingtonTemperatureLaw() {
        // T^4 = 3/4 T_eff^4 (tau + 2/3): T = T_eff at tau = 2/3, T(0) = 2^(-1/4) T_eff = 0.8409 T_eff
        // (Mihalas 1978, Stellar Atmospheres, §3-3 [from memory])
        assertEquals(5772.0, GreyAtmosphere.temperature(2.0 / 3.0, 5772.0), 1e-9);
        assertEquals(Math.pow(2.0, -0.25) * 5772.0, GreyAtmosphere.temperature(0.0, 5772.0), 1e-9);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void effectiveTemperatureOfTheNominalSun() {
        // IAU 2015 Resolution B3: the nominal L and R give T_eff = 5772 K (the nominal value, rounded)
        double teff = GreyAtmosphere.effectiveTemperature(Iau2015.SOLAR_LUMINOSITY, Iau2015.SOLAR_RADIUS);
        assertEquals(5772.0, teff, 0.01);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void photosphericPressureOfAConstantOpacityAtmosphere() {
        // dP/dtau = g / kappa with constant kappa and P(0) = P_rad(0) = a T(0)^4 / 3 = a T_eff^4 / 6 gives
        // P(2/3) = (2/3) g / kappa + a T_eff^4 / 6 (Kippenhahn, Weigert & Weiss 2012 §11.2: P_0 = 2 g / (3 kappa)
        // without radiation pressure [section from memory])
        double kappa = 0.37;
        EnvelopeSetup setup = new EnvelopeSetup(new LocalMixingLength(),
                new TextbookModels.PowerLawOpacity(kappa, 0.0, 0.0), Stars.defaults().thermodynamics());
        double g = Codata2018.GRAVITATIONAL_CONSTANT * STAR.mass() / (STAR.radius() * STAR.radius());
        double teff = GreyAtmosphere.effectiveTemperature(STAR.luminosity(), STAR.radius());
        double expected = 2.0 * g / (3.0 * kappa) + Codata2018.RADIATION_CONSTANT * Math.pow(teff, 4) / 6.0;
        double p = GreyAtmosphereEnvelope.DEFAULT.photosphericPressure(STAR, setup);
        assertEquals(1.0, p / expected, 1e-9);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void kramersRadiativeEnvelopeFollowsTheRadiativeZeroSolution() {
        // Radiative envelope with m = M, L constant and kappa = kappa_0 rho T^-3.5 (Kramers) in a perfect gas:
        // dP/dT = 16 pi a c G M T^3 / (3 kappa L) with kappa = kappa_0 (mu m_u / k) P T^-4.5 integrates to
        // P^2 = 2 A T^8.5 / 8.5 + const, A = 16 pi a c G M k / (3 kappa_0 mu m_u L); deep down the constant is
        // negligible: P = (2 A / 8.5)^(1/2) T^4.25 and nabla = 1 / 4.25 (the radiative-zero solution,
        // Kippenhahn, Weigert & Weiss 2012, §11.3.1, and Schwarzschild 1958, §13 [sections from memory]).
        // kappa_0 = 4.34e25 Z (1 + X) with Z = 0.02, X = 0.7: Kramers bound-free (Carroll & Ostlie 1996, eq. 9.22).
        double kappa0 = 4.34e25 * 0.02 * 1.7;
        EnvelopeSetup setup = new EnvelopeSetup(new LocalMixingLength(),
                new TextbookModels.PowerLawOpacity(kappa0, 1.0, -3.5), new TextbookModels.PerfectGas(MU));
        EnvelopeSolution s = GreyAtmosphereEnvelope.DEFAULT.integrate(STAR, setup);
        assertTrue(s.convectiveZones().isEmpty(), "a Kramers envelope with nabla -> 0.235 < 0.4 is radiative");
        double ac = Codata2018.RADIATION_CONSTANT * Codata2018.SPEED_OF_LIGHT;
        double a = 16.0 * Math.PI * ac * Codata2018.GRAVITATIONAL_CONSTANT * STAR.mass() * Codata2018.BOLTZMANN
                / (3.0 * kappa0 * MU * Codata2018.ATOMIC_MASS_UNIT * STAR.luminosity());
        Profile p = s.profile().orElseThrow();
        double[] nabla = s.nabla();
        int checked = 0;
        for (int k = 0; k < p.size(); k++) {
            double t = p.value(ProfileColumn.TEMPERATURE, k);
            if (t < 30.0 * s.effectiveTemperature()) {
                continue; // where the surface constant still matters: (T_s / T)^8.5 > 1e-12
            }
            double expected = Math.sqrt(2.0 * a / 8.5 * Math.pow(t, 8.5));
            assertEquals(1.0, p.value(ProfileColumn.PRESSURE, k) / expected, 1e-7, "P(T) at T = " + t);
            assertEquals(1.0 / 4.25, nabla[k], 1e-8, "nabla at T = " + t);
            checked++;
        }
        assertTrue(checked > 100, "deep points checked: " + checked);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void efficientConvectionInAPerfectMonatomicGasFollowsTheAdiabatPOfT() {
        // Deep in an efficient convection zone nabla -> nabla_ad = 2/5 for a fully ionised perfect monatomic gas,
        // so P ~ T^(5/2) (the adiabat P ~ T^(gamma / (gamma - 1)) with gamma = 5/3; Kippenhahn, Weigert & Weiss
        // 2012, §11.3.2 and §13.1 [sections from memory]). kappa ~ T^2 keeps nabla_rad rising inward on the
        // adiabat (nabla_rad ~ T^0.5), so the whole envelope convects.
        EnvelopeSetup setup = new EnvelopeSetup(new LocalMixingLength(),
                new TextbookModels.PowerLawOpacity(3e-8, 0.0, 2.0), new TextbookModels.PerfectGas(MU));
        EnvelopeSolution s = GreyAtmosphereEnvelope.DEFAULT.integrate(STAR, setup);
        assertEquals(1, s.convectiveZones().size());
        assertTrue(!s.convectiveZones().get(0).bottomReached(), "convective down to the stated depth");
        Profile p = s.profile().orElseThrow();
        // two points deep in the zone: r = 0.5 R (the innermost) and the first point above 0.65 R
        int inner = 0;
        int outer = 0;
        while (p.value(ProfileColumn.RADIUS, outer) < 0.65 * STAR.radius()) {
            outer++;
        }
        double slope = Math.log(p.value(ProfileColumn.PRESSURE, outer) / p.value(ProfileColumn.PRESSURE, inner))
                / Math.log(p.value(ProfileColumn.TEMPERATURE, outer) / p.value(ProfileColumn.TEMPERATURE, inner));
        assertEquals(2.5, slope, 1e-4);
    }
}
