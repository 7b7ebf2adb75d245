/*
 * startransport.c: the C interface of startransport over the JNI Invocation API.
 *
 * How a batch call runs (stt_convection and the others alike):
 *   1. The calling thread's state (thread_state) is found in a thread-local pointer; on the
 *      thread's first call it is attached to the JVM and given a Java Workspace: arrays for one
 *      chunk of zones, held here through global references. Nothing is allocated after that.
 *   2. For each chunk of up to CHUNK zones (Workspace.CHUNK, 256): each host column the call reads
 *      is copied into the workspace (the Java array pinned with GetPrimitiveArrayCritical, then
 *      memcpy); one static Java method runs the SPI's batch call over the chunk; each requested
 *      output is copied back the same way. A chunk's arrays stay in cache between the Java call
 *      and the copies. No JNI crossing per zone, no allocation per call. The convection Jacobian,
 *      four fifths of the bytes, is not copied: a direct ByteBuffer over the host's array (made
 *      once while the host passes the same array, see host_jacobian) lets the kernel store each
 *      entry straight into host memory (ConvectionModel.solveZoneMajorInto).
 *   3. A failure comes back as a status code from Java, with the message (zone renumbered for
 *      the host) in the workspace; a Java exception that escapes anyway is cleared here and
 *      reported as STT_JAVA_ERROR. No exception is ever left pending for the host.
 */
#define _GNU_SOURCE
#include "startransport.h"

#include <jni.h>

#include <dirent.h>
#include <dlfcn.h>
#include <errno.h>
#include <limits.h>
#include <pthread.h>
#include <stdarg.h>
#include <stdatomic.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

#define BRIDGE_CLASS "io/github/startransport/bridge/NativeBridge"
#define BRIDGE_CLASS_DOTTED "io.github.startransport.bridge.NativeBridge"
#define WORKSPACE_SIG "Lio/github/startransport/bridge/Workspace;"
#define JNI_VERSION JNI_VERSION_1_8

/* Family codes, as in NativeBridge. */
enum { FAMILY_STABILITY = 0, FAMILY_THERMODYNAMICS = 1, FAMILY_CONVECTION = 2, FAMILY_OPACITY = 3 };

/* Positions in Workspace.arrays(); see its javadoc. */
enum {
    A_IN = 0,            /* 14 input columns, stt_zones order */
    A_CONV = 14,         /* 11 convection value columns, stt_convection_out order without regime */
    A_STAB = 25,         /* 5 stability value columns */
    A_OPAC = 30,         /* 3 opacity columns */
    A_THERMO = 33,       /* 8 thermodynamics columns */
    A_CODES = 41,        /* int codes */
    A_CONV_JAC = 42,     /* convection Jacobian block */
    A_STAB_JAC = 43,     /* stability Jacobian block */
    A_COUNT = 44
};
enum { INPUT_COUNT = 14, IN_RADIUS = 0, IN_MASS, IN_T, IN_RHO, IN_P, IN_L, IN_KAPPA, IN_CP, IN_NABLA_AD, IN_DELTA,
       IN_NABLA_MU, IN_PHI, IN_X, IN_Z };

struct stt_session {
    int zone_origin;
};

struct stt_model {
    jobject object;  /* global reference */
    int family;
    int zone_origin;
};

/* One host thread's state. */
struct thread_state {
    JNIEnv *env;
    int attached_here;
    jobject workspace;     /* global reference */
    jarray arrays[A_COUNT];  /* global references */
    /* a direct ByteBuffer over the host's last convection Jacobian array (global reference), and that array */
    jobject host_jacobian;
    const double *host_jacobian_data;
    size_t host_jacobian_zones;
};

/* Process-wide state, set up by the first successful stt_open. */
static struct {
    pthread_mutex_t lock;
    int ready;
    JavaVM *vm;
    jclass bridge;
    jmethodID open, workspace, arrays, create, describe, convection, convection_direct, stability, opacity,
            thermodynamics, allocated;
    jfieldID message, family;
    int chunk;
    int sessions;
} g = {PTHREAD_MUTEX_INITIALIZER, 0, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL,
       NULL, NULL, NULL, 0, 0};

static atomic_llong allocations;
static __thread struct thread_state *current;
static pthread_key_t thread_key;
static pthread_once_t key_once = PTHREAD_ONCE_INIT;

static void *counted_calloc(size_t n, size_t size) {
    atomic_fetch_add(&allocations, 1);
    return calloc(n, size);
}

static void *counted_malloc(size_t size) {
    atomic_fetch_add(&allocations, 1);
    return malloc(size);
}

long long stt_native_allocations(void) {
    return atomic_load(&allocations);
}

/* ---- messages ---------------------------------------------------------------------------- */

static void clear_message(char *message, size_t size) {
    if (message != NULL && size > 0) {
        message[0] = '\0';
    }
}

/* Copies text into the caller's buffer, cut at a UTF-8 character boundary. */
static void copy_text(const char *text, char *message, size_t size) {
    if (message == NULL || size == 0) {
        return;
    }
    size_t n = strlen(text);
    if (n >= size) {
        n = size - 1;
        while (n > 0 && (((unsigned char) text[n]) & 0xC0) == 0x80) {
            n--;
        }
    }
    memcpy(message, text, n);
    message[n] = '\0';
}

static int fail(int status, char *message, size_t size, const char *format, ...) {
    if (message != NULL && size > 0) {
        va_list args;
        va_start(args, format);
        vsnprintf(message, size, format, args);
        va_end(args);
    }
    return status;
}

static void copy_jstring(JNIEnv *env, jstring s, char *message, size_t size) {
    if (s == NULL) {
        copy_text("(no message)", message, size);
        return;
    }
    const char *utf = (*env)->GetStringUTFChars(env, s, NULL);
    if (utf == NULL) {
        (*env)->ExceptionClear(env);
        copy_text("(message could not be read)", message, size);
        return;
    }
    copy_text(utf, message, size);
    (*env)->ReleaseStringUTFChars(env, s, utf);
}

/* Clears a pending Java exception and writes its toString() into the message. */
static int java_exception(JNIEnv *env, int status, const char *context, char *message, size_t size) {
    jthrowable e = (*env)->ExceptionOccurred(env);
    (*env)->ExceptionClear(env);
    char text[1024];
    snprintf(text, sizeof text, "%s: a Java exception", context);
    if (e != NULL) {
        jclass object = (*env)->FindClass(env, "java/lang/Object");
        jmethodID to_string = object == NULL ? NULL
                : (*env)->GetMethodID(env, object, "toString", "()Ljava/lang/String;");
        jstring s = to_string == NULL ? NULL : (jstring) (*env)->CallObjectMethod(env, e, to_string);
        if ((*env)->ExceptionCheck(env)) {
            (*env)->ExceptionClear(env);
            s = NULL;
        }
        if (s != NULL) {
            char inner[900];
            copy_jstring(env, s, inner, sizeof inner);
            snprintf(text, sizeof text, "%s: %s", context, inner);
            (*env)->DeleteLocalRef(env, s);
        }
        if (object != NULL) {
            (*env)->DeleteLocalRef(env, object);
        }
        (*env)->DeleteLocalRef(env, e);
    }
    if (strstr(text, "UnsupportedClassVersionError") != NULL) {
        return fail(STT_NO_JVM, message, size, "%s; the library needs Java 17 or newer: point STARTRANSPORT_JVM "
                    "or JAVA_HOME at a newer Java", text);
    }
    if (strstr(text, "NoClassDefFoundError") != NULL || strstr(text, "ClassNotFoundException") != NULL) {
        status = STT_NO_CLASSES;
    }
    copy_text(text, message, size);
    return status;
}

