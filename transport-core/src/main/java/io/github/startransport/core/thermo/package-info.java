/**
 * Equations of state: the partially ionised H, He and metal mixture with radiation
 * ({@link io.github.startransport.core.thermo.SahaIonisation}, model
 * {@link io.github.startransport.core.thermo.IonisingGas}). The fully ionised ideal gas plus radiation
 * stays in {@code gradient} ({@code GasRadiation}, {@code IdealGasRadiation}) under its public names.
 */
package io.github.startransport.core.thermo;
