package io.github.startransport.core.thermo;

import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneInput;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Laws the partial-ionisation equation of state must keep over random states: derivatives equal
 * central differences, thermodynamic consistency (the first law and a Maxwell relation, checked
 * by differencing the energy and pressure, and by integrating adiabats), agreement of the solve
 * with Commons Math's Brent solver, and a solve that never fails.
 */
class IonisingGasPropertyTest {

    private static ThermoResult at(double t, double rho, double x, double z) {
        ThermoResult r = new ThermoResult();
        SahaIonisation.evaluate(t, rho, x, z, r);
        return r;
    }

    private static double energy(double t, double rho, double x, double z) {
        return SahaIonisation.specificEnergy(t, rho, x, z, 1.0, 1.0);
    }

    /** Every derivative equals a central difference (common practice, no source). */
    @net.jqwik.api.Tag(CheckKind.INTERNAL)
    @Property(tries = 300, seed = "1401")
    void derivativesMatchCentralDifferences(@ForAll @Scale(9) @DoubleRange(min = 3.7, max = 8.5) double logT,
                                            @ForAll @Scale(9) @DoubleRange(min = -10, max = 1) double logRho,
                                            @ForAll @Scale(9) @DoubleRange(min = 0, max = 1) double xFrac,
                                            @ForAll @Scale(9) @DoubleRange(min = 0, max = 0.05) double z) {
        double x = xFrac * (1 - z);
        double t = Math.pow(10, logT);
        double rho = Math.pow(10, logRho);
        ThermoResult r = at(t, rho, x, z);
        double h = 1e-6;
        for (int i : new int[] {ZoneInput.T, ZoneInput.RHO}) {
            double v = i == ZoneInput.T ? t : rho;
            ThermoResult up = i == ZoneInput.T ? at(t * (1 + h), rho, x, z) : at(t, rho * (1 + h), x, z);
            ThermoResult dn = i == ZoneInput.T ? at(t * (1 - h), rho, x, z) : at(t, rho * (1 - h), x, z);
            String where = "T = " + t + ", rho = " + rho + ", X = " + x + ", Z = " + z + ", d/d" + (i == 0 ? "T" : "rho");
            check(r.dPressure[i], up.pressure, dn.pressure, v, h, r.pressure, where + " P");
            check(r.dNablaAd[i], up.nablaAd, dn.nablaAd, v, h, r.nablaAd, where + " nabla_ad");
            check(r.dCp[i], up.cp, dn.cp, v, h, r.cp, where + " c_P");
            check(r.dDelta[i], up.delta, dn.delta, v, h, r.delta, where + " delta");
            check(r.dGamma1[i], up.gamma1, dn.gamma1, v, h, r.gamma1, where + " Gamma_1");
            check(r.dMu[i], up.mu, dn.mu, v, h, r.mu, where + " mu");
            check(r.dPhi[i], up.phi, dn.phi, v, h, r.phi, where + " phi");
        }
        // chi_T and chi_rho are the logarithmic derivatives of P
        assertEquals(r.dPressure[ZoneInput.T] * t / r.pressure, r.chiT, 1e-12 * r.chiT);
        assertEquals(r.dPressure[ZoneInput.RHO] * rho / r.pressure, r.chiRho, 1e-12 * r.chiRho);
    }

    private static void check(double analytic, double up, double dn, double v, double h, double value, String what) {
        double fd = (up - dn) / (2 * h * v);
        double tol = 2e-5 * Math.abs(fd) + 1e-8 * Math.abs(value) / v;
        assertEquals(fd, analytic, tol, what);
    }

