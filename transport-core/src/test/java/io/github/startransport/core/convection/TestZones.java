package io.github.startransport.core.convection;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.gradient.GasRadiation;
import io.github.startransport.spi.ZoneState;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;

/**
 * Builds physically consistent zones for tests: ideal gas plus radiation thermodynamics
 * ({@link GasRadiation}), with the opacity chosen to give a wanted textbook loss parameter U and
 * the luminosity chosen to give a wanted radiative gradient.
 */
final class TestZones {
    private TestZones() {
    }

    static final double G = Codata2018.GRAVITATIONAL_CONSTANT;
    static final double SIGMA = Codata2018.STEFAN_BOLTZMANN;
    static final double A_RAD = Codata2018.RADIATION_CONSTANT;
    static final double C = Codata2018.SPEED_OF_LIGHT;
    static final double MU = 0.6;

    /** Lowest log10 rho (g cm^-3) at which beta = P_gas/P stays above 1e-3 at this T. */
    static double minLogDensity(double logT) {
        double t = Math.pow(10, logT);
        double rhoBeta = 1e-3 * GasRadiation.radiationPressure(t) * MU * Codata2018.ATOMIC_MASS_UNIT
                / (Codata2018.BOLTZMANN * t);
        return Math.max(-12.0, Math.log10(rhoBeta));
    }

    /**
     * @param logT        log10 T (K)
     * @param rhoFraction position of log10 rho between {@link #minLogDensity} and 6, in [0, 1]
     * @param logU        log10 of the textbook loss parameter U wanted
     * @param nablaRad    radiative gradient wanted
     * @param logR        log10 r (cm)
     * @param logM        log10 m (g)
     * @param alpha       mixing-length parameter
     * @param geometry    geometry constants (they enter U)
     * @param limit       near-centre limit (it decides l)
     */
    static ZoneState build(double logT, double rhoFraction, double logU, double nablaRad, double logR, double logM,
                           double alpha, MixingLengthGeometry geometry, CentreLimit limit) {
        double lo = minLogDensity(logT);
        double t = Math.pow(10, logT);
        double rho = Math.pow(10, lo + rhoFraction * (6.0 - lo));
        double pg = GasRadiation.gasPressure(t, rho, MU);
        double p = pg + GasRadiation.radiationPressure(t);
        double beta = pg / p;
        ZoneState z = new ZoneState();
        z.temperature = t;
        z.density = rho;
        z.pressure = p;
        z.radius = Math.pow(10, logR);
        z.mass = Math.pow(10, logM);
        z.cp = GasRadiation.cp(beta, MU);
        z.nablaAd = GasRadiation.nablaAd(beta);
        z.delta = GasRadiation.delta(beta);
        z.phi = 1.0;
        z.nablaMu = 0.0;
        double g = G * z.mass / (z.radius * z.radius);
        double hp = p / (rho * g);
        double l = alpha * (limit == CentreLimit.RADIUS ? Math.min(hp, z.radius) : hp);
        double u = Math.pow(10, logU);
        // U = c sigma T^3 sqrt(H_P / (a g delta)) / (2 c_P kappa rho^2 l^2), solved for kappa
        z.opacity = geometry.lossFactor() * SIGMA * t * t * t
                * Math.sqrt(hp / (geometry.velocityFactor() * g * z.delta)) / (2.0 * z.cp * rho * rho * l * l * u);
        // nabla_rad = 3 kappa L P / (16 pi a c G m T^4), solved for L
        z.luminosity = nablaRad * 16.0 * Math.PI * A_RAD * C * G * z.mass * t * t * t * t / (3.0 * z.opacity * p);
        return z;
    }

    /**
     * The textbook cubic x^3 + k U x^2 + 2 k U U' x - k U W = 0 (Kippenhahn, Weigert &amp; Weiss 2012,
     * ch. 7, with k = 8/9 and U' = U), solved by Commons Math's {@link LaguerreSolver}: all complex
     * roots, then the real positive one.
     *
     * @return x = sqrt(nabla - nabla_e)
     */
    static double commonsMathRoot(double k, double u, double uLoss, double w) {
        LaguerreSolver solver = new LaguerreSolver(1e-15, 1e-300, 1e-300);
        double[] coefficients = {-k * u * w, 2.0 * k * u * uLoss, k * u, 1.0};
        Complex[] roots = solver.solveAllComplex(coefficients, 0.0);
        double best = Double.NaN;
        double bestImag = Double.POSITIVE_INFINITY;
        for (Complex c : roots) {
            if (c.getReal() > 0.0 && Math.abs(c.getImaginary()) < bestImag) {
                bestImag = Math.abs(c.getImaginary());
                best = c.getReal();
            }
        }
        return best;
    }
}
