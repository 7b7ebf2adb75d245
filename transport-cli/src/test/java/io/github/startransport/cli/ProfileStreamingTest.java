package io.github.startransport.cli;

import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The streaming reader's own paths: column growth when the rows get longer after the sample it
 * estimates from, CRLF and a byte-order mark, quoted cells, a line longer than its buffer, no
 * final newline. Each value must equal {@link Double#parseDouble} of its text.
 */
class ProfileStreamingTest {

    /** A smooth invented profile of n zones, centre to surface, values written with varying digits. */
    private static String[][] rows(int n, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        String[][] rows = new String[n][8];
        for (int k = 0; k < n; k++) {
            double f = (k + 1.0) / n;
            double[] v = {7e10 * f, 2e33 * f, 1.5e7 * (1.01 - f), 150 * (1.0001 - f), 2e17 * (1.0001 - f),
                3.8e33 * f, 0.7, 0.02};
            for (int j = 0; j < 8; j++) {
                // short rows first, long rows later: the first estimate of the row count is too small
                rows[k][j] = k < 1500 ? String.format(Locale.ROOT, "%.6g", v[j]) : k % 2 == 0
                        ? String.valueOf(v[j] * (1 + 1e-9 * rnd.nextDouble())) : String.format(Locale.ROOT, "%.17e", v[j]);
            }
            if (k >= 1500) {
                rows[k][0] = String.valueOf(7e10 * f); // keep r strictly increasing
            }
        }
        return rows;
    }

    @Test
    void growsItsColumnsAndReadsEveryCellAsTheJdkWould(@TempDir Path dir) throws Exception {
        String[][] rows = rows(20_000, 5);
        StringBuilder b = new StringBuilder("\uFEFF# made up\r\n" + ProfileFiles.HEADER + ",note\r\n");
        for (int k = 0; k < rows.length; k++) {
            b.append(String.join(",", rows[k])).append(',').append(k == 7 ? "\"quoted, with comma\"" : "x");
            if (k < rows.length - 1) {
                b.append("\r\n");
            }
        }
        Path file = dir.resolve("p.csv");
        Files.writeString(file, b.toString(), StandardCharsets.UTF_8);
        Profile p = ProfileCsvReader.read(file, ColumnMap.none()).profile();
        assertEquals(rows.length, p.size());
        String[] headers = ProfileFiles.HEADER.split(",");
        for (int j = 0; j < headers.length; j++) {
            double[] expected = new double[rows.length];
            for (int k = 0; k < rows.length; k++) {
                expected[k] = Double.parseDouble(rows[k][j]);
            }
            assertArrayEquals(expected, p.column(ProfileColumn.byHeader(headers[j])), headers[j]);
        }
    }

    @Test
    void aLineLongerThanTheBufferIsReadWhole(@TempDir Path dir) throws Exception {
        String longCell = "y".repeat(3 << 20);
        StringBuilder b = new StringBuilder(ProfileFiles.HEADER + ",note\n");
        for (int k = 0; k < ProfileFiles.ROWS.length; k++) {
            b.append(ProfileFiles.ROWS[k]).append(',').append(k == 2 ? longCell : "x").append('\n');
        }
        Path file = Files.writeString(dir.resolve("p.csv"), b.toString());
        Profile p = ProfileCsvReader.read(file, ColumnMap.none()).profile();
        assertEquals(5, p.size());
        assertEquals(6.0e6, p.value(ProfileColumn.TEMPERATURE, 2));
    }

    @Test
    void aBadCellFarDownIsPlacedOnItsLineAndColumn(@TempDir Path dir) throws Exception {
        String[][] rows = rows(5000, 9);
        rows[4321][3] = "1.0Q+02";
        StringBuilder b = new StringBuilder("# c\n" + ProfileFiles.HEADER + "\n");
        for (String[] r : rows) {
            b.append(String.join(",", r)).append('\n');
        }
        Path file = Files.writeString(dir.resolve("p.csv"), b.toString());
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        assertEquals(4321 + 3, e.line());
        assertEquals(4, e.column());
        assertTrue(e.reason().contains("'1.0Q+02' is not a number"), e.getMessage());
    }

    @Test
    void aValueRefusedByTheProfileIsPlacedOnItsLineThroughASecondPass(@TempDir Path dir) throws Exception {
        String[][] rows = rows(3000, 11);
        rows[2500][2] = "-5";
        StringBuilder b = new StringBuilder(ProfileFiles.HEADER + "\n");
        for (int k = 0; k < rows.length; k++) {
            b.append(String.join(",", rows[k])).append('\n').append(k % 100 == 0 ? "# a comment\n\n" : "");
        }
        Path file = Files.writeString(dir.resolve("p.csv"), b.toString());
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        // line 1 the header, data row k on line 2 + k, plus two skipped lines after rows 0, 100, ..., 2400
        assertEquals(2 + 2500 + 2 * 25, e.line());
        assertEquals(3, e.column());
    }
}
