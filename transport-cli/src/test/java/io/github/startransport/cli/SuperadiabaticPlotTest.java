package io.github.startransport.cli;

import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.Transport;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.imageio.ImageIO;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The README's plot of nabla - nabla_ad through the demo star's convective envelope for the two theories:
 * mixing-length (alpha = 1.8) and full-spectrum turbulence (Canuto &amp; Mazzitelli 1991) with their own
 * length Lambda = z, the distance to the nearest edge, and with Lambda = 1.8 H_P. Drawn into a temporary
 * folder by every build; {@code -Ddocs.dir=docs} (with {@code -Dtest=SuperadiabaticPlotTest}) writes the
 * README's copy.
 */
class SuperadiabaticPlotTest {
    static final String FILE = "envelope-superadiabatic.png";

    @BeforeAll
    static void headless() {
        System.setProperty("java.awt.headless", "true");
    }

    private static ProfileDiagnosis diagnose(Transport t, Profile p, String convection, String options) {
        DiagnosisSetup setup = new DiagnosisSetup(t.convection(convection, ModelOptions.parse(options)),
                t.opacity(null, ModelOptions.defaults()), t.thermodynamics(null, ModelOptions.defaults()));
        return t.diagnoser(null, ModelOptions.defaults()).diagnose(p, setup);
    }

    @Test
    void drawsBothTheoriesThroughTheEnvelope(@TempDir Path tmp) throws Exception {
        Transport t = Transport.discover();
        Profile star = t.star(null, ModelOptions.defaults()).profile();
        List<ProfileDiagnosis> runs = List.of(
                diagnose(t, star, "local-mixing-length", "alpha=1.8"),
                diagnose(t, star, "eddy-spectrum", "length-scale=edge-distance,alpha=1"),
                diagnose(t, star, "eddy-spectrum", "alpha=1.8"));
        List<String> names = List.of("mixing-length theory, l = 1.8 H_P",
                "full spectrum (Canuto & Mazzitelli 1991), \u039b = z (distance to the edge)",
                "full spectrum, \u039b = 1.8 H_P");
        Region envelope = runs.get(0).regions().stream().filter(r -> r.regime() == Regime.CONVECTIVE)
                .reduce((a, b) -> b).orElseThrow();
        XYSeriesCollection data = new XYSeriesCollection();
        double radius = runs.get(0).radius();
        for (int i = 0; i < runs.size(); i++) {
            ProfileDiagnosis d = runs.get(i);
            // the regimes do not depend on the theory: the same envelope in every run
            Region own = d.regions().stream().filter(r -> r.regime() == Regime.CONVECTIVE).reduce((a, b) -> b)
                    .orElseThrow();
            assertEquals(envelope.firstZone(), own.firstZone());
            assertEquals(envelope.lastZone(), own.lastZone());
            XYSeries s = new XYSeries(names.get(i));
            for (int k = envelope.firstZone(); k <= envelope.lastZone(); k++) {
                double excess = d.value(DiagnosisColumn.NABLA, k) - d.value(DiagnosisColumn.NABLA_AD, k);
                double radiative = d.value(DiagnosisColumn.NABLA_RAD, k) - d.value(DiagnosisColumn.NABLA_AD, k);
                // convection carries flux: 0 < nabla - nabla_ad < nabla_rad - nabla_ad (Kippenhahn, Weigert & Weiss
                // ch. 7); read back as differences of columns, the two ends are reached to rounding where convection
                // is very efficient (the excess rounds to 0) or very inefficient (to nabla_rad - nabla_ad)
                assertTrue(excess >= 0 && excess <= radiative, names.get(i) + ", zone " + k + ": " + excess + " vs " + radiative);
                if (excess > 0) {
                    s.add(d.value(DiagnosisColumn.RADIUS, k) / radius, excess);
                }
            }
            data.addSeries(s);
        }
        NumberAxis x = new NumberAxis("fractional radius r / R (dimensionless)");
        x.setAutoRangeIncludesZero(false);
        LogAxis y = new LogAxis("superadiabatic excess \u2207 - \u2207_ad (dimensionless)");
        y.setBase(10);
        y.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        Color[] colours = {new Color(200, 30, 30), new Color(30, 110, 200), new Color(20, 150, 60)};
        for (int i = 0; i < colours.length; i++) {
            renderer.setSeriesPaint(i, colours[i]);
            renderer.setSeriesStroke(i, i == 2 ? new BasicStroke(2.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f,
                    new float[] {10f, 6f}, 0f) : new BasicStroke(2.5f));
        }
        XYPlot plot = new XYPlot(data, x, y, renderer);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(200, 200, 200));
        plot.setRangeGridlinePaint(new Color(200, 200, 200));
        x.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 16));
        y.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 16));
        x.setTickLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 14));
        y.setTickLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 14));
        JFreeChart chart = new JFreeChart("Superadiabatic excess through the convective envelope of " + star.source(),
                new Font(Font.SANS_SERIF, Font.BOLD, 22), plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.BOTTOM);
        legend.setItemFont(new Font(Font.SANS_SERIF, Font.PLAIN, 15));
        Path file = tmp.resolve(FILE);
        DiagnosisCharts.write(chart, file);
        assertEquals(DiagnosisCharts.WIDTH, ImageIO.read(file.toFile()).getWidth());
        String docs = System.getProperty("docs.dir");
        if (docs != null) {
            Path target = Path.of(docs).isAbsolute() ? Path.of(docs) : Path.of("..").resolve(docs);
            Files.createDirectories(target);
            Files.copy(file, target.resolve(FILE), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
