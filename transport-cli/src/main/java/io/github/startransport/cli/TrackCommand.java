package io.github.startransport.cli;

import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.Timescales;
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
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

/**
 * {@code track}: a sequence of profiles of one star (an evolution run) in, the history of its
 * convective, semiconvective and thermohaline regions out: {@code track.csv} (one row per profile
 * and region) and {@code track.png} (the regions in mass against age).
 */
@Command(name = "track", sortOptions = false, mixinStandardHelpOptions = true,
        description = {
            "Diagnoses a sequence of profiles of one star (an evolution run) and follows its regions with age:"
                + " which layers are convective, semiconvective or thermohaline in each profile, and, with"
                + " --overshoot-f or --overshoot-step, which are mixed by overshoot.",
            "",
            "Writes into DIR: track.csv (one row per profile and region: model number, age, regime, the region's"
                + " edges in mass and radius, and the profile's timescales) and track.png (every profile's regions"
                + " against age, mass on the vertical axis, each regime shaded in its own colour; against model"
                + " number when ages are missing).",
            "",
            "Ages come from a comment line '# age_yr = 1.5e9' in each file, or from --ages. Model numbers come"
                + " from a comment line '# model_number = 1200', or else count the profiles from 1 in the order"
                + " given. The profiles are diagnosed in parallel, with a progress bar; every file is attempted,"
                + " each refused one is reported with its line and column, and the exit code is 1 if any was.",
            ""},
        footer = {"",
            "Profile files: as for diagnose (see 'startransport diagnose --help').",
            "",
            "Exit codes: 0 success; 1 bad input (a file that cannot be read or holds bad data; any profile"
                + " refused); 2 usage error (unknown option or model name, malformed --columns or --ages, a bad"
                + " option value); 3 out of memory."})
final class TrackCommand implements Callable<Integer> {
    /** The track's table. */
    static final String CSV = "track.csv";
    /** The track's picture. */
    static final String PNG = "track.png";
    /** Comment line name of a profile's age (yr). */
    static final String AGE = "age_yr";
    /** Comment line name of a profile's model number. */
    static final String MODEL_NUMBER = "model_number";

