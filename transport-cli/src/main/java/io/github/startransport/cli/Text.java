package io.github.startransport.cli;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;

/** Text for people: names shortened, lists capped, numbers rounded. */
final class Text {
    /** Longest name or cell echoed whole in a message (characters). */
    static final int LONGEST = 60;
    /** Most names a list in a message shows. */
    static final int MOST_NAMES = 16;

    private Text() {
    }

    /**
     * @param s a name or cell from a file, any length
     * @return it whole when short, else its start, "..." and its length: a 10 MB header name stays one line
     */
    static String shorten(String s) {
        if (s.length() <= LONGEST) {
            return s;
        }
        return s.substring(0, LONGEST - 20) + "... (" + s.length() + " characters)";
    }

    /**
     * @param names names from a file
     * @return {@code [a, b, ...]}, each shortened, at most {@link #MOST_NAMES} of them and a count of the rest
     */
    static String list(List<String> names) {
        StringBuilder b = new StringBuilder("[");
        for (int i = 0; i < names.size() && i < MOST_NAMES; i++) {
            b.append(i == 0 ? "" : ", ").append(shorten(names.get(i)));
        }
        if (names.size() > MOST_NAMES) {
            b.append(", ... and ").append(names.size() - MOST_NAMES).append(" more");
        }
        return b.append(']').toString();
    }

    /**
     * A number as a person reads it: a whole number below 10^10 without a decimal point ({@code 4},
     * not {@code 4.0}); otherwise rounded to 10 significant digits without trailing zeros
     * ({@code 0.01}, not {@code 0.010000000000000009}), in exponent form outside 1e-4..1e10.
     *
     * @param v a number
     * @return its text
     */
    static String number(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e10) {
            return Long.toString((long) v);
        }
        BigDecimal d = new BigDecimal(v).round(new MathContext(10)).stripTrailingZeros();
        double a = Math.abs(v);
        if (a >= 1e-4 && a < 1e10) {
            return d.toPlainString();
        }
        int exponent = d.precision() - d.scale() - 1;
        BigDecimal mantissa = d.movePointLeft(exponent).stripTrailingZeros();
        return mantissa.toPlainString() + "e" + exponent;
    }

    /**
     * @param v a number
     * @return it rounded to 4 significant digits, in exponent form ({@code 1.5e9}) beyond 1e-3..1e6
     */
    static String compact(double v) {
        double a = Math.abs(v);
        if (!Double.isFinite(v) || v == 0 || (a >= 1e-3 && a < 1e6)) {
            return Double.isFinite(v) ? number(new BigDecimal(v).round(new MathContext(4)).doubleValue())
                    : Double.toString(v);
        }
        BigDecimal d = new BigDecimal(v).round(new MathContext(4)).stripTrailingZeros();
        int exponent = d.precision() - d.scale() - 1;
        return d.movePointLeft(exponent).stripTrailingZeros().toPlainString() + "e" + exponent;
    }
}
