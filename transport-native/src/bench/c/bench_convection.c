/*
 * Native benchmark: a batch of zones through stt_convection with the zone-major Jacobian, timed
 * from C. Its Java counterpart (io.github.startransport.bridge.BatchTiming) times the same batch
 * on the same zones through the Java API; run-benchmark.sh runs both and prints the overhead.
 *
 *   usage: bench_convection DIR [WARMUP_SECONDS ROUNDS CALLS_PER_ROUND]
 *
 * DIR holds models.txt and profile.csv (ExampleReference). The zones are completed through the
 * bridge (thermodynamics, then opacity), as the example host does, which gives bit for bit the
 * inputs the Java side computes. Every output is requested (regime, the 11 values, the Jacobian).
 * Prints the median and the fastest round, in ns per zone.
 */
#include "example_files.h"
#include "startransport.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

static double now(void) {
    struct timespec t;
    clock_gettime(CLOCK_MONOTONIC, &t);
    return (double) t.tv_sec + 1e-9 * (double) t.tv_nsec;
}

static int compare(const void *a, const void *b) {
    double x = *(const double *) a;
    double y = *(const double *) b;
    return (x > y) - (x < y);
}

int main(int argc, char **argv) {
    if (argc < 2) {
        fprintf(stderr, "usage: %s DIR [WARMUP_SECONDS ROUNDS CALLS_PER_ROUND]\n", argv[0]);
        return 2;
    }
    double warmup = argc > 2 ? atof(argv[2]) : 5.0;
    int rounds = argc > 3 ? atoi(argv[3]) : 31;
    int calls = argc > 4 ? atoi(argv[4]) : 200;
    struct example_models models;
    struct example_profile p;
    if (!example_read_models(argv[1], &models) || !example_read_profile(argv[1], &p)) {
        return 2;
    }
    int n = p.n;
    char message[2048];
    stt_session *session;
    stt_model *model[4];
    if (stt_open(NULL, NULL, 0, &session, message, sizeof message) != STT_OK) {
        fprintf(stderr, "%s\n", message);
        return 1;
    }
    for (int i = 0; i < 4; i++) {
        if (stt_model_create(session, models.family[i], models.name[i], models.options[i], &model[i], message,
                             sizeof message) != STT_OK) {
            fprintf(stderr, "%s\n", message);
            return 1;
        }
    }
    double *cp = calloc(n, sizeof(double)), *nabla_ad = calloc(n, sizeof(double)),
           *delta = calloc(n, sizeof(double)), *phi = calloc(n, sizeof(double)), *kappa = calloc(n, sizeof(double));
    stt_zones zones = {p.radius, p.mass, p.temperature, p.density, p.pressure, p.luminosity, kappa, cp, nabla_ad,
                       delta, p.nabla_mu, phi, p.hydrogen, p.metals};
    stt_thermo_out thermo = {NULL, NULL, NULL, nabla_ad, cp, delta, phi, NULL};
    stt_opacity_out opacity = {kappa, NULL, NULL, NULL};
    if (stt_thermodynamics(model[0], n, &zones, &thermo, message, sizeof message) != STT_OK
        || stt_opacity(model[1], n, &zones, &opacity, message, sizeof message) != STT_OK) {
        fprintf(stderr, "%s\n", message);
        return 1;
    }
    double *v[11];
    for (int j = 0; j < 11; j++) {
        v[j] = calloc(n, sizeof(double));
    }
    int *regime = calloc(n, sizeof(int));
    double *jacobian = calloc((size_t) n * STT_CONVECTION_OUTPUTS * STT_INPUTS, sizeof(double));
    stt_convection_out out = {regime, v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7], v[8], v[9], v[10]};

    double sink = 0;
    double start = now();
    long warm = 0;
    while (now() - start < warmup) {
        for (int c = 0; c < 50; c++) {
            if (stt_convection(model[3], n, &zones, &out, jacobian, message, sizeof message) != STT_OK) {
                fprintf(stderr, "%s\n", message);
                return 1;
            }
            sink += v[1][n / 2] + jacobian[n / 2];
            warm++;
        }
    }
    double *per_zone = malloc(sizeof(double) * rounds);
    for (int r = 0; r < rounds; r++) {
        double t0 = now();
        for (int c = 0; c < calls; c++) {
            stt_convection(model[3], n, &zones, &out, jacobian, message, sizeof message);
            sink += v[1][n / 2] + jacobian[n / 2];
        }
        per_zone[r] = (now() - t0) * 1e9 / ((double) calls * n);
    }
    qsort(per_zone, rounds, sizeof(double), compare);
    printf("bridge: convection with the zone-major Jacobian, %d zones per call, from C through stt_convection: "
           "median %.1f ns per zone, fastest round %.1f (%d rounds of %d calls after %ld warm-up calls; sink %g)\n",
           n, per_zone[rounds / 2], per_zone[0], rounds, calls, warm, sink);
    return 0;
}
