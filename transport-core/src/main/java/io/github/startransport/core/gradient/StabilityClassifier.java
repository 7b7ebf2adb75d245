package io.github.startransport.core.gradient;

import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.Regime;

/**
 * Local stability classification of a zone from its gradients: the one rule set that the
 * stability test, the convection models and the profile diagnosis share.
 *
 * <p>With nabla_L = nabla_ad + (phi/delta) nabla_mu (Kippenhahn, Weigert &amp; Weiss 2012 §6.1,
 * from memory) and, where nabla_mu &lt; 0, the density ratio
 * R0 = (nabla_rad - nabla_ad) / ((phi/delta) nabla_mu):
 * <table>
 *   <caption>Regime of a zone</caption>
 *   <tr><th>nabla_mu</th><th>gradients</th><th>Schwarzschild</th><th>Ledoux</th></tr>
 *   <tr><td>&lt; 0</td><td>nabla_rad &gt; nabla_L (R0 &lt; 1)</td><td>convective</td><td>convective</td></tr>
 *   <tr><td>&lt; 0</td><td>nabla_rad &lt;= nabla_L (R0 &gt;= 1)</td><td>thermohaline</td><td>thermohaline</td></tr>
 *   <tr><td>= 0</td><td>nabla_rad &gt; nabla_ad</td><td>convective</td><td>convective</td></tr>
 *   <tr><td>= 0</td><td>nabla_rad &lt;= nabla_ad</td><td>radiative</td><td>radiative</td></tr>
 *   <tr><td>&gt; 0</td><td>nabla_rad &gt; nabla_L</td><td>convective</td><td>convective</td></tr>
 *   <tr><td>&gt; 0</td><td>nabla_ad &lt; nabla_rad &lt;= nabla_L</td><td>convective</td><td>semiconvective
 *       (radiative at nabla_rad = nabla_L)</td></tr>
 *   <tr><td>&gt; 0</td><td>nabla_rad &lt;= nabla_ad</td><td>radiative</td><td>radiative</td></tr>
 * </table>
 *
 * <p>Why:
 * <ul>
 *   <li>An inverted composition gradient (nabla_mu &lt; 0) destabilises. Where nabla_rad &gt; nabla_L
 *       (R0 &lt; 1) an adiabatic element is buoyant: the zone is dynamically unstable whatever the
 *       criterion, so both call it convective (this includes Schwarzschild-stable zones,
 *       nabla_L &lt; nabla_rad &lt;= nabla_ad). For R0 &gt;= 1 it is stable to adiabatic overturning
 *       but unstable to the double-diffusive fingering of Kippenhahn, Ruschenplatt &amp; Thomas (1980,
 *       A&amp;A 91, 175); see also Traxler, Garaud &amp; Stellmach (2011, ApJ 728, L29) and Brown et al.
 *       (2013, ApJ 768, 34). Fingers grow only for 1 &lt; R0 &lt; 1/tau, tau the ratio of the
 *       composition to the thermal diffusivity; this library has no composition diffusivity and
 *       keeps the thermohaline coefficient for every R0 &gt;= 1 (it falls as 1/R0; common practice,
 *       no source): a host that knows tau sets the coefficient to 0 above 1/tau.</li>
 *   <li>The criteria differ only where the composition gradient stabilises (nabla_mu &gt; 0): the
 *       Schwarzschild criterion ignores it (it assumes the gradient mixed away), the Ledoux one
 *       counts it and calls the zones between nabla_ad and nabla_L semiconvective.</li>
 *   <li>A negative luminosity (inward energy flow, e.g. a neutrino-cooled core) gives
 *       nabla_rad &lt; 0 &lt; nabla_ad and needs no rule of its own: such a zone is radiative unless
 *       nabla_mu &lt; 0, and then thermohaline or, where nabla_L &lt; nabla_rad, convective.</li>
 *   <li>Equality counts as stable: a zone exactly on a margin (nabla_rad = nabla_L, or
 *       nabla_rad = nabla_ad with nabla_mu &gt;= 0) is not convective, and a zone exactly on the Ledoux
 *       margin of a semiconvective layer is radiative, because the semiconvective coefficient
 *       diverges there (Langer, Sugimoto &amp; Fricke 1983). The thermohaline coefficient stays
 *       finite on its margin (it is C_t K_T / R0 and R0 = 1 there).</li>
 * </ul>
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
        if (nablaMu < 0.0) {
            // destabilising composition: the same under both criteria. nabla_rad < nabla_ad holds in every
            // thermohaline zone (nabla_rad <= nabla_L < nabla_ad) unless (phi/delta) nabla_mu is below the
            // rounding of nabla_ad, so that nabla_L = nabla_ad = nabla_rad: a zone on both margins, radiative
            if (nablaRad > nablaLedoux) {
                return Regime.CONVECTIVE;
            }
            return nablaRad < nablaAd ? Regime.THERMOHALINE : Regime.RADIATIVE;
        }
        if (nablaRad > nablaLedoux) {
            return Regime.CONVECTIVE;
        }
        if (nablaRad > nablaAd) {
            // Schwarzschild-unstable, Ledoux-stable (nabla_mu > 0)
            if (criterion == Criterion.SCHWARZSCHILD) {
                return Regime.CONVECTIVE;
            }
            return nablaRad < nablaLedoux ? Regime.SEMICONVECTIVE : Regime.RADIATIVE;
        }
        return Regime.RADIATIVE;
    }

    /**
     * The margin whose sign decides convection under a criterion: positive exactly where
     * {@link #classify} says convective. Under Ledoux nabla_rad - nabla_L; under Schwarzschild
     * nabla_rad - min(nabla_ad, nabla_L), since a destabilising composition gradient counts under
     * both criteria and a stabilising one only under Ledoux.
     *
     * @param criterion   criterion to judge by
     * @param nablaRad    radiative gradient
     * @param nablaAd     adiabatic gradient
     * @param nablaLedoux Ledoux gradient
     * @return the margin (dimensionless)
     */
    public static double convectiveMargin(Criterion criterion, double nablaRad, double nablaAd, double nablaLedoux) {
        double threshold = criterion == Criterion.LEDOUX ? nablaLedoux : Math.min(nablaAd, nablaLedoux);
        return nablaRad - threshold;
    }
}
