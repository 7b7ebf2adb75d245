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
        XYPlot plot = DiagnosisCharts.velocityAndMixing(d, new DiagnosisCharts.Style(PlotAxis.RADIUS, "x")).getXYPlot();
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

    /** The series of a plot whose name starts with {@code prefix}, or null. */
    private static org.jfree.data.xy.XYSeries series(XYPlot plot, String prefix) {
        for (int i = 0; i < plot.getDatasetCount(); i++) {
            if (plot.getDataset(i) instanceof org.jfree.data.xy.XYSeriesCollection c) {
                for (Object o : c.getSeries()) {
                    org.jfree.data.xy.XYSeries s = (org.jfree.data.xy.XYSeries) o;
                    if (s.getKey().toString().startsWith(prefix)) {
                        return s;
                    }
                }
            }
        }
        return null;
    }

    @Test
    void ledouxGradientIsDrawnOnlyWhereItDiffersFromTheAdiabaticOne() {
        // the hand-made diagnosis has nabla_L = 0.5 in its semiconvective zones and nabla_L = nabla_ad = 0.4 elsewhere
        ProfileDiagnosis d = HandMadeDiagnosis.build();
        org.jfree.data.xy.XYSeries ledoux = series(DiagnosisCharts.gradients(d).getXYPlot(), "\u2207_L");
        assertNotNull(ledoux);
        int drawn = 0;
        for (int i = 0; i < ledoux.getItemCount(); i++) {
            Number y = ledoux.getY(i);
            if (y != null) {
                drawn++;
                assertEquals(0.5, y.doubleValue());
            }
        }
        int semiconvective = 0;
        for (int k = 0; k < d.size(); k++) {
            semiconvective += d.regime(k) == Regime.SEMICONVECTIVE ? 1 : 0;
        }
        assertEquals(semiconvective, drawn);
    }

    @Test
    void withoutACompositionGradientTheLedouxCurveIsLeftOutAndTheSubtitleSaysWhy() {
        io.github.startransport.spi.Transport t = io.github.startransport.spi.Transport.discover();
        io.github.startransport.spi.ModelOptions none = io.github.startransport.spi.ModelOptions.defaults();
        ProfileDiagnosis d = t.diagnoser(null, none).diagnose(t.star(null, none).profile(),
                new io.github.startransport.spi.DiagnosisSetup(t.convection(null, none), t.opacity(null, none),
                        t.thermodynamics(null, none)));
        JFreeChart chart = DiagnosisCharts.gradients(d);
        assertEquals(null, series(chart.getXYPlot(), "\u2207_L"));
        boolean said = false;
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            if (chart.getSubtitle(i) instanceof org.jfree.chart.title.TextTitle tt) {
                said |= tt.getText().contains("\u2207_L") && tt.getText().contains("not drawn");
            }
        }
        assertTrue(said, "no subtitle explains the missing Ledoux curve");
    }

    @Test
    void everyCurveIsDrawnAsOnePathSoThatItsDashesRunOn() {
        ProfileDiagnosis d = HandMadeDiagnosis.build();
        for (JFreeChart chart : List.of(DiagnosisCharts.gradients(d), DiagnosisCharts.velocityAndMixing(d),
                DiagnosisCharts.opacity(d))) {
            XYPlot plot = chart.getXYPlot();
            for (int i = 0; i < plot.getRendererCount(); i++) {
                var r = (org.jfree.chart.renderer.xy.XYLineAndShapeRenderer) plot.getRenderer(i);
                assertTrue(r.getDrawSeriesLineAsPath(), chart.getTitle().getText() + ", renderer " + i);
            }
        }
    }

    @Test
    void theOpacityPlotNamesWhereKappaCameFromAndCallsNoModelARosselandMean() {
        JFreeChart chart = DiagnosisCharts.opacity(HandMadeDiagnosis.build(),
                new DiagnosisCharts.Style(PlotAxis.MASS, "the opacity model analytic-composite"));
        List<String> labels = labels(chart.getXYPlot().getLegendItems());
        assertTrue(labels.stream().anyMatch(l -> l.contains("analytic-composite")), labels.toString());
        assertTrue(labels.stream().noneMatch(l -> l.contains("Rosseland")), labels.toString());
    }

    /** Labelled ticks an axis draws over a 1200 x 800 chart's plot area. */
    private static int labelledTicks(org.jfree.chart.axis.ValueAxis axis, org.jfree.chart.ui.RectangleEdge edge) {
        BufferedImage image = new BufferedImage(1200, 800, BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g = image.createGraphics();
        java.util.List<?> ticks = axis.refreshTicks(g, new org.jfree.chart.axis.AxisState(),
                new java.awt.geom.Rectangle2D.Double(100, 50, 1000, 650), edge);
        int labelled = 0;
        for (Object t : ticks) {
            if (t instanceof org.jfree.chart.axis.LogTick lt ? lt.getAttributedLabel() != null
                    : !((org.jfree.chart.axis.ValueTick) t).getText().isEmpty()) {
                labelled++;
            }
        }
        return labelled;
    }

    @Test
    void aLogarithmicAxisOfAFewDecadesCarriesEnoughLabelsToReadValuesOff() {
        // the right-hand axis of the issue: D_mix over 3.4 decades had three labels
        for (double[] range : List.of(new double[] {2e10, 5e13}, new double[] {3e2, 8e5}, new double[] {1e3, 9e8})) {
            org.jfree.data.xy.XYSeriesCollection data = new org.jfree.data.xy.XYSeriesCollection();
            org.jfree.data.xy.XYSeries s = new org.jfree.data.xy.XYSeries("D");
            s.add(0.1, range[0]);
            s.add(0.9, range[1]);
            data.addSeries(s);
            org.jfree.chart.axis.ValueAxis axis = DiagnosisCharts.logAxis("D_mix", data);
            axis.setRange(range[0], range[1]);
            int labels = labelledTicks(axis, org.jfree.chart.ui.RectangleEdge.RIGHT);
            assertTrue(labels >= 5, labels + " labels over " + range[0] + ".." + range[1]);
        }
    }

    @Test
    void theStretchedMassScaleIsLog10OfMOverMMinusM() {
        // logit base 10: antisymmetric about q = 1/2, log10 q near the centre, -log10(1 - q) near the surface
        for (double q : new double[] {1e-9, 1e-4, 0.01, 0.2, 0.5, 0.7, 0.99, 1 - 1e-6}) {
            assertEquals(Math.log10(q / (1 - q)), PlotAxis.stretched(q), 1e-12);
            // 1 - q rounds to about 1e-16 absolute, so near q = 0 or 1 the mirror agrees to ~1e-16 / min(q, 1 - q)
            assertEquals(-PlotAxis.stretched(q), PlotAxis.stretched(1 - q), 1e-15 / Math.min(q, 1 - q));
        }
        assertEquals(Math.log10(1e-8), PlotAxis.stretched(1e-8), 1e-7);
        assertEquals(-Math.log10(1e-8), PlotAxis.stretched(1 - 1e-8), 1e-6);
    }

    @Test
    void theMassAxisLabelsSitAtTheMassFractionsTheyName() {
        for (double[] range : List.of(new double[] {-6, 10}, new double[] {-1, 1}, new double[] {-12, 3})) {
            List<Object[]> ticks = PlotAxis.MassAxis.ticks(range[0], range[1]);
            assertTrue(ticks.size() >= 3 && ticks.size() <= 13, ticks.size() + " ticks");
            for (Object[] t : ticks) {
                String label = (String) t[1];
                double q = label.startsWith("1 \u2212 ") ? 1 - Double.parseDouble(label.substring(4))
                        : Double.parseDouble(label);
                assertEquals((Double) t[0], q, 1e-15 + 1e-12 * q, label);
            }
        }
    }

    @Test
    void onEveryAxisTheRegionsAreShadedWithinTheAxis() {
        ProfileDiagnosis d = HandMadeDiagnosis.build();
        for (PlotAxis axis : PlotAxis.values()) {
            XYPlot plot = DiagnosisCharts.gradients(d, new DiagnosisCharts.Style(axis, "x")).getXYPlot();
            var x = plot.getDomainAxis();
            List<org.jfree.chart.plot.IntervalMarker> markers = new ArrayList<>();
            for (Object m : plot.getDomainMarkers(org.jfree.chart.ui.Layer.BACKGROUND)) {
                markers.add((org.jfree.chart.plot.IntervalMarker) m);
            }
            assertEquals(5, markers.size(), axis.label() + ": three regions and two overshoot layers");
            for (var m : markers) {
                assertTrue(m.getStartValue() < m.getEndValue(), axis.label());
                assertTrue(m.getStartValue() >= x.getLowerBound() && m.getEndValue() <= x.getUpperBound(), axis.label());
            }
        }
        // on the mass axis a region sits at its own mass fractions; the centre is off the scale, at its left end
        XYPlot plot = DiagnosisCharts.gradients(d, new DiagnosisCharts.Style(PlotAxis.MASS, "x")).getXYPlot();
        double coreTop = PlotAxis.stretched(Math.pow(HandMadeDiagnosis.CORE_TOP, 1.5));
        double semiBottom = PlotAxis.stretched(Math.pow(HandMadeDiagnosis.SEMI_BOTTOM, 1.5));
        double semiTop = PlotAxis.stretched(Math.pow(HandMadeDiagnosis.SEMI_TOP, 1.5));
        List<double[]> intervals = new ArrayList<>();
        for (Object o : plot.getDomainMarkers(org.jfree.chart.ui.Layer.BACKGROUND)) {
            var m = (org.jfree.chart.plot.IntervalMarker) o;
            intervals.add(new double[] {m.getStartValue(), m.getEndValue()});
        }
        double lo = plot.getDomainAxis().getLowerBound();
        assertTrue(intervals.stream().anyMatch(i -> i[0] == lo && Math.abs(i[1] - coreTop) < 1e-12), "core");
        assertTrue(intervals.stream().anyMatch(i -> Math.abs(i[0] - semiBottom) < 1e-12
                && Math.abs(i[1] - semiTop) < 1e-12), "semiconvective shell");
    }
}
