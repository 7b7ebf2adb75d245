package io.github.startransport.spi;

/**
 * The global parameters of a star whose envelope is to be integrated: mass, photospheric radius,
 * luminosity and a homogeneous composition. The constructor refuses anything unphysical with an
 * {@link InvalidInputException} naming the field, its value and unit.
 *
 * @param mass       M (g), &gt; 0
 * @param radius     R, the photospheric radius where the optical depth is 2/3 (cm), &gt; 0
 * @param luminosity L (erg s^-1), &gt; 0
 * @param hydrogen   X (mass fraction), in [0, 1]
 * @param metals     Z (mass fraction), in [0, 1], X + Z &lt;= 1
 */
public record EnvelopeStar(double mass, double radius, double luminosity, double hydrogen, double metals) {
    /** Nominal solar radius R_sun^N = 6.957e10 cm (IAU 2015 Resolution B3, exact by definition). */
    public static final double NOMINAL_SOLAR_RADIUS = 6.957e10;
    /** Nominal solar luminosity L_sun^N = 3.828e33 erg s^-1 (IAU 2015 Resolution B3, exact by definition). */
    public static final double NOMINAL_SOLAR_LUMINOSITY = 3.828e33;
    /**
     * Solar mass (g): the nominal (G M)_sun^N = 1.3271244e26 cm^3 s^-2 (IAU 2015 Resolution B3) divided by
     * G = 6.67430e-8 cm^3 g^-1 s^-2 (CODATA 2018); B3 defines no nominal mass.
     */
    public static final double SOLAR_MASS = 1.3271244e26 / 6.67430e-8;

    /**
     * @param massSolar       M / M_sun
     * @param radiusSolar     R / R_sun^N
     * @param luminositySolar L / L_sun^N
     * @param hydrogen        X
     * @param metals          Z
     * @return the star in cgs
     * @throws InvalidInputException when a value is unphysical
     */
    public static EnvelopeStar inSolarUnits(double massSolar, double radiusSolar, double luminositySolar,
                                            double hydrogen, double metals) {
        return new EnvelopeStar(massSolar * SOLAR_MASS, radiusSolar * NOMINAL_SOLAR_RADIUS,
                luminositySolar * NOMINAL_SOLAR_LUMINOSITY, hydrogen, metals);
    }

    /**
     * Validates.
     *
     * @param mass       M (g), &gt; 0
     * @param radius     R, the photospheric radius where the optical depth is 2/3 (cm), &gt; 0
     * @param luminosity L (erg s^-1), &gt; 0
     * @param hydrogen   X (mass fraction), in [0, 1]
     * @param metals     Z (mass fraction), in [0, 1], X + Z &lt;= 1
     */
    public EnvelopeStar {
        Checks.positive("mass", mass, "g", InvalidInputException.NO_ZONE);
        Checks.positive("radius", radius, "cm", InvalidInputException.NO_ZONE);
        Checks.positive("luminosity", luminosity, "erg s^-1", InvalidInputException.NO_ZONE);
        Checks.closedInterval("hydrogen", hydrogen, 0.0, 1.0, "1", InvalidInputException.NO_ZONE);
        Checks.closedInterval("metals", metals, 0.0, 1.0, "1", InvalidInputException.NO_ZONE);
        if (hydrogen + metals > 1.0) {
            throw new InvalidInputException("metals", metals, "1", InvalidInputException.NO_ZONE,
                    "at most 1 - X = " + (1.0 - hydrogen) + " (X + Z = " + (hydrogen + metals)
                            + " leaves no room for helium); lower X or Z");
        }
    }
}
