package io.github.startransport.spi;

/**
 * Caller-owned output columns of {@link OpacityModel#evaluateColumns}: kappa and its two
 * logarithmic derivatives per zone, and what the lookup did with each point. {@link #workResult} is
 * working space; its contents after a call are unspecified. Not thread-safe (see
 * {@link ConvectionColumns}).
 */
public final class OpacityColumns {
    /** Number of zones the columns hold. */
    public final int capacity;
    /** Rosseland mean opacity kappa (cm^2 g^-1). */
    public final double[] kappa;
    /** (d ln kappa / d ln rho) at constant T and composition (dimensionless). */
    public final double[] dLnKappaDLnRho;
    /** (d ln kappa / d ln T) at constant rho and composition (dimensionless). */
    public final double[] dLnKappaDLnT;
    /** Inside, clamped or extrapolated, per zone. */
    public final OpacityStatus[] status;
    /** Working space: one lookup's result. */
    public final OpacityResult workResult = new OpacityResult();

    /**
     * @param capacity number of zones, &gt;= 0
     * @throws InvalidInputException when capacity is negative
     */
    public OpacityColumns(int capacity) {
        if (capacity < 0) {
            throw new InvalidInputException("capacity", capacity, "zones", InvalidInputException.NO_ZONE, ">= 0");
        }
        this.capacity = capacity;
        kappa = new double[capacity];
        dLnKappaDLnRho = new double[capacity];
        dLnKappaDLnT = new double[capacity];
        status = new OpacityStatus[capacity];
    }

    /**
     * Copies one lookup's result into column k.
     *
     * @param k column index
     * @param r the result (read only)
     */
    public void store(int k, OpacityResult r) {
        kappa[k] = r.kappa;
        dLnKappaDLnRho[k] = r.dLnKappaDLnRho;
        dLnKappaDLnT[k] = r.dLnKappaDLnT;
        status[k] = r.status;
    }
}
