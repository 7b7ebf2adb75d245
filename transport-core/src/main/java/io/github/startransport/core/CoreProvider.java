package io.github.startransport.core;

import io.github.startransport.core.convection.EddySpectrumConvection;
import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.convection.TransparentEddyMixingLength;
import io.github.startransport.core.envelope.GreyAtmosphereEnvelope;
import io.github.startransport.core.gradient.GradientStability;
import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.core.profile.LocalDiagnosis;
import io.github.startransport.core.seismic.LocalBuoyancy;
import io.github.startransport.core.thermo.IonisingGas;
import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.core.opacity.CsvTableTool;
import io.github.startransport.core.opacity.TabulatedOpacity;
import io.github.startransport.spi.DiscoveryException;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.TransportProvider;

import java.util.List;
import java.util.function.Function;

/**
 * The library's own provider: every model of transport-core, by name.
 *
 * <p>Registered in {@code module-info.java} ({@code provides}) and in
 * {@code META-INF/services}. Immutable; creating a model reads its options once.
 */
public final class CoreProvider implements TransportProvider {
    /** This provider's name. */
    public static final String NAME = "startransport-core";

    private record Entry(ModelInfo info, Function<ModelOptions, Object> factory) {
    }

    /** In each family the first entry is the default. */
    private static final List<Entry> ENTRIES = List.of(
            new Entry(GradientStability.INFO, GradientStability::fromOptions),
            new Entry(IonisingGas.INFO, IonisingGas::fromOptions),
            new Entry(IdealGasRadiation.INFO, IdealGasRadiation::fromOptions),
            new Entry(LocalMixingLength.INFO, LocalMixingLength::fromOptions),
            new Entry(TransparentEddyMixingLength.INFO, TransparentEddyMixingLength::fromOptions),
            new Entry(EddySpectrumConvection.INFO, EddySpectrumConvection::fromOptions),
            new Entry(AnalyticOpacity.INFO, AnalyticOpacity::fromOptions),
            new Entry(TabulatedOpacity.INFO, TabulatedOpacity::fromOptions),
            new Entry(CsvTableTool.INFO, CsvTableTool::fromOptions),
            new Entry(LocalDiagnosis.INFO, LocalDiagnosis::fromOptions),
            new Entry(GreyAtmosphereEnvelope.INFO, GreyAtmosphereEnvelope::fromOptions),
            new Entry(DemoStar.INFO, DemoStar::fromOptions),
            new Entry(LocalBuoyancy.INFO, LocalBuoyancy::fromOptions));

    /** Public no-argument constructor, as {@link java.util.ServiceLoader} requires. */
    public CoreProvider() {
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public String description() {
        return "startransport's own physics: stability tests, partially ionised gas (Saha) and ideal gas plus radiation, "
                + "mixing-length and full-spectrum convection, opacities (analytic and tabulated), profile diagnosis, envelope integration, "
                + "demo star, buoyancy and acoustic frequencies";
    }

    @Override
    public List<ModelInfo> models() {
        return ENTRIES.stream().map(Entry::info).toList();
    }

    @Override
    public <T> T create(ModelFamily<T> family, String modelName, ModelOptions options) {
        for (Entry e : ENTRIES) {
            if (e.info().family() == family && e.info().name().equals(modelName)) {
                return family.type().cast(e.factory().apply(options));
            }
        }
        List<String> found = ENTRIES.stream().filter(e -> e.info().family() == family)
                .map(e -> e.info().name()).toList();
        throw new DiscoveryException(DiscoveryException.Kind.UNKNOWN_MODEL, modelName, found,
                "provider " + NAME + " has no " + family + " model named '" + modelName + "'; it offers " + found);
    }

    @Override
    public String toString() {
        return NAME;
    }
}
