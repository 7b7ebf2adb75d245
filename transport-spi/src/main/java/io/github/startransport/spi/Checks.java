package io.github.startransport.spi;

/**
 * Input guards shared by every provider, so that refusals read the same everywhere.
 *
 * <p>Each method returns normally or throws {@link InvalidInputException}; none allocates on
 * the normal path.
 */
public final class Checks {
    private Checks() {
    }

    /**
     * Requires a finite value strictly greater than zero.
     *
     * @param field name of the input
     * @param value value to check
     * @param unit  unit of the input
     * @param zone  zone index or {@link InvalidInputException#NO_ZONE}
     * @return {@code value}
     */
    public static double positive(String field, double value, String unit, int zone) {
        if (!(value > 0.0) || value == Double.POSITIVE_INFINITY) {
            throw new InvalidInputException(field, value, unit, zone, "finite and > 0");
        }
        return value;
    }

    /**
     * Requires a finite value (any sign).
     *
     * @param field name of the input
     * @param value value to check
     * @param unit  unit of the input
     * @param zone  zone index or {@link InvalidInputException#NO_ZONE}
     * @return {@code value}
     */
    public static double finite(String field, double value, String unit, int zone) {
        if (!Double.isFinite(value)) {
            throw new InvalidInputException(field, value, unit, zone, "finite");
        }
        return value;
    }

    /**
     * Requires a finite value inside the open interval (lo, hi).
     *
     * @param field name of the input
     * @param value value to check
     * @param lo    exclusive lower bound
     * @param hi    exclusive upper bound
     * @param unit  unit of the input
     * @param zone  zone index or {@link InvalidInputException#NO_ZONE}
     * @return {@code value}
     */
    public static double openInterval(String field, double value, double lo, double hi, String unit, int zone) {
        if (!(value > lo && value < hi)) {
            throw new InvalidInputException(field, value, unit, zone, "inside (" + lo + ", " + hi + ")");
        }
        return value;
    }

    /**
     * Requires a finite value inside the closed interval [lo, hi].
     *
     * @param field name of the input
     * @param value value to check
     * @param lo    inclusive lower bound
     * @param hi    inclusive upper bound
     * @param unit  unit of the input
     * @param zone  zone index or {@link InvalidInputException#NO_ZONE}
     * @return {@code value}
     */
    public static double closedInterval(String field, double value, double lo, double hi, String unit, int zone) {
        if (!(value >= lo && value <= hi)) {
            throw new InvalidInputException(field, value, unit, zone, "inside [" + lo + ", " + hi + "]");
        }
        return value;
    }
}
