package io.github.startransport.cli;

import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.TransportProvider;

/**
 * Looks up what providers say about their models (names, defaults, options), for help texts,
 * run-time defaults and the summary. Creating models stays with {@link Transport}.
 */
final class Catalog {
    private Catalog() {
    }

    /**
     * The model {@link Transport#model} creates for a {@code null} name: the first provider's
     * recommended model of the family.
     *
     * @param transport the facade
     * @param family    a family
     * @return {@code provider/model}, or {@code null} when no provider has a model in the family
     */
    static String defaultModel(Transport transport, ModelFamily<?> family) {
        for (TransportProvider p : transport.providers()) {
            String name = p.defaultModel(family);
            if (name != null) {
                return p.name() + "/" + name;
            }
        }
        return null;
    }

    /**
     * @param transport the facade
     * @param family    a family
     * @param name      {@code model} or {@code provider/model}
     * @return what the provider says about it, or {@code null} when no provider (or more than one)
     *         offers that name; {@link Transport#model} then explains which
     */
    static ModelInfo info(Transport transport, ModelFamily<?> family, String name) {
        if (name == null) {
            return null;
        }
        int slash = name.indexOf('/');
        ModelInfo found = null;
        for (TransportProvider p : transport.providers()) {
            if (slash >= 0 && !p.name().equals(name.substring(0, slash))) {
                continue;
            }
            String bare = slash >= 0 ? name.substring(slash + 1) : name;
            for (ModelInfo info : p.models()) {
                if (info.family() == family && info.name().equals(bare)) {
                    if (found != null) {
                        return null;
                    }
                    found = info;
                }
            }
        }
        return found;
    }

    /**
     * @param info   a model's description, or {@code null}
     * @param option an option name
     * @return the option's default as text, or {@code null} when the model has no such option
     */
    static String optionDefault(ModelInfo info, String option) {
        if (info != null) {
            for (OptionInfo o : info.options()) {
                if (o.name().equals(option)) {
                    return o.defaultValue();
                }
            }
        }
        return null;
    }

    /**
     * @param name {@code model} or {@code provider/model}
     * @return the model part
     */
    static String bare(String name) {
        return name.substring(name.indexOf('/') + 1);
    }
}
