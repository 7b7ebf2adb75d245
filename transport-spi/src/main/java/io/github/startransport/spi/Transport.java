package io.github.startransport.spi;

import java.net.URL;
import java.security.CodeSource;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import java.util.function.Supplier;

/**
 * The discovery facade: finds {@link TransportProvider}s and hands out models by name.
 *
 * <p>Each provider is loaded on its own; one that fails to load is recorded in
 * {@link #loadFailures()} and does not hide the others. No provider at all, two providers with
 * the same name, an unknown name: each is a {@link DiscoveryException} saying what was looked
 * for, what was found and which jar to add. Nothing is silently picked: a model name offered by
 * several providers must be qualified as {@code provider/model}.
 *
 * <p>Instances are immutable and thread-safe. Discovery is not a hot-path operation: do it once.
 */
public final class Transport {
    private final Map<String, TransportProvider> providers;
    private final List<String> loadFailures;

    private Transport(Map<String, TransportProvider> providers, List<String> loadFailures) {
        this.providers = providers;
        this.loadFailures = List.copyOf(loadFailures);
    }

    /**
     * Discovers providers visible to the context class loader (class path) or, when this
     * module is on the module path, to the module layer.
     *
     * @return the facade
     * @throws DiscoveryException when no provider is found or two share a name
     */
    public static Transport discover() {
        return discover(ServiceLoader.load(TransportProvider.class));
    }

    /**
     * @param loader class loader to search
     * @return the facade
     * @throws DiscoveryException when no provider is found or two share a name
     */
    public static Transport discover(ClassLoader loader) {
        return discover(ServiceLoader.load(TransportProvider.class, loader));
    }

    private static Transport discover(ServiceLoader<TransportProvider> loader) {
        List<Supplier<TransportProvider>> suppliers = new ArrayList<>();
        List<String> failures = new ArrayList<>();
        Iterator<ServiceLoader.Provider<TransportProvider>> it = loader.stream().iterator();
        while (true) {
            try {
                if (!it.hasNext()) {
                    break;
                }
                ServiceLoader.Provider<TransportProvider> p = it.next();
                suppliers.add(p::get);
            } catch (ServiceConfigurationError e) {
                failures.add(describe(e));
            }
        }
        return fromSuppliers(suppliers, failures);
    }

    /**
     * Builds the facade from explicit provider factories (for hosts that wire providers by
     * hand, and for tests). A factory that throws is recorded as a load failure.
     *
     * @param factories provider factories
     * @return the facade
     * @throws DiscoveryException when no provider could be made or two share a name
     */
    public static Transport fromSuppliers(List<? extends Supplier<? extends TransportProvider>> factories) {
        return fromSuppliers(factories, new ArrayList<>());
    }

    private static Transport fromSuppliers(List<? extends Supplier<? extends TransportProvider>> factories,
                                           List<String> failures) {
        Map<String, TransportProvider> byName = new LinkedHashMap<>();
        for (Supplier<? extends TransportProvider> factory : factories) {
            TransportProvider provider;
            try {
                provider = factory.get();
            } catch (ServiceConfigurationError | RuntimeException | LinkageError e) {
                failures.add(describe(e));
                continue;
            }
            TransportProvider earlier = byName.putIfAbsent(provider.name(), provider);
            if (earlier != null) {
                throw new DiscoveryException(DiscoveryException.Kind.DUPLICATE_PROVIDER, provider.name(),
                        List.of(where(earlier), where(provider)),
                        "two providers are both named '" + provider.name() + "': " + where(earlier) + " and "
                                + where(provider) + "; remove one of these jars from the class path or module path");
            }
        }
        if (byName.isEmpty()) {
            throw new DiscoveryException(DiscoveryException.Kind.NO_PROVIDER, TransportProvider.class.getName(),
                    failures,
                    "no " + TransportProvider.class.getName() + " was found on the class path or module path"
                            + (failures.isEmpty() ? "" : " (" + failures.size() + " failed to load: "
                            + String.join("; ", failures) + ")")
                            + "; " + DiscoveryException.CORE_JAR_HINT);
        }
        return new Transport(byName, failures);
    }

    private static String describe(Throwable e) {
        Throwable root = e;
        while (root.getCause() != null && root.getCause() != root) {
            root = root.getCause();
        }
        return e.getMessage() + (root != e ? " (caused by " + root + ")" : "");
    }

