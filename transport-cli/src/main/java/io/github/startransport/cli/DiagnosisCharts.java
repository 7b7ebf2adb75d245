package io.github.startransport.cli;

import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.StandardChartTheme;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.LogarithmicAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Rectangle;
import java.awt.Stroke;
import java.io.IOException;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.Map;
import java.util.Set;

/**
 * The four plots of a diagnosis, drawn with JFreeChart and written as PNG at 1200 x 800.
 *
 * <p>On logarithmic axes a value that is zero or negative cannot be drawn; it leaves a gap in
 * its line, and the plot's subtitle says so. Along the star the plots use the {@link PlotAxis}
 * of their {@link Style} (by default the stretched mass scale). Each curve is drawn as one path,
 * so that a dashed line keeps one dash pattern however its points are spaced.
 */
final class DiagnosisCharts {
    /** Width of every PNG (pixels). */
    static final int WIDTH = 1200;
    /** Height of every PNG (pixels). */
    static final int HEIGHT = 800;

    /** File name of the gradient plot. */
    static final String GRADIENTS_PNG = "gradients.png";
    /** File name of the convective velocity and mixing plot. */
    static final String MIXING_PNG = "velocity-mixing.png";
    /** File name of the opacity plot. */
    static final String OPACITY_PNG = "opacity.png";
    /** File name of the propagation diagram. */
    static final String PROPAGATION_PNG = "propagation.png";

    private static final Map<Regime, Color> SHADE = new EnumMap<>(Map.of(
            Regime.CONVECTIVE, new Color(255, 170, 60, 70),
            Regime.SEMICONVECTIVE, new Color(80, 190, 90, 70),
            Regime.THERMOHALINE, new Color(90, 140, 230, 70),
            Regime.RADIATIVE, new Color(0, 0, 0, 0)));

    /** Shade of the layers that overshoot mixes beyond the edges of convective regions. */
    private static final Color OVERSHOOT_SHADE = new Color(200, 60, 200, 60);

    /**
     * nabla_L is drawn only where it differs from nabla_ad by more than this fraction of nabla_ad
     * (elsewhere the two lines coincide, and nabla_L would hide under nabla_ad).
     */
    static final double LEDOUX_DIFFERS = 1e-3;

    /**
     * How the plots are drawn.
     *
     * @param axis          what is put along the star
     * @param opacitySource where kappa came from, in words ("the opacity model analytic-composite", ...)
     */
    record Style(PlotAxis axis, String opacitySource) {
        /** The default: the stretched mass axis, kappa from an unnamed opacity model. */
        static final Style DEFAULT = new Style(PlotAxis.MASS, "the opacity model");
    }

    private DiagnosisCharts() {
    }

    /**
     * Writes all four plots into a folder, in the {@link Style#DEFAULT} style.
     *
     * @param diagnosis the diagnosis
     * @param dir       an existing folder
     * @throws IOException when a file cannot be written
     */
    static void writeAll(ProfileDiagnosis diagnosis, Path dir) throws IOException {
        writeAll(diagnosis, Style.DEFAULT, dir);
    }

    /**
     * Writes all four plots into a folder.
     *
     * @param diagnosis the diagnosis
     * @param style     how to draw them
     * @param dir       an existing folder
     * @throws IOException when a file cannot be written
     */
    static void writeAll(ProfileDiagnosis diagnosis, Style style, Path dir) throws IOException {
        // the abscissa once for the three plots along the star (two logarithms a zone on the mass axis)
        double[] xs = style.axis().of(diagnosis);
        write(gradients(diagnosis, style, xs), dir.resolve(GRADIENTS_PNG));
        write(velocityAndMixing(diagnosis, style, xs), dir.resolve(MIXING_PNG));
        write(opacity(diagnosis, style), dir.resolve(OPACITY_PNG));
        write(propagation(diagnosis, style, xs), dir.resolve(PROPAGATION_PNG));
    }

    /**
     * @param chart a chart
     * @param file  the PNG to create
     * @throws IOException when the file cannot be written
     */
    static void write(JFreeChart chart, Path file) throws IOException {
        ChartUtils.saveChartAsPNG(file.toFile(), chart, WIDTH, HEIGHT);
    }

