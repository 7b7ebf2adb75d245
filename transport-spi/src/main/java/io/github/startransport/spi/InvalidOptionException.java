package io.github.startransport.spi;

import java.util.Collection;

/**
 * A model option that is unknown to the model or whose text cannot be understood.
 */
public final class InvalidOptionException extends TransportException {
    private static final long serialVersionUID = 1L;

    /** The model the option was given to. */
    private final String model;
    /** The option name. */
    private final String option;
    /** The option text as given, or {@code null}. */
    private final String text;

    /**
     * @param model  model the option was given to
     * @param option option name
     * @param text   the option's text as given (may be {@code null} for unknown names)
     * @param reason what is wrong and what would be right
     */
    public InvalidOptionException(String model, String option, String text, String reason) {
        super("option '" + option + "'" + (text == null ? "" : " = '" + text + "'")
                + " for model '" + model + "': " + reason);
        this.model = model;
        this.option = option;
        this.text = text;
    }

    static InvalidOptionException unknown(String model, String option, Collection<String> known) {
        return new InvalidOptionException(model, option, null,
                "unknown option; this model takes " + (known.isEmpty() ? "no options" : String.join(", ", known)));
    }

    /** @return the model the option was given to */
    public String model() {
        return model;
    }

    /** @return the option name */
    public String option() {
        return option;
    }

    /** @return the option text as given, or {@code null} */
    public String text() {
        return text;
    }
}
