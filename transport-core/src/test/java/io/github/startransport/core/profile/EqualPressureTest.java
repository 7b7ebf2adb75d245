package io.github.startransport.core.profile;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Neighbouring zones of equal pressure: nabla_mu = d ln mu / d ln P is 0 between zones of the same
 * composition whatever d ln P is (d ln mu = 0), so such a pair is accepted; where the composition
 * changes, d ln mu / d ln P has no value at equal P and the profile is refused.
 */
class EqualPressureTest {

    /** The demo star with zone k's pressure set equal to zone k - 1's. */
    private static Map<ProfileColumn, double[]> flattened(int k) {
        Map<ProfileColumn, double[]> cols = LocalDiagnosisTest.columns(new DemoStar(800).profile());
        double[] p = cols.get(ProfileColumn.PRESSURE);
        p[k] = p[k - 1];
        return cols;
    }

    @Tag(CheckKind.LAW)
    @Test
    void equalPressureWithTheSameCompositionIsAcceptedWithNablaMuZero() {
        int k = 300;
        ProfileDiagnosis d = LocalDiagnosisTest.diagnose(new Profile("equal P", flattened(k)), "ledoux");
        // uniform composition: d ln mu = 0 everywhere (Kippenhahn, Weigert & Weiss 2012 §6.1: nabla_mu = 0)
        for (int j = k - 2; j <= k + 2; j++) {
            assertEquals(0.0, d.value(DiagnosisColumn.NABLA_MU, j), "zone " + j);
        }
        // nabla_model = d ln T / d ln P has no value there; the diagnosis says so and goes on
        assertTrue(Double.isNaN(d.value(DiagnosisColumn.NABLA_MODEL, k)));
        assertTrue(d.warnings().stream().anyMatch(w -> w.contains("could not be computed")), d.warnings().toString());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void aCompositionChangeAcrossEqualPressureIsRefusedNamingTheZone() {
        int k = 300;
        Map<ProfileColumn, double[]> cols = flattened(k);
        double[] x = cols.get(ProfileColumn.HYDROGEN);
        for (int j = 0; j < k; j++) {
            x[j] = 0.6;
        }
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> LocalDiagnosisTest.diagnose(new Profile("step at equal P", cols), "ledoux"));
        assertEquals(ProfileColumn.PRESSURE.header(), e.field());
        assertEquals(k, e.zone());
        assertTrue(e.requirement().contains("another X or Z"), e.getMessage());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void pressureRisingOutwardsIsStillRefused() {
        int k = 300;
        Map<ProfileColumn, double[]> cols = flattened(k);
        cols.get(ProfileColumn.PRESSURE)[k] *= 1.01;
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> LocalDiagnosisTest.diagnose(new Profile("rising P", cols), "ledoux"));
        assertEquals(k, e.zone());
        assertEquals(ProfileColumn.PRESSURE.header(), e.field());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void aZoneBetweenTwoEqualPressurePairsAndAnEndZoneOfOneGetZero() {
        // direct kernel: pairs (0, 1) and (2, 3), (3, 4) have equal P and equal composition
        double[] x = {0.7, 0.7, 0.7, 0.7, 0.7, 0.6};
        double[] z = {0.02, 0.02, 0.02, 0.02, 0.02, 0.02};
        double[] p = {1e17, 1e17, 5e16, 5e16, 5e16, 1e16};
        double[] out = new double[6];
        CompositionGradient.nablaMu(x, z, p, out);
        assertEquals(0.0, out[0]);
        assertEquals(0.0, out[3]);
        for (double v : out) {
            assertTrue(Double.isFinite(v), java.util.Arrays.toString(out));
        }
        // zone 4: its inner pair is flat, so the outer one alone gives d ln mu / d ln P
        double expected = (Math.log(mu(0.6)) - Math.log(mu(0.7))) / Math.log(1e16 / 5e16);
        assertEquals(expected, out[4], 1e-15);
    }

    /**
     * Mean molecular weight of a fully ionised mixture, 1/mu = 2X + 3Y/4 + Z/2 with Z = 0.02 (Kippenhahn, Weigert
     * &amp; Weiss 2012 §4.3, from memory).
     */
    private static double mu(double x) {
        double z = 0.02;
        return 1 / (2 * x + 0.75 * (1 - x - z) + 0.5 * z);
    }
}
