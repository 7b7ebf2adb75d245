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
     * Upper bound on Newton steps. From the closed-form start below convergence to full
     * precision takes at most about eight steps; the bound only guards against non-finite input.
     */
    static final int MAX_STEPS = 64;

    /**
     * Solves a0 Gamma^3 + Gamma^2 + Gamma = S for its positive root.
     *
     * <p>Start: min(S, sqrt(S), cbrt(S / a0)). Each candidate solves the equation with two of the
     * three positive terms dropped, so each is an upper bound on the root and the smallest lies
     * within a factor 3 of it (the largest term is at least S/3). Newton's method on an increasing
     * convex function started above the root decreases monotonically to it, so the iteration needs
     * no bracketing safeguard; it stops when a step no longer changes Gamma by more than 1e-15
     * relative.
     *
     * @param a0 cubic coefficient 2U'/(kU) (dimensionless), &gt; 0
     * @param s  right-hand side W / (4 U'^2) (dimensionless)
     * @return the efficiency Gamma (dimensionless), 0 when s &lt;= 0
     */
    public static double efficiency(double a0, double s) {
        return efficiency(a0, s, MAX_STEPS);
    }

    /** {@link #efficiency(double, double)} with at most {@code maxSteps} Newton steps (for the bound's test). */
    static double efficiency(double a0, double s, int maxSteps) {
        if (!(s > 0.0)) {
            return 0.0;
        }
        double g = Math.min(s, Math.min(Math.sqrt(s), Math.cbrt(s / a0)));
        for (int i = 0; i < maxSteps; i++) {
            double f = ((a0 * g + 1.0) * g + 1.0) * g - s;
            double step = f / ((3.0 * a0 * g + 2.0) * g + 1.0);
            g -= step;
            if (!(step > 1e-15 * g)) {
                break;
            }
        }
        return g;
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
