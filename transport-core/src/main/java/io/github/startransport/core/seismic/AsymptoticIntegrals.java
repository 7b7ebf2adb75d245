package io.github.startransport.core.seismic;

/**
 * Whole-model integrals of the asymptotic theory of stellar oscillations over a profile given
 * centre to surface (the centre itself, r = 0, is not a zone).
 *
 * <p>Sources (relations from memory, equation numbers not given): Tassoul (1980, ApJS 43, 469)
 * for the first-order asymptotics of p and g modes; Aerts, Christensen-Dalsgaard &amp; Kurtz (2010,
 * Asteroseismology, §3.4): the large separation Delta nu = (2 integral_0^R dr / c_s)^-1, the
 * period spacing of degree l, Delta Pi_l = 2 pi^2 / sqrt(l (l + 1)) (integral N / r dr)^-1 over
 * the g-mode cavity (N^2 &gt; 0), and the acoustic depth of a radius, integral_r^R dr / c_s.
 *
 * <p>Integrals are trapezoidal in r between zones (second order); from the centre to the first
 * zone the integrand is taken constant at its first-zone value (1 / c_s tends to a constant,
 * N / r too where N vanishes linearly at the centre).
 */
public final class AsymptoticIntegrals {
    private AsymptoticIntegrals() {
    }

    /**
     * @param r  radius of each zone (cm), increasing, r[0] &gt; 0
     * @param cs sound speed of each zone (cm s^-1), &gt; 0
     * @return the acoustic radius integral_0^R dr / c_s (s)
     */
    public static double acousticRadius(double[] r, double[] cs) {
        double sum = r[0] / cs[0];
        for (int k = 1; k < r.length; k++) {
            sum += 0.5 * (r[k] - r[k - 1]) * (1.0 / cs[k] + 1.0 / cs[k - 1]);
        }
        return sum;
    }

    /**
     * @param r  radius of each zone (cm), increasing, r[0] &gt; 0
     * @param cs sound speed of each zone (cm s^-1), &gt; 0
     * @param at a radius in [0, R] (cm)
     * @return the acoustic depth integral_at^R dr / c_s (s), with 1 / c_s linear in r between zones
     */
    public static double acousticDepth(double[] r, double[] cs, double at) {
        int n = r.length;
        double sum = 0.0;
        for (int k = n - 1; k >= 1; k--) {
            if (r[k - 1] >= at) {
                sum += 0.5 * (r[k] - r[k - 1]) * (1.0 / cs[k] + 1.0 / cs[k - 1]);
                continue;
            }
            if (r[k] > at) {
                double w = (at - r[k - 1]) / (r[k] - r[k - 1]);
                double inv = 1.0 / cs[k - 1] + w * (1.0 / cs[k] - 1.0 / cs[k - 1]);
                sum += 0.5 * (r[k] - at) * (1.0 / cs[k] + inv);
            }
            return sum;
        }
        return sum + Math.max(0.0, r[0] - at) / cs[0];
    }

    /**
     * @param r  radius of each zone (cm), increasing, r[0] &gt; 0
     * @param n2 N^2 of each zone (rad^2 s^-2)
     * @return integral N / r dr over the zones with N^2 &gt; 0 (N taken 0 elsewhere) (rad s^-1)
     */
    public static double buoyancyIntegral(double[] r, double[] n2) {
        double sum = r[0] * buoyancyOverR(r, n2, 0);
        for (int k = 1; k < r.length; k++) {
            sum += 0.5 * (r[k] - r[k - 1]) * (buoyancyOverR(r, n2, k) + buoyancyOverR(r, n2, k - 1));
        }
        return sum;
    }

    private static double buoyancyOverR(double[] r, double[] n2, int k) {
        return n2[k] > 0.0 ? Math.sqrt(n2[k]) / r[k] : 0.0;
    }

    /**
     * @param acousticRadius integral_0^R dr / c_s (s)
     * @return Delta nu = 1 / (2 acousticRadius) (Hz)
     */
    public static double largeSeparation(double acousticRadius) {
        return 0.5 / acousticRadius;
    }

    /**
     * @param degree   l &gt;= 1
     * @param integral integral N / r dr over the g-mode cavity (rad s^-1)
     * @return Delta Pi_l = 2 pi^2 / sqrt(l (l + 1)) / integral (s); NaN when the integral is 0
     */
    public static double periodSpacing(int degree, double integral) {
        if (!(integral > 0.0)) {
            return Double.NaN;
        }
        return 2.0 * Math.PI * Math.PI / Math.sqrt(degree * (degree + 1.0)) / integral;
    }
}