/* Reads the workspace's message (left by a failed Java call) into the caller's buffer. */
static void workspace_message(JNIEnv *env, jobject ws, char *message, size_t size) {
    jstring s = (jstring) (*env)->GetObjectField(env, ws, g.message);
    copy_jstring(env, s, message, size);
    if (s != NULL) {
        (*env)->DeleteLocalRef(env, s);
    }
    (*env)->SetObjectField(env, ws, g.message, NULL);
}

const char *stt_status_name(int status) {
    switch (status) {
    case STT_OK: return "STT_OK";
    case STT_INVALID_INPUT: return "STT_INVALID_INPUT";
    case STT_INVALID_OPTION: return "STT_INVALID_OPTION";
    case STT_UNKNOWN_MODEL: return "STT_UNKNOWN_MODEL";
    case STT_DATA_FORMAT: return "STT_DATA_FORMAT";
    case STT_NO_JVM: return "STT_NO_JVM";
    case STT_NO_CLASSES: return "STT_NO_CLASSES";
    case STT_BAD_ARGUMENT: return "STT_BAD_ARGUMENT";
    case STT_JAVA_ERROR: return "STT_JAVA_ERROR";
    case STT_NO_MEMORY: return "STT_NO_MEMORY";
    case STT_NO_THREAD: return "STT_NO_THREAD";
    default: return "STT_UNKNOWN_STATUS";
    }
}

/* ---- finding the JVM --------------------------------------------------------------------- */

static int is_file(const char *path) {
    struct stat st;
    return stat(path, &st) == 0 && S_ISREG(st.st_mode);
}

static int is_dir(const char *path) {
    struct stat st;
    return stat(path, &st) == 0 && S_ISDIR(st.st_mode);
}

/* Appends to a report, keeping it NUL-terminated. */
static void report(char *buf, size_t size, const char *format, ...) {
    size_t used = strlen(buf);
    if (used + 1 >= size) {
        return;
    }
    va_list args;
    va_start(args, format);
    vsnprintf(buf + used, size - used, format, args);
    va_end(args);
}

/*
 * Looks for libjvm.so given a path that is either the library itself or a Java home.
 * Writes what it tried into the report; returns 1 and the path in `found` when it exists.
 */
static int jvm_from(const char *where, const char *path, char *found, size_t found_size, char *rep, size_t rep_size) {
    static const char *const under_home[] = {
        "/lib/server/libjvm.so", "/jre/lib/server/libjvm.so", "/jre/lib/amd64/server/libjvm.so",
        "/lib/client/libjvm.so"
    };
    if (is_file(path)) {
        snprintf(found, found_size, "%s", path);
        return 1;
    }
    if (!is_dir(path)) {
        report(rep, rep_size, "; %s: %s does not exist", where, path);
        return 0;
    }
    for (size_t i = 0; i < sizeof under_home / sizeof under_home[0]; i++) {
        char candidate[PATH_MAX];
        snprintf(candidate, sizeof candidate, "%s%s", path, under_home[i]);
        if (is_file(candidate)) {
            snprintf(found, found_size, "%s", candidate);
            return 1;
        }
    }
    report(rep, rep_size, "; %s: no libjvm.so under %s (tried lib/server, jre/lib/server, jre/lib/amd64/server, "
           "lib/client)", where, path);
    return 0;
}

/* Finds libjvm.so: argument, STARTRANSPORT_JVM, JAVA_HOME, java on PATH. */
static int find_jvm(const char *argument, char *found, size_t found_size, char *message, size_t size) {
    char rep[3072] = "";
    if (argument != NULL && argument[0] != '\0') {
        if (jvm_from("jvm_library argument", argument, found, found_size, rep, sizeof rep)) {
            return STT_OK;
        }
        return fail(STT_NO_JVM, message, size, "no Java virtual machine found: looked for libjvm.so in%s; fix: pass "
                    "the path of a Java 17 (or newer) libjvm.so or Java home as jvm_library", rep + 1);
    }
    report(rep, sizeof rep, "; jvm_library argument: not given");
    const char *env = getenv("STARTRANSPORT_JVM");
    if (env != NULL && env[0] != '\0') {
        if (jvm_from("STARTRANSPORT_JVM", env, found, found_size, rep, sizeof rep)) {
            return STT_OK;
        }
    } else {
        report(rep, sizeof rep, "; STARTRANSPORT_JVM: not set");
    }
    const char *home = getenv("JAVA_HOME");
    if (home != NULL && home[0] != '\0') {
        if (jvm_from("JAVA_HOME", home, found, found_size, rep, sizeof rep)) {
            return STT_OK;
        }
    } else {
        report(rep, sizeof rep, "; JAVA_HOME: not set");
    }
    const char *path = getenv("PATH");
    int java_seen = 0;
    if (path != NULL) {
        const char *p = path;
        while (*p != '\0') {
            const char *end = strchr(p, ':');
            size_t len = end == NULL ? strlen(p) : (size_t) (end - p);
            char java[PATH_MAX];
            if (len > 0 && len + 6 < sizeof java) {
                snprintf(java, sizeof java, "%.*s/java", (int) len, p);
                char real[PATH_MAX];
                if (access(java, X_OK) == 0 && realpath(java, real) != NULL) {
                    java_seen = 1;
                    /* <home>/bin/java: the home is two levels up */
                    char *slash = strrchr(real, '/');
                    if (slash != NULL) {
                        *slash = '\0';
                        slash = strrchr(real, '/');
                    }
                    if (slash != NULL) {
                        *slash = '\0';
                        char where[PATH_MAX + 32];
                        snprintf(where, sizeof where, "java on PATH (%s)", java);
                        if (jvm_from(where, real, found, found_size, rep, sizeof rep)) {
                            return STT_OK;
                        }
                    }
                }
            }
            if (end == NULL) {
                break;
            }
            p = end + 1;
        }
    }
    if (!java_seen) {
        report(rep, sizeof rep, "; java on PATH: none in PATH=%s", path == NULL ? "(unset)" : path);
    }
    return fail(STT_NO_JVM, message, size, "no Java virtual machine found: looked for libjvm.so in%s; fix: install "
                "Java 17 or newer (e.g. apt-get install openjdk-17-jre-headless), or set STARTRANSPORT_JVM to its "
                "libjvm.so or Java home, or set JAVA_HOME", rep + 1);
}

/* ---- finding the jars -------------------------------------------------------------------- */

struct text {
    char *data;
    size_t length;
    size_t capacity;
};

static int text_add(struct text *t, const char *s) {
    size_t n = strlen(s);
    if (t->length + n + 2 > t->capacity) {
        size_t capacity = (t->length + n + 2) * 2;
        char *bigger = realloc(t->data, capacity);
        atomic_fetch_add(&allocations, 1);
        if (bigger == NULL) {
            return 0;
        }
        t->data = bigger;
        t->capacity = capacity;
    }
    if (t->length > 0) {
        t->data[t->length++] = ':';
    }
    memcpy(t->data + t->length, s, n + 1);
    t->length += n;
    return 1;
}

