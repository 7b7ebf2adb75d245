package io.github.startransport.spi;

import java.util.List;

/**
 * Whole-model asymptotic seismic integrals of a diagnosis (Tassoul 1980, ApJS 43, 469; Aerts,
 * Christensen-Dalsgaard &amp; Kurtz 2010, Asteroseismology, §3.4).
 *
 * @param acousticRadius    tau = integral of dr / c_s from the centre to the surface (s)
 * @param largeSeparation   Delta nu = 1 / (2 tau) (Hz)
 * @param periodSpacingL1   Delta Pi_1 = 2 pi^2 / sqrt(2) / integral of N / r dr over N^2 &gt; 0 (s);
 *                          NaN where no zone has N^2 &gt; 0
 * @param convectiveRegions acoustic depth below the surface, integral of dr / c_s from r to R, of the
 *                          edges of each convective region, centre to surface
 */
public record SeismicSummary(double acousticRadius, double largeSeparation, double periodSpacingL1,
                             List<RegionDepths> convectiveRegions) {
    /**
     * Copies the list.
     *
     * @param acousticRadius    tau (s)
     * @param largeSeparation   Delta nu (Hz)
     * @param periodSpacingL1   Delta Pi_1 (s), or NaN
     * @param convectiveRegions acoustic depths of the convective regions' edges
     */
    public SeismicSummary {
        convectiveRegions = List.copyOf(convectiveRegions);
    }

    /**
     * The acoustic depths of one convective region's edges.
     *
     * @param region              the region (one of {@link ProfileDiagnosis#regions()})
     * @param acousticDepthBottom acoustic depth of its bottom (s)
     * @param acousticDepthTop    acoustic depth of its top (s), 0 at the surface
     */
    public record RegionDepths(Region region, double acousticDepthBottom, double acousticDepthTop) {
    }

    /**
     * @param region a region of the same diagnosis
     * @return its acoustic depths, or {@code null} when it is not a convective region here
     */
    public RegionDepths depthsOf(Region region) {
        for (RegionDepths d : convectiveRegions) {
            if (d.region() == region || d.region().equals(region)) {
                return d;
            }
        }
        return null;
    }
}
