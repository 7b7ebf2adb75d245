package io.github.startransport.bridge;

import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.DiscoveryException;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.InvalidOptionException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.OpacityStatus;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.StabilityColumns;
import io.github.startransport.spi.StabilityModel;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ThermodynamicsModel;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.TransportException;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneMajorJacobian;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.ByteBuffer;
import java.nio.DoubleBuffer;
import java.util.Arrays;

/**
 * The Java half of the C interface (startransport.h): static entry points that the C library
 * calls through JNI, one per chunk of host zones, over a thread's {@link Workspace}.
 *
 * <p>The library is reached only through the SPI: {@link Transport#discover(ClassLoader)} once,
 * models by name and options, and their batch calls. Nothing here throws: every entry point
 * catches what the library throws, stores the message (zone renumbered for the host) in the
 * workspace and returns one of the status codes below, which equal the {@code STT_} codes of the
 * C header ({@code NativeBridgeTest} checks both against each other).
 */
public final class NativeBridge {
    private NativeBridge() {
    }

    /** Success. */
    public static final int OK = 0;
    /** An input was refused (InvalidInputException). */
    public static final int INVALID_INPUT = 1;
    /** A model option was unknown or malformed. */
    public static final int INVALID_OPTION = 2;
    /** No model of that name, or no provider (DiscoveryException). */
    public static final int UNKNOWN_MODEL = 3;
    /** A data file (opacity table) was malformed. */
    public static final int DATA_FORMAT = 4;
    /** No Java virtual machine could be found or started (C side only). */
    public static final int NO_JVM = 5;
    /** The library's classes or jars could not be found. */
    public static final int NO_CLASSES = 6;
    /** A bad argument: null pointer, negative count, wrong family. */
    public static final int BAD_ARGUMENT = 7;
    /** Any other Java error (out of memory, a provider's bug). */
    public static final int JAVA_ERROR = 8;

    /** Family codes (the C side keeps the model's family to check calls against it). */
    public static final int STABILITY = 0;
    /** Thermodynamics family code. */
    public static final int THERMODYNAMICS = 1;
    /** Convection family code. */
    public static final int CONVECTION = 2;
    /** Opacity family code. */
    public static final int OPACITY = 3;

    /** Regime codes (STT_RADIATIVE ...). */
    public static final int RADIATIVE = 0;
    /** Convective regime code. */
    public static final int CONVECTIVE = 1;
    /** Semiconvective regime code. */
    public static final int SEMICONVECTIVE = 2;
    /** Thermohaline regime code. */
    public static final int THERMOHALINE = 3;
    /** Opacity status codes (STT_INSIDE ...). */
    public static final int INSIDE = 0;
    /** Clamped opacity status code. */
    public static final int CLAMPED = 1;
    /** Extrapolated opacity status code. */
    public static final int EXTRAPOLATED = 2;

    private static volatile Transport transport;

    /**
     * Discovers the providers once per process (later calls reuse them).
     *
     * @param ws the calling thread's workspace, receives the message on failure
     * @return a status code
     */
    static int open(Workspace ws) {
        try {
            if (transport == null) {
                synchronized (NativeBridge.class) {
                    if (transport == null) {
                        transport = Transport.discover(NativeBridge.class.getClassLoader());
                    }
                }
            }
            return OK;
        } catch (DiscoveryException e) {
            ws.message = e.getMessage();
            return NO_CLASSES;
        } catch (Throwable e) {
            return fail(ws, e, 0);
        }
    }

    /** @return a new workspace for the calling host thread */
    static Workspace workspace() {
        return new Workspace();
    }

    /**
     * Creates a model by family, name and options, exactly as {@link Transport#model} does.
     *
     * @param ws      workspace: receives the family code, or the message on failure
     * @param family  "stability", "thermodynamics", "convection" or "opacity"
     * @param name    model name (or provider/model), null or blank for the default
     * @param options options text such as {@code alpha=1.8,criterion=ledoux}, null or blank for none
     * @return the model, or null on failure
     */
    static Object create(Workspace ws, String family, String name, String options) {
        try {
            ModelFamily<?> f;
            try {
                f = ModelFamily.byName(family == null ? "" : family);
            } catch (IllegalArgumentException e) {
                f = null;
            }
            int code = f == ModelFamily.STABILITY ? STABILITY : f == ModelFamily.THERMODYNAMICS ? THERMODYNAMICS
                    : f == ModelFamily.CONVECTION ? CONVECTION : f == ModelFamily.OPACITY ? OPACITY : -1;
            if (code < 0) {
                ws.message = "family '" + family + "' has no hot-path call in the C interface; use stability, "
                        + "thermodynamics, convection or opacity";
                ws.family = BAD_ARGUMENT;
                return null;
            }
            ModelOptions parsed;
            try {
                parsed = options == null || options.isBlank() ? ModelOptions.defaults() : ModelOptions.parse(options);
            } catch (IllegalArgumentException e) {
                ws.message = e.getMessage() + " (options '" + options + "' for " + family + " model '" + name
                        + "'; write them as name=value,name=value)";
                ws.family = INVALID_OPTION;
                return null;
            }
            Object model = transport.model(f, name, parsed);
            ws.family = code;
            return model;
        } catch (Throwable e) {
            ws.family = fail(ws, e, 0);
            return null;
        }
    }

