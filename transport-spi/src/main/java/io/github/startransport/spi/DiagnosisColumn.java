package io.github.startransport.spi;

/**
 * The numeric per-zone columns of a {@link ProfileDiagnosis}, in zone-table order, with their
 * table header names and units. The regime (a word) is not a numeric column: see
 * {@link ProfileDiagnosis#regimes()}; in the zone table it stands after {@link #NABLA_LEDOUX}.
 */
public enum DiagnosisColumn {
    /** Radius (cm). */
    RADIUS("r_cm", "cm"),
    /** Mass inside r (g). */
    MASS("m_g", "g"),
    /** Temperature (K). */
    TEMPERATURE("T_K", "K"),
    /** Density (g cm^-3). */
    DENSITY("rho_g_cm3", "g cm^-3"),
    /** Pressure (dyn cm^-2). */
    PRESSURE("P_dyn_cm2", "dyn cm^-2"),
    /** Luminosity (erg s^-1). */
    LUMINOSITY("L_erg_s", "erg s^-1"),
    /** Hydrogen mass fraction. */
    HYDROGEN("X", "1"),
    /** Metal mass fraction. */
    METALS("Z", "1"),
    /** Opacity in use (cm^2 g^-1): the profile's, or the opacity model's. */
    OPACITY("kappa_cm2_g", "cm^2 g^-1"),
    /** c_P in use (erg g^-1 K^-1). */
    CP("cp_erg_g_K", "erg g^-1 K^-1"),
    /** delta in use. */
    DELTA("delta", "1"),
    /** nabla_ad in use. */
    NABLA_AD("nabla_ad", "1"),
    /** nabla_mu in use. */
    NABLA_MU("nabla_mu", "1"),
    /** Gravity g = G m / r^2 (cm s^-2). */
    GRAVITY("g_cm_s2", "cm s^-2"),
    /** Pressure scale height H_P = P / (rho g) (cm). */
    SCALE_HEIGHT("H_P_cm", "cm"),
    /** Radiative gradient. */
    NABLA_RAD("nabla_rad", "1"),
    /** Ledoux gradient. */
    NABLA_LEDOUX("nabla_ledoux", "1"),
    /** Actual gradient from the convection model. */
    NABLA("nabla", "1"),
    /**
     * The profile's own structure gradient d ln T / d ln P, from its T and P columns (three-point
     * derivative in ln P, centred at interior zones, one-sided at the two ends); NaN where the pressure
     * does not decrease strictly outwards (the diagnosis warns).
     */
    NABLA_MODEL("nabla_model", "1"),
    /**
     * |nabla_model - nabla| over nabla_ad in convective zones, over |nabla_rad| elsewhere (where nabla =
     * nabla_rad; not below 0.01 nabla_ad): above 0.1 the model and the transport physics disagree.
     */
    NABLA_MISMATCH("nabla_mismatch", "1"),
    /** Gradient inside convective elements. */
    NABLA_ELEMENT("nabla_e", "1"),
    /** Convective velocity (cm s^-1). */
    VELOCITY("v_conv_cm_s", "cm s^-1"),
    /** F_conv / F. */
    CONVECTIVE_FRACTION("flux_conv_frac", "1"),
    /** Mixing diffusion coefficient (cm^2 s^-1): the regime's own, or the overshoot coefficient where that is larger. */
    DIFFUSION("D_mix_cm2_s", "cm^2 s^-1"),
    /** Gamma_1 in use: the profile's, or the thermodynamics model's at the zone's rho and T. */
    GAMMA1("Gamma1", "1"),
    /** phi in use: the profile's, or the thermodynamics model's. */
    PHI("phi", "1"),
    /** Adiabatic sound speed c_s = sqrt(Gamma_1 P / rho) with the profile's P (cm s^-1). */
    SOUND_SPEED("c_s_cm_s", "cm s^-1"),
    /** Buoyancy frequency squared N^2 = (g^2 rho / P) delta (nabla_L - nabla), the actual nabla (rad^2 s^-2). */
    BUOYANCY_SQUARED("N2_rad2_s2", "rad^2 s^-2"),
    /** Lamb frequency of degree l = 1, S_1 = sqrt(2) c_s / r (rad s^-1). */
    LAMB_L1("S1_rad_s", "rad s^-1"),
    /** Overshoot mixing coefficient beyond the edges of convective regions (cm^2 s^-1); 0 without overshoot. */
    OVERSHOOT_DIFFUSION("D_overshoot_cm2_s", "cm^2 s^-1");

    private final String header;
    private final String unit;

    DiagnosisColumn(String header, String unit) {
        this.header = header;
        this.unit = unit;
    }

    /** @return header name in the zone table */
    public String header() {
        return header;
    }

    /** @return cgs unit, {@code "1"} when dimensionless */
    public String unit() {
        return unit;
    }
}
