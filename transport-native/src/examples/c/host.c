/*
 * An example C host: reads a profile, completes it through the bridge (thermodynamics, then
 * opacity), runs the stability test and convection with the zone-major Jacobian, and compares
 * every value, bit for bit, with the same batch calls made through the Java API
 * (reference.csv, written by ExampleReference). Then it shows one refused zone.
 *
 *   usage: host DIR      (DIR holds models.txt, profile.csv, reference.csv)
 *
 * Prints one line "c-host: refused: ..." and one summary line "c-host: ... ok" (or "... FAILED");
 * exits 0 only when everything agreed.
 */
#include "example_files.h"
#include "startransport.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

enum { COLUMNS = 108, REFUSED_ZONE = 300 };

static long compared;
static long differing;

static void check(double host, double java, const char *what, int zone) {
    compared++;
    if (!example_same(host, java)) {
        if (differing < 10) {
            fprintf(stderr, "c-host differs: %s in zone %d: bridge %.17g, Java %.17g\n", what, zone, host, java);
        }
        differing++;
    }
}

static double *column(int n) {
    return calloc((size_t) n, sizeof(double));
}

int main(int argc, char **argv) {
    if (argc < 2) {
        fprintf(stderr, "usage: %s DIR\n", argv[0]);
        return 2;
    }
    const char *dir = argv[1];
    struct example_models models;
    struct example_profile p;
    if (!example_read_models(dir, &models) || !example_read_profile(dir, &p)) {
        return 2;
    }
    const int n = p.n;
    char message[2048];

    stt_session *session = NULL;
    if (stt_open(NULL, NULL, 0, &session, message, sizeof message) != STT_OK) {
        printf("c-host: could not open a session: %s: FAILED\n", message);
        return 1;
    }
    stt_model *model[4];
    for (int i = 0; i < 4; i++) {
        int rc = stt_model_create(session, models.family[i], models.name[i], models.options[i], &model[i], message,
                                  sizeof message);
        if (rc != STT_OK) {
            printf("c-host: %s model %s: %s: %s: FAILED\n", models.family[i], models.name[i], stt_status_name(rc),
                   message);
            return 1;
        }
    }

    /* the host's zones; c_P, nabla_ad, delta, phi and kappa come from the bridge */
    double *cp = column(n), *nabla_ad = column(n), *delta = column(n), *phi = column(n), *kappa = column(n);
    stt_zones zones = {
        .radius = p.radius, .mass = p.mass, .temperature = p.temperature, .density = p.density,
        .pressure = p.pressure, .luminosity = p.luminosity, .opacity = kappa, .cp = cp, .nabla_ad = nabla_ad,
        .delta = delta, .nabla_mu = p.nabla_mu, .phi = phi, .hydrogen = p.hydrogen, .metals = p.metals
    };

    double *thermo[8];
    for (int j = 0; j < 8; j++) {
        thermo[j] = column(n);
    }
    stt_thermo_out thermo_out = {thermo[0], thermo[1], thermo[2], thermo[3], thermo[4], thermo[5], thermo[6],
                                 thermo[7]};
    int rc = stt_thermodynamics(model[0], n, &zones, &thermo_out, message, sizeof message);
    memcpy(nabla_ad, thermo[3], sizeof(double) * (size_t) n);
    memcpy(cp, thermo[4], sizeof(double) * (size_t) n);
    memcpy(delta, thermo[5], sizeof(double) * (size_t) n);
    memcpy(phi, thermo[6], sizeof(double) * (size_t) n);

    double *dlnk_drho = column(n), *dlnk_dt = column(n);
    int *lookup = calloc((size_t) n, sizeof(int));
    stt_opacity_out opacity_out = {kappa, dlnk_drho, dlnk_dt, lookup};
    if (rc == STT_OK) {
        rc = stt_opacity(model[1], n, &zones, &opacity_out, message, sizeof message);
    }

    double *stab[5];
    for (int j = 0; j < 5; j++) {
        stab[j] = column(n);
    }
    int *stab_regime = calloc((size_t) n, sizeof(int));
    double *stab_jacobian = calloc((size_t) n * STT_STABILITY_OUTPUTS * STT_INPUTS, sizeof(double));
    stt_stability_out stability_out = {stab_regime, stab[0], stab[1], stab[2], stab[3], stab[4]};
    if (rc == STT_OK) {
        rc = stt_stability(model[2], n, &zones, &stability_out, stab_jacobian, message, sizeof message);
    }

    double *conv[11];
    for (int j = 0; j < 11; j++) {
        conv[j] = column(n);
    }
    int *regime = calloc((size_t) n, sizeof(int));
    double *jacobian = calloc((size_t) n * STT_CONVECTION_OUTPUTS * STT_INPUTS, sizeof(double));
    stt_convection_out convection_out = {regime, conv[0], conv[1], conv[2], conv[3], conv[4], conv[5], conv[6],
                                         conv[7], conv[8], conv[9], conv[10]};
    if (rc == STT_OK) {
        rc = stt_convection(model[3], n, &zones, &convection_out, jacobian, message, sizeof message);
    }
    if (rc != STT_OK) {
        printf("c-host: a call through the bridge failed: %s: %s: FAILED\n", stt_status_name(rc), message);
        return 1;
    }

    /* every value against the Java API's */
    char path[4096];
    snprintf(path, sizeof path, "%s/reference.csv", dir);
    int rows = 0;
    double *ref = example_read_table(path, COLUMNS, &rows);
    if (ref == NULL || rows != n) {
        printf("c-host: reference.csv has %d rows for %d zones: FAILED\n", rows, n);
        return 1;
    }
    static const char *const thermo_names[8] = {"mu", "beta", "P_eos", "nabla_ad", "cp", "delta", "phi", "gamma1"};
    static const char *const conv_names[11] = {"nabla_rad", "nabla", "nabla_e", "v_conv", "Fconv/F", "Frad/F",
                                               "Gamma", "U", "H_P", "l", "D"};
    for (int k = 0; k < n; k++) {
        const double *r = ref + (size_t) k * COLUMNS;
        for (int j = 0; j < 8; j++) {
            check(thermo[j][k], r[j], thermo_names[j], k);
        }
        check(kappa[k], r[8], "kappa", k);
        check(dlnk_drho[k], r[9], "dlnkappa/dlnrho", k);
        check(dlnk_dt[k], r[10], "dlnkappa/dlnT", k);
        check(lookup[k], r[11], "opacity lookup", k);
        check(stab_regime[k], r[12], "stability regime", k);
        for (int j = 0; j < 5; j++) {
            check(stab[j][k], r[13 + j], "stability value", k);
        }
        for (int o = 0; o < STT_STABILITY_OUTPUTS; o++) {
            for (int i = 0; i < STT_INPUTS; i++) {
                check(stab_jacobian[STT_STABILITY_INDEX(k, o, i)], r[18 + o * STT_INPUTS + i], "stability Jacobian", k);
            }
        }
        check(regime[k], r[44], "convection regime", k);
        for (int j = 0; j < 11; j++) {
            check(conv[j][k], r[45 + j], conv_names[j], k);
        }
        for (int o = 0; o < STT_CONVECTION_OUTPUTS; o++) {
            for (int i = 0; i < STT_INPUTS; i++) {
                check(jacobian[STT_CONVECTION_INDEX(k, o, i)], r[56 + o * STT_INPUTS + i], "convection Jacobian", k);
            }
        }
    }

    /* one refused zone: a negative temperature in zone REFUSED_ZONE (C numbering) */
    double *bad_temperature = column(n);
    memcpy(bad_temperature, p.temperature, sizeof(double) * (size_t) n);
    bad_temperature[REFUSED_ZONE] = -1.0;
    stt_zones bad = zones;
    bad.temperature = bad_temperature;
    rc = stt_convection(model[3], n, &bad, &convection_out, jacobian, message, sizeof message);
    char expected[32];
    snprintf(expected, sizeof expected, "zone %d:", REFUSED_ZONE);
    int refused_right = rc == STT_INVALID_INPUT && strstr(message, expected) != NULL
            && strstr(message, "temperature") != NULL;
    printf("c-host: refused: %s: %s\n", stt_status_name(rc), message);

    for (int i = 0; i < 4; i++) {
        stt_model_free(model[i]);
    }
    stt_close(session);

    int ok = differing == 0 && compared == (long) n * COLUMNS && refused_right;
    printf("c-host: %d zones through the bridge (thermodynamics, opacity, stability and convection with the "
           "zone-major Jacobian), %ld values compared bit for bit with the Java API, %ld differ; zone %d refused "
           "by name: %s\n", n, compared, differing, REFUSED_ZONE, ok ? "ok" : "FAILED");
    return ok ? 0 : 1;
}
