package io.github.startransport.spi;

/**
 * Root of the one unchecked exception family thrown by startransport and its providers.
 *
 * <p>Every subclass carries the structured facts of the failure (field, value, unit, zone,
 * file, line, ...) as accessors, so that callers and tests can act on them without parsing
 * the message; the message spells the same facts out for a person, together with the fix.
 */
public abstract class TransportException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * @param message the whole message for a person: the facts and the fix
     */
    protected TransportException(String message) {
        super(message);
    }

    /**
     * @param message the whole message for a person: the facts and the fix
     * @param cause   the exception that led to this one
     */
    protected TransportException(String message, Throwable cause) {
        super(message, cause);
    }
}
