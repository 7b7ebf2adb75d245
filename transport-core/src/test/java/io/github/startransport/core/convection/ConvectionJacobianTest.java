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

/**
 * Every Jacobian entry (nabla, v, F_conv/F, D with respect to all 13 inputs) against a central
 * finite difference (five-point stencil, step 1e-5 relative) to 1e-6 relative. An entry whose
 * elasticity is below 1e-10 of the output per unit relative change of the input is compared
 * in absolute terms at that level, which is ten times the stencil's rounding noise.
 */
class ConvectionJacobianTest {

    private static ConvectionModel model(double alpha, Criterion criterion, MixingLengthGeometry geometry,
                                         CentreLimit limit, boolean transparent) {
        ConvectionSettings s = new ConvectionSettings(alpha, criterion, geometry, limit, 0.1, 1000.0, 0.016);
        return transparent ? new TransparentEddyMixingLength(s, TransparentEddyMixingLength.DEFAULT_EDDY_SHAPE)
                : new LocalMixingLength(s);
    }

    private static ConvectionModel withAlpha(ConvectionModel m, double alpha) {
        return m instanceof LocalMixingLength l ? l.withAlpha(alpha) : ((TransparentEddyMixingLength) m).withAlpha(alpha);
    }

    /** Convective zones, both variants, both geometry sets, both near-centre limits. */
    @Tag(CheckKind.INTERNAL)
    @Property(tries = 400, seed = "51")
    void convectiveJacobian(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                            @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                            @ForAll @Scale(12) @DoubleRange(min = -8, max = 8) double logU,
                            @ForAll @Scale(12) @DoubleRange(min = -3, max = 1) double logW,
                            @ForAll @Scale(12) @DoubleRange(min = 8, max = 12) double logR,
                            @ForAll @Scale(12) @DoubleRange(min = 28, max = 34) double logM,
                            @ForAll @Scale(12) @DoubleRange(min = 0.5, max = 3) double alpha,
                            @ForAll @IntRange(min = 0, max = 7) int variant) {
        MixingLengthGeometry geometry = MixingLengthGeometry.values()[variant & 1];
        CentreLimit limit = (variant & 2) == 0 ? CentreLimit.RADIUS : CentreLimit.NONE;
        ZoneState probe = TestZones.build(logT, rhoFraction, logU, 1.0, logR, logM, alpha, geometry, limit);
        ZoneState z = TestZones.build(logT, rhoFraction, logU, probe.nablaAd + Math.pow(10, logW), logR, logM,
                alpha, geometry, limit);
        z.nablaMu = 0.01;
        check(model(alpha, Criterion.SCHWARZSCHILD, geometry, limit, (variant & 4) != 0), z, Regime.CONVECTIVE);
    }

    /**
     * Convective zones driven partly or wholly by an inverted composition gradient (nabla_mu &lt; 0,
     * b = -(phi/delta) nabla_mu in the buoyancy, R0 &lt; 1, W from -0.95 b to 2 b): every entry, including
     * d/d nabla_mu and d/d phi, under both criteria, both variants and both geometry sets.
     */
    @Tag(CheckKind.INTERNAL)
    @Property(tries = 400, seed = "53")
    void compositionJacobian(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                             @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                             @ForAll @Scale(12) @DoubleRange(min = -6, max = 6) double logU,
                             @ForAll @Scale(12) @DoubleRange(min = -3, max = 0) double logB,
                             @ForAll @Scale(12) @DoubleRange(min = -0.95, max = 2) double wOverB,
                             @ForAll @Scale(12) @DoubleRange(min = 8, max = 12) double logR,
                             @ForAll @Scale(12) @DoubleRange(min = 28, max = 34) double logM,
                             @ForAll @IntRange(min = 0, max = 15) int variant) {
        MixingLengthGeometry geometry = MixingLengthGeometry.values()[variant & 1];
        CentreLimit limit = (variant & 2) == 0 ? CentreLimit.RADIUS : CentreLimit.NONE;
        Criterion criterion = (variant & 8) == 0 ? Criterion.SCHWARZSCHILD : Criterion.LEDOUX;
        double b = Math.pow(10, logB);
        ZoneState probe = TestZones.build(logT, rhoFraction, logU, 1.0, logR, logM, 1.8, geometry, limit);
        ZoneState z = TestZones.build(logT, rhoFraction, logU, probe.nablaAd + wOverB * b, logR, logM, 1.8, geometry,
                limit);
        z.phi = 0.7 + 0.5 * rhoFraction;
        z.nablaMu = -b * z.delta / z.phi;
        check(model(1.8, criterion, geometry, limit, (variant & 4) != 0), z, Regime.CONVECTIVE);
    }

