package io.github.startransport.core.profile;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * nabla_mu = d ln mu / d ln P at the two end zones of a profile, where {@link CompositionGradient} takes
 * one-sided differences: exact for ln mu linear in ln P, and equal to the secant slope
 * (f(s_1) - f(s_0)) / (s_1 - s_0) = a + b (s_0 + s_1) for a quadratic f = a s + b s^2 (elementary calculus).
 * mu of the fully ionised mixture, 1/mu = 2X + 3Y/4 + Z/2 (Kippenhahn, Weigert &amp; Weiss 2012 §4.2, from
 * memory), is inverted for X at fixed Z.
 */
class CompositionGradientEndsTest {
    private static final double Z = 0.02;

    /** X with 1/mu = 2X + 3(1 - X - Z)/4 + Z/2 for the given mu. */
    private static double hydrogen(double mu) {
        return (1.0 / mu - 0.75 + 0.25 * Z) / 1.25;
    }

    private static double[] gradient(double a, double b, double[] lnP) {
        int n = lnP.length;
        double[] x = new double[n];
        double[] z = new double[n];
        double[] p = new double[n];
        for (int k = 0; k < n; k++) {
            double s = lnP[k] - lnP[0];
            x[k] = hydrogen(0.62 * Math.exp(a * s + b * s * s));
            z[k] = Z;
            p[k] = Math.exp(lnP[k]);
        }
        double[] out = new double[n];
        CompositionGradient.nablaMu(x, z, p, out);
        return out;
    }

    private static final double[] LN_P = {39.0, 38.2, 37.9, 36.5, 35.0, 34.6, 33.1, 31.0};

    @Test
    @Tag(CheckKind.EXTERNAL)
    void endZonesAreExactForLnMuLinearInLnP() {
        double[] out = gradient(0.02, 0.0, LN_P);
        assertEquals(0.02, out[0], 1e-12);
        assertEquals(0.02, out[LN_P.length - 1], 1e-12);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void endZonesGiveTheSecantSlopeOfAQuadratic() {
        double a = -0.01;
        double b = 0.002;
        double[] out = gradient(a, b, LN_P);
        int n = LN_P.length;
        double s0 = 0.0;
        double s1 = LN_P[1] - LN_P[0];
        assertEquals(a + b * (s0 + s1), out[0], 1e-12);
        double t0 = LN_P[n - 2] - LN_P[0];
        double t1 = LN_P[n - 1] - LN_P[0];
        assertEquals(a + b * (t0 + t1), out[n - 1], 1e-12);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void aCompositionStepShowsInBothZonesAroundIt() {
        // X = 0.5 inside, 0.7 outside between zones 3 and 4: the three-point formula of zone 3 (Fornberg 1988, Math.
        // Comp. 51, 699) weights the jump of ln mu by h0 / (h1 (h0 + h1)); the profile's ends, where the
        // composition is uniform, get 0
        int n = LN_P.length;
        double[] x = new double[n];
        double[] z = new double[n];
        double[] p = new double[n];
        for (int k = 0; k < n; k++) {
            x[k] = k <= 3 ? 0.5 : 0.7;
            z[k] = Z;
            p[k] = Math.exp(LN_P[k]);
        }
        double[] out = new double[n];
        CompositionGradient.nablaMu(x, z, p, out);
        double muIn = 1.0 / (2 * 0.5 + 0.75 * (1 - 0.5 - Z) + 0.5 * Z);
        double muOut = 1.0 / (2 * 0.7 + 0.75 * (1 - 0.7 - Z) + 0.5 * Z);
        assertEquals(0.0, out[0]);
        assertEquals(0.0, out[n - 1]);
        // zone 3's stencil (2, 3, 4): the three-point weight of the outer pair, h0 / (h1 (h0 + h1)) times d ln mu
        double h0 = LN_P[3] - LN_P[2];
        double h1 = LN_P[4] - LN_P[3];
        assertEquals(h0 / (h1 * (h0 + h1)) * Math.log(muOut / muIn), out[3], 1e-12);
        // positive: mu is larger inside (less hydrogen), so it falls with ln P (Kippenhahn, Weigert & Weiss 2012 §6.1)
        org.junit.jupiter.api.Assertions.assertTrue(out[3] > 0.0);
    }
}
