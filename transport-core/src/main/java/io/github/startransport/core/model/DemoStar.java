package io.github.startransport.core.model;

import io.github.startransport.core.constants.Iau2015;
import io.github.startransport.spi.Checks;
import io.github.startransport.spi.InvalidOptionException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.StarModel;

import java.util.List;

/**
 * The built-in demonstration star "Corvina": an invented main-sequence star of 1.6 solar masses,
 * built as an {@link EddingtonStandardModel} with a CNO-like energy generation rate
 * epsilon ~ rho T^16, so that it shows a convective core. By default its outer quarter is an
 * envelope integrated inward from a grey atmosphere with the library's own physics
 * ({@link DemoSurface}), so the outermost zone is the photosphere at the T_eff of L and R and the
 * surface convection zone comes from the envelope physics; with {@code surface=polytrope} it is the
 * bare polytrope cut where T = {@value #SURFACE_TEMPERATURE} K. Demo data, not a calibrated model
 * of any real star.
 */
public final class DemoStar implements StarModel {
    /** Name to ask for this model by. */
    public static final String NAME = "corvina";

    /** Mass (solar masses). */
    public static final double MASS_SOLAR = 1.6;
    /** Radius where the polytrope ends (solar radii). */
    public static final double RADIUS_SOLAR = 1.7;
    /** Surface luminosity (solar luminosities). */
    public static final double LUMINOSITY_SOLAR = 6.0;
    /** Hydrogen mass fraction. */
    public static final double HYDROGEN = 0.70;
    /** Metal mass fraction. */
    public static final double METALS = 0.02;
    /** Temperature exponent of the energy generation rate (CNO cycle near 2e7 K: ~16, from memory). */
    public static final double NU = 16.0;
    /** Temperature of the outermost zone of the bare polytrope, {@code surface=polytrope} (K). */
    public static final double SURFACE_TEMPERATURE = 1.0e4;

    private static final int DEFAULT_ZONES = 800;

    /** Describes this model and its options. */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.STAR, NAME,
            "demo star 'Corvina' (invented): 1.6 M_sun, 1.7 R_sun, 6 L_sun, X = 0.70, Z = 0.02, Eddington standard "
                    + "model (n = 3 polytrope, constant beta) with epsilon ~ rho T^16, joined at 0.75-0.85 R to an "
                    + "envelope integrated from a grey atmosphere",
            List.of(new OptionInfo("zones", String.valueOf(DEFAULT_ZONES), "1",
                            "about this many zones; the polytrope's half uniform in radius, half uniform in log T,"
                                    + " the envelope's uniform in ln P; 10 to 100000"),
                    new OptionInfo("surface", "envelope", "",
                            "envelope: an envelope integrated from a grey Eddington atmosphere with the library's"
                                    + " physics (T_eff of L and R at the outermost zone); polytrope: the bare n = 3"
                                    + " polytrope cut at T = 1e4 K")));

    private final int zones;
    private final boolean envelope;

    /**
     * The bare polytrope (no integrated envelope), as the resampling tests of the diagnosis use it.
     *
     * @param zones number of zones, 10 to 100000
     */
    public DemoStar(int zones) {
        this(zones, false);
    }

    /**
     * @param zones    about this many zones, 10 to 100000
     * @param envelope whether the outer layers are an integrated envelope (the provider's default)
     */
    public DemoStar(int zones, boolean envelope) {
        Checks.closedInterval("zones", zones, 10, 100_000, "1", -1);
        this.zones = zones;
        this.envelope = envelope;
    }

    /**
     * @param options {@code zones}
     * @return the model
     */
    public static DemoStar fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        double z = options.getDouble(NAME, "zones", DEFAULT_ZONES);
        if (z != Math.rint(z) || z < 10 || z > 100_000) {
            throw new InvalidOptionException(NAME, "zones", String.valueOf(z), "a whole number from 10 to 100000");
        }
        String surface = options.getString(NAME, "surface", "envelope");
        if (!surface.equals("envelope") && !surface.equals("polytrope")) {
            throw new InvalidOptionException(NAME, "surface", surface, "envelope or polytrope");
        }
        return new DemoStar((int) z, surface.equals("envelope"));
    }

    /** @return the underlying standard model */
    public static EddingtonStandardModel standardModel() {
        return new EddingtonStandardModel(MASS_SOLAR * Iau2015.SOLAR_MASS, RADIUS_SOLAR * Iau2015.SOLAR_RADIUS,
                LUMINOSITY_SOLAR * Iau2015.SOLAR_LUMINOSITY, HYDROGEN, METALS, NU);
    }

    @Override
    public String description() {
        return INFO.description();
    }

    @Override
    public Profile profile() {
        if (envelope) {
            return DemoSurface.profile(standardModel(), "demo star Corvina", zones);
        }
        return standardModel().profile("demo star Corvina", zones, SURFACE_TEMPERATURE);
    }

    @Override
    public String toString() {
        return NAME + "(zones=" + zones + ", surface=" + (envelope ? "envelope" : "polytrope") + ")";
    }
}
