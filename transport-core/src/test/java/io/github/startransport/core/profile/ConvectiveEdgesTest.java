package io.github.startransport.core.profile;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.InvalidOptionException;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileDiagnoser;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.Transport;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The edges of convective regions in a diagnosis: overshoot applied across the profile, and the
 * self-consistency margin of Gabriel et al. (2014, A&amp;A 569, A63) on a smooth profile and on one with a
 * composition step at the convective core's edge.
 */
class ConvectiveEdgesTest {
    private static final Transport TRANSPORT = Transport.discover();

    private static ProfileDiagnosis diagnose(ProfileDiagnoser diagnoser, Profile p, String criterion) {
        return diagnoser.diagnose(p, LocalDiagnosisTest.setup(criterion));
    }

    private static List<Region> convective(ProfileDiagnosis d) {
        return d.regions().stream().filter(r -> r.regime() == Regime.CONVECTIVE).toList();
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void withoutOvershootTheColumnIsZeroAndNoReachIsReported() {
        ProfileDiagnosis d = diagnose(LocalDiagnosis.INSTANCE, new DemoStar(400).profile(), "schwarzschild");
        for (double v : d.column(DiagnosisColumn.OVERSHOOT_DIFFUSION)) {
            assertEquals(0.0, v);
        }
        for (Region r : d.regions()) {
            assertTrue(r.overshootBottom().isEmpty() && r.overshootTop().isEmpty(), r.toString());
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void exponentialOvershootMixesBeyondBothInnerEdgesAndOnlyRaisesDMix() {
        Profile star = new DemoStar(800).profile();
        ProfileDiagnosis plain = diagnose(LocalDiagnosis.INSTANCE, star, "schwarzschild");
        ProfileDiagnoser withOvershoot = TRANSPORT.diagnoser(null, ModelOptions.parse("overshoot-f=0.016"));
        ProfileDiagnosis d = diagnose(withOvershoot, star, "schwarzschild");
        // overshoot changes mixing only: every other column is the same
        for (DiagnosisColumn c : DiagnosisColumn.values()) {
            if (c != DiagnosisColumn.DIFFUSION && c != DiagnosisColumn.OVERSHOOT_DIFFUSION) {
                assertArrayEquals(plain.column(c), d.column(c), c.header());
            }
        }
        assertArrayEquals(plain.regimes(), d.regimes());
        double[] own = plain.column(DiagnosisColumn.DIFFUSION);
        double[] ov = d.column(DiagnosisColumn.OVERSHOOT_DIFFUSION);
        double[] mix = d.column(DiagnosisColumn.DIFFUSION);
        double[] r = d.column(DiagnosisColumn.RADIUS);
        for (int k = 0; k < d.size(); k++) {
            assertEquals(Math.max(own[k], ov[k]), mix[k], "zone " + k);
        }
        List<Region> regions = convective(d);
        Region core = regions.get(0);
        Region envelope = regions.get(1);
        // above the core and below the envelope, and nowhere at the centre or the surface
        assertTrue(core.overshootBottom().isEmpty() && envelope.overshootTop().isEmpty());
        double coreReach = core.overshootTop().orElseThrow();
        double envelopeReach = envelope.overshootBottom().orElseThrow();
        assertTrue(coreReach > core.topRadius(), core.toString());
        assertTrue(envelopeReach < envelope.bottomRadius(), envelope.toString());
        // every radiative zone between an edge and its reach mixes, none beyond
        for (int k = 0; k < d.size(); k++) {
            boolean aboveCore = r[k] > core.topRadius() && r[k] < coreReach;
            boolean belowEnvelope = r[k] < envelope.bottomRadius() && r[k] > envelopeReach;
            boolean beyond = (r[k] > coreReach && r[k] < envelopeReach);
            if (aboveCore || belowEnvelope) {
                assertTrue(ov[k] > 0.0 && mix[k] > own[k], "zone " + k + " inside the overshoot layer");
            }
            if (beyond) {
                assertEquals(0.0, ov[k], "zone " + k + " beyond the reach");
            }
        }
        // the exponential reaches the 1e-2 cm^2/s floor (f / 2) ln(D_0 / floor) H beyond r_0, which lies f0 H
        // inside the edge: for convective coefficients of 1e10 to 1e18 cm^2/s that is 0.2 to 0.33 H for f = 0.016
        double hp = d.value(DiagnosisColumn.SCALE_HEIGHT, core.lastZone());
        double depth = (coreReach - core.topRadius()) / Math.min(hp, core.topRadius());
        assertTrue(depth > 0.1 && depth < 0.4, "overshoot depth " + depth + " H");
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void stepOvershootGoesAlphaHBeyondTheCoreWithHLimitedByTheCoreRadius() {
        Profile star = new DemoStar(800).profile();
        ProfileDiagnoser diagnoser = TRANSPORT.diagnoser(null, ModelOptions.parse("overshoot-step=0.2"));
        ProfileDiagnosis d = diagnose(diagnoser, star, "schwarzschild");
        Region core = convective(d).get(0);
        double top = core.topRadius();
        // H_P at the edge, linear between the two zones around it
        double[] r = d.column(DiagnosisColumn.RADIUS);
        double[] hp = d.column(DiagnosisColumn.SCALE_HEIGHT);
        int k = core.lastZone();
        double hpEdge = hp[k] + (top - r[k]) / (r[k + 1] - r[k]) * (hp[k + 1] - hp[k]);
        double h = Math.min(hpEdge, top);
        assertEquals(top + 0.2 * h, core.overshootTop().orElseThrow(), 1e-9 * top);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void overshootOptionsAreCheckedWhenTheDiagnoserIsCreated() {
        assertThrows(InvalidOptionException.class,
                () -> TRANSPORT.diagnoser(null, ModelOptions.parse("overshoot-f=0.016,overshoot-step=0.2")));
        assertThrows(InvalidOptionException.class,
                () -> TRANSPORT.diagnoser(null, ModelOptions.parse("overshoot-f=-1")));
        assertThrows(InvalidOptionException.class,
                () -> TRANSPORT.diagnoser(null, ModelOptions.parse("overshoot-f0=1.5")));
        assertThrows(InvalidOptionException.class,
                () -> TRANSPORT.diagnoser(null, ModelOptions.parse("overshot-f=0.016")));
    }

    @Tag(CheckKind.LAW)
    @Test
    void smoothProfileEdgesAreSelfConsistentAndConvergeToZeroMargin() {
        // Gabriel et al. (2014): with no composition jump the criterion is marginal at the edge, so the
        // margin extrapolated from the convective side must vanish as the zones get finer
        for (String criterion : List.of("schwarzschild", "ledoux")) {
            double[] coarse = null;
            for (int zones : new int[] {200, 3200}) {
                ProfileDiagnosis d = diagnose(LocalDiagnosis.INSTANCE, new DemoStar(zones).profile(), criterion);
                List<Region> regions = convective(d);
                double coreTop = regions.get(0).marginInsideTop().orElseThrow();
                double envelopeBottom = regions.get(1).marginInsideBottom().orElseThrow();
                assertTrue(regions.get(0).marginInsideBottom().isEmpty(), "no edge at the centre");
                assertTrue(regions.get(1).marginInsideTop().isEmpty(), "no edge at the surface");
                assertTrue(Math.abs(coreTop) < BoundaryMargins.MISPLACED, criterion + " " + zones + ": " + coreTop);
                assertTrue(Math.abs(envelopeBottom) < BoundaryMargins.MISPLACED, criterion + " " + zones);
                assertTrue(d.warnings().stream().noneMatch(w -> w.contains("not self-consistent")), d.warnings()
                        .toString());
                if (coarse == null) {
                    coarse = new double[] {coreTop, envelopeBottom};
                } else {
                    // 16 times finer zones: at least first-order convergence gives a factor 16
                    assertTrue(Math.abs(coreTop) < Math.abs(coarse[0]) / 10, coreTop + " vs " + coarse[0]);
                    assertTrue(Math.abs(envelopeBottom) < Math.abs(coarse[1]) / 10, envelopeBottom + " vs " + coarse[1]);
                }
            }
        }
    }

    @Tag(CheckKind.LAW)
    @Test
    void aCompositionStepAtTheCoresEdgeIsReportedAsMisplacedUnderLedoux() {
        Profile smooth = new DemoStar(800).profile();
        ProfileDiagnosis base = diagnose(LocalDiagnosis.INSTANCE, smooth, "schwarzschild");
        double[] nablaRad = base.column(DiagnosisColumn.NABLA_RAD);
        double[] nablaAd = base.column(DiagnosisColumn.NABLA_AD);
        // put the step (X = 0.5 inside, 0.7 outside) where the smooth core is still clearly unstable,
        // nabla_rad / nabla_ad >= 1.6
        int step = base.regions().get(0).lastZone();
        while (nablaRad[step] / nablaAd[step] < 1.6) {
            step--;
        }
        Profile p = LocalDiagnosisTest.withStep(smooth, step);
        ProfileDiagnosis ledoux = diagnose(LocalDiagnosis.INSTANCE, p, "ledoux");
        Region core = ledoux.regions().get(0);
        assertEquals(Regime.CONVECTIVE, core.regime());
        assertTrue(core.lastZone() <= step, "the Ledoux core ends at the step: " + core);
        // kappa of the ionised core is proportional to 1 + X (Thomson scattering and Kramers' laws), so lowering X
        // from 0.7 to 0.5 lowers nabla_rad by at most 1.5/1.7: the convective side keeps
        // nabla_rad / nabla_ad >= 1.6 * 1.5 / 1.7 = 1.41 at the step, a margin well above 0
        double margin = core.marginInsideTop().orElseThrow();
        assertTrue(margin > 0.2, "margin inside the step " + margin);
        assertTrue(ledoux.warnings().stream().anyMatch(w -> w.contains("top edge") && w.contains("not self-consistent")
                && w.contains("outwards")), ledoux.warnings().toString());
        // under Schwarzschild the composition gradient is ignored and the core reaches its smooth edge
        ProfileDiagnosis schwarzschild = diagnose(LocalDiagnosis.INSTANCE, p, "schwarzschild");
        double plain = schwarzschild.regions().get(0).marginInsideTop().orElseThrow();
        assertTrue(Math.abs(plain) < BoundaryMargins.MISPLACED, "Schwarzschild margin " + plain);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void hostsGetTheSameOvershootThroughTheBatchCall() {
        Profile star = new DemoStar(600).profile();
        ProfileDiagnoser diagnoser = TRANSPORT.diagnoser(null, ModelOptions.parse("overshoot-f=0.02,overshoot-f0=0.01"));
        ProfileDiagnosis plain = diagnose(LocalDiagnosis.INSTANCE, star, "schwarzschild");
        ProfileDiagnosis d = diagnose(diagnoser, star, "schwarzschild");
        List<Region> regions = convective(plain);
        double[] bottoms = regions.stream().mapToDouble(Region::bottomRadius).toArray();
        double[] tops = regions.stream().mapToDouble(Region::topRadius).toArray();
        double[] out = new double[plain.size()];
        double[] reachBottom = new double[bottoms.length];
        double[] reachTop = new double[bottoms.length];
        diagnoser.overshoot(plain.column(DiagnosisColumn.RADIUS), plain.column(DiagnosisColumn.SCALE_HEIGHT),
                plain.column(DiagnosisColumn.DIFFUSION), bottoms, tops, out, reachBottom, reachTop);
        assertArrayEquals(d.column(DiagnosisColumn.OVERSHOOT_DIFFUSION), out);
        assertEquals(convective(d).get(0).overshootTop().orElseThrow(), reachTop[0]);
        assertEquals(convective(d).get(1).overshootBottom().orElseThrow(), reachBottom[1]);
        assertTrue(Double.isNaN(reachBottom[0]) && Double.isNaN(reachTop[1]));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void withTheEdgeDistanceAsLengthScaleEachConvectiveZoneGetsItsDistanceToTheNearestInnerEdge() {
        Profile star = new DemoStar(600).profile();
        io.github.startransport.spi.ConvectionModel spectrum = TRANSPORT.convection("eddy-spectrum",
                ModelOptions.parse("length-scale=edge-distance"));
        io.github.startransport.spi.DiagnosisSetup setup = new io.github.startransport.spi.DiagnosisSetup(spectrum,
                TRANSPORT.opacity(null, ModelOptions.defaults()), TRANSPORT.thermodynamics(null, ModelOptions.defaults()));
        ProfileDiagnosis d = LocalDiagnosis.INSTANCE.diagnose(star, setup);
        // the regimes do not depend on the length scale: the same as the default model's
        assertArrayEquals(diagnose(LocalDiagnosis.INSTANCE, star, "schwarzschild").regimes(), d.regimes());
        List<Region> regions = convective(d);
        io.github.startransport.spi.ZoneState z = new io.github.startransport.spi.ZoneState();
        io.github.startransport.spi.ConvectionResult out = new io.github.startransport.spi.ConvectionResult();
        int checked = 0;
        for (Region g : regions) {
            for (int k = g.firstZone(); k <= g.lastZone(); k++) {
                // distance to the nearer edge inside the star (the centre and the surface are no edges)
                double r = d.value(DiagnosisColumn.RADIUS, k);
                double distance = Double.POSITIVE_INFINITY;
                if (g.firstZone() > 0) {
                    distance = Math.min(distance, r - g.bottomRadius());
                }
                if (g.lastZone() < d.size() - 1) {
                    distance = Math.min(distance, g.topRadius() - r);
                }
                z.radius = r;
                z.mass = d.value(DiagnosisColumn.MASS, k);
                z.temperature = d.value(DiagnosisColumn.TEMPERATURE, k);
                z.density = d.value(DiagnosisColumn.DENSITY, k);
                z.pressure = d.value(DiagnosisColumn.PRESSURE, k);
                z.luminosity = d.value(DiagnosisColumn.LUMINOSITY, k);
                z.opacity = d.value(DiagnosisColumn.OPACITY, k);
                z.cp = d.value(DiagnosisColumn.CP, k);
                z.nablaAd = d.value(DiagnosisColumn.NABLA_AD, k);
                z.delta = d.value(DiagnosisColumn.DELTA, k);
                z.nablaMu = d.value(DiagnosisColumn.NABLA_MU, k);
                z.phi = 1.0;
                z.edgeDistance = distance;
                spectrum.solve(z, out);
                assertEquals(out.nabla, d.value(DiagnosisColumn.NABLA, k), "zone " + k);
                assertEquals(out.velocity, d.value(DiagnosisColumn.VELOCITY, k), "zone " + k);
                checked++;
            }
        }
        assertTrue(checked > 50, checked + " convective zones");
    }
}
