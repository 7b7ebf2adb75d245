package io.github.startransport.core.envelope;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.AlphaCalibration;
import io.github.startransport.spi.CalibrationStep;
import io.github.startransport.spi.Checks;
import io.github.startransport.spi.ConvectiveBase;
import io.github.startransport.spi.ConvectiveZone;
import io.github.startransport.spi.EnvelopeIntegrator;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.EnvelopeSolution;
import io.github.startransport.spi.EnvelopeStar;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.InvalidOptionException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.SuperadiabaticLayer;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.FixedStepHandler;
import org.apache.commons.math3.ode.sampling.StepNormalizer;
import org.apache.commons.math3.ode.sampling.StepNormalizerBounds;
import org.apache.commons.math3.ode.sampling.StepNormalizerMode;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

/**
 * A star's envelope integrated inward from a grey Eddington atmosphere, and the mixing-length
 * parameter that puts the base of its surface convection zone at a target depth.
 *
 * <p><b>Atmosphere.</b> T(tau) of the Eddington approximation ({@link GreyAtmosphere}); the
 * photospheric pressure comes from integrating dP/dtau = g / kappa(rho(P, T(tau)), T(tau)) with
 * g = G M / R^2 from tau_0 (an option, 1e-6) to tau = 2/3, in ln tau, with Commons Math's
 * Dormand-Prince 8(5,3) integrator, for the gas pressure P_gas = P - a T^4 / 3 (well conditioned
 * where radiation pressure dominates near tau = 0). At tau_0 the gas pressure is the power-law solution
 * P_gas = (1 + a) tau_0 (g / kappa - sigma T_eff^4 / c), a = d ln kappa / d ln rho, solved for
 * kappa(P) by Newton's method; its error shrinks with tau_0.
 *
 * <p><b>Envelope.</b> From the photosphere (r = R, T = T_eff, m = M) inward in ln P
 * ({@link EnvelopeEquations}): r, ln T and the mass above, with the convection model's nabla.
 * Convective edges (nabla_rad = nabla_ad; with a homogeneous composition Schwarzschild and Ledoux
 * agree) and the edges of the superadiabatic layer (nabla - nabla_ad = threshold) are located as
 * events of the integrator, to 1e-10 in ln P, i.e. far below 1e-6 R. The integration stops at the
 * stated depth r = {@code inner-radius} R, or where m would fall below 1 % of M.
 *
 * <p><b>Approximations.</b> (1) m = M in gravity and in nabla_rad: right to the fraction of the
 * mass above the point, 1 - m/M, which the solution reports (2.5 % at the base of the Sun's
 * convection zone [from memory]; a warning is given above 5 %); it fails for deep envelopes (red
 * giants, fully convective dwarfs). (2) L constant: no nuclear energy generation and no thermal
 * imbalance above the point; it fails where hydrogen burns (T above ~5e6 K), in stars contracting
 * or expanding on their thermal time (pre-main sequence, subgiants crossing the Hertzsprung gap).
 * (3) A plane-parallel grey atmosphere in the Eddington approximation with the photosphere at
 * r = R: it fails for extended atmospheres (giants, where H_P is not small against R) and is only
 * approximate for real (non-grey) atmospheres, which is one reason a calibrated alpha belongs to its
 * input physics. (4) A homogeneous composition (no settling or diffusion).
 *
 * <p>Immutable and thread-safe: each call makes its own integrator and working state.
 */
public final class GreyAtmosphereEnvelope implements EnvelopeIntegrator {
    /** Name to ask for this integrator by. */
    public static final String NAME = "grey-atmosphere-envelope";

    static final String RELATIVE_TOLERANCE = "relative-tolerance";
    static final String INNER_RADIUS = "inner-radius";
    static final String TOP_OPTICAL_DEPTH = "top-optical-depth";
    static final String SAMPLE_SPACING = "sample-spacing";
    static final String SUPERADIABATIC_THRESHOLD = "superadiabatic-threshold";
    static final String ALPHA_LOW = "alpha-low";
    static final String ALPHA_HIGH = "alpha-high";