    /**
     * The first law and a Maxwell relation, from differences of u(rho, T) and P(rho, T) alone:
     * c_V = (du/dT)_rho and rho (du/drho)_T = (P / rho)(1 - chi_T) (Cox &amp; Giuli 1968, ch. 9, from
     * memory); holds only if the pressure-ionisation term is thermodynamically consistent.
     */
    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 200, seed = "1402")
    void energyAndPressureAreThermodynamicallyConsistent(
            @ForAll @Scale(9) @DoubleRange(min = 3.7, max = 8.0) double logT,
            @ForAll @Scale(9) @DoubleRange(min = -10, max = 1) double logRho,
            @ForAll @Scale(9) @DoubleRange(min = 0, max = 1) double xFrac) {
        double z = 0.02;
        double x = xFrac * (1 - z);
        double t = Math.pow(10, logT);
        double rho = Math.pow(10, logRho);
        ThermoResult r = at(t, rho, x, z);
        double h = 1e-5;
        double cvFd = (energy(t * (1 + h), rho, x, z) - energy(t * (1 - h), rho, x, z)) / (2 * h * t);
        assertEquals(cvFd, r.cv, 1e-6 * r.cv, "c_V at T = " + t + ", rho = " + rho);
        double dudlnrho = (energy(t, rho * (1 + h), x, z) - energy(t, rho * (1 - h), x, z)) / (2 * h);
        double expected = r.pressure / rho * (1 - r.chiT);
        assertEquals(expected, dudlnrho, 1e-6 * (Math.abs(expected) + r.cv * t),
                "Maxwell relation at T = " + t + ", rho = " + rho);
    }

    /**
     * Gamma_1 and nabla_ad from adiabats integrated through u and P (du + P d(1/rho) = 0, trapezoidal,
     * the end temperature found by Commons Math's BrentSolver), and the identities
     * Gamma_1 = chi_rho / (1 - chi_T nabla_ad) and c_P - c_V = P chi_T^2 / (rho T chi_rho) with
     * c_P from the enthalpy at constant pressure (Cox &amp; Giuli 1968, ch. 9; Kippenhahn, Weigert &amp;
     * Weiss 2012, §4.1, from memory).
     */
    @net.jqwik.api.Tag(CheckKind.LAW)
    @Property(tries = 120, seed = "1403", maxDiscardRatio = 10)
    void adiabatsAndIdentities(@ForAll @Scale(9) @DoubleRange(min = 3.7, max = 8.0) double logT,
                               @ForAll @Scale(9) @DoubleRange(min = -10, max = 0) double logRho) {
        double x = 0.7;
        double z = 0.02;
        double t = Math.pow(10, logT);
        double rho = Math.pow(10, logRho);
        ThermoResult r = at(t, rho, x, z);
        // differences of P at fixed T resolve chi_rho ~ beta only where gas pressure is not negligible
        Assume.that(r.beta > 0.05);
        double eps = 1e-4;
        double[] up = adiabat(t, rho, rho * (1 + eps), r, x, z);
        double[] dn = adiabat(t, rho, rho * (1 - eps), r, x, z);
        double dlnP = Math.log(up[1] / dn[1]);
        double gamma1 = dlnP / Math.log((1 + eps) / (1 - eps));
        double nablaAd = Math.log(up[0] / dn[0]) / dlnP;
        String where = "T = " + t + ", rho = " + rho;
        assertEquals(gamma1, r.gamma1, 1e-6 * r.gamma1, where + " Gamma_1");
        assertEquals(nablaAd, r.nablaAd, 1e-6 * r.nablaAd, where + " nabla_ad");
        // identities with chi_T, chi_rho from differences of P(rho, T)
        double h = 1e-6;
        double chiT = Math.log(at(t * (1 + h), rho, x, z).pressure / at(t * (1 - h), rho, x, z).pressure)
                / Math.log((1 + h) / (1 - h));
        double chiRho = Math.log(at(t, rho * (1 + h), x, z).pressure / at(t, rho * (1 - h), x, z).pressure)
                / Math.log((1 + h) / (1 - h));
        assertEquals(chiRho / (1 - chiT * nablaAd), gamma1, 2e-5 * gamma1, where + " Gamma_1 identity");
        double cp = enthalpySlope(t, rho, r.pressure, 1e-6 / r.delta, x, z);
        double cvFd = (energy(t * (1 + h), rho, x, z) - energy(t * (1 - h), rho, x, z)) / (2 * h * t);
        double diff = r.pressure * chiT * chiT / (rho * t * chiRho);
        assertEquals(diff, cp - cvFd, 2e-5 * cp, where + " c_P - c_V");
        assertEquals(cp, r.cp, 2e-5 * r.cp, where + " c_P");
    }

    /** {T', P'} at rho' on the adiabat through (rho, T). */
    private static double[] adiabat(double t, double rho, double rho2, ThermoResult r, double x, double z) {
        double u0 = energy(t, rho, x, z);
        double p0 = r.pressure;
        double t2 = new BrentSolver(1e-14 * t).solve(500, tt -> {
            double p = at(tt, rho2, x, z).pressure;
            return energy(tt, rho2, x, z) - u0 + 0.5 * (p0 + p) * (1 / rho2 - 1 / rho);
        }, t * 0.98, t * 1.02);
        return new double[] {t2, at(t2, rho2, x, z).pressure};
    }

    /** c_P = (dh/dT)_P with h = u + P / rho, rho(P, T) by Brent, over T (1 +- h). */
    private static double enthalpySlope(double t, double rho, double p, double h, double x, double z) {
        double[] hs = new double[2];
        for (int s = 0; s < 2; s++) {
            double tt = t * (s == 0 ? 1 + h : 1 - h);
            double lnRho = new BrentSolver(1e-15).solve(500,
                    lr -> Math.log(at(tt, Math.exp(lr), x, z).pressure / p), Math.log(rho) - 0.1, Math.log(rho) + 0.1);
            double rr = Math.exp(lnRho);
            hs[s] = energy(tt, rr, x, z) + p / rr;
        }
        return (hs[0] - hs[1]) / (2 * h * t);
    }

    /** Our bounded Newton solve finds the root Commons Math's BrentSolver finds (independent library). */
    @net.jqwik.api.Tag(CheckKind.EXTERNAL)
    @Property(tries = 500, seed = "1404")
    void solveAgreesWithBrent(@ForAll @Scale(9) @DoubleRange(min = 3.3, max = 9) double logT,
                              @ForAll @Scale(9) @DoubleRange(min = -14, max = 4) double logRho,
                              @ForAll @Scale(9) @DoubleRange(min = 0, max = 1) double xFrac,
                              @ForAll @Scale(9) @DoubleRange(min = 0, max = 0.1) double z) {
        double x = xFrac * (1 - z);
        double[] s = new double[SahaIonisation.SYSTEM_SIZE];
        SahaIonisation.chargeBalance(Math.pow(10, logT), Math.pow(10, logRho), x, z, s);
        double ours = SahaIonisation.electronsPerNucleus(s);
        // counted neutral (no free electron at all) is checked by the sweep below
        Assume.that(ours > 0.0);
        double lnRoot = new BrentSolver(1e-15, 1e-15).solve(1000, u -> {
            double e = Math.exp(u);
            double he = s[1] * (e * s[4] + 2 * s[4] * s[5]) / (e * e + e * s[4] + s[4] * s[5]);
            return Math.log((s[0] * s[3] / (s[3] + e) + he + s[2] * s[6] / (s[6] + e)) / e);
        }, Math.log(ours) - 2, Math.log(s[7]) + 1e-12);
        assertEquals(Math.exp(lnRoot), ours, 1e-12 * ours);
    }

    /** 1e2 to 1e10 K and any positive density: the solve never fails, nothing is NaN. */
    @Tag(CheckKind.INTERNAL)
    @Test
    void solveNeverFailsFromAHundredKelvinToTenBillion() {
        double[] densities = new double[40];
        for (int i = 0; i < 37; i++) {
            densities[i] = Math.pow(10, -300 + 50 * (i / 3) + (i % 3) * 17);
        }
        densities[37] = Double.MIN_VALUE;
        densities[38] = Double.MAX_VALUE;
        densities[39] = 1.0;
        double[][] compositions = {{0.7, 0.02}, {1, 0}, {0, 0}, {0, 1}, {0.5, 1e-35}};
        ThermoResult r = new ThermoResult();
        double[] s = new double[SahaIonisation.SYSTEM_SIZE];
        int finite = 0;
        for (double lg = 2; lg <= 10.0001; lg += 0.125) {
            double t = Math.pow(10, lg);
            for (double rho : densities) {
                for (double[] c : compositions) {
                    SahaIonisation.chargeBalance(t, rho, c[0], c[1], s);
                    double x = SahaIonisation.electronsPerNucleus(s);
                    assertTrue(x >= 0 && x <= s[7] * (1 + 1e-12), "x = " + x + " at T = " + t + ", rho = " + rho);
                    SahaIonisation.evaluate(t, rho, c[0], c[1], r);
                    assertTrue(r.mu > 0 && Double.isFinite(r.mu) && r.freeElectrons >= 0 && !Double.isNaN(r.pressure)
                            && r.pressureIonisation >= 0 && r.pressureIonisation <= 1,
                            "T = " + t + ", rho = " + rho + ": " + r);
                    try {
                        IonisingGas.INSTANCE.evaluate(t, rho, c[0], c[1], 0, r);
                        finite++;
                        for (double v : new double[] {r.pressure, r.nablaAd, r.cp, r.cv, r.delta, r.gamma1, r.chiT,
                            r.chiRho, r.phi, r.dNablaAd[0], r.dNablaAd[1], r.dGamma1[0], r.dGamma1[1]}) {
                            assertTrue(Double.isFinite(v), "T = " + t + ", rho = " + rho + ": " + r);
                        }
                        assertTrue(r.nablaAd > 0 && r.nablaAd < 1 && r.gamma1 > 1, r.toString());
                    } catch (InvalidInputException e) {
                        assertEquals("density", e.field()); // only where P or beta is not representable
                    }
                }
            }
        }
        assertTrue(finite > 4000, "representable states: " + finite);
    }

    /** Eight threads over the same states give bit-identical results to one thread. */
    @Tag(CheckKind.INTERNAL)
    @Test
    void concurrentCallsMatchSerialOnes() throws Exception {
        int n = 4000;
        double[] t = new double[n];
        double[] rho = new double[n];
        SplittableRandom rnd = new SplittableRandom(1405);
        for (int i = 0; i < n; i++) {
            t[i] = Math.pow(10, rnd.nextDouble(3.5, 8.5));
            rho[i] = Math.pow(10, rnd.nextDouble(-10, 2));
        }
        double[] serial = run(t, rho);
        ExecutorService pool = Executors.newFixedThreadPool(8);
        try {
            List<Future<double[]>> futures = new ArrayList<>();
            for (int k = 0; k < 8; k++) {
                futures.add(pool.submit(() -> run(t, rho)));
            }
            for (Future<double[]> f : futures) {
                assertArrayEquals(serial, f.get());
            }
        } finally {
            pool.shutdownNow();
        }
    }

    private static double[] run(double[] t, double[] rho) {
        ThermoResult r = new ThermoResult();
        double[] out = new double[t.length * 3];
        for (int i = 0; i < t.length; i++) {
            IonisingGas.INSTANCE.evaluate(t[i], rho[i], 0.7, 0.02, i, r);
            out[3 * i] = r.nablaAd;
            out[3 * i + 1] = r.dGamma1[ZoneInput.RHO];
            out[3 * i + 2] = r.cp;
        }
        return out;
    }
}
