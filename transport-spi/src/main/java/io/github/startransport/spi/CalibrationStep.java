package io.github.startransport.spi;

/**
 * One envelope integrated during an alpha calibration.
 *
 * @param iteration          1, 2, ... in the order the envelopes were integrated
 * @param alpha              the mixing-length parameter tried (dimensionless)
 * @param baseRadiusFraction r / R of the base of the surface convection zone it gave
 *                           (NaN when the base was not reached)
 */
public record CalibrationStep(int iteration, double alpha, double baseRadiusFraction) {
}
