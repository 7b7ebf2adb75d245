package io.github.startransport.cli;

import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.StandardChartTheme;
import org.jfree.chart.annotations.XYBoxAnnotation;
import org.jfree.chart.axis.NumberAxis;
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
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * {@code track.png}: each profile of a track as a column of shaded rectangles, one per region, at
 * its age (or model number) across and between the masses of the region's edges up; the star's
 * mass as a line. Each profile's column reaches halfway to its neighbours, so that the columns
 * tile the axis and a region that persists reads as one band.
 */
final class TrackChart {
    /** Width (pixels). */
    static final int WIDTH = 1200;
    /** Height (pixels). */
    static final int HEIGHT = 800;

    /** Fill of each kind of layer, in legend order. */
    static final Map<String, Color> FILL = fills();

    private TrackChart() {
    }

    private static Map<String, Color> fills() {
        Map<String, Color> m = new LinkedHashMap<>();
        m.put("convective", new Color(240, 150, 40));
        m.put("semiconvective", new Color(70, 170, 80));
        m.put("thermohaline", new Color(70, 120, 220));
        m.put("overshoot", new Color(190, 80, 190));
        return m;
    }

    /**
     * @param track the track
     * @param file  the PNG to create
     * @throws IOException when it cannot be written
     */
    static void write(TrackCommand.Track track, Path file) throws IOException {
        ChartUtils.saveChartAsPNG(file.toFile(), chart(track), WIDTH, HEIGHT);
    }

