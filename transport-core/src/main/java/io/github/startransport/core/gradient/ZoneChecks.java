package io.github.startransport.core.gradient;

import io.github.startransport.spi.Checks;
import io.github.startransport.spi.ZoneState;

/**
 * Validation of the zone fields each family of models reads, so that every model refuses
 * the same input with the same words. Allocation-free on the normal path.
 */
public final class ZoneChecks {
    private ZoneChecks() {
    }

    /**
     * Checks the fields the stability test reads: T, rho, P, L, m, kappa, nabla_ad, delta,
     * phi, nabla_mu.
     *
     * @param z the zone
     */
    public static void forStability(ZoneState z) {
        int i = z.zone;
        Checks.positive("temperature", z.temperature, "K", i);
        Checks.positive("density", z.density, "g cm^-3", i);
        Checks.positive("pressure", z.pressure, "dyn cm^-2", i);
        Checks.finite("luminosity", z.luminosity, "erg s^-1", i);
        Checks.positive("mass", z.mass, "g", i);
        Checks.positive("opacity", z.opacity, "cm^2 g^-1", i);
        Checks.openInterval("nablaAd", z.nablaAd, 0.0, 1.0, "1", i);
        Checks.positive("delta", z.delta, "1", i);
        Checks.positive("phi", z.phi, "1", i);
        Checks.finite("nablaMu", z.nablaMu, "1", i);
    }

    /**
     * Whether a values-only equation-of-state call may skip the derivatives at T and rho: from 1 to
     * 1e11 K and from 1e-20 to 1e10 g cm^-3. There no output and no derivative of the built-in models
     * comes near the largest double (the ideal gas with radiation keeps beta = P_gas / P above about
     * 1e-31, and c_P grows only as 1 / beta^2; the partial-ionisation model's largest output or
     * derivative is about 5e90 over a scan of 3.2 million states), so the call with derivatives refuses
     * no valid state and the values alone decide as it does. Outside, a values-only call runs the call
     * with derivatives, whose refusals also look at the derivatives.
     *
     * @param temperature T (K)
     * @param density     rho (g cm^-3)
     * @return true inside the range (false for NaN)
     */
    public static boolean valuesDecide(double temperature, double density) {
        return temperature >= 1.0 && temperature <= 1e11 && density >= 1e-20 && density <= 1e10;
    }

    /**
     * Checks a composition (X, Z).
     *
     * @param hydrogen X
     * @param metals   Z
     * @param zone     zone index for messages
     */
    public static void composition(double hydrogen, double metals, int zone) {
        Checks.closedInterval("hydrogen", hydrogen, 0.0, 1.0, "1", zone);
        Checks.closedInterval("metals", metals, 0.0, 1.0 - hydrogen, "1", zone);
    }

    /**
     * Refuses a zone whose inputs are each valid but together overflow double precision: the
     * caller passes the sum of its outputs each multiplied by 0, which is NaN exactly when one of
     * them is not finite.
     *
     * @param output name of the output checked (for the message)
     * @param value  its value (for the message)
     * @param probe  sum over the outputs of (output * 0)
     * @param z      the zone
     * @throws io.github.startransport.spi.InvalidInputException when the probe is not 0
     */
    public static void finiteOutputs(String output, double value, double probe, ZoneState z) {
        if (probe != 0.0) {
            throw new io.github.startransport.spi.InvalidInputException(output, value, "1", z.zone,
                    "finite with all its derivatives, but the zone's inputs overflow double precision ("
                            + z + ")");
        }
    }
}
