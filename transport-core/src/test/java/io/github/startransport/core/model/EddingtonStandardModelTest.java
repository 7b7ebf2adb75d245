package io.github.startransport.core.model;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.profile.LocalDiagnosis;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class EddingtonStandardModelTest {
    private static final double MSUN = Iau2015.SOLAR_MASS;

    @Tag(CheckKind.EXTERNAL)
    @Test
    void betaSatisfiesEddingtonsQuartic() {
        // 1 - beta = 0.003 (M/M_sun)^2 mu^4 beta^4 (Eddington 1926; Kippenhahn, Weigert & Weiss 2012
        // §19.4, coefficient "0.003" from memory, so a 1% tolerance on it)
        for (double mSolar : new double[] {1, 10, 100}) {
            double mu = 0.61;
            double beta = EddingtonStandardModel.solveBeta(mSolar * MSUN, mu, LaneEmden.solve(3, 0).massConstant());
            double coefficient = (1 - beta) / (mSolar * mSolar * Math.pow(mu * beta, 4));
            assertEquals(0.003, coefficient, 0.01 * 0.003, "M = " + mSolar);
        }
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void demoCentralTemperatureFollowsTheStandardModelFormula() {
        // T_c = (beta mu m_u / k) P_c / rho_c with P_c = 11.05 G M^2 / R^4 and rho_c = 54.18 * 3M / (4 pi R^3)
        // for n = 3 (Chandrasekhar 1939 ch. IV; the 11.05 from memory), i.e. T_c = 0.8543 beta mu m_u G M / (k R)
        EddingtonStandardModel model = DemoStar.standardModel();
        double m = DemoStar.MASS_SOLAR * MSUN;
        double r = DemoStar.RADIUS_SOLAR * Iau2015.SOLAR_RADIUS;
        double g = Codata2018.GRAVITATIONAL_CONSTANT;
        double pc = 11.05 * g * m * m / Math.pow(r, 4);
        double rhoc = 54.18 * 3 * m / (4 * Math.PI * r * r * r);
        double tc = model.beta() * model.mu() * Codata2018.ATOMIC_MASS_UNIT / Codata2018.BOLTZMANN * pc / rhoc;
        assertEquals(tc, model.centralTemperature(), 1e-3 * tc);
        assertEquals(rhoc, model.centralDensity(), 1e-3 * rhoc);
        assertEquals(pc, model.centralPressure(), 1e-3 * pc);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void demoProfileIsOrderedAndEndsAtTheSurfaceTemperature() {
        Profile p = DemoStar.fromOptions(ModelOptions.parse("zones=300,surface=polytrope")).profile();
        assertTrue(p.size() >= 298 && p.size() <= 300, "zones " + p.size());
        assertEquals(DemoStar.SURFACE_TEMPERATURE, p.value(ProfileColumn.TEMPERATURE, p.size() - 1),
                1e-6 * DemoStar.SURFACE_TEMPERATURE);
        double lSurface = p.luminosity();
        assertEquals(DemoStar.LUMINOSITY_SOLAR * Iau2015.SOLAR_LUMINOSITY, lSurface, 1e-6 * lSurface);
        assertTrue(p.mass() < DemoStar.MASS_SOLAR * MSUN && p.mass() > 0.999 * DemoStar.MASS_SOLAR * MSUN);
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void demoStarWithAnEnvelopeEndsAtThePhotosphereOfItsLAndR() {
        Profile p = DemoStar.fromOptions(ModelOptions.parse("zones=300")).profile();
        double r = DemoStar.RADIUS_SOLAR * Iau2015.SOLAR_RADIUS;
        double l = DemoStar.LUMINOSITY_SOLAR * Iau2015.SOLAR_LUMINOSITY;
        // Stefan-Boltzmann: L = 4 pi R^2 sigma T_eff^4 at the photosphere, the outermost zone
        double teff = Math.pow(l / (4 * Math.PI * r * r * Codata2018.STEFAN_BOLTZMANN), 0.25);
        assertEquals(teff, p.value(ProfileColumn.TEMPERATURE, p.size() - 1), 1e-9 * teff);
        assertEquals(r, p.radius(), 1e-9 * r);
        assertEquals(l, p.luminosity(), 1e-12 * l);
        assertEquals(DemoStar.MASS_SOLAR * MSUN, p.mass(), 1e-12 * DemoStar.MASS_SOLAR * MSUN);
        assertTrue(p.size() > 250 && p.size() < 400, "about the zones asked for: " + p.size());
        // the join (0.75-0.85 R) leaves no step (common practice, no source): the logarithmic slopes
        // d ln T / d ln r, d ln rho / d ln r and d ln P / d ln r of successive zone pairs differ by < 25 %
        for (int k = 2; k < p.size(); k++) {
            double rk = p.value(ProfileColumn.RADIUS, k) / r;
            if (rk < 0.7 || rk > 0.9) {
                continue;
            }
            double dlnr = Math.log(p.value(ProfileColumn.RADIUS, k) / p.value(ProfileColumn.RADIUS, k - 1));
            double dlnrBefore = Math.log(p.value(ProfileColumn.RADIUS, k - 1) / p.value(ProfileColumn.RADIUS, k - 2));
            for (ProfileColumn c : new ProfileColumn[] {ProfileColumn.TEMPERATURE, ProfileColumn.DENSITY,
                ProfileColumn.PRESSURE}) {
                double here = Math.log(p.value(c, k) / p.value(c, k - 1)) / dlnr;
                double before = Math.log(p.value(c, k - 1) / p.value(c, k - 2)) / dlnrBefore;
                assertEquals(1.0, here / before, 0.25, c.header() + " slope at r/R = " + rk);
            }
        }
    }

    /**
     * The demo star's surface convection zone comes from the ionisation of hydrogen (and helium), where
     * nabla_ad falls to ~0.1 (Kippenhahn, Weigert &amp; Weiss 2012, ch. 14, the nabla_ad figure [from memory]):
     * diagnosed with the models its envelope was integrated with, the outermost region is convective, reaches
     * the photosphere and holds the zone where nabla_ad is smallest, a hydrogen-ionisation value below 0.15
     * between 8e3 and 3e4 K.
     */
    @Tag(CheckKind.EXTERNAL)
    @Test
    void demoStarsSurfaceConvectionHoldsTheHydrogenIonisationDip() {
        Profile p = DemoStar.fromOptions(ModelOptions.parse("zones=400")).profile();
        EnvelopeSetup models = DemoSurface.models();
        ProfileDiagnosis d = LocalDiagnosis.INSTANCE.diagnose(p,
                new DiagnosisSetup(models.convection(), models.opacity(), models.thermodynamics()));
        int dip = 0;
        for (int k = 1; k < d.size(); k++) {
            if (d.value(DiagnosisColumn.NABLA_AD, k) < d.value(DiagnosisColumn.NABLA_AD, dip)) {
                dip = k;
            }
        }
        double t = d.value(DiagnosisColumn.TEMPERATURE, dip);
        assertTrue(d.value(DiagnosisColumn.NABLA_AD, dip) < 0.15 && t > 8e3 && t < 3e4,
                "nabla_ad " + d.value(DiagnosisColumn.NABLA_AD, dip) + " at " + t + " K");
        Region surface = d.regions().get(d.regions().size() - 1);
        assertEquals(Regime.CONVECTIVE, surface.regime(), surface.toString());
        assertEquals(1.0, surface.topRadiusFraction(), 1e-12, surface.toString());
        assertTrue(dip >= surface.firstZone() && dip <= surface.lastZone(),
                "zone " + dip + " in " + surface.firstZone() + "-" + surface.lastZone());
    }
}
