package io.github.startransport.core.opacity;

import io.github.startransport.core.constants.Codata2018;

/**
 * Electron-scattering opacity with the fitted reduction for high temperature (Compton / Klein-Nishina
 * effects) and for electron degeneracy.
 *
 * <p>kappa_es = kappa_T / [(1 + 2.7e11 rho / T^2) (1 + (T / 4.5e8)^0.86)], where
 * kappa_T = sigma_T / (mu_e m_u) = sigma_T (1 + X) / (2 m_u) is the Thomson value for fully ionised
 * matter (mu_e = 2 / (1 + X)). The correction factors are the fit attributed to Buchler &amp; Yueh
 * (1976, ApJ 210, 440) in the form given by Paczyński (1983); constants from memory. The fit as
 * published writes the prefactor as 0.2 (1 + X); we use the exact Thomson value
 * sigma_T / (2 m_u) = 0.20031 cm^2 g^-1 (CODATA 2018), which that 0.2 rounds.
 *
 * <p>Pure static kernel: no allocation, no state.
 */
public final class ElectronScattering {
    private ElectronScattering() {
    }

    /** sigma_T / (2 m_u) = 0.200311 cm^2 g^-1: kappa_T per unit (1 + X) (CODATA 2018). */
    public static final double THOMSON_PER_ONE_PLUS_X =
            Codata2018.THOMSON_CROSS_SECTION / (2.0 * Codata2018.ATOMIC_MASS_UNIT);

    /** Degeneracy coefficient 2.7e11 (K^2 cm^3 g^-1) of the fit (Buchler &amp; Yueh 1976; from memory). */
    public static final double DEGENERACY_COEFFICIENT = 2.7e11;

    /** Temperature scale 4.5e8 K of the high-temperature factor (Buchler &amp; Yueh 1976; from memory). */
    public static final double HOT_TEMPERATURE = 4.5e8;

    /** Exponent 0.86 of the high-temperature factor (Buchler &amp; Yueh 1976; from memory). */
    public static final double HOT_EXPONENT = 0.86;

    /**
     * @param hydrogen X (mass fraction)
     * @return the Thomson opacity sigma_T / (mu_e m_u) of fully ionised matter (cm^2 g^-1)
     */
    public static double thomson(double hydrogen) {
        return THOMSON_PER_ONE_PLUS_X * (1.0 + hydrogen);
    }

    /**
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param hydrogen    X (mass fraction)
     * @return kappa_es (cm^2 g^-1)
     */
    public static double kappa(double temperature, double density, double hydrogen) {
        double a = DEGENERACY_COEFFICIENT * density / (temperature * temperature);
        double b = Math.pow(temperature / HOT_TEMPERATURE, HOT_EXPONENT);
        return thomson(hydrogen) / ((1.0 + a) * (1.0 + b));
    }

    /**
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @return d ln kappa_es / d ln rho at constant T (dimensionless) = -A / (1 + A), A = 2.7e11 rho / T^2
     */
    public static double dLnRho(double temperature, double density) {
        double a = DEGENERACY_COEFFICIENT * density / (temperature * temperature);
        return -a / (1.0 + a);
    }

    /**
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @return d ln kappa_es / d ln T at constant rho (dimensionless) = 2A / (1 + A) - 0.86 B / (1 + B),
     *         B = (T / 4.5e8)^0.86
     */
    public static double dLnT(double temperature, double density) {
        double a = DEGENERACY_COEFFICIENT * density / (temperature * temperature);
        double b = Math.pow(temperature / HOT_TEMPERATURE, HOT_EXPONENT);
        return 2.0 * a / (1.0 + a) - HOT_EXPONENT * b / (1.0 + b);
    }
}
