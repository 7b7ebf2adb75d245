package io.github.startransport.spi;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.IntToDoubleFunction;

/**
 * The diagnosis of one profile: per-zone columns (centre to surface), regimes, regions,
 * timescales and warnings. Immutable: accessors return copies.
 */
public final class ProfileDiagnosis {
    private final String source;
    private final Criterion criterion;
    private final double alpha;
    private final EnumMap<DiagnosisColumn, double[]> columns;
    /** Columns not stored but computed per zone from stored ones (only through ColumnSharing). */
    private final EnumMap<DiagnosisColumn, IntToDoubleFunction> derived;
    private final Regime[] regimes;
    private final List<Region> regions;
    private final Timescales timescales;
    private final List<String> warnings;
    private final SeismicSummary seismic;

    /**
     * @param source     where the profile came from
     * @param criterion  criterion the regimes were decided by
     * @param alpha      mixing-length parameter used
     * @param columns    every {@link DiagnosisColumn}, each as long as {@code regimes}
     * @param regimes    regime per zone
     * @param regions    non-radiative regions, centre to surface
     * @param timescales whole-star timescales
     * @param warnings   what the diagnosis had to assume or could not trust, one sentence each
     */
    public ProfileDiagnosis(String source, Criterion criterion, double alpha, Map<DiagnosisColumn, double[]> columns,
                            Regime[] regimes, List<Region> regions, Timescales timescales, List<String> warnings) {
        this(source, criterion, alpha, columns, regimes, regions, timescales, warnings, true);
    }

    /**
     * @param copy whether to copy the arrays; {@code false} only through
     *             {@link io.github.startransport.spi.sharing.ColumnSharing}, whose caller hands
     *             the arrays over (they are arrays of an immutable {@link Profile}, or new ones
     *             nobody else keeps)
     */
    ProfileDiagnosis(String source, Criterion criterion, double alpha, Map<DiagnosisColumn, double[]> columns,
                     Regime[] regimes, List<Region> regions, Timescales timescales, List<String> warnings,
                     boolean copy) {
        this(source, criterion, alpha, columns, Map.of(), regimes, regions, timescales, warnings, copy);
    }

    /**
     * @param derived columns computed per zone from stored ones rather than stored (only through
     *                {@link io.github.startransport.spi.sharing.ColumnSharing}): each a pure function
     *                of the zone index over arrays nobody writes, so that a profile of millions of
     *                zones needs no array for them
     */
    ProfileDiagnosis(String source, Criterion criterion, double alpha, Map<DiagnosisColumn, double[]> columns,
                     Map<DiagnosisColumn, IntToDoubleFunction> derived, Regime[] regimes, List<Region> regions,
                     Timescales timescales, List<String> warnings, boolean copy) {
        this.source = source;
        this.criterion = criterion;
        this.alpha = alpha;
        this.columns = new EnumMap<>(DiagnosisColumn.class);
        this.derived = new EnumMap<>(DiagnosisColumn.class);
        for (DiagnosisColumn c : DiagnosisColumn.values()) {
            double[] v = columns.get(c);
            IntToDoubleFunction f = derived.get(c);
            if (v == null && f != null) {
                this.derived.put(c, f);
                continue;
            }
            if (v == null || v.length != regimes.length) {
                throw new IllegalArgumentException("column " + c.header() + " missing or of the wrong length");
            }
            this.columns.put(c, copy ? v.clone() : v);
        }
        this.regimes = copy ? regimes.clone() : regimes;
        this.regions = List.copyOf(regions);
        this.timescales = timescales;
        this.warnings = List.copyOf(warnings);
        this.seismic = null;
    }

    /**
     * @param source     where the profile came from
     * @param criterion  criterion the regimes were decided by
     * @param alpha      mixing-length parameter used
     * @param columns    every {@link DiagnosisColumn}, each as long as {@code regimes}
     * @param regimes    regime per zone
     * @param regions    non-radiative regions, centre to surface
     * @param timescales whole-star timescales
     * @param warnings   what the diagnosis had to assume or could not trust, one sentence each
     * @param seismic    whole-model seismic integrals, or {@code null} when not computed
     */
    public ProfileDiagnosis(String source, Criterion criterion, double alpha, Map<DiagnosisColumn, double[]> columns,
                            Regime[] regimes, List<Region> regions, Timescales timescales, List<String> warnings,
                            SeismicSummary seismic) {
        this(new ProfileDiagnosis(source, criterion, alpha, columns, regimes, regions, timescales, warnings, true),
                seismic);
    }

