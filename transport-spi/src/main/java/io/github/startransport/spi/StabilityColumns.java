package io.github.startransport.spi;

/**
 * Caller-owned output columns of {@link StabilityModel#evaluateColumns}: one entry per zone for
 * each field of {@link StabilityResult}, derivatives input-major ({@code dNablaRad[i][k]}, i a
 * {@link ZoneInput} index). {@link #workZone} and {@link #workResult} are working space; their
 * contents after a call are unspecified. Not thread-safe (see {@link ConvectionColumns}).
 */
public final class StabilityColumns {
    /** Number of zones the columns hold. */
    public final int capacity;
    /** Regime per zone. */
    public final Regime[] regime;
    /** nabla_rad (dimensionless). */
    public final double[] nablaRad;
    /** nabla_ad as given (dimensionless). */
    public final double[] nablaAd;
    /** nabla_L (dimensionless). */
    public final double[] nablaLedoux;
    /** nabla_rad - nabla_ad (dimensionless). */
    public final double[] marginSchwarzschild;
    /** nabla_rad - nabla_L (dimensionless). */
    public final double[] marginLedoux;
    /** d nabla_rad / d (input i) at [i][zone]. */
    public final double[][] dNablaRad;
    /** d nabla_L / d (input i) at [i][zone]. */
    public final double[][] dNablaLedoux;
    /** Working space: one zone's state. */
    public final ZoneState workZone = new ZoneState();
    /** Working space: one zone's result. */
    public final StabilityResult workResult = new StabilityResult();

    /**
     * @param capacity number of zones, &gt;= 0
     * @throws InvalidInputException when capacity is negative
     */
    public StabilityColumns(int capacity) {
        if (capacity < 0) {
            throw new InvalidInputException("capacity", capacity, "zones", InvalidInputException.NO_ZONE, ">= 0");
        }
        this.capacity = capacity;
        regime = new Regime[capacity];
        nablaRad = new double[capacity];
        nablaAd = new double[capacity];
        nablaLedoux = new double[capacity];
        marginSchwarzschild = new double[capacity];
        marginLedoux = new double[capacity];
        dNablaRad = new double[ZoneInput.COUNT][capacity];
        dNablaLedoux = new double[ZoneInput.COUNT][capacity];
    }

    /**
     * Copies one zone's result into column k.
     *
     * @param k column index
     * @param r the result (read only)
     */
    public void store(int k, StabilityResult r) {
        regime[k] = r.regime;
        nablaRad[k] = r.nablaRad;
        nablaAd[k] = r.nablaAd;
        nablaLedoux[k] = r.nablaLedoux;
        marginSchwarzschild[k] = r.marginSchwarzschild;
        marginLedoux[k] = r.marginLedoux;
        for (int i = 0; i < ZoneInput.COUNT; i++) {
            dNablaRad[i][k] = r.dNablaRad[i];
            dNablaLedoux[i][k] = r.dNablaLedoux[i];
        }
    }
}
