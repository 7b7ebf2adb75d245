package io.github.startransport.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The few lines {@code diagnose} prints on standard output, read back as a person would and
 * compared, number by number, with summary.json and zones.csv of the same run and with quantities
 * recomputed here from the published definitions and constants; never with the text's own code.
 */
class TerminalSummaryTest {
    /** Nominal solar radius (cm), IAU 2015 Resolution B3. */
    private static final double R_SUN = 6.957e10;
    /** Nominal solar luminosity (erg/s), IAU 2015 Resolution B3. */
    private static final double L_SUN = 3.828e33;
    /** Nominal (GM)_sun (cm^3 s^-2), IAU 2015 Resolution B3. */
    private static final double GM_SUN = 1.3271244e26;
    /** Newtonian constant of gravitation (cm^3 g^-1 s^-2), CODATA 2018. */
    private static final double G = 6.67430e-8;
    /** Speed of light (cm/s), exact (SI definition). */
    private static final double C = 2.99792458e10;
    /** Radiation constant a = 4 sigma / c (erg cm^-3 K^-4), sigma = 5.670374419e-5 (CODATA 2018). */
    private static final double A_RAD = 4.0 * 5.670374419e-5 / C;
    /** The Julian year (s), 365.25 days of 86400 s (IAU). */
    private static final double YEAR = 365.25 * 86400.0;
    private static final String NUMBER = "([-+0-9.eE]+)";

    private static List<CSVRecord> zones(Path dir) throws IOException {
        try (Reader in = Files.newBufferedReader(dir.resolve("zones.csv"));
             CSVParser csv = CSVParser.parse(in, CSVFormat.DEFAULT.builder().setHeader().get())) {
            return csv.getRecords();
        }
    }

    private static double[] column(List<CSVRecord> rows, String header) {
        double[] v = new double[rows.size()];
        for (int k = 0; k < v.length; k++) {
            v[k] = Double.parseDouble(rows.get(k).get(header));
        }
        return v;
    }

    /** The value as the summary prints it: rounded to {@code digits} significant digits. */
    private static void assertPrinted(double expected, String printed, int digits, String what) {
        double shown = Double.parseDouble(printed);
        double unit = Math.pow(10.0, Math.floor(Math.log10(Math.abs(expected))) - digits + 1);
        assertEquals(expected, shown, 0.5 * unit * (1.0 + 1e-9), what + ": printed " + printed);
    }

    /** The value printed with a fixed number of decimals. */
    private static void assertDecimals(double expected, String printed, int decimals, String what) {
        assertEquals(expected, Double.parseDouble(printed), 0.5 * Math.pow(10.0, -decimals) * (1.0 + 1e-9),
                what + ": printed " + printed);
    }

    private static Matcher find(String regex, String text) {
        Matcher m = Pattern.compile(regex, Pattern.MULTILINE).matcher(text);
        assertTrue(m.find(), "no line matching " + regex + " in\n" + text);
        return m;
    }

    /**
     * Trapezoids over the zones from the centre, where r = 0 and the integrand (a multiple of r)
     * vanishes: the integral of f dr over the star.
     */
    private static double fromCentre(double[] r, double[] f) {
        double sum = 0.5 * r[0] * f[0];
        for (int k = 1; k < r.length; k++) {
            sum += 0.5 * (r[k] - r[k - 1]) * (f[k] + f[k - 1]);
        }
        return sum;
    }

