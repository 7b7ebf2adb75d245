package io.github.startransport.cli;

import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;

class ZoneTableTest {
    /** The column list of issue 6, verbatim, with issue 10's nabla_model and its mismatch after nabla. */
    private static final String ISSUE_HEADER = "r_cm,m_g,T_K,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z,kappa_cm2_g,cp_erg_g_K,delta,"
            + "nabla_ad,nabla_mu,g_cm_s2,H_P_cm,nabla_rad,nabla_ledoux,regime,nabla,nabla_model,nabla_mismatch,nabla_e,"
            + "v_conv_cm_s,flux_conv_frac,D_mix_cm2_s";
    /** The columns issue 14 adds after them, verbatim. */
    private static final String ISSUE_14_COLUMNS = ",Gamma1,phi,c_s_cm_s,N2_rad2_s2,S1_rad_s";
    /** The column issue 15 adds at the end, verbatim. */
    private static final String ISSUE_15_COLUMNS = ",D_overshoot_cm2_s";

    @Test
    void headerIsExactlyTheIssuesAndEveryCellReadsBackToTheSameDouble(@TempDir Path dir) throws Exception {
        ProfileDiagnosis d = HandMadeDiagnosis.build();
        Path file = dir.resolve("zones.csv");
        ZoneTable.write(d, file);
        List<String> lines = Files.readAllLines(file);
        assertEquals(ISSUE_HEADER + ISSUE_14_COLUMNS + ISSUE_15_COLUMNS, lines.get(0));
        try (Reader in = Files.newBufferedReader(file);
             CSVParser csv = CSVParser.parse(in, CSVFormat.DEFAULT.builder().setHeader().get())) {
            List<CSVRecord> rows = csv.getRecords();
            assertEquals(d.size(), rows.size());
            Regime[] regimes = d.regimes();
            for (int k = 0; k < rows.size(); k++) {
                for (DiagnosisColumn c : DiagnosisColumn.values()) {
                    assertEquals(d.value(c, k), Double.parseDouble(rows.get(k).get(c.header())), c.header() + " zone " + k);
                }
                assertEquals(regimes[k], Regime.fromLabel(rows.get(k).get("regime")));
            }
        }
    }
    @Test
    void aTableOfManyBlocksWrittenOnSeveralCoresKeepsEveryRowInOrder(@TempDir Path dir) throws Exception {
        int n = 3 * 8192 + 123;
        java.util.Map<DiagnosisColumn, double[]> columns = new java.util.EnumMap<>(DiagnosisColumn.class);
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(3);
        for (DiagnosisColumn c : DiagnosisColumn.values()) {
            double[] v = new double[n];
            for (int k = 0; k < n; k++) {
                v[k] = c == DiagnosisColumn.RADIUS ? k + 1.0 : Math.exp(rnd.nextDouble(-60, 60));
            }
            columns.put(c, v);
        }
        Regime[] regimes = new Regime[n];
        for (int k = 0; k < n; k++) {
            regimes[k] = Regime.values()[k % Regime.values().length];
        }
        ProfileDiagnosis d = new ProfileDiagnosis("many", io.github.startransport.spi.Criterion.LEDOUX, 1.8, columns,
                regimes, List.of(), new io.github.startransport.spi.Timescales(1, 2, 3), List.of());
        Path file = dir.resolve("zones.csv");
        ZoneTable.write(d, file);
        try (Reader in = Files.newBufferedReader(file);
             CSVParser csv = CSVParser.parse(in, CSVFormat.DEFAULT.builder().setHeader().get())) {
            List<CSVRecord> rows = csv.getRecords();
            assertEquals(n, rows.size());
            for (int k = 0; k < n; k++) {
                for (DiagnosisColumn c : DiagnosisColumn.values()) {
                    assertEquals(d.value(c, k), Double.parseDouble(rows.get(k).get(c.header())), c.header() + " zone " + k);
                }
                assertEquals(regimes[k], Regime.fromLabel(rows.get(k).get("regime")));
            }
        }
    }
}
