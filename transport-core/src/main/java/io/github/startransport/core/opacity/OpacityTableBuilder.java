package io.github.startransport.core.opacity;

import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.OpacityGridSpec;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.OpacityResult;

import java.io.IOException;
import java.io.UncheckedIOException;

/**
 * Tabulates any {@link OpacityModel} into our table format (see {@link OpacityTableReader}), so that a
 * costly model becomes a fast table. Rows are written X, Z, log T, log R in the order of the grid;
 * numbers use {@link Double#toString}, which reads back to the identical double. Nodes the model refuses
 * with {@link InvalidInputException} become declared holes ({@code # absent:} lines). The node
 * (log_T, log_R) is evaluated at T = 10^log_T K and rho = 10^(log_R + 3 log_T - 18) g cm^-3.
 */
public final class OpacityTableBuilder {
    private OpacityTableBuilder() {
    }

    /**
     * @param model       the model to tabulate (its own out-of-range policy applies)
     * @param grid        the nodes
     * @param description one line saying what the table is, written as a comment (may be empty)
     * @param out         where the text goes
     * @return the number of nodes written as holes
     */
    public static int write(OpacityModel model, OpacityGridSpec grid, String description, Appendable out) {
        double[] xs = grid.hydrogen();
        double[] zs = grid.metals();
        double[] ts = grid.logT();
        double[] rs = grid.logR();
        OpacityResult r = new OpacityResult();
        StringBuilder rows = new StringBuilder(48 * xs.length * zs.length * ts.length * rs.length);
        StringBuilder holes = new StringBuilder();
        int absent = 0;
        for (double z : zs) {
            for (double x : xs) {
                if (x + z > 1.0) {
                    continue;
                }
                for (double lt : ts) {
                    for (double lr : rs) {
                        double temperature = Math.pow(10.0, lt);
                        double density = Math.pow(10.0, lr + 3.0 * lt - 18.0);
                        try {
                            model.evaluate(temperature, density, x, z, InvalidInputException.NO_ZONE, r);
                        } catch (InvalidInputException e) {
                            holes.append("# ").append(OpacityTableReader.ABSENT).append(" X=").append(x)
                                    .append(" Z=").append(z).append(" log_T=").append(lt).append(" log_R=")
                                    .append(lr).append('\n');
                            absent++;
                            continue;
                        }
                        rows.append(x).append(',').append(z).append(',').append(lt).append(',').append(lr)
                                .append(',').append(Math.log10(r.kappa)).append('\n');
                    }
                }
            }
        }
        try {
            out.append("# startransport opacity table: ").append(OpacityTableReader.HEADER).append('\n');
            out.append("# log_R = log10(rho) - 3 log10(T) + 18; kappa in cm^2/g; logs base 10\n");
            out.append("# tabulated from ").append(String.valueOf(model)).append('\n');
            if (description != null && !description.isBlank()) {
                out.append("# ").append(description.strip().replace('\n', ' ')).append('\n');
            }
            out.append(holes);
            out.append(OpacityTableReader.HEADER).append('\n');
            out.append(rows);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return absent;
    }

    /**
     * @param model the model to tabulate
     * @param grid  the nodes
     * @return the table text
     */
    public static String text(OpacityModel model, OpacityGridSpec grid) {
        StringBuilder b = new StringBuilder();
        write(model, grid, "", b);
        return b.toString();
    }
}
