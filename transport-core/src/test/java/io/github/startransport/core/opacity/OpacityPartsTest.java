package io.github.startransport.core.opacity;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The analytic opacity's parts at points not checked in {@code AnalyticOpacityTest}, against the published laws. */
class OpacityPartsTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void thomsonOpacityOfTheSolarMixture() {
        // sigma_T / (mu_e m_u) with mu_e = 2 / (1 + X) and CODATA 2018 values: 0.20031 (1 + X), 0.340527 at X = 0.7
        double expected = Codata2018.THOMSON_CROSS_SECTION * 1.7 / (2 * Codata2018.ATOMIC_MASS_UNIT);
        assertEquals(0.20031 * 1.7, expected, 1e-6);
        assertEquals(expected, ElectronScattering.thomson(0.7), 1e-12 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void hMinusInACoolDenseAtmosphere() {
        // 2.5e-31 (Z / 0.02) rho^(1/2) T^9 (Hansen, Kawaler & Trimble 2004) at 4000 K, 1e-8 g/cm^3, Z = 0.01
        double expected = 2.5e-31 * 0.5 * 1e-4 * Math.pow(4000.0, 9);
        assertEquals(expected, HMinus.kappa(4000.0, 1e-8, 0.01), 1e-12 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void kramersFreeFreeOfMetalFreeGasAtOneMillionKelvin() {
        // 3.68e22 g_ff (1 - Z)(1 + X) rho T^-3.5 (Carroll & Ostlie 1996, p. 274) at X = 0.75, Z = 0, rho = 0.01
        double expected = 3.68e22 * 1.75 * 0.01 * Math.pow(1e6, -3.5);
        assertEquals(expected, Kramers.freeFree(1e6, 0.01, 0.75, 0.0, 1.0), 1e-12 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void kramersBoundFreeGrowsWithMetals() {
        // 4.34e25 (g/t) Z (1 + X) rho T^-3.5 (Carroll & Ostlie 1996, p. 274) at Z = 0.04, X = 0.6, rho = 10, T = 3e6
        double expected = 4.34e25 * 0.04 * 1.6 * 10 * Math.pow(3e6, -3.5);
        assertEquals(expected, Kramers.boundFree(3e6, 10, 0.6, 0.04, 1.0), 1e-12 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void molecularFloorIsATenthOfZ() {
        // kappa_mol = 0.1 Z cm^2/g (an analytic envelope prescription, attribution unknown, from memory)
        assertEquals(0.002, MolecularFloor.kappa(0.02), 1e-15);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void chargeSquaredPerMassOfTheSolarMixture() {
        // sum X_i Z_i^2 / A_i: hydrogen 1, helium 4/4, metals as oxygen-16, 64/16 = 4 (the representative metal is
        // common practice, no source): X = 0.7, Z = 0.02 gives 0.7 + 0.28 + 0.08
        assertEquals(1.06, Conduction.chargeSquaredPerMass(0.7, 0.02), 1e-15);
    }
}
