package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneState;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Tag;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Physical laws of the mixing-length models over random zones: T 10^3.5-10^9 K,
 * rho 10^-12-10^6 g cm^-3 (radiation pressure below 99.9 %), U 10^-8-10^8, both geometry sets,
 * both near-centre limits, with and without the transparency correction.
 */
class ConvectionPropertyTest {

    /** One random convective case. */
    private record Case(ZoneState zone, ConvectionModel model, MixingLengthGeometry geometry, double eddyShape) {
    }

    private static Case convective(double logT, double rhoFraction, double logU, double logW, double logR,
                                   double logM, double alpha, int variant) {
        MixingLengthGeometry geometry = MixingLengthGeometry.values()[variant & 1];
        CentreLimit limit = (variant & 2) == 0 ? CentreLimit.RADIUS : CentreLimit.NONE;
        boolean transparent = (variant & 4) != 0;
        ZoneState probe = TestZones.build(logT, rhoFraction, logU, 1.0, logR, logM, alpha, geometry, limit);
        ZoneState z = TestZones.build(logT, rhoFraction, logU, probe.nablaAd + Math.pow(10, logW), logR, logM, alpha,
                geometry, limit);
        ConvectionSettings settings = new ConvectionSettings(alpha, Criterion.SCHWARZSCHILD, geometry, limit,
                0.1, 1000.0, 0.016);
        double y = TransparentEddyMixingLength.DEFAULT_EDDY_SHAPE;
        ConvectionModel model = transparent ? new TransparentEddyMixingLength(settings, y)
                : new LocalMixingLength(settings);
        return new Case(z, model, geometry, transparent ? y : 0.0);
    }

    /** Loss factor q = y omega^2 / (1 + y omega^2), omega = kappa rho l (Henyey, Vardya &amp; Bodenheimer 1965, from memory). */
    private static double lossFactor(Case c, ConvectionResult out) {
        if (c.eddyShape() == 0.0) {
            return 1.0;
        }
        double omega = c.zone().opacity * c.zone().density * out.mixingLength;
        double yw2 = c.eddyShape() * omega * omega;
        return yw2 / (1.0 + yw2);
    }

    private static double gravity(ZoneState z) {
        return TestZones.G * z.mass / (z.radius * z.radius);
    }

    /** nabla_ad &lt;= nabla_e &lt;= nabla &lt;= nabla_rad and v &gt;= 0 in every unstable zone (Kippenhahn, Weigert &amp; Weiss 2012 §7.1). */
    @Tag(CheckKind.LAW)
    @Property(tries = 2000, seed = "41")
    void gradientsAreOrdered(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                             @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                             @ForAll @Scale(12) @DoubleRange(min = -8, max = 8) double logU,
                             @ForAll @Scale(12) @DoubleRange(min = -8, max = 1) double logW,
                             @ForAll @Scale(12) @DoubleRange(min = 8, max = 12) double logR,
                             @ForAll @Scale(12) @DoubleRange(min = 28, max = 34) double logM,
                             @ForAll @Scale(12) @DoubleRange(min = 0.5, max = 3) double alpha,
                             @ForAll @IntRange(min = 0, max = 7) int variant) {
        Case c = convective(logT, rhoFraction, logU, logW, logR, logM, alpha, variant);
        ConvectionResult out = new ConvectionResult();
        c.model().solve(c.zone(), out);
        assertEquals(Regime.CONVECTIVE, out.regime);
        assertTrue(c.zone().nablaAd <= out.nablaElement, out::toString);
        assertTrue(out.nablaElement <= out.nabla, out::toString);
        assertTrue(out.nabla <= out.nablaRad, out::toString);
        assertTrue(out.velocity >= 0.0 && out.diffusion >= 0.0, out::toString);
        assertTrue(out.efficiency > 0.0, out::toString);
    }

