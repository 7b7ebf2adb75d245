package io.github.startransport.core.gradient;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class IdealGasRadiationTest {

    @Tag(CheckKind.EXTERNAL)
    @Test
    void pressureIsGasPlusRadiation() {
        // P = rho k T / (mu m_u) + a T^4 / 3 (Kippenhahn, Weigert & Weiss 2012 §13.1, from memory),
        // with mu = 1/2 for ionised hydrogen
        ThermoResult r = new ThermoResult();
        IdealGasRadiation.INSTANCE.evaluate(1e7, 1.0, 1.0, 0.0, -1, r);
        double pg = 1.0 * Codata2018.BOLTZMANN * 1e7 / (0.5 * Codata2018.ATOMIC_MASS_UNIT);
        double pr = Codata2018.RADIATION_CONSTANT * 1e28 / 3.0;
        assertEquals(pg + pr, r.pressure, 1e-12 * (pg + pr));
        assertEquals(pg / (pg + pr), r.beta, 1e-12);
        assertEquals(1.0, r.phi, 0.0);
    }

    @Tag(CheckKind.LAW)
    @Test
    void tenuousCoolGasIsMonatomicIdeal() {
        // beta -> 1: nabla_ad = 2/5, delta = 1, Gamma_1 = 5/3, c_P = (5/2) k/(mu m_u)
        ThermoResult r = new ThermoResult();
        IdealGasRadiation.INSTANCE.evaluate(1e5, 1.0, 0.7, 0.02, -1, r);
        assertEquals(0.4, r.nablaAd, 1e-6);
        assertEquals(1.0, r.delta, 1e-5);
        assertEquals(5.0 / 3.0, r.gamma1, 1e-5);
        assertEquals(2.5 * Codata2018.BOLTZMANN / (r.mu * Codata2018.ATOMIC_MASS_UNIT), r.cp, 1e-4 * r.cp);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void completeWritesTheResponseFunctionsIntoTheZone() {
        ZoneState z = new ZoneState();
        z.temperature = 2e7;
        z.density = 50;
        z.hydrogen = 0.7;
        z.metals = 0.02;
        ThermoResult r = new ThermoResult();
        IdealGasRadiation.INSTANCE.complete(z, r);
        assertEquals(r.pressure, z.pressure, 0.0);
        assertEquals(r.nablaAd, z.nablaAd, 0.0);
        assertEquals(r.cp, z.cp, 0.0);
        assertEquals(r.delta, z.delta, 0.0);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void refusesImpossibleCompositions() {
        ThermoResult r = new ThermoResult();
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> IdealGasRadiation.INSTANCE.evaluate(1e7, 1.0, 0.9, 0.2, 4, r));
        assertEquals("metals", e.field());
        assertEquals(4, e.zone());
        e = assertThrows(InvalidInputException.class,
                () -> IdealGasRadiation.INSTANCE.evaluate(1e7, 1.0, -0.1, 0.0, -1, r));
        assertEquals("hydrogen", e.field());
        e = assertThrows(InvalidInputException.class,
                () -> IdealGasRadiation.INSTANCE.evaluate(Double.NaN, 1.0, 0.7, 0.02, -1, r));
        assertEquals("temperature", e.field());
    }
}
