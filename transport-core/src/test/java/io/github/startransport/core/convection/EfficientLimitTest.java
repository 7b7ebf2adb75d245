package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.TransportException;
import io.github.startransport.spi.ZoneState;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The mixing-length solution over the whole range of doubles of the loss parameter U: the right
 * answer or a refusal, never a zone that silently turns radiative. Right means the efficient
 * (U -&gt; 0: nabla -&gt; nabla_ad with nabla - nabla_ad -&gt; (8UW/9)^(2/3)) and inefficient (U -&gt; infinity:
 * nabla -&gt; nabla_rad) limits of Kippenhahn, Weigert &amp; Weiss (2012, ch. 7, from memory).
 */
class EfficientLimitTest {

    /**
     * A zone built with U = 1 by {@link TestZones}, then moved to U = 10^logU by scaling c_P and kappa
     * (U is proportional to 1 / (c_P kappa), Kippenhahn, Weigert &amp; Weiss 2012 ch. 7), with L rescaled so
     * that nabla_rad keeps its value.
     */
    private static ZoneState zoneWithU(double logT, double rhoFraction, double logU, double w) {
        ZoneState probe = TestZones.build(logT, rhoFraction, 0.0, 1.0, 10.0, 33.0, 1.8,
                MixingLengthGeometry.BOHM_VITENSE_1958, CentreLimit.RADIUS);
        ZoneState z = TestZones.build(logT, rhoFraction, 0.0, probe.nablaAd + w, 10.0, 33.0, 1.8,
                MixingLengthGeometry.BOHM_VITENSE_1958, CentreLimit.RADIUS);
        double half = -0.5 * logU;
        z.cp *= Math.pow(10, half);
        z.opacity *= Math.pow(10, half);
        z.luminosity /= Math.pow(10, half);
        return z;
    }

