package io.github.startransport.core.opacity;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityResult;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The analytic composite's floors and options against the published laws written out here: the
 * composite at a point where each part is known, the molecular floor in cool tenuous gas, the metal-free
 * floor of Z, and what each option changes.
 */
class AnalyticOpacityOptionsTest {

    private static double kappa(AnalyticOpacity model, double t, double rho, double x, double z) {
        OpacityResult r = new OpacityResult();
        model.evaluate(t, rho, x, z, -1, r);
        return r.kappa;
    }

    /** Kramers bound-free, 4.34e25 (g/t) Z (1 + X) rho T^-3.5 (Carroll &amp; Ostlie 1996, p. 274). */
    private static double boundFree(double gOverT, double t, double rho, double x, double z) {
        return 4.34e25 * gOverT * z * (1 + x) * rho * Math.pow(t, -3.5);
    }

    /** Kramers free-free, 3.68e22 g_ff (1 - Z)(1 + X) rho T^-3.5 (Carroll &amp; Ostlie 1996, p. 274). */
    private static double freeFree(double gff, double t, double rho, double x, double z) {
        return 3.68e22 * gff * (1 - z) * (1 + x) * rho * Math.pow(t, -3.5);
    }

    /**
     * Electron scattering, sigma_T / (mu_e m_u) (CODATA 2018) times the Buchler &amp; Yueh (1976) correction as given
     * by Paczynski (1983): 1 / [(1 + 2.7e11 rho / T^2)(1 + (T / 4.5e8)^0.86)] (from memory).
     */
    private static double scattering(double t, double rho, double x) {
        double thomson = Codata2018.THOMSON_CROSS_SECTION * (1 + x) / (2 * Codata2018.ATOMIC_MASS_UNIT);
        return thomson / ((1 + 2.7e11 * rho / (t * t)) * (1 + Math.pow(t / 4.5e8, 0.86)));
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void compositeWithThePublishedKramersLawIsTheSumOfItsParts() {
        // T = 1e7 K, rho = 1: H-minus (~T^9 rho^1/2 harmonic with the rest) and conduction (non-degenerate) are
        // below 1e-6 of the total; the sum of the ionised sources plus the 0.1 Z floor remains
        double t = 1e7;
        double rho = 1.0;
        double expected = scattering(t, rho, 0.7) + boundFree(1.0, t, rho, 0.7, 0.02) + freeFree(1.0, t, rho, 0.7, 0.02)
                + 0.1 * 0.02;
        assertEquals(expected, kappa(new AnalyticOpacity(1.0, 1.0), t, rho, 0.7, 0.02), 1e-5 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void constantGauntOverGuillotineScalesOnlyTheBoundFreeTerm() {
        // g_bf / t = 0.05 instead of 1 (Carroll & Ostlie 1996 quote t between 1 and 100)
        double t = 1e7;
        double rho = 1.0;
        double expected = scattering(t, rho, 0.7) + boundFree(0.05, t, rho, 0.7, 0.02) + freeFree(1.0, t, rho, 0.7, 0.02)
                + 0.1 * 0.02;
        AnalyticOpacity model = AnalyticOpacity.fromOptions(ModelOptions.parse("bound-free-gaunt-over-guillotine=0.05"));
        assertEquals(expected, kappa(model, t, rho, 0.7, 0.02), 1e-5 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void freeFreeGauntScalesTheFreeFreeTerm() {
        // Z = 0 (no bound-free), T = 1e5 K, rho = 1e-2: free-free dominates; g_ff = 2 doubles it
        double t = 1e5;
        double rho = 1e-2;
        AnalyticOpacity model = AnalyticOpacity.fromOptions(ModelOptions.parse("free-free-gaunt=2"));
        // H-minus and the floor use Z_eff = 1e-4 for Z = 0; both are below 1e-4 of free-free here
        double expected = scattering(t, rho, 0.7) + freeFree(2.0, t, rho, 0.7, 0.0);
        assertEquals(expected, kappa(model, t, rho, 0.7, 0.0), 1e-3 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void kShellGuillotineIsThePublishedLawBelowAMillionKelvin() {
        // t = 1 while the light metals keep their K electrons: the default equals the published law at 8e5 K
        double t = 8e5;
        double rho = 1e-2;
        double published = kappa(new AnalyticOpacity(1.0, 1.0), t, rho, 0.7, 0.02);
        assertEquals(published, kappa(AnalyticOpacity.DEFAULT, t, rho, 0.7, 0.02), 1e-5 * published);
        double expected = scattering(t, rho, 0.7) + boundFree(1.0, t, rho, 0.7, 0.02) + freeFree(1.0, t, rho, 0.7, 0.02)
                + 0.1 * 0.02;
        assertEquals(expected, published, 2e-3 * expected);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void coolTenuousGasFallsToTheMolecularFloor() {
        // T = 2000 K, rho = 1e-10: H-minus, 2.5e-31 (Z/0.02) rho^1/2 T^9 (Hansen, Kawaler & Trimble 2004) = 1.3e-6,
        // blended harmonically with the much larger ionised terms, so kappa = 0.1 Z (the floor, from memory)
        // plus H-minus
        double hMinus = 2.5e-31 * Math.sqrt(1e-10) * Math.pow(2000.0, 9);
        double expected = 0.1 * 0.02 + hMinus;
        assertEquals(expected, kappa(AnalyticOpacity.DEFAULT, 2000.0, 1e-10, 0.7, 0.02), 1e-3 * expected);
    }

    @Test
    @Tag(CheckKind.INTERNAL)
    void metalFreeGasKeepsAFloorOfZEqualToOneInTenThousand() {
        // our own choice (common practice, no source): Z_eff = max(Z, 1e-4) in the H-minus and molecular terms
        double withFloor = kappa(AnalyticOpacity.DEFAULT, 2000.0, 1e-10, 0.7, 0.0);
        assertEquals(0.1 * AnalyticOpacity.MIN_EFFECTIVE_METALS, withFloor, 0.01 * withFloor);
        assertEquals(withFloor, kappa(AnalyticOpacity.DEFAULT, 2000.0, 1e-10, 0.7, 0.5e-4), 1e-12 * withFloor);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void photosphericHMinusOpacityScalesWithMetals() {
        // kappa_H- ~ Z (its electrons come from metals; Hansen, Kawaler & Trimble 2004): at 5000 K, rho = 1e-7 the
        // H-minus term dominates, so halving Z halves kappa up to the blend with the ionised terms and the floor
        double full = kappa(AnalyticOpacity.DEFAULT, 5000.0, 1e-7, 0.7, 0.02);
        double half = kappa(AnalyticOpacity.DEFAULT, 5000.0, 1e-7, 0.7, 0.01);
        assertEquals(0.5, half / full, 0.01);
        double hMinus = 2.5e-31 * Math.sqrt(1e-7) * Math.pow(5000.0, 9);
        assertEquals(hMinus + 0.1 * 0.02, full, 0.01 * full);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void hotTenuousGasIsThomsonScatteringReducedByTheHighTemperatureFactor() {
        // T = 1e9 K, rho = 1e-6: electron scattering and the constant 0.1 Z floor are left; the Buchler & Yueh
        // factor (1 + (T/4.5e8)^0.86) reduces the scattering by 1 / 2.99
        double expected = scattering(1e9, 1e-6, 0.7);
        assertEquals(expected + 0.1 * 0.02, kappa(AnalyticOpacity.DEFAULT, 1e9, 1e-6, 0.7, 0.02), 1e-4 * expected);
        double thomson = Codata2018.THOMSON_CROSS_SECTION * 1.7 / (2 * Codata2018.ATOMIC_MASS_UNIT);
        assertEquals(1.0 + Math.pow(1e9 / 4.5e8, 0.86), thomson / expected, 1e-6);
    }
}
