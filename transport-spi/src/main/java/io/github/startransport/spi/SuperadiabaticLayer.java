package io.github.startransport.spi;

/**
 * The superadiabatic layer at the top of the surface convection zone: the outermost stretch of it
 * where nabla - nabla_ad exceeds a threshold (an option of the integrator).
 *
 * @param threshold          the threshold on nabla - nabla_ad that defines the layer (dimensionless)
 * @param bottomDepth        depth of the layer's lower edge below the photosphere, R - r (cm)
 * @param topDepth           depth of its upper edge below the photosphere (cm); 0 when it reaches the photosphere
 * @param maxExcess          the largest nabla - nabla_ad in the layer (dimensionless)
 * @param depthOfMax         depth below the photosphere where that maximum sits (cm), to the output spacing
 * @param temperatureOfMax   T where the maximum sits (K)
 */
public record SuperadiabaticLayer(double threshold, double bottomDepth, double topDepth, double maxExcess,
                                  double depthOfMax, double temperatureOfMax) {
}
