package io.github.startransport.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.Tuple;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.lifecycle.AfterContainer;
import net.jqwik.api.lifecycle.BeforeContainer;
import net.jqwik.api.statistics.Statistics;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.IntSupplier;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * Garbage through the whole tool: profile files, opacity-table files and {@code --columns} maps given
 * to {@code diagnose}, whose output folder already holds a previous result. The tool's own contract
 * is checked on every try:
 * <ul>
 *   <li>the exit code means what the README says: 0 success, 1 a file that cannot be read or holds
 *       bad data, 2 a wrong command line (only a malformed {@code --columns} here), never 3 on these
 *       small inputs and nothing else;</li>
 *   <li>no stack trace and no "internal error" on standard error, whatever the input;</li>
 *   <li>a refused file is named as {@code startransport: FILE[:LINE[:COLUMN]]: reason}, and where
 *       the spoil is one cell that is plainly no number, or a number outside its column's domain,
 *       LINE and COLUMN are that cell's;</li>
 *   <li>nothing half-written: on a refusal the output folder still holds the previous result, byte
 *       for byte, and nothing else appeared beside it; on success every output file is there, whole
 *       (zones.csv holds one row per zone, summary.json parses).</li>
 * </ul>
 * The exit codes met are counted (jqwik statistics) and each property fails when the accepted or
 * refused share falls below the share its inputs are built for. The reader itself is fuzzed too,
 * in this JVM, without the tool around it.
 */
class InputFuzzTest {
    private static final String HEADER = ProfileFiles.HEADER;
    private static final List<String> FILES = List.of("zones.csv", "summary.json", "gradients.png",
            "velocity-mixing.png", "opacity.png", "propagation.png");
    /** A stack-trace line as the JVM prints it. */
    private static final Pattern STACK = Pattern.compile("(?m)^\\s+at [\\w.$/]+\\(");
    /** A decimal number as the README's profile section defines one (optional sign, fraction, exponent). */
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private static Path home;
    private static Path out;

    /** The output folder and the previous result every try starts from. */
    @BeforeContainer
    static void previousResult() throws IOException {
        home = Files.createTempDirectory("fuzz-tool");
        out = Files.createDirectory(home.resolve("run")).resolve("out");
        Path valid = ProfileFiles.valid(home, "valid.csv");
        Runs r = Runs.run("diagnose", valid.toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.toString());
        // a small table over the demo star's range (log T 3.5-8.5, log R -9 to 1), written by the tool itself
        Path table = home.resolve("base-table.csv");
        Runs t = Runs.run("table", "build", "--out", table.toString(), "--log-t", "3.5:8.5:11", "--log-r", "-9:1:11",
                "--hydrogen", "0,0.7");
        assertEquals(0, t.code(), t.toString());
        baseTable = Files.readAllLines(table);
        demoZones = io.github.startransport.spi.Transport.discover()
                .star(null, io.github.startransport.spi.ModelOptions.defaults()).profile().size();
    }

    private static List<String> baseTable;
    private static int demoZones;

