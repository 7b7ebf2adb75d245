package io.github.startransport.core.robustness;

import io.github.startransport.core.opacity.OpacityTableReader;
import io.github.startransport.core.opacity.OpacityTableSet;
import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OutOfRangePolicy;
import io.github.startransport.spi.TransportException;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.Tag;
import net.jqwik.api.Tuple;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.statistics.Statistics;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Garbage for the opacity table reader: random bytes, random lines, and a valid table with random
 * fields spoiled. The only outcomes allowed: a {@link DataFormatException} naming the source (with
 * a line whenever one is given), or a loaded set whose lookups give finite values or our exception.
 */
class OpacityTableFuzzTest {
    private static final String HEADER = "X,Z,log_T,log_R,log_kappa";

    private static String validTable() {
        StringBuilder b = new StringBuilder("# fuzz base\n").append(HEADER).append('\n');
        for (double x : new double[] {0.0, 0.7}) {
            for (int i = 0; i < 4; i++) {
                for (int j = 0; j < 4; j++) {
                    b.append(x).append(",0.02,").append(4.0 + 0.5 * i).append(',').append(-3.0 + 0.5 * j).append(',')
                            .append(0.1 * i - 0.2 * j + x).append('\n');
                }
            }
        }
        return b.toString();
    }

    @Provide
    Arbitrary<String> junkField() {
        return Arbitraries.frequencyOf(
                Tuple.of(3, Arbitraries.of("", " ", "NaN", "Infinity", "-Infinity", "1e999", "-0", "0x10", "1,2",
                        "absent:", "absent: log_R > 0", "#", "\"", "1.5.5", "\u00e9", "\t", "-1", "2", "9e-400")),
                Tuple.of(2, Arbitraries.strings().ofMaxLength(12)),
                Tuple.of(2, Arbitraries.doubles().between(-1e6, 1e6).ofScale(9).map(String::valueOf)));
    }

    private static void check(String text) {
        try {
            OpacityTableSet set = OpacityTableReader.parse(text, "fuzz.csv");
            Statistics.collect("accepted");
            OpacityResult r = new OpacityResult();
            for (OutOfRangePolicy policy : OutOfRangePolicy.values()) {
                for (double t : new double[] {1e4, 3e4, 1e5, 1e7}) {
                    try {
                        set.evaluate(t, 1e-6 * t * t * t / 1e18, 0.35, 0.02, policy, 0, r);
                        assertTrue(r.kappa > 0 && Double.isFinite(r.kappa) && Double.isFinite(r.dLnKappaDLnT)
                                && Double.isFinite(r.dLnKappaDLnRho), "lookup " + r);
                    } catch (TransportException e) {
                        assertTrue(e.getMessage() != null && !e.getMessage().isBlank());
                    }
                }
            }
        } catch (DataFormatException e) {
            Statistics.collect("refused");
            assertTrue(e.getMessage() != null && e.getMessage().startsWith("fuzz.csv"), e.getMessage());
            assertTrue(e.line() >= 0 && e.column() >= 0);
        }
    }

    @Tag("internal")
    @Property(tries = 400, seed = "7201")
    void randomBytesAreRefusedOrLoaded(@ForAll @IntRange(min = 0, max = 400) int length, @ForAll long seed) {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(seed);
        byte[] bytes = new byte[length];
        for (int i = 0; i < length; i++) {
            bytes[i] = (byte) rnd.nextInt(256);
        }
        check(HEADER + "\n" + new String(bytes, java.nio.charset.StandardCharsets.ISO_8859_1));
    }

    @Tag("internal")
    @Property(tries = 600, seed = "7202")
    void spoiledFieldsAreRefusedOrLoaded(@ForAll("junkField") String junk, @ForAll @IntRange(min = 0, max = 200) int at,
                                         @ForAll @IntRange(min = 0, max = 3) int how) {
        List<String> lines = new java.util.ArrayList<>(List.of(validTable().split("\n", -1)));
        int line = at % lines.size();
        String[] fields = lines.get(line).split(",", -1);
        switch (how) {
            case 0 -> fields[at % fields.length] = junk;                 // replace one field
            case 1 -> lines.add(line, junk);                              // insert a junk line
            case 2 -> lines.remove(line);                                 // drop a line
            default -> fields[at % fields.length] += junk;               // append junk to a field
        }
        if (how == 0 || how == 3) {
            lines.set(line, String.join(",", fields));
        }
        check(String.join("\n", lines));
    }
}
