package io.github.startransport.core.profile;

import io.github.startransport.core.gradient.GasRadiation;

/**
 * nabla_mu = d ln mu / d ln P from a profile's composition columns, with mu of a fully ionised
 * mixture ({@link GasRadiation#meanMolecularWeight}).
 *
 * <p>Derivative in ln P by the three-point formula for non-uniform spacing at interior zones
 * (exact for quadratics; e.g. Fornberg 1988, Math. Comp. 51, 699) and one-sided differences at
 * the two ends. A composition step between two zones therefore shows up in both of them.
 *
 * <p>Neighbouring zones of equal pressure are allowed where their composition is the same (then
 * d ln mu = 0 between them, whatever d ln P is): such a pair drops out of the stencil, and a zone
 * between two of them gets nabla_mu = 0. The caller makes sure that pressure falls strictly between
 * zones whose composition differs.
 */
public final class CompositionGradient {
    private CompositionGradient() {
    }

    /**
     * @param hydrogen X per zone
     * @param metals   Z per zone
     * @param pressure P per zone (dyn cm^-2): not rising outwards, and falling strictly between neighbouring
     *                 zones whose X or Z differ
     * @param out      nabla_mu per zone; modified
     */
    public static void nablaMu(double[] hydrogen, double[] metals, double[] pressure, double[] out) {
        int n = pressure.length;
        double[] lnMu = new double[n];
        double[] lnP = new double[n];
        for (int k = 0; k < n; k++) {
            lnMu[k] = Math.log(GasRadiation.meanMolecularWeight(hydrogen[k], metals[k]));
            lnP[k] = Math.log(pressure[k]);
        }
        // "+ 0.0" turns the -0.0 of a uniform composition (0 / negative) into 0.0
        out[0] = oneSided(lnMu[1] - lnMu[0], lnP[1] - lnP[0]);
        out[n - 1] = oneSided(lnMu[n - 1] - lnMu[n - 2], lnP[n - 1] - lnP[n - 2]);
        for (int k = 1; k < n - 1; k++) {
            double h0 = lnP[k] - lnP[k - 1];
            double h1 = lnP[k + 1] - lnP[k];
            if (h0 == 0.0 || h1 == 0.0) {
                // a pair of equal pressure and equal composition: the other side alone (or 0 when both are such pairs)
                out[k] = h0 == 0.0 ? oneSided(lnMu[k + 1] - lnMu[k], h1) : oneSided(lnMu[k] - lnMu[k - 1], h0);
                continue;
            }
            // the three weights sum to zero; written on differences so that a uniform composition
            // gives exactly 0 rather than rounding noise of either sign
            out[k] = (-h1 / (h0 * (h0 + h1))) * (lnMu[k - 1] - lnMu[k])
                    + (h0 / (h1 * (h0 + h1))) * (lnMu[k + 1] - lnMu[k]) + 0.0;
        }
    }

    /** d ln mu / d ln P over one pair of zones; 0 for a pair of equal pressure (and so equal composition). */
    private static double oneSided(double dLnMu, double dLnP) {
        return dLnP == 0.0 ? 0.0 : dLnMu / dLnP + 0.0;
    }
}
