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
    /** delta = -(d ln rho / d ln T)_{P, mu} (dimensionless). */
    public double delta;
    /** phi = (d ln rho / d ln mu)_{P, T} (dimensionless). */
    public double phi;
    /** First adiabatic exponent Gamma_1 = (d ln P / d ln rho)_s (dimensionless). */
    public double gamma1;

    @Override
    public String toString() {
        return "ThermoResult[mu=" + mu + ", beta=" + beta + ", P=" + pressure + " dyn/cm^2, nabla_ad=" + nablaAd
                + ", c_P=" + cp + " erg/(g K), delta=" + delta + ", phi=" + phi + ", Gamma_1=" + gamma1 + "]";
    }
}
