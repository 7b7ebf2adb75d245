package io.github.startransport.core.seismic;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.ZoneInput;

/**
 * The local frequencies of a zone: adiabatic sound speed, Lamb frequency and the buoyancy
 * (Brunt-Vaisala) frequency, as small static kernels.
 *
 * <p>Sources: c_s^2 = Gamma_1 P / rho, S_l = sqrt(l (l + 1)) c_s / r, and
 * N^2 = (g^2 rho / P) delta (nabla_L - nabla) with nabla_L = nabla_ad + (phi / delta) nabla_mu
 * (Kippenhahn, Weigert &amp; Weiss 2012, §6.2 for the buoyancy frequency of a displaced element and
 * ch. 40 for the Lamb frequency; Aerts, Christensen-Dalsgaard &amp; Kurtz 2010, §3.3; equation
 * numbers from memory). N^2 is written as (G m / r^2)^2 (rho / P) [delta (nabla_ad - nabla)
 * + phi nabla_mu], which needs no division by delta.
 */
public final class LocalFrequencies {
    private LocalFrequencies() {
    }

    /**
     * @param gamma1   Gamma_1 (dimensionless)
     * @param pressure P (dyn cm^-2)
     * @param density  rho (g cm^-3)
     * @return adiabatic sound speed c_s = sqrt(Gamma_1 P / rho) (cm s^-1)
     */
    public static double soundSpeed(double gamma1, double pressure, double density) {
        return Math.sqrt(gamma1 * pressure / density);
    }

    /**
     * @param degree     spherical-harmonic degree l
     * @param soundSpeed c_s (cm s^-1)
     * @param radius     r (cm)
     * @return Lamb frequency S_l = sqrt(l (l + 1)) c_s / r (rad s^-1)
     */
    public static double lamb(int degree, double soundSpeed, double radius) {
        return Math.sqrt(degree * (degree + 1.0)) * soundSpeed / radius;
    }

    /**
     * @param radius   r (cm)
     * @param mass     m (g)
     * @param density  rho (g cm^-3)
     * @param pressure P (dyn cm^-2)
     * @param delta    delta = -(d ln rho / d ln T)_P
     * @param nablaAd  nabla_ad
     * @param phi      phi = (d ln rho / d ln mu)_{P, T}
     * @param nablaMu  nabla_mu = d ln mu / d ln P
     * @param nabla    the actual nabla = d ln T / d ln P
     * @return N^2 (rad^2 s^-2): negative where the layer is convectively unstable
     */
    public static double buoyancySquared(double radius, double mass, double density, double pressure, double delta,
                                         double nablaAd, double phi, double nablaMu, double nabla) {
        double g = Codata2018.GRAVITATIONAL_CONSTANT * mass / (radius * radius);
        return g * g * density / pressure * (delta * (nablaAd - nabla) + phi * nablaMu);
    }

    /**
     * N^2 with its partial derivatives: {@code d[ZoneInput.R]}, {@code M}, {@code RHO}, {@code P},
     * {@code DELTA}, {@code NABLA_AD}, {@code PHI} and {@code NABLA_MU} are written (each with every
     * other argument fixed; units rad^2 s^-2 per unit of the input), the other entries are left as
     * they are; d N^2 / d nabla is {@link #dBuoyancySquaredDNabla}. Allocation-free.
     *
     * @param radius   r (cm)
     * @param mass     m (g)
     * @param density  rho (g cm^-3)
     * @param pressure P (dyn cm^-2)
     * @param delta    delta
     * @param nablaAd  nabla_ad
     * @param phi      phi
     * @param nablaMu  nabla_mu
     * @param nabla    the actual nabla
     * @param d        derivatives, indexed by {@link ZoneInput}, length at least {@link ZoneInput#COUNT}
     * @return N^2 (rad^2 s^-2)
     */
    public static double buoyancySquared(double radius, double mass, double density, double pressure, double delta,
                                         double nablaAd, double phi, double nablaMu, double nabla, double[] d) {
        double g = Codata2018.GRAVITATIONAL_CONSTANT * mass / (radius * radius);
        double a = g * g * density / pressure;
        double margin = nablaAd - nabla;
        double n2 = a * (delta * margin + phi * nablaMu);
        d[ZoneInput.R] = -4.0 * n2 / radius;
        d[ZoneInput.M] = 2.0 * n2 / mass;
        d[ZoneInput.RHO] = n2 / density;
        d[ZoneInput.P] = -n2 / pressure;
        d[ZoneInput.DELTA] = a * margin;
        d[ZoneInput.NABLA_AD] = a * delta;
        d[ZoneInput.PHI] = a * nablaMu;
        d[ZoneInput.NABLA_MU] = a * phi;
        return n2;
    }

    /**
     * @param radius   r (cm)
     * @param mass     m (g)
     * @param density  rho (g cm^-3)
     * @param pressure P (dyn cm^-2)
     * @param delta    delta
     * @return d N^2 / d nabla = -(g^2 rho / P) delta (rad^2 s^-2)
     */
    public static double dBuoyancySquaredDNabla(double radius, double mass, double density, double pressure,
                                                double delta) {
        double g = Codata2018.GRAVITATIONAL_CONSTANT * mass / (radius * radius);
        return -g * g * density / pressure * delta;
    }
}
