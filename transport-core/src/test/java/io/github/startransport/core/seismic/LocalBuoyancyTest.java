package io.github.startransport.core.seismic;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.BuoyancyModel;
import io.github.startransport.spi.BuoyancyResult;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** The buoyancy model as hosts find it through the SPI. */
class LocalBuoyancyTest {

    private static ZoneState zone() {
        ZoneState z = new ZoneState();
        z.zone = 12;
        z.radius = 3e10;
        z.mass = 1.2e33;
        z.density = 0.8;
        z.pressure = 4e15;
        z.delta = 1.05;
        z.nablaAd = 0.39;
        z.phi = 1.0;
        z.nablaMu = 0.05;
        return z;
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void discoveredModelGivesTheLocalFrequencies() {
        BuoyancyModel m = Transport.discover().buoyancy(null, ModelOptions.defaults());
        ZoneState z = zone();
        BuoyancyResult out = new BuoyancyResult();
        m.evaluate(z, 0.3, 5.0 / 3.0, out);
        // N^2 = (g^2 rho / P) [delta (nabla_ad - nabla) + phi nabla_mu] (Kippenhahn, Weigert & Weiss 2012 §6.2)
        double g = Codata2018.GRAVITATIONAL_CONSTANT * z.mass / (z.radius * z.radius);
        double n2 = g * g * z.density / z.pressure * (z.delta * (z.nablaAd - 0.3) + z.phi * z.nablaMu);
        assertEquals(n2, out.buoyancySquared, 1e-14 * Math.abs(n2));
        double cs = Math.sqrt(5.0 / 3.0 * z.pressure / z.density);
        assertEquals(cs, out.soundSpeed, 1e-14 * cs);
        assertEquals(Math.sqrt(2) * cs / z.radius, out.lamb1, 1e-14 * out.lamb1);
        assertEquals(-g * g * z.density / z.pressure * z.delta, out.dBuoyancySquaredDNabla, 1e-14 * Math.abs(n2));
        assertEquals(2 * n2 / z.mass, out.dBuoyancySquared[ZoneInput.M], 1e-14 * Math.abs(n2 / z.mass));
        assertEquals(0.0, out.dBuoyancySquared[ZoneInput.T], 0.0);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void refusesBadInputNamingFieldAndZone() {
        ZoneState z = zone();
        z.pressure = -1;
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> LocalBuoyancy.INSTANCE.evaluate(z, 0.3, 5.0 / 3.0, new BuoyancyResult()));
        assertEquals("pressure", e.field());
        assertEquals(12, e.zone());
        ZoneState ok = zone();
        e = assertThrows(InvalidInputException.class,
                () -> LocalBuoyancy.INSTANCE.evaluate(ok, Double.NaN, 5.0 / 3.0, new BuoyancyResult()));
        assertEquals("nabla", e.field());
    }
}
