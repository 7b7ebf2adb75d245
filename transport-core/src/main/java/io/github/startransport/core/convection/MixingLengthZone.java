package io.github.startransport.core.convection;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.gradient.LedouxGradient;
import io.github.startransport.core.gradient.RadiativeGradient;
import io.github.startransport.core.gradient.StabilityClassifier;
import io.github.startransport.core.gradient.ZoneChecks;
import io.github.startransport.spi.Checks;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneState;

import java.util.Arrays;

/**
 * One zone of local mixing-length convection with the full Jacobian: the kernel behind
 * {@link LocalMixingLength} and {@link TransparentEddyMixingLength}.
 *
 * <p>Steps, all in cgs:
 * <ol>
 *   <li>nabla_rad = 3 kappa L P / (16 pi a c G m T^4) ({@link RadiativeGradient}); g = G m / r^2;
 *       H_P = P / (rho g); l = alpha H_P, or alpha min(H_P, r) with {@link CentreLimit#RADIUS}.</li>
 *   <li>The regime from {@link StabilityClassifier} under the chosen criterion.</li>
 *   <li>Convective zone: U = c sigma T^3 sqrt(H_P / (a g delta)) / (2 c_P kappa rho^2 l^2) with the
 *       geometry constants (a, b, c) of {@link MixingLengthGeometry} (for the Böhm-Vitense set this
 *       is U = (3acT^3 / (c_P rho^2 kappa l^2)) sqrt(8 H_P / (g delta)) of Kippenhahn, Weigert &amp;
 *       Weiss 2012, ch. 7). The loss coefficient is U' = q U with q = 1 in the textbook theory and
 *       q = y omega^2 / (1 + y omega^2), omega = kappa rho l, for eddies that may be optically thin
 *       (Henyey, Vardya &amp; Bodenheimer 1965, ApJ 142, 841; form from memory, see
 *       {@link TransparentEddyMixingLength}). The efficiency Gamma solves the cubic of
 *       {@link MixingLengthCubic}; then nabla, nabla_e, v = l sqrt(a g delta / H_P) 2 U' Gamma,
 *       F_conv / F = (nabla_rad - nabla) / nabla_rad, D = v l / 3.</li>
 *   <li>Stable zone: nabla = nabla_e = nabla_rad, v = 0, F_conv = 0, and D from
 *       {@link MixingCoefficients} for the semiconvective and thermohaline regimes, 0 otherwise.</li>
 * </ol>
 *
 * <p>The heat-transport cubic is driven by the thermal excess W = nabla_rad - nabla_ad under both
 * criteria (the element's heat exchange does not depend on its composition). A zone that is
 * Ledoux-unstable only because of an inverted composition gradient (nabla_L &lt; nabla_rad &lt;=
 * nabla_ad) therefore has W &lt;= 0: it is reported convective, but carries no convective flux,
 * with v = 0 and D = 0. This theory has no composition term in the buoyancy.
 *
 * <p>Derivatives: every output's partial derivatives with respect to T, rho, P, L, m, r, kappa,
 * c_P, nabla_ad, delta, nabla_mu, phi and alpha, by the chain rule through nabla_rad, H_P, l, U, U'
 * and implicit differentiation of the cubic (d Gamma = (dS - Gamma^3 d a0) / (3 a0 Gamma^2 +
 * 2 Gamma + 1)). nabla_mu and phi enter only the semiconvective and thermohaline coefficients.
 * The derivative at the switch between H_P and r of {@link CentreLimit#RADIUS} is one-sided
 * (the r branch is taken when r &lt; H_P).
 *
 * <p>Allocation-free and stateless: safe to call from many threads with separate results.
 */
public final class MixingLengthZone {
    private MixingLengthZone() {
    }

    private static final double G = Codata2018.GRAVITATIONAL_CONSTANT;
    private static final double SIGMA = Codata2018.STEFAN_BOLTZMANN;

    /**
     * Validates the zone fields the convection models read: those of the stability test plus
     * radius and c_P.
     *
     * @param z the zone
     * @throws io.github.startransport.spi.InvalidInputException naming the first bad field
     */
    public static void check(ZoneState z) {
        ZoneChecks.forStability(z);
        Checks.positive("radius", z.radius, "cm", z.zone);
        Checks.positive("cp", z.cp, "erg g^-1 K^-1", z.zone);
    }

