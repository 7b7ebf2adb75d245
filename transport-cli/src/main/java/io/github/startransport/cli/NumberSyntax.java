package io.github.startransport.cli;

import com.fasterxml.jackson.core.io.NumberInput;

/**
 * The one place where the tool decides what a number in a profile cell is and turns it into a
 * double: an optional sign, digits with an optional decimal point (at least one digit), and an
 * optional exponent {@code e} or {@code E} with optional sign and at least one digit. Nothing
 * else: no {@code NaN}, {@code Infinity}, hexadecimal, or type suffixes.
 *
 * <p>Cells are checked and copied from the file's bytes into a caller-owned {@code char[]},
 * then converted by Jackson's {@link NumberInput#parseDouble(char[], int, int, boolean)} with its
 * fast, correctly rounded parser (the same double as {@link Double#parseDouble}; the tests
 * compare the two), so reading a cell creates no object.
 */
final class NumberSyntax {
    /** Longest cell (characters) taken as a number; longer cells are refused as not a number. */
    static final int MAX_LENGTH = 400;

    private NumberSyntax() {
    }

    /**
     * Checks the bytes of one cell and copies them as characters.
     *
     * @param b    the bytes
     * @param from first byte of the cell (already trimmed)
     * @param to   one past its last byte
     * @param out  receives the characters; at least {@link #MAX_LENGTH} long
     * @return the number of characters written, or -1 when the cell is not a number
     */
    static int copy(byte[] b, int from, int to, char[] out) {
        int len = to - from;
        if (len <= 0 || len > MAX_LENGTH) {
            return -1;
        }
        int i = from;
        int o = 0;
        byte c = b[i];
        if (c == '+' || c == '-') {
            out[o++] = (char) c;
            i++;
        }
        int digits = 0;
        while (i < to && b[i] >= '0' && b[i] <= '9') {
            out[o++] = (char) b[i++];
            digits++;
        }
        if (i < to && b[i] == '.') {
            out[o++] = '.';
            i++;
            while (i < to && b[i] >= '0' && b[i] <= '9') {
                out[o++] = (char) b[i++];
                digits++;
            }
        }
        if (digits == 0) {
            return -1;
        }
        if (i < to && (b[i] == 'e' || b[i] == 'E')) {
            out[o++] = 'e';
            i++;
            if (i < to && (b[i] == '+' || b[i] == '-')) {
                out[o++] = (char) b[i++];
            }
            int exp = 0;
            while (i < to && b[i] >= '0' && b[i] <= '9') {
                out[o++] = (char) b[i++];
                exp++;
            }
            if (exp == 0) {
                return -1;
            }
        }
        return i == to ? o : -1;
    }

    /**
     * @param chars a number checked by {@link #copy}
     * @param len   its length
     * @return the nearest double
     */
    static double parse(char[] chars, int len) {
        return NumberInput.parseDouble(chars, 0, len, true);
    }

    /**
     * @param text a cell's text, trimmed
     * @return the number, or {@code NaN} when the text is not a number of this syntax
     */
    static double parse(String text) {
        byte[] b = new byte[text.length()];
        for (int k = 0; k < b.length; k++) {
            char ch = text.charAt(k);
            b[k] = ch < 128 ? (byte) ch : (byte) '?';
        }
        char[] out = new char[Math.max(MAX_LENGTH, b.length)];
        int n = copy(b, 0, b.length, out);
        return n < 0 ? Double.NaN : parse(out, n);
    }
}
