package io.github.startransport.cli;

import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Transport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;

/** {@code diagnose}: profile files (or the built-in demo star) in, zone table, summary and plots out. */
@Command(name = "diagnose", sortOptions = false, mixinStandardHelpOptions = true,
        description = {
            "Diagnoses stellar model profiles: stability regime, actual gradient, convective velocity and mixing"
                + " of every zone, the convective, semiconvective and thermohaline regions, and the photon-diffusion,"
                + " thermal and Kelvin-Helmholtz timescales.",
            "",
            "Writes into DIR: zones.csv (one row per zone), summary.json, gradients.png, velocity-mixing.png,"
                + " opacity.png, propagation.png, and prints a short summary. With several profiles each goes to"
                + " DIR/<file name without extension>/, and they are diagnosed in parallel: every file is attempted, each refused"
                + " one is reported with its line and column, a closing line counts them, and the exit code is 1"
                + " if any was refused. Nothing is left half-written: the files appear in DIR only when they are"
                + " complete, and DIR is left as it was when every profile was refused.",
            ""},
        footer = {
            "",
            "Profile files: CSV, one header row of column names, then one zone per row (centre to surface or"
                + " surface to centre), cgs units. Lines starting with # and blank lines are skipped.",
            "  required: r_cm, m_g, T_K, rho_g_cm3, P_dyn_cm2, L_erg_s, X, Z (at least 3 zones)",
            "  optional: kappa_cm2_g, cp_erg_g_K, delta, nabla_ad, nabla_mu, phi, Gamma1 (computed when absent)",
            "  our names in any case and the aliases radius, mass, temperature, density, pressure, luminosity,"
                + " hydrogen, metals, kappa, cp, ... are read as ours; other columns are ignored (with a note on"
                + " standard error). Numbers: 1.5e7, 1.5E+07 or Fortran's 1.5D+07.",
            "",
            "Exit codes: 0 success; 1 bad input: a file that cannot be read or holds bad data (the message names"
                + " file, line, column and what is wrong), or, with several profiles, any of them refused;"
                + " 2 usage error (unknown option or model name, malformed --columns, a bad option value);"
                + " 3 out of memory (the message says which -Xmx to try)."})
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

    @Mixin
    private DiagnosisOptions options;

    @Option(names = "--x-axis", paramLabel = "mass|radius|depth|pressure", defaultValue = "mass",
            converter = PlotAxis.Converter.class,
            description = "What the plots put along the star: mass (m/M on a scale stretched at both ends,"
                    + " log10(m / (M - m)), so that a core and a thin surface zone both read clearly), radius (r/R),"
                    + " depth (log10(1 - m/M), for envelopes) or pressure (log10 P). Default: ${DEFAULT-VALUE}.")
    private PlotAxis xAxis;

    /** @param cli where to print and how to find the physics */
    DiagnoseCommand(Cli cli) {
        this.cli = cli;
    }

    /** One profile to diagnose: a file (then {@code file} is set) or the built-in star. */
    private record Job(String stem, Path file) {
    }

    @Override
    public Integer call() throws IOException {
        checkUsage();
        ColumnMap map = options.columnMap();
        Map<String, Path> stems = stems();
        options.checkFiles();
        List<Job> jobs = new ArrayList<>();
        stems.forEach((stem, file) -> jobs.add(new Job(stem, file)));
        if (demo) {
            jobs.add(new Job(null, null));
        }
        List<ProfileJobs.Outcome<Job, String>> outcomes;
        List<String> notes = new ArrayList<>();
        List<String> warnings = List.of();
        try (OutputFolder folder = OutputFolder.open(out, cli.args(), notes)) {
            notes.forEach(n -> cli.err().println("note: " + n));
            Transport transport = cli.transport();
            DiagnosisOptions.Setup setup = options.setup(transport, spec);
            Path staging = folder.staging();
            ProgressBar bar = new ProgressBar(cli.err(), jobs.size(), cli.console() && jobs.size() > 1);
            outcomes = ProfileJobs.run(jobs, j -> j.file() == null ? "demo star" : j.file().toString(),
                    (job, jobNotes) -> diagnoseAndWrite(job, map, setup,
                            job.stem() == null || !multiple() ? staging : staging.resolve(job.stem()), jobNotes),
                    bar);
            if (!multiple() && !outcomes.get(0).ok()) {
                outcomes.get(0).notes().forEach(n -> cli.err().println("note: " + n));
                throw outcomes.get(0).failure();
            }
            if (outcomes.stream().anyMatch(ProfileJobs.Outcome::ok)) {
                warnings = folder.commit();
            }
        }
        int failed = 0;
        for (ProfileJobs.Outcome<Job, String> o : outcomes) {
            o.notes().forEach(n -> cli.err().println(n.startsWith("warning: ") ? n : "note: " + n));
            if (o.ok()) {
                cli.out().print(o.result());
            } else {
                failed++;
                cli.err().println("startransport: " + Main.describe(o.failure()));
            }
        }
        cli.out().flush();
        if (multiple()) {
            String closing = outcomes.size() + " profiles: " + (outcomes.size() - failed) + " diagnosed"
                    + (outcomes.size() - failed > 0 ? " into " + out + "/<file name>/" : "") + ", " + failed
                    + " refused" + (failed == outcomes.size() ? "; " + out + " is left as it was" : "");
            (failed > 0 ? cli.err() : cli.out()).println(closing);
        }
        warnings.forEach(w -> cli.err().println("warning: " + w));
        return failed > 0 ? Main.BAD_INPUT : Main.OK;
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
        if (demo && options.columns != null) {
            throw new ParameterException(spec.commandLine(), "--columns applies to profile files, not to --demo");
        }
        options.checkUsage(spec);
    }

    /** File stem of each profile, in the order given. */
    private Map<String, Path> stems() {
        Map<String, Path> stems = new java.util.LinkedHashMap<>();
        Map<String, Path> seen = new HashMap<>();
        for (Path p : profiles) {
            String stem = stem(p);
            Path earlier = seen.putIfAbsent(stem, p);
            if (earlier != null) {
                throw new BadInputException("the profiles " + earlier + " and " + p + " would both be written to "
                        + out.resolve(stem) + "; rename one of them");
            }
            stems.put(stem, p);
        }
        return stems;
    }

    /** @return the file name without its extension */
    static String stem(Path p) {
        String name = p.getFileName() == null ? p.toString() : p.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }

    /**
     * Reads, diagnoses and writes one job; the job keeps its profile and diagnosis only while it
     * runs, so several profiles never sit in memory at once.
     *
     * @return the printed summary of the job
     */
    private String diagnoseAndWrite(Job job, ColumnMap map, DiagnosisOptions.Setup setup, Path dir,
                                    List<String> notes) throws IOException {
        ProfileCsvReader.Read read = null;
        Profile profile;
        if (job.file() != null) {
            read = ProfileCsvReader.read(job.file(), map, options.delimiter);
            notes.addAll(read.notes());
            read.warnings().forEach(w -> notes.add("warning: " + w));
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
            DiagnosisCharts.writeAll(d, new DiagnosisCharts.Style(xAxis, opacitySource(profile, setup.used())), dir);
        } catch (IOException | UncheckedIOException e) {
            throw new BadInputException("cannot write the output for " + profile.source() + " into " + out
                    + ": " + e.getMessage(), e);
        }
        Path where = job.stem() == null || !multiple() ? out : out.resolve(job.stem());
        return HumanSummary.text(d, setup.used(), where.toString());
    }

    /** @return where the diagnosis's kappa came from, in words, for the opacity plot */
    static String opacitySource(Profile profile, ModelsUsed used) {
        if (profile.has(ProfileColumn.OPACITY)) {
            return "the profile's own " + ProfileColumn.OPACITY.header() + " column";
        }
        if (used.opacityTable() != null) {
            return "interpolated in the table " + Path.of(used.opacityTable()).getFileName();
        }
        return "the opacity model " + used.opacity();
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