    /**
     * Solves one zone. Inputs are validated first.
     *
     * @param z              the zone (read only)
     * @param alpha          mixing-length parameter l / H_P (dimensionless), &gt; 0 (validated by the caller)
     * @param geometry       geometry constants
     * @param eddyShape      y of the transparency correction (dimensionless), or 0 for none
     * @param limit          near-centre limit of the mixing length
     * @param criterion      stability criterion
     * @param semiconvection alpha_sc of {@link MixingCoefficients#semiconvective} (dimensionless)
     * @param thermohaline   C_t of {@link MixingCoefficients#thermohaline} (dimensionless)
     * @param out            the result, overwritten
     */
    public static void solve(ZoneState z, double alpha, MixingLengthGeometry geometry, double eddyShape,
                             CentreLimit limit, Criterion criterion, double semiconvection, double thermohaline,
                             ConvectionResult out) {
        solve(z, alpha, geometry, eddyShape, limit, criterion, semiconvection, thermohaline, out, true);
    }

    /**
     * Solves one zone, with or without the Jacobian of a convective zone. Every value is the same,
     * bit for bit, either way; without the Jacobian the derivative arrays of a convective zone are
     * left unspecified (a stable zone's are still filled: they cost next to nothing).
     *
     * @param z              the zone (read only)
     * @param alpha          mixing-length parameter l / H_P (dimensionless), &gt; 0 (validated by the caller)
     * @param geometry       geometry constants
     * @param eddyShape      y of the transparency correction (dimensionless), or 0 for none
     * @param limit          near-centre limit of the mixing length
     * @param criterion      stability criterion
     * @param semiconvection alpha_sc of {@link MixingCoefficients#semiconvective} (dimensionless)
     * @param thermohaline   C_t of {@link MixingCoefficients#thermohaline} (dimensionless)
     * @param out            the result, overwritten
     * @param jacobian       whether to compute the derivatives of a convective zone
     */
    public static void solve(ZoneState z, double alpha, MixingLengthGeometry geometry, double eddyShape,
                             CentreLimit limit, Criterion criterion, double semiconvection, double thermohaline,
                             ConvectionResult out, boolean jacobian) {
        check(z);
        final double t = z.temperature;
        final double rho = z.density;
        final double p = z.pressure;
        final double m = z.mass;
        final double r = z.radius;
        final double kappa = z.opacity;
        final double cp = z.cp;
        final double nablaAd = z.nablaAd;
        final double delta = z.delta;
        final double nablaMu = z.nablaMu;
        final double phi = z.phi;

        // nabla_rad and its derivatives; dNabla holds them until the end
        final double[] dRad = out.dNabla;
        final double nablaRad = RadiativeGradient.valueAndDerivatives(kappa, z.luminosity, p, m, t, dRad);
        final double gravity = G * m / (r * r);
        final double scaleHeight = p / (rho * gravity);
        final boolean capped = limit == CentreLimit.RADIUS && r < scaleHeight;
        final double length = alpha * (capped ? r : scaleHeight);
        final double a = geometry.velocityFactor();
        final double u = geometry.lossFactor() * SIGMA * t * t * t * Math.sqrt(scaleHeight / (a * gravity * delta))
                / (2.0 * cp * kappa * rho * rho * length * length);
        final double nablaL = LedouxGradient.value(nablaAd, phi, delta, nablaMu);
        final Regime regime = StabilityClassifier.classify(criterion, nablaRad, nablaAd, nablaL, nablaMu);

        out.regime = regime;
        out.nablaRad = nablaRad;
        out.lossParameter = u;
        out.scaleHeight = scaleHeight;
        out.mixingLength = length;

        final double w = nablaRad - nablaAd;
        final boolean transparent = eddyShape > 0.0;
        final double omega = kappa * rho * length;
        final double yw2 = eddyShape * omega * omega;
        final double q = transparent ? yw2 / (1.0 + yw2) : 1.0;
        final double uLoss = q * u;
        final double a0 = 2.0 * q / geometry.cubicFactor();
        final double s = w / (4.0 * uLoss * uLoss);
        final double gamma = regime == Regime.CONVECTIVE ? MixingLengthCubic.efficiency(a0, s) : 0.0;
        if (!(gamma > 0.0)) {
            stable(z, regime, nablaRad, semiconvection, thermohaline, out);
            return;
        }

        final double den = MixingLengthCubic.denominator(a0, gamma);
        final double shareRad = a0 * gamma * gamma / den;    // (nabla_rad - nabla) / W
        final double shareSuper = (gamma + 1.0) / den;        // (nabla - nabla_ad) / W
        final double nabla = nablaAd + w * shareSuper;
        final double velocityScale = Math.sqrt(a * gravity * delta / scaleHeight);
        final double x = 2.0 * uLoss * gamma;
        final double velocity = length * velocityScale * x;
        final double convective = w * shareRad / nablaRad;
        final double diffusion = MixingCoefficients.convective(velocity, length);

        out.nabla = nabla;
        out.nablaElement = nablaAd + w / den;
        out.velocity = velocity;
        out.convectiveFraction = convective;
        out.radiativeFraction = nabla / nablaRad;
        out.efficiency = gamma;
        out.diffusion = diffusion;
        if (!jacobian) {
            guard(z, out, false);
            return;
        }

        final double sensitivity = MixingLengthCubic.sensitivity(a0, gamma);
        final double gamma3 = gamma * gamma * gamma;
        final double den2 = den * den;
        final double lossElasticity = transparent ? 2.0 / (1.0 + yw2) : 0.0; // d ln q / d ln omega
        // reciprocals once, so that the loop below multiplies only
        final double invGamma = 1.0 / gamma;
        final double invDen2 = 1.0 / den2;
        final double invNablaRad = 1.0 / nablaRad;
        final double invFourULoss2 = 1.0 / (4.0 * uLoss * uLoss);
        final double[] dNabla = out.dNabla;
        final double[] dVelocity = out.dVelocity;
        final double[] dConvective = out.dConvectiveFraction;
        final double[] dDiffusion = out.dDiffusion;
        // 1 / q_i for the inputs with a non-zero elasticity (validated > 0), 0 for the others;
        // held in dVelocity until iteration i overwrites entry i
        dVelocity[ZoneInput.T] = 1.0 / t;
        dVelocity[ZoneInput.RHO] = 1.0 / rho;
        dVelocity[ZoneInput.P] = 1.0 / p;
        dVelocity[ZoneInput.L] = 0.0;
        dVelocity[ZoneInput.M] = 1.0 / m;
        dVelocity[ZoneInput.R] = 1.0 / r;
        dVelocity[ZoneInput.KAPPA] = 1.0 / kappa;
        dVelocity[ZoneInput.CP] = 1.0 / cp;
        dVelocity[ZoneInput.NABLA_AD] = 0.0;
        dVelocity[ZoneInput.DELTA] = 1.0 / delta;
        dVelocity[ZoneInput.NABLA_MU] = 0.0;
        dVelocity[ZoneInput.PHI] = 0.0;
        dVelocity[ZoneInput.ALPHA] = 1.0 / alpha;
        final double[] lengthTable = capped ? LENGTH_CAPPED : LENGTH_SCALED;
        for (int i = 0; i < ZoneInput.COUNT; i++) {
            final double dNablaRad = dRad[i];
            final double dNablaAd = i == ZoneInput.NABLA_AD ? 1.0 : 0.0;
            final double dW = dNablaRad - dNablaAd;
            // elasticities d ln X / d ln q_i (constant tables), then per unit of q_i
            final double eHp = SCALE_HEIGHT[i];
            final double eGravity = GRAVITY[i];
            final double eLength = lengthTable[i];
            final double eLossBase = LOSS_BASE[i] + 0.5 * (eHp - eGravity) - 2.0 * eLength;
            final double eOmega = OMEGA_OWN[i] + eLength;
            final double eQ = lossElasticity * eOmega;
            final double eVelocityScale = 0.5 * (eGravity + DELTA_OWN[i] - eHp);
            final double perUnit = dVelocity[i];
            final double dlnLength = eLength * perUnit;
            final double dlnULoss = (eLossBase + eQ) * perUnit;
            final double dA0 = a0 * eQ * perUnit;
            final double dS = dW * invFourULoss2 - 2.0 * s * dlnULoss;
            final double dGamma = (dS - gamma3 * dA0) * sensitivity;
            final double dShareRad = (dA0 * gamma * gamma * (gamma + 1.0)
                    + a0 * gamma * (gamma + 2.0) * dGamma) * invDen2;
            dNabla[i] = shareSuper * dNablaRad + shareRad * dNablaAd - w * dShareRad;
            final double dlnVelocity = dlnLength + eVelocityScale * perUnit + dlnULoss + dGamma * invGamma;
            dVelocity[i] = velocity * dlnVelocity;
            dConvective[i] = (dW * shareRad + w * dShareRad - convective * dNablaRad) * invNablaRad;
            dDiffusion[i] = diffusion * (dlnVelocity + dlnLength);
        }
        guard(z, out, true);
    }

