package io.github.startransport.core.profile;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.Transport;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Whole-profile diagnosis of the demo star and of profiles derived from it. */
class LocalDiagnosisTest {
    private static final Transport TRANSPORT = Transport.discover();

    static DiagnosisSetup setup(String criterion) {
        return new DiagnosisSetup(TRANSPORT.convection(null, ModelOptions.parse("criterion=" + criterion)),
                TRANSPORT.opacity(null, ModelOptions.defaults()), TRANSPORT.thermodynamics(null, ModelOptions.defaults()));
    }

    static ProfileDiagnosis diagnose(Profile p, String criterion) {
        return LocalDiagnosis.INSTANCE.diagnose(p, setup(criterion));
    }

    static Map<ProfileColumn, double[]> columns(Profile p) {
        Map<ProfileColumn, double[]> m = new EnumMap<>(ProfileColumn.class);
        for (ProfileColumn c : ProfileColumn.values()) {
            if (p.has(c)) {
                m.put(c, p.column(c));
            }
        }
        return m;
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void demoStarHasAConvectiveCoreAndAConvectiveEnvelope() {
        ProfileDiagnosis d = diagnose(new DemoStar(800).profile(), "schwarzschild");
        List<Region> convective = d.regions().stream().filter(r -> r.regime() == Regime.CONVECTIVE).toList();
        assertEquals(2, convective.size(), d.regions().toString());
        assertEquals(0.0, convective.get(0).bottomRadius());
        assertEquals(d.radius(), convective.get(1).topRadius());
        // every convective region has turnover times; radiative zones have v = 0
        for (Region r : convective) {
            assertTrue(r.turnoverGlobal().isPresent() && r.turnoverLocal().isPresent() && r.maxVelocity().isPresent());
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void photonDiffusionTimeOfTheDemoStarIsInTheRangeQuotedForSunLikeStars() {
        // "thousands to hundreds of thousands of years" for a Sun-like star: ~1.7e5 yr for the Sun
        // (Mitalas & Sills 1992, ApJ 401, 759; figure from memory), ~1e4 yr from crude uniform estimates
        // (Hansen, Kawaler & Trimble 2004 §1.3, from memory)
        ProfileDiagnosis d = diagnose(new DemoStar(800).profile(), "schwarzschild");
        double years = d.timescales().photonDiffusion() / Iau2015.JULIAN_YEAR;
        assertTrue(years > 1e3 && years < 1e6, "t_gamma = " + years + " yr");
        // heat leaks out far more slowly than photons random-walk (Stix 2003, Sol. Phys. 212, 3)
        assertTrue(d.timescales().thermalDiffusion() > 10 * d.timescales().photonDiffusion());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void reversingTheZoneOrderChangesNothing() {
        Profile forward = new DemoStar(500).profile();
        Map<ProfileColumn, double[]> cols = columns(forward);
        for (double[] v : cols.values()) {
            for (int i = 0, j = v.length - 1; i < j; i++, j--) {
                double t = v[i];
                v[i] = v[j];
                v[j] = t;
            }
        }
        Profile backward = new Profile("reversed", cols);
        ProfileDiagnosis a = diagnose(forward, "ledoux");
        ProfileDiagnosis b = diagnose(backward, "ledoux");
        for (DiagnosisColumn c : DiagnosisColumn.values()) {
            assertArrayEquals(a.column(c), b.column(c), c.header());
        }
        assertArrayEquals(a.regimes(), b.regimes());
        assertEquals(a.regions(), b.regions());
        assertEquals(a.timescales(), b.timescales());
    }

    /** Demo star with a composition step: X = 0.5 inside zone k0, 0.7 outside. */
    static Profile withStep(Profile p, int k0) {
        Map<ProfileColumn, double[]> cols = columns(p);
        double[] x = cols.get(ProfileColumn.HYDROGEN);
        for (int k = 0; k <= k0; k++) {
            x[k] = 0.5;
        }
        return new Profile("step", cols);
    }

    @Tag(CheckKind.LAW)
    @Test
    void aCompositionStepIsSemiconvectiveUnderLedouxAndConvectiveUnderSchwarzschild() {
        Profile smooth = new DemoStar(800).profile();
        ProfileDiagnosis base = diagnose(smooth, "schwarzschild");
        int coreTop = base.regions().get(0).lastZone();
        int step = coreTop - 6; // a few zones inside the Schwarzschild core
        Profile p = withStep(smooth, step);
        ProfileDiagnosis s = diagnose(p, "schwarzschild");
        ProfileDiagnosis l = diagnose(p, "ledoux");
        Regime[] rs = s.regimes();
        Regime[] rl = l.regimes();
        Region semi = l.regions().stream().filter(r -> r.regime() == Regime.SEMICONVECTIVE).findFirst().orElseThrow(
                () -> new AssertionError("no semiconvective region under Ledoux: " + l.regions()));
        for (int k = semi.firstZone(); k <= semi.lastZone(); k++) {
            assertEquals(Regime.CONVECTIVE, rs[k], "zone " + k + " under Schwarzschild");
            assertEquals(Regime.SEMICONVECTIVE, rl[k]);
        }
        // the semiconvective layer sits at the step, where nabla_mu > 0
        assertTrue(semi.firstZone() <= step + 1 && semi.lastZone() >= step, semi.toString());
        // both boundaries reported, and they differ: the Ledoux margin changes sign at the step, the
        // Schwarzschild margin where a region of the Schwarzschild diagnosis ends
        double ledouxBottom = semi.bottomLedoux().orElseThrow();
        double schwarzschildTop = semi.topSchwarzschild().orElseThrow();
        assertNotEquals(ledouxBottom, schwarzschildTop);
        assertTrue(s.regions().stream().anyMatch(r -> Math.abs(r.topRadius() - schwarzschildTop) <= 1e-9 * schwarzschildTop
                        || Math.abs(r.bottomRadius() - schwarzschildTop) <= 1e-9 * schwarzschildTop),
                schwarzschildTop + " is no edge of " + s.regions());
    }

    /**
     * A composition inversion above the core (X = 0.75 inside zone k0, 0.70 outside, so mu rises outwards
     * and nabla_mu &lt; 0 at the step): where nabla_rad &gt; nabla_L the zones are dynamically unstable
     * (Kippenhahn, Ruschenplatt &amp; Thomas 1980: R0 &lt; 1) and convective under both criteria, with the
     * same v and D; every zone's regime is the rule table's for its own gradients
     * ({@link io.github.startransport.core.gradient.StabilityClassifier}); the convective region's edges
     * lie where nabla_rad - nabla_L changes sign.
     */
    @Tag(CheckKind.LAW)
    @Test
    void anInvertedCompositionStepConvectsUnderBothCriteria() {
        Profile smooth = new DemoStar(800).profile();
        int coreTop = diagnose(smooth, "schwarzschild").regions().get(0).lastZone();
        int k0 = coreTop + 15;
        Map<ProfileColumn, double[]> cols = columns(smooth);
        double[] x = cols.get(ProfileColumn.HYDROGEN);
        for (int k = 0; k <= k0; k++) {
            x[k] = 0.75;
        }
        Profile p = new Profile("inverted step", cols);
        ProfileDiagnosis s = diagnose(p, "schwarzschild");
        ProfileDiagnosis l = diagnose(p, "ledoux");
        double[] nablaRad = s.column(DiagnosisColumn.NABLA_RAD);
        double[] nablaL = s.column(DiagnosisColumn.NABLA_LEDOUX);
        double[] nablaAd = s.column(DiagnosisColumn.NABLA_AD);
        double[] nablaMu = s.column(DiagnosisColumn.NABLA_MU);
        double[] r = s.column(DiagnosisColumn.RADIUS);
        int unstable = 0;
        for (int k = 0; k < p.size(); k++) {
            for (ProfileDiagnosis d : List.of(s, l)) {
                io.github.startransport.spi.Criterion c = d == s ? io.github.startransport.spi.Criterion.SCHWARZSCHILD
                        : io.github.startransport.spi.Criterion.LEDOUX;
                assertEquals(io.github.startransport.core.gradient.StabilityClassifier.classify(c, nablaRad[k],
                        nablaAd[k], nablaL[k], nablaMu[k]), d.regimes()[k], "zone " + k + " under " + c);
                assertEquals(d.regimes()[k] != Regime.RADIATIVE, d.column(DiagnosisColumn.DIFFUSION)[k] > 0.0);
            }
            if (nablaMu[k] < 0.0 && nablaRad[k] > nablaL[k] && nablaRad[k] <= nablaAd[k]) {
                unstable++;
                assertEquals(Regime.CONVECTIVE, s.regimes()[k], "zone " + k);
                assertEquals(Regime.CONVECTIVE, l.regimes()[k], "zone " + k);
                assertTrue(s.column(DiagnosisColumn.VELOCITY)[k] > 0.0);
                assertEquals(s.column(DiagnosisColumn.VELOCITY)[k], l.column(DiagnosisColumn.VELOCITY)[k]);
                assertEquals(s.column(DiagnosisColumn.DIFFUSION)[k], l.column(DiagnosisColumn.DIFFUSION)[k]);
                assertEquals(s.column(DiagnosisColumn.NABLA)[k], l.column(DiagnosisColumn.NABLA)[k]);
            }
        }
        assertTrue(unstable > 0, "the step makes Schwarzschild-stable zones Ledoux-unstable");
        Region step = s.regions().stream()
                .filter(g -> g.regime() == Regime.CONVECTIVE && g.firstZone() > coreTop && g.lastZone() < p.size() - 50)
                .findFirst().orElseThrow(() -> new AssertionError("no convective region at the step: " + s.regions()));
        int a = step.firstZone() - 1;
        double f0 = nablaRad[a] - nablaL[a];
        double f1 = nablaRad[a + 1] - nablaL[a + 1];
        assertEquals(r[a] + (r[a + 1] - r[a]) * f0 / (f0 - f1), step.bottomRadius(), 1e-9 * r[a]);
        int b = step.lastZone();
        double g0 = nablaRad[b] - nablaL[b];
        double g1 = nablaRad[b + 1] - nablaL[b + 1];
        assertEquals(r[b] + (r[b + 1] - r[b]) * g0 / (g0 - g1), step.topRadius(), 1e-9 * r[b]);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void resamplingConvergesAtSecondOrder() {
        // boundary by linear interpolation and trapezoidal integrals: error O(h^2) expected (common practice)
        int[] zones = {400, 800, 1600, 3200};
        double[] top = new double[zones.length];
        double[] photon = new double[zones.length];
        for (int i = 0; i < zones.length; i++) {
            ProfileDiagnosis d = diagnose(new DemoStar(zones[i]).profile(), "schwarzschild");
            top[i] = d.regions().get(0).topRadiusFraction();
            photon[i] = d.timescales().photonDiffusion();
        }
        double orderTop = Math.log(Math.abs(top[0] - top[1]) / Math.abs(top[1] - top[2])) / Math.log(2);
        double orderPhoton = Math.log(Math.abs(photon[0] - photon[1]) / Math.abs(photon[1] - photon[2])) / Math.log(2);
        System.out.printf("resampling: core top r/R %s, observed order %.2f; t_gamma %s s, observed order %.2f%n",
                Arrays.toString(top), orderTop, Arrays.toString(photon), orderPhoton);
        assertTrue(orderTop > 1.5, "core boundary order " + orderTop);
        assertTrue(orderPhoton > 1.5, "photon diffusion order " + orderPhoton);
        assertEquals(top[3], top[2], 1e-4);
        assertEquals(photon[3], photon[2], 1e-4 * photon[3]);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void turnoverTimesConvergeWithResolution() {
        // A converged quantity changes by less than 1 % when the zones are doubled (common practice, no source).
        // The core's global time is its radius over its mass-weighted mean velocity: the integral of dr / v
        // diverged logarithmically (152, 174, 197, 220, 242 d at 200-3200 zones before this definition). The
        // envelope integral converges more slowly (its integrand ~ (r - r_b)^-1/3 at the base), so it is
        // checked from 800 zones on.
        int[] zones = {400, 800, 1600, 3200};
        List<List<Region>> runs = new java.util.ArrayList<>();
        for (int n : zones) {
            runs.add(diagnose(new DemoStar(n).profile(), "schwarzschild").regions().stream()
                    .filter(r -> r.regime() == Regime.CONVECTIVE).toList());
        }
        for (int i = 1; i < zones.length; i++) {
            List<Region> coarse = runs.get(i - 1);
            List<Region> fine = runs.get(i);
            assertEquals(coarse.size(), fine.size());
            for (int j = 0; j < fine.size(); j++) {
                boolean core = fine.get(j).bottomRadius() == 0.0;
                if (!core && zones[i - 1] < 800) {
                    continue;
                }
                for (boolean global : new boolean[] {true, false}) {
                    double a = (global ? coarse.get(j).turnoverGlobal() : coarse.get(j).turnoverLocal()).orElseThrow();
                    double b = (global ? fine.get(j).turnoverGlobal() : fine.get(j).turnoverLocal()).orElseThrow();
                    assertEquals(b, a, 0.01 * b, (core ? "core" : "region " + j) + (global ? " global" : " local")
                            + " turnover, " + zones[i - 1] + " -> " + zones[i] + " zones");
                }
            }
        }
    }

    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 8, seed = "503")
    void regionsDoNotDependOnTheZoneCountBeyondDiscretisation(@ForAll @IntRange(min = 300, max = 2500) int n) {
        ProfileDiagnosis ref = diagnose(new DemoStar(3000).profile(), "schwarzschild");
        ProfileDiagnosis d = diagnose(new DemoStar(n).profile(), "schwarzschild");
        assertEquals(ref.regions().size(), d.regions().size());
        for (int i = 0; i < ref.regions().size(); i++) {
            Region a = ref.regions().get(i);
            Region b = d.regions().get(i);
            assertEquals(a.regime(), b.regime());
            assertEquals(a.bottomRadiusFraction(), b.bottomRadiusFraction(), 2e-3);
            assertEquals(a.topRadiusFraction(), b.topRadiusFraction(), 2e-3);
        }
        assertEquals(ref.timescales().photonDiffusion(), d.timescales().photonDiffusion(),
                1e-2 * ref.timescales().photonDiffusion());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void fallbackThermodynamicsAndItsLimitsAreReported() {
        ProfileDiagnosis d = diagnose(new DemoStar(300).profile(), "schwarzschild");
        assertTrue(d.warnings().stream().anyMatch(w -> w.contains("fallback") && w.contains("saha-ionising-gas")),
                d.warnings().toString());
        // the demo star's centre (T ~ 2e7 K, rho ~ 25 g cm^-3): the Saha equation alone would leave ~6 % of
        // hydrogen neutral there (Kippenhahn, Weigert & Weiss 2012 §14.5 on pressure ionisation, from memory)
        assertTrue(d.warnings().stream().anyMatch(w -> w.contains("pressure-ionised")), d.warnings().toString());
        // given c_P, nabla_ad and delta columns, no fallback warning
        Profile p = new DemoStar(300).profile();
        Map<ProfileColumn, double[]> cols = columns(p);
        cols.put(ProfileColumn.CP, d.column(DiagnosisColumn.CP));
        cols.put(ProfileColumn.NABLA_AD, d.column(DiagnosisColumn.NABLA_AD));
        cols.put(ProfileColumn.DELTA, d.column(DiagnosisColumn.DELTA));
        ProfileDiagnosis given = diagnose(new Profile("given", cols), "schwarzschild");
        assertTrue(given.warnings().stream().noneMatch(w -> w.contains("fallback")), given.warnings().toString());
    }

    // ---- refusals with zone index and column ----

    private static Map<ProfileColumn, double[]> small() {
        return columns(new DemoStar(20).profile());
    }

    private static InvalidInputException refused(Map<ProfileColumn, double[]> cols) {
        return assertThrows(InvalidInputException.class, () -> new Profile("bad", cols));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void nonMonotonicRadiusIsRefusedWithZoneAndColumn() {
        Map<ProfileColumn, double[]> cols = small();
        cols.get(ProfileColumn.RADIUS)[7] = cols.get(ProfileColumn.RADIUS)[5];
        InvalidInputException e = refused(cols);
        assertEquals("r_cm", e.field());
        assertEquals(7, e.zone());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void nonMonotonicMassIsRefusedWithZoneAndColumn() {
        Map<ProfileColumn, double[]> cols = small();
        cols.get(ProfileColumn.MASS)[9] = cols.get(ProfileColumn.MASS)[8] * 0.5;
        InvalidInputException e = refused(cols);
        assertEquals("m_g", e.field());
        assertEquals(9, e.zone());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void duplicateZoneIsRefused() {
        Map<ProfileColumn, double[]> cols = small();
        for (double[] v : cols.values()) {
            v[4] = v[3];
        }
        InvalidInputException e = refused(cols);
        assertEquals("r_cm", e.field());
        assertEquals(4, e.zone());
        assertTrue(e.getMessage().contains("duplicate"), e.getMessage());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void nonFiniteValueIsRefusedWithZoneAndColumn() {
        Map<ProfileColumn, double[]> cols = small();
        cols.get(ProfileColumn.TEMPERATURE)[11] = Double.NaN;
        InvalidInputException e = refused(cols);
        assertEquals("T_K", e.field());
        assertEquals(11, e.zone());
        Map<ProfileColumn, double[]> cols2 = small();
        cols2.get(ProfileColumn.LUMINOSITY)[2] = Double.POSITIVE_INFINITY;
        e = refused(cols2);
        assertEquals("L_erg_s", e.field());
        assertEquals(2, e.zone());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void zoneIndexRefersToTheOrderGiven() {
        Map<ProfileColumn, double[]> cols = small();
        for (double[] v : cols.values()) {
            for (int i = 0, j = v.length - 1; i < j; i++, j--) {
                double t = v[i];
                v[i] = v[j];
                v[j] = t;
            }
        }
        // zone 3 as given (surface first) is zone n - 4 from the centre
        cols.get(ProfileColumn.MASS)[3] = cols.get(ProfileColumn.MASS)[4] * 0.9;
        InvalidInputException e = refused(cols);
        assertEquals("m_g", e.field());
        assertTrue(e.zone() == 3 || e.zone() == 4, "zone " + e.zone());
    }
}