static int jar_name(const struct dirent *e) {
    size_t n = strlen(e->d_name);
    return n > 4 && strcmp(e->d_name + n - 4, ".jar") == 0;
}

/* Adds the jars of a directory, sorted by name; returns how many. */
static int add_jars(struct text *t, const char *dir, int *ok) {
    struct dirent **list = NULL;
    int n = scandir(dir, &list, jar_name, alphasort);
    if (n < 0) {
        return 0;
    }
    for (int i = 0; i < n; i++) {
        char path[PATH_MAX];
        snprintf(path, sizeof path, "%s/%s", dir, list[i]->d_name);
        if (!text_add(t, path)) {
            *ok = 0;
        }
        free(list[i]);
    }
    free(list);
    return n;
}

/* Expands a class path: a directory holding jars stands for them. Every entry must exist. */
static int expand_class_path(const char *where, const char *value, struct text *out, char *message, size_t size) {
    const char *p = value;
    int ok = 1;
    while (1) {
        const char *end = strchr(p, ':');
        size_t len = end == NULL ? strlen(p) : (size_t) (end - p);
        if (len > 0) {
            char entry[PATH_MAX];
            snprintf(entry, sizeof entry, "%.*s", (int) len, p);
            size_t el = strlen(entry);
            if (el >= 2 && strcmp(entry + el - 2, "/*") == 0) {
                entry[el - 2] = '\0';
            }
            if (is_dir(entry)) {
                if (add_jars(out, entry, &ok) == 0) {
                    ok &= text_add(out, entry);
                }
            } else if (is_file(entry)) {
                ok &= text_add(out, entry);
            } else {
                return fail(STT_NO_CLASSES, message, size, "class path entry %s (from %s) does not exist; fix: give "
                            "the directory holding the library's jars (transport-native, transport-spi, "
                            "transport-core, commons-math3) or the jars themselves", entry, where);
            }
        }
        if (end == NULL) {
            break;
        }
        p = end + 1;
    }
    if (!ok) {
        return fail(STT_NO_MEMORY, message, size, "out of memory while building the class path");
    }
    return STT_OK;
}

/* The class path: argument, STARTRANSPORT_CLASSPATH, or the jars beside libstartransport.so. */
static int find_class_path(const char *argument, struct text *out, char *from, size_t from_size, char *message,
                           size_t size) {
    if (argument != NULL && argument[0] != '\0') {
        snprintf(from, from_size, "the class_path argument");
        return expand_class_path(from, argument, out, message, size);
    }
    const char *env = getenv("STARTRANSPORT_CLASSPATH");
    if (env != NULL && env[0] != '\0') {
        snprintf(from, from_size, "STARTRANSPORT_CLASSPATH");
        return expand_class_path(from, env, out, message, size);
    }
    Dl_info info;
    char dir[PATH_MAX] = "(unknown)";
    if (dladdr((void *) &stt_open, &info) != 0 && info.dli_fname != NULL) {
        char real[PATH_MAX];
        if (realpath(info.dli_fname, real) != NULL) {
            char *slash = strrchr(real, '/');
            if (slash != NULL) {
                *slash = '\0';
            }
            snprintf(dir, sizeof dir, "%s", real);
        }
    }
    int ok = 1;
    snprintf(from, from_size, "the directory of libstartransport.so (%s)", dir);
    if (add_jars(out, dir, &ok) > 0) {
        return ok ? STT_OK : fail(STT_NO_MEMORY, message, size, "out of memory while building the class path");
    }
    return fail(STT_NO_CLASSES, message, size, "the library's jars were not found: looked in the class_path argument "
                "(not given), STARTRANSPORT_CLASSPATH (not set) and the directory of libstartransport.so (%s: no .jar "
                "file); fix: put the jars of transport-native, transport-spi, transport-core and commons-math3 beside "
                "libstartransport.so (transport-native/target/native after mvn package), or set "
                "STARTRANSPORT_CLASSPATH to them", dir);
}

/* ---- starting or attaching the JVM -------------------------------------------------------- */

typedef jint (JNICALL *created_vms_fn)(JavaVM **, jsize, jsize *);
typedef jint (JNICALL *create_vm_fn)(JavaVM **, void **, void *);

/* A JVM already running in this process, if its libjvm is loaded. */
static JavaVM *existing_vm(void) {
    created_vms_fn created = (created_vms_fn) dlsym(RTLD_DEFAULT, "JNI_GetCreatedJavaVMs");
    if (created == NULL) {
        void *handle = dlopen("libjvm.so", RTLD_LAZY | RTLD_NOLOAD);
        if (handle != NULL) {
            created = (created_vms_fn) dlsym(handle, "JNI_GetCreatedJavaVMs");
        }
    }
    if (created == NULL) {
        return NULL;
    }
    JavaVM *vm = NULL;
    jsize count = 0;
    if (created(&vm, 1, &count) != JNI_OK || count < 1) {
        return NULL;
    }
    return vm;
}

static int start_jvm(const char *jvm_argument, const char *class_path, JNIEnv **env, char *message, size_t size) {
    char library[PATH_MAX];
    int status = find_jvm(jvm_argument, library, sizeof library, message, size);
    if (status != STT_OK) {
        return status;
    }
    void *handle = dlopen(library, RTLD_NOW | RTLD_GLOBAL);
    if (handle == NULL) {
        const char *why = dlerror();
        return fail(STT_NO_JVM, message, size, "found %s but could not load it: %s; fix: point STARTRANSPORT_JVM at "
                    "the libjvm.so of a Java 17 (or newer) for this machine's architecture", library,
                    why == NULL ? "unknown error" : why);
    }
    create_vm_fn create = (create_vm_fn) dlsym(handle, "JNI_CreateJavaVM");
    if (create == NULL) {
        return fail(STT_NO_JVM, message, size, "%s has no JNI_CreateJavaVM: not a Java virtual machine; fix: point "
                    "STARTRANSPORT_JVM at the libjvm.so of a Java 17 (or newer)", library);
    }
    /* options: class path, -Xrs, and STARTRANSPORT_JVM_OPTIONS split at spaces */
    JavaVMOption options[34];
    int count = 0;
    size_t cp_size = strlen(class_path) + 32;
    char *cp = counted_malloc(cp_size);
    const char *extra = getenv("STARTRANSPORT_JVM_OPTIONS");
    char *extra_copy = extra == NULL ? NULL : strdup(extra);
    if (cp == NULL || (extra != NULL && extra_copy == NULL)) {
        free(cp);
        free(extra_copy);
        return fail(STT_NO_MEMORY, message, size, "out of memory while starting the JVM");
    }
    snprintf(cp, cp_size, "-Djava.class.path=%s", class_path);
    options[count++].optionString = cp;
    options[count++].optionString = "-Xrs";
    if (extra_copy != NULL) {
        atomic_fetch_add(&allocations, 1);
        char *save = NULL;
        for (char *tok = strtok_r(extra_copy, " \t", &save); tok != NULL && count < 34;
             tok = strtok_r(NULL, " \t", &save)) {
            options[count++].optionString = tok;
        }
    }
    for (int i = 0; i < count; i++) {
        options[i].extraInfo = NULL;
    }
    JavaVMInitArgs args;
    args.version = JNI_VERSION;
    args.nOptions = count;
    args.options = options;
    args.ignoreUnrecognized = JNI_FALSE;
    JavaVM *vm = NULL;
    jint rc = create(&vm, (void **) env, &args);
    free(cp);
    free(extra_copy);
    if (rc != JNI_OK) {
        return fail(STT_NO_JVM, message, size, "JNI_CreateJavaVM from %s failed with code %d%s; fix: check "
                    "STARTRANSPORT_JVM_OPTIONS (%s), or the memory available", library, (int) rc,
                    rc == JNI_EINVAL ? " (an invalid option)" : rc == JNI_ENOMEM ? " (out of memory)" :
                    rc == JNI_EEXIST ? " (a JVM was already created in this process)" : "",
                    extra == NULL ? "not set" : extra);
    }
    g.vm = vm;
    return STT_OK;
}

