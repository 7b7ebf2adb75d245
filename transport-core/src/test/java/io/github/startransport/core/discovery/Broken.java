package io.github.startransport.core.discovery;

import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.TransportProvider;

import java.util.List;

/** A provider whose construction always fails, as a jar with missing data would. */
public class Broken implements TransportProvider {
    /** Always throws. */
    public Broken() {
        throw new IllegalStateException("this provider cannot start: its data file is missing");
    }

    @Override
    public String name() {
        return "broken";
    }

    @Override
    public String description() {
        return "never constructed";
    }

    @Override
    public List<ModelInfo> models() {
        return List.of();
    }

    @Override
    public <T> T create(ModelFamily<T> family, String modelName, ModelOptions options) {
        throw new UnsupportedOperationException();
    }
}
