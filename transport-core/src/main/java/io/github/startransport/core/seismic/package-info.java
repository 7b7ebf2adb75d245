/**
 * Stellar oscillation diagnostics: local frequencies ({@link io.github.startransport.core.seismic.LocalFrequencies}:
 * sound speed, Lamb and buoyancy frequencies, N^2 with its Jacobian) and the asymptotic whole-model integrals
 * ({@link io.github.startransport.core.seismic.AsymptoticIntegrals}: acoustic radius, large separation, period
 * spacing, acoustic depths).
 */
package io.github.startransport.core.seismic;
