package io.github.startransport.core.gradient;

import io.github.startransport.core.constants.Codata2018;

/**
 * Thermodynamics of a fully ionised ideal gas mixed with black-body radiation, as functions of
 * beta = P_gas / P and the mean molecular weight mu.
 *
 * <p>P = rho k T / (mu m_u) + a T^4 / 3. The response functions are Chandrasekhar's
 * (<i>An Introduction to the Study of Stellar Structure</i>, 1939, ch. II; reproduced in
 * Kippenhahn, Weigert &amp; Weiss 2012, ch. 13 [eq. numbers from memory]) and Cox &amp; Giuli
 * (1968, ch. 9), simplified algebraically:
 * <ul>
 *   <li>nabla_ad = 2 (4 - 3 beta) / (32 - 24 beta - 3 beta^2)</li>
 *   <li>c_P = (k / mu m_u) (32 - 24 beta - 3 beta^2) / (2 beta^2)</li>
 *   <li>delta = (4 - 3 beta) / beta, phi = 1</li>
 *   <li>Gamma_1 = (32 - 24 beta - 3 beta^2) / (24 - 21 beta)</li>
 * </ul>
 * A fallback for hosts without an equation of state: it ignores partial ionisation and
 * degeneracy, so it is wrong below about 1e5 K and in dense cores of evolved stars.
 */
public final class GasRadiation {
    private GasRadiation() {
    }

    /**
     * Mean molecular weight of a fully ionised mixture, 1/mu = 2X + 3Y/4 + Z/2 with Y = 1 - X - Z
     * (metals counted as A/2 particles per nucleon; Kippenhahn, Weigert &amp; Weiss 2012 §4.2,
     * from memory).
     *
     * @param hydrogen X (mass fraction)
     * @param metals   Z (mass fraction)
     * @return mu (dimensionless)
     */
    public static double meanMolecularWeight(double hydrogen, double metals) {
        double helium = 1.0 - hydrogen - metals;
        return 1.0 / (2.0 * hydrogen + 0.75 * helium + 0.5 * metals);
    }

    /**
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param mu          mean molecular weight
     * @return gas pressure rho k T / (mu m_u) (dyn cm^-2)
     */
    public static double gasPressure(double temperature, double density, double mu) {
        return density * Codata2018.BOLTZMANN * temperature / (mu * Codata2018.ATOMIC_MASS_UNIT);
    }

    /**
     * @param temperature T (K)
     * @return radiation pressure a T^4 / 3 (dyn cm^-2)
     */
    public static double radiationPressure(double temperature) {
        double t2 = temperature * temperature;
        return Codata2018.RADIATION_CONSTANT * t2 * t2 / 3.0;
    }

    /**
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param mu          mean molecular weight
     * @return beta = P_gas / (P_gas + P_rad)
     */
    public static double beta(double temperature, double density, double mu) {
        double pg = gasPressure(temperature, density, mu);
        return pg / (pg + radiationPressure(temperature));
    }

    /**
     * @param beta P_gas / P, in (0, 1]
     * @return nabla_ad, from 2/5 at beta = 1 down to 1/4 as beta tends to 0
     */
    public static double nablaAd(double beta) {
        return 2.0 * (4.0 - 3.0 * beta) / (32.0 - 24.0 * beta - 3.0 * beta * beta);
    }

    /**
     * @param beta P_gas / P, in (0, 1]
     * @param mu   mean molecular weight
     * @return c_P (erg g^-1 K^-1)
     */
    public static double cp(double beta, double mu) {
        return Codata2018.BOLTZMANN / (mu * Codata2018.ATOMIC_MASS_UNIT)
                * (32.0 - 24.0 * beta - 3.0 * beta * beta) / (2.0 * beta * beta);
    }

    /**
     * @param beta P_gas / P, in (0, 1]
     * @return delta = -(d ln rho / d ln T)_P = (4 - 3 beta) / beta
     */
    public static double delta(double beta) {
        return (4.0 - 3.0 * beta) / beta;
    }

