package io.github.startransport.core.gradient;

import io.github.startransport.core.constants.Codata2018;
import io.github.startransport.spi.Checks;
import io.github.startransport.spi.InvalidInputException;
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
        values(temperature, density, hydrogen, metals, out);
        double mu = out.mu;
        double p = out.pressure;
        double beta = out.beta;
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
            throw unresolved(temperature, density, zone, out);
        }
    }

    /**
     * The values of {@link #evaluate}, bit for bit, without the derivatives; the same inputs refused
     * with the same exception. The derivative arrays of {@code out} are left untouched where
     * {@link ZoneChecks#valuesDecide} holds, and filled outside. Allocation-free and thread-safe.
     */
    @Override
    public void evaluateValues(double temperature, double density, double hydrogen, double metals, int zone,
                               ThermoResult out) {
        if (!ZoneChecks.valuesDecide(temperature, density)) {
            evaluate(temperature, density, hydrogen, metals, zone, out);
            return;
        }
        ZoneChecks.composition(hydrogen, metals, zone);
        values(temperature, density, hydrogen, metals, out);
        // the value terms of evaluate's probe, added in its order: where one is infinite or NaN, so is that probe
        double probe = (out.pressure + out.nablaAd + out.cp + out.delta + out.gamma1 + out.cv) * 0.0;
        if (!(out.beta > 0.0) || probe != 0.0) {
            throw unresolved(temperature, density, zone, out);
        }
    }

    /** Every scalar output of both calls, from the same expressions. */
    private static void values(double temperature, double density, double hydrogen, double metals,
                               ThermoResult out) {
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
    }

    /** The refusal of a state whose gas pressure is lost beside radiation (the one message of both calls). */
    private static InvalidInputException unresolved(double temperature, double density, int zone, ThermoResult out) {
        return new InvalidInputException("density", density, "g cm^-3", zone,
                "large enough at T = " + temperature + " K that gas pressure is resolved in double precision "
                        + "(beta = P_gas / P = " + out.beta + ", c_P = " + out.cp + ", P = " + out.pressure + ")");
    }

    @Override
    public String toString() {
        return NAME;
    }
}
