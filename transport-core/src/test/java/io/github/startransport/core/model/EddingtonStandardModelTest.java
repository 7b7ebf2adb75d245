package io.github.startransport.core.model;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class EddingtonStandardModelTest {
    private static final double MSUN = Iau2015.SOLAR_MASS;

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

    @Test
    void demoProfileIsOrderedAndEndsAtTheSurfaceTemperature() {
        Profile p = DemoStar.fromOptions(ModelOptions.parse("zones=300")).profile();
        assertTrue(p.size() >= 298 && p.size() <= 300, "zones " + p.size());
        assertEquals(DemoStar.SURFACE_TEMPERATURE, p.value(ProfileColumn.TEMPERATURE, p.size() - 1),
                1e-6 * DemoStar.SURFACE_TEMPERATURE);
        double lSurface = p.luminosity();
        assertEquals(DemoStar.LUMINOSITY_SOLAR * Iau2015.SOLAR_LUMINOSITY, lSurface, 1e-6 * lSurface);
        assertTrue(p.mass() < DemoStar.MASS_SOLAR * MSUN && p.mass() > 0.999 * DemoStar.MASS_SOLAR * MSUN);
    }
}
