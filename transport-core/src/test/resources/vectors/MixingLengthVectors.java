import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Derives, in 60-digit decimal arithmetic, the many-digit expected values of
 * {@code MixingLengthCubicTest} and of {@code ConvectionModelTest} (the synthetic envelope point and the
 * two solar-like zones).
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

        // ConvectionModelTest.deepSolarEnvelope and nearSolarSurface: solar-like zones of ideal gas plus
        // radiation with mu = 0.6 at r = f R_sun, m = M_sun, L = L_sun
        solarLike("deep", d("0.85"), d("1.0e6"), d("0.05"), d("10"));
        solarLike("surface", d("1.0"), d("1.0e4"), d("3e-7"), d("10"));
        print("check", "pi", PI);
    }

    /** pi to 50 digits (value from memory; its digits are checked against Math.PI's 16 in the test). */
    static final BigDecimal PI = d("3.14159265358979323846264338327950288419716939937510");

    /**
     * A zone of ideal gas plus radiation (Chandrasekhar 1939; Kippenhahn, Weigert &amp; Weiss 2012 ch. 13):
     * beta = P_gas / P with P_gas = rho k T / (mu m_u), P_rad = a T^4 / 3;
     * c_P = (k / (mu m_u)) (32 - 24 beta - 3 beta^2) / (2 beta^2), delta = (4 - 3 beta) / beta,
     * nabla_ad = 2 (4 - 3 beta) / (32 - 24 beta - 3 beta^2); gravity g = G m / r^2 and the radiative
     * gradient nabla_rad = 3 kappa L P / (16 pi a c G m T^4) (KWW eq. 5.28); then the cubic as above
     * with l = alpha H_P, alpha = 1.8 (H_P is far below r in both zones, so min(H_P, r) = H_P).
     * Constants: k = 1.380649e-16 erg/K (exact), m_u = 1.66053906660e-24 g, G = 6.67430e-8 (CODATA 2018);
     * R_sun = 6.957e10 cm, L_sun = 3.828e33 erg/s, (GM)_sun = 1.3271244e26 cm^3 s^-2 (IAU 2015 B3),
     * M_sun = (GM)_sun / G.
     */
    static void solarLike(String name, BigDecimal f, BigDecimal t, BigDecimal rho, BigDecimal kappa) {
        BigDecimal c = d("2.99792458e10");
        BigDecimal a = d("4").multiply(d("5.670374419e-5"), MC).divide(c, MC);
        BigDecimal k = d("1.380649e-16");
        BigDecimal mu = d("1.66053906660e-24");
        BigDecimal g0 = d("6.67430e-8");
        BigDecimal mass = d("1.3271244e26").divide(g0, MC);
        BigDecimal r = f.multiply(d("6.957e10"), MC);
        BigDecimal lum = d("3.828e33");
        BigDecimal gasConstant = k.divide(d("0.6").multiply(mu, MC), MC);
        BigDecimal pg = rho.multiply(gasConstant, MC).multiply(t, MC);
        BigDecimal pr = a.multiply(t.pow(4, MC), MC).divide(d("3"), MC);
        BigDecimal p = pg.add(pr, MC);
        BigDecimal beta = pg.divide(p, MC);
        BigDecimal poly = d("32").subtract(d("24").multiply(beta, MC), MC).subtract(d("3").multiply(beta.pow(2, MC), MC), MC);
        BigDecimal cp = gasConstant.multiply(poly, MC).divide(d("2").multiply(beta.pow(2, MC), MC), MC);
        BigDecimal delta = d("4").subtract(d("3").multiply(beta, MC), MC).divide(beta, MC);
        BigDecimal ad = d("2").multiply(d("4").subtract(d("3").multiply(beta, MC), MC), MC).divide(poly, MC);
        BigDecimal g = g0.multiply(mass, MC).divide(r.pow(2, MC), MC);
        BigDecimal nablaRad = d("3").multiply(kappa, MC).multiply(lum, MC).multiply(p, MC)
                .divide(d("16").multiply(PI, MC).multiply(a, MC).multiply(c, MC).multiply(g0, MC).multiply(mass, MC)
                        .multiply(t.pow(4, MC), MC), MC);
        BigDecimal hp = p.divide(rho.multiply(g, MC), MC);
        BigDecimal l = d("1.8").multiply(hp, MC);
        BigDecimal u = d("3").multiply(a, MC).multiply(c, MC).multiply(t.pow(3, MC), MC)
                .divide(cp.multiply(rho.pow(2, MC), MC).multiply(kappa, MC).multiply(l.pow(2, MC), MC), MC)
                .multiply(d("8").multiply(hp, MC).divide(g.multiply(delta, MC), MC).sqrt(MC), MC);
        BigDecimal xi = xi(u, nablaRad.subtract(ad, MC));
        BigDecimal nabla = ad.add(xi.pow(2, MC), MC).subtract(u.pow(2, MC), MC);
        BigDecimal v = l.multiply(g.multiply(delta, MC).divide(d("8").multiply(hp, MC), MC).sqrt(MC), MC)
                .multiply(xi.subtract(u, MC), MC);
        print(name, "nablaRad", nablaRad);
        print(name, "excess", nabla.subtract(ad, MC));
        print(name, "velocity", v);
    }
}
