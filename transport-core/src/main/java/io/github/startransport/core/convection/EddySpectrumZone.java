package io.github.startransport.core.convection;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.gradient.LedouxGradient;
import io.github.startransport.core.gradient.RadiativeGradient;
import io.github.startransport.core.gradient.StabilityClassifier;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneState;


/**
 * One zone of full-spectrum turbulent convection (Canuto &amp; Mazzitelli 1991, ApJ 370, 295) with the full
 * Jacobian: the kernel behind {@link EddySpectrumConvection}.
 *
 * <p>Steps, all in cgs:
 * <ol>
 *   <li>nabla_rad = 3 kappa L P / (16 pi a c G m T^4) ({@link RadiativeGradient}, the same arithmetic as the
 *       mixing-length kernel, so both classify every zone alike); g = G m / r^2; H_P = P / (rho g); the eddy
 *       length Lambda = alpha H_P (alpha min(H_P, r) with {@link CentreLimit#RADIUS}) or alpha z
 *       ({@link LengthScale}).</li>
 *   <li>The regime from {@link StabilityClassifier}; a stable zone gets nabla = nabla_rad and the
 *       semiconvective or thermohaline coefficient of {@link MixingCoefficients}, as in the mixing-length
 *       models.</li>
 *   <li>A convective zone: U = 3 a c T^3 sqrt(8 H_P / (g delta)) / (c_P rho^2 kappa Lambda^2) (Kippenhahn,
 *       Weigert &amp; Weiss 2012, ch. 7, with Lambda for l), R = 40.5 W / U^2 with W = nabla_rad - nabla_ad,
 *       and the root S of S (1 + Phi(S)) = R ({@link SpectrumFlux}). Then nabla - nabla_ad = W / (1 + Phi) and
 *       F_conv / F = Phi (nabla - nabla_ad) / nabla_rad (= (nabla_rad - nabla) / nabla_rad, since F_conv =
 *       K (T / H_P)(nabla - nabla_ad) Phi and F = K (T / H_P) nabla_rad), both without cancellation.</li>
 *   <li>Quantities the theory does not define, defined here so that every field of the result keeps its
 *       meaning (our choices, no source): the efficiency Gamma of an element with the same nabla - nabla_ad,
 *       from Gamma (Gamma + 1) = A^2 (nabla - nabla_ad) = S / 162 (Cox &amp; Giuli 1968, ch. 14), and
 *       nabla_e = nabla_ad + (nabla - nabla_ad) / (1 + Gamma); the velocity at which eddies of size Lambda
 *       carry F_conv in the mixing-length picture, F_conv = (b/a) rho c_P T v^3 / (g delta Lambda) with the
 *       Böhm-Vitense constants a = 1/8, b = 1/2 (which holds exactly in mixing-length theory, whatever its
 *       efficiency), so v^3 = g delta Lambda F_conv / (4 rho c_P T) with F_conv = (F_conv / F) L / (4 pi r^2);
 *       and D = v Lambda / 3.</li>
 * </ol>
 *
 * <p>Composition: the theory has no composition term, and none is added. A zone convective only because of
 * an inverted composition gradient (W &lt;= 0 with nabla_rad &gt; nabla_L) has no solution of the flux
 * equation and is refused; a stabilising gradient decides the regime under Ledoux and stays out of the flux,
 * as in the mixing-length models.
 *
 * <p>Derivatives: with rho = ln R and sigma = ln S, implicit differentiation of h = sigma + ln(1 + Phi) - rho
 * gives d sigma = d rho / h', h' = 1 + phi' Phi / (1 + Phi), phi' = d ln Phi / d ln S; d rho = dW / W - 2 d ln U;
 * d Phi = Phi phi' d sigma; d(nabla - nabla_ad) = (dW - (nabla - nabla_ad) d Phi) / (1 + Phi);
 * d ln(F_conv / F) = phi' d sigma + d ln(nabla - nabla_ad) - d ln nabla_rad; d ln v = (d ln g + d ln delta + d ln Lambda + d ln(F_conv / F) + d ln L
 * - 2 d ln r - d ln rho - d ln c_P - d ln T) / 3; d ln D = d ln v + d ln Lambda. nabla_mu and phi enter only a
 * stable zone's coefficients. With Lambda = alpha z the distance z is not a {@link ZoneInput}; since
 * Lambda depends on alpha z only, d/dz = (alpha / z) d/d alpha.
 *
 * <p>Allocation-free and stateless.
 */
