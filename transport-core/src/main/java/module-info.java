/**
 * startransport's physics: constants, gradients and stability, thermodynamics fallback,
 * mixing-length convection and mixing coefficients.
 * Found by hosts through {@link io.github.startransport.spi.Transport}.
 */
module io.github.startransport.core {
    requires transitive io.github.startransport.spi;
    requires commons.math3;

    exports io.github.startransport.core;
    exports io.github.startransport.core.constants;
    exports io.github.startransport.core.convection;
    exports io.github.startransport.core.envelope;
    exports io.github.startransport.core.gradient;
    exports io.github.startransport.core.model;
    exports io.github.startransport.core.opacity;
    exports io.github.startransport.core.profile;
    exports io.github.startransport.core.seismic;
    exports io.github.startransport.core.thermo;
    exports io.github.startransport.core.timescale;

    provides io.github.startransport.spi.TransportProvider with io.github.startransport.core.CoreProvider;
}
