package io.github.startransport.core.convection;

import io.github.startransport.spi.Checks;
import io.github.startransport.spi.InvalidInputException;

/**
 * Overshoot mixing applied across a profile, at both edges of every convective region: the kernel
 * behind {@link io.github.startransport.spi.ProfileDiagnoser#overshoot} and the diagnosis.
 *
 * <p><b>Exponential diffusive overshoot</b> (Freytag, Ludwig &amp; Steffen 1996, A&amp;A 313, 497;
 * Herwig 2000, A&amp;A 360, 952): the mixing coefficient decays as
 * <pre>
 *   D_ov(r) = D_0 exp(-2 |r - r_0| / (f H)),
 * </pre>
 * with r_0 a distance f0 H inside the convective region from the edge and D_0 the region's own
 * coefficient there. Where D_0 is taken follows the convention described by Anders &amp; Pedersen (2023,
 * Galaxies 11, 56, §2; from memory) and used by Pedersen et al. (2018, A&amp;A 614, A128, with
 * f0 = 0.005; from memory): in mixing-length theory the convective coefficient falls to zero at a
 * Schwarzschild edge, so D_0 is read f0 H inside it, and the exponential runs from r_0 outwards, through
 * the last f0 H of the convective region and past its edge. At the edge itself D_ov = D_0 exp(-2 f0 / f).
 *
 * <p><b>Step overshoot</b>: D_ov = D_0 (from the same r_0) from r_0 to a distance alpha_ov H beyond the
 * edge, 0 further out. Only the mixing is extended: the temperature gradient there stays the radiative one
 * ("overshooting" in the sense of Zahn 1991, A&amp;A 252, 179, as opposed to "penetration", where it would
 * be adiabatic; the diagnosis does not change any gradient).
 *
 * <p><b>Small convective regions.</b> H is the pressure scale height at the edge, H_P (linear in r between
 * the two zones around the edge), but at most the region's thickness (for a convective core, its radius):
 * H = min(H_P, r_top - r_bottom). Near the centre H_P grows without bound, so a small core would otherwise
 * overshoot by more than its own size (common practice, no source).
 *
 * <p><b>Where overshoot mixing ends.</b> Where D_ov falls below a floor, {@link #DEFAULT_FLOOR} =
 * 1e-2 cm^2 s^-1 unless the caller sets another: such a coefficient moves material by
 * sqrt(D t) ~ 6e7 cm (600 km) in 1e10 yr, nothing on the scale of a star (our estimate). The reach
 * reported for each edge is that point (for the exponential, r_0 + (f H / 2) ln(D_0 / floor) outwards),
 * at least the edge itself and at most the centre or the surface. A D_0 at or below the floor gives no
 * overshoot (the reach is the edge).
 *
 * <p>Each zone gets the largest D_ov of all edges that reach it. Pure static kernel; allocates nothing.
 */
public final class OvershootMixing {
    private OvershootMixing() {
    }

    /** Default f0: where D_0 is taken, in units of H inside the edge (Pedersen et al. 2018, from memory). */
    public static final double DEFAULT_F0 = 0.005;

    /** Default floor of the overshoot coefficient (cm^2 s^-1): below it overshoot mixing ends (our estimate). */
    public static final double DEFAULT_FLOOR = 1e-2;

