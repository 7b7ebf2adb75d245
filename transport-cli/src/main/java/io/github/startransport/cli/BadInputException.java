package io.github.startransport.cli;

/**
 * Input the tool refuses before or outside any file reading: an option value that names
 * nothing known, an output folder that cannot be written. Ends the run with exit code 1.
 *
 * <p>Problems inside a file are {@link io.github.startransport.spi.DataFormatException}s
 * instead, with file, line and column.
 */
final class BadInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** @param message what is wrong and how to fix it */
    BadInputException(String message) {
        super(message);
    }

    /**
     * @param message what is wrong and how to fix it
     * @param cause   the underlying failure
     */
    BadInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