/* Loads the bridge class through a URLClassLoader over the class path (attached JVMs). */
static jclass load_through_url_loader(JNIEnv *env, const char *class_path) {
    jclass file_class = (*env)->FindClass(env, "java/io/File");
    jclass uri_class = (*env)->FindClass(env, "java/net/URI");
    jclass url_class = (*env)->FindClass(env, "java/net/URL");
    jclass loader_class = (*env)->FindClass(env, "java/lang/ClassLoader");
    jclass url_loader_class = (*env)->FindClass(env, "java/net/URLClassLoader");
    if ((*env)->ExceptionCheck(env)) {
        return NULL;
    }
    jmethodID file_init = (*env)->GetMethodID(env, file_class, "<init>", "(Ljava/lang/String;)V");
    jmethodID to_uri = (*env)->GetMethodID(env, file_class, "toURI", "()Ljava/net/URI;");
    jmethodID to_url = (*env)->GetMethodID(env, uri_class, "toURL", "()Ljava/net/URL;");
    jmethodID system_loader = (*env)->GetStaticMethodID(env, loader_class, "getSystemClassLoader",
                                                        "()Ljava/lang/ClassLoader;");
    jmethodID loader_init = (*env)->GetMethodID(env, url_loader_class, "<init>",
                                                "([Ljava/net/URL;Ljava/lang/ClassLoader;)V");
    jmethodID load_class = (*env)->GetMethodID(env, loader_class, "loadClass", "(Ljava/lang/String;)Ljava/lang/Class;");
    if ((*env)->ExceptionCheck(env)) {
        return NULL;
    }
    int entries = 1;
    for (const char *p = class_path; *p != '\0'; p++) {
        entries += *p == ':';
    }
    jobjectArray urls = (*env)->NewObjectArray(env, entries, url_class, NULL);
    if (urls == NULL) {
        return NULL;
    }
    const char *p = class_path;
    for (int i = 0; i < entries; i++) {
        const char *end = strchr(p, ':');
        size_t len = end == NULL ? strlen(p) : (size_t) (end - p);
        char entry[PATH_MAX];
        snprintf(entry, sizeof entry, "%.*s", (int) len, p);
        jstring name = (*env)->NewStringUTF(env, entry);
        jobject file = name == NULL ? NULL : (*env)->NewObject(env, file_class, file_init, name);
        jobject uri = file == NULL ? NULL : (*env)->CallObjectMethod(env, file, to_uri);
        jobject url = uri == NULL ? NULL : (*env)->CallObjectMethod(env, uri, to_url);
        if ((*env)->ExceptionCheck(env) || url == NULL) {
            return NULL;
        }
        (*env)->SetObjectArrayElement(env, urls, i, url);
        (*env)->DeleteLocalRef(env, name);
        (*env)->DeleteLocalRef(env, file);
        (*env)->DeleteLocalRef(env, uri);
        (*env)->DeleteLocalRef(env, url);
        p = end == NULL ? p + len : end + 1;
    }
    jobject parent = (*env)->CallStaticObjectMethod(env, loader_class, system_loader);
    jobject loader = parent == NULL ? NULL : (*env)->NewObject(env, url_loader_class, loader_init, urls, parent);
    if (loader == NULL) {
        return NULL;
    }
    jstring name = (*env)->NewStringUTF(env, BRIDGE_CLASS_DOTTED);
    return name == NULL ? NULL : (jclass) (*env)->CallObjectMethod(env, loader, load_class, name);
}

static int bind_bridge(JNIEnv *env, jclass bridge, char *message, size_t size) {
    g.bridge = (jclass) (*env)->NewGlobalRef(env, bridge);
    g.open = (*env)->GetStaticMethodID(env, bridge, "open", "(" WORKSPACE_SIG ")I");
    g.workspace = (*env)->GetStaticMethodID(env, bridge, "workspace", "()" WORKSPACE_SIG);
    g.create = (*env)->GetStaticMethodID(env, bridge, "create", "(" WORKSPACE_SIG
                                         "Ljava/lang/String;Ljava/lang/String;Ljava/lang/String;)Ljava/lang/Object;");
    g.describe = (*env)->GetStaticMethodID(env, bridge, "describe", "(Ljava/lang/Object;)Ljava/lang/String;");
    g.convection = (*env)->GetStaticMethodID(env, bridge, "convection", "(" WORKSPACE_SIG
                                             "Lio/github/startransport/spi/ConvectionModel;IIZI)I");
    g.convection_direct = (*env)->GetStaticMethodID(env, bridge, "convectionDirect", "(" WORKSPACE_SIG
                                                    "Lio/github/startransport/spi/ConvectionModel;IIILjava/nio/ByteBuffer;I)I");
    g.stability = (*env)->GetStaticMethodID(env, bridge, "stability", "(" WORKSPACE_SIG
                                            "Lio/github/startransport/spi/StabilityModel;IIZI)I");
    g.opacity = (*env)->GetStaticMethodID(env, bridge, "opacity", "(" WORKSPACE_SIG
                                          "Lio/github/startransport/spi/OpacityModel;II)I");
    g.thermodynamics = (*env)->GetStaticMethodID(env, bridge, "thermodynamics", "(" WORKSPACE_SIG
                                                 "Lio/github/startransport/spi/ThermodynamicsModel;II)I");
    g.allocated = (*env)->GetStaticMethodID(env, bridge, "allocatedBytes", "()J");
    if ((*env)->ExceptionCheck(env) || g.bridge == NULL) {
        return java_exception(env, STT_NO_CLASSES, "the bridge class does not match this libstartransport.so "
                              "(transport-native jar and library from different builds?)", message, size);
    }
    jclass workspace = (*env)->FindClass(env, "io/github/startransport/bridge/Workspace");
    if (workspace == NULL) {
        /* loaded by a URLClassLoader: find it through a workspace object */
        (*env)->ExceptionClear(env);
        jobject ws = (*env)->CallStaticObjectMethod(env, bridge, g.workspace);
        if (ws == NULL || (*env)->ExceptionCheck(env)) {
            return java_exception(env, STT_NO_CLASSES, "cannot make a workspace", message, size);
        }
        workspace = (*env)->GetObjectClass(env, ws);
        (*env)->DeleteLocalRef(env, ws);
    }
    g.arrays = (*env)->GetMethodID(env, workspace, "arrays", "()[Ljava/lang/Object;");
    g.message = (*env)->GetFieldID(env, workspace, "message", "Ljava/lang/String;");
    g.family = (*env)->GetFieldID(env, workspace, "family", "I");
    (*env)->DeleteLocalRef(env, workspace);
    if ((*env)->ExceptionCheck(env)) {
        return java_exception(env, STT_NO_CLASSES, "the Workspace class does not match this libstartransport.so",
                              message, size);
    }
    return STT_OK;
}

