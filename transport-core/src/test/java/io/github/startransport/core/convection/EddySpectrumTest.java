package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneState;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The full-spectrum convection model against the published fit of Canuto &amp; Mazzitelli (1991, ApJ 370, 295;
 * constants from memory), its limits, the flux equation F_rad + F_conv = F, Commons Math's root, mixing-length
 * theory where the two theories must agree, and central differences for every Jacobian entry.
 */
class EddySpectrumTest {

    private static ConvectionModel model(double alpha, Criterion criterion, LengthScale scale) {
        return new EddySpectrumConvection(alpha, criterion, scale);
    }

    /** A convective zone of the synthetic family of {@link TestZones}: U (textbook, l = alpha min(H_P, r)) and W given. */
    private static ZoneState zone(double logT, double rhoFraction, double logU, double w, double logR, double logM,
                                  double alpha) {
        ZoneState probe = TestZones.build(logT, rhoFraction, logU, 1.0, logR, logM, alpha,
                MixingLengthGeometry.BOHM_VITENSE_1958, CentreLimit.RADIUS);
        return TestZones.build(logT, rhoFraction, logU, probe.nablaAd + w, logR, logM, alpha,
                MixingLengthGeometry.BOHM_VITENSE_1958, CentreLimit.RADIUS);
    }

    // ---- the fit ----

