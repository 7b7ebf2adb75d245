package io.github.startransport.spi;

/**
 * Layout of a convection Jacobian stored zone-major, the order in which a Newton solver assembles
 * its matrix: one contiguous block of {@link #PER_ZONE} doubles per zone, four outputs of
 * {@link ZoneInput#COUNT} partial derivatives each.
 *
 * <pre>
 *   block[(k * OUTPUTS + o) * ZoneInput.COUNT + i] = d (output o) / d (input i) in zone k
 * </pre>
 *
 * <p>with o one of {@link #NABLA}, {@link #VELOCITY}, {@link #CONVECTIVE_FRACTION},
 * {@link #DIFFUSION} and i a {@link ZoneInput} index; the same plain partial derivatives, in the
 * same units, as the arrays of {@link ConvectionResult}. Zone k is the column index of the
 * {@link ZoneColumns} given to {@link ConvectionModel#solveZoneMajor}, so a block for zones
 * [from, to) holds at least {@code to * PER_ZONE} doubles. The column layout of
 * {@link ConvectionColumns} (input-major) stays available beside it.
 */
public final class ZoneMajorJacobian {
    private ZoneMajorJacobian() {
    }

    /** Output 0: the actual temperature gradient nabla (per unit of the input). */
    public static final int NABLA = 0;
    /** Output 1: the convective velocity v_conv (cm s^-1 per unit of the input). */
    public static final int VELOCITY = 1;
    /** Output 2: the convective share of the flux F_conv / F (per unit of the input). */
    public static final int CONVECTIVE_FRACTION = 2;
    /** Output 3: the mixing diffusion coefficient D (cm^2 s^-1 per unit of the input). */
    public static final int DIFFUSION = 3;
    /** Number of outputs per zone. */
    public static final int OUTPUTS = 4;
    /** Doubles per zone: {@code OUTPUTS * ZoneInput.COUNT}. */
    public static final int PER_ZONE = OUTPUTS * ZoneInput.COUNT;

    private static final String[] NAMES = {"nabla", "v_conv", "F_conv/F", "D"};

    /**
     * @param zone   column index k, &gt;= 0
     * @param output one of {@link #NABLA}, {@link #VELOCITY}, {@link #CONVECTIVE_FRACTION}, {@link #DIFFUSION}
     * @param input  a {@link ZoneInput} index
     * @return the position of d (output) / d (input) of zone k in a block
     */
    public static int index(int zone, int output, int input) {
        return (zone * OUTPUTS + output) * ZoneInput.COUNT + input;
    }

    /**
     * @param output an output index of this class
     * @return its short name, e.g. {@code "v_conv"}
     */
    public static String name(int output) {
        return NAMES[output];
    }

    /**
     * Copies one zone's four derivative arrays into its block (no allocation).
     *
     * @param block the zone-major block, at least {@code (zone + 1) * PER_ZONE} long
     * @param zone  column index k
     * @param r     the zone's result (read only)
     */
    public static void store(double[] block, int zone, ConvectionResult r) {
        final int base = zone * PER_ZONE;
        System.arraycopy(r.dNabla, 0, block, base, ZoneInput.COUNT);
        System.arraycopy(r.dVelocity, 0, block, base + ZoneInput.COUNT, ZoneInput.COUNT);
        System.arraycopy(r.dConvectiveFraction, 0, block, base + 2 * ZoneInput.COUNT, ZoneInput.COUNT);
        System.arraycopy(r.dDiffusion, 0, block, base + 3 * ZoneInput.COUNT, ZoneInput.COUNT);
    }

    /**
     * Copies one zone's four derivative arrays into its block in a buffer, from index
     * {@code position() + zone * PER_ZONE} (no allocation; the position is not changed).
     *
     * @param block the zone-major blocks, limit at least {@code position() + (zone + 1) * PER_ZONE}
     * @param zone  column index k
     * @param r     the zone's result (read only)
     */
    public static void store(java.nio.DoubleBuffer block, int zone, ConvectionResult r) {
        final int base = block.position() + zone * PER_ZONE;
        block.put(base, r.dNabla);
        block.put(base + ZoneInput.COUNT, r.dVelocity);
        block.put(base + 2 * ZoneInput.COUNT, r.dConvectiveFraction);
        block.put(base + 3 * ZoneInput.COUNT, r.dDiffusion);
    }

    /**
     * Checks that a buffer can take the blocks of zones up to {@code to} (exclusive) from its position.
     *
     * @param block the buffer
     * @param to    last zone, exclusive
     * @throws InvalidInputException when the buffer is null, read-only, or its limit is below
     *                               {@code position() + to * PER_ZONE}
     */
    public static void checkCapacity(java.nio.DoubleBuffer block, int to) {
        if (block == null) {
            throw new InvalidInputException("jacobian", Double.NaN, "buffer", InvalidInputException.NO_ZONE,
                    "a writable buffer (use solveZoneMajor with a null array for the values only)");
        }
        if (block.isReadOnly()) {
            throw new InvalidInputException("jacobian.readOnly", 1, "buffer", InvalidInputException.NO_ZONE,
                    "a writable buffer");
        }
        final long needed = block.position() + (long) to * PER_ZONE;
        if (needed > block.limit()) {
            throw new InvalidInputException("jacobian.limit", block.limit(), "doubles", InvalidInputException.NO_ZONE,
                    "at least position + " + PER_ZONE + " per zone, " + needed + " for zones up to " + to
                            + " from position " + block.position());
        }
    }

    /**
     * Checks that a block holds zones up to {@code to} (exclusive).
     *
     * @param block the block, or null (no Jacobian wanted)
     * @param to    last zone, exclusive
     * @throws InvalidInputException when the block is too short
     */
    public static void checkCapacity(double[] block, int to) {
        if (block != null && (long) to * PER_ZONE > block.length) {
            throw new InvalidInputException("jacobian.length", block.length, "doubles", InvalidInputException.NO_ZONE,
                    "at least " + PER_ZONE + " per zone, " + ((long) to * PER_ZONE) + " for zones up to " + to);
        }
    }
}
