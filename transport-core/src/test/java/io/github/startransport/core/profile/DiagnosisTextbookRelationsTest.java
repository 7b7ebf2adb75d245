package io.github.startransport.core.profile;

import io.github.startransport.core.model.DemoStar;
import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The diagnosis's per-zone columns against the textbook relations between them, evaluated here zone by zone from
 * the profile's stored columns and the diagnosis's own inputs (kappa, nabla_ad, delta, phi, nabla_mu, Gamma_1):
 * nabla_rad, nabla_L, N^2, c_s and F_conv / F. The profile is the demo star with a helium-enriched centre,
 * X = 0.7 - 0.35 exp(-(r / 0.15 R)^2), so that nabla_mu is not zero; checked under Ledoux.
 */
class DiagnosisTextbookRelationsTest {
    private static final double G = 6.67430e-8;                         // CODATA 2018
    private static final double A_C = 4 * 5.670374419e-5;              // a c = 4 sigma (CODATA 2018)

    private static Profile enrichedDemoStar() {
        Profile smooth = new DemoStar(600).profile();
        Map<ProfileColumn, double[]> cols = LocalDiagnosisTest.columns(smooth);
        double[] r = cols.get(ProfileColumn.RADIUS);
        double[] x = cols.get(ProfileColumn.HYDROGEN);
        double radius = r[r.length - 1];
        for (int k = 0; k < x.length; k++) {
            double s = r[k] / (0.15 * radius);
            x[k] = 0.7 - 0.35 * Math.exp(-s * s);
        }
        return new Profile("helium-enriched centre", cols);
    }

    private static final Profile PROFILE = enrichedDemoStar();
    private static final ProfileDiagnosis LEDOUX = LocalDiagnosisTest.diagnose(PROFILE, "ledoux");

    private static double col(DiagnosisColumn c, int k) {
        return LEDOUX.value(c, k);
    }

    private static double in(ProfileColumn c, int k) {
        return PROFILE.value(c, k);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void radiativeGradientIsThreeKappaLPOverSixteenPiAcGmTToTheFour() {
        // nabla_rad = 3 kappa L P / (16 pi a c G m T^4) (Kippenhahn, Weigert & Weiss 2012, eq. 5.28, from memory)
        for (int k = 0; k < PROFILE.size(); k++) {
            double t = in(ProfileColumn.TEMPERATURE, k);
            double expected = 3 * col(DiagnosisColumn.OPACITY, k) * in(ProfileColumn.LUMINOSITY, k)
                    * in(ProfileColumn.PRESSURE, k)
                    / (16 * Math.PI * A_C * G * in(ProfileColumn.MASS, k) * t * t * t * t);
            assertEquals(expected, col(DiagnosisColumn.NABLA_RAD, k), 1e-12 * Math.abs(expected), "zone " + k);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void ledouxGradientAddsPhiOverDeltaTimesNablaMu() {
        // nabla_L = nabla_ad + (phi / delta) nabla_mu (Kippenhahn, Weigert & Weiss 2012, eq. 6.18, from memory)
        int enriched = 0;
        for (int k = 0; k < PROFILE.size(); k++) {
            double mu = col(DiagnosisColumn.NABLA_MU, k);
            double expected = col(DiagnosisColumn.NABLA_AD, k)
                    + col(DiagnosisColumn.PHI, k) / col(DiagnosisColumn.DELTA, k) * mu;
            assertEquals(expected, col(DiagnosisColumn.NABLA_LEDOUX, k), 1e-13, "zone " + k);
            if (mu > 1e-3) {
                enriched++;
            }
        }
        assertTrue(enriched > 50, "zones with nabla_mu > 1e-3: " + enriched);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void buoyancyFrequencyFromTheGradientsAndGravity() {
        // N^2 = (g^2 rho / P)(delta (nabla_ad - nabla) + phi nabla_mu), g = G m / r^2 (Kippenhahn, Weigert & Weiss
        // 2012, §6.6; Aerts, Christensen-Dalsgaard & Kurtz 2010, ch. 3; from memory)
        for (int k = 0; k < PROFILE.size(); k++) {
            double r = in(ProfileColumn.RADIUS, k);
            double g = G * in(ProfileColumn.MASS, k) / (r * r);
            double a = g * g * in(ProfileColumn.DENSITY, k) / in(ProfileColumn.PRESSURE, k);
            double bracket = col(DiagnosisColumn.DELTA, k)
                    * (col(DiagnosisColumn.NABLA_AD, k) - col(DiagnosisColumn.NABLA, k))
                    + col(DiagnosisColumn.PHI, k) * col(DiagnosisColumn.NABLA_MU, k);
            double scale = a * (col(DiagnosisColumn.DELTA, k) * col(DiagnosisColumn.NABLA_AD, k)
                    + Math.abs(col(DiagnosisColumn.PHI, k) * col(DiagnosisColumn.NABLA_MU, k)));
            assertEquals(a * bracket, col(DiagnosisColumn.BUOYANCY_SQUARED, k), 1e-12 * scale, "zone " + k);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void soundSpeedIsTheRootOfGammaOnePOverRho() {
        // c_s^2 = Gamma_1 P / rho (Aerts, Christensen-Dalsgaard & Kurtz 2010, ch. 3, from memory)
        for (int k = 0; k < PROFILE.size(); k++) {
            double expected = Math.sqrt(col(DiagnosisColumn.GAMMA1, k) * in(ProfileColumn.PRESSURE, k)
                    / in(ProfileColumn.DENSITY, k));
            assertEquals(expected, col(DiagnosisColumn.SOUND_SPEED, k), 1e-13 * expected, "zone " + k);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void convectiveFluxFractionIsOneMinusNablaOverNablaRad() {
        // the radiative flux with the actual gradient is F_rad = F nabla / nabla_rad, so F_conv / F = 1 - nabla /
        // nabla_rad in convective zones; nabla = nabla_rad and no convective flux where stable (Kippenhahn,
        // Weigert & Weiss 2012, §7.1, from memory)
        int convective = 0;
        int radiative = 0;
        for (int k = 0; k < PROFILE.size(); k++) {
            double nabla = col(DiagnosisColumn.NABLA, k);
            double rad = col(DiagnosisColumn.NABLA_RAD, k);
            if (LEDOUX.regimes()[k] == Regime.CONVECTIVE) {
                convective++;
                assertEquals(1 - nabla / rad, col(DiagnosisColumn.CONVECTIVE_FRACTION, k), 1e-12, "zone " + k);
            } else if (LEDOUX.regimes()[k] == Regime.RADIATIVE) {
                radiative++;
                assertEquals(rad, nabla, 1e-14 * Math.abs(rad), "zone " + k);
                assertEquals(0.0, col(DiagnosisColumn.CONVECTIVE_FRACTION, k), "zone " + k);
            }
        }
        assertTrue(convective > 20 && radiative > 20, "convective zones: " + convective + ", radiative: " + radiative);
    }
}
