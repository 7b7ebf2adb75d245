package io.github.startransport.spi;

/**
 * Local oscillation frequencies of one zone for hosts: the buoyancy (Brunt-Vaisala) frequency
 * squared N^2 with its Jacobian, the adiabatic sound speed and the l = 1 Lamb frequency.
 *
 * <p>Implementations are immutable and thread-safe, and {@link #evaluate} allocates nothing.
 */
public interface BuoyancyModel {

    /**
     * Evaluates N^2 = (g^2 rho / P) delta (nabla_L - nabla) with g = G m / r^2 and
     * nabla_L = nabla_ad + (phi / delta) nabla_mu, c_s = sqrt(Gamma_1 P / rho) and
     * S_1 = sqrt(2) c_s / r.
     *
     * @param zone   reads radius, mass, density, pressure, delta, nablaAd, phi, nablaMu (and zone for errors)
     * @param nabla  the actual temperature gradient d ln T / d ln P of the zone (e.g. a convection model's)
     * @param gamma1 the first adiabatic exponent Gamma_1 (&gt; 0), e.g. from a {@link ThermodynamicsModel}
     * @param out    caller-owned result, overwritten
     * @throws InvalidInputException when an input is non-finite or unphysical
     */
    void evaluate(ZoneState zone, double nabla, double gamma1, BuoyancyResult out);
}
