package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.InvalidInputException;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.Arrays;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Overshoot applied across a profile, on synthetic grids whose answer is known in closed form: the
 * exponential of Freytag, Ludwig &amp; Steffen (1996) and Herwig (2000), D = D_0 exp(-2 z / (f H)), with
 * z counted from r_0 = edge -+ f0 H as described by Anders &amp; Pedersen (2023, Galaxies 11, 56; from
 * memory), and the step of length alpha_ov H.
 */
class OvershootMixingTest {
    private static final int N = 2001;
    private static final double R = 1e11;
    private static final double HP = 1e10;
    private static final double D_CONV = 1e12;

    /** r = (k + 1) R / N, constant H_P. */
    private static double[] radius() {
        double[] r = new double[N];
        for (int k = 0; k < N; k++) {
            r[k] = (k + 1.0) * R / N;
        }
        return r;
    }

    private static double[] constant(double v) {
        double[] a = new double[N];
        Arrays.fill(a, v);
        return a;
    }

    /** D = D_CONV where bottom &lt;= r &lt;= top for any of the regions, 0 elsewhere. */
    private static double[] convective(double[] r, double[] bottoms, double[] tops) {
        double[] d = new double[N];
        for (int k = 0; k < N; k++) {
            for (int i = 0; i < bottoms.length; i++) {
                if (r[k] >= bottoms[i] && r[k] <= tops[i]) {
                    d[k] = D_CONV;
                }
            }
        }
        return d;
    }

    private record Result(double[] d, double[] reachBottom, double[] reachTop) {
    }

