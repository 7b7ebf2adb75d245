package io.github.startransport.spi;

import java.util.Objects;

/**
 * The models a profile diagnosis uses, created by the caller through {@link Transport}.
 *
 * @param convection     the convection model; its criterion decides the regimes
 * @param opacity        used where the profile has no opacity column
 * @param thermodynamics used where the profile lacks nabla_ad, c_P or delta
 */
public record DiagnosisSetup(ConvectionModel convection, OpacityModel opacity, ThermodynamicsModel thermodynamics) {
    /**
     * Validates that no model is null.
     *
     * @param convection     the convection model; its criterion decides the regimes
     * @param opacity        used where the profile has no opacity column
     * @param thermodynamics used where the profile lacks nabla_ad, c_P or delta
     */
    public DiagnosisSetup {
        Objects.requireNonNull(convection, "convection");
        Objects.requireNonNull(opacity, "opacity");
        Objects.requireNonNull(thermodynamics, "thermodynamics");
    }
}
