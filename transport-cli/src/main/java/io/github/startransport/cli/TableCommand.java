package io.github.startransport.cli;

import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityGridSpec;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.OpacityTableSummary;
import io.github.startransport.spi.OpacityTableTool;
import io.github.startransport.spi.Transport;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

/** {@code table}: build an opacity table from any opacity model, or check a table file. */
@Command(name = "table", mixinStandardHelpOptions = true,
        description = {"Builds and checks opacity tables in the library's table format"
                + " (CSV with header X,Z,log_T,log_R,log_kappa; see the README).", ""})
final class TableCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        throw new CommandLine.ParameterException(spec.commandLine(), "name a subcommand: build or check");
    }

    /** How a grid axis is written on the command line: {@code lo:hi:n} or a comma-separated list. */
    static double[] axis(CommandLine cl, String option, String text) {
        String t = text.trim();
        String form = " (write lo:hi:n for n evenly spaced values from lo to hi, or a comma-separated list of numbers)";
        if (t.contains(":")) {
            String[] p = t.split(":", -1);
            if (p.length != 3) {
                throw new CommandLine.ParameterException(cl, option + " '" + Text.shorten(text) + "': expected three"
                        + " parts lo:hi:n" + form);
            }
            double lo = number(cl, option, text, p[0], "lo", form);
            double hi = number(cl, option, text, p[1], "hi", form);
            double n = number(cl, option, text, p[2], "n", form);
            if (!(n == Math.rint(n) && n >= 2 && n <= Integer.MAX_VALUE)) {
                throw new CommandLine.ParameterException(cl, option + " '" + Text.shorten(text) + "': n = "
                        + Text.shorten(p[2].trim()) + " must be a whole number of values, at least 2" + form);
            }
            if (!(hi > lo)) {
                throw new CommandLine.ParameterException(cl, option + " '" + Text.shorten(text) + "': hi = "
                        + Text.number(hi) + " must be greater than lo = " + Text.number(lo) + form);
            }
            return OpacityGridSpec.evenly(lo, hi, (int) n);
        }
        String[] items = t.split(",", -1);
        double[] v = new double[items.length];
        for (int i = 0; i < items.length; i++) {
            v[i] = number(cl, option, text, items[i], "item " + (i + 1), form);
        }
        return v;
    }

    private static double number(CommandLine cl, String option, String text, String item, String what, String form) {
        double v = NumberSyntax.parse(item.trim());
        if (!Double.isFinite(v)) {
            throw new CommandLine.ParameterException(cl, option + " '" + Text.shorten(text) + "': " + what + " = '"
                    + Text.shorten(item.trim()) + "' is not a finite number" + form);
        }
        return v;
    }

    static void print(PrintStream out, OpacityTableSummary s) {
        out.println(s.source() + ": " + s.tables().size() + " (X, Z) tables, " + s.values() + " values");
        out.println(String.format(Locale.ROOT, "  %6s %6s  %5s %14s  %5s %14s  %8s", "X", "Z", "n_T", "log_T range",
                "n_R", "log_R range", "coverage"));
        for (OpacityTableSummary.Table t : s.tables()) {
            out.println(String.format(Locale.ROOT, "  %6.4f %6.4f  %5d %6.3f..%6.3f  %5d %6.3f..%6.3f  %7.2f%%",
                    t.hydrogen(), t.metals(), t.logTCount(), t.logTMin(), t.logTMax(), t.logRCount(), t.logRMin(),
                    t.logRMax(), 100.0 * t.coverage()));
        }
    }

    /** {@code table build}. */
    @Command(name = "build", mixinStandardHelpOptions = true,
            description = {"Tabulates an opacity model at every node of a grid into a table file, then reads the"
                    + " file back and checks it. Nodes the model refuses become declared holes.", ""},
            footer = {"", "Axes: lo:hi:n for n evenly spaced values, or a comma-separated list.",
                "Example: table build --out kappa.csv --hydrogen 0,0.35,0.7 --metals 0.01,0.02,0.04"
                        + " --log-t 3.5:8.5:101 --log-r -9:1:81", "",
                "Exit codes: 0 success; 1 the model or the file failed; 2 usage error (unknown option or model name, a"
                        + " bad option value such as a grid that is too large)."})
    static final class Build implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        private final Cli cli;

        /** @param cli where to print and how to find the physics */
        Build(Cli cli) {
            this.cli = cli;
        }

        @Option(names = "--out", required = true, paramLabel = "FILE", description = "table file to write (replaced)")
        Path out;

        @Option(names = "--opacity", paramLabel = "NAME",
                description = "opacity model to tabulate (default: the provider's default opacity model)")
        String opacity;

        @Option(names = "--model-options", paramLabel = "NAME=VALUE,...",
                description = "options of that model, e.g. bound-free-gaunt-over-guillotine=0.1")
        String modelOptions;

        @Option(names = "--hydrogen", paramLabel = "AXIS", defaultValue = "0,0.35,0.7",
                description = "X values (default: ${DEFAULT-VALUE})")
        String hydrogen;

        @Option(names = "--metals", paramLabel = "AXIS", defaultValue = "0.02",
                description = "Z values (default: ${DEFAULT-VALUE})")
        String metals;

        @Option(names = "--log-t", paramLabel = "AXIS", defaultValue = "3.5:8.5:101",
                description = "log10 T nodes, T in K (default: ${DEFAULT-VALUE})")
        String logT;

        @Option(names = "--log-r", paramLabel = "AXIS", defaultValue = "-9:1:81",
                description = "log10 R nodes, R = rho / T_6^3 (default: ${DEFAULT-VALUE})")
        String logR;

        @Override
        public Integer call() {
            CommandLine cl = spec.commandLine();
            ModelOptions options;
            try {
                options = ModelOptions.parse(modelOptions);
            } catch (IllegalArgumentException e) {
                throw new CommandLine.ParameterException(cl, "--model-options: " + e.getMessage());
            }
            OpacityGridSpec grid;
            try {
                grid = new OpacityGridSpec(axis(cl, "--hydrogen", hydrogen), axis(cl, "--metals", metals),
                        axis(cl, "--log-t", logT), axis(cl, "--log-r", logR));
            } catch (InvalidInputException e) {
                throw new CommandLine.ParameterException(cl, "the grid of --hydrogen, --metals, --log-t and --log-r is"
                        + " refused: " + e.getMessage());
            }
            Transport transport = cli.transport();
            ModelOptions modelOptions = options;
            OpacityModel model = DiagnosisOptions.asOption("--opacity", opacity == null ? "(default)" : opacity,
                    () -> transport.opacity(opacity, modelOptions));
            OpacityTableTool tool = transport.opacityTables(null, ModelOptions.defaults());
            OpacityTableSummary summary = tool.build(model, grid, out.toAbsolutePath());
            PrintStream o = cli.out();
            o.println("tabulated " + model);
            print(o, summary);
            return 0;
        }
    }

    /** {@code table check}. */
    @Command(name = "check", mixinStandardHelpOptions = true,
            description = {"Reads a table file with the same checks as the table opacity model and prints its"
                    + " (X, Z) tables, grid axes and coverage.", ""},
            footer = {"", "Exit codes: 0 the file is valid; 1 it is not (file, line, column and reason are"
                    + " printed); 2 usage error."})
    static final class Check implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        private final Cli cli;

        /** @param cli where to print and how to find the physics */
        Check(Cli cli) {
            this.cli = cli;
        }

        @Parameters(index = "0", paramLabel = "FILE", description = "table file to check")
        Path file;

        @Override
        public Integer call() {
            Transport transport = cli.transport();
            OpacityTableSummary summary = transport.opacityTables(null, ModelOptions.defaults())
                    .check(file.toAbsolutePath());
            print(cli.out(), summary);
            return 0;
        }
    }
}
