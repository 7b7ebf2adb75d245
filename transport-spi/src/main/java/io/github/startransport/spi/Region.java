package io.github.startransport.spi;

import java.util.OptionalDouble;

/**
 * A contiguous run of zones in one non-radiative regime, with its boundaries located between
 * grid points by linear interpolation of the quantity whose sign change defines them.
 *
 * <p>A region that reaches the innermost zone has its bottom at the centre (r = 0, m = 0); one
 * that reaches the outermost zone has its top at the surface (r = R, m = M).
 *
 * @param regime                  the regime
 * @param bottomRadius            r at the bottom (cm)
 * @param topRadius               r at the top (cm)
 * @param bottomMass              m at the bottom (g)
 * @param topMass                 m at the top (g)
 * @param bottomRadiusFraction    r/R at the bottom
 * @param topRadiusFraction       r/R at the top
 * @param bottomMassFraction      m/M at the bottom
 * @param topMassFraction         m/M at the top
 * @param scaleHeights            thickness in pressure scale heights, ln(P_bottom / P_top)
 * @param bottomSchwarzschild     bottom radius by the Schwarzschild margin, where one lies next to the bottom (cm)
 * @param topSchwarzschild        top radius by the Schwarzschild margin, where one lies next to the top (cm)
 * @param bottomLedoux            bottom radius by the Ledoux margin, where one lies next to the bottom (cm)
 * @param topLedoux               top radius by the Ledoux margin, where one lies next to the top (cm)
 * @param turnoverGlobal          convective regions: integral of dr / v_conv across the region; for a region
 *                                that reaches the centre (a core, where that integral diverges) its radius over
 *                                its mass-weighted mean v_conv (s)
 * @param turnoverLocal           convective regions: l / v_conv half a mixing length inside the region from its
 *                                boundary with the radiative interior: above the bottom, or below the top of a
 *                                core (s)
 * @param maxVelocity             convective regions: largest v_conv in the region (cm s^-1)
 * @param firstZone               index of the innermost zone in the region
 * @param lastZone                index of the outermost zone in the region
 * @param overshootBottom         convective regions with overshoot applied: r where overshoot mixing below
 *                                the bottom edge ends (cm); empty at the centre or without overshoot
 * @param overshootTop            convective regions with overshoot applied: r where overshoot mixing above
 *                                the top edge ends (cm); empty at the surface or without overshoot
 * @param marginInsideBottom      convective regions: the criterion's margin on the convective side of the
 *                                bottom edge, (nabla_rad - nabla_crit) / nabla_ad extrapolated to the edge from
 *                                the two innermost convective zones (dimensionless); ~0 where the edge is placed
 *                                self-consistently; empty at the centre
 * @param marginInsideTop         the same at the top edge, from the two outermost convective zones; empty at
 *                                the surface
 */
public record Region(Regime regime,
                     double bottomRadius, double topRadius, double bottomMass, double topMass,
                     double bottomRadiusFraction, double topRadiusFraction,
                     double bottomMassFraction, double topMassFraction,
                     double scaleHeights,
                     OptionalDouble bottomSchwarzschild, OptionalDouble topSchwarzschild,
                     OptionalDouble bottomLedoux, OptionalDouble topLedoux,
                     OptionalDouble turnoverGlobal, OptionalDouble turnoverLocal, OptionalDouble maxVelocity,
                     int firstZone, int lastZone,
                     OptionalDouble overshootBottom, OptionalDouble overshootTop,
                     OptionalDouble marginInsideBottom, OptionalDouble marginInsideTop) {

    /**
     * A region without overshoot and boundary margins (all four empty): the components before them as in
     * the canonical constructor.
     *
     * @param regime               the regime
     * @param bottomRadius         r at the bottom (cm)
     * @param topRadius            r at the top (cm)
     * @param bottomMass           m at the bottom (g)
     * @param topMass              m at the top (g)
     * @param bottomRadiusFraction r/R at the bottom
     * @param topRadiusFraction    r/R at the top
     * @param bottomMassFraction   m/M at the bottom
     * @param topMassFraction      m/M at the top
     * @param scaleHeights         thickness in pressure scale heights
     * @param bottomSchwarzschild  bottom radius by the Schwarzschild margin (cm)
     * @param topSchwarzschild     top radius by the Schwarzschild margin (cm)
     * @param bottomLedoux         bottom radius by the Ledoux margin (cm)
     * @param topLedoux            top radius by the Ledoux margin (cm)
     * @param turnoverGlobal       global turnover time (s)
     * @param turnoverLocal        local turnover time (s)
     * @param maxVelocity          largest v_conv (cm s^-1)
     * @param firstZone            index of the innermost zone
     * @param lastZone             index of the outermost zone
     */
    public Region(Regime regime,
                  double bottomRadius, double topRadius, double bottomMass, double topMass,
                  double bottomRadiusFraction, double topRadiusFraction,
                  double bottomMassFraction, double topMassFraction,
                  double scaleHeights,
                  OptionalDouble bottomSchwarzschild, OptionalDouble topSchwarzschild,
                  OptionalDouble bottomLedoux, OptionalDouble topLedoux,
                  OptionalDouble turnoverGlobal, OptionalDouble turnoverLocal, OptionalDouble maxVelocity,
                  int firstZone, int lastZone) {
        this(regime, bottomRadius, topRadius, bottomMass, topMass, bottomRadiusFraction, topRadiusFraction,
                bottomMassFraction, topMassFraction, scaleHeights, bottomSchwarzschild, topSchwarzschild,
                bottomLedoux, topLedoux, turnoverGlobal, turnoverLocal, maxVelocity, firstZone, lastZone,
                OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty());
    }

    /**
     * @param newOvershootBottom    see {@link #overshootBottom()}
     * @param newOvershootTop       see {@link #overshootTop()}
     * @param newMarginInsideBottom see {@link #marginInsideBottom()}
     * @param newMarginInsideTop    see {@link #marginInsideTop()}
     * @return this region with those four components replaced
     */
    public Region withEdges(OptionalDouble newOvershootBottom, OptionalDouble newOvershootTop,
                            OptionalDouble newMarginInsideBottom, OptionalDouble newMarginInsideTop) {
        return new Region(regime, bottomRadius, topRadius, bottomMass, topMass, bottomRadiusFraction,
                topRadiusFraction, bottomMassFraction, topMassFraction, scaleHeights, bottomSchwarzschild,
                topSchwarzschild, bottomLedoux, topLedoux, turnoverGlobal, turnoverLocal, maxVelocity, firstZone,
                lastZone, newOvershootBottom, newOvershootTop, newMarginInsideBottom, newMarginInsideTop);
    }
}