    /**
     * Validates overshoot settings.
     *
     * @param f     exponential parameter f (dimensionless), &gt;= 0
     * @param f0    where D_0 is taken, in units of H inside the edge (dimensionless), in [0, 1)
     * @param step  step length alpha_ov in units of H (dimensionless), &gt;= 0; not together with f &gt; 0
     * @param floor coefficient below which overshoot mixing ends (cm^2 s^-1), &gt; 0
     * @throws InvalidInputException naming the bad setting
     */
    public static void checkSettings(double f, double f0, double step, double floor) {
        Checks.closedInterval("overshoot-f", f, 0.0, Double.MAX_VALUE, "1", InvalidInputException.NO_ZONE);
        if (!(f0 >= 0.0 && f0 < 1.0)) {
            throw new InvalidInputException("overshoot-f0", f0, "1", InvalidInputException.NO_ZONE, "inside [0, 1)");
        }
        Checks.closedInterval("overshoot-step", step, 0.0, Double.MAX_VALUE, "1", InvalidInputException.NO_ZONE);
        Checks.positive("overshoot-floor", floor, "cm^2 s^-1", InvalidInputException.NO_ZONE);
        if (f > 0.0 && step > 0.0) {
            throw new InvalidInputException("overshoot-step", step, "1", InvalidInputException.NO_ZONE,
                    "0 when overshoot-f > 0 (here " + f + "): exponential and step overshoot are alternatives");
        }
    }

    /**
     * The overshoot coefficient of every zone and the reach of every edge (see the class comment).
     *
     * @param radius       r per zone, centre to surface, strictly increasing (cm), &gt; 0
     * @param scaleHeight  H_P per zone (cm), finite and &gt; 0
     * @param diffusion    each zone's coefficient without overshoot (cm^2 s^-1), finite and &gt;= 0
     * @param regionBottom bottom radius of each convective region, in order (cm); at or below radius[0]: the centre
     * @param regionTop    top radius of each convective region (cm); at or above radius[n - 1]: the surface
     * @param f            exponential parameter (dimensionless), &gt;= 0
     * @param f0           where D_0 is taken, in units of H inside the edge (dimensionless), in [0, 1)
     * @param step         step length in units of H (dimensionless), &gt;= 0, not with f &gt; 0
     * @param floor        coefficient below which overshoot ends (cm^2 s^-1), &gt; 0
     * @param overshoot    output per zone (cm^2 s^-1), overwritten
     * @param reachBottom  output per region: r where overshoot below it ends (cm), NaN without a bottom edge or overshoot
     * @param reachTop     output per region: r where overshoot above it ends (cm), NaN without a top edge or overshoot
     * @throws InvalidInputException naming the column index of the first bad value, or a bad length or setting
     */
    public static void profile(double[] radius, double[] scaleHeight, double[] diffusion, double[] regionBottom,
                               double[] regionTop, double f, double f0, double step, double floor,
                               double[] overshoot, double[] reachBottom, double[] reachTop) {
        checkSettings(f, f0, step, floor);
        int n = radius.length;
        int regions = regionBottom.length;
        checkColumns(radius, scaleHeight, diffusion, regionBottom, regionTop, overshoot, reachBottom, reachTop);
        java.util.Arrays.fill(overshoot, 0.0);
        java.util.Arrays.fill(reachBottom, Double.NaN);
        java.util.Arrays.fill(reachTop, Double.NaN);
        if (f == 0.0 && step == 0.0) {
            return;
        }
        for (int i = 0; i < regions; i++) {
            double bottom = regionBottom[i];
            double top = regionTop[i];
            double thickness = top - bottom;
            if (bottom > radius[0]) {
                reachBottom[i] = edge(radius, scaleHeight, diffusion, bottom, thickness, -1, f, f0, step, floor,
                        overshoot);
            }
            if (top < radius[n - 1]) {
                reachTop[i] = edge(radius, scaleHeight, diffusion, top, thickness, +1, f, f0, step, floor,
                        overshoot);
            }
        }
    }

