/**
 * Opacity: static kernels for each source ({@link io.github.startransport.core.opacity.ElectronScattering},
 * {@link io.github.startransport.core.opacity.Kramers}, {@link io.github.startransport.core.opacity.HMinus},
 * {@link io.github.startransport.core.opacity.MolecularFloor}, {@link io.github.startransport.core.opacity.Conduction}),
 * the analytic composite model ({@link io.github.startransport.core.opacity.AnalyticOpacity}), our table format
 * ({@link io.github.startransport.core.opacity.OpacityTableReader},
 * {@link io.github.startransport.core.opacity.OpacityTableBuilder}) and its interpolation
 * ({@link io.github.startransport.core.opacity.OpacityTableSet},
 * {@link io.github.startransport.core.opacity.TabulatedOpacity}).
 */
package io.github.startransport.core.opacity;
