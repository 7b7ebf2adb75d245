package io.github.startransport.core.profile;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * Columns the diagnosis computes when they are read instead of storing them (g, S_1, and the overshoot
 * coefficient when no overshoot is applied) give the textbook values from the stored columns, and the
 * same whether read zone by zone or as a whole column.
 */
class DerivedColumnsTest {

    @Tag("external")
    @Test
    void computedWhenReadAndTheSameEitherWay() {
        Profile p = new DemoStar(800).profile();
        ProfileDiagnosis d = LocalDiagnosisTest.diagnose(p, "ledoux");
        int n = d.size();
        double[] g = d.column(DiagnosisColumn.GRAVITY);
        double[] s1 = d.column(DiagnosisColumn.LAMB_L1);
        double[] ov = d.column(DiagnosisColumn.OVERSHOOT_DIFFUSION);
        for (int k = 0; k < n; k++) {
            double r = p.value(ProfileColumn.RADIUS, k);
            double m = p.value(ProfileColumn.MASS, k);
            // g = G m / r^2 (Newton; Kippenhahn, Weigert & Weiss 2012, ch. 2)
            assertEquals(Codata2018.GRAVITATIONAL_CONSTANT * m / (r * r), g[k], 1e-14 * g[k], "g at zone " + k);
            // S_l = sqrt(l (l + 1)) c_s / r, l = 1 (Aerts, Christensen-Dalsgaard & Kurtz 2010, ch. 3)
            double cs = d.value(DiagnosisColumn.SOUND_SPEED, k);
            assertEquals(Math.sqrt(2.0) * cs / r, s1[k], 1e-14 * s1[k], "S_1 at zone " + k);
            assertEquals(0.0, ov[k], "no overshoot applied by default (common practice, no source)");
            assertEquals(Double.doubleToLongBits(g[k]), Double.doubleToLongBits(d.value(DiagnosisColumn.GRAVITY, k)));
            assertEquals(Double.doubleToLongBits(s1[k]), Double.doubleToLongBits(d.value(DiagnosisColumn.LAMB_L1, k)));
            // H_P = P / (rho g) from the stored scale height and the computed g
            double hp = p.value(ProfileColumn.PRESSURE, k) / (p.value(ProfileColumn.DENSITY, k) * g[k]);
            assertEquals(hp, d.value(DiagnosisColumn.SCALE_HEIGHT, k), 1e-14 * hp, "H_P at zone " + k);
        }
        assertThrows(IndexOutOfBoundsException.class, () -> d.value(DiagnosisColumn.GRAVITY, n));
        assertThrows(IndexOutOfBoundsException.class, () -> d.value(DiagnosisColumn.OVERSHOOT_DIFFUSION, -1));
    }
}