    /** Default relative tolerance of the integrators (common practice, no source: tight enough that halving it moves the base by far less than 1e-5 R). */
    public static final double DEFAULT_TOLERANCE = 1e-9;
    /** Default stated depth: the integration stops at r = 0.5 R. */
    public static final double DEFAULT_INNER_RADIUS = 0.5;
    /** Default optical depth where the atmosphere integration starts. */
    public static final double DEFAULT_TOP_OPTICAL_DEPTH = 1e-6;
    /** Default spacing of the output profile in ln P. */
    public static final double DEFAULT_SAMPLE_SPACING = 0.02;
    /** Default threshold on nabla - nabla_ad that bounds the superadiabatic layer (our choice, no source). */
    public static final double DEFAULT_SUPERADIABATIC_THRESHOLD = 1e-3;
    /** Default lower end of the alpha interval a calibration searches. */
    public static final double DEFAULT_ALPHA_LOW = 0.5;
    /** Default upper end of the alpha interval a calibration searches. */
    public static final double DEFAULT_ALPHA_HIGH = 4.0;

    /** Largest fraction of the mass above the base of the convection zone before a warning. */
    static final double MASS_WARNING = 0.05;
    /** Temperature at the base above which a warning says L may not be constant (K). */
    static final double BURNING_WARNING_K = 5e6;
    /** Relative step of alpha for the sensitivity's central difference. */
    static final double SENSITIVITY_STEP = 1e-3;
    /** Convergence of event locations in ln P. */
    static final double EVENT_CONVERGENCE = 1e-10;
    /** Largest ln P interval between two checks of an event function. */
    static final double EVENT_CHECK = 0.02;

