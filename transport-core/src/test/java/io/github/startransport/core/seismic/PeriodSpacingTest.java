package io.github.startransport.core.seismic;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The asymptotic period spacing of degree 2 and the large separation (Tassoul 1980, from memory). */
class PeriodSpacingTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void periodSpacingOfQuadrupoleModes() {
        // Delta Pi_l = 2 pi^2 / sqrt(l (l + 1)) / integral N dr / r: for l = 2, 2 pi^2 / sqrt 6 / I; the l = 1
        // spacing is sqrt 3 times longer
        double integral = 2.5e-3;
        double two = AsymptoticIntegrals.periodSpacing(2, integral);
        assertEquals(2 * Math.PI * Math.PI / Math.sqrt(6.0) / integral, two, 1e-12 * two);
        assertEquals(Math.sqrt(3.0), AsymptoticIntegrals.periodSpacing(1, integral) / two, 1e-14);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void largeSeparationOfTheSunFromItsAcousticRadius() {
        // the Sun's acoustic radius is about 3500 s (from memory), so Delta nu = 1 / (2 tau) ~ 143 uHz, near the
        // observed 135 uHz (Kjeldsen & Bedding 1995, from memory)
        double dnu = AsymptoticIntegrals.largeSeparation(3500.0);
        assertEquals(1.0 / 7000.0, dnu, 1e-18);
        assertEquals(135e-6, dnu, 0.1 * 135e-6);
    }
}