    private static String where(TransportProvider p) {
        String location = "unknown location";
        CodeSource src = p.getClass().getProtectionDomain().getCodeSource();
        if (src != null) {
            URL url = src.getLocation();
            if (url != null) {
                location = url.toString();
            }
        }
        return p.getClass().getName() + " from " + location;
    }

    /** @return the providers found, in discovery order, keyed by name */
    public List<TransportProvider> providers() {
        return List.copyOf(providers.values());
    }

    /** @return one line for each provider that failed to load (empty when all loaded) */
    public List<String> loadFailures() {
        return loadFailures;
    }

    /**
     * @param name a provider name
     * @return the provider
     * @throws DiscoveryException when no provider has that name
     */
    public TransportProvider provider(String name) {
        TransportProvider p = providers.get(name);
        if (p == null) {
            throw new DiscoveryException(DiscoveryException.Kind.UNKNOWN_PROVIDER, name,
                    List.copyOf(providers.keySet()),
                    "no provider named '" + name + "'; found " + providers.keySet()
                            + "; add the jar that carries '" + name + "' to the class path or module path");
        }
        return p;
    }

    /**
     * Finds and creates a model by name. The name is either a model name offered by exactly
     * one provider, or {@code provider/model}. A {@code null} or blank name asks for the first
     * provider's default in the family.
     *
     * @param family    family to look in
     * @param modelName model name, {@code provider/model}, or {@code null} for the default
     * @param options   model options
     * @param <T>       model interface
     * @return the created model (immutable, thread-safe)
     * @throws DiscoveryException     when the name is unknown or ambiguous
     * @throws InvalidOptionException when an option is unknown or malformed
     */
    public <T> T model(ModelFamily<T> family, String modelName, ModelOptions options) {
        if (modelName == null || modelName.isBlank()) {
            for (TransportProvider p : providers.values()) {
                String dflt = p.defaultModel(family);
                if (dflt != null) {
                    return p.create(family, dflt, options);
                }
            }
            throw unknownModel(family, "(default)");
        }
        int slash = modelName.indexOf('/');
        if (slash >= 0) {
            TransportProvider p = provider(modelName.substring(0, slash));
            String bare = modelName.substring(slash + 1);
            if (!offers(p, family, bare)) {
                throw unknownModel(family, modelName);
            }
            return p.create(family, bare, options);
        }
        List<TransportProvider> offering = new ArrayList<>();
        for (TransportProvider p : providers.values()) {
            if (offers(p, family, modelName)) {
                offering.add(p);
            }
        }
        if (offering.isEmpty()) {
            throw unknownModel(family, modelName);
        }
        if (offering.size() > 1) {
            List<String> names = offering.stream().map(p -> p.name() + "/" + modelName).toList();
            throw new DiscoveryException(DiscoveryException.Kind.AMBIGUOUS_MODEL, modelName, names,
                    "the " + family + " model '" + modelName + "' is offered by " + offering.size()
                            + " providers; ask for one of " + names);
        }
        return offering.get(0).create(family, modelName, options);
    }

    /**
     * @param family a family
     * @return every model of that family, from every provider, as {@code provider/model}
     */
    public List<String> modelNames(ModelFamily<?> family) {
        List<String> names = new ArrayList<>();
        for (TransportProvider p : providers.values()) {
            for (ModelInfo info : p.models()) {
                if (info.family() == family) {
                    names.add(p.name() + "/" + info.name());
                }
            }
        }
        return names;
    }

    private static boolean offers(TransportProvider p, ModelFamily<?> family, String name) {
        for (ModelInfo info : p.models()) {
            if (info.family() == family && info.name().equals(name)) {
                return true;
            }
        }
        return false;
    }

    private DiscoveryException unknownModel(ModelFamily<?> family, String name) {
        List<String> found = modelNames(family);
        return new DiscoveryException(DiscoveryException.Kind.UNKNOWN_MODEL, name, found,
                "no " + family + " model named '" + name + "'; found " + (found.isEmpty() ? "none" : found)
                        + " from providers " + providers.keySet()
                        + "; check the spelling, or add the jar that provides it ("
                        + DiscoveryException.CORE_JAR_HINT + ")");
    }

    /**
     * Shortcut for {@code model(ModelFamily.STABILITY, name, options)}.
     *
     * @param name    the model's name, or {@code provider/model}; {@code null} for the family's default
     * @param options the model's options
     * @return the model, immutable and thread-safe
     * @throws DiscoveryException     when no provider offers the name, or several do
     * @throws InvalidOptionException when an option is unknown to the model or its value is refused
     */
    public StabilityModel stability(String name, ModelOptions options) {
        return model(ModelFamily.STABILITY, name, options);
    }

