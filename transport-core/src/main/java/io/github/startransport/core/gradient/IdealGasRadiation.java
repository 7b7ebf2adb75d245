package io.github.startransport.core.gradient;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.Checks;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ThermodynamicsModel;
import io.github.startransport.spi.ZoneInput;

import java.util.List;

/**
 * {@link ThermodynamicsModel} for a fully ionised ideal gas plus radiation, from the kernels of
 * {@link GasRadiation}, with the derivatives with respect to T and rho through those of beta. Immutable and thread-safe; allocation-free.
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
        out.cv = GasRadiation.cv(beta, mu);
        out.chiT = GasRadiation.chiT(beta);
        out.chiRho = beta;
        double electrons = GasRadiation.electronsPerMassUnit(hydrogen);
        out.freeElectrons = electrons;
        out.degeneracy = GasRadiation.electronDegeneracy(temperature,
                density / Codata2018.ATOMIC_MASS_UNIT * electrons);
        out.pressureIonisation = 0.0;
        // d beta / d ln T = -3 beta (1 - beta), d beta / d ln rho = beta (1 - beta)
        double oneMinusBeta = GasRadiation.radiationPressure(temperature) / p;
        double perT = -3.0 * beta * oneMinusBeta / temperature;
        double perRho = beta * oneMinusBeta / density;
        out.dPressure[ZoneInput.T] = p * out.chiT / temperature;
        out.dPressure[ZoneInput.RHO] = p * beta / density;
        double dn = GasRadiation.dNablaAdDBeta(beta);
        out.dNablaAd[ZoneInput.T] = dn * perT;
        out.dNablaAd[ZoneInput.RHO] = dn * perRho;
        double dc = GasRadiation.dCpDBeta(beta, mu);
        out.dCp[ZoneInput.T] = dc * perT;
        out.dCp[ZoneInput.RHO] = dc * perRho;
        double dd = GasRadiation.dDeltaDBeta(beta);
        out.dDelta[ZoneInput.T] = dd * perT;
        out.dDelta[ZoneInput.RHO] = dd * perRho;
        double dg = GasRadiation.dGamma1DBeta(beta);
        out.dGamma1[ZoneInput.T] = dg * perT;
        out.dGamma1[ZoneInput.RHO] = dg * perRho;
        out.dPhi[ZoneInput.T] = 0.0;
        out.dPhi[ZoneInput.RHO] = 0.0;
        out.dMu[ZoneInput.T] = 0.0;
        out.dMu[ZoneInput.RHO] = 0.0;
        double probe = (out.pressure + out.nablaAd + out.cp + out.delta + out.gamma1 + out.cv
                + out.dPressure[ZoneInput.T] + out.dPressure[ZoneInput.RHO] + out.dCp[ZoneInput.T]
                + out.dCp[ZoneInput.RHO] + out.dDelta[ZoneInput.T] + out.dDelta[ZoneInput.RHO]) * 0.0;
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
