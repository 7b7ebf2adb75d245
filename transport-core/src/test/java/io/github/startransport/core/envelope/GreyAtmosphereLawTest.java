package io.github.startransport.core.envelope;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The grey Eddington atmosphere, T^4 = (3/4) T_eff^4 (tau + 2/3) (Mihalas 1978, Stellar Atmospheres, §3-3, from
 * memory), at depths not checked elsewhere, and its radiation terms.
 */
class GreyAtmosphereLawTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void temperatureAtUnitOpticalDepth() {
        // (3/4 (1 + 2/3))^(1/4) = 1.25^(1/4) = 1.0574 T_eff
        assertEquals(Math.pow(1.25, 0.25) * 6000.0, GreyAtmosphere.temperature(1.0, 6000.0), 1e-9);
    }

    @Test
    @Tag(CheckKind.LAW)
    void deepTemperatureGrowsAsTheFourthRootOfTheOpticalDepth() {
        // tau >> 1: T -> (3 tau / 4)^(1/4) T_eff, the diffusion limit; relative correction (2/3) / (4 tau)
        double tau = 1e6;
        double t = GreyAtmosphere.temperature(tau, 5772.0);
        double limit = Math.pow(0.75 * tau, 0.25) * 5772.0;
        assertEquals(1.0, t / limit, 1.0 / (6.0 * tau) * 1.01);
        assertEquals(true, t > limit);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void radiativeForceIsTheFluxOverC() {
        // the flux sigma T_eff^4 carries momentum F / c per unit time and area: dP_rad / dtau = F / c
        double teff = 5772.0;
        double expected = Codata2018.STEFAN_BOLTZMANN * Math.pow(teff, 4) / Codata2018.SPEED_OF_LIGHT;
        assertEquals(expected, GreyAtmosphere.radiativeForce(teff), 1e-14 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void radiationPressureAtTheSurfaceIsHalfTheDiffusionValue() {
        // P_rad(tau = 0) = a T(0)^4 / 3 with T(0)^4 = T_eff^4 / 2: a T_eff^4 / 6 = (2/3) sigma T_eff^4 / c
        double teff = 8000.0;
        double surface = GreyAtmosphere.radiationPressure(GreyAtmosphere.temperature(0.0, teff));
        double expected = 2.0 / 3.0 * Codata2018.STEFAN_BOLTZMANN * Math.pow(teff, 4) / Codata2018.SPEED_OF_LIGHT;
        assertEquals(expected, surface, 1e-12 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void effectiveTemperatureOfASixSolarLuminosityStarOfOnePointSevenSolarRadii() {
        // L = 4 pi R^2 sigma T_eff^4: T_eff = 5772 K (6^(1/4) / 1.7^(1/2)) with the IAU 2015 nominal Sun
        double teff = GreyAtmosphere.effectiveTemperature(6 * 3.828e33, 1.7 * 6.957e10);
        double sun = Math.pow(3.828e33 / (4 * Math.PI * 6.957e10 * 6.957e10 * Codata2018.STEFAN_BOLTZMANN), 0.25);
        assertEquals(sun * Math.pow(6.0, 0.25) / Math.sqrt(1.7), teff, 1e-9 * teff);
        assertEquals(6929.0, teff, 1.0);
    }
}
