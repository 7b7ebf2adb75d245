package io.github.startransport.spi;

import java.util.Objects;

/**
 * The models an envelope integration uses, created by the caller through {@link Transport}.
 * The convection model's alpha is the one integrated with; a calibration varies it through
 * {@link ConvectionModel#withAlpha(double)}.
 *
 * @param convection     the convection model (its criterion decides the regime; in a homogeneous
 *                       envelope Schwarzschild and Ledoux agree)
 * @param opacity        the opacity model
 * @param thermodynamics the equation of state: density from pressure and temperature, nabla_ad, c_P, delta
 */
public record EnvelopeSetup(ConvectionModel convection, OpacityModel opacity, ThermodynamicsModel thermodynamics) {
    /**
     * Validates that no model is null.
     *
     * @param convection     the convection model (its criterion decides the regime; in a homogeneous
     *                envelope Schwarzschild and Ledoux agree)
     * @param opacity        the opacity model
     * @param thermodynamics the equation of state: density from pressure and temperature, nabla_ad, c_P, delta
     */
    public EnvelopeSetup {
        Objects.requireNonNull(convection, "convection");
        Objects.requireNonNull(opacity, "opacity");
        Objects.requireNonNull(thermodynamics, "thermodynamics");
    }

    /**
     * @param alpha another mixing-length parameter (dimensionless), &gt; 0
     * @return the same models with the convection model's alpha replaced
     */
    public EnvelopeSetup withAlpha(double alpha) {
        return new EnvelopeSetup(convection.withAlpha(alpha), opacity, thermodynamics);
    }
}
