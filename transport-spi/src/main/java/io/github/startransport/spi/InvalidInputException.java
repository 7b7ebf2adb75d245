package io.github.startransport.spi;

/**
 * A non-finite or unphysical input refused before any arithmetic is done with it.
 *
 * <p>The message names the field, the value, its unit, the zone index when the call knows it
 * (batch calls, or a {@link ZoneState#zone} set by the host) and what a valid value looks like.
 * Nothing is ever clamped silently.
 */
public final class InvalidInputException extends TransportException {
    private static final long serialVersionUID = 1L;

    /** Zone index used when the call does not know which zone it is looking at. */
    public static final int NO_ZONE = -1;

    /** Name of the refused input field, as documented on the input type. */
    private final String field;
    /** The refused value, in {@link #unit}. */
    private final double value;
    /** Unit of the field ({@code "1"} if dimensionless). */
    private final String unit;
    /** Zone index, or {@link #NO_ZONE}. */
    private final int zone;
    /** The condition a valid value satisfies. */
    private final String requirement;

    /**
     * @param field       name of the offending input, as documented on the input type
     * @param value       the value that was refused
     * @param unit        unit of the field, e.g. {@code "K"}; {@code "1"} for dimensionless
     * @param zone        zone index, or {@link #NO_ZONE}
     * @param requirement what a valid value satisfies, e.g. {@code "finite and > 0"}
     */
    public InvalidInputException(String field, double value, String unit, int zone, String requirement) {
        super(format(field, value, unit, zone, requirement));
        this.field = field;
        this.value = value;
        this.unit = unit;
        this.zone = zone;
        this.requirement = requirement;
    }

    private static String format(String field, double value, String unit, int zone, String requirement) {
        StringBuilder b = new StringBuilder("invalid input ").append(field).append(" = ").append(value);
        if (unit != null && !unit.isEmpty() && !"1".equals(unit)) {
            b.append(' ').append(unit);
        }
        if (zone != NO_ZONE) {
            b.append(" in zone ").append(zone);
        }
        b.append(": must be ").append(requirement);
        return b.toString();
    }

    /** @return name of the refused input field */
    public String field() {
        return field;
    }

    /** @return the refused value */
    public double value() {
        return value;
    }

    /** @return unit of the field ({@code "1"} if dimensionless) */
    public String unit() {
        return unit;
    }

    /** @return zone index, or {@link #NO_ZONE} when the call did not know it */
    public int zone() {
        return zone;
    }

    /** @return the condition a valid value satisfies */
    public String requirement() {
        return requirement;
    }
}
