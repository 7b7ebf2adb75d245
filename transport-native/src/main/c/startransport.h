/*
 * startransport.h: the C interface of startransport (stellar energy transport).
 *
 * A session starts a Java virtual machine inside the host process (JNI Invocation API), or
 * attaches to the one already running there, and discovers the library's models. Models are
 * created by family, name and options, the same names and options as the Java SPI and as
 * `startransport models` lists. Each call takes a whole batch of zones as host arrays and crosses
 * into Java once per chunk of zones, never once per zone.
 *
 * Units: cgs throughout, temperatures in K (the units of the Java SPI; each field says its own).
 *
 * Errors: every call returns a status (enum stt_status). When a call fails and `message` is not
 * NULL, the library's message (field, value, unit, zone, what a valid value is) is written to
 * `message`, NUL-terminated and cut to `message_size` bytes; on success message[0] is set to 0.
 * Zone numbers in messages count in the host's numbering: from the `zone_origin` given to
 * stt_open (0 from C, 1 from Fortran). No Java exception ever reaches the host.
 *
 * Threads: every call may be made from several host threads at once (OpenMP style) with the
 * same models; each thread is attached to the JVM on its first call and detached when it exits.
 * A thread's working arrays are made on its first call and reused: in steady state a call
 * allocates nothing, in C or in Java.
 *
 * Arrays: input and output arrays hold n doubles (or ints), the Jacobian blocks n times their
 * per-zone size; an output pointer left NULL is not written. Inputs and outputs must not overlap.
 * On failure the outputs are unspecified.
 *
 * Signals: the JVM uses SIGSEGV, SIGBUS, SIGFPE and a few others for its own purposes. A host that
 * installs handlers for those after stt_open must chain to the JVM's handlers, or run with
 * LD_PRELOAD=$JAVA_HOME/lib/libjsig.so (the JVM's signal chaining). SIGINT, SIGTERM and SIGQUIT stay
 * the host's (the JVM is started with -Xrs).
 *
 * Compile and link a host:
 *   cc -I<dir>/include host.c -L<dir> -lstartransport -Wl,-rpath,<dir>
 * where <dir> holds libstartransport.so and, beside it, the library's jars.
 */
#ifndef STARTRANSPORT_H
#define STARTRANSPORT_H

#include <stddef.h>

