package io.github.startransport.core.profile;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.gradient.GasRadiation;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Tag;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;

class BoundaryAndCompositionTest {

    @Tag(CheckKind.EXTERNAL)
    @Property(tries = 500, seed = "501")
    void boundaryOfALinearMarginIsItsAnalyticRoot(@ForAll @Scale(9) @DoubleRange(min = 0.05, max = 0.95) double rootFraction,
                                                  @ForAll @IntRange(min = 5, max = 400) int n,
                                                  @ForAll @Scale(9) @DoubleRange(min = 0.1, max = 5) double slope) {
        // margin(r) = slope (r0 - r): convective core below r0, radiative above; the boundary must be r0
        double radius = 7e10;
        double r0 = rootFraction * radius;
        double[] r = new double[n];
        double[] m = new double[n];
        double[] p = new double[n];
        double[] margin = new double[n];
        Regime[] regimes = new Regime[n];
        for (int k = 0; k < n; k++) {
            r[k] = radius * (k + 1.0) / n * (1 + 0.3 * Math.sin(k)) / 1.3 + radius * k / n * 0.3 / 1.3; // uneven but increasing
        }
        java.util.Arrays.sort(r);
        for (int k = 0; k < n; k++) {
            m[k] = 2e33 * Math.pow(r[k] / r[n - 1], 3);
            p[k] = 1e17 * Math.exp(-10 * r[k] / r[n - 1]);
            margin[k] = slope * (r0 - r[k]) / radius;
            regimes[k] = margin[k] > 0 ? Regime.CONVECTIVE : Regime.RADIATIVE;
        }
        // the root must lie inside the grid (an Assume, so that jqwik counts the rejected tries)
        Assume.that(regimes[0] == Regime.CONVECTIVE && regimes[n - 1] == Regime.RADIATIVE);
        double[] zero = new double[n];
        List<Region> regions = LocalDiagnosis.regions(r, m, p, new double[n], new double[n], new double[n], regimes,
                margin, margin, margin, zero);
        assertEquals(1, regions.size());
        assertEquals(0.0, regions.get(0).bottomRadius());
        assertEquals(r0, regions.get(0).topRadius(), 1e-12 * r0);
        assertEquals(r0, regions.get(0).topSchwarzschild().orElseThrow(), 1e-12 * r0);
    }

    @Tag(CheckKind.EXTERNAL)
    @Property(tries = 300, seed = "502")
    void nablaMuIsExactForQuadraticLnMuInLnP(@ForAll @Scale(9) @DoubleRange(min = -0.03, max = 0.03) double a,
                                            @ForAll @Scale(9) @DoubleRange(min = -0.0005, max = 0.0005) double b) {
        // choose ln mu = ln mu0 + a s + b s^2 with s = ln P; the three-point formula (Fornberg 1988) is exact for
        // quadratics, so nabla_mu = a + 2 b s at every interior zone; X follows from mu with Z fixed.
        int n = 30;
        double z = 0.02;
        double[] x = new double[n];
        double[] zz = new double[n];
        double[] p = new double[n];
        double lnMu0 = Math.log(0.62);
        for (int k = 0; k < n; k++) {
            double s = 40 - 0.7 * k - 0.01 * k * k; // decreasing outwards, uneven
            p[k] = Math.exp(s);
            double ds = s - 40;
            double mu = Math.exp(lnMu0 + a * ds + b * ds * ds);
            // 1/mu = 2X + 0.75(1 - X - Z) + 0.5 Z  =>  X = (1/mu - 0.75 + 0.25 Z) / 1.25
            x[k] = (1 / mu - 0.75 + 0.25 * z) / 1.25;
            zz[k] = z;
        }
        double[] out = new double[n];
        CompositionGradient.nablaMu(x, zz, p, out);
        for (int k = 1; k < n - 1; k++) {
            double ds = Math.log(p[k]) - 40;
            assertEquals(a + 2 * b * ds, out[k], 1e-9 * Math.max(1, Math.abs(a + 2 * b * ds)), "zone " + k);
            assertEquals(Math.log(GasRadiation.meanMolecularWeight(x[k], z)), lnMu0 + a * ds + b * ds * ds, 1e-12);
        }
    }
}
