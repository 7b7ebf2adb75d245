package io.github.startransport.core.gradient;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.convection.EddySpectrumConvection;
import io.github.startransport.core.convection.LengthScale;
import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.convection.MixingLengthGeometry;
import io.github.startransport.core.convection.TransparentEddyMixingLength;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneState;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The stability test: classification by the Schwarzschild and Ledoux criteria as defined in
 * Kippenhahn, Weigert &amp; Weiss 2012 §6.1-6.2 (from memory), Ledoux derivatives, refusals.
 */
class GradientStabilityTest {
    private static final GradientStability SCHWARZSCHILD = new GradientStability(Criterion.SCHWARZSCHILD);
    private static final GradientStability LEDOUX = new GradientStability(Criterion.LEDOUX);

    /** A valid zone whose nabla_rad equals {@code nablaRad} (L is chosen for it). */
    static ZoneState zone(double nablaRad, double nablaAd, double nablaMu) {
        ZoneState z = new ZoneState();
        z.radius = 5e10;
        z.mass = 1e33;
        z.temperature = 1e7;
        z.density = 10.0;
        z.pressure = 1e16;
        z.opacity = 1.0;
        z.cp = 3e8;
        z.nablaAd = nablaAd;
        z.delta = 1.0;
        z.phi = 1.0;
        z.nablaMu = nablaMu;
        z.luminosity = nablaRad / RadiativeGradient.value(z.opacity, 1.0, z.pressure, z.mass, z.temperature);
        return z;
    }

