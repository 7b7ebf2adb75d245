package io.github.startransport.core.envelope;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.InvalidInputException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;

/**
 * The envelope's structure equations with t = ln P as the independent variable and the state
 * y = (r, ln T, M - m):
 * <ul>
 *   <li>dr / d ln P = -P r^2 / (G M rho) (hydrostatic equilibrium, dP/dr = -G m rho / r^2)</li>
 *   <li>d ln T / d ln P = nabla (the convection model's actual gradient; nabla_rad where stable)</li>
 *   <li>d(M - m) / d ln P = 4 pi r^4 P / (G M) (mass conservation, dm/dr = 4 pi r^2 rho)</li>
 * </ul>
 * with m = M in gravity and in nabla_rad and L constant (Kippenhahn, Weigert &amp; Weiss 2012,
 * §11.3, the envelope approximation [section from memory]). ln P is monotonic through the whole
 * envelope and changes by O(1) per pressure scale height, so an adaptive step in it follows thin
 * ionisation zones and the deep interior alike.
 *
 * <p>Holds an {@link EnvelopePoint}: one instance per integration.
 */
final class EnvelopeEquations implements FirstOrderDifferentialEquations {
    /** Index of r (cm) in the state. */
    static final int R = 0;
    /** Index of ln T in the state. */
    static final int LN_T = 1;
    /** Index of M - m (g) in the state. */
    static final int MASS_ABOVE = 2;

    private final EnvelopePoint point;
    private final double gm;
    private final double radiusScale;

    EnvelopeEquations(EnvelopePoint point, double mass, double radius) {
        this.point = point;
        this.gm = Codata2018.GRAVITATIONAL_CONSTANT * mass;
        this.radiusScale = radius;
    }

    @Override
    public int getDimension() {
        return 3;
    }

    @Override
    public void computeDerivatives(double lnP, double[] y, double[] yDot) {
        evaluate(lnP, y, true);
        double p = point.pressure;
        double r = y[R];
        yDot[R] = -p * r * r / (gm * point.density);
        yDot[LN_T] = point.nabla;
        yDot[MASS_ABOVE] = 4.0 * Math.PI * r * r * r * r * p / gm;
    }

    /**
     * Fills the point at a state, naming the depth when a model refuses it.
     *
     * @param lnP       ln P
     * @param y         state
     * @param transport whether to solve the convection model too
     * @return the point
     */
    EnvelopePoint evaluate(double lnP, double[] y, boolean transport) {
        double r = y[R];
        if (!(r > 0.0)) {
            throw new InvalidInputException("radius", r, "cm", InvalidInputException.NO_ZONE,
                    "> 0 inside the envelope (at ln P = " + lnP + " the integration reached the centre: the envelope"
                            + " holds more than fits in R; check M, R and L)");
        }
        try {
            point.at(Math.exp(lnP), Math.exp(y[LN_T]));
            if (transport) {
                point.transport(r);
            }
        } catch (InvalidInputException e) {
            throw new InvalidInputException(e.field(), e.value(), e.unit(), e.zone(), e.requirement()
                    + " (in the envelope at r / R = " + (r / radiusScale) + ", T = " + Math.exp(y[LN_T]) + " K, P = "
                    + Math.exp(lnP) + " dyn cm^-2)");
        }
        return point;
    }

    /** @return the point the last evaluation filled */
    EnvelopePoint point() {
        return point;
    }
}
