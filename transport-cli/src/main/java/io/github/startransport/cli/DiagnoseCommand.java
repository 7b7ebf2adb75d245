package io.github.startransport.cli;

import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileDiagnoser;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.ThermodynamicsModel;
import io.github.startransport.spi.Transport;
import picocli.CommandLine.Command;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.TypeConversionException;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/** {@code diagnose}: profile files (or the built-in demo star) in, zone table, summary and plots out. */
@Command(name = "diagnose", sortOptions = false, mixinStandardHelpOptions = true,
        description = {
            "Diagnoses stellar model profiles: stability regime, actual gradient, convective velocity and mixing"
                + " of every zone, the convective, semiconvective and thermohaline regions, and the photon-diffusion,"
                + " thermal and Kelvin-Helmholtz timescales.",
            "",
            "Writes into DIR: zones.csv (one row per zone), summary.json, gradients.png, velocity-mixing.png,"
                + " opacity.png, propagation.png, and prints a short summary. With several profiles each goes to DIR/<file name"
                + " without extension>/, and they are diagnosed in parallel. Nothing is left half-written: the"
                + " files appear in DIR only when everything succeeded.",
            ""},
        footer = {
            "",
            "Profile files: CSV, one header row of column names, then one zone per row (centre to surface or"
                + " surface to centre), cgs units. Lines starting with # and blank lines are skipped.",
            "  required: r_cm, m_g, T_K, rho_g_cm3, P_dyn_cm2, L_erg_s, X, Z",
            "  optional: kappa_cm2_g, cp_erg_g_K, delta, nabla_ad, nabla_mu, phi, Gamma1 (computed when absent)",
            "  other columns are ignored (with a note on standard error).",
            "",
            "Exit codes: 0 success; 1 bad input (the message names file, line, column and what is wrong);"
                + " 2 usage error; 3 out of memory (the message says which -Xmx to try)."})
