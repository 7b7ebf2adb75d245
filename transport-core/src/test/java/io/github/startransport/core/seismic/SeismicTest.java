package io.github.startransport.core.seismic;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.core.model.EddingtonStandardModel;
import io.github.startransport.core.model.LaneEmden;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.SeismicSummary;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.ZoneInput;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Buoyancy and acoustic frequencies, and the asymptotic integrals, against analytic results. */
class SeismicTest {
    private static final double G = Codata2018.GRAVITATIONAL_CONSTANT;
    private static final Transport TRANSPORT = Transport.discover();

    private static ProfileDiagnosis diagnose(io.github.startransport.spi.Profile p) {
        DiagnosisSetup setup = new DiagnosisSetup(TRANSPORT.convection(null, ModelOptions.defaults()),
                TRANSPORT.opacity(null, ModelOptions.defaults()), TRANSPORT.thermodynamics(null, ModelOptions.defaults()));
        return TRANSPORT.diagnoser(null, ModelOptions.defaults()).diagnose(p, setup);
    }

    /**
     * A polytrope P = K rho^(1 + 1/n) of an ideal gas with constant mu and Gamma_1 has
     * nabla = d ln T / d ln P = 1 / (n + 1) and, from N^2 = g (d ln P / dr / Gamma_1 - d ln rho / dr) with
     * d ln rho / d ln P = n / (n + 1) and d ln P / dr = -rho g / P,
     * N^2 = (g^2 rho / P) (n / (n + 1) - 1 / Gamma_1). In Lane-Emden variables (r = a xi,
     * rho = rho_c theta^n, P = P_c theta^(n+1), a^2 = (n + 1) P_c / (4 pi G rho_c^2)),
     * g^2 rho / P = 4 pi G rho_c (n + 1) theta'^2 / theta, so
     * N^2 = 4 pi G rho_c (theta'^2 / theta) (n - (n + 1) / Gamma_1) (derived here; the buoyancy frequency of
     * polytropes as in Unno et al. 1989, Nonradial Oscillations of Stars, §16, from memory; Lane-Emden
     * variables as in Chandrasekhar 1939, ch. IV). For n = 3/2 and Gamma_1 = 5/3 it vanishes: the
     * polytrope is isentropic, nabla = nabla_ad.
     */
    @Tag(CheckKind.EXTERNAL)
    @Test
    void polytropeBuoyancyFrequencyIsAnalytic() {
        for (double n : new double[] {1.5, 3.0, 4.0}) {
            LaneEmden le = LaneEmden.solve(n, 0.0);
            double mass = 2e33;
            double radius = 7e10;
            double xi1 = le.firstZero();
            double a = radius / xi1;
            double rhoC = mass / (4 * Math.PI * a * a * a * le.massConstant());
            double pC = 4 * Math.PI * G * rhoC * rhoC * a * a / (n + 1);
            double gamma1 = 5.0 / 3.0;
            double[] s = new double[3];
            double[] d = new double[ZoneInput.COUNT];
            for (double f = 0.05; f < 0.96; f += 0.05) {
                double xi = f * xi1;
                le.sample(xi, s);
                double theta = s[0];
                double thetaPrime = -s[1] / (xi * xi);
                double r = a * xi;
                double m = 4 * Math.PI * a * a * a * rhoC * s[1];
                double rho = rhoC * Math.pow(theta, n);
                double p = pC * Math.pow(theta, n + 1);
                double expected = 4 * Math.PI * G * rhoC * thetaPrime * thetaPrime / theta * (n - (n + 1) / gamma1);
                double ours = LocalFrequencies.buoyancySquared(r, m, rho, p, 1.0, 1 - 1 / gamma1, 1.0, 0.0,
                        1 / (n + 1), d);
                double scale = 4 * Math.PI * G * rhoC * thetaPrime * thetaPrime / theta;
                assertEquals(expected, ours, 1e-10 * scale, "n = " + n + ", xi / xi_1 = " + f);
            }
        }
    }

