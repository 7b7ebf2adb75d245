package io.github.startransport.spi;

/**
 * A local convection model (a mixing-length variant): given a zone, the actual temperature
 * gradient, the convective velocity and flux, the mixing diffusion coefficient, and their
 * partial derivatives with respect to every input of the call.
 *
 * <p>Reads from the zone: radius, mass, temperature, density, pressure, luminosity, opacity,
 * cp, nablaAd, delta, nablaMu, phi. Implementations are immutable and thread-safe, and
 * {@link #solve} allocates nothing.
 */
public interface ConvectionModel {

    /** @return the mixing-length parameter alpha = l / H_P this model was created with */
    double alpha();

    /** @return the criterion that decides whether the zone convects */
    Criterion criterion();

    /**
     * The same model with another mixing-length parameter and every other setting kept; what an
     * alpha calibration (for instance of an envelope, {@link EnvelopeIntegrator}) varies.
     *
     * @param alpha mixing-length parameter l / H_P (dimensionless), &gt; 0
     * @return the model with that alpha (immutable, thread-safe)
     * @throws InvalidInputException         when alpha is not finite and &gt; 0
     * @throws UnsupportedOperationException when the model has no mixing-length parameter
     */
    default ConvectionModel withAlpha(double alpha) {
        throw new UnsupportedOperationException(getClass().getName() + " cannot change its mixing-length parameter");
    }

    /**
     * Solves one zone. A zone that is stable under {@link #criterion()} gets nabla = nabla_rad,
     * zero convective velocity and flux, and the diffusion coefficient of its regime
     * (semiconvective, thermohaline, or zero).
     *
     * @param zone input state (read only)
     * @param out  caller-owned result, overwritten
     * @throws InvalidInputException when a read field is non-finite or unphysical
     */
    void solve(ZoneState zone, ConvectionResult out);

    /**
     * Solves one zone for the values only: every field of {@code out} as {@link #solve} sets it,
     * bit for bit, except the four derivative arrays, which are left unspecified. The default
     * calls {@link #solve}; implementations skip the Jacobian.
     *
     * @param zone input state (read only)
     * @param out  caller-owned result, overwritten
     * @throws InvalidInputException when a read field is non-finite or unphysical
     */
    default void solveValues(ZoneState zone, ConvectionResult out) {
        solve(zone, out);
    }

    /**
     * Solves zones [from, to) of a profile held in columns: zone k gets bit for bit what
     * {@link #solve} gives for {@code in.load(k, state)}. A host may split one profile across
     * threads by giving each a disjoint range and its own output (or working space).
     *
     * <p>The default loops over {@link #solve} with the output's working space and allocates
     * nothing; implementations override it with a loop over their static kernel, so that the
     * call site is not shared by every implementation of this interface.
     *
     * @param in       input columns (read only)
     * @param from     first zone, inclusive
     * @param to       last zone, exclusive
     * @param out      output columns, overwritten in [from, to)
     * @param jacobian whether to fill the derivative columns; when false they are left untouched
     * @throws InvalidInputException naming the zone (column index) of the first bad input, or a bad range;
     *                               zones before it have been written
     */
    default void solveColumns(ZoneColumns in, int from, int to, ConvectionColumns out, boolean jacobian) {
        in.checkRange(from, to, out.capacity);
        ZoneState zone = out.workZone;
        ConvectionResult r = out.workResult;
        for (int k = from; k < to; k++) {
            in.load(k, zone);
            if (jacobian) {
                solve(zone, r);
            } else {
                solveValues(zone, r);
            }
            out.store(k, r, jacobian);
        }
    }

    /**
     * Whether this model's length scale is the distance to the nearest edge of the convective region, read
     * from {@link ZoneState#edgeDistance} (and {@link ZoneColumns#edgeDistance}); a caller must then fill it
     * (the diagnosis does, from the edges it locates).
     *
     * @return true when {@link ZoneState#edgeDistance} is read; the default is false
     */
    default boolean needsEdgeDistance() {
        return false;
    }

