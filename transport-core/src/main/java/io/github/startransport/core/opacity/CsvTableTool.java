package io.github.startransport.core.opacity;

import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.InvalidOptionException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityGridSpec;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.OpacityTableSummary;
import io.github.startransport.spi.OpacityTableTool;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;

/**
 * {@link OpacityTableTool} for our tidy-CSV table format: {@link OpacityTableBuilder} to write,
 * {@link OpacityTableReader} to check. Stateless.
 */
public final class CsvTableTool implements OpacityTableTool {
    /** Name to ask for this tool by. */
    public static final String NAME = "tidy-csv";

    /** Describes this tool (it takes no options). */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.OPACITY_TABLES, NAME,
            "builds opacity tables (X,Z,log_T,log_R,log_kappa) from any opacity model and checks table files",
            List.of());

    /** The one instance. */
    public static final CsvTableTool INSTANCE = new CsvTableTool();

    private CsvTableTool() {
    }

    /**
     * @param options must be empty
     * @return the tool
     */
    public static CsvTableTool fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        return INSTANCE;
    }

    /**
     * Writes the table into a temporary file beside {@code file}, reads it back with every check,
     * and only then moves it onto {@code file} in one atomic rename: an existing file is replaced
     * whole or left exactly as it was. A grid of more than {@link OpacityTableBuilder#MAX_NODES}
     * nodes is refused before anything is computed or written.
     */
    @Override
    public OpacityTableSummary build(OpacityModel model, OpacityGridSpec grid, Path file) {
        String large = OpacityTableBuilder.tooLarge(grid);
        if (large != null) {
            throw new InvalidOptionException(NAME, "grid", grid.nodes() + " nodes", large);
        }
        Path target = file.toAbsolutePath();
        Path dir = target.getParent();
        Path temp;
        try {
            temp = Files.createTempFile(dir, "." + target.getFileName() + ".", ".partial");
        } catch (IOException e) {
            throw new DataFormatException(file.toString(), 0, 0, "cannot be written: " + e);
        }
        boolean moved = false;
        try {
            try (Writer w = Files.newBufferedWriter(temp, StandardCharsets.UTF_8)) {
                OpacityTableBuilder.write(model, grid, "", w);
            } catch (IOException | java.io.UncheckedIOException e) {
                throw new DataFormatException(file.toString(), 0, 0, "cannot be written: " + e);
            }
            OpacityTableSummary checked = summarize(OpacityTableReader.read(temp), file.toString());
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
                moved = true;
            } catch (IOException e) {
                throw new DataFormatException(file.toString(), 0, 0, "cannot be written: " + e);
            }
            return checked;
        } finally {
            if (!moved) {
                try {
                    Files.deleteIfExists(temp);
                } catch (IOException e) {
                    // a hidden .partial file is left; its name says what it is
                }
            }
        }
    }

    @Override
    public OpacityTableSummary check(Path file) {
        return summarize(OpacityTableReader.read(file));
    }

    /**
     * @param set a loaded set
     * @return its summary
     */
    public static OpacityTableSummary summarize(OpacityTableSet set) {
        return summarize(set, set.source());
    }

    private static OpacityTableSummary summarize(OpacityTableSet set, String source) {
        List<OpacityTableSummary.Table> tables = new ArrayList<>();
        for (OpacityTableSet.TableDescription d : set.describe()) {
            double[] t = d.logT();
            double[] r = d.logR();
            tables.add(new OpacityTableSummary.Table(d.hydrogen(), d.metals(), t.length, t[0], t[t.length - 1],
                    r.length, r[0], r[r.length - 1], d.present(), t.length * r.length - d.present()));
        }
        return new OpacityTableSummary(source, tables);
    }

    @Override
    public String toString() {
        return NAME;
    }
}
