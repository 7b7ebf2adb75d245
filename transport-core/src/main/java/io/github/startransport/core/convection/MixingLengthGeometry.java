package io.github.startransport.core.convection;

/**
 * The geometry constants of a mixing-length theory, written as the three numbers (a, b, c) of
 * the parametrised form
 * <pre>
 *   v^2    = a g delta l^2 (nabla - nabla_e) / H_P
 *   F_conv = b rho c_P T v (l / H_P) (nabla - nabla_e)
 *   Gamma  = c_P kappa rho^2 v l / (c sigma T^3)
 * </pre>
 * (Fontaine et al. 1981; Tassoul, Fontaine &amp; Winget 1990, ApJS 72, 335;
 * from memory, medium confidence on the attribution of each set). Different codes and papers
 * fix these constants differently; a calibrated mixing-length parameter alpha belongs to one
 * set and does not carry over to another.
 *
 * <p>From these, with x = sqrt(nabla - nabla_e), the loss parameter
 * U = c sigma T^3 sqrt(H_P / (a g delta)) / (2 c_P kappa rho^2 l^2) and
 * W = nabla_rad - nabla_ad, flux conservation gives the cubic
 * x^3 + k U x^2 + 2 k U U' x - k U W = 0 with k = 32 / (3 b c) and U' the loss coefficient
 * (U' = U without a transparency correction). For the Böhm-Vitense set k = 8/9 and U is the U of
 * Kippenhahn, Weigert &amp; Weiss (2012, ch. 7), whose equations this set reproduces exactly.
 */
public enum MixingLengthGeometry {
    /** Böhm-Vitense (1958, Z. Astrophys. 46, 108): a = 1/8, b = 1/2, c = 24; the textbook constants. */
    BOHM_VITENSE_1958(1.0 / 8.0, 0.5, 24.0),
    /** Böhm &amp; Cassinelli (1971, A&amp;A 12, 21): a = 1, b = 2, c = 16 (from memory). */
    BOHM_CASSINELLI_1971(1.0, 2.0, 16.0);

    private final double velocity;
    private final double flux;
    private final double loss;
    private final double coefficient;
    private final double rootVelocity;
    private final double[] starts;

    MixingLengthGeometry(double velocity, double flux, double loss) {
        this.velocity = velocity;
        this.flux = flux;
        this.loss = loss;
        this.coefficient = 3.0 * flux * loss / 16.0;
        this.rootVelocity = Math.sqrt(velocity);
        this.starts = MixingLengthCubic.startTable(coefficient);
    }

    /** @return a, the factor of the velocity relation (dimensionless) */
    public double velocityFactor() {
        return velocity;
    }

    /** @return sqrt(a) (dimensionless), kept so that a zone's solve takes no square root of a constant */
    double rootVelocityFactor() {
        return rootVelocity;
    }

    /**
     * @return the start table of {@link MixingLengthCubic#startTable(double)} for a0 = {@link #cubicCoefficient()}
     *         (not to be modified)
     */
    double[] cubicStarts() {
        return starts;
    }

    /** @return b, the factor of the convective flux (dimensionless) */
    public double fluxFactor() {
        return flux;
    }

    /** @return c, the factor in the efficiency (dimensionless) */
    public double lossFactor() {
        return loss;
    }

    /** @return k = 32 / (3 b c), the coefficient of the cubic (8/9 for the Böhm-Vitense set) */
    public double cubicFactor() {
        return 32.0 / (3.0 * flux * loss);
    }

    /**
     * @return 2 / k = 3 b c / 16, the coefficient a0 of the cubic of {@link MixingLengthCubic} without a
     *         transparency correction (9/4 for the Böhm-Vitense set)
     */
    public double cubicCoefficient() {
        return coefficient;
    }

    /** @return the option value, e.g. {@code "bohm-vitense-1958"} */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }
}