    private final Cli cli;

    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "PROFILE", arity = "1..*", description = "The profiles of the sequence, any order.")
    private List<Path> profiles = new ArrayList<>();

    @Option(names = "--out", paramLabel = "DIR", required = true,
            description = "Output folder, made and replaced exactly as by diagnose: a link to a hidden versioned"
                    + " folder beside it, replaced in one atomic step, and only if this tool made it.")
    private Path out;

    @Option(names = "--ages", paramLabel = "YR,YR,...",
            description = "The age of each profile in years, in the order the profiles are given; replaces their"
                    + " '# age_yr =' lines.")
    private String ages;

    @Mixin
    private DiagnosisOptions options;

    /** @param cli where to print and how to find the physics */
    TrackCommand(Cli cli) {
        this.cli = cli;
    }

    /** One profile of the track, in the order given (position counts from 1). */
    private record Job(int position, Path file) {
    }

    @Override
    public Integer call() throws IOException {
        options.checkUsage(spec);
        double[] given = ages == null ? null : ages();
        ColumnMap map = options.columnMap();
        options.checkFiles();
        List<Job> jobs = new ArrayList<>();
        for (int i = 0; i < profiles.size(); i++) {
            jobs.add(new Job(i + 1, profiles.get(i)));
        }
        List<ProfileJobs.Outcome<Job, TrackPoint>> outcomes;
        List<String> notes = new ArrayList<>();
        List<String> warnings = List.of();
        Track track = null;
        try (OutputFolder folder = OutputFolder.open(out, cli.args(), notes)) {
            notes.forEach(n -> cli.err().println("note: " + n));
            Transport transport = cli.transport();
            DiagnosisOptions.Setup setup = options.setup(transport, spec);
            ProgressBar bar = new ProgressBar(cli.err(), jobs.size(), cli.console() && jobs.size() > 1);
            outcomes = ProfileJobs.run(jobs, j -> j.file().toString(),
                    (job, jobNotes) -> point(job, map, setup, given, jobNotes), bar);
            List<TrackPoint> points = new ArrayList<>();
            outcomes.stream().filter(ProfileJobs.Outcome::ok).forEach(o -> points.add(o.result()));
            if (!points.isEmpty()) {
                track = Track.of(points);
                Path dir = folder.staging();
                try {
                    track.writeCsv(dir.resolve(CSV));
                    TrackChart.write(track, dir.resolve(PNG));
                } catch (IOException | UncheckedIOException e) {
                    throw new BadInputException("cannot write the track into " + out + ": " + e.getMessage(), e);
                }
                warnings = folder.commit();
            }
        }
        int failed = 0;
        for (ProfileJobs.Outcome<Job, TrackPoint> o : outcomes) {
            o.notes().forEach(n -> cli.err().println(n.startsWith("warning: ") ? n : "note: " + n));
            if (!o.ok()) {
                failed++;
                cli.err().println("startransport: " + Main.describe(o.failure()));
            }
        }
        if (track != null) {
            track.notes().forEach(n -> cli.err().println("note: " + n));
            cli.out().print(track.summary(out.toString()));
        }
        String closing = outcomes.size() + " profiles: " + (outcomes.size() - failed) + " diagnosed, " + failed
                + " refused" + (failed == outcomes.size() ? "; " + out + " is left as it was" : "");
        (failed > 0 ? cli.err() : cli.out()).println(closing);
        warnings.forEach(w -> cli.err().println("warning: " + w));
        return failed > 0 ? Main.BAD_INPUT : Main.OK;
    }

    /** @return the {@code --ages} values, one per profile */
    private double[] ages() {
        String[] items = ages.split(",", -1);
        if (items.length != profiles.size()) {
            throw new ParameterException(spec.commandLine(), "--ages gives " + items.length + " ages for "
                    + profiles.size() + " profiles; give one age (yr) per profile, in the order of the profiles");
        }
        double[] v = new double[items.length];
        for (int i = 0; i < items.length; i++) {
            v[i] = NumberSyntax.parse(items[i].trim());
            if (!Double.isFinite(v[i]) || v[i] < 0) {
                throw new ParameterException(spec.commandLine(), "--ages: item " + (i + 1) + " '"
                        + Text.shorten(items[i].trim()) + "' is not an age: write a number of years >= 0, e.g. 1.5e9");
            }
        }
        return v;
    }

    /** Reads and diagnoses one profile and keeps what the track needs of it. */
    private TrackPoint point(Job job, ColumnMap map, DiagnosisOptions.Setup setup, double[] given, List<String> notes) {
        ProfileCsvReader.Read read = ProfileCsvReader.read(job.file(), map, options.delimiter);
        notes.addAll(read.notes());
        read.warnings().forEach(w -> notes.add("warning: " + w));
        Profile profile = read.profile();
        ProfileDiagnosis d;
        try {
            d = setup.diagnoser().diagnose(profile, setup.models());
        } catch (InvalidInputException e) {
            throw read.locate(e, false);
        }
        Double age = number(read, AGE, false);
        if (given != null) {
            double a = given[job.position() - 1];
            if (age != null && age != a) {
                notes.add(job.file() + ": its '# " + AGE + " = " + Text.number(age) + "' line is replaced by --ages"
                        + " (" + Text.number(a) + ")");
            }
            age = a;
        }
        Double model = number(read, MODEL_NUMBER, true);
        List<TrackPoint.Layer> layers = new ArrayList<>();
        for (Region r : d.regions()) {
            List<TrackPoint.Layer> over = overshoot(d, r);
            over.stream().filter(l -> l.rTop() <= r.bottomRadius()).forEach(layers::add);
            layers.add(new TrackPoint.Layer(r.regime().label(), r.bottomMass(), r.topMass(), r.bottomRadius(),
                    r.topRadius()));
            over.stream().filter(l -> l.rBottom() >= r.topRadius()).forEach(layers::add);
        }
        return new TrackPoint(job.file().toString(), job.position(), model == null ? null : model.longValue(), age,
                d.mass(), d.radius(), d.luminosity(), d.timescales(), layers);
    }

    /**
     * The layers that overshoot mixes beyond a convective region's edges, when the diagnosis applies
     * overshoot ({@code --overshoot-f} or {@code --overshoot-step}): each as its own
     * {@link TrackPoint.Layer} of regime {@code overshoot}, from the edge to where overshoot mixing ends,
     * its masses interpolated in r between zones.
     */
    static List<TrackPoint.Layer> overshoot(ProfileDiagnosis d, Region r) {
        List<TrackPoint.Layer> layers = new ArrayList<>();
        if (r.overshootBottom().isPresent() && r.overshootBottom().getAsDouble() < r.bottomRadius()) {
            double reach = r.overshootBottom().getAsDouble();
            layers.add(new TrackPoint.Layer("overshoot", massAt(d, reach), r.bottomMass(), reach, r.bottomRadius()));
        }
        if (r.overshootTop().isPresent() && r.overshootTop().getAsDouble() > r.topRadius()) {
            double reach = r.overshootTop().getAsDouble();
            layers.add(new TrackPoint.Layer("overshoot", r.topMass(), massAt(d, reach), r.topRadius(), reach));
        }
        return layers;
    }

    /**
     * @return the value of a {@code # name = value} comment line of the file, or {@code null} when it has
     *         none
     * @throws io.github.startransport.spi.DataFormatException when the value is not a number (or not a whole
     *         number), or two lines give different values
     */
    private static Double number(ProfileCsvReader.Read read, String name, boolean whole) {
        List<ProfileCsvReader.Property> lines = read.properties(name);
        if (lines.isEmpty()) {
            return null;
        }
        Double value = null;
        ProfileCsvReader.Property first = null;
        for (ProfileCsvReader.Property p : lines) {
            double v = NumberSyntax.parse(p.value());
            if (!Double.isFinite(v) || v < 0 || (whole && v != Math.rint(v))) {
                throw new io.github.startransport.spi.DataFormatException(read.file().toString(), p.line(), p.column(),
                        "'# " + name + " = " + Text.shorten(p.value()) + "': expected " + (whole ? "a whole number >= 0"
                        : "a number of years >= 0, e.g. 1.5e9"));
            }
            if (value != null && v != value) {
                throw new io.github.startransport.spi.DataFormatException(read.file().toString(), p.line(), p.column(),
                        "'# " + name + " = " + Text.shorten(p.value()) + "' contradicts line " + first.line() + " ("
                        + Text.shorten(first.value()) + "); keep one of them");
            }
            if (value == null) {
                value = v;
                first = p;
            }
        }
        return value;
    }

    /** The whole track: its points in order, and what was decided about its axis. */
    record Track(List<TrackPoint> points, boolean byAge, List<String> notes) {
        /**
         * Orders the points by age when every point has a distinct age, else by model number.
         *
         * @param unordered the points, in any order
         * @return the track
         */
        static Track of(List<TrackPoint> unordered) {
            List<String> notes = new ArrayList<>();
            List<TrackPoint> points = new ArrayList<>(unordered);
            boolean allNumbered = points.stream().allMatch(p -> p.modelNumber() != null);
            if (!allNumbered && points.stream().anyMatch(p -> p.modelNumber() != null)) {
                notes.add("some profiles have no '# " + MODEL_NUMBER + " =' line: every profile is numbered by its"
                        + " place on the command line instead");
            }
            List<TrackPoint> numbered = new ArrayList<>();
            for (TrackPoint p : points) {
                numbered.add(p.numbered(allNumbered ? p.modelNumber() : p.position()));
            }
            points = numbered;
            boolean byAge = points.stream().allMatch(p -> p.age() != null);
            List<String> without = points.stream().filter(p -> p.age() == null).map(TrackPoint::source).toList();
            if (!byAge && without.size() < points.size()) {
                notes.add(without.size() + " profiles have no age (no '# " + AGE + " =' line and no --ages), e.g. "
                        + without.get(0) + ": the track is drawn against model number");
            }
            if (byAge) {
                points.sort(Comparator.comparingDouble(TrackPoint::age));
                for (int i = 1; i < points.size(); i++) {
                    if (points.get(i).age().doubleValue() == points.get(i - 1).age()) {
                        notes.add(points.get(i - 1).source() + " and " + points.get(i).source() + " have the same age, "
                                + Text.number(points.get(i).age()) + " yr: the track is drawn against model number");
                        byAge = false;
                        break;
                    }
                }
            }
            if (!byAge) {
                points.sort(Comparator.comparingLong(TrackPoint::modelNumber));
                for (int i = 1; i < points.size(); i++) {
                    if (points.get(i).modelNumber().longValue() == points.get(i - 1).modelNumber()) {
                        notes.add(points.get(i - 1).source() + " and " + points.get(i).source() + " have the same"
                                + " model number " + points.get(i).modelNumber() + ": they are drawn side by side");
                        break;
                    }
                }
            }
            return new Track(List.copyOf(points), byAge, List.copyOf(notes));
        }

        /** @return each point's place along the track's axis: its age (yr) or model number */
        double[] x() {
            double[] x = new double[points.size()];
            for (int i = 0; i < x.length; i++) {
                TrackPoint p = points.get(i);
                x[i] = byAge ? p.age() : p.modelNumber();
            }
            return x;
        }

        /**
         * @param file the table to create
         * @throws IOException when it cannot be written
         */
        void writeCsv(Path file) throws IOException {
            TrackTable.write(this, file);
        }

        /**
         * @param where the output folder
         * @return the lines printed on standard output
         */
        String summary(String where) {
            int layers = points.stream().mapToInt(p -> Math.max(1, p.layers().size())).sum();
            double[] x = x();
            String span = byAge ? String.format(Locale.ROOT, "ages %s to %s yr", Text.compact(x[0]),
                    Text.compact(x[x.length - 1])) : "model numbers " + (long) x[0] + " to " + (long) x[x.length - 1];
            return "track of " + points.size() + " profiles (" + span + "): " + layers + " rows written to "
                    + Path.of(where).resolve(CSV) + ", the picture to " + Path.of(where).resolve(PNG) + "\n";
        }
    }

    /**
     * @param d a diagnosis
     * @param r a radius (cm)
     * @return the mass inside that radius (g), interpolated linearly in r between zones; 0 at the centre
     */
    static double massAt(ProfileDiagnosis d, double r) {
        int n = d.size();
        double r0 = d.value(DiagnosisColumn.RADIUS, 0);
        if (r <= r0) {
            return d.value(DiagnosisColumn.MASS, 0) * Math.max(0.0, r / r0);
        }
        if (r >= d.value(DiagnosisColumn.RADIUS, n - 1)) {
            return d.mass();
        }
        int lo = 0;
        int hi = n - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (d.value(DiagnosisColumn.RADIUS, mid) <= r) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double ra = d.value(DiagnosisColumn.RADIUS, lo);
        double rb = d.value(DiagnosisColumn.RADIUS, hi);
        double ma = d.value(DiagnosisColumn.MASS, lo);
        double mb = d.value(DiagnosisColumn.MASS, hi);
        return ma + (mb - ma) * (r - ra) / (rb - ra);
    }

    /** @return the timescales of a point, in years, undefined ones as NaN */
    static double[] years(Timescales t) {
        return new double[] {t.photonDiffusion() / SummaryJson.JULIAN_YEAR_S,
            t.thermalDiffusion() / SummaryJson.JULIAN_YEAR_S, t.kelvinHelmholtz() / SummaryJson.JULIAN_YEAR_S};
    }
}
