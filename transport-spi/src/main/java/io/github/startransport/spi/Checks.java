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
            throw new InvalidInputException(field, value, unit, zone, "inside (" + text(lo) + ", " + rounded(hi) + ")");
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
            throw new InvalidInputException(field, value, unit, zone, "inside [" + text(lo) + ", " + rounded(hi) + "]");
        }
        return value;
    }

    /**
     * A value as a message shows it: a whole number below 10^10 without a decimal point ({@code 4},
     * not {@code 4.0}), any other value as {@link Double#toString(double)} (every digit it needs).
     */
    static String text(double value) {
        return value == Math.rint(value) && Math.abs(value) < 1e10 ? Long.toString((long) value)
                : Double.toString(value);
    }

    /**
     * A computed bound as a message shows it: rounded to 10 significant digits, so that
     * {@code 1 - 0.99} reads {@code 0.01}, not {@code 0.010000000000000009}.
     */
    static String rounded(double value) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        return new java.math.BigDecimal(value).round(new java.math.MathContext(10)).stripTrailingZeros()
                .toString().replace('E', 'e').replace("e+", "e");
    }
}
