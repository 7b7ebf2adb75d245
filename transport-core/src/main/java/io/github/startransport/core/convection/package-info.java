/**
 * Local mixing-length convection and the mixing diffusion coefficients of each regime.
 *
 * <p>Static kernels over primitives: {@link io.github.startransport.core.convection.MixingLengthCubic}
 * (the cubic for the convective efficiency and its implicit derivatives),
 * {@link io.github.startransport.core.convection.MixingLengthZone} (one zone, with the full
 * Jacobian), {@link io.github.startransport.core.convection.MixingCoefficients} (convective,
 * semiconvective, thermohaline and overshoot diffusion coefficients). Thin immutable models
 * around them: {@link io.github.startransport.core.convection.LocalMixingLength} and
 * {@link io.github.startransport.core.convection.TransparentEddyMixingLength}.
 */
package io.github.startransport.core.convection;