    /**
     * One edge: fills the zones it reaches (keeping the larger coefficient) and returns its reach.
     *
     * @param outward +1 for a top edge (overshoot outwards), -1 for a bottom edge (inwards)
     */
    private static double edge(double[] r, double[] hp, double[] d, double at, double thickness, int outward,
                               double f, double f0, double step, double floor, double[] out) {
        int n = r.length;
        double h = Math.min(interpolate(r, hp, at), thickness);
        double start = at - outward * f0 * h;
        double d0 = interpolate(r, d, start);
        if (!(d0 > floor)) {
            return at;
        }
        // distance from r_0 over which overshoot mixes
        double reachFromStart;
        double decay;
        if (f > 0.0) {
            decay = 0.5 * f * h;
            reachFromStart = decay * Math.log(d0 / floor);
        } else {
            decay = Double.POSITIVE_INFINITY;
            reachFromStart = f0 * h + step * h;
        }
        double end = start + outward * reachFromStart;
        // zones from r_0 outwards up to the end
        int k = lowerIndex(r, start);
        if (outward > 0) {
            for (int j = Math.max(k, 0); j < n && r[j] <= end; j++) {
                if (r[j] >= start) {
                    out[j] = Math.max(out[j], value(d0, r[j] - start, decay));
                }
            }
        } else {
            for (int j = Math.min(k + 1, n - 1); j >= 0 && r[j] >= end; j--) {
                if (r[j] <= start) {
                    out[j] = Math.max(out[j], value(d0, start - r[j], decay));
                }
            }
        }
        double reach = outward > 0 ? Math.max(end, at) : Math.min(end, at);
        return outward > 0 ? Math.min(reach, r[n - 1]) : Math.max(reach, 0.0);
    }

    private static double value(double d0, double distance, double decay) {
        return decay == Double.POSITIVE_INFINITY ? d0 : d0 * Math.exp(-distance / decay);
    }

    /** The largest j with r[j] &lt;= x, or -1 when x &lt; r[0] (binary search, no allocation). */
    static int lowerIndex(double[] r, double x) {
        int lo = -1;
        int hi = r.length;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (r[mid] <= x) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** The column linearly interpolated in r at x; its end values outside [r[0], r[n - 1]]. */
    static double interpolate(double[] r, double[] column, double x) {
        int n = r.length;
        int j = lowerIndex(r, x);
        if (j < 0) {
            return column[0];
        }
        if (j >= n - 1) {
            return column[n - 1];
        }
        double w = (x - r[j]) / (r[j + 1] - r[j]);
        return column[j] + w * (column[j + 1] - column[j]);
    }

    private static void checkColumns(double[] radius, double[] scaleHeight, double[] diffusion,
                                     double[] regionBottom, double[] regionTop, double[] overshoot,
                                     double[] reachBottom, double[] reachTop) {
        int n = radius.length;
        int regions = regionBottom.length;
        if (n < 2) {
            throw new InvalidInputException("radius.length", n, "zones", InvalidInputException.NO_ZONE, ">= 2");
        }
        length("scaleHeight.length", scaleHeight.length, n);
        length("diffusion.length", diffusion.length, n);
        length("overshoot.length", overshoot.length, n);
        length("regionTop.length", regionTop.length, regions);
        length("reachBottom.length", reachBottom.length, regions);
        length("reachTop.length", reachTop.length, regions);
        for (int k = 0; k < n; k++) {
            Checks.positive("radius", radius[k], "cm", k);
            if (k > 0 && !(radius[k] > radius[k - 1])) {
                throw new InvalidInputException("radius", radius[k], "cm", k,
                        "strictly increasing (zone before it: " + radius[k - 1] + " cm)");
            }
            Checks.positive("scaleHeight", scaleHeight[k], "cm", k);
            Checks.closedInterval("diffusion", diffusion[k], 0.0, Double.MAX_VALUE, "cm^2 s^-1", k);
        }
        double previousTop = 0.0;
        for (int i = 0; i < regions; i++) {
            Checks.closedInterval("regionBottom", regionBottom[i], previousTop, Double.MAX_VALUE, "cm", i);
            if (!(regionTop[i] > regionBottom[i]) || regionTop[i] == Double.POSITIVE_INFINITY) {
                throw new InvalidInputException("regionTop", regionTop[i], "cm", i,
                        "finite and above the region's bottom (" + regionBottom[i] + " cm)");
            }
            previousTop = regionTop[i];
        }
    }

    private static void length(String field, int length, int expected) {
        if (length != expected) {
            throw new InvalidInputException(field, length, "entries", InvalidInputException.NO_ZONE,
                    "equal to " + expected);
        }
    }
}