    /**
     * Flux closure: F_conv + F_rad = L / (4 pi r^2) to 1e-12, with F_conv recomputed from the
     * returned velocity through the parametrised theory (v^2 = a g delta l^2 (nabla - nabla_e)/H_P,
     * F_conv = b rho c_P T v (l/H_P)(nabla - nabla_e), hence F_conv = b rho c_P T v^3 / (a g delta l);
     * Tassoul, Fontaine &amp; Winget 1990, from memory) and F_rad = 4acT^4 nabla / (3 kappa rho H_P)
     * (Kippenhahn, Weigert &amp; Weiss 2012 §5.1). Also F_conv/F + F_rad/F = 1 to 1e-12.
     */
    @Tag(CheckKind.EXTERNAL)
    @Property(tries = 2000, seed = "42")
    void fluxesAddUpToTheTotal(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                               @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                               @ForAll @Scale(12) @DoubleRange(min = -8, max = 8) double logU,
                               @ForAll @Scale(12) @DoubleRange(min = -8, max = 1) double logW,
                               @ForAll @Scale(12) @DoubleRange(min = 8, max = 12) double logR,
                               @ForAll @Scale(12) @DoubleRange(min = 28, max = 34) double logM,
                               @ForAll @Scale(12) @DoubleRange(min = 0.5, max = 3) double alpha,
                               @ForAll @IntRange(min = 0, max = 7) int variant) {
        Case c = convective(logT, rhoFraction, logU, logW, logR, logM, alpha, variant);
        ZoneState z = c.zone();
        ConvectionResult out = new ConvectionResult();
        c.model().solve(z, out);
        double t = z.temperature;
        double v = out.velocity;
        double fConv = c.geometry().fluxFactor() * z.density * z.cp * t * v * v * v
                / (c.geometry().velocityFactor() * gravity(z) * z.delta * out.mixingLength);
        double fRad = 4.0 * TestZones.A_RAD * TestZones.C * t * t * t * t * out.nabla
                / (3.0 * z.opacity * z.density * out.scaleHeight);
        double fTotal = z.luminosity / (4.0 * Math.PI * z.radius * z.radius);
        assertEquals(1.0, (fConv + fRad) / fTotal, 1e-12);
        assertEquals(1.0, out.convectiveFraction + out.radiativeFraction, 1e-12);
    }

    /**
     * The textbook cubic x^3 + k U x^2 + 2 k U U' x - k U W = 0 (Kippenhahn, Weigert &amp; Weiss 2012
     * ch. 7 for k = 8/9, U' = U) holds for the returned state with residual below 1e-12 of its largest
     * term, x recovered from v = l sqrt(a g delta / H_P) x; and nabla = nabla_ad + x^2 + 2U'x agrees to
     * 1e-10 with the root of the same cubic from Commons Math's LaguerreSolver.
     */
    @Tag(CheckKind.EXTERNAL)
    @Property(tries = 2000, seed = "43")
    void cubicHoldsAndAgreesWithCommonsMath(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                                            @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                                            @ForAll @Scale(12) @DoubleRange(min = -8, max = 8) double logU,
                                            @ForAll @Scale(12) @DoubleRange(min = -6, max = 1) double logW,
                                            @ForAll @Scale(12) @DoubleRange(min = 8, max = 12) double logR,
                                            @ForAll @Scale(12) @DoubleRange(min = 28, max = 34) double logM,
                                            @ForAll @Scale(12) @DoubleRange(min = 0.5, max = 3) double alpha,
                                            @ForAll @IntRange(min = 0, max = 7) int variant) {
        Case c = convective(logT, rhoFraction, logU, logW, logR, logM, alpha, variant);
        ZoneState z = c.zone();
        ConvectionResult out = new ConvectionResult();
        c.model().solve(z, out);
        double k = 32.0 / (3.0 * c.geometry().fluxFactor() * c.geometry().lossFactor());
        double u = out.lossParameter;
        double uLoss = lossFactor(c, out) * u;
        double w = out.nablaRad - z.nablaAd;
        double x = out.velocity / (out.mixingLength
                * Math.sqrt(c.geometry().velocityFactor() * gravity(z) * z.delta / out.scaleHeight));
        double t1 = x * x * x;
        double t2 = k * u * x * x;
        double t3 = 2.0 * k * u * uLoss * x;
        double t4 = k * u * w;
        double largest = Math.max(Math.max(t1, t2), Math.max(t3, t4));
        assertTrue(Math.abs(t1 + t2 + t3 - t4) <= 1e-12 * largest, () -> "residual " + (t1 + t2 + t3 - t4) / largest);
        double root = TestZones.commonsMathRoot(k, u, uLoss, w);
        double peer = z.nablaAd + root * root + 2.0 * uLoss * root;
        assertEquals(peer, out.nabla, 1e-10 * peer);
    }

    /**
     * nabla decreases monotonically toward nabla_ad as alpha grows (Kippenhahn, Weigert &amp; Weiss 2012
     * §7.3: a longer mixing length makes convection more efficient), and d nabla / d alpha &lt;= 0.
     */
    @Tag(CheckKind.LAW)
    @Property(tries = 1000, seed = "44")
    void nablaFallsWithAlpha(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                             @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                             @ForAll @Scale(12) @DoubleRange(min = -8, max = 8) double logU,
                             @ForAll @Scale(12) @DoubleRange(min = -6, max = 1) double logW,
                             @ForAll @Scale(12) @DoubleRange(min = 8, max = 12) double logR,
                             @ForAll @Scale(12) @DoubleRange(min = 28, max = 34) double logM,
                             @ForAll @Scale(12) @DoubleRange(min = 0.5, max = 3) double alpha,
                             @ForAll @Scale(12) @DoubleRange(min = 1.001, max = 3) double factor,
                             @ForAll @IntRange(min = 0, max = 7) int variant) {
        Case c = convective(logT, rhoFraction, logU, logW, logR, logM, alpha, variant);
        ConvectionResult small = new ConvectionResult();
        ConvectionResult large = new ConvectionResult();
        c.model().solve(c.zone(), small);
        withAlpha(c.model(), alpha * factor).solve(c.zone(), large);
        assertTrue(large.nabla <= small.nabla * (1.0 + 1e-14), () -> small + " vs " + large);
        assertTrue(large.nabla >= c.zone().nablaAd);
        assertTrue(small.dNabla[ZoneInput.ALPHA] <= 0.0);
    }

