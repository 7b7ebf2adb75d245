package io.github.startransport.core.profile;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Every output of a {@link Region}, on profiles whose answer is known in closed form: the mass of a
 * singular isothermal sphere, m(r) = M r / R (rho = M / (4 pi R r^2); Chandrasekhar 1939, ch. IV, from
 * memory), the pressure of an isothermal exponential layer, P = P_0 exp(-r / H) (any text's isothermal
 * atmosphere), and margins that are straight lines in r near each edge, whose roots are the boundaries.
 * Between zones the region finder interpolates m, ln P and the margins linearly in r, so all of these
 * are reproduced exactly up to rounding, whatever the uneven grid.
 */
class RegionOutputsTest {
    private static final double RADIUS = 7.0e10;
    private static final double MASS = 2.0e33;
    private static final double HEIGHT = 0.09 * RADIUS;
    private static final double CENTRAL_PRESSURE = 1.0e17;
    private static final int N = 400;

    /** The profile's columns with margins m_S, m_L and nabla_mu given as functions of r. */
    private record Columns(double[] r, double[] m, double[] p, double[] marginS, double[] marginL, double[] nablaMu) {
    }

    private interface Line {
        double at(double r);
    }

    private static Columns columns(Line schwarzschild, Line ledoux, Line nablaMu) {
        double[] r = new double[N];
        double[] m = new double[N];
        double[] p = new double[N];
        double[] ms = new double[N];
        double[] ml = new double[N];
        double[] mu = new double[N];
        for (int k = 0; k < N; k++) {
            // uneven grid, finer at the centre, the last zone at R
            r[k] = RADIUS * Math.pow((k + 1.0) / N, 1.2);
            m[k] = MASS * r[k] / RADIUS;
            p[k] = CENTRAL_PRESSURE * Math.exp(-r[k] / HEIGHT);
            ms[k] = schwarzschild.at(r[k]);
            ml[k] = ledoux.at(r[k]);
            mu[k] = nablaMu.at(r[k]);
        }
        return new Columns(r, m, p, ms, ml, mu);
    }

    /** Regions of zones classified by the sign of {@code decide} (positive: {@code regime}) under a criterion margin. */
    private static List<Region> regions(Columns c, double[] decide, Regime regime, double[] criterionMargin) {
        Regime[] regimes = new Regime[N];
        for (int k = 0; k < N; k++) {
            regimes[k] = decide[k] > 0.0 ? regime : Regime.RADIATIVE;
        }
        double[] zero = new double[N];
        return LocalDiagnosis.regions(c.r(), c.m(), c.p(), zero, zero, zero, regimes, c.marginS(), c.marginL(),
                criterionMargin, c.nablaMu());
    }

    // a convective shell: Ledoux edges at 0.31 R and 0.62 R, Schwarzschild edges at 0.305 R and 0.64 R
    private static final double BOTTOM_L = 0.31 * RADIUS;
    private static final double TOP_L = 0.62 * RADIUS;
    private static final double BOTTOM_S = 0.305 * RADIUS;
    private static final double TOP_S = 0.64 * RADIUS;

