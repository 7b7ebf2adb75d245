package io.github.startransport.core.timescale;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The photon and heat diffusion times of non-uniform stars: the index-1 polytrope, whose density
 * rho_c sin(pi r / R) / (pi r / R) makes t_gamma = (1/c) integral kappa rho r dr a closed form, and a
 * Kramers-opacity polytrope, whose heat-diffusion integral is taken by Commons Math's Gauss-Legendre quadrature.
 */
class DiffusionTimeIntegralsTest {
    private static final double C = Codata2018.SPEED_OF_LIGHT;

    @Test
    @Tag(CheckKind.EXTERNAL)
    void photonDiffusionThroughAnIndexOnePolytrope() {
        // Lane-Emden n = 1: theta = sin(xi) / xi, xi = pi r / R (Chandrasekhar 1939, ch. IV), rho = rho_c theta.
        // integral_0^R rho_c sin(pi r / R) (R / pi) dr = 2 rho_c R^2 / pi^2, so t = 2 kappa rho_c R^2 / (pi^2 c)
        // (Hansen, Kawaler & Trimble 2004 §1.3 for the integral). The trapezoidal rule errs by at most
        // R h^2 max|f''| / 12 = h^2 kappa rho_c pi / 12 (f = kappa rho r, |f''| <= kappa rho_c pi / R).
        int n = 500;
        double radius = Iau2015.SOLAR_RADIUS;
        double rhoC = 3.29 * 1.41; // rho_c / rho_mean = pi^2 / 3 for n = 1 (Chandrasekhar 1939): a Sun-sized example
        double kappa = 0.34;
        double[] r = new double[n];
        double[] k = new double[n];
        double[] rho = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = radius * (i + 1.0) / n;
            double xi = Math.PI * r[i] / radius;
            k[i] = kappa;
            rho[i] = i == n - 1 ? 0.0 : rhoC * Math.sin(xi) / xi;
        }
        double exact = 2.0 * kappa * rhoC * radius * radius / (Math.PI * Math.PI * C);
        double h = radius / n;
        double bound = h * h * kappa * rhoC * Math.PI / (12.0 * C);
        assertTrue(bound < 1e-5 * exact);
        assertEquals(exact, Timescale.photonDiffusion(r, k, rho), bound);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void heatDiffusionThroughAKramersOpacityPolytrope() {
        // t_th = integral kappa rho^2 c_P r / (4 a c T^3) dr (Kippenhahn, Weigert & Weiss 2012 §5.1, from memory) for
        // the n = 1 polytrope of the test above with T = T_c theta, c_P constant and Kramers' kappa = kappa_0 rho
        // T^-3.5 (Carroll & Ostlie 2007 §9.2, from memory), out to r = 0.8 R (the integrand grows without bound at the
        // surface). Reference: Commons Math's Gauss-Legendre quadrature of the same integrand plus the trapezoidal
        // rule's leading error (h^2 / 12)(f'(b) - f'(a)) (Euler-Maclaurin formula; e.g. Press et al., Numerical
        // Recipes, 3rd ed., §4.2), which is about 1e-6 of the integral on 4000 zones; the next term is of order h^4.
        double radius = Iau2015.SOLAR_RADIUS;
        double rhoC = 4.64;
        double tc = 1.0e7;
        double cp = 3.4e8;
        double kappa0 = 4e25 * 0.02 * 1.7;
        double a = Codata2018.RADIATION_CONSTANT;
        java.util.function.DoubleUnaryOperator theta = x -> x == 0.0 ? 1.0 : Math.sin(Math.PI * x / radius) / (Math.PI * x / radius);
        java.util.function.DoubleUnaryOperator integrand = x -> {
            double rho = rhoC * theta.applyAsDouble(x);
            double t = tc * theta.applyAsDouble(x);
            double kappa = kappa0 * rho * Math.pow(t, -3.5);
            return kappa * rho * rho * cp * x / (4.0 * a * C * t * t * t);
        };
        double outer = 0.8 * radius;
        int n = 4000;
        double[] r = new double[n];
        double[] k = new double[n];
        double[] rho = new double[n];
        double[] t = new double[n];
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = outer * (i + 1.0) / n;
            rho[i] = rhoC * theta.applyAsDouble(r[i]);
            t[i] = tc * theta.applyAsDouble(r[i]);
            k[i] = kappa0 * rho[i] * Math.pow(t[i], -3.5);
            c[i] = cp;
        }
        IterativeLegendreGaussIntegrator gauss = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-300);
        double reference = 0.0;
        for (int i = 0; i < 16; i++) {
            reference += gauss.integrate(1_000_000, integrand::applyAsDouble, outer * i / 16.0, outer * (i + 1) / 16.0);
        }
        double h = outer / n;
        double slopeCentre = kappa0 * Math.pow(rhoC, 3) * Math.pow(tc, -3.5) * cp / (4.0 * a * C * tc * tc * tc);
        double dx = 1e-4 * outer;
        double slopeOuter = (integrand.applyAsDouble(outer + dx) - integrand.applyAsDouble(outer - dx)) / (2.0 * dx);
        double trapezoidError = h * h / 12.0 * (slopeOuter - slopeCentre);
        assertTrue(Math.abs(trapezoidError) > 1e-7 * reference, "the error term is resolved");
        assertEquals(reference + trapezoidError, Timescale.thermalDiffusion(r, k, rho, t, c), 1e-9 * reference);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void heatDiffusionWithATemperatureFallingLinearly() {
        // kappa, rho, c_P constant and T = T_c (1 - r / (2R)): integral_0^R r / (1 - r / 2R)^3 dr = 2 R^2 (substitute
        // u = 1 - r / 2R), so t_th = kappa rho^2 c_P 2 R^2 / (4 a c T_c^3) (Kippenhahn, Weigert & Weiss 2012 §5.1 for
        // the diffusivity, from memory). The trapezoids err by (h^2 / 12)(f'(R) - f'(0)) to order h^4 (Euler-Maclaurin),
        // with f = A r / (1 - r / 2R)^3: f' = A / u^3 + 3 A r / (2R u^4), u = 1 - r / 2R, so f'(0) = A, f'(R) = A (8 + 24) = 32 A.
        int n = 1000;
        double radius = 5e10;
        double kappa = 1.5;
        double rho = 2.0;
        double cp = 3.3e8;
        double tc = 8e6;
        double[] r = new double[n];
        double[] k = new double[n];
        double[] d = new double[n];
        double[] t = new double[n];
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = radius * (i + 1.0) / n;
            k[i] = kappa;
            d[i] = rho;
            t[i] = tc * (1.0 - r[i] / (2.0 * radius));
            c[i] = cp;
        }
        double coefficient = kappa * rho * rho * cp / (4.0 * Codata2018.RADIATION_CONSTANT * C * tc * tc * tc);
        double exact = coefficient * 2.0 * radius * radius;
        double h = radius / n;
        double error = h * h / 12.0 * (32.0 * coefficient - coefficient);
        assertEquals(exact + error, Timescale.thermalDiffusion(r, k, d, t, c), 1e-9 * exact);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void turnoverIntegralConvergesAtASchwarzschildBoundary() {
        // Above a Schwarzschild boundary W = nabla_rad - nabla_ad grows linearly with height, efficient convection
        // carries F_conv proportional to W and v^3 is proportional to F_conv (v^3 = g delta l F_conv / (4 rho c_P T),
        // Kippenhahn, Weigert & Weiss 2012 ch. 7 with l fixed), so v = v0 ((r - r_b) / d)^(1/3) near it. Then
        // integral_b^t dr / v = 1.5 d^(1/3) (t - b)^(2/3) / v0 (Gilliland 1985 for the definition, from memory). On
        // zones centred in cells of width h from the boundary each zone owns its cell (the code's rule): the
        // midpoint rule, whose first cell misses 1.5 - 2^(1/3) of c h^(2/3) (c = d^(1/3) / v0; exact integral
        // 1.5 c h^(2/3) against h c (h/2)^(-1/3)) and whose other cells underestimate the convex integrand by
        // between 0 and (h^2 / 24)(f'(t) - f'(b + h)) <= c h^(2/3) / 72 (the midpoint rule's error term).
        int n = 200;
        double bottom = 5e10;
        double d = 2e10;
        double v0 = 3e4;
        double h = d / n;
        double[] r = new double[n];
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = bottom + (i + 0.5) * h;
            v[i] = v0 * Math.cbrt((r[i] - bottom) / d);
        }
        double c = Math.cbrt(d) / v0;
        double exact = 1.5 * c * Math.pow(d, 2.0 / 3.0);
        double firstCell = (1.5 - Math.cbrt(2.0)) * c * Math.pow(h, 2.0 / 3.0);
        double rest = c * Math.pow(h, 2.0 / 3.0) / 72.0;
        double turnover = Timescale.turnoverGlobal(r, v, 0, n - 1, bottom, bottom + d);
        assertTrue(turnover <= exact - firstCell, turnover + " vs " + (exact - firstCell));
        assertTrue(turnover >= exact - firstCell - rest, turnover + " vs " + (exact - firstCell - rest));
    }
}
