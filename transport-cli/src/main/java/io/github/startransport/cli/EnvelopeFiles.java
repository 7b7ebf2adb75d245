package io.github.startransport.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.github.startransport.spi.AlphaCalibration;
import io.github.startransport.spi.CalibrationStep;
import io.github.startransport.spi.ConvectiveBase;
import io.github.startransport.spi.ConvectiveZone;
import io.github.startransport.spi.EnvelopeSolution;
import io.github.startransport.spi.EnvelopeStar;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.SuperadiabaticLayer;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes an envelope's {@code envelope.csv} (a profile that {@code diagnose} reads, centre side
 * first, with the extra columns nabla_rad, nabla and v_conv_cm_s, which the profile reader ignores)
 * and its {@code summary.json}. Numbers in the CSV are written with {@link Double#toString(double)};
 * non-finite numbers in the JSON as {@code null}.
 */
final class EnvelopeFiles {
    /** Extra columns after the profile's own. */
    static final List<String> EXTRA = List.of("nabla_rad", "nabla", "v_conv_cm_s");

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get();
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private EnvelopeFiles() {
    }

    /**
     * @param e    the envelope (with its profile)
     * @param file the file to create
     * @throws IOException when it cannot be written
     */
    static void writeCsv(EnvelopeSolution e, Path file) throws IOException {
        Profile p = e.profile().orElseThrow();
        List<ProfileColumn> columns = new ArrayList<>();
        for (ProfileColumn c : ProfileColumn.values()) {
            if (p.has(c)) {
                columns.add(c);
            }
        }
        double[][] extra = {e.nablaRad(), e.nabla(), e.velocity()};
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
             CSVPrinter csv = new CSVPrinter(w, FORMAT)) {
            csv.printComment("envelope of " + p.source() + ", alpha = " + e.alpha()
                    + "; centre side first; m = M and L constant in the structure equations");
            List<String> header = new ArrayList<>();
            columns.forEach(c -> header.add(c.header()));
            header.addAll(EXTRA);
            csv.printRecord(header);
            List<String> row = new ArrayList<>(header.size());
            for (int k = 0; k < p.size(); k++) {
                row.clear();
                for (ProfileColumn c : columns) {
                    row.add(Double.toString(p.value(c, k)));
                }
                for (double[] x : extra) {
                    row.add(Double.toString(x[k]));
                }
                csv.printRecord(row);
            }
        }
    }

    /**
     * @param e           the envelope
     * @param calibration the calibration that produced it, or {@code null}
     * @param used        the models' names
     * @return the summary tree
     */
    static ObjectNode tree(EnvelopeSolution e, AlphaCalibration calibration, EnvelopeCommand.Used used) {
        EnvelopeStar s = e.star();
        ObjectNode root = MAPPER.createObjectNode();
        number(root, "mass_g", s.mass());
        number(root, "radius_cm", s.radius());
        number(root, "luminosity_erg_s", s.luminosity());
        number(root, "X", s.hydrogen());
        number(root, "Z", s.metals());
        number(root, "alpha", e.alpha());
        root.put("convection_model", used.convection());
        root.put("opacity_model", used.opacity());
        if (used.opacityTable() != null) {
            root.put("opacity_table", used.opacityTable());
        }
        root.put("thermodynamics_model", used.thermodynamics());
        number(root, "T_eff_K", e.effectiveTemperature());
        number(root, "surface_gravity_cm_s2", e.surfaceGravity());
        number(root, "photosphere_P_dyn_cm2", e.photosphericPressure());
        number(root, "photosphere_rho_g_cm3", e.photosphericDensity());
        ConvectiveBase b = e.surfaceConvectionBase().orElse(null);
        number(root, "cz_base_r_over_R", b == null ? Double.NaN : b.radiusFraction());
        number(root, "cz_base_r_cm", b == null ? Double.NaN : b.radius());
        number(root, "cz_base_T_K", b == null ? Double.NaN : b.temperature());
        number(root, "cz_base_rho_g_cm3", b == null ? Double.NaN : b.density());
        number(root, "cz_base_P_dyn_cm2", b == null ? Double.NaN : b.pressure());
        number(root, "cz_base_m_over_M", b == null ? Double.NaN : b.massFraction());
        SuperadiabaticLayer l = e.superadiabaticLayer().orElse(null);
        number(root, "superadiabatic_threshold", l == null ? Double.NaN : l.threshold());
        number(root, "superadiabatic_layer_depth_cm", l == null ? Double.NaN : l.bottomDepth());
        number(root, "superadiabatic_layer_depth_over_R", l == null ? Double.NaN : l.bottomDepth() / s.radius());
        number(root, "max_nabla_minus_nabla_ad", l == null ? Double.NaN : l.maxExcess());
        number(root, "max_nabla_minus_nabla_ad_depth_cm", l == null ? Double.NaN : l.depthOfMax());
        number(root, "inner_r_over_R", e.innerRadius() / s.radius());
        ArrayNode zones = root.putArray("convective_zones");
        for (ConvectiveZone z : e.convectiveZones()) {
            ObjectNode o = zones.addObject();
            number(o, "r_top_over_R", z.topRadius() / s.radius());
            number(o, "r_bottom_over_R", z.bottomRadius() / s.radius());
            number(o, "P_top_dyn_cm2", z.topPressure());
            number(o, "P_bottom_dyn_cm2", z.bottomPressure());
            o.put("bottom_reached", z.bottomReached());
            number(o, "max_nabla_minus_nabla_ad", z.maxSuperadiabaticity());
        }
        if (calibration != null) {
            ObjectNode c = root.putObject("calibration");
            number(c, "target_r_over_R", calibration.target());
            number(c, "d_alpha_d_r_over_R", calibration.sensitivity());
            ArrayNode steps = c.putArray("iterations");
            for (CalibrationStep st : calibration.steps()) {
                ObjectNode o = steps.addObject();
                o.put("iteration", st.iteration());
                number(o, "alpha", st.alpha());
                number(o, "cz_base_r_over_R", st.baseRadiusFraction());
            }
        }
        ArrayNode warnings = root.putArray("warnings");
        e.warnings().forEach(warnings::add);
        return root;
    }

    /**
     * @param e           the envelope
     * @param calibration the calibration that produced it, or {@code null}
     * @param used        the models' names
     * @param file        the file to create
     * @throws IOException when it cannot be written
     */
    static void writeJson(EnvelopeSolution e, AlphaCalibration calibration, EnvelopeCommand.Used used, Path file)
            throws IOException {
        MAPPER.writeValue(file.toFile(), tree(e, calibration, used));
    }

    private static void number(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }
}
