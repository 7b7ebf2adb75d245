package io.github.startransport.cli;

import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Writes {@code zones.csv}: one row per zone, centre to surface, every {@link DiagnosisColumn}
 * under its header name in the library's order (a column added to the enum appears without an
 * edit here), with the regime label after {@code nabla_ledoux}. Numbers are the shortest decimal
 * that reads back to the identical double, as {@code Double.toString} writes them since Java 19
 * ({@link ShortestDecimal}, straight into each block's bytes; the tests read every number back).
 * No cell needs quoting: headers and regime labels are plain words. Blocks of
 * zones are formatted on all cores and written in order.
 */
final class ZoneTable {
    /** Header of the regime column. */
    static final String REGIME = "regime";

    private ZoneTable() {
    }

    /** @return the header names in file order */
    static List<String> header() {
        List<String> names = new ArrayList<>();
        for (DiagnosisColumn c : DiagnosisColumn.values()) {
            names.add(c.header());
            if (c == DiagnosisColumn.NABLA_LEDOUX) {
                names.add(REGIME);
            }
        }
        return names;
    }

    /** Zones formatted per task. */
    private static final int BLOCK = 8192;

    /**
     * @param diagnosis the diagnosis
     * @param file      the file to create
     * @throws IOException when the file cannot be written
     */
    static void write(ProfileDiagnosis diagnosis, Path file) throws IOException {
        try (OutputStream os = Files.newOutputStream(file)) {
            write(diagnosis, os);
        }
    }

    /**
     * Formats blocks of {@value #BLOCK} zones on all cores (at most two blocks per core in flight,
     * so memory stays small) and writes them in order.
     *
     * @param diagnosis the diagnosis
     * @param out       where the bytes go (not closed)
     * @throws IOException when they cannot be written
     */
    static void write(ProfileDiagnosis diagnosis, OutputStream out) throws IOException {
        out.write((String.join(",", header()) + "\n").getBytes(StandardCharsets.US_ASCII));
        int n = diagnosis.size();
        int blocks = (n + BLOCK - 1) / BLOCK;
        int threads = Math.min(Runtime.getRuntime().availableProcessors(), blocks);
        if (threads <= 1) {
            for (int b = 0; b < blocks; b++) {
                Rows rows = block(diagnosis, b * BLOCK, Math.min(n, (b + 1) * BLOCK));
                out.write(rows.bytes(), 0, rows.length());
            }
            return;
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "startransport-zone-table");
            t.setDaemon(true);
            return t;
        });
        try {
            ArrayDeque<Future<Rows>> inFlight = new ArrayDeque<>();
            int next = 0;
            for (int b = 0; b < blocks; b++) {
                while (next < blocks && inFlight.size() < 2 * threads) {
                    int from = next * BLOCK;
                    int to = Math.min(n, from + BLOCK);
                    inFlight.add(pool.submit(() -> block(diagnosis, from, to)));
                    next++;
                }
                Rows rows = inFlight.poll().get();
                out.write(rows.bytes(), 0, rows.length());
            }
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException re) {
                throw re;
            }
            if (e.getCause() instanceof Error error) {
                throw error;
            }
            throw new IOException(e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while writing the zone table", e);
        } finally {
            pool.shutdownNow();
        }
    }

    /** A block's rows as ASCII bytes: {@code bytes[0, length)}. */
    private record Rows(byte[] bytes, int length) {
    }

    /** @return the rows of zones [from, to) */
    private static Rows block(ProfileDiagnosis diagnosis, int from, int to) {
        DiagnosisColumn[] columns = DiagnosisColumn.values();
        Regime[] regimes = Regime.values();
        byte[][] labels = new byte[regimes.length][];
        int longestLabel = 0;
        for (Regime r : regimes) {
            labels[r.ordinal()] = r.label().getBytes(StandardCharsets.US_ASCII);
            longestLabel = Math.max(longestLabel, labels[r.ordinal()].length);
        }
        // every number and its comma, the regime and its comma, the line end
        byte[] b = new byte[(to - from) * (columns.length * (ShortestDecimal.MAX_LENGTH + 1) + longestLabel + 2)];
        int i = 0;
        for (int k = from; k < to; k++) {
            for (int j = 0; j < columns.length; j++) {
                if (j > 0) {
                    b[i++] = ',';
                }
                i = ShortestDecimal.write(diagnosis.value(columns[j], k), b, i);
                if (columns[j] == DiagnosisColumn.NABLA_LEDOUX) {
                    b[i++] = ',';
                    byte[] label = labels[diagnosis.regime(k).ordinal()];
                    System.arraycopy(label, 0, b, i, label.length);
                    i += label.length;
                }
            }
            b[i++] = '\n';
        }
        return new Rows(b, i);
    }
}
