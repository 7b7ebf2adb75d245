package io.github.startransport.core.profile;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The profile's own gradient nabla_model against the transport physics' nabla. */
class ModelConsistencyTest {

    @Tag(CheckKind.EXTERNAL)
    @Test
    void stencilIsExactForQuadraticsInLnP() {
        // The three-point formulas (centred inside, one-sided at the ends) are exact for quadratics
        // (Fornberg 1988, Math. Comp. 51, 699): ln T = a + b x + c x^2 with x = ln P, on an uneven grid.
        int n = 9;
        double[] p = new double[n];
        double[] t = new double[n];
        double[] expected = new double[n];
        double x = Math.log(1e17);
        for (int k = 0; k < n; k++) {
            x -= 0.3 + 0.17 * (k % 3); // uneven steps, pressure falling outwards
            p[k] = Math.exp(x);
            t[k] = Math.exp(2.0 + 0.31 * x - 0.004 * x * x);
            expected[k] = 0.31 - 0.008 * x;
        }
        double[] out = new double[n];
        ModelConsistency.nablaModel(t, p, out);
        for (int k = 0; k < n; k++) {
            assertEquals(expected[k], out[k], 1e-10, "zone " + k);
        }
        // a zone whose stencil holds equal pressures gets NaN, the others a value
        p[4] = p[3];
        ModelConsistency.nablaModel(t, p, out);
        assertTrue(Double.isNaN(out[3]) && Double.isNaN(out[4]) && Double.isFinite(out[5]) && Double.isFinite(out[2]));
        assertEquals(expected[1], out[1], 1e-10);
        assertEquals(expected[7], out[7], 1e-10);
        // pressure rising outwards at either end: the end zones get NaN as well
        p[4] = 0.5 * (p[3] + p[5]);
        p[0] = 0.9 * p[1];
        p[8] = 1.1 * p[7];
        ModelConsistency.nablaModel(t, p, out);
        assertTrue(Double.isNaN(out[0]) && Double.isNaN(out[1]) && Double.isNaN(out[7]) && Double.isNaN(out[8]));
        assertTrue(Double.isFinite(out[4]));
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void demoStarIsAnNEquals3PolytropeAndItsConvectiveZonesAreInconsistent() {
        // Eddington's standard model: T ~ theta, P ~ theta^4, so d ln T / d ln P = 1/4 exactly everywhere
        // (Eddington 1926; Kippenhahn, Weigert & Weiss 2012 §19.4). Its convective zones, where the physics
        // gives nabla ~ nabla_ad ~ 0.4 (efficient convection, Kippenhahn, Weigert & Weiss 2012 §7.3), must
        // therefore be reported inconsistent: |0.25 - 0.4| / 0.4 = 0.375 > 0.1.
        ProfileDiagnosis d = LocalDiagnosisTest.diagnose(new DemoStar(800).profile(), "schwarzschild");
        double[] nablaModel = d.column(DiagnosisColumn.NABLA_MODEL);
        for (double v : nablaModel) {
            assertEquals(0.25, v, 1e-9);
        }
        Regime[] regimes = d.regimes();
        double[] mismatch = d.column(DiagnosisColumn.NABLA_MISMATCH);
        double[] nabla = d.column(DiagnosisColumn.NABLA);
        double[] nablaAd = d.column(DiagnosisColumn.NABLA_AD);
        int flagged = 0;
        for (Region r : d.regions()) {
            if (r.regime() != Regime.CONVECTIVE) {
                continue;
            }
            assertTrue(d.maxNablaMismatch(r.firstZone(), r.lastZone()) > ModelConsistency.THRESHOLD, r.toString());
            for (int k = r.firstZone(); k <= r.lastZone(); k++) {
                assertEquals(Math.abs(0.25 - nabla[k]) / nablaAd[k], mismatch[k], 1e-9, "zone " + k);
                if (nabla[k] > 0.25 * 1.2 || nabla[k] < 0.25 / 1.2) {
                    assertTrue(mismatch[k] > ModelConsistency.THRESHOLD, "zone " + k + " not flagged");
                    flagged++;
                }
            }
        }
        assertTrue(flagged > 100, flagged + " convective zones flagged");
        assertTrue(d.maxNablaMismatch() > 0.3);
        String warning = d.warnings().stream().filter(w -> w.contains("disagree")).findFirst()
                .orElseThrow(() -> new AssertionError(d.warnings().toString()));
        Region core = d.regions().get(0);
        assertTrue(warning.contains("0-") && warning.contains("(convective)"), warning);
        assertEquals(Regime.CONVECTIVE, regimes[core.firstZone()]);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void aProfileBuiltFromThePhysicsOwnGradientIsConsistent() {
        // Keep the demo star's r, m, rho, P, L, X, Z and rebuild T by integrating d ln T / d ln P = nabla, with
        // nabla from the same transport physics (Heun's method in ln P from the centre outwards, the zones as
        // steps), over the zones hotter than 2e5 K. Then nabla_model differs from the physics' nabla only by discretisation errors, O(h^2) with
        // h = Delta ln P (<= 0.1 here) where nabla is smooth, O(h) at the kinks of nabla at convective
        // boundaries: far below the 0.1 of the consistency threshold. Required: < 0.03 in every zone, and no
        // inconsistency warning. As a control the same check must fail for the unmodified demo star (above).
        // Only the zones hotter than 2e5 K: in the outer layers nabla depends so steeply on T (kappa_H- ~ T^9,
        // nabla_rad ~ kappa / T^4) that an explicit step is unstable, and there the fully ionised fallback
        // equation of state is wrong anyway.
        Map<ProfileColumn, double[]> cols = LocalDiagnosisTest.columns(new DemoStar(1600).profile());
        double[] demoT = cols.get(ProfileColumn.TEMPERATURE);
        int zones = 0;
        while (zones < demoT.length && demoT[zones] > 2e5) {
            zones++;
        }
        for (Map.Entry<ProfileColumn, double[]> e : cols.entrySet()) {
            e.setValue(java.util.Arrays.copyOf(e.getValue(), zones));
        }
        DiagnosisSetup setup = LocalDiagnosisTest.setup("schwarzschild");
        double[] t = cols.get(ProfileColumn.TEMPERATURE);
        double[] p = cols.get(ProfileColumn.PRESSURE);
        Physics physics = new Physics(setup, cols);
        for (int k = 0; k + 1 < t.length; k++) {
            double h = Math.log(p[k + 1] / p[k]);
            double a = physics.nabla(k, t[k]);
            double predictor = t[k] * Math.exp(a * h);
            double b = physics.nabla(k + 1, predictor);
            t[k + 1] = t[k] * Math.exp(0.5 * (a + b) * h);
        }
        ProfileDiagnosis d = LocalDiagnosis.INSTANCE.diagnose(new Profile("rebuilt", cols), setup);
        double worst = d.maxNablaMismatch();
        System.out.printf("profile rebuilt from the physics' own nabla: largest mismatch %.3g%n", worst);
        assertTrue(worst < 0.03, "largest mismatch " + worst);
        assertTrue(d.warnings().stream().noneMatch(w -> w.contains("disagree")), d.warnings().toString());
        assertTrue(d.regions().stream().anyMatch(r -> r.regime() == Regime.CONVECTIVE), "no convective zone to test");
    }

    /** The transport physics' nabla at one zone of a profile, at a trial temperature. */
    private static final class Physics {
        private final DiagnosisSetup setup;
        private final Map<ProfileColumn, double[]> cols;
        private final ZoneState zone = new ZoneState();
        private final ThermoResult thermo = new ThermoResult();
        private final OpacityResult opacity = new OpacityResult();
        private final ConvectionResult conv = new ConvectionResult();

        Physics(DiagnosisSetup setup, Map<ProfileColumn, double[]> cols) {
            this.setup = setup;
            this.cols = cols;
        }

        double nabla(int k, double temperature) {
            double rho = cols.get(ProfileColumn.DENSITY)[k];
            double x = cols.get(ProfileColumn.HYDROGEN)[k];
            double z = cols.get(ProfileColumn.METALS)[k];
            setup.thermodynamics().evaluate(temperature, rho, x, z, k, thermo);
            setup.opacity().evaluate(temperature, rho, x, z, k, opacity);
            zone.zone = k;
            zone.radius = cols.get(ProfileColumn.RADIUS)[k];
            zone.mass = cols.get(ProfileColumn.MASS)[k];
            zone.temperature = temperature;
            zone.density = rho;
            zone.pressure = cols.get(ProfileColumn.PRESSURE)[k];
            zone.luminosity = cols.get(ProfileColumn.LUMINOSITY)[k];
            zone.hydrogen = x;
            zone.metals = z;
            zone.opacity = opacity.kappa;
            zone.nablaAd = thermo.nablaAd;
            zone.cp = thermo.cp;
            zone.delta = thermo.delta;
            zone.phi = 1.0;
            zone.nablaMu = 0.0; // uniform composition
            ConvectionModel model = setup.convection();
            model.solve(zone, conv);
            return conv.nabla;
        }
    }
}
