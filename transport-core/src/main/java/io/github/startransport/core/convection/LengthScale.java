package io.github.startransport.core.convection;

/** The eddy length scale Lambda of the full-spectrum convection model ({@link EddySpectrumConvection}). */
public enum LengthScale {
    /** Lambda = alpha H_P, limited near the centre as the model's {@link CentreLimit} says. */
    SCALE_HEIGHT,
    /**
     * Lambda = alpha z, z the distance to the nearest edge of the convective region
     * ({@link io.github.startransport.spi.ZoneState#edgeDistance}); alpha = 1 is the choice of Canuto &amp;
     * Mazzitelli (1991, from memory).
     */
    EDGE_DISTANCE;

    /** @return the option value, e.g. {@code "edge-distance"} */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }
}
