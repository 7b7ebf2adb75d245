package io.github.startransport.cli;

import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.ProfileColumn;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.StringJoiner;

/**
 * Which column of a profile file's header holds each of our columns, and, when a required one
 * is missing, a hint that works when copied into the next command line.
 *
 * <p>In order: a {@code --columns} map (THEIRS matched exactly); our header name exactly; our
 * name in another case or one of our aliases ({@link ColumnMap#ourColumn}), when exactly one
 * header name is such a name. Two header names that are both aliases of one column are refused
 * (which one is meant is a guess); so is a missing required column. Optional columns are taken
 * only by these rules, never guessed.
 */
final class HeaderMatch {
    /** First words of header names that probably hold a required column, lower case. */
    private static final Map<ProfileColumn, List<String>> WORDS = words();

    private HeaderMatch() {
    }

    private static Map<ProfileColumn, List<String>> words() {
        Map<ProfileColumn, List<String>> m = new EnumMap<>(ProfileColumn.class);
        m.put(ProfileColumn.RADIUS, List.of("r", "rad", "radius", "radii"));
        m.put(ProfileColumn.MASS, List.of("m", "mr", "mass", "mass_r"));
        m.put(ProfileColumn.TEMPERATURE, List.of("t", "temp", "temperature", "tem"));
        m.put(ProfileColumn.DENSITY, List.of("rho", "dens", "density", "den", "d"));
        m.put(ProfileColumn.PRESSURE, List.of("p", "pres", "press", "pressure", "ptot", "ptotal"));
        m.put(ProfileColumn.LUMINOSITY, List.of("l", "lr", "lum", "luminosity", "lumi"));
        m.put(ProfileColumn.HYDROGEN, List.of("x", "h1", "xh", "hyd", "hydrogen"));
        m.put(ProfileColumn.METALS, List.of("z", "zmet", "metals", "metallicity", "met", "metal"));
        return m;
    }

    /** How a header name relates to one of our columns. */
    private enum Kind {
        /** Probably the column itself, in our units. */
        SAME,
        /** Its logarithm. */
        LOG,
        /** In solar units. */
        SOLAR,
        /** A fraction of the star's total. */
        FRACTION
    }