    /** Stable zones: radiative, semiconvective (Ledoux, nabla_mu &gt; 0) and thermohaline (nabla_mu &lt; 0). */
    @Tag(CheckKind.INTERNAL)
    @Property(tries = 300, seed = "52")
    void stableJacobian(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                        @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                        @ForAll @Scale(12) @DoubleRange(min = -8, max = 8) double logU,
                        @ForAll @Scale(12) @DoubleRange(min = 0.05, max = 0.95) double position,
                        @ForAll @Scale(12) @DoubleRange(min = -4, max = 0) double logMu,
                        @ForAll @Scale(12) @DoubleRange(min = 8, max = 12) double logR,
                        @ForAll @Scale(12) @DoubleRange(min = 28, max = 34) double logM,
                        @ForAll @IntRange(min = 0, max = 2) int kind) {
        MixingLengthGeometry geometry = MixingLengthGeometry.BOHM_VITENSE_1958;
        ZoneState probe = TestZones.build(logT, rhoFraction, logU, 1.0, logR, logM, 1.8, geometry, CentreLimit.RADIUS);
        double nablaAd = probe.nablaAd;
        double nablaMu = kind == 2 ? -Math.pow(10, logMu) : Math.pow(10, logMu);
        double ratio = probe.phi / probe.delta;
        double nablaRad;
        Regime expected;
        if (kind == 0) {          // radiative: below nabla_ad, nabla_mu > 0
            nablaRad = nablaAd * position;
            expected = Regime.RADIATIVE;
        } else if (kind == 1) {   // semiconvective: between nabla_ad and nabla_L
            nablaRad = nablaAd + position * ratio * nablaMu;
            expected = Regime.SEMICONVECTIVE;
        } else {                  // thermohaline: below nabla_L < nabla_ad
            nablaRad = (nablaAd + ratio * nablaMu) * position;
            expected = Regime.THERMOHALINE;
        }
        Assume.that(nablaRad > 0.0);
        ZoneState z = TestZones.build(logT, rhoFraction, logU, nablaRad, logR, logM, 1.8, geometry, CentreLimit.RADIUS);
        z.nablaMu = nablaMu;
        check(model(1.8, Criterion.LEDOUX, geometry, CentreLimit.RADIUS, false), z, expected);
    }

    private static void check(ConvectionModel model, ZoneState z, Regime expected) {
        ConvectionResult out = new ConvectionResult();
        model.solve(z, out);
        assertEquals(expected, out.regime);
        // keep away from the kink of the radius limit
        Assume.that(Math.abs(Math.log(out.scaleHeight / z.radius)) > 1e-3);
        ConvectionResult probe = new ConvectionResult();
        ZoneState moved = new ZoneState();
        for (int i = 0; i < ZoneInput.COUNT; i++) {
            double q = i == ZoneInput.ALPHA ? model.alpha() : z.get(i);
            double h = 1e-5 * Math.max(Math.abs(q), i == ZoneInput.NABLA_MU ? 1e-6 : 1e-300);
            double[][] f = new double[4][5];
            double[] steps = {-2, -1, 1, 2};
            for (int s = 0; s < 4; s++) {
                moved.set(z);
                ConvectionModel m = model;
                if (i == ZoneInput.ALPHA) {
                    m = withAlpha(model, q + steps[s] * h);
                } else {
                    moved.put(i, q + steps[s] * h);
                }
                m.solve(moved, probe);
                Assume.that(probe.regime == expected);
                f[0][s] = probe.nabla;
                f[1][s] = probe.velocity;
                f[2][s] = probe.convectiveFraction;
                f[3][s] = probe.diffusion;
            }
            compare("nabla", i, q, h, f[0], out.nabla, out.dNabla[i]);
            compare("velocity", i, q, h, f[1], out.velocity, out.dVelocity[i]);
            compare("convectiveFraction", i, q, h, f[2], out.convectiveFraction, out.dConvectiveFraction[i]);
            compare("diffusion", i, q, h, f[3], out.diffusion, out.dDiffusion[i]);
        }
    }

