package io.github.startransport.spi;

import java.util.List;

/**
 * The service type: a jar of physics announces itself by implementing this interface and
 * registering the implementation with {@code provides ... with ...} in its
 * {@code module-info.java} and in {@code META-INF/services/io.github.startransport.spi.TransportProvider}.
 *
 * <p>Implementations must have a public no-argument constructor, be immutable and
 * thread-safe, and do no heavy work until a model is created.
 */
public interface TransportProvider {

    /** @return a short unique name, e.g. {@code "startransport-core"} */
    String name();

    /** @return one sentence about what this provider offers */
    String description();

    /** @return every model this provider offers, in every family */
    List<ModelInfo> models();

    /**
     * Creates a model. The returned object is immutable and thread-safe.
     *
     * @param family    the family to create in
     * @param modelName a name from {@link #models()} in that family
     * @param options   options; unknown names are refused
     * @param <T>       the family's model interface
     * @return the model
     * @throws DiscoveryException     when this provider has no such model
     * @throws InvalidOptionException when an option is unknown or malformed
     */
    <T> T create(ModelFamily<T> family, String modelName, ModelOptions options);

    /**
     * @param family a family
     * @return the name of the model this provider recommends in that family, or {@code null}
     */
    default String defaultModel(ModelFamily<?> family) {
        for (ModelInfo info : models()) {
            if (info.family() == family) {
                return info.name();
            }
        }
        return null;
    }
}
