package io.github.startransport.core.opacity;

import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.OpacityGridSpec;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.OpacityResult;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.BitSet;

/**
 * Tabulates any {@link OpacityModel} into our table format (see {@link OpacityTableReader}), so that a
 * costly model becomes a fast table. Rows are written X, Z, log T, log R in the order of the grid, as
 * they are computed (nothing but the refused nodes is kept in memory); numbers use
 * {@link Double#toString}, which reads back to the identical double. Nodes the model refuses with
 * {@link InvalidInputException} become declared holes: after the rows, one {@code # absent:} line per
 * rectangle of refused nodes (runs along log R, merged across neighbouring log T rows with the same
 * runs), not one per node. The node (log_T, log_R) is evaluated at T = 10^log_T K and
 * rho = 10^(log_R + 3 log_T - 18) g cm^-3.
 */
public final class OpacityTableBuilder {
    /**
     * Most nodes a table file may have: reading a table back keeps about 200 bytes per row
     * while it checks the grid, so 4 million rows need about 0.8 GB of heap (and the file is
     * about 250 MB).
     */
    public static final long MAX_NODES = 4_000_000L;

    private OpacityTableBuilder() {
    }

    /**
     * @param grid a grid
     * @return {@code null} when the grid may be tabulated, else why not (one sentence with the numbers)
     */
    public static String tooLarge(OpacityGridSpec grid) {
        long nodes = grid.nodes();
        if (nodes <= MAX_NODES) {
            return null;
        }
        return String.format(java.util.Locale.ROOT, "the grid has %,d nodes (%d log_T x %d log_R x %d X x %d Z);"
                        + " a table file holds at most %,d (reading it back needs about 200 bytes per node);"
                        + " use coarser axes, or split the compositions over several files", nodes,
                grid.logT().length, grid.logR().length, grid.hydrogen().length, grid.metals().length, MAX_NODES);
    }

    /**
     * @param model       the model to tabulate (its own out-of-range policy applies)
     * @param grid        the nodes; at most {@link #MAX_NODES}
     * @param description one line saying what the table is, written as a comment (may be empty)
     * @param out         where the text goes
     * @return the number of nodes written as holes
     * @throws IllegalArgumentException when the grid has more than {@link #MAX_NODES} nodes
     */
    public static long write(OpacityModel model, OpacityGridSpec grid, String description, Appendable out) {
        String large = tooLarge(grid);
        if (large != null) {
            throw new IllegalArgumentException(large);
        }
        double[] xs = grid.hydrogen();
        double[] zs = grid.metals();
        double[] ts = grid.logT();
        double[] rs = grid.logR();
        OpacityResult r = new OpacityResult();
        StringBuilder holes = new StringBuilder();
        StringBuilder row = new StringBuilder(128);
        long absent = 0;
        try {
            out.append("# startransport opacity table: ").append(OpacityTableReader.HEADER).append('\n');
            out.append("# log_R = log10(rho) - 3 log10(T) + 18; kappa in cm^2/g; logs base 10\n");
            out.append("# tabulated from ").append(String.valueOf(model)).append('\n');
            if (description != null && !description.isBlank()) {
                out.append("# ").append(description.strip().replace('\n', ' ')).append('\n');
            }
            out.append(OpacityTableReader.HEADER).append('\n');
            BitSet refused = new BitSet(ts.length * rs.length);
            for (double z : zs) {
                for (double x : xs) {
                    if (x + z > 1.0) {
                        continue;
                    }
                    refused.clear();
                    for (int i = 0; i < ts.length; i++) {
                        double lt = ts[i];
                        for (int j = 0; j < rs.length; j++) {
                            double lr = rs[j];
                            double temperature = Math.pow(10.0, lt);
                            double density = Math.pow(10.0, lr + 3.0 * lt - 18.0);
                            try {
                                model.evaluate(temperature, density, x, z, InvalidInputException.NO_ZONE, r);
                            } catch (InvalidInputException e) {
                                refused.set(i * rs.length + j);
                                absent++;
                                continue;
                            }
                            row.setLength(0);
                            row.append(x).append(',').append(z).append(',').append(lt).append(',').append(lr)
                                    .append(',').append(Math.log10(r.kappa)).append('\n');
                            out.append(row);
                        }
                    }
                    holes(x, z, ts, rs, refused, holes);
                }
            }
            if (absent > 0) {
                out.append("# nodes the model refused, declared as holes:\n").append(holes);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return absent;
    }

    /**
     * Appends one {@code # absent:} line per rectangle of refused nodes of one (X, Z) table:
     * runs of neighbouring log R nodes in each log T row, merged over neighbouring rows that have
     * exactly the same runs. Each range names axis values, so it covers exactly its nodes.
     */
    static void holes(double x, double z, double[] ts, double[] rs, BitSet refused, StringBuilder out) {
        int nr = rs.length;
        int i = 0;
        while (i < ts.length) {
            int[] runs = runs(refused, i, nr);
            if (runs.length == 0) {
                i++;
                continue;
            }
            int last = i;
            while (last + 1 < ts.length && java.util.Arrays.equals(runs, runs(refused, last + 1, nr))) {
                last++;
            }
            for (int k = 0; k < runs.length; k += 2) {
                out.append("# ").append(OpacityTableReader.ABSENT).append(" X=").append(x).append(" Z=").append(z)
                        .append(" log_T=").append(range(ts[i], ts[last])).append(" log_R=")
                        .append(range(rs[runs[k]], rs[runs[k + 1]])).append('\n');
            }
            i = last + 1;
        }
    }

    /** @return the refused runs of row i as pairs (first, last) of log R indices */
    private static int[] runs(BitSet refused, int i, int nr) {
        int base = i * nr;
        int[] runs = new int[0];
        int j = refused.nextSetBit(base);
        while (j >= 0 && j < base + nr) {
            int end = Math.min(refused.nextClearBit(j), base + nr);
            runs = java.util.Arrays.copyOf(runs, runs.length + 2);
            runs[runs.length - 2] = j - base;
            runs[runs.length - 1] = end - 1 - base;
            j = refused.nextSetBit(end);
        }
        return runs;
    }

    private static String range(double lo, double hi) {
        return lo == hi ? Double.toString(lo) : lo + ".." + hi;
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
