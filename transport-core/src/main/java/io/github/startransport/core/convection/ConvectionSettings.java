package io.github.startransport.core.convection;

import io.github.startransport.spi.Checks;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OptionInfo;

import java.util.List;
import java.util.Objects;

/**
 * The options every mixing-length model shares, validated once at creation.
 *
 * @param alpha          mixing-length parameter l / H_P (dimensionless), &gt; 0
 * @param criterion      stability criterion
 * @param geometry       geometry constants
 * @param centreLimit    near-centre limit of the mixing length
 * @param semiconvection alpha_sc (dimensionless), &gt;= 0
 * @param thermohaline   C_t (dimensionless), &gt;= 0
 * @param overshoot      f (dimensionless), &gt;= 0
 */
record ConvectionSettings(double alpha, Criterion criterion, MixingLengthGeometry geometry,
                          CentreLimit centreLimit, double semiconvection, double thermohaline,
                          double overshoot) {

    /**
     * Default alpha = 1.8: inside the range 1.6-2.2 of solar calibrations reviewed by Joyce &amp;
     * Tayar (2023, Galaxies 11, 75), between the 3-D calibrations 1.76 (Trampedach et al. 2014)
     * and 1.98 (Magic et al. 2015, A&amp;A 573, A89). A calibrated alpha belongs to one formulation
     * (here the Böhm-Vitense constants); recalibrate for another geometry.
     */
    static final double DEFAULT_ALPHA = 1.8;
    /** Default alpha_sc = 0.1, inside the 1e-3 to 1 range used in the literature (from memory). */
    static final double DEFAULT_SEMICONVECTION = 0.1;
    /** Default C_t = 1000, the value of Charbonnel &amp; Zahn (2007) for fingers of aspect ratio about 6. */
    static final double DEFAULT_THERMOHALINE = 1000.0;
    /** Default f = 0.016 (Herwig 2000, from memory). */
    static final double DEFAULT_OVERSHOOT = 0.016;

    static final String ALPHA = "alpha";
    static final String CRITERION = "criterion";
    static final String GEOMETRY = "geometry";
    static final String CENTRE_LIMIT = "centre-limit";
    static final String SEMICONVECTION = "semiconvection-efficiency";
    static final String THERMOHALINE = "thermohaline-efficiency";
    static final String OVERSHOOT = "overshoot-f";

    /** Options of every mixing-length model, with their defaults. */
    static final List<OptionInfo> OPTIONS = List.of(
            new OptionInfo(ALPHA, Double.toString(DEFAULT_ALPHA), "1",
                    "mixing length / pressure scale height; 1.8 lies in the 1.6-2.2 range of solar calibrations "
                            + "(Joyce & Tayar 2023) for the Böhm-Vitense constants"),
            new OptionInfo(CRITERION, "schwarzschild", "",
                    "schwarzschild or ledoux: which gradient decides that a zone convects"),
            new OptionInfo(GEOMETRY, MixingLengthGeometry.BOHM_VITENSE_1958.label(), "",
                    "geometry constants (a, b, c): bohm-vitense-1958 (1/8, 1/2, 24) or bohm-cassinelli-1971 (1, 2, 16)"),
            new OptionInfo(CENTRE_LIMIT, CentreLimit.RADIUS.label(), "",
                    "radius: l = alpha min(H_P, r) (common practice, no source); none: l = alpha H_P"),
            new OptionInfo(SEMICONVECTION, Double.toString(DEFAULT_SEMICONVECTION), "1",
                    "alpha_sc of semiconvective mixing (Langer, Sugimoto & Fricke 1983); literature uses 1e-3 to 1"),
            new OptionInfo(THERMOHALINE, Double.toString(DEFAULT_THERMOHALINE), "1",
                    "C_t of thermohaline mixing (Kippenhahn, Ruschenplatt & Thomas 1980) as in Charbonnel & Zahn 2007"),
            new OptionInfo(OVERSHOOT, Double.toString(DEFAULT_OVERSHOOT), "1",
                    "f of exponential overshoot, D = D_0 exp(-2z/(f H_P)) (Freytag, Ludwig & Steffen 1996; "
                            + "Herwig 2000); 0 disables"));

    ConvectionSettings {
        Objects.requireNonNull(criterion, "criterion");
        Objects.requireNonNull(geometry, "geometry");
        Objects.requireNonNull(centreLimit, "centreLimit");
        Checks.positive(ALPHA, alpha, "1", InvalidInputException.NO_ZONE);
        nonNegative(SEMICONVECTION, semiconvection);
        nonNegative(THERMOHALINE, thermohaline);
        nonNegative(OVERSHOOT, overshoot);
    }

    /** @return the defaults: alpha 1.8, Schwarzschild, Böhm-Vitense constants, radius limit */
    static ConvectionSettings defaults() {
        return new ConvectionSettings(DEFAULT_ALPHA, Criterion.SCHWARZSCHILD, MixingLengthGeometry.BOHM_VITENSE_1958,
                CentreLimit.RADIUS, DEFAULT_SEMICONVECTION, DEFAULT_THERMOHALINE, DEFAULT_OVERSHOOT);
    }

    /**
     * @param model   model name, for messages
     * @param options the options (unknown names must have been refused already)
     * @return the settings
     */
    static ConvectionSettings parse(String model, ModelOptions options) {
        return new ConvectionSettings(
                options.getDouble(model, ALPHA, DEFAULT_ALPHA),
                options.getEnum(model, CRITERION, Criterion.class, Criterion.SCHWARZSCHILD),
                options.getEnum(model, GEOMETRY, MixingLengthGeometry.class, MixingLengthGeometry.BOHM_VITENSE_1958),
                options.getEnum(model, CENTRE_LIMIT, CentreLimit.class, CentreLimit.RADIUS),
                options.getDouble(model, SEMICONVECTION, DEFAULT_SEMICONVECTION),
                options.getDouble(model, THERMOHALINE, DEFAULT_THERMOHALINE),
                options.getDouble(model, OVERSHOOT, DEFAULT_OVERSHOOT));
    }

    /** @return a copy with another alpha */
    ConvectionSettings withAlpha(double newAlpha) {
        return new ConvectionSettings(newAlpha, criterion, geometry, centreLimit, semiconvection, thermohaline,
                overshoot);
    }

    /** Validated overshoot kernel, shared by the models. */
    double overshootDiffusion(double boundaryDiffusion, double distance, double scaleHeight) {
        nonNegative("boundaryDiffusion", boundaryDiffusion, "cm^2 s^-1");
        nonNegative("distance", distance, "cm");
        Checks.positive("scaleHeight", scaleHeight, "cm", InvalidInputException.NO_ZONE);
        return MixingCoefficients.overshoot(boundaryDiffusion, distance, overshoot, scaleHeight);
    }

    private static void nonNegative(String field, double value) {
        nonNegative(field, value, "1");
    }

    private static void nonNegative(String field, double value, String unit) {
        Checks.closedInterval(field, value, 0.0, Double.MAX_VALUE, unit, InvalidInputException.NO_ZONE);
    }

    String describe() {
        return "alpha=" + alpha + ", criterion=" + criterion.label() + ", geometry=" + geometry.label()
                + ", centre-limit=" + centreLimit.label() + ", semiconvection-efficiency=" + semiconvection
                + ", thermohaline-efficiency=" + thermohaline + ", overshoot-f=" + overshoot;
    }
}
