package io.github.startransport.core.convection;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.ZoneInput;

/**
 * Mixing diffusion coefficients (cm^2 s^-1) for each regime of the stability test.
 *
 * <p>Pure static kernels over primitives; no allocation, no state. The derivative variants
 * write plain partial derivatives indexed by {@link ZoneInput} into a caller-owned array and
 * take the radiative gradient's derivatives as input, because in a stable zone the actual
 * gradient is nabla_rad.
 */
public final class MixingCoefficients {
    private MixingCoefficients() {
    }

    /** 4 a c / 3 (cgs): the radiative conductivity is this times T^3 / (kappa rho). */
    private static final double CONDUCTIVITY_FACTOR = 4.0 * Codata2018.RADIATION_CONSTANT
            * Codata2018.SPEED_OF_LIGHT / 3.0;

    /**
     * Convective mixing from the kinetic estimate D = v l / 3 (e.g. Langer, El Eid &amp; Fricke
     * 1985, A&amp;A 145, 179; from memory).
     *
     * @param velocity     convective velocity v (cm s^-1)
     * @param mixingLength mixing length l (cm)
     * @return D_conv (cm^2 s^-1)
     */
    public static double convective(double velocity, double mixingLength) {
        return velocity * mixingLength / 3.0;
    }

    /**
     * Thermal diffusivity K_T = 4 a c T^3 / (3 kappa rho^2 c_P): the radiative conductivity
     * 4acT^3/(3 kappa rho) divided by rho c_P.
     *
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param opacity     kappa (cm^2 g^-1)
     * @param cp          c_P (erg g^-1 K^-1)
     * @return K_T (cm^2 s^-1)
     */
    public static double thermalDiffusivity(double temperature, double density, double opacity, double cp) {
        return CONDUCTIVITY_FACTOR * temperature * temperature * temperature / (opacity * density * density * cp);
    }

    /**
     * Semiconvective mixing after Langer, Sugimoto &amp; Fricke (1983, A&amp;A 126, 207):
     * D_sc = alpha_sc (K_T / 6) (nabla - nabla_ad) / (nabla_L - nabla), for
     * nabla_ad &lt; nabla &lt; nabla_L (form from memory). Zero at the Schwarzschild margin,
     * growing without bound toward the Ledoux margin.
     *
     * @param efficiency  alpha_sc (dimensionless), &gt;= 0
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param opacity     kappa (cm^2 g^-1)
     * @param cp          c_P (erg g^-1 K^-1)
     * @param nabla       actual gradient (dimensionless)
     * @param nablaAd     adiabatic gradient (dimensionless)
     * @param nablaLedoux Ledoux gradient (dimensionless)
     * @return D_sc (cm^2 s^-1)
     */
    public static double semiconvective(double efficiency, double temperature, double density, double opacity,
                                        double cp, double nabla, double nablaAd, double nablaLedoux) {
        return efficiency * thermalDiffusivity(temperature, density, opacity, cp) / 6.0
                * (nabla - nablaAd) / (nablaLedoux - nabla);
    }

    /**
     * Thermohaline mixing after Kippenhahn, Ruschenplatt &amp; Thomas (1980, A&amp;A 91, 175), with
     * the efficiency written as in Charbonnel &amp; Zahn (2007, A&amp;A 467, L15):
     * D_th = C_t K_T (phi/delta) (-nabla_mu) / (nabla_ad - nabla), for nabla_mu &lt; 0 and
     * nabla &lt; nabla_ad (form from memory). C_t = 8 pi^2 a_f^2 / 3 for fingers of aspect ratio a_f.
     *
     * @param efficiency  C_t (dimensionless), &gt;= 0
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param opacity     kappa (cm^2 g^-1)
     * @param cp          c_P (erg g^-1 K^-1)
     * @param phi         (d ln rho / d ln mu)_{P,T} (dimensionless)
     * @param delta       -(d ln rho / d ln T)_{P,mu} (dimensionless)
     * @param nablaMu     d ln mu / d ln P (dimensionless), &lt; 0
     * @param nablaAd     adiabatic gradient (dimensionless)
     * @param nabla       actual gradient (dimensionless)
     * @return D_th (cm^2 s^-1)
     */
    public static double thermohaline(double efficiency, double temperature, double density, double opacity,
                                      double cp, double phi, double delta, double nablaMu, double nablaAd,
                                      double nabla) {
        return efficiency * thermalDiffusivity(temperature, density, opacity, cp) * (phi / delta)
                * (-nablaMu) / (nablaAd - nabla);
    }

    /**
     * Exponentially decaying overshoot (Freytag, Ludwig &amp; Steffen 1996, A&amp;A 313, 497;
     * Herwig 2000, A&amp;A 360, 952): D(z) = D_0 exp(-2 z / (f H_P)), z measured from the
     * convective boundary into the stable layer (exact expression from memory). f = 0 means no
     * overshoot: D(0) = D_0 and D(z &gt; 0) = 0.
     *
     * @param boundaryDiffusion D_0 (cm^2 s^-1)
     * @param distance          z (cm), &gt;= 0
     * @param parameter         f (dimensionless), &gt;= 0
     * @param scaleHeight       H_P at the boundary (cm), &gt; 0
     * @return D(z) (cm^2 s^-1)
     */
    public static double overshoot(double boundaryDiffusion, double distance, double parameter, double scaleHeight) {
        if (distance == 0.0) {
            return boundaryDiffusion;
        }
        if (parameter == 0.0) {
            return 0.0;
        }
        return boundaryDiffusion * Math.exp(-2.0 * distance / (parameter * scaleHeight));
    }

