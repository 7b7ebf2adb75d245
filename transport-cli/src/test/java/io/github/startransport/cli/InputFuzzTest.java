package io.github.startransport.cli;

import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.TransportException;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Garbage for the tool's own readers: profile files and --columns maps. The only allowed outcomes
 * are a whole, valid result or our own refusal with a message (a DataFormatException naming the
 * file, or a UsageException naming the option); never another exception type.
 */
class InputFuzzTest {
    private static final String HEADER = "r_cm,m_g,T_K,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z";

    @Provide
    Arbitrary<String> cell() {
        return Arbitraries.oneOf(
                Arbitraries.doubles().between(1e-3, 1e3).ofScale(4).map(String::valueOf),
                Arbitraries.of("", " ", "NaN", "Infinity", "-1", "0", "1e400", "abc", "\"1\"", "1,5", "0x10", "--",
                        "1e", "#", "\u00a0", "1.5e7", "-0", "7"),
                Arbitraries.strings().ofMaxLength(6));
    }

    @Provide
    Arbitrary<List<List<String>>> rows() {
        return cell().list().ofMinSize(0).ofMaxSize(10).list().ofMinSize(0).ofMaxSize(8);
    }

    @Provide
    Arbitrary<String> header() {
        return Arbitraries.oneOf(Arbitraries.just(HEADER), Arbitraries.just(HEADER + ",kappa_cm2_g"),
                Arbitraries.just("r_cm,m_g,T_K"), Arbitraries.strings().ofMaxLength(40),
                Arbitraries.just(HEADER.replace("T_K", "Temp")),
                Arbitraries.just("radius,mass,temperature,density,pressure,luminosity,hydrogen,metals"),
                Arbitraries.just("r,radius,m_g,T_K,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z"),
                Arbitraries.just("rad,Mass,logT,Dens,Press,Lum,X,Z"),
                Arbitraries.just(HEADER.replace(",", ";")));
    }

    @Property(tries = 400, seed = "601")
    void profileFilesAreReadWholeOrRefusedWithTheFileName(@ForAll("header") String header,
                                                          @ForAll("rows") List<List<String>> rows,
                                                          @ForAll boolean mapTemp) throws IOException {
        Path dir = Files.createTempDirectory("fuzz");
        Path file = dir.resolve("p.csv");
        StringBuilder text = new StringBuilder(header).append('\n');
        for (List<String> row : rows) {
            text.append(String.join(",", row)).append('\n');
        }
        Files.writeString(file, text, StandardCharsets.UTF_8);
        try {
            ColumnMap map = mapTemp ? ColumnMap.parse("Temp=temperature") : ColumnMap.none();
            Profile p = ProfileCsvReader.read(file, map).profile();
            Statistics.collect("accepted");
            for (ProfileColumn c : ProfileColumn.values()) {
                if (p.has(c)) {
                    for (double v : p.column(c)) {
                        assertTrue(Double.isFinite(v), c + " holds " + v);
                    }
                }
            }
        } catch (DataFormatException e) {
            Statistics.collect("refused: data format");
            assertTrue(e.getMessage().contains("p.csv"), e.getMessage());
        } catch (BadInputException e) {
            Statistics.collect("refused: bad input");
            assertTrue(!e.getMessage().isBlank());
        } finally {
            Files.deleteIfExists(file);
            Files.deleteIfExists(dir);
        }
    }

    @Property(tries = 400, seed = "603")
    void spoiledValidFilesAreReadWholeOrRefused(@ForAll("cell") String spoil,
                                                 @ForAll @net.jqwik.api.constraints.IntRange(min = 0, max = 60) int at,
                                                 @ForAll boolean reversed) throws IOException {
        // a valid file (ProfileFiles.ROWS), surface first or not, with at most one cell replaced
        List<String> rows = new java.util.ArrayList<>(List.of(ProfileFiles.ROWS));
        if (reversed) {
            java.util.Collections.reverse(rows);
        }
        int row = at / 8;
        if (row < rows.size()) {
            String[] cells = rows.get(row).split(",", -1);
            cells[at % 8 % cells.length] = spoil;
            rows.set(row, String.join(",", cells));
        }
        Path dir = Files.createTempDirectory("fuzz");
        Path file = dir.resolve("p.csv");
        Files.writeString(file, HEADER + "\n" + String.join("\n", rows) + "\n", StandardCharsets.UTF_8);
        try {
            Profile p = ProfileCsvReader.read(file, ColumnMap.none()).profile();
            Statistics.collect("accepted");
            // a spoiled cell may turn its line into a comment ("#...") or split it; every zone that
            // remains is whole and finite
            assertTrue(p.size() >= 3 && p.size() <= rows.size() + 1, "zones " + p.size());
            for (ProfileColumn c : ProfileColumn.values()) {
                if (p.has(c)) {
                    for (double v : p.column(c)) {
                        assertTrue(Double.isFinite(v), c + " holds " + v);
                    }
                }
            }
        } catch (DataFormatException e) {
            Statistics.collect("refused");
            assertTrue(e.getMessage().contains("p.csv") && e.line() > 0, e.getMessage());
        } finally {
            Files.deleteIfExists(file);
            Files.deleteIfExists(dir);
        }
    }

    @Property(tries = 1000, seed = "602")
    void columnMapsParseOrAreRefusedByName(@ForAll("mapText") String text) {
        try {
            ColumnMap map = ColumnMap.parse(text);
            Statistics.collect("accepted");
            for (ProfileColumn c : ProfileColumn.values()) {
                assertTrue(!map.fileHeader(c).isBlank());
            }
        } catch (UsageException e) {
            Statistics.collect("refused");
            assertTrue(e.getMessage().startsWith("--columns"), e.getMessage());
        } catch (TransportException e) {
            Statistics.collect("refused (transport)");
        }
    }

    @Provide
    Arbitrary<String> mapText() {
        Arbitrary<String> side = Arbitraries.oneOf(Arbitraries.of("temperature", "T_K", "rho", "Dens", "radius",
                "r_cm", "kappa", "x", "", " ", "=", ",", "temprature"), Arbitraries.strings().ofMaxLength(5));
        Arbitrary<String> item = Arbitraries.oneOf(
                side.flatMap(a -> side.map(b -> a + "=" + b)), side);
        return item.list().ofMaxSize(5).map(l -> String.join(",", l));
    }
}
