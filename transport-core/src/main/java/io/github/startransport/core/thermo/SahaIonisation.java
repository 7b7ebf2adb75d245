package io.github.startransport.core.thermo;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ZoneInput;

/**
 * Thermodynamics of a partially ionised mixture of hydrogen, helium and metals with black-body
 * radiation: ideal non-degenerate electrons and nuclei, ionisation by the Saha equation, all
 * outputs with analytic derivatives with respect to T and rho.
 *
 * <h2>The gas</h2>
 * <ul>
 *   <li>Hydrogen H / H+ (chi = 13.598434 eV), helium He / He+ / He++ (24.587389 eV and
 *       54.417765 eV; ionisation energies from the NIST Atomic Spectra Database, values from
 *       memory), ground states only, with the statistical-weight factors 2 g_(i+1) / g_i of 1
 *       (H), 4 (He I) and 1 (He II): the Saha equation n_(i+1) n_e / n_i
 *       = (2 g_(i+1) / g_i) (2 pi m_e k T / h^2)^(3/2) exp(-chi_i / k T) (Kippenhahn, Weigert &amp;
 *       Weiss 2012, §14.1; Cox &amp; Giuli 1968, ch. 15; Mihalas 1978, ch. 5).</li>
 *   <li>Metals: one donor species. A mean metal nucleus of mass number {@value #METAL_MASS_NUMBER}
 *       carries {@value #DONOR_ELECTRONS} = A/2 - 1 electrons, each freed independently by the Saha
 *       equation with the one potential {@value #CHI_DONOR_EV} eV and weight factor 1. So fully
 *       ionised metals count Z/2 particles per m_u, as in 1/mu = 2X + 3Y/4 + Z/2 (Kippenhahn,
 *       Weigert &amp; Weiss 2012, §4.2), and neutral ones Z/16. The potential is about the
 *       number-weighted mean first ionisation energy of the solar metal mix (O 13.6, C 11.3, N 14.5,
 *       Ne 21.6, Fe, Mg, Si about 8 eV; potentials and abundances from memory). The price: real
 *       metals free their inner electrons between 1e4 and 1e7 K, here together with hydrogen, which
 *       overstates the particle number by at most 6Z/16 per m_u (about 1 % of it at Z = 0.02)
 *       between ~1.5e4 K and ~1e6 K, and cool gas lacks the electrons of Fe, Mg, Si (which matter for
 *       the H-minus opacity, not for these thermodynamic quantities). A low potential instead
 *       (7.9 eV, that of Fe) would put the ionisation energy of all seven electrons into one false
 *       dip of nabla_ad near 6000 K, from 0.40 to 0.33 at rho = 1e-7 g cm^-3.</li>
 *   <li>Masses: A = 1 for H and 4 for He, exactly, as in the fully ionised fallback.</li>
 *   <li>Pressure ionisation: each bound state s keeps an occupation probability
 *       w_s = exp(-(4 pi / 3) n_N (2 r_s)^3), the chance that no other nucleus (number density
 *       n_N) lies within twice the Bohr-model orbit radius r_s = Z_s e^2 / (2 chi_s) of its
 *       electron (an excluded-volume occupation probability in the manner of Hummer &amp;
 *       Mihalas 1988, ApJ 331, 794; the factor 2 is our choice). The free energy gets the matching
 *       term -k T sum_s N_s ln w_s, so the Saha ratios gain w_(i+1) / w_i, the pressure gains
 *       k T sum_s n_s (-ln w_s), and the internal energy nothing: the model stays thermodynamically
 *       consistent. It ionises the centres of main-sequence stars, where the Saha equation alone
 *       leaves several per cent of hydrogen neutral, and changes nothing below ~1e-3 g cm^-3.</li>
 *   <li>Radiation: P_rad = a T^4 / 3, u_rad = a T^4 / rho.</li>
 * </ul>
 * Pressure P = n_N k T (1 + x + b) + a T^4 / 3 and specific energy
 * u = (n_N / rho) [3/2 k T (1 + x) + E_ion] + a T^4 / rho, with x the free electrons per nucleus,
 * b = sum_s (bound population of s per nucleus) (-ln w_s), E_ion the ionisation energy per nucleus
 * counted from the neutral atoms. From chi_T, chi_rho and c_V follow (Cox &amp; Giuli 1968, ch. 9):
 * Gamma_3 - 1 = P chi_T / (rho T c_V), Gamma_1 = chi_T (Gamma_3 - 1) + chi_rho,
 * nabla_ad = (Gamma_3 - 1) / Gamma_1, c_P = c_V Gamma_1 / chi_rho, delta = chi_T / chi_rho.
 *
 * <h2>The solve</h2>
 * The ionisation fractions are closed forms in x and the Saha ratios q_i = S_i / n_N; the charge
 * balance x = sum_i alpha_i e_i(x) (alpha_i nuclei of species i per nucleus, e_i its mean charge)
 * has one root, bracketed by the largest single-species root (from below) and the full charge
 * (from above). Newton steps in ln x, falling back to bisection whenever a step leaves the bracket,
 * reach it in a handful of iterations, and at most {@value #MAX_ITERATIONS}. The Saha ratios are
 * limited to [e^{@value #LN_Q_MIN}, e^{@value #LN_Q_MAX}] (formed through logarithms where
 * C T^(3/2) / n_N itself leaves [1e-250, 1e250]): beyond
 * these a stage is so nearly empty that nothing representable depends on it. Where even the
 * largest possible electron fraction is below 1e-60 the gas is taken as neutral (its ionisation
 * changes no output by a representable amount). Derivatives of the fractions follow by implicit
 * differentiation of the charge balance, to second order for the Jacobians; each is a moment of
 * the ionisation-stage distribution, so nothing cancels.
 *
 * <h2>Validity</h2>
 * Reliable where the gas is ideal and non-degenerate: roughly 6000 K (below, hydrogen forms
 * molecules, which the model ignores) to 1e9 K (above, electrons become relativistic and pairs
 * appear), densities with electron degeneracy indicator n_e lambda^3 / 2 below ~0.05 and
 * {@link ThermoResult#pressureIonisation} near 0. Solar envelopes and the interiors of
 * main-sequence stars above ~1 solar mass lie inside; the solar centre (mildly degenerate) and
 * white dwarfs do not. The solve itself never fails for 1e2 to 1e10 K and any positive density.
 */