final class DiagnoseCommand implements Callable<Integer> {
    private final Cli cli;

    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "PROFILE.csv", arity = "0..*",
            description = "Profile files to diagnose (or --demo).")
    private List<Path> profiles = new ArrayList<>();

    @Option(names = "--demo", description = "Diagnose the built-in demonstration star instead of a file.")
    private boolean demo;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "diagnosis",
            description = "Output folder. Default: ${DEFAULT-VALUE}. It becomes a link to a hidden versioned"
                    + " folder beside it (.DIR.run-<run id>) holding the files and " + OutputFolder.MARKER + "; a later"
                    + " run replaces it in one atomic step. An existing DIR is replaced only if this tool made it and"
                    + " it holds nothing else; a link someone else made is followed.")
    private Path out;

    @Option(names = "--alpha", paramLabel = "A",
            description = "Mixing-length parameter alpha = l / H_P (> 0). Default: the convection model's own"
                    + " default (${DEFAULT-VALUE} for the default model).")
    private Double alpha;

    @Option(names = "--criterion", paramLabel = "schwarzschild|ledoux", defaultValue = "schwarzschild",
            converter = CriterionConverter.class,
            description = "Convective stability criterion. Default: ${DEFAULT-VALUE}.")
    private Criterion criterion;

    @Option(names = "--convection", paramLabel = "NAME",
            description = "Convection model, by name (see the models command). Default: ${DEFAULT-VALUE}"
                    + " (the provider's recommended model).")
    private String convection;

    @Option(names = "--opacity", paramLabel = "NAME",
            description = "Opacity model for profiles without a kappa_cm2_g column. Default: ${DEFAULT-VALUE}"
                    + " (the provider's recommended model).")
    private String opacity;

    @Option(names = "--opacity-table", paramLabel = "FILE",
            description = "Use an opacity table file (the library's X,Z,log_T,log_R,log_kappa CSV format) instead of"
                    + " --opacity.")
    private Path opacityTable;

    @Option(names = "--columns", paramLabel = "MAP",
            description = "Read a profile written by another program: THEIRS=OURS[,THEIRS=OURS...] maps the file's"
                    + " header names onto our columns, e.g. --columns temperature=T_K,density=rho_g_cm3."
                    + " THEIRS is matched exactly; OURS is our header name or an alias (radius, mass, temperature,"
                    + " density, pressure, luminosity, hydrogen, metals, kappa, cp, ...), any case.")
    private String columns;

    @Option(names = "--overshoot-f", paramLabel = "F",
            description = "Apply exponential diffusive overshoot at both edges of every convective region,"
                    + " D = D_0 exp(-2|r - r_0|/(F H)) (Freytag, Ludwig & Steffen 1996; Herwig 2000); e.g. 0.016."
                    + " Default: none.")
    private Double overshootF;

    @Option(names = "--overshoot-f0", paramLabel = "F0",
            description = "With --overshoot-f or --overshoot-step: take D_0 at F0 H inside each edge, where the"
                    + " overshoot profile starts. Default: the diagnosis's own (0.005).")
    private Double overshootF0;

    @Option(names = "--overshoot-step", paramLabel = "A",
            description = "Apply step overshoot instead: D = D_0 up to A H beyond each edge (the temperature"
                    + " gradient stays radiative there); e.g. 0.2. Default: none.")
    private Double overshootStep;

    /** @param cli where to print and how to find the physics */
    DiagnoseCommand(Cli cli) {
        this.cli = cli;
    }

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

    /** One profile to diagnose: a file (then {@code file} is set) or the built-in star. */
    private record Job(String stem, Path file) {
    }

    @Override
    public Integer call() throws IOException {
        checkUsage();
        ColumnMap map = ColumnMap.parse(columns);
        Map<String, Path> stems = stems();
        if (opacityTable != null && !Files.isReadable(opacityTable)) {
            throw new BadInputException("--opacity-table " + opacityTable + ": cannot be read"
                    + (Files.exists(opacityTable) ? " (permission denied)" : " (no such file)"));
        }
        List<Job> jobs = new ArrayList<>();
        stems.forEach((stem, file) -> jobs.add(new Job(stem, file)));
        if (demo) {
            jobs.add(new Job(null, null));
        }
        List<String> summaries;
        List<String> notes = new ArrayList<>();
        List<String> warnings;
        try (OutputFolder folder = OutputFolder.open(out, cli.args(), notes)) {
            notes.forEach(n -> cli.err().println("note: " + n));
            Transport transport = cli.transport();
            Setup setup = setup(transport);
            summaries = diagnoseAndWrite(jobs, map, setup, folder.staging());
            warnings = folder.commit();
        }
        summaries.forEach(cli.out()::print);
        warnings.forEach(w -> cli.err().println("warning: " + w));
        return 0;
    }

    private boolean multiple() {
        return profiles.size() > 1;
    }

    private void checkUsage() {
        if (demo == !profiles.isEmpty()) {
            throw new ParameterException(spec.commandLine(), demo
                    ? "give either profile files or --demo, not both"
                    : "nothing to diagnose: give one or more profile files, or --demo");
        }
        if (demo && columns != null) {
            throw new ParameterException(spec.commandLine(), "--columns applies to profile files, not to --demo");
        }
        if (matched("--alpha") && !(alpha > 0 && Double.isFinite(alpha))) {
            throw new ParameterException(spec.commandLine(), "--alpha must be a finite number > 0, not " + alpha);
        }
        nonNegative("--overshoot-f", overshootF);
        nonNegative("--overshoot-step", overshootStep);
        if (overshootF0 != null && !(overshootF0 >= 0 && overshootF0 < 1)) {
            throw new ParameterException(spec.commandLine(), "--overshoot-f0 must be a number in [0, 1), not "
                    + overshootF0);
        }
        if (overshootF != null && overshootF > 0 && overshootStep != null && overshootStep > 0) {
            throw new ParameterException(spec.commandLine(), "give either --overshoot-f or --overshoot-step, not both:"
                    + " exponential and step overshoot are alternatives");
        }
        if (overshootF0 != null && overshootF == null && overshootStep == null) {
            throw new ParameterException(spec.commandLine(), "--overshoot-f0 needs --overshoot-f or --overshoot-step");
        }
        if (opacityTable != null && matched("--opacity")) {
            throw new ParameterException(spec.commandLine(), "give either --opacity or --opacity-table, not both");
        }
    }

    private void nonNegative(String option, Double value) {
        if (value != null && !(value >= 0 && Double.isFinite(value))) {
            throw new ParameterException(spec.commandLine(), option + " must be a finite number >= 0, not " + value);
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

    private boolean matched(String option) {
        return spec.commandLine().getParseResult().hasMatchedOption(option);
    }

    /** File stem of each profile, in the order given. */
    private Map<String, Path> stems() {
        Map<String, Path> stems = new java.util.LinkedHashMap<>();
        Map<String, Path> seen = new HashMap<>();
        for (Path p : profiles) {
            String name = p.getFileName() == null ? p.toString() : p.getFileName().toString();
            int dot = name.lastIndexOf('.');
            String stem = dot > 0 ? name.substring(0, dot) : name;
            Path earlier = seen.putIfAbsent(stem, p);
            if (earlier != null) {
                throw new BadInputException("the profiles " + earlier + " and " + p + " would both be written to "
                        + out.resolve(stem) + "; rename one of them");
            }
            stems.put(stem, p);
        }
        return stems;
    }

    private record Setup(DiagnosisSetup models, ProfileDiagnoser diagnoser, ModelsUsed used) {
    }

    private Setup setup(Transport transport) {
        String convectionName = convection != null ? convection : Catalog.defaultModel(transport,
                ModelFamily.CONVECTION);
        ModelOptions convectionOptions = ModelOptions.defaults()
                .with(ModelNames.CONVECTION_CRITERION, criterion.label());
        String alphaText = matched("--alpha") ? Double.toString(alpha)
                : Catalog.optionDefault(Catalog.info(transport, ModelFamily.CONVECTION, convectionName),
                ModelNames.CONVECTION_ALPHA);
        if (alphaText != null) {
            convectionOptions = convectionOptions.with(ModelNames.CONVECTION_ALPHA, alphaText);
        }
        ConvectionModel convectionModel = transport.convection(convectionName, convectionOptions);

        OpacityModel opacityModel;
        String opacityName;
        if (opacityTable != null) {
            opacityName = ModelNames.OPACITY_TABLE_MODEL;
            opacityModel = transport.opacity(opacityName, ModelOptions.defaults()
                    .with(ModelNames.OPACITY_TABLE_FILE, opacityTable.toAbsolutePath().toString()));
        } else {
            opacityName = opacity != null ? opacity : Catalog.defaultModel(transport, ModelFamily.OPACITY);
            opacityModel = transport.opacity(opacityName, ModelOptions.defaults());
        }
        ThermodynamicsModel thermo = transport.thermodynamics(null, ModelOptions.defaults());
        ProfileDiagnoser diagnoser = transport.diagnoser(null, diagnosisOptions());
        ModelsUsed used = new ModelsUsed(convectionName == null ? "(default)" : Catalog.bare(convectionName),
                opacityName == null ? "(default)" : Catalog.bare(opacityName),
                opacityTable == null ? null : opacityTable.toString());
        return new Setup(new DiagnosisSetup(convectionModel, opacityModel, thermo), diagnoser, used);
    }

    /**
     * Reads, diagnoses and writes each job, several at once when there are several; each job
     * keeps its profile and diagnosis only while it runs.
     *
     * @return the printed summary of each job, in order
     */
    private List<String> diagnoseAndWrite(List<Job> jobs, ColumnMap map, Setup setup, Path staging)
            throws IOException {
        ProgressBar bar = new ProgressBar(cli.err(), jobs.size(), cli.console() && jobs.size() > 1);
        bar.start();
        List<String> results = new ArrayList<>();
        if (jobs.size() == 1) {
            results.add(diagnoseAndWrite(jobs.get(0), map, setup, staging, bar));
            return results;
        }
        int threads = Math.min(jobs.size(), Runtime.getRuntime().availableProcessors());
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "startransport-diagnose");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<String>> futures = new ArrayList<>();
            for (Job job : jobs) {
                Path dir = job.stem() == null ? staging : staging.resolve(job.stem());
                futures.add(pool.submit(() -> diagnoseAndWrite(job, map, setup, dir, bar)));
            }
            for (Future<String> f : futures) {
                results.add(f.get());
            }
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException re) {
                throw re;
            }
            if (cause instanceof IOException io) {
                throw io;
            }
            if (cause instanceof Error error) {
                throw error;
            }
            throw new IllegalStateException(cause);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } finally {
            pool.shutdownNow();
            awaitQuietly(pool);
            bar.finish();
        }
        return results;
    }

    /** Waits for cancelled tasks to stop writing, so the staging folder can be deleted whole. */
    private static void awaitQuietly(ExecutorService pool) {
        try {
            pool.awaitTermination(2, java.util.concurrent.TimeUnit.MINUTES);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private String diagnoseAndWrite(Job job, ColumnMap map, Setup setup, Path dir, ProgressBar bar)
            throws IOException {
        ProfileCsvReader.Read read = null;
        Profile profile;
        if (job.file() != null) {
            read = ProfileCsvReader.read(job.file(), map);
            read.notes().forEach(n -> cli.err().println("note: " + n));
            profile = read.profile();
        } else {
            profile = cli.transport().star(null, ModelOptions.defaults()).profile();
        }
        ProfileDiagnosis d;
        try {
            d = setup.diagnoser().diagnose(profile, setup.models());
        } catch (InvalidInputException e) {
            if (read == null) {
                throw e;
            }
            throw read.locate(e, false);
        }
        try {
            Files.createDirectories(dir);
            ZoneTable.write(d, dir.resolve("zones.csv"));
            SummaryJson.write(d, setup.used(), dir.resolve("summary.json"));
            DiagnosisCharts.writeAll(d, dir);
        } catch (IOException | UncheckedIOException e) {
            throw new BadInputException("cannot write the output for " + profile.source() + " into " + out
                    + ": " + e.getMessage(), e);
        }
        bar.step(profile.source());
        Path where = job.stem() == null || !multiple() ? out : out.resolve(job.stem());
        return HumanSummary.text(d, setup.used(), where.toString());
    }

    /** @return the model this command uses when no name is given, or {@code null} */
    static String defaultName(Transport transport, ModelFamily<?> family) {
        return transport == null ? null : Catalog.defaultModel(transport, family);
    }

    /** @return the default convection model's alpha default, or {@code null} */
    static String defaultAlpha(Transport transport) {
        if (transport == null) {
            return null;
        }
        ModelInfo info = Catalog.info(transport, ModelFamily.CONVECTION, Catalog.defaultModel(transport,
                ModelFamily.CONVECTION));
        return Catalog.optionDefault(info, ModelNames.CONVECTION_ALPHA);
    }
}