    /**
     * @param model a model
     * @return its description (name and options)
     */
    static String describe(Object model) {
        return String.valueOf(model);
    }

    /** Fills the input columns the host did not give with their defaults (phi = 1, others 0). */
    private static void defaults(Workspace ws, int count, int present) {
        double[][] columns = ws.inputColumns;
        for (int j = 0; j < Workspace.INPUT_COUNT; j++) {
            if ((present & (1 << j)) == 0) {
                Arrays.fill(columns[j], 0, count, columns[j] == ws.in.phi ? 1.0 : 0.0);
            }
        }
    }

    /**
     * Convection over the chunk with the zone-major Jacobian stored straight into the host's array:
     * values into the workspace's columns and regimes into its codes as {@link #convection} does, the
     * Jacobian of chunk zone k into host zone {@code start + k}'s block through
     * {@link ConvectionModel#solveZoneMajorInto} (no copy through the workspace).
     *
     * @param ws        workspace holding the chunk's inputs
     * @param model     the model
     * @param count     zones in the chunk
     * @param zoneShift added to a refused zone's index in the message (chunk start + host origin)
     * @param present   bit j set when input column j was given by the host
     * @param host      a direct buffer over the host's whole Jacobian array (JNI NewDirectByteBuffer)
     * @param start     the chunk's first zone in the host's arrays
     * @return a status code
     */
    static int convectionDirect(Workspace ws, ConvectionModel model, int count, int zoneShift, int present,
                                ByteBuffer host, int start) {
        try {
            defaults(ws, count, present);
            DoubleBuffer jacobian = ws.hostJacobian(host);
            jacobian.position(start * ZoneMajorJacobian.PER_ZONE);
            model.solveZoneMajorInto(ws.in, 0, count, ws.convection, jacobian);
            convectionCodes(ws, count);
            return OK;
        } catch (Throwable e) {
            return fail(ws, e, zoneShift);
        }
    }

    /**
     * Convection over the chunk: values into the workspace's columns, regimes into its codes and,
     * when asked, the zone-major Jacobian into its block.
     *
     * @param ws        workspace holding the chunk's inputs
     * @param model     the model
     * @param count     zones in the chunk
     * @param zoneShift added to a refused zone's index in the message (chunk start + host origin)
     * @param jacobian  whether to fill the Jacobian
     * @param present   bit j set when input column j was given by the host
     * @return a status code
     */
    static int convection(Workspace ws, ConvectionModel model, int count, int zoneShift, boolean jacobian,
                          int present) {
        try {
            defaults(ws, count, present);
            model.solveZoneMajor(ws.in, 0, count, ws.convection, jacobian ? ws.convectionJacobian : null);
            convectionCodes(ws, count);
            return OK;
        } catch (Throwable e) {
            return fail(ws, e, zoneShift);
        }
    }

    /** The chunk's convection regimes as the C header's codes, into the workspace. */
    private static void convectionCodes(Workspace ws, int count) {
        Regime[] regime = ws.convection.regime;
        int[] codes = ws.codes;
        for (int k = 0; k < count; k++) {
            codes[k] = code(regime[k]);
        }
    }

    /**
     * The stability test over the chunk; the Jacobian of nabla_rad and nabla_L zone-major.
     *
     * @param ws        workspace
     * @param model     the model
     * @param count     zones in the chunk
     * @param zoneShift added to a refused zone's index
     * @param jacobian  whether to fill the Jacobian block
     * @param present   bit j set when input column j was given
     * @return a status code
     */
    static int stability(Workspace ws, StabilityModel model, int count, int zoneShift, boolean jacobian,
                         int present) {
        try {
            defaults(ws, count, present);
            StabilityColumns out = ws.stability;
            model.evaluateColumns(ws.in, 0, count, out);
            int[] codes = ws.codes;
            for (int k = 0; k < count; k++) {
                codes[k] = code(out.regime[k]);
            }
            if (jacobian) {
                double[] block = ws.stabilityJacobian;
                for (int i = 0; i < ZoneInput.COUNT; i++) {
                    double[] rad = out.dNablaRad[i];
                    double[] ledoux = out.dNablaLedoux[i];
                    for (int k = 0; k < count; k++) {
                        block[(2 * k) * ZoneInput.COUNT + i] = rad[k];
                        block[(2 * k + 1) * ZoneInput.COUNT + i] = ledoux[k];
                    }
                }
            }
            return OK;
        } catch (Throwable e) {
            return fail(ws, e, zoneShift);
        }
    }