    /**
     * @param track a track
     * @return its chart
     */
    static JFreeChart chart(TrackCommand.Track track) {
        List<TrackPoint> points = track.points();
        double[] x = track.x();
        int n = x.length;
        // ages in the unit that keeps the tick labels short
        double last = Math.abs(x[n - 1]);
        double unit = !track.byAge() ? 1 : last >= 1e9 ? 1e9 : last >= 1e6 ? 1e6 : last >= 1e3 ? 1e3 : 1;
        String unitName = unit == 1e9 ? "Gyr" : unit == 1e6 ? "Myr" : unit == 1e3 ? "kyr" : "yr";
        for (int i = 0; i < n; i++) {
            x[i] /= unit;
        }
        double[] left = new double[n];
        double[] right = new double[n];
        double typical = n > 1 ? (x[n - 1] - x[0]) / (n - 1) : (x[0] != 0 ? Math.abs(x[0]) * 0.1 : 1.0);
        if (!(typical > 0)) {
            typical = 1.0;
        }
        for (int i = 0; i < n; i++) {
            left[i] = i > 0 ? 0.5 * (x[i - 1] + x[i]) : x[i] - 0.5 * (n > 1 ? x[1] - x[0] : typical);
            right[i] = i < n - 1 ? 0.5 * (x[i] + x[i + 1]) : x[i] + 0.5 * (n > 1 ? x[n - 1] - x[n - 2] : typical);
            if (!(right[i] > left[i])) { // equal model numbers: give each a sliver
                left[i] = x[i] - 0.25 * typical;
                right[i] = x[i] + 0.25 * typical;
            }
        }
        if (track.byAge() && x[0] >= 0 && left[0] < 0) {
            left[0] = 0.0; // a track starts no earlier than age 0
        }
        // neighbouring columns overlap by a hair, so that no seam of background shows between equal colours
        double seam = 1e-3 * (right[n - 1] - left[0]); // about a pixel
        XYSeriesCollection data = new XYSeriesCollection();
        XYSeries mass = new XYSeries("the star's mass M", false, true);
        double top = 0;
        for (int i = 0; i < n; i++) {
            double m = points.get(i).mass() / HumanSummary.SOLAR_MASS_G;
            mass.add(left[i], m);
            mass.add(right[i], m);
            top = Math.max(top, m);
        }
        data.addSeries(mass);
        NumberAxis across = new NumberAxis(track.byAge() ? "age (" + unitName + ")" : "model number");
        across.setAutoRangeIncludesZero(false);
        if (!track.byAge()) {
            across.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        }
        across.setRange(left[0], right[n - 1]);
        NumberAxis up = new NumberAxis("mass coordinate m (M\u2609)");
        up.setRange(0.0, top * 1.04);
        XYLineAndShapeRenderer lines = new XYLineAndShapeRenderer(true, false);
        XYPlot plot = new XYPlot(data, across, up, lines);
        java.util.Set<String> shown = new java.util.LinkedHashSet<>();
        for (int i = 0; i < n; i++) {
            for (TrackPoint.Layer l : points.get(i).layers()) {
                Color c = FILL.getOrDefault(l.regime(), Color.GRAY);
                lines.addAnnotation(new XYBoxAnnotation(left[i] - seam, l.mBottom() / HumanSummary.SOLAR_MASS_G,
                        right[i] + seam,
                        l.mTop() / HumanSummary.SOLAR_MASS_G, null, null, c), Layer.BACKGROUND);
                shown.add(l.regime());
            }
        }
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(200, 200, 200));
        plot.setRangeGridlinePaint(new Color(200, 200, 200));
        plot.setDomainGridlinesVisible(false);
        JFreeChart chart = new JFreeChart("Regions of " + title(points) + " along its track", new Font(Font.SANS_SERIF,
                Font.BOLD, 24), plot, true);
        StandardChartTheme theme = (StandardChartTheme) StandardChartTheme.createJFreeTheme();
        theme.setExtraLargeFont(new Font(Font.SANS_SERIF, Font.BOLD, 24));
        theme.setLargeFont(new Font(Font.SANS_SERIF, Font.BOLD, 18));
        theme.setRegularFont(new Font(Font.SANS_SERIF, Font.PLAIN, 16));
        theme.setSmallFont(new Font(Font.SANS_SERIF, Font.PLAIN, 14));
        theme.setPlotBackgroundPaint(Color.WHITE);
        theme.setChartBackgroundPaint(Color.WHITE);
        theme.apply(chart);
        plot.setDomainGridlinesVisible(false);
        lines.setSeriesPaint(0, Color.BLACK);
        lines.setSeriesStroke(0, new BasicStroke(2.0f));
        lines.setDrawSeriesLineAsPath(true);
        plot.getDomainAxis().setTickLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 15));
        plot.getRangeAxis().setTickLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 15));
        LegendItemCollection items = new LegendItemCollection();
        LegendItemCollection series = plot.getLegendItems();
        for (int i = 0; i < series.getItemCount(); i++) {
            items.add(series.get(i));
        }
        for (Map.Entry<String, Color> e : FILL.entrySet()) {
            if (shown.contains(e.getKey())) {
                items.add(new LegendItem(e.getKey(), null, null, null, new Rectangle(-8, -8, 16, 16), e.getValue()));
            }
        }
        plot.setFixedLegendItems(items);
        chart.getLegend().setPosition(RectangleEdge.BOTTOM);
        if (shown.isEmpty()) {
            chart.addSubtitle(new org.jfree.chart.title.TextTitle("no profile has a convective, semiconvective or"
                    + " thermohaline region", new Font(Font.SANS_SERIF, Font.ITALIC, 15)));
        }
        return chart;
    }

    /** @return the star's name for the title: the profiles' common file-name prefix, or "the star" */
    private static String title(List<TrackPoint> points) {
        String first = Path.of(points.get(0).source()).getFileName().toString();
        String common = first;
        for (TrackPoint p : points) {
            String name = Path.of(p.source()).getFileName().toString();
            int k = 0;
            while (k < common.length() && k < name.length() && common.charAt(k) == name.charAt(k)) {
                k++;
            }
            common = common.substring(0, k);
        }
        common = common.replaceAll("[-_.0-9]+$", "");
        return common.isEmpty() ? "the star" : Text.shorten(common);
    }
}
