package io.github.startransport.core.thermo;

import io.github.startransport.core.gradient.ZoneChecks;
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
 * {@link ThermodynamicsModel} for a partially ionised H, He and metal mixture with radiation, from
 * the kernel {@link SahaIonisation} (see there for the physics, the solve and the validity range).
 * Immutable and thread-safe; allocation-free.
 */
public final class IonisingGas implements ThermodynamicsModel {
    /** Name to ask for this model by. */
    public static final String NAME = "saha-ionising-gas";

    /** Describes this model (it takes no options). */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.THERMODYNAMICS, NAME,
            "partially ionised H, He and metals (Saha equations: H, He I, He II, and one metal donor potential of "
                    + SahaIonisation.CHI_DONOR_EV + " eV) with ideal non-degenerate electrons and nuclei, an "
                    + "excluded-volume pressure ionisation, and radiation: mu, nabla_ad, c_P, c_V, delta, phi, Gamma_1, "
                    + "chi_T, chi_rho with analytic d/dT and d/drho; valid for ~6000 K to 1e9 K where electrons are not "
                    + "degenerate", List.of());

    /** The one instance: the model has no parameters. */
    public static final IonisingGas INSTANCE = new IonisingGas();

    private IonisingGas() {
    }

    /**
     * @param options must be empty
     * @return the model
     */
    public static IonisingGas fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        return INSTANCE;
    }

    @Override
    public void evaluate(double temperature, double density, double hydrogen, double metals, int zone,
                         ThermoResult out) {
        Checks.positive("temperature", temperature, "K", zone);
        Checks.positive("density", density, "g cm^-3", zone);
        ZoneChecks.composition(hydrogen, metals, zone);
        SahaIonisation.evaluate(temperature, density, hydrogen, metals, out);
        // zero unless some output is infinite or NaN; summed as a tree, not as one long chain of additions
        double probe = ((((out.pressure + out.nablaAd) + (out.cp + out.cv)) + ((out.delta + out.gamma1)
                + (out.chiT + out.chiRho))) + (((out.phi + out.mu) + (out.dPressure[ZoneInput.T]
                + out.dPressure[ZoneInput.RHO])) + ((out.dNablaAd[ZoneInput.T] + out.dNablaAd[ZoneInput.RHO])
                + (out.dCp[ZoneInput.T] + out.dCp[ZoneInput.RHO]))) + ((((out.dDelta[ZoneInput.T]
                + out.dDelta[ZoneInput.RHO]) + (out.dGamma1[ZoneInput.T] + out.dGamma1[ZoneInput.RHO]))
                + ((out.dPhi[ZoneInput.T] + out.dPhi[ZoneInput.RHO]) + (out.dMu[ZoneInput.T]
                + out.dMu[ZoneInput.RHO]))))) * 0.0;
        if (!(out.beta > 0.0) || probe != 0.0) {
            throw unrepresentable(temperature, density, zone, out);
        }
    }

    /**
     * The values of {@link #evaluate}, bit for bit, without the derivatives' arithmetic (see
     * {@link SahaIonisation#evaluateValues}); the same inputs refused with the same exception. The
     * derivative arrays of {@code out} are left untouched where {@link ZoneChecks#valuesDecide} holds,
     * and filled outside.
     * Allocation-free and thread-safe.
     */
    @Override
    public void evaluateValues(double temperature, double density, double hydrogen, double metals, int zone,
                               ThermoResult out) {
        if (!ZoneChecks.valuesDecide(temperature, density)) {
            evaluate(temperature, density, hydrogen, metals, zone, out);
            return;
        }
        ZoneChecks.composition(hydrogen, metals, zone);
        SahaIonisation.evaluateValues(temperature, density, hydrogen, metals, out);
        // the value terms of evaluate's probe: where one of them is infinite or NaN, so is that probe
        double probe = ((((out.pressure + out.nablaAd) + (out.cp + out.cv)) + ((out.delta + out.gamma1)
                + (out.chiT + out.chiRho))) + (out.phi + out.mu)) * 0.0;
        if (!(out.beta > 0.0) || probe != 0.0) {
            throw unrepresentable(temperature, density, zone, out);
        }
    }

    /** The refusal of a state whose outputs leave double precision (the one message of both calls). */
    private static InvalidInputException unrepresentable(double temperature, double density, int zone,
                                                         ThermoResult out) {
        return new InvalidInputException("density", density, "g cm^-3", zone,
                "such that pressure and its derivatives are representable in double precision at T = "
                        + temperature + " K (beta = P_gas / P = " + out.beta + ", P = " + out.pressure
                        + " dyn cm^-2, c_V = " + out.cv + " erg g^-1 K^-1)");
    }

    @Override
    public String toString() {
        return NAME;
    }
}
