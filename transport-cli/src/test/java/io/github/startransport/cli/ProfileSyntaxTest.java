package io.github.startransport.cli;

import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * What the reader accepts from other programs' files (our aliases in the header, Fortran
 * exponents, other delimiters, {@code # name = value} lines) and how its messages read (the
 * file's own text, people's numbers, short names). Expected values are the JDK's
 * {@link Double#parseDouble} of the text written.
 */
class ProfileSyntaxTest {

    private static double[] column(int j) {
        double[] v = new double[ProfileFiles.ROWS.length];
        for (int k = 0; k < v.length; k++) {
            v[k] = Double.parseDouble(ProfileFiles.ROWS[k].split(",")[j]);
        }
        return v;
    }

    private static Path withHeader(Path dir, String header, String... extraColumns) throws Exception {
        List<String> lines = new ArrayList<>(List.of(header));
        for (int k = 0; k < ProfileFiles.ROWS.length; k++) {
            StringBuilder row = new StringBuilder(ProfileFiles.ROWS[k]);
            for (String c : extraColumns) {
                row.append(',').append(c).append(k);
            }
            lines.add(row.toString());
        }
        return ProfileFiles.write(dir, "p.csv", lines.toArray(new String[0]));
    }

    @Test
    void aHeaderInOurAliasesIsReadWithoutAMap(@TempDir Path dir) throws Exception {
        Path file = withHeader(dir, "radius,mass,temperature,density,pressure,luminosity,hydrogen,metals,kappa,cp",
                "1", "3e8");
        ProfileCsvReader.Read read = ProfileCsvReader.read(file, ColumnMap.none());
        Profile p = read.profile();
        String[] ours = ProfileFiles.HEADER.split(",");
        for (int j = 0; j < ours.length; j++) {
            assertArrayEquals(column(j), p.column(ProfileColumn.byHeader(ours[j])), ours[j]);
        }
        assertTrue(p.has(ProfileColumn.OPACITY) && p.has(ProfileColumn.CP));
        assertTrue(read.notes().get(0).contains("'temperature' as T_K (K)"), read.notes().toString());
    }

    @Test
    void ourNamesInAnotherCaseAreOursToo(@TempDir Path dir) throws Exception {
        Profile p = ProfileCsvReader.read(withHeader(dir, "R_CM,M_G,t_k,RHO_G_CM3,p_dyn_cm2,l_erg_s,x,z"),
                ColumnMap.none()).profile();
        assertArrayEquals(column(2), p.column(ProfileColumn.TEMPERATURE));
    }

    @Test
    void ourExactNameWinsOverAnAliasAndTheAliasColumnIsNotedAsUnread(@TempDir Path dir) throws Exception {
        Path file = withHeader(dir, ProfileFiles.HEADER + ",temperature", "9");
        ProfileCsvReader.Read read = ProfileCsvReader.read(file, ColumnMap.none());
        assertArrayEquals(column(2), read.profile().column(ProfileColumn.TEMPERATURE));
        assertTrue(read.notes().toString().contains("'temperature' (column 9), because T_K is read from 'T_K'"),
                read.notes().toString());
    }

    @Test
    void fortranExponentsAreRead(@TempDir Path dir) throws Exception {
        List<String> lines = new ArrayList<>(List.of(ProfileFiles.HEADER));
        for (String row : ProfileFiles.ROWS) {
            lines.add(row.replace("e", "D").replace("E", "d"));
        }
        Profile p = ProfileCsvReader.read(ProfileFiles.write(dir, "p.csv", lines.toArray(new String[0])),
                ColumnMap.none()).profile();
        String[] ours = ProfileFiles.HEADER.split(",");
        for (int j = 0; j < ours.length; j++) {
            assertArrayEquals(column(j), p.column(ProfileColumn.byHeader(ours[j])), ours[j]);
        }
    }

    @Test
    void semicolonsTabsAndRunsOfSpacesSeparateCellsWhenSaidSo(@TempDir Path dir) throws Exception {
        for (Delimiter d : List.of(Delimiter.SEMICOLON, Delimiter.TAB, Delimiter.WHITESPACE)) {
            String sep = d == Delimiter.WHITESPACE ? "  \t " : String.valueOf(d.character());
            List<String> lines = new ArrayList<>(List.of((d == Delimiter.WHITESPACE ? "   " : "")
                    + ProfileFiles.HEADER.replace(",", sep)));
            for (String row : ProfileFiles.ROWS) {
                lines.add(row.replace(",", sep) + (d == Delimiter.WHITESPACE ? "  " : ""));
            }
            Path file = ProfileFiles.write(dir, d.label() + ".csv", lines.toArray(new String[0]));
            Profile p = ProfileCsvReader.read(file, ColumnMap.none(), d).profile();
            assertArrayEquals(column(5), p.column(ProfileColumn.LUMINOSITY), d.label());
        }
    }

    @Test
    void commentLinesOfTheFormNameEqualsValueAreKeptWithTheirPlace(@TempDir Path dir) throws Exception {
        Path file = ProfileFiles.write(dir, "p.csv", "# age_yr = 1.5e9", "#model_number=120", "# just a remark",
                ProfileFiles.HEADER, ProfileFiles.ROWS[0], ProfileFiles.ROWS[1], ProfileFiles.ROWS[2]);
        ProfileCsvReader.Read read = ProfileCsvReader.read(file, ColumnMap.none());
        ProfileCsvReader.Property age = read.properties("age_yr").get(0);
        assertEquals("1.5e9", age.value());
        assertEquals(1, age.line());
        assertEquals(12, age.column());
        assertEquals("120", read.properties("model_number").get(0).value());
        assertEquals(2, read.properties().size());
    }

    @Test
    void aProfileOfTwoZonesIsRefusedInWords(@TempDir Path dir) throws Exception {
        Path file = ProfileFiles.write(dir, "p.csv", ProfileFiles.HEADER, ProfileFiles.ROWS[0], ProfileFiles.ROWS[1]);
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        assertTrue(e.reason().contains("a profile needs at least 3 zones (data rows); this one has 2"), e.getMessage());
        assertFalse(e.reason().contains("2.0"), e.getMessage());
    }

    @Test
    void aRefusedValueIsQuotedAsWrittenAndAnUnderflowIsSaid(@TempDir Path dir) throws Exception {
        String[] rows = ProfileFiles.ROWS.clone();
        rows[2] = "1e-400" + rows[2].substring(rows[2].indexOf(','));
        Path file = ProfileFiles.write(dir, "p.csv", ProfileFiles.HEADER, rows[0], rows[1], rows[2], rows[3], rows[4]);
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        assertEquals(4, e.line());
        assertEquals(1, e.column());
        assertTrue(e.reason().contains("'1e-400' cm (read as 0) is refused"), e.getMessage());
    }

    @Test
    void anAcceptedUnderflowToZeroIsAWarningNamingItsCell(@TempDir Path dir) throws Exception {
        String[] rows = ProfileFiles.ROWS.clone();
        rows[3] = rows[3].replace(",0.02", ",1.0E-330");
        rows[4] = rows[4].replace(",0.02", ",2d-999");
        Path file = ProfileFiles.write(dir, "p.csv", ProfileFiles.HEADER, rows[0], rows[1], rows[2], rows[3], rows[4]);
        ProfileCsvReader.Read read = ProfileCsvReader.read(file, ColumnMap.none());
        assertEquals(0.0, read.profile().value(ProfileColumn.METALS, 3));
        assertEquals(1, read.warnings().size(), read.warnings().toString());
        String w = read.warnings().get(0);
        assertTrue(w.contains(file + ":5:8: '1.0E-330'") && w.contains("read as 0") && w.contains("1 more"), w);
    }

    @Test
    void aNumberBeyondTheLargestDoubleIsRefusedQuotingIt(@TempDir Path dir) throws Exception {
        String[] rows = ProfileFiles.ROWS.clone();
        rows[1] = rows[1].replace(",80,", ",8e400,");
        Path file = ProfileFiles.write(dir, "p.csv", ProfileFiles.HEADER, rows[0], rows[1], rows[2], rows[3], rows[4]);
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        assertEquals(3, e.line());
        assertEquals(4, e.column());
        assertTrue(e.reason().contains("'8e400' is larger than the largest double"), e.getMessage());
    }

    @Test
    void theBoundOfAFractionIsRoundedForPeople(@TempDir Path dir) throws Exception {
        String[] rows = ProfileFiles.ROWS.clone();
        rows[2] = rows[2].replace(",0.7,0.02", ",0.99,0.02");
        Path file = ProfileFiles.write(dir, "p.csv", ProfileFiles.HEADER, rows[0], rows[1], rows[2], rows[3], rows[4]);
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        assertTrue(e.reason().contains("'0.02'") && e.reason().contains("1 - X = 0.01 "), e.getMessage());
        assertFalse(e.reason().contains("0.0100000"), e.getMessage());
    }

    @Test
    void aHugeHeaderNameIsShortenedInEveryNoteAndMessage(@TempDir Path dir) throws Exception {
        String huge = "x".repeat(10 * 1024 * 1024);
        Path ignored = withHeader(dir, ProfileFiles.HEADER + "," + huge, "1");
        ProfileCsvReader.Read read = ProfileCsvReader.read(ignored, ColumnMap.none());
        String note = String.join("\n", read.notes());
        assertTrue(note.length() < 400 && note.contains("(10485760 characters)"), note.length() + " characters");
        Path missing = ProfileFiles.write(dir, "q.csv", huge + ",m_g", "1,2");
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(missing, ColumnMap.none()));
        assertTrue(e.getMessage().length() < 2000 && e.getMessage().contains("(10485760 characters)"),
                e.getMessage().length() + " characters");
        Files.delete(ignored);
        Files.delete(missing);
    }
}
