package io.github.startransport.core.opacity;

import io.github.startransport.core.constants.Codata2018;

/**
 * Conductive opacity of degenerate, non-relativistic electrons scattering off ions:
 * kappa_cd = C Lambda mu_e^2 (sum_i X_i Z_i^2 / A_i) (T / rho)^2 (cm^2 g^-1), the form
 * (mu_e^2 / mu_I) Z_c^2 (T / rho)^2 of Hansen, Kawaler &amp; Trimble (2004, <i>Stellar Interiors</i>,
 * §4.5) written for a mixture (for one species Z_c^2 / mu_I = Z^2 / A).
 *
 * <p><b>The coefficient.</b> The Wiedemann-Franz law for degenerate electrons,
 * lambda_cd = (pi^2 / 3) n_e k^2 T tau / m_e, with the electron-ion collision time of a Lorentz gas at
 * the Fermi momentum, 1 / tau = 4 pi e^4 Lambda sum_i n_i Z_i^2 / (p_F^2 v_F), p_F^3 = 3 pi^2 hbar^3 n_e
 * (Rutherford transport cross-section; the Lorentz approximation is asymptotically exact for strongly
 * degenerate electrons, e.g. Yakovlev &amp; Urpin 1980, Sov. Astron. 24, 303; Hubbard &amp; Lampe 1969, ApJS 18,
 * 297; references from memory), and kappa_cd = 4 a c T^3 / (3 rho lambda_cd), gives
 * <pre>
 *   C = 16 a c m_e^2 e^4 m_u / (3 pi^3 hbar^3 k^2) = 1.280e-7 cm^2 g^-1 (g cm^-3 / K)^2
 * </pre>
 * from CODATA 2018 constants, with the Coulomb logarithm Lambda = 1: in the ion liquid of white-dwarf
 * cores Yakovlev &amp; Urpin's Lambda is 0.6-1.5 (from memory; e.g. 0.9 for carbon at 1e6 g/cm^3, 1e7 K).
 * Hansen, Kawaler &amp; Trimble's rounded 4e-8 corresponds to Lambda = 0.31; earlier versions of this class used it,
 * which made conduction ~3x too effective.
 *
 * <p>It enters the total as 1/kappa = 1/kappa_rad + 1/kappa_cd because radiative and conductive fluxes
 * add. d ln kappa_cd / d ln rho = -2 and d ln kappa_cd / d ln T = +2 exactly. The formula is applied
 * everywhere; outside strong degeneracy it is only a stand-in, and there it must stay negligible: in
 * the analytic composite its share of 1/kappa is below 1 % for rho &lt;= 1e-3 g cm^-3 at T &gt;= 10^4.5 K,
 * rho &lt;= 0.1 at T &gt;= 10^5.5 K, rho &lt;= 1 at T &gt;= 1e6 K and rho &lt;= 100 at T &gt;= 1e7 K, all at least 5x
 * below the degeneracy line rho / mu_e = 2.4e-8 T^3/2 ({@code AnalyticOpacityTest}). Nearer that line, in
 * partly degenerate gas, the stand-in is not to be trusted. Production work
 * uses tabulated conductive opacities (e.g. Cassisi et al. 2007, ApJ 661, 1094). Pure static kernel.
 */
public final class Conduction {
    private Conduction() {
    }

    /** Elementary charge in Gaussian units, e c / 10 with the exact SI e = 1.602176634e-19 C (CODATA 2018) (statC). */
    static final double ELEMENTARY_CHARGE_ESU = 1.602176634e-19 * Codata2018.SPEED_OF_LIGHT / 10.0;

    /** Reduced Planck constant h / 2 pi (erg s), CODATA 2018 (exact). */
    static final double HBAR = Codata2018.PLANCK / (2.0 * Math.PI);

    /**
     * Coefficient C = 16 a c m_e^2 e^4 m_u / (3 pi^3 hbar^3 k^2) of the Wiedemann-Franz estimate with
     * Lambda = 1 (see the class comment), 1.28e-7 (cgs).
     */
    public static final double COEFFICIENT = 16.0 * Codata2018.RADIATION_CONSTANT * Codata2018.SPEED_OF_LIGHT
            * Codata2018.ELECTRON_MASS * Codata2018.ELECTRON_MASS
            * Math.pow(ELEMENTARY_CHARGE_ESU, 4) * Codata2018.ATOMIC_MASS_UNIT
            / (3.0 * Math.PI * Math.PI * Math.PI * HBAR * HBAR * HBAR * Codata2018.BOLTZMANN * Codata2018.BOLTZMANN);

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
