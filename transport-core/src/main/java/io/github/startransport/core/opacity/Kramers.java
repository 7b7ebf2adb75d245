package io.github.startransport.core.opacity;

/**
 * Kramers' laws for bound-free and free-free absorption, with the constants of Carroll &amp; Ostlie
 * (<i>An Introduction to Modern Astrophysics</i>, 1996, p. 274; §9.2 of the second edition, from memory):
 *
 * <ul>
 *   <li>kappa_bf = 4.34e25 (g_bf / t) Z (1 + X) rho T^-3.5 (cm^2 g^-1), t the guillotine factor (1 to 100);</li>
 *   <li>kappa_ff = 3.68e22 g_ff (1 - Z) (1 + X) rho T^-3.5 (cm^2 g^-1).</li>
 * </ul>
 *
 * <p>Both scale as rho T^-3.5, so d ln kappa / d ln rho = 1 and d ln kappa / d ln T = -3.5 exactly.
 * Pure static kernel: no allocation, no state.
 */
public final class Kramers {
    private Kramers() {
    }

    /** Bound-free constant 4.34e25 (cgs) of Carroll &amp; Ostlie (1996). */
    public static final double BOUND_FREE = 4.34e25;
    /** Free-free constant 3.68e22 (cgs) of Carroll &amp; Ostlie (1996). */
    public static final double FREE_FREE = 3.68e22;
    /** d ln kappa / d ln rho of both laws (dimensionless). */
    public static final double D_LN_RHO = 1.0;
    /** d ln kappa / d ln T of both laws (dimensionless). */
    public static final double D_LN_T = -3.5;

    /**
     * @param temperature  T (K)
     * @param density      rho (g cm^-3)
     * @param hydrogen     X (mass fraction)
     * @param metals       Z (mass fraction)
     * @param gauntOverCut g_bf / t, bound-free Gaunt factor over guillotine factor (dimensionless)
     * @return kappa_bf (cm^2 g^-1)
     */
    public static double boundFree(double temperature, double density, double hydrogen, double metals,
                                   double gauntOverCut) {
        return BOUND_FREE * gauntOverCut * metals * (1.0 + hydrogen) * density * tPowMinus3p5(temperature);
    }

    /**
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param hydrogen    X (mass fraction)
     * @param metals      Z (mass fraction)
     * @param gaunt       g_ff, free-free Gaunt factor (dimensionless)
     * @return kappa_ff (cm^2 g^-1)
     */
    public static double freeFree(double temperature, double density, double hydrogen, double metals,
                                  double gaunt) {
        return FREE_FREE * gaunt * (1.0 - metals) * (1.0 + hydrogen) * density * tPowMinus3p5(temperature);
    }

    /** @return T^-3.5 without a call to pow (T^-3.5 = 1 / (T^3 sqrt(T))) */
    static double tPowMinus3p5(double temperature) {
        return 1.0 / (temperature * temperature * temperature * Math.sqrt(temperature));
    }
}