    /**
     * @param d a diagnosis
     * @return the gradient plot in the default style
     */
    static JFreeChart gradients(ProfileDiagnosis d) {
        return gradients(d, Style.DEFAULT);
    }

    /**
     * @param d     a diagnosis
     * @param style how to draw it
     * @return nabla_rad, nabla_ad, nabla_L (where it differs from nabla_ad), the actual nabla and the profile's
     *         own d ln T / d ln P along the star, regions shaded
     */
    static JFreeChart gradients(ProfileDiagnosis d, Style style) {
        return gradients(d, style, style.axis().of(d));
    }

    /** The same, with every zone's coordinate on the style's axis given. */
    private static JFreeChart gradients(ProfileDiagnosis d, Style style, double[] xs) {
        Values x = k -> xs[k];
        XYSeriesCollection data = new XYSeriesCollection();
        int hidden = 0;
        Values nablaAd = column(d, DiagnosisColumn.NABLA_AD);
        // NaN (not drawn) where nabla_L lies on nabla_ad
        Values nablaL = k -> {
            double l = d.value(DiagnosisColumn.NABLA_LEDOUX, k);
            double ad = nablaAd.at(k);
            return Math.abs(l - ad) > LEDOUX_DIFFERS * ad ? l : Double.NaN;
        };
        int differs = 0;
        for (int k = 0; k < d.size(); k++) {
            if (!Double.isNaN(nablaL.at(k))) {
                differs++;
            }
        }
        hidden += add(data, "\u2207_rad (radiative)", d.size(), x, column(d, DiagnosisColumn.NABLA_RAD), true);
        hidden += add(data, "\u2207_ad (adiabatic)", d.size(), x, nablaAd, true);
        if (differs > 0) {
            hidden += add(data, "\u2207_L (Ledoux; drawn where it differs from \u2207_ad)", d.size(), x,
                    nablaL, true);
        }
        hidden += add(data, "\u2207 (actual)", d.size(), x, column(d, DiagnosisColumn.NABLA), true);
        // NaN where the pressure does not fall outwards; the diagnosis warns about those zones
        hidden += add(data, "\u2207_model (the profile's own d ln T / d ln P)", d.size(), x,
                column(d, DiagnosisColumn.NABLA_MODEL), true);
        ValueAxis y = logAxis("temperature gradient \u2207 = d ln T / d ln P (dimensionless)", data);
        XYPlot plot = new XYPlot(data, style.axis().axis(xs), y, new XYLineAndShapeRenderer(true, false));
        JFreeChart chart = chart("Temperature gradients of " + d.source() + " (" + d.criterion().label()
                + " criterion, \u03b1 = " + d.alpha() + ")", plot);
        if (differs > 0) {
            style(plot, 0, 5);
        } else {
            styleSkipping(plot, 2);
            chart.addSubtitle(subtitle("\u2207_L (Ledoux) equals \u2207_ad in every zone (no composition gradient)"
                    + " and is not drawn"));
        }
        shadeRegions(d, plot, style.axis(), xs);
        note(chart, hidden, "gradient values \u2264 0");
        return chart;
    }

    /**
     * @param d a diagnosis
     * @return the velocity and mixing plot in the default style
     */
    static JFreeChart velocityAndMixing(ProfileDiagnosis d) {
        return velocityAndMixing(d, Style.DEFAULT);
    }

    /**
     * @param d     a diagnosis
     * @param style how to draw it
     * @return v_conv (left axis) and D_mix (right axis) along the star, regions shaded
     */
    static JFreeChart velocityAndMixing(ProfileDiagnosis d, Style style) {
        return velocityAndMixing(d, style, style.axis().of(d));
    }