#ifdef __cplusplus
extern "C" {
#endif

/** Status of every call. */
enum stt_status {
    STT_OK = 0,              /* success */
    STT_INVALID_INPUT = 1,   /* a zone's input was refused: the message names field, value, unit, zone */
    STT_INVALID_OPTION = 2,  /* a model option is unknown or malformed */
    STT_UNKNOWN_MODEL = 3,   /* no model of that name (the message lists the names found) */
    STT_DATA_FORMAT = 4,     /* a data file named in the options (opacity table) is malformed */
    STT_NO_JVM = 5,          /* no Java virtual machine found or started (message: where we looked, the fix) */
    STT_NO_CLASSES = 6,      /* the library's jars were not found (message: where we looked, the fix) */
    STT_BAD_ARGUMENT = 7,    /* NULL pointer, negative count, a model of another family, no session */
    STT_JAVA_ERROR = 8,      /* any other Java error (out of memory, a provider's bug) */
    STT_NO_MEMORY = 9,       /* the C side could not allocate its per-thread or per-model state */
    STT_NO_THREAD = 10       /* the calling thread could not be attached to the JVM */
};

/** Regime codes (stability and convection outputs). */
enum stt_regime {
    STT_RADIATIVE = 0,
    STT_CONVECTIVE = 1,
    STT_SEMICONVECTIVE = 2,
    STT_THERMOHALINE = 3
};

/** What an opacity lookup did with its point. */
enum stt_opacity_status {
    STT_INSIDE = 0,
    STT_CLAMPED = 1,
    STT_EXTRAPOLATED = 2
};

/** Inputs of a derivative (the Java ZoneInput indices). */
enum stt_input {
    STT_T = 0, STT_RHO = 1, STT_P = 2, STT_L = 3, STT_M = 4, STT_R = 5, STT_KAPPA = 6, STT_CP = 7,
    STT_NABLA_AD = 8, STT_DELTA = 9, STT_NABLA_MU = 10, STT_PHI = 11, STT_ALPHA = 12,
    STT_INPUTS = 13
};

/** Outputs of the convection Jacobian, in their block order. */
enum stt_convection_output {
    STT_D_NABLA = 0,                /* d nabla */
    STT_D_VELOCITY = 1,             /* d v_conv (cm s^-1 per unit of the input) */
    STT_D_CONVECTIVE_FRACTION = 2,  /* d (F_conv / F) */
    STT_D_DIFFUSION = 3,            /* d D (cm^2 s^-1 per unit of the input) */
    STT_CONVECTION_OUTPUTS = 4
};

/** Outputs of the stability Jacobian, in their block order. */
enum stt_stability_output {
    STT_D_NABLA_RAD = 0,
    STT_D_NABLA_LEDOUX = 1,
    STT_STABILITY_OUTPUTS = 2
};

/*
 * Zone-major Jacobian blocks: zone k's derivatives are contiguous, the order a Newton solver
 * assembles. Convection: n * 4 * 13 doubles; d(output o)/d(input i) of zone k at
 * STT_CONVECTION_INDEX(k, o, i) = (k * 4 + o) * 13 + i. Stability: n * 2 * 13 doubles at
 * STT_STABILITY_INDEX(k, o, i). Plain partial derivatives with every other input fixed. In
 * Fortran, the same block is jacobian(13, 4, n), read as jacobian(i + 1, o + 1, k + 1).
 */
#define STT_CONVECTION_INDEX(k, o, i) ((((size_t)(k)) * STT_CONVECTION_OUTPUTS + (size_t)(o)) * STT_INPUTS + (size_t)(i))
#define STT_STABILITY_INDEX(k, o, i) ((((size_t)(k)) * STT_STABILITY_OUTPUTS + (size_t)(o)) * STT_INPUTS + (size_t)(i))

/**
 * A batch of zones as host columns. Each call reads only the columns it needs (see the call);
 * those must not be NULL. Columns a call reads but the host leaves NULL take a default:
 * phi = 1 (ideal gas), everything else 0.
 */
typedef struct stt_zones {
    const double *radius;       /* r (cm), > 0 */
    const double *mass;         /* m, mass inside r (g), > 0 */
    const double *temperature;  /* T (K), > 0 */
    const double *density;      /* rho (g cm^-3), > 0 */
    const double *pressure;     /* P, total pressure (dyn cm^-2), > 0 */
    const double *luminosity;   /* L (erg s^-1), finite, may be negative */
    const double *opacity;      /* kappa, Rosseland mean (cm^2 g^-1), > 0 */
    const double *cp;           /* c_P (erg g^-1 K^-1), > 0 */
    const double *nabla_ad;     /* adiabatic gradient, in (0, 1) */
    const double *delta;        /* -(d ln rho / d ln T)_{P,mu}, > 0 */
    const double *nabla_mu;     /* d ln mu / d ln P, finite (NULL: 0) */
    const double *phi;          /* (d ln rho / d ln mu)_{P,T}, > 0 (NULL: 1) */
    const double *hydrogen;     /* X, mass fraction */
    const double *metals;       /* Z, mass fraction */
} stt_zones;

/** Outputs of stt_thermodynamics. */
typedef struct stt_thermo_out {
    double *mu;        /* mean molecular weight */
    double *beta;      /* P_gas / P */
    double *pressure;  /* P (dyn cm^-2) */
    double *nabla_ad;  /* adiabatic gradient */
    double *cp;        /* c_P (erg g^-1 K^-1) */
    double *delta;     /* -(d ln rho / d ln T)_{P,mu} */
    double *phi;       /* (d ln rho / d ln mu)_{P,T} */
    double *gamma1;    /* first adiabatic exponent */
} stt_thermo_out;

/** Outputs of stt_opacity. */
typedef struct stt_opacity_out {
    double *kappa;           /* Rosseland mean opacity (cm^2 g^-1) */
    double *dlnkappa_dlnrho; /* (d ln kappa / d ln rho) at fixed T */
    double *dlnkappa_dlnt;   /* (d ln kappa / d ln T) at fixed rho */
    int *status;             /* enum stt_opacity_status */
} stt_opacity_out;

/** Outputs of stt_stability. */
typedef struct stt_stability_out {
    int *regime;                    /* enum stt_regime */
    double *nabla_rad;              /* radiative gradient */
    double *nabla_ad;               /* adiabatic gradient as given */
    double *nabla_ledoux;           /* nabla_ad + (phi / delta) nabla_mu */
    double *margin_schwarzschild;   /* nabla_rad - nabla_ad */
    double *margin_ledoux;          /* nabla_rad - nabla_L */
} stt_stability_out;

/** Outputs of stt_convection. */
typedef struct stt_convection_out {
    int *regime;                 /* enum stt_regime */
    double *nabla_rad;           /* radiative gradient */
    double *nabla;               /* actual temperature gradient */
    double *nabla_element;       /* gradient inside a rising element */
    double *velocity;            /* convective velocity (cm s^-1) */
    double *convective_fraction; /* F_conv / F */
    double *radiative_fraction;  /* F_rad / F */
    double *efficiency;          /* Gamma */
    double *loss_parameter;      /* U */
    double *scale_height;        /* H_P (cm) */
    double *mixing_length;       /* l (cm) */
    double *diffusion;           /* mixing diffusion coefficient D (cm^2 s^-1) */
} stt_convection_out;

typedef struct stt_session stt_session;
typedef struct stt_model stt_model;

/**
 * Opens a session: finds or attaches to the process's JVM and discovers the library.
 *
 * The JVM (libjvm.so) is looked for, in this order: `jvm_library` (a libjvm.so or a Java home
 * directory); the environment variable STARTRANSPORT_JVM (the same); $JAVA_HOME; the `java` found
 * on PATH. The first session of a process starts the JVM; it lives until the process exits
 * (a JVM cannot be started twice in one process). A JVM already running in the process (a Java
 * host, or another library) is attached to instead. Extra JVM options may be given in
 * STARTRANSPORT_JVM_OPTIONS (space separated); -Xrs is always set, so that the host keeps its own
 * handling of SIGINT, SIGTERM and SIGQUIT.
 *
 * The jars are looked for, in this order: `class_path` (a Java class path: entries separated by
 * ':', a directory standing for the .jar files in it, or for itself when it holds none); the
 * environment variable STARTRANSPORT_CLASSPATH (the same); the directory holding
 * libstartransport.so. The first session decides the JVM and class path of the process.
 *
 * @param jvm_library  libjvm.so or Java home, or NULL
 * @param class_path   class path, or NULL
 * @param zone_origin  the host's first zone number in messages (0 in C, 1 in Fortran)
 * @param session      receives the session
 * @return STT_OK, STT_NO_JVM, STT_NO_CLASSES, ...
 */
int stt_open(const char *jvm_library, const char *class_path, int zone_origin, stt_session **session,
             char *message, size_t message_size);

/** Closes a session (its models must be freed first). The JVM stays for the process's lifetime. */
void stt_close(stt_session *session);

/**
 * Creates a model, as the SPI's Transport.model(family, name, options) does.
 *
 * @param family   "stability", "thermodynamics", "convection" or "opacity"
 * @param name     a model name such as "local-mixing-length" (or "provider/model"); NULL or "" for
 *                 the family's default
 * @param options  options such as "alpha=1.8,criterion=ledoux"; NULL or "" for the defaults
 * @param model    receives the model (immutable, thread-safe)
 */
int stt_model_create(stt_session *session, const char *family, const char *name, const char *options,
                     stt_model **model, char *message, size_t message_size);

/** Frees a model. */
void stt_model_free(stt_model *model);

/** Writes the model's name and options, e.g. "local-mixing-length(alpha=1.8, ...)", into `text`. */
int stt_model_describe(const stt_model *model, char *text, size_t text_size);

/**
 * Thermodynamics of n zones. Reads temperature, density, hydrogen, metals.
 */
int stt_thermodynamics(const stt_model *model, int n, const stt_zones *in, const stt_thermo_out *out,
                       char *message, size_t message_size);

/**
 * Opacity of n zones, kappa and both logarithmic derivatives. Reads temperature, density,
 * hydrogen, metals.
 */
int stt_opacity(const stt_model *model, int n, const stt_zones *in, const stt_opacity_out *out,
                char *message, size_t message_size);

/**
 * Stability test of n zones. Reads temperature, density, pressure, luminosity, mass, opacity,
 * nabla_ad, delta (required) and nabla_mu, phi (optional).
 *
 * @param jacobian  NULL, or n * 2 * 13 doubles: d nabla_rad and d nabla_L, zone-major
 */
int stt_stability(const stt_model *model, int n, const stt_zones *in, const stt_stability_out *out,
                  double *jacobian, char *message, size_t message_size);

/**
 * Convection of n zones. Reads radius, mass, temperature, density, pressure, luminosity, opacity,
 * cp, nabla_ad, delta (required) and nabla_mu, phi (optional).
 *
 * @param jacobian  NULL for the values only, or n * 4 * 13 doubles: d nabla, d v_conv,
 *                  d (F_conv / F) and d D with respect to each input, zone-major
 */
int stt_convection(const stt_model *model, int n, const stt_zones *in, const stt_convection_out *out,
                   double *jacobian, char *message, size_t message_size);

/** @return the name of a status code, e.g. "STT_INVALID_INPUT" */
const char *stt_status_name(int status);

/**
 * Bytes the JVM has allocated on the calling thread so far (for allocation tests), or -1 when the
 * JVM does not count them or no session is open.
 */
long long stt_java_allocated_bytes(void);

/** Number of heap allocations this library has made so far, on all threads (for allocation tests). */
long long stt_native_allocations(void);

#ifdef __cplusplus
}
#endif

#endif /* STARTRANSPORT_H */
