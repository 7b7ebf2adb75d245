package io.github.startransport.core.envelope;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.gradient.GasRadiation;
import io.github.startransport.core.gradient.RadiativeGradient;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.EnvelopeStar;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OpacityStatus;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneState;

/**
 * The local state of one point of an envelope, from (P, T) and r: density from the equation of
 * state (inverted), opacity, nabla_rad, nabla_ad and, on request, the convection model's nabla.
 *
 * <p>One instance per integration (it holds the caller-owned inputs and results of the models and
 * the last density as the next starting guess): not thread-safe, never shared.
 */
final class EnvelopePoint {
    /** Largest number of iterations of the density solve; it converges in 2-6 along an envelope. */
    static final int MAX_DENSITY_ITERATIONS = 100;

    private final EnvelopeStar star;
    private final EnvelopeSetup setup;
    private final ZoneState zone = new ZoneState();
    private final ConvectionResult convection = new ConvectionResult();
    private final ThermoResult thermo = new ThermoResult();
    private final OpacityResult opacityResult = new OpacityResult();
    private double lastLnDensity = Double.NaN;
    /** Opacity lookups that were clamped or extrapolated by the model's out-of-range policy. */
    int opacityOutside;

    double temperature;
    double pressure;
    double density;
    double opacity;
    double nablaAd;
    double nablaRad;
    double cp;
    double delta;
    double phi;
    double mu;
    double beta;
    double dLnKappaDLnRho;
    /** Set by {@link #transport(double)}. */
    double nabla;
    /** Set by {@link #transport(double)} (cm s^-1). */
    double velocity;
    /** Set by {@link #transport(double)}. */
    boolean convective;

    EnvelopePoint(EnvelopeStar star, EnvelopeSetup setup) {
        this.star = star;
        this.setup = setup;
        zone.mass = star.mass();
        zone.luminosity = star.luminosity();
        zone.hydrogen = star.hydrogen();
        zone.metals = star.metals();
        zone.nablaMu = 0.0;
    }

    /**
     * Density, equation of state, opacity and nabla_rad at total pressure P and temperature T.
     *
     * @param p total pressure (dyn cm^-2)
     * @param t temperature (K)
     */
    void at(double p, double t) {
        pressure = p;
        temperature = t;
        density = solveDensity(p, t);
        setup.opacity().evaluate(t, density, star.hydrogen(), star.metals(), InvalidInputException.NO_ZONE,
                opacityResult);
        if (opacityResult.status != null && opacityResult.status != OpacityStatus.INSIDE) {
            opacityOutside++;
        }
        opacity = opacityResult.kappa;
        dLnKappaDLnRho = opacityResult.dLnKappaDLnRho;
        nablaAd = thermo.nablaAd;
        cp = thermo.cp;
        delta = thermo.delta;
        phi = thermo.phi;
        mu = thermo.mu;
        beta = thermo.beta;
        nablaRad = RadiativeGradient.value(opacity, star.luminosity(), p, star.mass(), t);
    }

    /**
     * The convection model's nabla at radius r, after {@link #at}.
     *
     * @param r radius (cm)
     */
    void transport(double r) {
        zone.radius = r;
        zone.temperature = temperature;
        zone.density = density;
        zone.pressure = pressure;
        zone.opacity = opacity;
        zone.cp = cp;
        zone.nablaAd = nablaAd;
        zone.delta = delta;
        zone.phi = phi;
        setup.convection().solveValues(zone, convection);
        nabla = convection.nabla;
        velocity = convection.velocity;
        convective = convection.regime == Regime.CONVECTIVE;
    }

    /**
     * Solves P_eos(T, rho) = P for rho: a secant iteration on ln rho, started from the last
     * point's density (or the fully ionised ideal gas), kept inside a bracket once one is known
     * (the pressure of a thermodynamically stable gas rises with density at fixed T).
     */
    private double solveDensity(double p, double t) {
        double lnP = Math.log(p);
        double x = lastLnDensity;
        if (Double.isNaN(x)) {
            double muIonised = GasRadiation.meanMolecularWeight(star.hydrogen(), star.metals());
            x = Math.log(p * muIonised * Codata2018.ATOMIC_MASS_UNIT / (Codata2018.BOLTZMANN * t));
        }
        double f = residual(x, t, lnP);
        double pRad = (1.0 - thermo.beta) * thermo.pressure; // the model's own radiation pressure, independent of rho
        if (!(p > pRad * (1.0 + 1e-12))) {
            throw new InvalidInputException("pressure", p, "dyn cm^-2", InvalidInputException.NO_ZONE,
                    "above the radiation pressure " + pRad + " dyn cm^-2 of " + setup.thermodynamics() + " at T = " + t
                            + " K, so that gas holds the layer up; radiation pressure exceeds gravity here: the"
                            + " luminosity is above the Eddington limit for this opacity, or R is too large for M");
        }
        double lo = Double.NEGATIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        double prevX = Double.NaN;
        double prevF = Double.NaN;
        for (int i = 0; i < MAX_DENSITY_ITERATIONS; i++) {
            if (f == 0.0) {
                break;
            }
            if (f < 0.0) {
                lo = x;
            } else {
                hi = x;
            }
            double slope = Double.isNaN(prevX) || x == prevX ? Math.max(thermo.beta, 0.05) : (f - prevF) / (x - prevX);
            double next = x - f / slope;
            if (!(slope > 0.0) || !(next > lo && next < hi)) {
                next = Double.isInfinite(lo) ? Math.min(x, hi) - 2.0
                        : Double.isInfinite(hi) ? Math.max(x, lo) + 2.0 : 0.5 * (lo + hi);
            }
            if (Math.abs(next - x) < 1e-13 * Math.max(1.0, Math.abs(x))) {
                x = next;
                f = residual(x, t, lnP);
                break;
            }
            prevX = x;
            prevF = f;
            x = next;
            f = residual(x, t, lnP);
        }
        if (!(Math.abs(f) < 1e-10)) {
            throw new InvalidInputException("pressure", p, "dyn cm^-2", InvalidInputException.NO_ZONE,
                    "reachable by the equation of state " + setup.thermodynamics() + " at T = " + t
                            + " K (no density found after " + MAX_DENSITY_ITERATIONS + " iterations; last ln rho = " + x
                            + ", ln P residual " + f + ")");
        }
        lastLnDensity = x;
        return Math.exp(x);
    }

    /** ln P_eos(T, e^x) - ln P; leaves the state in {@link #thermo} (values only: no derivative is read). */
    private double residual(double x, double t, double lnP) {
        setup.thermodynamics().evaluateValues(t, Math.exp(x), star.hydrogen(), star.metals(),
                InvalidInputException.NO_ZONE, thermo);
        return Math.log(thermo.pressure) - lnP;
    }
}
