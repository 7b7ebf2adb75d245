package io.github.startransport.cli;

import java.math.BigInteger;

/**
 * Writes a double as ASCII bytes straight into a caller's buffer: the shortest decimal that reads
 * back to the identical double (of several, the one nearest to it), in the layout of
 * {@link Double#toString} since Java 19 ({@code 0.001}, {@code 123.5}, {@code 1.0E7},
 * {@code 2.5E-4}, {@code -0.0}, {@code NaN}, {@code Infinity}). The digits come from the Schubfach
 * algorithm (R. Giulietti, "The Schubfach way to render doubles", 2020; 2021 revision): the
 * interval of reals that round to the double is scaled by 10^-k with one 128-bit multiplication by
 * a 126-bit approximation g of 10^-k, rounded to odd, and the shortest decimal inside it is read off.
 * The table of g is computed at class loading with {@link BigInteger}.
 *
 * <p>Measured need: {@code zones.csv} of a million zones holds 30 million numbers; formatting them
 * through a {@link String} per number (Jackson's writer of the same algorithm) cost about 120 ns a
 * number on the build machine, most of it the objects. {@code ShortestDecimalTest} compares every
 * result with Jackson's {@code NumberOutput.toString(double, true)} character for character and reads
 * it back with {@link Double#parseDouble}.
 */
final class ShortestDecimal {
    /** Longest result: {@code -2.2250738585072014E-308}. */
    static final int MAX_LENGTH = 24;

    private static final int Q_MIN = -1074;
    private static final long C_MIN = 1L << 52;
    private static final long T_MASK = C_MIN - 1;
    private static final int BQ_MASK = 0x7FF;
    /** Subnormal significands below this get one more digit of scale (10 t with k one lower). */
    private static final long C_TINY = 3;
    private static final int K_MIN = -324;
    private static final int K_MAX = 292;
    /** Digits of the scaled significand. */
    private static final int H = 17;
    private static final long MASK_63 = (1L << 63) - 1;
    /** ceil(2^84 / 10^8): multiplyHigh(f, this) >>> 20 is f / 10^8 for f &lt; 10^17. */
    private static final long INV_1E8 = 193_428_131_138_340_668L;
    private static final long[] POW10 = new long[H + 1];
    /** "00", "01", ..., "99" as ASCII. */
    private static final byte[] PAIRS = new byte[200];
    /** g of 10^-k, k = K_MIN..K_MAX, at 2 (k - K_MIN): high 63 bits and low 63 bits. */
    private static final long[] G = new long[2 * (K_MAX - K_MIN + 1)];

    static {
        for (int p = 0; p < 100; p++) {
            PAIRS[2 * p] = (byte) ('0' + p / 10);
            PAIRS[2 * p + 1] = (byte) ('0' + p % 10);
        }
        POW10[0] = 1;
        for (int i = 1; i <= H; i++) {
            POW10[i] = 10 * POW10[i - 1];
        }
        BigInteger two125 = BigInteger.ONE.shiftLeft(125);
        BigInteger two126 = BigInteger.ONE.shiftLeft(126);
        BigInteger mask63 = BigInteger.ONE.shiftLeft(63).subtract(BigInteger.ONE);
        for (int k = K_MIN; k <= K_MAX; k++) {
            // 10^-k = beta 2^r with 2^125 <= beta < 2^126; g = floor(beta) + 1
            int e = -k;
            BigInteger num = e >= 0 ? BigInteger.TEN.pow(e) : BigInteger.ONE;
            BigInteger den = e >= 0 ? BigInteger.ONE : BigInteger.TEN.pow(-e);
            int shift = 125 - flog2pow10(e);
            BigInteger beta = shift >= 0 ? num.shiftLeft(shift).divide(den) : num.divide(den.shiftLeft(-shift));
            if (beta.compareTo(two125) < 0 || beta.compareTo(two126) >= 0) {
                throw new AssertionError("g out of range at k = " + k);
            }
            BigInteger g = beta.add(BigInteger.ONE);
            G[2 * (k - K_MIN)] = g.shiftRight(63).longValue();
            G[2 * (k - K_MIN) + 1] = g.and(mask63).longValue();
        }
    }

