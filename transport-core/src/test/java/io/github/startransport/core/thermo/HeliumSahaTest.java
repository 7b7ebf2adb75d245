package io.github.startransport.core.thermo;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.ThermoResult;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Pure helium in the ideal-gas limit (no radiation, no pressure ionisation) against the two-stage Saha equations
 * solved here with Commons Math's BrentSolver: n_II n_e / n_I = 2 (g_II / g_I) lambda^-3 exp(-chi_1 / kT) and
 * n_III n_e / n_II = 2 (g_III / g_II) lambda^-3 exp(-chi_2 / kT), lambda = h / sqrt(2 pi m_e k T), ground-state
 * weights g = 1, 2, 1 (Kippenhahn, Weigert &amp; Weiss 2012 §14.1, from memory), n_He = rho / (4 m_u).
 */
class HeliumSahaTest {
    private static final double K = Codata2018.BOLTZMANN;

    private static double electronsPerNucleus(double t, double rho) {
        double lambda3 = Math.pow(Codata2018.PLANCK * Codata2018.PLANCK
                / (2 * Math.PI * Codata2018.ELECTRON_MASS * K * t), 1.5);
        double a1 = 2 * 2.0 / lambda3 * Math.exp(-SahaIonisation.CHI_HE1_EV * Codata2018.ELECTRON_VOLT / (K * t));
        double a2 = 2 * 0.5 / lambda3 * Math.exp(-SahaIonisation.CHI_HE2_EV * Codata2018.ELECTRON_VOLT / (K * t));
        double n = rho / (4 * Codata2018.ATOMIC_MASS_UNIT);
        // e = (n_II + 2 n_III) / n_He = (a1 n_e + 2 a1 a2) / (n_e^2 + a1 n_e + a1 a2) with n_e = e n_He
        return new BrentSolver(1e-300, 1e-15).solve(1000, e -> {
            double ne = e * n;
            return (a1 * ne + 2 * a1 * a2) / (ne * ne + a1 * ne + a1 * a2) - e;
        }, 1e-30, 2.0);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void heliumThroughBothIonisations() {
        for (double t : new double[] {1.5e4, 2.5e4, 4e4, 6e4, 1e5}) {
            for (double rho : new double[] {1e-9, 1e-6}) {
                ThermoResult r = new ThermoResult();
                SahaIonisation.evaluate(t, rho, 0.0, 0.0, 0.0, 0.0, r);
                // freeElectrons counts electrons per atomic mass unit: a quarter of those per helium nucleus
                double expected = electronsPerNucleus(t, rho) / 4.0;
                assertEquals(expected, r.freeElectrons, 1e-9 * expected + 1e-12, "T = " + t + ", rho = " + rho);
            }
        }
    }
}