    /**
     * @param name      file name, for messages
     * @param line      the header's line
     * @param header    the header's cells
     * @param text      the header line as written (for the delimiter hint)
     * @param position  header name to 0-based column
     * @param map       {@code --columns}
     * @param delimiter the delimiter the header was split with
     * @param notes     receives what was inferred and what is ignored
     * @return 0-based file column of each of our columns the file holds
     * @throws DataFormatException when a mapped name is absent, a column is ambiguous or a required one missing
     */
    static EnumMap<ProfileColumn, Integer> resolve(String name, int line, List<String> header, String text,
                                                   Map<String, Integer> position, ColumnMap map, Delimiter delimiter,
                                                   List<String> notes) {
        EnumMap<ProfileColumn, Integer> source = new EnumMap<>(ProfileColumn.class);
        boolean[] used = new boolean[header.size()];
        List<String> absent = new ArrayList<>();
        Map<String, ProfileColumn> corrected = new LinkedHashMap<>();
        boolean correctable = true;
        for (ProfileColumn c : ProfileColumn.values()) {
            if (!map.maps(c)) {
                continue;
            }
            String theirs = map.fileHeader(c);
            Integer at = position.get(theirs);
            if (at != null) {
                source.put(c, at);
                used[at] = true;
                corrected.put(theirs, c);
                continue;
            }
            absent.add("'" + Text.shorten(theirs) + "' (for " + c.header() + ")");
            String near = null;
            for (String h : header) {
                if (h.trim().equalsIgnoreCase(theirs.trim()) && h.indexOf(',') < 0 && h.indexOf(' ') < 0) {
                    near = h;
                }
            }
            if (near == null) {
                correctable = false;
            } else {
                corrected.put(near, c);
            }
        }
        if (!absent.isEmpty()) {
            throw new DataFormatException(name, line, 0, "--columns names " + String.join(" and ", absent)
                    + ", but the header has no such column; it has " + Text.list(header)
                    + (correctable ? ". Header names are matched exactly: rerun with --columns "
                    + columnsText(corrected) : "") + delimiterHint(text, delimiter, header.size()));
        }
        for (ProfileColumn c : ProfileColumn.values()) {
            Integer at = position.get(c.header());
            if (!source.containsKey(c) && at != null && !used[at]) {
                source.put(c, at);
                used[at] = true;
            }
        }
        StringJoiner byAlias = new StringJoiner(", ");
        List<String> ambiguous = new ArrayList<>();
        Map<String, ProfileColumn> choose = new LinkedHashMap<>();
        for (ProfileColumn c : ProfileColumn.values()) {
            if (source.containsKey(c)) {
                continue;
            }
            List<Integer> candidates = new ArrayList<>();
            for (int j = 0; j < header.size(); j++) {
                if (!used[j] && ColumnMap.ourColumn(header.get(j)) == c) {
                    candidates.add(j);
                }
            }
            if (candidates.size() == 1) {
                int j = candidates.get(0);
                source.put(c, j);
                used[j] = true;
                byAlias.add("'" + header.get(j) + "' as " + c.header() + " (" + unit(c) + ")");
            } else if (candidates.size() > 1) {
                StringJoiner names = new StringJoiner(" and ");
                candidates.forEach(j -> names.add("'" + header.get(j) + "' (column " + (j + 1) + ")"));
                ambiguous.add(names + " both name " + c.header());
                choose.put(header.get(candidates.get(0)), c);
            }
        }
        if (!ambiguous.isEmpty()) {
            Map<String, ProfileColumn> all = new LinkedHashMap<>(corrected);
            all.putAll(choose);
            throw new DataFormatException(name, line, 0, String.join("; ", ambiguous) + ": say which one to read,"
                    + " e.g. rerun with --columns " + columnsText(all));
        }
        List<ProfileColumn> missing = new ArrayList<>();
        for (ProfileColumn c : ProfileColumn.values()) {
            if (c.required() && !source.containsKey(c)) {
                missing.add(c);
            }
        }
        if (!missing.isEmpty()) {
            throw missing(name, line, header, text, used, missing, corrected, delimiter);
        }
        if (byAlias.length() > 0) {
            notes.add(name + ": read by their names " + byAlias + "; units as in our columns");
        }
        List<String> ignored = new ArrayList<>();
        for (int j = 0; j < header.size(); j++) {
            if (used[j]) {
                continue;
            }
            ProfileColumn c = ColumnMap.ourColumn(header.get(j));
            Integer from = c == null ? null : source.get(c);
            ignored.add("'" + Text.shorten(header.get(j)) + "' (column " + (j + 1) + ")"
                    + (from == null ? "" : ", because " + c.header() + " is read from '"
                    + Text.shorten(header.get(from)) + "'"));
        }
        if (!ignored.isEmpty()) {
            notes.add(name + ": " + (ignored.size() == 1 ? "this column is" : ignored.size() + " columns are")
                    + " not read: " + (ignored.size() <= Text.MOST_NAMES ? String.join(", ", ignored)
                    : String.join(", ", ignored.subList(0, Text.MOST_NAMES)) + ", ... and "
                    + (ignored.size() - Text.MOST_NAMES) + " more"));
        }
        return source;
    }

    /** The refusal of a header that lacks required columns, with what the other names look like. */
    private static DataFormatException missing(String name, int line, List<String> header, String text, boolean[] used,
                                               List<ProfileColumn> missing, Map<String, ProfileColumn> mapped,
                                               Delimiter delimiter) {
        StringJoiner names = new StringJoiner(", ");
        missing.forEach(c -> names.add(c.header() + " (" + unit(c) + ")"));
        StringBuilder b = new StringBuilder();
        b.append(missing.size() == 1 ? "the required column " + names + " is missing"
                : "the required columns " + names + " are missing");
        b.append("; the header has ").append(Text.list(header));
        String delimiterHint = delimiterHint(text, delimiter, header.size());
        if (!delimiterHint.isEmpty()) {
            return new DataFormatException(name, line, 0, b + delimiterHint);
        }
        Map<String, ProfileColumn> guesses = new LinkedHashMap<>();
        List<String> unusable = new ArrayList<>();
        boolean[] taken = used.clone();
        for (ProfileColumn c : missing) {
            for (int j = 0; j < header.size(); j++) {
                if (taken[j]) {
                    continue;
                }
                Kind kind = kind(c, header.get(j));
                if (kind == Kind.SAME) {
                    guesses.put(header.get(j), c);
                    taken[j] = true;
                    break;
                }
                if (kind != null) {
                    unusable.add("'" + Text.shorten(header.get(j)) + "' looks like " + switch (kind) {
                        case LOG -> "the logarithm of " + c.header() + ", not " + c.header() + " itself";
                        case SOLAR -> c.header() + " in solar units, not in " + unit(c);
                        default -> "a fraction of the star's total, not " + c.header() + " in " + unit(c);
                    });
                    taken[j] = true;
                    break;
                }
            }
        }
        if (!guesses.isEmpty()) {
            StringJoiner g = new StringJoiner(", ");
            guesses.forEach((h, c) -> g.add("'" + h + "' like " + c.header()));
            Map<String, ProfileColumn> all = new LinkedHashMap<>(mapped);
            all.putAll(guesses);
            b.append(". ").append(g).append(": if so, rerun with --columns ").append(columnsText(all))
                    .append(" (each item is the file's name = ours)");
        }
        if (!unusable.isEmpty()) {
            b.append(". ").append(String.join("; ", unusable))
                    .append(": the file needs a column in our units (cgs), which --columns cannot make");
        }
        if (guesses.size() + unusable.size() < missing.size()) {
            b.append(". Rename the file's column to ours, or map it with --columns, written THEIRS=OURS (the file's"
                    + " header name, then ours)");
        }
        return new DataFormatException(name, line, 0, b.toString());
    }