    private static void compare(String output, int input, double q, double h, double[] f, double value,
                                double analytic) {
        double fd = (8.0 * (f[2] - f[1]) - (f[3] - f[0])) / (12.0 * h);
        double scale = Math.abs(value) / Math.max(Math.abs(q), h);
        double tolerance = 1e-6 * Math.max(Math.abs(fd), Math.abs(analytic)) + 1e-10 * scale;
        assertEquals(fd, analytic, tolerance, () -> "d " + output + " / d " + ZoneInput.name(input));
    }
    // ---- near the margins: steps small against the distance to the margin ----

    /**
     * Every entry of near-marginal convective zones, W from 1e-8 to 1e-3 above the criterion's gradient (nabla_ad
     * under Schwarzschild, nabla_L under Ledoux with nabla_mu &gt; 0), both criteria, both variants: the steps
     * are 1/400 of the margin's size relative to nabla_rad, so that no step crosses the margin.
     */
    @Tag(CheckKind.INTERNAL)
    @Property(tries = 150, seed = "54")
    void nearMarginalConvectiveJacobian(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                                        @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                                        @ForAll @Scale(12) @DoubleRange(min = -6, max = 6) double logU,
                                        @ForAll @Scale(12) @DoubleRange(min = -8, max = -3) double logGap,
                                        @ForAll @IntRange(min = 0, max = 3) int variant) {
        Criterion criterion = (variant & 1) == 0 ? Criterion.SCHWARZSCHILD : Criterion.LEDOUX;
        boolean transparent = (variant & 2) != 0;
        MixingLengthGeometry geometry = MixingLengthGeometry.BOHM_VITENSE_1958;
        ZoneState probe = TestZones.build(logT, rhoFraction, logU, 1.0, 10, 33, 1.8, geometry, CentreLimit.RADIUS);
        // (phi/delta) nabla_mu = 0.05 under both criteria: away from the kink of the buoyancy at nabla_mu = 0,
        // and a Ledoux margin 0.05 above nabla_ad whatever beta is
        double nablaMu = 0.05 * probe.delta / probe.phi;
        double critical = criterion == Criterion.LEDOUX ? probe.nablaAd + 0.05 : probe.nablaAd;
        double gap = Math.pow(10, logGap);
        ZoneState z = TestZones.build(logT, rhoFraction, logU, critical + gap, 10, 33, 1.8, geometry, CentreLimit.RADIUS);
        z.nablaMu = nablaMu;
        checkNear(model(1.8, criterion, geometry, CentreLimit.RADIUS, transparent), z, Regime.CONVECTIVE, gap);
    }

    /**
     * Stable zones within 1e-8 to 1e-3 of each margin (Ledoux): radiative just below nabla_ad, semiconvective
     * just above nabla_ad and just below nabla_L, thermohaline just below nabla_L (R0 just above 1).
     */
    @Tag(CheckKind.INTERNAL)
    @Property(tries = 200, seed = "55")
    void stableJacobianNearEachMargin(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                                      @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                                      @ForAll @Scale(12) @DoubleRange(min = -6, max = 6) double logU,
                                      @ForAll @Scale(12) @DoubleRange(min = -8, max = -3) double logGap,
                                      @ForAll @IntRange(min = 0, max = 3) int kind) {
        MixingLengthGeometry geometry = MixingLengthGeometry.BOHM_VITENSE_1958;
        ZoneState probe = TestZones.build(logT, rhoFraction, logU, 1.0, 10, 33, 1.8, geometry, CentreLimit.RADIUS);
        double gap = Math.pow(10, logGap);
        // nabla_mu such that (phi/delta) |nabla_mu| = 0.05: nabla_L lies 0.05 from nabla_ad whatever beta is
        double mu = 0.05 * probe.delta / probe.phi;
        double nablaMu;
        double nablaRad;
        Regime expected;
        switch (kind) {
            case 0 -> { nablaMu = mu; nablaRad = probe.nablaAd - gap; expected = Regime.RADIATIVE; }
            case 1 -> { nablaMu = mu; nablaRad = probe.nablaAd + gap; expected = Regime.SEMICONVECTIVE; }
            case 2 -> { nablaMu = mu; nablaRad = probe.nablaAd + 0.05 - gap; expected = Regime.SEMICONVECTIVE; }
            default -> { nablaMu = -mu; nablaRad = probe.nablaAd - 0.05 - gap; expected = Regime.THERMOHALINE; }
        }
        ZoneState z = TestZones.build(logT, rhoFraction, logU, nablaRad, 10, 33, 1.8, geometry, CentreLimit.RADIUS);
        z.nablaMu = nablaMu;
        checkNear(model(1.8, Criterion.LEDOUX, geometry, CentreLimit.RADIUS, false), z, expected, gap);
    }

