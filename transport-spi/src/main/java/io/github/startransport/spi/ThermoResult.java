package io.github.startransport.spi;

/** Caller-owned, mutable result of a {@link ThermodynamicsModel}: allocate once, reuse. */
public final class ThermoResult {
    /** Creates an empty result, to be filled by a model. */
    public ThermoResult() {
    }

    /** Mean molecular weight mu (dimensionless, in atomic mass units per particle). */
    public double mu;
    /** beta = P_gas / P (dimensionless), in (0, 1]. */
    public double beta;
    /** Total pressure P (dyn cm^-2). */
    public double pressure;
    /** Adiabatic gradient nabla_ad = (d ln T / d ln P)_s (dimensionless). */
    public double nablaAd;
    /** Specific heat at constant pressure c_P (erg g^-1 K^-1). */
    public double cp;
    /**
     * delta = -(d ln rho / d ln T)_P (dimensionless) at fixed composition; where a model has an
     * ionisation equilibrium it shifts with T (so delta exceeds its fully ionised value).
     */
    public double delta;
    /**
     * phi = (d ln rho / d ln mu)_{P, T} (dimensionless), mu changed by the composition at a fixed
     * ionisation state: 1 for an ideal gas.
     */
    public double phi;
    /** First adiabatic exponent Gamma_1 = (d ln P / d ln rho)_s (dimensionless). */
    public double gamma1;
    /** Specific heat at constant volume c_V = (d u / d T)_rho (erg g^-1 K^-1). */
    public double cv;
    /** chi_T = (d ln P / d ln T)_rho (dimensionless), with the ionisation equilibrium shifting. */
    public double chiT;
    /** chi_rho = (d ln P / d ln rho)_T (dimensionless), with the ionisation equilibrium shifting. */
    public double chiRho;
    /** Free electrons per atomic mass unit of matter, n_e m_u / rho (dimensionless). */
    public double freeElectrons;
    /**
     * Electron degeneracy indicator n_e lambda_e^3 / 2 (dimensionless), lambda_e = h / sqrt(2 pi m_e k T):
     * equal to exp(eta) for non-degenerate electrons; the first Fermi-Dirac correction to the electron
     * pressure is this over 2^(5/2) (Landau &amp; Lifshitz, Statistical Physics, §56).
     */
    public double degeneracy;
    /**
     * Share of hydrogen whose ionisation state the model's pressure-ionisation treatment decides
     * (dimensionless, 0 to 1): 0 where the ideal Saha equation alone holds; 0 for models without
     * bound states.
     */
    public double pressureIonisation;

    /**
     * Derivatives of each output with respect to the inputs, indexed by {@link ZoneInput#T} (per K)
     * and {@link ZoneInput#RHO} (per g cm^-3), with the other input and the composition fixed;
     * the other entries stay 0. Plain partial derivatives: d P / d T is in dyn cm^-2 K^-1.
     */
    public final double[] dPressure = new double[ZoneInput.COUNT];
    /** d nabla_ad / d T and d rho (see {@link #dPressure}). */
    public final double[] dNablaAd = new double[ZoneInput.COUNT];
    /** d c_P / d T and d rho (see {@link #dPressure}). */
    public final double[] dCp = new double[ZoneInput.COUNT];
    /** d delta / d T and d rho (see {@link #dPressure}). */
    public final double[] dDelta = new double[ZoneInput.COUNT];
    /** d phi / d T and d rho (see {@link #dPressure}). */
    public final double[] dPhi = new double[ZoneInput.COUNT];
    /** d Gamma_1 / d T and d rho (see {@link #dPressure}). */
    public final double[] dGamma1 = new double[ZoneInput.COUNT];
    /** d mu / d T and d rho (see {@link #dPressure}). */
    public final double[] dMu = new double[ZoneInput.COUNT];

    @Override
    public String toString() {
        return "ThermoResult[mu=" + mu + ", beta=" + beta + ", P=" + pressure + " dyn/cm^2, nabla_ad=" + nablaAd
                + ", c_P=" + cp + " erg/(g K), delta=" + delta + ", phi=" + phi + ", Gamma_1=" + gamma1
                + ", c_V=" + cv + " erg/(g K), chi_T=" + chiT + ", chi_rho=" + chiRho + "]";
    }
}