    /** A {@code --columns} value: each item file header = our header, quoted for a shell where needed. */
    private static String columnsText(Map<String, ProfileColumn> items) {
        StringJoiner j = new StringJoiner(",");
        items.forEach((theirs, c) -> j.add(theirs + "=" + c.header()));
        String t = j.toString();
        return t.matches("[A-Za-z0-9_.,=+/:@%-]*") ? t : "'" + t.replace("'", "'\\''") + "'";
    }

    /** How {@code name} relates to {@code c}, or {@code null} when it does not look like it. */
    private static Kind kind(ProfileColumn c, String name) {
        List<String> words = WORDS.get(c);
        if (words == null) {
            return null;
        }
        String lower = name.trim().toLowerCase(Locale.ROOT);
        boolean log = false;
        for (String prefix : List.of("log10_", "log10", "log_", "log", "lg_", "lg", "ln_", "ln")) {
            if (lower.startsWith(prefix) && lower.length() > prefix.length()) {
                String rest = lower.substring(prefix.length());
                if (words.contains(firstWord(rest))) {
                    log = true;
                    lower = rest;
                    break;
                }
            }
        }
        String first = firstWord(lower);
        if (!words.contains(first) && !words.contains(lower)) {
            return null;
        }
        if (log) {
            return Kind.LOG;
        }
        String rest = lower.substring(Math.min(lower.length(), first.length()));
        if (rest.contains("sun") || rest.contains("solar")) {
            return Kind.SOLAR;
        }
        if (rest.contains("frac") || rest.matches("\\s*/\\s*[a-z_*]+\\s*")) {
            return Kind.FRACTION;
        }
        return Kind.SAME;
    }

    /** The name up to its first character that is neither a letter nor a digit. */
    private static String firstWord(String lower) {
        int i = 0;
        while (i < lower.length() && Character.isLetterOrDigit(lower.charAt(i))) {
            i++;
        }
        return lower.substring(0, i);
    }

    private static String plural(Delimiter d) {
        return switch (d) {
            case COMMA -> "commas";
            case SEMICOLON -> "semicolons";
            case TAB -> "tabs";
            case WHITESPACE -> "spaces";
        };
    }

    private static String unit(ProfileColumn c) {
        return "1".equals(c.unit()) ? "mass fraction" : c.unit();
    }

    /**
     * @param text      a line as written (may be {@code null})
     * @param delimiter the delimiter it was split with
     * @param cells     how many cells that gave
     * @return {@code ". It looks separated by ...: rerun with --delimiter ..."}, or empty when the line
     *         does not look separated by another delimiter
     */
    static String delimiterHint(String text, Delimiter delimiter, int cells) {
        if (text == null || cells > 2) {
            return "";
        }
        for (Delimiter d : Delimiter.values()) {
            if (d == delimiter) {
                continue;
            }
            int n = d == Delimiter.WHITESPACE ? text.trim().split("[ \t]+").length
                    : text.split(java.util.regex.Pattern.quote(String.valueOf(d.character())), -1).length;
            if (n >= 3) {
                return ". The line looks separated by " + plural(d) + ", not by " + plural(delimiter)
                        + ": rerun with --delimiter " + d.label();
            }
        }
        return "";
    }
}
