package io.github.startransport.spi;

import java.util.List;
import java.util.Objects;

/**
 * What a checked opacity table file holds: one entry per (X, Z) table. Not a hot-path type.
 *
 * @param source where the file came from
 * @param tables the (X, Z) tables, ordered by Z then X
 */
public record OpacityTableSummary(String source, List<Table> tables) {
    /**
     * Validates and copies.
     *
     * @param source where the file came from
     * @param tables the (X, Z) tables, ordered by Z then X
     */
    public OpacityTableSummary {
        Objects.requireNonNull(source, "source");
        tables = List.copyOf(tables);
    }

    /**
     * One (X, Z) table.
     *
     * @param hydrogen  X (mass fraction)
     * @param metals    Z (mass fraction)
     * @param logTCount number of log T nodes
     * @param logTMin   smallest log10 T (log K)
     * @param logTMax   largest log10 T (log K)
     * @param logRCount number of log R nodes
     * @param logRMin   smallest log10 R
     * @param logRMax   largest log10 R
     * @param present   nodes with a value
     * @param absent    nodes declared absent (holes)
     */
    public record Table(double hydrogen, double metals, int logTCount, double logTMin, double logTMax,
                        int logRCount, double logRMin, double logRMax, int present, int absent) {
        /** @return the fraction of grid nodes that have a value, in (0, 1] */
        public double coverage() {
            return present / (double) (present + absent);
        }
    }

    /** @return the number of log10 kappa values in the file */
    public long values() {
        return tables.stream().mapToLong(Table::present).sum();
    }
}
