/*
 * Threads: the four batch calls made from several pthreads at once, with shared models, give
 * bit for bit what one thread gives. Each thread is attached to the JVM on its first call.
 *
 *   usage: threads_test DIR THREADS REPETITIONS
 *
 * Every thread computes the whole profile REPETITIONS times (half of them as two halves, to cross
 * the chunk boundaries differently) and compares each value with the single-thread results.
 * Prints "threads: T threads x R repetitions, V values compared, M differ" and exits 0 when M = 0.
 */
#include "example_files.h"
#include "startransport.h"

#include <pthread.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

enum { VALUES = 8 + 3 + 5 + 11, CODES = 3 };

static struct example_profile p;
static stt_model *model[4];
static int n;
static int repetitions;
static double *cp, *nabla_ad, *delta, *phi, *kappa;

struct results {
    double *values[VALUES];
    int *codes[CODES];
    double *stab_jacobian;
    double *conv_jacobian;
};

static struct results reference;

static void allocate(struct results *r) {
    for (int j = 0; j < VALUES; j++) {
        r->values[j] = calloc(n, sizeof(double));
    }
    for (int j = 0; j < CODES; j++) {
        r->codes[j] = calloc(n, sizeof(int));
    }
    r->stab_jacobian = calloc((size_t) n * 2 * 13, sizeof(double));
    r->conv_jacobian = calloc((size_t) n * 4 * 13, sizeof(double));
}

/* All four calls over zones [from, to). */
static int compute(struct results *r, int from, int to, char *message, size_t size) {
    int count = to - from;
#define AT(a) ((a) + from)
    stt_zones zones = {AT(p.radius), AT(p.mass), AT(p.temperature), AT(p.density), AT(p.pressure),
                       AT(p.luminosity), AT(kappa), AT(cp), AT(nabla_ad), AT(delta), AT(p.nabla_mu), AT(phi),
                       AT(p.hydrogen), AT(p.metals)};
    double **v = r->values;
    stt_thermo_out thermo = {AT(v[0]), AT(v[1]), AT(v[2]), AT(v[3]), AT(v[4]), AT(v[5]), AT(v[6]), AT(v[7])};
    stt_opacity_out opacity = {AT(v[8]), AT(v[9]), AT(v[10]), AT(r->codes[0])};
    stt_stability_out stability = {AT(r->codes[1]), AT(v[11]), AT(v[12]), AT(v[13]), AT(v[14]), AT(v[15])};
    stt_convection_out convection = {AT(r->codes[2]), AT(v[16]), AT(v[17]), AT(v[18]), AT(v[19]), AT(v[20]),
                                     AT(v[21]), AT(v[22]), AT(v[23]), AT(v[24]), AT(v[25]), AT(v[26])};
#undef AT
    int rc = stt_thermodynamics(model[0], count, &zones, &thermo, message, size);
    if (rc == STT_OK) {
        rc = stt_opacity(model[1], count, &zones, &opacity, message, size);
    }
    if (rc == STT_OK) {
        rc = stt_stability(model[2], count, &zones, &stability, r->stab_jacobian + (size_t) from * 26, message, size);
    }
    if (rc == STT_OK) {
        rc = stt_convection(model[3], count, &zones, &convection, r->conv_jacobian + (size_t) from * 52, message,
                            size);
    }
    return rc;
}

static long differences(const struct results *r, long *compared) {
    long d = 0;
    for (int j = 0; j < VALUES; j++) {
        for (int k = 0; k < n; k++) {
            d += !example_same(r->values[j][k], reference.values[j][k]);
        }
    }
    for (int j = 0; j < CODES; j++) {
        d += memcmp(r->codes[j], reference.codes[j], sizeof(int) * (size_t) n) != 0;
    }
    d += memcmp(r->stab_jacobian, reference.stab_jacobian, sizeof(double) * (size_t) n * 26) != 0;
    d += memcmp(r->conv_jacobian, reference.conv_jacobian, sizeof(double) * (size_t) n * 52) != 0;
    *compared += (long) n * (VALUES + CODES + 26 + 52);
    return d;
}