    /** The same diagnosis (its arrays shared: they are never handed out) with the seismic integrals. */
    private ProfileDiagnosis(ProfileDiagnosis d, SeismicSummary seismic) {
        this.source = d.source;
        this.criterion = d.criterion;
        this.alpha = d.alpha;
        this.columns = d.columns;
        this.derived = d.derived;
        this.regimes = d.regimes;
        this.regions = d.regions;
        this.timescales = d.timescales;
        this.warnings = d.warnings;
        this.seismic = seismic;
    }

    /**
     * @param seismic whole-model seismic integrals of this diagnosis
     * @return this diagnosis with them (nothing copied: the columns are never handed out)
     */
    public ProfileDiagnosis withSeismic(SeismicSummary seismic) {
        return new ProfileDiagnosis(this, seismic);
    }

    /** @return the whole-model seismic integrals, when the diagnoser computed them */
    public Optional<SeismicSummary> seismic() {
        return Optional.ofNullable(seismic);
    }

    /** @return where the profile came from */
    public String source() {
        return source;
    }

    /** @return the criterion the regimes were decided by */
    public Criterion criterion() {
        return criterion;
    }

    /** @return the mixing-length parameter used */
    public double alpha() {
        return alpha;
    }

    /** @return number of zones */
    public int size() {
        return regimes.length;
    }

    /**
     * @param column a column
     * @return a copy of its values, centre to surface
     */
    public double[] column(DiagnosisColumn column) {
        double[] v = columns.get(column);
        if (v != null) {
            return v.clone();
        }
        IntToDoubleFunction f = derived.get(column);
        double[] a = new double[regimes.length];
        for (int k = 0; k < a.length; k++) {
            a[k] = f.applyAsDouble(k);
        }
        return a;
    }

    /**
     * @param column a column
     * @param zone   zone index, centre = 0
     * @return the value
     */
    public double value(DiagnosisColumn column, int zone) {
        double[] v = columns.get(column);
        if (v != null) {
            return v[zone];
        }
        return derived.get(column).applyAsDouble(Objects.checkIndex(zone, regimes.length));
    }

    /**
     * @param zone zone index, centre = 0
     * @return the regime of that zone
     */
    public Regime regime(int zone) {
        return regimes[zone];
    }

    /** @return a copy of the regime of every zone */
    public Regime[] regimes() {
        return regimes.clone();
    }

    /** @return the non-radiative regions, centre to surface */
    public List<Region> regions() {
        return regions;
    }

    /** @return the timescales */
    public Timescales timescales() {
        return timescales;
    }

    /** @return warnings, one sentence each */
    public List<String> warnings() {
        return warnings;
    }

    /**
     * @return the largest {@link DiagnosisColumn#NABLA_MISMATCH} over all zones, NaN when no zone has one:
     *         above 0.1 the model's own gradient and the transport physics disagree somewhere
     */
    public double maxNablaMismatch() {
        return maxNablaMismatch(0, size() - 1);
    }

    /**
     * @param firstZone first zone (centre = 0), e.g. {@link Region#firstZone()}
     * @param lastZone  last zone, inclusive
     * @return the largest {@link DiagnosisColumn#NABLA_MISMATCH} over those zones, NaN when none has one
     */
    public double maxNablaMismatch(int firstZone, int lastZone) {
        double max = Double.NaN;
        for (int k = firstZone; k <= lastZone; k++) {
            double m = value(DiagnosisColumn.NABLA_MISMATCH, k);
            if (!Double.isNaN(m) && !(m <= max)) {
                max = m;
            }
        }
        return max;
    }

    /** @return total mass M (g) */
    public double mass() {
        return value(DiagnosisColumn.MASS, size() - 1);
    }

    /** @return outer radius R (cm) */
    public double radius() {
        return value(DiagnosisColumn.RADIUS, size() - 1);
    }

    /** @return surface luminosity (erg s^-1) */
    public double luminosity() {
        return value(DiagnosisColumn.LUMINOSITY, size() - 1);
    }
}
