package io.github.startransport.spi;

import java.util.Locale;

/** How energy and matter move in a zone, as decided by a stability test. */
public enum Regime {
    /** Stable: energy is carried by radiation (and conduction) alone. */
    RADIATIVE,
    /**
     * Dynamically unstable under the chosen criterion (under either one where nabla_mu &lt; 0 and
     * nabla_rad &gt; nabla_L): convection carries energy and mixes.
     */
    CONVECTIVE,
    /** Schwarzschild-unstable but Ledoux-stable (nabla_ad &lt; nabla_rad &lt; nabla_L): slow double-diffusive mixing. */
    SEMICONVECTIVE,
    /**
     * Stable with an inverted molecular-weight gradient (nabla_mu &lt; 0, nabla_rad &lt;= nabla_L,
     * density ratio R0 &gt;= 1): thermohaline (salt-finger) mixing.
     */
    THERMOHALINE;

    /** @return the lower-case label used in files and on screen, e.g. {@code "semiconvective"} */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * @param text a label such as {@code "convective"} (case-insensitive)
     * @return the regime
     * @throws IllegalArgumentException if the text names no regime
     */
    public static Regime fromLabel(String text) {
        for (Regime r : values()) {
            if (r.label().equalsIgnoreCase(text.trim())) {
                return r;
            }
        }
        throw new IllegalArgumentException("unknown regime '" + text + "'; expected radiative, convective, semiconvective or thermohaline");
    }
}
