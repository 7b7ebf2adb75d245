package io.github.startransport.spi;

import java.util.function.Consumer;

/**
 * Integrates a star's envelope inward from a model atmosphere, with the thermodynamics, opacity
 * and convection models the caller chooses, and calibrates the mixing-length parameter to a
 * target depth of the surface convection zone.
 *
 * <p>Not a hot-path call (one envelope takes milliseconds). Implementations are immutable and
 * thread-safe: several envelopes may be integrated at once. What the integration assumes (the
 * atmosphere, mass and luminosity held fixed, the depth it stops at) is stated on the
 * implementation; the solution's {@link EnvelopeSolution#warnings()} say where an assumption
 * is strained.
 */
public interface EnvelopeIntegrator {

    /**
     * @param star  mass, radius, luminosity, composition
     * @param setup the models
     * @return the envelope from the photosphere down to the integrator's stated depth
     * @throws InvalidInputException when the star cannot have such an envelope (a super-Eddington
     *                               atmosphere, a state a model refuses), naming the quantity and depth
     */
    EnvelopeSolution integrate(EnvelopeStar star, EnvelopeSetup setup);

    /**
     * Finds the alpha that puts the base of the surface convection zone at {@code targetBase}
     * (r / R) by Brent's method, with the sensitivity d alpha / d(r_b / R).
     *
     * @param star       mass, radius, luminosity, composition
     * @param setup      the models; the convection model's alpha is replaced
     * @param targetBase the wanted r / R of the base (dimensionless), in (0, 1)
     * @param progress   told of each envelope integrated (may be {@code null})
     * @return the calibrated alpha, the envelope it gives, and every step
     * @throws InvalidInputException when the target is outside the range of bases the integrator's
     *                               alpha interval can reach (the message gives that range)
     */
    AlphaCalibration calibrate(EnvelopeStar star, EnvelopeSetup setup, double targetBase,
                               Consumer<CalibrationStep> progress);
}
