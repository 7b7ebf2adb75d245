package io.github.startransport.cli;

import com.fasterxml.jackson.core.io.NumberInput;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.math.BigInteger;
import java.nio.ByteOrder;

/**
 * The one place where the tool decides what a number in a profile cell is and turns it into a
 * double: an optional sign, digits with an optional decimal point (at least one digit), and an
 * optional exponent with optional sign and at least one digit, introduced by {@code e} or
 * {@code E}, or by Fortran's double-precision {@code d} or {@code D} ({@code 1.5D+07} is
 * {@code 1.5e+07}; many stellar codes write it). Nothing else: no {@code NaN}, {@code Infinity},
 * hexadecimal, or type suffixes.
 *
 * <p>A number too large for a double parses to infinity and one too small to 0 (as
 * {@link Double#parseDouble} does); {@link #nonZeroDigits} tells a written zero from an
 * underflow, so that the reader can refuse the one and warn about the other.
 *
 * <p>{@link #parse(byte[], int, int)} reads a cell straight from the file's bytes, creating no
 * object: the digits go into a {@code long} significand w and a decimal exponent q, and
 * w 10^q is rounded to the nearest double by Clinger's fast path (w &lt; 2^53, |q| &lt;= 22: one
 * exact operation; Clinger 1990) or else by the Eisel-Lemire algorithm (a 128-bit product with a
 * truncated power of five; Lemire 2021, "Number parsing at a gigabyte per second", Software:
 * Practice and Experience 51, 1700; as in its reference implementation {@code fast_float}). Runs of eight
 * digits after the first significant one are read eight at a time from one {@code long} (section 5 there).
 * Cells with more than 19 significant digits go to Jackson's correctly rounded parser. The tests
 * compare every path with {@link Double#parseDouble}, bit for bit. Measured need: Jackson's
 * parser alone took 75-115 ns a number on the build machine, the JDK's 400-650 ns.
 */
final class NumberSyntax {
    /** Longest cell (characters) taken as a number; longer cells are refused as not a number. */
    static final int MAX_LENGTH = 400;

    /** Returned by {@link #parse(byte[], int, int)} for a cell that is not a number (a NaN no cell can give). */
    static final double NOT_A_NUMBER = Double.NaN;

