package io.github.startransport.spi;

/**
 * One zone's local state: the caller-owned, mutable input of every hot-path call.
 *
 * <p>A host allocates one instance per thread, overwrites the fields for each zone and
 * passes it in; the library reads the fields and never keeps a reference. Units are cgs,
 * temperatures in K, no logarithms. Which fields a model reads is stated on the model;
 * each read field is validated and refused with {@link InvalidInputException} when it is
 * non-finite or unphysical.
 *
 * <p>Not thread-safe by design: one instance per thread.
 */
public final class ZoneState {
    /** Creates an empty zone (all fields 0, phi = 1, zone unknown); fill it before use. */
    public ZoneState() {
    }

    /** Zone index in the host's grid, used only in error messages; -1 when unknown. */
    public int zone = InvalidInputException.NO_ZONE;
    /** Radius r (cm), &gt; 0. */
    public double radius;
    /** Mass inside r, m (g), &gt; 0. */
    public double mass;
    /** Temperature T (K), &gt; 0. */
    public double temperature;
    /** Density rho (g cm^-3), &gt; 0. */
    public double density;
    /** Total (gas plus radiation) pressure P (dyn cm^-2), &gt; 0. */
    public double pressure;
    /** Luminosity through the sphere of radius r, L (erg s^-1); any finite sign (negative = inward flow). */
    public double luminosity;
    /** Rosseland mean opacity kappa (cm^2 g^-1), &gt; 0. */
    public double opacity;
    /** Specific heat at constant pressure c_P (erg g^-1 K^-1), &gt; 0. */
    public double cp;
    /** Adiabatic temperature gradient nabla_ad = (d ln T / d ln P)_s (dimensionless), in (0, 1). */
    public double nablaAd;
    /** delta = -(d ln rho / d ln T)_{P, mu} (dimensionless), &gt; 0; 1 for an ideal gas. */
    public double delta;
    /** Composition gradient nabla_mu = d ln mu / d ln P (dimensionless), any finite sign. */
    public double nablaMu;
    /** phi = (d ln rho / d ln mu)_{P, T} (dimensionless), &gt; 0; 1 for an ideal gas. */
    public double phi = 1.0;
    /** Hydrogen mass fraction X (dimensionless), in [0, 1]. */
    public double hydrogen;
    /** Metal mass fraction Z (dimensionless), in [0, 1], X + Z &lt;= 1. */
    public double metals;
    /**
     * Distance from the zone to the nearest edge of its convective region (cm), &gt; 0: read only by
     * convection models whose length scale is that distance ({@link ConvectionModel#needsEdgeDistance()});
     * 0 (unset) otherwise. Not a {@link ZoneInput}: a model with length scale alpha z reports
     * d/d alpha, from which d/dz = (alpha / z) d/d alpha.
     */
    public double edgeDistance;

    /**
     * Copies every field of {@code other} into this instance (no allocation).
     *
     * @param other the state to copy
     * @return this instance
     */
    public ZoneState set(ZoneState other) {
        zone = other.zone;
        radius = other.radius;
        mass = other.mass;
        temperature = other.temperature;
        density = other.density;
        pressure = other.pressure;
        luminosity = other.luminosity;
        opacity = other.opacity;
        cp = other.cp;
        nablaAd = other.nablaAd;
        delta = other.delta;
        nablaMu = other.nablaMu;
        phi = other.phi;
        hydrogen = other.hydrogen;
        metals = other.metals;
        edgeDistance = other.edgeDistance;
        return this;
    }

    /**
     * Reads an input by its {@link ZoneInput} index ({@link ZoneInput#ALPHA} is not a zone field).
     *
     * @param input a {@link ZoneInput} constant other than {@code ALPHA}
     * @return the field's value
     */
    public double get(int input) {
        switch (input) {
            case ZoneInput.T: return temperature;
            case ZoneInput.RHO: return density;
            case ZoneInput.P: return pressure;
            case ZoneInput.L: return luminosity;
            case ZoneInput.M: return mass;
            case ZoneInput.R: return radius;
            case ZoneInput.KAPPA: return opacity;
            case ZoneInput.CP: return cp;
            case ZoneInput.NABLA_AD: return nablaAd;
            case ZoneInput.DELTA: return delta;
            case ZoneInput.NABLA_MU: return nablaMu;
            case ZoneInput.PHI: return phi;
            default: throw new IllegalArgumentException("not a zone field: " + input);
        }
    }

    /**
     * Writes an input by its {@link ZoneInput} index ({@link ZoneInput#ALPHA} is not a zone field).
     *
     * @param input a {@link ZoneInput} constant other than {@code ALPHA}
     * @param value the new value
     */
    public void put(int input, double value) {
        switch (input) {
            case ZoneInput.T: temperature = value; break;
            case ZoneInput.RHO: density = value; break;
            case ZoneInput.P: pressure = value; break;
            case ZoneInput.L: luminosity = value; break;
            case ZoneInput.M: mass = value; break;
            case ZoneInput.R: radius = value; break;
            case ZoneInput.KAPPA: opacity = value; break;
            case ZoneInput.CP: cp = value; break;
            case ZoneInput.NABLA_AD: nablaAd = value; break;
            case ZoneInput.DELTA: delta = value; break;
            case ZoneInput.NABLA_MU: nablaMu = value; break;
            case ZoneInput.PHI: phi = value; break;
            default: throw new IllegalArgumentException("not a zone field: " + input);
        }
    }

    @Override
    public String toString() {
        return "ZoneState[zone=" + zone + ", r=" + radius + " cm, m=" + mass + " g, T=" + temperature
                + " K, rho=" + density + " g/cm^3, P=" + pressure + " dyn/cm^2, L=" + luminosity
                + " erg/s, kappa=" + opacity + " cm^2/g, c_P=" + cp + " erg/(g K), nabla_ad=" + nablaAd
                + ", delta=" + delta + ", nabla_mu=" + nablaMu + ", phi=" + phi + ", X=" + hydrogen
                + ", Z=" + metals + ", edge distance=" + edgeDistance + " cm]";
    }
}
