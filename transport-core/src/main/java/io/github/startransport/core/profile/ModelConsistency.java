package io.github.startransport.core.profile;

import io.github.startransport.spi.Regime;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.IntUnaryOperator;

/**
 * Does the profile's own structure agree with the transport physics? Compares the model's temperature
 * gradient nabla_model = d ln T / d ln P, taken from its T and P columns, with the gradient the
 * transport physics gives for the same zone.
 *
 * <p><b>Stencil.</b> At interior zones the three-point derivative in ln P for non-uniform spacing,
 * centred on the zone (exact for quadratics in ln P; e.g. Fornberg 1988, Math. Comp. 51, 699):
 * <pre>
 *   f'(x_k) = -h1 / (h0 (h0 + h1)) (f_{k-1} - f_k) + h0 / (h1 (h0 + h1)) (f_{k+1} - f_k),
 *   h0 = x_k - x_{k-1}, h1 = x_{k+1} - x_k,   f = ln T, x = ln P;
 * </pre>
 * at the two end zones the one-sided three-point formula through the zone and its two neighbours on
 * one side, also exact for quadratics. A zone whose stencil holds two zones of equal pressure, or
 * pressure that rises outwards, gets NaN (and the diagnosis says so in a warning).
 *
 * <p><b>Mismatch.</b> Per zone, |nabla_model - nabla| / s with nabla the physics' gradient (which is
 * nabla_rad outside convective zones) and the scale s = nabla_ad in a convective zone and |nabla_rad|
 * elsewhere, but not below {@value #ISOTHERMAL_FLOOR} nabla_ad so that a nearly isothermal zone
 * (L ~ 0, nabla_rad ~ 0) does not report the ratio of two small numbers (our choice). A zone whose
 * mismatch exceeds {@value #THRESHOLD} is inconsistent: the model and the transport physics disagree
 * there (common practice to flag a 10 % disagreement; no source).
 *
 * <p>Pure static kernels over columns centre to surface.
 */
public final class ModelConsistency {
    private ModelConsistency() {
    }

    /** Mismatch above which a zone is reported inconsistent (fraction of the zone's scale). */
    public static final double THRESHOLD = 0.1;

    /** Smallest scale of a non-convective zone, as a fraction of nabla_ad. */
    public static final double ISOTHERMAL_FLOOR = 0.01;

    /** Most zone ranges a warning names before it only counts the rest. */
    static final int MAX_RANGES = 8;

    /**
     * @param t   temperature per zone (K), centre to surface, at least 3 zones
     * @param p   pressure per zone (dyn cm^-2)
     * @param out nabla_model per zone; NaN where the stencil's pressures do not decrease strictly; modified
     */
    public static void nablaModel(double[] t, double[] p, double[] out) {
        int n = t.length;
        // a window of three zones' ln T and ln P, moved outwards: no working arrays, two logs per zone
        double x0 = Math.log(p[0]);
        double x1 = Math.log(p[1]);
        double x2 = Math.log(p[2]);
        double f0 = Math.log(t[0]);
        double f1 = Math.log(t[1]);
        double f2 = Math.log(t[2]);
        out[0] = oneSided(x0, f0, x1, f1, x2, f2, true);
        for (int k = 1; k < n - 1; k++) {
            if (k > 1) {
                x0 = x1;
                x1 = x2;
                x2 = Math.log(p[k + 1]);
                f0 = f1;
                f1 = f2;
                f2 = Math.log(t[k + 1]);
            }
            if (!(x1 < x0 && x2 < x1)) {
                out[k] = Double.NaN;
            } else {
                double h0 = x1 - x0;
                double h1 = x2 - x1;
                out[k] = -h1 / (h0 * (h0 + h1)) * (f0 - f1) + h0 / (h1 * (h0 + h1)) * (f2 - f1);
            }
        }
        out[n - 1] = oneSided(x2, f2, x1, f1, x0, f0, false);
    }