    /**
     * Solves zones [from, to) like {@link #solveColumns}, with the Jacobian in the zone-major layout
     * of {@link ZoneMajorJacobian}: zone k's values go to {@code out} (its derivative columns are
     * left untouched) and its 52 partial derivatives to
     * {@code jacobian[k * ZoneMajorJacobian.PER_ZONE ...]}, bit for bit what {@link #solve} gives for
     * {@code in.load(k, state)}.
     *
     * <p>The default loops over {@link #solve} (or {@link #solveValues} when {@code jacobian} is
     * null) with the output's working space and allocates nothing; implementations override it with
     * a loop over their static kernel.
     *
     * @param in       input columns (read only)
     * @param from     first zone, inclusive
     * @param to       last zone, exclusive
     * @param out      output columns: the values of zones [from, to) are overwritten
     * @param jacobian caller-owned block of at least {@code to * ZoneMajorJacobian.PER_ZONE} doubles,
     *                 overwritten for zones [from, to); or null for the values only
     * @throws InvalidInputException naming the zone (column index) of the first bad input, a bad range
     *                               or a short block; zones before it have been written
     */
    default void solveZoneMajor(ZoneColumns in, int from, int to, ConvectionColumns out, double[] jacobian) {
        in.checkRange(from, to, out.capacity);
        ZoneMajorJacobian.checkCapacity(jacobian, to);
        ZoneState zone = out.workZone;
        ConvectionResult r = out.workResult;
        for (int k = from; k < to; k++) {
            in.load(k, zone);
            if (jacobian != null) {
                solve(zone, r);
                ZoneMajorJacobian.store(jacobian, k, r);
            } else {
                solveValues(zone, r);
            }
            out.store(k, r, false);
        }
    }

    /**
     * {@link #solveZoneMajor(ZoneColumns, int, int, ConvectionColumns, double[])} with the Jacobian
     * written into a buffer instead of an array, in the same layout from the buffer's position: entry
     * {@code ZoneMajorJacobian.index(k, o, i)} goes to index {@code position() + index(k, o, i)} (the
     * position, limit and mark are not changed). This is how memory outside the Java heap is written directly:
     * a direct buffer over a native host's array ({@code ByteBuffer.allocateDirect} or JNI's
     * {@code NewDirectByteBuffer}, then {@code order(ByteOrder.nativeOrder()).asDoubleBuffer()}), with no
     * copy through a Java array. Every store goes through the buffer's own bounds check, so a buffer
     * that is too short is refused before anything is written and no store can land outside it.
     *
     * <p>The default loops over {@link #solve} with the output's working space and copies each zone's
     * arrays into the buffer; it allocates nothing. Implementations override it with their kernel.
     *
     * @param in       input columns (read only)
     * @param from     first zone, inclusive
     * @param to       last zone, exclusive
     * @param out      output columns: the values of zones [from, to) are overwritten
     * @param jacobian writable buffer whose limit is at least {@code position() + to * ZoneMajorJacobian.PER_ZONE},
     *                 overwritten for zones [from, to) in its own byte order
     * @throws InvalidInputException naming the zone (column index) of the first bad input, a bad range,
     *                               or a buffer that is null, read-only or too short; zones before a bad
     *                               zone have been written
     */
    default void solveZoneMajorInto(ZoneColumns in, int from, int to, ConvectionColumns out,
                                    java.nio.DoubleBuffer jacobian) {
        in.checkRange(from, to, out.capacity);
        ZoneMajorJacobian.checkCapacity(jacobian, to);
        ZoneState zone = out.workZone;
        ConvectionResult r = out.workResult;
        for (int k = from; k < to; k++) {
            solve(in.load(k, zone), r);
            ZoneMajorJacobian.store(jacobian, k, r);
            out.store(k, r, false);
        }
    }

    /**
     * The efficiency parameter of exponentially decaying overshoot beyond a convective
     * boundary: the velocity scale height is f H_P.
     *
     * @return f (dimensionless), 0 when the model applies no overshoot
     */
    default double overshootParameter() {
        return 0.0;
    }

    /**
     * Mixing diffusion coefficient at a distance beyond a convective boundary, for hosts that
     * extend mixing past the boundary (not a hot-path call: it needs the boundary's position,
     * which a single zone does not know). The host chooses where the boundary sits and which
     * convective zone supplies the starting coefficient.
     *
     * @param boundaryDiffusion D_0, the convective coefficient at the boundary (cm^2 s^-1), &gt;= 0
     * @param distance          distance z from the boundary into the stable layer (cm), &gt;= 0
     * @param scaleHeight       pressure scale height H_P at the boundary (cm), &gt; 0
     * @return D(z) (cm^2 s^-1)
     * @throws InvalidInputException         when an argument is non-finite or out of range
     * @throws UnsupportedOperationException when the model offers no overshoot
     */
    default double overshootDiffusion(double boundaryDiffusion, double distance, double scaleHeight) {
        throw new UnsupportedOperationException(getClass().getName() + " offers no overshoot mixing");
    }
}