public final class EddySpectrumZone {
    private EddySpectrumZone() {
    }

    private static final double G = Codata2018.GRAVITATIONAL_CONSTANT;
    /** 12 sqrt(8) sigma: U = this T^3 sqrt(H_P / (g delta)) / (c_P kappa rho^2 Lambda^2), since a c = 4 sigma. */
    private static final double U_FACTOR = 12.0 * Math.sqrt(8.0) * Codata2018.STEFAN_BOLTZMANN;
    /** 1 / (16 pi): v^3 = this g delta Lambda (F_conv / F) L / (r^2 rho c_P T). */
    private static final double V3_FACTOR = 1.0 / (16.0 * Math.PI);
    private static final double LN_A = Math.log(SpectrumFlux.A);
    private static final double THIRD = 1.0 / 3.0;

    /**
     * Solves one zone; inputs are validated first.
     *
     * @param z              the zone (read only)
     * @param alpha          Lambda / (H_P or z) (dimensionless), &gt; 0 (validated by the caller)
     * @param scale          the length scale
     * @param limit          near-centre limit of Lambda = alpha H_P
     * @param criterion      stability criterion
     * @param semiconvection alpha_sc of {@link MixingCoefficients#semiconvective} (dimensionless)
     * @param thermohaline   C_t of {@link MixingCoefficients#thermohaline} (dimensionless)
     * @param out            the result, overwritten
     * @param jacobian       whether to compute the derivatives of a convective zone (a stable zone's are
     *                       always filled); every value is the same either way
     * @throws InvalidInputException naming the bad field and the zone
     */
    public static void solve(ZoneState z, double alpha, LengthScale scale, CentreLimit limit, Criterion criterion,
                             double semiconvection, double thermohaline, ConvectionResult out, boolean jacobian) {
        MixingLengthZone.check(z);
        final double t = z.temperature;
        final double rho = z.density;
        final double p = z.pressure;
        final double m = z.mass;
        final double r = z.radius;
        final double kappa = z.opacity;
        final double cp = z.cp;
        final double nablaAd = z.nablaAd;
        final double delta = z.delta;
        final double lum = z.luminosity;

        final double perL = RadiativeGradient.value(kappa, 1.0, p, m, t);
        final double nablaRad = perL * lum;
        final double gravity = G * m / (r * r);
        final double scaleHeight = p / (rho * gravity);
        final boolean edge = scale == LengthScale.EDGE_DISTANCE;
        final boolean capped = !edge && limit == CentreLimit.RADIUS && r < scaleHeight;
        final double base = edge ? z.edgeDistance : capped ? r : scaleHeight;
        final double length = alpha * base;
        final boolean lengthOk = length > 0.0 && length < Double.POSITIVE_INFINITY;
        final double nablaL = LedouxGradient.value(nablaAd, z.phi, delta, z.nablaMu);
        final Regime regime = StabilityClassifier.classify(criterion, nablaRad, nablaAd, nablaL, z.nablaMu);
        final double u = lengthOk
                ? U_FACTOR * t * t * t * Math.sqrt(scaleHeight / (gravity * delta)) / (cp * kappa * rho * rho * length * length)
                : 0.0;

        out.regime = regime;
        out.nablaRad = nablaRad;
        out.scaleHeight = scaleHeight;
        out.mixingLength = lengthOk ? length : 0.0;
        out.lossParameter = u;

        if (regime != Regime.CONVECTIVE) {
            RadiativeGradient.valueAndDerivatives(kappa, lum, p, m, t, out.dNabla);
            MixingLengthZone.stable(z, regime, nablaRad, semiconvection, thermohaline, out);
            return;
        }
        if (!lengthOk) {
            throw new InvalidInputException("edgeDistance", z.edgeDistance, "cm", z.zone,
                    "finite and > 0 in a convective zone when the length scale is the distance to the nearest edge"
                            + " (alpha z = " + length + " cm): fill ZoneState.edgeDistance (" + z + ")");
        }
        final double w = nablaRad - nablaAd;
        if (!(w > 0.0)) {
            throw new InvalidInputException("nablaMu", z.nablaMu, "1", z.zone,
                    "such that the zone is not convective through its composition alone: nabla_rad - nabla_ad = " + w
                            + " <= 0 while nabla_rad > nabla_L, and the full-spectrum flux has no composition term; use"
                            + " a mixing-length model for such zones (" + z + ")");
        }
        final double u2 = u * u;
        final double rhs = SpectrumFlux.S_PER_EXCESS * w / u2;
        if (!(rhs >= Double.MIN_NORMAL && rhs <= Double.MAX_VALUE)) {
            throw new InvalidInputException("lossParameter", u, "1", z.zone,
                    "such that R = 40.5 (nabla_rad - nabla_ad) / U^2 is a normal double (here " + rhs + "): far below"
                            + " the zone is radiative and far above adiabatic to better than double precision; check c_P,"
                            + " kappa, rho, T and the length scale (" + z + ")");
        }
        final double invRhs = u2 / (SpectrumFlux.S_PER_EXCESS * w);

        // start within ~1e-8, then one Newton step in sigma = ln S on the residual S (1 + Phi) / R - 1
        double sigma = SpectrumFlux.start(Math.log(rhs));
        double s = Math.exp(sigma);
        final double x = SpectrumFlux.B * s;
        final double q = SpectrumFlux.excess(x);
        double phi = Math.exp(LN_A + SpectrumFlux.K * sigma + SpectrumFlux.N * Math.log(q));
        final double slope = SpectrumFlux.K + SpectrumFlux.N * SpectrumFlux.M * x * (1.0 + q) / ((1.0 + x) * q);
        double onePlus = 1.0 + phi;
        final double e = s * onePlus * invRhs - 1.0;
        final double step = -e / (1.0 + slope * phi / onePlus);
        s *= 1.0 + step * (1.0 + 0.5 * step);
        phi *= 1.0 + slope * step;
        onePlus = 1.0 + phi;
        final double inv1p = 1.0 / onePlus;
        final double invSlopeH = 1.0 / (1.0 + slope * phi * inv1p);

        final double y = w * inv1p;
        final double nabla = nablaAd + y;
        // F_conv / F = K (T / H_P) y Phi / (K (T / H_P) nabla_rad): the share of the total flux
        final double invNablaRad = 1.0 / nablaRad;
        final double share = phi * y * invNablaRad;
        final double sOver = s / 162.0;
        final double gamma = 2.0 * sOver / (1.0 + Math.sqrt(1.0 + 4.0 * sOver));
        final double v = Math.cbrt(V3_FACTOR * gravity * delta * length * share * lum / (r * r * rho * cp * t));
        final double diffusion = MixingCoefficients.convective(v, length);

        out.nabla = nabla;
        out.nablaElement = nablaAd + y / (1.0 + gamma);
        out.velocity = v;
        out.convectiveFraction = share;
        out.radiativeFraction = nabla / nablaRad;
        out.efficiency = gamma;
        out.diffusion = diffusion;
        double probe = 0.0;
        if (jacobian) {
            final double invT = 1.0 / t;
            final double invRho = 1.0 / rho;
            final double invP = 1.0 / p;
            final double invM = 1.0 / m;
            final double invR = 1.0 / r;
            final double invKappa = 1.0 / kappa;
            final double invCp = 1.0 / cp;
            final double invDelta = 1.0 / delta;
            final double invAlpha = 1.0 / alpha;
            final double invW = 1.0 / w;
            // d ln Lambda per d ln H_P: 1 when Lambda = alpha H_P, 0 when alpha r or alpha z
            final double hp = !edge && !capped ? 1.0 : 0.0;
            final double phiSlope = phi * slope;
            // T: nabla_rad ~ T^-4, U ~ T^3, v^3 ~ 1/T
            probe += entry(out, ZoneInput.T, -4.0 * nablaRad * invT, 0.0, 3.0 * invT, 0.0, -invT,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            // rho: H_P ~ 1/rho, U ~ rho^-2 H_P^(1/2) Lambda^-2, v^3 ~ 1/rho
            double lambdaRho = -hp * invRho;
            probe += entry(out, ZoneInput.RHO, 0.0, 0.0, -2.5 * invRho - 2.0 * lambdaRho, lambdaRho, -invRho,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            // P: nabla_rad ~ P, H_P ~ P
            double lambdaP = hp * invP;
            probe += entry(out, ZoneInput.P, nablaRad * invP, 0.0, 0.5 * invP - 2.0 * lambdaP, lambdaP, 0.0,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            // L: nabla_rad ~ L, v^3 ~ L
            probe += entry(out, ZoneInput.L, perL, 0.0, 0.0, 0.0, 1.0 / lum,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            // m: nabla_rad ~ 1/m, g ~ m, H_P ~ 1/m, U ~ (H_P / g)^(1/2) Lambda^-2, v^3 ~ g
            double lambdaM = -hp * invM;
            probe += entry(out, ZoneInput.M, -nablaRad * invM, 0.0, -invM - 2.0 * lambdaM, lambdaM, invM,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            // r: g ~ r^-2, H_P ~ r^2, Lambda ~ r when capped, v^3 ~ g / r^2
            double lambdaR = capped ? invR : 2.0 * hp * invR;
            probe += entry(out, ZoneInput.R, 0.0, 0.0, 2.0 * invR - 2.0 * lambdaR, lambdaR, -4.0 * invR,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            // kappa: nabla_rad ~ kappa, U ~ 1/kappa
            probe += entry(out, ZoneInput.KAPPA, nablaRad * invKappa, 0.0, -invKappa, 0.0, 0.0,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            // c_P: U ~ 1/c_P, v^3 ~ 1/c_P
            probe += entry(out, ZoneInput.CP, 0.0, 0.0, -invCp, 0.0, -invCp,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            probe += entry(out, ZoneInput.NABLA_AD, 0.0, 1.0, 0.0, 0.0, 0.0,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            // delta: U ~ delta^-1/2, v^3 ~ delta
            probe += entry(out, ZoneInput.DELTA, 0.0, 0.0, -0.5 * invDelta, 0.0, invDelta,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            probe += entry(out, ZoneInput.NABLA_MU, 0.0, 0.0, 0.0, 0.0, 0.0,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            probe += entry(out, ZoneInput.PHI, 0.0, 0.0, 0.0, 0.0, 0.0,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
            // alpha: Lambda ~ alpha, U ~ alpha^-2
            probe += entry(out, ZoneInput.ALPHA, 0.0, 0.0, -2.0 * invAlpha, invAlpha, 0.0,
                    invW, invSlopeH, phiSlope, slope, inv1p, y, v, diffusion, invNablaRad, share);
        }
        MixingLengthZone.guard(z, out, probe);
    }

    /**
     * One input's entries of a convective zone's Jacobian, from the base derivatives that input moves
     * (see the class comment), written into {@code out}.
     *
     * @return sum of (entry * 0) over the four entries: NaN exactly when one is not finite
     */
    private static double entry(ConvectionResult out, int i, double dRad, double dAd, double lnU, double lnLength,
                                double lnV3, double invW, double invSlopeH, double phiSlope, double slope,
                                double inv1p, double y, double v, double diffusion, double invNablaRad,
                                double share) {
        double dW = dRad - dAd;
        double dSigma = (dW * invW - 2.0 * lnU) * invSlopeH;
        double dPhi = phiSlope * dSigma;
        double dy = (dW - y * dPhi) * inv1p;
        // F_conv / F = Phi y / nabla_rad
        double dLnFraction = slope * dSigma + dy / y - dRad * invNablaRad;
        double dLnV = THIRD * (lnV3 + lnLength + dLnFraction);
        double nabla = dAd + dy;
        double velocity = v * dLnV;
        double fraction = share * dLnFraction;
        double mixing = diffusion * (dLnV + lnLength);
        out.dNabla[i] = nabla;
        out.dVelocity[i] = velocity;
        out.dConvectiveFraction[i] = fraction;
        out.dDiffusion[i] = mixing;
        return (nabla * 0.0 + velocity * 0.0) + (fraction * 0.0 + mixing * 0.0);
    }
}
