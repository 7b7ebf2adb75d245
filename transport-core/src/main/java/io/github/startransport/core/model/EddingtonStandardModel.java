package io.github.startransport.core.model;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.gradient.GasRadiation;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

import java.util.EnumMap;
import java.util.Map;
import java.util.TreeSet;

/**
 * Eddington's standard model: a polytrope of index 3 with a constant ratio beta = P_gas / P
 * (Eddington 1926; Chandrasekhar 1939 ch. VI; Kippenhahn, Weigert &amp; Weiss 2012 §19.4, from
 * memory).
 *
 * <p>With P_gas = beta P and P_rad = a T^4 / 3 = (1 - beta) P, P = K rho^(4/3) with
 * K = [(3/a) (k / mu m_u)^4 (1 - beta) / beta^4]^(1/3), and the n = 3 mass relation
 * M = 4 pi (-xi_1^2 theta'_1) (K / pi G)^(3/2) fixes beta from M and mu (Eddington's quartic).
 * The radius is free for n = 3; it is a parameter here. The luminosity profile comes from an
 * energy generation rate epsilon ~ rho T^nu, normalised to the given surface luminosity.
 */
public final class EddingtonStandardModel {
    private final double mass;
    private final double radius;
    private final double luminosity;
    private final double hydrogen;
    private final double metals;
    private final double nu;
    private final double mu;
    private final double beta;
    private final LaneEmden solution;
    private final double centralDensity;
    private final double centralPressure;
    private final double centralTemperature;

    /**
     * @param mass       M (g)
     * @param radius     R, where theta = 0 (cm)
     * @param luminosity surface L (erg s^-1)
     * @param hydrogen   X, uniform
     * @param metals     Z, uniform
     * @param nu         temperature exponent of the energy generation rate
     */
    public EddingtonStandardModel(double mass, double radius, double luminosity, double hydrogen, double metals,
                                  double nu) {
        this.mass = mass;
        this.radius = radius;
        this.luminosity = luminosity;
        this.hydrogen = hydrogen;
        this.metals = metals;
        this.nu = nu;
        this.mu = GasRadiation.meanMolecularWeight(hydrogen, metals);
        this.solution = LaneEmden.solve(3.0, nu);
        this.beta = solveBeta(mass, mu, solution.massConstant());
        this.centralDensity = solution.centralToMeanDensity() * 3.0 * mass / (4.0 * Math.PI * radius * radius * radius);
        this.centralPressure = polytropicConstant(beta, mu) * Math.pow(centralDensity, 4.0 / 3.0);
        this.centralTemperature = beta * mu * Codata2018.ATOMIC_MASS_UNIT * centralPressure
                / (Codata2018.BOLTZMANN * centralDensity);
    }

    /**
     * @param beta P_gas / P
     * @param mu   mean molecular weight
     * @return K of P = K rho^(4/3) (cgs)
     */
    static double polytropicConstant(double beta, double mu) {
        double kOverMu = Codata2018.BOLTZMANN / (mu * Codata2018.ATOMIC_MASS_UNIT);
        return Math.cbrt(3.0 / Codata2018.RADIATION_CONSTANT * Math.pow(kOverMu, 4) * (1.0 - beta) / Math.pow(beta, 4));
    }

    /**
     * Solves Eddington's quartic through the n = 3 mass relation with Commons Math's Brent solver.
     *
     * @param mass         M (g)
     * @param mu           mean molecular weight
     * @param massConstant -xi_1^2 theta'(xi_1) of n = 3
     * @return beta
     */
    static double solveBeta(double mass, double mu, double massConstant) {
        BrentSolver brent = new BrentSolver(1e-15, 1e-15);
        return brent.solve(500, b -> {
            double k = polytropicConstant(b, mu);
            double m = 4.0 * Math.PI * massConstant * Math.pow(k / (Math.PI * Codata2018.GRAVITATIONAL_CONSTANT), 1.5);
            return Math.log(m / mass);
        }, 1e-9, 1.0 - 1e-15);
    }

    /** @return M (g) */
    public double mass() {
        return mass;
    }

    /** @return R, where theta = 0 (cm) */
    public double radius() {
        return radius;
    }

    /** @return the surface luminosity (erg s^-1) */
    public double luminosity() {
        return luminosity;
    }

    /** @return X */
    public double hydrogen() {
        return hydrogen;
    }

    /** @return Z */
    public double metals() {
        return metals;
    }

