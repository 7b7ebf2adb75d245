package io.github.startransport.cli;

import io.github.startransport.spi.AlphaCalibration;
import io.github.startransport.spi.CalibrationStep;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectiveBase;
import io.github.startransport.spi.EnvelopeIntegrator;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.EnvelopeSolution;
import io.github.startransport.spi.EnvelopeStar;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.SuperadiabaticLayer;
import io.github.startransport.spi.ThermodynamicsModel;
import io.github.startransport.spi.Transport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

/**
 * {@code envelope}: a star's envelope integrated inward from a grey atmosphere, with the base of
 * its surface convection zone; optionally the alpha that puts that base at a given depth.
 */
@Command(name = "envelope", sortOptions = false, mixinStandardHelpOptions = true,
        description = {
            "Integrates a star's envelope inward from a grey Eddington atmosphere (T^4 = 3/4 T_eff^4 (tau + 2/3))"
                + " with m = M and L constant, and reports the base of the surface convection zone, T_eff and the"
                + " superadiabatic layer. With --calibrate-base it finds the mixing-length alpha that puts the base"
                + " at the given r/R (Brent's method), printing each envelope it tries.",
            "",
            "Writes into DIR: envelope.csv (a profile in the diagnose format, plus nabla_rad, nabla and v_conv),"
                + " summary.json and envelope.png (nabla, nabla_ad, nabla_rad against log P). Nothing is left"
                + " half-written: the files appear in DIR only when everything succeeded.",
            ""},
        footer = {"", "Exit codes: 0 success; 1 bad input (an opacity table that cannot be read or holds bad data,"
                + " an output folder that cannot be written); 2 usage error (unknown option or model name, a bad"
                + " option value: the message says which and why); 3 out of memory."})
final class EnvelopeCommand implements Callable<Integer> {
    /** The envelope's data file. */
    static final String CSV = "envelope.csv";
    /** The envelope's summary. */
    static final String JSON = "summary.json";
    /** The envelope's plot. */
    static final String PNG = "envelope.png";

    private final Cli cli;

    @Spec
    private CommandSpec spec;

    @Option(names = "--mass-msun", paramLabel = "M", required = true,
            description = "Mass in solar masses (M_sun = (G M)_sun^N / G: IAU 2015 B3 and CODATA 2018), > 0.")
    private double mass;

    @Option(names = "--radius-rsun", paramLabel = "R", required = true,
            description = "Photospheric radius in nominal solar radii (6.957e10 cm, IAU 2015 B3), > 0.")
    private double radius;

    @Option(names = "--luminosity-lsun", paramLabel = "L", required = true,
            description = "Luminosity in nominal solar luminosities (3.828e33 erg/s, IAU 2015 B3), > 0.")
    private double luminosity;

    @Option(names = "--hydrogen", paramLabel = "X", required = true,
            description = "Hydrogen mass fraction X, in [0, 1].")
    private double hydrogen;

    @Option(names = "--metals", paramLabel = "Z", required = true,
            description = "Metal mass fraction Z, in [0, 1], X + Z <= 1.")
    private double metals;

    @Option(names = "--alpha", paramLabel = "A",
            description = "Mixing-length parameter alpha = l / H_P (> 0). Default: the convection model's own default.")
    private Double alpha;

    @Option(names = "--calibrate-base", paramLabel = "R_OVER_RSTAR",
            description = "Find the alpha that puts the base of the surface convection zone at this r/R (in (0, 1));"
                    + " replaces --alpha. The Sun's is 0.713 (Christensen-Dalsgaard, Gough & Thompson 1991).")
    private Double calibrateBase;

    @Option(names = "--alpha-low", paramLabel = "A",
            description = "With --calibrate-base: the lower end of the alpha interval searched (> 0)."
                    + " Default: the envelope model's own, 0.5.")
    private Double alphaLow;

    @Option(names = "--alpha-high", paramLabel = "A",
            description = "With --calibrate-base: the upper end of the alpha interval searched (> --alpha-low)."
                    + " Default: the envelope model's own, 4.")
    private Double alphaHigh;

    @Option(names = "--convection", paramLabel = "NAME",
            description = "Convection model, by name (see the models command). Default: the provider's recommended"
                    + " model.")
    private String convection;

    @Option(names = "--opacity", paramLabel = "NAME",
            description = "Opacity model, by name. Default: the provider's recommended model.")
    private String opacity;

    @Option(names = "--opacity-table", paramLabel = "FILE",
            description = "Use an opacity table file (the library's X,Z,log_T,log_R,log_kappa CSV format) instead of"
                    + " --opacity.")
    private Path opacityTable;

    @Option(names = "--thermodynamics", paramLabel = "NAME",
            description = "Equation of state, by name. Default: the provider's recommended model.")
    private String thermodynamics;

    @Option(names = "--out", paramLabel = "DIR", required = true,
            description = "Output folder, made and replaced exactly as by diagnose: a link to a hidden versioned"
                    + " folder beside it, replaced in one atomic step, and only if this tool made it.")
    private Path out;

