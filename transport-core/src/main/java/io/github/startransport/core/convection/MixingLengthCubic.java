package io.github.startransport.core.convection;

/**
 * The cubic of local mixing-length theory, solved for the convective efficiency.
 *
 * <p>Kippenhahn, Weigert &amp; Weiss (2012, <i>Stellar Structure and Evolution</i>, ch. 7,
 * eqs. 7.6-7.18, numbers from memory) write flux conservation for x = sqrt(nabla - nabla_e) as
 * x^3 + (8U/9) x^2 + (16 U^2/9) x - (8U/9) W = 0, with W = nabla_rad - nabla_ad. With a general
 * geometry factor k ({@link MixingLengthGeometry#cubicFactor()}, 8/9 above) and a separate loss
 * coefficient U' (equal to U in the textbook theory) it reads
 * x^3 + k U x^2 + 2 k U U' x - k U W = 0. Substituting the efficiency Gamma = x / (2U')
 * (Cox &amp; Giuli 1968, ch. 14: Gamma = (nabla - nabla_e)/(nabla_e - nabla_ad)) and dividing by
 * 4 k U U'^2 gives the form solved here:
 * <pre>
 *   a0 Gamma^3 + Gamma^2 + Gamma = S,   a0 = 2 U' / (k U),   S = W / (4 U'^2)
 * </pre>
 * (a0 = 9/4 and S = A^2 W with A = 1/(2U) in Cox &amp; Giuli's notation). For S &gt; 0 the left
 * side is increasing and convex on Gamma &gt; 0, so there is exactly one positive root.
 *
 * <p>With D = a0 Gamma^2 + Gamma + 1 the gradients follow without subtracting nearly equal
 * numbers, which keeps full precision in the efficient (U -&gt; 0), inefficient (U -&gt; infinity)
 * and onset (W -&gt; 0+) limits:
 * <pre>
 *   nabla_e   - nabla_ad = W / D
 *   nabla     - nabla_e  = W Gamma / D
 *   nabla_rad - nabla    = W a0 Gamma^2 / D
 * </pre>
 * Pure static kernels; no allocation, no state.
 */
public final class MixingLengthCubic {
    private MixingLengthCubic() {
    }

    /**
     * Upper bound on iteration steps. The fast path takes {@link #HALLEY_STEPS}; the guarded
     * Newton path for extreme S converges within about ten; the bound only guards against
     * non-finite input.
     */
    static final int MAX_STEPS = 64;

    /**
     * Halley steps of the fast path. From a start at most a factor 1.51 above the root (see
     * {@link #efficiency(double, double)}) the relative error falls as about 0.14 e^3 per step:
     * 0.51, 0.02, 2e-6, then rounding (the residual after these steps is checked over a dense grid of a0
     * and S by the iteration-bound test, and the root against Commons Math by the property tests).
     */
    static final int HALLEY_STEPS = 3;

    /** Range of S where the fast path's intermediate d1^2 and f d1 stay far from overflow and underflow. */
    private static final double FAST_MIN = 1e-280;
    private static final double FAST_MAX = 1e150;
    /** Range of a0 of the fast path: (S/a0) and a0 Gamma^3 stay normal numbers. */
    private static final double FAST_A0_MIN = 1e-120;
    private static final double FAST_A0_MAX = 1e100;

    /**
     * Bias added to the bit pattern of x / 3 so that it reads as about cbrt(x): the exponent's
     * third plus an offset that centres the mantissa's error (the high word 0x2A9F7893 of
     * Kahan's cube-root estimate, as in the freely distributable fdlibm cbrt; constant from memory).
     * The estimate lies within [0.9689, 1.0321] of cbrt(x) for normal x > 0 (checked over a full
     * period of the exponent, [1, 8), and across exponents, against Math.cbrt by a test).
     */
    static final long CBRT_BIAS = 0x2A9F789300000000L;

