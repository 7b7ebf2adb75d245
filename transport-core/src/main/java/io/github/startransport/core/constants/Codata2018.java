package io.github.startransport.core.constants;

/**
 * Physical constants in cgs units, CODATA 2018 recommended values.
 *
 * <p>Source: E. Tiesinga, P. J. Mohr, D. B. Newell and B. N. Taylor, "CODATA recommended values
 * of the fundamental physical constants: 2018", Rev. Mod. Phys. 93, 025010 (2021); values as
 * published by NIST (physics.nist.gov/constants), converted from SI to cgs by powers of ten
 * only. Since the 2019 SI redefinition c, h and k_B are exact, and so are the Stefan-Boltzmann
 * constant and the radiation constant derived from them (up to the digits kept here).
 */
public final class Codata2018 {
    private Codata2018() {
    }

    /** Speed of light in vacuum c = 2.99792458e10 cm s^-1 (exact). */
    public static final double SPEED_OF_LIGHT = 2.99792458e10;

    /** Newtonian constant of gravitation G = 6.67430e-8 cm^3 g^-1 s^-2 (relative uncertainty 2.2e-5). */
    public static final double GRAVITATIONAL_CONSTANT = 6.67430e-8;

    /** Planck constant h = 6.62607015e-27 erg s (exact). */
    public static final double PLANCK = 6.62607015e-27;

    /** Boltzmann constant k_B = 1.380649e-16 erg K^-1 (exact). */
    public static final double BOLTZMANN = 1.380649e-16;

    /** Atomic mass constant m_u = 1.66053906660e-24 g (relative uncertainty 3.0e-10). */
    public static final double ATOMIC_MASS_UNIT = 1.66053906660e-24;

    /** Electron mass m_e = 9.1093837015e-28 g (relative uncertainty 3.0e-10). */
    public static final double ELECTRON_MASS = 9.1093837015e-28;

    /**
     * Stefan-Boltzmann constant sigma = 5.670374419e-5 erg cm^-2 s^-1 K^-4
     * (CODATA 2018 lists it as exact: 2 pi^5 k^4 / (15 h^3 c^2), truncated to the digits shown).
     */
    public static final double STEFAN_BOLTZMANN = 5.670374419e-5;

    /** Thomson cross-section sigma_T = 6.6524587321e-25 cm^2 (relative uncertainty 9.1e-10). */
    public static final double THOMSON_CROSS_SECTION = 6.6524587321e-25;

    /**
     * Radiation density constant a = 4 sigma / c = 7.565733250e-15 erg cm^-3 K^-4.
     * CODATA does not list a; it is derived here from the two exact constants above.
     */
    public static final double RADIATION_CONSTANT = 4.0 * STEFAN_BOLTZMANN / SPEED_OF_LIGHT;

    /**
     * Electron volt 1 eV = 1.602176634e-12 erg (exact since the 2019 SI: e = 1.602176634e-19 C
     * times 1 V, times 1e7 erg/J).
     */
    public static final double ELECTRON_VOLT = 1.602176634e-12;

    /**
     * Elementary charge in Gaussian units e = 4.803204712570263e-10 statC: 1.602176634e-19 C times c / 10
     * in cgs (1 C = c/10 statC with c in cm s^-1). That conversion assumes mu_0 = 4 pi 1e-7 H/m, exact
     * before the 2019 SI; since then mu_0 / (4 pi 1e-7) = 1.00000000055(15) (CODATA 2018) and the Gaussian
     * charge sqrt(e^2 mu_0 c^2 / 4 pi) is larger than this value by 2.7e-10 relative, far below anything a
     * stellar calculation resolves.
     */
    public static final double ELEMENTARY_CHARGE_ESU = 1.602176634e-20 * SPEED_OF_LIGHT;
}
