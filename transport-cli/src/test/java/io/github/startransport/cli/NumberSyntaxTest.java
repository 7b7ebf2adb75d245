package io.github.startransport.cli;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The profile reader's numbers: the syntax it accepts, and the double it makes, which must be
 * bit for bit the JDK's correctly rounded {@link Double#parseDouble} of the same text (an
 * independent implementation: the tool uses its own Clinger and Eisel-Lemire paths, and Jackson's
 * parser for long cells).
 */
class NumberSyntaxTest {

    private static double parse(String s) {
        byte[] b = s.getBytes(StandardCharsets.UTF_8);
        return NumberSyntax.parse(b, 0, b.length);
    }

    private static void assertSameAsJdk(String text) {
        assertEquals(Double.doubleToRawLongBits(Double.parseDouble(text)), Double.doubleToRawLongBits(parse(text)),
                text + ": JDK " + Double.parseDouble(text) + ", ours " + parse(text));
    }

    @Test
    void acceptsPlainDecimalsOnly() {
        for (String ok : List.of("0", "-0", "+7", "1.", ".5", "1.5e7", "1.5E-07", "-2.5e+300", "00012", "4.9e-324")) {
            assertSameAsJdk(ok);
        }
        for (String bad : List.of("", "+", "-", ".", "e5", "1e", "1e+", "1.2.3", "NaN", "Infinity", "-Infinity",
                "0x1p3", "1.5d", "1.5D+", "1.5f", "1,5", " 1", "1 ", "1e5.0", "--1", "\u0661", "1_000", "1.5-100",
                "1.5De7", "1.5ED7")) {
            assertEquals(Double.NaN, parse(bad), "'" + bad + "' was taken as a number");
        }
        assertEquals(Double.NaN, parse("1".repeat(NumberSyntax.MAX_LENGTH + 1)));
    }

    /** Fortran's double-precision exponent letter: the same double as the JDK gives for the E form. */
    private static void assertFortranSameAsJdk(String eForm) {
        double jdk = Double.parseDouble(eForm);
        for (String letter : List.of("D", "d")) {
            String fortran = eForm.replace("e", letter).replace("E", letter);
            assertEquals(Double.doubleToRawLongBits(jdk), Double.doubleToRawLongBits(parse(fortran)),
                    fortran + ": JDK (as " + eForm + ") " + jdk + ", ours " + parse(fortran));
        }
    }

    @Test
    void readsFortranDoublePrecisionExponents() {
        for (String s : List.of("1.5E+07", "1.5e7", "-2.5E-300", "0.1000000000000000E+01", "7E0", ".5E-3",
                "1e-400", "1e400", "0.15E-100", "123456789012345678901234567890E-10")) {
            assertFortranSameAsJdk(s);
        }
    }

    @Test
    void aZeroIsToldFromAnUnderflow() {
        // the independent truth: BigDecimal holds the written number exactly
        for (String s : List.of("0", "-0.0", "0e5", "0.000D-3", "1e-400", "-2.5d-999", "0.0001e-330", "4.9e-324",
                "1e-5", "000.000")) {
            boolean writtenNonZero = new java.math.BigDecimal(s.replace('d', 'e').replace('D', 'e')).signum() != 0;
            assertEquals(writtenNonZero, NumberSyntax.nonZeroDigits(s), s);
        }
    }

    @Test
    void hardCasesOfRoundingRangeAndLength() {
        // halfway and near-halfway cases, limits of the double range, subnormals, long and huge exponents
        for (String s : List.of("9007199254740993", "9007199254740992.5", "9007199254740995", "2.2250738585072011e-308",
                "2.2250738585072012e-308", "2.2250738585072014E-308", "4.9406564584124654e-324", "2.4703282292062327e-324",
                "2.4703282292062328e-324", "1.7976931348623157e308", "1.7976931348623158e308", "1.7976931348623159e308",
                "1e400", "-1e400", "1e-400", "-1e-400", "0.000000000000000000000000000000000001", "1e23", "8.41e21",
                "123456789012345678901234567890", "0.1000000000000000055511151231257827021181583404541015625",
                "7.2057594037927933e16", "1e99999999999999999999", "1e-99999999999999999999", "-0.0e5",
                "3.0000000000000004440892098500626161694526672363281250000001", "1.00000000000000011102230246251565404236316680908203125",
                "1.00000000000000011102230246251565404236316680908203124", "4503599627370496.5", "4503599627370497.5")) {
            assertSameAsJdk(s);
        }
    }

    @Provide
    Arbitrary<String> numbers() {
        Arbitrary<Double> any = Arbitraries.longs().map(Double::longBitsToDouble)
                .filter(d -> Double.isFinite(d));
        Arbitrary<Double> stellar = Arbitraries.doubles().between(-80, 80).map(Math::exp);
        return Arbitraries.oneOf(
                any.map(String::valueOf),                                       // shortest round trip, any exponent
                stellar.map(String::valueOf),                                   // the magnitudes of profiles
                any.map(d -> String.format(Locale.ROOT, "%.16e", d)),           // 17 significant digits
                stellar.map(d -> String.format(Locale.ROOT, "%.18e", d)),       // 19: the last of the fast paths
                any.map(d -> String.format(Locale.ROOT, "%.25e", d)),           // more digits than a double holds
                Arbitraries.strings().withChars("0123456789").ofMinLength(1).ofMaxLength(22)
                        .flatMap(m -> Arbitraries.integers().between(-345, 330).map(e -> m + "e" + e)),
                Arbitraries.strings().withChars("0123456789").ofMinLength(1).ofMaxLength(19)
                        .flatMap(m -> Arbitraries.integers().between(0, 19).map(p -> p >= m.length() ? "0." + m
                                : m.substring(0, p) + "." + m.substring(p))));
    }

    @Property(tries = 20000, seed = "13")
    void givesTheSameDoubleAsTheJdk(@ForAll("numbers") String text) {
        assertSameAsJdk(text);
    }

    @Property(tries = 3000, seed = "29")
    void fortranExponentsGiveTheSameDoubleAsTheJdksEForm(@ForAll("numbers") String text) {
        if (text.contains("e") || text.contains("E")) {
            assertFortranSameAsJdk(text);
        }
    }
}
