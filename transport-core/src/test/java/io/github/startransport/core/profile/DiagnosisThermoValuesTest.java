package io.github.startransport.core.profile;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.core.thermo.EvaluateOnly;
import io.github.startransport.core.thermo.IonisingGas;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.ThermodynamicsModel;
import io.github.startransport.spi.Transport;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The diagnosis takes the equation of state's values without derivatives
 * ({@link ThermodynamicsModel#evaluateValues}), and its whole output is what it is when every zone goes
 * through {@link ThermodynamicsModel#evaluate}: the same columns bit for bit, regimes, regions, timescales,
 * seismic summary and warnings.
 */
class DiagnosisThermoValuesTest {
    private static final Transport TRANSPORT = Transport.discover();

    private static ProfileDiagnosis diagnose(Profile p, ThermodynamicsModel thermo) {
        DiagnosisSetup setup = new DiagnosisSetup(TRANSPORT.convection(null, ModelOptions.defaults()),
                TRANSPORT.opacity(null, ModelOptions.defaults()), thermo);
        return LocalDiagnosis.INSTANCE.diagnose(p, setup);
    }

    private static void assertSameDiagnosis(ProfileDiagnosis a, ProfileDiagnosis b, String what) {
        for (DiagnosisColumn c : DiagnosisColumn.values()) {
            assertArrayEquals(a.column(c), b.column(c), what + ": " + c.header());
        }
        assertArrayEquals(a.regimes(), b.regimes(), what);
        assertEquals(a.regions(), b.regions(), what);
        assertEquals(a.timescales(), b.timescales(), what);
        assertEquals(a.seismic(), b.seismic(), what);
        assertEquals(a.warnings(), b.warnings(), what);
    }

    /**
     * The demo star (no thermodynamic columns: nabla_ad, c_P, delta, Gamma_1 and phi all come from the model,
     * with its pressure-ionisation warning), and the same star four times as dense, whose zones the checks also
     * count as degenerate and as far from the profile's pressure: each diagnosed with the values-only call and
     * through evaluate, for both equations of state (common practice, no source).
     */
    @Tag(CheckKind.INTERNAL)
    @Test
    void diagnosisIsTheSameThroughEvaluate() {
        Profile demo = new DemoStar(600).profile();
        Map<ProfileColumn, double[]> cols = new EnumMap<>(ProfileColumn.class);
        for (ProfileColumn c : ProfileColumn.values()) {
            if (demo.has(c)) {
                cols.put(c, demo.column(c));
            }
        }
        double[] rho = cols.get(ProfileColumn.DENSITY);
        for (int k = 0; k < rho.length; k++) {
            rho[k] *= 4.0;
        }
        Profile dense = new Profile("demo star, 4 rho", cols);
        for (ThermodynamicsModel model : List.of(IonisingGas.INSTANCE, IdealGasRadiation.INSTANCE)) {
            for (Profile p : List.of(demo, dense)) {
                String what = model + " on " + p.source();
                EvaluateOnly reference = new EvaluateOnly(model, false);
                ProfileDiagnosis expected = diagnose(p, reference);
                ProfileDiagnosis actual = diagnose(p, model);
                assertSameDiagnosis(expected, actual, what);
                assertTrue(expected.warnings().stream().anyMatch(w -> w.contains("fallback")), what);
            }
        }
        // the checks of the model's validity were exercised: each kind of warning appears for the dense star
        List<String> warnings = diagnose(dense, IonisingGas.INSTANCE).warnings();
        for (String kind : new String[] {"degenerate electrons", "pressure-ionised", "away from the profile's P"}) {
            assertTrue(warnings.stream().anyMatch(w -> w.contains(kind)), kind + " in " + warnings);
        }
    }

    /**
     * Every zone asks the model for values only, once, and no derivative is read: with every derivative spoilt
     * to NaN, the output is still the same bit for bit (common practice, no source).
     */
    @Tag(CheckKind.INTERNAL)
    @Test
    void diagnosisAsksForValuesOnlyAndReadsNoDerivative() {
        Profile demo = new DemoStar(400).profile();
        EvaluateOnly spoilt = new EvaluateOnly(IonisingGas.INSTANCE, true);
        ProfileDiagnosis withNaN = diagnose(demo, spoilt);
        assertEquals(0, spoilt.full.get(), "calls of evaluate");
        assertEquals(demo.size(), spoilt.values.get(), "calls of evaluateValues");
        assertSameDiagnosis(diagnose(demo, new EvaluateOnly(IonisingGas.INSTANCE, false)), withNaN,
                "derivatives spoilt");
    }
}
