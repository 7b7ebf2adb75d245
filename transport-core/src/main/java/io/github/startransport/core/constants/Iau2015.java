package io.github.startransport.core.constants;

/**
 * Nominal solar values of IAU 2015 Resolution B3, in cgs, and the units of time used for
 * reporting.
 *
 * <p>Source: E. E. Mamajek et al., "IAU 2015 Resolution B3 on Recommended Nominal Conversion
 * Constants for Selected Solar and Planetary Properties", arXiv:1510.07674. The nominal values
 * are exact by definition; they are conversion constants, not measurements.
 */
public final class Iau2015 {
    private Iau2015() {
    }

    /** Nominal solar radius R_sun^N = 6.957e8 m = 6.957e10 cm (exact by definition). */
    public static final double SOLAR_RADIUS = 6.957e10;

    /** Nominal solar luminosity L_sun^N = 3.828e26 W = 3.828e33 erg s^-1 (exact by definition). */
    public static final double SOLAR_LUMINOSITY = 3.828e33;

    /** Nominal solar mass parameter (GM)_sun^N = 1.3271244e20 m^3 s^-2 = 1.3271244e26 cm^3 s^-2 (exact). */
    public static final double SOLAR_MASS_PARAMETER = 1.3271244e26;

    /** Nominal solar effective temperature T_eff,sun^N = 5772 K (exact by definition). */
    public static final double SOLAR_EFFECTIVE_TEMPERATURE = 5772.0;

    /**
     * Solar mass M_sun = (GM)_sun^N / G = 1.98841e33 g, with G from {@link Codata2018}.
     * B3 defines no nominal mass; this derived value carries G's relative uncertainty 2.2e-5.
     */
    public static final double SOLAR_MASS = SOLAR_MASS_PARAMETER / Codata2018.GRAVITATIONAL_CONSTANT;

    /** Julian year = 365.25 d = 3.15576e7 s (IAU 1976 / IAU style manual: exact by definition). */
    public static final double JULIAN_YEAR = 365.25 * 86400.0;

    /** Day = 86400 s (SI, exact). */
    public static final double DAY = 86400.0;
}