    /** @param cli where to print and how to find the physics */
    EnvelopeCommand(Cli cli) {
        this.cli = cli;
    }

    /** What the summary says about the models. */
    record Used(String convection, String opacity, String opacityTable, String thermodynamics) {
    }

    @Override
    public Integer call() throws IOException {
        if (!matched("--alpha")) {
            alpha = null; // the help shows the provider's default; the model applies it itself
        }
        if (!matched("--opacity")) {
            opacity = null;
        }
        if ((alphaLow != null || alphaHigh != null) && calibrateBase == null) {
            throw new ParameterException(spec.commandLine(), "--alpha-low and --alpha-high bound the alpha a calibration"
                    + " searches: give them with --calibrate-base");
        }
        if (alpha != null && calibrateBase != null) {
            throw new ParameterException(spec.commandLine(), "give either --alpha or --calibrate-base, not both");
        }
        if (alpha != null && !(alpha > 0 && Double.isFinite(alpha))) {
            throw new ParameterException(spec.commandLine(), "--alpha must be a finite number > 0, not "
                    + Text.number(alpha));
        }
        if (opacityTable != null && opacity != null) {
            throw new ParameterException(spec.commandLine(), "give either --opacity or --opacity-table, not both");
        }
        if (opacityTable != null && !Files.isReadable(opacityTable)) {
            throw new BadInputException("--opacity-table " + opacityTable + ": cannot be read"
                    + (Files.exists(opacityTable) ? " (permission denied)" : " (no such file)"));
        }
        // The star and the target are the input data of this command: a star that cannot exist or a target
        // it cannot reach is bad input (exit 1), like a bad profile for diagnose; usage errors (exit 2) are
        // options that do not fit together or cannot be read as numbers.
        if (calibrateBase != null && !(calibrateBase > 0.0 && calibrateBase < 1.0)) {
            throw new BadInputException("--calibrate-base " + Text.number(calibrateBase) + ": the"
                    + " base of the convection zone is a fraction r/R of the radius, strictly between 0 and 1");
        }
        positive("--mass-msun", mass);
        positive("--radius-rsun", radius);
        positive("--luminosity-lsun", luminosity);
        if (!(hydrogen >= 0 && hydrogen <= 1) || !(metals >= 0 && metals <= 1) || !(hydrogen + metals <= 1)) {
            throw new BadInputException("--hydrogen " + Text.number(hydrogen) + " and --metals "
                    + Text.number(metals) + ": mass fractions, each in [0, 1] and together at most 1");
        }
        EnvelopeStar star;
        try {
            star = EnvelopeStar.inSolarUnits(mass, radius, luminosity, hydrogen, metals);
        } catch (InvalidInputException e) {
            throw new BadInputException("the star given by --mass-msun, --radius-rsun,"
                    + " --luminosity-lsun, --hydrogen and --metals is refused: " + e.getMessage());
        }
        Transport transport = cli.transport();
        String convectionName = convection != null ? convection
                : Catalog.defaultModel(transport, ModelFamily.CONVECTION);
        ModelOptions convectionOptions = ModelOptions.defaults();
        if (alpha != null) {
            convectionOptions = convectionOptions.with(ModelNames.CONVECTION_ALPHA, Double.toString(alpha));
        }
        ModelOptions finalConvectionOptions = convectionOptions;
        ConvectionModel convectionModel = DiagnosisOptions.asOption("--convection", convectionName,
                () -> transport.convection(convectionName, finalConvectionOptions));
        ChosenOpacity chosenOpacity = ChosenOpacity.of(transport, opacity, opacityTable);
        OpacityModel opacityModel = chosenOpacity.model();
        String opacityName = chosenOpacity.name();
        String thermoName = thermodynamics != null ? thermodynamics
                : Catalog.defaultModel(transport, ModelFamily.THERMODYNAMICS);
        ThermodynamicsModel thermo = DiagnosisOptions.asOption("--thermodynamics", thermoName,
                () -> transport.thermodynamics(thermoName, ModelOptions.defaults()));
        ModelOptions envelopeOptions = ModelOptions.defaults();
        if (alphaLow != null) {
            envelopeOptions = envelopeOptions.with(ModelNames.ENVELOPE_ALPHA_LOW, Double.toString(alphaLow));
        }
        if (alphaHigh != null) {
            envelopeOptions = envelopeOptions.with(ModelNames.ENVELOPE_ALPHA_HIGH, Double.toString(alphaHigh));
        }
        ModelOptions finalEnvelopeOptions = envelopeOptions;
        EnvelopeIntegrator integrator = DiagnosisOptions.asOption("--alpha-low/--alpha-high", "",
                () -> transport.envelope(null, finalEnvelopeOptions));
        EnvelopeSetup setup = new EnvelopeSetup(convectionModel, opacityModel, thermo);
        Used used = new Used(Catalog.bare(convectionName), Catalog.bare(opacityName),
                opacityTable == null ? null : opacityTable.toString(), Catalog.bare(thermoName));

        EnvelopeSolution envelope;
        AlphaCalibration calibration = null;
        List<String> notes = new ArrayList<>();
        List<String> warnings;
        try (OutputFolder folder = OutputFolder.open(out, cli.args(), notes)) {
            notes.forEach(n -> cli.err().println("note: " + n));
            try {
                if (calibrateBase != null) {
                    cli.out().printf(Locale.ROOT, "calibrating alpha to r_b/R = %.6f%n", calibrateBase);
                    calibration = integrator.calibrate(star, setup, calibrateBase, this::printStep);
                    envelope = calibration.envelope();
                } else {
                    envelope = integrator.integrate(star, setup);
                }
            } catch (InvalidInputException e) {
                if (e.zone() != InvalidInputException.NO_ZONE) {
                    throw e;
                }
                // not about a zone: about the star or a target given on the command line (bad input, exit 1)
                throw new BadInputException(e.getMessage(), e);
            }
            Path dir = folder.staging();
            try {
                EnvelopeFiles.writeCsv(envelope, dir.resolve(CSV));
                EnvelopeFiles.writeJson(envelope, calibration, used, dir.resolve(JSON));
                EnvelopeChart.write(envelope, dir.resolve(PNG));
            } catch (IOException | UncheckedIOException e) {
                throw new BadInputException("cannot write the envelope into " + out + ": " + e.getMessage(), e);
            }
            warnings = folder.commit();
        }
        printSummary(envelope, calibration);
        warnings.forEach(w -> cli.err().println("warning: " + w));
        return 0;
    }

