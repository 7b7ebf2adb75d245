package io.github.startransport.core.convection;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.gradient.LedouxGradient;
import io.github.startransport.core.gradient.RadiativeGradient;
import io.github.startransport.core.gradient.StabilityClassifier;
import io.github.startransport.core.gradient.ZoneChecks;
import io.github.startransport.spi.Checks;
import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.ZoneColumns;
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
 *       {@link MixingLengthCubic}, or where nabla_mu &lt; 0 its generalisation with the composition
 *       term in the buoyancy (below); then nabla, nabla_e, v = l sqrt(a g delta / H_P) 2 U' Gamma,
 *       F_conv / F = (nabla_rad - nabla) / nabla_rad, D = v l / 3.</li>
 *   <li>Stable zone: nabla = nabla_e = nabla_rad, v = 0, F_conv = 0, and D from
 *       {@link MixingCoefficients} for the semiconvective and thermohaline regimes, 0 otherwise.</li>
 * </ol>
 *
 * <p><b>Which excess drives the flux.</b> The flux is carried by the element's temperature
 * excess, so the cubic is driven by the thermal excess W = nabla_rad - nabla_ad under both
 * criteria. A stabilising composition gradient (nabla_mu &gt; 0) decides under Ledoux whether the
 * zone convects (nabla_rad &gt; nabla_L) but is left out of the buoyancy of its elements: with it
 * no efficient solution exists (there nabla tends to nabla_ad &lt; nabla_L, which is Ledoux-stable),
 * and convection mixes such a gradient away (common practice, no source). A destabilising one
 * (nabla_mu &lt; 0) enters the buoyancy under both criteria, as follows.
 *
 * <p><b>Composition in the buoyancy</b> (nabla_mu &lt; 0, b = -(phi/delta) nabla_mu &gt; 0). An element
 * displaced by dr keeps its mu while its surroundings' mu changes by -nabla_mu dr / H_P, so at
 * equal pressure its density contrast is -[delta (nabla - nabla_e) - phi nabla_mu] dr / H_P
 * (rho proportional to mu^phi T^-delta at fixed P; Kippenhahn, Weigert &amp; Weiss 2012 §6.1, from
 * memory). The mixing-length estimates of ch. 7 then read, with y = nabla - nabla_e and the geometry
 * constants a, b_F of {@link MixingLengthGeometry}:
 * <pre>
 *   v^2    = a g delta l^2 (y + b) / H_P            (buoyancy of temperature and composition)
 *   F_conv = b_F rho c_P T v (l / H_P) y            (heat is carried by the temperature excess)
 *   (nabla_e - nabla_ad) / y = 1 / Gamma,   Gamma proportional to v   (losses depend on y only)
 * </pre>
 * With x = sqrt(y + b) in the units of the cubic (v = l sqrt(a g delta / H_P) x) the losses give
 * nabla - nabla_ad = y (1 + 2U'/x) and the flux x y = k U (nabla_rad - nabla); eliminating nabla,
 * <pre>
 *   (x^2 - b) (x^2 + k U x + 2 k U U') = k U W x,
 * </pre>
 * which for b = 0 is x times the textbook cubic; in the efficiency Gamma = x / (2U') it is the
 * equation of {@link MixingLengthCubic#efficiency(double, double, double)}. It has one positive
 * root wherever nabla_rad &gt; nabla_L (W + b &gt; 0), also for W &lt;= 0: a zone that is
 * Schwarzschild-stable but Ledoux-unstable convects, driven by its composition alone. There
 * y = W Gamma / D has the sign of W, so for W &lt; 0 the element is cooler than its surroundings
 * when it rises and the convective flux runs inwards: nabla_rad &lt; nabla &lt; nabla_e &lt; nabla_ad,
 * F_conv / F = (nabla_rad - nabla) / nabla_rad &lt; 0 for L &gt; 0 (radiation then carries more than
 * the total; with L &lt; 0 the ratio is positive and may exceed 1). The limits: as U -&gt; 0 nabla -&gt;
 * nabla_ad with nabla - nabla_ad -&gt; k U W / sqrt(b) (x -&gt; sqrt(b)); as U -&gt; infinity nabla -&gt;
 * nabla_rad while v -&gt; l sqrt(a g delta b / H_P), the composition's buoyancy alone. A zone with
 * L = 0 that convects this way is refused: F_conv / F has no value there. The same
 * construction is not made for nabla_mu &gt; 0 (see above). At R0 = 1 (nabla_rad = nabla_L) the
 * convective solution does not vanish (x -&gt; sqrt(b) there too, since the composition's buoyancy
 * remains when W + b -&gt; 0), so the regime switch to thermohaline mixing is discontinuous: onset
 * of overturning in an inverted-mu zone is not gradual in this local theory.
 *
 * <p><b>Limits of double precision.</b> A convective zone needs W / (4 U'^2) (with composition
 * (|W| + b) / (4 U'^2)) to be a normal double, roughly 1e-154 &lt; U' / sqrt(W) &lt; 1e154; beyond, it is refused with an
 * {@link InvalidInputException} on the loss parameter (far below the zone is adiabatic, far above
 * radiative, to far better than double precision; no star comes near either). F_conv / F is
 * bounded to [0, 1] where W &gt; 0 (its rounded product could land one ulp above 1).
 *
 * <p>Derivatives: every output's partial derivatives with respect to T, rho, P, L, m, r, kappa,
 * c_P, nabla_ad, delta, nabla_mu, phi and alpha, by the chain rule through nabla_rad, H_P, l, U, U'
 * and implicit differentiation of the cubic (d Gamma = (dS - Gamma^3 d a0) / (3 a0 Gamma^2 +
 * 2 Gamma + 1), or of the equation with composition). nabla_mu and phi enter the semiconvective and
 * thermohaline coefficients, and a convective zone through b where nabla_mu &lt; 0.
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
    private static final double INV_G = 1.0 / G;
    /** Bit pattern of 2^-256: {@link #offset} maps [2^-256, 2^256) onto [0, 2^61). */
    private static final long ORDINARY_LOW = 767L << 52;
    private static final int ORDINARY_SHIFT = 61;

    /**
     * The batch call of both convection models: a loop over the per-zone kernel with the output's
     * working space (no allocation, no per-zone dispatch); a convective zone's Jacobian is written
     * straight into the output columns, by the same arithmetic as the per-zone call.
     *
     * @param settings  the model's options
     * @param eddyShape y of the transparency correction, or 0 for none
     * @param in        input columns
     * @param from      first zone (inclusive)
     * @param to        last zone (exclusive)
     * @param out       output columns
     * @param jacobian  whether to fill the derivative columns
     */
    static void solveColumns(ConvectionSettings settings, double eddyShape, ZoneColumns in, int from, int to,
                             ConvectionColumns out, boolean jacobian) {
        in.checkRange(from, to, out.capacity);
        final ZoneState zone = out.workZone;
        final ConvectionResult r = out.workResult;
        final double alpha = settings.alpha();
        final MixingLengthGeometry geometry = settings.geometry();
        final CentreLimit limit = settings.centreLimit();
        final Criterion criterion = settings.criterion();
        final double semiconvection = settings.semiconvection();
        final double thermohaline = settings.thermohaline();
        for (int k = from; k < to; k++) {
            boolean written = solve(in.load(k, zone), alpha, geometry, eddyShape, limit, criterion,
                    semiconvection, thermohaline, r, jacobian, out, k);
            out.store(k, r, jacobian && !written);
        }
    }

    /**
     * Validates the zone fields the convection models read: those of the stability test plus
     * radius and c_P.
     *
     * @param z the zone
     * @throws io.github.startransport.spi.InvalidInputException naming the first bad field
     */
    public static void check(ZoneState z) {
        // one combined test on the normal path; the detailed checks (which name the first bad field)
        // only when it fails, so the refusal is exactly theirs
        final double inf = Double.POSITIVE_INFINITY;
        final boolean ok = (z.temperature > 0.0) & (z.temperature < inf)
                & (z.density > 0.0) & (z.density < inf)
                & (z.pressure > 0.0) & (z.pressure < inf)
                & (Math.abs(z.luminosity) < inf)
                & (z.mass > 0.0) & (z.mass < inf)
                & (z.opacity > 0.0) & (z.opacity < inf)
                & (z.nablaAd > 0.0) & (z.nablaAd < 1.0)
                & (z.delta > 0.0) & (z.delta < inf)
                & (z.phi > 0.0) & (z.phi < inf)
                & (Math.abs(z.nablaMu) < inf)
                & (z.radius > 0.0) & (z.radius < inf)
                & (z.cp > 0.0) & (z.cp < inf);
        if (!ok) {
            ZoneChecks.forStability(z);
            Checks.positive("radius", z.radius, "cm", z.zone);
            Checks.positive("cp", z.cp, "erg g^-1 K^-1", z.zone);
        }
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
        solve(z, alpha, geometry, eddyShape, limit, criterion, semiconvection, thermohaline, out, jacobian, null, 0);
    }

    /**
     * {@link #solve(ZoneState, double, MixingLengthGeometry, double, CentreLimit, Criterion, double, double,
     * ConvectionResult, boolean)} for a batch call: the Jacobian of a convective zone goes straight into zone
     * k of {@code columns} (by the same arithmetic, so bit for bit the per-zone values); everything else
     * goes into {@code out} as in the per-zone call.
     *
     * @param columns the batch output whose derivative columns receive a convective zone's Jacobian, or
     *                null to write it into {@code out}
     * @param k       the zone's column index
     * @return true when the Jacobian went into {@code columns} (a convective zone with {@code jacobian});
     *         false when {@code out} holds the whole result
     */
    static boolean solve(ZoneState z, double alpha, MixingLengthGeometry geometry, double eddyShape,
                         CentreLimit limit, Criterion criterion, double semiconvection, double thermohaline,
                         ConvectionResult out, boolean jacobian, ConvectionColumns columns, int k) {
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

        // Normal path: every input that is inverted lies in [2^-256, 2^256) (one test on the bit
        // patterns, which also proves it finite and > 0) and the other fields are valid. Otherwise the
        // detailed checks run, which refuse naming the first bad field.
        final long spread = offset(t) | offset(rho) | offset(p) | offset(m) | offset(r) | offset(kappa)
                | offset(cp) | offset(delta) | offset(alpha);
        final double inf = Double.POSITIVE_INFINITY;
        final boolean ordinary = ((spread >>> ORDINARY_SHIFT) == 0L) & (Math.abs(z.luminosity) < inf)
                & (nablaAd > 0.0) & (nablaAd < 1.0) & (phi > 0.0) & (phi < inf) & (Math.abs(nablaMu) < inf);
        if (!ordinary) {
            check(z);
        }

        // The reciprocals of the inputs first, independent of the value chain, which is then products
        // and two independent square roots up to U. On the normal path three reciprocals come from one
        // division (1/x = y z / (x y z)), whose products cannot overflow or underflow there.
        final double invT;
        final double invRho;
        final double invP;
        final double invM;
        final double invR;
        final double invKappa;
        final double invCp;
        final double invDelta;
        final double invAlpha;
        if (ordinary) {
            final double rhoP = rho * p;
            final double invRhoPDelta = 1.0 / (rhoP * delta);
            final double mR = m * r;
            final double invMRT = 1.0 / (mR * t);
            final double kappaCp = kappa * cp;
            final double invKappaCpAlpha = 1.0 / (kappaCp * alpha);
            invRho = (p * delta) * invRhoPDelta;
            invP = (rho * delta) * invRhoPDelta;
            invDelta = rhoP * invRhoPDelta;
            invM = (r * t) * invMRT;
            invR = (m * t) * invMRT;
            invT = mR * invMRT;
            invKappa = (cp * alpha) * invKappaCpAlpha;
            invCp = (kappa * alpha) * invKappaCpAlpha;
            invAlpha = kappaCp * invKappaCpAlpha;
        } else {
            invT = 1.0 / t;
            invRho = 1.0 / rho;
            invP = 1.0 / p;
            invM = 1.0 / m;
            invR = 1.0 / r;
            invKappa = 1.0 / kappa;
            invCp = 1.0 / cp;
            invDelta = 1.0 / delta;
            invAlpha = 1.0 / alpha;
        }

        // nabla_rad per unit L, then nabla_rad: the same arithmetic as RadiativeGradient.valueAndDerivatives
        final double perL = RadiativeGradient.value(kappa, 1.0, p, m, t);
        final double nablaRad = perL * z.luminosity;
        // g = G m / r^2 and 1/g; H_P = (P / rho) / g and 1/H_P
        final double gravity = (G * m) * (invR * invR);
        final double invGravity = (r * r) * (invM * INV_G);
        final double pressureHeight = p * invRho;
        final double scaleHeight = pressureHeight * invGravity;
        final boolean capped = limit == CentreLimit.RADIUS && r < scaleHeight;
        final double length = alpha * (capped ? r : scaleHeight);
        // sqrt(H_P / (a g delta)) = sqrt(P / (rho delta)) / (g sqrt(a)) and its inverse, the velocity
        // scale sqrt(a g delta / H_P) = g sqrt(a) sqrt(delta rho / P): two independent roots
        final double rootA = geometry.rootVelocityFactor();
        final double thermal = Math.sqrt(pressureHeight * invDelta);
        final double buoyant = Math.sqrt((delta * rho) * invP);
        final double velocityScale = gravity * (rootA * buoyant);
        // U = c sigma T^3 sqrt(H_P / (a g delta)) / (2 c_P kappa rho^2 l^2) as numerator / denominator,
        // so that U and 1/U are two independent divisions
        final double uNumerator = geometry.lossFactor() * SIGMA * t * t * t * (thermal * invGravity);
        final double uDenominator = 2.0 * rootA * cp * kappa * rho * rho * length * length;
        final double u = uNumerator / uDenominator;
        final double invU = uDenominator / uNumerator;
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
        // q = y omega^2 / (1 + y omega^2) and 1/q = 1 + 1/(y omega^2), independent of each other
        final double thin = transparent ? 1.0 / (1.0 + yw2) : 0.0;
        final double q = transparent ? yw2 * thin : 1.0;
        final double invQ = transparent ? 1.0 + 1.0 / yw2 : 1.0;
        final double uLoss = q * u;
        final double invULoss = invQ * invU;
        final double a0 = q * geometry.cubicCoefficient();
        final double invFourULoss2 = 0.25 * invULoss * invULoss;
        final double s = w * invFourULoss2;
        // 1/W and 1/nabla_rad from one division when their product is far from overflow and underflow
        final double wNablaRad = w * nablaRad;
        final double invW;
        final double invNablaRad;
        if (wNablaRad > 1e-300 && wNablaRad < 1e300) {
            final double both = 1.0 / wNablaRad;
            invW = nablaRad * both;
            invNablaRad = w * both;
        } else {
            invW = 1.0 / w;
            invNablaRad = 1.0 / nablaRad;
        }
        if (regime != Regime.CONVECTIVE) {
            RadiativeGradient.valueAndDerivatives(kappa, z.luminosity, p, m, t, out.dNabla);
            stable(z, regime, nablaRad, semiconvection, thermohaline, out);
            return false;
        }
        // the composition term of the buoyancy, b = -(phi/delta) nabla_mu, where it destabilises
        final double b = nablaMu < 0.0 ? (phi * invDelta) * -nablaMu : 0.0;
        final boolean driven = b > 0.0;
        final double beta = driven ? b * invFourULoss2 : 0.0;
        // the cubic's right-hand side S (with composition, the scale |S| + beta of the equation) must be a
        // normal double: outside it U' is beyond ~1e+-154 and S or Gamma do not fit. (W + b > 0 is not
        // required of the rounded terms: the composition solver also takes a W + b that rounding made <= 0.)
        final double drive = driven ? Math.abs(s) + beta : s;
        if (!(drive >= Double.MIN_NORMAL && drive <= Double.MAX_VALUE && beta <= Double.MAX_VALUE)) {
            throw lossOutOfRange(z, u, uLoss, w, b);
        }
        if (nablaRad == 0.0) {
            throw undefinedFraction(z);
        }

        // without the transparency correction a0 is the geometry's constant, whose start table applies
        final double gamma = driven ? MixingLengthCubic.efficiency(a0, s, beta)
                : transparent ? MixingLengthCubic.efficiency(a0, s)
                : MixingLengthCubic.efficiency(a0, s, geometry.cubicStarts());
        final double den = MixingLengthCubic.denominator(a0, gamma);
        final double invDen;
        // d Gamma = gR (dR - dA) + gB dB + gMu mu + gNu nu and d ln v = vR (dR - dA) + vB dB + vMu mu + vNu nu
        // + lambda + sigma (see convectiveJacobian), with B = b
        final double gR;
        final double gB;
        final double gMu;
        final double gNu;
        final double vR;
        final double vB;
        final double vMu;
        final double vNu;
        final double a0Gamma2 = a0 * (gamma * gamma);
        if (driven) {
            // d Gamma = (Gamma dS + D d beta - (Gamma^2 - beta) Gamma^2 d a0) / F' (MixingLengthCubic.compositionSlope)
            invDen = 1.0 / den;
            final double h = 1.0 / MixingLengthCubic.compositionSlope(a0, s, gamma);
            final double scaled = invFourULoss2 * h;
            gR = gamma * scaled;
            gB = den * scaled;
            gMu = -2.0 * (gamma * gamma) * den * h;
            gNu = -s * a0Gamma2 * gamma * invDen * h;
            vR = scaled;
            vB = gB / gamma;
            vMu = 1.0 - 2.0 * gamma * den * h;
            vNu = -s * a0Gamma2 * invDen * h;
        } else {
            // D and the cubic's slope 3 a0 Gamma^2 + 2 Gamma + 1 are both >= 1: their reciprocals from one
            // division unless the product is near overflow
            final double slope = (3.0 * a0 * gamma + 2.0) * gamma + 1.0;
            final double denSlope = den * slope;
            final double sensitivity;
            if (denSlope < 1e300) {
                final double both = 1.0 / denSlope;
                invDen = slope * both;
                sensitivity = den * both;
            } else {
                invDen = 1.0 / den;
                sensitivity = 1.0 / slope;
            }
            // the g's over Gamma written by S = Gamma D and S = W / (4 U'^2): gR / Gamma = sensitivity D / W,
            // gMu / Gamma = -2 sensitivity D, gNu / Gamma = -sensitivity a0 Gamma^2
            gR = sensitivity * invFourULoss2;
            gB = 0.0;
            gMu = sensitivity * (-2.0 * s);
            gNu = sensitivity * -(a0Gamma2 * gamma);
            vR = sensitivity * (den * invW);
            vB = 0.0;
            vMu = 1.0 - 2.0 * (sensitivity * den);
            vNu = sensitivity * -a0Gamma2;
        }
        final double shareRad = a0Gamma2 * invDen;               // (nabla_rad - nabla) / W
        final double shareSuper = (gamma + 1.0) * invDen;        // (nabla - nabla_ad) / W
        final double nabla = nablaAd + w * shareSuper;
        final double x = 2.0 * uLoss * gamma;
        final double velocity = length * velocityScale * x;
        // F_conv / F = (W / nabla_rad) (a0 Gamma^2 / D): for W > 0 both factors lie in [0, 1), but their
        // rounded product can land one ulp above 1 where both are 1 - ulp; it is bounded to 1 there. For
        // W <= 0 (convection driven by composition alone) it is the signed fraction, <= 0 for L > 0.
        final double product = w * shareRad * invNablaRad;
        final double convective = w > 0.0 ? Math.min(product, 1.0) : product;
        final double diffusion = MixingCoefficients.convective(velocity, length);

        out.nabla = nabla;
        out.nablaElement = nablaAd + w * invDen;
        out.velocity = velocity;
        out.convectiveFraction = convective;
        out.radiativeFraction = nabla * invNablaRad;
        out.efficiency = gamma;
        out.diffusion = diffusion;
        double probe = 0.0;
        if (jacobian) {
            probe = convectiveJacobian(invT, invRho, invP, invM, invR, invKappa, invCp, invDelta, invAlpha, capped,
                    2.0 * thin, nablaRad, invNablaRad, perL, w, a0, gamma, a0Gamma2, invDen, gR, gMu, gNu, vR, vMu,
                    vNu, shareRad, shareSuper, velocity, convective, diffusion, out, columns, k);
            if (driven) {
                probe += compositionJacobian(phi, invDelta, nablaMu, b, w, a0, gamma, invDen, invNablaRad, gB, vB,
                        velocity, diffusion, out, columns, k);
            }
        }
        guard(z, out, probe);
        return jacobian && columns != null;
    }

    /**
     * The Jacobian of a convective zone, written as a few coefficients per output times the
     * derivatives of the "base" quantities each input moves: nabla_rad (R), nabla_ad (A),
     * ln U' (mu), ln a0 (nu), ln l (lambda) and ln sqrt(a g delta / H_P) (sigma); the composition
     * term b (B) is added by {@link #compositionJacobian}. From the chain rule through the cubic
     * (see the class comment):
     * <pre>
     *   dS     = (dR - dA) / (4 U'^2) - 2 S mu,   d a0 = a0 nu,   dGamma = (dS - Gamma^3 d a0) / (3 a0 Gamma^2 + 2 Gamma + 1)
     *   d(a0 Gamma^2 / D) = (d a0 Gamma^2 (Gamma + 1) + a0 Gamma (Gamma + 2) dGamma) / D^2
     *   d nabla = (Gamma + 1)/D dR + a0 Gamma^2/D dA - W d(a0 Gamma^2 / D)
     *   d ln v  = lambda + sigma + mu + dGamma / Gamma,   d ln D_conv = d ln v + lambda
     *   d(F_conv/F) = (dW a0 Gamma^2/D + W d(a0 Gamma^2 / D) - (F_conv/F) dR) / nabla_rad
     * </pre>
     * The caller passes dGamma as gR (dR - dA) + gMu mu + gNu nu and d ln v - lambda - sigma as
     * vR (dR - dA) + vMu mu + vNu nu, from the cubic or from the equation with composition
     * ({@link MixingLengthCubic#compositionSlope}). Each input moves only some of these
     * (H_P = P r^2 / (G m rho), g = G m / r^2, U proportional to T^3 sqrt(H_P / (g delta)) /
     * (c_P kappa rho^2 l^2), omega = kappa rho l, ln q = ln (y omega^2 / (1 + y omega^2))), so each
     * entry is written with its nonzero terms only. The values go to {@code out}'s arrays, or to
     * zone k of {@code columns} when that is not null, by the same arithmetic (bit-identical either
     * way).
     */
    private static double convectiveJacobian(double invT, double invRho, double invP, double invM, double invR,
                                           double invKappa, double invCp, double invDelta, double invAlpha,
                                           boolean capped, double lossElasticity, double nablaRad,
                                           double invNablaRad, double perL, double w, double a0,
                                           double gamma, double a0Gamma2, double invDen,
                                           double gR, double gMu, double gNu, double vR, double vMu, double vNu,
                                           double shareRad, double shareSuper, double velocity, double convective,
                                           double diffusion, ConvectionResult out, ConvectionColumns columns,
                                           int k) {
        // d(shareRad) = sR (dR - dA) + sMu mu + sNu nu
        final double invDen2 = invDen * invDen;
        final double shareSlope = (a0 * gamma * (gamma + 2.0)) * invDen2;
        final double sR = shareSlope * gR;
        final double sMu = shareSlope * gMu;
        final double sNu = (a0Gamma2 * (gamma + 1.0)) * invDen2 + shareSlope * gNu;
        // d nabla = nR dR + nA dA + nMu mu + nNu nu
        final double nR = shareSuper - w * sR;
        final double nA = shareRad + w * sR;
        final double nMu = -w * sMu;
        final double nNu = -w * sNu;
        // d(F_conv/F) = cR dR + cA dA + cMu mu + cNu nu
        final double cR = (shareRad + w * sR - convective) * invNablaRad;
        final double cA = -nA * invNablaRad;
        final double cMu = w * sMu * invNablaRad;
        final double cNu = w * sNu * invNablaRad;

        // per input: base derivatives per unit of the input
        // d ln l / d ln q for H_P's inputs (0 when l = alpha r), and d ln q' of q = omega's share
        final double lengthHp = capped ? 0.0 : 1.0;
        final double le = lossElasticity;
        // the 44 entries that can be nonzero, input by input: d nabla, d v, d(F_conv/F), d D
        final double nablaT;
        final double velT;
        final double fracT;
        final double diffT;
        // T: nabla_rad ~ T^-4, U ~ T^3
        {
            double dR = -4.0 * nablaRad * invT;
            double mu = 3.0 * invT;
            double lnV = vR * dR + vMu * mu;
            nablaT = nR * dR + nMu * mu;
            velT = velocity * lnV;
            fracT = cR * dR + cMu * mu;
            diffT = diffusion * lnV;
        }
        final double nablaRho;
        final double velRho;
        final double fracRho;
        final double diffRho;
        // rho: H_P ~ 1/rho, U ~ rho^-2 (H_P)^(1/2) l^-2, omega ~ rho l, sigma = +1/2
        {
            double lambda = -lengthHp * invRho;
            double nu = le * (invRho + lambda);
            double mu = -2.5 * invRho - 2.0 * lambda + nu;
            double sigma = 0.5 * invRho;
            double lnV = vMu * mu + vNu * nu + lambda + sigma;
            nablaRho = nMu * mu + nNu * nu;
            velRho = velocity * lnV;
            fracRho = cMu * mu + cNu * nu;
            diffRho = diffusion * (lnV + lambda);
        }
        final double nablaP;
        final double velP;
        final double fracP;
        final double diffP;
        // P: nabla_rad ~ P, H_P ~ P, sigma = -1/2
        {
            double dR = nablaRad * invP;
            double lambda = lengthHp * invP;
            double nu = le * lambda;
            double mu = 0.5 * invP - 2.0 * lambda + nu;
            double sigma = -0.5 * invP;
            double lnV = vR * dR + vMu * mu + vNu * nu + lambda + sigma;
            nablaP = nR * dR + nMu * mu + nNu * nu;
            velP = velocity * lnV;
            fracP = cR * dR + cMu * mu + cNu * nu;
            diffP = diffusion * (lnV + lambda);
        }
        final double nablaL;
        final double velL;
        final double fracL;
        final double diffL;
        // L: nabla_rad only
        {
            double dR = perL;
            double lnV = vR * dR;
            nablaL = nR * dR;
            velL = velocity * lnV;
            fracL = cR * dR;
            diffL = diffusion * lnV;
        }
        final double nablaM;
        final double velM;
        final double fracM;
        final double diffM;
        // m: nabla_rad ~ 1/m, H_P ~ 1/m, g ~ m, U ~ (H_P/g)^(1/2) l^-2, sigma = +1
        {
            double dR = -nablaRad * invM;
            double lambda = -lengthHp * invM;
            double nu = le * lambda;
            double mu = -invM - 2.0 * lambda + nu;
            double sigma = invM;
            double lnV = vR * dR + vMu * mu + vNu * nu + lambda + sigma;
            nablaM = nR * dR + nMu * mu + nNu * nu;
            velM = velocity * lnV;
            fracM = cR * dR + cMu * mu + cNu * nu;
            diffM = diffusion * (lnV + lambda);
        }
        final double nablaRadius;
        final double velRadius;
        final double fracRadius;
        final double diffRadius;
        // r: H_P ~ r^2, g ~ r^-2, l ~ r^2 (or r when capped), sigma = -2
        {
            double lambda = (1.0 + lengthHp) * invR;
            double nu = le * lambda;
            double mu = 2.0 * invR - 2.0 * lambda + nu;
            double sigma = -2.0 * invR;
            double lnV = vMu * mu + vNu * nu + lambda + sigma;
            nablaRadius = nMu * mu + nNu * nu;
            velRadius = velocity * lnV;
            fracRadius = cMu * mu + cNu * nu;
            diffRadius = diffusion * (lnV + lambda);
        }
        final double nablaKappa;
        final double velKappa;
        final double fracKappa;
        final double diffKappa;
        // kappa: nabla_rad ~ kappa, U ~ 1/kappa, omega ~ kappa
        {
            double dR = nablaRad * invKappa;
            double nu = le * invKappa;
            double mu = -invKappa + nu;
            double lnV = vR * dR + vMu * mu + vNu * nu;
            nablaKappa = nR * dR + nMu * mu + nNu * nu;
            velKappa = velocity * lnV;
            fracKappa = cR * dR + cMu * mu + cNu * nu;
            diffKappa = diffusion * lnV;
        }
        final double nablaCp;
        final double velCp;
        final double fracCp;
        final double diffCp;
        // c_P: U ~ 1/c_P
        {
            double mu = -invCp;
            double lnV = vMu * mu;
            nablaCp = nMu * mu;
            velCp = velocity * lnV;
            fracCp = cMu * mu;
            diffCp = diffusion * lnV;
        }
        final double nablaNablaAd;
        final double velNablaAd;
        final double fracNablaAd;
        final double diffNablaAd;
        // nabla_ad: dA = 1
        {
            double lnV = -vR;
            nablaNablaAd = nA;
            velNablaAd = velocity * lnV;
            fracNablaAd = cA;
            diffNablaAd = diffusion * lnV;
        }
        final double nablaDelta;
        final double velDelta;
        final double fracDelta;
        final double diffDelta;
        // delta: U ~ delta^-1/2, sigma = +1/2
        {
            double mu = -0.5 * invDelta;
            double lnV = vMu * mu + 0.5 * invDelta;
            nablaDelta = nMu * mu;
            velDelta = velocity * lnV;
            fracDelta = cMu * mu;
            diffDelta = diffusion * lnV;
        }
        final double nablaAlpha;
        final double velAlpha;
        final double fracAlpha;
        final double diffAlpha;
        // alpha: l ~ alpha, U ~ l^-2, omega ~ l
        {
            double lambda = invAlpha;
            double nu = le * lambda;
            double mu = -2.0 * lambda + nu;
            double lnV = vMu * mu + vNu * nu + lambda;
            nablaAlpha = nMu * mu + nNu * nu;
            velAlpha = velocity * lnV;
            fracAlpha = cMu * mu + cNu * nu;
            diffAlpha = diffusion * (lnV + lambda);
        }
        // nabla_mu and phi enter only through the composition term (written by compositionJacobian).
        // The stores follow in one straight run per destination, so that nothing branches between them.
        if (columns == null) {
            write(out.dNabla, nablaT, nablaRho, nablaP, nablaL, nablaM, nablaRadius, nablaKappa, nablaCp, nablaNablaAd,
                    nablaDelta, nablaAlpha);
            write(out.dVelocity, velT, velRho, velP, velL, velM, velRadius, velKappa, velCp, velNablaAd, velDelta,
                    velAlpha);
            write(out.dConvectiveFraction, fracT, fracRho, fracP, fracL, fracM, fracRadius, fracKappa, fracCp,
                    fracNablaAd, fracDelta, fracAlpha);
            write(out.dDiffusion, diffT, diffRho, diffP, diffL, diffM, diffRadius, diffKappa, diffCp, diffNablaAd,
                    diffDelta, diffAlpha);
        } else {
            write(columns.dNabla, k, nablaT, nablaRho, nablaP, nablaL, nablaM, nablaRadius, nablaKappa, nablaCp,
                    nablaNablaAd, nablaDelta, nablaAlpha);
            write(columns.dVelocity, k, velT, velRho, velP, velL, velM, velRadius, velKappa, velCp, velNablaAd,
                    velDelta, velAlpha);
            write(columns.dConvectiveFraction, k, fracT, fracRho, fracP, fracL, fracM, fracRadius, fracKappa, fracCp,
                    fracNablaAd, fracDelta, fracAlpha);
            write(columns.dDiffusion, k, diffT, diffRho, diffP, diffL, diffM, diffRadius, diffKappa, diffCp,
                    diffNablaAd, diffDelta, diffAlpha);
        }
        // sum of (entry * 0): NaN exactly when one entry is not finite; a short tree of sums
        final double zeroT = (nablaT * 0.0 + velT * 0.0) + (fracT * 0.0 + diffT * 0.0);
        final double zeroRho = (nablaRho * 0.0 + velRho * 0.0) + (fracRho * 0.0 + diffRho * 0.0);
        final double zeroP = (nablaP * 0.0 + velP * 0.0) + (fracP * 0.0 + diffP * 0.0);
        final double zeroL = (nablaL * 0.0 + velL * 0.0) + (fracL * 0.0 + diffL * 0.0);
        final double zeroM = (nablaM * 0.0 + velM * 0.0) + (fracM * 0.0 + diffM * 0.0);
        final double zeroRadius = (nablaRadius * 0.0 + velRadius * 0.0) + (fracRadius * 0.0 + diffRadius * 0.0);
        final double zeroKappa = (nablaKappa * 0.0 + velKappa * 0.0) + (fracKappa * 0.0 + diffKappa * 0.0);
        final double zeroCp = (nablaCp * 0.0 + velCp * 0.0) + (fracCp * 0.0 + diffCp * 0.0);
        final double zeroNablaAd = (nablaNablaAd * 0.0 + velNablaAd * 0.0) + (fracNablaAd * 0.0 + diffNablaAd * 0.0);
        final double zeroDelta = (nablaDelta * 0.0 + velDelta * 0.0) + (fracDelta * 0.0 + diffDelta * 0.0);
        final double zeroAlpha = (nablaAlpha * 0.0 + velAlpha * 0.0) + (fracAlpha * 0.0 + diffAlpha * 0.0);
        return ((((zeroT + zeroRho) + (zeroP + zeroL)) + ((zeroM + zeroRadius) + (zeroKappa + zeroCp)))
                + ((zeroNablaAd + zeroDelta) + zeroAlpha));
    }

    /**
     * The composition term's share of a convective zone's Jacobian, where b = -(phi/delta) nabla_mu &gt; 0
     * enters the buoyancy: each output's coefficient of dB (from d Gamma = ... + gB dB and
     * d ln v = ... + vB dB), times d b / d nabla_mu = -phi/delta, d b / d phi = -nabla_mu/delta and
     * d b / d delta = -b/delta. Writes the nabla_mu and phi entries and adds to the delta entries
     * that {@link #convectiveJacobian} wrote, in {@code out} or in zone k of {@code columns}.
     *
     * @return sum of (entry * 0) over the entries written: NaN exactly when one is not finite
     */
    private static double compositionJacobian(double phi, double invDelta, double nablaMu, double b, double w,
                                              double a0, double gamma, double invDen, double invNablaRad,
                                              double gB, double vB, double velocity, double diffusion,
                                              ConvectionResult out, ConvectionColumns columns, int k) {
        final double shareSlope = (a0 * gamma * (gamma + 2.0)) * (invDen * invDen);
        final double sB = shareSlope * gB;
        final double nablaB = -w * sB;
        final double velB = velocity * vB;
        final double fracB = w * sB * invNablaRad;
        final double diffB = diffusion * vB;
        final double bMu = -(phi * invDelta);
        final double bPhi = -nablaMu * invDelta;
        final double bDelta = -b * invDelta;
        if (columns == null) {
            return composition(out.dNabla, nablaB, bMu, bPhi, bDelta) + composition(out.dVelocity, velB, bMu, bPhi, bDelta)
                    + composition(out.dConvectiveFraction, fracB, bMu, bPhi, bDelta)
                    + composition(out.dDiffusion, diffB, bMu, bPhi, bDelta);
        }
        return composition(columns.dNabla, k, nablaB, bMu, bPhi, bDelta)
                + composition(columns.dVelocity, k, velB, bMu, bPhi, bDelta)
                + composition(columns.dConvectiveFraction, k, fracB, bMu, bPhi, bDelta)
                + composition(columns.dDiffusion, k, diffB, bMu, bPhi, bDelta);
    }

    /** One output's composition entries: d/d nabla_mu and d/d phi written, d/d delta added to. */
    private static double composition(double[] d, double perB, double bMu, double bPhi, double bDelta) {
        d[ZoneInput.NABLA_MU] = perB * bMu;
        d[ZoneInput.PHI] = perB * bPhi;
        d[ZoneInput.DELTA] += perB * bDelta;
        return (d[ZoneInput.NABLA_MU] * 0.0 + d[ZoneInput.PHI] * 0.0) + d[ZoneInput.DELTA] * 0.0;
    }

    /** {@link #composition(double[], double, double, double, double)} for zone k of an output's columns. */
    private static double composition(double[][] c, int k, double perB, double bMu, double bPhi, double bDelta) {
        c[ZoneInput.NABLA_MU][k] = perB * bMu;
        c[ZoneInput.PHI][k] = perB * bPhi;
        c[ZoneInput.DELTA][k] += perB * bDelta;
        return (c[ZoneInput.NABLA_MU][k] * 0.0 + c[ZoneInput.PHI][k] * 0.0) + c[ZoneInput.DELTA][k] * 0.0;
    }

    /**
     * The refusal of a convective zone whose loss parameter is beyond what double precision can
     * solve: the right-hand side W / (4 U'^2) of the cubic (or (|W| + b) / (4 U'^2)) is not a normal
     * double (U' below
     * about 1e-154 or above about 1e154 for W ~ 1). Not a hot-path branch: it allocates the exception.
     */
    private static InvalidInputException lossOutOfRange(ZoneState z, double u, double uLoss, double w, double b) {
        return new InvalidInputException("lossParameter", u, "1", z.zone,
                "such that (|nabla_rad - nabla_ad| + b) / (4 U'^2) is a normal double (here U' = " + uLoss
                        + ", nabla_rad - nabla_ad = " + w + ", b = -(phi/delta) nabla_mu = " + b
                        + "): about 1e-154 < U' / sqrt(|nabla_rad - nabla_ad| + b) < 1e154. Far below, the zone is"
                        + " adiabatic (nabla = nabla_ad) and far above radiative (nabla = nabla_rad) to much better"
                        + " than double precision; U = (3 a c T^3 / (c_P rho^2 kappa l^2)) sqrt(8 H_P / (g delta)):"
                        + " check c_P, kappa, rho, T and alpha (" + z + ")");
    }

    /** The refusal of a convective zone with L = 0, where F_conv / F has no value. */
    private static InvalidInputException undefinedFraction(ZoneState z) {
        return new InvalidInputException("luminosity", z.luminosity, "erg s^-1", z.zone,
                "non-zero in a convective zone: with L = 0 (nabla_rad = 0) the zone convects only because its"
                        + " inverted composition gradient puts nabla_L below 0, and F_conv / F is undefined ("
                        + z + ")");
    }

    /** Bit pattern of x minus that of 2^-256: in [0, 2^61) exactly when 2^-256 &lt;= x &lt; 2^256. */
    private static long offset(double x) {
        return Double.doubleToRawLongBits(x) - ORDINARY_LOW;
    }

    /** Writes one output's Jacobian row in {@link ZoneInput} order, with 0 for nabla_mu and phi. */
    private static void write(double[] d, double t, double rho, double p, double l, double m, double r,
                              double kappa, double cp, double nablaAd, double delta, double alpha) {
        d[ZoneInput.ALPHA] = alpha;
        d[ZoneInput.T] = t;
        d[ZoneInput.RHO] = rho;
        d[ZoneInput.P] = p;
        d[ZoneInput.L] = l;
        d[ZoneInput.M] = m;
        d[ZoneInput.R] = r;
        d[ZoneInput.KAPPA] = kappa;
        d[ZoneInput.CP] = cp;
        d[ZoneInput.NABLA_AD] = nablaAd;
        d[ZoneInput.DELTA] = delta;
        d[ZoneInput.NABLA_MU] = 0.0;
        d[ZoneInput.PHI] = 0.0;
    }

    /** Writes one output's Jacobian entries into zone k of its columns, with 0 for nabla_mu and phi. */
    private static void write(double[][] c, int k, double t, double rho, double p, double l, double m, double r,
                              double kappa, double cp, double nablaAd, double delta, double alpha) {
        c[ZoneInput.T][k] = t;
        c[ZoneInput.RHO][k] = rho;
        c[ZoneInput.P][k] = p;
        c[ZoneInput.L][k] = l;
        c[ZoneInput.M][k] = m;
        c[ZoneInput.R][k] = r;
        c[ZoneInput.KAPPA][k] = kappa;
        c[ZoneInput.CP][k] = cp;
        c[ZoneInput.NABLA_AD][k] = nablaAd;
        c[ZoneInput.DELTA][k] = delta;
        c[ZoneInput.NABLA_MU][k] = 0.0;
        c[ZoneInput.PHI][k] = 0.0;
        c[ZoneInput.ALPHA][k] = alpha;
    }

    /**
     * Refuses a zone whose valid inputs overflow double precision somewhere on the way (see
     * {@link ZoneChecks#finiteOutputs}).
     *
     * @param probe sum of (entry * 0) over the derivatives already written, or 0
     */
    private static void guard(ZoneState z, ConvectionResult out, double probe) {
        // a short tree of sums (any non-finite term makes it NaN)
        probe += ((((out.nablaRad + out.nabla) + (out.nablaElement + out.velocity))
                + ((out.convectiveFraction + out.radiativeFraction) + (out.efficiency + out.lossParameter)))
                + ((out.scaleHeight + out.mixingLength) + out.diffusion)) * 0.0;
        ZoneChecks.finiteOutputs("nabla", out.nabla, probe, z);
    }

    /** Sum of (entry * 0) over a stable zone's derivative arrays: NaN exactly when one is not finite. */
    private static double derivativeProbe(ConvectionResult out) {
        double a = 0.0;
        double b = 0.0;
        for (int i = 0; i < ZoneInput.COUNT; i++) {
            a += out.dNabla[i] * 0.0 + out.dVelocity[i] * 0.0;
            b += out.dConvectiveFraction[i] * 0.0 + out.dDiffusion[i] * 0.0;
        }
        return a + b;
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
        guard(z, out, derivativeProbe(out));
    }
}
