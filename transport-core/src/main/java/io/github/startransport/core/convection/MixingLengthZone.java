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
import io.github.startransport.spi.ZoneMajorJacobian;
import io.github.startransport.spi.ZoneState;

import java.nio.DoubleBuffer;
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
     * Doubles of working space per zone: three sections of {@link ZoneInput#COUNT} (the intermediate
     * values that pass from {@link #front} to the cubic, to {@link #values} and to {@link #jacobian}). In
     * a per-zone call the sections are the result's {@code dVelocity}, {@code dConvectiveFraction} and
     * {@code dDiffusion}, read before they are overwritten; in a batch call a chunk of zones shares the
     * columns' work array.
     */
    static final int SCRATCH = 3 * ZoneInput.COUNT;
    /** Zones per chunk of a batch call: the stages run over a chunk at a time (see {@link #solveBatch}). */
    static final int CHUNK = 16;

    // section A
    private static final int INV_T = 0;
    private static final int INV_RHO = 1;
    private static final int INV_P = 2;
    private static final int INV_M = 3;
    private static final int INV_R = 4;
    private static final int INV_KAPPA = 5;
    private static final int INV_CP = 6;
    private static final int INV_DELTA = 7;
    private static final int INV_ALPHA = 8;
    private static final int LENGTH_HP = 9;
    private static final int LOSS_ELASTICITY = 10;
    private static final int PER_L = 11;
    private static final int NABLA_AD = 12;
    // section B
    private static final int NABLA_RAD = 0;
    private static final int INV_NABLA_RAD = 1;
    private static final int EXCESS = 2;
    private static final int INV_EXCESS = 3;
    private static final int A0 = 4;
    private static final int INV_FOUR_U_LOSS2 = 5;
    private static final int RHS = 6;
    private static final int BETA = 7;
    private static final int B = 8;
    private static final int U_LOSS = 9;
    private static final int VELOCITY_SCALE = 10;
    private static final int LENGTH = 11;
    private static final int U = 12;
    // section C
    private static final int SCALE_HEIGHT = 0;
    private static final int PHI = 1;
    private static final int NABLA_MU = 2;
    /** The zone's {@link #front} code and its efficiency Gamma, for {@link #values} and {@link #jacobian}. */
    private static final int CODE = 3;
    private static final int GAMMA = 4;
    /**
     * Written by {@link #values} for {@link #jacobian} and the caller: 1/D, d Gamma / d S, the shares of W,
     * v, F_conv / F, D_conv and the probe.
     */
    private static final int INV_DEN = 5;
    private static final int SENSITIVITY = 6;
    private static final int SHARE_RAD = 7;
    private static final int SHARE_SUPER = 8;
    private static final int VELOCITY_OUT = 9;
    private static final int CONVECTIVE_OUT = 10;
    private static final int DIFFUSION_OUT = 11;
    private static final int PROBE = 12;

    /** {@link #front} codes below 0: the zone is refused (by the caller, which holds the zone for the message). */
    private static final int INVALID = -1;
    private static final int OUT_OF_RANGE = -2;
    private static final int NO_FRACTION = -3;
    /** {@link #front} codes of a convective zone: the cubic's fast path, or the equation with composition. */
    private static final int CUBIC = 4;
    private static final int COMPOSITION = 5;
    // codes 0 to 3 are the Regime ordinals of stable zones (never CONVECTIVE's)
    private static final Regime[] REGIMES = Regime.values();

    /**
     * The batch call of both convection models with the Jacobian in the column layout, or values only.
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
        solveBatch(settings, eddyShape, in, from, to, out, jacobian, null, null, 0);
    }

    /**
     * The batch call of both convection models with the Jacobian zone-major (or values only).
     *
     * @param settings  the model's options
     * @param eddyShape y of the transparency correction, or 0 for none
     * @param in        input columns
     * @param from      first zone (inclusive)
     * @param to        last zone (exclusive)
     * @param out       output columns (values)
     * @param block     the zone-major Jacobian ({@link ZoneMajorJacobian}), or null for values only
     */
    static void solveZoneMajor(ConvectionSettings settings, double eddyShape, ZoneColumns in, int from, int to,
                               ConvectionColumns out, double[] block) {
        in.checkRange(from, to, out.capacity);
        ZoneMajorJacobian.checkCapacity(block, to);
        solveBatch(settings, eddyShape, in, from, to, out, block != null, block, null, 0);
    }

    /**
     * The batch call of both convection models with the Jacobian zone-major in a buffer (for example
     * over a native host's memory), zone k's block from index {@code position() + k * PER_ZONE}: each
     * chunk's blocks are staged in the columns' work array (the same stores as into a block) and go
     * into the buffer with one bulk put per chunk.
     *
     * @param settings  the model's options
     * @param eddyShape y of the transparency correction, or 0 for none
     * @param in        input columns
     * @param from      first zone (inclusive)
     * @param to        last zone (exclusive)
     * @param out       output columns (values)
     * @param jacobian  the zone-major Jacobian ({@link ZoneMajorJacobian}), writable, limit at least
     *                  {@code position() + to * PER_ZONE}
     */
    static void solveZoneMajor(ConvectionSettings settings, double eddyShape, ZoneColumns in, int from, int to,
                               ConvectionColumns out, DoubleBuffer jacobian) {
        in.checkRange(from, to, out.capacity);
        ZoneMajorJacobian.checkCapacity(jacobian, to);
        solveBatch(settings, eddyShape, in, from, to, out, true, null, jacobian, jacobian.position());
    }

    /**
     * The batch calls. Chunks of {@link #CHUNK} zones go through the per-zone stages one stage at a
     * time: {@link #front} over the chunk, the cubic, {@link #values} over the chunk (which writes the
     * values straight into the columns), then {@link #jacobian} over the chunk, which writes the
     * Jacobian straight into the zone-major block or into the derivative columns (for a buffer, into a
     * zone-major staging area put into the buffer in bulk once per chunk). A zone's dependent chain of
     * divisions, roots and Halley steps then overlaps with its neighbours' instead of running alone, the
     * stages run as loops without a call per zone, and no zone goes through the per-zone result. The stages
     * are those of the per-zone call, so every value is bit for bit the same; zones that are not
     * convective go through the per-zone finish. Zones are finished, and refused, in order: a refused
     * zone leaves every zone before it written (later zones of its chunk may hold their values too).
     */
    private static void solveBatch(ConvectionSettings settings, double eddyShape, ZoneColumns in, int from, int to,
                                   ConvectionColumns out, boolean jacobian, double[] block, DoubleBuffer buffer,
                                   int origin) {
        final double alpha = settings.alpha();
        final MixingLengthGeometry geometry = settings.geometry();
        final CentreLimit limit = settings.centreLimit();
        final Criterion criterion = settings.criterion();
        final boolean transparent = eddyShape > 0.0;
        final double[] starts = geometry.cubicStarts();
        final double[] work = out.work;
        // zone j of a chunk: scratch at j * SCRATCH. The Jacobian goes straight into the zone-major block,
        // or straight into the derivative columns (column layout), or for a buffer into the chunk's staging
        // from STAGE, entry (o, i) of zone j at STAGE + j * PER_ZONE + o * COUNT + i (zone-major)
        final boolean staged = jacobian && buffer != null;
        final boolean columnLayout = jacobian && block == null && buffer == null;
        final double[] jac = staged ? work : block;
        final ConvectionColumns cols = columnLayout ? out : null;
        for (int c0 = from; c0 < to; c0 += CHUNK) {
            final int c1 = Math.min(to, c0 + CHUNK);
            front(null, in, c0, c1, alpha, geometry, eddyShape, limit, criterion, work, null, jacobian);
            for (int k = c0; k < c1; k++) {
                final int o = (k - c0) * SCRATCH;
                final int c = o + 2 * ZoneInput.COUNT;
                final int code = (int) work[c + CODE];
                if (code >= CUBIC) {
                    final int b = o + ZoneInput.COUNT;
                    work[c + GAMMA] = efficiency(code, work[b + A0], work[b + RHS], work[b + BETA], transparent, starts);
                }
            }
            values(work, null, out, c0, c1);
            if (jacobian) {
                // zone-major: output o of zone k at base + o * COUNT, in the block or in the chunk's staging; in
                // the columns, at index k
                jacobian(work, null, cols, jac,
                        columnLayout ? c0 : staged ? STAGE : origin + c0 * ZoneMajorJacobian.PER_ZONE,
                        columnLayout ? 1 : ZoneMajorJacobian.PER_ZONE, c0, c1);
            }
            for (int k = c0; k < c1; k++) {
                final int o = (k - c0) * SCRATCH;
                final int c = o + 2 * ZoneInput.COUNT;
                final int code = (int) work[c + CODE];
                // zone-major: output o of zone k at base + o * COUNT, in the block or in the chunk's staging
                final int base = staged ? STAGE + (k - c0) * ZoneMajorJacobian.PER_ZONE
                        : origin + k * ZoneMajorJacobian.PER_ZONE;
                try {
                    if (code >= CUBIC) {
                        final double probe = work[c + PROBE];
                        if (probe != 0.0) {
                            ZoneChecks.finiteOutputs("nabla", out.nabla[k], probe, in.load(k, out.workZone));
                        }
                    } else {
                        final ConvectionResult res = out.workResult;
                        finish(code, in.load(k, out.workZone), settings.semiconvection(), settings.thermohaline(),
                                work, o, res);
                        out.store(k, res, columnLayout);
                        if (jacobian && !columnLayout) {
                            stage(res, jac, base);
                        }
                    }
                } catch (RuntimeException e) {
                    // the zones before the refused one keep their whole result
                    if (staged) {
                        unstage(work, k - c0, c0, buffer, origin);
                    }
                    throw e;
                }
            }
            if (staged) {
                unstage(work, c1 - c0, c0, buffer, origin);
            }
        }
    }

    /** Start of the staged Jacobians in the columns' work array: after a chunk's scratch. */
    private static final int STAGE = CHUNK * SCRATCH;

    static {
        if (STAGE + CHUNK * ZoneMajorJacobian.PER_ZONE > ConvectionColumns.WORK_LENGTH) {
            throw new AssertionError("ConvectionColumns.work is too short for a chunk");
        }
    }

    /** Puts the staged blocks of a chunk's first {@code zones} zones into the buffer in one bulk put. */
    private static void unstage(double[] work, int zones, int first, DoubleBuffer buffer, int origin) {
        buffer.put(origin + first * ZoneMajorJacobian.PER_ZONE, work, STAGE, zones * ZoneMajorJacobian.PER_ZONE);
    }

    /** Copies one zone's Jacobian from a result into its zone-major block or staging: (o, i) at base + o * 13 + i. */
    private static void stage(ConvectionResult r, double[] jac, int base) {
        for (int i = 0; i < ZoneInput.COUNT; i++) {
            jac[base + i] = r.dNabla[i];
            jac[base + ZoneInput.COUNT + i] = r.dVelocity[i];
            jac[base + 2 * ZoneInput.COUNT + i] = r.dConvectiveFraction[i];
            jac[base + 3 * ZoneInput.COUNT + i] = r.dDiffusion[i];
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
        if (!valid(z.temperature, z.density, z.pressure, z.luminosity, z.mass, z.radius, z.opacity, z.cp, z.nablaAd,
                z.delta, z.nablaMu, z.phi)) {
            ZoneChecks.forStability(z);
            Checks.positive("radius", z.radius, "cm", z.zone);
            Checks.positive("cp", z.cp, "erg g^-1 K^-1", z.zone);
        }
    }

    /**
     * One combined test of every field {@link #check} checks, for the normal path; the detailed checks
     * (which name the first bad field) run only when it fails, so the refusal is exactly theirs.
     */
    private static boolean valid(double t, double rho, double p, double lum, double m, double r, double kappa,
                                 double cp, double nablaAd, double delta, double nablaMu, double phi) {
        final double inf = Double.POSITIVE_INFINITY;
        return (t > 0.0) & (t < inf)
                & (rho > 0.0) & (rho < inf)
                & (p > 0.0) & (p < inf)
                & (Math.abs(lum) < inf)
                & (m > 0.0) & (m < inf)
                & (kappa > 0.0) & (kappa < inf)
                & (nablaAd > 0.0) & (nablaAd < 1.0)
                & (delta > 0.0) & (delta < inf)
                & (phi > 0.0) & (phi < inf)
                & (Math.abs(nablaMu) < inf)
                & (r > 0.0) & (r < inf)
                & (cp > 0.0) & (cp < inf);
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
        // the scratch of the stages is the result's own last three derivative arrays (written last)
        final int code = front(z, null, 0, 1, alpha, geometry, eddyShape, limit, criterion, null, out, jacobian);
        if (code >= CUBIC) {
            final double[] b = out.dConvectiveFraction;
            final double gamma = efficiency(code, b[A0], b[RHS], b[BETA], eddyShape > 0.0, geometry.cubicStarts());
            final double[] c = out.dDiffusion;
            c[CODE] = code;
            c[GAMMA] = gamma;
            values(null, out, null, 0, 1);
            final double valuesProbe = c[PROBE];
            final double probe = jacobian ? valuesProbe + jacobian(null, out, null, null, 0, 0, 0, 1) : valuesProbe;
            ZoneChecks.finiteOutputs("nabla", out.nabla, probe, z);
        } else {
            finish(code, z, semiconvection, thermohaline, null, 0, out);
        }
    }

    /**
     * The efficiency Gamma of a convective zone: the cubic (from the geometry's start table where a0 is
     * its constant), or the equation with composition.
     */
    private static double efficiency(int code, double a0, double s, double beta, boolean transparent,
                                     double[] starts) {
        // without the transparency correction a0 is the geometry's constant, whose start table applies
        return code == COMPOSITION ? MixingLengthCubic.efficiency(a0, s, beta)
                : transparent ? MixingLengthCubic.efficiency(a0, s)
                : MixingLengthCubic.efficiency(a0, s, starts);
    }

    /**
     * A zone that {@link #values} does not finish: a stable one (its result written into {@code out}), or
     * one that is refused.
     */
    private static void finish(int code, ZoneState z, double semiconvection, double thermohaline,
                               double[] scratch, int o, ConvectionResult out) {
        final double[] b = scratch != null ? scratch : out.dConvectiveFraction;
        final double[] c = scratch != null ? scratch : out.dDiffusion;
        final int bo = scratch != null ? o + ZoneInput.COUNT : 0;
        final int co = scratch != null ? o + 2 * ZoneInput.COUNT : 0;
        if (code == INVALID) {
            check(z);
            throw new IllegalStateException("zone " + z.zone + " failed the combined check but none of the detailed ones");
        }
        if (code == OUT_OF_RANGE) {
            throw lossOutOfRange(z, b[bo + U], b[bo + U_LOSS], b[bo + EXCESS], b[bo + B]);
        }
        if (code == NO_FRACTION) {
            throw undefinedFraction(z);
        }
        final double nablaRad = b[bo + NABLA_RAD];
        final double u = b[bo + U];
        final double length = b[bo + LENGTH];
        final double scaleHeight = c[co + SCALE_HEIGHT];
        out.regime = REGIMES[code];
        out.nablaRad = nablaRad;
        out.lossParameter = u;
        out.scaleHeight = scaleHeight;
        out.mixingLength = length;
        RadiativeGradient.valueAndDerivatives(z.opacity, z.luminosity, z.pressure, z.mass, z.temperature, out.dNabla);
        stable(z, out.regime, nablaRad, semiconvection, thermohaline, out);
    }

    /**
     * The first stage of a zone: validation, the reciprocals of the inputs, nabla_rad, H_P, l, U, the
     * regime and the right-hand side of the cubic, written into three scratch sections of
     * {@link ZoneInput#COUNT} doubles (A, B and C). Refuses nothing itself: the code says what the
     * caller must do. The loop over a batch call's zones is here rather than in the caller, so that the
     * compiler keeps the whole stage in one piece of code instead of calling it once per zone (a
     * per-zone call runs it once, for its zone).
     *
     * @param z        the zone of a per-zone call, or null
     * @param in       the columns of a batch call (when z is null)
     * @param c0       first zone (inclusive); 0 for a per-zone call
     * @param c1       last zone (exclusive); 1 for a per-zone call
     * @param alpha    mixing-length parameter
     * @param geometry geometry constants
     * @param eddyShape y of the transparency correction, or 0 for none
     * @param limit    near-centre limit of the mixing length
     * @param criterion stability criterion
     * @param scratch  a batch call's work array (zone k's scratch at (k - c0) * SCRATCH, its code stored
     *                 there too), or null for the result's own arrays
     * @param out      the result whose arrays are the scratch of a per-zone call
     * @param derivatives whether the Jacobian stage follows (otherwise the reciprocals only it reads are 0)
     * @return for the last zone: {@link #CUBIC} or {@link #COMPOSITION} for a convective zone; the ordinal of the
     *         {@link Regime} of a stable zone; {@link #INVALID}, {@link #OUT_OF_RANGE} or
     *         {@link #NO_FRACTION} for a zone to refuse
     */
    private static int front(ZoneState z, ZoneColumns in, int c0, int c1, double alpha,
                             MixingLengthGeometry geometry, double eddyShape, CentreLimit limit, Criterion criterion,
                             double[] scratch, ConvectionResult out, boolean derivatives) {
        int code = INVALID;
        for (int k = c0; k < c1; k++) {
            // the zone's inputs: from the zone of a per-zone call, or from the columns of a batch call
            final double t = z != null ? z.temperature : in.temperature[k];
            final double rho = z != null ? z.density : in.density[k];
            final double p = z != null ? z.pressure : in.pressure[k];
            final double lum = z != null ? z.luminosity : in.luminosity[k];
            final double m = z != null ? z.mass : in.mass[k];
            final double r = z != null ? z.radius : in.radius[k];
            final double kappa = z != null ? z.opacity : in.opacity[k];
            final double cp = z != null ? z.cp : in.cp[k];
            final double nablaAd = z != null ? z.nablaAd : in.nablaAd[k];
            final double delta = z != null ? z.delta : in.delta[k];
            final double nablaMu = z != null ? z.nablaMu : in.nablaMu[k];
            final double phi = z != null ? z.phi : in.phi[k];
            final int o = scratch != null ? (k - c0) * SCRATCH : 0;
            // Normal path: every input that is inverted lies in [2^-256, 2^256) (one test on the bit
            // patterns, which also proves it finite and > 0) and the other fields are valid. Otherwise the
            // detailed checks run, which refuse naming the first bad field.
            final long spread = offset(t) | offset(rho) | offset(p) | offset(m) | offset(r) | offset(kappa)
                    | offset(cp) | offset(delta) | offset(alpha);
            final double inf = Double.POSITIVE_INFINITY;
            final boolean ordinary = ((spread >>> ORDINARY_SHIFT) == 0L) & (Math.abs(lum) < inf)
                    & (nablaAd > 0.0) & (nablaAd < 1.0) & (phi > 0.0) & (phi < inf) & (Math.abs(nablaMu) < inf);
            if (!ordinary && !valid(t, rho, p, lum, m, r, kappa, cp, nablaAd, delta, nablaMu, phi)) {
                code = mark(scratch, o, INVALID);
                continue;
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
                invRho = (p * delta) * invRhoPDelta;
                invP = (rho * delta) * invRhoPDelta;
                invDelta = rhoP * invRhoPDelta;
                invM = (r * t) * invMRT;
                invR = (m * t) * invMRT;
                invT = mR * invMRT;
            } else {
                invT = 1.0 / t;
                invRho = 1.0 / rho;
                invP = 1.0 / p;
                invM = 1.0 / m;
                invR = 1.0 / r;
                invDelta = 1.0 / delta;
            }
            // 1/kappa, 1/c_P and 1/alpha enter the Jacobian only
            if (!derivatives) {
                invKappa = 0.0;
                invCp = 0.0;
                invAlpha = 0.0;
            } else if (ordinary) {
                final double kappaCp = kappa * cp;
                final double invKappaCpAlpha = 1.0 / (kappaCp * alpha);
                invKappa = (cp * alpha) * invKappaCpAlpha;
                invCp = (kappa * alpha) * invKappaCpAlpha;
                invAlpha = kappaCp * invKappaCpAlpha;
            } else {
                invKappa = 1.0 / kappa;
                invCp = 1.0 / cp;
                invAlpha = 1.0 / alpha;
            }

            // nabla_rad per unit L, then nabla_rad: the same arithmetic as RadiativeGradient.valueAndDerivatives
            final double perL = RadiativeGradient.value(kappa, 1.0, p, m, t);
            final double nablaRad = perL * lum;
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
            // the composition term of the buoyancy, b = -(phi/delta) nabla_mu, where it destabilises
            final double buoyancy = nablaMu < 0.0 ? (phi * invDelta) * -nablaMu : 0.0;
            final boolean driven = buoyancy > 0.0;
            final double beta = driven ? buoyancy * invFourULoss2 : 0.0;

            // the scratch: three sections of a batch's work array, or the result's last three derivative arrays
            final double[] a = scratch != null ? scratch : out.dVelocity;
            final double[] b = scratch != null ? scratch : out.dConvectiveFraction;
            final double[] c = scratch != null ? scratch : out.dDiffusion;
            final int ao = scratch != null ? o : 0;
            final int bo = scratch != null ? o + ZoneInput.COUNT : 0;
            final int co = scratch != null ? o + 2 * ZoneInput.COUNT : 0;
            // each section's highest slot first: its bounds check covers the others
            a[ao + NABLA_AD] = nablaAd;
            b[bo + U] = u;
            c[co + NABLA_MU] = nablaMu;
            a[ao + INV_T] = invT;
            a[ao + INV_RHO] = invRho;
            a[ao + INV_P] = invP;
            a[ao + INV_M] = invM;
            a[ao + INV_R] = invR;
            a[ao + INV_KAPPA] = invKappa;
            a[ao + INV_CP] = invCp;
            a[ao + INV_DELTA] = invDelta;
            a[ao + INV_ALPHA] = invAlpha;
            // d ln l / d ln H_P (0 when l = alpha r), and the loss elasticity 2 (1 - q) of d ln q = 2 (1 - q) d ln omega
            a[ao + LENGTH_HP] = capped ? 0.0 : 1.0;
            a[ao + LOSS_ELASTICITY] = 2.0 * thin;
            a[ao + PER_L] = perL;
            b[bo + NABLA_RAD] = nablaRad;
            b[bo + INV_NABLA_RAD] = invNablaRad;
            b[bo + EXCESS] = w;
            b[bo + INV_EXCESS] = invW;
            b[bo + A0] = a0;
            b[bo + INV_FOUR_U_LOSS2] = invFourULoss2;
            b[bo + RHS] = s;
            b[bo + BETA] = beta;
            b[bo + B] = buoyancy;
            b[bo + U_LOSS] = uLoss;
            b[bo + VELOCITY_SCALE] = velocityScale;
            b[bo + LENGTH] = length;
            c[co + SCALE_HEIGHT] = scaleHeight;
            c[co + PHI] = phi;

            if (regime != Regime.CONVECTIVE) {
                code = mark(scratch, o, regime.ordinal());
                continue;
            }
            // the cubic's right-hand side S (with composition, the scale |S| + beta of the equation) must be a
            // normal double: outside it U' is beyond ~1e+-154 and S or Gamma do not fit. (W + b > 0 is not
            // required of the rounded terms: the composition solver also takes a W + b that rounding made <= 0.)
            final double drive = driven ? Math.abs(s) + beta : s;
            if (!(drive >= Double.MIN_NORMAL && drive <= Double.MAX_VALUE && beta <= Double.MAX_VALUE)) {
                code = mark(scratch, o, OUT_OF_RANGE);
                continue;
            }
            if (nablaRad == 0.0) {
                code = mark(scratch, o, NO_FRACTION);
                continue;
            }
            code = mark(scratch, o, driven ? COMPOSITION : CUBIC);
        }
        return code;
    }

    /** Stores a zone's {@link #front} code in its scratch (batch calls) and returns it. */
    private static int mark(double[] scratch, int o, int code) {
        if (scratch != null) {
            scratch[o + 2 * ZoneInput.COUNT + CODE] = code;
        }
        return code;
    }

    /**
     * The values stage of convective zones: from Gamma (in the scratch, slot {@link #GAMMA}) and the
     * scratch of {@link #front}, D = a0 Gamma^2 + Gamma + 1 and the shares of W of
     * {@link MixingLengthCubic} give nabla, nabla_e, v, F_conv / F, F_rad / F and D_conv, written into
     * {@code out} (a per-zone call) or into zone k of {@code columns}. What the Jacobian stage needs
     * of them goes into section C of the scratch, with the zone's probe (0, or NaN when a value is not
     * finite; the caller refuses the zone). Like {@link #front} it loops over a batch call's zones
     * itself; zones whose code is not a convective one are skipped.
     *
     * @param scratch a batch call's work array, or null for the result's own arrays
     * @param out     the result of a per-zone call (values and scratch), or null
     * @param columns the output columns of a batch call, or null
     * @param c0      first zone (inclusive); 0 for a per-zone call
     * @param c1      last zone (exclusive); 1 for a per-zone call
     */
    private static void values(double[] scratch, ConvectionResult out, ConvectionColumns columns, int c0, int c1) {
        for (int k = c0; k < c1; k++) {
            // the scratch: three sections of a batch's work array, or the result's last three derivative arrays
            final int o = scratch != null ? (k - c0) * SCRATCH : 0;
            final double[] a = scratch != null ? scratch : out.dVelocity;
            final double[] b = scratch != null ? scratch : out.dConvectiveFraction;
            final double[] c = scratch != null ? scratch : out.dDiffusion;
            final int ao = scratch != null ? o : 0;
            final int bo = scratch != null ? o + ZoneInput.COUNT : 0;
            final int co = scratch != null ? o + 2 * ZoneInput.COUNT : 0;
            final int code = (int) c[co + CODE];
            if (code < CUBIC) {
                continue;
            }
            // each section's highest slot first: its bounds check covers the others
            final double nablaAd = a[ao + NABLA_AD];
            final double u = b[bo + U];
            final double nablaRad = b[bo + NABLA_RAD];
            final double invNablaRad = b[bo + INV_NABLA_RAD];
            final double w = b[bo + EXCESS];
            final double a0 = b[bo + A0];
            final double uLoss = b[bo + U_LOSS];
            final double velocityScale = b[bo + VELOCITY_SCALE];
            final double length = b[bo + LENGTH];
            final double scaleHeight = c[co + SCALE_HEIGHT];
            final double gamma = c[co + GAMMA];

            final double den = MixingLengthCubic.denominator(a0, gamma);
            final double invDen;
            final double sensitivity;
            if (code == COMPOSITION) {
                // the slope of the equation with composition is the Jacobian stage's own
                invDen = 1.0 / den;
                sensitivity = 0.0;
            } else {
                // D and the cubic's slope 3 a0 Gamma^2 + 2 Gamma + 1 are both >= 1: their reciprocals from one
                // division unless the product is near overflow
                final double slope = (3.0 * a0 * gamma + 2.0) * gamma + 1.0;
                final double denSlope = den * slope;
                if (denSlope < 1e300) {
                    final double both = 1.0 / denSlope;
                    invDen = slope * both;
                    sensitivity = den * both;
                } else {
                    invDen = 1.0 / den;
                    sensitivity = 1.0 / slope;
                }
            }
            final double a0Gamma2 = a0 * (gamma * gamma);
            final double shareRad = a0Gamma2 * invDen;               // (nabla_rad - nabla) / W
            final double shareSuper = (gamma + 1.0) * invDen;        // (nabla - nabla_ad) / W
            final double nabla = nablaAd + w * shareSuper;
            final double nablaElement = nablaAd + w * invDen;
            final double x = 2.0 * uLoss * gamma;
            final double velocity = length * velocityScale * x;
            // F_conv / F = (W / nabla_rad) (a0 Gamma^2 / D): for W > 0 both factors lie in [0, 1), but their
            // rounded product can land one ulp above 1 where both are 1 - ulp; it is bounded to 1 there. For
            // W <= 0 (convection driven by composition alone) it is the signed fraction, <= 0 for L > 0.
            final double product = w * shareRad * invNablaRad;
            final double convective = w > 0.0 ? Math.min(product, 1.0) : product;
            final double radiative = nabla * invNablaRad;
            final double diffusion = MixingCoefficients.convective(velocity, length);
            if (columns == null) {
                out.regime = Regime.CONVECTIVE;
                out.nablaRad = nablaRad;
                out.lossParameter = u;
                out.scaleHeight = scaleHeight;
                out.mixingLength = length;
                out.nabla = nabla;
                out.nablaElement = nablaElement;
                out.velocity = velocity;
                out.convectiveFraction = convective;
                out.radiativeFraction = radiative;
                out.efficiency = gamma;
                out.diffusion = diffusion;
            } else {
                if (columns.regime[k] != Regime.CONVECTIVE) {
                    // a reference store costs a garbage-collector barrier: skipped when the regime is unchanged
                    columns.regime[k] = Regime.CONVECTIVE;
                }
                columns.nablaRad[k] = nablaRad;
                columns.lossParameter[k] = u;
                columns.scaleHeight[k] = scaleHeight;
                columns.mixingLength[k] = length;
                columns.nabla[k] = nabla;
                columns.nablaElement[k] = nablaElement;
                columns.velocity[k] = velocity;
                columns.convectiveFraction[k] = convective;
                columns.radiativeFraction[k] = radiative;
                columns.efficiency[k] = gamma;
                columns.diffusion[k] = diffusion;
            }
            // a short tree of sums (any non-finite term makes it NaN)
            final double probe = ((((nablaRad + nabla) + (nablaElement + velocity))
                    + ((convective + radiative) + (gamma + u))) + ((scaleHeight + length) + diffusion)) * 0.0;
            // for the Jacobian stage and the caller (the highest slot first: its bounds check covers the others)
            c[co + PROBE] = probe;
            c[co + INV_DEN] = invDen;
            c[co + SENSITIVITY] = sensitivity;
            c[co + SHARE_RAD] = shareRad;
            c[co + SHARE_SUPER] = shareSuper;
            c[co + VELOCITY_OUT] = velocity;
            c[co + CONVECTIVE_OUT] = convective;
            c[co + DIFFUSION_OUT] = diffusion;
        }
    }

    /**
     * The Jacobian stage of convective zones, after {@link #values}: from Gamma and the scratch of
     * {@link #front} and {@link #values}, one output's 13 entries at a time into the result's arrays (a
     * per-zone call), into the derivative columns at index k, or into {@code jac} (zone-major) from zone
     * k's base {@code base0 + (k - c0) zoneStep} ({@link #put}). Reads all of a zone's scratch before it
     * writes anything, so the scratch may be the result's own derivative arrays. Like {@link #front} it
     * loops over a batch call's zones itself (zones whose code is not a convective one are skipped) and
     * adds each zone's probe to the one {@link #values} left in its scratch.
     *
     * <p>The Jacobian is written as a few coefficients per output times the derivatives of the "base"
     * quantities each input moves: nabla_rad (R), nabla_ad (A), ln U' (mu), ln a0 (nu), ln l (lambda)
     * and ln sqrt(a g delta / H_P) (sigma), and, with composition, the term b (B). From the chain rule
     * through the cubic (see the class comment):
     * <pre>
     *   dS     = (dR - dA) / (4 U'^2) - 2 S mu,   d a0 = a0 nu,   dGamma = (dS - Gamma^3 d a0) / (3 a0 Gamma^2 + 2 Gamma + 1)
     *   d(a0 Gamma^2 / D) = (d a0 Gamma^2 (Gamma + 1) + a0 Gamma (Gamma + 2) dGamma) / D^2
     *   d nabla = (Gamma + 1)/D dR + a0 Gamma^2/D dA - W d(a0 Gamma^2 / D)
     *   d ln v  = lambda + sigma + mu + dGamma / Gamma,   d ln D_conv = d ln v + lambda
     *   d(F_conv/F) = (dW a0 Gamma^2/D + W d(a0 Gamma^2 / D) - (F_conv/F) dR) / nabla_rad
     * </pre>
     * with dGamma = gR (dR - dA) + gB dB + gMu mu + gNu nu and d ln v - lambda - sigma = vR (dR - dA) +
     * vB dB + vMu mu + vNu nu, from the cubic or from the equation with composition
     * ({@link MixingLengthCubic#compositionSlope}). Each input moves only some of these
     * (H_P = P r^2 / (G m rho), g = G m / r^2, U proportional to T^3 sqrt(H_P / (g delta)) /
     * (c_P kappa rho^2 l^2), omega = kappa rho l, ln q = ln (y omega^2 / (1 + y omega^2))), so each
     * entry is written with its nonzero terms only. The composition term's share goes in last: each
     * output's coefficient of dB times d b / d nabla_mu = -phi/delta, d b / d phi = -nabla_mu/delta
     * and d b / d delta = -b/delta, written for nabla_mu and phi and added to the delta entries.
     *
     * @param scratch  a batch call's work array, or null for the result's own arrays
     * @param out      the result of a per-zone call, or null
     * @param cols     the columns of a batch call in the column layout, or null
     * @param jac      the zone-major block or the chunk's staging, or null
     * @param base0    index of the chunk's first zone's entry (0, 0) in {@code jac}, or c0 in the columns
     * @param zoneStep distance between two zones' entries (0, 0): {@link ZoneMajorJacobian#PER_ZONE}, or 1
     *                 in the columns
     * @param c0       first zone (inclusive); 0 for a per-zone call
     * @param c1       last zone (exclusive); 1 for a per-zone call
     * @return the last zone's probe: 0, or NaN when a derivative is not finite (the caller refuses the zone)
     */
    private static double jacobian(double[] scratch, ConvectionResult out, ConvectionColumns cols, double[] jac,
                                   int base0, int zoneStep, int c0, int c1) {
        double last = 0.0;
        for (int k = c0; k < c1; k++) {
            final int o = scratch != null ? (k - c0) * SCRATCH : 0;
            final int code = (int) (scratch != null ? scratch[o + 2 * ZoneInput.COUNT + CODE] : out.dDiffusion[CODE]);
            if (code < CUBIC) {
                continue;
            }
            final double gamma = scratch != null ? scratch[o + 2 * ZoneInput.COUNT + GAMMA] : out.dDiffusion[GAMMA];
            final int base = base0 + (k - c0) * zoneStep;
            // the scratch: three sections of a batch's work array, or the result's last three derivative arrays
            final double[] a = scratch != null ? scratch : out.dVelocity;
            final double[] b = scratch != null ? scratch : out.dConvectiveFraction;
            final double[] c = scratch != null ? scratch : out.dDiffusion;
            final int ao = scratch != null ? o : 0;
            final int bo = scratch != null ? o + ZoneInput.COUNT : 0;
            final int co = scratch != null ? o + 2 * ZoneInput.COUNT : 0;
            // each section's highest slot first: its bounds check covers the others
            final double diffusion = c[co + DIFFUSION_OUT];
            final double perL = a[ao + PER_L];
            final double nablaMu = c[co + NABLA_MU];
            final double invT = a[ao + INV_T];
            final double invRho = a[ao + INV_RHO];
            final double invP = a[ao + INV_P];
            final double invM = a[ao + INV_M];
            final double invR = a[ao + INV_R];
            final double invKappa = a[ao + INV_KAPPA];
            final double invCp = a[ao + INV_CP];
            final double invDelta = a[ao + INV_DELTA];
            final double invAlpha = a[ao + INV_ALPHA];
            final double lengthHp = a[ao + LENGTH_HP];
            final double le = a[ao + LOSS_ELASTICITY];
            final double nablaRad = b[bo + NABLA_RAD];
            final double invNablaRad = b[bo + INV_NABLA_RAD];
            final double w = b[bo + EXCESS];
            final double invW = b[bo + INV_EXCESS];
            final double a0 = b[bo + A0];
            final double invFourULoss2 = b[bo + INV_FOUR_U_LOSS2];
            final double s = b[bo + RHS];
            final double buoyancy = b[bo + B];
            final double phi = c[co + PHI];
            final double invDen = c[co + INV_DEN];
            final double shareRad = c[co + SHARE_RAD];
            final double shareSuper = c[co + SHARE_SUPER];
            final double sensitivity = c[co + SENSITIVITY];
            final double velocity = c[co + VELOCITY_OUT];
            final double convective = c[co + CONVECTIVE_OUT];
            final boolean driven = code == COMPOSITION;

            final double den = MixingLengthCubic.denominator(a0, gamma);
            // d Gamma = gR (dR - dA) + gB dB + gMu mu + gNu nu and d ln v = vR (dR - dA) + vB dB + vMu mu + vNu nu
            // + lambda + sigma, with B = b
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
            // lengthHp: d ln l / d ln H_P for H_P's inputs (0 when l = alpha r); le: d ln q / d ln omega
            // the 44 entries that can be nonzero, input by input: d nabla, d v, d(F_conv/F), d D, each stored as soon
            // as it is known (few values live at a time). Every entry finite? Their plain sum is finite only if
            // each one is (an infinity or NaN carries through); in the rare case that it is not, the exact test,
            // the sum of (entry * 0), which is NaN exactly when one entry is not finite.
            double sum;
            // alpha: l ~ alpha, U ~ l^-2, omega ~ l
            {
                double lambda = invAlpha;
                double nu = le * lambda;
                double mu = -2.0 * lambda + nu;
                double lnV = vMu * mu + vNu * nu + lambda;
                final double nablaAlpha = nMu * mu + nNu * nu;
                final double velAlpha = velocity * lnV;
                final double fracAlpha = cMu * mu + cNu * nu;
                final double diffAlpha = diffusion * (lnV + lambda);
                put(out, cols, jac, base, ZoneInput.ALPHA, nablaAlpha, velAlpha, fracAlpha, diffAlpha);
                sum = (nablaAlpha + velAlpha) + (fracAlpha + diffAlpha);
            }
            // T: nabla_rad ~ T^-4, U ~ T^3
            {
                double dR = -4.0 * nablaRad * invT;
                double mu = 3.0 * invT;
                double lnV = vR * dR + vMu * mu;
                final double nablaT = nR * dR + nMu * mu;
                final double velT = velocity * lnV;
                final double fracT = cR * dR + cMu * mu;
                final double diffT = diffusion * lnV;
                put(out, cols, jac, base, ZoneInput.T, nablaT, velT, fracT, diffT);
                sum += (nablaT + velT) + (fracT + diffT);
            }
            // rho: H_P ~ 1/rho, U ~ rho^-2 (H_P)^(1/2) l^-2, omega ~ rho l, sigma = +1/2
            {
                double lambda = -lengthHp * invRho;
                double nu = le * (invRho + lambda);
                double mu = -2.5 * invRho - 2.0 * lambda + nu;
                double sigma = 0.5 * invRho;
                double lnV = vMu * mu + vNu * nu + lambda + sigma;
                final double nablaRho = nMu * mu + nNu * nu;
                final double velRho = velocity * lnV;
                final double fracRho = cMu * mu + cNu * nu;
                final double diffRho = diffusion * (lnV + lambda);
                put(out, cols, jac, base, ZoneInput.RHO, nablaRho, velRho, fracRho, diffRho);
                sum += (nablaRho + velRho) + (fracRho + diffRho);
            }
            // P: nabla_rad ~ P, H_P ~ P, sigma = -1/2
            {
                double dR = nablaRad * invP;
                double lambda = lengthHp * invP;
                double nu = le * lambda;
                double mu = 0.5 * invP - 2.0 * lambda + nu;
                double sigma = -0.5 * invP;
                double lnV = vR * dR + vMu * mu + vNu * nu + lambda + sigma;
                final double nablaP = nR * dR + nMu * mu + nNu * nu;
                final double velP = velocity * lnV;
                final double fracP = cR * dR + cMu * mu + cNu * nu;
                final double diffP = diffusion * (lnV + lambda);
                put(out, cols, jac, base, ZoneInput.P, nablaP, velP, fracP, diffP);
                sum += (nablaP + velP) + (fracP + diffP);
            }
            // L: nabla_rad only
            {
                double dR = perL;
                double lnV = vR * dR;
                final double nablaL = nR * dR;
                final double velL = velocity * lnV;
                final double fracL = cR * dR;
                final double diffL = diffusion * lnV;
                put(out, cols, jac, base, ZoneInput.L, nablaL, velL, fracL, diffL);
                sum += (nablaL + velL) + (fracL + diffL);
            }
            // m: nabla_rad ~ 1/m, H_P ~ 1/m, g ~ m, U ~ (H_P/g)^(1/2) l^-2, sigma = +1
            {
                double dR = -nablaRad * invM;
                double lambda = -lengthHp * invM;
                double nu = le * lambda;
                double mu = -invM - 2.0 * lambda + nu;
                double sigma = invM;
                double lnV = vR * dR + vMu * mu + vNu * nu + lambda + sigma;
                final double nablaM = nR * dR + nMu * mu + nNu * nu;
                final double velM = velocity * lnV;
                final double fracM = cR * dR + cMu * mu + cNu * nu;
                final double diffM = diffusion * (lnV + lambda);
                put(out, cols, jac, base, ZoneInput.M, nablaM, velM, fracM, diffM);
                sum += (nablaM + velM) + (fracM + diffM);
            }
            // r: H_P ~ r^2, g ~ r^-2, l ~ r^2 (or r when capped), sigma = -2
            {
                double lambda = (1.0 + lengthHp) * invR;
                double nu = le * lambda;
                double mu = 2.0 * invR - 2.0 * lambda + nu;
                double sigma = -2.0 * invR;
                double lnV = vMu * mu + vNu * nu + lambda + sigma;
                final double nablaRadius = nMu * mu + nNu * nu;
                final double velRadius = velocity * lnV;
                final double fracRadius = cMu * mu + cNu * nu;
                final double diffRadius = diffusion * (lnV + lambda);
                put(out, cols, jac, base, ZoneInput.R, nablaRadius, velRadius, fracRadius, diffRadius);
                sum += (nablaRadius + velRadius) + (fracRadius + diffRadius);
            }
            // kappa: nabla_rad ~ kappa, U ~ 1/kappa, omega ~ kappa
            {
                double dR = nablaRad * invKappa;
                double nu = le * invKappa;
                double mu = -invKappa + nu;
                double lnV = vR * dR + vMu * mu + vNu * nu;
                final double nablaKappa = nR * dR + nMu * mu + nNu * nu;
                final double velKappa = velocity * lnV;
                final double fracKappa = cR * dR + cMu * mu + cNu * nu;
                final double diffKappa = diffusion * lnV;
                put(out, cols, jac, base, ZoneInput.KAPPA, nablaKappa, velKappa, fracKappa, diffKappa);
                sum += (nablaKappa + velKappa) + (fracKappa + diffKappa);
            }
            // c_P: U ~ 1/c_P
            {
                double mu = -invCp;
                double lnV = vMu * mu;
                final double nablaCp = nMu * mu;
                final double velCp = velocity * lnV;
                final double fracCp = cMu * mu;
                final double diffCp = diffusion * lnV;
                put(out, cols, jac, base, ZoneInput.CP, nablaCp, velCp, fracCp, diffCp);
                sum += (nablaCp + velCp) + (fracCp + diffCp);
            }
            // nabla_ad: dA = 1
            {
                double lnV = -vR;
                final double nablaNablaAd = nA;
                final double velNablaAd = velocity * lnV;
                final double fracNablaAd = cA;
                final double diffNablaAd = diffusion * lnV;
                put(out, cols, jac, base, ZoneInput.NABLA_AD, nablaNablaAd, velNablaAd, fracNablaAd, diffNablaAd);
                sum += (nablaNablaAd + velNablaAd) + (fracNablaAd + diffNablaAd);
            }
            // delta: U ~ delta^-1/2, sigma = +1/2
            {
                double mu = -0.5 * invDelta;
                double lnV = vMu * mu + 0.5 * invDelta;
                final double nablaDelta = nMu * mu;
                final double velDelta = velocity * lnV;
                final double fracDelta = cMu * mu;
                final double diffDelta = diffusion * lnV;
                put(out, cols, jac, base, ZoneInput.DELTA, nablaDelta, velDelta, fracDelta, diffDelta);
                sum += (nablaDelta + velDelta) + (fracDelta + diffDelta);
            }
            // nabla_mu and phi enter only through the composition term, added below
            put(out, cols, jac, base, ZoneInput.NABLA_MU, 0.0, 0.0, 0.0, 0.0);
            put(out, cols, jac, base, ZoneInput.PHI, 0.0, 0.0, 0.0, 0.0);
            double probe = 0.0;
            if (!(Math.abs(sum) <= Double.MAX_VALUE)) {
                for (int output = 0; output < ZoneMajorJacobian.OUTPUTS; output++) {
                    for (int i = 0; i < ZoneInput.COUNT; i++) {
                        probe += entry(out, cols, jac, base, output, i) * 0.0;
                    }
                }
            }
            if (driven) {
                // the composition term, after the entries it adds to (d/d delta)
                final double shareSlopeB = shareSlope * gB;
                final double bMu = -(phi * invDelta);
                final double bPhi = -nablaMu * invDelta;
                final double bDelta = -buoyancy * invDelta;
                probe += composition(out, cols, jac, base, ZoneMajorJacobian.NABLA, -w * shareSlopeB, bMu, bPhi, bDelta)
                        + composition(out, cols, jac, base, ZoneMajorJacobian.VELOCITY, velocity * vB, bMu, bPhi, bDelta)
                        + composition(out, cols, jac, base, ZoneMajorJacobian.CONVECTIVE_FRACTION,
                                w * shareSlopeB * invNablaRad, bMu, bPhi, bDelta)
                        + composition(out, cols, jac, base, ZoneMajorJacobian.DIFFUSION, diffusion * vB, bMu, bPhi,
                                bDelta);
            }
            if (scratch != null) {
                scratch[o + 2 * ZoneInput.COUNT + PROBE] += probe;
            }
            last = probe;
        }
        return last;
    }

    /**
     * Stores the four entries of one input i: into the zone-major block or staging, entry (o, i) at
     * {@code base + o * COUNT + i} (the highest offset first); into the derivative columns at index
     * {@code base}; or into the result's arrays when there is neither.
     */
    private static void put(ConvectionResult out, ConvectionColumns cols, double[] jac, int base, int i,
                            double nabla, double velocity, double fraction, double diffusion) {
        if (jac != null) {
            jac[base + 3 * ZoneInput.COUNT + i] = diffusion;
            jac[base + 2 * ZoneInput.COUNT + i] = fraction;
            jac[base + ZoneInput.COUNT + i] = velocity;
            jac[base + i] = nabla;
        } else if (cols != null) {
            cols.dDiffusion[i][base] = diffusion;
            cols.dConvectiveFraction[i][base] = fraction;
            cols.dVelocity[i][base] = velocity;
            cols.dNabla[i][base] = nabla;
        } else {
            out.dDiffusion[i] = diffusion;
            out.dConvectiveFraction[i] = fraction;
            out.dVelocity[i] = velocity;
            out.dNabla[i] = nabla;
        }
    }

    /** Entry (o, i) of a Jacobian written by {@link #put}. */
    private static double entry(ConvectionResult out, ConvectionColumns cols, double[] jac, int base, int o, int i) {
        return jac != null ? jac[base + o * ZoneInput.COUNT + i]
                : cols != null ? column(cols, o)[i][base] : row(out, o)[i];
    }

    /** Sets entry (o, i) of a Jacobian written by {@link #put}. */
    private static void setEntry(ConvectionResult out, ConvectionColumns cols, double[] jac, int base, int o, int i,
                                 double value) {
        if (jac != null) {
            jac[base + o * ZoneInput.COUNT + i] = value;
        } else if (cols != null) {
            column(cols, o)[i][base] = value;
        } else {
            row(out, o)[i] = value;
        }
    }

    private static double[] row(ConvectionResult out, int o) {
        return o == ZoneMajorJacobian.NABLA ? out.dNabla : o == ZoneMajorJacobian.VELOCITY ? out.dVelocity
                : o == ZoneMajorJacobian.CONVECTIVE_FRACTION ? out.dConvectiveFraction : out.dDiffusion;
    }

    private static double[][] column(ConvectionColumns cols, int o) {
        return o == ZoneMajorJacobian.NABLA ? cols.dNabla : o == ZoneMajorJacobian.VELOCITY ? cols.dVelocity
                : o == ZoneMajorJacobian.CONVECTIVE_FRACTION ? cols.dConvectiveFraction : cols.dDiffusion;
    }

    /**
     * One output's composition entries: d/d nabla_mu and d/d phi written, d/d delta added to.
     *
     * @return the sum of (entry * 0) over the three: NaN exactly when one is not finite
     */
    private static double composition(ConvectionResult out, ConvectionColumns cols, double[] jac, int base, int o,
                                      double perB, double bMu, double bPhi, double bDelta) {
        final double mu = perB * bMu;
        final double phi = perB * bPhi;
        final double delta = entry(out, cols, jac, base, o, ZoneInput.DELTA) + perB * bDelta;
        setEntry(out, cols, jac, base, o, ZoneInput.NABLA_MU, mu);
        setEntry(out, cols, jac, base, o, ZoneInput.PHI, phi);
        setEntry(out, cols, jac, base, o, ZoneInput.DELTA, delta);
        return (mu * 0.0 + phi * 0.0) + delta * 0.0;
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


    /**
     * Refuses a zone whose valid inputs overflow double precision somewhere on the way (see
     * {@link ZoneChecks#finiteOutputs}).
     *
     * @param probe sum of (entry * 0) over the derivatives already written, or 0
     */
    static void guard(ZoneState z, ConvectionResult out, double probe) {
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

    /**
     * A stable zone's result (also the full-spectrum model's): nabla = nabla_rad, no convective flux or
     * velocity, and the semiconvective or thermohaline coefficient where the regime has one.
     */
    static void stable(ZoneState z, Regime regime, double nablaRad, double semiconvection,
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