    /** Each entry of the N^2 Jacobian equals a central difference (common practice, no source). */
    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 200, seed = "1406")
    void buoyancyJacobianMatchesCentralDifferences(
            @ForAll @Scale(9) @DoubleRange(min = 8, max = 12) double logR,
            @ForAll @Scale(9) @DoubleRange(min = 30, max = 34) double logM,
            @ForAll @Scale(9) @DoubleRange(min = -8, max = 2) double logRho,
            @ForAll @Scale(9) @DoubleRange(min = 4, max = 17) double logP,
            @ForAll @Scale(9) @DoubleRange(min = 0.5, max = 3) double delta,
            @ForAll @Scale(9) @DoubleRange(min = 0.1, max = 0.4) double nablaAd,
            @ForAll @Scale(9) @DoubleRange(min = 0.5, max = 1.2) double phi,
            @ForAll @Scale(9) @DoubleRange(min = -0.2, max = 0.5) double nablaMu,
            @ForAll @Scale(9) @DoubleRange(min = 0.05, max = 1.0) double nabla) {
        double[] v = {Math.pow(10, logR), Math.pow(10, logM), Math.pow(10, logRho), Math.pow(10, logP), delta, nablaAd,
            phi, nablaMu, nabla};
        int[] index = {ZoneInput.R, ZoneInput.M, ZoneInput.RHO, ZoneInput.P, ZoneInput.DELTA, ZoneInput.NABLA_AD,
            ZoneInput.PHI, ZoneInput.NABLA_MU, -1};
        double[] d = new double[ZoneInput.COUNT];
        double n2 = LocalFrequencies.buoyancySquared(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7], v[8], d);
        assertEquals(LocalFrequencies.buoyancySquared(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7], v[8]), n2, 0.0);
        double scale = G * v[1] / (v[0] * v[0]);
        scale = scale * scale * v[2] / v[3];
        for (int i = 0; i < v.length; i++) {
            double h = 1e-6 * Math.max(Math.abs(v[i]), 0.01);
            double[] up = v.clone();
            double[] dn = v.clone();
            up[i] += h;
            dn[i] -= h;
            double fd = (LocalFrequencies.buoyancySquared(up[0], up[1], up[2], up[3], up[4], up[5], up[6], up[7], up[8])
                    - LocalFrequencies.buoyancySquared(dn[0], dn[1], dn[2], dn[3], dn[4], dn[5], dn[6], dn[7], dn[8]))
                    / (2 * h);
            double analytic = index[i] >= 0 ? d[index[i]]
                    : LocalFrequencies.dBuoyancySquaredDNabla(v[0], v[1], v[2], v[3], v[4]);
            assertEquals(fd, analytic, 1e-6 * Math.abs(fd) + 1e-8 * scale / Math.max(Math.abs(v[i]), 0.01),
                    "input " + i);
        }
    }

    /**
     * Homologous stars (m -> a m, r -> b r, rho -> a / b^3 rho, P -> a^2 / b^4 P, the same Gamma_1 and
     * nablas) have c_s ~ sqrt(a / b) and N ~ sqrt(a / b^3): Delta nu scales exactly as sqrt(M / R^3) and
     * the period spacing as its inverse (Kjeldsen &amp; Bedding 1995 for the Delta nu scaling; homology,
     * Kippenhahn, Weigert &amp; Weiss 2012 §20, from memory).
     */
    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 60, seed = "1407")
    void largeSeparationScalesAsRootOfMeanDensity(@ForAll @Scale(9) @DoubleRange(min = 0.1, max = 10) double a,
                                                  @ForAll @Scale(9) @DoubleRange(min = 0.1, max = 10) double b) {
        ProfileDiagnosis d = DEMO;
        double[] r = d.column(DiagnosisColumn.RADIUS);
        double[] m = d.column(DiagnosisColumn.MASS);
        double[] rho = d.column(DiagnosisColumn.DENSITY);
        double[] p = d.column(DiagnosisColumn.PRESSURE);
        double[] gamma1 = d.column(DiagnosisColumn.GAMMA1);
        double[] delta = d.column(DiagnosisColumn.DELTA);
        double[] nablaAd = d.column(DiagnosisColumn.NABLA_AD);
        double[] phi = d.column(DiagnosisColumn.PHI);
        double[] nablaMu = d.column(DiagnosisColumn.NABLA_MU);
        double[] nabla = d.column(DiagnosisColumn.NABLA);
        double[] base = integrals(r, m, rho, p, gamma1, delta, nablaAd, phi, nablaMu, nabla, 1, 1);
        double[] scaled = integrals(r, m, rho, p, gamma1, delta, nablaAd, phi, nablaMu, nabla, a, b);
        assertEquals(Math.sqrt(a / (b * b * b)), scaled[0] / base[0], 1e-12 * Math.sqrt(a / (b * b * b)));
        assertEquals(Math.sqrt(b * b * b / a), scaled[1] / base[1], 1e-12 * Math.sqrt(b * b * b / a));
    }

    private static final ProfileDiagnosis DEMO = diagnose(new DemoStar(400).profile());

    private static double[] integrals(double[] r0, double[] m0, double[] rho0, double[] p0, double[] gamma1,
                                      double[] delta, double[] nablaAd, double[] phi, double[] nablaMu, double[] nabla,
                                      double a, double b) {
        int n = r0.length;
        double[] r = new double[n];
        double[] cs = new double[n];
        double[] n2 = new double[n];
        for (int k = 0; k < n; k++) {
            r[k] = b * r0[k];
            double m = a * m0[k];
            double rho = a / (b * b * b) * rho0[k];
            double p = a * a / (b * b * b * b) * p0[k];
            cs[k] = LocalFrequencies.soundSpeed(gamma1[k], p, rho);
            n2[k] = LocalFrequencies.buoyancySquared(r[k], m, rho, p, delta[k], nablaAd[k], phi[k], nablaMu[k],
                    nabla[k]);
        }
        return new double[] {AsymptoticIntegrals.largeSeparation(AsymptoticIntegrals.acousticRadius(r, cs)),
            AsymptoticIntegrals.periodSpacing(1, AsymptoticIntegrals.buoyancyIntegral(r, n2))};
    }

    /** Uniform and linear 1/c_s: the integrals are exact (trapezoids integrate linear functions exactly). */
    @Tag(CheckKind.EXTERNAL)
    @Test
    void acousticIntegralsOfSimpleProfiles() {
        int n = 101;
        double radius = 5e10;
        double[] r = new double[n];
        double[] cs = new double[n];
        for (int k = 0; k < n; k++) {
            r[k] = radius * (k + 1.0) / n;
            cs[k] = 3e6;
        }
        assertEquals(radius / 3e6, AsymptoticIntegrals.acousticRadius(r, cs), 1e-12 * radius / 3e6);
        assertEquals(0.3 * radius / 3e6, AsymptoticIntegrals.acousticDepth(r, cs, 0.7 * radius), 1e-9 * radius / 3e6);
        assertEquals(0.0, AsymptoticIntegrals.acousticDepth(r, cs, radius), 0.0);
        assertEquals(radius / 3e6, AsymptoticIntegrals.acousticDepth(r, cs, 0.0), 1e-12 * radius / 3e6);
        // 1/c_s = A + B r: integral from x to R is A (R - x) + B (R^2 - x^2) / 2
        double aa = 1e-7;
        double bb = 4e-17;
        for (int k = 0; k < n; k++) {
            cs[k] = 1 / (aa + bb * r[k]);
        }
        double x = 0.4321 * radius;
        assertEquals(aa * (radius - x) + bb * (radius * radius - x * x) / 2, AsymptoticIntegrals.acousticDepth(r, cs, x),
                1e-12 * aa * radius);
        // Delta nu = 1 / (2 tau) and Delta Pi_1 = 2 pi^2 / sqrt(2) / integral (Tassoul 1980)
        assertEquals(0.5 / 1234.0, AsymptoticIntegrals.largeSeparation(1234.0), 0.0);
        assertEquals(2 * Math.PI * Math.PI / Math.sqrt(2) / 1e-3, AsymptoticIntegrals.periodSpacing(1, 1e-3), 1e-9);
        assertTrue(Double.isNaN(AsymptoticIntegrals.periodSpacing(1, 0.0)));
    }

    /**
     * N^2 ~ 0 where nabla = nabla_ad: an efficiently convective, chemically uniform layer is neutrally
     * buoyant (Kippenhahn, Weigert &amp; Weiss 2012, §6.1-6.2). In the demo star's convective core the
     * mixing-length nabla exceeds nabla_ad by less than 1e-3 (most near the centre, where the mixing length
     * is limited by r), so N^2 / (g^2 rho / P) there must be below 1e-3, against ~0.1 in the radiative
     * zone above (nabla_ad - nabla_rad).
     */
    @Tag(CheckKind.LAW)
    @Test
    void buoyancyVanishesInTheConvectiveCore() {
        ProfileDiagnosis d = DEMO;
        double[] n2 = d.column(DiagnosisColumn.BUOYANCY_SQUARED);
        double[] g = d.column(DiagnosisColumn.GRAVITY);
        double[] rho = d.column(DiagnosisColumn.DENSITY);
        double[] p = d.column(DiagnosisColumn.PRESSURE);
        double[] nablaMu = d.column(DiagnosisColumn.NABLA_MU);
        int core = 0;
        for (int k = 0; k < d.size() && d.regimes()[k] == Regime.CONVECTIVE && d.radius() * 0.5 > d.value(
                DiagnosisColumn.RADIUS, k); k++) {
            assertEquals(0.0, nablaMu[k], 0.0);
            assertTrue(Math.abs(n2[k]) < 1e-3 * g[k] * g[k] * rho[k] / p[k], "zone " + k + ": N^2 = " + n2[k]);
            assertTrue(n2[k] <= 0, "unstable: N^2 <= 0 in zone " + k);
            core++;
        }
        assertTrue(core > 20, "core zones " + core);
        // and in the radiative layer above it N^2 > 0, reaching a few per cent of g^2 rho / P
        double most = 0;
        for (int k = core; k < d.size() && d.regimes()[k] == Regime.RADIATIVE; k++) {
            assertTrue(n2[k] > 0, "radiative zone " + k + ": N^2 = " + n2[k]);
            most = Math.max(most, n2[k] / (g[k] * g[k] * rho[k] / p[k]));
        }
        assertTrue(most > 0.03, "largest N^2 / (g^2 rho / P) above the core: " + most);
    }

    /**
     * A Sun-like model: Eddington's standard model (n = 3) with the IAU 2015 nominal solar mass, radius,
     * luminosity and its surface at the nominal T_eff = 5772 K, X = 0.70, Z = 0.02. The Sun's
     * Delta nu is about 135 microhertz (value from memory; Kjeldsen &amp; Bedding 1995 scale from it).
     * The n = 3 model cannot match it closely: near the surface c_s^2 = Gamma_1 g z / (n + 1) at depth z,
     * so its envelope is slower than the Sun's convective, n ~ 3/2 one by up to sqrt(4 / 2.5) = 1.26
     * where the outer layers dominate tau. So Delta nu must lie below 135 microhertz, within 10 %.
     */
    @Tag(CheckKind.EXTERNAL)
    @Test
    void sunLikeModelHasALargeSeparationNearTheSolarValue() {
        EddingtonStandardModel sun = new EddingtonStandardModel(Iau2015.SOLAR_MASS, Iau2015.SOLAR_RADIUS,
                Iau2015.SOLAR_LUMINOSITY, 0.70, 0.02, 16);
        SeismicSummary s = diagnose(sun.profile("Sun-like n = 3", 600, Iau2015.SOLAR_EFFECTIVE_TEMPERATURE))
                .seismic().orElseThrow();
        double dnu = s.largeSeparation() * 1e6;
        assertEquals(135.0, dnu, 13.5, "Delta nu (uHz)");
        assertTrue(dnu < 135.0, "slower envelope than the Sun's: " + dnu);
    }
}
