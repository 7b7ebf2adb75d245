/**
 * The startransport contract: what a host code compiles against.
 *
 * <p>Hosts discover physics providers with {@link java.util.ServiceLoader} through
 * {@link io.github.startransport.spi.Transport}; providers implement
 * {@link io.github.startransport.spi.TransportProvider}.
 */
// "module": the qualified export names the core module, which is not on the spi's own module path
@SuppressWarnings("module")
module io.github.startransport.spi {
    exports io.github.startransport.spi;
    exports io.github.startransport.spi.sharing to io.github.startransport.core;

    uses io.github.startransport.spi.TransportProvider;
}
