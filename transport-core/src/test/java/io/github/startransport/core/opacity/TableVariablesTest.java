package io.github.startransport.core.opacity;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OutOfRangePolicy;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The opacity-table variable R = rho / T_6^3, log R = log rho - 3 log T + 18 (Seaton &amp; Badnell 2004; the
 * convention of the OPAL and OP tables): a table whose log kappa is a linear function of log T and log R is
 * interpolated exactly, so looking it up at (T, rho) must give that function of log T and log10(rho / T_6^3)
 * written out here, with the slopes d ln kappa / d ln rho and d ln kappa / d ln T that follow from it.
 */
class TableVariablesTest {

    /** log kappa = 0.3 + 0.5 log R - 0.25 (log T - 4) on log T 3.5..6.0, log R -6..0, X = 0.7, Z = 0.02. */
    private static OpacityTableSet linearTable() {
        StringBuilder text = new StringBuilder("X,Z,log_T,log_R,log_kappa\n");
        for (int i = 0; i <= 10; i++) {
            double logT = 3.5 + 0.25 * i;
            for (int j = 0; j <= 12; j++) {
                double logR = -6.0 + 0.5 * j;
                text.append("0.7,0.02,").append(logT).append(',').append(logR).append(',')
                        .append(0.3 + 0.5 * logR - 0.25 * (logT - 4.0)).append('\n');
            }
        }
        return OpacityTableReader.parse(text.toString(), "linear.csv");
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void lookUpInRhoAndTUsesLogROfSeatonAndBadnell() {
        TabulatedOpacity model = new TabulatedOpacity(linearTable(), OutOfRangePolicy.REFUSE);
        OpacityResult r = new OpacityResult();
        double[][] states = {{2e4, 1e-7}, {3e5, 1e-3}, {8e5, 2e-2}, {6000.0, 3e-9}};
        for (double[] s : states) {
            double t = s[0];
            double rho = s[1];
            double logR = Math.log10(rho / Math.pow(t / 1e6, 3));
            double expected = 0.3 + 0.5 * logR - 0.25 * (Math.log10(t) - 4.0);
            model.evaluate(t, rho, 0.7, 0.02, -1, r);
            assertEquals(expected, Math.log10(r.kappa), 1e-10, "T = " + t + ", rho = " + rho);
            // d ln kappa / d ln rho = 0.5 (through log R); d ln kappa / d ln T = -3 * 0.5 - 0.25
            assertEquals(0.5, r.dLnKappaDLnRho, 1e-9);
            assertEquals(-1.75, r.dLnKappaDLnT, 1e-9);
        }
    }
}
