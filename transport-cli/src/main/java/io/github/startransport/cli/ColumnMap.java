package io.github.startransport.cli;

import io.github.startransport.spi.ProfileColumn;

import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.StringJoiner;

/**
 * The {@code --columns} option: maps the header of a profile file written by another program
 * onto ours, written {@code THEIRS=OURS[,THEIRS=OURS...]}.
 *
 * <p>THEIRS is the other file's header name, matched exactly (after trimming). OURS is one of our
 * header names ({@link ProfileColumn#header()}, e.g. {@code T_K}) or a readable alias
 * ({@code temperature}); both are matched without regard to case. Example:
 * {@code --columns Temp=T_K,Dens=rho_g_cm3} reads our T_K from the file's column
 * {@code Temp} and our rho_g_cm3 from its column {@code Dens}.
 *
 * <p>A file's header that already uses our names in another case or our aliases
 * ({@code radius,mass,temperature,...}) needs no map: the reader recognises them by
 * {@link #ourColumn(String)}.
 */
final class ColumnMap {
    /** Alias (lower case) to column; our header names are added in lower case too. */
    private static final Map<String, ProfileColumn> NAMES = names();

    private static final ColumnMap NONE = new ColumnMap(new EnumMap<>(ProfileColumn.class));

    private final Map<ProfileColumn, String> theirs;

    private ColumnMap(EnumMap<ProfileColumn, String> theirs) {
        this.theirs = Collections.unmodifiableMap(theirs);
    }

    private static Map<String, ProfileColumn> names() {
        Map<String, ProfileColumn> m = new LinkedHashMap<>();
        for (ProfileColumn c : ProfileColumn.values()) {
            m.put(c.header().toLowerCase(Locale.ROOT), c);
        }
        alias(m, ProfileColumn.RADIUS, "radius", "r");
        alias(m, ProfileColumn.MASS, "mass", "m");
        alias(m, ProfileColumn.TEMPERATURE, "temperature", "t");
        alias(m, ProfileColumn.DENSITY, "density", "rho");
        alias(m, ProfileColumn.PRESSURE, "pressure", "p");
        alias(m, ProfileColumn.LUMINOSITY, "luminosity", "l");
        alias(m, ProfileColumn.HYDROGEN, "hydrogen");
        alias(m, ProfileColumn.METALS, "metals", "metallicity");
        alias(m, ProfileColumn.OPACITY, "kappa", "opacity");
        alias(m, ProfileColumn.CP, "cp", "specific_heat");
        alias(m, ProfileColumn.NABLA_AD, "adiabatic_gradient");
        alias(m, ProfileColumn.NABLA_MU, "composition_gradient");
        alias(m, ProfileColumn.GAMMA1, "gamma_1", "first_adiabatic_exponent");
        return Collections.unmodifiableMap(m);
    }

    private static void alias(Map<String, ProfileColumn> m, ProfileColumn c, String... aliases) {
        for (String a : aliases) {
            m.put(a, c);
        }
    }

    /** @return the empty map: every column is read under our own header name */
    static ColumnMap none() {
        return NONE;
    }

    /**
     * @param name one of our header names or an alias, any case
     * @return the column, or {@code null} when the name is neither
     */
    static ProfileColumn ourColumn(String name) {
        return NAMES.get(name.trim().toLowerCase(Locale.ROOT));
    }

    /** @return every accepted name of every column, for messages and help */
    static String acceptedNames() {
        Map<ProfileColumn, StringJoiner> byColumn = new EnumMap<>(ProfileColumn.class);
        NAMES.forEach((name, c) -> byColumn.computeIfAbsent(c, k -> new StringJoiner("|")).add(
                name.equals(c.header().toLowerCase(Locale.ROOT)) ? c.header() : name));
        StringJoiner all = new StringJoiner(", ");
        byColumn.values().forEach(j -> all.add(j.toString()));
        return all.toString();
    }

    /**
     * @param text {@code THEIRS=OURS[,THEIRS=OURS...]}; {@code null} or blank gives {@link #none()}
     * @return the map
     * @throws UsageException when an item is malformed, names none of our columns, or maps a
     *                        column twice
     */
    static ColumnMap parse(String text) {
        if (text == null || text.isBlank()) {
            return NONE;
        }
        EnumMap<ProfileColumn, String> theirs = new EnumMap<>(ProfileColumn.class);
        for (String item : text.split(",", -1)) {
            int eq = item.indexOf('=');
            String their = eq < 0 ? "" : item.substring(0, eq).trim();
            String ours = eq < 0 ? "" : item.substring(eq + 1).trim();
            if (ours.isEmpty() || their.isEmpty()) {
                throw new UsageException("--columns: '" + Text.shorten(item.trim()) + "' is not of the form"
                        + " THEIRS=OURS: the file's header name, '=', then our column name");
            }
            ProfileColumn c = ourColumn(ours);
            if (c == null) {
                ProfileColumn reversed = ourColumn(their);
                throw new UsageException("--columns: '" + Text.shorten(ours) + "' (right of '=') is not one of our"
                        + " profile columns; the left side names the file's header, the right side ours"
                        + (reversed != null ? " (write " + Text.shorten(ours) + "=" + their + ", not " + their + "="
                        + Text.shorten(ours) + ")" : "") + ". Our columns: " + acceptedNames());
            }
            if (theirs.containsKey(c)) {
                throw new UsageException("--columns: " + c.header() + " is mapped twice ('"
                        + Text.shorten(theirs.get(c)) + "' and '" + Text.shorten(their) + "')");
            }
            if (theirs.containsValue(their)) {
                throw new UsageException("--columns: the file column '" + Text.shorten(their)
                        + "' is mapped onto two of ours");
            }
            theirs.put(c, their);
        }
        return new ColumnMap(theirs);
    }

    /**
     * @return the map as it is written on the command line, with our header names on the right, in
     *         our column order; empty for {@link #none()}
     */
    String text() {
        StringJoiner j = new StringJoiner(",");
        theirs.forEach((c, their) -> j.add(their + "=" + c.header()));
        return j.toString();
    }

    /**
     * @param extra more items, file header name to our column
     * @return this map's {@link #text()} with the extra items added (a value for {@code --columns})
     */
    String textWith(Map<String, ProfileColumn> extra) {
        StringJoiner j = new StringJoiner(",");
        if (!theirs.isEmpty()) {
            j.add(text());
        }
        extra.forEach((their, c) -> j.add(their + "=" + c.header()));
        return j.toString();
    }

    /**
     * @param c one of our columns
     * @return the file's header name that holds it: the mapped one, or our own header
     */
    String fileHeader(ProfileColumn c) {
        return theirs.getOrDefault(c, c.header());
    }

    /**
     * @param c one of our columns
     * @return whether {@code --columns} maps it
     */
    boolean maps(ProfileColumn c) {
        return theirs.containsKey(c);
    }
}
