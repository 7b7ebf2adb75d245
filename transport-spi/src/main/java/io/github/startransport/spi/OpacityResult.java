package io.github.startransport.spi;

/** Caller-owned, mutable result of an {@link OpacityModel}: allocate once, reuse. */
public final class OpacityResult {
    /** Creates an empty result, to be filled by a model. */
    public OpacityResult() {
    }

    /** Rosseland mean opacity kappa (cm^2 g^-1). */
    public double kappa;
    /** (d ln kappa / d ln rho) at constant T and composition (dimensionless). */
    public double dLnKappaDLnRho;
    /** (d ln kappa / d ln T) at constant rho and composition (dimensionless). */
    public double dLnKappaDLnT;
    /** Whether the query was inside the model's domain, or clamped / extrapolated by policy. */
    public OpacityStatus status;

    @Override
    public String toString() {
        return "OpacityResult[kappa=" + kappa + " cm^2/g, dlnk/dlnrho=" + dLnKappaDLnRho + ", dlnk/dlnT="
                + dLnKappaDLnT + ", " + status + "]";
    }
}
