package io.github.startransport.core.convection;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The dimensionless cubic against worked values of the textbook theory. */
class MixingLengthCubicTest {

    /**
     * Kippenhahn, Weigert &amp; Weiss (2012, ch. 7): the cubic
     * xi^3 - (19U/9) xi^2 + 3U^2 xi - U^3 - (8U/9)(U^2 + W) = 0 with nabla = nabla_ad + xi^2 - U^2
     * and Gamma = (xi - U)/(2U), nabla_ad = 0.4. Values derived from those equations in 60-digit
     * arithmetic by {@code src/test/resources/vectors/MixingLengthVectors.java} (bisection on the xi form,
     * no code of the library); {@code MixingLengthVectorsTest} reruns it on every build and compares
     * each value below with it.
     */
    @Tag("external")
    @ParameterizedTest
    @CsvSource({
            "1e-6, 1,   0.00961570078658671, 0.400092461700617, 4807.35039329335",
            "1e-3, 1,   0.0968484420322609,  0.409378620724076, 47.9242210161304",
            "0.1,  0.1, 0.257307679609466,   0.456207241986008, 0.786538398047332",
            "0.1,  1,   0.506163519645434,   0.646201508619853, 2.03081759822717",
            "1,    1,   1.39035399793987,    1.33308423958737,  0.195176998969934",
            "10,   1,   10.0498749267226,    1.39998604276682,  0.00249374633612809"})
    void reproducesTextbookVectors(double u, double w, double xi, double nabla, double gamma) {
        double a0 = 9.0 / 4.0; // 2U'/(kU) with k = 8/9, U' = U
        double s = w / (4.0 * u * u);
        double root = MixingLengthCubic.efficiency(a0, s);
        assertEquals(gamma, root, 1e-12 * gamma);
        assertEquals(nabla, 0.4 + w * MixingLengthCubic.superadiabaticShare(a0, root), 1e-13 * nabla);
        // xi = U + x with x = 2 U Gamma
        assertEquals(xi, u + 2.0 * u * root, 1e-13 * xi);
    }
}
