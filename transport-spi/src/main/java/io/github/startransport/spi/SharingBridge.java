package io.github.startransport.spi;

import io.github.startransport.spi.sharing.ColumnSharing;

import java.util.List;
import java.util.Map;
import java.util.function.IntToDoubleFunction;

/** Lets {@link ColumnSharing} reach the package-private, copy-free members of this package. */
final class SharingBridge extends ColumnSharing.Access {
    static {
        ColumnSharing.Access.install(new SharingBridge());
    }

    private SharingBridge() {
    }

    @Override
    protected double[] column(Profile profile, ProfileColumn column) {
        return profile.shared(column);
    }

    @Override
    protected ProfileDiagnosis diagnosis(String source, Criterion criterion, double alpha,
                                         Map<DiagnosisColumn, double[]> columns,
                                         Map<DiagnosisColumn, IntToDoubleFunction> derived, Regime[] regimes,
                                         List<Region> regions, Timescales timescales, List<String> warnings) {
        return new ProfileDiagnosis(source, criterion, alpha, columns, derived, regimes, regions, timescales, warnings,
                false);
    }
}
