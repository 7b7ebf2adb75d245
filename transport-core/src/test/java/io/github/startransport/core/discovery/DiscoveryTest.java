package io.github.startransport.core.discovery;

import io.github.startransport.core.CoreProvider;
import io.github.startransport.core.checks.CheckKind;
import io.github.startransport.spi.DiscoveryException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.StabilityModel;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.TransportProvider;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Supplier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The discovery facade of the SPI, on the class path, with the core provider and with test providers. */
class DiscoveryTest {

    /** A second provider whose name can be chosen, offering one stability model. */
    static final class NamedProvider implements TransportProvider {
        private final String name;
        private final CoreProvider core = new CoreProvider();

        NamedProvider(String name) {
            this.name = name;
        }

        @Override
        public String name() {
            return name;
        }

        @Override
        public String description() {
            return "test provider";
        }

        @Override
        public List<ModelInfo> models() {
            return core.models();
        }

        @Override
        public <T> T create(ModelFamily<T> family, String modelName, ModelOptions options) {
            return core.create(family, modelName, options);
        }
    }

    /** Registered by a services file in a temporary folder: its constructor always fails. */
    public static final class BrokenProvider extends io.github.startransport.core.discovery.Broken {
        public BrokenProvider() {
            super();
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void classPathDiscoveryFindsTheCoreProvider() {
        Transport t = Transport.discover();
        assertEquals(CoreProvider.NAME, t.provider(CoreProvider.NAME).name());
        assertTrue(t.loadFailures().isEmpty(), t.loadFailures().toString());
        StabilityModel m = t.stability("gradient-comparison", ModelOptions.parse("criterion=ledoux"));
        assertEquals("LEDOUX", m.criterion().name());
        assertNotNull(t.model(ModelFamily.THERMODYNAMICS, CoreProvider.NAME + "/ideal-gas-radiation",
                ModelOptions.defaults()));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void defaultModelOfAFamilyIsTheProvidersFirst() {
        Transport t = Transport.discover();
        assertEquals("gradient-comparison", new CoreProvider().defaultModel(ModelFamily.STABILITY));
        assertNotNull(t.stability(null, ModelOptions.defaults()));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void unknownModelNameSaysWhatWasFound() {
        Transport t = Transport.discover();
        DiscoveryException e = assertThrows(DiscoveryException.class,
                () -> t.stability("no-such-test", ModelOptions.defaults()));
        assertEquals(DiscoveryException.Kind.UNKNOWN_MODEL, e.kind());
        assertEquals("no-such-test", e.wanted());
        assertTrue(e.found().contains(CoreProvider.NAME + "/gradient-comparison"), e.found().toString());
        assertTrue(e.getMessage().contains("transport-core"), e.getMessage());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void unknownProviderNameSaysWhatWasFound() {
        Transport t = Transport.discover();
        DiscoveryException e = assertThrows(DiscoveryException.class, () -> t.provider("elsewhere"));
        assertEquals(DiscoveryException.Kind.UNKNOWN_PROVIDER, e.kind());
        assertEquals(List.of(CoreProvider.NAME), e.found());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void noProviderAtAllNamesTheJarToAdd() {
        DiscoveryException e = assertThrows(DiscoveryException.class, () -> Transport.fromSuppliers(List.of()));
        assertEquals(DiscoveryException.Kind.NO_PROVIDER, e.kind());
        assertTrue(e.getMessage().contains("io.github.startransport:transport-core"), e.getMessage());
        // and through a real ServiceLoader over a loader that sees no services file
        try (URLClassLoader empty = new URLClassLoader(new URL[0], ClassLoader.getPlatformClassLoader())) {
            DiscoveryException e2 = assertThrows(DiscoveryException.class, () -> Transport.discover(empty));
            assertEquals(DiscoveryException.Kind.NO_PROVIDER, e2.kind());
        } catch (IOException ex) {
            throw new AssertionError(ex);
        }
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void twoProvidersWithOneNameAreRefusedNamingBoth() {
        List<Supplier<TransportProvider>> two = List.of(CoreProvider::new, () -> new NamedProvider(CoreProvider.NAME));
        DiscoveryException e = assertThrows(DiscoveryException.class, () -> Transport.fromSuppliers(two));
        assertEquals(DiscoveryException.Kind.DUPLICATE_PROVIDER, e.kind());
        assertEquals(2, e.found().size());
        assertTrue(e.found().get(1).contains(NamedProvider.class.getName()), e.found().toString());
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void aModelOfferedTwiceMustBeQualified() {
        Transport t = Transport.fromSuppliers(List.of(CoreProvider::new, () -> new NamedProvider("other")));
        DiscoveryException e = assertThrows(DiscoveryException.class,
                () -> t.stability("gradient-comparison", ModelOptions.defaults()));
        assertEquals(DiscoveryException.Kind.AMBIGUOUS_MODEL, e.kind());
        assertTrue(e.found().contains("other/gradient-comparison"));
        assertNotNull(t.stability("other/gradient-comparison", ModelOptions.defaults()));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void aProviderThatFailsToLoadDoesNotHideTheOthers() {
        Supplier<TransportProvider> failing = () -> {
            throw new IllegalStateException("missing native data");
        };
        Transport t = Transport.fromSuppliers(List.of(failing, CoreProvider::new));
        assertEquals(1, t.providers().size());
        assertEquals(1, t.loadFailures().size());
        assertTrue(t.loadFailures().get(0).contains("missing native data"));
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void brokenServiceEntriesAreReportedNotFatal(@TempDir Path dir) throws IOException {
        Path services = dir.resolve("META-INF/services");
        Files.createDirectories(services);
        Files.writeString(services.resolve(TransportProvider.class.getName()),
                "org.example.absent.NoSuchProvider\n" + BrokenProvider.class.getName() + "\n"
                        + CoreProvider.class.getName() + "\n");
        try (URLClassLoader loader = new URLClassLoader(new URL[] {dir.toUri().toURL()},
                DiscoveryTest.class.getClassLoader())) {
            Transport t = Transport.discover(loader);
            assertEquals(List.of(CoreProvider.NAME), t.providers().stream().map(TransportProvider::name).toList());
            assertEquals(2, t.loadFailures().size(), t.loadFailures().toString());
            assertTrue(t.loadFailures().stream().anyMatch(s -> s.contains("NoSuchProvider")), t.loadFailures().toString());
            assertTrue(t.loadFailures().stream().anyMatch(s -> s.contains("BrokenProvider")), t.loadFailures().toString());
            assertFalse(t.loadFailures().isEmpty());
        }
    }
}
