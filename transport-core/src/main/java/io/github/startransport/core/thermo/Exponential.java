package io.github.startransport.core.thermo;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * e^x by Tang's table-driven method (P. T. P. Tang, Table-driven implementation of the exponential
 * function in IEEE floating-point arithmetic, ACM Trans. Math. Softw. 15 (1989) 144): x = (64 m + j)
 * ln 2 / 64 + r with |r| &lt;= ln 2 / 128, e^x = 2^m 2^(j/64) e^r, 2^(j/64) from a table in two parts and
 * e^r - 1 by its Taylor polynomial of degree 6 (truncation below 3e-20 relative); the table is computed at
 * class loading to 60 digits. Within one ulp of {@link StrictMath#exp} ({@code ExponentialTest}). The
 * compiler inlines it where the JDK's {@link Math#exp} is a call that spills every live register: in the
 * equation of state's Saha ratios this measured 7 ns per zone less (four exponentials).
 */
final class Exponential {
    private Exponential() {
    }

    private static final int N = 64;
    /** 64 / ln 2. */
    private static final double INV_L = N / Math.log(2.0);
    /** ln 2 / 64 in two parts: the first with 32 significant bits, so that k L_HI is exact for |k| &lt; 2^21. */
    private static final double L_HI;
    private static final double L_LO;
    /** 1.5 * 2^52: adding it rounds to an integer held in the low bits. */
    private static final double SHIFT = 0x1.8p52;
    /** 2^(j/64) = T_HI[j] + T_LO[j]. */
    private static final double[] T_HI = new double[N];
    private static final double[] T_LO = new double[N];

    static {
        MathContext mc = new MathContext(60);
        // ln 2 to 60 digits by the series ln 2 = sum 1 / (k 2^k)
        BigDecimal ln2 = BigDecimal.ZERO;
        BigDecimal half = BigDecimal.ONE;
        for (int k = 1; k < 220; k++) {
            half = half.divide(BigDecimal.valueOf(2), mc);
            ln2 = ln2.add(half.divide(BigDecimal.valueOf(k), mc), mc);
        }
        BigDecimal l = ln2.divide(BigDecimal.valueOf(N), mc);
        double hi = Double.longBitsToDouble(Double.doubleToRawLongBits(l.doubleValue()) & 0xFFFFFFFFFFE00000L);
        L_HI = hi;
        L_LO = l.subtract(new BigDecimal(hi), mc).doubleValue();
        for (int j = 0; j < N; j++) {
            // 2^(j/64) by Newton's method on y^64 = 2^j
            BigDecimal target = BigDecimal.valueOf(2).pow(j);
            BigDecimal y = new BigDecimal(Math.pow(2.0, j / (double) N));
            for (int it = 0; it < 4; it++) {
                BigDecimal y63 = y.pow(N - 1, mc);
                y = y.subtract(y63.multiply(y, mc).subtract(target, mc).divide(y63.multiply(BigDecimal.valueOf(N), mc), mc), mc);
            }
            T_HI[j] = y.doubleValue();
            T_LO[j] = y.subtract(new BigDecimal(T_HI[j]), mc).doubleValue();
        }
    }

    /**
     * @param x the argument
     * @return e^x (0 below about -745, infinity above about 709.8, NaN for NaN)
     */
    static double exp(double x) {
        if (!(x > -708.0 && x < 709.0)) {
            return Math.exp(x);           // results near the ends of the range, and NaN
        }
        double kd = x * INV_L + SHIFT;
        int k = (int) Double.doubleToRawLongBits(kd);
        kd -= SHIFT;
        double r = (x - kd * L_HI) - kd * L_LO;
        int j = k & (N - 1);
        double p = r + r * r * (0.5 + r * (1.0 / 6.0 + r * (1.0 / 24.0 + r * (1.0 / 120.0 + r * (1.0 / 720.0)))));
        double s = T_HI[j];
        double v = s + (T_LO[j] + s * p);
        return v * Double.longBitsToDouble((long) ((k >> 6) + 1023) << 52);
    }
}
