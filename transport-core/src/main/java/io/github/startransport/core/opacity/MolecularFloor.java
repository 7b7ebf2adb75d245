package io.github.startransport.core.opacity;

/**
 * A constant floor standing for molecular and grain-free line opacity in the coolest layers:
 * kappa_mol = 0.1 Z (cm^2 g^-1) (a common analytic envelope prescription; attribution unknown, from memory).
 * Independent of rho and T, so both log-derivatives are 0. Pure static kernel.
 */
public final class MolecularFloor {
    private MolecularFloor() {
    }

    /** Coefficient 0.1 (cm^2 g^-1 per unit Z), from memory. */
    public static final double COEFFICIENT = 0.1;

    /**
     * @param metals Z (mass fraction)
     * @return kappa_mol (cm^2 g^-1)
     */
    public static double kappa(double metals) {
        return COEFFICIENT * metals;
    }
}