    private static Result run(double[] r, double[] hp, double[] d, double[] bottoms, double[] tops, double f,
                              double f0, double step, double floor) {
        double[] out = new double[r.length];
        double[] rb = new double[bottoms.length];
        double[] rt = new double[bottoms.length];
        OvershootMixing.profile(r, hp, d, bottoms, tops, f, f0, step, floor, out, rb, rt);
        return new Result(out, rb, rt);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void exponentialAboveACoreFollowsTheClosedFormFromR0() {
        double[] r = radius();
        double top = 0.4 * R + 0.3 * R / N; // between two zones
        double[] d = convective(r, new double[] {0.0}, new double[] {top});
        double f = 0.016;
        double f0 = 0.005;
        double floor = 1e-2;
        Result res = run(r, constant(HP), d, new double[] {0.0}, new double[] {top}, f, f0, 0.0, floor);
        double r0 = top - f0 * HP; // the core (0.4 R = 4e10) is larger than H_P: H = H_P
        for (int k = 0; k < N; k++) {
            // D_ov(r) = D_0 exp(-2 (r - r_0) / (f H)) beyond r_0 down to the floor (Herwig 2000, eq. 2, from memory)
            double z = r[k] - r0;
            double expected = z < 0 ? 0.0 : D_CONV * Math.exp(-2.0 * z / (f * HP));
            if (expected < floor) {
                expected = 0.0;
            }
            assertEquals(expected, res.d()[k], 1e-12 * D_CONV, "zone " + k);
        }
        // where the exponential reaches the floor: r_0 + (f H / 2) ln(D_0 / floor)
        assertEquals(r0 + 0.5 * f * HP * Math.log(D_CONV / floor), res.reachTop()[0], 1e-9 * R);
        assertTrue(Double.isNaN(res.reachBottom()[0]), "no edge at the centre");
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void atTheEdgeItselfTheCoefficientIsD0TimesExpOfMinusTwoF0OverF() {
        // place the edge exactly on a zone so that the zone sits at z = f0 H from r_0
        double[] r = radius();
        int kEdge = 1200;
        double bottom = r[kEdge];
        double[] d = convective(r, new double[] {bottom}, new double[] {R});
        double f = 0.02;
        double f0 = 0.004;
        Result res = run(r, constant(HP), d, new double[] {bottom}, new double[] {R}, f, f0, 0.0, 1e-2);
        // the point f0 H inside lies between two convective zones: D_0 = D_CONV, and the edge zone is f0 H from r_0
        assertEquals(D_CONV * Math.exp(-2.0 * f0 / f), res.d()[kEdge], 1e-12 * D_CONV);
        assertTrue(Double.isNaN(res.reachTop()[0]), "no edge at the surface");
        assertTrue(res.reachBottom()[0] < bottom);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void stepMixesAtD0UpToAlphaHBeyondTheEdgeAndNotFurther() {
        double[] r = radius();
        double bottom = 0.6 * R + 0.5 * R / N;
        double[] d = convective(r, new double[] {bottom}, new double[] {R});
        double alpha = 0.2;
        Result res = run(r, constant(HP), d, new double[] {bottom}, new double[] {R}, 0.0, 0.005, alpha, 1e-2);
        double end = bottom - alpha * HP;
        for (int k = 0; k < N; k++) {
            boolean inStep = r[k] >= end && r[k] <= bottom + 0.005 * HP;
            assertEquals(inStep ? D_CONV : 0.0, res.d()[k], "zone " + k + " at r = " + r[k]);
        }
        assertEquals(end, res.reachBottom()[0], 1e-9 * R);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void aCoreSmallerThanHpOvershootsInUnitsOfItsOwnRadius() {
        // a core of 0.02 R = 2e9 cm under H_P = 1e10 cm: H = min(H_P, r_core) = r_core (common practice, no source)
        double[] r = radius();
        double top = 0.02 * R + 0.5 * R / N;
        double[] d = convective(r, new double[] {0.0}, new double[] {top});
        double alpha = 0.5;
        Result res = run(r, constant(HP), d, new double[] {0.0}, new double[] {top}, 0.0, 0.0, alpha, 1e-2);
        assertEquals(top + alpha * top, res.reachTop()[0], 1e-9 * R);
        Result unlimited = run(r, constant(0.1 * top), d, new double[] {0.0}, new double[] {top}, 0.0, 0.0, alpha,
                1e-2);
        assertEquals(top + alpha * 0.1 * top, unlimited.reachTop()[0], 1e-9 * R, "H_P below the core's radius is used");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void withoutOvershootEveryZoneIsZeroAndNoReachIsReported() {
        double[] r = radius();
        double[] d = convective(r, new double[] {0.0, 0.8 * R}, new double[] {0.3 * R, R});
        Result res = run(r, constant(HP), d, new double[] {0.0, 0.8 * R}, new double[] {0.3 * R, R}, 0.0, 0.005, 0.0,
                1e-2);
        for (double v : res.d()) {
            assertEquals(0.0, v);
        }
        for (int i = 0; i < 2; i++) {
            assertTrue(Double.isNaN(res.reachBottom()[i]) && Double.isNaN(res.reachTop()[i]));
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void aStartingCoefficientAtOrBelowTheFloorGivesNoOvershoot() {
        double[] r = radius();
        double top = 0.5 * R;
        double[] d = new double[N];
        for (int k = 0; k < N; k++) {
            d[k] = r[k] <= top ? 1e-3 : 0.0;
        }
        Result res = run(r, constant(HP), d, new double[] {0.0}, new double[] {top}, 0.016, 0.005, 0.0, 1e-2);
        assertEquals(top, res.reachTop()[0]);
        for (int k = 0; k < N; k++) {
            assertEquals(0.0, res.d()[k]);
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void twoEdgesReachingTheSameZonesKeepTheLargerCoefficient() {
        double[] r = radius();
        double[] bottoms = {0.0, 0.505 * R};
        double[] tops = {0.495 * R, R};
        double[] d = convective(r, bottoms, tops);
        double f = 0.1;
        Result both = run(r, constant(HP), d, bottoms, tops, f, 0.0, 0.0, 1e-2);
        Result lower = run(r, constant(HP), d, new double[] {bottoms[0]}, new double[] {tops[0]}, f, 0.0, 0.0, 1e-2);
        Result upper = run(r, constant(HP), d, new double[] {bottoms[1]}, new double[] {tops[1]}, f, 0.0, 0.0, 1e-2);
        for (int k = 0; k < N; k++) {
            assertEquals(Math.max(lower.d()[k], upper.d()[k]), both.d()[k], "zone " + k);
        }
    }

    /** The exponential falls by e^-2 over each f H (Freytag, Ludwig &amp; Steffen 1996): a law on any grid. */
    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 200, seed = "15")
    void coefficientFallsByEToTheMinusTwoPerFH(@ForAll @DoubleRange(min = 0.005, max = 0.05) @Scale(6) double f,
                                               @ForAll @DoubleRange(min = 0.1, max = 0.6) @Scale(6) double top) {
        double[] r = radius();
        double edge = top * R + 0.37 * R / N;
        double[] d = convective(r, new double[] {0.0}, new double[] {edge});
        Result res = run(r, constant(HP), d, new double[] {0.0}, new double[] {edge}, f, 0.005, 0.0, 1e-30);
        int k = 1;
        while (r[k] < edge) {
            k++;
        }
        // zones beyond the edge: D(r + dr) / D(r) = exp(-2 dr / (f H))
        for (int j = k; j < k + 20 && res.d()[j + 1] > 0; j++) {
            double ratio = res.d()[j + 1] / res.d()[j];
            assertEquals(Math.exp(-2.0 * (r[j + 1] - r[j]) / (f * HP)), ratio, 1e-12);
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void badColumnsAndSettingsAreRefusedNamingTheFieldAndZone() {
        double[] r = radius();
        double[] d = convective(r, new double[] {0.0}, new double[] {0.3 * R});
        double[] hp = constant(HP);
        double[] one = {0.0};
        double[] top = {0.3 * R};
        double[] out = new double[N];
        double[] a = new double[1];
        double[] b = new double[1];
        InvalidInputException both = assertThrows(InvalidInputException.class, () -> OvershootMixing.profile(r, hp, d,
                one, top, 0.016, 0.005, 0.2, 1e-2, out, a, b));
        assertEquals("overshoot-step", both.field());
        double[] badR = r.clone();
        badR[7] = badR[6];
        InvalidInputException order = assertThrows(InvalidInputException.class, () -> OvershootMixing.profile(badR, hp,
                d, one, top, 0.016, 0.005, 0.0, 1e-2, out, a, b));
        assertEquals("radius", order.field());
        assertEquals(7, order.zone());
        double[] badD = d.clone();
        badD[3] = -1.0;
        InvalidInputException negative = assertThrows(InvalidInputException.class, () -> OvershootMixing.profile(r, hp,
                badD, one, top, 0.016, 0.005, 0.0, 1e-2, out, a, b));
        assertEquals("diffusion", negative.field());
        assertEquals(3, negative.zone());
        assertThrows(InvalidInputException.class, () -> OvershootMixing.profile(r, hp, d, one, top, 0.016, 1.0, 0.0,
                1e-2, out, a, b));
        assertThrows(InvalidInputException.class, () -> OvershootMixing.profile(r, hp, d, one, top, 0.016, 0.005, 0.0,
                1e-2, new double[N - 1], a, b));
        assertThrows(InvalidInputException.class, () -> OvershootMixing.profile(r, hp, d, new double[] {0.5 * R},
                new double[] {0.4 * R}, 0.016, 0.005, 0.0, 1e-2, out, a, b));
    }
}
