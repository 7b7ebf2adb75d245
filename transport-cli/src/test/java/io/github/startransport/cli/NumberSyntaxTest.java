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
 * the JDK's correctly rounded {@link Double#parseDouble} of the same text (an independent
 * implementation: the tool parses with Jackson's fast parser).
 */
class NumberSyntaxTest {

    private static double parse(String s) {
        byte[] b = s.getBytes(StandardCharsets.UTF_8);
        char[] c = new char[NumberSyntax.MAX_LENGTH];
        int n = NumberSyntax.copy(b, 0, b.length, c);
        return n < 0 ? Double.NaN : NumberSyntax.parse(c, n);
    }

    @Test
    void acceptsPlainDecimalsOnly() {
        for (String ok : List.of("0", "-0", "+7", "1.", ".5", "1.5e7", "1.5E-07", "-2.5e+300", "00012", "4.9e-324")) {
            assertEquals(Double.parseDouble(ok), parse(ok), ok);
        }
        for (String bad : List.of("", "+", "-", ".", "e5", "1e", "1e+", "1.2.3", "NaN", "Infinity", "-Infinity",
                "0x1p3", "1.5d", "1.5f", "1,5", " 1", "1 ", "1e5.0", "--1", "\u0661", "1_000")) {
            assertEquals(Double.NaN, parse(bad), "'" + bad + "' was taken as a number");
        }
        assertEquals(Double.NaN, parse("1".repeat(NumberSyntax.MAX_LENGTH + 1)));
    }

    @Provide
    Arbitrary<String> numbers() {
        Arbitrary<Double> any = Arbitraries.longs().map(Double::longBitsToDouble)
                .filter(d -> Double.isFinite(d));
        return Arbitraries.oneOf(
                any.map(String::valueOf),                                       // shortest round trip
                any.map(d -> String.format(Locale.ROOT, "%.16e", d)),           // 17 significant digits
                any.map(d -> String.format(Locale.ROOT, "%.25e", d)),           // more digits than a double holds
                Arbitraries.strings().withChars("0123456789").ofMinLength(1).ofMaxLength(30)
                        .flatMap(m -> Arbitraries.integers().between(-340, 320).map(e -> "0." + m + "e" + e)));
    }

    @Property(tries = 3000, seed = "13")
    void givesTheSameDoubleAsTheJdk(@ForAll("numbers") String text) {
        assertEquals(Double.doubleToRawLongBits(Double.parseDouble(text)), Double.doubleToRawLongBits(parse(text)),
                text);
    }
}
