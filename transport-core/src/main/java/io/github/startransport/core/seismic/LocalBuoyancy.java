package io.github.startransport.core.seismic;

import io.github.startransport.spi.BuoyancyModel;
import io.github.startransport.spi.BuoyancyResult;
import io.github.startransport.spi.Checks;
import io.github.startransport.spi.InvalidInputException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneState;

import java.util.List;

/**
 * {@link BuoyancyModel} from the kernels of {@link LocalFrequencies}. Immutable and thread-safe;
 * allocation-free.
 */
public final class LocalBuoyancy implements BuoyancyModel {
    /** Name to ask for this model by. */
    public static final String NAME = "local-buoyancy";

    /** Describes this model (it takes no options). */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.BUOYANCY, NAME,
            "buoyancy frequency N^2 = (g^2 rho / P) delta (nabla_L - nabla) with its Jacobian, sound speed "
                    + "c_s = sqrt(Gamma_1 P / rho) and Lamb frequency S_1 = sqrt(2) c_s / r of one zone", List.of());

    /** The one instance: the model has no parameters. */
    public static final LocalBuoyancy INSTANCE = new LocalBuoyancy();

    private LocalBuoyancy() {
    }

    /**
     * @param options must be empty
     * @return the model
     */
    public static LocalBuoyancy fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        return INSTANCE;
    }

    @Override
    public void evaluate(ZoneState z, double nabla, double gamma1, BuoyancyResult out) {
        int i = z.zone;
        Checks.positive("radius", z.radius, "cm", i);
        Checks.positive("mass", z.mass, "g", i);
        Checks.positive("density", z.density, "g cm^-3", i);
        Checks.positive("pressure", z.pressure, "dyn cm^-2", i);
        Checks.positive("delta", z.delta, "1", i);
        Checks.finite("nablaAd", z.nablaAd, "1", i);
        Checks.positive("phi", z.phi, "1", i);
        Checks.finite("nablaMu", z.nablaMu, "1", i);
        Checks.finite("nabla", nabla, "1", i);
        Checks.positive("gamma1", gamma1, "1", i);
        double[] d = out.dBuoyancySquared;
        d[ZoneInput.T] = 0.0;
        d[ZoneInput.L] = 0.0;
        d[ZoneInput.KAPPA] = 0.0;
        d[ZoneInput.CP] = 0.0;
        d[ZoneInput.ALPHA] = 0.0;
        out.buoyancySquared = LocalFrequencies.buoyancySquared(z.radius, z.mass, z.density, z.pressure, z.delta,
                z.nablaAd, z.phi, z.nablaMu, nabla, d);
        out.dBuoyancySquaredDNabla = LocalFrequencies.dBuoyancySquaredDNabla(z.radius, z.mass, z.density, z.pressure,
                z.delta);
        out.soundSpeed = LocalFrequencies.soundSpeed(gamma1, z.pressure, z.density);
        out.lamb1 = LocalFrequencies.lamb(1, out.soundSpeed, z.radius);
        double probe = (out.buoyancySquared + out.dBuoyancySquaredDNabla + out.soundSpeed + out.lamb1
                + d[ZoneInput.R] + d[ZoneInput.M] + d[ZoneInput.RHO] + d[ZoneInput.P]) * 0.0;
        if (probe != 0.0) {
            throw new InvalidInputException("buoyancySquared", out.buoyancySquared, "rad^2 s^-2", i,
                    "finite with its derivatives, but the zone's inputs overflow double precision (" + z + ")");
        }
    }

    @Override
    public String toString() {
        return NAME;
    }
}