    /**
     * d f / d x at x_a from three points, exact for quadratics: the centre zone and the two beyond it
     * ({@code centre}), whose ln P must fall strictly, or the surface zone and the two inside it, whose
     * ln P must rise strictly inwards; NaN otherwise.
     */
    private static double oneSided(double xa, double fa, double xb, double fb, double xc, double fc, boolean centre) {
        if (!(centre ? xb < xa && xc < xb : xb > xa && xc > xb)) {
            return Double.NaN;
        }
        double h1 = xb - xa;
        double h2 = xc - xa;
        return h2 / (h1 * (h2 - h1)) * (fb - fa) - h1 / (h2 * (h2 - h1)) * (fc - fa);
    }

    /**
     * @param nablaModel nabla_model per zone
     * @param nabla      the physics' nabla per zone
     * @param nablaRad   nabla_rad per zone
     * @param nablaAd    nabla_ad per zone
     * @param regimes    regime per zone
     * @param out        mismatch per zone (see the class comment); NaN where nabla_model is; modified
     */
    public static void mismatch(double[] nablaModel, double[] nabla, double[] nablaRad, double[] nablaAd,
                                Regime[] regimes, double[] out) {
        for (int k = 0; k < out.length; k++) {
            double scale = regimes[k] == Regime.CONVECTIVE ? nablaAd[k]
                    : Math.max(Math.abs(nablaRad[k]), ISOTHERMAL_FLOOR * nablaAd[k]);
            out[k] = Math.abs(nablaModel[k] - nabla[k]) / scale;
        }
    }

    /**
     * The warnings on a profile's consistency: zone ranges where nabla_model could not be computed,
     * and zone ranges (with their regime) where the mismatch exceeds {@link #THRESHOLD}.
     *
     * @param mismatch mismatch per zone, centre to surface
     * @param regimes  regime per zone
     * @param asGiven  maps a zone index (centre = 0) to its index in the order the host gave the zones
     * @return the warnings, empty when the profile is consistent
     */
    static List<String> warnings(double[] mismatch, Regime[] regimes, IntUnaryOperator asGiven) {
        List<String> out = new ArrayList<>();
        List<String> missing = ranges(mismatch, regimes, asGiven, true);
        if (!missing.isEmpty()) {
            out.add("nabla_model = d ln T / d ln P could not be computed at zones " + String.join(", ", missing)
                    + ", where the pressure does not decrease strictly outwards");
        }
        List<String> bad = ranges(mismatch, regimes, asGiven, false);
        if (!bad.isEmpty()) {
            int worst = -1;
            for (int k = 0; k < mismatch.length; k++) {
                if (mismatch[k] > THRESHOLD && (worst < 0 || mismatch[k] > mismatch[worst])) {
                    worst = k;
                }
            }
            out.add(String.format(Locale.ROOT, "the model and the transport physics disagree: the profile's own "
                            + "gradient nabla_model = d ln T / d ln P differs from the physics' nabla by more than "
                            + "%.0f %% (of nabla_ad in convective zones, of nabla_rad elsewhere) at zones %s; largest "
                            + "%.3g at zone %d (zones counted as given, from 0)", 100 * THRESHOLD, String.join(", ", bad),
                    mismatch[worst], asGiven.applyAsInt(worst)));
        }
        return out;
    }

    /** Runs of zones that are NaN ({@code missing}) or above the threshold, split where the regime changes. */
    private static List<String> ranges(double[] mismatch, Regime[] regimes, IntUnaryOperator asGiven,
                                       boolean missing) {
        List<String> out = new ArrayList<>();
        int count = 0;
        int n = mismatch.length;
        int k = 0;
        while (k < n) {
            if (!(missing ? Double.isNaN(mismatch[k]) : mismatch[k] > THRESHOLD)) {
                k++;
                continue;
            }
            int first = k;
            while (k + 1 < n && (missing ? Double.isNaN(mismatch[k + 1]) : mismatch[k + 1] > THRESHOLD)
                    && (missing || regimes[k + 1] == regimes[first])) {
                k++;
            }
            int a = asGiven.applyAsInt(first);
            int b = asGiven.applyAsInt(k);
            String range = (a == b ? Integer.toString(a) : Math.min(a, b) + "-" + Math.max(a, b))
                    + (missing ? "" : " (" + regimes[first].label() + ")");
            if (count < MAX_RANGES) {
                out.add(range);
            }
            count++;
            k++;
        }
        if (count > MAX_RANGES) {
            out.add("and " + (count - MAX_RANGES) + " more ranges");
        }
        return out;
    }
}
