package io.github.startransport.core.profile;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.core.convection.OvershootMixing;
import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.core.gradient.LedouxGradient;
import io.github.startransport.core.seismic.AsymptoticIntegrals;
import io.github.startransport.core.seismic.LocalFrequencies;
import io.github.startransport.core.gradient.StabilityClassifier;
import io.github.startransport.core.timescale.Timescale;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.InvalidOptionException;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ProfileDiagnoser;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.SeismicSummary;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.Timescales;
import io.github.startransport.spi.ZoneState;
import io.github.startransport.spi.sharing.ColumnSharing;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.function.IntToDoubleFunction;

/**
 * Zone-by-zone diagnosis of a whole profile with local models: per-zone gradients and
 * convection, regions with interpolated boundaries, and timescales.
 *
 * <p>Missing optional columns are filled: kappa from the setup's opacity model; nabla_ad, c_P,
 * delta, Gamma_1 and phi from its thermodynamics model, called with the profile's rho and T (a warning
 * says so, and counts the zones where that model leaves its validity: degenerate electrons, pressure
 * ionisation, a pressure more than 1 % from the profile's; with the fully ionised fallback, zones
 * cooler than {@value #PARTIAL_IONISATION_T} K); nabla_mu from the composition
 * ({@link CompositionGradient}). Dimensional quantities use the profile's own P: H_P,
 * c_s = sqrt(Gamma_1 P / rho), N^2 = (g^2 rho / P) delta (nabla_L - nabla) with the actual nabla, and
 * S_1 = sqrt(2) c_s / r ({@link LocalFrequencies}); the whole-model integrals (acoustic radius, large
 * separation, l = 1 period spacing, acoustic depths of convective edges) follow from them
 * ({@link AsymptoticIntegrals}).
 *
 * <p>Region boundaries lie where the quantity that separates the two regimes changes sign, found
 * by {@link BoundaryFinder} between the two zones: the chosen criterion's convective margin
 * ({@link StabilityClassifier#convectiveMargin}: nabla_rad - nabla_L under Ledoux,
 * nabla_rad - min(nabla_ad, nabla_L) under Schwarzschild) at the edge of a convective region, the Schwarzschild margin at the edge of a semiconvective region, nabla_mu
 * at the edge of a thermohaline region. The Schwarzschild and Ledoux boundaries are both
 * reported where a margin of each kind changes sign next to the edge.
 *
 * <p>Immutable and thread-safe; each call allocates its own working arrays. The diagnosis shares
 * the profile's columns (both are immutable) rather than copying them.
 */
public final class LocalDiagnosis implements ProfileDiagnoser {
    /** Name to ask for this model by. */
    public static final String NAME = "zone-by-zone";

    /** Below this temperature (K) a fully ionised equation of state is not to be trusted. */
    public static final double PARTIAL_IONISATION_T = 1e5;

    /** Option: f of exponential overshoot applied in the diagnosis; 0 (the default) applies none. */
    public static final String OVERSHOOT_F = "overshoot-f";
    /** Option: f0, where D_0 of overshoot is taken, in units of H inside the edge. */
    public static final String OVERSHOOT_F0 = "overshoot-f0";
    /** Option: alpha_ov of step overshoot, in units of H; 0 (the default) applies none. */
    public static final String OVERSHOOT_STEP = "overshoot-step";
    /** Option: the coefficient below which overshoot mixing ends (cm^2 s^-1). */
    public static final String OVERSHOOT_FLOOR = "overshoot-floor";

