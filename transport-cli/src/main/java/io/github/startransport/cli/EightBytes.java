package io.github.startransport.cli;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;

/**
 * Eight bytes of a file at a time, as one {@code long}: the reader finds line ends and cell
 * separators a word at a time instead of a byte at a time (the zero-byte test of H. S. Warren,
 * Hacker's Delight, 2nd ed. 2013, section 6-1: (x - 0x01..01) &amp; ~x &amp; 0x80..80 marks the
 * bytes of x that are 0; the lowest mark is always right, a higher one may be a false alarm,
 * so only the lowest is used).
 */
final class EightBytes {
    private EightBytes() {
    }

    private static final VarHandle LONGS = MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.LITTLE_ENDIAN);
    private static final long ONES = 0x0101010101010101L;
    private static final long HIGHS = 0x8080808080808080L;

    /** @return bytes {@code b[i, i + 8)} as a long, {@code b[i]} in the lowest 8 bits */
    static long at(byte[] b, int i) {
        return (long) LONGS.get(b, i);
    }

    /** @return the byte c repeated in all eight bytes of a long */
    static long repeated(byte c) {
        return (c & 0xFFL) * ONES;
    }

    /** @return the high bit of each byte of {@code word} that equals the byte repeated in {@code pattern}: the lowest one is the first match */
    static long matches(long word, long pattern) {
        long x = word ^ pattern;
        return (x - ONES) & ~x & HIGHS;
    }

    /** @return the index (0-7) of the byte marked by the lowest set bit of a non-zero {@link #matches} result */
    static int first(long marks) {
        return Long.numberOfTrailingZeros(marks) >>> 3;
    }
}
