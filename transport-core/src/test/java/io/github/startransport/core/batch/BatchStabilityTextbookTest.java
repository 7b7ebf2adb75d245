package io.github.startransport.core.batch;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.gradient.GradientStability;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.StabilityColumns;
import io.github.startransport.spi.ZoneColumns;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The batch stability kernel (its own copy of the arithmetic) on a column through a grey Eddington atmosphere of
 * constant opacity: T^4 = (3/4) T_eff^4 (tau + 2/3) and P = g tau / kappa (Mihalas 1978, Stellar Atmospheres,
 * §3.3; Kippenhahn, Weigert &amp; Weiss 2012 §4.3; from memory) give nabla_rad = tau / (4 (tau + 2/3)) in closed
 * form, from 0 at the top to 1/4 at depth; with the composition gradient set per zone, the Schwarzschild and
 * Ledoux decisions follow from nabla_L = nabla_ad + (phi / delta) nabla_mu (Kippenhahn, Weigert &amp; Weiss 2012
 * §6.1, from memory) written out here.
 */
class BatchStabilityTextbookTest {
    private static final int ZONES = 40;

    @Test
    @Tag(CheckKind.EXTERNAL)
    void batchStabilityThroughAGreyAtmosphere() {
        double r = Iau2015.SOLAR_RADIUS;
        double m = Iau2015.SOLAR_MASS;
        double teff = Iau2015.SOLAR_EFFECTIVE_TEMPERATURE;
        double l = 4.0 * Math.PI * r * r * Codata2018.STEFAN_BOLTZMANN * Math.pow(teff, 4);
        double g = Iau2015.SOLAR_MASS_PARAMETER / (r * r);
        double kappa = 0.4;
        ZoneColumns in = new ZoneColumns(ZONES);
        double[] tau = new double[ZONES];
        for (int k = 0; k < ZONES; k++) {
            tau[k] = Math.pow(10.0, -3.0 + 7.0 * k / (ZONES - 1.0));
            in.radius[k] = r;
            in.mass[k] = m;
            in.temperature[k] = teff * Math.pow(0.75 * (tau[k] + 2.0 / 3.0), 0.25);
            in.density[k] = 1e-7;
            in.pressure[k] = g * tau[k] / kappa;
            in.luminosity[k] = l;
            in.opacity[k] = kappa;
            in.cp[k] = 3e8;
            // nabla_ad of a gas whose ionisation lowers it (0.1 to 0.4), phi/delta = 0.5, nabla_mu of both signs
            in.nablaAd[k] = 0.1 + 0.3 * ((k * 7) % ZONES) / ZONES;
            in.delta[k] = 2.0;
            in.phi[k] = 1.0;
            in.nablaMu[k] = 0.2 * Math.sin(k);
        }
        for (Criterion criterion : Criterion.values()) {
            StabilityColumns out = new StabilityColumns(ZONES);
            new GradientStability(criterion).evaluateColumns(in, 0, ZONES, out);
            for (int k = 0; k < ZONES; k++) {
                double nablaRad = tau[k] / (4.0 * (tau[k] + 2.0 / 3.0));
                double nablaL = in.nablaAd[k] + 0.5 * in.nablaMu[k];
                String at = criterion + ", tau = " + tau[k];
                assertEquals(nablaRad, out.nablaRad[k], 1e-13 * nablaRad, at);
                assertEquals(nablaL, out.nablaLedoux[k], 1e-15, at);
                // a zone convects where nabla_rad exceeds nabla_L; where the composition stabilises (nabla_mu > 0) the
                // Schwarzschild criterion compares with nabla_ad instead (Kippenhahn, Weigert & Weiss 2012 §6.1-6.2)
                double threshold = criterion == Criterion.LEDOUX || in.nablaMu[k] < 0.0 ? nablaL : in.nablaAd[k];
                boolean convective = nablaRad > threshold;
                assertEquals(convective, out.regime[k] == Regime.CONVECTIVE, at);
            }
        }
    }
}
