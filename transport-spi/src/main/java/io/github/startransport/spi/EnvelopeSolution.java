package io.github.startransport.spi;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * An integrated envelope: the profile from the innermost point integrated out to the photosphere,
 * the transport gradients along it, its convection zones, the base of the surface convection zone
 * and the superadiabatic layer. Immutable; the column accessors return copies.
 *
 * <p>The profile holds every column a {@link ProfileDiagnoser} reads (r, m, T, rho, P, L, X, Z,
 * and the envelope's own kappa, c_P, delta, nabla_ad, phi), centre side first, so it can be
 * diagnosed like any model. The gradient columns are aligned with the profile's zones.
 */
public final class EnvelopeSolution {
    private final EnvelopeStar star;
    private final double alpha;
    private final double effectiveTemperature;
    private final double surfaceGravity;
    private final double photosphericPressure;
    private final double photosphericDensity;
    private final Profile profile;
    private final double[] nablaRad;
    private final double[] nabla;
    private final double[] velocity;
    private final List<ConvectiveZone> convectiveZones;
    private final ConvectiveBase base;
    private final SuperadiabaticLayer superadiabaticLayer;
    private final double innerRadius;
    private final int evaluations;
    private final List<String> warnings;

    /**
     * @param star                 the star
     * @param alpha                the mixing-length parameter used (dimensionless)
     * @param effectiveTemperature T_eff = (L / 4 pi R^2 sigma)^(1/4) (K)
     * @param surfaceGravity       g = G M / R^2 (cm s^-2)
     * @param photosphericPressure P at optical depth 2/3 (dyn cm^-2)
     * @param photosphericDensity  rho at optical depth 2/3 (g cm^-3)
     * @param profile              the envelope as a profile (may be {@code null} when not sampled)
     * @param nablaRad             nabla_rad per profile zone (copied; {@code null} with a null profile)
     * @param nabla                actual nabla per profile zone (copied; {@code null} with a null profile)
     * @param velocity             convective velocity per profile zone (cm s^-1) (copied; {@code null} with a null profile)
     * @param convectiveZones      convection zones, outermost first
     * @param base                 base of the surface convection zone, or {@code null} when none was found
     *                             or the integration stopped inside it
     * @param superadiabaticLayer  the superadiabatic layer, or {@code null} when there is none
     * @param innerRadius          r of the innermost point integrated (cm)
     * @param evaluations          evaluations of the structure equations by the integrator
     * @param warnings             where an approximation is strained, or a model reported something
     */
    public EnvelopeSolution(EnvelopeStar star, double alpha, double effectiveTemperature, double surfaceGravity,
                            double photosphericPressure, double photosphericDensity, Profile profile,
                            double[] nablaRad, double[] nabla, double[] velocity, List<ConvectiveZone> convectiveZones,
                            ConvectiveBase base, SuperadiabaticLayer superadiabaticLayer, double innerRadius,
                            int evaluations, List<String> warnings) {
        this.star = Objects.requireNonNull(star, "star");
        this.alpha = alpha;
        this.effectiveTemperature = effectiveTemperature;
        this.surfaceGravity = surfaceGravity;
        this.photosphericPressure = photosphericPressure;
        this.photosphericDensity = photosphericDensity;
        this.profile = profile;
        if (profile != null) {
            int n = profile.size();
            if (nablaRad.length != n || nabla.length != n || velocity.length != n) {
                throw new IllegalArgumentException("gradient columns must have the profile's " + n + " zones");
            }
            this.nablaRad = nablaRad.clone();
            this.nabla = nabla.clone();
            this.velocity = velocity.clone();
        } else {
            this.nablaRad = null;
            this.nabla = null;
            this.velocity = null;
        }
        this.convectiveZones = List.copyOf(convectiveZones);
        this.base = base;
        this.superadiabaticLayer = superadiabaticLayer;
        this.innerRadius = innerRadius;
        this.evaluations = evaluations;
        this.warnings = List.copyOf(warnings);
    }

    /** @return the star */
    public EnvelopeStar star() {
        return star;
    }

    /** @return the mixing-length parameter used (dimensionless) */
    public double alpha() {
        return alpha;
    }

    /** @return T_eff (K) */
    public double effectiveTemperature() {
        return effectiveTemperature;
    }

    /** @return g = G M / R^2 at the photosphere (cm s^-2) */
    public double surfaceGravity() {
        return surfaceGravity;
    }

    /** @return P at optical depth 2/3 (dyn cm^-2) */
    public double photosphericPressure() {
        return photosphericPressure;
    }

    /** @return rho at optical depth 2/3 (g cm^-3) */
    public double photosphericDensity() {
        return photosphericDensity;
    }

    /** @return the envelope as a profile, centre side first, if it was sampled */
    public Optional<Profile> profile() {
        return Optional.ofNullable(profile);
    }

    /** @return nabla_rad per profile zone (a copy) */
    public double[] nablaRad() {
        return requireProfile(nablaRad).clone();
    }

    /** @return the actual nabla per profile zone (a copy) */
    public double[] nabla() {
        return requireProfile(nabla).clone();
    }

    /** @return the convective velocity per profile zone (cm s^-1, a copy) */
    public double[] velocity() {
        return requireProfile(velocity).clone();
    }

    private double[] requireProfile(double[] column) {
        if (column == null) {
            throw new IllegalStateException("this envelope was integrated without a profile");
        }
        return column;
    }

    /** @return the convection zones, outermost first */
    public List<ConvectiveZone> convectiveZones() {
        return convectiveZones;
    }

    /** @return the base of the outermost convection zone, when the integration passed it */
    public Optional<ConvectiveBase> surfaceConvectionBase() {
        return Optional.ofNullable(base);
    }

    /** @return the superadiabatic layer, when the surface convection zone has one */
    public Optional<SuperadiabaticLayer> superadiabaticLayer() {
        return Optional.ofNullable(superadiabaticLayer);
    }

    /** @return r of the innermost point integrated (cm) */
    public double innerRadius() {
        return innerRadius;
    }

    /** @return evaluations of the structure equations by the integrator (a measure of its work) */
    public int evaluations() {
        return evaluations;
    }

    /** @return warnings: strained approximations, model notes */
    public List<String> warnings() {
        return warnings;
    }

    @Override
    public String toString() {
        return "EnvelopeSolution[" + star + ", alpha=" + alpha + ", T_eff=" + effectiveTemperature + " K, base="
                + base + ", zones=" + convectiveZones.size() + "]";
    }
}
