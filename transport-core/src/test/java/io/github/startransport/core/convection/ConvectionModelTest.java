package io.github.startransport.core.convection;

import io.github.startransport.core.CoreProvider;
import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.core.gradient.GasRadiation;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.InvalidOptionException;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.ZoneState;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.function.Consumer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Worked zones, discovery by name, options and refusals of the convection models. */
class ConvectionModelTest {

    private static final Transport TRANSPORT = Transport.fromSuppliers(List.of(CoreProvider::new));

    /** r, m, L of a zone with the wanted gravity and radiative gradient (r fixed at 1e11 cm). */
    private static ZoneState zone(double t, double rho, double p, double kappa, double cp, double delta,
                                  double nablaAd, double gravity, double nablaRad) {
        ZoneState z = new ZoneState();
        z.temperature = t;
        z.density = rho;
        z.pressure = p;
        z.opacity = kappa;
        z.cp = cp;
        z.delta = delta;
        z.nablaAd = nablaAd;
        z.radius = 1e11;
        z.mass = gravity * z.radius * z.radius / TestZones.G;
        z.luminosity = nablaRad * 16.0 * Math.PI * TestZones.A_RAD * TestZones.C * TestZones.G * z.mass
                * t * t * t * t / (3.0 * kappa * p);
        return z;
    }

    /** H_P (cm) of the synthetic envelope point, derived by {@code src/test/resources/vectors/MixingLengthVectors.java}. */
    static final double SYNTHETIC_SCALE_HEIGHT = 6.069587591e7;
    /** U of the synthetic envelope point (same derivation). */
    static final double SYNTHETIC_LOSS_PARAMETER = 0.0420147842;
    /** nabla of the synthetic envelope point (same derivation). */
    static final double SYNTHETIC_NABLA = 0.635589553;
    /** nabla_e of the synthetic envelope point (same derivation). */
    static final double SYNTHETIC_NABLA_ELEMENT = 0.437293080;
    /** v (cm/s) of the synthetic envelope point (same derivation). */
    static final double SYNTHETIC_VELOCITY = 3.65536581e5;
    /** F_conv / F of the synthetic envelope point (same derivation). */
    static final double SYNTHETIC_CONVECTIVE_FRACTION = 0.7881368156;

    /**
     * A synthetic envelope point solved with the textbook equations of Kippenhahn, Weigert &amp;
     * Weiss (2012, ch. 7): rho = 3e-7, T = 1.2e4, kappa = 10, g = 2.74e4, alpha = 1.8, nabla_rad = 3,
     * ideal gas plus radiation with mu = 0.6 (P, c_P, delta, nabla_ad rounded to 7 digits). The
     * expected values come from those equations in 60-digit arithmetic (xi-form of the cubic, solved by
     * bisection): {@code src/test/resources/vectors/MixingLengthVectors.java} derives them, and
     * {@code MixingLengthVectorsTest} reruns it on every build against the constants above; tolerances
     * allow for the 7-digit inputs.
     */
    @Tag("external")
    @Test
    void syntheticEnvelopePoint() {
        ZoneState z = zone(1.2e4, 3e-7, 4.989201e5, 10.0, 3.467265e8, 1.000419, 0.39987430, 2.74e4, 3.0);
        ConvectionResult out = new ConvectionResult();
        new LocalMixingLength().solve(z, out);
        assertEquals(Regime.CONVECTIVE, out.regime);
        assertEquals(SYNTHETIC_SCALE_HEIGHT, out.scaleHeight, 1e-8 * 6.07e7);
        assertEquals(SYNTHETIC_LOSS_PARAMETER, out.lossParameter, 1e-8 * 0.042);
        assertEquals(SYNTHETIC_NABLA, out.nabla, 1e-8);
        assertEquals(SYNTHETIC_NABLA_ELEMENT, out.nablaElement, 1e-8);
        assertEquals(SYNTHETIC_VELOCITY, out.velocity, 1e-7 * 3.66e5);
        assertEquals(SYNTHETIC_CONVECTIVE_FRACTION, out.convectiveFraction, 1e-8);
        // D = v l / 3 with l = alpha H_P (kinetic estimate, Langer, El Eid & Fricke 1985, from memory)
        assertEquals(1.8 * out.scaleHeight * out.velocity / 3.0, out.diffusion, 1e-12 * out.diffusion);
    }

    /** A solar-like zone: ideal gas with mu = 0.6 at T, rho, kappa chosen by the caller; r, m, L solar-like. */
    private static ZoneState solarLike(double rFraction, double t, double rho, double kappa) {
        double mu = 0.6;
        double pg = GasRadiation.gasPressure(t, rho, mu);
        double p = pg + GasRadiation.radiationPressure(t);
        double beta = pg / p;
        ZoneState z = new ZoneState();
        z.radius = rFraction * Iau2015.SOLAR_RADIUS;
        z.mass = Iau2015.SOLAR_MASS;
        z.luminosity = Iau2015.SOLAR_LUMINOSITY;
        z.temperature = t;
        z.density = rho;
        z.pressure = p;
        z.opacity = kappa;
        z.cp = GasRadiation.cp(beta, mu);
        z.delta = GasRadiation.delta(beta);
        z.nablaAd = GasRadiation.nablaAd(beta);
        return z;
    }