    /** Describes this integrator and its options. */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.ENVELOPE, NAME,
            "envelope integrated inward in ln P from a grey Eddington atmosphere (T^4 = 3/4 T_eff^4 (tau + 2/3), "
                    + "photospheric P from dP/dtau = g/kappa) with m = M and L constant, convective edges located as "
                    + "integrator events; alpha calibration to a target convection-zone base by Brent's method",
            List.of(new OptionInfo(RELATIVE_TOLERANCE, String.valueOf(DEFAULT_TOLERANCE), "1",
                            "relative tolerance of the Dormand-Prince 8(5,3) integrators; in (1e-14, 1e-3)"),
                    new OptionInfo(INNER_RADIUS, String.valueOf(DEFAULT_INNER_RADIUS), "1",
                            "the stated depth: the integration stops at r = inner-radius R; in (0.01, 1)"),
                    new OptionInfo(TOP_OPTICAL_DEPTH, String.valueOf(DEFAULT_TOP_OPTICAL_DEPTH), "1",
                            "optical depth where the atmosphere integration starts; in (1e-12, 0.01)"),
                    new OptionInfo(SAMPLE_SPACING, String.valueOf(DEFAULT_SAMPLE_SPACING), "1",
                            "spacing of the output profile in ln P; in [1e-4, 1]"),
                    new OptionInfo(SUPERADIABATIC_THRESHOLD, String.valueOf(DEFAULT_SUPERADIABATIC_THRESHOLD), "1",
                            "the superadiabatic layer is where nabla - nabla_ad exceeds this (our choice); in (0, 1)"),
                    new OptionInfo(ALPHA_LOW, String.valueOf(DEFAULT_ALPHA_LOW), "1",
                            "lower end of the alpha interval a calibration searches; > 0"),
                    new OptionInfo(ALPHA_HIGH, String.valueOf(DEFAULT_ALPHA_HIGH), "1",
                            "upper end of the alpha interval a calibration searches; > alpha-low")));

    /** The integrator with every option at its default. */
    public static final GreyAtmosphereEnvelope DEFAULT = new GreyAtmosphereEnvelope(DEFAULT_TOLERANCE,
            DEFAULT_INNER_RADIUS, DEFAULT_TOP_OPTICAL_DEPTH, DEFAULT_SAMPLE_SPACING, DEFAULT_SUPERADIABATIC_THRESHOLD,
            DEFAULT_ALPHA_LOW, DEFAULT_ALPHA_HIGH);

    private final double tolerance;
    private final double innerRadius;
    private final double topOpticalDepth;
    private final double sampleSpacing;
    private final double superadiabaticThreshold;
    private final double alphaLow;
    private final double alphaHigh;

    /**
     * @param tolerance               relative tolerance of the integrators, in (1e-14, 1e-3)
     * @param innerRadius             the stated depth r / R, in (0.01, 1)
     * @param topOpticalDepth         tau where the atmosphere starts, in (1e-12, 0.01)
     * @param sampleSpacing           spacing of the profile in ln P, in [1e-4, 1]
     * @param superadiabaticThreshold threshold on nabla - nabla_ad, in (0, 1)
     * @param alphaLow                lower end of the calibration's alpha interval, &gt; 0
     * @param alphaHigh               upper end, &gt; alphaLow
     */
    public GreyAtmosphereEnvelope(double tolerance, double innerRadius, double topOpticalDepth, double sampleSpacing,
                                  double superadiabaticThreshold, double alphaLow, double alphaHigh) {
        int none = InvalidInputException.NO_ZONE;
        this.tolerance = Checks.openInterval(RELATIVE_TOLERANCE, tolerance, 1e-14, 1e-3, "1", none);
        this.innerRadius = Checks.openInterval(INNER_RADIUS, innerRadius, 0.01, 1.0, "1", none);
        this.topOpticalDepth = Checks.openInterval(TOP_OPTICAL_DEPTH, topOpticalDepth, 1e-12, 0.01, "1", none);
        this.sampleSpacing = Checks.closedInterval(SAMPLE_SPACING, sampleSpacing, 1e-4, 1.0, "1", none);
        this.superadiabaticThreshold = Checks.openInterval(SUPERADIABATIC_THRESHOLD, superadiabaticThreshold, 0.0,
                1.0, "1", none);
        this.alphaLow = Checks.positive(ALPHA_LOW, alphaLow, "1", none);
        this.alphaHigh = Checks.positive(ALPHA_HIGH, alphaHigh, "1", none);
        if (!(alphaHigh > alphaLow)) {
            throw new InvalidInputException(ALPHA_HIGH, alphaHigh, "1", none, "greater than alpha-low = " + alphaLow);
        }
    }

    /**
     * @param options see {@link #INFO}
     * @return the integrator
     */
    public static GreyAtmosphereEnvelope fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        try {
            return new GreyAtmosphereEnvelope(options.getDouble(NAME, RELATIVE_TOLERANCE, DEFAULT_TOLERANCE),
                    options.getDouble(NAME, INNER_RADIUS, DEFAULT_INNER_RADIUS),
                    options.getDouble(NAME, TOP_OPTICAL_DEPTH, DEFAULT_TOP_OPTICAL_DEPTH),
                    options.getDouble(NAME, SAMPLE_SPACING, DEFAULT_SAMPLE_SPACING),
                    options.getDouble(NAME, SUPERADIABATIC_THRESHOLD, DEFAULT_SUPERADIABATIC_THRESHOLD),
                    options.getDouble(NAME, ALPHA_LOW, DEFAULT_ALPHA_LOW),
                    options.getDouble(NAME, ALPHA_HIGH, DEFAULT_ALPHA_HIGH));
        } catch (InvalidInputException e) {
            throw new InvalidOptionException(NAME, e.field(), String.valueOf(e.value()), "must be " + e.requirement());
        }
    }

    /**
     * @param factor multiplies the relative tolerance
     * @return this integrator with the tolerance scaled
     */
    public GreyAtmosphereEnvelope withToleranceScaled(double factor) {
        return new GreyAtmosphereEnvelope(tolerance * factor, innerRadius, topOpticalDepth, sampleSpacing,
                superadiabaticThreshold, alphaLow, alphaHigh);
    }

    /** @return the relative tolerance of the integrators */
    public double tolerance() {
        return tolerance;
    }

    /** @return the stated depth r / R where the integration stops */
    public double innerRadius() {
        return innerRadius;
    }

    @Override
    public EnvelopeSolution integrate(EnvelopeStar star, EnvelopeSetup setup) {
        return run(star, setup, true);
    }

    /**
     * The photospheric pressure of the grey atmosphere.
     *
     * @param star  the star
     * @param setup the models (the convection model is not used)
     * @return P at tau = 2/3 (dyn cm^-2)
     */
    public double photosphericPressure(EnvelopeStar star, EnvelopeSetup setup) {
        return photosphere(star, new EnvelopePoint(star, setup));
    }

    private double photosphere(EnvelopeStar star, EnvelopePoint point) {
        double teff = GreyAtmosphere.effectiveTemperature(star.luminosity(), star.radius());
        double g = Codata2018.GRAVITATIONAL_CONSTANT * star.mass() / (star.radius() * star.radius());
        double force = GreyAtmosphere.radiativeForce(teff);
        double tau0 = topOpticalDepth;
        double t0 = GreyAtmosphere.temperature(tau0, teff);
        double pRad0 = GreyAtmosphere.radiationPressure(t0);
        // Newton on ln P_gas = ln((1 + a) tau_0 (g / kappa - F)) at the top of the atmosphere
        double lnPg = Math.log(tau0 * g / 0.3);
        for (int i = 0; i < 60; i++) {
            point.at(pRad0 + Math.exp(lnPg), t0);
            double a = Math.max(0.0, point.dLnKappaDLnRho);
            double excess = g / point.opacity - force;
            if (!(excess > 0.0)) {
                throw superEddington(star, point.opacity, g, force);
            }
            double target = Math.log((1.0 + a) * tau0 * excess);
            double slope = 1.0 + a * g / point.opacity / excess;
            double step = (lnPg - target) / slope;
            lnPg -= step;
            if (Math.abs(step) < 1e-13) {
                break;
            }
        }
        // y = ln P_gas with P_gas = P - a T^4 / 3: dP_gas / dtau = g / kappa - sigma T_eff^4 / c
        FirstOrderDifferentialEquations atmosphere = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 1;
            }

            @Override
            public void computeDerivatives(double lnTau, double[] y, double[] yDot) {
                double tau = Math.exp(lnTau);
                double t = GreyAtmosphere.temperature(tau, teff);
                double pg = Math.exp(y[0]);
                point.at(pg + GreyAtmosphere.radiationPressure(t), t);
                double excess = g / point.opacity - force;
                if (!(excess > 0.0)) {
                    throw superEddington(star, point.opacity, g, force);
                }
                yDot[0] = tau * excess / pg;
            }
        };
        DormandPrince853Integrator dp = new DormandPrince853Integrator(1e-12, 10.0, tolerance * 1e-3, tolerance);
        double[] y = {lnPg};
        try {
            dp.integrate(atmosphere, Math.log(tau0), y, Math.log(GreyAtmosphere.PHOTOSPHERE_OPTICAL_DEPTH), y);
        } catch (MathIllegalStateException e) {
            throw new IllegalStateException("the grey atmosphere of " + star + " could not be integrated: "
                    + e.getMessage(), e);
        }
        return Math.exp(y[0]) + GreyAtmosphere.radiationPressure(teff);
    }

    private static InvalidInputException superEddington(EnvelopeStar star, double kappa, double g, double force) {
        return new InvalidInputException("luminosity", star.luminosity(), "erg s^-1", InvalidInputException.NO_ZONE,
                "below the Eddington limit of the atmosphere: there kappa sigma T_eff^4 / c = " + (kappa * force)
                        + " cm s^-2 is not below g = G M / R^2 = " + g + " cm s^-2 (kappa = " + kappa
                        + " cm^2/g), so radiation would lift the atmosphere off; lower L or R, or raise M");
    }

    /** A point where an event function changed sign. */
    private record Crossing(double lnP, double[] y, boolean increasing) {
    }

    /** Records sign changes of nabla_rad - nabla_ad; restarts the step there (nabla has a kink). */
    private static final class EdgeEvent implements EventHandler {
        private final EnvelopeEquations eq;
        final List<Crossing> crossings = new ArrayList<>();

        EdgeEvent(EnvelopeEquations eq) {
            this.eq = eq;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double t, double[] y) {
            EnvelopePoint p = eq.evaluate(t, y, false);
            return p.nablaRad - p.nablaAd;
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            crossings.add(new Crossing(t, y.clone(), increasing));
            return Action.RESET_DERIVATIVES;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }

    /** Records where nabla - nabla_ad crosses the superadiabatic threshold. */
    private static final class ExcessEvent implements EventHandler {
        private final EnvelopeEquations eq;
        private final double threshold;
        final List<Crossing> crossings = new ArrayList<>();

        ExcessEvent(EnvelopeEquations eq, double threshold) {
            this.eq = eq;
            this.threshold = threshold;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double t, double[] y) {
            EnvelopePoint p = eq.evaluate(t, y, true);
            return p.nabla - p.nablaAd - threshold;
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            crossings.add(new Crossing(t, y.clone(), increasing));
            return Action.CONTINUE;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }

    /** Stops at the stated depth, or where m would fall below 1 % of M. */
    private static final class StopEvent implements EventHandler {
        private final double innerRadius;
        private final double mass;
        boolean massLimit;

        StopEvent(double innerRadius, double mass) {
            this.innerRadius = innerRadius;
            this.mass = mass;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double t, double[] y) {
            return Math.min(y[EnvelopeEquations.R] / innerRadius - 1.0,
                    0.99 - y[EnvelopeEquations.MASS_ABOVE] / mass);
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            massLimit = y[EnvelopeEquations.MASS_ABOVE] / mass > 0.98;
            return Action.STOP;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }

    /** Keeps the profile's points: ln P and the state. */
    private static final class Samples implements FixedStepHandler {
        final List<double[]> points = new ArrayList<>();

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public void handleStep(double t, double[] y, double[] yDot, boolean isLast) {
            if (!points.isEmpty()) {
                double[] last = points.get(points.size() - 1);
                if (!(y[EnvelopeEquations.R] < last[1 + EnvelopeEquations.R]) || !(t > last[0])) {
                    return;
                }
            }
            points.add(new double[] {t, y[0], y[1], y[2]});
        }
    }

    /**
     * @param star   the star
     * @param setup  the models
     * @param sample whether to sample the profile (a calibration needs only the base)
     * @return the envelope
     */
    EnvelopeSolution run(EnvelopeStar star, EnvelopeSetup setup, boolean sample) {
        if (setup.convection().needsEdgeDistance()) {
            throw new InvalidOptionException(String.valueOf(setup.convection()), "length scale", null,
                    "this convection model takes its length from the distance to the nearest edge of the convective"
                            + " region, which an envelope integrated inward from the photosphere does not know before it"
                            + " reaches the zone's base; give it a local length instead (eddy-spectrum:"
                            + " length-scale=scale-height)");
        }
        double mass = star.mass();
        double radius = star.radius();
        double teff = GreyAtmosphere.effectiveTemperature(star.luminosity(), radius);
        double g = Codata2018.GRAVITATIONAL_CONSTANT * mass / (radius * radius);
        EnvelopePoint point = new EnvelopePoint(star, setup);
        double pPhot = photosphere(star, point);
        EnvelopeEquations eq = new EnvelopeEquations(point, mass, radius);

        double[] absTol = {radius * tolerance * 1e-3, tolerance * 1e-3, mass * tolerance * 1e-6};
        double[] relTol = {tolerance, tolerance, tolerance};
        DormandPrince853Integrator dp = new DormandPrince853Integrator(1e-12, 2.0, absTol, relTol);
        dp.setMaxEvaluations(2_000_000);
        EdgeEvent edges = new EdgeEvent(eq);
        StopEvent stop = new StopEvent(innerRadius * radius, mass);
        ExcessEvent excess = new ExcessEvent(eq, superadiabaticThreshold);
        dp.addEventHandler(edges, EVENT_CHECK, EVENT_CONVERGENCE, 1000);
        dp.addEventHandler(stop, EVENT_CHECK, EVENT_CONVERGENCE, 1000);
        if (sample) {
            dp.addEventHandler(excess, EVENT_CHECK, EVENT_CONVERGENCE, 1000);
        }
        Samples samples = new Samples();
        if (sample) {
            dp.addStepHandler(new StepNormalizer(sampleSpacing, samples, StepNormalizerMode.INCREMENT,
                    StepNormalizerBounds.BOTH));
        }
        double t0 = Math.log(pPhot);
        double[] y0 = {radius, Math.log(teff), 0.0};
        EnvelopePoint top = eq.evaluate(t0, y0, true);
        boolean convectiveAtTop = top.nablaRad > top.nablaAd;
        boolean superadiabaticAtTop = top.nabla - top.nablaAd > superadiabaticThreshold;
        double[] y = y0.clone();
        double tEnd;
        try {
            tEnd = dp.integrate(eq, t0, y0, t0 + 300.0, y);
        } catch (MathIllegalStateException e) {
            throw new IllegalStateException("the envelope of " + star + " could not be integrated: " + e.getMessage(),
                    e);
        }
        int evaluations = dp.getEvaluations();

        List<String> warnings = new ArrayList<>();
        if (stop.massLimit) {
            warnings.add("the integration stopped where m fell to 1 % of M, above the stated depth r = "
                    + innerRadius + " R: the envelope approximation m = M does not hold for this star");
        }
        // convection zones from the edges, outermost first
        List<ConvectiveZone> zones = new ArrayList<>();
        ConvectiveBase base = null;
        boolean inside = convectiveAtTop;
        double zoneTop = radius;
        double topLnP = t0;
        List<double[]> zoneSpans = new ArrayList<>(); // ln P of each zone's top and bottom
        for (Crossing c : edges.crossings) {
            if (c.increasing() && !inside) {
                inside = true;
                zoneTop = c.y()[EnvelopeEquations.R];
                topLnP = c.lnP();
            } else if (!c.increasing() && inside) {
                inside = false;
                zones.add(new ConvectiveZone(zoneTop, c.y()[EnvelopeEquations.R], Math.exp(topLnP), Math.exp(c.lnP()),
                        true, Double.NaN));
                zoneSpans.add(new double[] {topLnP, c.lnP()});
                if (base == null) {
                    base = base(eq, c, star);
                }
            }
        }
        if (inside) {
            zones.add(new ConvectiveZone(zoneTop, y[EnvelopeEquations.R], Math.exp(topLnP), Math.exp(tEnd), false,
                    Double.NaN));
            zoneSpans.add(new double[] {topLnP, tEnd});
        }
        if (base != null && 1.0 - base.massFraction() > MASS_WARNING) {
            warnings.add(String.format("the layers above the base of the surface convection zone hold %.1f %% of the"
                    + " mass; the envelope approximation m = M is off by up to that much there",
                    100.0 * (1.0 - base.massFraction())));
        }
        if (base != null && base.temperature() > BURNING_WARNING_K) {
            warnings.add(String.format("the base of the surface convection zone is at T = %.3g K, where hydrogen"
                    + " burning may already change L, which the envelope holds constant", base.temperature()));
        }
        if (!zones.isEmpty() && !zones.get(0).bottomReached()) {
            warnings.add("the surface convection zone reaches below the stated depth r = " + innerRadius
                    + " R; its base was not found (integrate deeper with the option " + INNER_RADIUS + ")");
        }

        Profile profile = null;
        double[] nablaRad = null;
        double[] nabla = null;
        double[] velocity = null;
        SuperadiabaticLayer layer = null;
        if (sample) {
            int n = samples.points.size();
            if (n < 3) {
                throw new InvalidInputException(SAMPLE_SPACING, sampleSpacing, "1", InvalidInputException.NO_ZONE,
                        "small enough to give at least 3 profile points over the " + (tEnd - t0)
                                + " in ln P that were integrated");
            }
            Map<ProfileColumn, double[]> cols = new EnumMap<>(ProfileColumn.class);
            for (ProfileColumn c : List.of(ProfileColumn.RADIUS, ProfileColumn.MASS, ProfileColumn.TEMPERATURE,
                    ProfileColumn.DENSITY, ProfileColumn.PRESSURE, ProfileColumn.LUMINOSITY, ProfileColumn.HYDROGEN,
                    ProfileColumn.METALS, ProfileColumn.OPACITY, ProfileColumn.CP, ProfileColumn.DELTA,
                    ProfileColumn.NABLA_AD, ProfileColumn.NABLA_MU, ProfileColumn.PHI)) {
                cols.put(c, new double[n]);
            }
            nablaRad = new double[n];
            nabla = new double[n];
            velocity = new double[n];
            double maxExcess = Double.NEGATIVE_INFINITY;
            double depthOfMax = Double.NaN;
            double tOfMax = Double.NaN;
            double[] surfaceZone = zoneSpans.isEmpty() ? null : zoneSpans.get(0);
            double[] maxPerZone = new double[zoneSpans.size()];
            java.util.Arrays.fill(maxPerZone, Double.NEGATIVE_INFINITY);
            for (int i = 0; i < n; i++) {
                double[] s = samples.points.get(i);
                int k = n - 1 - i; // centre side first
                double[] state = {s[1], s[2], s[3]};
                EnvelopePoint p = eq.evaluate(s[0], state, true);
                cols.get(ProfileColumn.RADIUS)[k] = s[1];
                cols.get(ProfileColumn.MASS)[k] = mass - s[3];
                cols.get(ProfileColumn.TEMPERATURE)[k] = p.temperature;
                cols.get(ProfileColumn.DENSITY)[k] = p.density;
                cols.get(ProfileColumn.PRESSURE)[k] = p.pressure;
                cols.get(ProfileColumn.LUMINOSITY)[k] = star.luminosity();
                cols.get(ProfileColumn.HYDROGEN)[k] = star.hydrogen();
                cols.get(ProfileColumn.METALS)[k] = star.metals();
                cols.get(ProfileColumn.OPACITY)[k] = p.opacity;
                cols.get(ProfileColumn.CP)[k] = p.cp;
                cols.get(ProfileColumn.DELTA)[k] = p.delta;
                cols.get(ProfileColumn.NABLA_AD)[k] = p.nablaAd;
                cols.get(ProfileColumn.NABLA_MU)[k] = 0.0;
                cols.get(ProfileColumn.PHI)[k] = p.phi;
                nablaRad[k] = p.nablaRad;
                nabla[k] = p.nabla;
                velocity[k] = p.velocity;
                double ex = p.nabla - p.nablaAd;
                for (int z = 0; z < zoneSpans.size(); z++) {
                    if (s[0] >= zoneSpans.get(z)[0] && s[0] <= zoneSpans.get(z)[1]) {
                        maxPerZone[z] = Math.max(maxPerZone[z], ex);
                    }
                }
                if (surfaceZone != null && s[0] >= surfaceZone[0] && s[0] <= surfaceZone[1] && ex > maxExcess) {
                    maxExcess = ex;
                    depthOfMax = radius - s[1];
                    tOfMax = p.temperature;
                }
            }
            List<ConvectiveZone> withMax = new ArrayList<>();
            for (int z = 0; z < zones.size(); z++) {
                ConvectiveZone cz = zones.get(z);
                withMax.add(new ConvectiveZone(cz.topRadius(), cz.bottomRadius(), cz.topPressure(),
                        cz.bottomPressure(), cz.bottomReached(),
                        maxPerZone[z] == Double.NEGATIVE_INFINITY ? Double.NaN : maxPerZone[z]));
            }
            zones = withMax;
            layer = superadiabaticLayer(excess.crossings, superadiabaticAtTop, surfaceZone, radius, maxExcess,
                    depthOfMax, tOfMax);
            profile = new Profile("envelope of M = " + (float) mass + " g, R = " + (float) radius + " cm, L = "
                    + (float) star.luminosity() + " erg/s", cols);
        }
        if (point.opacityOutside > 0) {
            warnings.add(point.opacityOutside + " opacity lookups fell outside the opacity model's domain and were"
                    + " clamped or extrapolated by its out-of-range policy");
        }
        double rhoPhot = eq.evaluate(t0, y0, false).density;
        return new EnvelopeSolution(star, setup.convection().alpha(), teff, g, pPhot, rhoPhot, profile, nablaRad, nabla,
                velocity, zones, base, layer, y[EnvelopeEquations.R], evaluations, warnings);
    }

    private SuperadiabaticLayer superadiabaticLayer(List<Crossing> crossings, boolean atTop, double[] surfaceZone,
                                                    double radius, double maxExcess, double depthOfMax,
                                                    double tOfMax) {
        if (surfaceZone == null || !(maxExcess > superadiabaticThreshold)) {
            return null;
        }
        double topDepth = atTop ? 0.0 : Double.NaN;
        double bottomDepth = Double.NaN;
        for (Crossing c : crossings) {
            if (c.lnP() < surfaceZone[0] || c.lnP() > surfaceZone[1]) {
                continue;
            }
            if (c.increasing() && Double.isNaN(topDepth)) {
                topDepth = radius - c.y()[EnvelopeEquations.R];
            } else if (!c.increasing() && !Double.isNaN(topDepth)) {
                bottomDepth = radius - c.y()[EnvelopeEquations.R];
                break;
            }
        }
        if (Double.isNaN(topDepth) || Double.isNaN(bottomDepth)) {
            return null;
        }
        return new SuperadiabaticLayer(superadiabaticThreshold, bottomDepth, topDepth, maxExcess, depthOfMax, tOfMax);
    }

    private static ConvectiveBase base(EnvelopeEquations eq, Crossing c, EnvelopeStar star) {
        double[] y = c.y();
        EnvelopePoint p = eq.evaluate(c.lnP(), y, false);
        double r = y[EnvelopeEquations.R];
        double m = star.mass() - y[EnvelopeEquations.MASS_ABOVE];
        return new ConvectiveBase(r, r / star.radius(), p.temperature, p.density, p.pressure, m, m / star.mass());
    }

    @Override
    public AlphaCalibration calibrate(EnvelopeStar star, EnvelopeSetup setup, double targetBase,
                                      Consumer<CalibrationStep> progress) {
        Checks.openInterval("target base r/R", targetBase, 0.0, 1.0, "1", InvalidInputException.NO_ZONE);
        List<CalibrationStep> steps = new ArrayList<>();
        Map<Double, Double> done = new HashMap<>();
        java.util.function.DoubleUnaryOperator baseAt = alpha -> done.computeIfAbsent(alpha, a -> {
            EnvelopeSolution s = run(star, setup.withAlpha(a), false);
            double rb = s.surfaceConvectionBase().map(ConvectiveBase::radiusFraction).orElse(Double.NaN);
            CalibrationStep step = new CalibrationStep(steps.size() + 1, a, rb);
            steps.add(step);
            if (progress != null) {
                progress.accept(step);
            }
            if (Double.isNaN(rb)) {
                if (s.convectiveZones().isEmpty()) {
                    throw new InvalidInputException("target base r/R", targetBase, "1", InvalidInputException.NO_ZONE,
                            "the base of a surface convection zone, but this star has none (nabla_rad < nabla_ad"
                                    + " from the photosphere to r = " + innerRadius + " R for every alpha)");
                }
                return innerRadius; // the base lies below the stated depth
            }
            return rb;
        });
        double shallow = baseAt.applyAsDouble(alphaLow);
        double deep = baseAt.applyAsDouble(alphaHigh);
        double hi = Math.max(shallow, deep);
        double lo = Math.min(shallow, deep);
        if (!(targetBase >= lo && targetBase <= hi) || targetBase <= innerRadius) {
            throw new InvalidInputException("target base r/R", targetBase, "1", InvalidInputException.NO_ZONE,
                    String.format("inside the range of bases that alpha from %s to %s reaches for this star, r_b/R from"
                            + " %.6f to %.6f (the stated depth is r = %s R); choose a reachable target, or widen the"
                            + " alpha interval with the options %s and %s", alphaLow, alphaHigh, lo, hi, innerRadius,
                            ALPHA_LOW, ALPHA_HIGH));
        }
        BrentSolver brent = new BrentSolver(1e-12, 1e-9, 1e-12);
        double alpha;
        try {
            alpha = brent.solve(200, a -> baseAt.applyAsDouble(a) - targetBase, alphaLow, alphaHigh);
        } catch (MathIllegalStateException e) {
            throw new IllegalStateException("the alpha calibration of " + star + " did not converge: " + e.getMessage(),
                    e);
        }
        double h = SENSITIVITY_STEP * alpha;
        double up = baseAt.applyAsDouble(alpha + h);
        double down = baseAt.applyAsDouble(alpha - h);
        double sensitivity = 2.0 * h / (up - down);
        EnvelopeSolution envelope = run(star, setup.withAlpha(alpha), true);
        return new AlphaCalibration(alpha, targetBase, sensitivity, steps, envelope);
    }

    @Override
    public String toString() {
        return NAME + "(" + RELATIVE_TOLERANCE + "=" + tolerance + ", " + INNER_RADIUS + "=" + innerRadius + ")";
    }
}
