package io.github.startransport.spi;

/**
 * Whole-star timescales, in seconds. Definitions and sources are on the core implementation
 * and in the README.
 *
 * @param photonDiffusion  photon random-walk time t_gamma = (1/c) integral_0^R kappa rho r dr (s)
 * @param thermalDiffusion radiative heat-diffusion time: the same random walk with the heat
 *                         diffusivity chi = 4 a c T^3 / (3 kappa rho^2 c_P) in place of the
 *                         photon diffusivity, integral_0^R r / (3 chi) dr (s)
 * @param kelvinHelmholtz  G M^2 / (R L) (s)
 */
public record Timescales(double photonDiffusion, double thermalDiffusion, double kelvinHelmholtz) {
}
