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
     * Evaluates zones [from, to) at the columns' T, rho, X, Z: zone k gets bit for bit what
     * {@link #evaluate} gives with zone index k. The default loops over {@link #evaluate} and
     * allocates nothing; implementations may override it.
     *
     * @param in   input columns (temperature, density, hydrogen, metals are read)
     * @param from first zone, inclusive
     * @param to   last zone, exclusive
     * @param out  output columns, overwritten in [from, to)
     * @throws InvalidInputException naming the zone (column index) of the first bad input, or a bad range
     */
    default void evaluateColumns(ZoneColumns in, int from, int to, OpacityColumns out) {
        in.checkRange(from, to, out.capacity);
        OpacityResult r = out.workResult;
        double[] t = in.temperature;
        double[] rho = in.density;
        double[] x = in.hydrogen;
        double[] z = in.metals;
        for (int k = from; k < to; k++) {
            evaluate(t[k], rho[k], x[k], z[k], k, r);
            out.store(k, r);
        }
    }

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