    /**
     * Shortcut for {@code model(ModelFamily.THERMODYNAMICS, name, options)}.
     *
     * @param name    the model's name, or {@code provider/model}; {@code null} for the family's default
     * @param options the model's options
     * @return the model, immutable and thread-safe
     * @throws DiscoveryException     when no provider offers the name, or several do
     * @throws InvalidOptionException when an option is unknown to the model or its value is refused
     */
    public ThermodynamicsModel thermodynamics(String name, ModelOptions options) {
        return model(ModelFamily.THERMODYNAMICS, name, options);
    }

    /**
     * Shortcut for {@code model(ModelFamily.CONVECTION, name, options)}.
     *
     * @param name    the model's name, or {@code provider/model}; {@code null} for the family's default
     * @param options the model's options
     * @return the model, immutable and thread-safe
     * @throws DiscoveryException     when no provider offers the name, or several do
     * @throws InvalidOptionException when an option is unknown to the model or its value is refused
     */
    public ConvectionModel convection(String name, ModelOptions options) {
        return model(ModelFamily.CONVECTION, name, options);
    }

    /**
     * Shortcut for {@code model(ModelFamily.OPACITY, name, options)}.
     *
     * @param name    the model's name, or {@code provider/model}; {@code null} for the family's default
     * @param options the model's options
     * @return the model, immutable and thread-safe
     * @throws DiscoveryException     when no provider offers the name, or several do
     * @throws InvalidOptionException when an option is unknown to the model or its value is refused
     */
    public OpacityModel opacity(String name, ModelOptions options) {
        return model(ModelFamily.OPACITY, name, options);
    }

    /**
     * Shortcut for {@code model(ModelFamily.DIAGNOSIS, name, options)}.
     *
     * @param name    the model's name, or {@code provider/model}; {@code null} for the family's default
     * @param options the model's options
     * @return the model, immutable and thread-safe
     * @throws DiscoveryException     when no provider offers the name, or several do
     * @throws InvalidOptionException when an option is unknown to the model or its value is refused
     */
    public ProfileDiagnoser diagnoser(String name, ModelOptions options) {
        return model(ModelFamily.DIAGNOSIS, name, options);
    }

    /**
     * Shortcut for {@code model(ModelFamily.STAR, name, options)}.
     *
     * @param name    the model's name, or {@code provider/model}; {@code null} for the family's default
     * @param options the model's options
     * @return the model, immutable and thread-safe
     * @throws DiscoveryException     when no provider offers the name, or several do
     * @throws InvalidOptionException when an option is unknown to the model or its value is refused
     */
    public StarModel star(String name, ModelOptions options) {
        return model(ModelFamily.STAR, name, options);
    }

    /**
     * Shortcut for {@code model(ModelFamily.BUOYANCY, name, options)}.
     *
     * @param name    the model's name, or {@code provider/model}; {@code null} for the family's default
     * @param options the model's options
     * @return the model, immutable and thread-safe
     * @throws DiscoveryException     when no provider offers the name, or several do
     * @throws InvalidOptionException when an option is unknown to the model or its value is refused
     */
    public BuoyancyModel buoyancy(String name, ModelOptions options) {
        return model(ModelFamily.BUOYANCY, name, options);
    }

    /**
     * Shortcut for {@code model(ModelFamily.OPACITY_TABLES, name, options)}.
     *
     * @param name    the model's name, or {@code provider/model}; {@code null} for the family's default
     * @param options the model's options
     * @return the model, immutable and thread-safe
     * @throws DiscoveryException     when no provider offers the name, or several do
     * @throws InvalidOptionException when an option is unknown to the model or its value is refused
     */
    public OpacityTableTool opacityTables(String name, ModelOptions options) {
        return model(ModelFamily.OPACITY_TABLES, name, options);
    }

    /**
     * Shortcut for {@code model(ModelFamily.ENVELOPE, name, options)}.
     *
     * @param name    the integrator's name, or {@code provider/model}; {@code null} for the family's default
     * @param options the integrator's options
     * @return the integrator, immutable and thread-safe
     * @throws DiscoveryException     when no provider offers the name, or several do
     * @throws InvalidOptionException when an option is unknown to the integrator or its value is refused
     */
    public EnvelopeIntegrator envelope(String name, ModelOptions options) {
        return model(ModelFamily.ENVELOPE, name, options);
    }
}
