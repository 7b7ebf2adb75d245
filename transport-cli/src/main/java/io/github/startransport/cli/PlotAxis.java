package io.github.startransport.cli;

import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What the diagnosis plots put along the star ({@code --x-axis}), always centre on the left.
 *
 * <p>r/R squeezes a surface convection zone a few per cent of R deep into a sliver, and
 * log10(1 - m/M) or log10 P squeeze a convective core into a few per cent of the axis; the
 * default, {@link #MASS}, is the mass fraction q = m/M on the scale log10(q / (1 - q)), which
 * stretches both ends (near the centre it is log10 q, near the surface -log10(1 - q)) and is
 * labelled in q itself. The surface zone (q = 1 exactly) is at infinity on the mass scales and is
 * not drawn.
 */
enum PlotAxis {
    /** m/M on the scale log10(q / (1 - q)). */
    MASS("mass"),
    /** r/R, linear. */
    RADIUS("radius"),
    /** log10(1 - m/M), the mass above a point over the star's mass. */
    DEPTH("depth"),
    /** log10 P (P in dyn cm^-2). */
    PRESSURE("pressure");

    private final String label;

    PlotAxis(String label) {
        this.label = label;
    }

    /** @return the name on the command line */
    String label() {
        return label;
    }

    /** picocli converter for {@code --x-axis}. */
    static final class Converter implements picocli.CommandLine.ITypeConverter<PlotAxis> {
        @Override
        public PlotAxis convert(String value) {
            for (PlotAxis a : values()) {
                if (a.label.equalsIgnoreCase(value.trim())) {
                    return a;
                }
            }
            throw new picocli.CommandLine.TypeConversionException("'" + value + "' is not a plot axis; expected mass,"
                    + " radius, depth or pressure");
        }
    }

    /**
     * @param q mass fraction m/M
     * @return log10(q / (1 - q)); -infinity at q = 0, +infinity at q = 1
     */
    static double stretched(double q) {
        return Math.log10(q) - Math.log10(1.0 - q);
    }

    /**
     * @param d a diagnosis
     * @return every zone's coordinate on this axis (not finite where a zone lies at infinity)
     */
    double[] of(ProfileDiagnosis d) {
        switch (this) {
            case RADIUS -> {
                double[] r = d.column(DiagnosisColumn.RADIUS);
                double big = d.radius();
                for (int k = 0; k < r.length; k++) {
                    r[k] /= big;
                }
                return r;
            }
            case PRESSURE -> {
                double[] p = d.column(DiagnosisColumn.PRESSURE);
                for (int k = 0; k < p.length; k++) {
                    p[k] = Math.log10(p[k]);
                }
                return p;
            }
            default -> {
                double[] m = d.column(DiagnosisColumn.MASS);
                double big = d.mass();
                for (int k = 0; k < m.length; k++) {
                    m[k] = atMassFraction(m[k] / big);
                }
                return m;
            }
        }
    }

    /**
     * @param q a mass fraction m/M in [0, 1]
     * @return its coordinate on a mass axis ({@link #MASS} or {@link #DEPTH}), possibly infinite
     */
    double atMassFraction(double q) {
        return this == DEPTH ? Math.log10(1.0 - q) : stretched(q);
    }

    /**
     * The coordinate of a point given by its radius (a region's edge), placed between the zones
     * either side by linear interpolation in r of their coordinates; outside the zones, the
     * nearest zone's. Radius and mass-fraction coordinates of region edges should be taken
     * directly instead, where known.
     *
     * @param d      the diagnosis
     * @param x      every zone's coordinate ({@link #of})
     * @param radius r (cm)
     * @return the coordinate
     */
    static double atRadius(ProfileDiagnosis d, double[] x, double radius) {
        int n = d.size();
        if (radius <= d.value(DiagnosisColumn.RADIUS, 0)) {
            return x[0];
        }
        if (radius >= d.value(DiagnosisColumn.RADIUS, n - 1)) {
            return x[n - 1];
        }
        int lo = 0;
        int hi = n - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (d.value(DiagnosisColumn.RADIUS, mid) <= radius) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double r0 = d.value(DiagnosisColumn.RADIUS, lo);
        double r1 = d.value(DiagnosisColumn.RADIUS, hi);
        double f = (radius - r0) / (r1 - r0);
        if (!Double.isFinite(x[hi])) {
            return x[lo];
        }
        return x[lo] + f * (x[hi] - x[lo]);
    }

    /**
     * @param x every zone's coordinate
     * @return the axis: range over the finite coordinates, centre on the left, with its title and ticks
     */
    ValueAxis axis(double[] x) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : x) {
            if (Double.isFinite(v)) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        if (!(hi > lo)) {
            lo = Double.isFinite(lo) ? lo - 1 : 0;
            hi = lo + 2;
        }
        switch (this) {
            case RADIUS -> {
                NumberAxis a = new NumberAxis("fractional radius r / R (dimensionless)");
                a.setRange(0.0, 1.0);
                return a;
            }
            case PRESSURE -> {
                NumberAxis a = new NumberAxis("log\u2081\u2080 (P / dyn cm\u207b\u00b2), centre on the left");
                a.setInverted(true);
                a.setRange(lo, hi);
                return a;
            }
            case DEPTH -> {
                NumberAxis a = new NumberAxis("log\u2081\u2080 (1 \u2212 m / M), mass above the point over M"
                        + " (the surface zone, m = M, is off the scale)");
                a.setInverted(true);
                double pad = 0.01 * (hi - lo);
                a.setRange(lo - pad, hi);
                return a;
            }
            default -> {
                MassAxis a = new MassAxis("mass fraction m / M, on a scale that stretches the centre and the"
                        + " surface: log\u2081\u2080 (m / (M \u2212 m))");
                double pad = 0.01 * (hi - lo);
                a.setRange(lo - pad, hi + pad);
                return a;
            }
        }
    }

    /** The {@link #MASS} axis: ticks at round mass fractions (1e-4, 0.01, 0.5, 0.99, 1 - 1e-6, ...). */
    static final class MassAxis extends NumberAxis {
        private static final long serialVersionUID = 1L;

        MassAxis(String label) {
            super(label);
        }

        /**
         * @param lo lowest coordinate shown
         * @param hi highest coordinate shown
         * @return the mass fractions to label, each with its text
         */
        static List<Object[]> ticks(double lo, double hi) {
            List<Object[]> all = new ArrayList<>();
            for (int k = 15; k >= 1; k--) {
                double q = Math.pow(10, -k);
                all.add(new Object[] {q, k <= 3 ? String.format(Locale.ROOT, "%." + k + "f", q) : "1e-" + k});
            }
            all.add(new Object[] {0.5, "0.5"});
            for (int k = 1; k <= 15; k++) {
                double q = 1.0 - Math.pow(10, -k);
                all.add(new Object[] {q, k <= 3 ? String.format(Locale.ROOT, "%." + k + "f", q)
                        : "1 \u2212 1e-" + k});
            }
            List<Object[]> in = new ArrayList<>();
            for (Object[] t : all) {
                double x = stretched((Double) t[0]);
                if (x >= lo && x <= hi) {
                    in.add(t);
                }
            }
            // at most ~12 labels: drop every other decade, keeping 0.5, while there are too many
            int step = 1;
            while (in.size() / step > 12) {
                step++;
            }
            List<Object[]> out = new ArrayList<>();
            for (int i = 0; i < in.size(); i++) {
                double q = (Double) in.get(i)[0];
                if (q == 0.5 || i % step == 0) {
                    out.add(in.get(i));
                }
            }
            return out;
        }

        @Override
        protected List<NumberTick> refreshTicksHorizontal(Graphics2D g2, Rectangle2D dataArea, RectangleEdge edge) {
            List<NumberTick> ticks = new ArrayList<>();
            for (Object[] t : ticks(getLowerBound(), getUpperBound())) {
                ticks.add(new NumberTick(TickType.MAJOR, stretched((Double) t[0]), (String) t[1], TextAnchor.TOP_CENTER,
                        TextAnchor.CENTER, 0.0));
            }
            return ticks;
        }
    }
}
