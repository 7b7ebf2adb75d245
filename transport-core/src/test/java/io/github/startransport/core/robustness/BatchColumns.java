package io.github.startransport.core.robustness;

import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneColumns;

/** The demo star's zones as columns, completed by the ideal-gas thermodynamics and the analytic opacity. */
final class BatchColumns {
    private BatchColumns() {
    }

    static ZoneColumns demo() {
        Profile p = new DemoStar(100).profile();
        int n = p.size();
        ZoneColumns c = new ZoneColumns(n);
        ThermoResult th = new ThermoResult();
        OpacityResult op = new OpacityResult();
        for (int k = 0; k < n; k++) {
            c.radius[k] = p.value(ProfileColumn.RADIUS, k);
            c.mass[k] = p.value(ProfileColumn.MASS, k);
            c.temperature[k] = p.value(ProfileColumn.TEMPERATURE, k);
            c.density[k] = p.value(ProfileColumn.DENSITY, k);
            c.pressure[k] = p.value(ProfileColumn.PRESSURE, k);
            c.luminosity[k] = p.value(ProfileColumn.LUMINOSITY, k);
            c.hydrogen[k] = p.value(ProfileColumn.HYDROGEN, k);
            c.metals[k] = p.value(ProfileColumn.METALS, k);
            IdealGasRadiation.INSTANCE.evaluate(c.temperature[k], c.density[k], c.hydrogen[k], c.metals[k], k, th);
            c.cp[k] = th.cp;
            c.nablaAd[k] = th.nablaAd;
            c.delta[k] = th.delta;
            AnalyticOpacity.DEFAULT.evaluate(c.temperature[k], c.density[k], c.hydrogen[k], c.metals[k], k, op);
            c.opacity[k] = op.kappa;
        }
        return c;
    }
}
