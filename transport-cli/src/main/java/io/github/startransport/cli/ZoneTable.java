package io.github.startransport.cli;

import com.fasterxml.jackson.core.io.NumberOutput;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.ProfileDiagnosis;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes {@code zones.csv}: one row per zone, centre to surface, every {@link DiagnosisColumn}
 * under its header name in the library's order (a column added to the enum appears without an
 * edit here), with the regime label after {@code nabla_ledoux}. Numbers are the shortest decimal
 * that reads back to the identical double (Jackson's Schubfach writer, the algorithm of
 * {@code Double.toString} since Java 19, about 3x faster than Java 17's; the tests read every
 * number back). No cell needs quoting: headers and regime labels are plain words.
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

    /**
     * @param diagnosis the diagnosis
     * @param file      the file to create
     * @throws IOException when the file cannot be written
     */
    static void write(ProfileDiagnosis diagnosis, Path file) throws IOException {
        try (OutputStream os = Files.newOutputStream(file);
             Writer w = new OutputStreamWriter(os, StandardCharsets.UTF_8)) {
            write(diagnosis, w);
        }
    }

    /**
     * @param diagnosis the diagnosis
     * @param out       where the text goes (not closed)
     * @throws IOException when it cannot be written
     */
    static void write(ProfileDiagnosis diagnosis, Writer out) throws IOException {
        DiagnosisColumn[] columns = DiagnosisColumn.values();
        StringBuilder b = new StringBuilder(1 << 17);
        b.append(String.join(",", header())).append('\n');
        int n = diagnosis.size();
        for (int k = 0; k < n; k++) {
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
            if (b.length() >= 1 << 16) {
                out.append(b);
                b.setLength(0);
            }
        }
        out.append(b);
        out.flush();
    }
}
