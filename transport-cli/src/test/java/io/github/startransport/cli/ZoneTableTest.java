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
    /** The column list of issue 6, verbatim, then issue 15's overshoot column. */
    private static final String ISSUE_HEADER = "r_cm,m_g,T_K,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z,kappa_cm2_g,cp_erg_g_K,delta,"
            + "nabla_ad,nabla_mu,g_cm_s2,H_P_cm,nabla_rad,nabla_ledoux,regime,nabla,nabla_e,"
            + "v_conv_cm_s,flux_conv_frac,D_mix_cm2_s,D_overshoot_cm2_s";

    @Test
    void headerIsExactlyTheIssuesAndEveryCellReadsBackToTheSameDouble(@TempDir Path dir) throws Exception {
        ProfileDiagnosis d = HandMadeDiagnosis.build();
        Path file = dir.resolve("zones.csv");
        ZoneTable.write(d, file);
        List<String> lines = Files.readAllLines(file);
        assertEquals(ISSUE_HEADER, lines.get(0));
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
}