    @Test
    void everyNumberOfTheTerminalSummaryIsThatOfTheFilesAndOfTheDefinitions(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("out");
        Runs r = Runs.run("diagnose", "--demo", "--overshoot-f", "0.016", "--out", out.toString());
        assertEquals(0, r.code(), r.toString());
        String text = r.out();
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        List<CSVRecord> rows = zones(out);

        // the star
        Matcher head = find("^(.+): (\\d+) zones$", text);
        assertEquals(s.get("source").asText(), head.group(1));
        assertEquals(rows.size(), Integer.parseInt(head.group(2)));
        assertEquals(s.get("zones").asInt(), rows.size());
        double mass = s.get("mass_g").asDouble();
        double radius = s.get("radius_cm").asDouble();
        double luminosity = s.get("luminosity_erg_s").asDouble();
        Matcher star = find("M = " + NUMBER + " g \\(" + NUMBER + " M_sun\\)\\s+R = " + NUMBER + " cm \\(" + NUMBER
                + " R_sun\\)\\s+L = " + NUMBER + " erg/s \\(" + NUMBER + " L_sun\\)", text);
        assertPrinted(mass, star.group(1), 4, "M");
        // M_sun = (GM)_sun / G: IAU 2015 B3 gives no nominal mass, only the product
        assertPrinted(mass / (GM_SUN / G), star.group(2), 4, "M / M_sun");
        assertPrinted(radius, star.group(3), 4, "R");
        assertPrinted(radius / R_SUN, star.group(4), 4, "R / R_sun");
        assertPrinted(luminosity, star.group(5), 4, "L");
        assertPrinted(luminosity / L_SUN, star.group(6), 4, "L / L_sun");
        double[] rz = column(rows, "r_cm");
        double[] mz = column(rows, "m_g");
        assertEquals(rz[rz.length - 1], radius);
        assertEquals(mz[mz.length - 1], mass);

        // the models
        Matcher models = find("^  criterion (\\S+), alpha = " + NUMBER + ", convection (\\S+), opacity (\\S+)$", text);
        assertEquals(s.get("criterion").asText(), models.group(1));
        assertEquals(s.get("alpha").asDouble(), Double.parseDouble(models.group(2)));
        assertEquals(s.get("convection_model").asText(), models.group(3));
        assertEquals(s.get("opacity_model").asText(), models.group(4));

        // the regions, one line each, in the order of summary.json
        Matcher region = Pattern.compile("^    (\\S+)\\s+r/R " + NUMBER + " - " + NUMBER + "\\s+m/M " + NUMBER + " - "
                + NUMBER + "(.*)$", Pattern.MULTILINE).matcher(text);
        JsonNode regions = s.get("regions");
        int i = 0;
        while (region.find()) {
            JsonNode g = regions.get(i++);
            String where = "region " + i + " " + g;
            assertEquals(g.get("regime").asText(), region.group(1), where);
            assertDecimals(g.get("r_bottom_cm").asDouble() / radius, region.group(2), 4, where);
            assertDecimals(g.get("r_top_cm").asDouble() / radius, region.group(3), 4, where);
            assertDecimals(g.get("m_bottom_g").asDouble() / mass, region.group(4), 6, where);
            assertDecimals(g.get("m_top_g").asDouble() / mass, region.group(5), 6, where);
            String rest = region.group(6);
            if (g.get("regime").asText().equals("convective")) {
                Matcher t = find("turnover " + NUMBER + " d \\(global\\), " + NUMBER + " d \\(local\\), max v_conv "
                        + NUMBER + " cm/s", rest);
                assertPrinted(g.get("turnover_time_global_days").asDouble(), t.group(1), 3, where);
                assertPrinted(g.get("turnover_time_local_days").asDouble(), t.group(2), 3, where);
                assertPrinted(g.get("max_v_conv_cm_s").asDouble(), t.group(3), 3, where);
                // the largest v_conv of the region's zones in zones.csv
                double vmax = 0.0;
                double[] v = column(rows, "v_conv_cm_s");
                for (int k = 0; k < rz.length; k++) {
                    if (rz[k] >= g.get("r_bottom_cm").asDouble() && rz[k] <= g.get("r_top_cm").asDouble()) {
                        vmax = Math.max(vmax, v[k]);
                    }
                }
                assertPrinted(vmax, t.group(3), 3, where + " against zones.csv");
                JsonNode top = g.get("overshoot_top_cm");
                if (!top.isNull()) {
                    Matcher o = find("overshoot to r/R (\\S+) below, (\\S+) above", rest);
                    assertDecimals(top.asDouble() / radius, o.group(2), 4, where + " overshoot top");
                    JsonNode bottom = g.get("overshoot_bottom_cm");
                    if (bottom.isNull()) {
                        assertEquals("-", o.group(1), where);
                    } else {
                        assertDecimals(bottom.asDouble() / radius, o.group(1), 4, where + " overshoot bottom");
                    }
                }
            } else {
                assertTrue(rest.isBlank(), where + ": " + rest);
            }
        }
        assertEquals(regions.size(), i, "regions printed");
        assertTrue(i >= 2, "the demo star has convective core and envelope zones");

        // the timescales, against summary.json and against the definitions recomputed from zones.csv
        Matcher times = find("^  timescales: photon diffusion " + NUMBER + " yr, thermal diffusion " + NUMBER
                + " yr, Kelvin-Helmholtz " + NUMBER + " yr$", text);
        assertPrinted(s.get("photon_diffusion_time_yr").asDouble(), times.group(1), 3, "photon diffusion");
        assertPrinted(s.get("thermal_diffusion_time_yr").asDouble(), times.group(2), 3, "thermal diffusion");
        assertPrinted(s.get("kelvin_helmholtz_time_yr").asDouble(), times.group(3), 3, "Kelvin-Helmholtz");
        // Kelvin-Helmholtz time t_KH = G M^2 / (R L), the gravitational energy's order of magnitude over the
        // luminosity, as in the Paris Observatory's astronomy dictionary (dictionary.obspm.fr, "Kelvin-Helmholtz
        // time"; ~3e7 yr for the Sun) and Kippenhahn, Weigert & Weiss (2012) ch. 3 (from memory). Textbooks
        // differ by a factor: G M^2 / (2 R L) with E_g ~ G M^2 / (2R), 3 G M^2 / (5 R L) for a uniform sphere;
        // the tool uses G M^2 / (R L), which the README states.
        double kh = G * mass * mass / (radius * luminosity) / YEAR;
        assertEquals(kh, s.get("kelvin_helmholtz_time_yr").asDouble(), 1e-12 * kh, "t_KH = G M^2 / (R L)");
        double[] kappa = column(rows, "kappa_cm2_g");
        double[] rho = column(rows, "rho_g_cm3");
        double[] t = column(rows, "T_K");
        double[] cp = column(rows, "cp_erg_g_K");
        double[] photon = new double[rz.length];
        double[] thermal = new double[rz.length];
        for (int k = 0; k < rz.length; k++) {
            // photon diffusion: a 3-D random walk with D = l c / 3, l = 1 / (kappa rho), reaches R after
            // R^2 / (6 D) on average; locally dt = r dr / (3 D) = kappa rho r dr / c (common practice, no source;
            // Hansen, Kawaler & Trimble 2004 §1.3, from memory)
            photon[k] = kappa[k] * rho[k] * rz[k] / C;
            // thermal diffusion: the same walk with the thermal diffusivity chi = 4 a c T^3 / (3 kappa rho^2 c_P)
            // (Kippenhahn, Weigert & Weiss 2012 §5.1, from memory) in place of D: dt = r dr / (3 chi)
            double chi = 4.0 * A_RAD * C * t[k] * t[k] * t[k] / (3.0 * kappa[k] * rho[k] * rho[k] * cp[k]);
            thermal[k] = rz[k] / (3.0 * chi);
        }
        double tPhoton = fromCentre(rz, photon) / YEAR;
        double tThermal = fromCentre(rz, thermal) / YEAR;
        assertEquals(tPhoton, s.get("photon_diffusion_time_yr").asDouble(), 1e-9 * tPhoton, "photon diffusion time");
        assertEquals(tThermal, s.get("thermal_diffusion_time_yr").asDouble(), 1e-9 * tThermal, "thermal diffusion time");

        // the seismic line
        Matcher seismic = find("^  seismic: acoustic radius " + NUMBER + " s, large separation " + NUMBER
                + " uHz, l = 1 period spacing " + NUMBER + " s$", text);
        assertPrinted(s.get("acoustic_radius_s").asDouble(), seismic.group(1), 4, "acoustic radius");
        assertPrinted(s.get("large_separation_uHz").asDouble(), seismic.group(2), 4, "large separation");
        assertPrinted(s.get("period_spacing_l1_s").asDouble(), seismic.group(3), 4, "period spacing");
        // the large separation is 1 / (2 x acoustic radius) (Tassoul 1980 asymptotic relation, from memory)
        assertEquals(1e6 / (2.0 * s.get("acoustic_radius_s").asDouble()), s.get("large_separation_uHz").asDouble(),
                1e-9 * s.get("large_separation_uHz").asDouble());

        // warnings, every one and in order, and where the files went
        List<String> printed = new ArrayList<>();
        Matcher w = Pattern.compile("^  warning: (.*)$", Pattern.MULTILINE).matcher(text);
        while (w.find()) {
            printed.add(w.group(1));
        }
        List<String> listed = new ArrayList<>();
        s.get("warnings").forEach(n -> listed.add(n.asText()));
        assertEquals(listed, printed);
        assertTrue(text.endsWith("  written to " + out + "\n") || text.contains("  written to " + out + "\n"), text);
    }

