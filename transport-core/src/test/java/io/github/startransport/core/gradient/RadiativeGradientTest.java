package io.github.startransport.core.gradient;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.ZoneInput;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Tag;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * nabla_rad = 3 kappa L P / (16 pi a c G m T^4) (Kippenhahn, Weigert &amp; Weiss 2012 eq. 5.28).
 */
class RadiativeGradientTest {
    private static final double G = Codata2018.GRAVITATIONAL_CONSTANT;
    private static final double A = Codata2018.RADIATION_CONSTANT;
    private static final double C = Codata2018.SPEED_OF_LIGHT;

    @Tag(CheckKind.EXTERNAL)
    @Property(tries = 1000, seed = "101")
    void radiativeFluxAtNablaRadCarriesTheWholeLuminosity(
            @ForAll @Scale(9) @DoubleRange(min = 3.5, max = 9) double logT,
            @ForAll @Scale(9) @DoubleRange(min = -10, max = 6) double logRho,
            @ForAll @Scale(9) @DoubleRange(min = -1, max = 4) double logKappa,
            @ForAll @Scale(9) @DoubleRange(min = 30, max = 40) double logL,
            @ForAll @Scale(9) @DoubleRange(min = 29, max = 35) double logM,
            @ForAll @Scale(9) @DoubleRange(min = 8, max = 13) double logR,
            @ForAll @Scale(9) @DoubleRange(min = 2, max = 20) double logP) {
        // The diffusion form of the flux, F = (4 a c T^4 / (3 kappa rho H_P)) nabla with H_P = P/(rho g),
        // g = G m / r^2 (Kippenhahn, Weigert & Weiss 2012 §5.1), must equal L / (4 pi r^2) when nabla = nabla_rad.
        double t = Math.pow(10, logT);
        double rho = Math.pow(10, logRho);
        double kappa = Math.pow(10, logKappa);
        double l = Math.pow(10, logL);
        double m = Math.pow(10, logM);
        double r = Math.pow(10, logR);
        double p = Math.pow(10, logP);
        double nabla = RadiativeGradient.value(kappa, l, p, m, t);
        double g = G * m / (r * r);
        double hp = p / (rho * g);
        double flux = 4 * A * C * Math.pow(t, 4) / (3 * kappa * rho * hp) * nabla;
        double expected = l / (4 * Math.PI * r * r);
        assertEquals(expected, flux, 1e-12 * expected);
    }

    @Tag(CheckKind.LAW)
    @Property(tries = 1000, seed = "102")
    void scalesLinearlyWithKappaTimesL(@ForAll @Scale(9) @DoubleRange(min = -1, max = 4) double logKappa,
                                       @ForAll @Scale(9) @DoubleRange(min = 30, max = 38) double logL,
                                       @ForAll @Scale(9) @DoubleRange(min = -3, max = 3) double logScale) {
        // nabla_rad is proportional to kappa L (definition); kappa and L scaled inversely leave it unchanged
        double kappa = Math.pow(10, logKappa);
        double l = Math.pow(10, logL);
        double s = Math.pow(10, logScale);
        double p = 1e16;
        double m = 1e33;
        double t = 5e6;
        double base = RadiativeGradient.value(kappa, l, p, m, t);
        assertEquals(s * base, RadiativeGradient.value(s * kappa, l, p, m, t), 1e-13 * s * base);
        assertEquals(s * base, RadiativeGradient.value(kappa, s * l, p, m, t), 1e-13 * s * base);
        assertEquals(base, RadiativeGradient.value(s * kappa, l / s, p, m, t), 1e-13 * base);
    }

    @Tag(CheckKind.INTERNAL)
    @Property(tries = 1000, seed = "103")
    void derivativesAgreeWithCentralDifferences(
            @ForAll @Scale(9) @DoubleRange(min = 3.5, max = 9) double logT,
            @ForAll @Scale(9) @DoubleRange(min = -1, max = 4) double logKappa,
            @ForAll @Scale(9) @DoubleRange(min = 30, max = 40) double logL,
            @ForAll @Scale(9) @DoubleRange(min = 29, max = 35) double logM,
            @ForAll @Scale(9) @DoubleRange(min = 2, max = 20) double logP,
            @ForAll boolean inward) {
        double[] x = new double[ZoneInput.COUNT];
        x[ZoneInput.T] = Math.pow(10, logT);
        x[ZoneInput.KAPPA] = Math.pow(10, logKappa);
        x[ZoneInput.L] = (inward ? -1 : 1) * Math.pow(10, logL);
        x[ZoneInput.M] = Math.pow(10, logM);
        x[ZoneInput.P] = Math.pow(10, logP);
        double[] d = new double[ZoneInput.COUNT];
        RadiativeGradient.valueAndDerivatives(x[ZoneInput.KAPPA], x[ZoneInput.L], x[ZoneInput.P], x[ZoneInput.M],
                x[ZoneInput.T], d);
        for (int i : new int[] {ZoneInput.T, ZoneInput.KAPPA, ZoneInput.L, ZoneInput.M, ZoneInput.P}) {
            double h = 1e-6 * Math.abs(x[i]);
            double[] up = x.clone();
            double[] dn = x.clone();
            up[i] += h;
            dn[i] -= h;
            double fd = (eval(up) - eval(dn)) / (2 * h);
            assertEquals(fd, d[i], 1e-6 * Math.abs(fd), ZoneInput.name(i));
        }
    }

    private static double eval(double[] x) {
        return RadiativeGradient.value(x[ZoneInput.KAPPA], x[ZoneInput.L], x[ZoneInput.P], x[ZoneInput.M],
                x[ZoneInput.T]);
    }
}
