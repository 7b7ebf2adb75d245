package io.github.startransport.cli;

import io.github.startransport.spi.Transport;

import java.io.PrintStream;
import java.util.List;
import java.util.function.Supplier;

/**
 * What every command needs from the outside: where to print, whether a person is watching,
 * and the physics (discovered once, on first use).
 */
final class Cli {
    private final PrintStream out;
    private final PrintStream err;
    private final boolean console;
    private final Supplier<Transport> discovery;
    private final List<String> args;
    private Transport transport;

    /**
     * @param out       standard output
     * @param err       standard error
     * @param console   whether a console is attached (progress bars are drawn only then)
     * @param discovery finds the providers
     * @param args      the command line, as given
     */
    Cli(PrintStream out, PrintStream err, boolean console, Supplier<Transport> discovery, List<String> args) {
        this.args = List.copyOf(args);
        this.out = out;
        this.err = err;
        this.console = console;
        this.discovery = discovery;
    }

    PrintStream out() {
        return out;
    }

    PrintStream err() {
        return err;
    }

    boolean console() {
        return console;
    }

    /** @return the command line, as given */
    List<String> args() {
        return args;
    }

    /**
     * @return the facade
     * @throws io.github.startransport.spi.DiscoveryException when no provider is found
     */
    synchronized Transport transport() {
        if (transport == null) {
            transport = discovery.get();
        }
        return transport;
    }

    /** @return the facade, or {@code null} when discovery fails (for help texts) */
    synchronized Transport transportOrNull() {
        try {
            return transport();
        } catch (RuntimeException e) {
            return null;
        }
    }
}
