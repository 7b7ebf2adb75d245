package io.github.startransport.core.thermo;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneInput;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Published values and limits of the partial-ionisation equation of state. */
class IonisingGasTest {
    private static final double K = Codata2018.BOLTZMANN;
    private static final double MU = Codata2018.ATOMIC_MASS_UNIT;

    private static ThermoResult ideal(double t, double rho, double x, double z) {
        ThermoResult r = new ThermoResult();
        SahaIonisation.evaluate(t, rho, x, z, 0.0, 0.0, r);
        return r;
    }

    private static ThermoResult full(double t, double rho, double x, double z) {
        ThermoResult r = new ThermoResult();
        IonisingGas.INSTANCE.evaluate(t, rho, x, z, -1, r);
        return r;
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void hydrogenIsHalfIonisedNear9600KatAnElectronPressureOf200() {
        // Carroll & Ostlie, An Introduction to Modern Astrophysics, Example 8.1.4 (values from memory):
        // pure hydrogen, partition functions Z_I = 2, Z_II = 1, P_e = 20 N m^-2 = 200 dyn cm^-2:
        // N_II / N_total = 1/2 at T ~ 9600 K (quoted to two figures, so +-100 K)
        double pe = 200.0;
        // half ionised: n_H = 2 n_e = 2 P_e / (k T), rho = n_H m_u (A = 1)
        double t = new BrentSolver(1e-6).solve(200, temp -> {
            double rho = 2.0 * pe / (K * temp) * MU;
            return full(temp, rho, 1.0, 0.0).freeElectrons - 0.5;
        }, 6000, 15000);
        assertEquals(9600.0, t, 100.0);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void pureHydrogenFollowsTheSahaEquationInClosedForm() {
        // Saha (Kippenhahn, Weigert & Weiss 2012, eq. 14.4-14.5, numbers from memory):
        // x^2 / (1 - x) = (2 pi m_e k T / h^2)^(3/2) exp(-chi / kT) / n_H for pure hydrogen
        for (double t : new double[] {7000, 9000, 12000, 20000, 60000}) {
            for (double rho : new double[] {1e-10, 1e-7, 1e-4}) {
                double s = Math.pow(2 * Math.PI * Codata2018.ELECTRON_MASS * K * t
                        / (Codata2018.PLANCK * Codata2018.PLANCK), 1.5)
                        * Math.exp(-SahaIonisation.CHI_H_EV * Codata2018.ELECTRON_VOLT / (K * t)) / (rho / MU);
                double x = 2 * s / (s + Math.sqrt(s * s + 4 * s));
                assertEquals(x, ideal(t, rho, 1.0, 0.0).freeElectrons, 1e-12 * x, "T = " + t + ", rho = " + rho);
            }
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void ionisingHydrogenHasTheTextbookResponseFunctions() {
        // Kippenhahn, Weigert & Weiss 2012, §14.3 (from memory), pure hydrogen without radiation, with
        // a = 5/2 + chi / kT: delta = 1 + x(1 - x) a / 2, c_P = (k / m_u)(1 + x)[5/2 + x(1 - x) a^2 / 2],
        // nabla_ad = (2 + x(1 - x) a) / (5 + x(1 - x) a^2)
        for (double t : new double[] {6000, 9000, 11000, 14000, 20000, 40000}) {
            for (double rho : new double[] {1e-9, 1e-6, 1e-3}) {
                ThermoResult r = ideal(t, rho, 1.0, 0.0);
                double x = r.freeElectrons;
                double a = 2.5 + SahaIonisation.CHI_H_EV * Codata2018.ELECTRON_VOLT / (K * t);
                double w = x * (1 - x);
                String at = "T = " + t + ", rho = " + rho + ", x = " + x;
                assertEquals(1 + w * a / 2, r.delta, 1e-11 * r.delta, at);
                assertEquals(K / MU * (1 + x) * (2.5 + w * a * a / 2), r.cp, 1e-11 * r.cp, at);
                assertEquals((2 + w * a) / (5 + w * a * a), r.nablaAd, 1e-11, at);
                assertEquals(1.0 / (1 + x), r.mu, 1e-14, at);
            }
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void neutralMonatomicGasLimit() {
        // an ideal monatomic gas: nabla_ad = 2/5, Gamma_1 = 5/3, c_P = 5/2 k/(mu m_u), delta = 1
        // (Kippenhahn, Weigert & Weiss 2012, §13.1, from memory); neutral: 1/mu = X + Y/4 + Z/16
        ThermoResult r = ideal(1500.0, 1e-6, 0.7, 0.02);
        assertEquals(0.4, r.nablaAd, 1e-13);
        assertEquals(5.0 / 3.0, r.gamma1, 1e-13);
        assertEquals(1.0, r.delta, 1e-13);
        assertEquals(1.0 / (0.7 + 0.28 / 4 + 0.02 / 16), r.mu, 1e-13);
        assertEquals(2.5 * K / (r.mu * MU), r.cp, 1e-12 * r.cp);
        // with radiation and the excluded volume switched on, both corrections are below 1e-4 here
        ThermoResult m = full(1500.0, 1e-6, 0.7, 0.02);
        assertEquals(0.4, m.nablaAd, 1e-4);
        assertEquals(5.0 / 3.0, m.gamma1, 1e-4);
        assertEquals(0.0, m.pressureIonisation, 1e-5);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void fullyIonisedLimitIsTheIdealGasPlusRadiation() {
        // dense hot gas, ionised to 1e-13 (pressure ionisation takes the last bound states), compared
        // with the independent closed forms of Chandrasekhar's ideal gas plus radiation (ideal-gas-radiation)
        double[][] states = {{1e8, 1e3}, {3e8, 300}, {1e9, 1e3}, {1e9, 1e-8}, {3e9, 1e-7}};
        double[][] compositions = {{0.7, 0.02}, {1.0, 0.0}, {0.0, 0.0}, {0.3, 0.1}};
        ThermoResult a = new ThermoResult();
        ThermoResult b = new ThermoResult();
        for (double[] s : states) {
            for (double[] c : compositions) {
                IonisingGas.INSTANCE.evaluate(s[0], s[1], c[0], c[1], -1, a);
                IdealGasRadiation.INSTANCE.evaluate(s[0], s[1], c[0], c[1], -1, b);
                String at = "T = " + s[0] + ", rho = " + s[1] + ", X = " + c[0] + ", Z = " + c[1];
                close(b.mu, a.mu, at + " mu");
                close(b.pressure, a.pressure, at + " P");
                close(b.beta, a.beta, at + " beta");
                close(b.nablaAd, a.nablaAd, at + " nabla_ad");
                close(b.cp, a.cp, at + " c_P");
                close(b.cv, a.cv, at + " c_V");
                close(b.delta, a.delta, at + " delta");
                close(b.gamma1, a.gamma1, at + " Gamma_1");
                close(b.chiT, a.chiT, at + " chi_T");
                close(b.chiRho, a.chiRho, at + " chi_rho");
                close(b.phi, a.phi, at + " phi");
                // electrons: X + Y/2 + 7Z/16 here (metal nuclei of A = 16 count Z/16 of the Z/2 particles);
                // ideal-gas-radiation reports the textbook (1 + X)/2, all Z/2 as electrons
                close(c[0] + (1 - c[0] - c[1]) / 2 + 7 * c[1] / 16, a.freeElectrons, at + " electrons");
                for (int i : new int[] {ZoneInput.T, ZoneInput.RHO}) {
                    double scale = i == ZoneInput.T ? s[0] : s[1];
                    closeLog(b.dPressure[i] * scale, a.dPressure[i] * scale, b.pressure, at + " dP");
                    closeLog(b.dNablaAd[i] * scale, a.dNablaAd[i] * scale, b.nablaAd, at + " dnabla_ad");
                    closeLog(b.dCp[i] * scale, a.dCp[i] * scale, b.cp, at + " dc_P");
                    closeLog(b.dDelta[i] * scale, a.dDelta[i] * scale, b.delta, at + " ddelta");
                    closeLog(b.dGamma1[i] * scale, a.dGamma1[i] * scale, b.gamma1, at + " dGamma_1");
                    closeLog(b.dMu[i] * scale, a.dMu[i] * scale, b.mu, at + " dmu");
                    closeLog(b.dPhi[i] * scale, a.dPhi[i] * scale, b.phi, at + " dphi");
                }
            }
        }
    }

    private static void close(double expected, double actual, String what) {
        assertEquals(expected, actual, 1e-10 * Math.abs(expected), what);
    }

    /** Logarithmic derivatives d ln f / d ln x agree to 1e-10. */
    private static void closeLog(double expected, double actual, double value, String what) {
        assertEquals(expected / value, actual / value, 1e-10, what);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void hydrogenIonisationZoneLowersNablaAdToAboutOneTenthAndGamma1() {
        // Kippenhahn, Weigert & Weiss 2012, §14.3-14.4 and their figure of nabla_ad against T for an
        // ionising hydrogen-helium mixture (figure number and values from memory): nabla_ad drops from
        // 0.4 to about 0.1 in the hydrogen ionisation zone (1e4-2e4 K in stellar envelopes), and
        // Gamma_1 from 5/3 to about 1.2 there, with a shallower second dip in the He II zone.
        double rho = 1e-7;
        double minNabla = 1;
        double tAtMin = 0;
        double minGamma = 2;
        for (double lg = 3.7; lg <= 4.7; lg += 0.002) {
            ThermoResult r = full(Math.pow(10, lg), rho, 0.7, 0.02);
            if (r.nablaAd < minNabla) {
                minNabla = r.nablaAd;
                tAtMin = Math.pow(10, lg);
            }
            minGamma = Math.min(minGamma, r.gamma1);
        }
        assertEquals(0.1, minNabla, 0.05, "nabla_ad minimum");
        assertTrue(tAtMin > 1e4 && tAtMin < 2e4, "minimum at " + tAtMin + " K");
        assertEquals(1.2, minGamma, 0.1, "Gamma_1 minimum");
        // the He II zone: a second, shallower dip of Gamma_1 between 3e4 and 2e5 K, at rho = 1e-5
        double minHe = 2;
        for (double lg = 4.5; lg <= 5.3; lg += 0.002) {
            minHe = Math.min(minHe, full(Math.pow(10, lg), 1e-5, 0.7, 0.02).gamma1);
        }
        assertTrue(minHe > minGamma && minHe < 5.0 / 3.0 - 0.03, "He II dip of Gamma_1: " + minHe);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void refusesBadInputWithFieldAndZone() {
        ThermoResult r = new ThermoResult();
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> IonisingGas.INSTANCE.evaluate(-5, 1e-3, 0.7, 0.02, 7, r));
        assertEquals("temperature", e.field());
        assertEquals(7, e.zone());
        e = assertThrows(InvalidInputException.class,
                () -> IonisingGas.INSTANCE.evaluate(1e4, Double.NaN, 0.7, 0.02, 3, r));
        assertEquals("density", e.field());
        e = assertThrows(InvalidInputException.class,
                () -> IonisingGas.INSTANCE.evaluate(1e4, 1e-3, 0.9, 0.2, 3, r));
        assertEquals("metals", e.field());
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void solarCentreIsFlaggedMildlyDegenerateAndPressureIonised() {
        // T = 1.57e7 K, rho = 150 g cm^-3, X = 0.34 (standard solar model centre, Bahcall et al., values
        // from memory): n_e lambda^3 / 2 ~ 0.2, so the first Fermi-Dirac correction is ~4 % (Landau &
        // Lifshitz §56), and the Saha equation alone would leave a large share of hydrogen neutral
        ThermoResult r = full(1.57e7, 150, 0.34, 0.02);
        double ne = 150 / MU * (0.34 + 0.64 / 2 + 7 * 0.02 / 16);   // X + Y/2 + 7Z/16 electrons per m_u
        double lambda = Codata2018.PLANCK / Math.sqrt(2 * Math.PI * Codata2018.ELECTRON_MASS * K * 1.57e7);
        assertEquals(ne * lambda * lambda * lambda / 2, r.degeneracy, 1e-6 * r.degeneracy);
        assertTrue(r.pressureIonisation > 0.1, "pressure ionisation " + r.pressureIonisation);
        assertEquals(1.0 / (2 * 0.34 + 0.75 * 0.64 + 0.01), r.mu, 1e-6, "fully ionised there");
    }
}
