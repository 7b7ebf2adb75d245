package io.github.startransport.spi;

/** Caller-owned, mutable result of a {@link BuoyancyModel}: allocate once, reuse. */
public final class BuoyancyResult {
    /** Creates an empty result, to be filled by a model. */
    public BuoyancyResult() {
    }

    /** Buoyancy frequency squared N^2 (rad^2 s^-2): negative where the layer is convectively unstable. */
    public double buoyancySquared;
    /** Adiabatic sound speed c_s (cm s^-1). */
    public double soundSpeed;
    /** Lamb frequency of degree l = 1, S_1 (rad s^-1). */
    public double lamb1;
    /**
     * Partial derivatives of N^2 by the zone's inputs, indexed by {@link ZoneInput}: entries
     * {@link ZoneInput#R}, {@link ZoneInput#M}, {@link ZoneInput#RHO}, {@link ZoneInput#P},
     * {@link ZoneInput#DELTA}, {@link ZoneInput#NABLA_AD}, {@link ZoneInput#PHI} and
     * {@link ZoneInput#NABLA_MU} (rad^2 s^-2 per unit of the input); the others are 0.
     */
    public final double[] dBuoyancySquared = new double[ZoneInput.COUNT];
    /** d N^2 / d nabla, by the actual gradient (rad^2 s^-2). */
    public double dBuoyancySquaredDNabla;

    @Override
    public String toString() {
        return "BuoyancyResult[N^2=" + buoyancySquared + " rad^2/s^2, c_s=" + soundSpeed + " cm/s, S_1=" + lamb1
                + " rad/s]";
    }
}