    private static final int SMALLEST_Q = -342;
    private static final int LARGEST_Q = 308;
    /** Truncated 128-bit powers of five, high and low words, for q = -342..308 (fast_float's table). */
    private static final long[] POW5 = powersOfFive();
    private static final double[] POW10 = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13,
        1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};

    private NumberSyntax() {
    }

    /**
     * @param b    the bytes
     * @param from first byte of the cell (already trimmed)
     * @param to   one past its last byte
     * @return the nearest double, or {@link #NOT_A_NUMBER} (test with {@link Double#isNaN}) when
     *         the cell is not a number of this syntax
     */
    static double parse(byte[] b, int from, int to) {
        if (to - from <= 0 || to - from > MAX_LENGTH) {
            return NOT_A_NUMBER;
        }
        int i = from;
        boolean negative = false;
        if (b[i] == '+' || b[i] == '-') {
            negative = b[i] == '-';
            i++;
        }
        long w = 0;
        int significant = 0;
        int digits = 0;
        int fraction = 0;
        while (i < to && b[i] >= '0' && b[i] <= '9') {
            if (significant > 0 && to - i >= 8) {
                long chunk = (long) LONGS.get(b, i);
                if (eightDigits(chunk)) {
                    w = w * 100_000_000L + valueOfEight(chunk);
                    significant += 8;
                    digits += 8;
                    i += 8;
                    continue;
                }
            }
            int d = b[i++] - '0';
            if (significant > 0 || d != 0) {
                w = w * 10 + d;
                significant++;
            }
            digits++;
        }
        if (i < to && b[i] == '.') {
            i++;
            while (i < to && b[i] >= '0' && b[i] <= '9') {
                if (significant > 0 && to - i >= 8) {
                    long chunk = (long) LONGS.get(b, i);
                    if (eightDigits(chunk)) {
                        w = w * 100_000_000L + valueOfEight(chunk);
                        significant += 8;
                        digits += 8;
                        fraction += 8;
                        i += 8;
                        continue;
                    }
                }
                int d = b[i++] - '0';
                if (significant > 0 || d != 0) {
                    w = w * 10 + d;
                    significant++;
                }
                digits++;
                fraction++;
            }
        }
        if (digits == 0) {
            return NOT_A_NUMBER;
        }
        long exp = 0;
        if (i < to && (b[i] == 'e' || b[i] == 'E' || b[i] == 'd' || b[i] == 'D')) {
            i++;
            boolean expNegative = false;
            if (i < to && (b[i] == '+' || b[i] == '-')) {
                expNegative = b[i] == '-';
                i++;
            }
            int expDigits = 0;
            while (i < to && b[i] >= '0' && b[i] <= '9') {
                if (exp < 100_000_000L) {
                    exp = exp * 10 + (b[i] - '0');
                }
                i++;
                expDigits++;
            }
            if (expDigits == 0) {
                return NOT_A_NUMBER;
            }
            if (expNegative) {
                exp = -exp;
            }
        }
        if (i != to) {
            return NOT_A_NUMBER;
        }
        if (significant > 19) {
            return slow(b, from, to);
        }
        double v = toDouble(w, exp - fraction);
        return negative ? -v : v;
    }

    /** Eight bytes of a byte array as one little-endian long: the first byte in the lowest 8 bits. */
    private static final VarHandle LONGS = MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.LITTLE_ENDIAN);

    /**
     * Whether all eight bytes of {@code v} are ASCII digits: each byte's high half is 3 and adding 6 to
     * it does not carry into the high half (Lemire 2021, section 5; {@code fast_float}'s test).
     */
    private static boolean eightDigits(long v) {
        return ((v & 0xF0F0F0F0F0F0F0F0L) | (((v + 0x0606060606060606L) & 0xF0F0F0F0F0F0F0F0L) >>> 4))
                == 0x3333333333333333L;
    }

    /**
     * The value of eight ASCII digits, the first in the lowest byte: pairs, then fours, then all eight combined
     * by three multiplications instead of eight steps of w = 10 w + d (Lemire 2021, section 5).
     */
    private static int valueOfEight(long v) {
        long d = v - 0x3030303030303030L;
        d = d * 10 + (d >>> 8);                        // each even byte: two digits
        return (int) (((d & 0x000000FF000000FFL) * (100 + (1_000_000L << 32))
                + ((d >>> 16 & 0x000000FF000000FFL) * (1 + (10_000L << 32)))) >>> 32);
    }

    /** Cells of more than 19 significant digits: Jackson's parser on a copy (a Fortran D made an E). */
    private static double slow(byte[] b, int from, int to) {
        char[] c = new char[to - from];
        for (int k = 0; k < c.length; k++) {
            char ch = (char) b[from + k];
            c[k] = ch == 'd' || ch == 'D' ? 'e' : ch;
        }
        return NumberInput.parseDouble(c, 0, c.length, true);
    }

    /**
     * @param w a decimal significand, 0 &lt;= w &lt; 10^19, unsigned (19 digits can pass 2^63)
     * @param q a decimal exponent
     * @return w 10^q rounded to the nearest double, ties to even
     */
    static double toDouble(long w, long q) {
        if (w == 0 || q < SMALLEST_Q) {
            return 0.0;
        }
        if (q > LARGEST_Q) {
            return Double.POSITIVE_INFINITY;
        }
        int e = (int) q;
        if (Long.compareUnsigned(w, 1L << 53) <= 0 && e >= -22 && e <= 22) {
            return e >= 0 ? w * POW10[e] : w / POW10[-e];
        }
        int lz = Long.numberOfLeadingZeros(w);
        w <<= lz;
        int index = 2 * (e - SMALLEST_Q);
        long hi = unsignedMultiplyHigh(w, POW5[index]);
        long lo = w * POW5[index];
        // 55 bits of precision: 52 stored + the implicit one + two for rounding
        long precisionMask = 0xFFFFFFFFFFFFFFFFL >>> 55;
        if ((hi & precisionMask) == precisionMask) {
            long hi2 = unsignedMultiplyHigh(w, POW5[index + 1]);
            lo += hi2;
            if (Long.compareUnsigned(hi2, lo) > 0) {
                hi++;
            }
        }
        int upperbit = (int) (hi >>> 63);
        int shift = upperbit + 64 - 52 - 3;
        long mantissa = hi >>> shift;
        int power2 = (((152170 + 65536) * e) >> 16) + 63 + upperbit - lz + 1023;
        if (power2 <= 0) {
            if (-power2 + 1 >= 64) {
                return 0.0;
            }
            mantissa >>>= -power2 + 1;
            mantissa += mantissa & 1;
            mantissa >>>= 1;
            power2 = mantissa < 1L << 52 ? 0 : 1;
            return Double.longBitsToDouble(mantissa | (long) power2 << 52 & 0x7FF0000000000000L);
        }
        if ((lo == 0 || lo == 1) && e >= -4 && e <= 23 && (mantissa & 3) == 1 && mantissa << shift == hi) {
            mantissa &= ~1L; // exactly halfway: round to even, not up
        }
        mantissa += mantissa & 1;
        mantissa >>>= 1;
        if (mantissa >= 2L << 52) {
            mantissa = 1L << 52;
            power2++;
        }
        mantissa &= ~(1L << 52);
        if (power2 >= 0x7FF) {
            return Double.POSITIVE_INFINITY;
        }
        return Double.longBitsToDouble(mantissa | (long) power2 << 52);
    }

    private static long unsignedMultiplyHigh(long a, long b) {
        return Math.multiplyHigh(a, b) + ((a >> 63) & b) + ((b >> 63) & a);
    }

    /** fast_float's table: 5^q normalised to 128 bits and truncated; for q &lt; 0, 2^b / 5^-q + 1, truncated. */
    private static long[] powersOfFive() {
        long[] t = new long[2 * (LARGEST_Q - SMALLEST_Q + 1)];
        BigInteger two128 = BigInteger.ONE.shiftLeft(128);
        BigInteger two127 = BigInteger.ONE.shiftLeft(127);
        for (int q = SMALLEST_Q; q <= LARGEST_Q; q++) {
            BigInteger c;
            if (q < 0) {
                BigInteger power5 = BigInteger.valueOf(5).pow(-q);
                int z = 0;
                while (BigInteger.ONE.shiftLeft(z).compareTo(power5) < 0) {
                    z++;
                }
                int bits = q >= -27 ? z + 127 : 2 * z + 2 * 64;
                c = BigInteger.ONE.shiftLeft(bits).divide(power5).add(BigInteger.ONE);
                while (c.compareTo(two128) >= 0) {
                    c = c.shiftRight(1);
                }
            } else {
                c = BigInteger.valueOf(5).pow(q);
                while (c.compareTo(two127) < 0) {
                    c = c.shiftLeft(1);
                }
                while (c.compareTo(two128) >= 0) {
                    c = c.shiftRight(1);
                }
            }
            int k = 2 * (q - SMALLEST_Q);
            t[k] = c.shiftRight(64).longValue();
            t[k + 1] = c.longValue();
        }
        return t;
    }

    /**
     * Whether a cell that {@link #parse(byte[], int, int)} accepted has a non-zero digit in its
     * significand: then a result of 0 is an underflow (the number is below the smallest double,
     * 4.9e-324), not a written zero. Cost: one pass over the cell, taken only for zeros.
     *
     * @param b    the bytes
     * @param from first byte of the cell (already trimmed)
     * @param to   one past its last byte
     * @return whether a digit 1-9 comes before the exponent
     */
    static boolean nonZeroDigits(byte[] b, int from, int to) {
        for (int i = from; i < to; i++) {
            byte c = b[i];
            if (c == 'e' || c == 'E' || c == 'd' || c == 'D') {
                return false;
            }
            if (c >= '1' && c <= '9') {
                return true;
            }
        }
        return false;
    }

    /**
     * @param text a cell's text
     * @return {@link #nonZeroDigits(byte[], int, int)} of its trimmed text
     */
    static boolean nonZeroDigits(String text) {
        String t = text.trim();
        byte[] b = new byte[t.length()];
        for (int k = 0; k < b.length; k++) {
            char ch = t.charAt(k);
            b[k] = ch < 128 ? (byte) ch : (byte) '?';
        }
        return nonZeroDigits(b, 0, b.length);
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
        return parse(b, 0, b.length);
    }
}
