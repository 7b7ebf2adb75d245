package io.github.startransport.spi;

/**
 * A malformed data file (opacity table, profile): refused whole, nothing half-loaded is used.
 *
 * <p>Line and column are 1-based; 0 means "not applicable" (for example a whole-file problem
 * such as a missing header, or a grid that is not rectangular).
 */
public final class DataFormatException extends TransportException {
    private static final long serialVersionUID = 1L;

    /** File name or other description of where the data came from. */
    private final String source;
    /** 1-based line number, or 0. */
    private final int line;
    /** 1-based column number, or 0. */
    private final int column;
    /** The reason, without the location prefix. */
    private final String reason;

    /**
     * @param source file name or other description of where the data came from
     * @param line   1-based line number, or 0
     * @param column 1-based column number, or 0
     * @param reason what is wrong and, where possible, how to fix it
     */
    public DataFormatException(String source, int line, int column, String reason) {
        super(source + (line > 0 ? ":" + line : "") + (column > 0 ? ":" + column : "") + ": " + reason);
        this.source = source;
        this.line = line;
        this.column = column;
        this.reason = reason;
    }

    /** @return file name or description of the data source */
    public String source() {
        return source;
    }

    /** @return 1-based line number, or 0 */
    public int line() {
        return line;
    }

    /** @return 1-based column number, or 0 */
    public int column() {
        return column;
    }

    /** @return the reason, without the location prefix */
    public String reason() {
        return reason;
    }
}
