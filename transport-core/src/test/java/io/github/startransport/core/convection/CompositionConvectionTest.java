package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.gradient.GradientStability;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ZoneState;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Convection with an inverted composition gradient (nabla_mu &lt; 0) in the buoyancy. The checks are
 * the defining relations of mixing-length theory (Kippenhahn, Weigert &amp; Weiss 2012 ch. 7, with the
 * element's density contrast delta (nabla - nabla_e) - phi nabla_mu of §6.1; from memory), each
 * evaluated from the returned state independently of how the code solves them, the root of the
 * resulting quartic from Commons Math's LaguerreSolver, the limits and the regime rules of
 * Kippenhahn, Ruschenplatt &amp; Thomas (1980): R0 &lt; 1 is dynamically unstable under either criterion.
 */
class CompositionConvectionTest {

    /** One random zone: W = nabla_rad - nabla_ad and b = -(phi/delta) nabla_mu as wanted. */
    private record Case(ZoneState zone, ConvectionModel model, MixingLengthGeometry geometry, double eddyShape,
                        double w, double b) {
    }

    private static Case zone(double logT, double rhoFraction, double logU, double w, double b, double logR,
                             double logM, double alpha, int variant, Criterion criterion) {
        MixingLengthGeometry geometry = MixingLengthGeometry.values()[variant & 1];
        CentreLimit limit = (variant & 2) == 0 ? CentreLimit.RADIUS : CentreLimit.NONE;
        boolean transparent = (variant & 4) != 0;
        ZoneState probe = TestZones.build(logT, rhoFraction, logU, 1.0, logR, logM, alpha, geometry, limit);
        ZoneState z = TestZones.build(logT, rhoFraction, logU, probe.nablaAd + w, logR, logM, alpha, geometry, limit);
        z.nablaMu = -b * z.delta / z.phi;
        ConvectionSettings settings = new ConvectionSettings(alpha, criterion, geometry, limit, 0.1, 1000.0, 0.016);
        double y = TransparentEddyMixingLength.DEFAULT_EDDY_SHAPE;
        ConvectionModel model = transparent ? new TransparentEddyMixingLength(settings, y)
                : new LocalMixingLength(settings);
        return new Case(z, model, geometry, transparent ? y : 0.0, w, b);
    }

    private static double gravity(ZoneState z) {
        return TestZones.G * z.mass / (z.radius * z.radius);
    }

    /** x = v / (l sqrt(a g delta / H_P)): the velocity in the units of the cubic. */
    private static double velocityUnits(Case c, ConvectionResult out) {
        ZoneState z = c.zone();
        return out.velocity / (out.mixingLength
                * Math.sqrt(c.geometry().velocityFactor() * gravity(z) * z.delta / out.scaleHeight));
    }

    private static double lossFactor(Case c, ConvectionResult out) {
        if (c.eddyShape() == 0.0) {
            return 1.0;
        }
        double omega = c.zone().opacity * c.zone().density * out.mixingLength;
        double yw2 = c.eddyShape() * omega * omega;
        return yw2 / (1.0 + yw2);
    }

    /**
     * The three defining relations hold for the returned state (to 1e-9; b up to 1, W from -b to 2,
     * R0 &lt; 1 throughout):
     * buoyancy v^2 = a g l^2 [delta (nabla - nabla_e) - phi nabla_mu] / H_P;
     * losses (nabla_e - nabla_ad) / (nabla - nabla_e) = 1 / Gamma with Gamma = c_P kappa rho^2 v l / (c sigma T^3 q)
     * (q the transparency factor; Cox &amp; Giuli 1968 ch. 14, Tassoul, Fontaine &amp; Winget 1990, from memory);
     * flux F_conv = b_F rho c_P T v (l / H_P)(nabla - nabla_e) with F_rad = 4acT^4 nabla / (3 kappa rho H_P)
     * adding up to L / (4 pi r^2). Also the ordering: nabla between nabla_ad and nabla_rad, nabla_e
     * between nabla_ad and nabla, and y = nabla - nabla_e of the sign of W.
     */
    @net.jqwik.api.Tag(CheckKind.EXTERNAL)
    @Property(tries = 2000, seed = "1001")
    void definingRelationsHold(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                               @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                               @ForAll @Scale(12) @DoubleRange(min = -8, max = 8) double logU,
                               @ForAll @Scale(12) @DoubleRange(min = -4, max = 0) double logB,
                               @ForAll @Scale(12) @DoubleRange(min = -0.999, max = 2) double wOverB,
                               @ForAll @Scale(12) @DoubleRange(min = 8, max = 12) double logR,
                               @ForAll @Scale(12) @DoubleRange(min = 28, max = 34) double logM,
                               @ForAll @Scale(12) @DoubleRange(min = 0.5, max = 3) double alpha,
                               @ForAll @IntRange(min = 0, max = 7) int variant) {
        double b = Math.pow(10, logB);
        Case c = zone(logT, rhoFraction, logU, wOverB * b, b, logR, logM, alpha, variant, Criterion.LEDOUX);
        ZoneState z = c.zone();
        ConvectionResult out = new ConvectionResult();
        c.model().solve(z, out);
        assertEquals(Regime.CONVECTIVE, out.regime);
        double w = out.nablaRad - z.nablaAd;
        double y = out.nabla - out.nablaElement;
        double g = gravity(z);
        double v = out.velocity;
        double l = out.mixingLength;
        double hp = out.scaleHeight;
        // y is a difference of two returned gradients: allow for their rounding in each relation
        double ey = 4.0 * (Math.ulp(Math.max(Math.abs(out.nabla), Math.abs(out.nablaElement))) + Math.ulp(z.nablaAd));
        // buoyancy
        double perY = c.geometry().velocityFactor() * g * l * l * z.delta / hp;
        double buoyancy = perY * (y - z.phi * z.nablaMu / z.delta);
        assertEquals(buoyancy, v * v, 1e-9 * buoyancy + perY * ey, out::toString);
        // losses
        double t = z.temperature;
        double gammaFromV = z.cp * z.opacity * z.density * z.density * v * l
                / (c.geometry().lossFactor() * TestZones.SIGMA * t * t * t * lossFactor(c, out));
        assertEquals(1.0, gammaFromV / out.efficiency, 1e-9);
        assertEquals(y, (out.nablaElement - z.nablaAd) * gammaFromV, 1e-9 * Math.abs(y) + ey * (1.0 + gammaFromV),
                out::toString);
        // flux
        double fPerY = c.geometry().fluxFactor() * z.density * z.cp * t * v * (l / hp);
        double fConv = fPerY * y;
        double fRad = 4.0 * TestZones.A_RAD * TestZones.C * t * t * t * t * out.nabla / (3.0 * z.opacity * z.density * hp);
        double fTotal = z.luminosity / (4.0 * Math.PI * z.radius * z.radius);
        assertEquals(fTotal, fConv + fRad, 1e-9 * Math.max(Math.abs(fTotal), Math.abs(fRad)) + fPerY * ey);
        assertEquals(1.0, out.convectiveFraction + out.radiativeFraction, 1e-9 * Math.max(1, Math.abs(out.radiativeFraction)));
        // ordering and signs (where y is above the rounding of the gradients)
        if (Math.abs(y) > ey) {
            assertTrue(Math.signum(y) == Math.signum(w), out::toString);
        }
        double en = 2.0 * Math.ulp(out.nabla);
        assertTrue(out.nabla >= Math.min(z.nablaAd, out.nablaRad) - en && out.nabla <= Math.max(z.nablaAd, out.nablaRad) + en,
                out::toString);
        assertTrue((out.nablaElement - z.nablaAd) * (out.nabla - out.nablaElement) >= -ey * ey, out::toString);
        assertTrue(out.velocity > 0.0 && out.diffusion > 0.0 && out.efficiency > 0.0, out::toString);
        if (w < 0.0) {
            // the convective flux runs inwards: F_conv / F <= 0 for L > 0, >= 0 for L < 0
            assertTrue(out.convectiveFraction * Math.signum(z.luminosity) <= 0.0, "heat carried inwards: " + out);
        }
    }

    /**
     * The velocity agrees with the positive root of (x^2 - b)(x^2 + k U x + 2 k U U') = k U W x found by
     * Commons Math's LaguerreSolver (all complex roots of the quartic, then the real positive one).
     */
    @net.jqwik.api.Tag(CheckKind.EXTERNAL)
    @Property(tries = 1000, seed = "1002")
    void quarticRootAgreesWithCommonsMath(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                                          @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                                          @ForAll @Scale(12) @DoubleRange(min = -4, max = 4) double logU,
                                          @ForAll @Scale(12) @DoubleRange(min = -3, max = 0) double logB,
                                          @ForAll @Scale(12) @DoubleRange(min = -0.99, max = 2) double wOverB,
                                          @ForAll @IntRange(min = 0, max = 7) int variant) {
        double b = Math.pow(10, logB);
        Case c = zone(logT, rhoFraction, logU, wOverB * b, b, 10, 33, 1.8, variant, Criterion.SCHWARZSCHILD);
        ConvectionResult out = new ConvectionResult();
        c.model().solve(c.zone(), out);
        double k = 32.0 / (3.0 * c.geometry().fluxFactor() * c.geometry().lossFactor());
        double u = out.lossParameter;
        double uLoss = lossFactor(c, out) * u;
        double w = out.nablaRad - c.zone().nablaAd;
        double bz = -(c.zone().phi / c.zone().delta) * c.zone().nablaMu;
        double[] coefficients = {-2.0 * k * u * uLoss * bz, -k * u * (w + bz), 2.0 * k * u * uLoss - bz, k * u, 1.0};
        Complex[] roots = new LaguerreSolver(1e-15, 1e-300, 1e-300).solveAllComplex(coefficients, 0.0);
        double root = Double.NaN;
        for (Complex r : roots) {
            if (r.getReal() > 0.0 && Math.abs(r.getImaginary()) <= 1e-9 * Math.abs(r.getReal())) {
                assertTrue(Double.isNaN(root), "one positive root only (Descartes' rule of signs)");
                root = r.getReal();
            }
        }
        assertEquals(root, velocityUnits(c, out), 1e-9 * root);
    }

    /**
     * Limits: as nabla_mu -&gt; 0- the result tends to the textbook cubic's (checked at b = 1e-12 x^2 against b = 0,
     * to 1e-9); efficient convection (1e-9 &lt;= U &lt;= 1e-7) gives nabla - nabla_ad -&gt; k U W / sqrt(b) (the first terms of
     * the expansion in U of the equation: x -&gt; sqrt(b), y -&gt; k U W / x; re-derived, relative corrections
     * O(k U / sqrt(b)) and O(|y| / b), below 1e-3 here); inefficient convection (U &gt;= 1e5) gives nabla -&gt;
     * nabla_rad and x^2 -&gt; b, the composition's buoyancy alone.
     */
    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 500, seed = "1003")
    void limits(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                @ForAll @Scale(12) @DoubleRange(min = -2, max = 0) double logB,
                @ForAll @Scale(12) @DoubleRange(min = -0.9, max = 1) double wOverB,
                @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double position) {
        double b = Math.pow(10, logB);
        double w = wOverB * b;
        // nabla_mu -> 0-: continuity with the textbook cubic (W > 0 there)
        double logU = -8 + 16 * position;
        Case plain = zone(logT, rhoFraction, logU, Math.abs(w) + 0.01, 0.0, 10, 33, 1.8, 0, Criterion.LEDOUX);
        ConvectionResult a = new ConvectionResult();
        plain.model().solve(plain.zone(), a);
        double x0 = velocityUnits(plain, a);
        // b small against the textbook buoyancy y = x^2: x changes by b / (2 y) = 5e-13 relative
        Case tiny = zone(logT, rhoFraction, logU, Math.abs(w) + 0.01, 1e-12 * x0 * x0, 10, 33, 1.8, 0,
                Criterion.LEDOUX);
        ConvectionResult t = new ConvectionResult();
        tiny.model().solve(tiny.zone(), t);
        assertEquals(a.nabla, t.nabla, 1e-9 * a.nabla);
        assertEquals(a.velocity, t.velocity, 1e-9 * a.velocity);
        // efficient (|W| >= 0.01 so that nabla - nabla_ad >= 1e-11 is far above the rounding of nabla)
        Assume.that(Math.abs(w) >= 0.01);
        double k = 8.0 / 9.0;
        double logSmallU = -9 + 2 * position;
        Case eff = zone(logT, rhoFraction, logSmallU, w, b, 10, 33, 1.8, 0, Criterion.LEDOUX);
        ConvectionResult e = new ConvectionResult();
        eff.model().solve(eff.zone(), e);
        double expected = k * e.lossParameter * (e.nablaRad - eff.zone().nablaAd) / Math.sqrt(b);
        assertEquals(1.0, (e.nabla - eff.zone().nablaAd) / expected, 1e-3, e::toString);
        // inefficient
        double logLargeU = 5 + 3 * position;
        Case ineff = zone(logT, rhoFraction, logLargeU, w, b, 10, 33, 1.8, 0, Criterion.LEDOUX);
        ConvectionResult i = new ConvectionResult();
        ineff.model().solve(ineff.zone(), i);
        assertEquals(0.0, (i.nablaRad - i.nabla) / Math.abs(i.nablaRad - ineff.zone().nablaAd), 1e-4);
        double x = velocityUnits(ineff, i);
        assertEquals(1.0, x * x / b, 2e-4);
    }

    /**
     * Nothing happens at nabla_rad = nabla_ad (R0 = 0) when nabla_mu &lt; 0: nabla, v and D are continuous
     * there (steps of 1e-10 in W change nabla by O(1e-10) and v, D by O(1e-10 / b)); exactly there y = 0, so nabla = nabla_e = nabla_ad
     * and v^2 = a g delta l^2 b / H_P.
     */
    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 500, seed = "1004")
    void continuousAcrossTheSchwarzschildMargin(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                                                @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                                                @ForAll @Scale(12) @DoubleRange(min = -6, max = 6) double logU,
                                                @ForAll @Scale(12) @DoubleRange(min = -3, max = 0) double logB,
                                                @ForAll @IntRange(min = 0, max = 7) int variant) {
        double b = Math.pow(10, logB);
        ConvectionResult[] r = new ConvectionResult[3];
        Case c = null;
        double[] ws = {-1e-10, 0.0, 1e-10};
        for (int j = 0; j < 3; j++) {
            c = zone(logT, rhoFraction, logU, ws[j], b, 10, 33, 1.8, variant, Criterion.SCHWARZSCHILD);
            r[j] = new ConvectionResult();
            c.model().solve(c.zone(), r[j]);
            assertEquals(Regime.CONVECTIVE, r[j].regime);
        }
        for (int j : new int[] {0, 2}) {
            assertEquals(r[1].nabla, r[j].nabla, 1e-8 * r[1].nabla);
            assertEquals(r[1].velocity, r[j].velocity, 1e-6 * r[1].velocity);
            assertEquals(r[1].diffusion, r[j].diffusion, 1e-6 * r[1].diffusion);
        }
        ConvectionResult at = r[1];
        if (at.nablaRad == c.zone().nablaAd) {
            assertEquals(c.zone().nablaAd, at.nabla, 1e-15);
            assertEquals(at.nabla, at.nablaElement, 1e-15);
            double x = velocityUnits(c, at);
            assertEquals(1.0, x * x / b, 1e-12);
        }
    }

    /**
     * The law: any state with nabla_mu &lt;= 0 and density ratio R0 = (nabla_rad - nabla_ad) /
     * ((phi/delta) nabla_mu) &lt; 1 (for nabla_mu = 0: nabla_rad &gt; nabla_ad) is dynamically unstable
     * (Kippenhahn, Ruschenplatt &amp; Thomas 1980; Brown et al. 2013), so both criteria call it convective,
     * with D &gt; 0 and identical results; with 1 &lt;= R0 both call it thermohaline with
     * D = C_t K_T / R0 &gt; 0. The stability test agrees with the convection models.
     */
    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 3000, seed = "1005")
    void bothCriteriaAgreeWhereNablaMuIsNotPositive(
            @ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
            @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
            @ForAll @Scale(12) @DoubleRange(min = -6, max = 6) double logU,
            @ForAll @Scale(12) @DoubleRange(min = -5, max = 0.5) double logB,
            @ForAll @Scale(12) @DoubleRange(min = -3, max = 2) double w,
            @ForAll @IntRange(min = 0, max = 8) int variant) {
        double b = variant == 8 ? 0.0 : Math.pow(10, logB);
        Assume.that(w + b != 0.0 && !(b == 0.0 && w == 0.0));
        ConvectionResult[] out = new ConvectionResult[2];
        Case c = null;
        for (Criterion criterion : Criterion.values()) {
            c = zone(logT, rhoFraction, logU, w, b, 10, 33, 1.8, variant & 7, criterion);
            out[criterion.ordinal()] = new ConvectionResult();
            c.model().solve(c.zone(), out[criterion.ordinal()]);
            StabilityResult st = new StabilityResult();
            new GradientStability(criterion).evaluate(c.zone(), st);
            assertEquals(st.regime, out[criterion.ordinal()].regime);
            assertEquals(st.regime == Regime.CONVECTIVE, st.margin() > 0.0);
        }
        ZoneState z = c.zone();
        double wz = out[0].nablaRad - z.nablaAd;
        double bz = -(z.phi / z.delta) * z.nablaMu;
        double r0 = wz / -bz;   // -infinity for nabla_mu = 0, W > 0
        ConvectionResult s = out[0];
        ConvectionResult l = out[1];
        assertEquals(s.regime, l.regime);
        assertEquals(s.toString(), l.toString());
        if (r0 < 1.0) {
            assertEquals(Regime.CONVECTIVE, s.regime, s::toString);
            assertTrue(s.diffusion > 0.0 && s.velocity > 0.0, s::toString);
        } else if (bz > 0.0) {
            assertEquals(Regime.THERMOHALINE, s.regime, s::toString);
            double kT = 4.0 * TestZones.A_RAD * TestZones.C * Math.pow(z.temperature, 3)
                    / (3.0 * z.opacity * z.density * z.density * z.cp);
            assertEquals(1000.0 * kT / r0, s.diffusion, 1e-12 * s.diffusion);
        } else {
            assertEquals(Regime.RADIATIVE, s.regime);
        }
    }

    /**
     * L &lt; 0 (inward energy flow, nabla_rad &lt; 0): radiative for nabla_mu &gt;= 0; with nabla_mu &lt; 0
     * thermohaline, or convective where nabla_L &lt; nabla_rad, and then the convective flux runs inwards
     * like the total one (F_conv / F &gt; 0) and the relations of mixing-length theory still close.
     */
    @Tag(CheckKind.LAW)
    @Test
    void negativeLuminosityFollowsTheSameRules() {
        Case rad = zone(6.5, 0.5, -2, -0.6, 0.0, 10, 33, 1.8, 0, Criterion.LEDOUX);
        ConvectionResult out = new ConvectionResult();
        rad.model().solve(rad.zone(), out);
        assertTrue(rad.zone().luminosity < 0.0 && out.nablaRad < 0.0);
        assertEquals(Regime.RADIATIVE, out.regime);
        Case fingers = zone(6.5, 0.5, -2, -0.6, 0.3, 10, 33, 1.8, 0, Criterion.SCHWARZSCHILD);
        fingers.model().solve(fingers.zone(), out);
        assertEquals(Regime.THERMOHALINE, out.regime);
        assertTrue(out.diffusion > 0.0);
        Case overturning = zone(6.5, 0.5, -2, -0.6, 0.9, 10, 33, 1.8, 0, Criterion.SCHWARZSCHILD);
        overturning.model().solve(overturning.zone(), out);
        assertEquals(Regime.CONVECTIVE, out.regime);
        assertTrue(out.nablaRad < out.nabla && out.nabla < out.nablaElement
                && out.nablaElement < overturning.zone().nablaAd, out::toString);
        assertTrue(out.convectiveFraction > 0.0 && out.velocity > 0.0 && out.diffusion > 0.0, out::toString);
        assertEquals(1.0, out.convectiveFraction + out.radiativeFraction, 1e-12);
    }

    /** A convective zone with L = 0 (convecting because nabla_L &lt; 0) is refused: F_conv / F has no value. */
    @Tag(CheckKind.INTERNAL)
    @Test
    void zeroLuminosityInAConvectiveZoneIsRefused() {
        Case c = zone(6.5, 0.5, -2, -0.6, 0.9, 10, 33, 1.8, 0, Criterion.LEDOUX);
        c.zone().luminosity = 0.0;
        c.zone().zone = 12;
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> c.model().solve(c.zone(), new ConvectionResult()));
        assertEquals("luminosity", e.field());
        assertEquals(12, e.zone());
    }

    /**
     * The composition solver converges within its bound over a dense grid of a0, S and beta (including
     * R0 -&gt; 1, S -&gt; -beta, and S = -beta, where rounding can put a zone that is convective by its
     * gradients): the residual of (Gamma^2 - beta) D = S Gamma is at rounding level relative
     * to its largest term, and the root lies in the bracket the javadoc proves.
     */
    @Tag(CheckKind.INTERNAL)
    @Test
    void compositionSolverConvergesOverAGrid() {
        for (double a0 : new double[] {1e-6, 0.01, 0.5, 9.0 / 4.0, 6.0}) {
            for (int eb = -40; eb <= 40; eb += 2) {
                double beta = Math.pow(10, eb);
                for (double ratio : new double[] {-1.0, -0.999999, -0.9, -0.5, -1e-3, 0.0, 1e-3, 0.5, 1.0, 10.0, 1e6}) {
                    double s = ratio * beta;
                    double g = MixingLengthCubic.efficiency(a0, s, beta);
                    double den = MixingLengthCubic.denominator(a0, g);
                    double lhs = Math.fma(g, g, -beta) * den;
                    double largest = Math.max(Math.max(g * g * den, beta * den), Math.abs(s * g));
                    assertTrue(Math.abs(lhs - s * g) <= 1e-13 * largest,
                            () -> "a0 " + a0 + " beta " + beta + " S " + s + ": residual " + (lhs - s * g) / largest);
                    if (s >= 0.0) {
                        assertTrue(g >= Math.sqrt(beta) * (1 - 1e-15));
                    } else {
                        assertTrue(g <= Math.sqrt(beta) * (1 + 1e-15) && g > 0.0);
                    }
                    assertTrue(MixingLengthCubic.compositionSlope(a0, s, g) > 0.0);
                }
            }
        }
    }
}
