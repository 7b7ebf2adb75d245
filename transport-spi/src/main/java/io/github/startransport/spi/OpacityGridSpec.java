package io.github.startransport.spi;

import java.util.Arrays;

/**
 * The nodes at which an opacity model is tabulated into a table file: every combination of the
 * listed X, Z, log T and log R values is one row of the file.
 *
 * <p>Arrays are copied in and out. Not a hot-path type.
 *
 * @param hydrogen X values (mass fraction), each in [0, 1], strictly increasing
 * @param metals   Z values (mass fraction), each in [0, 1], strictly increasing; X + Z &lt;= 1 for every pair
 * @param logT     log10 T nodes (log K), strictly increasing, at least 2
 * @param logR     log10 R nodes, R = rho / T_6^3 (log_R = log10 rho - 3 log10 T + 18), strictly increasing, at least 2
 */
public record OpacityGridSpec(double[] hydrogen, double[] metals, double[] logT, double[] logR) {
    /**
     * Validates and copies.
     *
     * @param hydrogen X values (mass fraction), each in [0, 1], strictly increasing
     * @param metals   Z values (mass fraction), each in [0, 1], strictly increasing; X + Z &lt;= 1 for every pair
     * @param logT     log10 T nodes (log K), strictly increasing, at least 2
     * @param logR     log10 R nodes, R = rho / T_6^3 (log_R = log10 rho - 3 log10 T + 18), strictly increasing, at least 2
     */
    public OpacityGridSpec {
        hydrogen = increasing("hydrogen", hydrogen, 1);
        metals = increasing("metals", metals, 1);
        logT = increasing("logT", logT, 2);
        logR = increasing("logR", logR, 2);
        for (double x : hydrogen) {
            Checks.closedInterval("hydrogen", x, 0.0, 1.0, "1", InvalidInputException.NO_ZONE);
            for (double z : metals) {
                Checks.closedInterval("metals", z, 0.0, 1.0 - x, "1", InvalidInputException.NO_ZONE);
            }
        }
    }

    private static double[] increasing(String field, double[] a, int min) {
        if (a == null || a.length < min) {
            throw new InvalidInputException(field + ".length", a == null ? 0 : a.length, "1",
                    InvalidInputException.NO_ZONE, ">= " + min);
        }
        double[] c = a.clone();
        for (int k = 0; k < c.length; k++) {
            Checks.finite(field, c[k], "1", InvalidInputException.NO_ZONE);
            if (k > 0 && !(c[k] > c[k - 1])) {
                throw new InvalidInputException(field, c[k], "1", InvalidInputException.NO_ZONE,
                        "> the previous value " + c[k - 1] + " (values strictly increasing)");
            }
        }
        return c;
    }

    /** @return copy of the X values */
    @Override
    public double[] hydrogen() {
        return hydrogen.clone();
    }

    /** @return copy of the Z values */
    @Override
    public double[] metals() {
        return metals.clone();
    }

    /** @return copy of the log T nodes */
    @Override
    public double[] logT() {
        return logT.clone();
    }

    /** @return copy of the log R nodes */
    @Override
    public double[] logR() {
        return logR.clone();
    }

    /** @return the number of nodes, every X, Z, log T, log R combination (a {@code long}: it can pass 2^31) */
    public long nodes() {
        return (long) hydrogen.length * metals.length * logT.length * logR.length;
    }

    /**
     * Evenly spaced nodes, computed as lo + k (hi - lo) / (n - 1) so that end points are exact.
     *
     * @param lo first value
     * @param hi last value, &gt; lo
     * @param n  number of values, &gt;= 2
     * @return the nodes
     */
    public static double[] evenly(double lo, double hi, int n) {
        if (n < 2) {
            throw new InvalidInputException("n", n, "1", InvalidInputException.NO_ZONE, "at least 2 (values on the axis)");
        }
        if (!(hi > lo)) {
            throw new InvalidInputException("hi", hi, "1", InvalidInputException.NO_ZONE, "greater than lo = "
                    + Checks.text(lo));
        }
        double[] a = new double[n];
        for (int k = 0; k < n; k++) {
            a[k] = k == n - 1 ? hi : lo + k * (hi - lo) / (n - 1);
        }
        return a;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof OpacityGridSpec s && Arrays.equals(hydrogen, s.hydrogen) && Arrays.equals(metals, s.metals)
                && Arrays.equals(logT, s.logT) && Arrays.equals(logR, s.logR);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(new int[] {Arrays.hashCode(hydrogen), Arrays.hashCode(metals), Arrays.hashCode(logT),
            Arrays.hashCode(logR)});
    }

    @Override
    public String toString() {
        return "OpacityGridSpec[X=" + Arrays.toString(hydrogen) + ", Z=" + Arrays.toString(metals) + ", log_T "
                + logT.length + " nodes " + logT[0] + ".." + logT[logT.length - 1] + ", log_R " + logR.length + " nodes "
                + logR[0] + ".." + logR[logR.length - 1] + "]";
    }
}
