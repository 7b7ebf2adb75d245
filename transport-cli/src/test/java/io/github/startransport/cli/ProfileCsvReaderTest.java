package io.github.startransport.cli;

import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The profile reader against small files whose every line number and column is known here. */
class ProfileCsvReaderTest {

    private static double[] column(int j) {
        double[] v = new double[ProfileFiles.ROWS.length];
        for (int k = 0; k < v.length; k++) {
            v[k] = Double.parseDouble(ProfileFiles.ROWS[k].split(",")[j]);
        }
        return v;
    }

    @Test
    void readsEveryColumnSkippingCommentsAndBlankLinesAndNotesExtraColumns(@TempDir Path dir) throws Exception {
        Path file = ProfileFiles.write(dir, "p.csv",
                "# invented numbers for testing",
                "",
                ProfileFiles.HEADER + ",kappa_cm2_g,zone_label",
                ProfileFiles.ROWS[0] + ",1.0,a",
                "  # a comment between rows",
                ProfileFiles.ROWS[1] + ",2.0,b",
                ProfileFiles.ROWS[2] + ",3.0,c",
                "",
                ProfileFiles.ROWS[3] + ",4.0,d",
                ProfileFiles.ROWS[4] + ",5.0,e");
        ProfileCsvReader.Read read = ProfileCsvReader.read(file, ColumnMap.none());
        Profile p = read.profile();
        assertEquals(5, p.size());
        String[] headers = ProfileFiles.HEADER.split(",");
        for (int j = 0; j < headers.length; j++) {
            assertArrayEquals(column(j), p.column(ProfileColumn.byHeader(headers[j])), headers[j]);
        }
        assertArrayEquals(new double[] {1, 2, 3, 4, 5}, p.column(ProfileColumn.OPACITY));
        assertFalse(p.has(ProfileColumn.CP));
        assertArrayEquals(new int[] {4, 6, 7, 9, 10}, read.dataLines());
        assertEquals(1, read.notes().size(), read.notes().toString());
        assertTrue(read.notes().get(0).contains("zone_label"), read.notes().toString());
        assertTrue(read.notes().get(0).contains("column 10"), read.notes().toString());
    }

    @Test
    void readsSurfaceToCentreOrder(@TempDir Path dir) throws Exception {
        String[] rows = ProfileFiles.ROWS;
        Path file = ProfileFiles.write(dir, "p.csv", ProfileFiles.HEADER, rows[4], rows[3], rows[2], rows[1], rows[0]);
        Profile p = ProfileCsvReader.read(file, ColumnMap.none()).profile();
        assertTrue(p.wasReversed());
        assertArrayEquals(column(0), p.column(ProfileColumn.RADIUS));
    }

    @Test
    void columnsOptionMapsTheFilesHeaderOntoOurNames(@TempDir Path dir) throws Exception {
        Path file = ProfileFiles.write(dir, "foreign.csv",
                "radius,Mass,Temp,Dens,Press,Lum,X,Z",
                ProfileFiles.ROWS[0], ProfileFiles.ROWS[1], ProfileFiles.ROWS[2], ProfileFiles.ROWS[3],
                ProfileFiles.ROWS[4]);
        ColumnMap map = ColumnMap.parse("radius=r_cm, Mass=mass,Temp=TEMPERATURE,Dens=density,Press=pressure,"
                + "Lum=L");
        Profile p = ProfileCsvReader.read(file, map).profile();
        assertArrayEquals(column(2), p.column(ProfileColumn.TEMPERATURE));
        assertArrayEquals(column(3), p.column(ProfileColumn.DENSITY));
        assertArrayEquals(column(5), p.column(ProfileColumn.LUMINOSITY));
    }

    @Test
    void missingRequiredColumnIsNamedWithTheHeaderLine(@TempDir Path dir) throws Exception {
        Path file = ProfileFiles.write(dir, "p.csv", "# c", "r_cm,m_g,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z",
                "1e9,1e31,150,2e17,1e32,0.7,0.02");
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        assertEquals(file.toString(), e.source());
        assertEquals(2, e.line());
        assertTrue(e.reason().contains("T_K"), e.getMessage());
    }

