package io.github.startransport.core.profile;

/**
 * Locates a boundary between two grid points as the root of the straight line through the
 * values of the quantity whose sign change defines it (the stability margin, or nabla_mu).
 * Exact when that quantity is linear in r between the two zones.
 */
public final class BoundaryFinder {
    private BoundaryFinder() {
    }

    /**
     * @param x0 coordinate of the first point
     * @param f0 value there
     * @param x1 coordinate of the second point
     * @param f1 value there, of the opposite sign (or zero)
     * @return the root of the line through (x0, f0), (x1, f1); the midpoint when f0 = f1
     */
    public static double root(double x0, double f0, double x1, double f1) {
        if (f0 == f1) {
            return 0.5 * (x0 + x1);
        }
        double w = f0 / (f0 - f1);
        if (w < 0.0) {
            w = 0.0;
        } else if (w > 1.0) {
            w = 1.0;
        }
        return x0 + w * (x1 - x0);
    }

    /**
     * @param a first value
     * @param b second value
     * @return whether a and b lie on different sides of zero (a zero counts as a change)
     */
    public static boolean changesSign(double a, double b) {
        return (a > 0.0) != (b > 0.0);
    }
}
