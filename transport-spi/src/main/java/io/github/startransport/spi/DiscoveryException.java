package io.github.startransport.spi;

import java.util.List;

/**
 * Provider discovery or model lookup failed: nothing found, an unknown name, or an ambiguity.
 *
 * <p>The message says what was looked for, what was found, and how to fix it (usually:
 * which jar to add to the class path or module path).
 */
public final class DiscoveryException extends TransportException {
    private static final long serialVersionUID = 1L;

    /** What went wrong. */
    public enum Kind {
        /** No provider at all on the class path or module path. */
        NO_PROVIDER,
        /** A provider name that none of the found providers has. */
        UNKNOWN_PROVIDER,
        /** Two or more providers report the same name. */
        DUPLICATE_PROVIDER,
        /** A model name that no provider offers in the requested family. */
        UNKNOWN_MODEL,
        /** A model name offered by more than one provider; the caller must choose. */
        AMBIGUOUS_MODEL
    }

    /** The jar that carries the library's own provider. */
    public static final String CORE_JAR_HINT =
            "add transport-core (io.github.startransport:transport-core) to the class path or module path";

    /** What went wrong. */
    private final Kind kind;
    /** What was looked for. */
    private final String wanted;
    /** What was found instead (names, one entry each). */
    private final List<String> found;

    /**
     * @param kind    what went wrong
     * @param wanted  what was looked for
     * @param found   what was found instead (names, one entry each)
     * @param message the whole message, including the fix
     */
    public DiscoveryException(Kind kind, String wanted, List<String> found, String message) {
        super(message);
        this.kind = kind;
        this.wanted = wanted;
        this.found = List.copyOf(found);
    }

    /** @return what went wrong */
    public Kind kind() {
        return kind;
    }

    /** @return what was looked for */
    public String wanted() {
        return wanted;
    }

    /** @return what was found instead */
    public List<String> found() {
        return found;
    }
}
