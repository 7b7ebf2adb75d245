package io.github.startransport.core.timescale;

import io.github.startransport.core.constants.Codata2018;

/**
 * Whole-star and per-region timescales from profile columns (cgs, seconds). Static kernels over
 * arrays ordered centre to surface; the centre (r = 0) is not a zone, and integrals from the
 * centre add the segment [0, r_0] with the integrand's centre value (zero for the diffusion
 * integrals, whose integrands carry a factor r).
 */
public final class Timescale {
    private Timescale() {
    }

    /**
     * Photon random-walk (diffusion) time out of the star,
     * t_gamma = (1/c) integral_0^R kappa rho r dr.
     *
     * <p>A photon with mean free path l = 1/(kappa rho) diffuses with D = l c / 3; a 3-D random
     * walk reaches distance R after &lt;r^2&gt; = 6 D t, so t = R^2 / (2 l c) for uniform l, and
     * the local form dt = r dr / (l c) generalises it to variable opacity (Mitalas &amp; Sills 1992,
     * ApJ 401, 759, whose solar estimate is ~1.7e5 yr, from memory; Hansen, Kawaler &amp; Trimble
     * 2004 §1.3). Trapezoidal rule on the zones.
     *
     * @param r     radius (cm), increasing
     * @param kappa opacity (cm^2 g^-1)
     * @param rho   density (g cm^-3)
     * @return t_gamma (s)
     */
    public static double photonDiffusion(double[] r, double[] kappa, double[] rho) {
        double sum = 0.5 * r[0] * (kappa[0] * rho[0] * r[0]);
        for (int k = 1; k < r.length; k++) {
            double fa = kappa[k - 1] * rho[k - 1] * r[k - 1];
            double fb = kappa[k] * rho[k] * r[k];
            sum += 0.5 * (r[k] - r[k - 1]) * (fa + fb);
        }
        return sum / Codata2018.SPEED_OF_LIGHT;
    }

    /**
     * Radiative heat-diffusion time: the same random walk as {@link #photonDiffusion} with the
     * photon diffusivity l c / 3 replaced by the thermal diffusivity
     * chi = 4 a c T^3 / (3 kappa rho^2 c_P) (Kippenhahn, Weigert &amp; Weiss 2012 §5.1, from memory),
     * t_th = integral_0^R r / (3 chi) dr = integral_0^R kappa rho^2 c_P r / (4 a c T^3) dr.
     * It exceeds t_gamma by the ratio of the gas's heat content to the radiation's,
     * rho c_P T / (a T^4), which is why heat leaks out far more slowly than photons random-walk
     * (Stix 2003, Sol. Phys. 212, 3).
     *
     * @param r     radius (cm), increasing
     * @param kappa opacity (cm^2 g^-1)
     * @param rho   density (g cm^-3)
     * @param t     temperature (K)
     * @param cp    c_P (erg g^-1 K^-1)
     * @return t_th (s)
     */
    public static double thermalDiffusion(double[] r, double[] kappa, double[] rho, double[] t, double[] cp) {
        double sum = 0.5 * r[0] * thermalIntegrand(r[0], kappa[0], rho[0], t[0], cp[0]);
        for (int k = 1; k < r.length; k++) {
            double fa = thermalIntegrand(r[k - 1], kappa[k - 1], rho[k - 1], t[k - 1], cp[k - 1]);
            double fb = thermalIntegrand(r[k], kappa[k], rho[k], t[k], cp[k]);
            sum += 0.5 * (r[k] - r[k - 1]) * (fa + fb);
        }
        return sum;
    }

    private static double thermalIntegrand(double r, double kappa, double rho, double t, double cp) {
        return kappa * rho * rho * cp * r
                / (4.0 * Codata2018.RADIATION_CONSTANT * Codata2018.SPEED_OF_LIGHT * t * t * t);
    }

    /**
     * Kelvin-Helmholtz time t_KH = G M^2 / (R L) (Kippenhahn, Weigert &amp; Weiss 2012 eq. 3.18,
     * from memory; about 3e7 yr for the Sun).
     *
     * @param mass       M (g)
     * @param radius     R (cm)
     * @param luminosity L (erg s^-1)
     * @return t_KH (s)
     */
    public static double kelvinHelmholtz(double mass, double radius, double luminosity) {
        return Codata2018.GRAVITATIONAL_CONSTANT * mass * mass / (radius * luminosity);
    }

    /**
     * Global convective turnover time of a region, integral of dr / v_conv from its bottom to its
     * top (Gilliland 1985; Kim &amp; Demarque 1996, ApJ 457, 340; from memory). Each zone k of the
     * region owns the interval between the midpoints to its neighbours, clipped to [bottom, top],
     * and contributes width / v_k. Zones with v = 0 contribute nothing.
     *
     * @param r      radius (cm), increasing
     * @param v      convective velocity (cm s^-1)
     * @param first  innermost zone of the region
     * @param last   outermost zone of the region
     * @param bottom region bottom (cm)
     * @param top    region top (cm)
     * @return the turnover time (s); 0 when no zone moves
     */
    public static double turnoverGlobal(double[] r, double[] v, int first, int last, double bottom, double top) {
        double sum = 0.0;
        for (int k = first; k <= last; k++) {
            if (!(v[k] > 0.0)) {
                continue;
            }
            double lo = k == first ? bottom : 0.5 * (r[k - 1] + r[k]);
            double hi = k == last ? top : 0.5 * (r[k] + r[k + 1]);
            sum += Math.max(0.0, hi - lo) / v[k];
        }
        return sum;
    }

    /**
     * Local convective turnover time l / v_conv at half a pressure scale height above the region's
     * bottom, r_b + H_P(r_b)/2 (Kim &amp; Demarque 1996, from memory). Where that point lies above
     * the region's top (a thin region, or a core whose H_P diverges at the centre) the region's
     * middle is used. l and v are interpolated linearly in r between zones.
     *
     * @param r      radius (cm), increasing
     * @param hp     pressure scale height (cm)
     * @param l      mixing length (cm)
     * @param v      convective velocity (cm s^-1)
     * @param first  innermost zone of the region
     * @param last   outermost zone of the region
     * @param bottom region bottom (cm)
     * @param top    region top (cm)
     * @return l / v (s), or 0 when v vanishes there
     */
    public static double turnoverLocal(double[] r, double[] hp, double[] l, double[] v, int first, int last,
                                       double bottom, double top) {
        double hpBottom = interpolate(r, hp, bottom, first, last);
        double at = bottom + 0.5 * hpBottom;
        if (!(at < top)) {
            at = 0.5 * (bottom + top);
        }
        double vAt = interpolate(r, v, at, first, last);
        if (!(vAt > 0.0)) {
            return 0.0;
        }
        return interpolate(r, l, at, first, last) / vAt;
    }

    /** Linear interpolation of y(r) at x using zones first..last, constant beyond them. */
    static double interpolate(double[] r, double[] y, double x, int first, int last) {
        if (x <= r[first]) {
            return y[first];
        }
        if (x >= r[last]) {
            return y[last];
        }
        int k = first;
        while (r[k + 1] < x) {
            k++;
        }
        double w = (x - r[k]) / (r[k + 1] - r[k]);
        return y[k] + w * (y[k + 1] - y[k]);
    }
}
