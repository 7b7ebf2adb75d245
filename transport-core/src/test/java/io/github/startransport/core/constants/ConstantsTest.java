package io.github.startransport.core.constants;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Each constant against its published value. CODATA 2018: Tiesinga et al., Rev. Mod. Phys. 93,
 * 025010 (2021), SI values times the cgs powers of ten. IAU 2015 Resolution B3: Mamajek et al.,
 * arXiv:1510.07674.
 */
class ConstantsTest {

    @Tag(CheckKind.EXTERNAL)
    @Test
    void codataExactConstantsAreTheDefinedValues() {
        // CODATA 2018 / SI 2019 definitions: c = 299 792 458 m/s, h = 6.626 070 15e-34 J s, k = 1.380 649e-23 J/K
        assertEquals(299_792_458.0 * 100.0, Codata2018.SPEED_OF_LIGHT, 0.0);
        assertEquals(6.62607015e-34 * 1e7, Codata2018.PLANCK, 1e-40);
        assertEquals(1.380649e-23 * 1e7, Codata2018.BOLTZMANN, 1e-30);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void codataMeasuredConstants() {
        // CODATA 2018: G = 6.674 30(15)e-11 m^3 kg^-1 s^-2; m_u = 1.660 539 066 60(50)e-27 kg;
        // m_e = 9.109 383 7015(28)e-31 kg; sigma_T = 6.652 458 7321(60)e-29 m^2
        assertEquals(6.67430e-11 * 1e3, Codata2018.GRAVITATIONAL_CONSTANT, 1e-20);
        assertEquals(1.66053906660e-27 * 1e3, Codata2018.ATOMIC_MASS_UNIT, 1e-36);
        assertEquals(9.1093837015e-31 * 1e3, Codata2018.ELECTRON_MASS, 1e-40);
        assertEquals(6.6524587321e-29 * 1e4, Codata2018.THOMSON_CROSS_SECTION, 1e-36);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void stefanBoltzmannFollowsFromTheExactConstants() {
        // sigma = 2 pi^5 k^4 / (15 h^3 c^2) (any statistical-physics text); CODATA 2018 lists
        // 5.670 374 419e-8 W m^-2 K^-4, exact, truncated.
        double k = Codata2018.BOLTZMANN;
        double h = Codata2018.PLANCK;
        double c = Codata2018.SPEED_OF_LIGHT;
        double sigma = 2.0 * Math.pow(Math.PI, 5) * Math.pow(k, 4) / (15.0 * h * h * h * c * c);
        assertEquals(sigma, Codata2018.STEFAN_BOLTZMANN, 1e-9 * sigma);
        assertEquals(5.670374419e-8 * 1e3, Codata2018.STEFAN_BOLTZMANN, 1e-17);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void radiationConstantIsFourSigmaOverC() {
        // a = 4 sigma / c = 8 pi^5 k^4 / (15 h^3 c^3) (Kippenhahn, Weigert & Weiss 2012 §13.2, from memory)
        double k = Codata2018.BOLTZMANN;
        double h = Codata2018.PLANCK;
        double c = Codata2018.SPEED_OF_LIGHT;
        double a = 8.0 * Math.pow(Math.PI, 5) * Math.pow(k, 4) / (15.0 * Math.pow(h * c, 3));
        assertEquals(a, Codata2018.RADIATION_CONSTANT, 1e-9 * a);
        assertEquals(7.5657e-15, Codata2018.RADIATION_CONSTANT, 1e-19);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void iauNominalSolarValues() {
        // IAU 2015 B3: R = 6.957e8 m, L = 3.828e26 W, (GM) = 1.3271244e20 m^3 s^-2, Teff = 5772 K
        assertEquals(6.957e8 * 100.0, Iau2015.SOLAR_RADIUS, 0.0);
        assertEquals(3.828e26 * 1e7, Iau2015.SOLAR_LUMINOSITY, 0.0);
        assertEquals(1.3271244e20 * 1e6, Iau2015.SOLAR_MASS_PARAMETER, 0.0);
        assertEquals(5772.0, Iau2015.SOLAR_EFFECTIVE_TEMPERATURE, 0.0);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void nominalEffectiveTemperatureIsConsistentWithNominalRadiusAndLuminosity() {
        // IAU 2015 B3 notes that its nominal T_eff is consistent with L and R through
        // L = 4 pi R^2 sigma T^4 to within its rounding (5772 K is the rounded value).
        double r = Iau2015.SOLAR_RADIUS;
        double teff = Math.pow(Iau2015.SOLAR_LUMINOSITY / (4.0 * Math.PI * r * r * Codata2018.STEFAN_BOLTZMANN), 0.25);
        assertEquals(Iau2015.SOLAR_EFFECTIVE_TEMPERATURE, teff, 0.5);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void solarMassFromTheNominalMassParameter() {
        // IAU 2015 B3 recommends M_sun = (GM)_sun^N / G; with CODATA 2018 G this is 1.98841e33 g,
        // uncertain in the 5th digit through G (relative 2.2e-5).
        assertEquals(1.98841e33, Iau2015.SOLAR_MASS, 1e28);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void julianYear() {
        // IAU: the Julian year is exactly 365.25 days of 86400 s
        assertEquals(31_557_600.0, Iau2015.JULIAN_YEAR, 0.0);
    }
}
