package io.github.startransport.core.opacity;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The logarithmic slopes of electron scattering against central differences of the published fit written out
 * here, 0.2 (1 + X) / [(1 + 2.7e11 rho / T^2)(1 + (T / 4.5e8)^0.86)] (Buchler &amp; Yueh 1976 as given by
 * Paczynski 1983, from memory): a difference of the source's formula, not of our function.
 */
class ScatteringSlopesTest {
    private static double fit(double t, double rho) {
        return 0.2 * 1.7 / ((1 + 2.7e11 * rho / (t * t)) * (1 + Math.pow(t / 4.5e8, 0.86)));
    }

    private static final double[][] STATES = {{1e7, 1.0}, {1e8, 1e5}, {3e8, 1e3}, {2e6, 1e-4}, {1e9, 1e7}};

    @Test
    @Tag(CheckKind.EXTERNAL)
    void densitySlope() {
        for (double[] s : STATES) {
            double h = 1e-5;
            double fd = (Math.log(fit(s[0], s[1] * Math.exp(h))) - Math.log(fit(s[0], s[1] * Math.exp(-h)))) / (2 * h);
            assertEquals(fd, ElectronScattering.dLnRho(s[0], s[1]), 1e-8, "T = " + s[0] + ", rho = " + s[1]);
        }
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void temperatureSlope() {
        for (double[] s : STATES) {
            double h = 1e-5;
            double fd = (Math.log(fit(s[0] * Math.exp(h), s[1])) - Math.log(fit(s[0] * Math.exp(-h), s[1]))) / (2 * h);
            assertEquals(fd, ElectronScattering.dLnT(s[0], s[1]), 1e-8, "T = " + s[0] + ", rho = " + s[1]);
        }
    }
}
