package io.github.startransport.core.seismic;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * N^2 = (g^2 rho / P)(delta (nabla_ad - nabla) + phi nabla_mu) (Kippenhahn, Weigert &amp; Weiss 2012 §6.2, from
 * memory) in a layer whose temperature gradient is adiabatic: the buoyancy then comes from the composition
 * gradient alone, positive (stable) for mu falling outwards and negative for an inversion.
 */
class CompositionBuoyancyTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void anAdiabaticLayerIsStabilisedByItsCompositionGradientAlone() {
        double r = 1e10;
        double m = 3e33;
        double rho = 20.0;
        double p = 5e16;
        double g = Codata2018.GRAVITATIONAL_CONSTANT * m / (r * r);
        double n2 = LocalFrequencies.buoyancySquared(r, m, rho, p, 1.3, 0.38, 0.9, 0.05, 0.38);
        double expected = g * g * rho / p * 0.9 * 0.05;
        assertEquals(expected, n2, 1e-14 * expected);
        assertTrue(LocalFrequencies.buoyancySquared(r, m, rho, p, 1.3, 0.38, 0.9, -0.05, 0.38) < 0.0);
    }
}