    /** Refuses a zone whose valid inputs overflow double precision somewhere on the way (see {@link ZoneChecks#finiteOutputs}). */
    private static void guard(ZoneState z, ConvectionResult out, boolean jacobian) {
        double probe = (out.nablaRad + out.nabla + out.nablaElement + out.velocity + out.convectiveFraction
                + out.radiativeFraction + out.efficiency + out.lossParameter + out.scaleHeight + out.mixingLength
                + out.diffusion) * 0.0;
        if (jacobian) {
            double a = 0.0;
            double b = 0.0;
            for (int i = 0; i < ZoneInput.COUNT; i++) {
                a += out.dNabla[i] * 0.0 + out.dVelocity[i] * 0.0;
                b += out.dConvectiveFraction[i] * 0.0 + out.dDiffusion[i] * 0.0;
            }
            probe += a + b;
        }
        ZoneChecks.finiteOutputs("nabla", out.nabla, probe, z);
    }

    private static void stable(ZoneState z, Regime regime, double nablaRad, double semiconvection,
                               double thermohaline, ConvectionResult out) {
        // out.dNabla already holds d nabla_rad
        out.nabla = nablaRad;
        out.nablaElement = nablaRad;
        out.velocity = 0.0;
        out.convectiveFraction = 0.0;
        out.radiativeFraction = 1.0;
        out.efficiency = 0.0;
        Arrays.fill(out.dVelocity, 0.0);
        Arrays.fill(out.dConvectiveFraction, 0.0);
        if (regime == Regime.SEMICONVECTIVE) {
            out.diffusion = MixingCoefficients.semiconvectiveWithDerivatives(semiconvection, z.temperature,
                    z.density, z.opacity, z.cp, nablaRad, out.dNabla, z.nablaAd, z.phi, z.delta, z.nablaMu,
                    out.dDiffusion);
        } else if (regime == Regime.THERMOHALINE) {
            out.diffusion = MixingCoefficients.thermohalineWithDerivatives(thermohaline, z.temperature,
                    z.density, z.opacity, z.cp, nablaRad, out.dNabla, z.nablaAd, z.phi, z.delta, z.nablaMu,
                    out.dDiffusion);
        } else {
            out.diffusion = 0.0;
            Arrays.fill(out.dDiffusion, 0.0);
        }
        guard(z, out, true);
    }