    /** nabla_rad of the deep solar-like zone, derived by {@code src/test/resources/vectors/MixingLengthVectors.java}. */
    static final double DEEP_NABLA_RAD = 0.5260789820;
    /** nabla - nabla_ad of the deep solar-like zone (same derivation). */
    static final double DEEP_EXCESS = 3.172536989e-7;
    /** v (cm/s) of the deep solar-like zone (same derivation). */
    static final double DEEP_VELOCITY = 4223.437214;
    /** nabla_rad of the zone below the solar-like surface (same derivation). */
    static final double SURFACE_NABLA_RAD = 3.155516831;
    /** nabla - nabla_ad of the zone below the solar-like surface (same derivation). */
    static final double SURFACE_EXCESS = 0.2008523017;
    /** v (cm/s) of the zone below the solar-like surface (same derivation). */
    static final double SURFACE_VELOCITY = 3.126717770e5;

    /**
     * Deep in a solar-like convective envelope (r = 0.85 R_sun, T = 1e6 K, rho = 0.05 g/cm^3,
     * kappa = 10 cm^2/g; state from memory of standard solar models): nabla_rad, nabla - nabla_ad and v
     * as the textbook theory gives them (Kippenhahn, Weigert &amp; Weiss 2012 ch. 7 and 13, ideal gas plus
     * radiation with mu = 0.6), derived in 60-digit arithmetic by
     * {@code src/test/resources/vectors/MixingLengthVectors.java} from the state alone (the zone's c_P,
     * delta and nabla_ad are recomputed there, not taken from the library). Convection is efficient:
     * nabla - nabla_ad = 3.2e-7, v = 42 m/s (tens of m/s in the deep solar envelope, from memory), and
     * convection carries 1 - nabla_ad/nabla_rad of the flux (the efficient limit).
     */
    @Tag("external")
    @Test
    void deepSolarEnvelope() {
        ZoneState z = solarLike(0.85, 1.0e6, 0.05, 10.0);
        ConvectionResult out = new ConvectionResult();
        new LocalMixingLength().solve(z, out);
        assertEquals(Regime.CONVECTIVE, out.regime);
        assertEquals(DEEP_NABLA_RAD, out.nablaRad, 1e-9 * DEEP_NABLA_RAD);
        assertEquals(DEEP_EXCESS, out.nabla - z.nablaAd, 1e-8 * DEEP_EXCESS);
        assertEquals(DEEP_VELOCITY, out.velocity, 1e-9 * DEEP_VELOCITY);
        // efficient limit: nabla -> nabla_ad, so F_conv / F -> 1 - nabla_ad / nabla_rad
        assertEquals(1.0 - z.nablaAd / out.nablaRad, out.convectiveFraction, 1e-4);
    }

    /**
     * Just below a solar-like surface (r = R_sun, T = 1e4 K, rho = 3e-7 g/cm^3, kappa = 10 cm^2/g;
     * from memory): nabla_rad, nabla - nabla_ad and v derived as for {@link #deepSolarEnvelope}. Radiative
     * losses of the eddies matter, so nabla lies well above nabla_ad (by 0.20), and v = 3.1 km/s (peak
     * convective velocities of a few km/s below the solar surface, from memory). With optically thin eddies
     * allowed for, losses are smaller and nabla cannot rise (Henyey, Vardya &amp; Bodenheimer 1965; the
     * transparent model's normalisation is not pinned here).
     */
    @Tag("external")
    @Test
    void nearSolarSurface() {
        ZoneState z = solarLike(1.0, 1.0e4, 3e-7, 10.0);
        ConvectionResult out = new ConvectionResult();
        new LocalMixingLength().solve(z, out);
        assertEquals(Regime.CONVECTIVE, out.regime);
        assertEquals(SURFACE_NABLA_RAD, out.nablaRad, 1e-9 * SURFACE_NABLA_RAD);
        assertEquals(SURFACE_EXCESS, out.nabla - z.nablaAd, 1e-9);
        assertEquals(SURFACE_VELOCITY, out.velocity, 1e-9 * SURFACE_VELOCITY);
        ConvectionResult thin = new ConvectionResult();
        new TransparentEddyMixingLength().solve(z, thin);
        assertTrue(thin.nabla <= out.nabla);
        // the transparent model's normalisation is unverified (see TransparentEddyMixingLength): order of magnitude only
        assertTrue(thin.velocity > 1e4 && thin.velocity < 1e6, thin::toString);
    }

