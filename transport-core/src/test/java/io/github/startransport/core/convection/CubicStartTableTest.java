package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The table start of the mixing-length cubic (one table per geometry, two Halley steps after it)
 * against the root found by Commons Math's LaguerreSolver (through {@link TestZones#commonsMathRoot}), and the cubic's residual over the whole
 * range the table covers.
 */
class CubicStartTableTest {

    /**
     * Gamma from the textbook x-cubic x^3 + k U x^2 + 2 k U^2 x - k U W = 0 (Kippenhahn, Weigert &amp;
     * Weiss 2012, ch. 7) solved by Commons Math ({@link TestZones#commonsMathRoot}), with W = 1 and
     * U = 1 / (2 sqrt(S)), so that S = W / (4 U^2) and Gamma = x / (2 U).
     */
    private static double commonsMathGamma(MixingLengthGeometry geometry, double s) {
        double u = 0.5 / Math.sqrt(s);
        return TestZones.commonsMathRoot(geometry.cubicFactor(), u, u, 1.0) / (2.0 * u);
    }

    /** Chord start at S, as the solver forms it (same bit arithmetic; the bound is what is checked). */
    private static double start(double[] table, double s) {
        long bits = Double.doubleToRawLongBits(s);
        int i = (int) (bits >>> 52) - (1023 + MixingLengthCubic.TABLE_MIN_EXPONENT);
        double fraction = Double.longBitsToDouble((bits & 0x000FFFFFFFFFFFFFL) | 0x3FF0000000000000L) - 1.0;
        return Math.fma(table[2 * i + 1], fraction, table[2 * i]);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void tableStartAndRootAgreeWithCommonsMathLaguerre() {
        for (MixingLengthGeometry geometry : MixingLengthGeometry.values()) {
            double a0 = geometry.cubicCoefficient();
            double[] table = geometry.cubicStarts();
            double worstStart = 0.0;
            // S from 1e-10 to 1e20 in steps of about 1/60 of a decade, crossing every binade several times
            for (double ls = -10.0; ls <= 20.0; ls += 0.01713) {
                double s = Math.pow(10.0, ls);
                double peer = commonsMathGamma(geometry, s);
                double root = MixingLengthCubic.efficiency(a0, s, table);
                assertTrue(Math.abs(root - peer) <= 1e-11 * peer,
                        geometry + ": S = " + s + ", ours " + root + ", Commons Math " + peer);
                worstStart = Math.max(worstStart, Math.abs(start(table, s) - peer) / peer);
            }
            // two Halley steps reach rounding from within 2.5 % (relative error about 0.14 e^3 per step,
            // see MixingLengthCubic.HALLEY_STEPS)
            assertTrue(worstStart <= 0.025, geometry + ": worst start error " + worstStart);
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void tableRootSatisfiesTheCubicOverTheWholeTableRange() {
        for (MixingLengthGeometry geometry : MixingLengthGeometry.values()) {
            double a0 = geometry.cubicCoefficient();
            double[] table = geometry.cubicStarts();
            for (double ls = -279.9; ls < 149.9; ls += 0.00731) {
                double s = Math.pow(10.0, ls);
                double root = MixingLengthCubic.efficiency(a0, s, table);
                // residual relative to the largest term: rounding only (common practice, no source)
                double scale = Math.max(s, root);
                assertTrue(root > 0.0 && Math.abs(MixingLengthCubic.residual(a0, s, root)) <= 1e-14 * scale,
                        geometry + ": S = " + s + ", Gamma = " + root);
            }
            // outside the table: the general solve (0 for S <= 0)
            assertTrue(MixingLengthCubic.efficiency(a0, 0.0, table) == 0.0);
            assertTrue(MixingLengthCubic.efficiency(a0, -1.0, table) == 0.0);
            assertTrue(MixingLengthCubic.efficiency(a0, Double.NaN, table) == 0.0);
            double tiny = 1e-300;
            assertTrue(Math.abs(MixingLengthCubic.efficiency(a0, tiny, table) - tiny) <= 1e-15 * tiny);
        }
    }
}
