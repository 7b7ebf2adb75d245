package io.github.startransport.cli;

import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads a profile file: CSV, one header row of column names, then one zone per row, in cgs
 * units. Lines whose first non-blank character is {@code #} and blank lines are skipped
 * anywhere; a comment {@code # name = value} is kept as a {@link Property} (e.g.
 * {@code # age_yr = 1.5e9}). Each record is one physical line (no line breaks inside quoted
 * cells). Cells are separated by commas, or by the {@link Delimiter} given.
 *
 * <p>Header names are matched to our columns: a {@code --columns} map first, then our header
 * names exactly, then our names in any case and our aliases ({@link ColumnMap#ourColumn}). A
 * header that lacks a required column is refused with a hint that works when copied.
 *
 * <p>The file is streamed: bytes are split into cells in place, and the cells of our columns
 * go straight into growing {@code double} columns ({@link NumberSyntax}, no object per cell); cells of other columns
 * are counted, not parsed. Memory is the profile's columns (8 bytes per zone and column) plus
 * one buffer. A line holding a double quote takes a slower path through commons-csv.
 *
 * <p>Zones may run centre to surface or surface to centre ({@link Profile} reverses the
 * latter). A file is refused whole with a {@link DataFormatException} naming file, 1-based line
 * and column: nothing half-read is ever used.
 */
final class ProfileCsvReader {
    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setTrim(true).get();
    /** Smallest profile the library accepts (zones). */
    static final int MIN_ZONES = 3;
    /** Read buffer (bytes); a longer line grows it. */
    private static final int BUFFER = 1 << 20;
    /** Rows read before the column capacity is estimated from the file size. */
    private static final int SAMPLE_ROWS = 1024;
    /** Largest number of zones an array can hold. */
    static final int MAX_ZONES = Integer.MAX_VALUE - 16;

    /**
     * A comment line {@code # name = value} of a profile file.
     *
     * @param name   the name, e.g. {@code age_yr}
     * @param value  the text after {@code =}, trimmed
     * @param line   1-based file line
     * @param column 1-based column (character) where the value starts
     */
    record Property(String name, String value, int line, int column) {
    }

    /**
     * A profile read from a file, with what the reader noticed and where each zone came from.
     *
     * @param profile    the validated profile
     * @param file       the file it was read from
     * @param notes      things the reader ignored or inferred, one sentence each
     * @param warnings   things in the file that may not mean what it says (numbers that underflowed to 0)
     * @param columnAt   1-based file column of each of our columns that the file holds
     * @param map        the {@code --columns} map the file was read with
     * @param delimiter  what separates its cells
     * @param properties its {@code # name = value} comment lines, in file order
     */
    record Read(Profile profile, Path file, List<String> notes, List<String> warnings,
                Map<ProfileColumn, Integer> columnAt, ColumnMap map, Delimiter delimiter, List<Property> properties) {
        /**
         * Places an error about one zone of the profile in the file, quoting the file's own text.
         *
         * @param e           an error naming a zone and a field of {@link #profile()}
         * @param centreFirst whether {@code e.zone()} counts from the centre (the order of the
         *                    profile and its diagnosis) rather than in file order
         * @return the error with file, 1-based line and column (0 where unknown)
         */
        DataFormatException locate(InvalidInputException e, boolean centreFirst) {
            int row = e.zone();
            if (row != InvalidInputException.NO_ZONE && centreFirst && profile != null && profile.wasReversed()) {
                row = profile.size() - 1 - row;
            }
            int line = row >= 0 ? lineOfRow(file, row) : 0;
            ProfileColumn c = ProfileColumn.byHeader(e.field());
            Integer at = c == null ? null : columnAt.get(c);
            String column = c == null ? "field " + e.field()
                    : "column " + Text.shorten(map.fileHeader(c)) + (map.maps(c) ? " (our " + c.header() + ")" : "")
                    + (at == null ? "" : " (column " + at + ")");
            String unit = e.unit() == null || e.unit().isEmpty() || "1".equals(e.unit()) ? "" : " " + e.unit();
            String where = line > 0 ? "data row " + (row + 1) + ", " : "";
            String written = line > 0 && at != null ? cellText(file, line, at, delimiter) : null;
            String value;
            if (written == null) {
                value = "the value " + Text.number(e.value()) + unit;
            } else {
                double read = NumberSyntax.parse(written.trim());
                value = "'" + Text.shorten(written.trim()) + "'" + unit + (Double.compare(read, e.value()) == 0
                        && !(read == 0.0 && NumberSyntax.nonZeroDigits(written)) ? ""
                        : " (read as " + Text.number(e.value()) + ")");
            }
            return new DataFormatException(file.toString(), line, at == null ? 0 : at,
                    where + column + ": " + value + " is refused; it must be " + e.requirement());
        }

        /** @return the 1-based file line of every data row, in file order (found by reading the file again) */
        int[] dataLines() {
            List<Integer> lines = new ArrayList<>();
            scanLines(file, (line, kind) -> {
                if (kind == LineKind.DATA) {
                    lines.add((int) line);
                }
                return true;
            });
            return lines.stream().mapToInt(Integer::intValue).toArray();
        }

        /**
         * @param name a property name, e.g. {@code age_yr}
         * @return every comment line giving it, in file order
         */
        List<Property> properties(String name) {
            return properties.stream().filter(p -> p.name().equals(name)).toList();
        }
    }

    private ProfileCsvReader() {
    }

    // ------------------------------------------------------------------ lines

    /** What a line of a profile file is. */
    enum LineKind {
        /** Blank or a comment. */
        SKIPPED,
        /** The header. */
        HEADER,
        /** A data row. */
        DATA
    }

    /** Receives each line while the file is scanned again; returns whether to go on. */
    private interface LineVisitor {
        boolean visit(long line, LineKind kind);
    }

    /** Reads the file again and names each line's kind; used only to place an error. */
    private static void scanLines(Path file, LineVisitor visitor) {
        try (LineSource src = new LineSource(file)) {
            boolean header = false;
            while (src.next()) {
                LineKind kind = src.skippable() ? LineKind.SKIPPED : header ? LineKind.DATA : LineKind.HEADER;
                header |= kind == LineKind.HEADER;
                if (!visitor.visit(src.lineNo, kind)) {
                    return;
                }
            }
        } catch (IOException e) {
            // the file changed or vanished since it was read: no line to name
        }
    }

    /** @return the 1-based line of data row {@code row} (0-based, file order), or 0 when not found */
    static int lineOfRow(Path file, int row) {
        long[] found = {0};
        int[] seen = {0};
        scanLines(file, (line, kind) -> {
            if (kind == LineKind.DATA && seen[0]++ == row) {
                found[0] = line;
                return false;
            }
            return true;
        });
        return found[0] > Integer.MAX_VALUE ? 0 : (int) found[0];
    }

    /**
     * The file's lines as byte ranges of one buffer: {@link #next()} makes
     * {@code buf[from, to)} the next line without its end-of-line bytes.
     */
    private static final class LineSource implements AutoCloseable {
        private static final long NEWLINES = EightBytes.repeated((byte) '\n');
        final FileChannel channel;
        final long size;
        byte[] buf = new byte[BUFFER];
        int start;
        int end;
        boolean eof;
        long lineNo;
        long consumed;
        /** Offset in the file of the current line's first byte. */
        long lineOffset;
        int from;
        int to;

        LineSource(Path file) throws IOException {
            channel = FileChannel.open(file, StandardOpenOption.READ);
            size = channel.size();
        }

        /** @return whether a line was found */
        boolean next() throws IOException {
            int scan = start;
            while (true) {
                int i = scan;
                for (; i + 8 <= end; i += 8) {
                    long marks = EightBytes.matches(EightBytes.at(buf, i), NEWLINES);
                    if (marks != 0) {
                        int at = i + EightBytes.first(marks);
                        take(at, at + 1);
                        return true;
                    }
                }
                for (; i < end; i++) {
                    if (buf[i] == '\n') {
                        take(i, i + 1);
                        return true;
                    }
                }
                scan = end;
                if (eof) {
                    if (start < end) {
                        take(end, end);
                        return true;
                    }
                    return false;
                }
                if (start > 0) {
                    System.arraycopy(buf, start, buf, 0, end - start);
                    scan -= start;
                    end -= start;
                    start = 0;
                }
                if (end == buf.length) {
                    if (buf.length >= Integer.MAX_VALUE / 2) {
                        throw new IOException("a line longer than " + buf.length + " bytes");
                    }
                    buf = Arrays.copyOf(buf, buf.length * 2);
                }
                int n = channel.read(ByteBuffer.wrap(buf, end, buf.length - end));
                if (n < 0) {
                    eof = true;
                } else {
                    end += n;
                }
            }
        }

        private void take(int lineEnd, int next) {
            lineNo++;
            lineOffset = consumed;
            from = start;
            to = lineEnd > start && buf[lineEnd - 1] == '\r' ? lineEnd - 1 : lineEnd;
            if (lineNo == 1 && to - from >= 3 && buf[from] == (byte) 0xEF && buf[from + 1] == (byte) 0xBB
                    && buf[from + 2] == (byte) 0xBF) {
                from += 3;
            }
            consumed += next - start;
            start = next;
        }

        /** @return whether the current line is blank or a comment */
        boolean skippable() {
            int i = from;
            while (i < to && (buf[i] == ' ' || buf[i] == '\t')) {
                i++;
            }
            return i == to || buf[i] == '#';
        }

        @Override
        public void close() throws IOException {
            channel.close();
        }
    }

    // ------------------------------------------------------------------ reading

    /**
     * @param file the profile file, comma-separated
     * @param map  {@code --columns}: which file header holds which of our columns
     * @return the profile and what the reader noticed
     * @throws DataFormatException when the file cannot be read or is malformed, or the profile
     *                             it holds is refused
     */
    static Read read(Path file, ColumnMap map) {
        return read(file, map, Delimiter.COMMA);
    }

    /**
     * @param file      the profile file
     * @param map       {@code --columns}: which file header holds which of our columns
     * @param delimiter what separates its cells
     * @return the profile and what the reader noticed
     * @throws DataFormatException when the file cannot be read or is malformed, or the profile
     *                             it holds is refused
     */
    static Read read(Path file, ColumnMap map, Delimiter delimiter) {
        String name = file.toString();
        if (Files.isDirectory(file)) {
            throw new DataFormatException(name, 0, 0, "is a folder, not a profile file");
        }
        try (LineSource src = new LineSource(file)) {
            return read(file, map, delimiter, src);
        } catch (NoSuchFileException e) {
            throw new DataFormatException(name, 0, 0, "cannot be read: no such file");
        } catch (AccessDeniedException e) {
            throw new DataFormatException(name, 0, 0, "cannot be read: permission denied");
        } catch (IOException e) {
            throw new DataFormatException(name, 0, 0, "cannot be read: " + e);
        }
    }

    private static Read read(Path file, ColumnMap map, Delimiter delimiter, LineSource src) throws IOException {
        String name = file.toString();
        List<String> notes = new ArrayList<>();
        List<Property> properties = new ArrayList<>();
        List<String> header = null;
        String headerText = null;
        long headerLine = 0;
        while (header == null && src.next()) {
            if (src.skippable()) {
                property(src, properties);
            } else {
                headerText = decode(name, src);
                header = cells(name, src.lineNo, headerText, delimiter);
                headerLine = src.lineNo;
            }
        }
        if (header == null) {
            throw new DataFormatException(name, 0, 0, "no header row: the first line that is neither blank nor a"
                    + " # comment must name the columns, e.g. " + requiredHeaders());
        }
        int hl = (int) headerLine;
        Map<String, Integer> position = headerPositions(name, hl, header);
        EnumMap<ProfileColumn, Integer> source = HeaderMatch.resolve(name, hl, header, headerText, position, map,
                delimiter, notes);

        int width = header.size();
        // slot[j]: which of our columns file column j fills, or -1
        ProfileColumn[] ours = source.keySet().toArray(new ProfileColumn[0]);
        int[] slot = new int[width];
        Arrays.fill(slot, -1);
        for (int s = 0; s < ours.length; s++) {
            slot[source.get(ours[s])] = s;
        }

        Columns columns = new Columns(ours.length, SAMPLE_ROWS);
        long firstDataOffset = -1;
        MemoryAdvice.reading(file, src.size);
        byte sep = (byte) delimiter.character();
        boolean runs = delimiter == Delimiter.WHITESPACE;
        while (src.next()) {
            if (src.skippable()) {
                property(src, properties);
                continue;
            }
            int n = columns.size;
            if (n == SAMPLE_ROWS) {
                // room for the whole file, estimated from the bytes per row so far
                double perRow = (double) (src.consumed - firstDataOffset) / (n + 1);
                columns.reserve((long) Math.ceil((src.size - firstDataOffset) / perRow * 1.02) + 16);
            } else if (n == 0) {
                firstDataOffset = src.lineOffset;
            }
            if (n >= MAX_ZONES) {
                throw new DataFormatException(name, 0, 0, "holds more than " + MAX_ZONES + " zones; split the profile");
            }
            if ((n & 0xFFFF) == 0) {
                MemoryAdvice.progress(n, src.consumed);
            }
            columns.add();
            if (runs) {
                rowOfRuns(src, slot, width, columns);
            } else if (!row(src, sep, slot, width, columns)) {
                slowRow(name, src, slot, columns, delimiter);
            }
            checkRow(name, src, header, slot, ours, columns, hl, delimiter);
        }
        if (columns.size < MIN_ZONES) {
            throw new DataFormatException(name, hl, 0, columns.size == 0 ? "the header is followed by no data rows;"
                    + " a profile needs at least " + MIN_ZONES + " zones"
                    : "a profile needs at least " + MIN_ZONES + " zones (data rows); this one has " + columns.size);
        }
        MemoryAdvice.progress(columns.size, src.consumed);

        List<String> warnings = new ArrayList<>();
        if (columns.underflows > 0) {
            warnings.add(name + ":" + columns.underflowLine + ":" + (columns.underflowColumn + 1) + ": '"
                    + Text.shorten(columns.underflowText) + "' in column " + Text.shorten(header.get(columns.underflowColumn))
                    + " is smaller than the smallest double (4.9e-324) and was read as 0"
                    + (columns.underflows > 1 ? "; so were " + (columns.underflows - 1) + " more cells" : ""));
        }
        Map<ProfileColumn, Integer> columnAt = new EnumMap<>(ProfileColumn.class);
        source.forEach((c, j) -> columnAt.put(c, j + 1));
        EnumMap<ProfileColumn, double[]> values = new EnumMap<>(ProfileColumn.class);
        for (int s = 0; s < ours.length; s++) {
            values.put(ours[s], columns.trimmed(s));
        }
        columns = null;
        Read unchecked = new Read(null, file, List.of(), List.of(), columnAt, map, delimiter, List.of());
        Profile profile;
        try {
            profile = new Profile(name, values);
        } catch (InvalidInputException e) {
            throw unchecked.locate(e, false);
        }
        return new Read(profile, file, List.copyOf(notes), List.copyOf(warnings), Map.copyOf(columnAt), map, delimiter,
                List.copyOf(properties));
    }

    /** Keeps a comment line of the form {@code # name = value}. */
    private static void property(LineSource src, List<Property> properties) {
        int i = src.from;
        while (i < src.to && (src.buf[i] == ' ' || src.buf[i] == '\t')) {
            i++;
        }
        if (i == src.to || src.buf[i] != '#') {
            return;
        }
        int eq = -1;
        for (int k = i + 1; k < src.to && k - i < 200; k++) {
            if (src.buf[k] == '=') {
                eq = k;
                break;
            }
        }
        if (eq < 0) {
            return;
        }
        String key = new String(src.buf, i + 1, eq - i - 1, StandardCharsets.UTF_8).trim();
        if (!key.matches("[A-Za-z_][A-Za-z0-9_.]*")) {
            return;
        }
        int v = eq + 1;
        while (v < src.to && (src.buf[v] == ' ' || src.buf[v] == '\t')) {
            v++;
        }
        String value = new String(src.buf, v, src.to - v, StandardCharsets.UTF_8).trim();
        int column = new String(src.buf, src.from, v - src.from, StandardCharsets.UTF_8).length() + 1;
        properties.add(new Property(key, value, (int) Math.min(Integer.MAX_VALUE, src.lineNo), column));
    }

    /** Our columns while they grow: one array per column. */
    private static final class Columns {
        double[][] v;
        int size;
        /** Per row: the number of cells seen, or -1 when a number was refused (set by the row parser). */
        int cells;
        int badColumn = -1;
        /** Cells whose number is below the smallest double and was read as 0; the first one's place and text. */
        long underflows;
        long underflowLine;
        int underflowColumn;
        String underflowText;

        Columns(int count, int capacity) {
            v = new double[count][capacity];
        }

        void reserve(long capacity) {
            int c = (int) Math.min(MAX_ZONES, Math.max(capacity, size + 1L));
            if (v.length > 0 && c > v[0].length) {
                for (int s = 0; s < v.length; s++) {
                    v[s] = Arrays.copyOf(v[s], c);
                }
            }
        }

        void add() {
            if (v.length > 0 && size == v[0].length) {
                reserve(size + (size >> 2) + 16L);
            }
            size++;
        }

        double[] trimmed(int s) {
            double[] a = v[s];
            if (a.length != size) {
                a = Arrays.copyOf(a, size);
                v[s] = null;
            }
            return a;
        }

        /** Stores a parsed cell of file column j into row {@code size - 1}; notes refusals and underflows. */
        void put(LineSource src, int j, int slot, double value, int a, int z) {
            if (!(Math.abs(value) <= Double.MAX_VALUE)) {
                // not a number, or beyond the largest double: checkRow says which, quoting the cell
                if (badColumn < 0) {
                    badColumn = j;
                }
                return;
            }
            if (value == 0.0 && NumberSyntax.nonZeroDigits(src.buf, a, z)) {
                if (underflows++ == 0) {
                    underflowLine = src.lineNo;
                    underflowColumn = j;
                    underflowText = new String(src.buf, a, Math.min(z - a, 200), StandardCharsets.UTF_8);
                }
            }
            v[slot][size - 1] = value;
        }
    }

    /**
     * Splits the current line at {@code sep} and parses the cells of our columns into row
     * {@code size - 1}. Sets {@code columns.cells}, and {@code columns.badColumn} to the first
     * file column whose cell is not a finite number.
     *
     * @return {@code false} when the line holds a double quote (the slow path reads it)
     */
    private static final long QUOTES = EightBytes.repeated((byte) '"');

    private static boolean row(LineSource src, byte sep, int[] slot, int width, Columns columns) {
        byte[] b = src.buf;
        int end = src.to;
        int j = 0;
        int i = src.from;
        columns.badColumn = -1;
        long seps = EightBytes.repeated(sep);
        while (true) {
            int cellEnd = i;
            // eight bytes at a time to the first separator or quote, then byte by byte
            while (cellEnd + 8 <= end) {
                long word = EightBytes.at(b, cellEnd);
                long marks = EightBytes.matches(word, seps) | EightBytes.matches(word, QUOTES);
                if (marks != 0) {
                    cellEnd += EightBytes.first(marks);
                    break;
                }
                cellEnd += 8;
            }
            while (cellEnd < end && b[cellEnd] != sep) {
                if (b[cellEnd] == '"') {
                    return false;
                }
                cellEnd++;
            }
            if (j < width && slot[j] >= 0) {
                int a = i;
                int z = cellEnd;
                while (a < z && (b[a] == ' ' || b[a] == '\t')) {
                    a++;
                }
                while (z > a && (b[z - 1] == ' ' || b[z - 1] == '\t')) {
                    z--;
                }
                columns.put(src, j, slot[j], NumberSyntax.parse(b, a, z), a, z);
            }
            j++;
            if (cellEnd >= end) {
                break;
            }
            i = cellEnd + 1;
        }
        columns.cells = j;
        return true;
    }

    /** The row parser for {@link Delimiter#WHITESPACE}: cells are the runs of other bytes; no quoting. */
    private static void rowOfRuns(LineSource src, int[] slot, int width, Columns columns) {
        byte[] b = src.buf;
        int end = src.to;
        int j = 0;
        int i = src.from;
        columns.badColumn = -1;
        while (true) {
            while (i < end && (b[i] == ' ' || b[i] == '\t')) {
                i++;
            }
            if (i >= end) {
                break;
            }
            int cellEnd = i;
            while (cellEnd < end && b[cellEnd] != ' ' && b[cellEnd] != '\t') {
                cellEnd++;
            }
            if (j < width && slot[j] >= 0) {
                columns.put(src, j, slot[j], NumberSyntax.parse(b, i, cellEnd), i, cellEnd);
            }
            j++;
            i = cellEnd;
        }
        columns.cells = j;
    }

    /** A line with quotes: parsed by commons-csv, then the same checks. */
    private static void slowRow(String name, LineSource src, int[] slot, Columns columns, Delimiter delimiter) {
        List<String> cells = cells(name, src.lineNo, decode(name, src), delimiter);
        columns.badColumn = -1;
        for (int j = 0; j < cells.size() && j < slot.length; j++) {
            if (slot[j] >= 0) {
                String cell = cells.get(j);
                byte[] b = cell.getBytes(StandardCharsets.UTF_8);
                double v = NumberSyntax.parse(b, 0, b.length);
                if (Math.abs(v) <= Double.MAX_VALUE && v == 0.0 && NumberSyntax.nonZeroDigits(b, 0, b.length)
                        && columns.underflows++ == 0) {
                    columns.underflowLine = src.lineNo;
                    columns.underflowColumn = j;
                    columns.underflowText = Text.shorten(cell);
                } else if (!(Math.abs(v) <= Double.MAX_VALUE) && columns.badColumn < 0) {
                    columns.badColumn = j;
                }
                if (Math.abs(v) <= Double.MAX_VALUE) {
                    columns.v[slot[j]][columns.size - 1] = v;
                }
            }
        }
        columns.cells = cells.size();
    }

    private static void checkRow(String name, LineSource src, List<String> header, int[] slot, ProfileColumn[] ours,
                                 Columns columns, int headerLine, Delimiter delimiter) {
        int line = (int) Math.min(Integer.MAX_VALUE, src.lineNo);
        if (columns.cells != header.size()) {
            throw new DataFormatException(name, line, 0, "this row has " + columns.cells + " cells but the header"
                    + " (line " + headerLine + ") names " + header.size() + " columns");
        }
        int j = columns.badColumn;
        if (j >= 0) {
            String cell = cells(name, src.lineNo, decode(name, src), delimiter).get(j);
            String what = "column " + Text.shorten(header.get(j)) + " (column " + (j + 1) + "): ";
            ProfileColumn c = ours[slot[j]];
            if (cell.isEmpty()) {
                throw new DataFormatException(name, line, j + 1, what + "the cell is empty; expected a decimal number in "
                        + c.unit() + ", e.g. 1.5e7");
            }
            double v = NumberSyntax.parse(cell);
            if (Double.isInfinite(v)) {
                throw new DataFormatException(name, line, j + 1, what + "'" + Text.shorten(cell) + "' is larger than"
                        + " the largest double (1.8e308)");
            }
            throw new DataFormatException(name, line, j + 1, what + "'" + Text.shorten(cell) + "' is not a number;"
                    + " expected a decimal number in " + c.unit() + ", e.g. 1.5e7" + numberHint(cell, delimiter));
        }
    }

    /** Why a cell that looks numeric is not a number of our syntax, and what to write instead. */
    private static String numberHint(String cell, Delimiter delimiter) {
        String t = cell.trim();
        if (t.matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)[+-]\\d{3}")) {
            int sign = Math.max(t.lastIndexOf('+'), t.lastIndexOf('-'));
            return " (a Fortran number whose exponent lost its letter? write " + t.substring(0, sign) + "E"
                    + t.substring(sign) + ")";
        }
        if (delimiter != Delimiter.COMMA && t.matches("[+-]?\\d+,\\d+([eEdD][+-]?\\d+)?")) {
            return " (a decimal comma? write " + t.replace(',', '.') + ")";
        }
        return "";
    }

    private static String decode(String name, LineSource src) {
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(src.buf, src.from, src.to - src.from)).toString();
        } catch (CharacterCodingException e) {
            throw new DataFormatException(name, (int) Math.min(Integer.MAX_VALUE, src.lineNo), 0,
                    "cannot be read: not UTF-8 (or ASCII) text");
        }
    }

    private static String requiredHeaders() {
        StringBuilder b = new StringBuilder();
        for (ProfileColumn c : ProfileColumn.values()) {
            if (c.required()) {
                b.append(b.length() == 0 ? "" : ",").append(c.header());
            }
        }
        return b.toString();
    }

    /**
     * @param text one line
     * @return its cells, trimmed
     */
    static List<String> cells(String name, long line, String text, Delimiter delimiter) {
        int l = (int) Math.min(Integer.MAX_VALUE, line);
        if (delimiter == Delimiter.WHITESPACE) {
            String t = text.trim();
            return t.isEmpty() ? List.of("") : List.of(t.split("[ \\t]+"));
        }
        CSVFormat format = delimiter == Delimiter.COMMA ? FORMAT
                : FORMAT.builder().setDelimiter(delimiter.character()).get();
        try (CSVParser parser = CSVParser.parse(text, format)) {
            List<CSVRecord> records = parser.getRecords();
            if (records.size() != 1) {
                throw new DataFormatException(name, l, 0, "expected one CSV record on this line");
            }
            List<String> cells = new ArrayList<>();
            records.get(0).forEach(cells::add);
            return cells;
        } catch (IOException | UncheckedIOException e) {
            throw new DataFormatException(name, l, 0, "not valid CSV (" + e.getMessage() + ")");
        }
    }

    /** @return the text of cell {@code column} (1-based) on file line {@code line}, or {@code null} */
    static String cellText(Path file, int line, int column, Delimiter delimiter) {
        try (LineSource src = new LineSource(file)) {
            while (src.next()) {
                if (src.lineNo == line) {
                    List<String> cells = cells(file.toString(), line, decode(file.toString(), src), delimiter);
                    return column >= 1 && column <= cells.size() ? cells.get(column - 1) : null;
                }
            }
        } catch (IOException | RuntimeException e) {
            // the file changed or vanished since it was read: no text to quote
        }
        return null;
    }

    private static Map<String, Integer> headerPositions(String name, int line, List<String> header) {
        Map<String, Integer> position = new HashMap<>();
        for (int j = 0; j < header.size(); j++) {
            String h = header.get(j);
            if (h.isEmpty()) {
                throw new DataFormatException(name, line, j + 1, "the header's column " + (j + 1) + " has no name");
            }
            Integer earlier = position.putIfAbsent(h, j);
            if (earlier != null) {
                throw new DataFormatException(name, line, j + 1, "the header names '" + Text.shorten(h) + "' twice"
                        + " (columns " + (earlier + 1) + " and " + (j + 1) + ")");
            }
        }
        return position;
    }
}
