package io.github.startransport.core.opacity;

import io.github.startransport.spi.OpacityGridSpec;

/**
 * The demonstration table: {@link AnalyticOpacity#DEFAULT} tabulated by {@link OpacityTableBuilder}
 * at run time (no data file is shipped) and read back through {@link OpacityTableReader}, built once
 * on first use.
 *
 * <p>Grid: X in {0, 0.35, 0.7}, Z in {0.01, 0.02, 0.04}; log T from 3.5 to 8.5 in steps of 0.05
 * (101 nodes); log R from -9 to 1 in steps of 0.125 (81 nodes): 9 tables of 8181 nodes, 73,629
 * values. Held in memory: 4 doubles per node, about 2.4 MB.
 */
public final class DemoTable {
    private DemoTable() {
    }

    /** Name of the demo table in messages. */
    public static final String SOURCE = "built-in demo table (analytic-composite, tabulated at start-up)";

    /** @return the grid of the demo table */
    public static OpacityGridSpec grid() {
        return new OpacityGridSpec(new double[] {0.0, 0.35, 0.7}, new double[] {0.01, 0.02, 0.04},
                OpacityGridSpec.evenly(3.5, 8.5, 101), OpacityGridSpec.evenly(-9.0, 1.0, 81));
    }

    /** @return the demo table set (built once, shared; immutable) */
    public static OpacityTableSet set() {
        return Holder.SET;
    }

    private static final class Holder {
        static final OpacityTableSet SET =
                OpacityTableReader.parse(OpacityTableBuilder.text(AnalyticOpacity.DEFAULT, grid()), SOURCE);
    }
}