/* ---- threads ----------------------------------------------------------------------------- */

static void release_thread(void *p) {
    struct thread_state *t = p;
    if (t == NULL) {
        return;
    }
    JNIEnv *env = NULL;
    if (g.vm != NULL && (*g.vm)->GetEnv(g.vm, (void **) &env, JNI_VERSION) == JNI_OK) {
        for (int i = 0; i < A_COUNT; i++) {
            if (t->arrays[i] != NULL) {
                (*env)->DeleteGlobalRef(env, t->arrays[i]);
            }
        }
        if (t->workspace != NULL) {
            (*env)->DeleteGlobalRef(env, t->workspace);
        }
        if (t->host_jacobian != NULL) {
            (*env)->DeleteGlobalRef(env, t->host_jacobian);
        }
        if (t->attached_here) {
            (*g.vm)->DetachCurrentThread(g.vm);
        }
    }
    if (current == t) {
        current = NULL;
    }
    free(t);
}

static void make_key(void) {
    pthread_key_create(&thread_key, release_thread);
}

/*
 * The calling thread's state: attached and given its workspace on its first call. Needs g.ready
 * (or the bridge bound, during stt_open).
 */
static int thread_state(struct thread_state **out, char *message, size_t size) {
    struct thread_state *t = current;
    if (t != NULL) {
        *out = t;
        return STT_OK;
    }
    pthread_once(&key_once, make_key);
    JNIEnv *env = NULL;
    int attached_here = 0;
    jint rc = (*g.vm)->GetEnv(g.vm, (void **) &env, JNI_VERSION);
    if (rc == JNI_EDETACHED) {
        JavaVMAttachArgs args = {JNI_VERSION, "startransport-host", NULL};
        if ((*g.vm)->AttachCurrentThreadAsDaemon(g.vm, (void **) &env, &args) != JNI_OK) {
            return fail(STT_NO_THREAD, message, size, "this thread could not be attached to the JVM");
        }
        attached_here = 1;
    } else if (rc != JNI_OK) {
        return fail(STT_NO_THREAD, message, size, "the JVM refused this thread (GetEnv returned %d)", (int) rc);
    }
    t = counted_calloc(1, sizeof *t);
    if (t == NULL) {
        if (attached_here) {
            (*g.vm)->DetachCurrentThread(g.vm);
        }
        return fail(STT_NO_MEMORY, message, size, "out of memory for this thread's state");
    }
    t->env = env;
    t->attached_here = attached_here;
    jobject ws = (*env)->CallStaticObjectMethod(env, g.bridge, g.workspace);
    jobjectArray arrays = ws == NULL ? NULL : (jobjectArray) (*env)->CallObjectMethod(env, ws, g.arrays);
    if ((*env)->ExceptionCheck(env) || arrays == NULL || (*env)->GetArrayLength(env, arrays) != A_COUNT) {
        int status = (*env)->ExceptionCheck(env)
                ? java_exception(env, STT_JAVA_ERROR, "making this thread's workspace", message, size)
                : fail(STT_NO_CLASSES, message, size, "the Workspace class does not match this libstartransport.so");
        release_thread(t);
        return status;
    }
    t->workspace = (*env)->NewGlobalRef(env, ws);
    for (int i = 0; i < A_COUNT; i++) {
        jobject a = (*env)->GetObjectArrayElement(env, arrays, i);
        t->arrays[i] = (jarray) (*env)->NewGlobalRef(env, a);
        (*env)->DeleteLocalRef(env, a);
    }
    (*env)->DeleteLocalRef(env, arrays);
    (*env)->DeleteLocalRef(env, ws);
    if (g.chunk == 0) {
        g.chunk = (int) (*env)->GetArrayLength(env, t->arrays[A_IN]);
    }
    current = t;
    pthread_setspecific(thread_key, t);
    *out = t;
    return STT_OK;
}

/* ---- sessions and models ----------------------------------------------------------------- */

static int open_locked(const char *jvm_library, const char *class_path, char *message, size_t size) {
    JNIEnv *env = NULL;
    JavaVM *vm = g.vm != NULL ? g.vm : existing_vm();
    struct text cp = {NULL, 0, 0};
    char from[PATH_MAX + 64] = "";
    int status;
    jclass bridge = NULL;
    if (vm == NULL) {
        status = find_class_path(class_path, &cp, from, sizeof from, message, size);
        if (status != STT_OK) {
            free(cp.data);
            return status;
        }
        status = start_jvm(jvm_library, cp.data, &env, message, size);
        if (status != STT_OK) {
            free(cp.data);
            return status;
        }
        bridge = (*env)->FindClass(env, BRIDGE_CLASS);
    } else {
        g.vm = vm;
        jint rc = (*vm)->GetEnv(vm, (void **) &env, JNI_VERSION);
        if (rc == JNI_EDETACHED) {
            JavaVMAttachArgs args = {JNI_VERSION, "startransport-host", NULL};
            if ((*vm)->AttachCurrentThreadAsDaemon(vm, (void **) &env, &args) != JNI_OK) {
                return fail(STT_NO_THREAD, message, size, "could not attach to the JVM already in this process");
            }
        }
        bridge = (*env)->FindClass(env, BRIDGE_CLASS);
        if (bridge == NULL) {
            /* the running JVM does not see our jars: load them through a class loader of our own */
            (*env)->ExceptionClear(env);
            status = find_class_path(class_path, &cp, from, sizeof from, message, size);
            if (status != STT_OK) {
                free(cp.data);
                return status;
            }
            bridge = load_through_url_loader(env, cp.data);
        }
    }
    if (bridge == NULL) {
        char why[1024];
        java_exception(env, STT_NO_CLASSES, "loading " BRIDGE_CLASS_DOTTED, why, sizeof why);
        status = strstr(why, "UnsupportedClassVersionError") != NULL ? STT_NO_JVM : STT_NO_CLASSES;
        fail(status, message, size, "%s; class path %s (from %s); fix: %s", why, cp.data == NULL ? "(none)" : cp.data,
             from[0] == '\0' ? "the running JVM" : from,
             status == STT_NO_JVM ? "use Java 17 or newer (STARTRANSPORT_JVM or JAVA_HOME)"
                                  : "put the jars of transport-native, transport-spi, transport-core and commons-math3, "
                                    "all from one build, beside libstartransport.so or in STARTRANSPORT_CLASSPATH");
        free(cp.data);
        return status;
    }
    free(cp.data);
    status = bind_bridge(env, bridge, message, size);
    if (status != STT_OK) {
        return status;
    }
    struct thread_state *t;
    status = thread_state(&t, message, size);
    if (status != STT_OK) {
        return status;
    }
    jint opened = (*env)->CallStaticIntMethod(env, g.bridge, g.open, t->workspace);
    if ((*env)->ExceptionCheck(env)) {
        return java_exception(env, STT_JAVA_ERROR, "discovering the library", message, size);
    }
    if (opened != STT_OK) {
        char text[2048];
        workspace_message(env, t->workspace, text, sizeof text);
        return fail(opened, message, size, "%s (class path from %s)", text,
                    from[0] == '\0' ? "the running JVM" : from);
    }
    g.ready = 1;
    return STT_OK;
}

