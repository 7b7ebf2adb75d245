package io.github.startransport.core.gradient;

import io.github.startransport.spi.Checks;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ThermodynamicsModel;

import java.util.List;

/**
 * {@link ThermodynamicsModel} for a fully ionised ideal gas plus radiation, from the kernels of
 * {@link GasRadiation}. Immutable and thread-safe; allocation-free.
 */
public final class IdealGasRadiation implements ThermodynamicsModel {
    /** Name to ask for this model by. */
    public static final String NAME = "ideal-gas-radiation";

    /** Describes this model (it takes no options). */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.THERMODYNAMICS, NAME,
            "fully ionised ideal gas plus black-body radiation (Chandrasekhar 1939): nabla_ad, c_P, delta, "
                    + "Gamma_1 from beta = P_gas/P; wrong below ~1e5 K (partial ionisation) and where electrons are degenerate",
            List.of());

    /** The one instance: the model has no parameters. */
    public static final IdealGasRadiation INSTANCE = new IdealGasRadiation();

    private IdealGasRadiation() {
    }

    /**
     * @param options must be empty
     * @return the model
     */
    public static IdealGasRadiation fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        return INSTANCE;
    }

    @Override
    public void evaluate(double temperature, double density, double hydrogen, double metals, int zone,
                         ThermoResult out) {
        Checks.positive("temperature", temperature, "K", zone);
        Checks.positive("density", density, "g cm^-3", zone);
        ZoneChecks.composition(hydrogen, metals, zone);
        double mu = GasRadiation.meanMolecularWeight(hydrogen, metals);
        double pg = GasRadiation.gasPressure(temperature, density, mu);
        double p = pg + GasRadiation.radiationPressure(temperature);
        double beta = pg / p;
        out.mu = mu;
        out.beta = beta;
        out.pressure = p;
        out.nablaAd = GasRadiation.nablaAd(beta);
        out.cp = GasRadiation.cp(beta, mu);
        out.delta = GasRadiation.delta(beta);
        out.phi = 1.0;
        out.gamma1 = GasRadiation.gamma1(beta);
        double probe = (out.pressure + out.nablaAd + out.cp + out.delta + out.gamma1) * 0.0;
        if (!(beta > 0.0) || probe != 0.0) {
            throw new io.github.startransport.spi.InvalidInputException("density", density, "g cm^-3", zone,
                    "large enough at T = " + temperature + " K that gas pressure is resolved in double precision "
                            + "(beta = P_gas / P = " + beta + ", c_P = " + out.cp + ", P = " + p + ")");
        }
    }

    @Override
    public String toString() {
        return NAME;
    }
}
