package io.github.startransport.spi;

import java.util.List;
import java.util.Objects;

/**
 * A family of interchangeable physical models, typed by the interface its members implement.
 *
 * <p>The constants are the families the contract knows; a provider offers zero or more
 * named models in each.
 *
 * @param <T> the model interface of this family
 */
public final class ModelFamily<T> {
    /** Stability tests: radiative vs adiabatic vs Ledoux gradient, regime of a zone. */
    public static final ModelFamily<StabilityModel> STABILITY = new ModelFamily<>("stability", StabilityModel.class);
    /** Thermodynamics for hosts without an equation of state of their own. */
    public static final ModelFamily<ThermodynamicsModel> THERMODYNAMICS =
            new ModelFamily<>("thermodynamics", ThermodynamicsModel.class);

    /** Local convection (mixing-length variants) with mixing coefficients. */
    public static final ModelFamily<ConvectionModel> CONVECTION = new ModelFamily<>("convection", ConvectionModel.class);
    /** Rosseland mean opacities, analytic or tabulated. */
    public static final ModelFamily<OpacityModel> OPACITY = new ModelFamily<>("opacity", OpacityModel.class);

    /** Builders and checkers of opacity table files (not a physical model: a tool over the table format). */
    public static final ModelFamily<OpacityTableTool> OPACITY_TABLES =
            new ModelFamily<>("opacity-tables", OpacityTableTool.class);

    /** Whole-profile diagnosis: zones, regions, boundaries, timescales. */
    public static final ModelFamily<ProfileDiagnoser> DIAGNOSIS = new ModelFamily<>("diagnosis", ProfileDiagnoser.class);
    /** Envelopes integrated inward from a model atmosphere, and the alpha calibration they allow. */
    public static final ModelFamily<EnvelopeIntegrator> ENVELOPE =
            new ModelFamily<>("envelope", EnvelopeIntegrator.class);

    /** Local oscillation frequencies of a zone: N^2 with its Jacobian, sound speed, Lamb frequency. */
    public static final ModelFamily<BuoyancyModel> BUOYANCY = new ModelFamily<>("buoyancy", BuoyancyModel.class);

    /** Built-in stellar models that need no input file. */
    public static final ModelFamily<StarModel> STAR = new ModelFamily<>("star", StarModel.class);

    private static final List<ModelFamily<?>> ALL =
            List.of(STABILITY, THERMODYNAMICS, CONVECTION, OPACITY, OPACITY_TABLES, DIAGNOSIS, ENVELOPE, STAR, BUOYANCY);

    private final String name;
    private final Class<T> type;

    private ModelFamily(String name, Class<T> type) {
        this.name = name;
        this.type = type;
    }

    /** @return every family the contract defines */
    public static List<ModelFamily<?>> all() {
        return ALL;
    }

    /**
     * @param name a family name such as {@code "stability"}
     * @return the family
     * @throws IllegalArgumentException when no family has that name
     */
    public static ModelFamily<?> byName(String name) {
        for (ModelFamily<?> f : ALL) {
            if (f.name.equalsIgnoreCase(Objects.requireNonNull(name).trim())) {
                return f;
            }
        }
        throw new IllegalArgumentException("unknown model family '" + name + "'; known: "
                + ALL.stream().map(ModelFamily::name).toList());
    }

    /** @return the family's name, e.g. {@code "stability"} */
    public String name() {
        return name;
    }

    /** @return the interface every member implements */
    public Class<T> type() {
        return type;
    }

    @Override
    public String toString() {
        return name;
    }
}
