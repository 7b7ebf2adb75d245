package io.github.startransport.core.gradient;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The radiative gradient at the base of the Sun's convective envelope, where a standard solar model puts
 * nabla_rad = nabla_ad = 0.4 by definition of that boundary (Schwarzschild criterion).
 */
class SolarConvectionBaseGradientTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void radiativeGradientAtTheBaseOfTheSolarConvectionZoneIsTheAdiabaticOne() {
        // State at the base of the convection zone of a standard solar model (Christensen-Dalsgaard et al. 1996,
        // Science 272, 1286, "Model S"; all values from memory): r = 0.713 R_sun, T = 2.18e6 K, rho = 0.192 g/cm^3,
        // X = 0.74, Z = 0.018, 2.4 % of the mass above it, the whole luminosity below it, Rosseland opacity about
        // 20 cm^2/g (OPAL, log kappa ~ 1.3). P from the fully ionised ideal gas, mu = 4 / (3 + 5X - Z), plus a T^4 / 3
        // (Kippenhahn, Weigert & Weiss 2012 §13). There nabla_rad = nabla_ad = 0.4 (ideal monatomic gas, the boundary
        // of the Schwarzschild criterion). The inputs are remembered to two digits (kappa is the weakest), so 10 %.
        double t = 2.18e6;
        double rho = 0.192;
        double mu = 4.0 / (3.0 + 5.0 * 0.74 - 0.018);
        double p = rho * Codata2018.BOLTZMANN * t / (mu * Codata2018.ATOMIC_MASS_UNIT)
                + Codata2018.RADIATION_CONSTANT * Math.pow(t, 4) / 3.0;
        double m = (1.0 - 0.024) * Iau2015.SOLAR_MASS;
        double nablaRad = RadiativeGradient.value(20.0, Iau2015.SOLAR_LUMINOSITY, p, m, t);
        assertEquals(0.4, nablaRad, 0.04);
    }
}