public final class SahaIonisation {
    private SahaIonisation() {
    }

    /** Ionisation energy of H (eV), NIST, from memory. */
    public static final double CHI_H_EV = 13.598434;
    /** First ionisation energy of He (eV), NIST, from memory. */
    public static final double CHI_HE1_EV = 24.587389;
    /** Second ionisation energy of He (eV), NIST, from memory. */
    public static final double CHI_HE2_EV = 54.417765;
    /** The metals' one donor potential (eV). */
    public static final double CHI_DONOR_EV = 13.0;
    /** Mass number of the mean metal nucleus. */
    public static final double METAL_MASS_NUMBER = 16.0;
    /** Donor electrons per metal nucleus, A/2 - 1, so that fully ionised metals count Z/2 particles per m_u. */
    public static final double DONOR_ELECTRONS = METAL_MASS_NUMBER / 2.0 - 1.0;

    /** The solve takes Halley steps where the charge balance's relative residual rhs / x - 1 is below this. */
    static final double HALLEY_REGION = 0.25;
    /** Bounds of the solve: iterations at most. */
    static final int MAX_ITERATIONS = 200;
    /** Lower limit of ln q (see the class comment). */
    static final double LN_Q_MIN = -600.0;
    /** Upper limit of ln q. */
    static final double LN_Q_MAX = 300.0;
    /** e^LN_Q_MIN and e^LN_Q_MAX. */
    static final double Q_MIN = Math.exp(LN_Q_MIN);
    static final double Q_MAX = Math.exp(LN_Q_MAX);
    /** The gas is neutral when the sum of alpha q (an upper bound of x^2) is below this. */
    static final double NEUTRAL_X2 = 1e-120;
    /** Abundances per nucleus below this change nothing representable and are dropped. */
    static final double NEGLIGIBLE_ABUNDANCE = 1e-30;

    private static final double K = Codata2018.BOLTZMANN;
    private static final double MU = Codata2018.ATOMIC_MASS_UNIT;
    private static final double A_RAD = Codata2018.RADIATION_CONSTANT;
    private static final double EV_OVER_K = Codata2018.ELECTRON_VOLT / Codata2018.BOLTZMANN;

    /** chi / k (K). */
    static final double THETA_H = CHI_H_EV * EV_OVER_K;
    static final double THETA_HE1 = CHI_HE1_EV * EV_OVER_K;
    static final double THETA_HE2 = CHI_HE2_EV * EV_OVER_K;
    static final double THETA_D = CHI_DONOR_EV * EV_OVER_K;

    /** ln of (2 pi m_e k / h^2)^(3/2) (cm^-3 K^-3/2). */
    static final double LN_C = 1.5 * Math.log(2.0 * Math.PI * Codata2018.ELECTRON_MASS * K
            / (Codata2018.PLANCK * Codata2018.PLANCK));
    private static final double LN_4 = Math.log(4.0);
    private static final double LN_MU = Math.log(MU);
    private static final double C_MU = Math.exp(LN_C + LN_MU);

    /** Excluded volume (4 pi / 3)(2 r_s)^3 / m_u of each bound state (cm^3 per m_u... times rho nu_N gives -ln w). */
    static final double V_H0 = exclusion(1.0, CHI_H_EV);
    static final double V_HE0 = exclusion(1.0, CHI_HE1_EV);
    static final double V_HE1 = exclusion(2.0, CHI_HE2_EV);
    static final double V_D0 = exclusion(1.0, CHI_DONOR_EV);

    private static double exclusion(double charge, double chiEv) {
        double e = Codata2018.ELEMENTARY_CHARGE_ESU;
        double radius = charge * e * e / (2.0 * chiEv * Codata2018.ELECTRON_VOLT);
        double d = 2.0 * radius;
        return 4.0 * Math.PI / 3.0 * d * d * d / MU;
    }