    private static Region shell() {
        Columns c = columns(r -> Math.min(r - BOTTOM_S, TOP_S - r) / RADIUS,
                r -> 0.7 * Math.min(r - BOTTOM_L, TOP_L - r) / RADIUS, r -> 0.0);
        List<Region> regions = regions(c, c.marginL(), Regime.CONVECTIVE, c.marginL());
        assertEquals(1, regions.size(), regions.toString());
        return regions.get(0);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void bottomAndTopOfAShellAreTheRootsOfItsMargin() {
        Region s = shell();
        assertEquals(Regime.CONVECTIVE, s.regime());
        assertEquals(BOTTOM_L, s.bottomRadius(), 1e-12 * RADIUS);
        assertEquals(TOP_L, s.topRadius(), 1e-12 * RADIUS);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void massesOfAShellInASingularIsothermalSphere() {
        Region s = shell();
        assertEquals(MASS * BOTTOM_L / RADIUS, s.bottomMass(), 1e-12 * MASS);
        assertEquals(MASS * TOP_L / RADIUS, s.topMass(), 1e-12 * MASS);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void massFractionsOfAShellInASingularIsothermalSphere() {
        Region s = shell();
        assertEquals(0.31, s.bottomMassFraction(), 1e-12);
        assertEquals(0.62, s.topMassFraction(), 1e-12);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void radiusFractionsOfAShell() {
        Region s = shell();
        assertEquals(0.31, s.bottomRadiusFraction(), 1e-12);
        assertEquals(0.62, s.topRadiusFraction(), 1e-12);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void thicknessInScaleHeightsOfAnIsothermalLayer() {
        // P = P_0 exp(-r / H): ln(P_bottom / P_top) = (r_top - r_bottom) / H, H = P / (rho g) the scale height
        Region s = shell();
        assertEquals((TOP_L - BOTTOM_L) / HEIGHT, s.scaleHeights(), 1e-11);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void schwarzschildBoundariesAreTheRootsOfTheSchwarzschildMargin() {
        Region s = shell();
        assertEquals(BOTTOM_S, s.bottomSchwarzschild().orElseThrow(), 1e-12 * RADIUS);
        assertEquals(TOP_S, s.topSchwarzschild().orElseThrow(), 1e-12 * RADIUS);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void ledouxBoundariesAreTheRootsOfTheLedouxMargin() {
        Region s = shell();
        assertEquals(BOTTOM_L, s.bottomLedoux().orElseThrow(), 1e-12 * RADIUS);
        assertEquals(TOP_L, s.topLedoux().orElseThrow(), 1e-12 * RADIUS);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void massOfAUniformSphereShellWithinTheLinearInterpolationBound() {
        // m = M (r / R)^3 (uniform density) between zones is interpolated linearly in r: the error is at most
        // h^2 max|m''| / 8 with m'' = 6 M r / R^3 (the textbook bound of linear interpolation)
        Columns c = columns(r -> Math.min(r - BOTTOM_S, TOP_S - r) / RADIUS,
                r -> Math.min(r - BOTTOM_L, TOP_L - r) / RADIUS, r -> 0.0);
        double[] cubic = c.m().clone();
        double hMax = 0.0;
        for (int k = 0; k < N; k++) {
            cubic[k] = MASS * Math.pow(c.r()[k] / RADIUS, 3);
            if (k > 0) {
                hMax = Math.max(hMax, c.r()[k] - c.r()[k - 1]);
            }
        }
        Columns uniform = new Columns(c.r(), cubic, c.p(), c.marginS(), c.marginL(), c.nablaMu());
        Region s = regions(uniform, uniform.marginL(), Regime.CONVECTIVE, uniform.marginL()).get(0);
        double bound = hMax * hMax * 6.0 * MASS * TOP_L / Math.pow(RADIUS, 3) / 8.0;
        assertEquals(MASS * Math.pow(0.31, 3), s.bottomMass(), bound);
        assertEquals(MASS * Math.pow(0.62, 3), s.topMass(), bound);
        assertTrue(bound < 1e-4 * MASS, "the bound itself is tight: " + bound / MASS);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void thermohalineLayerEndsWhereNablaMuChangesSign() {
        // thermohaline: nabla_mu < 0 and Ledoux-stable (Kippenhahn, Ruschenplatt & Thomas 1980); its edges with
        // the radiative zones are the roots of nabla_mu, here a straight line near each edge
        double bottom = 0.42 * RADIUS;
        double top = 0.57 * RADIUS;
        Columns c = columns(r -> -1.0, r -> -1.0, r -> -1e-3 * Math.min(r - bottom, top - r) / RADIUS);
        double[] inverted = new double[N];
        for (int k = 0; k < N; k++) {
            inverted[k] = -c.nablaMu()[k];
        }
        List<Region> regions = regions(c, inverted, Regime.THERMOHALINE, c.marginL());
        assertEquals(1, regions.size());
        Region t = regions.get(0);
        assertEquals(Regime.THERMOHALINE, t.regime());
        assertEquals(bottom, t.bottomRadius(), 1e-12 * RADIUS);
        assertEquals(top, t.topRadius(), 1e-12 * RADIUS);
        assertEquals(MASS * 0.42, t.bottomMass(), 1e-12 * MASS);
        assertEquals((top - bottom) / HEIGHT, t.scaleHeights(), 1e-11);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void semiconvectiveLayerEndsWhereTheSchwarzschildMarginChangesSign() {
        // semiconvective: nabla_ad < nabla_rad < nabla_L (Langer, Sugimoto & Fricke 1983); its edges with
        // radiative zones are the roots of nabla_rad - nabla_ad
        double bottom = 0.2 * RADIUS;
        double top = 0.26 * RADIUS;
        Columns c = columns(r -> Math.min(r - bottom, top - r) / RADIUS, r -> -1.0, r -> 0.01);
        List<Region> regions = regions(c, c.marginS(), Regime.SEMICONVECTIVE, c.marginL());
        assertEquals(1, regions.size());
        Region s = regions.get(0);
        assertEquals(Regime.SEMICONVECTIVE, s.regime());
        assertEquals(bottom, s.bottomRadius(), 1e-12 * RADIUS);
        assertEquals(top, s.topRadius(), 1e-12 * RADIUS);
        assertEquals(0.26, s.topMassFraction(), 1e-12);
    }

    @Test
    @Tag(CheckKind.INTERNAL)
    void aCoreStartsAtTheCentreWithNoMassAndAnEnvelopeEndsAtTheSurfaceWithAllOfIt() {
        // the documented convention of Region: no edge at the centre or the surface
        double coreTop = 0.15 * RADIUS;
        double envelopeBottom = 0.8 * RADIUS;
        Line margin = r -> r < 0.5 * RADIUS ? (coreTop - r) / RADIUS : (r - envelopeBottom) / RADIUS;
        Columns c = columns(margin, margin, r -> 0.0);
        List<Region> regions = regions(c, c.marginL(), Regime.CONVECTIVE, c.marginL());
        assertEquals(2, regions.size());
        Region core = regions.get(0);
        Region envelope = regions.get(1);
        assertEquals(0.0, core.bottomRadius());
        assertEquals(0.0, core.bottomMass());
        assertEquals(0.0, core.bottomMassFraction());
        assertTrue(core.bottomSchwarzschild().isEmpty() && core.bottomLedoux().isEmpty());
        assertEquals(coreTop, core.topRadius(), 1e-12 * RADIUS);
        // the core's thickness runs from the innermost zone's pressure
        assertEquals((coreTop - c.r()[0]) / HEIGHT, core.scaleHeights(), 1e-11);
        assertEquals(RADIUS, envelope.topRadius());
        assertEquals(MASS, envelope.topMass());
        assertEquals(1.0, envelope.topMassFraction());
        assertTrue(envelope.topSchwarzschild().isEmpty() && envelope.topLedoux().isEmpty());
        assertEquals(envelopeBottom, envelope.bottomRadius(), 1e-12 * RADIUS);
    }
}