    /** Factor that lifts the bit-level estimate above cbrt(x): 1 / 0.9689, rounded up. */
    static final double CBRT_LIFT = 1.0321;

    /**
     * Solves a0 Gamma^3 + Gamma^2 + Gamma = S for its positive root.
     *
     * <p>Start: min(G_q, G_c) with G_q = 2S / (1 + sqrt(1 + 4S)), the exact root of
     * Gamma^2 + Gamma = S, and G_c a bit-level estimate of cbrt(S / a0) lifted above it
     * ({@link #CBRT_BIAS}, {@link #CBRT_LIFT}). Each solves the equation with positive terms
     * dropped, so each is an upper bound on the root, and the smaller lies within a factor 1.51
     * of it (the worst case is where a0 Gamma^3 and Gamma^2 + Gamma are comparable). Then
     * {@link #HALLEY_STEPS} steps of Halley's method (cubic convergence; e.g. Press et al.,
     * <i>Numerical Recipes</i>, 3rd ed., §9.4, from memory) bring it to rounding level: no
     * transcendental call and no data-dependent branch on the normal path.
     *
     * <p>Outside the fast path's range (S &lt; 1e-280, S &gt; 1e150, a0 outside [1e-120, 1e100],
     * far from any star) the start is min(S, sqrt(S), cbrt(S / a0)), again an upper bound within a
     * factor 3, and Newton's method on the increasing convex cubic decreases monotonically to the
     * root; it stops when a step no longer changes Gamma by more than 1e-15 relative.
     *
     * @param a0 cubic coefficient 2U'/(kU) (dimensionless), &gt; 0
     * @param s  right-hand side W / (4 U'^2) (dimensionless)
     * @return the efficiency Gamma (dimensionless), 0 when s &lt;= 0, +infinity when s is +infinity
     */
    public static double efficiency(double a0, double s) {
        return efficiency(a0, s, MAX_STEPS);
    }

    /** {@link #efficiency(double, double)} with at most {@code maxSteps} steps (for the bound's test). */
    static double efficiency(double a0, double s, int maxSteps) {
        if (!(s > 0.0)) {
            return 0.0;
        }
        if (s > FAST_MIN && s < FAST_MAX && a0 > FAST_A0_MIN && a0 < FAST_A0_MAX) {
            double quadratic = 2.0 * s / (1.0 + Math.sqrt(Math.fma(4.0, s, 1.0)));
            double g = Math.min(quadratic, CBRT_LIFT * cubeRootEstimate(s / a0));
            double a3 = 3.0 * a0;
            int steps = Math.min(maxSteps, HALLEY_STEPS);
            for (int i = 0; i < steps; i++) {
                // f, f' and f''/2 of the cubic; Halley: g -= f f' / (f'^2 - f f''/2)
                double f = Math.fma(Math.fma(Math.fma(a0, g, 1.0), g, 1.0), g, -s);
                double d1 = Math.fma(Math.fma(a3, g, 2.0), g, 1.0);
                double d2 = Math.fma(a3, g, 1.0);
                g -= f * d1 / Math.fma(d1, d1, -f * d2);
            }
            return g;
        }
        if (s == Double.POSITIVE_INFINITY) {
            return s; // the root of an infinite right-hand side; Newton would turn it into NaN
        }
        // cbrt(S) / cbrt(a0), not cbrt(S / a0): the quotient overflows for a tiny a0 and a huge S, and a start
        // at sqrt(S) instead leaves Newton (2/3 per step from far above) short of the root after MAX_STEPS
        double g = Math.min(s, Math.min(Math.sqrt(s), Math.cbrt(s) / Math.cbrt(a0)));
        for (int i = 0; i < maxSteps; i++) {
            // f / f' with f written relative to S, so that S near the largest double does not overflow
            double relative = ((a0 * g + 1.0) * g + 1.0) * (g / s) - 1.0;
            double step = relative * (s / ((3.0 * a0 * g + 2.0) * g + 1.0));
            g -= step;
            if (!(step > 1e-15 * g)) {
                break;
            }
        }
        return g;
    }

