package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Tag;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Limits, signs and scaling laws of the mixing coefficients of each regime. */
class MixingCoefficientsPropertyTest {

    /**
     * Semiconvection (Langer, Sugimoto &amp; Fricke 1983, form from memory): zero at the Schwarzschild
     * margin, positive and increasing in nabla between nabla_ad and nabla_L, linear in alpha_sc,
     * proportional to T^3 / (kappa rho^2 c_P).
     */
    @Tag(CheckKind.LAW)
    @Property(tries = 1000, seed = "61")
    void semiconvection(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                        @ForAll @Scale(12) @DoubleRange(min = -12, max = 6) double logRho,
                        @ForAll @Scale(12) @DoubleRange(min = -3, max = 3) double logKappa,
                        @ForAll @Scale(12) @DoubleRange(min = 0.01, max = 0.99) double position,
                        @ForAll @Scale(12) @DoubleRange(min = -4, max = 0) double logMu,
                        @ForAll @Scale(12) @DoubleRange(min = -3, max = 0) double logAlpha) {
        double t = Math.pow(10, logT);
        double rho = Math.pow(10, logRho);
        double kappa = Math.pow(10, logKappa);
        double cp = 3e8;
        double ad = 0.4;
        double ledoux = ad + Math.pow(10, logMu);
        double nabla = ad + position * (ledoux - ad);
        double a = Math.pow(10, logAlpha);
        double d = MixingCoefficients.semiconvective(a, t, rho, kappa, cp, nabla, ad, ledoux);
        assertEquals(0.0, MixingCoefficients.semiconvective(a, t, rho, kappa, cp, ad, ad, ledoux));
        assertTrue(d > 0.0);
        double higher = ad + (0.5 + 0.5 * position) * (ledoux - ad);
        assertTrue(MixingCoefficients.semiconvective(a, t, rho, kappa, cp, higher, ad, ledoux) > d);
        assertEquals(2.0 * d, MixingCoefficients.semiconvective(2.0 * a, t, rho, kappa, cp, nabla, ad, ledoux), 1e-14 * d);
        assertEquals(8.0 * d, MixingCoefficients.semiconvective(a, 2.0 * t, rho, kappa, cp, nabla, ad, ledoux), 1e-14 * 8 * d);
        assertEquals(0.25 * d, MixingCoefficients.semiconvective(a, t, 2.0 * rho, kappa, cp, nabla, ad, ledoux), 1e-14 * d);
        assertEquals(0.5 * d, MixingCoefficients.semiconvective(a, t, rho, 2.0 * kappa, cp, nabla, ad, ledoux), 1e-14 * d);
    }

    /**
     * Thermohaline mixing (Kippenhahn, Ruschenplatt &amp; Thomas 1980; Charbonnel &amp; Zahn 2007; form
     * from memory): zero for a flat composition profile, positive for nabla_mu &lt; 0, linear in
     * -nabla_mu and in C_t, growing as nabla approaches nabla_ad from below.
     */
    @Tag(CheckKind.LAW)
    @Property(tries = 1000, seed = "62")
    void thermohaline(@ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                      @ForAll @Scale(12) @DoubleRange(min = -12, max = 6) double logRho,
                      @ForAll @Scale(12) @DoubleRange(min = -6, max = -1) double logMu,
                      @ForAll @Scale(12) @DoubleRange(min = 0.01, max = 0.99) double position,
                      @ForAll @Scale(12) @DoubleRange(min = 0.5, max = 4) double logCt) {
        double t = Math.pow(10, logT);
        double rho = Math.pow(10, logRho);
        double ad = 0.4;
        double nabla = ad * position;
        double mu = -Math.pow(10, logMu);
        double ct = Math.pow(10, logCt);
        double d = MixingCoefficients.thermohaline(ct, t, rho, 1.0, 3e8, 1.0, 1.0, mu, ad, nabla);
        assertEquals(0.0, MixingCoefficients.thermohaline(ct, t, rho, 1.0, 3e8, 1.0, 1.0, -0.0, ad, nabla), 0.0);
        assertTrue(d > 0.0);
        assertEquals(3.0 * d, MixingCoefficients.thermohaline(ct, t, rho, 1.0, 3e8, 1.0, 1.0, 3.0 * mu, ad, nabla), 1e-14 * 3 * d);
        assertEquals(2.0 * d, MixingCoefficients.thermohaline(2.0 * ct, t, rho, 1.0, 3e8, 1.0, 1.0, mu, ad, nabla), 1e-14 * 2 * d);
        double closer = ad * (0.5 + 0.5 * position);
        assertTrue(MixingCoefficients.thermohaline(ct, t, rho, 1.0, 3e8, 1.0, 1.0, mu, ad, closer) > d);
    }

    /**
     * Exponential overshoot (Freytag, Ludwig &amp; Steffen 1996; Herwig 2000; form from memory): D(0) = D_0,
     * strictly decreasing in z, D(z1 + z2) D_0 = D(z1) D(z2), and halving f squares the decay.
     */
    @Tag(CheckKind.LAW)
    @Property(tries = 1000, seed = "63")
    void overshoot(@ForAll @Scale(12) @DoubleRange(min = 0, max = 16) double logD0,
                   @ForAll @Scale(12) @DoubleRange(min = 0.001, max = 0.05) double f,
                   @ForAll @Scale(12) @DoubleRange(min = 7, max = 11) double logHp,
                   @ForAll @Scale(12) @DoubleRange(min = 0.001, max = 0.1) double z1,
                   @ForAll @Scale(12) @DoubleRange(min = 0.001, max = 0.1) double z2) {
        double d0 = Math.pow(10, logD0);
        double hp = Math.pow(10, logHp);
        double a = MixingCoefficients.overshoot(d0, z1 * hp, f, hp);
        double b = MixingCoefficients.overshoot(d0, z2 * hp, f, hp);
        double ab = MixingCoefficients.overshoot(d0, (z1 + z2) * hp, f, hp);
        assertEquals(d0, MixingCoefficients.overshoot(d0, 0.0, f, hp));
        assertTrue(a < d0);
        assertEquals(a * b / d0, ab, 1e-12 * a * b / d0 + Double.MIN_NORMAL);
        double half = MixingCoefficients.overshoot(d0, z1 * hp, 0.5 * f, hp);
        assertEquals(a * a / d0, half, 1e-12 * a * a / d0 + Double.MIN_NORMAL);
    }
}
