package io.github.startransport.core.gradient;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.ThermoResult;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The mean molecular weight of fully ionised matter in the textbook's closed form mu = 4 / (3 + 5X - Z)
 * (Carroll &amp; Ostlie 2007, §10.2; Hansen, Kawaler &amp; Trimble 2004 §3.1; from memory), which counts metals as A/2
 * particles per nucleon, against the thermodynamics model that writes it as 1 / (2X + 3Y/4 + Z/2).
 */
class MeanMolecularWeightTextbookTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void fullyIonisedMeanMolecularWeightIsFourOverThreePlusFiveXMinusZ() {
        double[][] compositions = {{0.70, 0.02}, {0.7381, 0.0134}, {0.34, 0.02}, {0.0, 0.02}, {0.0, 0.0}, {0.0, 1.0},
            {1.0, 0.0}};
        ThermoResult out = new ThermoResult();
        for (double[] xz : compositions) {
            double expected = 4.0 / (3.0 + 5.0 * xz[0] - xz[1]);
            IdealGasRadiation.INSTANCE.evaluate(1e7, 1.0, xz[0], xz[1], 0, out);
            assertEquals(expected, out.mu, 1e-15 * expected, "X = " + xz[0] + ", Z = " + xz[1]);
        }
        // the familiar values: pure ionised helium 4/3, pure metals 2, ionised hydrogen 1/2 (same sources)
        IdealGasRadiation.INSTANCE.evaluate(1e7, 1.0, 0.0, 0.0, 0, out);
        assertEquals(4.0 / 3.0, out.mu, 1e-15);
        IdealGasRadiation.INSTANCE.evaluate(1e7, 1.0, 0.0, 1.0, 0, out);
        assertEquals(2.0, out.mu, 1e-15);
    }
}
