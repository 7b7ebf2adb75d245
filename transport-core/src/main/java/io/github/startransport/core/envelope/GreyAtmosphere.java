package io.github.startransport.core.envelope;

import io.github.startransport.core.constants.Codata2018;

/**
 * The grey atmosphere in the Eddington approximation, the outer boundary of an envelope.
 *
 * <p>T^4(tau) = (3/4) T_eff^4 (tau + 2/3), so that T = T_eff at the photosphere tau = 2/3
 * (Eddington 1926; Mihalas 1978, <i>Stellar Atmospheres</i>, §3-3; Kippenhahn, Weigert &amp; Weiss
 * 2012, §11.2 [section numbers from memory]). In a plane-parallel, geometrically thin atmosphere
 * (gravity g = G M / R^2 constant) hydrostatic equilibrium in the optical depth reads
 * dP / dtau = g / kappa for the total pressure; in the same approximation the radiation pressure is
 * P_rad = a T^4 / 3 = (sigma T_eff^4 / c)(tau + 2/3), so the gas pressure obeys
 * dP_gas / dtau = g / kappa - sigma T_eff^4 / c. Pure static kernels.
 */
public final class GreyAtmosphere {
    /** Optical depth of the photosphere, where T = T_eff in the Eddington approximation. */
    public static final double PHOTOSPHERE_OPTICAL_DEPTH = 2.0 / 3.0;

    private GreyAtmosphere() {
    }

    /**
     * @param opticalDepth         tau (dimensionless), &gt;= 0
     * @param effectiveTemperature T_eff (K)
     * @return T(tau) = T_eff [(3/4)(tau + 2/3)]^(1/4) (K)
     */
    public static double temperature(double opticalDepth, double effectiveTemperature) {
        return effectiveTemperature * Math.sqrt(Math.sqrt(0.75 * (opticalDepth + PHOTOSPHERE_OPTICAL_DEPTH)));
    }

    /**
     * The Stefan-Boltzmann law at the photosphere, L = 4 pi R^2 sigma T_eff^4.
     *
     * @param luminosity L (erg s^-1)
     * @param radius     R (cm)
     * @return T_eff (K)
     */
    public static double effectiveTemperature(double luminosity, double radius) {
        return Math.sqrt(Math.sqrt(luminosity / (4.0 * Math.PI * radius * radius * Codata2018.STEFAN_BOLTZMANN)));
    }

    /**
     * @param effectiveTemperature T_eff (K)
     * @return the radiative force per unit opacity sigma T_eff^4 / c (dyn cm^-2 per unit optical depth)
     */
    public static double radiativeForce(double effectiveTemperature) {
        double t2 = effectiveTemperature * effectiveTemperature;
        return Codata2018.STEFAN_BOLTZMANN * t2 * t2 / Codata2018.SPEED_OF_LIGHT;
    }

    /**
     * @param temperature T (K)
     * @return the radiation pressure a T^4 / 3 (dyn cm^-2)
     */
    public static double radiationPressure(double temperature) {
        double t2 = temperature * temperature;
        return Codata2018.RADIATION_CONSTANT * t2 * t2 / 3.0;
    }
}