    private static void positive(String option, double value) {
        if (!(value > 0 && Double.isFinite(value))) {
            throw new BadInputException(option + " must be a finite number > 0, not "
                    + Text.number(value));
        }
    }

    private boolean matched(String option) {
        return spec.commandLine().getParseResult().hasMatchedOption(option);
    }

    private void printStep(CalibrationStep step) {
        cli.out().printf(Locale.ROOT, "  iteration %2d: alpha = %.8f -> r_b/R = %s%n", step.iteration(), step.alpha(),
                Double.isNaN(step.baseRadiusFraction()) ? "below the stated depth"
                        : String.format(Locale.ROOT, "%.8f", step.baseRadiusFraction()));
        cli.out().flush();
    }

    private void printSummary(EnvelopeSolution e, AlphaCalibration c) {
        var o = cli.out();
        EnvelopeStar s = e.star();
        o.printf(Locale.ROOT, "envelope of M = %.4f M_sun, R = %.4f R_sun, L = %.4f L_sun, X = %s, Z = %s%n",
                s.mass() / EnvelopeStar.SOLAR_MASS, s.radius() / EnvelopeStar.NOMINAL_SOLAR_RADIUS,
                s.luminosity() / EnvelopeStar.NOMINAL_SOLAR_LUMINOSITY, s.hydrogen(), s.metals());
        o.printf(Locale.ROOT, "  T_eff = %.1f K   photosphere P = %.4e dyn/cm^2, rho = %.4e g/cm^3%n",
                e.effectiveTemperature(), e.photosphericPressure(), e.photosphericDensity());
        if (c != null) {
            o.printf(Locale.ROOT, "  calibrated alpha = %.6f after %d envelopes; d alpha / d(r_b/R) = %.4f%n", c.alpha(),
                    c.steps().size(), c.sensitivity());
        } else {
            o.printf(Locale.ROOT, "  alpha = %s%n", e.alpha());
        }
        if (e.surfaceConvectionBase().isPresent()) {
            ConvectiveBase b = e.surfaceConvectionBase().get();
            o.printf(Locale.ROOT, "  base of the surface convection zone: r/R = %.6f, T = %.4e K, rho = %.4e g/cm^3,"
                    + " P = %.4e dyn/cm^2, m/M = %.6f%n", b.radiusFraction(), b.temperature(), b.density(),
                    b.pressure(), b.massFraction());
        } else if (e.convectiveZones().isEmpty()) {
            o.printf(Locale.ROOT, "  no surface convection zone down to r/R = %.4f%n",
                    e.innerRadius() / s.radius());
        } else {
            o.printf(Locale.ROOT, "  the surface convection zone reaches below r/R = %.4f, where the integration"
                    + " stopped%n", e.innerRadius() / s.radius());
        }
        if (e.superadiabaticLayer().isPresent()) {
            SuperadiabaticLayer l = e.superadiabaticLayer().get();
            o.printf(Locale.ROOT, "  superadiabatic layer (nabla - nabla_ad > %s): down to %.1f km below the"
                    + " photosphere; largest nabla - nabla_ad = %.4f at %.1f km (T = %.0f K)%n", l.threshold(),
                    l.bottomDepth() / 1e5, l.maxExcess(), l.depthOfMax() / 1e5, l.temperatureOfMax());
        }
        for (String w : e.warnings()) {
            o.println("  warning: " + w);
        }
        o.println("  written to " + out);
    }
}
