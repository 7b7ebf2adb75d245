package io.github.startransport.cli;

import java.io.PrintStream;

/**
 * A one-line text progress bar, redrawn in place with a carriage return. Drawn only when
 * enabled (a console is attached); otherwise every call does nothing, so logs stay clean.
 */
final class ProgressBar {
    private static final int CELLS = 30;

    private final PrintStream err;
    private final int total;
    private final boolean enabled;
    private int done;

    /**
     * @param err     where to draw
     * @param total   number of steps
     * @param enabled whether to draw at all
     */
    ProgressBar(PrintStream err, int total, boolean enabled) {
        this.err = err;
        this.total = total;
        this.enabled = enabled;
    }

    /** Draws the empty bar. */
    synchronized void start() {
        draw("");
    }

    /** @param label what just finished */
    synchronized void step(String label) {
        done++;
        draw(label);
    }

    /** Ends the line. */
    synchronized void finish() {
        if (enabled) {
            err.println();
            err.flush();
        }
    }

    private void draw(String label) {
        if (!enabled) {
            return;
        }
        int filled = total == 0 ? CELLS : done * CELLS / total;
        String text = "\rdiagnosing [" + "#".repeat(filled) + " ".repeat(CELLS - filled) + "] " + done + "/" + total
                + (label.isEmpty() ? "" : "  " + label);
        err.print(text.length() > 100 ? text.substring(0, 100) : text + " ".repeat(100 - text.length()));
        err.flush();
    }
}
