package io.github.startransport.spi;

/**
 * One convection zone of an integrated envelope, between two edges where nabla_rad = nabla_ad.
 *
 * @param topRadius       r of the upper edge (cm); the photospheric radius when the zone reaches the photosphere
 * @param bottomRadius    r of the lower edge (cm); the innermost radius integrated when {@code bottomReached} is false
 * @param topPressure     P at the upper edge (dyn cm^-2)
 * @param bottomPressure  P at the lower edge, or at the innermost point when the bottom was not reached (dyn cm^-2)
 * @param bottomReached   whether the integration passed the zone's lower edge
 * @param maxSuperadiabaticity largest nabla - nabla_ad inside the zone (dimensionless), over the profile's points
 *                        (NaN when the envelope was integrated without a profile)
 */
public record ConvectiveZone(double topRadius, double bottomRadius, double topPressure, double bottomPressure,
                             boolean bottomReached, double maxSuperadiabaticity) {
}
