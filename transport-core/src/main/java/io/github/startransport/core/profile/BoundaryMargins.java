package io.github.startransport.core.profile;

import java.util.function.IntToDoubleFunction;

/**
 * Self-consistency of a convective edge, after Gabriel et al. (2014, A&amp;A 569, A63): at a convective
 * boundary the criterion must be marginal when the boundary is approached from the convective side,
 * nabla_rad = nabla_crit there (nabla_crit = nabla_ad under Schwarzschild, nabla_L under Ledoux). Where
 * the composition jumps at the edge (a convective core that grew into a region of other composition), the
 * criterion can jump too, and a boundary placed where it changes sign between two zones has a clearly
 * convective side: the boundary is misplaced and a host should move it (outwards, for a core whose margin
 * on the convective side is positive).
 *
 * <p>The margin reported is (nabla_rad - nabla_crit) / nabla_ad, the chosen criterion's convective margin
 * in units of nabla_ad, <b>extrapolated to the edge</b> along the straight line through the two convective
 * zones nearest it (the zone's own value when the region has one zone), rather than the last zone's own
 * value, which differs from the edge's by the margin's change over up to one zone. For a smooth profile the
 * edge was located by the straight line through the last convective zone and the first stable one, so the
 * extrapolation from the other side leaves only the error of straight lines over about one zone, which
 * vanishes as the zones get finer: on the demo star the core's top edge gives -0.020, -7.7e-4, -9.1e-5 and
 * -3.2e-5 at 100, 200, 800 and 3200 zones, and the envelope's bottom edge -2.4e-3 to -8.9e-6. A jump at the
 * edge stays whatever the resolution.
 *
 * <p>The diagnosis warns where |margin| exceeds {@link #MISPLACED} = 0.02. Why that value: it is above what
 * a smooth profile leaves at the resolutions hosts use (the figures above, from 200 zones upwards), and a
 * composition step at the edge that changes the opacity by a few per cent (kappa of an ionised mixture is
 * proportional to 1 + X for electron scattering and Kramers' laws) already leaves more on the convective
 * side. It is a threshold of our own choosing (no source). Pure static helpers.
 */
public final class BoundaryMargins {
    private BoundaryMargins() {
    }

    /** |margin| above which an edge is reported as misplaced (dimensionless, in units of nabla_ad). */
    public static final double MISPLACED = 0.02;

    /**
     * The margin on the convective side of an edge, extrapolated to it.
     *
     * @param r       radius per zone (cm), increasing
     * @param margin  the criterion's convective margin per zone (dimensionless)
     * @param nablaAd nabla_ad per zone (dimensionless)
     * @param inner   the convective zone nearest the edge
     * @param next    the convective zone next to it, away from the edge, or -1 when the region has only one zone
     * @param edge    radius of the edge (cm)
     * @return (nabla_rad - nabla_crit) / nabla_ad at the edge, seen from the convective side (dimensionless)
     */
    public static double inside(double[] r, double[] margin, double[] nablaAd, int inner, int next, double edge) {
        return inside(r, k -> margin[k], nablaAd, inner, next, edge);
    }

    /**
     * {@link #inside(double[], double[], double[], int, int, double)} with the margin computed per zone.
     *
     * @param r       radius per zone (cm), increasing
     * @param margin  the criterion's convective margin of a zone (dimensionless)
     * @param nablaAd nabla_ad per zone (dimensionless)
     * @param inner   the convective zone nearest the edge
     * @param next    the convective zone next to it, away from the edge, or -1 when the region has only one zone
     * @param edge    radius of the edge (cm)
     * @return (nabla_rad - nabla_crit) / nabla_ad at the edge, seen from the convective side (dimensionless)
     */
    public static double inside(double[] r, IntToDoubleFunction margin, double[] nablaAd, int inner, int next,
                                double edge) {
        double m1 = margin.applyAsDouble(inner) / nablaAd[inner];
        if (next < 0) {
            return m1;
        }
        double m2 = margin.applyAsDouble(next) / nablaAd[next];
        double slope = (m1 - m2) / (r[inner] - r[next]);
        return m1 + slope * (edge - r[inner]);
    }
}