    private ShortestDecimal() {
    }

    /** floor(q log10 2), for |q| &lt;= 5456721 (Giulietti 2020, section 9). */
    static int flog10pow2(int q) {
        return (int) (q * 661_971_961_083L >> 41);
    }

    /** floor(log10(3/4 2^q)). */
    static int flog10threeQuartersPow2(int q) {
        return (int) (q * 661_971_961_083L + -274_743_187_321L >> 41);
    }

    /** floor(e log2 10). */
    static int flog2pow10(int e) {
        return (int) (e * 913_124_641_741L >> 38);
    }

    /**
     * @param v   the value
     * @param out the buffer, with at least {@value #MAX_LENGTH} bytes free from {@code at}
     * @param at  where to start writing
     * @return one past the last byte written
     */
    static int write(double v, byte[] out, int at) {
        long bits = Double.doubleToRawLongBits(v);
        long t = bits & T_MASK;
        int bq = (int) (bits >>> 52) & BQ_MASK;
        if (bq == BQ_MASK) {
            return t != 0 ? ascii("NaN", out, at) : ascii(bits > 0 ? "Infinity" : "-Infinity", out, at);
        }
        int i = at;
        if (bits < 0) {
            out[i++] = '-';
        }
        if (bq != 0) {
            int mq = -Q_MIN + 1 - bq;                 // -q, v = c 2^q
            long c = C_MIN | t;
            if (0 < mq && mq < 53) {
                long f = c >> mq;
                if (f << mq == c) {                   // an integer below 2^53
                    return digits(f, 0, out, i);
                }
            }
            return decimal(-mq, c, 0, out, i);
        }
        if (t != 0) {
            return t < C_TINY ? decimal(Q_MIN, 10 * t, -1, out, i) : decimal(Q_MIN, t, 0, out, i);
        }
        out[i++] = '0';
        out[i++] = '.';
        out[i++] = '0';
        return i;
    }

    private static int ascii(String s, byte[] out, int at) {
        for (int k = 0; k < s.length(); k++) {
            out[at + k] = (byte) s.charAt(k);
        }
        return at + s.length();
    }

    /** The shortest decimal of c 2^q (Giulietti 2020, figure 4), times 10^dk. */
    private static int decimal(int q, long c, int dk, byte[] out, int at) {
        int odd = (int) c & 1;
        long cb = c << 2;
        long cbr = cb + 2;
        long cbl;
        int k;
        if (c != C_MIN || q == Q_MIN) {
            cbl = cb - 2;
            k = flog10pow2(q);
        } else {
            cbl = cb - 1;                             // the lower neighbour is half as far
            k = flog10threeQuartersPow2(q);
        }
        int h = q + flog2pow10(-k) + 2;
        int index = 2 * (k - K_MIN);
        long g1 = G[index];
        long g0 = G[index + 1];
        long vb = roundToOdd(g1, g0, cb << h);
        long vbl = roundToOdd(g1, g0, cbl << h);
        long vbr = roundToOdd(g1, g0, cbr << h);
        long s = vb >> 2;
        if (s >= 100) {
            // one digit fewer, if a multiple of 10 lies inside the interval
            long sp10 = 10 * Math.multiplyHigh(s, 115_292_150_460_684_698L << 4);
            long tp10 = sp10 + 10;
            boolean upin = vbl + odd <= sp10 << 2;
            boolean wpin = (tp10 << 2) + odd <= vbr;
            if (upin != wpin) {
                return digits(upin ? sp10 : tp10, k, out, at);
            }
        }
        long tt = s + 1;
        boolean uin = vbl + odd <= s << 2;
        boolean win = (tt << 2) + odd <= vbr;
        if (uin != win) {
            return digits(uin ? s : tt, k + dk, out, at);
        }
        long cmp = vb - (s + tt << 1);
        return digits(cmp < 0 || cmp == 0 && (s & 1) == 0 ? s : tt, k + dk, out, at);
    }