    /** The same, with every zone's coordinate on the style's axis given. */
    private static JFreeChart velocityAndMixing(ProfileDiagnosis d, Style style, double[] xs) {
        Values x = k -> xs[k];
        XYSeriesCollection velocity = new XYSeriesCollection();
        XYSeriesCollection mixing = new XYSeriesCollection();
        int hidden = add(velocity, "v_conv (left axis)", d.size(), x, column(d, DiagnosisColumn.VELOCITY), true);
        int hiddenMixing = add(mixing, "D_mix (right axis)", d.size(), x, column(d, DiagnosisColumn.DIFFUSION),
                true);
        XYPlot plot = new XYPlot(velocity, style.axis().axis(xs),
                logAxis("convective velocity v_conv (cm s\u207b\u00b9)", velocity),
                new XYLineAndShapeRenderer(true, false));
        plot.setRangeAxis(1, logAxis("mixing diffusion coefficient D_mix (cm\u00b2 s\u207b\u00b9)", mixing));
        plot.setDataset(1, mixing);
        plot.mapDatasetToRangeAxis(1, 1);
        plot.setRenderer(1, new XYLineAndShapeRenderer(true, false));
        plot.setRangeAxisLocation(1, org.jfree.chart.axis.AxisLocation.BOTTOM_OR_RIGHT);
        JFreeChart chart = chart("Convective velocity and mixing in " + d.source(), plot);
        style(plot, 0, 1);
        style(plot, 1, 1);
        shadeRegions(d, plot, style.axis(), xs);
        if (hidden == d.size() && hiddenMixing == d.size()) {
            chart.addSubtitle(subtitle("no zone has v_conv > 0 or D_mix > 0: nothing to draw"));
        } else if (hidden == hiddenMixing) {
            note(chart, hidden, "zones without convection or mixing (v_conv = D_mix = 0)");
        } else {
            chart.addSubtitle(subtitle(hidden + " zones with v_conv = 0 and " + hiddenMixing
                    + " with D_mix = 0 not drawn on the logarithmic axis"));
        }
        return chart;
    }

    /**
     * @param d a diagnosis
     * @return the opacity plot in the default style
     */
    static JFreeChart opacity(ProfileDiagnosis d) {
        return opacity(d, Style.DEFAULT);
    }

