package io.github.startransport.bridge;

import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.OpacityColumns;
import io.github.startransport.spi.StabilityColumns;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneMajorJacobian;
import io.github.startransport.spi.ZoneInput;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.DoubleBuffer;

/**
 * One native thread's working arrays: the C side copies a chunk of up to {@link #CHUNK} host
 * zones into the input columns, calls {@link NativeBridge}, and copies the output columns back.
 * Made once per host thread, on its first call, and reused for every call after it, so that a
 * call in steady state allocates nothing on either side.
 *
 * <p>Not thread-safe: each host thread has its own.
 */
public final class Workspace {
    /**
     * Zones per chunk. A chunk's arrays (about 0.15 MB with the Jacobian) stay in the core's L2
     * cache between the Java call and the copy back to the host, and the workspace of a thread
     * stays small whatever the host's zone count; 64 to 1024 timed the same within the noise of
     * the shared build machine (DEVELOPERS.md).
     */
    public static final int CHUNK = 256;

    /** Number of input columns (the fields of the C header's {@code stt_zones}). */
    static final int INPUT_COUNT = 14;

    final ZoneColumns in = new ZoneColumns(CHUNK);
    final ConvectionColumns convection = new ConvectionColumns(CHUNK);
    final StabilityColumns stability = new StabilityColumns(CHUNK);
    final OpacityColumns opacity = new OpacityColumns(CHUNK);
    final ThermoResult thermoResult = new ThermoResult();
    /** Thermodynamics outputs: mu, beta, P, nabla_ad, c_P, delta, phi, Gamma_1. */
    final double[][] thermo = new double[8][CHUNK];
    /** Regime or opacity status codes of the last call (the STT_ codes of the C header). */
    final int[] codes = new int[CHUNK];
    /** The convection Jacobian, zone-major ({@link ZoneMajorJacobian}). */
    final double[] convectionJacobian = new double[CHUNK * ZoneMajorJacobian.PER_ZONE];
    /** The stability Jacobian, zone-major: [(k * 2 + o) * 13 + i], o = 0 nabla_rad, 1 nabla_L. */
    final double[] stabilityJacobian = new double[CHUNK * 2 * ZoneInput.COUNT];
    /** Message of the last failed call, or null. */
    String message;
    /** Family code of the last model created on this thread. */
    int family;

    /** The direct buffer over the host's Jacobian array last passed, and its view as doubles. */
    private ByteBuffer hostBytes;
    private DoubleBuffer hostJacobian;

    /**
     * The host's Jacobian array as native-order doubles: a new view only when the C side passes a new
     * buffer (it keeps one per thread while the host passes the same array), so nothing is allocated
     * in steady state.
     *
     * @param bytes direct buffer over the host's array
     * @return its view as doubles in the platform's byte order
     */
    DoubleBuffer hostJacobian(ByteBuffer bytes) {
        if (bytes != hostBytes) {
            hostJacobian = bytes.order(ByteOrder.nativeOrder()).asDoubleBuffer();
            hostBytes = bytes;
        }
        return hostJacobian;
    }

    /** The input columns in the order of the C header's {@code stt_zones} fields. */
    final double[][] inputColumns = inputs();

    private double[][] inputs() {
        return new double[][] {in.radius, in.mass, in.temperature, in.density, in.pressure, in.luminosity,
            in.opacity, in.cp, in.nablaAd, in.delta, in.nablaMu, in.phi, in.hydrogen, in.metals};
    }

    /**
     * Every array the C side reads or writes, in one fixed order that startransport.c mirrors:
     * the 14 input columns ({@code stt_zones} order); the 11 convection value columns
     * ({@code stt_convection_out} order, regime excluded); the 5 stability value columns; the 3
     * opacity columns; the 8 thermodynamics columns; the codes; the convection Jacobian; the
     * stability Jacobian. Called once per thread.
     *
     * @return 44 arrays
     */
    Object[] arrays() {
        ConvectionColumns c = convection;
        StabilityColumns s = stability;
        OpacityColumns o = opacity;
        double[][] input = inputColumns;
        Object[] all = new Object[ARRAY_COUNT];
        int j = 0;
        for (double[] column : input) {
            all[j++] = column;
        }
        for (double[] column : new double[][] {c.nablaRad, c.nabla, c.nablaElement, c.velocity, c.convectiveFraction,
            c.radiativeFraction, c.efficiency, c.lossParameter, c.scaleHeight, c.mixingLength, c.diffusion}) {
            all[j++] = column;
        }
        for (double[] column : new double[][] {s.nablaRad, s.nablaAd, s.nablaLedoux, s.marginSchwarzschild,
            s.marginLedoux}) {
            all[j++] = column;
        }
        for (double[] column : new double[][] {o.kappa, o.dLnKappaDLnRho, o.dLnKappaDLnT}) {
            all[j++] = column;
        }
        for (double[] column : thermo) {
            all[j++] = column;
        }
        all[j++] = codes;
        all[j++] = convectionJacobian;
        all[j++] = stabilityJacobian;
        if (j != ARRAY_COUNT) {
            throw new IllegalStateException(j + " arrays, expected " + ARRAY_COUNT);
        }
        return all;
    }

    /** Number of arrays {@link #arrays()} returns. */
    static final int ARRAY_COUNT = 14 + 11 + 5 + 3 + 8 + 3;
}
