package io.github.startransport.spi;

/**
 * A local convection model (a mixing-length variant): given a zone, the actual temperature
 * gradient, the convective velocity and flux, the mixing diffusion coefficient, and their
 * partial derivatives with respect to every input of the call.
 *
 * <p>Reads from the zone: radius, mass, temperature, density, pressure, luminosity, opacity,
 * cp, nablaAd, delta, nablaMu, phi. Implementations are immutable and thread-safe, and
 * {@link #solve} allocates nothing.
 */
public interface ConvectionModel {

    /** @return the mixing-length parameter alpha = l / H_P this model was created with */
    double alpha();

    /** @return the criterion that decides whether the zone convects */
    Criterion criterion();

    /**
     * Solves one zone. A zone that is stable under {@link #criterion()} gets nabla = nabla_rad,
     * zero convective velocity and flux, and the diffusion coefficient of its regime
     * (semiconvective, thermohaline, or zero).
     *
     * @param zone input state (read only)
     * @param out  caller-owned result, overwritten
     * @throws InvalidInputException when a read field is non-finite or unphysical
     */
    void solve(ZoneState zone, ConvectionResult out);
}
