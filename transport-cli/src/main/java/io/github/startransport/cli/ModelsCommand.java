package io.github.startransport.cli;

import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.TransportProvider;
import picocli.CommandLine.Command;

import java.io.PrintStream;
import java.util.concurrent.Callable;

/** {@code models}: every provider found, and every model it offers per family, with options and defaults. */
@Command(name = "models", mixinStandardHelpOptions = true,
        description = {"Lists every provider found on the class path or module path and, family by family, every"
                + " model it offers with its options and their defaults. The model marked (default) is the one"
                + " used when no name is given.", ""},
        footer = {"", "Exit codes: 0 success; 1 no provider found; 2 usage error."})
final class ModelsCommand implements Callable<Integer> {
    private final Cli cli;

    /** @param cli where to print and how to find the physics */
    ModelsCommand(Cli cli) {
        this.cli = cli;
    }

    @Override
    public Integer call() {
        Transport transport = cli.transport();
        PrintStream out = cli.out();
        out.println("providers:");
        for (TransportProvider p : transport.providers()) {
            out.println("  " + p.name() + "  " + p.description());
        }
        for (String failure : transport.loadFailures()) {
            out.println("  (failed to load: " + failure + ")");
        }
        for (ModelFamily<?> family : ModelFamily.all()) {
            out.println();
            out.println(family.name() + " models:");
            String dflt = Catalog.defaultModel(transport, family);
            boolean any = false;
            for (TransportProvider p : transport.providers()) {
                for (ModelInfo info : p.models()) {
                    if (info.family() != family) {
                        continue;
                    }
                    any = true;
                    String qualified = p.name() + "/" + info.name();
                    out.println("  " + info.name() + "  (provider " + p.name() + ")"
                            + (qualified.equals(dflt) ? "  (default)" : ""));
                    out.println("      " + info.description());
                    for (OptionInfo o : info.options()) {
                        String unit = o.unit().isEmpty() || "1".equals(o.unit()) ? "" : " " + o.unit();
                        out.println("      option " + o.name() + " = " + o.defaultValue() + unit + "  " + o.description());
                    }
                }
            }
            if (!any) {
                out.println("  (none found)");
            }
        }
        return 0;
    }
}
