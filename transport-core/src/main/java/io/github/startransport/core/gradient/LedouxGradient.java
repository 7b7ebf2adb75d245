package io.github.startransport.core.gradient;

import io.github.startransport.spi.ZoneInput;

/**
 * The Ledoux gradient nabla_L = nabla_ad + (phi / delta) nabla_mu
 * (Kippenhahn, Weigert &amp; Weiss 2012 §6.1, from memory). Equivalently
 * nabla_ad - (chi_mu / chi_T) nabla_mu, since phi/delta = -chi_mu/chi_T; for an ideal gas
 * chi_mu &lt; 0, so a molecular weight rising inwards (nabla_mu &gt; 0) stabilises.
 */
public final class LedouxGradient {
    private LedouxGradient() {
    }

    /**
     * @param nablaAd adiabatic gradient
     * @param phi     (d ln rho / d ln mu)_{P,T}
     * @param delta   -(d ln rho / d ln T)_{P,mu}
     * @param nablaMu d ln mu / d ln P
     * @return nabla_L
     */
    public static double value(double nablaAd, double phi, double delta, double nablaMu) {
        return nablaAd + phi / delta * nablaMu;
    }

    /**
     * Evaluates nabla_L and writes its partial derivatives into {@code d}, indexed by
     * {@link ZoneInput} (entries for nabla_ad, phi, delta, nabla_mu; all others set to 0).
     *
     * @param nablaAd adiabatic gradient
     * @param phi     (d ln rho / d ln mu)_{P,T}
     * @param delta   -(d ln rho / d ln T)_{P,mu}
     * @param nablaMu d ln mu / d ln P
     * @param d       output, length &gt;= {@link ZoneInput#COUNT}; modified
     * @return nabla_L
     */
    public static double valueAndDerivatives(double nablaAd, double phi, double delta, double nablaMu, double[] d) {
        java.util.Arrays.fill(d, 0, ZoneInput.COUNT, 0.0);
        double ratio = phi / delta;
        d[ZoneInput.NABLA_AD] = 1.0;
        d[ZoneInput.PHI] = nablaMu / delta;
        d[ZoneInput.DELTA] = -ratio * nablaMu / delta;
        d[ZoneInput.NABLA_MU] = ratio;
        return nablaAd + ratio * nablaMu;
    }
}
