import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Derives, in 60-digit decimal arithmetic, the many-digit expected values of
 * {@code MixingLengthCubicTest} and of {@code ConvectionModelTest.syntheticEnvelopePoint}.
 *
 * <p>Run it with nothing but a JDK (11 or newer; no project class is used):
 * <pre>
 * java transport-core/src/test/resources/vectors/MixingLengthVectors.java
 * </pre>
 * It prints one CSV line per value, {@code kind,key,...,value}, with 40 significant digits.
 * {@code MixingLengthVectorsTest} runs it on every build and compares each printed value with the
 * literal in the tests, which must agree to within one unit of the literal's last digit.
 *
 * <p>Equations (Kippenhahn, Weigert &amp; Weiss 2012, <i>Stellar Structure and Evolution</i>, 2nd ed.,
 * ch. 7, in the textbook local mixing-length theory; equation numbers not copied here):
 * <ul>
 *   <li>H_P = P / (rho g), l = alpha H_P;</li>
 *   <li>U = 3 a c T^3 / (c_P rho^2 kappa l^2) sqrt(8 H_P / (g delta)), W = nabla_rad - nabla_ad;</li>
 *   <li>xi^3 - (19U/9) xi^2 + 3 U^2 xi - U^3 - (8U/9)(U^2 + W) = 0, the real root with xi &gt; U;</li>
 *   <li>nabla = nabla_ad + xi^2 - U^2, nabla_e = nabla - (xi - U)^2, Gamma = (xi - U) / (2U);</li>
 *   <li>v = l sqrt(g delta / (8 H_P)) (xi - U);</li>
 *   <li>F_conv / F = 1 - nabla / nabla_rad (the radiative flux carries nabla / nabla_rad of F).</li>
 * </ul>
 * Constants: c = 2.99792458e10 cm/s (exact) and sigma = 5.670374419e-5 erg cm^-2 s^-1 K^-4 (CODATA
 * 2018), a = 4 sigma / c.
 *
 * <p>The root is found by bisection on [U, U + 1 + W], where the cubic changes sign (at xi = U it is
 * -(8U/9) W &lt; 0; at xi = U + 1 + W every term of (xi - U)^3 + (8U/9)(xi^2 - U^2 - W) is positive),
 * 220 halvings, which leaves an interval below 1e-60 of its start: no starting guess, no derivative,
 * nothing that could share a mistake with the library's Halley or Newton iteration.
 */
public final class MixingLengthVectors {
    static final MathContext MC = new MathContext(60, RoundingMode.HALF_EVEN);
    static final MathContext OUT = new MathContext(40, RoundingMode.HALF_EVEN);

    static BigDecimal d(String s) {
        return new BigDecimal(s);
    }

    static BigDecimal cubic(BigDecimal u, BigDecimal w, BigDecimal xi) {
        BigDecimal x = xi.subtract(u, MC);
        BigDecimal eight9 = d("8").divide(d("9"), MC);
        return x.pow(3, MC).add(eight9.multiply(u, MC).multiply(xi.pow(2, MC).subtract(u.pow(2, MC), MC).subtract(w, MC), MC), MC);
    }

    /** The root xi &gt; U of the cubic, by bisection. */
    static BigDecimal xi(BigDecimal u, BigDecimal w) {
        BigDecimal lo = u;
        BigDecimal hi = u.add(BigDecimal.ONE).add(w);
        for (int i = 0; i < 220; i++) {
            BigDecimal mid = lo.add(hi).divide(d("2"), MC);
            if (cubic(u, w, mid).signum() > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return lo.add(hi).divide(d("2"), MC);
    }

    static void print(String kind, String key, BigDecimal value) {
        System.out.println(kind + "," + key + "," + value.round(OUT).toString());
    }

    public static void main(String[] args) {
        // MixingLengthCubicTest: (U, W) with nabla_ad = 0.4
        String[][] cases = {{"1e-6", "1"}, {"1e-3", "1"}, {"0.1", "0.1"}, {"0.1", "1"}, {"1", "1"}, {"10", "1"}};
        BigDecimal nablaAd = d("0.4");
        for (String[] c : cases) {
            BigDecimal u = d(c[0]);
            BigDecimal w = d(c[1]);
            BigDecimal xi = xi(u, w);
            String key = c[0] + ";" + c[1];
            print("cubic-xi", key, xi);
            print("cubic-nabla", key, nablaAd.add(xi.pow(2, MC), MC).subtract(u.pow(2, MC), MC));
            print("cubic-gamma", key, xi.subtract(u, MC).divide(u.multiply(d("2"), MC), MC));
        }

        // ConvectionModelTest.syntheticEnvelopePoint
        BigDecimal c = d("2.99792458e10");
        BigDecimal sigma = d("5.670374419e-5");
        BigDecimal a = d("4").multiply(sigma, MC).divide(c, MC);
        BigDecimal t = d("1.2e4");
        BigDecimal rho = d("3e-7");
        BigDecimal p = d("4.989201e5");
        BigDecimal kappa = d("10");
        BigDecimal cp = d("3.467265e8");
        BigDecimal delta = d("1.000419");
        BigDecimal ad = d("0.39987430");
        BigDecimal g = d("2.74e4");
        BigDecimal alpha = d("1.8");
        BigDecimal nablaRad = d("3");

        BigDecimal hp = p.divide(rho.multiply(g, MC), MC);
        BigDecimal l = alpha.multiply(hp, MC);
        BigDecimal root = d("8").multiply(hp, MC).divide(g.multiply(delta, MC), MC).sqrt(MC);
        BigDecimal u = d("3").multiply(a, MC).multiply(c, MC).multiply(t.pow(3, MC), MC)
                .divide(cp.multiply(rho.pow(2, MC), MC).multiply(kappa, MC).multiply(l.pow(2, MC), MC), MC)
                .multiply(root, MC);
        BigDecimal w = nablaRad.subtract(ad, MC);
        BigDecimal xi = xi(u, w);
        BigDecimal nabla = ad.add(xi.pow(2, MC), MC).subtract(u.pow(2, MC), MC);
        BigDecimal nablaE = nabla.subtract(xi.subtract(u, MC).pow(2, MC), MC);
        BigDecimal v = l.multiply(g.multiply(delta, MC).divide(d("8").multiply(hp, MC), MC).sqrt(MC), MC)
                .multiply(xi.subtract(u, MC), MC);
        BigDecimal fconv = BigDecimal.ONE.subtract(nabla.divide(nablaRad, MC), MC);
        print("envelope", "scaleHeight", hp);
        print("envelope", "lossParameter", u);
        print("envelope", "nabla", nabla);
        print("envelope", "nablaElement", nablaE);
        print("envelope", "velocity", v);
        print("envelope", "convectiveFraction", fconv);
    }
}
