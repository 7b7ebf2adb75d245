package io.github.startransport.core.thermo;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.ThermoResult;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Gamma_1 and c_V of pure ionising hydrogen (ideal gas, no radiation, no pressure ionisation) in closed form. With
 * P = (1 + x) (rho / m_u) k T and the Saha equation x^2 / (1 - x) = (2 pi m_e k T / h^2)^(3/2) e^(-theta / T) m_u / rho
 * (theta = chi_H / k), differentiating ln(x^2 / (1 - x)) gives d ln x = (1 - x) / (2 - x) [(3/2 + theta / T) d ln T
 * - d ln rho], hence (derived here, the steps of Cox &amp; Giuli 1968, ch. 9, from memory):
 * chi_rho = 1 - x (1 - x) / ((1 + x)(2 - x)), chi_T = 1 + x (1 - x) (3/2 + theta / T) / ((1 + x)(2 - x)), and with
 * u = (k T / m_u)(3/2)(1 + x) + x chi_H / m_u: c_V = (k / m_u)[(3/2)(1 + x) + x (1 - x) / (2 - x) (3/2 + theta / T)^2].
 * x is solved from the Saha equation here, CODATA 2018 constants typed in, chi_H = 13.598434 eV (NIST, from memory).
 */
class IonisingHydrogenClosedFormsTest {
    private static final double K = 1.380649e-16;           // erg/K
    private static final double M_U = 1.66053906660e-24;    // g
    private static final double M_E = 9.1093837015e-28;     // g
    private static final double H = 6.62607015e-27;         // erg s
    private static final double THETA = 13.598434 * 1.602176634e-12 / K;   // K

    private static double saha(double t, double rho) {
        double s = Math.pow(2 * Math.PI * M_E * K * t / (H * H), 1.5) * Math.exp(-THETA / t) * M_U / rho;
        return 2 * s / (s + Math.sqrt(s * s + 4 * s));   // root of x^2 + s x - s = 0
    }

    private static ThermoResult ideal(double t, double rho) {
        ThermoResult r = new ThermoResult();
        SahaIonisation.evaluate(t, rho, 1.0, 0.0, 0.0, 0.0, r);
        return r;
    }

    private static final double[] TEMPERATURES = {7000, 9000, 11000, 14000, 25000};
    private static final double[] DENSITIES = {1e-9, 1e-6, 1e-3};

    @Test
    @Tag(CheckKind.EXTERNAL)
    void firstAdiabaticExponent() {
        // Gamma_1 = chi_rho / (1 - chi_T nabla_ad) (Cox & Giuli 1968, §9.13, from memory) with nabla_ad =
        // (2 + x (1 - x) a) / (5 + x (1 - x) a^2), a = 5/2 + theta / T (Kippenhahn, Weigert & Weiss 2012, §14.3)
        for (double t : TEMPERATURES) {
            for (double rho : DENSITIES) {
                double x = saha(t, rho);
                double w = x * (1 - x);
                double b = 1.5 + THETA / t;
                double chiRho = 1 - w / ((1 + x) * (2 - x));
                double chiT = 1 + w * b / ((1 + x) * (2 - x));
                double a = b + 1;
                double nablaAd = (2 + w * a) / (5 + w * a * a);
                double expected = chiRho / (1 - chiT * nablaAd);
                ThermoResult r = ideal(t, rho);
                String at = "T = " + t + ", rho = " + rho + ", x = " + x;
                assertEquals(chiRho, r.chiRho, 1e-9 * chiRho, at);
                assertEquals(chiT, r.chiT, 1e-9 * chiT, at);
                assertEquals(expected, r.gamma1, 1e-9 * expected, at);
            }
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void specificHeatAtConstantVolume() {
        for (double t : TEMPERATURES) {
            for (double rho : DENSITIES) {
                double x = saha(t, rho);
                double b = 1.5 + THETA / t;
                double expected = K / M_U * (1.5 * (1 + x) + x * (1 - x) / (2 - x) * b * b);
                assertEquals(expected, ideal(t, rho).cv, 1e-9 * expected, "T = " + t + ", rho = " + rho + ", x = " + x);
            }
        }
    }
}
