package io.github.startransport.spi;

/**
 * Caller-owned, mutable result of a {@link ConvectionModel}: allocate once, reuse per zone.
 *
 * <p>Derivative arrays are indexed by {@link ZoneInput} and hold plain partial derivatives
 * with every other input of the call fixed (nabla_rad is not an input: it is computed from
 * kappa, L, P, m and T, so those derivatives include its change).
 */
public final class ConvectionResult {
    /** Creates an empty result, to be filled by a model. */
    public ConvectionResult() {
    }

    /** The regime the model decided on. */
    public Regime regime;
    /** Radiative gradient nabla_rad (dimensionless). */
    public double nablaRad;
    /** Actual temperature gradient of the surroundings nabla = d ln T / d ln P (dimensionless). */
    public double nabla;
    /** Temperature gradient inside a rising element nabla_e (dimensionless). */
    public double nablaElement;
    /** Convective velocity v_conv (cm s^-1), &gt;= 0. */
    public double velocity;
    /** Fraction of the total flux carried by convection F_conv / F (dimensionless). */
    public double convectiveFraction;
    /** Fraction of the total flux carried by radiation F_rad / F = nabla / nabla_rad (dimensionless). */
    public double radiativeFraction;
    /** Convective efficiency Gamma = (nabla - nabla_e) / (nabla_e - nabla_ad) (dimensionless). */
    public double efficiency;
    /** Radiative-loss parameter U of the local theory (dimensionless). */
    public double lossParameter;
    /** Pressure scale height H_P = P / (rho g) (cm). */
    public double scaleHeight;
    /** Mixing length l in use (cm). */
    public double mixingLength;
    /** Mixing diffusion coefficient D (cm^2 s^-1) of the regime: v l / 3 when convective. */
    public double diffusion;
    /** Partial derivatives of {@link #nabla}. */
    public final double[] dNabla = new double[ZoneInput.COUNT];
    /** Partial derivatives of {@link #velocity} (cm s^-1 per unit of the input). */
    public final double[] dVelocity = new double[ZoneInput.COUNT];
    /** Partial derivatives of {@link #convectiveFraction}. */
    public final double[] dConvectiveFraction = new double[ZoneInput.COUNT];
    /** Partial derivatives of {@link #diffusion} (cm^2 s^-1 per unit of the input). */
    public final double[] dDiffusion = new double[ZoneInput.COUNT];

    @Override
    public String toString() {
        return "ConvectionResult[regime=" + regime + ", nabla_rad=" + nablaRad + ", nabla=" + nabla
                + ", nabla_e=" + nablaElement + ", v=" + velocity + " cm/s, Fconv/F=" + convectiveFraction
                + ", Gamma=" + efficiency + ", U=" + lossParameter + ", l=" + mixingLength + " cm, D="
                + diffusion + " cm^2/s]";
    }
}
