package io.github.startransport.core.convection;

/**
 * The convective flux of the full spectrum of turbulent eddies, after Canuto &amp; Mazzitelli (1991, ApJ 370,
 * 295; "CM91" below), and the root of the flux equation it gives.
 *
 * <p><b>The fit.</b> CM91 write the convective flux as F_conv = K (T / H_P) (nabla - nabla_ad) Phi(S), with
 * K = 4 a c T^3 / (3 kappa rho) the radiative conductivity, and fit their numerical Phi by
 * <pre>
 *   Phi(S) = a S^k [(1 + b S)^m - 1]^n,   a = 24.868, b = 0.097666, k = 0.14972, m = 0.18931, n = 1.8503
 * </pre>
 * (constants and form from memory: the paper could not be consulted here, and its equation number is not
 * given for that reason). Two checks of the remembered constants: k + n = 2.0000 and k + m n = 0.5000, the
 * exponents of the two limits every local theory shares (Phi proportional to S^2 for inefficient and to
 * S^(1/2) for efficient convection; the mixing-length Phi of {@link #mixingLengthPhi} has both). The
 * efficiency variable is S = (81/2) Sigma with Sigma = 4 A^2 (nabla - nabla_ad) and A the efficiency
 * factor of Cox &amp; Giuli (1968, ch. 14) with the mixing length Lambda, A = 1 / (2U) in the U of
 * Kippenhahn, Weigert &amp; Weiss (2012, ch. 7), so that S = 162 A^2 (nabla - nabla_ad) =
 * 40.5 (nabla - nabla_ad) / U^2.
 *
 * <p><b>The flux equation.</b> With F_rad = K (T / H_P) nabla and F = K (T / H_P) nabla_rad, flux
 * conservation reads nabla_rad - nabla = Phi(S) (nabla - nabla_ad). Multiplying by 40.5 / U^2:
 * <pre>
 *   S (1 + Phi(S)) = R,   R = 40.5 W / U^2,   W = nabla_rad - nabla_ad,
 * </pre>
 * whose left side increases from 0 to infinity, so there is one root S &gt; 0 for every R &gt; 0. With
 * mixing-length theory's Phi it is exactly the cubic of {@link MixingLengthCubic} (S = 162 Gamma (Gamma + 1),
 * R = 162 A^2 W). It is solved in sigma = ln S against rho = ln R, where h(sigma) = sigma + ln(1 + Phi) - rho
 * has slope h' = 1 + phi' Phi / (1 + Phi) between 1 and 3 (phi' = d ln Phi / d ln S lies between k + m n = 0.5 and k + n = 2.00002):
 * a start from a table of the root (cubic Hermite in rho on nodes 1/16 apart, node values and slopes
 * 1 / h' exact; within ~1e-8 of the root), then one Newton step with the residual taken as
 * S (1 + Phi) / R - 1, which brings it to ~1e-14 relative. Outside the table (R below 1e-17 or above 5e34)
 * a safeguarded Newton iteration starts from the asymptotes. The derivative of the root is implicit:
 * d sigma = d rho / h'.
 *
 * <p>Evaluation of Phi without cancellation: (1 + x)^m - 1 for x = b S below 1/8 by its binomial series (18
 * terms, to rounding), above by exp(m ln(1 + x)) - 1, whose value is then at least 0.0225, so that the
 * subtraction loses at most a factor 50 of relative precision. Pure static kernels, no allocation.
 */
public final class SpectrumFlux {
    private SpectrumFlux() {
    }

    /** a of the fit (CM91, from memory). */
    public static final double A = 24.868;
    /** b of the fit (CM91, from memory). */
    public static final double B = 0.097666;
    /** k of the fit (CM91, from memory). */
    public static final double K = 0.14972;
    /** m of the fit (CM91, from memory). */
    public static final double M = 0.18931;
    /** n of the fit (CM91, from memory). */
    public static final double N = 1.8503;

    /** S / (nabla - nabla_ad) per 1 / U^2: S = 40.5 (nabla - nabla_ad) / U^2 (81/2 times 4 A^2, A = 1/(2U)). */
    public static final double S_PER_EXCESS = 40.5;

    /** Inefficient limit: Phi -&gt; a (m b)^n S^(k + n) as S -&gt; 0 (from the fit). */
    public static final double INEFFICIENT_COEFFICIENT = A * Math.pow(M * B, N);
    /** Efficient limit: Phi -&gt; a b^(m n) S^(k + m n) as S -&gt; infinity (from the fit). */
    public static final double EFFICIENT_COEFFICIENT = A * Math.pow(B, M * N);

    private static final double LN_A = Math.log(A);
    /** Below this x = b S, (1 + x)^m - 1 by its series. */
    private static final double SERIES_LIMIT = 0.125;
    /** Binomial coefficients C(m, j), j = 1..18, of (1 + x)^m - 1. */
    private static final double[] SERIES = binomial(18);

    /** Table of the root: rho = ln R from RHO_LO in steps of 1/16. */
    static final double RHO_LO = -40.0;
    static final double RHO_HI = 80.0;
    private static final double STEPS_PER_UNIT = 16.0;
    private static final int NODES = (int) Math.round((RHO_HI - RHO_LO) * STEPS_PER_UNIT) + 1;
    /** sigma_i, d sigma / d rho at node i, interleaved. */
    private static final double[] TABLE = table();