    @Test
    void columnsOptionNamingAnAbsentFileColumnIsRefused(@TempDir Path dir) throws Exception {
        Path file = ProfileFiles.valid(dir, "p.csv");
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.parse("Temp=temperature")));
        assertEquals(2, e.line());
        assertTrue(e.reason().contains("'Temp'"), e.getMessage());
    }

    @Test
    void nonNumericCellGivesLineAndColumn(@TempDir Path dir) throws Exception {
        String[] r = ProfileFiles.ROWS;
        // line 1 comment, 2 header, 3-4 rows, 5 comment, 6 the bad row (T_K is column 3)
        Path file = ProfileFiles.write(dir, "p.csv", "# c", ProfileFiles.HEADER, r[0], r[1], "# c",
                "2.0e10,1.2e33,hot,5,3.0e15,3.5e33,0.7,0.02", r[3], r[4]);
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        assertEquals(6, e.line());
        assertEquals(3, e.column());
        assertTrue(e.reason().contains("T_K") && e.reason().contains("'hot'"), e.getMessage());
    }

    @Test
    void emptyCellIsRefusedWithLineAndColumn(@TempDir Path dir) throws Exception {
        String[] r = ProfileFiles.ROWS;
        Path file = ProfileFiles.write(dir, "p.csv", ProfileFiles.HEADER, r[0], r[1], r[2], r[3],
                "6.9e10,2.0e33,1.0e4,1e-6,1.0e6,3.8e33,,0.02");
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        assertEquals(6, e.line());
        assertEquals(7, e.column());
    }

    @Test
    void nonMonotonicRadiusNamesTheLineOfTheZoneAndTheColumn(@TempDir Path dir) throws Exception {
        String[] r = ProfileFiles.ROWS;
        // the fourth data row (line 6) has a radius below the third's
        Path file = ProfileFiles.write(dir, "p.csv", "# c", ProfileFiles.HEADER, r[0], r[1], r[2],
                "1.0e10,1.9e33,1.0e6,0.1,1.0e13,3.8e33,0.7,0.02", r[4]);
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        assertEquals(6, e.line());
        assertEquals(1, e.column());
        assertTrue(e.reason().contains("r_cm"), e.getMessage());
    }

    @Test
    void refusedValueInAMappedColumnIsReportedUnderTheFilesName(@TempDir Path dir) throws Exception {
        String[] r = ProfileFiles.ROWS;
        Path file = ProfileFiles.write(dir, "p.csv", "r_cm,m_g,T_K,Dens,P_dyn_cm2,L_erg_s,X,Z", r[0], r[1],
                "2.0e10,1.2e33,6.0e6,-5,3.0e15,3.5e33,0.7,0.02", r[3], r[4]);
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.parse("Dens=density")));
        assertEquals(4, e.line());
        assertEquals(4, e.column());
        assertTrue(e.reason().contains("Dens") && e.reason().contains("rho_g_cm3"), e.getMessage());
    }

    @Test
    void missingFileAndFolderAreRefused(@TempDir Path dir) {
        Path missing = dir.resolve("nothing-here.csv");
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(missing, ColumnMap.none()));
        assertEquals(missing.toString(), e.source());
        assertTrue(e.reason().contains("cannot be read"), e.getMessage());
        assertThrows(DataFormatException.class, () -> ProfileCsvReader.read(dir, ColumnMap.none()));
    }

    @Test
    void rowWithTheWrongNumberOfCellsIsRefused(@TempDir Path dir) throws Exception {
        String[] r = ProfileFiles.ROWS;
        Path file = ProfileFiles.write(dir, "p.csv", ProfileFiles.HEADER, r[0], r[1] + ",7", r[2]);
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        assertEquals(3, e.line());
    }

    @Test
    void duplicateHeaderNameIsRefused(@TempDir Path dir) throws Exception {
        Path file = ProfileFiles.write(dir, "p.csv", ProfileFiles.HEADER + ",T_K", ProfileFiles.ROWS[0] + ",1");
        DataFormatException e = assertThrows(DataFormatException.class,
                () -> ProfileCsvReader.read(file, ColumnMap.none()));
        assertEquals(1, e.line());
        assertEquals(9, e.column());
    }

    @Test
    void headerWithoutRowsAndEmptyFileAreRefused(@TempDir Path dir) throws Exception {
        Path header = ProfileFiles.write(dir, "h.csv", "# c", ProfileFiles.HEADER);
        assertThrows(DataFormatException.class, () -> ProfileCsvReader.read(header, ColumnMap.none()));
        Path empty = dir.resolve("e.csv");
        Files.writeString(empty, "# only a comment\n");
        assertThrows(DataFormatException.class, () -> ProfileCsvReader.read(empty, ColumnMap.none()));
    }

    @Test
    void aDiagnosisErrorCountedFromTheCentreIsPlacedOnTheRightLineOfAReversedFile(@TempDir Path dir)
            throws Exception {
        String[] r = ProfileFiles.ROWS;
        // surface first: the centre zone (r[0]) is the last data row, on line 7
        Path file = ProfileFiles.write(dir, "p.csv", "# c", ProfileFiles.HEADER, r[4], r[3], r[2], r[1], r[0]);
        ProfileCsvReader.Read read = ProfileCsvReader.read(file, ColumnMap.none());
        DataFormatException e = read.locate(new io.github.startransport.spi.InvalidInputException("T_K", 1.5e7, "K", 0,
                "something the diagnosis needs"), true);
        assertEquals(7, e.line());
        assertEquals(3, e.column());
        DataFormatException surface = read.locate(new io.github.startransport.spi.InvalidInputException("rho_g_cm3",
                1e-6, "g cm^-3", 4, "something"), true);
        assertEquals(3, surface.line());
        assertEquals(4, surface.column());
    }
}
