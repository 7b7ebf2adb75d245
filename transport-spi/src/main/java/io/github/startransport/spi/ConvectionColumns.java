package io.github.startransport.spi;

/**
 * Caller-owned output columns of {@link ConvectionModel#solveColumns}: one entry per zone for each
 * field of {@link ConvectionResult}, and the derivative columns laid out input-major:
 * {@code dNabla[i][k]} = d nabla / d (input i) in zone k, with i a {@link ZoneInput} index, so that
 * a host reads one input's column of the Jacobian as one contiguous array.
 *
 * <p>{@link #workZone}, {@link #workResult} and {@link #work} are working space for the solver
 * (caller-owned, so that batch calls allocate nothing); their contents after a call are unspecified. Not
 * thread-safe: threads that split one profile write disjoint zone ranges of one instance, each
 * with its own working space, or use one instance each.
 */
public final class ConvectionColumns {
    /** Number of zones the columns hold. */
    public final int capacity;
    /** Regime per zone. */
    public final Regime[] regime;
    /** Radiative gradient nabla_rad (dimensionless). */
    public final double[] nablaRad;
    /** Actual temperature gradient nabla (dimensionless). */
    public final double[] nabla;
    /** Element gradient nabla_e (dimensionless). */
    public final double[] nablaElement;
    /** Convective velocity (cm s^-1). */
    public final double[] velocity;
    /** F_conv / F (dimensionless). */
    public final double[] convectiveFraction;
    /** F_rad / F (dimensionless). */
    public final double[] radiativeFraction;
    /** Convective efficiency Gamma (dimensionless). */
    public final double[] efficiency;
    /** Loss parameter U (dimensionless). */
    public final double[] lossParameter;
    /** Pressure scale height H_P (cm). */
    public final double[] scaleHeight;
    /** Mixing length l (cm). */
    public final double[] mixingLength;
    /** Mixing diffusion coefficient D (cm^2 s^-1). */
    public final double[] diffusion;
    /** d nabla / d (input i) at [i][zone] (per unit of the input). */
    public final double[][] dNabla;
    /** d v / d (input i) at [i][zone] (cm s^-1 per unit of the input). */
    public final double[][] dVelocity;
    /** d (F_conv / F) / d (input i) at [i][zone] (per unit of the input). */
    public final double[][] dConvectiveFraction;
    /** d D / d (input i) at [i][zone] (cm^2 s^-1 per unit of the input). */
    public final double[][] dDiffusion;
    /** Working space: one zone's state. */
    public final ZoneState workZone = new ZoneState();
    /** Working space: one zone's result. */
    public final ConvectionResult workResult = new ConvectionResult();
    /** Length of {@link #work}: room for 64 zones of {@link ZoneMajorJacobian#PER_ZONE} doubles. */
    public static final int WORK_LENGTH = 64 * ZoneMajorJacobian.PER_ZONE;
    /**
     * Working space: room for a provider's intermediate values of a chunk of zones, so that a batch call
     * can run its stages over several zones at a time without allocating ({@link #WORK_LENGTH} doubles).
     */
    public final double[] work = new double[WORK_LENGTH];

    /**
     * @param capacity number of zones, &gt;= 0
     * @throws InvalidInputException when capacity is negative
     */
    public ConvectionColumns(int capacity) {
        if (capacity < 0) {
            throw new InvalidInputException("capacity", capacity, "zones", InvalidInputException.NO_ZONE, ">= 0");
        }
        this.capacity = capacity;
        regime = new Regime[capacity];
        nablaRad = new double[capacity];
        nabla = new double[capacity];
        nablaElement = new double[capacity];
        velocity = new double[capacity];
        convectiveFraction = new double[capacity];
        radiativeFraction = new double[capacity];
        efficiency = new double[capacity];
        lossParameter = new double[capacity];
        scaleHeight = new double[capacity];
        mixingLength = new double[capacity];
        diffusion = new double[capacity];
        dNabla = new double[ZoneInput.COUNT][capacity];
        dVelocity = new double[ZoneInput.COUNT][capacity];
        dConvectiveFraction = new double[ZoneInput.COUNT][capacity];
        dDiffusion = new double[ZoneInput.COUNT][capacity];
    }

    /**
     * Copies one zone's result into column k.
     *
     * @param k        column index
     * @param r        the result (read only)
     * @param jacobian whether to copy the derivatives too
     */
    public void store(int k, ConvectionResult r, boolean jacobian) {
        regime[k] = r.regime;
        nablaRad[k] = r.nablaRad;
        nabla[k] = r.nabla;
        nablaElement[k] = r.nablaElement;
        velocity[k] = r.velocity;
        convectiveFraction[k] = r.convectiveFraction;
        radiativeFraction[k] = r.radiativeFraction;
        efficiency[k] = r.efficiency;
        lossParameter[k] = r.lossParameter;
        scaleHeight[k] = r.scaleHeight;
        mixingLength[k] = r.mixingLength;
        diffusion[k] = r.diffusion;
        if (jacobian) {
            for (int i = 0; i < ZoneInput.COUNT; i++) {
                dNabla[i][k] = r.dNabla[i];
                dVelocity[i][k] = r.dVelocity[i];
                dConvectiveFraction[i][k] = r.dConvectiveFraction[i];
                dDiffusion[i][k] = r.dDiffusion[i];
            }
        }
    }
}
