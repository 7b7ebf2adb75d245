package io.github.startransport.spi.sharing;

import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.Timescales;

import java.util.List;
import java.util.Map;
import java.util.function.IntToDoubleFunction;

/**
 * Column access without copies, for the library's own diagnosis, so that a profile of millions
 * of zones and its diagnosis fit in memory once. Not an API: on the module path this package is
 * exported to the core module only; elsewhere, treat it as absent.
 *
 * <p>A {@link Profile} is immutable, so a diagnosis may share its arrays; the arrays a diagnoser
 * computes become the diagnosis's own. Whoever calls these methods must never write into an
 * array obtained from a profile, nor into an array handed to a diagnosis.
 */
public final class ColumnSharing {
    private ColumnSharing() {
    }

    /**
     * @param profile a profile
     * @param column  one of its columns
     * @return the profile's own array for the column (read only!), or {@code null} when absent
     */
    public static double[] read(Profile profile, ProfileColumn column) {
        return Access.read(profile, column);
    }

    /**
     * A diagnosis that takes the given arrays as they are, without copying them.
     *
     * @param source     where the profile came from
     * @param criterion  criterion the regimes were decided by
     * @param alpha      mixing-length parameter used
     * @param columns    every {@link DiagnosisColumn}, each as long as {@code regimes}: arrays of
     *                   the profile, or new arrays no one else keeps
     * @param regimes    regime per zone (taken, not copied)
     * @param regions    non-radiative regions, centre to surface
     * @param timescales whole-star timescales
     * @param warnings   warnings, one sentence each
     * @return the diagnosis
     */
    public static ProfileDiagnosis adopt(String source, Criterion criterion, double alpha,
                                         Map<DiagnosisColumn, double[]> columns, Regime[] regimes,
                                         List<Region> regions, Timescales timescales, List<String> warnings) {
        return Access.adopt(source, criterion, alpha, columns, Map.of(), regimes, regions, timescales, warnings);
    }

    /**
     * A diagnosis that takes the given arrays as they are, and computes some columns per zone
     * instead of storing them.
     *
     * @param source     where the profile came from
     * @param criterion  criterion the regimes were decided by
     * @param alpha      mixing-length parameter used
     * @param columns    the stored columns, each as long as {@code regimes}: arrays of the profile,
     *                   or new arrays no one else keeps
     * @param derived    every other {@link DiagnosisColumn}: a pure function of the zone index (0 to
     *                   {@code regimes.length - 1}) over arrays no one writes, giving the value the
     *                   diagnoser would have stored
     * @param regimes    regime per zone (taken, not copied)
     * @param regions    non-radiative regions, centre to surface
     * @param timescales whole-star timescales
     * @param warnings   warnings, one sentence each
     * @return the diagnosis
     */
    public static ProfileDiagnosis adopt(String source, Criterion criterion, double alpha,
                                         Map<DiagnosisColumn, double[]> columns,
                                         Map<DiagnosisColumn, IntToDoubleFunction> derived, Regime[] regimes,
                                         List<Region> regions, Timescales timescales, List<String> warnings) {
        return Access.adopt(source, criterion, alpha, columns, derived, regimes, regions, timescales, warnings);
    }

    /** The bridge into the spi package's package-private members; set by {@code Profile}'s package. */
    public abstract static class Access {
        private static Access instance;

        /** Only the spi package makes one. */
        protected Access() {
        }

        /**
         * @param access the bridge; accepted once
         */
        public static synchronized void install(Access access) {
            if (instance == null && access.getClass().getName().equals("io.github.startransport.spi.SharingBridge")) {
                instance = access;
            }
        }

        private static Access get() {
            if (instance == null) {
                // loading the spi package's bridge installs it
                try {
                    Class.forName("io.github.startransport.spi.SharingBridge", true, ColumnSharing.class.getClassLoader());
                } catch (ClassNotFoundException e) {
                    throw new IllegalStateException(e);
                }
            }
            return instance;
        }

        static double[] read(Profile profile, ProfileColumn column) {
            return get().column(profile, column);
        }

        static ProfileDiagnosis adopt(String source, Criterion criterion, double alpha,
                                      Map<DiagnosisColumn, double[]> columns,
                                      Map<DiagnosisColumn, IntToDoubleFunction> derived, Regime[] regimes,
                                      List<Region> regions, Timescales timescales, List<String> warnings) {
            return get().diagnosis(source, criterion, alpha, columns, derived, regimes, regions, timescales,
                    warnings);
        }

        /**
         * @param profile a profile
         * @param column  a column
         * @return its own array, or {@code null}
         */
        protected abstract double[] column(Profile profile, ProfileColumn column);

        /**
         * @param source     source
         * @param criterion  criterion
         * @param alpha      alpha
         * @param columns    columns, taken
         * @param derived    columns computed per zone
         * @param regimes    regimes, taken
         * @param regions    regions
         * @param timescales timescales
         * @param warnings   warnings
         * @return the diagnosis
         */
        protected abstract ProfileDiagnosis diagnosis(String source, Criterion criterion, double alpha,
                                                      Map<DiagnosisColumn, double[]> columns,
                                                      Map<DiagnosisColumn, IntToDoubleFunction> derived,
                                                      Regime[] regimes,
                                                      List<Region> regions, Timescales timescales,
                                                      List<String> warnings);
    }
}
