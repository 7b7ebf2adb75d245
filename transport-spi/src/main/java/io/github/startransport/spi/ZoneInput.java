package io.github.startransport.spi;

/**
 * Indices of the inputs of a hot-path call, used to address derivative arrays.
 *
 * <p>A result's derivative array {@code d[]} holds plain partial derivatives
 * {@code d[i] = ∂(output)/∂(input i)} in the units of output over input, with every other
 * input of the call held fixed. Entries for inputs that a model does not use are zero.
 * Plain {@code int} constants (not an enum) so that hot loops index arrays directly.
 */
public final class ZoneInput {
    private ZoneInput() {
    }

    /** Temperature T (K). */
    public static final int T = 0;
    /** Density rho (g cm^-3). */
    public static final int RHO = 1;
    /** Total pressure P (dyn cm^-2). */
    public static final int P = 2;
    /** Luminosity through the sphere L (erg s^-1). */
    public static final int L = 3;
    /** Mass inside the sphere m (g). */
    public static final int M = 4;
    /** Radius r (cm). */
    public static final int R = 5;
    /** Rosseland mean opacity kappa (cm^2 g^-1). */
    public static final int KAPPA = 6;
    /** Specific heat at constant pressure c_P (erg g^-1 K^-1). */
    public static final int CP = 7;
    /** Adiabatic gradient nabla_ad (dimensionless). */
    public static final int NABLA_AD = 8;
    /** delta = -(d ln rho / d ln T) at constant P and mu (dimensionless). */
    public static final int DELTA = 9;
    /** Composition gradient nabla_mu = d ln mu / d ln P (dimensionless). */
    public static final int NABLA_MU = 10;
    /** phi = (d ln rho / d ln mu) at constant P and T (dimensionless). */
    public static final int PHI = 11;
    /** Mixing-length parameter alpha = l / H_P (dimensionless), a model option. */
    public static final int ALPHA = 12;
    /** Number of inputs: the length of every derivative array. */
    public static final int COUNT = 13;

    private static final String[] NAMES = {
        "T", "rho", "P", "L", "m", "r", "kappa", "c_P", "nabla_ad", "delta", "nabla_mu", "phi", "alpha"
    };
    private static final String[] UNITS = {
        "K", "g cm^-3", "dyn cm^-2", "erg s^-1", "g", "cm", "cm^2 g^-1", "erg g^-1 K^-1", "1", "1", "1", "1", "1"
    };

    /**
     * @param index one of the constants of this class
     * @return the input's short name, e.g. {@code "rho"}
     */
    public static String name(int index) {
        return NAMES[index];
    }

    /**
     * @param index one of the constants of this class
     * @return the input's cgs unit, {@code "1"} when dimensionless
     */
    public static String unit(int index) {
        return UNITS[index];
    }
}