    /**
     * {@link #semiconvective} with nabla = nabla_rad (a stable zone) and its partial derivatives.
     *
     * @param efficiency  alpha_sc (dimensionless)
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param opacity     kappa (cm^2 g^-1)
     * @param cp          c_P (erg g^-1 K^-1)
     * @param nablaRad    radiative gradient (dimensionless)
     * @param dNablaRad   its partial derivatives, indexed by {@link ZoneInput} (read only)
     * @param nablaAd     adiabatic gradient (dimensionless)
     * @param phi         (d ln rho / d ln mu)_{P,T} (dimensionless)
     * @param delta       -(d ln rho / d ln T)_{P,mu} (dimensionless)
     * @param nablaMu     d ln mu / d ln P (dimensionless)
     * @param d           output: partial derivatives of D_sc (cm^2 s^-1 per unit input); modified
     * @return D_sc (cm^2 s^-1)
     */
    public static double semiconvectiveWithDerivatives(double efficiency, double temperature, double density,
                                                       double opacity, double cp, double nablaRad,
                                                       double[] dNablaRad, double nablaAd, double phi,
                                                       double delta, double nablaMu, double[] d) {
        double scale = efficiency * thermalDiffusivity(temperature, density, opacity, cp) / 6.0;
        double ratio = phi / delta;
        double nablaL = nablaAd + ratio * nablaMu;
        double above = nablaRad - nablaAd;
        double below = nablaL - nablaRad;
        double share = above / below;
        double value = scale * share;
        for (int i = 0; i < ZoneInput.COUNT; i++) {
            double dRad = dNablaRad[i];
            double dAd = i == ZoneInput.NABLA_AD ? 1.0 : 0.0;
            double dL = dAd + ledouxTerm(i, ratio, delta, nablaMu);
            double dShare = ((dRad - dAd) * below - above * (dL - dRad)) / (below * below);
            d[i] = scale * dShare + value * diffusivityLogDerivative(i, temperature, density, opacity, cp);
        }
        return value;
    }

    /**
     * {@link #thermohaline} with nabla = nabla_rad (a stable zone) and its partial derivatives.
     *
     * @param efficiency  C_t (dimensionless)
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param opacity     kappa (cm^2 g^-1)
     * @param cp          c_P (erg g^-1 K^-1)
     * @param nablaRad    radiative gradient (dimensionless)
     * @param dNablaRad   its partial derivatives, indexed by {@link ZoneInput} (read only)
     * @param nablaAd     adiabatic gradient (dimensionless)
     * @param phi         (d ln rho / d ln mu)_{P,T} (dimensionless)
     * @param delta       -(d ln rho / d ln T)_{P,mu} (dimensionless)
     * @param nablaMu     d ln mu / d ln P (dimensionless), &lt; 0
     * @param d           output: partial derivatives of D_th (cm^2 s^-1 per unit input); modified
     * @return D_th (cm^2 s^-1)
     */
    public static double thermohalineWithDerivatives(double efficiency, double temperature, double density,
                                                     double opacity, double cp, double nablaRad,
                                                     double[] dNablaRad, double nablaAd, double phi,
                                                     double delta, double nablaMu, double[] d) {
        double margin = nablaAd - nablaRad;
        double value = efficiency * thermalDiffusivity(temperature, density, opacity, cp) * (phi / delta)
                * (-nablaMu) / margin;
        for (int i = 0; i < ZoneInput.COUNT; i++) {
            double dAd = i == ZoneInput.NABLA_AD ? 1.0 : 0.0;
            double logDerivative = diffusivityLogDerivative(i, temperature, density, opacity, cp)
                    - (dAd - dNablaRad[i]) / margin;
            if (i == ZoneInput.PHI) {
                logDerivative += 1.0 / phi;
            } else if (i == ZoneInput.DELTA) {
                logDerivative -= 1.0 / delta;
            } else if (i == ZoneInput.NABLA_MU) {
                logDerivative += 1.0 / nablaMu;
            }
            d[i] = value * logDerivative;
        }
        return value;
    }

    /** d((phi/delta) nabla_mu)/d(input i). */
    private static double ledouxTerm(int i, double ratio, double delta, double nablaMu) {
        switch (i) {
            case ZoneInput.PHI: return nablaMu / delta;
            case ZoneInput.DELTA: return -ratio * nablaMu / delta;
            case ZoneInput.NABLA_MU: return ratio;
            default: return 0.0;
        }
    }

    /** d ln K_T / d(input i), K_T proportional to T^3 / (kappa rho^2 c_P). */
    static double diffusivityLogDerivative(int i, double temperature, double density, double opacity, double cp) {
        switch (i) {
            case ZoneInput.T: return 3.0 / temperature;
            case ZoneInput.RHO: return -2.0 / density;
            case ZoneInput.KAPPA: return -1.0 / opacity;
            case ZoneInput.CP: return -1.0 / cp;
            default: return 0.0;
        }
    }
}
