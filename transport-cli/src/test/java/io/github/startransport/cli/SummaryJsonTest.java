package io.github.startransport.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.github.startransport.spi.DiagnosisColumn;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SummaryJsonTest {
    /** Seconds in a Julian year of 365.25 days of 86400 s (IAU Style Manual, the astronomical year unit). */
    private static final double YEAR = 365.25 * 86400.0;
    private static final double DAY = 86400.0;

    private static JsonNode written(Path dir) throws Exception {
        Path file = dir.resolve("summary.json");
        SummaryJson.write(HandMadeDiagnosis.build(), new ModelsUsed("conv-x", "opac-y", null), file);
        return new ObjectMapper().readTree(file.toFile());
    }

    @Test
    void hasEveryKeyOfTheIssueWithTimesInYearsAndDays(@TempDir Path dir) throws Exception {
        JsonNode j = written(dir);
        for (String key : List.of("mass_g", "radius_cm", "luminosity_erg_s", "alpha", "criterion", "convection_model",
                "opacity_model", "photon_diffusion_time_yr", "thermal_diffusion_time_yr", "kelvin_helmholtz_time_yr",
                "max_nabla_mismatch", "regions")) {
            assertTrue(j.has(key), "no " + key + " in " + j);
        }
        assertEquals(HandMadeDiagnosis.MASS, j.get("mass_g").asDouble());
        assertEquals(HandMadeDiagnosis.RADIUS, j.get("radius_cm").asDouble());
        assertEquals(1.7, j.get("alpha").asDouble());
        assertEquals("ledoux", j.get("criterion").asText());
        assertEquals("conv-x", j.get("convection_model").asText());
        assertEquals("opac-y", j.get("opacity_model").asText());
        assertEquals(HandMadeDiagnosis.PHOTON_S / YEAR, j.get("photon_diffusion_time_yr").asDouble(), 1e-12 * 2e5);
        assertEquals(HandMadeDiagnosis.THERMAL_S / YEAR, j.get("thermal_diffusion_time_yr").asDouble(), 1e-12 * 3e6);
        assertEquals(HandMadeDiagnosis.KH_S / YEAR, j.get("kelvin_helmholtz_time_yr").asDouble(), 1e-12 * 4e7);
        // the largest nabla_mismatch of any zone, and of each region's zones
        double max = 0;
        for (double v : HandMadeDiagnosis.build().column(DiagnosisColumn.NABLA_MISMATCH)) {
            max = Math.max(max, v);
        }
        assertEquals(max, j.get("max_nabla_mismatch").asDouble());
        for (JsonNode region : j.get("regions")) {
            assertEquals(HandMadeDiagnosis.build().value(DiagnosisColumn.NABLA_MISMATCH, 0),
                    region.get("max_nabla_mismatch").asDouble());
        }
    }

    @Test
    void regionsCarryBoundariesAndTurnoverOnlyWhenConvective(@TempDir Path dir) throws Exception {
        JsonNode regions = written(dir).get("regions");
        assertEquals(3, regions.size());
        JsonNode core = regions.get(0);
        assertEquals("convective", core.get("regime").asText());
        assertEquals(HandMadeDiagnosis.CORE_TOP * HandMadeDiagnosis.RADIUS, core.get("r_top_cm").asDouble());
        assertEquals(0.0, core.get("m_bottom_g").asDouble());
        assertEquals(HandMadeDiagnosis.CORE_TURNOVER_GLOBAL_S / DAY, core.get("turnover_time_global_days").asDouble(),
                1e-12);
        assertEquals(HandMadeDiagnosis.CORE_TURNOVER_LOCAL_S / DAY, core.get("turnover_time_local_days").asDouble(),
                1e-12);
        assertEquals(HandMadeDiagnosis.CORE_MAX_V, core.get("max_v_conv_cm_s").asDouble());
        JsonNode semi = regions.get(1);
        assertEquals("semiconvective", semi.get("regime").asText());
        for (String key : List.of("r_bottom_cm", "r_top_cm", "m_bottom_g", "m_top_g")) {
            assertTrue(semi.has(key), key);
        }
        for (String key : List.of("turnover_time_global_days", "turnover_time_local_days", "max_v_conv_cm_s")) {
            assertFalse(semi.has(key), key);
        }
        assertEquals(HandMadeDiagnosis.ENVELOPE_MAX_V, regions.get(2).get("max_v_conv_cm_s").asDouble());
    }

    @Test
    void convectiveRegionsCarryOvershootReachAndEdgeMarginsOrNull(@TempDir Path dir) throws Exception {
        JsonNode regions = written(dir).get("regions");
        JsonNode core = regions.get(0);
        assertTrue(core.get("overshoot_bottom_cm").isNull(), "no edge at the centre: " + core);
        assertEquals(HandMadeDiagnosis.CORE_OVERSHOOT_TOP * HandMadeDiagnosis.RADIUS,
                core.get("overshoot_top_cm").asDouble());
        assertTrue(core.get("margin_inside_bottom").isNull(), core.toString());
        assertEquals(HandMadeDiagnosis.CORE_MARGIN_TOP, core.get("margin_inside_top").asDouble());
        JsonNode envelope = regions.get(2);
        assertEquals(HandMadeDiagnosis.ENVELOPE_OVERSHOOT_BOTTOM * HandMadeDiagnosis.RADIUS,
                envelope.get("overshoot_bottom_cm").asDouble());
        assertTrue(envelope.get("overshoot_top_cm").isNull(), "no edge at the surface: " + envelope);
        assertEquals(HandMadeDiagnosis.ENVELOPE_MARGIN_BOTTOM, envelope.get("margin_inside_bottom").asDouble());
        for (String key : List.of("overshoot_bottom_cm", "overshoot_top_cm", "margin_inside_bottom",
                "margin_inside_top")) {
            assertFalse(regions.get(1).has(key), "semiconvective regions have no " + key);
        }
    }
}
