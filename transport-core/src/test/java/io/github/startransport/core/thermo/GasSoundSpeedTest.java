package io.github.startransport.core.thermo;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.seismic.LocalFrequencies;
import io.github.startransport.spi.ThermoResult;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The adiabatic sound speed c_s = sqrt(Gamma_1 P / rho) built from the ionising gas's Gamma_1 and P, against the
 * ideal-gas closed form and against the published centre of the standard solar model.
 */
class GasSoundSpeedTest {
    private static final double K = 1.380649e-16;          // Boltzmann constant (erg/K), CODATA 2018
    private static final double M_U = 1.66053906660e-24;   // atomic mass unit (g), CODATA 2018

    private static double soundSpeed(double t, double rho, double x, double z) {
        ThermoResult r = new ThermoResult();
        SahaIonisation.evaluate(t, rho, x, z, r);
        return LocalFrequencies.soundSpeed(r.gamma1, r.pressure, rho);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void neutralMonatomicGasHasTheIdealSoundSpeed() {
        // An ideal monatomic gas: c_s = sqrt(5 k T / (3 mu m_u)), independent of rho (Landau & Lifshitz, Fluid
        // Mechanics §64, from memory). At 3000 K and 1e-6 g cm^-3 hydrogen is ionised to ~1e-10 (Saha) and
        // radiation pressure is 1e-6 of the gas pressure, so the neutral atomic mu with 1/mu = X + Y/4 + Z/16 holds
        // to 1e-5 (metals counted as A = 16, the model's representative metal).
        double x = 0.7;
        double z = 0.02;
        double mu = 1.0 / (x + (1 - x - z) / 4 + z / 16);
        for (double t : new double[] {2000.0, 3000.0}) {
            double expected = Math.sqrt(5 * K * t / (3 * mu * M_U));
            assertEquals(expected, soundSpeed(t, 1e-6, x, z), 1e-5 * expected, "T = " + t);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void soundSpeedAtTheCentreOfTheStandardSolarModel() {
        // Standard solar model centre: T = 1.57e7 K, rho = 152 g cm^-3, X = 0.34, Z = 0.02 (Bahcall & Pinsonneault
        // 2004, from memory); its central sound speed is about 5.1e7 cm/s (helioseismic inversions and
        // Christensen-Dalsgaard et al. 1996, Model S, ~510 km/s, from memory). The remaining differences (the
        // models' own EOS with electrostatic and degeneracy corrections, the rounded inputs) are a few per mil to
        // a per cent: 3 % asserted.
        assertEquals(5.1e7, soundSpeed(1.57e7, 152.0, 0.34, 0.02), 0.03 * 5.1e7);
    }
}
