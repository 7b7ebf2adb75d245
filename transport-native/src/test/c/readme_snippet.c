/*
 * The README's C snippet (between the snippet markers, which the README check keeps equal to the
 * README's block), run on three invented zones (demo numbers, not a star). Prints, per zone,
 * "zone K v=V dv_dkappa=D" with 17 significant digits, which NativeCTest compares with the Java API.
 */
#include "startransport.h"

#include <stdio.h>
#include <stdlib.h>

int main(void) {
    enum { n = 3 };
    double r[n] = {5e10, 5e10, 5e10}, m[n] = {1e33, 1e33, 1e33}, T[n] = {1e6, 1e6, 2e6},
           rho[n] = {0.1, 0.1, 0.2}, P[n] = {1.4e13, 1.4e13, 5.6e13}, L[n] = {3.8e33, 3.8e32, 7.6e33},
           kappa[n] = {10.0, 10.0, 5.0}, cp[n] = {3e8, 3e8, 3e8}, nabla_ad[n] = {0.4, 0.4, 0.4},
           delta[n] = {1.0, 1.0, 1.0};
    double nabla[n], v[n], fconv[n], D[n];
    /* snippet-start: native-c */
    char msg[1024];
    stt_session *session;
    stt_model *mlt;
    if (stt_open(NULL, NULL, 0, &session, msg, sizeof msg) != STT_OK) {   /* 0: zones numbered from 0 */
        fprintf(stderr, "%s\n", msg);                                      /* where it looked, and the fix */
        exit(1);
    }
    stt_model_create(session, "convection", "local-mixing-length", "alpha=1.8,criterion=ledoux", &mlt,
                     msg, sizeof msg);
    stt_zones in = {.radius = r, .mass = m, .temperature = T, .density = rho, .pressure = P,
                    .luminosity = L, .opacity = kappa, .cp = cp, .nabla_ad = nabla_ad, .delta = delta};
    stt_convection_out out = {.nabla = nabla, .velocity = v, .convective_fraction = fconv, .diffusion = D};
    double *jac = malloc(sizeof(double) * n * STT_CONVECTION_OUTPUTS * STT_INPUTS);   /* once */
    int rc = stt_convection(mlt, n, &in, &out, jac, msg, sizeof msg);  /* from any thread */
    /* d v_conv / d kappa of zone k: jac[STT_CONVECTION_INDEX(k, STT_D_VELOCITY, STT_KAPPA)] */
    if (rc != STT_OK) fprintf(stderr, "%s: %s\n", stt_status_name(rc), msg);
    /* snippet-end: native-c */
    for (int k = 0; k < n; k++) {
        printf("zone %d v=%.17g dv_dkappa=%.17g\n", k, v[k], jac[STT_CONVECTION_INDEX(k, STT_D_VELOCITY, STT_KAPPA)]);
    }
    free(jac);
    return rc;
}
