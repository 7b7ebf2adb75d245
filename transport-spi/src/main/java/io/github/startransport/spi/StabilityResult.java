package io.github.startransport.spi;

import java.util.Arrays;

/**
 * Caller-owned, mutable result of a {@link StabilityModel}: allocate once, reuse per zone.
 *
 * <p>Derivative arrays are indexed by {@link ZoneInput} and hold plain partial derivatives.
 */
public final class StabilityResult {
    /** Creates an empty result, to be filled by a model. */
    public StabilityResult() {
    }

    /** Radiative gradient nabla_rad = 3 kappa L P / (16 pi a c G m T^4) (dimensionless). */
    public double nablaRad;
    /** Adiabatic gradient nabla_ad as given (dimensionless). */
    public double nablaAd;
    /** Ledoux gradient nabla_L = nabla_ad + (phi/delta) nabla_mu (dimensionless). */
    public double nablaLedoux;
    /** Schwarzschild margin nabla_rad - nabla_ad: positive means Schwarzschild-unstable. */
    public double marginSchwarzschild;
    /** Ledoux margin nabla_rad - nabla_L: positive means Ledoux-unstable. */
    public double marginLedoux;
    /** The regime under {@link #criterion}. */
    public Regime regime;
    /** The criterion the regime was decided by. */
    public Criterion criterion;
    /** Partial derivatives of nablaRad with respect to each {@link ZoneInput}. */
    public final double[] dNablaRad = new double[ZoneInput.COUNT];
    /** Partial derivatives of nablaLedoux with respect to each {@link ZoneInput}. */
    public final double[] dNablaLedoux = new double[ZoneInput.COUNT];

    /**
     * @return the margin whose sign decided convection, positive exactly in a convective zone: under
     *         Ledoux the Ledoux margin; under Schwarzschild the larger of the two margins, since an
     *         inverted composition gradient (nabla_mu &lt; 0, nabla_L &lt; nabla_ad) makes a zone
     *         convective under both criteria wherever nabla_rad &gt; nabla_L
     */
    public double margin() {
        return criterion == Criterion.LEDOUX ? marginLedoux : Math.max(marginSchwarzschild, marginLedoux);
    }

    @Override
    public String toString() {
        return "StabilityResult[regime=" + regime + " (" + criterion + "), nabla_rad=" + nablaRad
                + ", nabla_ad=" + nablaAd + ", nabla_L=" + nablaLedoux + ", dNablaRad=" + Arrays.toString(dNablaRad) + "]";
    }
}
