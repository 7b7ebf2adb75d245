package io.github.startransport.cli;

import io.github.startransport.spi.DiscoveryException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.StabilityModel;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.TransportProvider;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Test;

import java.net.URL;
import java.net.URLClassLoader;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * This module compiles against transport-spi only: everything here reaches the physics through
 * {@link java.util.ServiceLoader}.
 */
class SpiDiscoveryTest {

    @Test
    void findsTheCoreProviderAndAModelByName() {
        Transport t = Transport.discover();
        assertTrue(t.providers().stream().map(TransportProvider::name).anyMatch("startransport-core"::equals),
                t.providers().toString());
        StabilityModel m = t.stability("gradient-comparison", ModelOptions.parse("criterion=ledoux"));
        // a zone with nabla_rad well above nabla_ad and no composition gradient convects under either criterion
        ZoneState z = new ZoneState();
        z.temperature = 1e7;
        z.density = 10;
        z.hydrogen = 0.7;
        z.metals = 0.02;
        z.mass = 1e33;
        z.opacity = 1.0;
        z.luminosity = 1e36;
        t.thermodynamics(null, ModelOptions.defaults()).complete(z, new io.github.startransport.spi.ThermoResult());
        StabilityResult r = new StabilityResult();
        m.evaluate(z, r);
        assertTrue(r.nablaRad > r.nablaAd, r.toString());
        assertEquals(Regime.CONVECTIVE, r.regime);
        assertTrue(t.modelNames(ModelFamily.STABILITY).contains("startransport-core/gradient-comparison"));
    }

    @Test
    void withoutTheCoreJarTheErrorSaysWhichJarToAdd() throws Exception {
        try (URLClassLoader empty = new URLClassLoader(new URL[0], ClassLoader.getPlatformClassLoader())) {
            DiscoveryException e = assertThrows(DiscoveryException.class, () -> Transport.discover(empty));
            assertEquals(DiscoveryException.Kind.NO_PROVIDER, e.kind());
            assertTrue(e.getMessage().contains("transport-core"), e.getMessage());
        }
    }
}
