package io.github.startransport.cli;

import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.DiscoveryException;
import io.github.startransport.spi.InvalidOptionException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.TransportException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.function.Supplier;

/**
 * The command-line tool {@code startransport}: {@code diagnose} and {@code models}. It reaches
 * the physics only through the SPI ({@link Transport#discover()}).
 *
 * <p>Exit codes: {@value #OK} success, {@value #BAD_INPUT} bad input (a file that cannot be read
 * or holds bad data: file, line or zone, column and what is wrong), {@value #USAGE} usage error
 * (an unknown option or model name, a malformed option value), {@value #OUT_OF_MEMORY} out of
 * memory (one line saying how many zones and which {@code -Xmx} to try).
 */
public final class Main {
    /** Exit code: success. */
    public static final int OK = 0;
    /** Exit code: bad input (a file that cannot be read or holds bad data, an output folder). */
    public static final int BAD_INPUT = 1;
    /** Exit code: the command line itself is wrong (unknown option or model name, malformed option value). */
    public static final int USAGE = 2;
    /** Exit code: the Java heap is too small for the input (the message says which -Xmx to try). */
    public static final int OUT_OF_MEMORY = 3;

    private Main() {
    }

    /** The top-level command; it only dispatches. */
    @Command(name = "startransport", mixinStandardHelpOptions = true, versionProvider = Version.class,
            description = {"Energy-transport diagnostics of stellar model profiles.", ""},
            footer = {"", "Exit codes: 0 success; 1 bad input (a file that cannot be read or holds bad data); 2 usage"
                + " error (unknown option or model name, a bad option value); 3 out of memory (the message says which"
                + " -Xmx to try).",
                "Run 'startransport diagnose --help' for the profile format and every option."})
    static final class Root implements Runnable {
        @Spec
        private CommandSpec spec;

        @Override
        public void run() {
            throw new ParameterException(spec.commandLine(), "missing command: diagnose, track, envelope, models or"
                    + " table");
        }
    }

    /** The version from the jar's manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"startransport " + (v == null ? "(development build)" : v)};
        }
    }

    /** Defaults that come from the providers found at run time: shown in help, used when no value is given. */
    private static final class ProviderDefaults implements CommandLine.IDefaultValueProvider {
        private final Cli cli;

        ProviderDefaults(Cli cli) {
            this.cli = cli;
        }

        @Override
        public String defaultValue(ArgSpec arg) {
            if (!(arg instanceof OptionSpec o)) {
                return null;
            }
            switch (o.longestName()) {
                case "--alpha" -> {
                    String a = DiagnoseCommand.defaultAlpha(cli.transportOrNull());
                    try {
                        return a != null && Double.isFinite(Double.parseDouble(a)) ? a : null;
                    } catch (NumberFormatException e) {
                        return null;
                    }
                }
                case "--convection" -> {
                    return DiagnoseCommand.defaultName(cli.transportOrNull(), ModelFamily.CONVECTION);
                }
                case "--opacity" -> {
                    return DiagnoseCommand.defaultName(cli.transportOrNull(), ModelFamily.OPACITY);
                }
                default -> {
                    return null;
                }
            }
        }
    }

    /**
     * Runs the tool and exits with its exit code.
     *
     * @param args the command line
     */
    public static void main(String[] args) {
        System.exit(run(args, System.out, System.err));
    }

    /**
     * Runs the tool in this JVM.
     *
     * @param args the command line
     * @param out  standard output
     * @param err  standard error
     * @return the exit code
     */
    public static int run(String[] args, PrintStream out, PrintStream err) {
        return run(args, out, err, System.console() != null, Transport::discover);
    }

    /**
     * @param args      the command line
     * @param out       standard output
     * @param err       standard error
     * @param console   whether a person is watching (progress bars)
     * @param discovery finds the providers
     * @return the exit code
     */
    static int run(String[] args, PrintStream out, PrintStream err, boolean console, Supplier<Transport> discovery) {
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
        Cli cli = new Cli(out, err, console, discovery, java.util.Arrays.asList(args));
        CommandLine cl = new CommandLine(new Root());
        cl.addSubcommand(new CommandLine(new DiagnoseCommand(cli)));
        cl.addSubcommand(new CommandLine(new TrackCommand(cli)));
        cl.addSubcommand(new CommandLine(new EnvelopeCommand(cli)));
        cl.addSubcommand(new CommandLine(new ModelsCommand(cli)));
        CommandLine table = new CommandLine(new TableCommand());
        table.addSubcommand(new CommandLine(new TableCommand.Build(cli)));
        table.addSubcommand(new CommandLine(new TableCommand.Check(cli)));
        cl.addSubcommand(table);
        cl.setDefaultValueProvider(new ProviderDefaults(cli));
        cl.setOut(new PrintWriter(out, true, StandardCharsets.UTF_8));
        cl.setErr(new PrintWriter(err, true, StandardCharsets.UTF_8));
        cl.setParameterExceptionHandler((e, arguments) -> {
            String command = e.getCommandLine().getCommandSpec().qualifiedName();
            err.println(command + ": " + e.getMessage());
            err.println("Run '" + command + " --help' for the options.");
            err.flush();
            return USAGE;
        });
        cl.setExecutionExceptionHandler((e, line, parsed) -> {
            if (e instanceof IllegalStateException && e.getCause() instanceof OutOfMemoryError) {
                return outOfMemory(err);
            }
            if (isUsage(e)) {
                String command = line.getCommandSpec().qualifiedName();
                err.println(command + ": " + e.getMessage());
                err.println("Run '" + command + " --help' for the options.");
                err.flush();
                return USAGE;
            }
            err.println("startransport: " + describe(e));
            if (!(e instanceof TransportException || e instanceof BadInputException
                    || e instanceof java.io.UncheckedIOException)) {
                e.printStackTrace(err);
            }
            err.flush();
            return BAD_INPUT;
        });
        int code;
        try {
            code = cl.execute(args);
        } catch (OutOfMemoryError e) {
            code = outOfMemory(err);
        }
        out.flush();
        err.flush();
        return code;
    }

    /** One line, no stack trace: the output folder has already been cleaned up by then. */
    private static int outOfMemory(PrintStream err) {
        err.println("startransport: " + MemoryAdvice.message(Runtime.getRuntime().maxMemory()));
        err.flush();
        return OUT_OF_MEMORY;
    }

    /**
     * @param e a failure
     * @return whether it says the command line is wrong: a usage error, an option a model refuses, a
     *         model name that no provider offers
     */
    static boolean isUsage(Exception e) {
        if (e instanceof UsageException || e instanceof InvalidOptionException) {
            return true;
        }
        return e instanceof DiscoveryException d && d.kind() != DiscoveryException.Kind.NO_PROVIDER
                && d.kind() != DiscoveryException.Kind.DUPLICATE_PROVIDER;
    }

    /**
     * @param e a failure
     * @return its message for the person running the tool
     */
    static String describe(Exception e) {
        if (e instanceof DataFormatException || e instanceof BadInputException || e instanceof UsageException) {
            return e.getMessage();
        }
        if (e instanceof java.io.UncheckedIOException u) {
            return "cannot read or write a file: " + u.getCause().getMessage();
        }
        if (e instanceof TransportException) {
            return e.getMessage();
        }
        return "internal error: " + e;
    }
}
