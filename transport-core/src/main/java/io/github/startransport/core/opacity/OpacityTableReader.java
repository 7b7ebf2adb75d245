package io.github.startransport.core.opacity;

import io.github.startransport.spi.DataFormatException;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.regex.Pattern;

/**
 * Reads our opacity table format and refuses a bad file whole.
 *
 * <p><b>Format.</b> UTF-8 text. Lines starting with {@code #} are comments; blank lines are ignored.
 * The first other line is the header {@code X,Z,log_T,log_R,log_kappa}; every further line is one
 * node: hydrogen and metal mass fractions, log10 T (K), log10 R with R = rho / T_6^3
 * (log_R = log10 rho - 3 log10 T + 18), and log10 kappa (cm^2 g^-1). Fields are decimal numbers
 * (optional sign, digits, optional fraction, optional exponent); spaces around them are allowed. Rows
 * may come in any order. Rows with equal (X, Z) form one table, which must be a rectangular grid in
 * (log_T, log_R) with at least two values on each axis; spacing need not be uniform.
 *
 * <p><b>Holes.</b> A node may be missing only if a comment line declares it:
 * <pre>
 * # absent: X=0.7 Z=0.02 log_T=3.75..4.00 log_R=0.5..1.0
 * </pre>
 * declares every node of the table (X, Z) with log_T and log_R inside the closed ranges as absent
 * (a single number instead of {@code a..b} means just that value). Declared nodes must not appear in
 * the file; any other missing node is an error. Cells touching an absent node are out of range.
 *
 * <p><b>Refusals</b> ({@link DataFormatException} with file, 1-based line, 1-based character column of
 * the offending field, and reason): wrong header; wrong number of fields; non-numeric or non-finite
 * value; duplicate point; X or Z negative or X + Z &gt; 1; single-value axis; grid not rectangular
 * (an undeclared missing node); a row inside a declared hole; a malformed {@code # absent:} line or one
 * naming an (X, Z) with no rows; no data rows.
 *
 * <p>Hand-written rather than built on a CSV library: the format has no quoting or escapes, the
 * parser is short, it reports exact character columns, and transport-core gains no dependency.
 */
public final class OpacityTableReader {
    /** The required header line. */
    public static final String HEADER = "X,Z,log_T,log_R,log_kappa";
    /** Prefix (after {@code #} and optional spaces) of a hole declaration. */
    public static final String ABSENT = "absent:";

    private static final String[] COLUMNS = HEADER.split(",");
    /**
     * The largest |log10 kappa| a table may hold: 10^300 leaves eight decades below the largest double
     * (1.8e308) for the interpolation's slopes and blends (common practice, no source; tabulated
     * Rosseland means lie within about -10..10).
     */
    static final double MAX_ABS_LOG_KAPPA = 300.0;
    private static final Pattern NON_FINITE = Pattern.compile("[+-]?(nan|inf|infinity)", Pattern.CASE_INSENSITIVE);

    private OpacityTableReader() {
    }

