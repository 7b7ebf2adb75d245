package io.github.startransport.spi;

/**
 * A Rosseland mean opacity with its logarithmic derivatives.
 *
 * <p>Implementations are immutable and thread-safe, and {@link #evaluate} allocates nothing.
 */
public interface OpacityModel {

    /**
     * @param temperature T (K), &gt; 0
     * @param density     rho (g cm^-3), &gt; 0
     * @param hydrogen    X (mass fraction), in [0, 1]
     * @param metals      Z (mass fraction), in [0, 1], X + Z &lt;= 1
     * @param zone        zone index for error messages, or {@link InvalidInputException#NO_ZONE}
     * @param out         caller-owned result, overwritten
     * @throws InvalidInputException when an input is invalid, or outside a table whose
     *                               policy is {@link OutOfRangePolicy#REFUSE}
     */
    void evaluate(double temperature, double density, double hydrogen, double metals, int zone, OpacityResult out);

    /**
     * Evaluates at the zone's T, rho, X, Z and writes kappa into {@link ZoneState#opacity}.
     *
     * @param zone    the zone
     * @param scratch caller-owned result, overwritten
     */
    default void complete(ZoneState zone, OpacityResult scratch) {
        evaluate(zone.temperature, zone.density, zone.hydrogen, zone.metals, zone.zone, scratch);
        zone.opacity = scratch.kappa;
    }
}