    /**
     * Evaluates the mixture at (T, rho, X, Z) into {@code out}: every scalar output and the T and
     * rho entries of every derivative array. Inputs are not validated here (see
     * {@link IonisingGas}); allocation-free and thread-safe.
     *
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param hydrogen    X
     * @param metals      Z
     * @param out         result, overwritten
     */
    public static void evaluate(double temperature, double density, double hydrogen, double metals,
                                ThermoResult out) {
        compute(temperature, density, hydrogen, metals, 1.0, 1.0, true, out);
    }

    /**
     * {@link #evaluate(double, double, double, double, ThermoResult)} without the derivatives: every
     * scalar output bit for bit as there (the same arithmetic, in the same order), the derivative
     * arrays left untouched. Inputs are not validated here (see {@link IonisingGas}); allocation-free
     * and thread-safe.
     *
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param hydrogen    X
     * @param metals      Z
     * @param out         result: scalar fields overwritten, derivative arrays untouched
     */
    public static void evaluateValues(double temperature, double density, double hydrogen, double metals,
                                      ThermoResult out) {
        compute(temperature, density, hydrogen, metals, 1.0, 1.0, false, out);
    }

    /**
     * Specific internal energy u = (n_N / rho) [3/2 k T (1 + x) + E_ion] + a T^4 / rho (erg g^-1),
     * counted from neutral atoms in their ground states at T = 0: for checks of the thermodynamic
     * consistency of {@link #evaluate}.
     *
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param hydrogen    X
     * @param metals      Z
     * @param radiation   1 for the model, 0 to leave radiation out
     * @param exclusion   1 for the model, 0 to leave the pressure ionisation out
     * @return u (erg g^-1)
     */
    static double specificEnergy(double temperature, double density, double hydrogen, double metals,
                                 double radiation, double exclusion) {
        return evaluate(temperature, density, hydrogen, metals, radiation, exclusion, new ThermoResult());
    }

    /**
     * {@link #evaluate(double, double, double, double, ThermoResult)} with radiation and the
     * pressure-ionisation term scaled (1 and 1 for the model; 0 leaves either out, so that tests can
     * compare with textbook formulas for the ideal ionising gas alone).
     *
     * @return the specific internal energy u (erg g^-1), see {@link #specificEnergy}
     */
    static double evaluate(double temperature, double density, double hydrogen, double metals, double radiation,
                         double exclusion, ThermoResult out) {
        return compute(temperature, density, hydrogen, metals, radiation, exclusion, true, out);
    }