    /**
     * The model's state at a radius.
     *
     * @param r   radius (cm), in (0, R)
     * @param out receives T (K), rho (g cm^-3), P (dyn cm^-2), m (g), L (erg s^-1) in that order
     */
    public void state(double r, double[] out) {
        double[] s = new double[3];
        solution.sample(r / radius * solution.firstZero(), s);
        double theta = s[0];
        out[0] = centralTemperature * theta;
        out[1] = centralDensity * theta * theta * theta;
        out[2] = centralPressure * Math.pow(theta, 4);
        out[3] = mass * s[1] / solution.massConstant();
        out[4] = luminosity * s[2] / solution.lambdaTotal();
    }

    /** @return beta = P_gas / P */
    public double beta() {
        return beta;
    }

    /** @return mean molecular weight mu */
    public double mu() {
        return mu;
    }

    /** @return central temperature (K) */
    public double centralTemperature() {
        return centralTemperature;
    }

    /** @return central density (g cm^-3) */
    public double centralDensity() {
        return centralDensity;
    }

    /** @return central pressure (dyn cm^-2) */
    public double centralPressure() {
        return centralPressure;
    }

    /** @return the Lane-Emden solution used */
    public LaneEmden laneEmden() {
        return solution;
    }

    /**
     * Tabulates the model into zones from near the centre out to where T falls to
     * {@code surfaceTemperature}: half the zones uniform in xi, half uniform in ln T (so in
     * ln P), merged; points that coincide are kept once, so there may be a zone or two fewer.
     *
     * @param source             name of the profile
     * @param zones              number of zones, &gt;= 10
     * @param surfaceTemperature the outermost zone's temperature (K), below the central one
     * @return the profile
     */
    public Profile profile(String source, int zones, double surfaceTemperature) {
        double thetaCut = surfaceTemperature / centralTemperature;
        double xi1 = solution.firstZero();
        double[] s = new double[3];
        BrentSolver brent = new BrentSolver(1e-14 * xi1);
        double xiCut = brent.solve(500, xi -> {
            solution.sample(xi, s);
            return s[0] - thetaCut;
        }, 1e-3, xi1);
        TreeSet<Double> grid = new TreeSet<>();
        int half = zones / 2;
        for (int i = 1; i <= half; i++) {
            grid.add(xiCut * i / half);
        }
        double lnThetaCut = Math.log(thetaCut);
        int rest = zones - grid.size();
        for (int i = 1; i <= rest; i++) {
            double lnTheta = lnThetaCut * i / rest;
            double target = Math.exp(lnTheta);
            if (i == rest) {
                continue; // the cut itself is already in the xi-uniform half
            }
            grid.add(brent.solve(500, xi -> {
                solution.sample(xi, s);
                return s[0] - target;
            }, 1e-4, xiCut));
        }
        int n = grid.size();
        double[] r = new double[n];
        double[] m = new double[n];
        double[] t = new double[n];
        double[] rho = new double[n];
        double[] p = new double[n];
        double[] l = new double[n];
        double[] x = new double[n];
        double[] z = new double[n];
        int k = 0;
        for (double xi : grid) {
            solution.sample(xi, s);
            double theta = s[0];
            r[k] = radius * xi / xi1;
            m[k] = mass * s[1] / solution.massConstant();
            rho[k] = centralDensity * theta * theta * theta;
            p[k] = centralPressure * Math.pow(theta, 4);
            t[k] = centralTemperature * theta;
            l[k] = luminosity * s[2] / solution.lambdaTotal();
            x[k] = hydrogen;
            z[k] = metals;
            k++;
        }
        Map<ProfileColumn, double[]> cols = new EnumMap<>(ProfileColumn.class);
        cols.put(ProfileColumn.RADIUS, r);
        cols.put(ProfileColumn.MASS, m);
        cols.put(ProfileColumn.TEMPERATURE, t);
        cols.put(ProfileColumn.DENSITY, rho);
        cols.put(ProfileColumn.PRESSURE, p);
        cols.put(ProfileColumn.LUMINOSITY, l);
        cols.put(ProfileColumn.HYDROGEN, x);
        cols.put(ProfileColumn.METALS, z);
        return new Profile(source, cols);
    }

    @Override
    public String toString() {
        return "EddingtonStandardModel[M=" + mass + " g, R=" + radius + " cm, L=" + luminosity + " erg/s, X="
                + hydrogen + ", Z=" + metals + ", nu=" + nu + ", beta=" + beta + ", T_c=" + centralTemperature
                + " K, rho_c=" + centralDensity + " g/cm^3]";
    }
}
