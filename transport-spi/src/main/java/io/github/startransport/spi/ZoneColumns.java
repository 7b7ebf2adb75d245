package io.github.startransport.spi;

/**
 * A whole profile's zone states as caller-owned columns: the input of the batch calls
 * ({@link ConvectionModel#solveColumns}, {@link StabilityModel#evaluateColumns},
 * {@link OpacityModel#evaluateColumns}).
 *
 * <p>One array per {@link ZoneState} field, all of length {@link #capacity}, with the same units and
 * domains as the field of the same name (cgs, temperatures in K, no logarithms). Zone k of the
 * columns is what {@link ZoneState} would hold with {@code zone = k}: the batch calls name the
 * column index k in every {@link InvalidInputException}. {@link #phi} starts filled with 1 (ideal
 * gas); every other column starts at 0. The library reads the arrays and never keeps a reference.
 *
 * <p>Not thread-safe by design: threads may read disjoint or shared zone ranges of one instance
 * while nobody writes to it.
 */
public final class ZoneColumns {
    /** Number of zones the columns hold. */
    public final int capacity;
    /** Radius r (cm), &gt; 0. */
    public final double[] radius;
    /** Mass inside r, m (g), &gt; 0. */
    public final double[] mass;
    /** Temperature T (K), &gt; 0. */
    public final double[] temperature;
    /** Density rho (g cm^-3), &gt; 0. */
    public final double[] density;
    /** Total pressure P (dyn cm^-2), &gt; 0. */
    public final double[] pressure;
    /** Luminosity L (erg s^-1), finite. */
    public final double[] luminosity;
    /** Rosseland mean opacity kappa (cm^2 g^-1), &gt; 0. */
    public final double[] opacity;
    /** Specific heat at constant pressure c_P (erg g^-1 K^-1), &gt; 0. */
    public final double[] cp;
    /** Adiabatic gradient nabla_ad (dimensionless), in (0, 1). */
    public final double[] nablaAd;
    /** delta = -(d ln rho / d ln T)_{P, mu} (dimensionless), &gt; 0. */
    public final double[] delta;
    /** Composition gradient nabla_mu = d ln mu / d ln P (dimensionless), finite. */
    public final double[] nablaMu;
    /** phi = (d ln rho / d ln mu)_{P, T} (dimensionless), &gt; 0; filled with 1 at construction. */
    public final double[] phi;
    /** Hydrogen mass fraction X (dimensionless), in [0, 1]. */
    public final double[] hydrogen;
    /** Metal mass fraction Z (dimensionless), in [0, 1], X + Z &lt;= 1. */
    public final double[] metals;
    /** Distance to the nearest edge of the zone's convective region (cm): see {@link ZoneState#edgeDistance}. */
    public final double[] edgeDistance;

    /**
     * @param capacity number of zones, &gt;= 0
     * @throws InvalidInputException when capacity is negative
     */
    public ZoneColumns(int capacity) {
        if (capacity < 0) {
            throw new InvalidInputException("capacity", capacity, "zones", InvalidInputException.NO_ZONE, ">= 0");
        }
        this.capacity = capacity;
        radius = new double[capacity];
        mass = new double[capacity];
        temperature = new double[capacity];
        density = new double[capacity];
        pressure = new double[capacity];
        luminosity = new double[capacity];
        opacity = new double[capacity];
        cp = new double[capacity];
        nablaAd = new double[capacity];
        delta = new double[capacity];
        nablaMu = new double[capacity];
        phi = new double[capacity];
        java.util.Arrays.fill(phi, 1.0);
        hydrogen = new double[capacity];
        metals = new double[capacity];
        edgeDistance = new double[capacity];
    }

    /**
     * Copies zone k into a zone state and sets its {@link ZoneState#zone} to k (no allocation).
     *
     * @param k    column index, in [0, capacity)
     * @param zone the state to overwrite
     * @return {@code zone}
     */
    public ZoneState load(int k, ZoneState zone) {
        zone.zone = k;
        zone.radius = radius[k];
        zone.mass = mass[k];
        zone.temperature = temperature[k];
        zone.density = density[k];
        zone.pressure = pressure[k];
        zone.luminosity = luminosity[k];
        zone.opacity = opacity[k];
        zone.cp = cp[k];
        zone.nablaAd = nablaAd[k];
        zone.delta = delta[k];
        zone.nablaMu = nablaMu[k];
        zone.phi = phi[k];
        zone.hydrogen = hydrogen[k];
        zone.metals = metals[k];
        zone.edgeDistance = edgeDistance[k];
        return zone;
    }

    /**
     * Copies a zone state into column k (its {@link ZoneState#zone} is not stored).
     *
     * @param k    column index, in [0, capacity)
     * @param zone the state to copy (read only)
     */
    public void store(int k, ZoneState zone) {
        radius[k] = zone.radius;
        mass[k] = zone.mass;
        temperature[k] = zone.temperature;
        density[k] = zone.density;
        pressure[k] = zone.pressure;
        luminosity[k] = zone.luminosity;
        opacity[k] = zone.opacity;
        cp[k] = zone.cp;
        nablaAd[k] = zone.nablaAd;
        delta[k] = zone.delta;
        nablaMu[k] = zone.nablaMu;
        phi[k] = zone.phi;
        hydrogen[k] = zone.hydrogen;
        metals[k] = zone.metals;
        edgeDistance[k] = zone.edgeDistance;
    }

    /**
     * Checks a zone range [from, to) against this input and an output of the given capacity.
     *
     * @param from           first zone, inclusive
     * @param to             last zone, exclusive
     * @param outputCapacity capacity of the output columns
     * @throws InvalidInputException unless 0 &lt;= from &lt;= to &lt;= min(capacity, outputCapacity)
     */
    public void checkRange(int from, int to, int outputCapacity) {
        int limit = Math.min(capacity, outputCapacity);
        if (from < 0 || from > to) {
            throw new InvalidInputException("from", from, "zone", InvalidInputException.NO_ZONE,
                    "inside [0, to = " + to + "]");
        }
        if (to > limit) {
            throw new InvalidInputException("to", to, "zone", InvalidInputException.NO_ZONE,
                    "at most " + limit + " (input capacity " + capacity + ", output capacity " + outputCapacity + ")");
        }
    }
}
