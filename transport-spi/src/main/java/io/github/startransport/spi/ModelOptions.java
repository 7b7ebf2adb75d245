package io.github.startransport.spi;

import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;

/**
 * Immutable name-to-text options for creating a model, e.g. {@code alpha=1.8}.
 *
 * <p>Options are read once when a model is created, never on the hot path. Typed getters
 * refuse text that cannot be understood with {@link InvalidOptionException}.
 */
public final class ModelOptions {
    private static final ModelOptions EMPTY = new ModelOptions(Map.of());

    private final Map<String, String> values;

    private ModelOptions(Map<String, String> values) {
        this.values = values;
    }

    /** @return options with nothing set: every model uses its defaults */
    public static ModelOptions defaults() {
        return EMPTY;
    }

    /**
     * @param map option names to values (copied)
     * @return options holding the map's entries
     */
    public static ModelOptions of(Map<String, String> map) {
        Map<String, String> copy = new LinkedHashMap<>();
        map.forEach((k, v) -> copy.put(Objects.requireNonNull(k).trim(), Objects.requireNonNull(v, k).trim()));
        return new ModelOptions(Collections.unmodifiableMap(copy));
    }

    /**
     * Parses {@code "name=value,name=value"}; blank text gives {@link #defaults()}.
     *
     * @param text comma-separated assignments
     * @return the options
     * @throws IllegalArgumentException when an item has no {@code =}
     */
    public static ModelOptions parse(String text) {
        Map<String, String> map = new LinkedHashMap<>();
        if (text != null && !text.isBlank()) {
            for (String item : text.split(",")) {
                int eq = item.indexOf('=');
                if (eq <= 0) {
                    throw new IllegalArgumentException("option '" + item.trim() + "' is not of the form name=value");
                }
                map.put(item.substring(0, eq).trim(), item.substring(eq + 1).trim());
            }
        }
        return of(map);
    }

    /**
     * @param name  option name
     * @param value option value as text
     * @return a copy with that option set
     */
    public ModelOptions with(String name, String value) {
        Map<String, String> copy = new LinkedHashMap<>(values);
        copy.put(Objects.requireNonNull(name).trim(), Objects.requireNonNull(value).trim());
        return new ModelOptions(Collections.unmodifiableMap(copy));
    }

    /** @return the options as an unmodifiable map */
    public Map<String, String> asMap() {
        return values;
    }

    /**
     * Refuses any option name outside {@code known}.
     *
     * @param model model name, for the message
     * @param known option names the model takes
     * @return this
     */
    public ModelOptions requireKnown(String model, Collection<String> known) {
        for (String name : values.keySet()) {
            if (!known.contains(name)) {
                throw InvalidOptionException.unknown(model, name, known);
            }
        }
        return this;
    }

    /**
     * @param model model name, for the message
     * @param name  option name
     * @param dflt  value when absent
     * @return the option as a finite double
     */
    public double getDouble(String model, String name, double dflt) {
        String text = values.get(name);
        if (text == null) {
            return dflt;
        }
        double v;
        try {
            v = Double.parseDouble(text);
        } catch (NumberFormatException e) {
            throw new InvalidOptionException(model, name, text, "not a number");
        }
        if (!Double.isFinite(v)) {
            throw new InvalidOptionException(model, name, text, "must be finite");
        }
        return v;
    }

    /**
     * @param model model name, for the message
     * @param name  option name
     * @param dflt  value when absent
     * @return the option's text
     */
    public String getString(String model, String name, String dflt) {
        return values.getOrDefault(name, dflt);
    }

    /**
     * @param model model name, for the message
     * @param name  option name
     * @param type  the enum type; values are matched case-insensitively, '-' standing for '_'
     * @param dflt  value when absent
     * @param <E>   enum type
     * @return the option as an enum constant
     */
    public <E extends Enum<E>> E getEnum(String model, String name, Class<E> type, E dflt) {
        String text = values.get(name);
        if (text == null) {
            return dflt;
        }
        String key = text.trim().replace('-', '_').toUpperCase(Locale.ROOT);
        for (E e : type.getEnumConstants()) {
            if (e.name().equals(key)) {
                return e;
            }
        }
        StringBuilder allowed = new StringBuilder();
        for (E e : type.getEnumConstants()) {
            if (allowed.length() > 0) {
                allowed.append(", ");
            }
            allowed.append(e.name().toLowerCase(Locale.ROOT).replace('_', '-'));
        }
        throw new InvalidOptionException(model, name, text, "expected one of " + allowed);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ModelOptions other && other.values.equals(values);
    }

    @Override
    public int hashCode() {
        return values.hashCode();
    }

    @Override
    public String toString() {
        return values.toString();
    }
}
