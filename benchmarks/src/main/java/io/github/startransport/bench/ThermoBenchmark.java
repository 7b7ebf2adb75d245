package io.github.startransport.bench;

import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.core.thermo.IonisingGas;
import io.github.startransport.core.thermo.SahaIonisation;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneInput;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

/**
 * The partial-ionisation equation of state per zone, over {@value #ZONES} random states
 * (T 10^3.7-10^8 K, rho 10^-10-10^2 g cm^-3, X = 0.7, Z = 0.02) and along the demo star's
 * profile. Peer: the same Saha charge balance solved for the free electrons (value only, no
 * derivatives) by Commons Math's {@link BrentSolver} in ln x, from the same Saha ratios.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ThermoBenchmark {
    static final int ZONES = 2000;

    private final double[] temp = new double[ZONES];
    private final double[] rho = new double[ZONES];
    private double[] profileT;
    private double[] profileRho;
    private final ThermoResult result = new ThermoResult();
    private final double[] system = new double[SahaIonisation.SYSTEM_SIZE];
    private double hydrogen = 0.7;
    private double metals = 0.02;

    @Setup
    public void setup() {
        SplittableRandom rnd = new SplittableRandom(20261214L);
        for (int i = 0; i < ZONES; i++) {
            temp[i] = Math.pow(10, rnd.nextDouble(3.7, 8.0));
            rho[i] = Math.pow(10, rnd.nextDouble(-10, 2));
        }
        Profile p = new DemoStar(ZONES).profile();
        profileT = p.column(ProfileColumn.TEMPERATURE);
        profileRho = p.column(ProfileColumn.DENSITY);
    }

    /** Ours: every output with its T and rho derivatives, validated, per zone. */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double oursZoneWithDerivatives() {
        double s = 0;
        for (int i = 0; i < ZONES; i++) {
            IonisingGas.INSTANCE.evaluate(temp[i], rho[i], hydrogen, metals, i, result);
            s += result.nablaAd + result.dGamma1[ZoneInput.RHO];
        }
        return s;
    }

    /**
     * Ours: the same outputs as {@link #oursZoneWithDerivatives} bit for bit, without the derivatives
     * (what a profile diagnosis reads), validated, per zone.
     */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double oursZoneValues() {
        double s = 0;
        for (int i = 0; i < ZONES; i++) {
            IonisingGas.INSTANCE.evaluateValues(temp[i], rho[i], hydrogen, metals, i, result);
            s += result.nablaAd + result.gamma1;
        }
        return s;
    }

    /** Ours along the demo star's profile (centre to surface), per zone. */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double oursProfileWithDerivatives() {
        double s = 0;
        int n = profileT.length;
        for (int i = 0; i < n; i++) {
            IonisingGas.INSTANCE.evaluate(profileT[i], profileRho[i], hydrogen, metals, i, result);
            s += result.nablaAd + result.dGamma1[ZoneInput.RHO];
        }
        return s * ZONES / n;
    }

    /** Ours: the Saha ratios and the bounded solve for the free electrons alone, per zone. */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double oursSolveOnly() {
        double s = 0;
        for (int i = 0; i < ZONES; i++) {
            SahaIonisation.chargeBalance(temp[i], rho[i], hydrogen, metals, system);
            s += SahaIonisation.electronsPerNucleus(system);
        }
        return s;
    }

    /** Peer: the same Saha ratios, the charge balance in ln x by Commons Math's BrentSolver (value only). */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double peerBrentSolveOnly() {
        double s = 0;
        BrentSolver brent = new BrentSolver(1e-15, 1e-15);
        for (int i = 0; i < ZONES; i++) {
            SahaIonisation.chargeBalance(temp[i], rho[i], hydrogen, metals, system);
            double[] q = system;
            double lo = Math.log(Math.max(1e-300, lowerBound(q)));
            double hi = Math.log(q[7]);
            if (hi - lo < 1e-15) {
                s += q[7];
                continue;
            }
            s += Math.exp(brent.solve(1000, u -> {
                double e = Math.exp(u);
                double he = q[1] * (e * q[4] + 2 * q[4] * q[5]) / (e * e + e * q[4] + q[4] * q[5]);
                return Math.log((q[0] * q[3] / (q[3] + e) + he + q[2] * q[6] / (q[6] + e)) / e);
            }, lo, hi));
        }
        return s;
    }

    /** A bracket's lower end for the peer: the largest single-species root (as ours uses). */
    private static double lowerBound(double[] q) {
        double lo = 0;
        for (int[] t : new int[][] {{0, 3}, {1, 4}, {2, 6}}) {
            double a = q[t[0]];
            double qq = q[t[1]];
            lo = Math.max(lo, 2 * a * qq / (qq + Math.sqrt(qq * (qq + 4 * a))));
        }
        return lo;
    }

    /** Reference: the fully ionised ideal gas plus radiation with its derivatives, per zone. */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double idealGasRadiationZone() {
        double s = 0;
        for (int i = 0; i < ZONES; i++) {
            IdealGasRadiation.INSTANCE.evaluate(temp[i], rho[i], hydrogen, metals, i, result);
            s += result.nablaAd + result.dGamma1[ZoneInput.RHO];
        }
        return s;
    }

    /** Reference: the fully ionised ideal gas plus radiation, values only (no derivatives), per zone. */
    @Benchmark
    @OperationsPerInvocation(ZONES)
    public double idealGasRadiationZoneValues() {
        double s = 0;
        for (int i = 0; i < ZONES; i++) {
            IdealGasRadiation.INSTANCE.evaluateValues(temp[i], rho[i], hydrogen, metals, i, result);
            s += result.nablaAd + result.gamma1;
        }
        return s;
    }
}