    /** Upper bound on the safeguarded Newton steps of {@link #efficiency(double, double, double)}. */
    static final int COMPOSITION_MAX_STEPS = 100;

    /**
     * Solves the mixing-length equation with a destabilising composition term in the buoyancy,
     * <pre>
     *   (Gamma^2 - beta) (a0 Gamma^2 + Gamma + 1) = S Gamma,   beta &gt; 0,   S + beta &gt; 0,
     * </pre>
     * for its positive root (S may be negative). Derivation (see {@link MixingLengthZone} for the
     * physics): an element keeps its mu, so its buoyancy per unit dr/H_P is
     * delta (nabla - nabla_e) - phi nabla_mu = delta (y + b) with y = nabla - nabla_e and
     * b = -(phi/delta) nabla_mu; its velocity is x = sqrt(y + b) in the units of the textbook cubic,
     * its losses give nabla_e - nabla_ad = 2U' y / x, and the flux it carries is still proportional
     * to x y. With Gamma = x / (2U'), S = W / (4U'^2) and beta = b / (4U'^2) flux conservation gives
     * the equation above, a quartic; for beta = 0 it is Gamma times the cubic of
     * {@link #efficiency(double, double)}. The gradients follow from Gamma by the same shares as
     * without composition (nabla - nabla_ad = W (Gamma + 1) / D and so on), so y has the sign of W.
     *
     * <p>Exactly one positive root: the quartic a0 G^4 + G^3 + (1 - a0 beta) G^2 - (beta + S) G - beta
     * has one change of sign in its coefficients whatever the sign of 1 - a0 beta (Descartes' rule of
     * signs), and it is simple, so the slope F' there is &gt; 0. Bracket: for S &gt;= 0 the root lies in
     * [max(sqrt(beta), G_c), G_c + sqrt(beta)], G_c the root of the cubic for the same S (F is &lt;= 0 at
     * both lower ends and &gt;= 0 at the upper one), where F is convex; for S &lt; 0 it lies between the
     * roots of G^2 + |S| G - beta (where F = |S| G (1 - D) &lt; 0) and of G^2 + |S| G / D(sqrt(beta)) -
     * beta (where F &gt;= 0). From the upper end Newton's method, kept inside the bracket by bisection
     * (Press et al., <i>Numerical Recipes</i>, 3rd ed., §9.4, rtsafe; from memory), stops when a step
     * is below 1e-13 of the root (or after {@link #COMPOSITION_MAX_STEPS} steps), then takes one more
     * Newton step, which brings a quadratically converging iterate to rounding level.
     *
     * @param a0   cubic coefficient 2U'/(kU) (dimensionless), &gt; 0
     * @param s    W / (4 U'^2) (dimensionless), any sign, s + beta &gt; 0 (or rounded to &lt;= 0 from above)
     * @param beta b / (4 U'^2) (dimensionless), &gt; 0
     * @return the efficiency Gamma (dimensionless), &gt; 0
     */
    public static double efficiency(double a0, double s, double beta) {
        double root = Math.sqrt(beta);
        double lo;
        double hi;
        if (s >= 0.0) {
            double cubic = efficiency(a0, s);
            lo = Math.max(root, cubic);
            hi = cubic + root;
        } else {
            double m = -s;
            lo = 2.0 * beta / (m + Math.hypot(m, 2.0 * root));
            double mh = m / denominator(a0, root);
            hi = 2.0 * beta / (mh + Math.hypot(mh, 2.0 * root));
        }
        double g = hi;
        for (int i = 0; i < COMPOSITION_MAX_STEPS; i++) {
            double excess = Math.fma(g, g, -beta);
            double den = denominator(a0, g);
            double f = excess * den - s * g;
            if (f == 0.0) {
                return g;
            }
            if (f > 0.0) {
                hi = g;
            } else {
                lo = g;
            }
            double slope = 2.0 * g * den + excess * Math.fma(2.0 * a0, g, 1.0) - s;
            double next = g - f / slope;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            boolean done = Math.abs(next - g) <= 1e-13 * next;
            g = next;
            if (done || !(hi > lo)) {
                break;
            }
        }
        // Newton converges quadratically: after a step below 1e-13 one more lands at rounding level
        double excess = Math.fma(g, g, -beta);
        double den = denominator(a0, g);
        double slope = 2.0 * g * den + excess * Math.fma(2.0 * a0, g, 1.0) - s;
        double polished = g - (excess * den - s * g) / slope;
        return polished > 0.0 ? polished : g;
    }

