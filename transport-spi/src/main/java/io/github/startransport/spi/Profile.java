package io.github.startransport.spi;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.Map;

/**
 * A stellar model as columns, centre to surface, cgs. Immutable: the constructor validates and
 * copies.
 *
 * <p>Input ordered surface to centre (radius decreasing) is accepted and reversed. Refused with
 * {@link InvalidInputException} naming the column (its header) and the zone index <em>as given</em>
 * (0-based): a missing required column, columns of unequal length, fewer than 3 zones, a
 * non-finite value, a value outside its column's domain, non-monotonic r or m, duplicate zones
 * (equal r). The centre itself (r = 0) is not a zone: the first zone has r &gt; 0 and m &gt; 0.
 */
public final class Profile {
    private final String source;
    private final int size;
    private final boolean reversed;
    private final EnumMap<ProfileColumn, double[]> columns;

    /**
     * @param source  where the profile came from (file name, model name), for messages
     * @param columns the columns; optional ones may be absent
     * @throws InvalidInputException when the profile is malformed
     */
    public Profile(String source, Map<ProfileColumn, double[]> columns) {
        this.source = source;
        EnumMap<ProfileColumn, double[]> copy = new EnumMap<>(ProfileColumn.class);
        int n = -1;
        for (ProfileColumn c : ProfileColumn.values()) {
            double[] values = columns.get(c);
            if (values == null) {
                if (c.required()) {
                    throw new InvalidInputException(c.header(), Double.NaN, c.unit(), InvalidInputException.NO_ZONE,
                            "present: the column " + c.header() + " is required in every profile (" + source + ")");
                }
                continue;
            }
            if (n < 0) {
                n = values.length;
            } else if (values.length != n) {
                throw new InvalidInputException(c.header(), values.length, "zones", InvalidInputException.NO_ZONE,
                        "as long as the other columns (" + n + " zones) in " + source);
            }
            copy.put(c, values.clone());
        }
        if (n < 3) {
            throw new InvalidInputException(ProfileColumn.RADIUS.header(), Math.max(n, 0), "zones",
                    InvalidInputException.NO_ZONE, "at least 3 (a profile needs at least 3 zones; " + source
                    + " has " + Math.max(n, 0) + ")");
        }
        this.size = n;
        for (Map.Entry<ProfileColumn, double[]> e : copy.entrySet()) {
            checkDomain(e.getKey(), e.getValue());
        }
        double[] x = copy.get(ProfileColumn.HYDROGEN);
        double[] z = copy.get(ProfileColumn.METALS);
        for (int k = 0; k < n; k++) {
            if (x[k] + z[k] > 1.0 + 1e-12) {
                throw new InvalidInputException(ProfileColumn.METALS.header(), z[k], "1", k,
                        "at most 1 - X = " + Checks.rounded(1.0 - x[k]) + " (" + source + ")");
            }
        }
        double[] r = copy.get(ProfileColumn.RADIUS);
        this.reversed = r[n - 1] < r[0];
        if (reversed) {
            for (double[] v : copy.values()) {
                reverse(v);
            }
        }
        checkIncreasing(copy.get(ProfileColumn.RADIUS), ProfileColumn.RADIUS);
        checkIncreasing(copy.get(ProfileColumn.MASS), ProfileColumn.MASS);
        this.columns = copy;
    }