    /**
     * The one body of {@link #evaluate} and {@link #evaluateValues}: the scalar outputs and what they
     * need first, then, when {@code derivatives} is true, the second-order sums and the derivative
     * arrays. Either way each scalar output comes from the same expressions, so the two agree bit for bit.
     *
     * @param derivatives whether to fill the derivative arrays (left untouched when false)
     * @return the specific internal energy u (erg g^-1), see {@link #specificEnergy}
     */
    private static double compute(double temperature, double density, double hydrogen, double metals,
                                  double radiation, double exclusion, boolean derivatives, ThermoResult out) {
        double t = temperature;
        double rho = density;
        double invT = 1.0 / t;
        double invRho = 1.0 / rho;
        double helium = Math.max(0.0, 1.0 - hydrogen - metals);
        double metalNuclei = metals / METAL_MASS_NUMBER;
        double nuN = hydrogen + 0.25 * helium + metalNuclei;   // nuclei per m_u
        double invNu = 1.0 / nuN;
        double aH = negligible(hydrogen * invNu);
        double aHe = negligible(0.25 * helium * invNu);
        double aD = negligible(DONOR_ELECTRONS * metalNuclei * invNu);

        // the occupation-probability terms -ln w = V rho nu_N of each bound state
        double excluded = exclusion * rho * nuN;
        double lH0 = V_H0 * excluded;
        double lHe0 = V_HE0 * excluded;
        double lHe1 = V_HE1 * excluded;
        double lD0 = V_D0 * excluded;
        // the Saha ratios q = exp(base - theta / T + dL), base = ln(C T^(3/2) / n_N): from
        // C T^(3/2) / n_N itself where that is a normal double, else through logarithms
        double ratio = t * Math.sqrt(t) * (invRho * invNu);
        double argH = -THETA_H * invT + lH0;
        double arg1 = -THETA_HE1 * invT + (lHe0 - lHe1);
        double arg2 = -THETA_HE2 * invT + lHe1;
        double argD = -THETA_D * invT + lD0;
        double qH;
        double q1;
        double q2;
        double qD;
        double nLambda3;                       // n_N lambda_e^3 = exp(-base), for the degeneracy indicator
        if (ratio > 1e-250 && ratio < 1e250) {
            double b0 = C_MU * ratio;
            qH = b0 * Exponential.exp(argH);
            q1 = 4.0 * b0 * Exponential.exp(arg1);
            q2 = b0 * Exponential.exp(arg2);
            qD = b0 * Exponential.exp(argD);
            nLambda3 = 1.0 / b0;
        } else {
            double base = LN_C + LN_MU + 1.5 * Math.log(t) - Math.log(rho) - Math.log(nuN);
            qH = Math.exp(limit(base + argH));
            q1 = Math.exp(limit(LN_4 + base + arg1));
            q2 = Math.exp(limit(base + arg2));
            qD = Math.exp(limit(base + argD));
            nLambda3 = Math.exp(Math.min(-base, 700.0));
        }
        // a ratio at either limit is constant there: no derivatives through it (see the class comment)
        boolean inH = qH > Q_MIN && qH < Q_MAX;
        boolean in1 = q1 > Q_MIN && q1 < Q_MAX;
        boolean in2 = q2 > Q_MIN && q2 < Q_MAX;
        boolean inD = qD > Q_MIN && qD < Q_MAX;
        boolean limited = !(inH && in1 && in2 && inD);
        // a bound state below a stage limited from above is empty to double precision: no -ln w weight
        boolean emptyH0 = false;
        boolean emptyHe0 = false;
        boolean emptyHe1 = false;
        boolean emptyD0 = false;
        if (limited) {
            emptyH0 = qH >= Q_MAX;
            emptyHe0 = q1 >= Q_MAX;
            emptyHe1 = q2 >= Q_MAX;
            emptyD0 = qD >= Q_MAX;
            qH = Math.max(Q_MIN, Math.min(Q_MAX, qH));
            q1 = Math.max(Q_MIN, Math.min(Q_MAX, q1));
            q2 = Math.max(Q_MIN, Math.min(Q_MAX, q2));
            qD = Math.max(Q_MIN, Math.min(Q_MAX, qD));
        }

        double x;
        if (aH * qH + aHe * q1 + aD * qD < NEUTRAL_X2 && aHe * q1 * q2 < NEUTRAL_X2 * 1e-60) {
            x = 0.0;
        } else {
            x = solve(aH, aHe, aD, qH, q1, q2, qD, aH + 2.0 * aHe + aD);
        }

        // stage populations at the root
        double yH;
        double nH;
        double yD;
        double nD;
        double y0;
        double y1;
        double y2;
        if (x == 0.0) {
            yH = 0.0;
            nH = 1.0;
            yD = 0.0;
            nD = 1.0;
            y0 = 1.0;
            y1 = 0.0;
            y2 = 0.0;
        } else {
            double dH = 1.0 / (qH + x);
            yH = qH * dH;
            nH = x * dH;
            double dD = 1.0 / (qD + x);
            yD = qD * dD;
            nD = x * dD;
            double dHe = 1.0 / (x * x + x * q1 + q1 * q2);
            y0 = x * x * dHe;
            y1 = x * q1 * dHe;
            y2 = q1 * q2 * dHe;
        }

        // d ln q / d tau (h), d2 / d tau2 (hp), d / d ln rho (k), d2 / d ln rho2 (kp), and the -ln w weight of
        // each bound state in b
        double hpH = -THETA_H * invT;
        double hp1 = -THETA_HE1 * invT;
        double hp2 = -THETA_HE2 * invT;
        double hpD = -THETA_D * invT;
        double kpH = lH0;
        double kp1 = lHe0 - lHe1;
        double kp2 = lHe1;
        double kpD = lD0;
        double bH0 = lH0;
        double bHe0 = lHe0;
        double bHe1 = lHe1;
        double bD0 = lD0;
        double hH = 1.5 - hpH;
        double h1 = 1.5 - hp1;
        double h2 = 1.5 - hp2;
        double hD = 1.5 - hpD;
        double kH = kpH - 1.0;
        double k1 = kp1 - 1.0;
        double k2 = kp2 - 1.0;
        double kD = kpD - 1.0;
        if (limited) {
            if (!inH) {
                hH = hpH = kH = kpH = 0.0;
            }
            if (!in1) {
                h1 = hp1 = k1 = kp1 = 0.0;
            }
            if (!in2) {
                h2 = hp2 = k2 = kp2 = 0.0;
            }
            if (!inD) {
                hD = hpD = kD = kpD = 0.0;
            }
            bH0 = emptyH0 ? 0.0 : lH0;
            bHe0 = emptyHe0 ? 0.0 : lHe0;
            bHe1 = emptyHe1 ? 0.0 : lHe1;
            bD0 = emptyD0 ? 0.0 : lD0;
        }

        // Three per-nucleus sums are linear in the populations (yH, p1 = P(He ionised at least once),
        // p2 = P(He twice), yD): the free electrons x, the ionisation energy E / k (weights e), and the
        // excluded-volume term b (weights f). The stage distribution is an exponential family in the stage
        // logs l = ln q - u, u = ln x: a population's first derivative is its covariance C with the stages
        // times the derivatives of l, its second one adds the third cumulants K times products of them.
        // With l_T = h - u_T, each sum S has S_T = S[C h] - u_T S[C1] (C1: covariance with the charge), and
        // S_TT = S[K l_T l_T + C hp] - u_TT S[C1]; the charge balance x = X gives the derivatives of u.
        // The values need the first order only (c_V, chi_T and chi_rho are first derivatives of u and P);
        // the second order feeds the derivative arrays alone and is computed after the values, when asked.
        // single-stage variances c; helium covariances C of (I1, I2)
        double cH = yH * nH;
        double cD = yD * nD;
        double p1 = y1 + y2;
        double q2c = y0 + y1;                  // 1 - p2
        double c11 = p1 * y0;
        double c12 = y2 * y0;
        double c22 = y2 * q2c;
        double ce1 = c11 + c12;                // covariances of I1 and I2 with the charge I1 + I2
        double ce2 = c12 + c22;
        // weights of the ionisation energy (K) and of b on (yH, p1, p2, yD)
        double eH = aH * THETA_H;
        double e1 = aHe * THETA_HE1;
        double e2 = aHe * THETA_HE2;
        double eD = aD * THETA_D;
        double fH = -aH * bH0;
        double f1 = aHe * (bHe1 - bHe0);
        double f2 = -aHe * bHe1;
        double fD = -aD * bD0;
        // first order: S[C1], S[C h], S[C k]
        double chH = cH * hH;
        double ckH = cH * kH;
        double chD = cD * hD;
        double ckD = cD * kD;
        double ch1 = c11 * h1 + c12 * h2;
        double ch2 = c12 * h1 + c22 * h2;
        double ck1 = c11 * k1 + c12 * k2;
        double ck2 = c12 * k1 + c22 * k2;
        double invW = x > 0.0 ? 1.0 / (x + aH * cH + aHe * (ce1 + ce2) + aD * cD) : 0.0;
        double uT = (aH * chH + aHe * (ch1 + ch2) + aD * chD) * invW;
        double uR = (aH * ckH + aHe * (ck1 + ck2) + aD * ckD) * invW;
        double eC = eH * cH + e1 * ce1 + e2 * ce2 + eD * cD;
        double bC = fH * cH + f1 * ce1 + f2 * ce2 + fD * cD;
        double qeT = eH * chH + e1 * ch1 + e2 * ch2 + eD * chD - uT * eC;
        double bT = fH * chH + f1 * ch1 + f2 * ch2 + fD * chD - uT * bC;
        double bgR = fH * ckH + f1 * ck1 + f2 * ck2 + fD * ckD - uR * bC;
        double qe = eH * yH + e1 * p1 + e2 * y2 + eD * yD;
        double b = aH * bH0 * nH + aHe * (bHe0 * y0 + bHe1 * y1) + aD * bD0 * nD;
        double bR = b + bgR;

        // gas pressure: ln P_g = const + ln rho + ln T + ln Pi, Pi = 1 + x + b
        double pi = 1.0 + x + b;
        double invPi = 1.0 / pi;
        double piT = x * uT + bT;
        double piR = x * uR + bR;
        double gT = 1.0 + piT * invPi;
        double gR = 1.0 + piR * invPi;

        double kOverMu = K / MU * nuN;                       // k / m_u per nucleus count
        double pg = kOverMu * rho * t * pi;
        double t2 = t * t;
        double aRad = radiation * A_RAD;
        double pr = aRad * t2 * t2 * (1.0 / 3.0);
        double p = pg + pr;
        double invP = 1.0 / p;
        double beta = pg * invP;
        double oneMinusBeta = pr * invP;
        double chiT = beta * gT + 4.0 * oneMinusBeta;
        double chiR = beta * gR;

        // c_V = (k nu_N / m_u) A + 4 a T^3 / rho
        double radCv = 12.0 * pr * invT * invRho;            // 4 a T^3 / rho
        double aCv = 1.5 * (1.0 + x) + 1.5 * x * uT + qeT * invT;
        double cv = kOverMu * aCv + radCv;

        double invCv = 1.0 / cv;
        double invChiTR = 1.0 / (chiT * chiR);
        double invChiR = chiT * invChiTR;
        double g3 = p * chiT * invRho * invT * invCv;        // Gamma_3 - 1
        double gamma1 = chiT * g3 + chiR;
        double invG1 = 1.0 / gamma1;
        double nablaAd = g3 * invG1;
        double cp = cv * gamma1 * invChiR;
        double delta = chiT * invChiR;
        double onePlusX = 1.0 + x;
        double invOnePlusX = 1.0 / onePlusX;
        double mu = invNu * invOnePlusX;
        double denPhi = 1.0 / (onePlusX + 2.0 * b);
        double phi = onePlusX * denPhi;

        out.mu = mu;
        out.beta = beta;
        out.pressure = p;
        out.nablaAd = nablaAd;
        out.cp = cp;
        out.delta = delta;
        out.phi = phi;
        out.gamma1 = gamma1;
        out.cv = cv;
        out.chiT = chiT;
        out.chiRho = chiR;
        out.freeElectrons = nuN * x;
        out.degeneracy = 0.5 * x * nLambda3;
        out.pressureIonisation = aH > 0.0 ? pressureIonised(x, nH, qH, inH, lH0) : 0.0;
        if (derivatives) {
            // single-stage third cumulants kappa; helium cumulants K of (I1, I2)
            double kapH = cH * (nH - yH);
            double kapD = cD * (nD - yD);
            // second order: S[K l l + C hp] (TT), S[K l l] (TR), S[K l l + C kp] (RR)
            double lTH = hH - uT;
            double lRH = kH - uR;
            double sTTH = kapH * lTH * lTH + cH * hpH;
            double sTRH = kapH * lTH * lRH;
            double sRRH = kapH * lRH * lRH + cH * kpH;
            double lTD = hD - uT;
            double lRD = kD - uR;
            double sTTD = kapD * lTD * lTD + cD * hpD;
            double sTRD = kapD * lTD * lRD;
            double sRRD = kapD * lRD * lRD + cD * kpD;
            double lT1 = h1 - uT;
            double lT2 = h2 - uT;
            double lR1 = k1 - uR;
            double lR2 = k2 - uR;
            double k111 = c11 * (y0 - p1);
            double k112 = c12 * (y0 - p1);
            double k122 = c12 * (q2c - y2);
            double k222 = c22 * (q2c - y2);
            double tt11 = lT1 * lT1;
            double tt12 = 2.0 * lT1 * lT2;
            double tt22 = lT2 * lT2;
            double tr11 = lT1 * lR1;
            double tr12 = lT1 * lR2 + lT2 * lR1;
            double tr22 = lT2 * lR2;
            double rr11 = lR1 * lR1;
            double rr12 = 2.0 * lR1 * lR2;
            double rr22 = lR2 * lR2;
            double sTT1 = k111 * tt11 + k112 * tt12 + k122 * tt22 + c11 * hp1 + c12 * hp2;
            double sTT2 = k112 * tt11 + k122 * tt12 + k222 * tt22 + c12 * hp1 + c22 * hp2;
            double sTR1 = k111 * tr11 + k112 * tr12 + k122 * tr22;
            double sTR2 = k112 * tr11 + k122 * tr12 + k222 * tr22;
            double sRR1 = k111 * rr11 + k112 * rr12 + k122 * rr22 + c11 * kp1 + c12 * kp2;
            double sRR2 = k112 * rr11 + k122 * rr12 + k222 * rr22 + c12 * kp1 + c22 * kp2;
            double uTT = (aH * sTTH + aHe * (sTT1 + sTT2) + aD * sTTD - x * uT * uT) * invW;
            double uTR = (aH * sTRH + aHe * (sTR1 + sTR2) + aD * sTRD - x * uT * uR) * invW;
            double uRR = (aH * sRRH + aHe * (sRR1 + sRR2) + aD * sRRD - x * uR * uR) * invW;
            double qeTT = eH * sTTH + e1 * sTT1 + e2 * sTT2 + eD * sTTD - uTT * eC;
            double qeTR = eH * sTRH + e1 * sTR1 + e2 * sTR2 + eD * sTRD - uTR * eC;
            double bTT = fH * sTTH + f1 * sTT1 + f2 * sTT2 + fD * sTTD - uTT * bC;
            double bTR = bT + fH * sTRH + f1 * sTR1 + f2 * sTR2 + fD * sTRD - uTR * bC;
            double bRR = b + 2.0 * bgR + fH * sRRH + f1 * sRR1 + f2 * sRR2 + fD * sRRD - uRR * bC;

            double piTT = x * (uT * uT + uTT) + bTT;
            double piTR = x * (uT * uR + uTR) + bTR;
            double piRR = x * (uR * uR + uRR) + bRR;
            double gTT = (piTT - piT * piT * invPi) * invPi;
            double gTR = (piTR - piT * piR * invPi) * invPi;
            double gRR = (piRR - piR * piR * invPi) * invPi;

            double betaT = beta * oneMinusBeta * (gT - 4.0);
            double betaR = beta * oneMinusBeta * gR;
            double chiTT = betaT * (gT - 4.0) + beta * gTT;
            double chiTR = betaR * (gT - 4.0) + beta * gTR;
            double chiRT = betaT * gR + beta * gTR;
            double chiRR = betaR * gR + beta * gRR;

            double aCvT = 1.5 * x * uT + 1.5 * x * (uT * uT + uTT) + (qeTT - qeT) * invT;
            double aCvR = 1.5 * x * uR + 1.5 * x * (uT * uR + uTR) + qeTR * invT;
            double cvT = kOverMu * aCvT + 3.0 * radCv;
            double cvR = kOverMu * aCvR - radCv;

            double invChiT = chiR * invChiTR;
            double g3T = g3 * (chiT + chiTT * invChiT - 1.0 - cvT * invCv);
            double g3R = g3 * (chiR + chiTR * invChiT - 1.0 - cvR * invCv);
            double gamma1T = chiTT * g3 + chiT * g3T + chiRT;
            double gamma1R = chiTR * g3 + chiT * g3R + chiRR;
            double nablaAdT = (g3T - nablaAd * gamma1T) * invG1;
            double nablaAdR = (g3R - nablaAd * gamma1R) * invG1;
            double cpT = cp * (cvT * invCv + gamma1T * invG1 - chiRT * invChiR);
            double cpR = cp * (cvR * invCv + gamma1R * invG1 - chiRR * invChiR);
            double deltaT = delta * (chiTT * invChiT - chiRT * invChiR);
            double deltaR = delta * (chiTR * invChiT - chiRR * invChiR);
            double lnMuT = -x * uT * invOnePlusX;
            double lnMuR = -x * uR * invOnePlusX;
            double lnPhiT = x * uT * invOnePlusX - (x * uT + 2.0 * bT) * denPhi;
            double lnPhiR = x * uR * invOnePlusX - (x * uR + 2.0 * bR) * denPhi;

            out.dPressure[ZoneInput.T] = p * chiT * invT;
            out.dPressure[ZoneInput.RHO] = p * chiR * invRho;
            out.dNablaAd[ZoneInput.T] = nablaAdT * invT;
            out.dNablaAd[ZoneInput.RHO] = nablaAdR * invRho;
            out.dCp[ZoneInput.T] = cpT * invT;
            out.dCp[ZoneInput.RHO] = cpR * invRho;
            out.dDelta[ZoneInput.T] = deltaT * invT;
            out.dDelta[ZoneInput.RHO] = deltaR * invRho;
            out.dPhi[ZoneInput.T] = phi * lnPhiT * invT;
            out.dPhi[ZoneInput.RHO] = phi * lnPhiR * invRho;
            out.dGamma1[ZoneInput.T] = gamma1T * invT;
            out.dGamma1[ZoneInput.RHO] = gamma1R * invRho;
            out.dMu[ZoneInput.T] = mu * lnMuT * invT;
            out.dMu[ZoneInput.RHO] = mu * lnMuR * invRho;
        }
        return kOverMu * (1.5 * t * onePlusX + qe) + aRad * t2 * t2 * invRho;
    }

