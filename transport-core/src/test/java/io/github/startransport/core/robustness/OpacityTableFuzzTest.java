package io.github.startransport.core.robustness;

import io.github.startransport.core.opacity.OpacityTableReader;
import io.github.startransport.core.opacity.OpacityTableSet;
import io.github.startransport.spi.DataFormatException;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.OpacityStatus;
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

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Garbage for the opacity table reader: random bytes put into a valid table, random lines, and a
 * valid table with random fields spoiled. The only outcomes allowed: a {@link DataFormatException}
 * naming the source (with a line whenever one is given), or a loaded set that gives back every node
 * of the text and whose lookups inside and outside its range behave as the out-of-range policy says.
 * The shares of loaded and refused texts, and of lookups inside a table, are printed and checked.
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

    /** A decimal number as the format defines it: optional sign, digits, optional fraction, optional exponent. */
    private static final Pattern NUMBER = Pattern.compile("\\s*[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?\\s*");

    /**
     * The nodes of a table text read the way the format's definition states it (a line that is not a
     * comment and holds five decimal numbers), written here without the reader's code.
     */
    private static List<double[]> nodes(String text) {
        List<double[]> nodes = new ArrayList<>();
        for (String line : text.split("\n", -1)) {
            if (line.strip().startsWith("#")) {
                continue;
            }
            String[] f = line.split(",", -1);
            if (f.length != 5) {
                continue;
            }
            double[] v = new double[5];
            boolean numbers = true;
            for (int i = 0; i < 5 && numbers; i++) {
                numbers = NUMBER.matcher(f[i]).matches();
                v[i] = numbers ? Double.parseDouble(f[i].strip()) : 0.0;
            }
            if (numbers) {
                nodes.add(v);
            }
        }
        return nodes;
    }

    /** rho (g cm^-3) at log T and log R, from log_R = log10 rho - 3 log10 T + 18 (the format's definition). */
    private static double density(double logT, double logR) {
        return Math.pow(10.0, logR + 3.0 * logT - 18.0);
    }

    /**
     * Parses the text; a refusal must name the file and a place in it. A loaded set is then looked up
     * (1) at every node the text holds, where a piecewise-cubic Hermite interpolant passes through the
     * tabulated value (its defining property; common practice, no source) and the X and Z weights of a
     * node's own composition are 1 and 0, so log10 kappa must come back to rounding; (2) at the centre
     * of cell {@code cell} of every table, with the refusing policy: inside the table, so the result is
     * INSIDE and finite, or a refusal where a declared hole touches the cell; (3) beyond the log T edge
     * under each policy: refused, CLAMPED or EXTRAPOLATED as the policy says.
     */
    private static void check(String text, int cell) {
        OpacityTableSet set;
        try {
            set = OpacityTableReader.parse(text, "fuzz.csv");
        } catch (DataFormatException e) {
            Statistics.label("table").collect("refused");
            Statistics.label("lookup at a cell centre").collect("no table");
            assertTrue(e.getMessage() != null && e.getMessage().startsWith("fuzz.csv"), e.getMessage());
            assertTrue(e.line() >= 0 && e.column() >= 0);
            return;
        }
        Statistics.label("table").collect("accepted");
        OpacityResult r = new OpacityResult();
        // The reader takes any finite log10 kappa; one beyond about +-300 is no double as kappa, and a
        // lookup touching it must then be refused by our own exception (counted apart below).
        boolean unrepresentable = false;
        for (double[] node : nodes(text)) {
            unrepresentable |= Math.abs(node[4]) >= 300.0;
        }
        for (double[] node : nodes(text)) {
            try {
                set.evaluate(Math.pow(10.0, node[2]), density(node[2], node[3]), node[0], node[1],
                        OutOfRangePolicy.CLAMP, 0, r);
                assertEquals(node[4], Math.log10(r.kappa), 1e-9 * Math.max(1.0, Math.abs(node[4])),
                        "node " + java.util.Arrays.toString(node) + " of\n" + text);
            } catch (InvalidInputException e) {
                Statistics.label("node beyond double range").collect("refused");
                assertTrue(unrepresentable, "node " + java.util.Arrays.toString(node) + " refused: " + e.getMessage());
                assertTrue(e.getMessage().contains("finite and > 0"), e.getMessage());
            }
        }
        String centre = "refused in a hole or beyond double range";
        for (OpacityTableSet.TableDescription d : set.describe()) {
            int i = cell % (d.logT().length - 1);
            int j = cell / 7 % (d.logR().length - 1);
            double lt = 0.5 * (d.logT()[i] + d.logT()[i + 1]);
            double lr = 0.5 * (d.logR()[j] + d.logR()[j + 1]);
            try {
                set.evaluate(Math.pow(10.0, lt), density(lt, lr), d.hydrogen(), d.metals(), OutOfRangePolicy.REFUSE, 0, r);
                centre = "inside";
                assertEquals(OpacityStatus.INSIDE, r.status);
                assertTrue(r.kappa > 0 && Double.isFinite(r.kappa) && Double.isFinite(r.dLnKappaDLnT)
                        && Double.isFinite(r.dLnKappaDLnRho), "lookup " + r);
            } catch (InvalidInputException e) {
                assertTrue(d.present() < d.logT().length * d.logR().length || unrepresentable,
                        "refused inside a table without holes: " + e.getMessage());
            }
            double beyond = d.logT()[d.logT().length - 1] + 0.3;
            for (OutOfRangePolicy policy : OutOfRangePolicy.values()) {
                try {
                    set.evaluate(Math.pow(10.0, beyond), density(beyond, lr), d.hydrogen(), d.metals(), policy, 0, r);
                    assertTrue(policy != OutOfRangePolicy.REFUSE, "a point beyond the table was not refused");
                    assertEquals(policy == OutOfRangePolicy.CLAMP ? OpacityStatus.CLAMPED : OpacityStatus.EXTRAPOLATED,
                            r.status);
                    assertTrue(r.kappa > 0 && Double.isFinite(r.kappa), "lookup " + r);
                } catch (TransportException e) {
                    assertTrue(policy != OutOfRangePolicy.CLAMP, "clamping refused: " + e.getMessage());
                    assertTrue(e.getMessage() != null && !e.getMessage().isBlank());
                }
            }
        }
        // once per try: "inside" when at least one table's cell centre was interpolated
        Statistics.label("lookup at a cell centre").collect(centre);
    }

    /**
     * Shares this fuzzer is built for (design targets, not physics): at least 10 % of the texts load
     * and reach the lookups, at least 30 % are refused, and a lookup inside a loaded table (the
     * interpolation itself, not a guard) runs in at least 10 % of the tries.
     */
    private static void shares() {
        Statistics.label("table").coverage(c -> {
            c.check("accepted").percentage(p -> p >= 10.0);
            c.check("refused").percentage(p -> p >= 30.0);
        });
        Statistics.label("lookup at a cell centre").coverage(c -> c.check("inside").percentage(p -> p >= 10.0));
    }

    /** How many random bytes go in: none (the valid table), a few, or many. */
    @Provide
    Arbitrary<Integer> byteCount() {
        return Arbitraries.frequencyOf(Tuple.of(1, Arbitraries.just(0)), Tuple.of(3, Arbitraries.integers().between(1, 3)),
                Tuple.of(2, Arbitraries.integers().between(4, 400)));
    }

    @Tag("internal")
    @Property(tries = 400, seed = "7201")
    void randomBytesAreRefusedOrLoaded(@ForAll("byteCount") int length, @ForAll long seed,
                                       @ForAll @IntRange(min = 0, max = 2000) int at,
                                       @ForAll @IntRange(min = 0, max = 48) int cell) {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(seed);
        byte[] bytes = new byte[length];
        for (int i = 0; i < length; i++) {
            bytes[i] = (byte) rnd.nextInt(256);
        }
        String valid = validTable();
        int where = at % (valid.length() + 1);
        shares();
        check(valid.substring(0, where) + new String(bytes, java.nio.charset.StandardCharsets.ISO_8859_1)
                + valid.substring(where), cell);
    }

    @Tag("internal")
    @Property(tries = 600, seed = "7202")
    void spoiledFieldsAreRefusedOrLoaded(@ForAll("junkField") String junk, @ForAll @IntRange(min = 0, max = 200) int at,
                                         @ForAll @IntRange(min = 0, max = 3) int how,
                                         @ForAll @IntRange(min = 0, max = 48) int cell) {
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
        shares();
        check(String.join("\n", lines), cell);
    }
}
