package io.github.startransport.core.opacity;

/**
 * Opacity of the negative hydrogen ion in cool envelopes:
 * kappa_H- = 2.5e-31 (Z / 0.02) rho^1/2 T^9 (cm^2 g^-1)
 * (Hansen, Kawaler &amp; Trimble 2004, <i>Stellar Interiors</i>, §4.4; the same as Carroll &amp; Ostlie's
 * 7.9e-34 m^2 kg^-1 form converted to cgs). Rough validity 3000 K &lt; T &lt; 6000 K,
 * 1e-10 &lt; rho &lt; 1e-5 g cm^-3, X near 0.7 (from memory).
 *
 * <p>d ln kappa / d ln rho = 1/2 and d ln kappa / d ln T = 9 exactly. Pure static kernel.
 */
public final class HMinus {
    private HMinus() {
    }

    /** Coefficient 2.5e-31 (cgs) at Z = 0.02 (Hansen, Kawaler &amp; Trimble 2004). */
    public static final double COEFFICIENT = 2.5e-31;
    /** Metal fraction the coefficient refers to (dimensionless). */
    public static final double REFERENCE_METALS = 0.02;
    /** d ln kappa / d ln rho (dimensionless). */
    public static final double D_LN_RHO = 0.5;
    /** d ln kappa / d ln T (dimensionless). */
    public static final double D_LN_T = 9.0;

    /**
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param metals      Z (mass fraction) supplying the free electrons
     * @return kappa_H- (cm^2 g^-1)
     */
    public static double kappa(double temperature, double density, double metals) {
        double t3 = temperature * temperature * temperature;
        return COEFFICIENT * (metals / REFERENCE_METALS) * Math.sqrt(density) * (t3 * t3 * t3);
    }
}
