package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The thermal diffusivity behind the semiconvective and thermohaline coefficients, from the kinetic theory of the
 * photon gas rather than from the conductivity formula the code writes.
 */
class PhotonGasDiffusivityTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void thermalDiffusivityIsThePhotonGasConductivityOverRhoCp() {
        // Kinetic theory of a gas of carriers (Kippenhahn, Weigert & Weiss 2012 §5.1.1, from memory): conductivity
        // K = (1/3) v l c_V per unit volume; for photons v = c, mean free path l = 1 / (kappa rho), and the heat
        // capacity of radiation per unit volume d(a T^4)/dT = 4 a T^3. The thermal diffusivity is K / (rho c_P).
        // Near the solar centre (T = 1.5e7 K, rho = 150, kappa = 1.2, c_P = 3.4e8; illustrative)
        double t = 1.5e7;
        double rho = 150.0;
        double kappa = 1.2;
        double cp = 3.4e8;
        double a = 4.0 * Codata2018.STEFAN_BOLTZMANN / Codata2018.SPEED_OF_LIGHT;
        double meanFreePath = 1.0 / (kappa * rho);
        double conductivity = Codata2018.SPEED_OF_LIGHT * meanFreePath * (4.0 * a * t * t * t) / 3.0;
        double expected = conductivity / (rho * cp);
        assertEquals(expected, MixingCoefficients.thermalDiffusivity(t, rho, kappa, cp), 1e-13 * expected);
    }
}
