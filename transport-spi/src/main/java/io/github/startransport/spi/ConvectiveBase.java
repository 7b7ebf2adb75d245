package io.github.startransport.spi;

/**
 * The state at the lower edge of a convection zone, where nabla_rad = nabla_ad (located by an
 * event of the integration, not by interpolation between output points).
 *
 * @param radius         r (cm)
 * @param radiusFraction r / R (dimensionless)
 * @param temperature    T (K)
 * @param density        rho (g cm^-3)
 * @param pressure       P (dyn cm^-2)
 * @param mass           m (g), the mass inside r
 * @param massFraction   m / M (dimensionless)
 */
public record ConvectiveBase(double radius, double radiusFraction, double temperature, double density,
                             double pressure, double mass, double massFraction) {
}
