package io.github.startransport.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.SeismicSummary;
import io.github.startransport.spi.Timescales;

import java.io.IOException;
import java.nio.file.Path;
import java.util.OptionalDouble;

/**
 * Writes {@code summary.json}: the whole-star numbers, the models used, the timescales, the
 * asymptotic seismic integrals and the non-radiative regions. Non-finite numbers are written as {@code null} (JSON has no NaN).
 */
final class SummaryJson {
    /** The day (s). */
    static final double DAY_S = 86400.0;
    /** The Julian year, 365.25 days (s): the IAU's year for astronomical time spans. */
    static final double JULIAN_YEAR_S = 365.25 * DAY_S;

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private SummaryJson() {
    }

    /**
     * @param diagnosis the diagnosis
     * @param models    the models it was made with
     * @return the summary as a JSON tree
     */
    static ObjectNode tree(ProfileDiagnosis diagnosis, ModelsUsed models) {
        ObjectNode root = JSON.createObjectNode();
        root.put("source", diagnosis.source());
        root.put("zones", diagnosis.size());
        number(root, "mass_g", diagnosis.mass());
        number(root, "radius_cm", diagnosis.radius());
        number(root, "luminosity_erg_s", diagnosis.luminosity());
        number(root, "alpha", diagnosis.alpha());
        root.put("criterion", diagnosis.criterion().label());
        root.put("convection_model", models.convection());
        root.put("opacity_model", models.opacity());
        if (models.opacityTable() != null) {
            root.put("opacity_table", models.opacityTable());
        }
        Timescales t = diagnosis.timescales();
        number(root, "photon_diffusion_time_yr", t.photonDiffusion() / JULIAN_YEAR_S);
        number(root, "thermal_diffusion_time_yr", t.thermalDiffusion() / JULIAN_YEAR_S);
        number(root, "kelvin_helmholtz_time_yr", t.kelvinHelmholtz() / JULIAN_YEAR_S);
        number(root, "max_nabla_mismatch", diagnosis.maxNablaMismatch());
        SeismicSummary seismic = diagnosis.seismic().orElse(null);
        if (seismic != null) {
            number(root, "acoustic_radius_s", seismic.acousticRadius());
            number(root, "large_separation_uHz", seismic.largeSeparation() * 1e6);
            number(root, "period_spacing_l1_s", seismic.periodSpacingL1());
        }
        ArrayNode regions = root.putArray("regions");
        for (Region r : diagnosis.regions()) {
            ObjectNode o = regions.addObject();
            o.put("regime", r.regime().label());
            number(o, "r_bottom_cm", r.bottomRadius());
            number(o, "r_top_cm", r.topRadius());
            number(o, "m_bottom_g", r.bottomMass());
            number(o, "m_top_g", r.topMass());
            number(o, "max_nabla_mismatch", diagnosis.maxNablaMismatch(r.firstZone(), r.lastZone()));
            if (r.regime() == Regime.CONVECTIVE) {
                optional(o, "turnover_time_global_days", r.turnoverGlobal(), DAY_S);
                optional(o, "turnover_time_local_days", r.turnoverLocal(), DAY_S);
                optional(o, "max_v_conv_cm_s", r.maxVelocity(), 1.0);
                optional(o, "overshoot_bottom_cm", r.overshootBottom(), 1.0);
                optional(o, "overshoot_top_cm", r.overshootTop(), 1.0);
                optional(o, "margin_inside_bottom", r.marginInsideBottom(), 1.0);
                optional(o, "margin_inside_top", r.marginInsideTop(), 1.0);
                SeismicSummary.RegionDepths depths = seismic == null ? null : seismic.depthsOf(r);
                if (depths != null) {
                    number(o, "acoustic_depth_bottom_s", depths.acousticDepthBottom());
                    number(o, "acoustic_depth_top_s", depths.acousticDepthTop());
                }
            }
        }
        ArrayNode warnings = root.putArray("warnings");
        diagnosis.warnings().forEach(warnings::add);
        return root;
    }

    /**
     * @param diagnosis the diagnosis
     * @param models    the models it was made with
     * @param file      the file to create
     * @throws IOException when the file cannot be written
     */
    static void write(ProfileDiagnosis diagnosis, ModelsUsed models, Path file) throws IOException {
        JSON.writeValue(file.toFile(), tree(diagnosis, models));
    }

    private static void number(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    private static void optional(ObjectNode o, String key, OptionalDouble v, double unit) {
        if (v.isPresent()) {
            number(o, key, v.getAsDouble() / unit);
        } else {
            o.putNull(key);
        }
    }
}
