/**
 * startransport's physics: constants, gradients and stability, thermodynamics fallback.
 * Found by hosts through {@link io.github.startransport.spi.Transport}.
 */
module io.github.startransport.core {
    requires io.github.startransport.spi;
    requires commons.math3;

    exports io.github.startransport.core;
    exports io.github.startransport.core.constants;
    exports io.github.startransport.core.gradient;
    exports io.github.startransport.core.opacity;

    provides io.github.startransport.spi.TransportProvider with io.github.startransport.core.CoreProvider;
}
