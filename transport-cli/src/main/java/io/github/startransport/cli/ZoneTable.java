package io.github.startransport.cli;

import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes {@code zones.csv}: one row per zone, centre to surface, every {@link DiagnosisColumn}
 * under its header name in the library's order, with the regime label after
 * {@code nabla_ledoux}. Numbers are written with {@link Double#toString(double)}, which reads
 * back to the identical double.
 */
final class ZoneTable {
    /** Header of the regime column. */
    static final String REGIME = "regime";

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get();

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
        DiagnosisColumn[] columns = DiagnosisColumn.values();
        double[][] values = new double[columns.length][];
        for (int j = 0; j < columns.length; j++) {
            values[j] = diagnosis.column(columns[j]);
        }
        Regime[] regimes = diagnosis.regimes();
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
             CSVPrinter csv = new CSVPrinter(w, FORMAT)) {
            csv.printRecord(header());
            List<String> row = new ArrayList<>(columns.length + 1);
            for (int k = 0; k < diagnosis.size(); k++) {
                row.clear();
                for (int j = 0; j < columns.length; j++) {
                    row.add(Double.toString(values[j][k]));
                    if (columns[j] == DiagnosisColumn.NABLA_LEDOUX) {
                        row.add(regimes[k].label());
                    }
                }
                csv.printRecord(row);
            }
        }
    }
}
