package io.github.startransport.spi;

import java.util.List;
import java.util.Objects;

/**
 * What a provider says about one model it offers.
 *
 * @param family      the model's family
 * @param name        the name to ask for it by, unique within the provider and family
 * @param description one sentence: what it computes and after which published work
 * @param options     the options it accepts, with their defaults
 */
public record ModelInfo(ModelFamily<?> family, String name, String description, List<OptionInfo> options) {
    /**
     * Validates and copies.
     *
     * @param family      the model's family
     * @param name        the name to ask for it by, unique within the provider and family
     * @param description one sentence: what it computes and after which published work
     * @param options     the options it accepts, with their defaults
     */
    public ModelInfo {
        Objects.requireNonNull(family, "family");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description");
        options = List.copyOf(options);
    }

    /** @return the option names, in declaration order */
    public List<String> optionNames() {
        return options.stream().map(OptionInfo::name).toList();
    }
}