    /**
     * The slope of the composition equation at its root, F'(Gamma) = 2 Gamma D + S (a0 Gamma^2 - 1) / D
     * (from F' = 2 Gamma D + (Gamma^2 - beta)(2 a0 Gamma + 1) - S with (Gamma^2 - beta) D = S Gamma):
     * d Gamma = (Gamma dS + D d beta - (Gamma^2 - beta) Gamma^2 d a0) / F'.
     *
     * @param a0    cubic coefficient (dimensionless)
     * @param s     W / (4 U'^2) (dimensionless)
     * @param gamma the root (dimensionless)
     * @return F'(Gamma) (dimensionless), &gt; 0
     */
    public static double compositionSlope(double a0, double s, double gamma) {
        double den = denominator(a0, gamma);
        return 2.0 * gamma * den + s * Math.fma(a0 * gamma, gamma, -1.0) / den;
    }

    /** Binary exponents of S covered by a start table: S in [2^-930, 2^498), inside the fast range. */
    static final int TABLE_MIN_EXPONENT = -930;
    static final int TABLE_MAX_EXPONENT = 498;
    /** Halley steps after a start from a table: from within 2.5 % of the root, about 2e-6 and then rounding. */
    static final int TABLE_STEPS = 2;
    private static final long MANTISSA = 0x000FFFFFFFFFFFFFL;
    private static final long ONE_BITS = 0x3FF0000000000000L;

    /**
     * Start table for one fixed a0: for each binade [2^e, 2^(e+1)) of S, the root at its lower end
     * and the rise to the root at its upper end (both by {@link #efficiency(double, double)}),
     * interleaved. The root is increasing and concave in S (dGamma/dS = 1/f'(Gamma) falls as Gamma
     * grows), so the chord across a binade lies below it, within 2.5 % (about 1.5 % where the root
     * grows like a power of S, up to 2.4 % where Gamma^2 takes over from Gamma; checked against
     * Commons Math's roots over a dense grid by a test).
     *
     * @param a0 cubic coefficient (dimensionless), in the fast range
     * @return the table for {@link #efficiency(double, double, double[])}
     */
    static double[] startTable(double a0) {
        int n = TABLE_MAX_EXPONENT - TABLE_MIN_EXPONENT;
        double[] table = new double[2 * n];
        double low = efficiency(a0, Math.scalb(1.0, TABLE_MIN_EXPONENT));
        for (int i = 0; i < n; i++) {
            double high = efficiency(a0, Math.scalb(1.0, TABLE_MIN_EXPONENT + i + 1));
            table[2 * i] = low;
            table[2 * i + 1] = high - low;
            low = high;
        }
        return table;
    }