    /**
     * A stable zone: nabla = nabla_rad, no convective flux, radiative fraction 1 (a layer stable by the
     * Schwarzschild criterion carries its whole flux by radiation; Kippenhahn, Weigert &amp; Weiss 2012 §6.1, from
     * memory).
     */
    @Tag("law")
    @Test
    void stableZoneCarriesNoConvectiveFlux() {
        ZoneState z = zone(1e7, 10.0, 1e16, 1.0, 3e8, 1.0, 0.4, 1e5, 0.2);
        ConvectionResult out = new ConvectionResult();
        new LocalMixingLength().solve(z, out);
        assertEquals(Regime.RADIATIVE, out.regime);
        assertEquals(out.nablaRad, out.nabla);
        assertEquals(0.0, out.velocity);
        assertEquals(0.0, out.convectiveFraction);
        assertEquals(1.0, out.radiativeFraction);
        assertEquals(0.0, out.diffusion);
    }

    /**
     * A semiconvective zone (Ledoux) gets D_sc = alpha_sc (4acT^3 / (3 kappa rho)) / (6 c_P rho)
     * (nabla - nabla_ad) / (nabla_L - nabla) with nabla = nabla_rad (Langer, Sugimoto &amp; Fricke 1983, from memory)
     * and nabla_L = nabla_ad + (phi/delta) nabla_mu (Kippenhahn, Weigert &amp; Weiss 2012 §6.1, from memory). phi and
     * delta differ from 1 and from each other, so a swapped or dropped phi/delta changes nabla_L and fails.
     */
    @Tag("external")
    @Test
    void semiconvectiveZoneUsesTheLangerCoefficient() {
        ZoneState z = zone(1e7, 10.0, 1e16, 1.0, 3e8, 2.0, 0.4, 1e5, 0.45);
        z.phi = 0.8;
        z.nablaMu = 0.25; // nabla_L = 0.4 + (0.8 / 2.0) 0.25 = 0.5
        ConvectionModel model = LocalMixingLength.fromOptions(ModelOptions.parse("criterion=ledoux,semiconvection-efficiency=0.02"));
        ConvectionResult out = new ConvectionResult();
        model.solve(z, out);
        assertEquals(Regime.SEMICONVECTIVE, out.regime);
        double conductivity = 4.0 * TestZones.A_RAD * TestZones.C * 1e21 / (3.0 * 1.0 * 10.0);
        double expected = 0.02 * conductivity / (6.0 * 3e8 * 10.0) * (out.nablaRad - 0.4) / (0.5 - out.nablaRad);
        assertEquals(expected, out.diffusion, 1e-12 * expected);
    }

    /**
     * A thermohaline zone gets D_th = C_t (4acT^3 / (3 kappa rho^2 c_P)) (phi/delta)(-nabla_mu)/(nabla_ad - nabla)
     * (Kippenhahn, Ruschenplatt &amp; Thomas 1980; Charbonnel &amp; Zahn 2007; from memory), with phi = 0.9 and
     * delta = 1.6 so that a swapped or dropped phi/delta fails.
     */
    @Tag("external")
    @Test
    void thermohalineZoneUsesTheFingerCoefficient() {
        ZoneState z = zone(1e7, 10.0, 1e16, 1.0, 3e8, 1.6, 0.4, 1e5, 0.3);
        z.phi = 0.9;
        z.nablaMu = -1e-3;
        ConvectionResult out = new ConvectionResult();
        new LocalMixingLength().solve(z, out);
        assertEquals(Regime.THERMOHALINE, out.regime);
        double kT = 4.0 * TestZones.A_RAD * TestZones.C * 1e21 / (3.0 * 1.0 * 100.0 * 3e8);
        double expected = 1000.0 * kT * (0.9 / 1.6) * 1e-3 / (0.4 - out.nablaRad);
        assertEquals(expected, out.diffusion, 1e-12 * expected);
    }

    @Tag("internal")
    @Test
    void discoveredByNameWithTextbookDefault() {
        ConvectionModel dflt = TRANSPORT.convection(null, ModelOptions.defaults());
        LocalMixingLength local = assertInstanceOf(LocalMixingLength.class, dflt);
        assertEquals(1.8, local.alpha());
        assertEquals(Criterion.SCHWARZSCHILD, local.criterion());
        assertEquals(MixingLengthGeometry.BOHM_VITENSE_1958, local.geometry());
        assertEquals(CentreLimit.RADIUS, local.centreLimit());
        assertEquals(0.016, local.overshootParameter());
        ConvectionModel thin = TRANSPORT.convection(TransparentEddyMixingLength.NAME,
                ModelOptions.parse("alpha=2.0,geometry=bohm-cassinelli-1971,eddy-shape-factor=0.3333333333"));
        TransparentEddyMixingLength t = assertInstanceOf(TransparentEddyMixingLength.class, thin);
        assertEquals(2.0, t.alpha());
        assertEquals(MixingLengthGeometry.BOHM_CASSINELLI_1971, t.geometry());
        assertEquals(0.3333333333, t.eddyShape());
    }

