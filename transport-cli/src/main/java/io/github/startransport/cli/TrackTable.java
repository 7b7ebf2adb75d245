package io.github.startransport.cli;

import com.fasterxml.jackson.core.io.NumberOutput;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes {@code track.csv}: one row per profile and region, in track order, each region's rows
 * centre to surface. A profile without any convective, semiconvective or thermohaline region has
 * one row of regime {@code none} with empty edges. Undefined numbers (an age that is not known, a
 * Kelvin-Helmholtz time where L &lt;= 0) are empty cells.
 */
final class TrackTable {
    /** The columns, in order. */
    static final List<String> HEADER = List.of("model_number", "age_yr", "profile", "regime", "m_bottom_g", "m_top_g",
            "r_bottom_cm", "r_top_cm", "mass_g", "radius_cm", "luminosity_erg_s", "photon_diffusion_time_yr",
            "thermal_diffusion_time_yr", "kelvin_helmholtz_time_yr");

    private TrackTable() {
    }

    /**
     * @param track the track
     * @param file  the file to create
     * @throws IOException when it cannot be written
     */
    static void write(TrackCommand.Track track, Path file) throws IOException {
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
             CSVPrinter csv = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setRecordSeparator('\n').get())) {
            csv.printRecord(HEADER);
            for (TrackPoint p : track.points()) {
                double[] years = TrackCommand.years(p.timescales());
                List<TrackPoint.Layer> layers = p.layers().isEmpty()
                        ? List.of(new TrackPoint.Layer("none", Double.NaN, Double.NaN, Double.NaN, Double.NaN))
                        : p.layers();
                for (TrackPoint.Layer l : layers) {
                    List<String> row = new ArrayList<>();
                    row.add(Long.toString(p.modelNumber()));
                    row.add(p.age() == null ? "" : number(p.age()));
                    row.add(p.source());
                    row.add(l.regime());
                    row.add(number(l.mBottom()));
                    row.add(number(l.mTop()));
                    row.add(number(l.rBottom()));
                    row.add(number(l.rTop()));
                    row.add(number(p.mass()));
                    row.add(number(p.radius()));
                    row.add(number(p.luminosity()));
                    for (double y : years) {
                        row.add(number(y));
                    }
                    csv.printRecord(row);
                }
            }
        }
    }

    /** Shortest text that reads back as the same double; empty when not finite. */
    private static String number(double v) {
        return Double.isFinite(v) ? NumberOutput.toString(v, true) : "";
    }
}
