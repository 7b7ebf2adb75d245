/**
 * The startransport contract: what a host code compiles against.
 *
 * <p>Hosts discover physics providers with {@link java.util.ServiceLoader} through
 * {@link io.github.startransport.spi.Transport}; providers implement
 * {@link io.github.startransport.spi.TransportProvider}.
 */
module io.github.startransport.spi {
    exports io.github.startransport.spi;
    exports io.github.startransport.spi.sharing to io.github.startransport.core;

    uses io.github.startransport.spi.TransportProvider;
}
