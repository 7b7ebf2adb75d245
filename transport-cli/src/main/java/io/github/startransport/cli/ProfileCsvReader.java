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
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * Reads a profile file: CSV, one header row of column names, then one zone per row, in cgs
 * units. Lines whose first non-blank character is {@code #} and blank lines are skipped
 * anywhere. Each record is one physical line (no line breaks inside quoted cells).
 *
 * <p>Zones may run centre to surface or surface to centre ({@link Profile} reverses the
 * latter). A file is refused whole with a {@link DataFormatException} naming file, 1-based line
 * and column: nothing half-read is ever used.
 */
final class ProfileCsvReader {
    /** A plain decimal number: sign, digits, optional fraction, optional exponent. */
    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setTrim(true).get();

    /**
     * A profile read from a file, with what the reader noticed and where each zone came from.
     *
     * @param profile   the validated profile
     * @param file      the file it was read from
     * @param notes     things the reader ignored, one sentence each
     * @param dataLines 1-based file line of each data row, in file order
     * @param columnAt  1-based file column of each of our columns that the file holds
     * @param map       the {@code --columns} map the file was read with
     */
    record Read(Profile profile, Path file, List<String> notes, int[] dataLines,
                Map<ProfileColumn, Integer> columnAt, ColumnMap map) {
        /**
         * Places an error about one zone of the profile in the file.
         *
         * @param e           an error naming a zone and a field of {@link #profile()}
         * @param centreFirst whether {@code e.zone()} counts from the centre (the order of the
         *                    profile and its diagnosis) rather than in file order
         * @return the error with file, 1-based line and column (0 where unknown)
         */
        DataFormatException locate(InvalidInputException e, boolean centreFirst) {
            int n = dataLines.length;
            int row = e.zone();
            if (row != InvalidInputException.NO_ZONE && centreFirst && profile != null && profile.wasReversed()) {
                row = n - 1 - row;
            }
            int line = row >= 0 && row < n ? dataLines[row] : 0;
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
    }

    private ProfileCsvReader() {
    }

    /**
     * @param file the profile file
     * @param map  {@code --columns}: which file header holds which of our columns
     * @return the profile and what the reader noticed
     * @throws DataFormatException when the file cannot be read or is malformed, or the profile
     *                             it holds is refused
     */
    static Read read(Path file, ColumnMap map) {
        String name = file.toString();
        List<String> lines = readLines(file);
        List<String> notes = new ArrayList<>();

        int headerLine = 0;
        List<String> header = null;
        List<Integer> rowsAt = new ArrayList<>();
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            String text = lines.get(i);
            if (i == 0 && text.startsWith("\uFEFF")) {
                text = text.substring(1);
            }
            String trimmed = text.strip();
            if (trimmed.isEmpty() || trimmed.startsWith("#")) {
                continue;
            }
            List<String> cells = cells(name, i + 1, text);
            if (header == null) {
                header = cells;
                headerLine = i + 1;
            } else {
                rows.add(cells);
                rowsAt.add(i + 1);
            }
        }
        if (header == null) {
            throw new DataFormatException(name, 0, 0, "no header row: the first line that is neither blank nor a"
                    + " # comment must name the columns, e.g. " + requiredHeaders());
        }
        Map<String, Integer> position = headerPositions(name, headerLine, header);

        EnumMap<ProfileColumn, Integer> source = new EnumMap<>(ProfileColumn.class);
        for (ProfileColumn c : ProfileColumn.values()) {
            String theirs = map.fileHeader(c);
            Integer at = position.get(theirs);
            if (at != null) {
                source.put(c, at);
            } else if (map.maps(c)) {
                throw new DataFormatException(name, headerLine, 0, "--columns maps " + c.header() + " onto '" + theirs
                        + "', but the header has no column '" + theirs + "'; it has " + header);
            } else if (c.required()) {
                throw new DataFormatException(name, headerLine, 0, "the required column " + c.header() + " ("
                        + c.unit() + ") is missing; the header has " + header + hint(header) + ". Name it "
                        + c.header() + " in the file, or map it with --columns " + c.header() + "=YOUR_NAME");
            }
        }
        for (int j = 0; j < header.size(); j++) {
            if (!source.containsValue(j)) {
                notes.add(name + ": column '" + header.get(j) + "' (column " + (j + 1) + ") is not a profile column;"
                        + " ignored");
            }
        }
        if (rows.isEmpty()) {
            throw new DataFormatException(name, headerLine, 0, "the header is followed by no data rows");
        }

        int n = rows.size();
        int[] dataLines = new int[n];
        EnumMap<ProfileColumn, double[]> columns = new EnumMap<>(ProfileColumn.class);
        source.keySet().forEach(c -> columns.put(c, new double[n]));
        for (int k = 0; k < n; k++) {
            int line = rowsAt.get(k);
            dataLines[k] = line;
            List<String> row = rows.get(k);
            if (row.size() != header.size()) {
                throw new DataFormatException(name, line, 0, "this row has " + row.size() + " cells but the header"
                        + " (line " + headerLine + ") names " + header.size() + " columns");
            }
            for (Map.Entry<ProfileColumn, Integer> e : source.entrySet()) {
                int j = e.getValue();
                String cell = row.get(j);
                if (!NUMBER.matcher(cell).matches()) {
                    throw new DataFormatException(name, line, j + 1, "column " + header.get(j) + " (column " + (j + 1)
                            + "): " + (cell.isEmpty() ? "the cell is empty" : "'" + cell + "' is not a number")
                            + "; expected a decimal number in " + e.getKey().unit() + ", e.g. 1.5e7");
                }
                columns.get(e.getKey())[k] = Double.parseDouble(cell);
            }
        }

        Map<ProfileColumn, Integer> columnAt = new EnumMap<>(ProfileColumn.class);
        source.forEach((c, j) -> columnAt.put(c, j + 1));
        Read unchecked = new Read(null, file, List.of(), dataLines, columnAt, map);
        Profile profile;
        try {
            profile = new Profile(name, columns);
        } catch (InvalidInputException e) {
            throw unchecked.locate(e, false);
        }
        return new Read(profile, file, List.copyOf(notes), dataLines, Map.copyOf(columnAt), map);
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

    private static List<String> readLines(Path file) {
        String name = file.toString();
        if (Files.isDirectory(file)) {
            throw new DataFormatException(name, 0, 0, "is a folder, not a profile file");
        }
        try {
            return Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new DataFormatException(name, 0, 0, "cannot be read: no such file");
        } catch (AccessDeniedException e) {
            throw new DataFormatException(name, 0, 0, "cannot be read: permission denied");
        } catch (CharacterCodingException e) {
            throw new DataFormatException(name, 0, 0, "cannot be read: not UTF-8 (or ASCII) text");
        } catch (IOException e) {
            throw new DataFormatException(name, 0, 0, "cannot be read: " + e);
        }
    }

    private static List<String> cells(String name, int line, String text) {
        try (CSVParser parser = CSVParser.parse(text, FORMAT)) {
            List<CSVRecord> records = parser.getRecords();
            if (records.size() != 1) {
                throw new DataFormatException(name, line, 0, "expected one CSV record on this line");
            }
            List<String> cells = new ArrayList<>();
            records.get(0).forEach(cells::add);
            return cells;
        } catch (IOException | UncheckedIOException e) {
            throw new DataFormatException(name, line, 0, "not valid CSV (" + e.getMessage() + ")");
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
