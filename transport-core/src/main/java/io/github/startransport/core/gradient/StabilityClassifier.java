package io.github.startransport.core.gradient;

import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.Regime;

/**
 * Local stability classification of a zone from its gradients.
 *
 * <p>Definitions (Kippenhahn, Weigert &amp; Weiss 2012 §6.1 and §6.2, from memory):
 * <ul>
 *   <li>Ledoux criterion: convective where nabla_rad &gt; nabla_L; otherwise semiconvective
 *       where nabla_ad &lt; nabla_rad (Schwarzschild-unstable, Ledoux-stable), thermohaline where
 *       nabla_mu &lt; 0, radiative elsewhere.</li>
 *   <li>Schwarzschild criterion: convective where nabla_rad &gt; nabla_ad; otherwise thermohaline
 *       where nabla_mu &lt; 0 and radiative elsewhere. A zone the Ledoux test would call
 *       semiconvective is convective here by definition.</li>
 * </ul>
 * Equality counts as stable (a zone exactly at the margin carries its flux by radiation).
 */
public final class StabilityClassifier {
    private StabilityClassifier() {
    }

    /**
     * @param criterion   criterion to judge by
     * @param nablaRad    radiative gradient
     * @param nablaAd     adiabatic gradient
     * @param nablaLedoux Ledoux gradient
     * @param nablaMu     composition gradient d ln mu / d ln P
     * @return the regime
     */
    public static Regime classify(Criterion criterion, double nablaRad, double nablaAd, double nablaLedoux,
                                  double nablaMu) {
        boolean schwarzschildUnstable = nablaRad > nablaAd;
        if (criterion == Criterion.SCHWARZSCHILD) {
            if (schwarzschildUnstable) {
                return Regime.CONVECTIVE;
            }
            return nablaMu < 0.0 ? Regime.THERMOHALINE : Regime.RADIATIVE;
        }
        if (nablaRad > nablaLedoux) {
            return Regime.CONVECTIVE;
        }
        if (schwarzschildUnstable) {
            return Regime.SEMICONVECTIVE;
        }
        return nablaMu < 0.0 ? Regime.THERMOHALINE : Regime.RADIATIVE;
    }
}
