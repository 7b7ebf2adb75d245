package io.github.startransport.spi;

import java.util.List;

/**
 * The result of calibrating the mixing-length parameter to a target depth of the surface
 * convection zone.
 *
 * @param alpha              the calibrated alpha (dimensionless)
 * @param target             the requested r / R of the base (dimensionless)
 * @param sensitivity        d alpha / d(r_b / R) at the solution (dimensionless), by a central difference
 *                           of two further envelopes at alpha (1 -+ 1e-3)
 * @param steps              every envelope integrated, in order, including the two of the sensitivity
 * @param envelope           the envelope at the calibrated alpha
 */
public record AlphaCalibration(double alpha, double target, double sensitivity, List<CalibrationStep> steps,
                               EnvelopeSolution envelope) {
    /**
     * Copies the steps.
     *
     * @param alpha              the calibrated alpha (dimensionless)
     * @param target             the requested r / R of the base (dimensionless)
     * @param sensitivity        d alpha / d(r_b / R) at the solution (dimensionless), by a central difference
     *                of two further envelopes at alpha (1 -+ 1e-3)
     * @param steps              every envelope integrated, in order, including the two of the sensitivity
     * @param envelope           the envelope at the calibrated alpha
     */
    public AlphaCalibration {
        steps = List.copyOf(steps);
    }
}
