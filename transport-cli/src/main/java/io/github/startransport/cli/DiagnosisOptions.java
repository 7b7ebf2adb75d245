package io.github.startransport.cli;

import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.DiscoveryException;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.InvalidOptionException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.ProfileDiagnoser;
import io.github.startransport.spi.ThermodynamicsModel;
import io.github.startransport.spi.Transport;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.TypeConversionException;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.Supplier;

/**
 * The options that say how profiles are read and diagnosed, shared by {@code diagnose} and
 * {@code track} (a picocli mixin): criterion, convection model and alpha, opacity, overshoot, and
 * how to read another program's file ({@code --columns}, {@code --delimiter}).
 */
final class DiagnosisOptions {
    @Option(names = "--criterion", paramLabel = "schwarzschild|ledoux", defaultValue = "schwarzschild",
            converter = CriterionConverter.class,
            description = "Convective stability criterion. Default: ${DEFAULT-VALUE}.")
    Criterion criterion;

    @Option(names = "--convection", paramLabel = "NAME",
            description = "Convection model, by name (see the models command). Default: ${DEFAULT-VALUE}"
                    + " (the provider's recommended model).")
    String convection;

    @Option(names = "--alpha", paramLabel = "A",
            description = "Mixing-length parameter alpha = l / H_P (> 0). Default: the convection model's own"
                    + " default (${DEFAULT-VALUE} for the default model).")
    Double alpha;

    @Option(names = "--opacity", paramLabel = "NAME",
            description = "Opacity model for profiles without a kappa_cm2_g column. Default: ${DEFAULT-VALUE}"
                    + " (the provider's recommended model).")
    String opacity;

    @Option(names = "--opacity-table", paramLabel = "FILE",
            description = "Use an opacity table file (the library's X,Z,log_T,log_R,log_kappa CSV format) instead of"
                    + " --opacity.")
    Path opacityTable;

    @Option(names = "--columns", paramLabel = "MAP",
            description = "Read a profile written by another program: THEIRS=OURS[,THEIRS=OURS...] maps the file's"
                    + " header names onto our columns, e.g. --columns Temp=T_K,Dens=rho_g_cm3."
                    + " THEIRS is matched exactly; OURS is our header name or an alias (radius, mass, temperature,"
                    + " density, pressure, luminosity, hydrogen, metals, kappa, cp, ...), any case. Headers that"
                    + " already use our names or aliases need no map.")
    String columns;

    @Option(names = "--delimiter", paramLabel = "comma|semicolon|tab|whitespace", defaultValue = "comma",
            converter = Delimiter.Converter.class,
            description = "What separates the cells of the profile files. Default: ${DEFAULT-VALUE}.")
    Delimiter delimiter;

    @Option(names = "--overshoot-f", paramLabel = "F",
            description = "Apply exponential diffusive overshoot at both edges of every convective region,"
                    + " D = D_0 exp(-2|r - r_0|/(F H)) (Freytag, Ludwig & Steffen 1996; Herwig 2000); e.g. 0.016."
                    + " Default: none.")
    Double overshootF;

    @Option(names = "--overshoot-f0", paramLabel = "F0",
            description = "With --overshoot-f or --overshoot-step: take D_0 at F0 H inside each edge, where the"
                    + " overshoot profile starts. Default: the diagnosis's own (0.005).")
    Double overshootF0;

    @Option(names = "--overshoot-step", paramLabel = "A",
            description = "Apply step overshoot instead: D = D_0 up to A H beyond each edge (the temperature"
                    + " gradient stays radiative there); e.g. 0.2. Default: none.")
    Double overshootStep;

    /** Converts {@code schwarzschild} / {@code ledoux}, any case. */
    static final class CriterionConverter implements ITypeConverter<Criterion> {
        @Override
        public Criterion convert(String value) {
            try {
                return Criterion.fromLabel(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException("'" + value + "' is not a criterion; expected schwarzschild or"
                        + " ledoux");
            }
        }
    }

    /**
     * The models a run uses, created once and shared by every profile (they are immutable).
     *
     * @param models    convection, opacity and thermodynamics
     * @param diagnoser the diagnosis
     * @param used      their names, for the summaries
     */
    record Setup(DiagnosisSetup models, ProfileDiagnoser diagnoser, ModelsUsed used) {
    }

    /**
     * Refuses option combinations and values that cannot work, before anything is read.
     *
     * @param spec the command's spec (for the parse result and the error)
     * @throws ParameterException on a usage error
     */
    void checkUsage(CommandSpec spec) {
        if (matched(spec, "--alpha") && !(alpha > 0 && Double.isFinite(alpha))) {
            throw new ParameterException(spec.commandLine(), "--alpha must be a finite number > 0, not " + Text.number(alpha));
        }
        nonNegative(spec, "--overshoot-f", overshootF);
        nonNegative(spec, "--overshoot-step", overshootStep);
        if (overshootF0 != null && !(overshootF0 >= 0 && overshootF0 < 1)) {
            throw new ParameterException(spec.commandLine(), "--overshoot-f0 must be a number in [0, 1), not "
                    + Text.number(overshootF0));
        }
        if (overshootF != null && overshootF > 0 && overshootStep != null && overshootStep > 0) {
            throw new ParameterException(spec.commandLine(), "give either --overshoot-f or --overshoot-step, not both:"
                    + " exponential and step overshoot are alternatives");
        }
        if (overshootF0 != null && overshootF == null && overshootStep == null) {
            throw new ParameterException(spec.commandLine(), "--overshoot-f0 needs --overshoot-f or --overshoot-step");
        }
        if (opacityTable != null && matched(spec, "--opacity")) {
            throw new ParameterException(spec.commandLine(), "give either --opacity or --opacity-table, not both");
        }
    }