    /** floor(g cp / 2^127), its last bit set when the rest is not 0. */
    private static long roundToOdd(long g1, long g0, long cp) {
        long x1 = Math.multiplyHigh(g0, cp);
        long y0 = g1 * cp;
        long y1 = Math.multiplyHigh(g1, cp);
        long z = (y0 >>> 1) + x1;
        long vbp = y1 + (z >>> 63);
        return vbp | (z & MASK_63) + MASK_63 >>> 63;
    }

    /** Writes f 10^e (f &gt; 0, at most 17 digits) in the layout of {@link Double#toString}. */
    private static int digits(long f, int e, byte[] out, int at) {
        int len = flog10pow2(Long.SIZE - Long.numberOfLeadingZeros(f));
        if (f >= POW10[len]) {
            len++;
        }
        f *= POW10[H - len];                           // 10^16 <= f < 10^17, f 10^(e - 17) = 0.f 10^(e + len)
        e += len;
        long hm = Math.multiplyHigh(f, INV_1E8) >>> 20;
        int l = (int) (f - 100_000_000L * hm);        // the last 8 digits
        int hd = (int) (hm * 1_441_151_881L >>> 57);  // the first digit
        int m = (int) (hm - 100_000_000L * hd);       // the 8 after it
        int i = at;
        if (0 < e && e <= 7) {
            // plain, without leading zeros: e digits before the point; the first nine digits written, those
            // after the first e moved one place on for the point
            out[i] = (byte) ('0' + hd);
            eightDigits(m, out, i + 1);
            System.arraycopy(out, i + e, out, i + e + 1, 9 - e);
            out[i + e] = '.';
            return lowDigits(l, out, i + 10);
        }
        if (-3 < e && e <= 0) {
            // plain, with leading zeros
            out[i++] = '0';
            out[i++] = '.';
            for (; e < 0; e++) {
                out[i++] = '0';
            }
            out[i++] = (byte) ('0' + hd);
            i = eightDigits(m, out, i);
            return lowDigits(l, out, i);
        }
        out[i++] = (byte) ('0' + hd);
        out[i++] = '.';
        i = eightDigits(m, out, i);
        i = lowDigits(l, out, i);
        out[i++] = 'E';
        int x = e - 1;
        if (x < 0) {
            out[i++] = '-';
            x = -x;
        }
        if (x >= 100) {
            int d = x * 1_311 >>> 17;                  // x / 100
            out[i++] = (byte) ('0' + d);
            x -= 100 * d;
            out[i++] = PAIRS[2 * x];
            out[i++] = PAIRS[2 * x + 1];
        } else if (x >= 10) {
            out[i++] = PAIRS[2 * x];
            out[i++] = PAIRS[2 * x + 1];
        } else {
            out[i++] = (byte) ('0' + x);
        }
        return i;
    }

    /** The last 8 digits when not all 0, then trailing zeros removed, keeping one digit after the point. */
    private static int lowDigits(int l, byte[] out, int at) {
        int i = at;
        if (l != 0) {
            i = eightDigits(l, out, i);
        }
        while (out[i - 1] == '0') {
            i--;
        }
        if (out[i - 1] == '.') {
            i++;
        }
        return i;
    }

    /** The eight digits of m &lt; 10^8, leading zeros included, two at a time from {@link #PAIRS}. */
    private static int eightDigits(int m, byte[] out, int at) {
        int hi = (int) (m * 109_951_163L >>> 40);      // m / 10^4: ceil(2^40 / 10^4), exact for m < 10^8
        int lo = m - 10_000 * hi;
        fourDigits(hi, out, at);
        fourDigits(lo, out, at + 4);
        return at + 8;
    }

    private static void fourDigits(int x, byte[] out, int at) {
        int hi = x * 5_243 >>> 19;                     // x / 100: ceil(2^19 / 100), exact for x < 10^4
        int lo = x - 100 * hi;
        out[at] = PAIRS[2 * hi];
        out[at + 1] = PAIRS[2 * hi + 1];
        out[at + 2] = PAIRS[2 * lo];
        out[at + 3] = PAIRS[2 * lo + 1];
    }

}
