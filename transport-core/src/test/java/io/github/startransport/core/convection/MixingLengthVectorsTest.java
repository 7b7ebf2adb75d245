package io.github.startransport.core.convection;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.provider.CsvSource;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The many-digit literals of {@link MixingLengthCubicTest} and {@link ConvectionModelTest} (the
 * synthetic envelope point, the deep and the near-surface solar-like zones) are what their derivation gives: runs {@code src/test/resources/vectors/MixingLengthVectors.java} (60-digit
 * decimal arithmetic, no code of the library) in a child JVM, as a person would from the module's
 * folder, and requires each literal to lie within one unit of its own last digit of the derived value.
 * A literal retyped wrongly, or a derivation changed without the tests, fails here.
 */
class MixingLengthVectorsTest {
    private static final Path SCRIPT = Path.of("src", "test", "resources", "vectors", "MixingLengthVectors.java");

    /** Runs the derivation; its lines {@code kind,key,value} by {@code kind,key}. */
    private static Map<String, BigDecimal> derived() throws IOException, InterruptedException {
        assertTrue(Files.isRegularFile(SCRIPT), SCRIPT.toAbsolutePath() + " missing");
        String java = ProcessHandle.current().info().command().orElse("java");
        Process p = new ProcessBuilder(java, SCRIPT.toString()).redirectErrorStream(true).start();
        String text = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "the derivation did not end");
        assertEquals(0, p.exitValue(), text);
        Map<String, BigDecimal> values = new HashMap<>();
        for (String line : text.split("\n")) {
            String[] f = line.strip().split(",");
            assertEquals(3, f.length, "line '" + line + "'");
            values.put(f[0] + "," + f[1], new BigDecimal(f[2]));
        }
        return values;
    }

    /** The literal as typed, within one unit of its last digit of the derived value. */
    private static void assertLiteral(String literal, BigDecimal derived, String what) {
        assertNotNull(derived, what + " is not derived by " + SCRIPT);
        BigDecimal typed = new BigDecimal(literal.strip());
        BigDecimal off = typed.subtract(derived).abs();
        assertTrue(off.compareTo(typed.ulp()) <= 0,
                what + ": typed " + literal.strip() + ", derived " + derived + " (off by " + off + ")");
    }

    @Tag("internal")
    @Test
    @Timeout(120)
    void testLiteralsAreTheDerivedValues() throws Exception {
        Map<String, BigDecimal> derived = derived();
        CsvSource rows = MixingLengthCubicTest.class
                .getDeclaredMethod("reproducesTextbookVectors", double.class, double.class, double.class,
                        double.class, double.class)
                .getAnnotation(CsvSource.class);
        int compared = 0;
        for (String row : rows.value()) {
            String[] f = row.split(",");
            String key = f[0].strip() + ";" + f[1].strip();
            assertLiteral(f[2], derived.get("cubic-xi," + key), "xi at U;W = " + key);
            assertLiteral(f[3], derived.get("cubic-nabla," + key), "nabla at U;W = " + key);
            assertLiteral(f[4], derived.get("cubic-gamma," + key), "Gamma at U;W = " + key);
            compared += 3;
        }
        // the constants are compared as Java prints them (the shortest text that gives the same double)
        assertLiteral(Double.toString(ConvectionModelTest.SYNTHETIC_SCALE_HEIGHT), derived.get("envelope,scaleHeight"),
                "H_P");
        assertLiteral(Double.toString(ConvectionModelTest.SYNTHETIC_LOSS_PARAMETER),
                derived.get("envelope,lossParameter"), "U");
        assertLiteral(Double.toString(ConvectionModelTest.SYNTHETIC_NABLA), derived.get("envelope,nabla"), "nabla");
        assertLiteral(Double.toString(ConvectionModelTest.SYNTHETIC_NABLA_ELEMENT), derived.get("envelope,nablaElement"),
                "nabla_e");
        assertLiteral(Double.toString(ConvectionModelTest.SYNTHETIC_VELOCITY), derived.get("envelope,velocity"), "v");
        assertLiteral(Double.toString(ConvectionModelTest.SYNTHETIC_CONVECTIVE_FRACTION),
                derived.get("envelope,convectiveFraction"), "F_conv/F");
        compared += 6;
        for (String zone : new String[] {"deep", "surface"}) {
            boolean deep = zone.equals("deep");
            assertLiteral(Double.toString(deep ? ConvectionModelTest.DEEP_NABLA_RAD : ConvectionModelTest.SURFACE_NABLA_RAD),
                    derived.get(zone + ",nablaRad"), zone + " nabla_rad");
            assertLiteral(Double.toString(deep ? ConvectionModelTest.DEEP_EXCESS : ConvectionModelTest.SURFACE_EXCESS),
                    derived.get(zone + ",excess"), zone + " nabla - nabla_ad");
            assertLiteral(Double.toString(deep ? ConvectionModelTest.DEEP_VELOCITY : ConvectionModelTest.SURFACE_VELOCITY),
                    derived.get(zone + ",velocity"), zone + " v");
            compared += 3;
        }
        // the derivation's 50-digit pi (typed from memory) agrees with the double nearest pi
        assertEquals(Math.PI, derived.get("check,pi").doubleValue());
        compared++;
        assertEquals(31, compared);
        assertEquals(derived.size(), compared, "values derived but compared with no literal: " + derived.keySet());
    }
}
