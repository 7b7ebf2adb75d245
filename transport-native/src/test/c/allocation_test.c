/*
 * Allocation in steady state: after a warm-up, many batch calls (all four kinds, the Jacobians
 * included) allocate nothing. Three counts over the measured calls:
 *   - heap allocations by libstartransport itself (stt_native_allocations);
 *   - calls of malloc, calloc, realloc and aligned allocation made on this thread by anyone in
 *     the process (the JVM included), counted by the wrappers below, which replace the C
 *     library's through symbol interposition (the executable's definitions win);
 *   - bytes the JVM allocated on this thread (com.sun.management.ThreadMXBean).
 *
 * The JIT compilers warm up in the background, and while they do the JVM itself mallocs now and
 * then on the calling thread (compilation requests, deoptimisation); so after WARMUP rounds the
 * program measures rounds of CALLS calls until one round has all three counts at zero, at most
 * ROUNDS rounds, and prints one line per round:
 *   "allocation: round R, CALLS calls of each kind over N zones: library L, thread mallocs M, java bytes B"
 *
 *   usage: allocation_test DIR WARMUP CALLS ROUNDS
 */
#include "example_files.h"
#include "startransport.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

extern void *__libc_malloc(size_t);
extern void *__libc_calloc(size_t, size_t);
extern void *__libc_realloc(void *, size_t);
extern void *__libc_memalign(size_t, size_t);
extern void __libc_free(void *);

static __thread long thread_mallocs;

void *malloc(size_t size) {
    thread_mallocs++;
    return __libc_malloc(size);
}

void *calloc(size_t n, size_t size) {
    thread_mallocs++;
    return __libc_calloc(n, size);
}

void *realloc(void *p, size_t size) {
    thread_mallocs++;
    return __libc_realloc(p, size);
}

void *memalign(size_t alignment, size_t size) {
    thread_mallocs++;
    return __libc_memalign(alignment, size);
}

int posix_memalign(void **p, size_t alignment, size_t size) {
    thread_mallocs++;
    *p = __libc_memalign(alignment, size);
    return *p == NULL ? 12 : 0;
}

void *aligned_alloc(size_t alignment, size_t size) {
    thread_mallocs++;
    return __libc_memalign(alignment, size);
}

void free(void *p) {
    __libc_free(p);
}

int main(int argc, char **argv) {
    if (argc < 5) {
        fprintf(stderr, "usage: %s DIR WARMUP CALLS ROUNDS\n", argv[0]);
        return 2;
    }
    int warmup = atoi(argv[2]);
    int calls = atoi(argv[3]);
    int rounds = atoi(argv[4]);
    struct example_models models;
    struct example_profile p;
    if (!example_read_models(argv[1], &models) || !example_read_profile(argv[1], &p)) {
        return 2;
    }
    int n = p.n;
    char message[1024];
    stt_session *session;
    stt_model *model[4];
    if (stt_open(NULL, NULL, 0, &session, message, sizeof message) != STT_OK) {
        printf("allocation: open failed: %s\n", message);
        return 1;
    }
    for (int i = 0; i < 4; i++) {
        if (stt_model_create(session, models.family[i], models.name[i], models.options[i], &model[i], message,
                             sizeof message) != STT_OK) {
            printf("allocation: model failed: %s\n", message);
            return 1;
        }
    }
    double *col[40];
    for (int j = 0; j < 40; j++) {
        col[j] = calloc(n, sizeof(double));
    }
    int *codes[3] = {calloc(n, sizeof(int)), calloc(n, sizeof(int)), calloc(n, sizeof(int))};
    double *stab_jacobian = calloc((size_t) n * 26, sizeof(double));
    double *conv_jacobian = calloc((size_t) n * 52, sizeof(double));
    double *cp = col[30], *nabla_ad = col[31], *delta = col[32], *phi = col[33], *kappa = col[34];
    stt_zones zones = {p.radius, p.mass, p.temperature, p.density, p.pressure, p.luminosity, kappa, cp, nabla_ad,
                       delta, p.nabla_mu, phi, p.hydrogen, p.metals};
    stt_thermo_out thermo = {col[0], col[1], col[2], nabla_ad, cp, delta, phi, col[3]};
    stt_opacity_out opacity = {kappa, col[4], col[5], codes[0]};
    stt_stability_out stability = {codes[1], col[6], col[7], col[8], col[9], col[10]};
    stt_convection_out convection = {codes[2], col[11], col[12], col[13], col[14], col[15], col[16], col[17],
                                     col[18], col[19], col[20], col[21]};
    stt_java_allocated_bytes();
    for (int round = 0; round <= rounds; round++) {
        long long library = stt_native_allocations();
        long long java = stt_java_allocated_bytes();
        long mallocs = thread_mallocs;
        int count = round == 0 ? warmup : calls;
        for (int c = 0; c < count; c++) {
            int rc = stt_thermodynamics(model[0], n, &zones, &thermo, message, sizeof message);
            rc |= stt_opacity(model[1], n, &zones, &opacity, message, sizeof message);
            rc |= stt_stability(model[2], n, &zones, &stability, stab_jacobian, message, sizeof message);
            rc |= stt_convection(model[3], n, &zones, &convection, conv_jacobian, message, sizeof message);
            if (rc != STT_OK) {
                printf("allocation: a call failed: %s\n", message);
                return 1;
            }
        }
        long thread_delta = thread_mallocs - mallocs;
        long long java_delta = stt_java_allocated_bytes() - java;
        long long library_delta = stt_native_allocations() - library;
        if (round == 0) {
            continue;
        }
        printf("allocation: round %d, %d calls of each kind over %d zones: library %lld, thread mallocs %ld, "
               "java bytes %lld\n", round, calls, n, library_delta, thread_delta, java_delta);
        if (library_delta == 0 && thread_delta == 0 && java_delta == 0) {
            break;
        }
    }
    return 0;
}