int stt_open(const char *jvm_library, const char *class_path, int zone_origin, stt_session **session,
             char *message, size_t message_size) {
    clear_message(message, message_size);
    if (session == NULL) {
        return fail(STT_BAD_ARGUMENT, message, message_size, "stt_open: session is NULL");
    }
    *session = NULL;
    pthread_mutex_lock(&g.lock);
    int status = g.ready ? STT_OK : open_locked(jvm_library, class_path, message, message_size);
    if (status == STT_OK) {
        stt_session *s = counted_calloc(1, sizeof *s);
        if (s == NULL) {
            status = fail(STT_NO_MEMORY, message, message_size, "out of memory for the session");
        } else {
            s->zone_origin = zone_origin;
            g.sessions++;
            *session = s;
        }
    }
    pthread_mutex_unlock(&g.lock);
    return status;
}

void stt_close(stt_session *session) {
    if (session == NULL) {
        return;
    }
    pthread_mutex_lock(&g.lock);
    g.sessions--;
    pthread_mutex_unlock(&g.lock);
    free(session);
}

static jstring new_string(JNIEnv *env, const char *s) {
    return s == NULL ? NULL : (*env)->NewStringUTF(env, s);
}

int stt_model_create(stt_session *session, const char *family, const char *name, const char *options,
                     stt_model **model, char *message, size_t message_size) {
    clear_message(message, message_size);
    if (model == NULL) {
        return fail(STT_BAD_ARGUMENT, message, message_size, "stt_model_create: model is NULL");
    }
    *model = NULL;
    if (session == NULL || !g.ready) {
        return fail(STT_BAD_ARGUMENT, message, message_size, "stt_model_create: no open session (call stt_open "
                    "first)");
    }
    if (family == NULL) {
        return fail(STT_BAD_ARGUMENT, message, message_size, "stt_model_create: family is NULL; use stability, "
                    "thermodynamics, convection or opacity");
    }
    struct thread_state *t;
    int status = thread_state(&t, message, message_size);
    if (status != STT_OK) {
        return status;
    }
    JNIEnv *env = t->env;
    if ((*env)->PushLocalFrame(env, 8) != 0) {
        return java_exception(env, STT_JAVA_ERROR, "stt_model_create", message, message_size);
    }
    jstring jf = new_string(env, family);
    jstring jn = new_string(env, name);
    jstring jo = new_string(env, options);
    jobject created = (*env)->ExceptionCheck(env) ? NULL
            : (*env)->CallStaticObjectMethod(env, g.bridge, g.create, t->workspace, jf, jn, jo);
    if ((*env)->ExceptionCheck(env)) {
        status = java_exception(env, STT_JAVA_ERROR, "stt_model_create", message, message_size);
    } else if (created == NULL) {
        status = (*env)->GetIntField(env, t->workspace, g.family);
        workspace_message(env, t->workspace, message, message_size);
    } else {
        stt_model *m = counted_calloc(1, sizeof *m);
        if (m == NULL) {
            status = fail(STT_NO_MEMORY, message, message_size, "out of memory for the model");
        } else {
            m->object = (*env)->NewGlobalRef(env, created);
            m->family = (*env)->GetIntField(env, t->workspace, g.family);
            m->zone_origin = session->zone_origin;
            *model = m;
        }
    }
    (*env)->PopLocalFrame(env, NULL);
    return status;
}

void stt_model_free(stt_model *model) {
    if (model == NULL) {
        return;
    }
    struct thread_state *t;
    if (g.ready && thread_state(&t, NULL, 0) == STT_OK) {
        (*t->env)->DeleteGlobalRef(t->env, model->object);
    }
    free(model);
}

int stt_model_describe(const stt_model *model, char *text, size_t text_size) {
    clear_message(text, text_size);
    if (model == NULL || !g.ready) {
        return fail(STT_BAD_ARGUMENT, text, text_size, "stt_model_describe: no model");
    }
    struct thread_state *t;
    int status = thread_state(&t, text, text_size);
    if (status != STT_OK) {
        return status;
    }
    JNIEnv *env = t->env;
    jstring s = (jstring) (*env)->CallStaticObjectMethod(env, g.bridge, g.describe, model->object);
    if ((*env)->ExceptionCheck(env)) {
        return java_exception(env, STT_JAVA_ERROR, "stt_model_describe", text, text_size);
    }
    copy_jstring(env, s, text, text_size);
    (*env)->DeleteLocalRef(env, s);
    return STT_OK;
}

long long stt_java_allocated_bytes(void) {
    struct thread_state *t;
    if (!g.ready || thread_state(&t, NULL, 0) != STT_OK) {
        return -1;
    }
    jlong bytes = (*t->env)->CallStaticLongMethod(t->env, g.bridge, g.allocated);
    if ((*t->env)->ExceptionCheck(t->env)) {
        (*t->env)->ExceptionClear(t->env);
        return -1;
    }
    return (long long) bytes;
}

/* ---- batch calls ------------------------------------------------------------------------- */

static const char *const input_names[INPUT_COUNT] = {
    "radius", "mass", "temperature", "density", "pressure", "luminosity", "opacity", "cp", "nabla_ad", "delta",
    "nabla_mu", "phi", "hydrogen", "metals"
};

static void columns_of(const stt_zones *in, const double *columns[INPUT_COUNT]) {
    columns[IN_RADIUS] = in->radius;
    columns[IN_MASS] = in->mass;
    columns[IN_T] = in->temperature;
    columns[IN_RHO] = in->density;
    columns[IN_P] = in->pressure;
    columns[IN_L] = in->luminosity;
    columns[IN_KAPPA] = in->opacity;
    columns[IN_CP] = in->cp;
    columns[IN_NABLA_AD] = in->nabla_ad;
    columns[IN_DELTA] = in->delta;
    columns[IN_NABLA_MU] = in->nabla_mu;
    columns[IN_PHI] = in->phi;
    columns[IN_X] = in->hydrogen;
    columns[IN_Z] = in->metals;
}

/* Common checks of a batch call; on success *t is the thread's state. */
static int begin(const char *call, const stt_model *model, int family, int n, const stt_zones *in, const void *out,
                 unsigned required, const double *columns[INPUT_COUNT], struct thread_state **t, char *message,
                 size_t size) {
    static const char *const family_names[] = {"stability", "thermodynamics", "convection", "opacity"};
    clear_message(message, size);
    if (model == NULL) {
        return fail(STT_BAD_ARGUMENT, message, size, "%s: model is NULL", call);
    }
    if (model->family != family) {
        return fail(STT_BAD_ARGUMENT, message, size, "%s: the model is a %s model, not a %s model", call,
                    family_names[model->family], family_names[family]);
    }
    if (n < 0) {
        return fail(STT_BAD_ARGUMENT, message, size, "%s: n = %d zones: must be >= 0", call, n);
    }
    if (in == NULL || out == NULL) {
        return fail(STT_BAD_ARGUMENT, message, size, "%s: %s is NULL", call, in == NULL ? "in" : "out");
    }
    columns_of(in, columns);
    for (int j = 0; j < INPUT_COUNT; j++) {
        if ((required & (1u << j)) != 0 && columns[j] == NULL) {
            return fail(STT_BAD_ARGUMENT, message, size, "%s: in->%s is NULL; the call reads %s for every zone",
                        call, input_names[j], input_names[j]);
        }
    }
    if (n == 0) {
        *t = NULL;
        return STT_OK;
    }
    return thread_state(t, message, size);
}

