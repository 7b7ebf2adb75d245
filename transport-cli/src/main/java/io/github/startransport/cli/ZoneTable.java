package io.github.startransport.cli;

import com.fasterxml.jackson.core.io.NumberOutput;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.ProfileDiagnosis;

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
 * that reads back to the identical double (Jackson's Schubfach writer, the algorithm of
 * {@code Double.toString} since Java 19, about 3x faster than Java 17's; the tests read every
 * number back). No cell needs quoting: headers and regime labels are plain words. Blocks of
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
                out.write(block(diagnosis, b * BLOCK, Math.min(n, (b + 1) * BLOCK)));
            }
            return;
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "startransport-zone-table");
            t.setDaemon(true);
            return t;
        });
        try {
            ArrayDeque<Future<byte[]>> inFlight = new ArrayDeque<>();
            int next = 0;
            for (int b = 0; b < blocks; b++) {
                while (next < blocks && inFlight.size() < 2 * threads) {
                    int from = next * BLOCK;
                    int to = Math.min(n, from + BLOCK);
                    inFlight.add(pool.submit(() -> block(diagnosis, from, to)));
                    next++;
                }
                out.write(inFlight.poll().get());
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

    /** @return the rows of zones [from, to) as ASCII bytes */
    private static byte[] block(ProfileDiagnosis diagnosis, int from, int to) {
        DiagnosisColumn[] columns = DiagnosisColumn.values();
        StringBuilder b = new StringBuilder((to - from) * columns.length * 20);
        for (int k = from; k < to; k++) {
            for (int j = 0; j < columns.length; j++) {
                if (j > 0) {
                    b.append(',');
                }
                b.append(NumberOutput.toString(diagnosis.value(columns[j], k), true));
                if (columns[j] == DiagnosisColumn.NABLA_LEDOUX) {
                    b.append(',').append(diagnosis.regime(k).label());
                }
            }
            b.append('\n');
        }
        return b.toString().getBytes(StandardCharsets.US_ASCII);
    }
}