    /**
     * U log-uniform over 10^-300..10^300: either an {@link InvalidInputException} on the loss parameter
     * (allowed only beyond 10^+-150, where the efficiency is not a normal double), or a convective
     * result with nabla_ad &lt;= nabla &lt;= nabla_rad and F_conv / F in [0, 1]; for U &lt;= 1e-6 nabla -
     * nabla_ad within 2 U^(2/3) / (kW)^(1/3) (relative) of (8UW/9)^(2/3), the first correction of the
     * expansion of the cubic (x = (kUW)^(1/3) (1 - kU / (3x) ...), nabla - nabla_ad = x^2 + 2Ux; re-derived),
     * where it is resolved above the rounding of nabla; for U &gt;= 1e6 (nabla_rad - nabla) / W below 1e-4.
     */
    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 3000, seed = "1101")
    void rightAnswerOrRefusalOverEveryU(@ForAll @Scale(12) @DoubleRange(min = -300, max = 300) double logU,
                                        @ForAll @Scale(12) @DoubleRange(min = 3.5, max = 9) double logT,
                                        @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                                        @ForAll @Scale(12) @DoubleRange(min = -3, max = 1) double logW) {
        double w = Math.pow(10, logW);
        ZoneState z = zoneWithU(logT, rhoFraction, logU, w);
        ConvectionResult out = new ConvectionResult();
        try {
            new LocalMixingLength().solve(z, out);
        } catch (InvalidInputException e) {
            assertEquals("lossParameter", e.field(), e.getMessage());
            assertTrue(Math.abs(logU) > 150, "refused inside the representable range: " + e.getMessage());
            return;
        }
        assertEquals(Regime.CONVECTIVE, out.regime);
        double u = Math.pow(10, logU);
        assertEquals(1.0, out.lossParameter / u, 1e-9);
        double wz = out.nablaRad - z.nablaAd;
        assertTrue(out.nabla >= z.nablaAd && out.nabla <= out.nablaRad, out::toString);
        assertTrue(out.convectiveFraction >= 0.0 && out.convectiveFraction <= 1.0, out::toString);
        double k = 8.0 / 9.0;
        if (logU <= -6) {
            double asymptote = Math.pow(k * u * wz, 2.0 / 3.0);
            double rounding = 4.0 * Math.ulp(out.nabla);
            double bound = 2.0 * Math.pow(u, 2.0 / 3.0) / Math.cbrt(k * wz);
            assertEquals(asymptote, out.nabla - z.nablaAd, bound * asymptote + rounding, out::toString);
            assertTrue(out.nabla - z.nablaAd < 1e-3 * wz);
        }
        if (logU >= 6) {
            assertTrue(out.nablaRad - out.nabla <= 1e-4 * wz, out::toString);
        }
    }

    /** The values the review found: c_P = 1e152 and 3e152 (U about 1e-152): the adiabatic limit, or a refusal. */
    @Tag(CheckKind.LAW)
    @Test
    void largeHeatCapacityGivesTheAdiabaticGradientOrARefusal() {
        for (double factor : new double[] {1e150, 1e152, 3e152, 1e160}) {
            ZoneState z = zoneWithU(6.0, 0.5, 0.0, 1.0);
            z.cp *= factor;
            ConvectionResult out = new ConvectionResult();
            try {
                new LocalMixingLength().solve(z, out);
                assertEquals(Regime.CONVECTIVE, out.regime);
                assertEquals(z.nablaAd, out.nabla, 1e-12, out::toString);
                // all the flux beyond what nabla_ad carries by radiation: F_conv / F = 1 - nabla_ad / nabla_rad
                assertTrue(out.velocity > 0.0, out::toString);
                assertEquals(1.0 - z.nablaAd / out.nablaRad, out.convectiveFraction, 1e-12, out::toString);
            } catch (InvalidInputException e) {
                assertEquals("lossParameter", e.field());
                assertTrue(factor > 1e152, "U = " + out.lossParameter + " should still be solved");
            }
        }
        ZoneState z = zoneWithU(6.0, 0.5, 0.0, 1.0);
        z.cp *= 1e160;
        assertThrows(InvalidInputException.class, () -> new LocalMixingLength().solve(z, new ConvectionResult()));
    }

    /**
     * 3e5 random zones in the style of the hot-path fuzz test (T, rho, P, kappa, c_P, L, m, r log-uniform
     * over wide ranges, nabla_ad in (0, 1), nabla_mu of either sign, both variants): every accepted
     * convective zone with W = nabla_rad - nabla_ad &gt; 0 has 0 &lt;= F_conv / F &lt;= 1 and
     * F_conv / F + F_rad / F = 1 to 1e-12 (fractions of one flux; exact identity of the theory); a zone
     * convecting with W &lt;= 0 carries its convective flux inwards (F_conv / F has the sign of -L).
     */
    @Tag(CheckKind.LAW)
    @Test
    void convectiveFractionStaysInItsRangeOverFuzzedZones() {
        SplittableRandom rnd = new SplittableRandom(1102);
        List<ConvectionModel> models = List.of(new LocalMixingLength(), new TransparentEddyMixingLength());
        ZoneState z = new ZoneState();
        ConvectionResult out = new ConvectionResult();
        int convective = 0;
        int inverted = 0;
        for (int i = 0; i < 300_000; i++) {
            z.temperature = Math.pow(10, rnd.nextDouble(3, 9));
            z.density = Math.pow(10, rnd.nextDouble(-12, 6));
            z.pressure = Math.pow(10, rnd.nextDouble(2, 20));
            z.opacity = Math.pow(10, rnd.nextDouble(-4, 6));
            z.cp = Math.pow(10, rnd.nextDouble(6, 12));
            z.luminosity = (rnd.nextInt(8) == 0 ? -1 : 1) * Math.pow(10, rnd.nextDouble(28, 40));
            z.mass = Math.pow(10, rnd.nextDouble(28, 35));
            z.radius = Math.pow(10, rnd.nextDouble(6, 12));
            z.nablaAd = rnd.nextDouble(0.05, 0.95);
            z.delta = Math.pow(10, rnd.nextDouble(-0.5, 1));
            z.phi = 1.0;
            z.nablaMu = rnd.nextInt(3) == 0 ? -Math.pow(10, rnd.nextDouble(-6, 0.5)) : rnd.nextDouble(0, 0.5);
            ConvectionModel model = models.get(i & 1);
            try {
                model.solve(z, out);
            } catch (TransportException e) {
                continue;
            }
            if (out.regime != Regime.CONVECTIVE) {
                continue;
            }
            convective++;
            double w = out.nablaRad - z.nablaAd;
            double f = out.convectiveFraction;
            if (w > 0.0) {
                assertTrue(f >= 0.0 && f <= 1.0, "F_conv/F = " + f + " for " + z + ": " + out);
                assertEquals(1.0, f + out.radiativeFraction, 1e-12, out::toString);
            } else {
                inverted++;
                assertTrue(f * Math.signum(z.luminosity) <= 0.0, out::toString);
            }
        }
        // the sample reaches both kinds of convective zone
        assertTrue(convective > 30_000 && inverted > 1_000, convective + " convective, " + inverted + " with W <= 0");
    }
}
