package io.github.startransport.core.batch;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.convection.MixingLengthGeometry;
import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.ZoneColumns;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The batch call of the mixing-length model over a column of zones whose loss parameter U runs from 1e-9 to 1e2
 * (efficient to inefficient), for both geometry sets, against the general mixing-length cubic
 * x^3 + k U x^2 + 2 k U^2 x - k U W = 0 (Kippenhahn, Weigert &amp; Weiss 2012 ch. 7 for k = 8/9; Tassoul, Fontaine &amp;
 * Winget 1990, ApJS 72, 335 for general (a, b, c), from memory; the Böhm &amp; Cassinelli constants unverified)
 * solved zone by zone by Commons Math's LaguerreSolver from U and W computed here from the inputs.
 */
class BatchTextbookRootsTest {
    private static final double G = Codata2018.GRAVITATIONAL_CONSTANT;
    private static final double A_RAD = Codata2018.RADIATION_CONSTANT;
    private static final double C = Codata2018.SPEED_OF_LIGHT;
    private static final double SIGMA = Codata2018.STEFAN_BOLTZMANN;
    private static final double K = Codata2018.BOLTZMANN;
    private static final double M_U = Codata2018.ATOMIC_MASS_UNIT;
    private static final double MU = 1.0 / 1.62;
    private static final int ZONES = 45;

    /**
     * Zones of a solar-like envelope (r = 0.9 R_sun, T = 1e5 K, rho = 1e-3) with ideal gas plus radiation written
     * out (P = rho k T / (mu m_u) + a T^4 / 3 and Chandrasekhar's nabla_ad, delta, c_P in beta), nabla_rad = 1.2
     * set through L, and kappa swept over 11 decades so that U sweeps with it (U is proportional to 1 / kappa).
     */
    private static ZoneColumns columns() {
        ZoneColumns in = new ZoneColumns(ZONES);
        for (int k = 0; k < ZONES; k++) {
            double t = 1e5;
            double rho = 1e-3;
            double pg = rho * K * t / (MU * M_U);
            double pr = A_RAD * t * t * t * t / 3.0;
            double beta = pg / (pg + pr);
            double d = 32.0 - 24.0 * beta - 3.0 * beta * beta;
            in.radius[k] = 0.9 * Iau2015.SOLAR_RADIUS;
            in.mass[k] = Iau2015.SOLAR_MASS;
            in.temperature[k] = t;
            in.density[k] = rho;
            in.pressure[k] = pg + pr;
            in.opacity[k] = Math.pow(10.0, -8.0 + 11.0 * k / (ZONES - 1.0));
            in.cp[k] = K / (MU * M_U) * d / (2.0 * beta * beta);
            in.nablaAd[k] = 2.0 * (4.0 - 3.0 * beta) / d;
            in.delta[k] = (4.0 - 3.0 * beta) / beta;
            in.phi[k] = 1.0;
            in.nablaMu[k] = 0.0;
            in.hydrogen[k] = 0.7;
            in.metals[k] = 0.02;
            in.luminosity[k] = 1.2 * 16.0 * Math.PI * A_RAD * C * G * in.mass[k] * t * t * t * t
                    / (3.0 * in.opacity[k] * in.pressure[k]);
        }
        return in;
    }

