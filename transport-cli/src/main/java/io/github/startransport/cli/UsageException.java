package io.github.startransport.cli;

/**
 * The command line itself is wrong: an unknown model name, a malformed option value, options that
 * exclude each other. Ends the run with exit code {@link Main#USAGE} (2), before any file is read
 * or written.
 */
final class UsageException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** @param message what is wrong on the command line and how to write it */
    UsageException(String message) {
        super(message);
    }

    /**
     * @param message what is wrong on the command line and how to write it
     * @param cause   the refusal it comes from
     */
    UsageException(String message, Throwable cause) {
        super(message, cause);
    }
}
