package io.github.startransport.core.opacity;

/**
 * Conductive opacity of degenerate, non-relativistic electrons:
 * kappa_cd = 4e-8 mu_e^2 (sum_i X_i Z_i^2 / A_i) (T / rho)^2 (cm^2 g^-1),
 * the form (mu_e^2 / mu_I) Z_c^2 of Hansen, Kawaler &amp; Trimble (2004, <i>Stellar Interiors</i>,
 * §4.5) written for a mixture: for one species Z_c^2 / mu_I = Z^2 / A.
 * It enters the total as 1/kappa = 1/kappa_rad + 1/kappa_cd because radiative and conductive fluxes
 * add (kappa_cd = 4 a c T^3 / (3 rho lambda_cd)).
 *
 * <p>d ln kappa_cd / d ln rho = -2 and d ln kappa_cd / d ln T = +2 exactly. The formula is applied
 * everywhere; outside strong degeneracy it is only a stand-in (its share of the total stays below ~1%
 * wherever kappa_rad is below ~1e-2 of kappa_cd, e.g. the solar interior, but it reaches a few percent
 * in dense, moderately hot gas such as T = 1e5-1e6 K at rho ~ 1e-2-1 g cm^-3).
 * Production work uses tabulated conductive opacities (e.g. Cassisi et al. 2007). Pure static kernel.
 */
public final class Conduction {
    private Conduction() {
    }

    /** Coefficient 4e-8 (cgs) of Hansen, Kawaler &amp; Trimble (2004). */
    public static final double COEFFICIENT = 4e-8;
    /** d ln kappa_cd / d ln rho (dimensionless). */
    public static final double D_LN_RHO = -2.0;
    /** d ln kappa_cd / d ln T (dimensionless). */
    public static final double D_LN_T = 2.0;

    /**
     * Z^2 / A assigned to the metals: 4, the value of 16-O, taken as representative of a
     * metal mixture dominated by C, N, O (common practice, no source).
     */
    public static final double METALS_Z2_OVER_A = 4.0;

    /**
     * @param hydrogen X (mass fraction)
     * @param metals   Z (mass fraction)
     * @return sum_i X_i Z_i^2 / A_i for H (1), He (4/4 = 1) and metals ({@link #METALS_Z2_OVER_A}) (dimensionless)
     */
    public static double chargeSquaredPerMass(double hydrogen, double metals) {
        double helium = 1.0 - hydrogen - metals;
        return hydrogen + helium + METALS_Z2_OVER_A * metals;
    }

    /**
     * @param temperature       T (K)
     * @param density           rho (g cm^-3)
     * @param muE               mean molecular weight per electron mu_e (dimensionless)
     * @param chargeSqPerMass   sum_i X_i Z_i^2 / A_i (dimensionless)
     * @return kappa_cd (cm^2 g^-1)
     */
    public static double kappa(double temperature, double density, double muE, double chargeSqPerMass) {
        double r = temperature / density;
        return COEFFICIENT * muE * muE * chargeSqPerMass * r * r;
    }
}
