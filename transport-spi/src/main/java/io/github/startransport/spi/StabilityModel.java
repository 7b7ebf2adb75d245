package io.github.startransport.spi;

/**
 * Decides whether a zone is radiative, convective, semiconvective or thermohaline, and
 * reports the radiative and Ledoux gradients with their derivatives.
 *
 * <p>Reads from the zone: temperature, density, pressure, luminosity, mass, opacity,
 * nablaAd, delta, nablaMu, phi. Implementations are immutable and thread-safe, and
 * {@link #evaluate} allocates nothing.
 */
public interface StabilityModel {

    /** @return the criterion this model judges by */
    Criterion criterion();

    /**
     * Evaluates one zone.
     *
     * @param zone input state (read only)
     * @param out  caller-owned result, overwritten
     * @throws InvalidInputException when a read field is non-finite or unphysical
     */
    void evaluate(ZoneState zone, StabilityResult out);
}
