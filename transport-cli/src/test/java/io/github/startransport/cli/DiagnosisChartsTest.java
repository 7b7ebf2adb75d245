package io.github.startransport.cli;

import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.plot.XYPlot;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.imageio.ImageIO;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

class DiagnosisChartsTest {

    @BeforeAll
    static void headless() {
        System.setProperty("java.awt.headless", "true");
    }

    @Test
    void writesThreePngsOf1200By800(@TempDir Path dir) throws Exception {
        DiagnosisCharts.writeAll(HandMadeDiagnosis.build(), dir);
        for (String name : List.of("gradients.png", "velocity-mixing.png", "opacity.png", "propagation.png")) {
            BufferedImage image = ImageIO.read(dir.resolve(name).toFile());
            assertNotNull(image, name + " is not a readable PNG");
            assertEquals(1200, image.getWidth(), name);
            assertEquals(800, image.getHeight(), name);
        }
    }

    @Test
    void gradientPlotShadesEachNonRadiativeRegionAndNamesItsRegimeInTheLegend() {
        ProfileDiagnosis d = HandMadeDiagnosis.build();
        XYPlot plot = DiagnosisCharts.gradients(d).getXYPlot();
        long nonRadiative = d.regions().stream().filter(r -> r.regime() != Regime.RADIATIVE).count();
        long overshootLayers = d.regions().stream().mapToLong(r -> (r.overshootBottom().isPresent() ? 1 : 0)
                + (r.overshootTop().isPresent() ? 1 : 0)).sum();
        assertEquals(2, overshootLayers, "the hand-made diagnosis overshoots above its core and below its envelope");
        assertEquals(nonRadiative + overshootLayers, plot.getDomainMarkers(org.jfree.chart.ui.Layer.BACKGROUND).size());
        List<String> labels = labels(plot.getLegendItems());
        for (Region r : d.regions()) {
            assertTrue(labels.contains(r.regime().label() + " region"), labels.toString());
        }
        assertTrue(labels.contains("overshoot mixing"), labels.toString());
        assertTrue(labels.stream().anyMatch(l -> l.contains("rad")), labels.toString());
        assertTrue(labels.stream().anyMatch(l -> l.contains("ad")), labels.toString());
    }

    @Test
    void overshootLayersAreShadedBetweenTheEdgeAndWhereOvershootEnds() {
        ProfileDiagnosis d = HandMadeDiagnosis.build();
        XYPlot plot = DiagnosisCharts.velocityAndMixing(d).getXYPlot();
        List<double[]> intervals = new ArrayList<>();
        for (Object o : plot.getDomainMarkers(org.jfree.chart.ui.Layer.BACKGROUND)) {
            org.jfree.chart.plot.IntervalMarker m = (org.jfree.chart.plot.IntervalMarker) o;
            intervals.add(new double[] {m.getStartValue(), m.getEndValue()});
        }
        assertTrue(intervals.stream().anyMatch(i -> i[0] == HandMadeDiagnosis.CORE_TOP
                && i[1] == HandMadeDiagnosis.CORE_OVERSHOOT_TOP), "no layer above the core");
        assertTrue(intervals.stream().anyMatch(i -> i[0] == HandMadeDiagnosis.ENVELOPE_OVERSHOOT_BOTTOM
                && i[1] == HandMadeDiagnosis.ENVELOPE_BOTTOM), "no layer below the envelope");
    }

    @Test
    void axesCarryUnitsAndVelocityAndMixingUseLogarithmicAxes() {
        ProfileDiagnosis d = HandMadeDiagnosis.build();
        JFreeChart mixing = DiagnosisCharts.velocityAndMixing(d);
        XYPlot plot = mixing.getXYPlot();
        assertLogarithmic(plot.getRangeAxis(0));
        assertLogarithmic(plot.getRangeAxis(1));
        assertTrue(plot.getRangeAxis(0).getLabel().contains("cm s"), plot.getRangeAxis(0).getLabel());
        assertTrue(plot.getRangeAxis(1).getLabel().contains("cm\u00b2 s"), plot.getRangeAxis(1).getLabel());
        XYPlot opacity = DiagnosisCharts.opacity(d).getXYPlot();
        assertTrue(opacity.getDomainAxis().getLabel().contains("T / K"), opacity.getDomainAxis().getLabel());
        assertTrue(opacity.getRangeAxis().getLabel().contains("cm\u00b2 g"), opacity.getRangeAxis().getLabel());
    }

    private static void assertLogarithmic(org.jfree.chart.axis.ValueAxis axis) {
        assertTrue(axis instanceof LogAxis || axis instanceof org.jfree.chart.axis.LogarithmicAxis,
                axis.getClass().getName());
    }

    private static List<String> labels(LegendItemCollection items) {
        List<String> labels = new ArrayList<>();
        for (int i = 0; i < items.getItemCount(); i++) {
            labels.add(items.get(i).getLabel());
        }
        return labels;
    }
}
