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
 * anywhere. Each record is one physical line (no line breaks inside quoted cells).
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
    /** Read buffer (bytes); a longer line grows it. */
    private static final int BUFFER = 1 << 20;
    /** Rows read before the column capacity is estimated from the file size. */
    private static final int SAMPLE_ROWS = 1024;
    /** Largest number of zones an array can hold. */
    static final int MAX_ZONES = Integer.MAX_VALUE - 16;

    /**
     * A profile read from a file, with what the reader noticed and where each zone came from.
     *
     * @param profile   the validated profile
     * @param file      the file it was read from
     * @param notes     things the reader ignored, one sentence each
     * @param columnAt  1-based file column of each of our columns that the file holds
     * @param map       the {@code --columns} map the file was read with
     */
    record Read(Profile profile, Path file, List<String> notes, Map<ProfileColumn, Integer> columnAt, ColumnMap map) {
        /**
         * Places an error about one zone of the profile in the file.
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
                    : "column " + map.fileHeader(c) + (map.maps(c) ? " (our " + c.header() + ")" : "")
                    + (at == null ? "" : " (column " + at + ")");
            String unit = e.unit() == null || e.unit().isEmpty() || "1".equals(e.unit()) ? "" : " " + e.unit();
            String where = line > 0 ? "data row " + (row + 1) + ", " : "";
            return new DataFormatException(file.toString(), line, at == null ? 0 : at,
                    where + column + ": the value " + e.value() + unit + " is refused; it must be " + e.requirement());
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
                for (int i = scan; i < end; i++) {
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
     * @param file the profile file
     * @param map  {@code --columns}: which file header holds which of our columns
     * @return the profile and what the reader noticed
     * @throws DataFormatException when the file cannot be read or is malformed, or the profile
     *                             it holds is refused
     */
    static Read read(Path file, ColumnMap map) {
        String name = file.toString();
        if (Files.isDirectory(file)) {
            throw new DataFormatException(name, 0, 0, "is a folder, not a profile file");
        }
        try (LineSource src = new LineSource(file)) {
            return read(file, map, src);
        } catch (NoSuchFileException e) {
            throw new DataFormatException(name, 0, 0, "cannot be read: no such file");
        } catch (AccessDeniedException e) {
            throw new DataFormatException(name, 0, 0, "cannot be read: permission denied");
        } catch (IOException e) {
            throw new DataFormatException(name, 0, 0, "cannot be read: " + e);
        }
    }

    private static Read read(Path file, ColumnMap map, LineSource src) throws IOException {
        String name = file.toString();
        List<String> notes = new ArrayList<>();
        List<String> header = null;
        long headerLine = 0;
        while (header == null && src.next()) {
            if (!src.skippable()) {
                header = cells(name, src.lineNo, decode(name, src));
                headerLine = src.lineNo;
            }
        }
        if (header == null) {
            throw new DataFormatException(name, 0, 0, "no header row: the first line that is neither blank nor a"
                    + " # comment must name the columns, e.g. " + requiredHeaders());
        }
        int hl = (int) headerLine;
        Map<String, Integer> position = headerPositions(name, hl, header);

        EnumMap<ProfileColumn, Integer> source = new EnumMap<>(ProfileColumn.class);
        for (ProfileColumn c : ProfileColumn.values()) {
            String theirs = map.fileHeader(c);
            Integer at = position.get(theirs);
            if (at != null) {
                source.put(c, at);
            } else if (map.maps(c)) {
                throw new DataFormatException(name, hl, 0, "--columns maps " + c.header() + " onto '" + theirs
                        + "', but the header has no column '" + theirs + "'; it has " + header);
            } else if (c.required()) {
                throw new DataFormatException(name, hl, 0, "the required column " + c.header() + " ("
                        + c.unit() + ") is missing; the header has " + header + hint(header) + ". Name it "
                        + c.header() + " in the file, or map it with --columns " + c.header() + "=YOUR_NAME");
            }
        }
        int width = header.size();
        // slot[j]: which of our columns file column j fills, or -1
        ProfileColumn[] ours = source.keySet().toArray(new ProfileColumn[0]);
        int[] slot = new int[width];
        Arrays.fill(slot, -1);
        for (int s = 0; s < ours.length; s++) {
            slot[source.get(ours[s])] = s;
        }
        for (int j = 0; j < width; j++) {
            if (slot[j] < 0) {
                notes.add(name + ": column '" + header.get(j) + "' (column " + (j + 1) + ") is not a profile column;"
                        + " ignored");
            }
        }

        Columns columns = new Columns(ours.length, SAMPLE_ROWS);
        long firstDataOffset = -1;
        MemoryAdvice.reading(file, src.size);
        while (src.next()) {
            if (src.skippable()) {
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
            if (!row(src, slot, width, columns)) {
                slowRow(name, src, header, slot, ours, columns, hl);
            }
            checkRow(name, src, header, slot, ours, columns, hl);
        }
        if (columns.size == 0) {
            throw new DataFormatException(name, hl, 0, "the header is followed by no data rows");
        }
        MemoryAdvice.progress(columns.size, src.consumed);

        Map<ProfileColumn, Integer> columnAt = new EnumMap<>(ProfileColumn.class);
        source.forEach((c, j) -> columnAt.put(c, j + 1));
        EnumMap<ProfileColumn, double[]> values = new EnumMap<>(ProfileColumn.class);
        for (int s = 0; s < ours.length; s++) {
            values.put(ours[s], columns.trimmed(s));
        }
        columns = null;
        Read unchecked = new Read(null, file, List.of(), columnAt, map);
        Profile profile;
        try {
            profile = new Profile(name, values);
        } catch (InvalidInputException e) {
            throw unchecked.locate(e, false);
        }
        return new Read(profile, file, List.copyOf(notes), Map.copyOf(columnAt), map);
    }

    /** Our columns while they grow: one array per column. */
    private static final class Columns {
        double[][] v;
        int size;
        /** Per row: the number of cells seen, or -1 when a number was refused (set by the row parser). */
        int cells;
        int badColumn = -1;

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
    }

    /**
     * Splits the current line at commas and parses the cells of our columns into row
     * {@code size - 1}. Sets {@code columns.cells}, and {@code columns.badColumn} to the first
     * file column whose cell is not a number.
     *
     * @return {@code false} when the line holds a double quote (the slow path reads it)
     */
    private static boolean row(LineSource src, int[] slot, int width, Columns columns) {
        byte[] b = src.buf;
        int end = src.to;
        int k = columns.size - 1;
        int j = 0;
        int i = src.from;
        columns.badColumn = -1;
        while (true) {
            int cellEnd = i;
            while (cellEnd < end && b[cellEnd] != ',') {
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
                double value = NumberSyntax.parse(b, a, z);
                if (Double.isNaN(value)) {
                    if (columns.badColumn < 0) {
                        columns.badColumn = j;
                    }
                } else {
                    columns.v[slot[j]][k] = value;
                }
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

    /** A line with quotes: parsed by commons-csv, then the same checks. */
    private static void slowRow(String name, LineSource src, List<String> header, int[] slot, ProfileColumn[] ours,
                                Columns columns, int headerLine) {
        List<String> cells = cells(name, src.lineNo, decode(name, src));
        int k = columns.size - 1;
        columns.badColumn = -1;
        for (int j = 0; j < cells.size() && j < slot.length; j++) {
            if (slot[j] >= 0) {
                double v = NumberSyntax.parse(cells.get(j));
                if (Double.isNaN(v)) {
                    if (columns.badColumn < 0) {
                        columns.badColumn = j;
                    }
                } else {
                    columns.v[slot[j]][k] = v;
                }
            }
        }
        columns.cells = cells.size();
    }

    private static void checkRow(String name, LineSource src, List<String> header, int[] slot, ProfileColumn[] ours,
                                 Columns columns, int headerLine) {
        int line = (int) Math.min(Integer.MAX_VALUE, src.lineNo);
        if (columns.cells != header.size()) {
            throw new DataFormatException(name, line, 0, "this row has " + columns.cells + " cells but the header"
                    + " (line " + headerLine + ") names " + header.size() + " columns");
        }
        int j = columns.badColumn;
        if (j >= 0) {
            String cell = cells(name, src.lineNo, decode(name, src)).get(j);
            throw new DataFormatException(name, line, j + 1, "column " + header.get(j) + " (column " + (j + 1)
                    + "): " + (cell.isEmpty() ? "the cell is empty" : "'" + cell + "' is not a number")
                    + "; expected a decimal number in " + ours[slot[j]].unit() + ", e.g. 1.5e7");
        }
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

    private static String hint(List<String> header) {
        for (String h : header) {
            ProfileColumn c = ColumnMap.ourColumn(h);
            if (c != null && !c.header().equals(h)) {
                return " ('" + h + "' looks like " + c.header() + ": --columns " + c.header() + "=" + h + ")";
            }
        }
        return "";
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

    private static List<String> cells(String name, long line, String text) {
        int l = (int) Math.min(Integer.MAX_VALUE, line);
        try (CSVParser parser = CSVParser.parse(text, FORMAT)) {
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

    private static Map<String, Integer> headerPositions(String name, int line, List<String> header) {
        Map<String, Integer> position = new HashMap<>();
        for (int j = 0; j < header.size(); j++) {
            String h = header.get(j);
            if (h.isEmpty()) {
                throw new DataFormatException(name, line, j + 1, "the header's column " + (j + 1) + " has no name");
            }
            Integer earlier = position.putIfAbsent(h, j);
            if (earlier != null) {
                throw new DataFormatException(name, line, j + 1, "the header names '" + h + "' twice (columns "
                        + (earlier + 1) + " and " + (j + 1) + ")");
            }
        }
        return position;
    }
}
