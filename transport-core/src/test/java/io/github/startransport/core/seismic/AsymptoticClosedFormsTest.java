package io.github.startransport.core.seismic;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The asymptotic integrals and the buoyancy frequency on profiles whose integrals have closed forms: the large
 * separation Delta nu = (2 integral_0^R dr / c)^-1 (Tassoul 1980, ApJS 43, 469; Aerts, Christensen-Dalsgaard
 * &amp; Kurtz 2010, ch. 3, from memory), the g-mode period spacing Delta Pi_l = 2 pi^2 / (sqrt(l (l + 1))
 * integral N dr / r) (Tassoul 1980, from memory), and N^2 in the chi form of Kippenhahn, Weigert &amp; Weiss
 * (2012, §6.6, from memory).
 */
class AsymptoticClosedFormsTest {
    private static final double R = 6.957e10;   // cm, IAU 2015 nominal solar radius (any radius would do)

    /** 1/c = a + b r: the sound speed falls outwards as in a star, from 1/a at the centre to 1/(a + bR). */
    private static final double A = 1.0 / 5e7;            // s/cm
    private static final double B = (1.0 / 7e5 - A) / R;   // s/cm^2

    private static double[] grid(double first, int zones) {
        double[] r = new double[zones];
        for (int k = 0; k < zones; k++) {
            r[k] = first + (R - first) * k / (zones - 1.0);
        }
        return r;
    }

