package io.github.startransport.spi;

import java.util.Locale;

/** The convective stability criterion a zone is judged by. */
public enum Criterion {
    /**
     * Convective where nabla_rad &gt; nabla_ad; a stabilising composition gradient (nabla_mu &gt; 0) is
     * ignored, a destabilising one (nabla_mu &lt; 0) counts: convective also where nabla_rad &gt; nabla_L.
     */
    SCHWARZSCHILD,
    /**
     * Convective where nabla_rad &gt; nabla_L = nabla_ad + (phi/delta) nabla_mu. The two criteria
     * differ only where nabla_mu &gt; 0.
     */
    LEDOUX;

    /** @return the lower-case label, e.g. {@code "ledoux"} */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * @param text {@code "schwarzschild"} or {@code "ledoux"} (case-insensitive)
     * @return the criterion
     * @throws IllegalArgumentException if the text names neither
     */
    public static Criterion fromLabel(String text) {
        for (Criterion c : values()) {
            if (c.label().equalsIgnoreCase(text.trim())) {
                return c;
            }
        }
        throw new IllegalArgumentException("unknown criterion '" + text + "'; expected schwarzschild or ledoux");
    }
}