    /**
     * The share of hydrogen whose state the occupation probability w = exp(-l) decides: the neutral
     * share the Saha equation alone would give at the same electron density minus ours, or, where
     * hydrogen stays neutral regardless, ours times 1 - w; to first order in l (relative error
     * below 1e-4) where l &lt; 1e-4.
     */
    private static double pressureIonised(double x, double neutral, double qH, boolean inH, double l) {
        if (l < 1e-4) {
            return neutral * l;
        }
        // the Saha ratio without the occupation probability, q e^(-l), where q is not at a limit
        double w = Exponential.exp(-l);
        double qIdeal = inH ? qH * w : 0.0;
        double ideal = x == 0.0 ? 1.0 : x / (qIdeal + x);
        double oneMinusW;
        if (l >= 0.5) {
            oneMinusW = 1.0 - w;
        } else {
            // 1 - e^(-l) = 2 e^(-l/2) sinh(l/2) without cancellation, sinh by its Taylor series to the 13th power
            // (truncation below 1e-17 relative for l < 1/2)
            double y = 0.5 * l;
            double y2 = y * y;
            double sinh = y * (1.0 + y2 * (1.0 / 6.0 + y2 * (1.0 / 120.0 + y2 * (1.0 / 5040.0 + y2 * (1.0 / 362880.0
                    + y2 * (1.0 / 39916800.0 + y2 * (1.0 / 6227020800.0)))))));
            oneMinusW = 2.0 * Math.sqrt(w) * sinh;
        }
        return Math.max(ideal - neutral, neutral * oneMinusW);
    }