    private static double[] soundSpeed(double[] r) {
        double[] c = new double[r.length];
        for (int k = 0; k < r.length; k++) {
            c[k] = 1.0 / (A + B * r[k]);
        }
        return c;
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void largeSeparationOfAUniformAndOfALinearlyRisingSlownessProfile() {
        // uniform c: integral dr / c = R / c, Delta nu = c / (2R) (the homogeneous sphere's spacing)
        double[] r = grid(1e-3 * R, 200);
        double[] uniform = new double[r.length];
        java.util.Arrays.fill(uniform, 3e7);
        assertEquals(R / 3e7, AsymptoticIntegrals.acousticRadius(r, uniform), 1e-12 * R / 3e7);
        assertEquals(3e7 / (2 * R), AsymptoticIntegrals.largeSeparation(AsymptoticIntegrals.acousticRadius(r, uniform)),
                1e-12 * 3e7 / (2 * R));
        // 1/c = a + b r: integral_0^R dr / c = a R + b R^2 / 2 exactly; the trapezoid rule is exact for it, and the
        // centre piece [0, r_0] taken at 1/c(r_0) errs by b r_0^2 / 2 (here r_0 = 1e-6 R: 5e-13 relative)
        r = grid(1e-6 * R, 57);
        double exact = A * R + B * R * R / 2;
        assertEquals(exact, AsymptoticIntegrals.acousticRadius(r, soundSpeed(r)), 1e-11 * exact);
        assertEquals(1.0 / (2 * exact), AsymptoticIntegrals.largeSeparation(exact), 1e-15 / exact);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void acousticDepthInsideAZoneIsTheExactIntegralForALinearSlowness() {
        // integral_at^R dr / c = a (R - at) + b (R^2 - at^2) / 2, at points between the grid's radii and on them
        double[] r = grid(1e-3 * R, 41);
        double[] c = soundSpeed(r);
        for (double at : new double[] {0.0137 * R, 0.5 * R, r[17], 0.9871 * R, R}) {
            double exact = A * (R - at) + B * (R * R - at * at) / 2;
            assertEquals(exact, AsymptoticIntegrals.acousticDepth(r, c, at), 1e-12 * (A * R + B * R * R / 2),
                    "at r = " + at / R + " R");
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void periodSpacingOfACavityWhereNGrowsLinearlyWithRadius() {
        // N = N0 r / R on the nodes lo..hi (N^2 < 0 outside: a convective core and envelope), so N / r = N0 / R
        // there. The integral of the piecewise-linear N / r through the nodes is N0 (r_hi - r_lo) / R inside and
        // a triangle N0 dr / (2R) on each side, where N / r falls to 0 at the neighbouring node: in all
        // N0 (r_hi - r_lo + dr) / R. Then Delta Pi_l = 2 pi^2 / (sqrt(l (l + 1)) integral).
        double n0 = 2e-3;   // rad/s
        double[] r = grid(1e-3 * R, 1000);
        double dr = r[1] - r[0];
        int lo = 99;
        int hi = 599;
        double[] n2 = new double[r.length];
        for (int k = 0; k < r.length; k++) {
            n2[k] = k >= lo && k <= hi ? Math.pow(n0 * r[k] / R, 2) : -1e-6;
        }
        double expected = n0 * (r[hi] - r[lo] + dr) / R;
        double integral = AsymptoticIntegrals.buoyancyIntegral(r, n2);
        assertEquals(expected, integral, 1e-12 * expected);
        for (int l = 1; l <= 3; l++) {
            double spacing = 2 * Math.PI * Math.PI / (Math.sqrt(l * (l + 1.0)) * expected);
            assertEquals(spacing, AsymptoticIntegrals.periodSpacing(l, integral), 1e-12 * spacing, "l = " + l);
        }
        // the continuous cavity from 0.1 R to 0.6 R: Delta Pi_1 = 2 pi^2 / (sqrt 2 N0 / 2) = 13 958 s; the grid
        // blurs each edge by half a zone, dr / (0.5 R) = 0.2 % in all
        double continuous = 4 * Math.PI * Math.PI / (Math.sqrt(2) * n0);
        assertEquals(continuous, AsymptoticIntegrals.periodSpacing(1, integral), 2.5 * dr / (0.5 * R) * continuous);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void buoyancyOfARadiativeLayerOfGasAndRadiationWithAHeliumGradient() {
        // N^2 = (g^2 rho / P)(chi_T / chi_rho)(nabla_ad - nabla - (chi_mu / chi_T) nabla_mu) (Kippenhahn, Weigert &
        // Weiss 2012, §6.6, from memory). For ideal gas plus radiation at beta = 0.8: chi_rho = beta, chi_T =
        // 4 - 3 beta, chi_mu = -beta (P_gas ~ rho T / mu); so delta = chi_T / chi_rho = 4 - 3 beta over beta and
        // phi = -chi_mu / chi_rho = 1, the inputs of the code's form, which must agree.
        double beta = 0.8;
        double chiRho = beta;
        double chiT = 4 - 3 * beta;
        double chiMu = -beta;
        double q = (1 - beta) * (4 + beta) / (beta * beta);
        double nablaAd = (1 + q) / (2.5 + 4 * q);      // KWW 2012, §13.2 (from memory)
        double nabla = 0.31;
        double nablaMu = 0.05;
        double r = 0.2 * R;
        double m = 0.3 * 1.98841e33;
        double rho = 40.0;
        double p = 1.0e17;
        double g = 6.67430e-8 * m / (r * r);          // G from CODATA 2018
        double expected = g * g * rho / p * (chiT / chiRho) * (nablaAd - nabla - chiMu / chiT * nablaMu);
        double n2 = LocalFrequencies.buoyancySquared(r, m, rho, p, chiT / chiRho, nablaAd, -chiMu / chiRho, nablaMu,
                nabla);
        assertEquals(expected, n2, 1e-13 * Math.abs(expected));
        // a swapped phi and delta would give a different value here (delta = 2, phi = 1)
        double swapped = LocalFrequencies.buoyancySquared(r, m, rho, p, -chiMu / chiRho, nablaAd, chiT / chiRho,
                nablaMu, nabla);
        assertTrue(Math.abs(swapped - expected) > 0.05 * Math.abs(expected), "swapped: " + swapped);
    }
}
