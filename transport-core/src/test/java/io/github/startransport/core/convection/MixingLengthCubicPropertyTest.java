package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Tag;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Laws of the dimensionless mixing-length cubic over U in 1e-8..1e8. */
class MixingLengthCubicPropertyTest {
    private static final double KWW_A0 = 9.0 / 4.0;
    private static final double KWW_K = 8.0 / 9.0;

    /** The root satisfies a0 Gamma^3 + Gamma^2 + Gamma = S to 1e-12 relative (to S, the sum of the positive terms). */
    @Tag(CheckKind.INTERNAL)
    @Property(tries = 2000, seed = "31")
    void residualIsBelow1e12(@ForAll @Scale(12) @DoubleRange(min = -8, max = 8) double logU,
                             @ForAll @Scale(12) @DoubleRange(min = -9, max = 1) double logW,
                             @ForAll @Scale(12) @DoubleRange(min = -3, max = 0) double logLoss) {
        double u = Math.pow(10, logU);
        double uLoss = Math.pow(10, logLoss) * u;
        double a0 = 2.0 * uLoss / (KWW_K * u);
        double s = Math.pow(10, logW) / (4.0 * uLoss * uLoss);
        double gamma = MixingLengthCubic.efficiency(a0, s);
        assertTrue(gamma > 0.0);
        assertTrue(Math.abs(MixingLengthCubic.residual(a0, s, gamma)) <= 1e-12 * s);
    }

    /**
     * nabla agrees to 1e-10 with the root of the textbook x-cubic (Kippenhahn, Weigert &amp; Weiss
     * 2012, ch. 7) found by Commons Math's LaguerreSolver.
     */
    @Tag(CheckKind.EXTERNAL)
    @Property(tries = 2000, seed = "32")
    void agreesWithCommonsMathLaguerre(@ForAll @Scale(12) @DoubleRange(min = -8, max = 8) double logU,
                                       @ForAll @Scale(12) @DoubleRange(min = -6, max = 1) double logW,
                                       @ForAll @Scale(12) @DoubleRange(min = 0.25, max = 0.4) double nablaAd) {
        double u = Math.pow(10, logU);
        double w = Math.pow(10, logW);
        double gamma = MixingLengthCubic.efficiency(KWW_A0, w / (4.0 * u * u));
        double ours = nablaAd + w * MixingLengthCubic.superadiabaticShare(KWW_A0, gamma);
        double x = TestZones.commonsMathRoot(KWW_K, u, u, w);
        double peer = nablaAd + x * x + 2.0 * u * x;
        assertEquals(peer, ours, 1e-10 * peer);
    }

    /**
     * Efficient limit U -&gt; 0 (Kippenhahn, Weigert &amp; Weiss 2012 §7.3: nabla -&gt; nabla_ad): from the
     * cubic, nabla - nabla_ad -&gt; (8UW/9)^(2/3), with a relative correction of order 1/Gamma.
     */
    @Tag(CheckKind.LAW)
    @Property(tries = 500, seed = "33")
    void efficientLimit(@ForAll @Scale(12) @DoubleRange(min = -8, max = -5) double logU,
                        @ForAll @Scale(12) @DoubleRange(min = -3, max = 1) double logW) {
        double u = Math.pow(10, logU);
        double w = Math.pow(10, logW);
        double gamma = MixingLengthCubic.efficiency(KWW_A0, w / (4.0 * u * u));
        double excess = w * MixingLengthCubic.superadiabaticShare(KWW_A0, gamma);
        double limit = Math.pow(8.0 * u * w / 9.0, 2.0 / 3.0);
        double leadingGamma = Math.cbrt(w / (9.0 * u * u)); // (S / a0)^(1/3)
        assertEquals(1.0, excess / limit, 2.0 / leadingGamma);
    }

    /**
     * Inefficient limit U -&gt; infinity (Cox &amp; Giuli 1968 ch. 14: Gamma -&gt; A^2 W, with A = 1/(2U); from
     * memory): nabla -&gt; nabla_rad, and nabla_rad - nabla -&gt; a0 S^2 W with a relative correction of order S.
     */
    @Tag(CheckKind.LAW)
    @Property(tries = 500, seed = "34")
    void inefficientLimit(@ForAll @Scale(12) @DoubleRange(min = 3, max = 8) double logU,
                          @ForAll @Scale(12) @DoubleRange(min = -6, max = 1) double logW) {
        double u = Math.pow(10, logU);
        double w = Math.pow(10, logW);
        double s = w / (4.0 * u * u);
        double gamma = MixingLengthCubic.efficiency(KWW_A0, s);
        assertEquals(1.0, gamma / s, 4.0 * s);
        double deficit = w * MixingLengthCubic.convectiveShare(KWW_A0, gamma);
        assertEquals(1.0, deficit / (KWW_A0 * s * s * w), 8.0 * s);
    }

    /** Onset W -&gt; 0+: nabla -&gt; nabla_rad (= nabla_ad at W = 0); the deficit is bounded by a0 S^2 W since Gamma &lt;= S. */
    @Tag(CheckKind.LAW)
    @Property(tries = 500, seed = "35")
    void continuousThroughOnset(@ForAll @Scale(12) @DoubleRange(min = -4, max = 4) double logU,
                                @ForAll @Scale(12) @DoubleRange(min = -14, max = -6) double logW) {
        double u = Math.pow(10, logU);
        double w = Math.pow(10, logW);
        double s = w / (4.0 * u * u);
        double gamma = MixingLengthCubic.efficiency(KWW_A0, s);
        double deficit = w * MixingLengthCubic.convectiveShare(KWW_A0, gamma);
        assertTrue(deficit <= KWW_A0 * s * s * w * (1.0 + 1e-12));
        assertTrue(deficit <= w);
        assertEquals(0.0, MixingLengthCubic.efficiency(KWW_A0, 0.0));
    }
}
