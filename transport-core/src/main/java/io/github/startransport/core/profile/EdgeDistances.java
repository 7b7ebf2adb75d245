package io.github.startransport.core.profile;

import io.github.startransport.core.gradient.LedouxGradient;
import io.github.startransport.core.gradient.RadiativeGradient;
import io.github.startransport.core.gradient.StabilityClassifier;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.Regime;

/**
 * The distance from every zone to the nearest edge of a convective region, for convection models whose length
 * scale is that distance ({@link io.github.startransport.spi.ConvectionModel#needsEdgeDistance()}).
 *
 * <p>Zones are classified by {@link StabilityClassifier} with nabla_rad computed as the convection kernels do
 * (the same arithmetic, so the regimes agree), and the edges located like the diagnosis's region edges: where
 * the criterion's convective margin changes sign between two zones, by {@link BoundaryFinder}. The centre and
 * the surface are not edges: a convective zone's distance is to the nearer edge of its own region that lies
 * inside the star, +infinity when its region has none (the whole star convective). A stable zone gets the
 * distance to the nearest edge of any convective region (+infinity when there is none); models read it only in
 * convective zones.
 */
final class EdgeDistances {
    private EdgeDistances() {
    }

    /**
     * @return the distance of each zone to its nearest convective edge (cm), &gt; 0, or +infinity
     */
    static double[] of(Criterion criterion, double[] r, double[] m, double[] t, double[] pres, double[] lum,
                       double[] kappa, double[] nablaAd, double[] delta, double[] phi, double[] nablaMu) {
        int n = r.length;
        boolean[] convective = new boolean[n];
        double[] margin = new double[n];
        for (int k = 0; k < n; k++) {
            double nablaRad = RadiativeGradient.value(kappa[k], 1.0, pres[k], m[k], t[k]) * lum[k];
            double nablaL = LedouxGradient.value(nablaAd[k], phi[k], delta[k], nablaMu[k]);
            convective[k] = StabilityClassifier.classify(criterion, nablaRad, nablaAd[k], nablaL, nablaMu[k])
                    == Regime.CONVECTIVE;
            margin[k] = StabilityClassifier.convectiveMargin(criterion, nablaRad, nablaAd[k], nablaL);
        }
        // edges between zone k and k + 1 where convection starts or stops
        double[] edges = new double[n];
        int count = 0;
        for (int k = 0; k + 1 < n; k++) {
            if (convective[k] != convective[k + 1]) {
                edges[count++] = BoundaryFinder.root(r[k], margin[k], r[k + 1], margin[k + 1]);
            }
        }
        double[] distance = new double[n];
        int k = 0;
        while (k < n) {
            int first = k;
            while (k + 1 < n && convective[k + 1] == convective[first]) {
                k++;
            }
            int last = k;
            k++;
            for (int j = first; j <= last; j++) {
                double best = Double.POSITIVE_INFINITY;
                if (convective[first]) {
                    if (first > 0) {
                        best = Math.min(best, r[j] - BoundaryFinder.root(r[first - 1], margin[first - 1], r[first],
                                margin[first]));
                    }
                    if (last < n - 1) {
                        best = Math.min(best, BoundaryFinder.root(r[last], margin[last], r[last + 1],
                                margin[last + 1]) - r[j]);
                    }
                } else {
                    for (int e = 0; e < count; e++) {
                        best = Math.min(best, Math.abs(r[j] - edges[e]));
                    }
                }
                distance[j] = best;
            }
        }
        return distance;
    }
}