struct worker {
    pthread_t thread;
    long differing;
    long compared;
    int status;
    char message[1024];
};

static void *work(void *arg) {
    struct worker *w = arg;
    struct results r;
    allocate(&r);
    for (int i = 0; i < repetitions && w->status == STT_OK; i++) {
        if (i % 2 == 0) {
            w->status = compute(&r, 0, n, w->message, sizeof w->message);
        } else {
            /* two pieces, cut off the chunk boundaries */
            w->status = compute(&r, 0, n / 3 + 1, w->message, sizeof w->message);
            if (w->status == STT_OK) {
                w->status = compute(&r, n / 3 + 1, n, w->message, sizeof w->message);
            }
        }
        if (w->status == STT_OK) {
            w->differing += differences(&r, &w->compared);
            memset(r.conv_jacobian, 0, sizeof(double) * (size_t) n * 52);
        }
    }
    return NULL;
}

int main(int argc, char **argv) {
    if (argc < 4) {
        fprintf(stderr, "usage: %s DIR THREADS REPETITIONS\n", argv[0]);
        return 2;
    }
    int threads = atoi(argv[2]);
    repetitions = atoi(argv[3]);
    struct example_models models;
    if (!example_read_models(argv[1], &models) || !example_read_profile(argv[1], &p)) {
        return 2;
    }
    n = p.n;
    char message[1024];
    stt_session *session;
    if (stt_open(NULL, NULL, 0, &session, message, sizeof message) != STT_OK) {
        printf("threads: open failed: %s\n", message);
        return 1;
    }
    for (int i = 0; i < 4; i++) {
        if (stt_model_create(session, models.family[i], models.name[i], models.options[i], &model[i], message,
                             sizeof message) != STT_OK) {
            printf("threads: model failed: %s\n", message);
            return 1;
        }
    }
    cp = calloc(n, sizeof(double));
    nabla_ad = calloc(n, sizeof(double));
    delta = calloc(n, sizeof(double));
    phi = calloc(n, sizeof(double));
    kappa = calloc(n, sizeof(double));
    stt_zones zones = {NULL, NULL, p.temperature, p.density, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL,
                       p.hydrogen, p.metals};
    stt_thermo_out thermo = {NULL, NULL, NULL, nabla_ad, cp, delta, phi, NULL};
    stt_opacity_out opacity = {kappa, NULL, NULL, NULL};
    if (stt_thermodynamics(model[0], n, &zones, &thermo, message, sizeof message) != STT_OK
        || stt_opacity(model[1], n, &zones, &opacity, message, sizeof message) != STT_OK) {
        printf("threads: completing the zones failed: %s\n", message);
        return 1;
    }
    /* the single-thread reference, on the main thread */
    allocate(&reference);
    if (compute(&reference, 0, n, message, sizeof message) != STT_OK) {
        printf("threads: reference failed: %s\n", message);
        return 1;
    }
    struct worker *w = calloc(threads, sizeof *w);
    for (int i = 0; i < threads; i++) {
        pthread_create(&w[i].thread, NULL, work, &w[i]);
    }
    long differing = 0;
    long compared = 0;
    int failed = 0;
    for (int i = 0; i < threads; i++) {
        pthread_join(w[i].thread, NULL);
        differing += w[i].differing;
        compared += w[i].compared;
        if (w[i].status != STT_OK) {
            printf("threads: thread %d failed: %s: %s\n", i, stt_status_name(w[i].status), w[i].message);
            failed = 1;
        }
    }
    printf("threads: %d threads x %d repetitions of %d zones, %ld values compared with one thread, %ld differ\n",
           threads, repetitions, n, compared, differing);
    return failed || differing != 0 || compared == 0;
}