    /**
     * @param d     a diagnosis
     * @param style how to draw it (names where kappa came from)
     * @return kappa against log10 T
     */
    static JFreeChart opacity(ProfileDiagnosis d, Style style) {
        double[] t = d.column(DiagnosisColumn.TEMPERATURE);
        for (int k = 0; k < t.length; k++) {
            t[k] = Math.log10(t[k]);
        }
        Values logT = k -> t[k];
        XYSeriesCollection data = new XYSeriesCollection();
        int hidden = add(data, "\u03ba from " + style.opacitySource(), d.size(), logT,
                column(d, DiagnosisColumn.OPACITY), false);
        NumberAxis x = new NumberAxis("log\u2081\u2080 (T / K)");
        x.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, x, logAxis("opacity \u03ba (cm\u00b2 g\u207b\u00b9)", data),
                new XYLineAndShapeRenderer(true, false));
        JFreeChart chart = chart("Opacity against temperature in " + d.source(), plot);
        chart.addSubtitle(subtitle("\u03ba from " + style.opacitySource()));
        style(plot, 0, 1);
        note(chart, hidden, "opacity values \u2264 0");
        return chart;
    }

    /**
     * The propagation diagram: the buoyancy frequency N and the l = 1 Lamb frequency S_1 as cyclic
     * frequencies (N / 2 pi, S_1 / 2 pi, in microhertz) along the star on a logarithmic axis, the large
     * separation Delta nu marked, non-radiative regions shaded. Zones with N^2 &lt;= 0 (convectively
     * unstable) leave gaps in N.
     *
     * @param d a diagnosis
     * @return the chart in the default style
     */
    static JFreeChart propagation(ProfileDiagnosis d) {
        return propagation(d, Style.DEFAULT);
    }

    /**
     * @param d     a diagnosis
     * @param style how to draw it
     * @return the propagation diagram
     */
    static JFreeChart propagation(ProfileDiagnosis d, Style style) {
        return propagation(d, style, style.axis().of(d));
    }

    /** The same, with every zone's coordinate on the style's axis given. */
    private static JFreeChart propagation(ProfileDiagnosis d, Style style, double[] xs) {
        Values x = k -> xs[k];
        Values n = k -> {
            double n2 = d.value(DiagnosisColumn.BUOYANCY_SQUARED, k);
            return n2 > 0 ? Math.sqrt(n2) / (2 * Math.PI) * 1e6 : 0.0;
        };
        Values s1 = k -> d.value(DiagnosisColumn.LAMB_L1, k) / (2 * Math.PI) * 1e6;
        XYSeriesCollection data = new XYSeriesCollection();
        int hidden = add(data, "N / 2\u03c0 (buoyancy frequency)", d.size(), x, n, true);
        add(data, "S\u2081 / 2\u03c0 (Lamb frequency, l = 1)", d.size(), x, s1, true);
        ValueAxis y = logAxis("cyclic frequency (\u03bcHz)", data);
        XYPlot plot = new XYPlot(data, style.axis().axis(xs), y, new XYLineAndShapeRenderer(true, false));
        JFreeChart chart = chart("Propagation diagram of " + d.source(), plot);
        XYLineAndShapeRenderer lines = (XYLineAndShapeRenderer) plot.getRenderer();
        lines.setSeriesPaint(0, new Color(200, 30, 30));
        lines.setSeriesStroke(0, new BasicStroke(2.5f));
        lines.setSeriesPaint(1, new Color(30, 110, 200));
        lines.setSeriesStroke(1, new BasicStroke(2.5f));
        lines.setDrawSeriesLineAsPath(true);
        shadeRegions(d, plot, style.axis(), xs);
        double deltaNu = d.seismic().map(sm -> sm.largeSeparation() * 1e6).orElse(Double.NaN);
        if (Double.isFinite(deltaNu) && deltaNu > 0) {
            org.jfree.chart.plot.ValueMarker marker = new org.jfree.chart.plot.ValueMarker(deltaNu);
            marker.setPaint(new Color(120, 60, 160));
            marker.setStroke(new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f,
                    new float[] {8f, 5f}, 0f));
            marker.setLabel(String.format(java.util.Locale.ROOT, "\u0394\u03bd = %.4g \u03bcHz", deltaNu));
            marker.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 16));
            marker.setLabelPaint(new Color(120, 60, 160));
            marker.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.TOP_RIGHT);
            marker.setLabelTextAnchor(org.jfree.chart.ui.TextAnchor.BOTTOM_RIGHT);
            marker.setLabelBackgroundColor(new Color(255, 255, 255, 0));
            plot.addRangeMarker(marker);
            includeInRange(y, data, deltaNu);
        }
        note(chart, hidden, "zones with N\u00b2 \u2264 0 (convectively unstable)");
        return chart;
    }

    /** Widens a logarithmic axis so that {@code value} and every drawn point lie inside it. */
    private static void includeInRange(ValueAxis axis, XYSeriesCollection data, double value) {
        double lo = value;
        double hi = value;
        for (int s = 0; s < data.getSeriesCount(); s++) {
            for (int i = 0; i < data.getItemCount(s); i++) {
                double v = data.getYValue(s, i);
                if (v > 0 && Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        axis.setRange(lo / 1.5, hi * 1.5);
    }

    /** One value per zone. */
    interface Values {
        /**
         * @param zone zone index, centre = 0
         * @return the value
         */
        double at(int zone);
    }

    /**
     * One column as values, read through the diagnosis: a copy of each column drawn would add 8 bytes per zone
     * to the tool's peak memory while a plot is drawn (a series reads each zone two or three times).
     */
    private static Values column(ProfileDiagnosis d, DiagnosisColumn c) {
        return k -> d.value(c, k);
    }

    /** Up to this many zones a series draws every zone. */
    static final int MAX_POINTS = 4000;
    /** Beyond {@link #MAX_POINTS} zones, a series is cut into this many runs of neighbouring zones. */
    static final int RUNS = 1000;

    /**
     * Zones to draw of one series: all of them when there are at most {@link #MAX_POINTS};
     * otherwise, in each of {@link #RUNS} runs of neighbouring zones, the first, the last, the
     * smallest and the largest drawable value, and one undrawable zone if the run holds any (so
     * a gap stays a gap): at most 5 points a run, fewer than a 1200-pixel plot can tell apart.
     * Extremes are never lost, and the cost beyond one pass over the zones does not grow with
     * their number.
     *
     * @param n number of zones
     * @param x the abscissa
     * @param y the values
     * @return zone indices, increasing
     */
    static int[] decimate(int n, Values x, Values y) {
        return decimate(n, x, y, new int[1]);
    }

    /**
     * {@link #decimate(int, Values, Values)}, counting in the same pass the zones whose value a log axis
     * cannot show (see {@link #add}).
     *
     * @param hidden receives that count in element 0
     */
    private static int[] decimate(int n, Values x, Values y, int[] hidden) {
        if (n <= MAX_POINTS) {
            for (int k = 0; k < n; k++) {
                double v = y.at(k);
                double xv = x.at(k);
                if (Double.isFinite(xv) && !Double.isNaN(v) && !drawable(xv, v)) {
                    hidden[0]++;
                }
            }
            int[] all = new int[n];
            for (int k = 0; k < n; k++) {
                all[k] = k;
            }
            return all;
        }
        int buckets = RUNS;
        int[] keep = new int[buckets * 5];
        int m = 0;
        for (int b = 0; b < buckets; b++) {
            int from = (int) ((long) n * b / buckets);
            int to = (int) ((long) n * (b + 1) / buckets);
            int lo = -1;
            int hi = -1;
            int gap = -1;
            double loV = 0.0;
            double hiV = 0.0;
            for (int k = from; k < to; k++) {
                double v = y.at(k);
                double xv = x.at(k);
                if (drawable(xv, v)) {
                    if (lo < 0 || v < loV) {
                        lo = k;
                        loV = v;
                    }
                    if (hi < 0 || v > hiV) {
                        hi = k;
                        hiV = v;
                    }
                } else {
                    if (gap < 0) {
                        gap = k;
                    }
                    if (Double.isFinite(xv) && !Double.isNaN(v)) {
                        hidden[0]++;
                    }
                }
            }
            int[] picks = {from, lo, hi, gap, to - 1};
            java.util.Arrays.sort(picks);
            int last = m > 0 ? keep[m - 1] : -1;
            for (int p : picks) {
                if (p >= 0 && p != last) {
                    keep[m++] = p;
                    last = p;
                }
            }
        }
        return java.util.Arrays.copyOf(keep, m);
    }

    private static boolean drawable(double x, double y) {
        return y > 0 && Double.isFinite(y) && Double.isFinite(x);
    }

    /**
     * Adds a series, decimated ({@link #decimate}); values a log axis cannot show become gaps, and so do
     * NaN values (a quantity not defined there) and zones that lie at infinity on the x axis.
     *
     * @return how many zones (of all, not only those drawn) have a value the log axis cannot show: zero,
     *         negative or infinite (NaN and zones off the x axis are not counted)
     */
    private static int add(XYSeriesCollection data, String name, int n, Values x, Values y, boolean sortByX) {
        XYSeries s = new XYSeries(name, sortByX, true);
        int[] hidden = new int[1];
        for (int k : decimate(n, x, y, hidden)) {
            double xv = x.at(k);
            double yv = y.at(k);
            if (drawable(xv, yv)) {
                s.add(xv, yv, false);
            } else if (Double.isFinite(xv)) {
                s.add(xv, null, false);
            }
        }
        data.addSeries(s);
        return hidden[0];
    }

    /**
     * A logarithmic axis: powers of ten over a wide range; over less than three decades, where
     * those would be too few, ticks at 1, 2, ... 9 times a power of ten.
     */
    static ValueAxis logAxis(String label, XYSeriesCollection data) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0.0;
        for (int s = 0; s < data.getSeriesCount(); s++) {
            for (int i = 0; i < data.getItemCount(s); i++) {
                double y = data.getYValue(s, i);
                if (y > 0 && Double.isFinite(y)) {
                    lo = Math.min(lo, y);
                    hi = Math.max(hi, y);
                }
            }
        }
        if (hi > 0 && Math.log10(hi / lo) < 3) {
            LogarithmicAxis y = new OneTwoFiveLogAxis(label);
            y.setStrictValuesFlag(false);
            y.setAllowNegativesFlag(false);
            y.setExpTickLabelsFlag(hi > 1e4 || lo < 1e-3);
            return y;
        }
        LogAxis y = hi > 0 && Math.log10(hi / lo) <= 6 ? new OneThreeLogAxis(label) : new LogAxis(label);
        y.setBase(10);
        y.setSmallestValue(1e-300);
        y.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        return y;
    }

    /**
     * A logarithmic axis for three to six decades, labelled at 1 and 3 times each power of ten, with
     * unlabelled ticks between: every decade alone would give only three or four labels.
     */
    static final class OneThreeLogAxis extends LogAxis {
        private static final long serialVersionUID = 1L;

        OneThreeLogAxis(String label) {
            super(label);
        }

        @Override
        protected java.util.List<org.jfree.chart.axis.ValueTick> refreshTicksVertical(java.awt.Graphics2D g2,
                java.awt.geom.Rectangle2D dataArea, RectangleEdge edge) {
            java.util.List<org.jfree.chart.axis.ValueTick> ticks = new java.util.ArrayList<>();
            double lo = getLowerBound();
            double hi = getUpperBound();
            org.jfree.chart.ui.TextAnchor anchor = edge == RectangleEdge.LEFT
                    ? org.jfree.chart.ui.TextAnchor.CENTER_RIGHT : org.jfree.chart.ui.TextAnchor.CENTER_LEFT;
            for (int e = (int) Math.floor(Math.log10(lo)); e <= (int) Math.ceil(Math.log10(hi)); e++) {
                for (int m = 1; m <= 9; m++) {
                    double v = m * Math.pow(10, e);
                    if (v < lo || v > hi) {
                        continue;
                    }
                    boolean labelled = m == 1 || m == 3;
                    ticks.add(new org.jfree.chart.axis.LogTick(labelled ? org.jfree.chart.axis.TickType.MAJOR
                            : org.jfree.chart.axis.TickType.MINOR, v, labelled ? label(m, e) : null, anchor));
                }
            }
            return ticks;
        }

        /** {@code 10} with the exponent raised, after {@code m×} when m is not 1. */
        private java.text.AttributedString label(int m, int e) {
            String base = (m == 1 ? "" : m + "\u00d7") + "10";
            String exponent = Integer.toString(e).replace('-', '\u2212');
            java.text.AttributedString s = new java.text.AttributedString(base + exponent);
            s.addAttributes(getTickLabelFont().getAttributes(), 0, base.length() + exponent.length());
            s.addAttribute(java.awt.font.TextAttribute.SUPERSCRIPT, java.awt.font.TextAttribute.SUPERSCRIPT_SUPER,
                    base.length(), base.length() + exponent.length());
            return s;
        }
    }

    /** The gradient plot's styles without the one at {@code skip}: that series is absent. */
    private static void styleSkipping(XYPlot plot, int skip) {
        style(plot, 0, 5);
        XYLineAndShapeRenderer r = (XYLineAndShapeRenderer) plot.getRenderer(0);
        for (int s = skip; s < 4; s++) {
            r.setSeriesPaint(s, r.getSeriesPaint(s + 1));
            r.setSeriesStroke(s, r.getSeriesStroke(s + 1));
        }
    }

    /**
     * Colours and line styles, set after the theme (which would otherwise replace them). Each series is
     * drawn as one path: drawn segment by segment, a dash pattern starts again at every zone and a
     * dashed curve looks solid where zones are close.
     */
    private static void style(XYPlot plot, int index, int series) {
        XYLineAndShapeRenderer r = (XYLineAndShapeRenderer) plot.getRenderer(index);
        r.setDrawSeriesLineAsPath(true);
        Paint[] paints = {new Color(200, 30, 30), new Color(30, 30, 30), new Color(30, 110, 200),
            new Color(20, 150, 60), new Color(150, 60, 180)};
        Stroke[] strokes = {new BasicStroke(2.5f),
            new BasicStroke(2.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f, new float[] {10f, 6f}, 0f),
            new BasicStroke(2.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f, new float[] {3f, 4f}, 0f),
            new BasicStroke(3.5f),
            new BasicStroke(2.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f, new float[] {12f, 4f, 2f, 4f}, 0f)};
        if (series == 1) {
            r.setSeriesPaint(0, index == 0 ? new Color(200, 30, 30) : new Color(30, 110, 200));
            r.setSeriesStroke(0, index == 0 ? strokes[0] : strokes[1]);
            return;
        }
        for (int s = 0; s < series; s++) {
            r.setSeriesPaint(s, paints[s % paints.length]);
            r.setSeriesStroke(s, strokes[s % strokes.length]);
        }
    }

    private static JFreeChart chart(String title, XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(200, 200, 200));
        plot.setRangeGridlinePaint(new Color(200, 200, 200));
        JFreeChart chart = new JFreeChart(title, new Font(Font.SANS_SERIF, Font.BOLD, 24), plot, true);
        StandardChartTheme theme = (StandardChartTheme) StandardChartTheme.createJFreeTheme();
        theme.setExtraLargeFont(new Font(Font.SANS_SERIF, Font.BOLD, 24));
        theme.setLargeFont(new Font(Font.SANS_SERIF, Font.BOLD, 18));
        theme.setRegularFont(new Font(Font.SANS_SERIF, Font.PLAIN, 16));
        theme.setSmallFont(new Font(Font.SANS_SERIF, Font.PLAIN, 14));
        theme.setPlotBackgroundPaint(Color.WHITE);
        theme.setChartBackgroundPaint(Color.WHITE);
        theme.setDomainGridlinePaint(new Color(210, 210, 210));
        theme.setRangeGridlinePaint(new Color(210, 210, 210));
        theme.apply(chart);
        chart.getLegend().setPosition(RectangleEdge.BOTTOM);
        for (int i = 0; i < plot.getRangeAxisCount(); i++) {
            ValueAxis a = plot.getRangeAxis(i);
            if (a != null) {
                a.setTickLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 15));
            }
        }
        return chart;
    }

    /**
     * Where a region's edges lie on the x axis: r/R or the mass scales from the region's own fractions, the
     * pressure scale by interpolation between zones; edges at infinity (the centre or the surface on a mass
     * scale) at the axis's end.
     */
    private static double[] edges(ProfileDiagnosis d, Region region, PlotAxis axis, double[] xs, XYPlot plot) {
        double a;
        double b;
        switch (axis) {
            case RADIUS -> {
                a = region.bottomRadiusFraction();
                b = region.topRadiusFraction();
            }
            case PRESSURE -> {
                a = PlotAxis.atRadius(d, xs, region.bottomRadius());
                b = PlotAxis.atRadius(d, xs, region.topRadius());
            }
            default -> {
                a = axis.atMassFraction(region.bottomMassFraction());
                b = axis.atMassFraction(region.topMassFraction());
            }
        }
        ValueAxis x = plot.getDomainAxis();
        return new double[] {clamp(a, x), clamp(b, x)};
    }

    private static double clamp(double v, ValueAxis x) {
        return Double.isNaN(v) ? x.getLowerBound() : Math.max(x.getLowerBound(), Math.min(x.getUpperBound(), v));
    }

    /** Shades each non-radiative region and adds one legend entry per regime shown. */
    private static void shadeRegions(ProfileDiagnosis d, XYPlot plot, PlotAxis axis, double[] xs) {
        Set<Regime> shown = EnumSet.noneOf(Regime.class);
        boolean overshot = false;
        for (Region region : d.regions()) {
            if (region.regime() == Regime.RADIATIVE) {
                continue;
            }
            double[] e = edges(d, region, axis, xs, plot);
            IntervalMarker m = new IntervalMarker(Math.min(e[0], e[1]), Math.max(e[0], e[1]));
            m.setPaint(SHADE.get(region.regime()));
            m.setOutlinePaint(null);
            plot.addDomainMarker(m, Layer.BACKGROUND);
            shown.add(region.regime());
            overshot |= shadeOvershoot(d, plot, axis, xs, region.overshootBottom(), region.bottomRadius(), e[0]);
            overshot |= shadeOvershoot(d, plot, axis, xs, region.overshootTop(), region.topRadius(), e[1]);
        }
        LegendItemCollection items = new LegendItemCollection();
        LegendItemCollection series = plot.getLegendItems();
        for (int i = 0; i < series.getItemCount(); i++) {
            items.add(series.get(i));
        }
        for (Regime regime : shown) {
            Color c = SHADE.get(regime);
            LegendItem item = new LegendItem(regime.label() + " region", null, null, null,
                    new Rectangle(-8, -8, 16, 16), new Color(c.getRed(), c.getGreen(), c.getBlue(), 140));
            items.add(item);
        }
        if (overshot) {
            items.add(new LegendItem("overshoot mixing", null, null, null, new Rectangle(-8, -8, 16, 16),
                    new Color(OVERSHOOT_SHADE.getRed(), OVERSHOOT_SHADE.getGreen(), OVERSHOOT_SHADE.getBlue(), 140)));
        }
        plot.setFixedLegendItems(items);
    }

    /**
     * Shades the layer between an edge (already placed on the x axis) and the point where overshoot mixing
     * beyond it ends, placed by its radius.
     *
     * @return whether anything was shaded (an edge with overshoot of non-zero extent)
     */
    private static boolean shadeOvershoot(ProfileDiagnosis d, XYPlot plot, PlotAxis axis, double[] xs,
                                          java.util.OptionalDouble reach, double edge, double edgeOnAxis) {
        if (reach.isEmpty() || reach.getAsDouble() == edge) {
            return false;
        }
        ValueAxis x = plot.getDomainAxis();
        double a = edgeOnAxis;
        double b = clamp(onAxis(d, axis, xs, reach.getAsDouble()), x);
        if (a == b) {
            return false;
        }
        IntervalMarker m = new IntervalMarker(Math.min(a, b), Math.max(a, b));
        m.setPaint(OVERSHOOT_SHADE);
        m.setOutlinePaint(null);
        plot.addDomainMarker(m, Layer.BACKGROUND);
        return true;
    }

    /** A point given by its radius on the x axis: r/R directly, otherwise between the zones either side. */
    private static double onAxis(ProfileDiagnosis d, PlotAxis axis, double[] xs, double radius) {
        return axis == PlotAxis.RADIUS ? radius / d.radius() : PlotAxis.atRadius(d, xs, radius);
    }

    private static void note(JFreeChart chart, int hidden, String what) {
        if (hidden > 0) {
            chart.addSubtitle(subtitle(hidden + " " + what + " not drawn on the logarithmic axis"));
        }
    }

    private static TextTitle subtitle(String text) {
        TextTitle t = new TextTitle(text, new Font(Font.SANS_SERIF, Font.ITALIC, 15));
        t.setPaint(new Color(90, 90, 90));
        return t;
    }

    /**
     * A logarithmic axis for ranges of a few decades, labelled at 1, 2 and 5 times each power of
     * ten, so that a reader can read values off a range narrower than two decades.
     */
    static final class OneTwoFiveLogAxis extends LogarithmicAxis {
        private static final long serialVersionUID = 1L;

        OneTwoFiveLogAxis(String label) {
            super(label);
        }

        @Override
        protected java.util.List<org.jfree.chart.axis.NumberTick> refreshTicksVertical(java.awt.Graphics2D g2,
                java.awt.geom.Rectangle2D dataArea, org.jfree.chart.ui.RectangleEdge edge) {
            java.util.List<org.jfree.chart.axis.NumberTick> ticks = new java.util.ArrayList<>();
            double lo = getLowerBound();
            double hi = getUpperBound();
            org.jfree.chart.ui.TextAnchor anchor = edge == org.jfree.chart.ui.RectangleEdge.LEFT
                    ? org.jfree.chart.ui.TextAnchor.CENTER_RIGHT : org.jfree.chart.ui.TextAnchor.CENTER_LEFT;
            for (int e = (int) Math.floor(Math.log10(lo)); e <= (int) Math.ceil(Math.log10(hi)); e++) {
                for (int m = 1; m <= 9; m++) {
                    double v = m * Math.pow(10, e);
                    if (v < lo || v > hi) {
                        continue;
                    }
                    boolean labelled = m == 1 || m == 2 || m == 5;
                    String text = labelled ? new java.text.DecimalFormat("0.###E0").format(v)
                            .replace("E0", "") : "";
                    if (labelled && e >= -3 && e <= 3) {
                        text = java.math.BigDecimal.valueOf(v).round(new java.math.MathContext(1)).stripTrailingZeros()
                                .toPlainString();
                    }
                    ticks.add(new org.jfree.chart.axis.NumberTick(
                            labelled ? org.jfree.chart.axis.TickType.MAJOR : org.jfree.chart.axis.TickType.MINOR,
                            v, text, anchor, anchor, 0.0));
                }
            }
            return ticks;
        }
    }
}