    private static double negligible(double abundance) {
        return abundance < NEGLIGIBLE_ABUNDANCE ? 0.0 : abundance;
    }

    private static double limit(double lnq) {
        return Math.max(LN_Q_MIN, Math.min(LN_Q_MAX, lnq));
    }

    /** Length of the array {@link #chargeBalance} fills. */
    public static final int SYSTEM_SIZE = 8;

    /**
     * The charge balance this class solves, for comparisons with other root finders: writes
     * {alpha_H, alpha_He, alpha_D, q_H, q_He1, q_He2, q_D, x_max} (abundances per nucleus, Saha
     * ratios S / n_N as limited here, the full charge per nucleus), so that the free electrons per
     * nucleus x solve x = alpha_H q_H / (q_H + x) + alpha_He (x q_He1 + 2 q_He1 q_He2) / (x^2
     * + x q_He1 + q_He1 q_He2) + alpha_D q_D / (q_D + x) in (0, x_max].
     *
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @param hydrogen    X
     * @param metals      Z
     * @param system      array of at least {@link #SYSTEM_SIZE}, overwritten
     */
    public static void chargeBalance(double temperature, double density, double hydrogen, double metals,
                                     double[] system) {
        double helium = Math.max(0.0, 1.0 - hydrogen - metals);
        double metalNuclei = metals / METAL_MASS_NUMBER;
        double nuN = hydrogen + 0.25 * helium + metalNuclei;
        system[0] = negligible(hydrogen / nuN);
        system[1] = negligible(0.25 * helium / nuN);
        system[2] = negligible(DONOR_ELECTRONS * metalNuclei / nuN);
        double rhoNu = density * nuN;
        double base = LN_C + LN_MU + 1.5 * Math.log(temperature) - Math.log(density) - Math.log(nuN);
        double invT = 1.0 / temperature;
        system[3] = Math.exp(limit(base - THETA_H * invT + V_H0 * rhoNu));
        system[4] = Math.exp(limit(LN_4 + base - THETA_HE1 * invT + (V_HE0 - V_HE1) * rhoNu));
        system[5] = Math.exp(limit(base - THETA_HE2 * invT + V_HE1 * rhoNu));
        system[6] = Math.exp(limit(base - THETA_D * invT + V_D0 * rhoNu));
        system[7] = system[0] + 2.0 * system[1] + system[2];
    }

