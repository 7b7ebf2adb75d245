package io.github.startransport.spi;

/**
 * One convection zone of an integrated envelope, between two edges where nabla_rad = nabla_ad.
 *
 * @param topRadius       r of the upper edge (cm); the photospheric radius when the zone reaches the photosphere
 * @param bottomRadius    r of the lower edge (cm); the innermost radius integrated when {@code bottomReached} is false
 * @param bottomReached   whether the integration passed the zone's lower edge
 * @param maxSuperadiabaticity largest nabla - nabla_ad inside the zone (dimensionless)
 */
public record ConvectiveZone(double topRadius, double bottomRadius, boolean bottomReached,
                             double maxSuperadiabaticity) {
}