    /**
     * @param file a table file
     * @return the loaded set
     * @throws DataFormatException when the file is malformed or cannot be read
     */
    public static OpacityTableSet read(Path file) {
        String source = file.toString();
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(r, source);
        } catch (IOException e) {
            throw new DataFormatException(source, 0, 0, "cannot be read: " + e);
        }
    }

    /**
     * @param text   the whole file as text
     * @param source name used in messages
     * @return the loaded set
     * @throws DataFormatException when the text is malformed
     */
    public static OpacityTableSet parse(String text, String source) {
        try {
            return read(new StringReader(text), source);
        } catch (IOException e) {
            throw new DataFormatException(source, 0, 0, "cannot be read: " + e);
        }
    }

    private record Key(double x, double z) {
    }

    private record Point(double t, double r) {
    }

    private record Row(double t, double r, double v, int line, int colT, int colR) {
    }

    private record Hole(double x, double z, double tLo, double tHi, double rLo, double rHi, int line) {
        boolean covers(double t, double r) {
            return t >= tLo && t <= tHi && r >= rLo && r <= rHi;
        }
    }

    private static final class Table {
        final int firstLine;
        final int firstColX;
        final List<Row> rows = new ArrayList<>();
        final Map<Point, Row> seen = new HashMap<>();
        final List<Hole> holes = new ArrayList<>();

        Table(int firstLine, int firstColX) {
            this.firstLine = firstLine;
            this.firstColX = firstColX;
        }
    }

    /**
     * @param in     the text (not closed)
     * @param source name used in messages
     * @return the loaded set
     * @throws IOException         on a read failure
     * @throws DataFormatException when the text is malformed
     */
    public static OpacityTableSet read(Reader in, String source) throws IOException {
        BufferedReader br = in instanceof BufferedReader b ? b : new BufferedReader(in);
        Map<Key, Table> tables = new LinkedHashMap<>();
        List<Hole> holes = new ArrayList<>();
        boolean header = false;
        int lineNo = 0;
        String line;
        int[] starts = new int[5];
        double[] vals = new double[5];
        while ((line = br.readLine()) != null) {
            lineNo++;
            if (lineNo == 1 && line.startsWith("\uFEFF")) {
                line = line.substring(1);
            }
            String trimmed = line.strip();
            if (trimmed.isEmpty()) {
                continue;
            }
            if (trimmed.startsWith("#")) {
                int at = line.indexOf('#') + 1;
                while (at < line.length() && Character.isWhitespace(line.charAt(at))) {
                    at++;
                }
                if (line.startsWith(ABSENT, at)) {
                    holes.add(parseHole(line, at + ABSENT.length(), lineNo, source));
                }
                continue;
            }
            if (!header) {
                checkHeader(line, lineNo, source);
                header = true;
                continue;
            }
            splitRow(line, lineNo, source, starts, vals);
            Key key = new Key(vals[0], vals[1]);
            Table table = tables.get(key);
            if (table == null) {
                checkComposition(vals[0], vals[1], starts, lineNo, source);
                table = new Table(lineNo, starts[0] + 1);
                tables.put(key, table);
            }
            Row row = new Row(vals[2], vals[3], vals[4], lineNo, starts[2] + 1, starts[3] + 1);
            Row other = table.seen.putIfAbsent(new Point(vals[2], vals[3]), row);
            if (other != null) {
                throw new DataFormatException(source, lineNo, starts[0] + 1,
                        "duplicate point X=" + vals[0] + ", Z=" + vals[1] + ", log_T=" + vals[2] + ", log_R="
                                + vals[3] + " (first given on line " + other.line + ")");
            }
            table.rows.add(row);
        }
        if (!header) {
            throw new DataFormatException(source, 0, 0, "no header line: expected '" + HEADER + "'");
        }
        if (tables.isEmpty()) {
            throw new DataFormatException(source, 0, 0, "no data rows after the header");
        }
        for (Hole h : holes) {
            Table t = tables.get(new Key(h.x, h.z));
            if (t == null) {
                throw new DataFormatException(source, h.line, 1,
                        "'# absent:' names X=" + h.x + ", Z=" + h.z + " but the file has no rows for that composition");
            }
            t.holes.add(h);
        }
        List<OpacityGrid> grids = new ArrayList<>();
        List<double[]> axes = new ArrayList<>();
        for (Map.Entry<Key, Table> e : tables.entrySet()) {
            grids.add(buildGrid(e.getKey(), e.getValue(), source, axes));
        }
        return new OpacityTableSet(source, grids, true);
    }

    private static OpacityGrid buildGrid(Key key, Table table, String source, List<double[]> axes) {
        String name = "table X=" + key.x + ", Z=" + key.z;
        TreeSet<Double> ts = new TreeSet<>();
        TreeSet<Double> rs = new TreeSet<>();
        for (Row row : table.rows) {
            ts.add(row.t);
            rs.add(row.r);
        }
        double[] logT = ts.stream().mapToDouble(Double::doubleValue).toArray();
        double[] logR = rs.stream().mapToDouble(Double::doubleValue).toArray();
        int nt = logT.length;
        int nr = logR.length;
        // how many declared holes cover each node: a 2-D difference array over the axes, summed once,
        // so the cost is O(rows + holes + nodes) however many holes there are
        int[] cover = new int[(nt + 1) * (nr + 1)];
        for (Hole h : table.holes) {
            int i0 = firstAtLeast(logT, h.tLo);
            int i1 = firstAtLeast(logT, Math.nextUp(h.tHi)) - 1;
            int j0 = firstAtLeast(logR, h.rLo);
            int j1 = firstAtLeast(logR, Math.nextUp(h.rHi)) - 1;
            if (i0 <= i1 && j0 <= j1) {
                cover[i0 * (nr + 1) + j0]++;
                cover[i0 * (nr + 1) + j1 + 1]--;
                cover[(i1 + 1) * (nr + 1) + j0]--;
                cover[(i1 + 1) * (nr + 1) + j1 + 1]++;
            }
        }
        for (int i = 0; i <= nt; i++) {
            for (int j = 0; j <= nr; j++) {
                int at = i * (nr + 1) + j;
                cover[at] += (i > 0 ? cover[at - nr - 1] : 0) + (j > 0 ? cover[at - 1] : 0)
                        - (i > 0 && j > 0 ? cover[at - nr - 2] : 0);
            }
        }
        int[] rowsAtT = new int[nt];
        int[] rowsAtR = new int[nr];
        for (Row row : table.rows) {
            int i = Arrays.binarySearch(logT, row.t);
            int j = Arrays.binarySearch(logR, row.r);
            if (cover[i * (nr + 1) + j] > 0) {
                Hole h = table.holes.stream().filter(o -> o.covers(row.t, row.r)).findFirst().orElseThrow();
                throw new DataFormatException(source, row.line, row.colT,
                        "point log_T=" + row.t + ", log_R=" + row.r + " of " + name
                                + " lies inside the hole declared on line " + h.line);
            }
            rowsAtT[i]++;
            rowsAtR[j]++;
        }
        Row first = table.rows.get(0);
        if (nt < 2) {
            throw new DataFormatException(source, first.line, first.colT,
                    name + " has a single log_T value (" + ts.first() + "); an axis needs at least 2 values");
        }
        if (nr < 2) {
            throw new DataFormatException(source, first.line, first.colR,
                    name + " has a single log_R value (" + rs.first() + "); an axis needs at least 2 values");
        }
        double[][] v = new double[nt][nr];
        for (double[] row : v) {
            Arrays.fill(row, Double.NaN);
        }
        for (Row row : table.rows) {
            v[Arrays.binarySearch(logT, row.t)][Arrays.binarySearch(logR, row.r)] = row.v;
        }
        for (int i = 0; i < nt; i++) {
            for (int j = 0; j < nr; j++) {
                if (Double.isNaN(v[i][j]) && cover[i * (nr + 1) + j] == 0) {
                    throw notRectangular(source, key, name, table, logT, logR, rowsAtT, rowsAtR, i, j);
                }
            }
        }
        logT = share(logT, axes);
        logR = share(logR, axes);
        OpacityGrid grid = new OpacityGrid(key.x, key.z, logT, logR, v);
        if (!grid.complete()) {
            boolean any = false;
            for (int i = 0; i < logT.length - 1 && !any; i++) {
                for (int j = 0; j < logR.length - 1 && !any; j++) {
                    any = grid.fallbackRow(i, j) == -1;
                }
            }
            if (!any) {
                throw new DataFormatException(source, table.firstLine, table.firstColX,
                        name + " has no complete cell (four present corners) once its holes are removed");
            }
        }
        return grid;
    }


    /** Two axis values closer than this fraction of the axis's mean spacing are taken as one value written twice. */
    static final double OFF_AXIS = 1e-6;

    /** @return the first index whose value is &gt;= v (the length when none is) */
    private static int firstAtLeast(double[] axis, double v) {
        int lo = 0;
        int hi = axis.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (axis[mid] < v) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /**
     * The error for an undeclared missing node (i, j). When an axis holds two values closer than
     * {@link #OFF_AXIS} of its spacing, the rarer one (on a tie, the longer decimal) is a row written
     * slightly off the grid: the
     * error points at that row. Otherwise it names the missing node, points at a row next to it,
     * and shows the {@code # absent:} line that would declare it.
     */
    private static DataFormatException notRectangular(String source, Key key, String name, Table table,
                                                      double[] logT, double[] logR, int[] rowsAtT, int[] rowsAtR,
                                                      int i, int j) {
        for (int axis = 0; axis < 2; axis++) {
            double[] a = axis == 0 ? logT : logR;
            int[] count = axis == 0 ? rowsAtT : rowsAtR;
            double spacing = (a[a.length - 1] - a[0]) / (a.length - 1);
            for (int k = 0; k + 1 < a.length; k++) {
                if (a[k + 1] - a[k] < OFF_AXIS * spacing) {
                    // the value fewer rows use is the odd one; on a tie, the one with more digits
                    int odd = count[k] != count[k + 1] ? (count[k] < count[k + 1] ? k : k + 1)
                            : Double.toString(a[k]).length() >= Double.toString(a[k + 1]).length() ? k : k + 1;
                    int other = odd == k ? k + 1 : k;
                    String field = axis == 0 ? "log_T" : "log_R";
                    for (Row row : table.rows) {
                        if ((axis == 0 ? row.t : row.r) == a[odd]) {
                            return new DataFormatException(source, row.line, axis == 0 ? row.colT : row.colR,
                                    field + "=" + a[odd] + " is off the grid of " + name + ": " + count[other]
                                            + " other rows have " + field + "=" + a[other] + " (a difference of "
                                            + (float) Math.abs(a[odd] - a[other]) + "), and " + count[odd]
                                            + (count[odd] == 1 ? " row has" : " rows have") + " this value; write "
                                            + field + "=" + a[other] + " here");
                        }
                    }
                }
            }
        }
        Row near = null;
        for (Row row : table.rows) {
            if (row.t == logT[i] && (near == null || Math.abs(row.r - logR[j]) < Math.abs(near.r - logR[j]))) {
                near = row;
            }
        }
        if (near == null) {
            near = table.rows.get(0);
        }
        return new DataFormatException(source, near.line, near.colR,
                "grid of " + name + " is not rectangular: no row for log_T=" + logT[i] + ", log_R=" + logR[j]
                        + " (this row is its neighbour); add it, or declare it with '# " + ABSENT + " X=" + key.x
                        + " Z=" + key.z + " log_T=" + logT[i] + " log_R=" + logR[j] + "'");
    }

    private static double[] share(double[] axis, List<double[]> axes) {
        for (double[] a : axes) {
            if (Arrays.equals(a, axis)) {
                return a;
            }
        }
        axes.add(axis);
        return axis;
    }

    private static void checkHeader(String line, int lineNo, String source) {
        String[] parts = line.split(",", -1);
        int col = 1;
        for (int k = 0; k < Math.max(parts.length, COLUMNS.length); k++) {
            String got = k < parts.length ? parts[k].strip() : null;
            if (k >= COLUMNS.length || got == null || !got.equals(COLUMNS[k])) {
                throw new DataFormatException(source, lineNo, k < parts.length ? col : line.length() + 1,
                        "wrong header: expected '" + HEADER + "', field " + (k + 1) + " is "
                                + (got == null ? "missing" : "'" + got + "'")
                                + (k < COLUMNS.length ? " instead of '" + COLUMNS[k] + "'" : ""));
            }
            col += parts[k].length() + 1;
        }
    }

    /** Splits a data row into five numbers; starts[k] gets the 0-based start column of field k. */
    private static void splitRow(String line, int lineNo, String source, int[] starts, double[] vals) {
        int field = 0;
        int begin = 0;
        int len = line.length();
        while (true) {
            int comma = line.indexOf(',', begin);
            int end = comma < 0 ? len : comma;
            if (field >= 5) {
                throw new DataFormatException(source, lineNo, begin + 1,
                        "too many fields: expected 5 (" + HEADER + ")");
            }
            String raw = line.substring(begin, end);
            int lead = 0;
            while (lead < raw.length() && Character.isWhitespace(raw.charAt(lead))) {
                lead++;
            }
            String text = raw.strip();
            starts[field] = begin + lead;
            int col = begin + lead + 1;
            if (text.isEmpty()) {
                throw new DataFormatException(source, lineNo, col, COLUMNS[field] + " is empty");
            }
            if (!isDecimal(text)) {
                if (NON_FINITE.matcher(text).matches()) {
                    throw new DataFormatException(source, lineNo, col, COLUMNS[field] + " is not finite: '" + text + "'");
                }
                throw new DataFormatException(source, lineNo, col, COLUMNS[field] + " is not a number: '" + text + "'");
            }
            double v = Double.parseDouble(text);
            if (!Double.isFinite(v)) {
                throw new DataFormatException(source, lineNo, col,
                        COLUMNS[field] + " is not finite: '" + text + "' overflows a double");
            }
            if (field == 4 && Math.abs(v) > MAX_ABS_LOG_KAPPA) {
                throw new DataFormatException(source, lineNo, col, "log_kappa = '" + text
                        + "' puts kappa beyond what a double holds with room for interpolation"
                        + " (|log_kappa| <= " + (int) MAX_ABS_LOG_KAPPA + "); check the column order ("
                        + HEADER + ") and the units (log10 of cm^2/g)");
            }
            vals[field] = v;
            field++;
            if (comma < 0) {
                break;
            }
            begin = comma + 1;
        }
        if (field < 5) {
            throw new DataFormatException(source, lineNo, len + 1,
                    "too few fields: expected 5 (" + HEADER + "), found " + field);
        }
    }

    /** [+-]? (digits [. digits?] | . digits) ([eE] [+-]? digits)? */
    static boolean isDecimal(String s) {
        int n = s.length();
        int i = 0;
        if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            i++;
        }
        int digits = 0;
        while (i < n && s.charAt(i) >= '0' && s.charAt(i) <= '9') {
            i++;
            digits++;
        }
        if (i < n && s.charAt(i) == '.') {
            i++;
            while (i < n && s.charAt(i) >= '0' && s.charAt(i) <= '9') {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return false;
        }
        if (i < n && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            i++;
            if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                i++;
            }
            int exp = 0;
            while (i < n && s.charAt(i) >= '0' && s.charAt(i) <= '9') {
                i++;
                exp++;
            }
            if (exp == 0) {
                return false;
            }
        }
        return i == n;
    }

    private static void checkComposition(double x, double z, int[] starts, int lineNo, String source) {
        if (x < 0) {
            throw new DataFormatException(source, lineNo, starts[0] + 1, "X = " + x + " is negative");
        }
        if (z < 0) {
            throw new DataFormatException(source, lineNo, starts[1] + 1, "Z = " + z + " is negative");
        }
        if (x + z > 1.0 + 1e-12) {
            throw new DataFormatException(source, lineNo, starts[1] + 1,
                    "X + Z = " + (x + z) + " exceeds 1 (X = " + x + ", Z = " + z + ")");
        }
    }

    private static Hole parseHole(String line, int from, int lineNo, String source) {
        Double x = null;
        Double z = null;
        double[] t = null;
        double[] r = null;
        int at = from;
        int len = line.length();
        while (true) {
            while (at < len && Character.isWhitespace(line.charAt(at))) {
                at++;
            }
            if (at >= len) {
                break;
            }
            int end = at;
            while (end < len && !Character.isWhitespace(line.charAt(end))) {
                end++;
            }
            String token = line.substring(at, end);
            int eq = token.indexOf('=');
            if (eq <= 0) {
                throw new DataFormatException(source, lineNo, at + 1,
                        "'# " + ABSENT + "' expects name=value items (X, Z, log_T, log_R), got '" + token + "'");
            }
            String name = token.substring(0, eq);
            String value = token.substring(eq + 1);
            int col = at + 1;
            switch (name) {
                case "X" -> x = holeNumber(value, lineNo, col, source);
                case "Z" -> z = holeNumber(value, lineNo, col, source);
                case "log_T" -> t = holeRange(value, lineNo, col, source);
                case "log_R" -> r = holeRange(value, lineNo, col, source);
                default -> throw new DataFormatException(source, lineNo, col,
                        "'# " + ABSENT + "' knows X, Z, log_T, log_R, not '" + name + "'");
            }
            at = end;
        }
        if (x == null || z == null || t == null || r == null) {
            throw new DataFormatException(source, lineNo, 1,
                    "'# " + ABSENT + "' needs all of X=, Z=, log_T=, log_R= (e.g. '# " + ABSENT
                            + " X=0.7 Z=0.02 log_T=3.75..4.0 log_R=0.5..1.0')");
        }
        return new Hole(x, z, t[0], t[1], r[0], r[1], lineNo);
    }

    private static double holeNumber(String text, int lineNo, int col, String source) {
        if (!isDecimal(text)) {
            throw new DataFormatException(source, lineNo, col, "'# " + ABSENT + "' value is not a number: '" + text + "'");
        }
        double v = Double.parseDouble(text);
        if (!Double.isFinite(v)) {
            throw new DataFormatException(source, lineNo, col, "'# " + ABSENT + "' value is not finite: '" + text + "'");
        }
        return v;
    }

    private static double[] holeRange(String text, int lineNo, int col, String source) {
        int dots = text.indexOf("..", text.startsWith("-") || text.startsWith("+") ? 1 : 0);
        if (dots < 0) {
            double v = holeNumber(text, lineNo, col, source);
            return new double[] {v, v};
        }
        double lo = holeNumber(text.substring(0, dots), lineNo, col, source);
        double hi = holeNumber(text.substring(dots + 2), lineNo, col, source);
        if (hi < lo) {
            throw new DataFormatException(source, lineNo, col, "'# " + ABSENT + "' range " + text + " is reversed");
        }
        return new double[] {lo, hi};
    }
}