    /** Describes this model and its options (overshoot, off by default). */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.DIAGNOSIS, NAME,
            "zone-by-zone diagnosis with local models: gradients, regime, convection, mixing; regions with "
                    + "boundaries interpolated between zones and their self-consistency (Gabriel et al. 2014); "
                    + "overshoot mixing at the edges of convective regions (off by default); photon, thermal and "
                    + "Kelvin-Helmholtz timescales; convective turnover times",
            List.of(new OptionInfo(OVERSHOOT_F, "0", "1",
                            "f of exponential diffusive overshoot, D = D_0 exp(-2|r - r_0|/(f H)) (Freytag, Ludwig & "
                                    + "Steffen 1996; Herwig 2000); 0: none"),
                    new OptionInfo(OVERSHOOT_F0, Double.toString(OvershootMixing.DEFAULT_F0), "1",
                            "D_0 is taken f0 H inside each convective edge, where the exponential starts "
                                    + "(Pedersen et al. 2018 use 0.005)"),
                    new OptionInfo(OVERSHOOT_STEP, "0", "1",
                            "alpha_ov of step overshoot: D = D_0 up to alpha_ov H beyond each edge, nabla left "
                                    + "radiative; 0: none; not together with overshoot-f"),
                    new OptionInfo(OVERSHOOT_FLOOR, Double.toString(OvershootMixing.DEFAULT_FLOOR), "cm^2 s^-1",
                            "overshoot mixing ends where its coefficient falls below this")));

    /** The diagnosis with every option at its default (no overshoot). */
    public static final LocalDiagnosis INSTANCE = new LocalDiagnosis(0.0, OvershootMixing.DEFAULT_F0, 0.0,
            OvershootMixing.DEFAULT_FLOOR);

    /** f of exponential overshoot (dimensionless). */
    private final double overshootF;
    /** f0 (dimensionless). */
    private final double overshootF0;
    /** alpha_ov of step overshoot (dimensionless). */
    private final double overshootStep;
    /** Floor of the overshoot coefficient (cm^2 s^-1). */
    private final double overshootFloor;

    private LocalDiagnosis(double overshootF, double overshootF0, double overshootStep, double overshootFloor) {
        OvershootMixing.checkSettings(overshootF, overshootF0, overshootStep, overshootFloor);
        this.overshootF = overshootF;
        this.overshootF0 = overshootF0;
        this.overshootStep = overshootStep;
        this.overshootFloor = overshootFloor;
    }

    /**
     * @param options {@value #OVERSHOOT_F}, {@value #OVERSHOOT_F0}, {@value #OVERSHOOT_STEP},
     *                {@value #OVERSHOOT_FLOOR} (see {@link #INFO})
     * @return the model
     * @throws InvalidOptionException for an unknown option or a value out of range
     */
    public static LocalDiagnosis fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        double f = options.getDouble(NAME, OVERSHOOT_F, 0.0);
        double f0 = options.getDouble(NAME, OVERSHOOT_F0, OvershootMixing.DEFAULT_F0);
        double step = options.getDouble(NAME, OVERSHOOT_STEP, 0.0);
        double floor = options.getDouble(NAME, OVERSHOOT_FLOOR, OvershootMixing.DEFAULT_FLOOR);
        try {
            return new LocalDiagnosis(f, f0, step, floor);
        } catch (InvalidInputException e) {
            throw new InvalidOptionException(NAME, e.field(), Double.toString(e.value()), e.requirement());
        }
    }

    /** @return whether this diagnosis applies overshoot (f &gt; 0 or alpha_ov &gt; 0) */
    public boolean appliesOvershoot() {
        return overshootF > 0.0 || overshootStep > 0.0;
    }

    /**
     * Overshoot with this diagnosis's settings: see {@link OvershootMixing#profile}.
     */
    @Override
    public void overshoot(double[] radius, double[] scaleHeight, double[] diffusion, double[] regionBottom,
                          double[] regionTop, double[] overshoot, double[] reachBottom, double[] reachTop) {
        OvershootMixing.profile(radius, scaleHeight, diffusion, regionBottom, regionTop, overshootF, overshootF0,
                overshootStep, overshootFloor, overshoot, reachBottom, reachTop);
    }

    @Override
    public ProfileDiagnosis diagnose(Profile p, DiagnosisSetup setup) {
        int n = p.size();
        ConvectionModel convection = setup.convection();
        Criterion criterion = convection.criterion();
        List<String> warnings = new ArrayList<>();
        if (p.wasReversed()) {
            warnings.add("the profile was ordered surface to centre and has been reversed");
        }
        double[] r = ColumnSharing.read(p, ProfileColumn.RADIUS);
        double[] m = ColumnSharing.read(p, ProfileColumn.MASS);
        double[] t = ColumnSharing.read(p, ProfileColumn.TEMPERATURE);
        double[] rho = ColumnSharing.read(p, ProfileColumn.DENSITY);
        double[] pres = ColumnSharing.read(p, ProfileColumn.PRESSURE);
        double[] lum = ColumnSharing.read(p, ProfileColumn.LUMINOSITY);
        double[] x = ColumnSharing.read(p, ProfileColumn.HYDROGEN);
        double[] z = ColumnSharing.read(p, ProfileColumn.METALS);

        boolean hasKappa = p.has(ProfileColumn.OPACITY);
        double[] kappa = columnOr(p, ProfileColumn.OPACITY, 0.0);
        boolean hasThermo = p.has(ProfileColumn.NABLA_AD) && p.has(ProfileColumn.CP) && p.has(ProfileColumn.DELTA);
        double[] nablaAd = columnOr(p, ProfileColumn.NABLA_AD, 0.0);
        double[] cp = columnOr(p, ProfileColumn.CP, 0.0);
        double[] delta = columnOr(p, ProfileColumn.DELTA, 0.0);
        boolean hasPhi = p.has(ProfileColumn.PHI);
        double[] phi = columnOr(p, ProfileColumn.PHI, 1.0); // ideal gas, unless the thermodynamics model says
        boolean hasGamma1 = p.has(ProfileColumn.GAMMA1);
        double[] gamma1 = columnOr(p, ProfileColumn.GAMMA1, 0.0);
        boolean useThermo = !hasThermo || !hasGamma1 || !hasPhi;
        double[] nablaMu;
        if (p.has(ProfileColumn.NABLA_MU)) {
            nablaMu = ColumnSharing.read(p, ProfileColumn.NABLA_MU);
        } else {
            for (int k = 1; k < n; k++) {
                // nabla_mu = d ln mu / d ln P needs P to fall where mu changes; it may stay equal where X and Z do
                boolean sameComposition = x[k] == x[k - 1] && z[k] == z[k - 1];
                if (!(pres[k] < pres[k - 1] || pres[k] == pres[k - 1] && sameComposition)) {
                    throw new InvalidInputException(ProfileColumn.PRESSURE.header(), pres[k], ProfileColumn.PRESSURE.unit(),
                            zoneAsGiven(p, k), (sameComposition ? "equal to or below the pressure of the zone inside it"
                            : "below the pressure of the zone inside it, which has another X or Z,")
                            + " to compute nabla_mu from the composition (zone before it: " + pres[k - 1]
                            + "); give a nabla_mu column instead (" + p.source() + ")");
                }
            }
            nablaMu = new double[n];
            CompositionGradient.nablaMu(x, z, pres, nablaMu);
        }

        // the computed columns; the profile's own (and the filled-in ones) join them below
        EnumMap<DiagnosisColumn, double[]> out = new EnumMap<>(DiagnosisColumn.class);
        double[] hp = computed(out, DiagnosisColumn.SCALE_HEIGHT, n);
        double[] nablaRad = computed(out, DiagnosisColumn.NABLA_RAD, n);
        double[] nablaL = computed(out, DiagnosisColumn.NABLA_LEDOUX, n);
        double[] nabla = computed(out, DiagnosisColumn.NABLA, n);
        double[] nablaE = computed(out, DiagnosisColumn.NABLA_ELEMENT, n);
        double[] v = computed(out, DiagnosisColumn.VELOCITY, n);
        double[] fconv = computed(out, DiagnosisColumn.CONVECTIVE_FRACTION, n);
        double[] dmix = computed(out, DiagnosisColumn.DIFFUSION, n);
        double[] soundSpeed = computed(out, DiagnosisColumn.SOUND_SPEED, n);
        double[] n2 = computed(out, DiagnosisColumn.BUOYANCY_SQUARED, n);
        ThermoChecks thermoChecks = new ThermoChecks();
        double[] ell = new double[n];
        Regime[] regimes = new Regime[n];

        ZoneState zone = new ZoneState();
        ThermoResult thermo = new ThermoResult();
        OpacityResult opacity = new OpacityResult();
        ConvectionResult conv = new ConvectionResult();
        int cool = 0;
        // a convection model whose length scale is the distance to the nearest edge needs the edges first: a
        // first pass fills every zone's inputs, EdgeDistances classifies them and locates the edges, and the
        // second pass solves with the distances (one pass, filling and solving, for every other model)
        final boolean deferred = convection.needsEdgeDistance();
        double[] edgeDistance = null;
        for (int pass = deferred ? 0 : 1; pass <= 1; pass++) {
            for (int k = 0; k < n; k++) {
                zone.zone = zoneAsGiven(p, k);
                zone.radius = r[k];
                zone.mass = m[k];
                zone.temperature = t[k];
                zone.density = rho[k];
                zone.pressure = pres[k];
                zone.luminosity = lum[k];
                zone.hydrogen = x[k];
                zone.metals = z[k];
                if (pass == 0 || !deferred) {
                    if (useThermo) {
                        // values only: nabla_ad, c_P, delta, Gamma_1, phi and the checks' P, degeneracy and
                        // pressure ionisation; the diagnosis reads no derivative
                        setup.thermodynamics().evaluateValues(t[k], rho[k], x[k], z[k], zone.zone, thermo);
                        if (!hasThermo) {
                            if (!p.has(ProfileColumn.NABLA_AD)) {
                                nablaAd[k] = thermo.nablaAd;
                            }
                            if (!p.has(ProfileColumn.CP)) {
                                cp[k] = thermo.cp;
                            }
                            if (!p.has(ProfileColumn.DELTA)) {
                                delta[k] = thermo.delta;
                            }
                            if (t[k] < PARTIAL_IONISATION_T) {
                                cool++;
                            }
                        }
                        if (!hasGamma1) {
                            gamma1[k] = thermo.gamma1;
                        }
                        if (!hasPhi) {
                            phi[k] = thermo.phi;
                        }
                        thermoChecks.add(thermo, pres[k]);
                    }
                    if (!hasKappa) {
                        setup.opacity().evaluate(t[k], rho[k], x[k], z[k], zone.zone, opacity);
                        kappa[k] = opacity.kappa;
                    }
                }
                if (pass == 0) {
                    continue;
                }
                if (edgeDistance != null) {
                    zone.edgeDistance = edgeDistance[k];
                }
                zone.opacity = kappa[k];
                zone.nablaAd = nablaAd[k];
                zone.cp = cp[k];
                zone.delta = delta[k];
                zone.phi = phi[k];
                zone.nablaMu = nablaMu[k];
                convection.solveValues(zone, conv);   // the diagnosis reads no derivative
                hp[k] = pres[k] / (rho[k] * gravity(r, m, k));
                nablaRad[k] = conv.nablaRad;
                nablaL[k] = LedouxGradient.value(nablaAd[k], phi[k], delta[k], nablaMu[k]);
                nabla[k] = conv.nabla;
                nablaE[k] = conv.nablaElement;
                v[k] = conv.velocity;
                fconv[k] = conv.convectiveFraction;
                dmix[k] = conv.diffusion;
                ell[k] = conv.mixingLength;
                regimes[k] = conv.regime;
                soundSpeed[k] = LocalFrequencies.soundSpeed(gamma1[k], pres[k], rho[k]);
                n2[k] = LocalFrequencies.buoyancySquared(r[k], m[k], rho[k], pres[k], delta[k], nablaAd[k], phi[k],
                        nablaMu[k], nabla[k]);
            }
            if (pass == 0) {
                edgeDistance = EdgeDistances.of(criterion, r, m, t, pres, lum, kappa, nablaAd, delta, phi, nablaMu);
            }
        }
        if (!hasThermo) {
            boolean fullyIonised = IdealGasRadiation.NAME.equals(setup.thermodynamics().toString());
            warnings.add("nabla_ad, c_P and delta were computed by " + setup.thermodynamics()
                    + (fullyIonised ? " (fully ionised ideal gas plus radiation)" : "")
                    + ": a fallback, not the model's own equation of state"
                    + (fullyIonised && cool > 0 ? "; " + cool + " zones are cooler than 1e5 K, where partial ionisation"
                    + " makes it wrong" : ""));
        }
        if (useThermo) {
            List<String> missing = new ArrayList<>();
            if (!hasGamma1) {
                missing.add("Gamma_1");
            }
            if (!hasPhi) {
                missing.add("phi");
            }
            if (hasThermo && !missing.isEmpty()) {
                warnings.add(String.join(" and ", missing) + " computed by " + setup.thermodynamics()
                        + " at the profile's rho and T");
            }
            thermoChecks.warnings(setup.thermodynamics().toString(), warnings);
        }
        if (!hasKappa) {
            warnings.add("kappa was computed by the opacity model " + setup.opacity());
        }
        if (!p.has(ProfileColumn.NABLA_MU)) {
            warnings.add("nabla_mu was computed from the X and Z columns (fully ionised mu)");
        }
        out.put(DiagnosisColumn.RADIUS, r);
        out.put(DiagnosisColumn.MASS, m);
        out.put(DiagnosisColumn.TEMPERATURE, t);
        out.put(DiagnosisColumn.DENSITY, rho);
        out.put(DiagnosisColumn.PRESSURE, pres);
        out.put(DiagnosisColumn.LUMINOSITY, lum);
        out.put(DiagnosisColumn.HYDROGEN, x);
        out.put(DiagnosisColumn.METALS, z);
        out.put(DiagnosisColumn.OPACITY, kappa);
        out.put(DiagnosisColumn.CP, cp);
        out.put(DiagnosisColumn.DELTA, delta);
        out.put(DiagnosisColumn.NABLA_AD, nablaAd);
        out.put(DiagnosisColumn.NABLA_MU, nablaMu);
        out.put(DiagnosisColumn.GAMMA1, gamma1);
        out.put(DiagnosisColumn.PHI, phi);

        // does the profile's own gradient agree with the physics? (see ModelConsistency)
        double[] nablaModel = computed(out, DiagnosisColumn.NABLA_MODEL, n);
        double[] mismatch = computed(out, DiagnosisColumn.NABLA_MISMATCH, n);
        ModelConsistency.nablaModel(t, pres, nablaModel);
        ModelConsistency.mismatch(nablaModel, nabla, nablaRad, nablaAd, regimes, mismatch);
        warnings.addAll(ModelConsistency.warnings(mismatch, regimes, k -> zoneAsGiven(p, k)));

        // the stability margins are computed where they are needed, not stored (a profile of millions of zones)
        IntToDoubleFunction marginS = k -> nablaRad[k] - nablaAd[k];
        IntToDoubleFunction marginL = k -> nablaRad[k] - nablaL[k];
        IntToDoubleFunction marginC = k -> StabilityClassifier.convectiveMargin(criterion, nablaRad[k], nablaAd[k],
                nablaL[k]);
        List<Region> regions = regions(r, m, pres, hp, ell, v, regimes, marginS, marginL, marginC, k -> nablaMu[k]);
        // columns as cheap as a division or two from stored ones are computed when read, not stored
        EnumMap<DiagnosisColumn, IntToDoubleFunction> derived = new EnumMap<>(DiagnosisColumn.class);
        derived.put(DiagnosisColumn.GRAVITY, k -> gravity(r, m, k));
        derived.put(DiagnosisColumn.LAMB_L1, k -> LocalFrequencies.lamb(1, soundSpeed[k], r[k]));
        double[] dov;
        if (appliesOvershoot()) {
            dov = computed(out, DiagnosisColumn.OVERSHOOT_DIFFUSION, n);
        } else {
            dov = ell;                         // no longer needed: the overshoot model fills it with zeros
            derived.put(DiagnosisColumn.OVERSHOOT_DIFFUSION, k -> 0.0);
        }
        regions = edges(r, hp, nablaAd, marginC, dmix, dov, regions, criterion, warnings);
        if (!(lum[n - 1] > 0.0)) {
            warnings.add("the surface luminosity is L = " + lum[n - 1] + " erg/s, not > 0: the Kelvin-Helmholtz time"
                    + " G M^2 / (R L) is undefined there and is not reported");
        }
        Timescales times = new Timescales(
                Timescale.photonDiffusion(r, kappa, rho),
                Timescale.thermalDiffusion(r, kappa, rho, t, cp),
                Timescale.kelvinHelmholtz(m[n - 1], r[n - 1], lum[n - 1]));
        // the diagnosis shares the profile's columns and takes the computed ones: no copy of millions of zones
        return ColumnSharing.adopt(p.source(), criterion, convection.alpha(), out, derived, regimes, regions, times,
                        warnings).withSeismic(seismic(r, soundSpeed, n2, regions));
    }

    /** The asymptotic integrals of the whole model and the acoustic depths of each convective region's edges. */
    private static SeismicSummary seismic(double[] r, double[] soundSpeed, double[] n2, List<Region> regions) {
        double tau = AsymptoticIntegrals.acousticRadius(r, soundSpeed);
        List<SeismicSummary.RegionDepths> depths = new ArrayList<>();
        for (Region region : regions) {
            if (region.regime() == Regime.CONVECTIVE) {
                depths.add(new SeismicSummary.RegionDepths(region,
                        AsymptoticIntegrals.acousticDepth(r, soundSpeed, region.bottomRadius()),
                        AsymptoticIntegrals.acousticDepth(r, soundSpeed, region.topRadius())));
            }
        }
        return new SeismicSummary(tau, AsymptoticIntegrals.largeSeparation(tau),
                AsymptoticIntegrals.periodSpacing(1, AsymptoticIntegrals.buoyancyIntegral(r, n2)), depths);
    }

    /**
     * Where the thermodynamics model leaves its validity or disagrees with the profile: zones with
     * degenerate electrons (the first Fermi-Dirac correction to the electron pressure,
     * n_e lambda^3 / 2^(7/2), above {@value #DEGENERACY_LIMIT}; Landau &amp; Lifshitz, Statistical Physics
     * §56), zones where pressure ionisation decides the state of more than {@value #PRESSURE_IONISATION_LIMIT}
     * of hydrogen, and the largest difference between the model's pressure at the profile's rho and T and
     * the profile's own P.
     */
    private static final class ThermoChecks {
        int degenerate;
        int pressureIonised;
        int mismatched;
        double worstMismatch;

        void add(ThermoResult thermo, double profilePressure) {
            if (thermo.degeneracy / FERMI_CORRECTION > DEGENERACY_LIMIT) {
                degenerate++;
            }
            if (thermo.pressureIonisation > PRESSURE_IONISATION_LIMIT) {
                pressureIonised++;
            }
            double mismatch = Math.abs(thermo.pressure / profilePressure - 1.0);
            if (mismatch > PRESSURE_MISMATCH_LIMIT) {
                mismatched++;
            }
            worstMismatch = Math.max(worstMismatch, mismatch);
        }

        void warnings(String model, List<String> warnings) {
            if (degenerate > 0) {
                warnings.add(degenerate + " zones have degenerate electrons (the first Fermi-Dirac correction to the"
                        + " electron pressure exceeds " + percent(DEGENERACY_LIMIT) + "), which " + model
                        + " treats as an ideal gas");
            }
            if (pressureIonised > 0) {
                warnings.add(pressureIonised + " zones are pressure-ionised (the state of more than "
                        + percent(PRESSURE_IONISATION_LIMIT) + " of hydrogen is set by " + model
                        + "'s approximate pressure ionisation, not by the Saha equation)");
            }
            if (mismatched > 0) {
                warnings.add(model + " at the profile's rho and T gives a pressure up to "
                        + String.format(java.util.Locale.ROOT, "%.3g", 100.0 * worstMismatch)
                        + " % away from the profile's P (" + mismatched + " zones beyond "
                        + percent(PRESSURE_MISMATCH_LIMIT) + "); its response functions are taken at (rho, T),"
                        + " and H_P, c_s and N^2 use the profile's P");
            }
        }

        private static String percent(double f) {
            return String.format(java.util.Locale.ROOT, "%.3g %%", 100.0 * f);
        }
    }

    /** 2^(5/2): the first Fermi-Dirac correction to P_e is n_e lambda^3 / 2 over this. */
    private static final double FERMI_CORRECTION = Math.pow(2.0, 2.5);
    /** Count zones whose first Fermi-Dirac correction to the electron pressure exceeds this. */
    public static final double DEGENERACY_LIMIT = 0.01;
    /** Count zones where pressure ionisation decides the state of more than this share of hydrogen. */
    public static final double PRESSURE_IONISATION_LIMIT = 0.01;
    /** Count zones where the thermodynamics model's P differs from the profile's by more than this. */
    public static final double PRESSURE_MISMATCH_LIMIT = 0.01;
    /**
     * The edges of the convective regions: overshoot (when this diagnosis applies it) into {@code dov}, with
     * D_mix raised to it where it is larger; each edge's margin on the convective side
     * ({@link BoundaryMargins}), with a warning where it is not ~0. Returns the regions with both recorded.
     */
    private List<Region> edges(double[] r, double[] hp, double[] nablaAd, IntToDoubleFunction marginC, double[] dmix,
                               double[] dov, List<Region> regions, Criterion criterion, List<String> warnings) {
        int n = r.length;
        List<Region> convective = regions.stream().filter(g -> g.regime() == Regime.CONVECTIVE).toList();
        int count = convective.size();
        double[] bottoms = new double[count];
        double[] tops = new double[count];
        for (int i = 0; i < count; i++) {
            bottoms[i] = convective.get(i).bottomRadius();
            tops[i] = convective.get(i).topRadius();
        }
        double[] reachBottom = new double[count];
        double[] reachTop = new double[count];
        overshoot(r, hp, dmix, bottoms, tops, dov, reachBottom, reachTop);
        for (int k = 0; k < n; k++) {
            dmix[k] = Math.max(dmix[k], dov[k]);
        }
        double radius = r[n - 1];
        List<Region> result = new ArrayList<>(regions.size());
        int i = 0;
        for (Region g : regions) {
            if (g.regime() != Regime.CONVECTIVE) {
                result.add(g);
                continue;
            }
            int first = g.firstZone();
            int last = g.lastZone();
            OptionalDouble bottom = OptionalDouble.empty();
            OptionalDouble top = OptionalDouble.empty();
            if (first > 0) {
                double at = BoundaryMargins.inside(r, marginC, nablaAd, first, first < last ? first + 1 : -1,
                        g.bottomRadius());
                bottom = OptionalDouble.of(at);
                misplaced(warnings, g, "bottom", at, radius, criterion);
            }
            if (last < n - 1) {
                double at = BoundaryMargins.inside(r, marginC, nablaAd, last, last > first ? last - 1 : -1,
                        g.topRadius());
                top = OptionalDouble.of(at);
                misplaced(warnings, g, "top", at, radius, criterion);
            }
            result.add(g.withEdges(present(reachBottom[i]), present(reachTop[i]), bottom, top));
            i++;
        }
        return result;
    }

    private static OptionalDouble present(double value) {
        return Double.isNaN(value) ? OptionalDouble.empty() : OptionalDouble.of(value);
    }

    private static void misplaced(List<String> warnings, Region g, String side, double margin, double radius,
                                  Criterion criterion) {
        if (!(Math.abs(margin) > BoundaryMargins.MISPLACED)) {
            return;
        }
        boolean grow = margin > 0.0;
        warnings.add(String.format(java.util.Locale.ROOT, "the %s edge of the convective region at r/R %.4f - %.4f"
                        + " is not self-consistent (Gabriel et al. 2014): the %s criterion's margin on its convective"
                        + " side, (nabla_rad - nabla_crit)/nabla_ad extrapolated to the edge, is %+.3g, not ~0"
                        + " (|margin| > %.2g); a host should move the edge %s until the margin vanishes there",
                side, g.bottomRadius() / radius, g.topRadius() / radius, criterion.label(), margin,
                BoundaryMargins.MISPLACED, grow == side.equals("top") ? "outwards" : "inwards"));
    }

    private static int zoneAsGiven(Profile p, int k) {
        return p.wasReversed() ? p.size() - 1 - k : k;
    }

    /** g = G m / r^2 (cm s^-2) of zone k: the {@link DiagnosisColumn#GRAVITY} column, computed when read. */
    private static double gravity(double[] r, double[] m, int k) {
        return Codata2018.GRAVITATIONAL_CONSTANT * m[k] / (r[k] * r[k]);
    }

    /** A new column of n zones, entered in {@code out} under {@code c}. */
    private static double[] computed(Map<DiagnosisColumn, double[]> out, DiagnosisColumn c, int n) {
        double[] a = new double[n];
        out.put(c, a);
        return a;
    }

    /**
     * The profile's own column (shared, never written), or a new column filled with {@code absent}
     * (to be computed, or a default).
     */
    private static double[] columnOr(Profile p, ProfileColumn c, double absent) {
        if (p.has(c)) {
            return ColumnSharing.read(p, c);
        }
        double[] a = new double[p.size()];
        java.util.Arrays.fill(a, absent);
        return a;
    }

    /**
     * The quantity whose sign change separates regime a (inside) from regime b (outside): the
     * criterion's convective margin ({@link StabilityClassifier#convectiveMargin}) at the edge of a
     * convective region, the Schwarzschild margin at the edge of a semiconvective one, nabla_mu between
     * thermohaline and radiative zones.
     */
    private static IntToDoubleFunction separator(Regime inside, Regime outside, IntToDoubleFunction marginS,
                                                 IntToDoubleFunction marginC, IntToDoubleFunction nablaMu) {
        if (inside == Regime.CONVECTIVE || outside == Regime.CONVECTIVE) {
            return marginC;
        }
        if (inside == Regime.SEMICONVECTIVE || outside == Regime.SEMICONVECTIVE) {
            return marginS;
        }
        return nablaMu;
    }

    static List<Region> regions(double[] r, double[] m, double[] pres, double[] hp, double[] ell, double[] v,
                                Regime[] regimes, double[] marginS, double[] marginL, double[] marginC,
                                double[] nablaMu) {
        return regions(r, m, pres, hp, ell, v, regimes, k -> marginS[k], k -> marginL[k], k -> marginC[k],
                k -> nablaMu[k]);
    }

    /** {@link #regions(double[], double[], double[], double[], double[], double[], Regime[], double[], double[],
     * double[], double[])} with each margin and nabla_mu given per zone. */
    private static List<Region> regions(double[] r, double[] m, double[] pres, double[] hp, double[] ell, double[] v,
                                        Regime[] regimes, IntToDoubleFunction marginS, IntToDoubleFunction marginL,
                                        IntToDoubleFunction marginC, IntToDoubleFunction nablaMu) {
        int n = r.length;
        double radius = r[n - 1];
        double mass = m[n - 1];
        List<Region> regions = new ArrayList<>();
        int k = 0;
        while (k < n) {
            Regime regime = regimes[k];
            int first = k;
            while (k + 1 < n && regimes[k + 1] == regime) {
                k++;
            }
            int last = k;
            k++;
            if (regime == Regime.RADIATIVE) {
                continue;
            }
            // bottom at the centre, top at the surface, or between the zones either side of the edge
            double[] bottom = first == 0 ? new double[] {0.0, 0.0, pres[0]}
                    : edgeBetween(first - 1, first, separator(regime, regimes[first - 1], marginS, marginC, nablaMu), r, m, pres);
            double[] top = last == n - 1 ? new double[] {radius, mass, pres[n - 1]}
                    : edgeBetween(last, last + 1, separator(regime, regimes[last + 1], marginS, marginC, nablaMu), r, m, pres);
            double rb = bottom[0];
            double rt = top[0];
            OptionalDouble turnGlobal = OptionalDouble.empty();
            OptionalDouble turnLocal = OptionalDouble.empty();
            OptionalDouble vmax = OptionalDouble.empty();
            if (regime == Regime.CONVECTIVE) {
                double peak = 0.0;
                for (int j = first; j <= last; j++) {
                    peak = Math.max(peak, v[j]);
                }
                vmax = OptionalDouble.of(peak);
                if (peak > 0.0) {
                    // the envelope integral of dr / v diverges at the centre of a core: there the
                    // core's radius over its mass-weighted mean velocity (see Timescale)
                    turnGlobal = OptionalDouble.of(first == 0 ? Timescale.turnoverCore(m, v, last, rt, top[1])
                            : Timescale.turnoverGlobal(r, v, first, last, rb, rt));
                    double local = Timescale.turnoverLocal(r, ell, v, first, last, rb, rt);
                    if (local > 0.0) {
                        turnLocal = OptionalDouble.of(local);
                    }
                }
            }
            regions.add(new Region(regime, rb, rt, bottom[1], top[1], rb / radius, rt / radius, bottom[1] / mass,
                    top[1] / mass, Math.log(bottom[2] / top[2]),
                    edge(r, marginS, first - 1, first), edge(r, marginS, last, last + 1),
                    edge(r, marginL, first - 1, first), edge(r, marginL, last, last + 1),
                    turnGlobal, turnLocal, vmax, first, last));
        }
        return regions;
    }

    /**
     * r, m and P where {@code f} changes sign between zones a and b = a + 1: r by
     * {@link BoundaryFinder#root}, m linear in r, ln P linear in r.
     */
    private static double[] edgeBetween(int a, int b, IntToDoubleFunction f, double[] r, double[] m, double[] pres) {
        double at = BoundaryFinder.root(r[a], f.applyAsDouble(a), r[b], f.applyAsDouble(b));
        double w = (at - r[a]) / (r[b] - r[a]);
        double lnP = Math.log(pres[a]) + w * (Math.log(pres[b]) - Math.log(pres[a]));
        return new double[] {at, m[a] + w * (m[b] - m[a]), Math.exp(lnP)};
    }

    /**
     * The root of a margin next to an edge: searched between zones a and b, then outwards and
     * inwards by up to {@value #EDGE_SEARCH} zones, since the two criteria's boundaries need not
     * fall in the same interval.
     */
    private static OptionalDouble edge(double[] r, IntToDoubleFunction f, int a, int b) {
        int n = r.length;
        for (int d = 0; d <= EDGE_SEARCH; d++) {
            for (int s : new int[] {-d, d}) {
                int i = a + s;
                int j = b + s;
                if (i >= 0 && j < n && j > i && BoundaryFinder.changesSign(f.applyAsDouble(i), f.applyAsDouble(j))) {
                    return OptionalDouble.of(BoundaryFinder.root(r[i], f.applyAsDouble(i), r[j], f.applyAsDouble(j)));
                }
            }
        }
        return OptionalDouble.empty();
    }

    private static final int EDGE_SEARCH = 50;

    @Override
    public String toString() {
        if (!appliesOvershoot()) {
            return NAME;
        }
        return NAME + "(" + (overshootF > 0.0 ? OVERSHOOT_F + "=" + overshootF : OVERSHOOT_STEP + "=" + overshootStep)
                + ", " + OVERSHOOT_F0 + "=" + overshootF0 + ", " + OVERSHOOT_FLOOR + "=" + overshootFloor + ")";
    }
}
