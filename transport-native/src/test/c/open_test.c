/*
 * Opening a session and refusing bad calls, one scenario per process (a JVM, once started, stays
 * for the process's lifetime). Prints what happened as "key=value" lines for NativeCTest to check.
 *
 *   open_test open JVM CLASSPATH     stt_open with those arguments ("-" for NULL); then, when the
 *                                    session opened, one convection call on an invented zone
 *   open_test refusals DIR ORIGIN    a session with that zone origin, then every kind of bad call:
 *                                    one line "CASE status=NAME message=TEXT" per case
 */
#include "example_files.h"
#include "startransport.h"

#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

static char message[2048];

static void show(const char *what, int status, const char *text) {
    printf("%s status=%s message=%s\n", what, stt_status_name(status), text);
}

/* One invented convective zone (demo numbers, not a star). */
static int one_zone(stt_session *session) {
    stt_model *mlt;
    int rc = stt_model_create(session, "convection", "local-mixing-length", "", &mlt, message, sizeof message);
    if (rc != STT_OK) {
        return rc;
    }
    double r = 5e10, m = 1e33, t = 1e6, rho = 0.1, p = 1.4e13, l = 3.8e33, kappa = 10.0, cp = 3e8, nad = 0.4,
           delta = 1.0, v = 0.0;
    stt_zones in = {&r, &m, &t, &rho, &p, &l, &kappa, &cp, &nad, &delta, NULL, NULL, NULL, NULL};
    stt_convection_out out = {0};
    out.velocity = &v;
    rc = stt_convection(mlt, 1, &in, &out, NULL, message, sizeof message);
    stt_model_free(mlt);
    return rc;
}

static int open_scenario(const char *jvm, const char *class_path) {
    stt_session *session = NULL;
    int rc = stt_open(strcmp(jvm, "-") == 0 ? NULL : jvm, strcmp(class_path, "-") == 0 ? NULL : class_path, 0,
                      &session, message, sizeof message);
    show("open", rc, message);
    if (rc == STT_OK) {
        rc = one_zone(session);
        show("call", rc, message);
        stt_close(session);
    }
    return 0;
}

static double *copy(const double *a, int n) {
    double *c = malloc(sizeof(double) * (size_t) n);
    memcpy(c, a, sizeof(double) * (size_t) n);
    return c;
}