/*
 * Copies between host memory and a workspace array. The array is pinned for the copy
 * (GetPrimitiveArrayCritical: no copy of its own with HotSpot's collectors) and copied with
 * memcpy; nothing in between calls the JVM. (Timed the same as Get/Set<Type>ArrayRegion: the
 * copies are bound by memory bandwidth.) If the JVM cannot pin (it returns NULL), the region
 * copy is used instead.
 */
static void copy_in(JNIEnv *env, jarray array, const double *host, jsize count) {
    void *java = (*env)->GetPrimitiveArrayCritical(env, array, NULL);
    if (java != NULL) {
        memcpy(java, host, sizeof(double) * (size_t) count);
        (*env)->ReleasePrimitiveArrayCritical(env, array, java, 0);
    } else {
        (*env)->ExceptionClear(env);
        (*env)->SetDoubleArrayRegion(env, (jdoubleArray) array, 0, count, host);
    }
}

static void copy_out(JNIEnv *env, jarray array, void *host, size_t element, jsize count) {
    void *java = (*env)->GetPrimitiveArrayCritical(env, array, NULL);
    if (java != NULL) {
        memcpy(host, java, element * (size_t) count);
        (*env)->ReleasePrimitiveArrayCritical(env, array, java, JNI_ABORT);
    } else {
        (*env)->ExceptionClear(env);
        if (element == sizeof(jint)) {
            (*env)->GetIntArrayRegion(env, (jintArray) array, 0, count, (jint *) host);
        } else {
            (*env)->GetDoubleArrayRegion(env, (jdoubleArray) array, 0, count, (jdouble *) host);
        }
    }
}

/* Copies the given input columns of zones [start, start + count) into the workspace. */
static unsigned put_inputs(JNIEnv *env, struct thread_state *t, const double *columns[INPUT_COUNT], unsigned read,
                           size_t start, jsize count) {
    unsigned present = 0;
    for (int j = 0; j < INPUT_COUNT; j++) {
        if ((read & (1u << j)) != 0 && columns[j] != NULL) {
            copy_in(env, t->arrays[A_IN + j], columns[j] + start, count);
            present |= 1u << j;
        }
    }
    return present;
}

static void get_doubles(JNIEnv *env, struct thread_state *t, int array, double *host, size_t start, jsize count) {
    if (host != NULL) {
        copy_out(env, t->arrays[array], host + start, sizeof(double), count);
    }
}

static void get_codes(JNIEnv *env, struct thread_state *t, int *host, size_t start, jsize count) {
    if (host != NULL) {
        copy_out(env, t->arrays[A_CODES], host + start, sizeof(jint), count);
    }
}

/*
 * The host's convection Jacobian array of n zones as a direct ByteBuffer (NewDirectByteBuffer: a Java
 * object over the host's memory, no copy), so that the kernel stores each entry straight into it. Kept
 * per thread while the host passes the same array and zone count, so a new one (about 100 bytes of Java
 * heap) is made only when they change. NULL when the JVM makes no direct buffers or the array is too
 * large for one (over 2 GB): the caller then copies the Jacobian out of the workspace as before.
 */
static jobject host_jacobian(JNIEnv *env, struct thread_state *t, const double *jacobian, size_t n) {
    if (t->host_jacobian != NULL && t->host_jacobian_data == jacobian && t->host_jacobian_zones == n) {
        return t->host_jacobian;
    }
    if (t->host_jacobian != NULL) {
        (*env)->DeleteGlobalRef(env, t->host_jacobian);
        t->host_jacobian = NULL;
    }
    size_t doubles = n * STT_CONVECTION_OUTPUTS * STT_INPUTS;
    if (doubles > (size_t) INT_MAX / sizeof(double)) {
        return NULL;
    }
    jobject local = (*env)->NewDirectByteBuffer(env, (void *) jacobian, (jlong) (doubles * sizeof(double)));
    if (local == NULL || (*env)->ExceptionCheck(env)) {
        (*env)->ExceptionClear(env);
        return NULL;
    }
    t->host_jacobian = (*env)->NewGlobalRef(env, local);
    (*env)->DeleteLocalRef(env, local);
    t->host_jacobian_data = jacobian;
    t->host_jacobian_zones = n;
    return t->host_jacobian;
}

/* Ends a chunk: a status from Java becomes the call's, with the workspace's message. */
static int chunk_status(JNIEnv *env, struct thread_state *t, const char *call, jint status, char *message,
                        size_t size) {
    if ((*env)->ExceptionCheck(env)) {
        return java_exception(env, STT_JAVA_ERROR, call, message, size);
    }
    if (status != STT_OK) {
        workspace_message(env, t->workspace, message, size);
    }
    return status;
}

#define BIT(j) (1u << (j))
#define ALL_INPUTS ((1u << INPUT_COUNT) - 1u)
#define STATE_INPUTS (BIT(IN_T) | BIT(IN_RHO) | BIT(IN_X) | BIT(IN_Z))
#define STABILITY_INPUTS (BIT(IN_T) | BIT(IN_RHO) | BIT(IN_P) | BIT(IN_L) | BIT(IN_MASS) | BIT(IN_KAPPA) \
                          | BIT(IN_NABLA_AD) | BIT(IN_DELTA))
#define CONVECTION_INPUTS (STABILITY_INPUTS | BIT(IN_RADIUS) | BIT(IN_CP))
/* what the SPI says each call reads (ConvectionModel, StabilityModel javadoc): required plus optional */
#define STABILITY_READS (STABILITY_INPUTS | BIT(IN_NABLA_MU) | BIT(IN_PHI))
#define CONVECTION_READS (CONVECTION_INPUTS | BIT(IN_NABLA_MU) | BIT(IN_PHI))