    @AfterContainer
    static void cleanUp() throws IOException {
        try (Stream<Path> s = Files.walk(home)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }

    /** What is in and beside the output folder. */
    private record Snapshot(List<String> beside, String target, byte[] zones, byte[] summary) {
        static Snapshot take() throws IOException {
            return new Snapshot(OutputFolderTest.names(out.getParent()), Files.readSymbolicLink(out).toString(),
                    Files.readAllBytes(out.resolve("zones.csv")), Files.readAllBytes(out.resolve("summary.json")));
        }
    }

    /** Where a refusal must point. */
    enum Expect { ACCEPT, REFUSE_AT_CELL, REFUSE_AT_LINE, EITHER }

    /**
     * Runs {@code diagnose FILE --out out ...} and checks the contract (class comment).
     *
     * @param line   the 1-based line a refusal must name, or 0 when any or none may be named
     * @param column the 1-based column a refusal must name, or 0
     * @return the exit code
     */
    private static int diagnose(Path file, Expect expect, int line, int column, String... options)
            throws IOException {
        List<String> args = new ArrayList<>(List.of("diagnose", file.toString(), "--out", out.toString()));
        args.addAll(List.of(options));
        return tool(args, file, expect, line, column, () -> ProfileCsvReader.read(file,
                options.length == 0 ? ColumnMap.none() : ColumnMap.parse(options[1])).profile().size());
    }

    /**
     * Runs the tool and checks the contract (class comment).
     *
     * @param named  the input file a refusal must name
     * @param line   the 1-based line a refusal must name, or 0 when any or none may be named
     * @param column the 1-based column a refusal must name, or 0
     * @param zones  the number of zones a successful run must write
     * @return the exit code
     */
    private static int tool(List<String> args, Path named, Expect expect, int line, int column, IntSupplier zones)
            throws IOException {
        Snapshot before = Snapshot.take();
        Runs r = Runs.run(args.toArray(String[]::new));
        Statistics.label("exit code").collect(r.code());
        assertTrue(r.code() >= 0 && r.code() <= 2, "exit code " + r.code() + "\n" + r);
        assertTrue(!STACK.matcher(r.err()).find() && !r.err().contains("internal error"), r.toString());
        boolean usageOption = args.contains("--columns");
        if (r.code() == 0) {
            assertTrue(expect != Expect.REFUSE_AT_CELL && expect != Expect.REFUSE_AT_LINE, "accepted:\n" + r);
            assertEquals(OutputFolderTest.expectedBeside(out.getParent(), "out"), OutputFolderTest.names(out.getParent()),
                    r.toString());
            for (String f : FILES) {
                assertTrue(Files.size(out.resolve(f)) > 0, f);
            }
            List<String> written = Files.readAllLines(out.resolve("zones.csv"));
            assertEquals(zones.getAsInt() + 1, written.size(), "zones.csv: a header and one row per zone");
            new ObjectMapper().readTree(out.resolve("summary.json").toFile());
            return 0;
        }
        // refused: the previous result is untouched and nothing new is beside it
        Snapshot after = Snapshot.take();
        assertEquals(before.beside(), after.beside(), r.toString());
        assertEquals(before.target(), after.target(), r.toString());
        assertArrayEquals(before.zones(), after.zones(), "zones.csv changed by a refused run");
        assertArrayEquals(before.summary(), after.summary(), "summary.json changed by a refused run");
        if (r.code() == 2) {
            assertTrue(usageOption && r.err().contains("--columns"), "usage error without --columns:\n" + r);
            return 2;
        }
        assertTrue(expect != Expect.ACCEPT, "refused:\n" + r);
        Matcher m = Pattern.compile("(?m)^startransport: " + Pattern.quote(named.toString())
                + "(?::(\\d+))?(?::(\\d+))?: \\S").matcher(r.err());
        assertTrue(m.find(), "the refusal does not name the file as FILE[:LINE[:COLUMN]]: reason\n" + r);
        int at = m.group(1) == null ? 0 : Integer.parseInt(m.group(1));
        int col = m.group(2) == null ? 0 : Integer.parseInt(m.group(2));
        Statistics.label("refusal names").collect(at > 0 && col > 0 ? "line and column" : at > 0 ? "line" : "file");
        if (expect == Expect.REFUSE_AT_CELL) {
            assertEquals(line + ":" + column, at + ":" + col, "place of the refused cell\n" + r);
        } else if (expect == Expect.REFUSE_AT_LINE) {
            assertEquals(line, at, "line of the refused row\n" + r);
        }
        return 1;
    }

    @Provide
    Arbitrary<String> cell() {
        return Arbitraries.oneOf(
                Arbitraries.doubles().between(1e-3, 1e3).ofScale(4).map(String::valueOf),
                Arbitraries.of("", " ", "NaN", "Infinity", "-1", "0", "1e400", "abc", "\"1\"", "1,5", "0x10", "--",
                        "1e", "#", "\u00a0", "1.5e7", "-0", "7"),
                Arbitraries.strings().ofMaxLength(6));
    }

    /** Random rows, or the valid rows of {@link ProfileFiles#ROWS} with about one cell in 60 replaced. */
    @Provide
    Arbitrary<List<List<String>>> rows() {
        Arbitrary<List<List<String>>> random = cell().list().ofMinSize(0).ofMaxSize(10).list().ofMinSize(0).ofMaxSize(8);
        int n = ProfileFiles.ROWS.length * 8;
        Arbitrary<List<List<String>>> spoiled = Combinators.combine(Arbitraries.integers().between(0, 59).list().ofSize(n),
                cell().list().ofSize(n)).as((keep, cells) -> {
                    List<List<String>> rows = new ArrayList<>();
                    for (int i = 0; i < ProfileFiles.ROWS.length; i++) {
                        List<String> row = new ArrayList<>(List.of(ProfileFiles.ROWS[i].split(",")));
                        for (int j = 0; j < 8; j++) {
                            if (keep.get(8 * i + j) == 0) {
                                row.set(j, cells.get(8 * i + j));
                            }
                        }
                        rows.add(row);
                    }
                    return rows;
                });
        return Arbitraries.frequencyOf(Tuple.of(1, random), Tuple.of(4, spoiled));
    }

    @Provide
    Arbitrary<String> header() {
        return Arbitraries.oneOf(Arbitraries.just(HEADER), Arbitraries.just(HEADER), Arbitraries.just(HEADER),
                Arbitraries.just(HEADER), Arbitraries.just(HEADER), Arbitraries.just(HEADER + ",kappa_cm2_g"),
                Arbitraries.just("r_cm,m_g,T_K"), Arbitraries.strings().ofMaxLength(40),
                Arbitraries.just(HEADER.replace("T_K", "Temp")),
                Arbitraries.just("radius,mass,temperature,density,pressure,luminosity,hydrogen,metals"),
                Arbitraries.just("r,radius,m_g,T_K,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z"),
                Arbitraries.just("rad,Mass,logT,Dens,Press,Lum,X,Z"),
                Arbitraries.just(HEADER.replace(",", ";")));
    }

    /** Random headers and rows, read by the reader alone: a whole, valid profile or our refusal naming the file. */
    @Property(tries = 400, seed = "601")
    void profileFilesAreReadWholeOrRefusedWithTheFileName(@ForAll("header") String header,
                                                          @ForAll("rows") List<List<String>> rows,
                                                          @ForAll boolean mapTemp) throws IOException {
        Path file = home.resolve("p.csv");
        StringBuilder text = new StringBuilder(header).append('\n');
        for (List<String> row : rows) {
            text.append(String.join(",", row)).append('\n');
        }
        Files.writeString(file, text, StandardCharsets.UTF_8);
        Statistics.coverage(c -> {
            c.check("accepted").percentage(p -> p >= 5.0);
            c.check("refused").percentage(p -> p >= 50.0);
        });
        try {
            ColumnMap map = mapTemp ? ColumnMap.parse("Temp=temperature") : ColumnMap.none();
            Profile p = ProfileCsvReader.read(file, map).profile();
            Statistics.collect("accepted");
            assertTrue(p.size() >= 3, "zones " + p.size());
            for (ProfileColumn c : ProfileColumn.values()) {
                if (p.has(c)) {
                    for (double v : p.column(c)) {
                        assertTrue(Double.isFinite(v), c + " holds " + v);
                    }
                }
            }
        } catch (DataFormatException e) {
            Statistics.collect("refused");
            assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
        } catch (BadInputException e) {
            Statistics.collect("refused");
            assertTrue(!e.getMessage().isBlank());
        }
    }

    /**
     * What the tool must do with a valid file one of whose cells is replaced: a cell that is plainly
     * no decimal number (a NaN and an infinity included) or a number outside its column's domain
     * (r, m, T, rho, P &gt; 0; X, Z in [0, 1]; L finite) is refused at that line and column; a comma
     * in the cell adds a cell to its row, refused at that line; a number inside the domain may be
     * accepted or break the order of r or m (refused, somewhere); anything with quotes, comment
     * marks, line breaks, blanks or a Fortran exponent letter is left to the general contract.
     */
    static Expect expect(String spoil, int column) {
        if (spoil.chars().anyMatch(ch -> ch == '\n' || ch == '\r' || ch == '"' || ch == '#' || ch == 'd' || ch == 'D'
                || Character.isWhitespace(ch) || Character.isSpaceChar(ch))) {
            return Expect.EITHER;
        }
        if (spoil.indexOf(',') >= 0) {
            return Expect.REFUSE_AT_LINE;
        }
        if (!DECIMAL.matcher(spoil).matches()) {
            return Expect.REFUSE_AT_CELL;
        }
        double v = Double.parseDouble(spoil);
        boolean inDomain = switch (column) {
            case 5 -> Double.isFinite(v);                       // L
            case 6, 7 -> v >= 0.0 && v <= 1.0;                  // X, Z
            default -> v > 0.0 && Double.isFinite(v);           // r, m, T, rho, P
        };
        return inDomain ? Expect.EITHER : Expect.REFUSE_AT_CELL;
    }

    @Property(tries = 60, seed = "603")
    void spoiledValidFilesThroughTheToolKeepItsContract(@ForAll("cell") String spoil,
                                                        @ForAll @IntRange(min = 0, max = 43) int at,
                                                        @ForAll boolean reversed) throws IOException {
        // a valid file (ProfileFiles.ROWS, header on line 1, data on lines 2-6), surface first or not,
        // with at most one cell replaced (at >= 40: none)
        List<String> rows = new ArrayList<>(List.of(ProfileFiles.ROWS));
        if (reversed) {
            java.util.Collections.reverse(rows);
        }
        int row = at / 8;
        int column = at % 8;
        Expect expect = Expect.ACCEPT;
        if (row < rows.size()) {
            String[] cells = rows.get(row).split(",", -1);
            cells[column] = spoil;
            rows.set(row, String.join(",", cells));
            expect = expect(spoil, column);
        }
        Statistics.label("expected").collect(expect);
        Statistics.label("exit code").coverage(c -> {
            c.check(0).percentage(p -> p >= 20.0);
            c.check(1).percentage(p -> p >= 40.0);
        });
        Statistics.label("refusal names").coverage(c -> c.check("line and column").percentage(p -> p >= 50.0));
        Path file = home.resolve("p.csv");
        Files.writeString(file, HEADER + "\n" + String.join("\n", rows) + "\n", StandardCharsets.UTF_8);
        diagnose(file, expect, row + 2, column + 1);
    }

    @Provide
    Arbitrary<String> tableCell() {
        return Arbitraries.oneOf(cell(), Arbitraries.doubles().between(-3.0, 3.0).ofScale(3).map(String::valueOf));
    }

    /**
     * What the tool must do with a table file one of whose fields is replaced (the format of the
     * README's opacity-table section: decimal numbers, spaces around them allowed): a field that is
     * plainly no finite decimal number is refused at its line and at the character column where the
     * field starts; a comma adds a field, refused at its line; another number may be accepted (a new
     * log kappa) or refused as a grid that is no longer rectangular, a duplicate or a composition out
     * of range (somewhere); quotes aside, comment marks, blanks and line breaks are left to the
     * general contract.
     */
    static Expect expectInTable(String spoil) {
        if (spoil.chars().anyMatch(ch -> ch == '\n' || ch == '\r' || ch == '#' || Character.isWhitespace(ch)
                || Character.isSpaceChar(ch))) {
            return Expect.EITHER;
        }
        if (spoil.indexOf(',') >= 0) {
            return Expect.REFUSE_AT_LINE;
        }
        if (!DECIMAL.matcher(spoil).matches() || !Double.isFinite(Double.parseDouble(spoil))) {
            return Expect.REFUSE_AT_CELL;
        }
        return Expect.EITHER;
    }

    @Property(tries = 40, seed = "604")
    void spoiledTableFilesThroughTheToolKeepItsContract(@ForAll("tableCell") String spoil,
                                                        @ForAll @IntRange(min = 0, max = 241) int row,
                                                        @ForAll @IntRange(min = 0, max = 5) int field)
            throws IOException {
        List<String> lines = new ArrayList<>(baseTable);
        int header = lines.indexOf("X,Z,log_T,log_R,log_kappa");
        assertTrue(header >= 0, "no header in " + lines.subList(0, 5));
        int line = header + 1 + row % (lines.size() - header - 1); // 0-based index of a data line
        Expect expect = Expect.ACCEPT;
        int column = 0;
        if (field < 5) {
            String[] f = lines.get(line).split(",", -1);
            for (int i = 0; i < field; i++) {
                column += f[i].length() + 1;
            }
            column++;
            f[field] = spoil;
            lines.set(line, String.join(",", f));
            expect = expectInTable(spoil);
        }
        Statistics.label("expected").collect(expect);
        Statistics.label("exit code").coverage(c -> {
            c.check(0).percentage(p -> p >= 15.0);
            c.check(1).percentage(p -> p >= 40.0);
        });
        Statistics.label("refusal names").coverage(c -> c.check("line and column").percentage(p -> p >= 50.0));
        Path table = home.resolve("t.csv");
        Files.write(table, lines, StandardCharsets.UTF_8);
        tool(List.of("diagnose", "--demo", "--opacity-table", table.toString(), "--out", out.toString()), table, expect,
                line + 1, column, () -> demoZones);
    }

    /**
     * Random {@code --columns} maps with a valid file whose temperature column is headed "Temp": a
     * malformed map is a usage error (exit 2, the message names --columns), a well-formed one either
     * finds every column (exit 0) or names what is missing (exit 1); never anything else.
     */
    @Property(tries = 80, seed = "602")
    void columnMapsThroughTheToolKeepItsContract(@ForAll("mapText") String text) throws IOException {
        String[] lines = new String[ProfileFiles.ROWS.length + 1];
        lines[0] = HEADER.replace("T_K", "Temp");
        System.arraycopy(ProfileFiles.ROWS, 0, lines, 1, ProfileFiles.ROWS.length);
        Path file = ProfileFiles.write(home, "p.csv", lines);
        boolean wellFormed;
        try {
            ColumnMap.parse(text);
            wellFormed = true;
        } catch (UsageException e) {
            wellFormed = false;
            assertTrue(e.getMessage().startsWith("--columns"), e.getMessage());
        }
        Statistics.label("map").collect(wellFormed ? "well formed" : "malformed");
        Statistics.label("exit code").coverage(c -> {
            c.check(0).count(n -> n >= 5);
            c.check(1).count(n -> n >= 5);
            c.check(2).count(n -> n >= 10);
        });
        int code = diagnose(file, Expect.EITHER, 0, 0, "--columns", text);
        assertEquals(wellFormed, code != 2, "map '" + text + "' gave exit code " + code);
    }

    @Provide
    Arbitrary<String> mapText() {
        Arbitrary<String> side = Arbitraries.oneOf(Arbitraries.of("temperature", "T_K", "Temp", "rho", "Dens",
                "radius", "r_cm", "kappa", "x", "", " ", "=", ",", "temprature"), Arbitraries.strings().ofMaxLength(5));
        Arbitrary<String> item = Arbitraries.oneOf(
                side.flatMap(a -> side.map(b -> a + "=" + b)), side, Arbitraries.just("Temp=T_K"),
                Arbitraries.just("Temp=temperature"));
        return item.list().ofMaxSize(3).map(l -> String.join(",", l));
    }

    /** The contract check itself is not vacuous: a file refused at a cell it does not name would fail it. */
    @Property(tries = 1)
    void theCellCheckCanFail() throws IOException {
        String[] lines = {HEADER, ProfileFiles.ROWS[0], ProfileFiles.ROWS[1].replace("80", "abc"), ProfileFiles.ROWS[2],
            ProfileFiles.ROWS[3], ProfileFiles.ROWS[4]};
        Path file = ProfileFiles.write(home, "p.csv", lines);
        assertEquals(1, diagnose(file, Expect.REFUSE_AT_CELL, 3, 4));
        assertThrows(org.opentest4j.AssertionFailedError.class, () -> diagnose(file, Expect.REFUSE_AT_CELL, 3, 5),
                "a refusal at 3:4 passed as one at 3:5");
    }
}
