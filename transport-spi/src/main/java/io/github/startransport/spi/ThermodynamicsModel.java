package io.github.startransport.spi;

/**
 * Thermodynamic response functions for hosts and tools that have no equation of state of
 * their own.
 *
 * <p>Implementations are immutable and thread-safe, and {@link #evaluate} and
 * {@link #evaluateValues} allocate nothing.
 */
public interface ThermodynamicsModel {

    /**
     * Evaluates the state at given temperature, density and composition.
     *
     * @param temperature T (K), &gt; 0
     * @param density     rho (g cm^-3), &gt; 0
     * @param hydrogen    X (mass fraction), in [0, 1]
     * @param metals      Z (mass fraction), in [0, 1], X + Z &lt;= 1
     * @param zone        zone index for error messages, or {@link InvalidInputException#NO_ZONE}
     * @param out         caller-owned result, overwritten
     * @throws InvalidInputException when an input is non-finite or unphysical
     */
    void evaluate(double temperature, double density, double hydrogen, double metals, int zone, ThermoResult out);

    /**
     * Evaluates the state for the values only: every scalar field of {@code out} as
     * {@link #evaluate} sets it, bit for bit, and the same inputs refused with the same exception;
     * the derivative arrays ({@link ThermoResult#dPressure} and the others) are left unspecified.
     * For callers that read no derivative, such as a diagnosis of a whole profile. The default
     * calls {@link #evaluate}; implementations skip the derivatives' arithmetic.
     *
     * @param temperature T (K), &gt; 0
     * @param density     rho (g cm^-3), &gt; 0
     * @param hydrogen    X (mass fraction), in [0, 1]
     * @param metals      Z (mass fraction), in [0, 1], X + Z &lt;= 1
     * @param zone        zone index for error messages, or {@link InvalidInputException#NO_ZONE}
     * @param out         caller-owned result: its scalar fields are overwritten, its derivative
     *                    arrays may be overwritten or left as they were
     * @throws InvalidInputException when an input is non-finite or unphysical, exactly where
     *                               {@link #evaluate} throws it
     */
    default void evaluateValues(double temperature, double density, double hydrogen, double metals, int zone,
                                ThermoResult out) {
        evaluate(temperature, density, hydrogen, metals, zone, out);
    }

    /**
     * Evaluates at the zone's temperature, density and composition and writes pressure,
     * c_P, nabla_ad, delta and phi back into the zone.
     *
     * @param zone    state to read T, rho, X, Z from and to complete
     * @param scratch caller-owned result used as scratch, overwritten
     */
    default void complete(ZoneState zone, ThermoResult scratch) {
        evaluate(zone.temperature, zone.density, zone.hydrogen, zone.metals, zone.zone, scratch);
        zone.pressure = scratch.pressure;
        zone.cp = scratch.cp;
        zone.nablaAd = scratch.nablaAd;
        zone.delta = scratch.delta;
        zone.phi = scratch.phi;
    }
}