static int refusals(const char *dir, int origin) {
    struct example_models models;
    struct example_profile p;
    if (!example_read_models(dir, &models) || !example_read_profile(dir, &p)) {
        return 2;
    }
    int n = p.n;
    stt_session *session;
    int rc = stt_open(NULL, NULL, origin, &session, message, sizeof message);
    show("open", rc, message);
    if (rc != STT_OK) {
        return 1;
    }
    stt_model *model[4];
    for (int i = 0; i < 4; i++) {
        rc = stt_model_create(session, models.family[i], models.name[i], models.options[i], &model[i], message,
                              sizeof message);
        if (rc != STT_OK) {
            show("model", rc, message);
            return 1;
        }
    }
    stt_model *other;
    rc = stt_model_create(session, "convection", "no-such-model", NULL, &other, message, sizeof message);
    show("unknown-model", rc, message);
    rc = stt_model_create(session, "convection", "local-mixing-length", "colour=blue", &other, message,
                          sizeof message);
    show("unknown-option", rc, message);
    rc = stt_model_create(session, "convection", "local-mixing-length", "alpha=abc", &other, message, sizeof message);
    show("malformed-option", rc, message);
    rc = stt_model_create(session, "diagnosis", NULL, NULL, &other, message, sizeof message);
    show("family-without-hot-path", rc, message);
    rc = stt_model_create(session, "convection", NULL, NULL, &other, message, sizeof message);
    show("default-model", rc, message);
    if (rc == STT_OK) {
        stt_model_describe(other, message, sizeof message);
        show("default-model-is", rc, message);
        stt_model_free(other);
    }

    double *cp = calloc(n, sizeof(double)), *nad = calloc(n, sizeof(double)), *delta = calloc(n, sizeof(double)),
           *phi = calloc(n, sizeof(double)), *kappa = calloc(n, sizeof(double));
    stt_zones zones = {p.radius, p.mass, p.temperature, p.density, p.pressure, p.luminosity, kappa, cp, nad, delta,
                       p.nabla_mu, phi, p.hydrogen, p.metals};
    stt_thermo_out thermo = {NULL, NULL, NULL, nad, cp, delta, phi, NULL};
    stt_opacity_out opacity = {kappa, NULL, NULL, NULL};
    double *nabla = calloc(n, sizeof(double));
    double *jacobian = calloc((size_t) n * 52, sizeof(double));
    stt_stability_out stability = {0};
    stability.nabla_rad = nabla;
    stt_convection_out convection = {0};
    convection.nabla = nabla;
    show("thermodynamics", stt_thermodynamics(model[0], n, &zones, &thermo, message, sizeof message), message);
    show("opacity", stt_opacity(model[1], n, &zones, &opacity, message, sizeof message), message);

    /* bad arguments */
    show("null-model", stt_convection(NULL, n, &zones, &convection, jacobian, message, sizeof message), message);
    show("wrong-family", stt_convection(model[2], n, &zones, &convection, jacobian, message, sizeof message), message);
    show("negative-count", stt_convection(model[3], -1, &zones, &convection, jacobian, message, sizeof message),
         message);
    stt_zones missing = zones;
    missing.cp = NULL;
    show("missing-column", stt_convection(model[3], n, &missing, &convection, jacobian, message, sizeof message),
         message);
    show("zero-zones", stt_convection(model[3], 0, &zones, &convection, jacobian, message, sizeof message), message);

    /* bad zones, each in a later chunk than the first */
    stt_zones bad = zones;
    double *t = copy(p.temperature, n);
    t[260] = -1.0;
    bad.temperature = t;
    show("thermodynamics-bad-zone-260", stt_thermodynamics(model[0], n, &bad, &thermo, message, sizeof message),
         message);
    bad = zones;
    double *rho = copy(p.density, n);
    rho[5] = NAN;
    bad.density = rho;
    show("opacity-bad-zone-5", stt_opacity(model[1], n, &bad, &opacity, message, sizeof message), message);
    bad = zones;
    double *k = copy(kappa, n);
    k[511] = 0.0;
    bad.opacity = k;
    show("stability-bad-zone-511", stt_stability(model[2], n, &bad, &stability, NULL, message, sizeof message),
         message);
    bad = zones;
    double *c = copy(cp, n);
    c[700] = -INFINITY;
    bad.cp = c;
    show("convection-bad-zone-700", stt_convection(model[3], n, &bad, &convection, jacobian, message, sizeof message),
         message);

    /* short and absent message buffers */
    char small[16];
    memset(small, 'x', sizeof small);
    rc = stt_convection(model[3], n, &bad, &convection, jacobian, small, sizeof small);
    printf("small-buffer status=%s length=%zu terminated=%d\n", stt_status_name(rc), strlen(small),
           memchr(small, '\0', sizeof small) != NULL);
    rc = stt_convection(model[3], n, &bad, &convection, jacobian, NULL, 0);
    show("no-buffer", rc, "");

    /* and the next good call works: nothing was left pending */
    show("after-refusals", stt_convection(model[3], n, &zones, &convection, jacobian, message, sizeof message),
         message);
    for (int i = 0; i < 4; i++) {
        stt_model_free(model[i]);
    }
    stt_close(session);
    return 0;
}

int main(int argc, char **argv) {
    if (argc >= 4 && strcmp(argv[1], "open") == 0) {
        return open_scenario(argv[2], argv[3]);
    }
    if (argc >= 4 && strcmp(argv[1], "refusals") == 0) {
        return refusals(argv[2], atoi(argv[3]));
    }
    fprintf(stderr, "usage: %s open JVM CLASSPATH | refusals DIR ORIGIN\n", argv[0]);
    return 2;
}