    private static void nonNegative(CommandSpec spec, String option, Double value) {
        if (value != null && !(value >= 0 && Double.isFinite(value))) {
            throw new ParameterException(spec.commandLine(), option + " must be a finite number >= 0, not "
                    + Text.number(value));
        }
    }

    /** @return the diagnosis's options: the overshoot settings given on the command line */
    private ModelOptions diagnosisOptions() {
        ModelOptions options = ModelOptions.defaults();
        if (overshootF != null) {
            options = options.with(ModelNames.DIAGNOSIS_OVERSHOOT_F, Double.toString(overshootF));
        }
        if (overshootF0 != null) {
            options = options.with(ModelNames.DIAGNOSIS_OVERSHOOT_F0, Double.toString(overshootF0));
        }
        if (overshootStep != null) {
            options = options.with(ModelNames.DIAGNOSIS_OVERSHOOT_STEP, Double.toString(overshootStep));
        }
        return options;
    }

    /**
     * @return the {@code --columns} map
     * @throws UsageException when it is malformed
     */
    ColumnMap columnMap() {
        return ColumnMap.parse(columns);
    }

    /** @throws BadInputException when {@code --opacity-table} names a file that cannot be read */
    void checkFiles() {
        if (opacityTable != null && !Files.isReadable(opacityTable)) {
            throw new BadInputException("--opacity-table " + opacityTable + ": cannot be read"
                    + (Files.exists(opacityTable) ? " (permission denied)" : " (no such file)"));
        }
    }

    private static boolean matched(CommandSpec spec, String option) {
        return spec.commandLine().getParseResult().hasMatchedOption(option);
    }

    /**
     * Creates the models. A model name that no provider offers, or an option value a model refuses,
     * is a usage error; a malformed opacity table file is bad input.
     *
     * @param transport the facade
     * @param spec      the command's spec
     * @return the setup
     * @throws UsageException on an unknown model name or a refused option value
     */
    Setup setup(Transport transport, CommandSpec spec) {
        String convectionName = convection != null ? convection : Catalog.defaultModel(transport,
                ModelFamily.CONVECTION);
        ModelOptions convectionOptions = ModelOptions.defaults()
                .with(ModelNames.CONVECTION_CRITERION, criterion.label());
        String alphaText = matched(spec, "--alpha") ? Double.toString(alpha)
                : Catalog.optionDefault(Catalog.info(transport, ModelFamily.CONVECTION, convectionName),
                ModelNames.CONVECTION_ALPHA);
        if (alphaText != null) {
            convectionOptions = convectionOptions.with(ModelNames.CONVECTION_ALPHA, alphaText);
        }
        ModelOptions finalConvectionOptions = convectionOptions;
        ConvectionModel convectionModel = asOption("--convection", convectionName,
                () -> transport.convection(convectionName, finalConvectionOptions));

        ChosenOpacity chosenOpacity = ChosenOpacity.of(transport, opacity, opacityTable);
        OpacityModel opacityModel = chosenOpacity.model();
        String opacityName = chosenOpacity.name();
        ThermodynamicsModel thermo = transport.thermodynamics(null, ModelOptions.defaults());
        ProfileDiagnoser diagnoser = asOption("--overshoot-f", "", () -> transport.diagnoser(null,
                diagnosisOptions()));
        ModelsUsed used = new ModelsUsed(convectionName == null ? "(default)" : Catalog.bare(convectionName),
                opacityName == null ? "(default)" : Catalog.bare(opacityName),
                opacityTable == null ? null : opacityTable.toString());
        return new Setup(new DiagnosisSetup(convectionModel, opacityModel, thermo), diagnoser, used);
    }

    /**
     * Creates a model named on the command line; what the providers refuse about the name or its
     * options becomes a usage error that names the option.
     */
    static <T> T asOption(String option, String name, Supplier<T> create) {
        try {
            return create.get();
        } catch (DiscoveryException e) {
            if (e.kind() == DiscoveryException.Kind.NO_PROVIDER || e.kind() == DiscoveryException.Kind.DUPLICATE_PROVIDER) {
                throw e;
            }
            throw new UsageException(option + " " + name + ": " + e.getMessage(), e);
        } catch (InvalidOptionException | InvalidInputException e) {
            throw new UsageException(option + " " + name + ": " + e.getMessage(), e);
        }
    }
}
