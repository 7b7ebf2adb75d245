package io.github.startransport.core.checks;

/**
 * What a test method compares with. Every test method of this module carries exactly one of these
 * three values as a tag ({@code org.junit.jupiter.api.Tag} on JUnit methods, {@code net.jqwik.api.Tag}
 * on jqwik properties), and {@link CheckKindCoverageTest} fails when one does not. Run one kind alone
 * with {@code -Dgroups=external} (or {@code law}, {@code internal}).
 */
public final class CheckKind {
    /**
     * Compares with something the project did not invent: a published value, a cited textbook formula
     * recomputed in the test from the inputs, a standard (CODATA 2018, IAU 2015 B3), a closed-form
     * solution, or an independent library (Commons Math).
     */
    public static final String EXTERNAL = "external";
    /**
     * States a physical law as a property: a limit, bound, monotonicity, continuity, conservation, an
     * identity from thermodynamics.
     */
    public static final String LAW = "law";
    /**
     * Consistency of the code with itself: batch against per zone, threads bit-identical, a derivative
     * against a finite difference of our own function, error messages and refusals.
     */
    public static final String INTERNAL = "internal";

    private CheckKind() {
    }
}
