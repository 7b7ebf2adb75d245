package io.github.startransport.core.envelope;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OpacityStatus;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ThermodynamicsModel;

/**
 * Textbook models with closed-form envelopes, written here from their formulas (not the library's
 * kernels), so that the integrator can be checked against analytic solutions.
 */
final class TextbookModels {
    private TextbookModels() {
    }

    /**
     * A perfect monatomic gas without radiation: P = rho k T / (mu m_u), nabla_ad = 2/5,
     * c_P = (5/2) k / (mu m_u), delta = phi = 1, Gamma_1 = 5/3 (Kippenhahn, Weigert &amp; Weiss 2012, §13.1).
     */
    static final class PerfectGas implements ThermodynamicsModel {
        final double mu;

        PerfectGas(double mu) {
            this.mu = mu;
        }

        @Override
        public void evaluate(double t, double rho, double x, double z, int zone, ThermoResult out) {
            double kOverMu = Codata2018.BOLTZMANN / (mu * Codata2018.ATOMIC_MASS_UNIT);
            out.mu = mu;
            out.beta = 1.0;
            out.pressure = rho * kOverMu * t;
            out.nablaAd = 0.4;
            out.cp = 2.5 * kOverMu;
            out.delta = 1.0;
            out.phi = 1.0;
            out.gamma1 = 5.0 / 3.0;
        }

        @Override
        public String toString() {
            return "perfect monatomic gas, mu = " + mu;
        }
    }

    /** kappa = kappa_0 rho^a T^b (cm^2/g), a power law such as Kramers' kappa ~ rho T^-3.5. */
    static final class PowerLawOpacity implements OpacityModel {
        final double kappa0;
        final double a;
        final double b;

        PowerLawOpacity(double kappa0, double a, double b) {
            this.kappa0 = kappa0;
            this.a = a;
            this.b = b;
        }

        @Override
        public void evaluate(double t, double rho, double x, double z, int zone, OpacityResult out) {
            out.kappa = kappa0 * Math.pow(rho, a) * Math.pow(t, b);
            out.dLnKappaDLnRho = a;
            out.dLnKappaDLnT = b;
            out.status = OpacityStatus.INSIDE;
        }

        @Override
        public String toString() {
            return "kappa = " + kappa0 + " rho^" + a + " T^" + b;
        }
    }
}