    /** Every value of column c inside its domain; the first one outside is refused (a loop per domain: millions of zones). */
    private void checkDomain(ProfileColumn c, double[] v) {
        int n = v.length;
        switch (c) {
            case LUMINOSITY, NABLA_MU -> {
                for (int k = 0; k < n; k++) {
                    if (!Double.isFinite(v[k])) {
                        throw new InvalidInputException(c.header(), v[k], c.unit(), k, "finite" + where());
                    }
                }
            }
            case HYDROGEN, METALS -> {
                for (int k = 0; k < n; k++) {
                    if (!(v[k] >= 0.0 && v[k] <= 1.0)) {
                        throw new InvalidInputException(c.header(), v[k], c.unit(), k, "inside [0, 1]" + where());
                    }
                }
            }
            case NABLA_AD -> {
                for (int k = 0; k < n; k++) {
                    if (!(v[k] > 0.0 && v[k] < 1.0)) {
                        throw new InvalidInputException(c.header(), v[k], c.unit(), k, "inside (0, 1)" + where());
                    }
                }
            }
            default -> {
                for (int k = 0; k < n; k++) {
                    if (!(v[k] > 0.0) || v[k] == Double.POSITIVE_INFINITY) {
                        throw new InvalidInputException(c.header(), v[k], c.unit(), k, "finite and > 0" + where());
                    }
                }
            }
        }
    }

    private String where() {
        return " (" + source + ")";
    }

    private void checkIncreasing(double[] v, ProfileColumn c) {
        for (int k = 1; k < size; k++) {
            if (!(v[k] > v[k - 1])) {
                int given = reversed ? size - 1 - k : k;
                String what = v[k] == v[k - 1] ? "different from its neighbour (duplicate zone)"
                        : "monotonic from centre to surface (the zone before it has " + c.header() + " = " + v[k - 1] + ")";
                throw new InvalidInputException(c.header(), v[k], c.unit(), given, what + " in " + source);
            }
        }
    }

    private static void reverse(double[] v) {
        for (int i = 0, j = v.length - 1; i < j; i++, j--) {
            double t = v[i];
            v[i] = v[j];
            v[j] = t;
        }
    }

    /** @return where the profile came from */
    public String source() {
        return source;
    }

    /** @return number of zones */
    public int size() {
        return size;
    }

    /** @return whether the input was ordered surface to centre and has been reversed */
    public boolean wasReversed() {
        return reversed;
    }

    /**
     * @param column a column
     * @return whether the profile holds it
     */
    public boolean has(ProfileColumn column) {
        return columns.containsKey(column);
    }

    /**
     * @param column a column the profile holds
     * @return a copy of its values, centre to surface
     * @throws IllegalArgumentException when the column is absent
     */
    public double[] column(ProfileColumn column) {
        double[] v = columns.get(column);
        if (v == null) {
            throw new IllegalArgumentException("profile " + source + " has no column " + column.header());
        }
        return v.clone();
    }

    /** @return the column's own array (not a copy), or {@code null}; for {@link io.github.startransport.spi.sharing.ColumnSharing} */
    double[] shared(ProfileColumn column) {
        return columns.get(column);
    }

    /**
     * @param column a column the profile holds
     * @param zone   zone index, centre = 0
     * @return the value
     */
    public double value(ProfileColumn column, int zone) {
        double[] v = columns.get(column);
        if (v == null) {
            throw new IllegalArgumentException("profile " + source + " has no column " + column.header());
        }
        return v[zone];
    }

    /** @return the outermost radius R (cm) */
    public double radius() {
        return value(ProfileColumn.RADIUS, size - 1);
    }

    /** @return the outermost mass M (g) */
    public double mass() {
        return value(ProfileColumn.MASS, size - 1);
    }

    /** @return the outermost luminosity (erg s^-1) */
    public double luminosity() {
        return value(ProfileColumn.LUMINOSITY, size - 1);
    }

    /**
     * @param other another profile
     * @return whether both hold the same columns with bit-identical values
     */
    public boolean sameData(Profile other) {
        if (other.size != size || !other.columns.keySet().equals(columns.keySet())) {
            return false;
        }
        for (Map.Entry<ProfileColumn, double[]> e : columns.entrySet()) {
            if (!Arrays.equals(e.getValue(), other.columns.get(e.getKey()))) {
                return false;
            }
        }
        return true;
    }

    @Override
    public String toString() {
        return "Profile[" + source + ", " + size + " zones, columns " + columns.keySet() + "]";
    }
}
