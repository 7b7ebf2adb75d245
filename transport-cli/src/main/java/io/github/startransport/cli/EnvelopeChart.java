package io.github.startransport.cli;

import io.github.startransport.spi.ConvectiveZone;
import io.github.startransport.spi.EnvelopeSolution;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.StandardChartTheme;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Rectangle;
import java.io.IOException;
import java.nio.file.Path;

/** {@code envelope.png}: nabla, nabla_ad and nabla_rad against log10 P, convection zones shaded. */
final class EnvelopeChart {
    private static final Color SHADE = new Color(255, 170, 60, 70);

    private EnvelopeChart() {
    }

    /**
     * @param e    the envelope (with its profile)
     * @param file the PNG to create
     * @throws IOException when it cannot be written
     */
    static void write(EnvelopeSolution e, Path file) throws IOException {
        DiagnosisCharts.write(chart(e), file);
    }

    /**
     * @param e the envelope (with its profile)
     * @return the chart
     */
    static JFreeChart chart(EnvelopeSolution e) {
        Profile p = e.profile().orElseThrow();
        double[] logP = p.column(ProfileColumn.PRESSURE);
        for (int k = 0; k < logP.length; k++) {
            logP[k] = Math.log10(logP[k]);
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(series("\u2207_rad (radiative)", logP, e.nablaRad()));
        data.addSeries(series("\u2207_ad (adiabatic)", logP, p.column(ProfileColumn.NABLA_AD)));
        data.addSeries(series("\u2207 (actual)", logP, e.nabla()));
        NumberAxis x = new NumberAxis("log\u2081\u2080 (P / dyn cm\u207b\u00b2)   (photosphere on the left, inward to"
                + " the right)");
        x.setAutoRangeIncludesZero(false);
        ValueAxis y = DiagnosisCharts.logAxis("temperature gradient \u2207 = d ln T / d ln P (dimensionless)", data);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        XYPlot plot = new XYPlot(data, x, y, r);
        String title = String.format(java.util.Locale.ROOT,
                "Envelope: M = %.3f M\u2299, R = %.3f R\u2299, L = %.3f L\u2299, T_eff = %.0f K, \u03b1 = %.4g",
                e.star().mass() / io.github.startransport.spi.EnvelopeStar.SOLAR_MASS,
                e.star().radius() / io.github.startransport.spi.EnvelopeStar.NOMINAL_SOLAR_RADIUS,
                e.star().luminosity() / io.github.startransport.spi.EnvelopeStar.NOMINAL_SOLAR_LUMINOSITY,
                e.effectiveTemperature(), e.alpha());
        JFreeChart chart = new JFreeChart(title, new Font(Font.SANS_SERIF, Font.BOLD, 22), plot, true);
        StandardChartTheme theme = (StandardChartTheme) StandardChartTheme.createJFreeTheme();
        theme.setLargeFont(new Font(Font.SANS_SERIF, Font.BOLD, 18));
        theme.setRegularFont(new Font(Font.SANS_SERIF, Font.PLAIN, 16));
        theme.setSmallFont(new Font(Font.SANS_SERIF, Font.PLAIN, 14));
        theme.setPlotBackgroundPaint(Color.WHITE);
        theme.setChartBackgroundPaint(Color.WHITE);
        theme.setDomainGridlinePaint(new Color(210, 210, 210));
        theme.setRangeGridlinePaint(new Color(210, 210, 210));
        theme.apply(chart);
        chart.getLegend().setPosition(RectangleEdge.BOTTOM);
        r.setSeriesPaint(0, new Color(200, 30, 30));
        r.setSeriesStroke(0, new BasicStroke(2.5f));
        r.setSeriesPaint(1, new Color(30, 30, 30));
        r.setSeriesStroke(1, new BasicStroke(2.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f,
                new float[] {10f, 6f}, 0f));
        r.setSeriesPaint(2, new Color(20, 150, 60));
        r.setSeriesStroke(2, new BasicStroke(3.5f));
        r.setDrawSeriesLineAsPath(true); // one dash pattern along each curve, not one per segment
        for (ConvectiveZone z : e.convectiveZones()) {
            IntervalMarker m = new IntervalMarker(Math.log10(z.topPressure()), Math.log10(z.bottomPressure()));
            m.setPaint(SHADE);
            m.setOutlinePaint(null);
            plot.addDomainMarker(m, Layer.BACKGROUND);
        }
        LegendItemCollection items = new LegendItemCollection();
        LegendItemCollection series = plot.getLegendItems();
        for (int i = 0; i < series.getItemCount(); i++) {
            items.add(series.get(i));
        }
        if (!e.convectiveZones().isEmpty()) {
            items.add(new LegendItem("convection zone", null, null, null, new Rectangle(-8, -8, 16, 16),
                    new Color(SHADE.getRed(), SHADE.getGreen(), SHADE.getBlue(), 140)));
        }
        plot.setFixedLegendItems(items);
        return chart;
    }

    private static XYSeries series(String name, double[] x, double[] y) {
        XYSeries s = new XYSeries(name, true, true);
        for (int k = 0; k < x.length; k++) {
            s.add(x[k], y[k] > 0 && Double.isFinite(y[k]) ? Double.valueOf(y[k]) : null);
        }
        return s;
    }
}
