package io.github.startransport.core.constants;

import io.github.startransport.core.checks.CheckKind;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Our constants combined into quantities that CODATA 2018 (Tiesinga et al. 2021, Rev. Mod. Phys. 93, 025010;
 * values as listed by NIST, digits from memory) publishes separately, and the nominal Sun of IAU 2015 B3
 * (Mamajek et al., arXiv:1510.07674) against handbook figures. A wrong digit in one of our constants shows up as a
 * disagreement with a value it was not copied from.
 */
class CodataRelationsTest {
    private static final double C = Codata2018.SPEED_OF_LIGHT;
    private static final double H = Codata2018.PLANCK;
    private static final double K = Codata2018.BOLTZMANN;
    /** mu_0 / (4 pi 1e-7 H/m) = 1.000 000 000 55(15) (CODATA 2018; exactly 1 before the 2019 SI). */
    private static final double MU_0_RATIO = 1.00000000055;

    @Test
    @Tag(CheckKind.EXTERNAL)
    void atomicMassUnitIsTheMolarMassConstantOverAvogadrosNumber() {
        // CODATA 2018: N_A = 6.022 140 76e23 mol^-1 (exact), M_u = 0.999 999 999 65(30)e-3 kg/mol, m_u = M_u / N_A;
        // in grams M_u = 0.999 999 999 65 g/mol. Relative uncertainty of M_u is 3e-10
        double mu = 0.99999999965 / 6.02214076e23;
        assertEquals(mu, Codata2018.ATOMIC_MASS_UNIT, 1e-9 * mu);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void boltzmannOverAtomicMassUnitIsTheGasConstantOverMolarMass() {
        // R = N_A k = 8.314 462 618 J mol^-1 K^-1 (CODATA 2018, exact), so k / m_u = R / M_u
        // = 8.314 462 618e7 erg g^-1 K^-1 / 0.999 999 999 65: the gas constant per gram behind every P = rho k T / (mu m_u)
        double expected = 8.314462618e7 / 0.99999999965;
        assertEquals(expected, K / Codata2018.ATOMIC_MASS_UNIT, 1e-9 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void electronRestEnergyIsFiveHundredElevenKiloElectronVolts() {
        // CODATA 2018: m_e c^2 = 0.510 998 950 00(15) MeV
        double energy = Codata2018.ELECTRON_MASS * C * C / Codata2018.ELECTRON_VOLT;
        assertEquals(0.51099895000e6, energy, 1e-9 * 0.511e6);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void electronMassInAtomicMassUnits() {
        // CODATA 2018: m_e = 5.485 799 090 65(16)e-4 u
        assertEquals(5.48579909065e-4, Codata2018.ELECTRON_MASS / Codata2018.ATOMIC_MASS_UNIT, 1e-9 * 5.486e-4);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void thomsonCrossSectionIsEightPiThirdsOfTheClassicalElectronRadiusSquared() {
        // r_e = e^2 / (m_e c^2) in Gaussian units = 2.817 940 3262(13)e-13 cm (CODATA 2018);
        // sigma_T = (8 pi / 3) r_e^2 (Rybicki & Lightman 1979, eq. 3.60, from memory)
        double e = Codata2018.ELEMENTARY_CHARGE_ESU * Math.sqrt(MU_0_RATIO); // see the Rydberg test
        double re = e * e / (Codata2018.ELECTRON_MASS * C * C);
        assertEquals(2.8179403262e-13, re, 1e-9 * 2.818e-13);
        assertEquals(8.0 * Math.PI / 3.0 * re * re, Codata2018.THOMSON_CROSS_SECTION, 2e-9 * 6.65e-25);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void fineStructureConstantFromTheGaussianCharge() {
        // alpha = e^2 / (hbar c) in Gaussian units = 7.297 352 5693(11)e-3 (CODATA 2018), with the mu_0 factor of
        // the Rydberg test below
        double e = Codata2018.ELEMENTARY_CHARGE_ESU * Math.sqrt(MU_0_RATIO);
        double alpha = 2.0 * Math.PI * e * e / (H * C);
        assertEquals(7.2973525693e-3, alpha, 3e-10 * 7.3e-3);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void secondRadiationConstantIsHcOverK() {
        // CODATA 2018: c_2 = h c / k = 1.438 776 877e-2 m K (exact) = 1.438 776 877 cm K
        assertEquals(1.438776877, H * C / K, 1e-9);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void firstRadiationConstantIsTwoPiHcSquared() {
        // CODATA 2018: c_1 = 2 pi h c^2 = 3.741 771 852e-16 W m^2 (exact); 1 W m^2 = 1e11 erg s^-1 cm^2
        assertEquals(3.741771852e-5, 2.0 * Math.PI * H * C * C, 1e-9 * 3.74e-5);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void wienDisplacementConstantFromThePeakOfPlanckLaw() {
        // The peak of B_lambda(T) sits at lambda T = c_2 / x with x the root of (x - 5) e^x + 5 = 0 (Rybicki &
        // Lightman 1979 §1.5, from memory), found here by Commons Math's Brent solver. CODATA 2018: b = 2.897 771 955e-3 m K
        // (exact) = 0.289 777 1955 cm K
        double x = new BrentSolver(1e-15).solve(100, v -> (v - 5.0) * Math.exp(v) + 5.0, 4.0, 5.0);
        assertEquals(4.965114231744276, x, 1e-12); // the textbook 4.965 (from memory); 15 digits from the solver
        assertEquals(0.2897771955, H * C / (K * x), 1e-9 * 0.29);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void stefanBoltzmannConstantFromTheIntegralOfPlanckLaw() {
        // sigma T^4 = pi integral B_nu dnu = (2 pi k^4 T^4 / (h^3 c^2)) integral_0^inf x^3 / (e^x - 1) dx
        // (Rybicki & Lightman 1979 §1.5, from memory), the integral by Commons Math's Gauss-Legendre quadrature
        // (the tail beyond x = 80 is below 1e-28); it must be pi^4 / 15 and give CODATA's sigma
        IterativeLegendreGaussIntegrator gauss = new IterativeLegendreGaussIntegrator(24, 1e-15, 1e-15);
        double integral = 0.0;
        for (int i = 0; i < 8; i++) {
            integral += gauss.integrate(100_000, x -> x == 0.0 ? 0.0 : x * x * x / Math.expm1(x), 10.0 * i, 10.0 * i + 10.0);
        }
        assertEquals(Math.pow(Math.PI, 4) / 15.0, integral, 1e-12);
        double sigma = 2.0 * Math.PI * Math.pow(K, 4) / (H * H * H * C * C) * integral;
        assertEquals(sigma, Codata2018.STEFAN_BOLTZMANN, 1e-9 * sigma);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void meanDensityOfTheSun() {
        // rho_mean = 3 M / (4 pi R^3) = 1.41 g cm^-3 (Allen's Astrophysical Quantities, Cox 2000, §14.1; from memory)
        double r = Iau2015.SOLAR_RADIUS;
        double mean = 3.0 * Iau2015.SOLAR_MASS / (4.0 * Math.PI * r * r * r);
        assertEquals(1.41, mean, 0.005);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void surfaceGravityOfTheSun() {
        // g = GM / R^2 = 2.74e4 cm s^-2, log g = 4.438 (Allen's Astrophysical Quantities, Cox 2000, §14.1; from memory)
        double g = Iau2015.SOLAR_MASS_PARAMETER / (Iau2015.SOLAR_RADIUS * Iau2015.SOLAR_RADIUS);
        assertEquals(4.438, Math.log10(g), 0.0005);
        assertEquals(g, Codata2018.GRAVITATIONAL_CONSTANT * Iau2015.SOLAR_MASS / (Iau2015.SOLAR_RADIUS * Iau2015.SOLAR_RADIUS),
                1e-12 * g);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void nominalLuminosityIsTheNominalIrradianceAtOneAstronomicalUnit() {
        // IAU 2015 B3 derives L_sun^N = 4 pi (1 au)^2 S_sun^N from the nominal total solar irradiance
        // S_sun^N = 1361 W m^-2 (= 1.361e6 erg s^-1 cm^-2) and 1 au = 1.495 978 707e13 cm (IAU 2012 B2, exact),
        // rounded to 3.828e26 W
        double au = 1.495978707e13;
        double irradiance = Iau2015.SOLAR_LUMINOSITY / (4.0 * Math.PI * au * au);
        assertEquals(1.361e6, irradiance, 0.0005e6);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void eddingtonLuminosityOfOneSolarMass() {
        // L_Edd = 4 pi c G M / kappa with kappa = 0.34 cm^2 g^-1 (Thomson scattering, X = 0.7): about 1.5e31 W per
        // solar mass (Carroll & Ostlie 2007, eq. 10.6, from memory), i.e. 3.8e4 L_sun
        double eddington = 4.0 * Math.PI * C * Iau2015.SOLAR_MASS_PARAMETER / 0.34;
        assertEquals(1.5e38, eddington, 0.05e38);
        assertEquals(3.8e4, eddington / Iau2015.SOLAR_LUMINOSITY, 0.1e4);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void thomsonOpacityOfIonisedHydrogen() {
        // kappa_es = sigma_T / (mu_e m_u) with mu_e = 1 for pure ionised hydrogen: 0.40 cm^2 g^-1, and
        // 0.20 (1 + X) in general (Kippenhahn, Weigert & Weiss 2012 §17.2; Hansen, Kawaler & Trimble 2004 §4.4; from
        // memory); the coefficient is the commonly quoted 0.2003 (from memory)
        double kappa = Codata2018.THOMSON_CROSS_SECTION / Codata2018.ATOMIC_MASS_UNIT;
        assertEquals(0.40, kappa, 0.002);
        assertEquals(0.2003, kappa / 2.0, 0.00005);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void rydbergEnergyFromTheElectronMassAndCharge() {
        // R_inf h c = m_e e^4 / (2 hbar^2) in Gaussian units = 13.605 693 122 994(26) eV (CODATA 2018). The Gaussian
        // charge squared is e^2 mu_0 c^2 / (4 pi) (SI to cgs); our constant takes mu_0 = 4 pi 1e-7 H/m, while since
        // 2019 mu_0 / (4 pi 1e-7) = 1.000 000 000 55(15) (CODATA 2018), so e^4 carries that factor squared (1.1e-9)
        double e = Codata2018.ELEMENTARY_CHARGE_ESU * Math.sqrt(MU_0_RATIO);
        double hbar = H / (2.0 * Math.PI);
        double rydberg = Codata2018.ELECTRON_MASS * Math.pow(e, 4) / (2.0 * hbar * hbar) / Codata2018.ELECTRON_VOLT;
        assertEquals(13.605693122994, rydberg, 5e-10 * 13.6);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void comptonWavelengthOfTheElectron() {
        // lambda_C = h / (m_e c) = 2.426 310 238 67(73)e-12 m (CODATA 2018) = 2.426 310 238 67e-10 cm
        assertEquals(2.42631023867e-10, H / (Codata2018.ELECTRON_MASS * C), 1e-9 * 2.43e-10);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void bolometricMagnitudeOfTheNominalSun() {
        // IAU 2015 Resolution B2: M_bol = -2.5 log10(L / L_0) with L_0 = 3.0128e28 W = 3.0128e35 erg s^-1 (exact), which
        // gives M_bol = 4.74 for the nominal solar luminosity (the resolution quotes 4.74)
        assertEquals(4.74, -2.5 * Math.log10(Iau2015.SOLAR_LUMINOSITY / 3.0128e35), 0.005);
    }
}
