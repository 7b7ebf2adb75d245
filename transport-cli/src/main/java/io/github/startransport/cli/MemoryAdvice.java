package io.github.startransport.cli;

import java.nio.file.Path;
import java.util.Locale;

/**
 * What the tool knows about the size of its work, so that running out of memory ends in one
 * clear line instead of a stack trace: the file being read, how many zones so far, and an
 * estimate of the total from the bytes read.
 */
final class MemoryAdvice {
    /**
     * Memory a profile needs per zone (bytes), reading and diagnosing, as measured by the
     * benchmark module's {@code ZoneMemory} (see the README's performance section), rounded up.
     */
    static final long BYTES_PER_ZONE = 250;
    /** Memory the tool needs besides the zones (bytes): classes, plots, the opacity table. */
    static final long BASE_BYTES = 256L << 20;

    private static volatile Path file;
    private static volatile long fileBytes;
    private static volatile long zones;
    private static volatile long bytesRead;

    private MemoryAdvice() {
    }

    /**
     * @param f    the profile file being read
     * @param size its size (bytes)
     */
    static void reading(Path f, long size) {
        file = f;
        fileBytes = size;
        zones = 0;
        bytesRead = 0;
    }

    /**
     * @param rows zones read so far
     * @param read bytes read so far
     */
    static void progress(long rows, long read) {
        zones = rows;
        bytesRead = read;
    }

    /**
     * @param maxHeap the JVM's maximum heap (bytes), {@link Runtime#maxMemory()}
     * @return one line: what ran out, how big the work is, which -Xmx to try
     */
    static String message(long maxHeap) {
        Path f = file;
        long z = zones;
        long read = bytesRead;
        long estimate = f == null || read <= 0 ? z : Math.max(z, (long) ((double) z * fileBytes / read));
        long need = BASE_BYTES + 2 * BYTES_PER_ZONE * Math.max(estimate, 1);
        long gib = Math.max(1, (need + (1L << 30) - 1) >> 30);
        String what = f == null ? "" : String.format(Locale.ROOT, " after reading %,d zones of %s (about %,d in all)",
                z, f, estimate);
        return String.format(Locale.ROOT, "out of memory%s with a maximum heap of %s; the tool needs about %d bytes"
                        + " per zone: run it with more heap, e.g. java -Xmx%dg -jar startransport.jar ...", what,
                size(maxHeap), BYTES_PER_ZONE, gib);
    }

    private static String size(long bytes) {
        return bytes >= 1L << 30 ? String.format(Locale.ROOT, "%.1f GiB", bytes / (double) (1L << 30))
                : String.format(Locale.ROOT, "%d MiB", bytes >> 20);
    }
}
