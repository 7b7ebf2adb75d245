package io.github.startransport.core.profile;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The whole-star timescales of a diagnosis against the formulas evaluated here from the profile's own columns. */
class DiagnosisTimescalesTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void kelvinHelmholtzTimeOfTheDemoStarIsGMSquaredOverRL() {
        // t_KH = G M^2 / (R L) (Kippenhahn, Weigert & Weiss 2012 eq. 3.18, from memory) with the outermost zone's
        // m, r and L
        Profile p = new DemoStar(400).profile();
        ProfileDiagnosis d = LocalDiagnosisTest.diagnose(p, "schwarzschild");
        int n = p.size() - 1;
        double m = p.value(ProfileColumn.MASS, n);
        double r = p.value(ProfileColumn.RADIUS, n);
        double l = p.value(ProfileColumn.LUMINOSITY, n);
        double expected = Codata2018.GRAVITATIONAL_CONSTANT * m * m / (r * l);
        assertEquals(expected, d.timescales().kelvinHelmholtz(), 1e-12 * expected);
        // a 1.6 M_sun, 1.7 R_sun, 6 L_sun star: (1.6^2 / (1.7 * 6)) of the Sun's 3.14e7 yr, about 7.9e6 yr
        assertEquals(3.14e7 * 1.6 * 1.6 / (1.7 * 6.0), expected / 31_557_600.0, 0.01e7);
    }
}