    /** d ln H_P / d ln q_i, H_P = P r^2 / (rho G m). */
    private static final double[] SCALE_HEIGHT = table(ZoneInput.P, 1.0, ZoneInput.RHO, -1.0, ZoneInput.R, 2.0,
            ZoneInput.M, -1.0);
    /** d ln g / d ln q_i, g = G m / r^2. */
    private static final double[] GRAVITY = table(ZoneInput.M, 1.0, ZoneInput.R, -2.0);
    /** d ln U / d ln q_i from the factor T^3 / (c_P kappa rho^2 sqrt(delta)) of U. */
    private static final double[] LOSS_BASE = table(ZoneInput.T, 3.0, ZoneInput.CP, -1.0, ZoneInput.KAPPA, -1.0,
            ZoneInput.RHO, -2.0, ZoneInput.DELTA, -0.5);
    /** d ln l / d ln q_i for l = alpha H_P. */
    private static final double[] LENGTH_SCALED = table(ZoneInput.ALPHA, 1.0, ZoneInput.P, 1.0, ZoneInput.RHO, -1.0,
            ZoneInput.R, 2.0, ZoneInput.M, -1.0);
    /** d ln l / d ln q_i for l = alpha r. */
    private static final double[] LENGTH_CAPPED = table(ZoneInput.ALPHA, 1.0, ZoneInput.R, 1.0);
    /** d ln (kappa rho) / d ln q_i: the part of omega = kappa rho l other than l. */
    private static final double[] OMEGA_OWN = table(ZoneInput.KAPPA, 1.0, ZoneInput.RHO, 1.0);
    /** d ln delta / d ln q_i. */
    private static final double[] DELTA_OWN = table(ZoneInput.DELTA, 1.0);

    /** A table over the inputs: zero except at the (index, value) pairs given. */
    private static double[] table(double... pairs) {
        double[] e = new double[ZoneInput.COUNT];
        for (int k = 0; k < pairs.length; k += 2) {
            e[(int) pairs[k]] = pairs[k + 1];
        }
        return e;
    }
}
