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
 * Equality counts as stable (a zone exactly at the margin carries its flux by radiation). The two
 * slow-mixing regimes are strict: semiconvective needs nabla_ad &lt; nabla_rad &lt; nabla_L and
 * thermohaline nabla_rad &lt; nabla_ad, because their mixing coefficients diverge at those
 * margins (Langer, Sugimoto &amp; Fricke 1983; Kippenhahn, Ruschenplatt &amp; Thomas 1980); a zone
 * exactly on such a margin is radiative.
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
        boolean fingers = nablaMu < 0.0 && nablaRad < nablaAd;
        if (criterion == Criterion.SCHWARZSCHILD) {
            if (schwarzschildUnstable) {
                return Regime.CONVECTIVE;
            }
            return fingers ? Regime.THERMOHALINE : Regime.RADIATIVE;
        }
        if (nablaRad > nablaLedoux) {
            return Regime.CONVECTIVE;
        }
        if (schwarzschildUnstable && nablaRad < nablaLedoux) {
            return Regime.SEMICONVECTIVE;
        }
        return fingers ? Regime.THERMOHALINE : Regime.RADIATIVE;
    }
}