    /**
     * A profile whose surface luminosity is not positive: no zone convects (nabla_rad &lt; 0 everywhere),
     * and G M^2 / (R L) is no time at all, so the summary says "none" and "n/a" as summary.json says
     * null, and never prints a negative or infinite time.
     */
    @Test
    void aStarWithNoPositiveLuminosityPrintsNoRegionAndNoKelvinHelmholtzTime(@TempDir Path dir) throws Exception {
        List<String> lines = new ArrayList<>();
        lines.add(ProfileFiles.HEADER);
        for (String row : ProfileFiles.ROWS) {
            String[] c = row.split(",");
            c[5] = "-" + c[5];
            lines.add(String.join(",", c));
        }
        Path file = ProfileFiles.write(dir, "dark.csv", lines.toArray(String[]::new));
        Path out = dir.resolve("out");
        Runs r = Runs.run("diagnose", file.toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.toString());
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertTrue(s.get("kelvin_helmholtz_time_yr").isNull(), s.toString());
        assertEquals(0, s.get("regions").size(), s.toString());
        assertTrue(r.out().contains("  regions: none; every zone is radiative\n"), r.out());
        String times = find("^  timescales: .*$", r.out()).group();
        assertTrue(times.endsWith("Kelvin-Helmholtz n/a"), times);
        assertTrue(!times.toLowerCase(Locale.ROOT).contains("infinity") && !times.contains("NaN")
                && !times.matches(".* -[0-9].*"), times);
    }
}