    /** Ledoux convective zones with a stabilising composition gradient, nabla_rad well above nabla_L. */
    @Tag(CheckKind.INTERNAL)
    @Property(tries = 200, seed = "56")
    void ledouxConvectiveJacobian(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                                  @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                                  @ForAll @Scale(12) @DoubleRange(min = -8, max = 8) double logU,
                                  @ForAll @Scale(12) @DoubleRange(min = -3, max = 1) double logW,
                                  @ForAll @Scale(12) @DoubleRange(min = -4, max = 0) double logMu,
                                  @ForAll @IntRange(min = 0, max = 3) int variant) {
        MixingLengthGeometry geometry = MixingLengthGeometry.values()[variant & 1];
        ZoneState probe = TestZones.build(logT, rhoFraction, logU, 1.0, 10, 33, 1.8, geometry, CentreLimit.RADIUS);
        double nablaMu = Math.pow(10, logMu);
        double nablaL = probe.nablaAd + (probe.phi / probe.delta) * nablaMu;
        ZoneState z = TestZones.build(logT, rhoFraction, logU, nablaL + Math.pow(10, logW), 10, 33, 1.8, geometry,
                CentreLimit.RADIUS);
        z.nablaMu = nablaMu;
        check(model(1.8, Criterion.LEDOUX, geometry, CentreLimit.RADIUS, (variant & 2) != 0), z, Regime.CONVECTIVE);
    }

    /**
     * As {@link #check}, with steps of gap / (400 max(nabla_rad, 1)) relative (at most 1e-5; the stencil's
     * truncation error then stays below 1e-7 of a coefficient like 1 / (nabla_L - nabla)), and a tolerance floor
     * for the rounding of such small steps, (1e-13 + 4e-16 / gap) |f| / h (common practice, no source).
     */
    private static void checkNear(ConvectionModel model, ZoneState z, Regime expected, double gap) {
        ConvectionResult out = new ConvectionResult();
        model.solve(z, out);
        assertEquals(expected, out.regime);
        Assume.that(Math.abs(Math.log(out.scaleHeight / z.radius)) > 1e-3);
        double relStep = Math.min(1e-5, gap / (400.0 * Math.max(Math.abs(out.nablaRad), 1.0)));
        // an output that divides by the distance to the margin (D_sc ~ 1 / (nabla_L - nabla)) carries the rounding of
        // that difference, ~1e-16 nabla / gap relative; the five-point stencil turns noise e |f| into ~1.5 e |f| / h
        double rounding = 1e-13 + 4e-16 / gap;
        ConvectionResult probe = new ConvectionResult();
        ZoneState moved = new ZoneState();
        for (int i = 0; i < ZoneInput.COUNT; i++) {
            double q = i == ZoneInput.ALPHA ? model.alpha() : z.get(i);
            double h = relStep * Math.max(Math.abs(q), i == ZoneInput.NABLA_MU ? 1e-6 : 1e-300);
            double[][] f = new double[4][4];
            double[] steps = {-2, -1, 1, 2};
            for (int s = 0; s < 4; s++) {
                moved.set(z);
                ConvectionModel m = model;
                if (i == ZoneInput.ALPHA) {
                    m = withAlpha(model, q + steps[s] * h);
                } else {
                    moved.put(i, q + steps[s] * h);
                }
                m.solve(moved, probe);
                assertEquals(expected, probe.regime, () -> "a step crossed the margin: " + probe);
                f[0][s] = probe.nabla;
                f[1][s] = probe.velocity;
                f[2][s] = probe.convectiveFraction;
                f[3][s] = probe.diffusion;
            }
            double[] values = {out.nabla, out.velocity, out.convectiveFraction, out.diffusion};
            double[][] analytic = {out.dNabla, out.dVelocity, out.dConvectiveFraction, out.dDiffusion};
            String[] names = {"nabla", "velocity", "convectiveFraction", "diffusion"};
            for (int o = 0; o < 4; o++) {
                double fd = (8.0 * (f[o][2] - f[o][1]) - (f[o][3] - f[o][0])) / (12.0 * h);
                double a = analytic[o][i];
                double tolerance = 1e-5 * Math.max(Math.abs(fd), Math.abs(a)) + rounding * Math.abs(values[o]) / h
                        + 1e-10 * Math.abs(values[o]) / Math.max(Math.abs(q), h);
                int input = i;
                String name = names[o];
                assertEquals(fd, a, tolerance, () -> "d " + name + " / d " + ZoneInput.name(input) + " at gap " + gap);
            }
        }
    }
}