    @Tag(CheckKind.LAW)
    @Test
    void theRememberedExponentsGiveTheLimitsOfLocalTheory() {
        // Phi ~ S^2 (inefficient) and Phi ~ S^(1/2) (efficient): the exponents k + n and k + m n of the fit
        assertEquals(2.0, SpectrumFlux.K + SpectrumFlux.N, 1e-4);
        assertEquals(0.5, SpectrumFlux.K + SpectrumFlux.M * SpectrumFlux.N, 1e-5);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void phiEqualsTheFitAsWrittenWhereThatHasNoCancellation() {
        for (double s = 1e-1; s < 1e12; s *= 1.7) {
            assertEquals(SpectrumFlux.phiAsWritten(s), SpectrumFlux.phi(s), 2e-13 * SpectrumFlux.phiAsWritten(s),
                    "S = " + s);
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void phiApproachesThePapersLimits() {
        // inefficient: (1 + x)^m - 1 = m x (1 + (m - 1) x / 2 + ...), so Phi / (a (m b)^n S^(k + n)) - 1
        // = n (m - 1) b S / 2 to first order (expansion of the published formula)
        for (double s = 1e-12; s < 1e-3; s *= 3) {
            double ratio = SpectrumFlux.phi(s) / (SpectrumFlux.INEFFICIENT_COEFFICIENT
                    * Math.pow(s, SpectrumFlux.K + SpectrumFlux.N));
            double first = SpectrumFlux.N * (SpectrumFlux.M - 1.0) * SpectrumFlux.B * s / 2.0;
            // the second-order term is (n (m - 1)(m - 2)/6 + n (n - 1)(m - 1)^2/8) x^2 = 0.58 x^2, about first^2
            assertEquals(1.0 + first, ratio, 2.0 * first * first + 1e-14, "S = " + s);
        }
        // efficient: Phi / (a b^(m n) S^(k + m n)) -> 1 as S -> infinity, the deviation falling as S^-m
        double previous = Double.POSITIVE_INFINITY;
        for (double s = 1e6; s <= 1e30; s *= 100) {
            double deviation = Math.abs(SpectrumFlux.phi(s) / (SpectrumFlux.EFFICIENT_COEFFICIENT
                    * Math.pow(s, SpectrumFlux.K + SpectrumFlux.M * SpectrumFlux.N)) - 1.0);
            assertTrue(deviation < previous, "S = " + s);
            previous = deviation;
        }
        assertTrue(previous < 1e-4, "deviation at S = 1e30: " + previous);
        // the fit's two limit coefficients a (m b)^n and a b^(m n), computed from the constants separately
        // (Python, double precision): 0.0154496 and 11.0095
        assertEquals(0.0154496, SpectrumFlux.INEFFICIENT_COEFFICIENT, 1e-7);
        assertEquals(11.0095, SpectrumFlux.EFFICIENT_COEFFICIENT, 1e-4);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void slopeOfPhiIsTheLogarithmicDerivativeOfTheFit() {
        for (double s = 1e-6; s < 1e12; s *= 2.3) {
            double h = 1e-6;
            double fd = (Math.log(SpectrumFlux.phi(s * Math.exp(h))) - Math.log(SpectrumFlux.phi(s * Math.exp(-h))))
                    / (2 * h);
            assertEquals(fd, SpectrumFlux.logSlope(s), 1e-8, "S = " + s);
            // between the exponents of the two limits, k + m n and k + n
            assertTrue(SpectrumFlux.logSlope(s) > SpectrumFlux.K + SpectrumFlux.M * SpectrumFlux.N - 1e-12
                    && SpectrumFlux.logSlope(s) < SpectrumFlux.K + SpectrumFlux.N + 1e-12, "S = " + s);
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void theMixingLengthPhiTurnsTheFluxEquationIntoTheCubic() {
        // with S = 162 Gamma (Gamma + 1): S (1 + Phi_MLT(S)) = 162 (a0 Gamma^3 + Gamma^2 + Gamma), a0 = 9/4
        // (Cox & Giuli 1968, ch. 14; the cubic of Kippenhahn, Weigert & Weiss 2012, ch. 7)
        for (double gamma = 1e-4; gamma < 1e5; gamma *= 3.1) {
            double s = 162.0 * gamma * (gamma + 1.0);
            double cubic = 162.0 * ((2.25 * gamma + 1.0) * gamma + 1.0) * gamma;
            assertEquals(cubic, s * (1.0 + SpectrumFlux.mixingLengthPhi(s)), 1e-9 * cubic, "Gamma = " + gamma);
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void theFullSpectrumCarriesMoreFluxThanOneEddyAtEveryEfficiency() {
        // CM91's central result (from memory): Phi_CM > Phi_MLT at the same S
        for (double s = 1e-8; s < 1e16; s *= 1.9) {
            assertTrue(SpectrumFlux.phi(s) > SpectrumFlux.mixingLengthPhi(s), "S = " + s);
        }
    }

    // ---- the root ----

    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 300, seed = "91")
    void tableStartIsWithinTwoPartsInTenToTheEightOfTheRoot(
            @ForAll @Scale(9) @DoubleRange(min = -40, max = 79.99) double rho) {
        assertEquals(SpectrumFlux.solveFully(rho), SpectrumFlux.start(rho), 2e-8);
    }

    @net.jqwik.api.Tag(CheckKind.EXTERNAL)
    @Property(tries = 200, seed = "92")
    void rootAgreesWithCommonsMathBrent(@ForAll @Scale(9) @DoubleRange(min = -2, max = 60) double rho) {
        // h(sigma) = sigma + ln(1 + Phi(e^sigma)) - rho with the fit as written (no cancellation for S > 0.1)
        BrentSolver brent = new BrentSolver(1e-14, 1e-15);
        double root = brent.solve(500, sigma -> sigma + Math.log1p(SpectrumFlux.phiAsWritten(Math.exp(sigma))) - rho,
                -5.0, rho + 1.0);
        assertEquals(root, SpectrumFlux.solveFully(rho), 1e-11);
    }

    // ---- a zone ----

    /** F_rad + F_conv = F with the fit as written: nabla_rad - nabla = Phi(S) (nabla - nabla_ad), S = 40.5 (nabla - nabla_ad) / U^2. */
    @net.jqwik.api.Tag(CheckKind.EXTERNAL)
    @Property(tries = 300, seed = "93")
    void fluxEquationHolds(@ForAll @Scale(9) @DoubleRange(min = 3.7, max = 8) double logT,
                           @ForAll @Scale(9) @DoubleRange(min = 0, max = 1) double rhoFraction,
                           @ForAll @Scale(9) @DoubleRange(min = -8, max = 2) double logU,
                           @ForAll @Scale(9) @DoubleRange(min = -3, max = 1) double logW) {
        ZoneState z = zone(logT, rhoFraction, logU, Math.pow(10, logW), 10, 33, 1.0);
        ConvectionResult out = new ConvectionResult();
        model(1.0, Criterion.SCHWARZSCHILD, LengthScale.SCALE_HEIGHT).solve(z, out);
        assertEquals(Regime.CONVECTIVE, out.regime);
        // S from the efficiency (Gamma (Gamma + 1) = S / 162), which carries it to rounding; nabla - nabla_ad
        // itself is read back with an absolute error of ~1e-16 nabla_ad
        double g = out.efficiency;
        double s = 162.0 * g * (g + 1.0);
        Assume.that(s > 0.1);
        double u2 = out.lossParameter * out.lossParameter;
        double phi = SpectrumFlux.phiAsWritten(s);
        double w = out.nablaRad - z.nablaAd;
        assertEquals(SpectrumFlux.S_PER_EXCESS * w / u2, s * (1.0 + phi), 1e-12 * s * (1.0 + phi));
        assertEquals(s * u2 / SpectrumFlux.S_PER_EXCESS, out.nabla - z.nablaAd, 1e-12 * w + 4e-16 * z.nablaAd);
        // F_conv / F = K (T / H_P)(nabla - nabla_ad) Phi / (K (T / H_P) nabla_rad) (Canuto & Mazzitelli 1991), with
        // nabla - nabla_ad = W / (1 + Phi) from the flux equation
        assertEquals(phi / (1.0 + phi) * w / out.nablaRad, out.convectiveFraction, 1e-12);
        assertTrue(out.nabla > z.nablaAd && out.nabla < out.nablaRad);
    }

    @Tag(CheckKind.LAW)
    @Test
    void efficientLimitApproachesTheAdiabatAsTheAsymptoteSays() {
        // U -> 0: S (1 + Phi) = R with Phi -> c S^(1/2): S -> (R / c)^(2/3), nabla - nabla_ad = S U^2 / 40.5
        double previous = Double.POSITIVE_INFINITY;
        for (double logU = -4; logU >= -10; logU -= 2) {
            ZoneState z = zone(6.5, 0.5, logU, 0.3, 10, 33, 1.0);
            ConvectionResult out = new ConvectionResult();
            model(1.0, Criterion.SCHWARZSCHILD, LengthScale.SCALE_HEIGHT).solve(z, out);
            double u = out.lossParameter;
            double r = SpectrumFlux.S_PER_EXCESS * 0.3 / (u * u);
            double asymptote = Math.pow(r / SpectrumFlux.EFFICIENT_COEFFICIENT, 2.0 / 3.0) * u * u / SpectrumFlux.S_PER_EXCESS;
            double deviation = Math.abs((out.nabla - z.nablaAd) / asymptote - 1.0);
            assertTrue(deviation < previous, "U = " + u + ": " + deviation);
            previous = deviation;
        }
        assertTrue(previous < 1e-2, "deviation at U = 1e-10: " + previous);
    }

    @Tag(CheckKind.LAW)
    @Test
    void inefficientLimitApproachesTheRadiativeGradientAsTheAsymptoteSays() {
        // U -> infinity: S -> R, Phi -> c0 R^2, so F_conv / F = Phi (nabla - nabla_ad) / nabla_rad -> c0 R^2 W / nabla_rad
        // and nabla -> nabla_rad
        for (double logU = 2; logU <= 6; logU += 2) {
            ZoneState z = zone(5.0, 0.3, logU, 0.5, 10, 33, 1.0);
            ConvectionResult out = new ConvectionResult();
            model(1.0, Criterion.SCHWARZSCHILD, LengthScale.SCALE_HEIGHT).solve(z, out);
            double u = out.lossParameter;
            double r = SpectrumFlux.S_PER_EXCESS * 0.5 / (u * u);
            double expected = SpectrumFlux.INEFFICIENT_COEFFICIENT * r * r * 0.5 / out.nablaRad;
            assertEquals(expected, out.convectiveFraction, 1e-3 * expected, "U = " + u);
            // nabla_rad - nabla = F_conv / F nabla_rad, down to the rounding of nabla = nabla_ad + W / (1 + Phi)
            assertEquals(out.nablaRad, out.nabla, 1.01 * expected * out.nablaRad + 4.0 * Math.ulp(out.nablaRad));
        }
    }

    @Tag(CheckKind.LAW)
    @Test
    void atTheSameLengthTheFullSpectrumIsCloserToTheAdiabatThanMixingLengthTheory() {
        ConvectionModel mlt = new LocalMixingLength(1.0, Criterion.SCHWARZSCHILD, MixingLengthGeometry.BOHM_VITENSE_1958);
        ConvectionModel cm = model(1.0, Criterion.SCHWARZSCHILD, LengthScale.SCALE_HEIGHT);
        for (double logU = -8; logU <= 3; logU += 0.5) {
            ZoneState z = zone(5.5, 0.4, logU, 0.2, 10, 33, 1.0);
            ConvectionResult a = new ConvectionResult();
            ConvectionResult b = new ConvectionResult();
            mlt.solve(z, a);
            cm.solve(z, b);
            assertEquals(a.lossParameter, b.lossParameter, 1e-13 * a.lossParameter, "the same U");
            assertTrue(b.nabla < a.nabla && b.convectiveFraction > a.convectiveFraction, "U = 1e" + logU);
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void velocityIsTheOneEddyCarryingTheFluxInTheMixingLengthPicture() {
        // v^3 = g delta Lambda F_conv / (4 rho c_P T) holds exactly in mixing-length theory with the Böhm-Vitense
        // constants (Kippenhahn, Weigert & Weiss 2012, ch. 7: v^2 = g delta l^2 (nabla - nabla_e) / (8 H_P),
        // F_conv = rho c_P T v (l / 2 H_P) (nabla - nabla_e)); the full-spectrum model defines v by it
        ConvectionModel mlt = new LocalMixingLength(1.0, Criterion.SCHWARZSCHILD, MixingLengthGeometry.BOHM_VITENSE_1958);
        ConvectionModel cm = model(1.0, Criterion.SCHWARZSCHILD, LengthScale.SCALE_HEIGHT);
        for (double logU = -6; logU <= 2; logU += 1) {
            ZoneState z = zone(6.0, 0.5, logU, 0.3, 10, 33, 1.0);
            for (ConvectionModel m : List.of(mlt, cm)) {
                ConvectionResult out = new ConvectionResult();
                m.solve(z, out);
                double g = Codata2018.GRAVITATIONAL_CONSTANT * z.mass / (z.radius * z.radius);
                double fConv = out.convectiveFraction * z.luminosity / (4 * Math.PI * z.radius * z.radius);
                double v3 = g * z.delta * out.mixingLength * fConv / (4 * z.density * z.cp * z.temperature);
                assertEquals(Math.cbrt(v3), out.velocity, 1e-10 * out.velocity, m + " at U = 1e" + logU);
                assertEquals(out.velocity * out.mixingLength / 3.0, out.diffusion, 1e-12 * out.diffusion);
            }
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void efficiencyAndElementGradientFollowCoxAndGiuli() {
        ZoneState z = zone(6.0, 0.5, -2, 0.3, 10, 33, 1.0);
        ConvectionResult out = new ConvectionResult();
        model(1.0, Criterion.SCHWARZSCHILD, LengthScale.SCALE_HEIGHT).solve(z, out);
        // Gamma (Gamma + 1) = A^2 (nabla - nabla_ad), A = 1 / (2U); Gamma = (nabla - nabla_e) / (nabla_e - nabla_ad)
        double a = 1.0 / (2.0 * out.lossParameter);
        double g = out.efficiency;
        assertEquals(a * a * (out.nabla - z.nablaAd), g * (g + 1.0), 1e-12 * g * (g + 1.0));
        assertEquals(g, (out.nabla - out.nablaElement) / (out.nablaElement - z.nablaAd), 1e-6 * g);
    }

    // ---- derivatives ----

    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 300, seed = "94")
    void convectiveJacobian(@ForAll @Scale(12) @DoubleRange(min = 3.7, max = 8.5) double logT,
                            @ForAll @Scale(12) @DoubleRange(min = 0, max = 1) double rhoFraction,
                            @ForAll @Scale(12) @DoubleRange(min = -8, max = 6) double logU,
                            @ForAll @Scale(12) @DoubleRange(min = -3, max = 1) double logW,
                            @ForAll @Scale(12) @DoubleRange(min = 8, max = 12) double logR,
                            @ForAll @Scale(12) @DoubleRange(min = 28, max = 34) double logM,
                            @ForAll @Scale(12) @DoubleRange(min = 0.3, max = 2) double alpha,
                            @ForAll @IntRange(min = 0, max = 3) int variant) {
        ZoneState z = zone(logT, rhoFraction, logU, Math.pow(10, logW), logR, logM, alpha);
        Criterion criterion = (variant & 1) == 0 ? Criterion.SCHWARZSCHILD : Criterion.LEDOUX;
        LengthScale scale = (variant & 2) == 0 ? LengthScale.SCALE_HEIGHT : LengthScale.EDGE_DISTANCE;
        z.edgeDistance = 0.1 * z.radius * (1.0 + rhoFraction);
        z.nablaMu = 0.01 * rhoFraction;
        check(model(alpha, criterion, scale), z);
    }

    private static void check(ConvectionModel model, ZoneState z) {
        ConvectionResult out = new ConvectionResult();
        model.solve(z, out);
        Assume.that(out.regime == Regime.CONVECTIVE);
        Assume.that(Math.abs(Math.log(out.scaleHeight / z.radius)) > 1e-3);
        ConvectionResult probe = new ConvectionResult();
        ZoneState moved = new ZoneState();
        for (int i = 0; i < ZoneInput.COUNT; i++) {
            double q = i == ZoneInput.ALPHA ? model.alpha() : z.get(i);
            double h = 1e-5 * Math.max(Math.abs(q), i == ZoneInput.NABLA_MU ? 1e-6 : 1e-300);
            double[][] f = new double[4][4];
            double[] steps = {-2, -1, 1, 2};
            for (int s = 0; s < 4; s++) {
                moved.set(z);
                ConvectionModel m = model;
                if (i == ZoneInput.ALPHA) {
                    m = ((EddySpectrumConvection) model).withAlpha(q + steps[s] * h);
                } else {
                    moved.put(i, q + steps[s] * h);
                }
                m.solve(moved, probe);
                Assume.that(probe.regime == Regime.CONVECTIVE);
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
        double tolerance = 1e-6 * Math.max(Math.abs(fd), Math.abs(analytic)) + 1e-9 * scale;
        assertEquals(fd, analytic, tolerance, () -> "d " + output + " / d " + ZoneInput.name(input) + " (value "
                + value + ", input " + q + ", f " + java.util.Arrays.toString(f) + ")");
    }

    // ---- calls ----

    @Tag(CheckKind.INTERNAL)
    @Test
    void batchIsBitForBitThePerZoneCallAndValuesOnlyKeepsEveryValue() {
        int n = 257;
        ZoneColumns in = new ZoneColumns(n);
        List<ZoneState> zones = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            double f = k / (n - 1.0);
            // convective, radiative (W < 0) and semiconvective-under-Ledoux zones mixed
            double w = (k % 3 == 0) ? -0.1 : 0.02 + f;
            ZoneState z = zone(4.0 + 4.0 * f, f, -7 + 12 * f, w, 10, 33, 1.0);
            z.nablaMu = (k % 5 == 0) ? 0.5 : 0.0;
            z.edgeDistance = 1e8 * (1 + k);
            in.store(k, z);
            zones.add(z);
        }
        for (ConvectionModel m : List.of(model(1.2, Criterion.LEDOUX, LengthScale.SCALE_HEIGHT),
                model(1.0, Criterion.SCHWARZSCHILD, LengthScale.EDGE_DISTANCE))) {
            ConvectionColumns batch = new ConvectionColumns(n);
            m.solveColumns(in, 0, n, batch, true);
            ConvectionColumns values = new ConvectionColumns(n);
            m.solveColumns(in, 0, n, values, false);
            ConvectionResult one = new ConvectionResult();
            for (int k = 0; k < n; k++) {
                ZoneState z = in.load(k, new ZoneState());
                m.solve(z, one);
                assertEquals(one.regime, batch.regime[k]);
                assertEquals(Double.doubleToRawLongBits(one.nabla), Double.doubleToRawLongBits(batch.nabla[k]));
                assertEquals(Double.doubleToRawLongBits(one.nabla), Double.doubleToRawLongBits(values.nabla[k]));
                assertEquals(Double.doubleToRawLongBits(one.velocity), Double.doubleToRawLongBits(values.velocity[k]));
                assertEquals(Double.doubleToRawLongBits(one.diffusion), Double.doubleToRawLongBits(values.diffusion[k]));
                for (int i = 0; i < ZoneInput.COUNT; i++) {
                    assertEquals(Double.doubleToRawLongBits(one.dNabla[i]), Double.doubleToRawLongBits(batch.dNabla[i][k]));
                    assertEquals(Double.doubleToRawLongBits(one.dVelocity[i]),
                            Double.doubleToRawLongBits(batch.dVelocity[i][k]));
                    assertEquals(Double.doubleToRawLongBits(one.dConvectiveFraction[i]),
                            Double.doubleToRawLongBits(batch.dConvectiveFraction[i][k]));
                    assertEquals(Double.doubleToRawLongBits(one.dDiffusion[i]),
                            Double.doubleToRawLongBits(batch.dDiffusion[i][k]));
                }
            }
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void concurrentCallsGiveTheSerialResults() throws Exception {
        ConvectionModel m = model(1.0, Criterion.LEDOUX, LengthScale.SCALE_HEIGHT);
        int n = 500;
        ZoneState[] zones = new ZoneState[n];
        double[] serial = new double[n];
        ConvectionResult out = new ConvectionResult();
        for (int k = 0; k < n; k++) {
            zones[k] = zone(4.0 + 4.0 * k / n, 0.5, -6 + 10.0 * k / n, 0.01 + k / (double) n, 10, 33, 1.0);
            m.solve(zones[k], out);
            serial[k] = out.nabla + out.dNabla[ZoneInput.T] + out.velocity + out.dDiffusion[ZoneInput.KAPPA];
        }
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<Boolean>> futures = new ArrayList<>();
            for (int t = 0; t < 4; t++) {
                futures.add(pool.submit(() -> {
                    ConvectionResult mine = new ConvectionResult();
                    ZoneState z = new ZoneState();
                    for (int round = 0; round < 100; round++) {
                        for (int k = 0; k < n; k++) {
                            m.solve(z.set(zones[k]), mine);
                            double v = mine.nabla + mine.dNabla[ZoneInput.T] + mine.velocity
                                    + mine.dDiffusion[ZoneInput.KAPPA];
                            if (Double.doubleToRawLongBits(v) != Double.doubleToRawLongBits(serial[k])) {
                                return false;
                            }
                        }
                    }
                    return true;
                }));
            }
            for (Future<Boolean> f : futures) {
                assertTrue(f.get());
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void refusesWhatItCannotSolveNamingTheField() {
        ConvectionModel edge = model(1.0, Criterion.SCHWARZSCHILD, LengthScale.EDGE_DISTANCE);
        ZoneState z = zone(6.0, 0.5, -2, 0.3, 10, 33, 1.0);
        z.zone = 17;
        ConvectionResult out = new ConvectionResult();
        InvalidInputException missing = assertThrows(InvalidInputException.class, () -> edge.solve(z, out));
        assertEquals("edgeDistance", missing.field());
        assertEquals(17, missing.zone());
        // convective only through an inverted composition gradient: no full-spectrum solution
        ZoneState inverted = zone(6.0, 0.5, -2, -0.05, 10, 33, 1.0);
        inverted.nablaMu = -0.5;
        InvalidInputException composition = assertThrows(InvalidInputException.class,
                () -> model(1.0, Criterion.SCHWARZSCHILD, LengthScale.SCALE_HEIGHT).solve(inverted, out));
        assertEquals("nablaMu", composition.field());
        ZoneState bad = zone(6.0, 0.5, -2, 0.3, 10, 33, 1.0);
        bad.temperature = Double.NaN;
        assertEquals("temperature", assertThrows(InvalidInputException.class,
                () -> model(1.0, Criterion.SCHWARZSCHILD, LengthScale.SCALE_HEIGHT).solve(bad, out)).field());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void hostsFindItByNameWithItsOptions() {
        Transport transport = Transport.discover();
        ConvectionModel m = transport.convection(EddySpectrumConvection.NAME,
                ModelOptions.parse("alpha=1,length-scale=edge-distance,criterion=ledoux"));
        assertTrue(m.needsEdgeDistance());
        assertEquals(Criterion.LEDOUX, m.criterion());
        assertEquals(1.0, m.alpha());
        assertTrue(!transport.convection(EddySpectrumConvection.NAME, ModelOptions.defaults()).needsEdgeDistance());
        assertThrows(io.github.startransport.spi.InvalidOptionException.class,
                () -> transport.convection(EddySpectrumConvection.NAME, ModelOptions.parse("geometry=bohm-vitense-1958")));
    }
}