    /**
     * Free electrons per nucleus x of the system {@link #chargeBalance} writes, by this class's
     * bounded solve; 0 where the gas counts as neutral.
     *
     * @param system the array {@link #chargeBalance} filled
     * @return x (dimensionless)
     */
    public static double electronsPerNucleus(double[] system) {
        double aH = system[0];
        double aHe = system[1];
        double aD = system[2];
        double qH = system[3];
        double q1 = system[4];
        double q2 = system[5];
        double qD = system[6];
        if (aH * qH + aHe * q1 + aD * qD < NEUTRAL_X2 && aHe * q1 * q2 < NEUTRAL_X2 * 1e-60) {
            return 0.0;
        }
        return solve(aH, aHe, aD, qH, q1, q2, qD, system[7]);
    }

    /**
     * Free electrons per nucleus x from the charge balance x = sum alpha_i e_i(x): Halley steps where
     * the balance is within {@value #HALLEY_REGION} of closing, Newton steps in ln x farther out, both
     * inside a bracket, with bisection in ln x whenever a step would leave it. (Kept small, so that the
     * compiler inlines it into {@link #evaluate}.)
     *
     * @return x, in (0, xMax]
     */
    static double solve(double aH, double aHe, double aD, double qH, double q1, double q2, double qD,
                        double xMax) {
        double lo = lowerBound(aH, aHe, aD, qH, q1, qD);
        double hi = xMax;
        double x = lo;
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            double dH = 1.0 / (qH + x);
            double dD = 1.0 / (qD + x);
            double dHe = 1.0 / (x * x + x * q1 + q1 * q2);
            double yH = qH * dH;
            double nH = x * dH;
            double yD = qD * dD;
            double nD = x * dD;
            double y0 = x * x * dHe;
            double y1 = x * q1 * dHe;
            double y2 = q1 * q2 * dHe;
            double rhs = aH * yH + aHe * (y1 + 2.0 * y2) + aD * yD;
            double var = aH * yH * nH + aHe * (y0 * y1 + y1 * y2 + 4.0 * y0 * y2) + aD * yD * nD;
            double f = rhs - x;
            if (f > 0.0) {
                lo = x;
            } else {
                hi = x;
            }
            double next;
            if (Math.abs(f) < HALLEY_REGION * x) {
                double dx = halleyStep(x, f, var, aH * yH * nH * (nH - yH) + aD * yD * nD * (nD - yD), aHe, y0, y1, y2);
                next = x + dx;
                if (Math.abs(dx) < 1e-6 * x) {
                    return next;
                }
            } else {
                next = newtonInLnX(x, rhs, var);
            }
            if (!(next > lo && next < hi)) {
                next = Math.sqrt(lo * hi);             // bisection in ln x
            }
            x = next;
        }
        return x;
    }

    /**
     * Near the root: a Halley step on F = x - rhs(x), F' = (x + var) / x, F'' = -(var + k3) / x^2, with
     * k3 = sum alpha E[(K - e)^3] (d var / d ln x = -k3); the error after a step s is O(s^3).
     *
     * @param k3H the hydrogen and donor part of k3
     * @return the step in x
     */
    private static double halleyStep(double x, double f, double var, double k3H, double aHe, double y0, double y1,
                                     double y2) {
        double eHe = y1 + 2.0 * y2;
        double d0 = -eHe;
        double d1 = 1.0 - eHe;
        double d2 = 2.0 - eHe;
        double k3 = k3H + aHe * (y0 * d0 * d0 * d0 + y1 * d1 * d1 * d1 + y2 * d2 * d2 * d2);
        double xv = x + var;
        return 2.0 * f * xv * x / (2.0 * xv * xv - f * (var + k3));
    }

    /**
     * Far from the root: a Newton step in ln x on G = ln(rhs / x), G' = -1 - var / rhs, exact in the
     * low-ionisation limit where rhs ~ 1 / x.
     */
    private static double newtonInLnX(double x, double rhs, double var) {
        return x * Math.exp(Math.log(rhs / x) * rhs / (rhs + var));
    }

    /** The largest root of a single species alone, a lower bound of x (helium's first stage alone is below its e). */
    private static double lowerBound(double aH, double aHe, double aD, double qH, double q1, double qD) {
        return Math.max(Math.max(single(aH, qH), single(aHe, q1)), single(aD, qD));
    }

    /** The root of x = alpha q / (q + x): 2 alpha q / (q + sqrt(q^2 + 4 alpha q)), 0 when alpha = 0. */
    private static double single(double alpha, double q) {
        return 2.0 * alpha * q / (q + Math.sqrt(q * (q + 4.0 * alpha)));
    }
}