    @Tag("internal")
    @Test
    void unknownOrMalformedOptionsAreRefused() {
        assertThrows(InvalidOptionException.class,
                () -> TRANSPORT.convection(LocalMixingLength.NAME, ModelOptions.parse("eddy-shape-factor=0.3")));
        assertThrows(InvalidOptionException.class,
                () -> TRANSPORT.convection(LocalMixingLength.NAME, ModelOptions.parse("geometry=textbook")));
        assertThrows(InvalidOptionException.class,
                () -> TRANSPORT.convection(LocalMixingLength.NAME, ModelOptions.parse("alpha=abc")));
    }

    @Tag("internal")
    @Test
    void nonPositiveAlphaIsRefused() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> TRANSPORT.convection(LocalMixingLength.NAME, ModelOptions.parse("alpha=0")));
        assertEquals("alpha", e.field());
        assertEquals(0.0, e.value());
        assertThrows(InvalidInputException.class, () -> new LocalMixingLength(-1.0, Criterion.LEDOUX,
                MixingLengthGeometry.BOHM_VITENSE_1958));
    }

    @Tag("internal")
    @Test
    void badZoneInputIsRefusedWithFieldValueUnitAndZone() {
        refused("temperature", "K", Double.NaN, z -> z.temperature = Double.NaN);
        refused("density", "g cm^-3", -1.0, z -> z.density = -1.0);
        refused("pressure", "dyn cm^-2", Double.POSITIVE_INFINITY, z -> z.pressure = Double.POSITIVE_INFINITY);
        refused("luminosity", "erg s^-1", Double.NaN, z -> z.luminosity = Double.NaN);
        refused("mass", "g", 0.0, z -> z.mass = 0.0);
        refused("radius", "cm", 0.0, z -> z.radius = 0.0);
        refused("opacity", "cm^2 g^-1", -2.0, z -> z.opacity = -2.0);
        refused("cp", "erg g^-1 K^-1", 0.0, z -> z.cp = 0.0);
        refused("nablaAd", "1", 1.2, z -> z.nablaAd = 1.2);
        refused("nablaAd", "1", 0.0, z -> z.nablaAd = 0.0);
        refused("delta", "1", -1.0, z -> z.delta = -1.0);
        refused("nablaMu", "1", Double.NaN, z -> z.nablaMu = Double.NaN);
        refused("phi", "1", 0.0, z -> z.phi = 0.0);
    }

    private static void refused(String field, String unit, double value, Consumer<ZoneState> spoil) {
        ZoneState z = zone(1.2e4, 3e-7, 4.989201e5, 10.0, 3.467265e8, 1.000419, 0.39987430, 2.74e4, 3.0);
        z.zone = 17;
        spoil.accept(z);
        for (ConvectionModel m : List.of(new LocalMixingLength(), new TransparentEddyMixingLength())) {
            InvalidInputException e = assertThrows(InvalidInputException.class, () -> m.solve(z, new ConvectionResult()));
            assertEquals(field, e.field());
            assertEquals(unit, e.unit());
            assertEquals(17, e.zone());
            assertEquals(value, e.value());
        }
    }

    /**
     * Overshoot through the SPI: D(0) = D_0 and D(f H_P / 2) = D_0 / e for D = D_0 exp(-2z/(f H_P))
     * (Freytag, Ludwig &amp; Steffen 1996; Herwig 2000; from memory).
     */
    @Tag("external")
    @Test
    void overshootThroughTheContract() {
        ConvectionModel m = TRANSPORT.convection(LocalMixingLength.NAME, ModelOptions.parse("overshoot-f=0.02"));
        assertEquals(0.02, m.overshootParameter());
        assertEquals(1e12, m.overshootDiffusion(1e12, 0.0, 1e9));
        assertEquals(1e12 / Math.E, m.overshootDiffusion(1e12, 0.5 * 0.02 * 1e9, 1e9), 1e-3);
        assertThrows(InvalidInputException.class, () -> m.overshootDiffusion(1e12, -1.0, 1e9));
        assertThrows(InvalidInputException.class, () -> m.overshootDiffusion(1e12, 1.0, 0.0));
        assertThrows(InvalidInputException.class, () -> m.overshootDiffusion(Double.NaN, 1.0, 1e9));
        ConvectionModel none = TRANSPORT.convection(LocalMixingLength.NAME, ModelOptions.parse("overshoot-f=0"));
        assertEquals(0.0, none.overshootDiffusion(1e12, 1.0, 1e9));
    }
}
