package io.github.startransport.core.gradient;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.ZoneInput;

/**
 * The radiative temperature gradient, the gradient radiation alone needs to carry the local
 * luminosity by diffusion.
 *
 * <p>nabla_rad = 3 kappa L P / (16 pi a c G m T^4)
 * (Kippenhahn, Weigert &amp; Weiss 2012, <i>Stellar Structure and Evolution</i>, eq. 5.28;
 * Hansen, Kawaler &amp; Trimble 2004, §5.1). Pure static kernel: no allocation, no state.
 */
public final class RadiativeGradient {
    private RadiativeGradient() {
    }

    /** 16 pi a c G (cgs), the constant denominator of nabla_rad. */
    static final double DENOMINATOR = 16.0 * Math.PI * Codata2018.RADIATION_CONSTANT
            * Codata2018.SPEED_OF_LIGHT * Codata2018.GRAVITATIONAL_CONSTANT;

    /**
     * @param kappa       Rosseland mean opacity (cm^2 g^-1)
     * @param luminosity  L (erg s^-1)
     * @param pressure    P (dyn cm^-2)
     * @param mass        m (g)
     * @param temperature T (K)
     * @return nabla_rad (dimensionless)
     */
    public static double value(double kappa, double luminosity, double pressure, double mass, double temperature) {
        double t2 = temperature * temperature;
        return 3.0 * kappa * luminosity * pressure / (DENOMINATOR * mass * (t2 * t2));
    }

    /**
     * Evaluates nabla_rad and writes its partial derivatives into {@code d}, indexed by
     * {@link ZoneInput} (entries for T, P, L, m, kappa; all others set to 0).
     *
     * @param kappa       Rosseland mean opacity (cm^2 g^-1)
     * @param luminosity  L (erg s^-1)
     * @param pressure    P (dyn cm^-2)
     * @param mass        m (g)
     * @param temperature T (K)
     * @param d           output, length &gt;= {@link ZoneInput#COUNT}; modified
     * @return nabla_rad (dimensionless)
     */
    public static double valueAndDerivatives(double kappa, double luminosity, double pressure, double mass,
                                             double temperature, double[] d) {
        double t2 = temperature * temperature;
        // per unit L, so that the L-derivative stays exact when L = 0
        double perL = 3.0 * kappa * pressure / (DENOMINATOR * mass * (t2 * t2));
        double nabla = perL * luminosity;
        java.util.Arrays.fill(d, 0, ZoneInput.COUNT, 0.0);
        d[ZoneInput.L] = perL;
        d[ZoneInput.KAPPA] = nabla / kappa;
        d[ZoneInput.P] = nabla / pressure;
        d[ZoneInput.M] = -nabla / mass;
        d[ZoneInput.T] = -4.0 * nabla / temperature;
        return nabla;
    }
}
