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
     * walk from the centre first reaches distance R after a mean time R^2 / (6 D) = R^2 / (2 l c) for
     * uniform l (kappa rho R^2 / (2c), tested), and the local form dt = r dr / (l c) generalises it to
     * variable opacity (Hansen, Kawaler &amp; Trimble 2004 §1.3, from memory). Trapezoidal rule on the zones.
     *
     * <p><b>Definitions differ.</b> Published solar figures span ~1e4 to ~1e6 yr because the definitions
     * do: counting (R/l)^2 steps of length l (a 1-D walk) doubles this value, the 1-D diffusion law
     * &lt;x^2&gt; = 2 D t with the 3-D D triples it, and the opacity profile adopted changes it as much.
     * Mitalas &amp; Sills (1992, ApJ 401, 759) give ~1.7e5 yr for the Sun (figure from memory; we have not
     * checked their definition against this one). With the default analytic opacity this formula gives
     * 7.2e4 yr for the Sun built as an n = 3 polytrope ({@code EddingtonStandardModel}, 1 M_sun, 1 R_sun,
     * 1 L_sun, X = 0.7, Z = 0.02) and 3.1e4 yr for the demo star.
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
     * from memory; about 3e7 yr for the Sun): the time the star's gravitational energy lasts at its
     * luminosity. It has no meaning for L &lt;= 0 (a star that loses no energy at its surface: the
     * formula would give a negative or infinite time), so it is NaN there.
     *
     * @param mass       M (g)
     * @param radius     R (cm)
     * @param luminosity L at the surface (erg s^-1)
     * @return t_KH (s), or NaN when {@code luminosity} is not &gt; 0
     */
    public static double kelvinHelmholtz(double mass, double radius, double luminosity) {
        if (!(luminosity > 0.0)) {
            return Double.NaN;
        }
        return Codata2018.GRAVITATIONAL_CONSTANT * mass * mass / (radius * luminosity);
    }

    /**
     * Global convective turnover time of a region that does not reach the centre (an envelope or a
     * shell): the integral of dr / v_conv from its bottom to its top (Gilliland 1985, ApJ 299, 286;
     * Kim &amp; Demarque 1996, ApJ 457, 340; from memory). Each zone k of the region owns the interval
     * between the midpoints to its neighbours, clipped to [bottom, top], and contributes width / v_k.
     * Zones with v = 0 contribute nothing. The integral converges at a Schwarzschild boundary, where
     * v ~ (r - r_b)^(1/3) in efficient convection; it diverges at the centre of a core (there l =
     * alpha r and v -&gt; 0 like r): use {@link #turnoverCore} for a region that reaches the centre.
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
     * Local convective turnover time l / v_conv half a mixing length inside the region from its
     * boundary with the radiative interior: at r_b + l(r_b) / 2 above the bottom of an envelope or
     * shell (Kim &amp; Demarque 1996, ApJ 457, 340, who follow Gilliland 1985; from memory), and, for a
     * region that reaches the centre (a core), at r_t - l(r_t) / 2 below its top (our mirror of that
     * rule: the core's boundary with the radiative envelope is its top). Where that point falls
     * outside the region (a region thinner than half a mixing length) the region's middle is used.
     * l, and v are interpolated linearly in r between zones; l at the boundary is that of the
     * nearest zone of the region.
     *
     * @param r      radius (cm), increasing
     * @param l      mixing length (cm)
     * @param v      convective velocity (cm s^-1)
     * @param first  innermost zone of the region
     * @param last   outermost zone of the region
     * @param bottom region bottom (cm); 0 for a core
     * @param top    region top (cm)
     * @return l / v (s), or 0 when v vanishes there
     */
    public static double turnoverLocal(double[] r, double[] l, double[] v, int first, int last,
                                       double bottom, double top) {
        double at = bottom > 0.0 ? bottom + 0.5 * interpolate(r, l, bottom, first, last)
                : top - 0.5 * interpolate(r, l, top, first, last);
        if (!(at > bottom && at < top)) {
            at = 0.5 * (bottom + top);
        }
        double vAt = interpolate(r, v, at, first, last);
        if (!(vAt > 0.0)) {
            return 0.0;
        }
        return interpolate(r, l, at, first, last) / vAt;
    }

    /**
     * Global turnover time of a convective core: its radius over its mass-weighted mean convective
     * velocity, tau = r_top / &lt;v&gt;_m with &lt;v&gt;_m = (1 / m_top) integral_0^m_top v dm.
     *
     * <p>The integral of dr / v used for envelopes ({@link #turnoverGlobal}) diverges at the centre of a
     * core, where the mixing length alpha min(H_P, r) and the velocity vanish together (the demo core
     * gave 152, 174, 197, 220 and 242 d at 200-3200 zones, growing by a constant step per doubling:
     * a logarithmic divergence). The mass-weighted mean velocity weights the centre by its small mass
     * and converges. Our definition for cores (common practice to average a core's velocity over mass;
     * no source); for a region with uniform v it equals the envelope integral r_top / v.
     *
     * <p>Each zone k owns the mass between the midpoints to its neighbours (from 0 for zone 0, to
     * {@code topMass} for the last zone): midpoint rule in m.
     *
     * @param m       mass (g), increasing
     * @param v       convective velocity (cm s^-1)
     * @param last    outermost zone of the core (its innermost is zone 0)
     * @param top     core radius (cm)
     * @param topMass core mass (g)
     * @return the turnover time (s); 0 when no zone moves
     */
    public static double turnoverCore(double[] m, double[] v, int last, double top, double topMass) {
        double sum = 0.0;
        for (int k = 0; k <= last; k++) {
            double lo = k == 0 ? 0.0 : 0.5 * (m[k - 1] + m[k]);
            double hi = k == last ? topMass : 0.5 * (m[k] + m[k + 1]);
            sum += Math.max(0.0, hi - lo) * Math.max(0.0, v[k]);
        }
        return sum > 0.0 ? top * topMass / sum : 0.0;
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
