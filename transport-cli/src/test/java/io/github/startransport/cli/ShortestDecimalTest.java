package io.github.startransport.cli;

import com.fasterxml.jackson.core.io.NumberOutput;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Our byte writer of doubles against an independent implementation of the same specification,
 * Jackson's {@code NumberOutput.toString(double, true)} (the layout of {@code Double.toString} since
 * Java 19: the shortest decimal that reads back, the nearest of several), character for character,
 * and every result read back with {@link Double#parseDouble} (the JDK's correctly rounded reader).
 */
class ShortestDecimalTest {

    private static String ours(double v) {
        byte[] b = new byte[ShortestDecimal.MAX_LENGTH + 8];
        b[0] = 'x';
        int end = ShortestDecimal.write(v, b, 1);
        assertEquals('x', b[0], "wrote before its start");
        return new String(b, 1, end - 1, StandardCharsets.US_ASCII);
    }

    private static void same(double v) {
        String expected = NumberOutput.toString(v, true);
        String actual = ours(v);
        assertEquals(expected, actual, "bits " + Long.toHexString(Double.doubleToRawLongBits(v)));
        if (Double.isFinite(v)) {
            assertEquals(Double.doubleToRawLongBits(v), Double.doubleToRawLongBits(Double.parseDouble(actual)), actual);
        }
    }

    @Test
    void randomBitPatternsCoverEveryExponentAndSubnormals() {
        SplittableRandom random = new SplittableRandom(2020);
        for (int i = 0; i < 2_000_000; i++) {
            same(Double.longBitsToDouble(random.nextLong()));
        }
    }

    @Test
    void shortDecimalsIntegersAndTheValuesOfAProfile() {
        SplittableRandom random = new SplittableRandom(19);
        for (int i = 0; i < 500_000; i++) {
            // decimals of 1 to 17 digits at every scale, as files and computations hold them
            int digits = 1 + random.nextInt(17);
            long w = random.nextLong(1, (long) Math.pow(10, Math.min(digits, 17)));
            int e = random.nextInt(-330, 310);
            same(Double.parseDouble(w + "E" + e));
            same(random.nextLong(-(1L << 54), 1L << 54));
            same(Math.pow(10, random.nextDouble(-12, 40)));
        }
    }

    @Test
    void edgesOfTheLayoutAndOfTheRange() {
        double[] special = {0.0, -0.0, 1.0, -1.0, 0.5, 0.1, 0.2, 0.3, 1e-3, 9.999999999999999e-4, 1e-4, 1e7,
            9999999.0, 9999999.999999998, 1e6, 123456.789, 1.0E23, 8.41E21, 5e-324, 1e-323, 2 * Double.MIN_VALUE,
            3 * Double.MIN_VALUE, Double.MIN_NORMAL, Math.nextDown(Double.MIN_NORMAL), Double.MAX_VALUE,
            Math.nextDown(Double.MAX_VALUE), 1L << 53, (1L << 53) + 2, 2.0E-3, 1.0E-5, 4.35E-3,
            Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Math.PI, Math.E};
        for (double v : special) {
            same(v);
            same(-v);
        }
        // powers of two: the lower neighbour is half as far (the asymmetric interval)
        for (int p = -1074; p <= 1023; p++) {
            same(Math.scalb(1.0, p));
        }
        // powers of ten and their neighbours
        for (int p = -323; p <= 308; p++) {
            double v = Double.parseDouble("1e" + p);
            same(v);
            same(Math.nextUp(v));
            same(Math.nextDown(v));
        }
    }

    /** The floors of logarithms the algorithm takes by multiplication, against exact arithmetic. */
    @Test
    void logarithmFloorsAreExactOverTheRangeUsed() {
        MathContext mc = new MathContext(60, RoundingMode.HALF_EVEN);
        // log10 2, log2 10 and log10(3/4) to 60 digits, from bc -l (l(x) / l(10) at scale 60)
        BigDecimal log10of2 = new BigDecimal("0.301029995663981195213738894724493026768189881462108541310427");
        BigDecimal log2of10 = new BigDecimal("3.32192809488736234787031942948939017586483139302458061205475");
        BigDecimal log10ThreeQuarters = new BigDecimal("-0.124938736608299953132449886193870744336250898733521217790989");
        for (int q = -1100; q <= 1100; q++) {
            BigDecimal bq = BigDecimal.valueOf(q);
            assertEquals(floor(bq.multiply(log10of2, mc)), ShortestDecimal.flog10pow2(q), "q = " + q);
            assertEquals(floor(bq.multiply(log10of2, mc).add(log10ThreeQuarters, mc)),
                    ShortestDecimal.flog10threeQuartersPow2(q), "q = " + q);
        }
        for (int e = -400; e <= 400; e++) {
            assertEquals(floor(BigDecimal.valueOf(e).multiply(log2of10, mc)), ShortestDecimal.flog2pow10(e), "e = " + e);
        }
    }

    private static int floor(BigDecimal x) {
        return x.setScale(0, RoundingMode.FLOOR).intValueExact();
    }
}
