package io.github.startransport.core.convection;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.ZoneState;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The convective gradient of solar-like zones from formulations written independently of the code's, solved by
 * Commons Math: Cox &amp; Giuli's cubic in the efficiency (1968, ch. 14, from memory), the general cubic with
 * separate loss coefficient for transparent eddies (Henyey, Vardya &amp; Bodenheimer 1965 as remembered; its
 * normalisation is unverified, see {@link ConvectionOutputsTest}), and Canuto &amp; Mazzitelli's flux equation
 * (1991, ApJ 370, 295; fit constants from memory). U, W and l come from the zone's inputs
 * ({@link ConvectionOutputsTest#zone}).
 */
class CubicFormulationsTest {
    private static final double G = Codata2018.GRAVITATIONAL_CONSTANT;
    private static final double A_RAD = Codata2018.RADIATION_CONSTANT;
    private static final double C = Codata2018.SPEED_OF_LIGHT;

    private static List<ZoneState> zones() {
        return List.of(ConvectionOutputsTest.deepEnvelope(), ConvectionOutputsTest.nearSurface(),
                ConvectionOutputsTest.zone(0.98 * Iau2015.SOLAR_RADIUS, Iau2015.SOLAR_MASS, 3e4, 3e-6, 30.0, 2.0),
                ConvectionOutputsTest.zone(0.95 * Iau2015.SOLAR_RADIUS, Iau2015.SOLAR_MASS, 1.5e5, 2e-4, 60.0, 1.2));
    }

    private static double hp(ZoneState z) {
        return z.pressure * z.radius * z.radius / (z.density * G * z.mass);
    }

    /** The textbook U of Kippenhahn, Weigert &amp; Weiss (2012, ch. 7) with l = alpha H_P. */
    private static double u(ZoneState z, double l) {
        double g = G * z.mass / (z.radius * z.radius);
        return 3.0 * A_RAD * C * Math.pow(z.temperature, 3) / (z.cp * z.density * z.density * z.opacity * l * l)
                * Math.sqrt(8.0 * hp(z) / (g * z.delta));
    }

    private static double nablaRad(ZoneState z) {
        return 3.0 * z.opacity * z.luminosity * z.pressure
                / (16.0 * Math.PI * A_RAD * C * G * z.mass * Math.pow(z.temperature, 4));
    }

    /** The positive real root of a polynomial (coefficients from the constant term up), by LaguerreSolver. */
    private static double positiveRoot(double[] coefficients) {
        Complex[] roots = new LaguerreSolver(1e-15, 1e-300, 1e-300).solveAllComplex(coefficients, 1.0);
        double best = Double.NaN;
        for (Complex r : roots) {
            if (r.getReal() > 0 && Math.abs(r.getImaginary()) <= 1e-9 * Math.abs(r.getReal())) {
                best = r.getReal();
            }
        }
        assertTrue(Double.isFinite(best));
        return best;
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void gradientFromCoxAndGiulisEfficiencyCubic() {
        // (9/4) Gamma^3 + Gamma^2 + Gamma = A^2 W with A = 1 / (2U); nabla - nabla_ad = Gamma (Gamma + 1) / A^2
        for (ZoneState z : zones()) {
            double l = 1.8 * hp(z);
            double a = 1.0 / (2.0 * u(z, l));
            double w = nablaRad(z) - z.nablaAd;
            double gamma = positiveRoot(new double[] {-a * a * w, 1.0, 1.0, 2.25});
            double expected = z.nablaAd + gamma * (gamma + 1.0) / (a * a);
            ConvectionResult out = new ConvectionResult();
            new LocalMixingLength().solve(z, out);
            assertEquals(expected, out.nabla, 1e-9 * expected, "T = " + z.temperature);
            assertEquals(gamma, out.efficiency, 1e-9 * gamma);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void gradientOfTransparentEddiesFromTheGeneralCubic() {
        // x^3 + (8U/9) x^2 + (16 U U' / 9) x - (8U/9) W = 0, U' = q U, q = y w^2 / (1 + y w^2), w = kappa rho l,
        // y = 3 / (4 pi^2); nabla = nabla_ad + x^2 + 2 U' x
        double y = 3.0 / (4.0 * Math.PI * Math.PI);
        for (ZoneState z : zones()) {
            double l = 1.8 * hp(z);
            double uu = u(z, l);
            double omega = z.opacity * z.density * l;
            double q = y * omega * omega / (1.0 + y * omega * omega);
            double uLoss = q * uu;
            double w = nablaRad(z) - z.nablaAd;
            double k = 8.0 / 9.0;
            double x = positiveRoot(new double[] {-k * uu * w, 2.0 * k * uu * uLoss, k * uu, 1.0});
            double expected = z.nablaAd + x * x + 2.0 * uLoss * x;
            ConvectionResult out = new ConvectionResult();
            new TransparentEddyMixingLength().solve(z, out);
            assertEquals(expected, out.nabla, 1e-9 * expected, "T = " + z.temperature + ", omega = " + omega);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void gradientOfTheFullSpectrumFromItsFluxEquation() {
        // nabla_rad - nabla = Phi(S) (nabla - nabla_ad), S = 40.5 (nabla - nabla_ad) / U^2 (Canuto & Mazzitelli 1991,
        // U of the textbook with Lambda = alpha H_P, alpha = 1), Phi = a S^k ((1 + b S)^m - 1)^n; solved for
        // e = nabla - nabla_ad by Brent's method on e (1 + Phi) = W
        for (ZoneState z : zones()) {
            double l = hp(z);
            double uu = u(z, l);
            double w = nablaRad(z) - z.nablaAd;
            BrentSolver brent = new BrentSolver(1e-300, 1e-14);
            double e = brent.solve(1000, x -> {
                double s = 40.5 * x / (uu * uu);
                double phi = 24.868 * Math.pow(s, 0.14972) * Math.pow(Math.pow(1 + 0.097666 * s, 0.18931) - 1, 1.8503);
                return x * (1 + phi) - w;
            }, 0.0, w);
            ConvectionResult out = new ConvectionResult();
            new EddySpectrumConvection(1.0, Criterion.SCHWARZSCHILD, LengthScale.SCALE_HEIGHT).solve(z, out);
            assertEquals(z.nablaAd + e, out.nabla, 1e-9 * (z.nablaAd + e) + 1e-9 * e, "T = " + z.temperature);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void gradientOfTheBohmCassinelliSetFromItsCubic() {
        // general cubic with k = 32 / (3 b c) = 1/6 for (b, c) = (2, 16) and U of the parametrised theory
        // (Tassoul, Fontaine & Winget 1990; constants unverified): U = c sigma T^3 sqrt(H_P / (a g delta)) / (2 c_P kappa rho^2 l^2)
        for (ZoneState z : zones()) {
            double l = 1.8 * hp(z);
            double uu = u(z, l) * 16.0 / (24.0 * Math.sqrt(8.0));
            double w = nablaRad(z) - z.nablaAd;
            double k = 32.0 / (3.0 * 2.0 * 16.0);
            double x = positiveRoot(new double[] {-k * uu * w, 2.0 * k * uu * uu, k * uu, 1.0});
            double expected = z.nablaAd + x * x + 2.0 * uu * x;
            ConvectionResult out = new ConvectionResult();
            new LocalMixingLength(1.8, Criterion.SCHWARZSCHILD, MixingLengthGeometry.BOHM_CASSINELLI_1971).solve(z, out);
            assertEquals(expected, out.nabla, 1e-9 * expected, "T = " + z.temperature);
        }
    }
}