    private static Regime regime(GradientStability model, ZoneState z) {
        StabilityResult r = new StabilityResult();
        model.evaluate(z, r);
        return r.regime;
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void radiativeWhereNablaRadBelowNablaAd() {
        ZoneState z = zone(0.2, 0.4, 0.0);
        assertEquals(Regime.RADIATIVE, regime(SCHWARZSCHILD, z));
        assertEquals(Regime.RADIATIVE, regime(LEDOUX, z));
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void convectiveWhereNablaRadAboveBothGradients() {
        ZoneState z = zone(0.9, 0.4, 0.1);
        assertEquals(Regime.CONVECTIVE, regime(SCHWARZSCHILD, z));
        assertEquals(Regime.CONVECTIVE, regime(LEDOUX, z));
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void semiconvectiveBetweenNablaAdAndNablaLedoux() {
        // nabla_ad < nabla_rad < nabla_L with nabla_mu > 0: Schwarzschild-unstable, Ledoux-stable
        ZoneState z = zone(0.5, 0.4, 0.3); // nabla_L = 0.7
        assertEquals(Regime.CONVECTIVE, regime(SCHWARZSCHILD, z));
        assertEquals(Regime.SEMICONVECTIVE, regime(LEDOUX, z));
    }

    @Tag(CheckKind.EXTERNAL)
    @Test
    void thermohalineWhereMuInvertedAndLedouxStable() {
        ZoneState z = zone(0.2, 0.4, -0.05); // nabla_L = 0.35 > nabla_rad
        assertEquals(Regime.THERMOHALINE, regime(SCHWARZSCHILD, z));
        assertEquals(Regime.THERMOHALINE, regime(LEDOUX, z));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void zonesExactlyOnAMarginAreNotConvective() {
        // the semiconvective coefficient diverges at nabla_rad = nabla_L (Langer, Sugimoto & Fricke 1983): radiative
        assertEquals(Regime.RADIATIVE, StabilityClassifier.classify(Criterion.LEDOUX, 0.7, 0.4, 0.7, 0.3));
        assertEquals(Regime.SEMICONVECTIVE, StabilityClassifier.classify(Criterion.LEDOUX, Math.nextDown(0.7), 0.4, 0.7, 0.3));
        // R0 = 1 exactly is marginally stable to overturning: fingers (Kippenhahn, Ruschenplatt & Thomas 1980),
        // whose coefficient C_t K_T / R0 is finite there
        for (Criterion c : Criterion.values()) {
            assertEquals(Regime.THERMOHALINE, StabilityClassifier.classify(c, 0.35, 0.4, 0.35, -0.05));
            assertEquals(Regime.CONVECTIVE, StabilityClassifier.classify(c, Math.nextUp(0.35), 0.4, 0.35, -0.05));
            // nabla_rad = nabla_ad with nabla_mu < 0 is R0 = 0: dynamically unstable
            assertEquals(Regime.CONVECTIVE, StabilityClassifier.classify(c, 0.4, 0.4, 0.35, -0.05));
            // a composition term below the rounding of nabla_ad (nabla_L = nabla_ad = nabla_rad): on both margins
            assertEquals(Regime.RADIATIVE, StabilityClassifier.classify(c, 0.4, 0.4, 0.4, -1e-30));
            // nabla_mu = 0 and nabla_rad = nabla_ad: stable
            assertEquals(Regime.RADIATIVE, StabilityClassifier.classify(c, 0.4, 0.4, 0.4, 0.0));
        }
    }

    /**
     * Every row of the rule table (README, Stability; {@link StabilityClassifier}), under both criteria,
     * through the classifier, the stability model and its margin: nabla_ad = 0.4, phi/delta = 1, so
     * nabla_L = 0.4 + nabla_mu. Definitions: Schwarzschild and Ledoux criteria and the semiconvective
     * range (Kippenhahn, Weigert &amp; Weiss 2012 §6.1-6.2, from memory); an inverted gradient is
     * dynamically unstable for R0 &lt; 1 and fingering-unstable for R0 &gt;= 1 (Kippenhahn, Ruschenplatt
     * &amp; Thomas 1980; Brown et al. 2013, ApJ 768, 34). Rows with L &lt; 0 have nabla_rad &lt; 0.
     */
    static Stream<Arguments> ruleTable() {
        return Stream.of(
                // nabla_rad, nabla_mu, Schwarzschild, Ledoux
                Arguments.of("mu<0, W>0", 0.6, -0.1, Regime.CONVECTIVE, Regime.CONVECTIVE),
                Arguments.of("mu<0, nabla_L<nabla_rad<nabla_ad (0<R0<1)", 0.35, -0.1, Regime.CONVECTIVE, Regime.CONVECTIVE),
                Arguments.of("mu<0, nabla_rad<nabla_L (R0>1)", 0.25, -0.1, Regime.THERMOHALINE, Regime.THERMOHALINE),
                Arguments.of("mu<0, far below (R0>>1)", 0.01, -1e-4, Regime.THERMOHALINE, Regime.THERMOHALINE),
                Arguments.of("mu=0, W>0", 0.6, 0.0, Regime.CONVECTIVE, Regime.CONVECTIVE),
                Arguments.of("mu=0, W<0", 0.2, 0.0, Regime.RADIATIVE, Regime.RADIATIVE),
                Arguments.of("mu>0, nabla_rad>nabla_L", 0.6, 0.1, Regime.CONVECTIVE, Regime.CONVECTIVE),
                Arguments.of("mu>0, nabla_ad<nabla_rad<nabla_L", 0.45, 0.1, Regime.CONVECTIVE, Regime.SEMICONVECTIVE),
                Arguments.of("mu>0, W<0", 0.2, 0.1, Regime.RADIATIVE, Regime.RADIATIVE),
                Arguments.of("L<0, mu>0", -0.3, 0.1, Regime.RADIATIVE, Regime.RADIATIVE),
                Arguments.of("L<0, mu=0", -0.3, 0.0, Regime.RADIATIVE, Regime.RADIATIVE),
                Arguments.of("L<0, mu<0, nabla_rad<nabla_L", -0.3, -0.5, Regime.THERMOHALINE, Regime.THERMOHALINE),
                Arguments.of("L<0, mu<0, nabla_L<nabla_rad", -0.3, -0.9, Regime.CONVECTIVE, Regime.CONVECTIVE));
    }

    @Tag(CheckKind.INTERNAL)
    @ParameterizedTest(name = "{0}")
    @MethodSource("ruleTable")
    void everyRowOfTheRuleTable(String row, double nablaRad, double nablaMu, Regime schwarzschild, Regime ledoux) {
        ZoneState z = zone(nablaRad, 0.4, nablaMu);
        assertEquals(nablaRad < 0, z.luminosity < 0, row);
        for (Criterion c : Criterion.values()) {
            Regime expected = c == Criterion.SCHWARZSCHILD ? schwarzschild : ledoux;
            assertEquals(expected, StabilityClassifier.classify(c, nablaRad, 0.4, 0.4 + nablaMu, nablaMu), row);
            StabilityResult r = new StabilityResult();
            new GradientStability(c).evaluate(z, r);
            assertEquals(expected, r.regime, row + " under " + c);
            assertEquals(expected == Regime.CONVECTIVE, r.margin() > 0.0, row + ": margin " + r.margin());
            assertEquals(r.margin(), StabilityClassifier.convectiveMargin(c, r.nablaRad, r.nablaAd, r.nablaLedoux), 0.0);
            // the convection models decide by the same rules: v > 0 exactly when convective, D > 0 in every
            // regime but radiative
            for (ConvectionModel model : List.of(new LocalMixingLength(1.8, c, MixingLengthGeometry.BOHM_VITENSE_1958),
                    new TransparentEddyMixingLength(1.8, c, MixingLengthGeometry.BOHM_CASSINELLI_1971, 1.0 / 3.0))) {
                ConvectionResult out = new ConvectionResult();
                model.solve(z, out);
                assertEquals(expected, out.regime, row + ": " + model);
                assertEquals(expected == Regime.CONVECTIVE, out.velocity > 0.0, row + ": " + out);
                assertEquals(expected != Regime.RADIATIVE, out.diffusion > 0.0, row + ": " + out);
            }
            // the full-spectrum model too, except that a zone convective through its composition alone
            // (nabla_rad <= nabla_ad) has no full-spectrum solution and is refused
            ConvectionModel spectrum = new EddySpectrumConvection(1.0, c, LengthScale.SCALE_HEIGHT);
            ConvectionResult out = new ConvectionResult();
            if (expected == Regime.CONVECTIVE && nablaRad <= 0.4) {
                assertThrows(InvalidInputException.class, () -> spectrum.solve(z, out), row);
            } else {
                spectrum.solve(z, out);
                assertEquals(expected, out.regime, row + ": " + spectrum);
                assertEquals(expected == Regime.CONVECTIVE, out.velocity > 0.0, row + ": " + out);
                assertEquals(expected != Regime.RADIATIVE, out.diffusion > 0.0, row + ": " + out);
            }
        }
    }

    @Tag(CheckKind.LAW)
    @Test
    void negativeLuminosityWithoutAnInvertedGradientIsRadiative() {
        // energy flowing inward (e.g. a neutrino-cooled core): nabla_rad < 0 < nabla_ad
        ZoneState z = zone(-0.3, 0.4, 0.0);
        StabilityResult r = new StabilityResult();
        SCHWARZSCHILD.evaluate(z, r);
        assertTrue(r.nablaRad < 0);
        assertEquals(Regime.RADIATIVE, r.regime);
        assertEquals(Regime.RADIATIVE, regime(LEDOUX, z));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void marginsAreTheGradientDifferences() {
        ZoneState z = zone(0.5, 0.4, 0.3);
        StabilityResult r = new StabilityResult();
        LEDOUX.evaluate(z, r);
        assertEquals(0.1, r.marginSchwarzschild, 1e-12);
        assertEquals(0.5 - 0.7, r.marginLedoux, 1e-12);
        assertEquals(r.marginLedoux, r.margin(), 0.0);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void optionsChooseTheCriterion() {
        assertEquals(Criterion.LEDOUX, GradientStability.fromOptions(ModelOptions.parse("criterion=Ledoux")).criterion());
        assertEquals(Criterion.SCHWARZSCHILD, GradientStability.fromOptions(ModelOptions.defaults()).criterion());
        assertThrows(io.github.startransport.spi.InvalidOptionException.class,
                () -> GradientStability.fromOptions(ModelOptions.parse("criterion=maybe")));
        assertThrows(io.github.startransport.spi.InvalidOptionException.class,
                () -> GradientStability.fromOptions(ModelOptions.parse("alhpa=2")));
    }

    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 2000, seed = "201")
    void schwarzschildStableWithStabilisingMuIsLedouxStable(
            @ForAll @Scale(9) @DoubleRange(min = -1, max = 3) double nablaRad,
            @ForAll @Scale(9) @DoubleRange(min = 0.2, max = 0.45) double nablaAd,
            @ForAll @Scale(9) @DoubleRange(min = 0, max = 2) double nablaMu,
            @ForAll @Scale(9) @DoubleRange(min = 0.3, max = 10) double delta,
            @ForAll @Scale(9) @DoubleRange(min = 0.3, max = 3) double phi) {
        ZoneState z = zone(nablaRad, nablaAd, nablaMu);
        z.delta = delta;
        z.phi = phi;
        StabilityResult r = new StabilityResult();
        SCHWARZSCHILD.evaluate(z, r);
        if (r.regime != Regime.CONVECTIVE) {
            LEDOUX.evaluate(z, r);
            assertNotEquals(Regime.CONVECTIVE, r.regime);
            assertTrue(r.marginLedoux <= 0);
        }
    }

    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 2000, seed = "202")
    void ledouxConvectiveImpliesSchwarzschildConvectiveWhenMuStabilises(
            @ForAll @Scale(9) @DoubleRange(min = -1, max = 3) double nablaRad,
            @ForAll @Scale(9) @DoubleRange(min = 0.2, max = 0.45) double nablaAd,
            @ForAll @Scale(9) @DoubleRange(min = 0, max = 2) double nablaMu) {
        ZoneState z = zone(nablaRad, nablaAd, nablaMu);
        if (regime(LEDOUX, z) == Regime.CONVECTIVE) {
            assertEquals(Regime.CONVECTIVE, regime(SCHWARZSCHILD, z));
        }
    }

    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 1000, seed = "203")
    void ledouxDerivativesAgreeWithCentralDifferences(
            @ForAll @Scale(9) @DoubleRange(min = 0.2, max = 0.45) double nablaAd,
            @ForAll @Scale(9) @DoubleRange(min = -1, max = 1) double nablaMu,
            @ForAll @Scale(9) @DoubleRange(min = 0.3, max = 10) double delta,
            @ForAll @Scale(9) @DoubleRange(min = 0.3, max = 3) double phi) {
        ZoneState z = zone(0.3, nablaAd, nablaMu);
        z.delta = delta;
        z.phi = phi;
        StabilityResult r = new StabilityResult();
        LEDOUX.evaluate(z, r);
        StabilityResult up = new StabilityResult();
        StabilityResult dn = new StabilityResult();
        for (int i : new int[] {ZoneInput.NABLA_AD, ZoneInput.NABLA_MU, ZoneInput.DELTA, ZoneInput.PHI,
                                ZoneInput.T, ZoneInput.P, ZoneInput.L, ZoneInput.M, ZoneInput.KAPPA}) {
            double x = z.get(i);
            double h = 1e-6 * Math.max(Math.abs(x), 1e-3);
            ZoneState zu = new ZoneState().set(z);
            ZoneState zd = new ZoneState().set(z);
            zu.put(i, x + h);
            zd.put(i, x - h);
            LEDOUX.evaluate(zu, up);
            LEDOUX.evaluate(zd, dn);
            double fdL = (up.nablaLedoux - dn.nablaLedoux) / (2 * h);
            double fdR = (up.nablaRad - dn.nablaRad) / (2 * h);
            // 1e-6 relative, with a floor at the central difference's own rounding error ~ 1e-10 |f| / |x|
            double scale = Math.max(Math.abs(x), 1e-3);
            assertEquals(fdL, r.dNablaLedoux[i], 1e-6 * Math.abs(fdL) + 1e-8 * Math.abs(r.nablaLedoux) / scale,
                    "dNablaL/d" + ZoneInput.name(i));
            assertEquals(fdR, r.dNablaRad[i], 1e-6 * Math.abs(fdR) + 1e-8 * Math.abs(r.nablaRad) / scale,
                    "dNablaRad/d" + ZoneInput.name(i));
        }
    }

    // ---- refusals: one case per field and kind of bad value ----

    static Stream<Arguments> badInputs() {
        List<Arguments> cases = new ArrayList<>();
        String[][] positive = {
            {"temperature", "K"}, {"density", "g cm^-3"}, {"pressure", "dyn cm^-2"}, {"opacity", "cm^2 g^-1"},
            {"mass", "g"}, {"delta", "1"}, {"phi", "1"}};
        for (String[] f : positive) {
            for (double bad : new double[] {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 0.0, -1.0}) {
                cases.add(Arguments.of(f[0], f[1], bad));
            }
        }
        for (double bad : new double[] {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY}) {
            cases.add(Arguments.of("luminosity", "erg s^-1", bad));
            cases.add(Arguments.of("nablaMu", "1", bad));
        }
        for (double bad : new double[] {Double.NaN, 0.0, 1.0, -0.1, 1.5}) {
            cases.add(Arguments.of("nablaAd", "1", bad));
        }
        return cases.stream();
    }

    @Tag(CheckKind.INTERNAL)
    @ParameterizedTest(name = "{0} = {2}")
    @MethodSource("badInputs")
    void badInputIsRefusedNamingFieldValueUnitAndZone(String field, String unit, double bad) {
        ZoneState z = zone(0.5, 0.4, 0.0);
        z.zone = 17;
        switch (field) {
            case "temperature" -> z.temperature = bad;
            case "density" -> z.density = bad;
            case "pressure" -> z.pressure = bad;
            case "opacity" -> z.opacity = bad;
            case "mass" -> z.mass = bad;
            case "delta" -> z.delta = bad;
            case "phi" -> z.phi = bad;
            case "luminosity" -> z.luminosity = bad;
            case "nablaMu" -> z.nablaMu = bad;
            case "nablaAd" -> z.nablaAd = bad;
            default -> throw new IllegalArgumentException(field);
        }
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> LEDOUX.evaluate(z, new StabilityResult()));
        assertEquals(field, e.field());
        assertEquals(unit, e.unit());
        assertEquals(17, e.zone());
        assertTrue(Double.compare(bad, e.value()) == 0, "value " + e.value());
        assertTrue(e.getMessage().contains(field) && e.getMessage().contains("zone 17"), e.getMessage());
    }
}
