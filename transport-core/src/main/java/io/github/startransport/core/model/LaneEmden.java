package io.github.startransport.core.model;

import org.apache.commons.math3.ode.ContinuousOutputModel;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * The Lane-Emden equation of index n, (1/xi^2) d/dxi (xi^2 dtheta/dxi) = -theta^n, theta(0) = 1,
 * theta'(0) = 0 (Chandrasekhar 1939, <i>An Introduction to the Study of Stellar Structure</i>,
 * ch. IV), integrated with Commons Math's Dormand-Prince 8(5,3) integrator from a series start
 * to the first zero xi_1.
 *
 * <p>Alongside theta it integrates a luminosity integral
 * lambda(xi) = integral_0^xi s^2 theta(s)^(6 + nu) ds, which for n = 3 (rho ~ theta^3,
 * T ~ theta) is proportional to the luminosity L(r) of an energy generation rate
 * epsilon ~ rho T^nu.
 */
public final class LaneEmden {
    private final double index;
    private final double firstZero;
    private final double massConstant;
    private final double lambdaTotal;
    private final ContinuousOutputModel output;

    private LaneEmden(double index, double firstZero, double massConstant, double lambdaTotal,
                      ContinuousOutputModel output) {
        this.index = index;
        this.firstZero = firstZero;
        this.massConstant = massConstant;
        this.lambdaTotal = lambdaTotal;
        this.output = output;
    }

    /**
     * @param n  polytropic index, in [0, 5)
     * @param nu temperature exponent of the energy generation rate for lambda (use 0 when unused)
     * @return the solution up to the first zero
     */
    public static LaneEmden solve(double n, double nu) {
        if (!(n >= 0.0 && n < 5.0)) {
            throw new IllegalArgumentException("polytropic index must be in [0, 5): " + n);
        }
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 3;
            }

            @Override
            public void computeDerivatives(double xi, double[] y, double[] dy) {
                double theta = y[0];
                double thetaN = theta > 0.0 ? Math.pow(theta, n) : 0.0;
                dy[0] = y[1];
                dy[1] = -thetaN - 2.0 * y[1] / xi;
                dy[2] = theta > 0.0 ? xi * xi * Math.pow(theta, 6.0 + nu) : 0.0;
            }
        };
        // series about the centre: theta = 1 - xi^2/6 + n xi^4/120 - ...
        double xi0 = 1e-4;
        double x2 = xi0 * xi0;
        double[] y = {1.0 - x2 / 6.0 + n * x2 * x2 / 120.0, -xi0 / 3.0 + n * x2 * xi0 / 30.0, x2 * xi0 / 3.0};
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, 0.05, 1e-15, 1e-13);
        integrator.addEventHandler(new EventHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
            }

            @Override
            public double g(double xi, double[] state) {
                return state[0];
            }

            @Override
            public Action eventOccurred(double xi, double[] state, boolean increasing) {
                return Action.STOP;
            }

            @Override
            public void resetState(double xi, double[] state) {
            }
        }, 0.01, 1e-14, 1000);
        ContinuousOutputModel output = new ContinuousOutputModel();
        integrator.addStepHandler(output);
        double end = integrator.integrate(ode, xi0, y, 50.0, y);
        if (!(y[0] <= 1e-10)) {
            throw new IllegalStateException("Lane-Emden solution of index " + n + " has no zero below xi = 50");
        }
        return new LaneEmden(n, end, -end * end * y[1], y[2], output);
    }

    /** @return the polytropic index n */
    public double index() {
        return index;
    }

    /** @return xi_1, the first zero of theta */
    public double firstZero() {
        return firstZero;
    }

    /** @return -xi_1^2 theta'(xi_1), the mass constant */
    public double massConstant() {
        return massConstant;
    }

    /** @return rho_c / mean rho = xi_1^3 / (3 (-xi_1^2 theta'(xi_1))) */
    public double centralToMeanDensity() {
        return firstZero * firstZero * firstZero / (3.0 * massConstant);
    }

    /** @return lambda(xi_1) */
    public double lambdaTotal() {
        return lambdaTotal;
    }

    /**
     * Samples the solution (dense output of the integrator; synchronised, not for hot paths).
     *
     * @param xi  a point in (0, xi_1]
     * @param out receives theta, -xi^2 theta'(xi) and lambda(xi); modified
     */
    public synchronized void sample(double xi, double[] out) {
        output.setInterpolatedTime(Math.max(output.getInitialTime(), Math.min(xi, output.getFinalTime())));
        double[] y = output.getInterpolatedState();
        out[0] = y[0];
        out[1] = -xi * xi * y[1];
        out[2] = y[2];
    }
}
