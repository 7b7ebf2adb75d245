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
    /** Validates. */
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