    /**
     * The opacity over the chunk's T, rho, X, Z; statuses into the codes.
     *
     * @param ws        workspace
     * @param model     the model
     * @param count     zones in the chunk
     * @param zoneShift added to a refused zone's index
     * @return a status code
     */
    static int opacity(Workspace ws, OpacityModel model, int count, int zoneShift) {
        try {
            model.evaluateColumns(ws.in, 0, count, ws.opacity);
            OpacityStatus[] status = ws.opacity.status;
            int[] codes = ws.codes;
            for (int k = 0; k < count; k++) {
                codes[k] = code(status[k]);
            }
            return OK;
        } catch (Throwable e) {
            return fail(ws, e, zoneShift);
        }
    }

    /**
     * The thermodynamics over the chunk's T, rho, X, Z (the SPI has no batch call here: a loop
     * over the per-zone call, zone index k in messages).
     *
     * @param ws        workspace
     * @param model     the model
     * @param count     zones in the chunk
     * @param zoneShift added to a refused zone's index
     * @return a status code
     */
    static int thermodynamics(Workspace ws, ThermodynamicsModel model, int count, int zoneShift) {
        try {
            ZoneColumns in = ws.in;
            ThermoResult r = ws.thermoResult;
            double[][] t = ws.thermo;
            for (int k = 0; k < count; k++) {
                model.evaluate(in.temperature[k], in.density[k], in.hydrogen[k], in.metals[k], k, r);
                t[0][k] = r.mu;
                t[1][k] = r.beta;
                t[2][k] = r.pressure;
                t[3][k] = r.nablaAd;
                t[4][k] = r.cp;
                t[5][k] = r.delta;
                t[6][k] = r.phi;
                t[7][k] = r.gamma1;
            }
            return OK;
        } catch (Throwable e) {
            return fail(ws, e, zoneShift);
        }
    }

    /**
     * Bytes the JVM has allocated on the calling thread so far (for the native allocation test).
     *
     * @return bytes, or -1 when the JVM does not measure them
     */
    static long allocatedBytes() {
        com.sun.management.ThreadMXBean bean = Threads.BEAN;
        return bean != null ? bean.getCurrentThreadAllocatedBytes() : -1;
    }

    /** The thread bean, looked up on first use (not on the hot path). */
    private static final class Threads {
        static final com.sun.management.ThreadMXBean BEAN = find();

        private static com.sun.management.ThreadMXBean find() {
            ThreadMXBean bean = ManagementFactory.getThreadMXBean();
            return bean instanceof com.sun.management.ThreadMXBean sun && sun.isThreadAllocatedMemorySupported()
                    ? sun : null;
        }
    }

    static int code(Regime regime) {
        return switch (regime) {
            case RADIATIVE -> RADIATIVE;
            case CONVECTIVE -> CONVECTIVE;
            case SEMICONVECTIVE -> SEMICONVECTIVE;
            case THERMOHALINE -> THERMOHALINE;
        };
    }

    static int code(OpacityStatus status) {
        return switch (status) {
            case INSIDE -> INSIDE;
            case CLAMPED -> CLAMPED;
            case EXTRAPOLATED -> EXTRAPOLATED;
        };
    }

    /**
     * Turns anything thrown into a status and a message; a refused zone is renumbered for the
     * host (chunk start plus the host's first zone number).
     */
    static int fail(Workspace ws, Throwable e, int zoneShift) {
        try {
            if (e instanceof InvalidInputException bad) {
                ws.message = bad.zone() == InvalidInputException.NO_ZONE ? bad.getMessage()
                        : new InvalidInputException(bad.field(), bad.value(), bad.unit(), bad.zone() + zoneShift,
                        bad.requirement()).getMessage();
                return INVALID_INPUT;
            }
            ws.message = e.getMessage() != null && e instanceof TransportException ? e.getMessage() : e.toString();
            if (e instanceof InvalidOptionException) {
                return INVALID_OPTION;
            }
            if (e instanceof DiscoveryException) {
                return UNKNOWN_MODEL;
            }
            if (e instanceof DataFormatException) {
                return DATA_FORMAT;
            }
            if (e instanceof TransportException) {
                return INVALID_INPUT;
            }
            if (e instanceof LinkageError) {
                ws.message = e + "; a jar of the library is missing or from another version (transport-spi, "
                        + "transport-core and transport-native must come from the same build)";
                return NO_CLASSES;
            }
            return JAVA_ERROR;
        } catch (Throwable inner) {
            // out of memory while formatting: a fixed message
            ws.message = "java error while reporting an error";
            return JAVA_ERROR;
        }
    }
}
