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
}
