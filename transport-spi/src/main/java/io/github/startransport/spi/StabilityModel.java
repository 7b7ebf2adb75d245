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

    /**
     * Evaluates zones [from, to) of a profile held in columns: zone k gets bit for bit what
     * {@link #evaluate} gives for {@code in.load(k, state)}. The default loops over
     * {@link #evaluate} and allocates nothing; implementations may override it.
     *
     * @param in   input columns (read only)
     * @param from first zone, inclusive
     * @param to   last zone, exclusive
     * @param out  output columns, overwritten in [from, to)
     * @throws InvalidInputException naming the zone (column index) of the first bad input, or a bad range
     */
    default void evaluateColumns(ZoneColumns in, int from, int to, StabilityColumns out) {
        in.checkRange(from, to, out.capacity);
        ZoneState zone = out.workZone;
        StabilityResult r = out.workResult;
        for (int k = from; k < to; k++) {
            evaluate(in.load(k, zone), r);
            out.store(k, r);
        }
    }
}