    /**
     * {@link #efficiency(double, double)} for the a0 of {@code table}: the start is the table's
     * chord at S, then {@link #TABLE_STEPS} Halley steps; outside the table's range, the general
     * solve.
     *
     * @param a0    cubic coefficient (dimensionless), the one the table was built for
     * @param s     right-hand side (dimensionless)
     * @param table from {@link #startTable(double)} for this a0
     * @return the efficiency Gamma (dimensionless), 0 when s &lt;= 0
     */
    static double efficiency(double a0, double s, double[] table) {
        long bits = Double.doubleToRawLongBits(s);
        int i = (int) (bits >>> 52) - (1023 + TABLE_MIN_EXPONENT);
        if (i < 0 || i >= table.length / 2) {
            return efficiency(a0, s);
        }
        // position inside the binade, [0, 1), from the mantissa bits
        double fraction = Double.longBitsToDouble((bits & MANTISSA) | ONE_BITS) - 1.0;
        double g = Math.fma(table[2 * i + 1], fraction, table[2 * i]);
        double a3 = 3.0 * a0;
        for (int k = 0; k < TABLE_STEPS; k++) {
            double f = Math.fma(Math.fma(Math.fma(a0, g, 1.0), g, 1.0), g, -s);
            double d1 = Math.fma(Math.fma(a3, g, 2.0), g, 1.0);
            double d2 = Math.fma(a3, g, 1.0);
            g -= f * d1 / Math.fma(d1, d1, -f * d2);
        }
        return g;
    }

    /**
     * A cube-root estimate from the bit pattern (no call): within [0.9689, 1.0321] of cbrt(x) for
     * a normal x &gt; 0.
     *
     * @param x a positive normal number
     * @return about cbrt(x)
     */
    static double cubeRootEstimate(double x) {
        return Double.longBitsToDouble(Double.doubleToRawLongBits(x) / 3 + CBRT_BIAS);
    }

    /**
     * @param a0    cubic coefficient (dimensionless)
     * @param s     right-hand side (dimensionless)
     * @param gamma a trial efficiency (dimensionless)
     * @return a0 Gamma^3 + Gamma^2 + Gamma - S (dimensionless)
     */
    public static double residual(double a0, double s, double gamma) {
        return ((a0 * gamma + 1.0) * gamma + 1.0) * gamma - s;
    }

    /**
     * Implicit derivative: d Gamma / d S = 1 / (3 a0 Gamma^2 + 2 Gamma + 1); likewise
     * d Gamma / d a0 = -Gamma^3 times this.
     *
     * @param a0    cubic coefficient (dimensionless)
     * @param gamma the root (dimensionless)
     * @return d Gamma / d S (dimensionless)
     */
    public static double sensitivity(double a0, double gamma) {
        return 1.0 / ((3.0 * a0 * gamma + 2.0) * gamma + 1.0);
    }

    /**
     * @param a0    cubic coefficient (dimensionless)
     * @param gamma the root (dimensionless)
     * @return D = a0 Gamma^2 + Gamma + 1 (dimensionless)
     */
    public static double denominator(double a0, double gamma) {
        return (a0 * gamma + 1.0) * gamma + 1.0;
    }

    /**
     * @param a0    cubic coefficient (dimensionless)
     * @param gamma the root (dimensionless)
     * @return (nabla - nabla_ad) / W = (Gamma + 1) / D, the superadiabatic share of W (dimensionless)
     */
    public static double superadiabaticShare(double a0, double gamma) {
        return (gamma + 1.0) / denominator(a0, gamma);
    }

    /**
     * @param a0    cubic coefficient (dimensionless)
     * @param gamma the root (dimensionless)
     * @return (nabla_rad - nabla) / W = a0 Gamma^2 / D, which is also F_conv / F times nabla_rad / W
     *         (dimensionless)
     */
    public static double convectiveShare(double a0, double gamma) {
        return a0 * gamma * gamma / denominator(a0, gamma);
    }

    /**
     * @param a0    cubic coefficient (dimensionless)
     * @param gamma the root (dimensionless)
     * @return (nabla_e - nabla_ad) / W = 1 / D (dimensionless)
     */
    public static double elementShare(double a0, double gamma) {
        return 1.0 / denominator(a0, gamma);
    }
}
