package io.github.startransport.core.opacity;

import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityColumns;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.OutOfRangePolicy;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/**
 * {@link OpacityModel} backed by a table file in our format, interpolated by {@link OpacityTableSet}
 * (bicubic Hermite in log T, log R; blended quadratics across X and Z) with the caller's
 * {@link OutOfRangePolicy}. Immutable, thread-safe, allocation-free per lookup.
 */
public final class TabulatedOpacity implements OpacityModel {
    /** Name to ask for this model by. */
    public static final String NAME = "table";

    /** Describes this model and its options. */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.OPACITY, NAME,
            "tabulated log kappa (file format X,Z,log_T,log_R,log_kappa): bicubic Hermite in (log T, log R), "
                    + "continuous value and derivatives, quadratic blending across X and Z",
            List.of(new OptionInfo("file", "", "",
                            "table file to read; empty for the built-in demo table (the analytic composite tabulated "
                                    + "at start-up)"),
                    new OptionInfo("out-of-range", "refuse", "",
                            "refuse, clamp or extrapolate: what a query outside the table does")));

    private final OpacityTableSet set;
    private final OutOfRangePolicy policy;

    /**
     * @param set    the tables
     * @param policy what to do outside them
     */
    public TabulatedOpacity(OpacityTableSet set, OutOfRangePolicy policy) {
        this.set = Objects.requireNonNull(set, "set");
        this.policy = Objects.requireNonNull(policy, "policy");
    }

    /**
     * @param options {@code file}, {@code out-of-range}
     * @return the model
     * @throws io.github.startransport.spi.DataFormatException when the file is malformed
     */
    public static TabulatedOpacity fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        OutOfRangePolicy policy = options.getEnum(NAME, "out-of-range", OutOfRangePolicy.class, OutOfRangePolicy.REFUSE);
        String file = options.getString(NAME, "file", "");
        OpacityTableSet set = file.isBlank() ? DemoTable.set() : OpacityTableReader.read(Path.of(file));
        return new TabulatedOpacity(set, policy);
    }

    /** A loop over this model's own lookup with the output's working space: no allocation, no per-zone dispatch. */
    @Override
    public void evaluateColumns(ZoneColumns in, int from, int to, OpacityColumns out) {
        in.checkRange(from, to, out.capacity);
        final OpacityResult r = out.workResult;
        final double[] t = in.temperature;
        final double[] rho = in.density;
        final double[] x = in.hydrogen;
        final double[] z = in.metals;
        for (int k = from; k < to; k++) {
            set.evaluate(t[k], rho[k], x[k], z[k], policy, k, r);
            out.store(k, r);
        }
    }

    @Override
    public void evaluate(double temperature, double density, double hydrogen, double metals, int zone,
                         OpacityResult out) {
        set.evaluate(temperature, density, hydrogen, metals, policy, zone, out);
    }

    /** @return the tables */
    public OpacityTableSet tables() {
        return set;
    }

    /** @return the out-of-range policy */
    public OutOfRangePolicy policy() {
        return policy;
    }

    @Override
    public String toString() {
        return NAME + "(" + set.source() + ", out-of-range=" + policy.name().toLowerCase(java.util.Locale.ROOT) + ")";
    }
}