    /**
     * Eddies that may be optically thin lose less heat than the diffusion estimate, so convection is
     * more efficient and nabla is never above the textbook value; for omega = kappa rho l &gt;&gt; 1 the two
     * agree (Henyey, Vardya &amp; Bodenheimer 1965, from memory).
     */
    @Tag(CheckKind.LAW)
    @Property(tries = 1000, seed = "45")
    void transparencyNeverRaisesNabla(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                                      @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                                      @ForAll @Scale(12) @DoubleRange(min = -8, max = 8) double logU,
                                      @ForAll @Scale(12) @DoubleRange(min = -6, max = 1) double logW,
                                      @ForAll @Scale(12) @DoubleRange(min = 8, max = 12) double logR,
                                      @ForAll @Scale(12) @DoubleRange(min = 28, max = 34) double logM,
                                      @ForAll @Scale(12) @DoubleRange(min = 0.5, max = 3) double alpha,
                                      @ForAll @IntRange(min = 0, max = 3) int variant) {
        Case textbook = convective(logT, rhoFraction, logU, logW, logR, logM, alpha, variant);
        Case thin = convective(logT, rhoFraction, logU, logW, logR, logM, alpha, variant | 4);
        ConvectionResult a = new ConvectionResult();
        ConvectionResult b = new ConvectionResult();
        textbook.model().solve(textbook.zone(), a);
        thin.model().solve(thin.zone(), b);
        assertTrue(b.nabla <= a.nabla * (1.0 + 1e-14));
        assertTrue(b.velocity >= a.velocity * (1.0 - 1e-14));
        double omega = thin.zone().opacity * thin.zone().density * b.mixingLength;
        if (TransparentEddyMixingLength.DEFAULT_EDDY_SHAPE * omega * omega > 1e8) {
            assertEquals(a.nabla, b.nabla, 1e-7 * a.nabla);
        }
    }

    /** Onset: W -&gt; 0+ gives nabla -&gt; nabla_rad = nabla_ad; on the stable side nabla = nabla_rad exactly. */
    @Tag(CheckKind.LAW)
    @Property(tries = 500, seed = "46")
    void continuousThroughOnset(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                                @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                                @ForAll @Scale(12) @DoubleRange(min = -3, max = 8) double logU,
                                @ForAll @Scale(12) @DoubleRange(min = -12, max = -7) double logW,
                                @ForAll @Scale(12) @DoubleRange(min = 8, max = 12) double logR,
                                @ForAll @Scale(12) @DoubleRange(min = 28, max = 34) double logM,
                                @ForAll @IntRange(min = 0, max = 7) int variant) {
        Case above = convective(logT, rhoFraction, logU, logW, logR, logM, 1.8, variant);
        ConvectionResult out = new ConvectionResult();
        above.model().solve(above.zone(), out);
        double w = out.nablaRad - above.zone().nablaAd;
        // nabla_rad - nabla = W a0 Gamma^2 / D <= a0 S^2 W, since Gamma <= S (Cox & Giuli 1968 ch. 14:
        // Gamma -> S = A^2 W as W -> 0, from memory): the deficit vanishes like W^3
        double uLoss = lossFactor(above, out) * out.lossParameter;
        double k = 32.0 / (3.0 * above.geometry().fluxFactor() * above.geometry().lossFactor());
        double a0 = 2.0 * uLoss / (k * out.lossParameter);
        double s = w / (4.0 * uLoss * uLoss);
        assertTrue(out.nablaRad - out.nabla <= a0 * s * s * w * (1.0 + 1e-9) + 1e-15 * out.nablaRad, out::toString);
        ZoneState below = new ZoneState().set(above.zone());
        below.luminosity *= (above.zone().nablaAd - w) / out.nablaRad;
        ConvectionResult stable = new ConvectionResult();
        above.model().solve(below, stable);
        assertEquals(Regime.RADIATIVE, stable.regime);
        assertEquals(stable.nablaRad, stable.nabla);
        assertEquals(0.0, stable.velocity);
        assertEquals(0.0, stable.convectiveFraction);
        assertTrue(Math.abs(out.nabla - stable.nabla) <= 2.0 * w + 1e-15 * out.nablaRad);
    }

    private static ConvectionModel withAlpha(ConvectionModel m, double alpha) {
        return m instanceof LocalMixingLength l ? l.withAlpha(alpha) : ((TransparentEddyMixingLength) m).withAlpha(alpha);
    }
}