int stt_convection(const stt_model *model, int n, const stt_zones *in, const stt_convection_out *out,
                   double *jacobian, char *message, size_t message_size) {
    const double *columns[INPUT_COUNT];
    struct thread_state *t;
    int status = begin("stt_convection", model, FAMILY_CONVECTION, n, in, out, CONVECTION_INPUTS, columns, &t,
                       message, message_size);
    if (status != STT_OK || n == 0) {
        return status;
    }
    JNIEnv *env = t->env;
    const jsize chunk = g.chunk;
    /* the Jacobian goes straight into the host's array when the JVM can view it as a buffer */
    jobject direct = jacobian != NULL ? host_jacobian(env, t, jacobian, (size_t) n) : NULL;
    for (size_t start = 0; start < (size_t) n; start += (size_t) chunk) {
        jsize count = (size_t) n - start < (size_t) chunk ? (jsize) ((size_t) n - start) : chunk;
        /* columns the model does not read count as present: neither copied nor filled */
        unsigned present = put_inputs(env, t, columns, CONVECTION_READS, start, count) | (ALL_INPUTS & ~CONVECTION_READS);
        jint rc = direct != NULL
                ? (*env)->CallStaticIntMethod(env, g.bridge, g.convection_direct, t->workspace, model->object, count,
                                              (jint) start + model->zone_origin, (jint) present, direct, (jint) start)
                : (*env)->CallStaticIntMethod(env, g.bridge, g.convection, t->workspace, model->object, count,
                                              (jint) start + model->zone_origin, jacobian != NULL, (jint) present);
        status = chunk_status(env, t, "stt_convection", rc, message, message_size);
        if (status != STT_OK) {
            return status;
        }
        get_codes(env, t, out->regime, start, count);
        get_doubles(env, t, A_CONV + 0, out->nabla_rad, start, count);
        get_doubles(env, t, A_CONV + 1, out->nabla, start, count);
        get_doubles(env, t, A_CONV + 2, out->nabla_element, start, count);
        get_doubles(env, t, A_CONV + 3, out->velocity, start, count);
        get_doubles(env, t, A_CONV + 4, out->convective_fraction, start, count);
        get_doubles(env, t, A_CONV + 5, out->radiative_fraction, start, count);
        get_doubles(env, t, A_CONV + 6, out->efficiency, start, count);
        get_doubles(env, t, A_CONV + 7, out->loss_parameter, start, count);
        get_doubles(env, t, A_CONV + 8, out->scale_height, start, count);
        get_doubles(env, t, A_CONV + 9, out->mixing_length, start, count);
        get_doubles(env, t, A_CONV + 10, out->diffusion, start, count);
        if (jacobian != NULL && direct == NULL) {
            copy_out(env, t->arrays[A_CONV_JAC], jacobian + start * STT_CONVECTION_OUTPUTS * STT_INPUTS,
                     sizeof(double), count * STT_CONVECTION_OUTPUTS * STT_INPUTS);
        }
        if ((*env)->ExceptionCheck(env)) {
            return java_exception(env, STT_JAVA_ERROR, "stt_convection", message, message_size);
        }
    }
    return STT_OK;
}

int stt_stability(const stt_model *model, int n, const stt_zones *in, const stt_stability_out *out,
                  double *jacobian, char *message, size_t message_size) {
    const double *columns[INPUT_COUNT];
    struct thread_state *t;
    int status = begin("stt_stability", model, FAMILY_STABILITY, n, in, out, STABILITY_INPUTS, columns, &t,
                       message, message_size);
    if (status != STT_OK || n == 0) {
        return status;
    }
    JNIEnv *env = t->env;
    const jsize chunk = g.chunk;
    for (size_t start = 0; start < (size_t) n; start += (size_t) chunk) {
        jsize count = (size_t) n - start < (size_t) chunk ? (jsize) ((size_t) n - start) : chunk;
        unsigned present = put_inputs(env, t, columns, STABILITY_READS, start, count) | (ALL_INPUTS & ~STABILITY_READS);
        jint rc = (*env)->CallStaticIntMethod(env, g.bridge, g.stability, t->workspace, model->object, count,
                                              (jint) start + model->zone_origin, jacobian != NULL, (jint) present);
        status = chunk_status(env, t, "stt_stability", rc, message, message_size);
        if (status != STT_OK) {
            return status;
        }
        get_codes(env, t, out->regime, start, count);
        get_doubles(env, t, A_STAB + 0, out->nabla_rad, start, count);
        get_doubles(env, t, A_STAB + 1, out->nabla_ad, start, count);
        get_doubles(env, t, A_STAB + 2, out->nabla_ledoux, start, count);
        get_doubles(env, t, A_STAB + 3, out->margin_schwarzschild, start, count);
        get_doubles(env, t, A_STAB + 4, out->margin_ledoux, start, count);
        if (jacobian != NULL) {
            copy_out(env, t->arrays[A_STAB_JAC], jacobian + start * STT_STABILITY_OUTPUTS * STT_INPUTS,
                     sizeof(double), count * STT_STABILITY_OUTPUTS * STT_INPUTS);
        }
        if ((*env)->ExceptionCheck(env)) {
            return java_exception(env, STT_JAVA_ERROR, "stt_stability", message, message_size);
        }
    }
    return STT_OK;
}

int stt_opacity(const stt_model *model, int n, const stt_zones *in, const stt_opacity_out *out, char *message,
                size_t message_size) {
    const double *columns[INPUT_COUNT];
    struct thread_state *t;
    int status = begin("stt_opacity", model, FAMILY_OPACITY, n, in, out, STATE_INPUTS, columns, &t, message,
                       message_size);
    if (status != STT_OK || n == 0) {
        return status;
    }
    JNIEnv *env = t->env;
    const jsize chunk = g.chunk;
    for (size_t start = 0; start < (size_t) n; start += (size_t) chunk) {
        jsize count = (size_t) n - start < (size_t) chunk ? (jsize) ((size_t) n - start) : chunk;
        put_inputs(env, t, columns, STATE_INPUTS, start, count);
        jint rc = (*env)->CallStaticIntMethod(env, g.bridge, g.opacity, t->workspace, model->object, count,
                                              (jint) start + model->zone_origin);
        status = chunk_status(env, t, "stt_opacity", rc, message, message_size);
        if (status != STT_OK) {
            return status;
        }
        get_doubles(env, t, A_OPAC + 0, out->kappa, start, count);
        get_doubles(env, t, A_OPAC + 1, out->dlnkappa_dlnrho, start, count);
        get_doubles(env, t, A_OPAC + 2, out->dlnkappa_dlnt, start, count);
        get_codes(env, t, out->status, start, count);
        if ((*env)->ExceptionCheck(env)) {
            return java_exception(env, STT_JAVA_ERROR, "stt_opacity", message, message_size);
        }
    }
    return STT_OK;
}

int stt_thermodynamics(const stt_model *model, int n, const stt_zones *in, const stt_thermo_out *out,
                       char *message, size_t message_size) {
    const double *columns[INPUT_COUNT];
    struct thread_state *t;
    int status = begin("stt_thermodynamics", model, FAMILY_THERMODYNAMICS, n, in, out, STATE_INPUTS, columns, &t,
                       message, message_size);
    if (status != STT_OK || n == 0) {
        return status;
    }
    JNIEnv *env = t->env;
    const jsize chunk = g.chunk;
    for (size_t start = 0; start < (size_t) n; start += (size_t) chunk) {
        jsize count = (size_t) n - start < (size_t) chunk ? (jsize) ((size_t) n - start) : chunk;
        put_inputs(env, t, columns, STATE_INPUTS, start, count);
        jint rc = (*env)->CallStaticIntMethod(env, g.bridge, g.thermodynamics, t->workspace, model->object, count,
                                              (jint) start + model->zone_origin);
        status = chunk_status(env, t, "stt_thermodynamics", rc, message, message_size);
        if (status != STT_OK) {
            return status;
        }
        get_doubles(env, t, A_THERMO + 0, out->mu, start, count);
        get_doubles(env, t, A_THERMO + 1, out->beta, start, count);
        get_doubles(env, t, A_THERMO + 2, out->pressure, start, count);
        get_doubles(env, t, A_THERMO + 3, out->nabla_ad, start, count);
        get_doubles(env, t, A_THERMO + 4, out->cp, start, count);
        get_doubles(env, t, A_THERMO + 5, out->delta, start, count);
        get_doubles(env, t, A_THERMO + 6, out->phi, start, count);
        get_doubles(env, t, A_THERMO + 7, out->gamma1, start, count);
        if ((*env)->ExceptionCheck(env)) {
            return java_exception(env, STT_JAVA_ERROR, "stt_thermodynamics", message, message_size);
        }
    }
    return STT_OK;
}