    private static double root(double k, double u, double w) {
        double[] coefficients = {-k * u * w, 2.0 * k * u * u, k * u, 1.0};
        double best = Double.NaN;
        for (Complex r : new LaguerreSolver(1e-15, 1e-300, 1e-300).solveAllComplex(coefficients, 0.0)) {
            if (r.getReal() > 0.0 && Math.abs(r.getImaginary()) <= 1e-9 * r.getReal()) {
                best = r.getReal();
            }
        }
        double f = ((best + k * u) * best + 2.0 * k * u * u) * best - k * u * w;
        double df = (3.0 * best + 2.0 * k * u) * best + 2.0 * k * u * u;
        return best - f / df;
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void batchSolutionFollowsTheTextbookCubicFromEfficientToInefficient() {
        ZoneColumns in = columns();
        for (MixingLengthGeometry geometry : MixingLengthGeometry.values()) {
            // (a, b, c) = (1/8, 1/2, 24) and (1, 2, 16), written here rather than read from the enum
            boolean textbook = geometry == MixingLengthGeometry.BOHM_VITENSE_1958;
            double a = textbook ? 0.125 : 1.0;
            double b = textbook ? 0.5 : 2.0;
            double c = textbook ? 24.0 : 16.0;
            double kCubic = 32.0 / (3.0 * b * c);
            ConvectionColumns out = new ConvectionColumns(ZONES);
            new LocalMixingLength(1.8, Criterion.SCHWARZSCHILD, geometry).solveColumns(in, 0, ZONES, out, true);
            double smallest = Double.POSITIVE_INFINITY;
            double largest = 0.0;
            for (int k = 0; k < ZONES; k++) {
                double g = G * in.mass[k] / (in.radius[k] * in.radius[k]);
                double hp = in.pressure[k] / (in.density[k] * g);
                double l = 1.8 * hp;
                double u = c * SIGMA * Math.pow(in.temperature[k], 3) * Math.sqrt(hp / (a * g * in.delta[k]))
                        / (2.0 * in.cp[k] * in.density[k] * in.density[k] * in.opacity[k] * l * l);
                smallest = Math.min(smallest, u);
                largest = Math.max(largest, u);
                double w = 1.2 - in.nablaAd[k];
                double x = root(kCubic, u, w);
                String where = geometry + ", zone " + k + ", U = " + u;
                assertEquals(Regime.CONVECTIVE, out.regime[k], where);
                assertEquals(in.nablaAd[k] + x * x + 2.0 * u * x, out.nabla[k], 1e-10 * out.nabla[k], where);
                double v = l * Math.sqrt(a * g * in.delta[k] / hp) * x;
                assertEquals(v, out.velocity[k], 1e-9 * v, where);
                // F_conv / F = (nabla_rad - nabla) / nabla_rad = x^3 / (k U nabla_rad), from the same cubic
                double share = x * x * x / (kCubic * u * 1.2);
                assertEquals(share, out.convectiveFraction[k], 1e-9 * share, where);
            }
            assertTrue(smallest < 1e-8 && largest > 10.0, "U from " + smallest + " to " + largest);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void batchTransparentEddiesFollowTheGeneralCubicAcrossOpticalThickness() {
        // The transparent-eddy model in batch (its cubic has no start table: a0 changes with omega) over the same
        // column, where omega = kappa rho l runs from about 1e-2 to 1e9: the general cubic with U' = q U,
        // q = y omega^2 / (1 + y omega^2), y = 3 / (4 pi^2) (Henyey, Vardya & Bodenheimer 1965, form from memory)
        ZoneColumns in = columns();
        ConvectionColumns out = new ConvectionColumns(ZONES);
        new io.github.startransport.core.convection.TransparentEddyMixingLength().solveColumns(in, 0, ZONES, out, true);
        double y = 3.0 / (4.0 * Math.PI * Math.PI);
        double thinnest = Double.POSITIVE_INFINITY;
        for (int k = 0; k < ZONES; k++) {
            double g = G * in.mass[k] / (in.radius[k] * in.radius[k]);
            double hp = in.pressure[k] / (in.density[k] * g);
            double l = 1.8 * hp;
            double u = 3.0 * A_RAD * C * Math.pow(in.temperature[k], 3)
                    / (in.cp[k] * in.density[k] * in.density[k] * in.opacity[k] * l * l)
                    * Math.sqrt(8.0 * hp / (g * in.delta[k]));
            double omega = in.opacity[k] * in.density[k] * l;
            thinnest = Math.min(thinnest, omega);
            double q = y * omega * omega / (1.0 + y * omega * omega);
            double kCubic = 8.0 / 9.0;
            double[] coefficients = {-kCubic * u * (1.2 - in.nablaAd[k]), 2.0 * kCubic * u * q * u, kCubic * u, 1.0};
            double x = Double.NaN;
            for (Complex r : new LaguerreSolver(1e-15, 1e-300, 1e-300).solveAllComplex(coefficients, 0.0)) {
                if (r.getReal() > 0.0 && Math.abs(r.getImaginary()) <= 1e-9 * r.getReal()) {
                    x = r.getReal();
                }
            }
            String where = "zone " + k + ", omega = " + omega;
            assertEquals(in.nablaAd[k] + x * x + 2.0 * q * u * x, out.nabla[k], 1e-9 * out.nabla[k], where);
            double share = x * x * x / (kCubic * u * 1.2);
            assertEquals(share, out.convectiveFraction[k], 1e-8 * share, where);
        }
        assertTrue(thinnest < 0.1, "omega down to " + thinnest);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void batchFullSpectrumFollowsItsFluxEquation() {
        // The full-spectrum model in batch over the same column (U from 1e-9 to 1e2 at Lambda = 1.8 H_P): Canuto &
        // Mazzitelli's (1991, ApJ 370, 295; fit constants from memory) nabla_rad - nabla = Phi(S)(nabla - nabla_ad),
        // S = 40.5 (nabla - nabla_ad) / U^2, solved by Commons Math's Brent; F_conv / F = (nabla_rad - nabla) / nabla_rad
        ZoneColumns in = columns();
        ConvectionColumns out = new ConvectionColumns(ZONES);
        new io.github.startransport.core.convection.EddySpectrumConvection(1.8, Criterion.SCHWARZSCHILD,
                io.github.startransport.core.convection.LengthScale.SCALE_HEIGHT).solveColumns(in, 0, ZONES, out, true);
        for (int k = 0; k < ZONES; k++) {
            double g = G * in.mass[k] / (in.radius[k] * in.radius[k]);
            double hp = in.pressure[k] / (in.density[k] * g);
            double l = 1.8 * hp;
            double u = 3.0 * A_RAD * C * Math.pow(in.temperature[k], 3)
                    / (in.cp[k] * in.density[k] * in.density[k] * in.opacity[k] * l * l)
                    * Math.sqrt(8.0 * hp / (g * in.delta[k]));
            double w = 1.2 - in.nablaAd[k];
            double e = new org.apache.commons.math3.analysis.solvers.BrentSolver(1e-300, 1e-15).solve(1000, z -> {
                double s = 40.5 * z / (u * u);
                double phi = 24.868 * Math.pow(s, 0.14972) * Math.pow(Math.pow(1 + 0.097666 * s, 0.18931) - 1, 1.8503);
                return z * (1 + phi) - w;
            }, 0.0, w);
            String where = "zone " + k + ", U = " + u;
            assertEquals(in.nablaAd[k] + e, out.nabla[k], 1e-9 * e + 4.0 * Math.ulp(1.2), where);
            assertEquals((w - e) / 1.2, out.convectiveFraction[k], 1e-9, where);
        }
    }
}