    /**
     * @param beta P_gas / P, in (0, 1]
     * @return Gamma_1 = (32 - 24 beta - 3 beta^2) / (24 - 21 beta)
     */
    public static double gamma1(double beta) {
        return (32.0 - 24.0 * beta - 3.0 * beta * beta) / (24.0 - 21.0 * beta);
    }

    /**
     * @param beta P_gas / P, in (0, 1]
     * @return chi_T = (d ln P / d ln T)_rho = 4 - 3 beta
     */
    public static double chiT(double beta) {
        return 4.0 - 3.0 * beta;
    }

    /**
     * @param beta P_gas / P, in (0, 1]
     * @param mu   mean molecular weight
     * @return c_V = (k / mu m_u) (3/2 + 12 (1 - beta) / beta) (erg g^-1 K^-1), from
     *         u = 3 k T / (2 mu m_u) + a T^4 / rho
     */
    public static double cv(double beta, double mu) {
        return Codata2018.BOLTZMANN / (mu * Codata2018.ATOMIC_MASS_UNIT) * (1.5 + 12.0 * (1.0 - beta) / beta);
    }

    /**
     * @param beta P_gas / P, in (0, 1]
     * @return d nabla_ad / d beta, from {@link #nablaAd(double)}
     */
    public static double dNablaAdDBeta(double beta) {
        double d = 32.0 - 24.0 * beta - 3.0 * beta * beta;
        return (-6.0 * d + 2.0 * (4.0 - 3.0 * beta) * (24.0 + 6.0 * beta)) / (d * d);
    }

    /**
     * @param beta P_gas / P, in (0, 1]
     * @param mu   mean molecular weight
     * @return d c_P / d beta (erg g^-1 K^-1), from {@link #cp(double, double)}
     */
    public static double dCpDBeta(double beta, double mu) {
        double n = 32.0 - 24.0 * beta - 3.0 * beta * beta;
        return Codata2018.BOLTZMANN / (mu * Codata2018.ATOMIC_MASS_UNIT)
                * ((-24.0 - 6.0 * beta) / (2.0 * beta * beta) - n / (beta * beta * beta));
    }

    /**
     * @param beta P_gas / P, in (0, 1]
     * @return d delta / d beta = -4 / beta^2
     */
    public static double dDeltaDBeta(double beta) {
        return -4.0 / (beta * beta);
    }

    /**
     * @param beta P_gas / P, in (0, 1]
     * @return d Gamma_1 / d beta, from {@link #gamma1(double)}
     */
    public static double dGamma1DBeta(double beta) {
        double d = 24.0 - 21.0 * beta;
        return ((-24.0 - 6.0 * beta) * d + 21.0 * (32.0 - 24.0 * beta - 3.0 * beta * beta)) / (d * d);
    }

    /**
     * Free electrons per m_u of a fully ionised mixture, X + Y/2 + Z/2 = (1 + X) / 2 (metals
     * counted as A/2 electrons per nucleus, as in {@link #meanMolecularWeight}).
     *
     * @param hydrogen X
     * @return electrons per atomic mass unit (dimensionless)
     */
    public static double electronsPerMassUnit(double hydrogen) {
        return 0.5 * (1.0 + hydrogen);
    }

    /**
     * Electron degeneracy indicator n_e lambda_e^3 / 2 with lambda_e = h / sqrt(2 pi m_e k T), the
     * thermal de Broglie wavelength: exp(eta) for non-degenerate electrons (Landau &amp; Lifshitz,
     * Statistical Physics, §56). Formed from logarithms; at least Double.MAX_VALUE / 1e4 is
     * returned as that.
     *
     * @param temperature     T (K)
     * @param electronDensity n_e (cm^-3)
     * @return n_e lambda_e^3 / 2 (dimensionless)
     */
    public static double electronDegeneracy(double temperature, double electronDensity) {
        double lnLambda3 = 1.5 * Math.log(Codata2018.PLANCK * Codata2018.PLANCK
                / (2.0 * Math.PI * Codata2018.ELECTRON_MASS * Codata2018.BOLTZMANN * temperature));
        return 0.5 * Math.exp(Math.min(700.0, Math.log(electronDensity) + lnLambda3));
    }
}