    private static double[] binomial(int terms) {
        double[] c = new double[terms];
        double term = 1.0;
        for (int j = 1; j <= terms; j++) {
            term *= (M - (j - 1)) / j;
            c[j - 1] = term;
        }
        return c;
    }

    /**
     * Phi(S) straight from the fit's formula, for tests and tables (Math.pow, with the subtraction as written).
     *
     * @param s S (dimensionless), &gt; 0
     * @return Phi(S) (dimensionless)
     */
    public static double phiAsWritten(double s) {
        return A * Math.pow(s, K) * Math.pow(Math.pow(1.0 + B * s, M) - 1.0, N);
    }

    /**
     * The mixing-length theory's Phi in CM91's variables (their comparison; from memory), which the flux
     * equation turns into the cubic of {@link MixingLengthCubic}: Phi_MLT = (729/16) S^-1 [(1 + 2S/81)^(1/2) - 1]^3.
     *
     * @param s S (dimensionless), &gt; 0
     * @return Phi_MLT(S) (dimensionless)
     */
    public static double mixingLengthPhi(double s) {
        double root = Math.sqrt(1.0 + 2.0 * s / 81.0) - 1.0;
        return 729.0 / 16.0 / s * root * root * root;
    }

    /** (1 + x)^m - 1 for x &gt;= 0, without cancellation. */
    static double excess(double x) {
        if (x < SERIES_LIMIT) {
            double[] c = SERIES;
            double p = c[c.length - 1];
            for (int j = c.length - 2; j >= 0; j--) {
                p = Math.fma(p, x, c[j]);
            }
            return p * x;
        }
        return Math.exp(M * Math.log(1.0 + x)) - 1.0;
    }

    /**
     * Phi(S) by the evaluation the solver uses (no cancellation).
     *
     * @param s S (dimensionless), &gt; 0
     * @return Phi(S) (dimensionless)
     */
    public static double phi(double s) {
        double q = excess(B * s);
        return Math.exp(LN_A + K * Math.log(s) + N * Math.log(q));
    }

    /**
     * phi' = d ln Phi / d ln S = k + n m x (1 + x)^(m - 1) / ((1 + x)^m - 1), x = b S.
     *
     * @param s S (dimensionless), &gt; 0
     * @return d ln Phi / d ln S (dimensionless), between 1/2 and 2
     */
    public static double logSlope(double s) {
        double x = B * s;
        double q = excess(x);
        return K + N * M * x * (1.0 + q) / ((1.0 + x) * q);
    }

    /**
     * The root of S (1 + Phi(S)) = R, solved to convergence (safeguarded Newton in ln S from the asymptotes):
     * the reference for the table and for R outside it.
     *
     * @param rho ln R
     * @return ln S at the root
     */
    static double solveFully(double rho) {
        // S <= R since Phi >= 0, so sigma <= rho; a lower end by stepping down until h < 0
        double hi = rho;
        double lo = Math.min(rho, 2.0 / 3.0 * (rho - Math.log(EFFICIENT_COEFFICIENT))) - 1.0;
        while (residual(lo, rho) > 0.0) {
            lo -= 2.0 * (hi - lo);
        }
        double sigma = 0.5 * (lo + hi);
        for (int i = 0; i < 200; i++) {
            double h = residual(sigma, rho);
            if (h > 0.0) {
                hi = sigma;
            } else {
                lo = sigma;
            }
            double s = Math.exp(sigma);
            double phi = phi(s);
            double slope = 1.0 + logSlope(s) * phi / (1.0 + phi);
            double next = sigma - h / slope;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            boolean done = Math.abs(next - sigma) <= 1e-15 * Math.max(1.0, Math.abs(next));
            sigma = next;
            if (done || !(hi > lo)) {
                break;
            }
        }
        return sigma;
    }

    /** h(sigma) = sigma + ln(1 + Phi(e^sigma)) - rho. */
    private static double residual(double sigma, double rho) {
        return sigma + Math.log1p(phi(Math.exp(sigma))) - rho;
    }

    private static double[] table() {
        double[] t = new double[2 * NODES];
        for (int i = 0; i < NODES; i++) {
            double rho = RHO_LO + i / STEPS_PER_UNIT;
            double sigma = solveFully(rho);
            double s = Math.exp(sigma);
            double phi = phi(s);
            t[2 * i] = sigma;
            t[2 * i + 1] = 1.0 / (1.0 + logSlope(s) * phi / (1.0 + phi));
        }
        return t;
    }

    /**
     * A start for ln S: the table's cubic Hermite interpolant at rho inside [{@value #RHO_LO},
     * {@value #RHO_HI}), the fully converged root outside.
     *
     * @param rho ln R
     * @return ln S, within ~1e-8 of the root inside the table
     */
    static double start(double rho) {
        double u = (rho - RHO_LO) * STEPS_PER_UNIT;
        if (!(u >= 0.0 && u < NODES - 1)) {
            return solveFully(rho);
        }
        int i = (int) u;
        double t = u - i;
        double[] tab = TABLE;
        double y0 = tab[2 * i];
        double d0 = tab[2 * i + 1] / STEPS_PER_UNIT;
        double y1 = tab[2 * i + 2];
        double d1 = tab[2 * i + 3] / STEPS_PER_UNIT;
        // cubic Hermite on [0, 1] with end slopes d0, d1 (per unit t)
        double dy = y1 - y0;
        double c2 = 3.0 * dy - 2.0 * d0 - d1;
        double c3 = d0 + d1 - 2.0 * dy;
        return y0 + t * (d0 + t * (c2 + t * c3));
    }
}
