package io.github.startransport.spi;

import java.nio.file.Path;

/**
 * Builds and checks opacity table files in startransport's table format
 * ({@code X,Z,log_T,log_R,log_kappa}, see the README), so that a program compiled against the
 * contract only (such as the command-line tool) can turn any opacity model into a fast table.
 * Obtained from {@link Transport#opacityTables}. Not a hot-path type; implementations are immutable.
 */
public interface OpacityTableTool {

    /**
     * Tabulates {@code model} at every node of {@code grid} and writes the file. Nodes the model
     * refuses ({@link InvalidInputException}) are written as declared holes. The file is then read
     * back and checked.
     *
     * @param model the model to tabulate
     * @param grid  the nodes
     * @param file  the file to write (replaced if it exists)
     * @return the summary of the written file
     * @throws DataFormatException when the written file cannot be written or does not check
     */
    OpacityTableSummary build(OpacityModel model, OpacityGridSpec grid, Path file);

    /**
     * Reads a table file with the same checks as a table-backed opacity model.
     *
     * @param file the file
     * @return what the file holds
     * @throws DataFormatException when the file is malformed, with file, line, column and reason
     */
    OpacityTableSummary check(Path file);
}
