package io.github.startransport.spi;

import java.util.Objects;

/**
 * Describes one option a model accepts.
 *
 * @param name         option name as given in {@link ModelOptions}
 * @param defaultValue the value used when the option is absent, as text
 * @param unit         unit of the value ({@code "1"} when dimensionless, {@code ""} for words)
 * @param description  what the option does, and the source of its default
 */
public record OptionInfo(String name, String defaultValue, String unit, String description) {
    /**
     * Validates that no component is null.
     *
     * @param name         option name as given in {@link ModelOptions}
     * @param defaultValue the value used when the option is absent, as text
     * @param unit         unit of the value ({@code "1"} when dimensionless, {@code ""} for words)
     * @param description  what the option does, and the source of its default
     */
    public OptionInfo {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(defaultValue, "defaultValue");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(description, "description");
    }
}
