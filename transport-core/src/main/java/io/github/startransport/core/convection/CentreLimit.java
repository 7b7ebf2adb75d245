package io.github.startransport.core.convection;

/**
 * How the mixing length is limited near the centre, where g tends to 0 and H_P grows without
 * bound.
 */
public enum CentreLimit {
    /** l = alpha H_P everywhere. */
    NONE,
    /**
     * l = alpha min(H_P, r): an eddy is not longer (in units of alpha) than its distance from
     * the centre. Common practice, no source.
     */
    RADIUS;

    /** @return the option value, e.g. {@code "radius"} */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
