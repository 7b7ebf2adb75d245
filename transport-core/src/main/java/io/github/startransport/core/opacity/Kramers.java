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
 * <p>Both scale as rho T^-3.5, so d ln kappa / d ln rho = 1 and d ln kappa / d ln T = -3.5 exactly
 * for a constant guillotine factor.
 *
 * <p><b>A guillotine factor that rises with temperature</b> ({@link #guillotine}). Kramers' T^-3.5
 * assumes that, whatever the temperature, enough ions keep bound electrons whose edges lie near
 * the Rosseland window (h nu ~ 3-10 kT). In a solar-type mixture that supply runs out between
 * ~2 and ~16 MK: the K shells of the abundant light metals (C, N, O, Ne; edges 0.5-1.4 keV, oxygen
 * being the most abundant) empty and their edges fall below the window. With f the fraction of an
 * element still holding its K-shell electron, the Saha equation gives, once the element is mostly
 * stripped, f ~ n_e lambda_e^3 exp(chi_K / kT) ~ rho T^-3/2 exp(chi_K / kT), and the hydrogenic
 * cross-section at h nu ~ kT &gt;&gt; chi_K gives kappa_bf ~ f T^-3 ~ rho T^-4.5 exp(chi_K / kT): a
 * factor ~ T exp(-chi_K / kT) below Kramers' law. Joined to the Kramers regime (t = 1) this is
 * <pre>
 *   t(T) = 1 + (T / T_A) exp(-theta_K / T),     theta_K = chi_K / k
 * </pre>
 * with chi_K the K-shell (hydrogen-like) ionisation energy of oxygen, Z^2 R_inf h c = 64 x 13.606 eV
 * = 870.8 eV (hydrogenic, CODATA 2018 Rydberg energy; the measured value is 871.4 eV, from memory),
 * so theta_K = {@value #K_SHELL_TEMPERATURE} K: an atomic constant, not a fitted one. The one fitted
 * constant, T_A = {@value #GUILLOTINE_TEMPERATURE} K, is fixed by a single calibration anchor: the
 * composite opacity ({@link AnalyticOpacity}) gives 1.25 cm^2/g at the centre of a standard solar model
 * (T = 1.57e7 K, rho = 150 g/cm^3, X = 0.34, Z = 0.02), the middle of the 1.2-1.3 cm^2/g of tabulated
 * Rosseland means there (value from memory); there t = 20.4. Up to 2.2 MK, t stays within 6 % of 1:
 * the published law unchanged. This law is our own heuristic (no published source); its checks on
 * points not used to fix it are in {@code AnalyticOpacityTest}.
 *
 * <p>Pure static kernel: no allocation, no state.
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

    /**
     * Oxygen K-shell temperature theta_K = Z^2 R_inf h c / k with Z = 8 (K): the hydrogenic ionisation
     * energy of O VIII, from the CODATA 2018 Rydberg energy R_inf h c = 13.605693122994 eV and
     * k = 8.617333262e-5 eV/K (both CODATA 2018).
     */
    public static final double K_SHELL_TEMPERATURE = 64.0 * 13.605693122994 / 8.617333262e-5;

    /**
     * Scale T_A (K) of the rising guillotine factor, fixed so that the composite gives 1.25 cm^2/g at the
     * centre of a standard solar model (see the class comment; a calibration, not a prediction).
     */
    public static final double GUILLOTINE_TEMPERATURE = 4.25e5;

    /**
     * The temperature-dependent guillotine factor t(T) = 1 + (T / T_A) exp(-theta_K / T) (see the class
     * comment): 1 in the Kramers regime, rising as the light metals' K shells empty.
     *
     * @param temperature T (K), &gt; 0
     * @return t (dimensionless, &gt;= 1)
     */
    public static double guillotine(double temperature) {
        return 1.0 + rise(temperature);
    }

    /**
     * d ln t / d ln T of {@link #guillotine}: (t - 1) / t (1 + theta_K / T).
     *
     * @param temperature T (K), &gt; 0
     * @return d ln t / d ln T (dimensionless, &gt;= 0)
     */
    public static double dLnGuillotineDLnT(double temperature) {
        double rise = rise(temperature);
        return rise == 0.0 ? 0.0 : rise / (1.0 + rise) * (1.0 + K_SHELL_TEMPERATURE / temperature);
    }

    /**
     * @param temperature T (K), &gt; 0
     * @return t - 1 = (T / T_A) exp(-theta_K / T) of {@link #guillotine}; exactly 0 where the exponential underflows
     */
    static double rise(double temperature) {
        return temperature / GUILLOTINE_TEMPERATURE * Math.exp(-K_SHELL_TEMPERATURE / temperature);
    }

    /** @return T^-3.5 without a call to pow (T^-3.5 = 1 / (T^3 sqrt(T))) */
    static double tPowMinus3p5(double temperature) {
        return 1.0 / (temperature * temperature * temperature * Math.sqrt(temperature));
    }
}
