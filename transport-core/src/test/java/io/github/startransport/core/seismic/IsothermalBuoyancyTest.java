package io.github.startransport.core.seismic;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The buoyancy and Lamb frequencies of an isothermal layer of ideal monatomic gas, whose closed forms are
 * N^2 = (gamma - 1) g^2 / c_s^2 and S_l = sqrt(l (l + 1)) c_s / r with c_s^2 = gamma P / rho (the isothermal
 * atmosphere of helioseismology texts, e.g. Aerts, Christensen-Dalsgaard &amp; Kurtz 2010, ch. 3, from memory).
 */
class IsothermalBuoyancyTest {
    private static final double GAMMA = 5.0 / 3.0;

    @Test
    @Tag(CheckKind.EXTERNAL)
    void buoyancyOfAnIsothermalMonatomicLayer() {
        double r = 6.9e10;
        double m = 1.989e33;
        double rho = 2e-7;
        double p = 1.2e5;
        double g = Codata2018.GRAVITATIONAL_CONSTANT * m / (r * r);
        double cs2 = GAMMA * p / rho;
        // nabla = 0 (isothermal), nabla_ad = 2/5, delta = 1, no composition gradient
        double n2 = LocalFrequencies.buoyancySquared(r, m, rho, p, 1.0, 0.4, 1.0, 0.0, 0.0);
        double expected = (GAMMA - 1.0) * g * g / cs2;
        assertEquals(expected, n2, 1e-13 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void soundSpeedAndLambFrequencies() {
        double r = 5e10;
        double cs = LocalFrequencies.soundSpeed(GAMMA, 1e15, 1.5);
        assertEquals(Math.sqrt(GAMMA * 1e15 / 1.5), cs, 1e-14 * cs);
        assertEquals(Math.sqrt(2.0) * cs / r, LocalFrequencies.lamb(1, cs, r), 1e-14 * cs / r);
        assertEquals(Math.sqrt(6.0) * cs / r, LocalFrequencies.lamb(2, cs, r), 1e-14 * cs / r);
    }
}
