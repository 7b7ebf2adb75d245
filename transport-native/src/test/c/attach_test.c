/*
 * Attaching to a JVM already running in the process: this program starts a JVM of its own
 * (as a Java host, or another library, would) whose class path holds none of the library's jars,
 * then opens a session. The session must attach to that JVM (not start a second one, which JNI
 * refuses), find the jars beside libstartransport.so and load them through a class loader of its
 * own, and work from the main thread and from a second thread.
 *
 *   usage: attach_test LIBJVM
 * Prints "attach: open=NAME vms=N main=NAME thread=NAME v=VALUE".
 */
#define _GNU_SOURCE
#include "startransport.h"

#include <dlfcn.h>
#include <jni.h>
#include <pthread.h>
#include <stdio.h>
#include <string.h>

typedef jint (JNICALL *create_fn)(JavaVM **, void **, void *);
typedef jint (JNICALL *created_fn)(JavaVM **, jsize, jsize *);

static stt_model *mlt;
static double v_main, v_thread;

/* One invented convective zone (demo numbers, not a star). */
static int one_zone(double *v) {
    char message[512];
    double r = 5e10, m = 1e33, t = 1e6, rho = 0.1, p = 1.4e13, l = 3.8e33, kappa = 10.0, cp = 3e8, nad = 0.4,
           delta = 1.0;
    stt_zones in = {&r, &m, &t, &rho, &p, &l, &kappa, &cp, &nad, &delta, NULL, NULL, NULL, NULL};
    stt_convection_out out = {0};
    out.velocity = v;
    int rc = stt_convection(mlt, 1, &in, &out, NULL, message, sizeof message);
    if (rc != STT_OK) {
        fprintf(stderr, "%s\n", message);
    }
    return rc;
}

static void *second(void *status) {
    *(int *) status = one_zone(&v_thread);
    return NULL;
}

int main(int argc, char **argv) {
    if (argc < 2) {
        fprintf(stderr, "usage: %s LIBJVM\n", argv[0]);
        return 2;
    }
    void *jvm = dlopen(argv[1], RTLD_NOW | RTLD_LOCAL);
    if (jvm == NULL) {
        fprintf(stderr, "%s\n", dlerror());
        return 2;
    }
    create_fn create = (create_fn) dlsym(jvm, "JNI_CreateJavaVM");
    created_fn created = (created_fn) dlsym(jvm, "JNI_GetCreatedJavaVMs");
    JavaVMOption options[2] = {{"-Djava.class.path=/nonexistent", NULL}, {"-Xrs", NULL}};
    JavaVMInitArgs args = {JNI_VERSION_1_8, 2, options, JNI_FALSE};
    JavaVM *vm;
    JNIEnv *env;
    if (create(&vm, (void **) &env, &args) != JNI_OK) {
        fprintf(stderr, "the host's own JVM did not start\n");
        return 2;
    }
    char message[2048];
    stt_session *session;
    int opened = stt_open(NULL, NULL, 0, &session, message, sizeof message);
    if (opened != STT_OK) {
        printf("attach: open=%s message=%s\n", stt_status_name(opened), message);
        return 1;
    }
    int made = stt_model_create(session, "convection", "local-mixing-length", NULL, &mlt, message, sizeof message);
    int on_main = made == STT_OK ? one_zone(&v_main) : made;
    int on_thread = -1;
    pthread_t t;
    pthread_create(&t, NULL, second, &on_thread);
    pthread_join(t, NULL);
    JavaVM *vms[4];
    jsize count = 0;
    created(vms, 4, &count);
    printf("attach: open=%s vms=%d same=%d main=%s thread=%s v=%.17g v_thread=%.17g\n", stt_status_name(opened),
           (int) count, count == 1 && vms[0] == vm, stt_status_name(on_main), stt_status_name(on_thread), v_main,
           v_thread);
    return 0;
}
