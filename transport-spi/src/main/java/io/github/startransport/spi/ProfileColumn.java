package io.github.startransport.spi;

/**
 * The per-zone quantities a {@link Profile} can hold, with their file header names and units.
 *
 * <p>Required columns must be present in every profile; the optional ones are computed by the
 * diagnosis when absent (kappa from the opacity model, nabla_ad, c_P and delta from the
 * thermodynamics fallback, nabla_mu from the composition, phi = 1).
 */
public enum ProfileColumn {
    /** Radius r (cm), &gt; 0, strictly increasing outwards. */
    RADIUS("r_cm", "cm", true),
    /** Mass inside r, m (g), &gt; 0, strictly increasing outwards. */
    MASS("m_g", "g", true),
    /** Temperature T (K), &gt; 0. */
    TEMPERATURE("T_K", "K", true),
    /** Density rho (g cm^-3), &gt; 0. */
    DENSITY("rho_g_cm3", "g cm^-3", true),
    /** Total pressure P (dyn cm^-2), &gt; 0. */
    PRESSURE("P_dyn_cm2", "dyn cm^-2", true),
    /** Luminosity L (erg s^-1), finite (may be negative). */
    LUMINOSITY("L_erg_s", "erg s^-1", true),
    /** Hydrogen mass fraction X, in [0, 1]. */
    HYDROGEN("X", "1", true),
    /** Metal mass fraction Z, in [0, 1 - X]. */
    METALS("Z", "1", true),
    /** Rosseland mean opacity kappa (cm^2 g^-1), &gt; 0. Optional. */
    OPACITY("kappa_cm2_g", "cm^2 g^-1", false),
    /** Specific heat at constant pressure c_P (erg g^-1 K^-1), &gt; 0. Optional. */
    CP("cp_erg_g_K", "erg g^-1 K^-1", false),
    /** delta = -(d ln rho / d ln T)_P, &gt; 0. Optional. */
    DELTA("delta", "1", false),
    /** Adiabatic gradient nabla_ad, in (0, 1). Optional. */
    NABLA_AD("nabla_ad", "1", false),
    /** Composition gradient nabla_mu = d ln mu / d ln P, finite. Optional. */
    NABLA_MU("nabla_mu", "1", false),
    /** phi = (d ln rho / d ln mu)_{P,T}, &gt; 0. Optional. */
    PHI("phi", "1", false),
    /** First adiabatic exponent Gamma_1 = (d ln P / d ln rho)_s, &gt; 0. Optional. */
    GAMMA1("Gamma1", "1", false);

    private final String header;
    private final String unit;
    private final boolean required;

    ProfileColumn(String header, String unit, boolean required) {
        this.header = header;
        this.unit = unit;
        this.required = required;
    }

    /** @return the column's name in profile files and in the zone table, e.g. {@code "T_K"} */
    public String header() {
        return header;
    }

    /** @return the cgs unit, {@code "1"} when dimensionless */
    public String unit() {
        return unit;
    }

    /** @return whether every profile must have this column */
    public boolean required() {
        return required;
    }

    /**
     * @param header a header name such as {@code "rho_g_cm3"} (exact match)
     * @return the column, or {@code null} when no column has that header
     */
    public static ProfileColumn byHeader(String header) {
        for (ProfileColumn c : values()) {
            if (c.header.equals(header)) {
                return c;
            }
        }
        return null;
    }
}
