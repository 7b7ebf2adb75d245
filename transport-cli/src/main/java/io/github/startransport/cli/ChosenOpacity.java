package io.github.startransport.cli;

import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.Transport;

import java.nio.file.Path;

/**
 * The opacity model a command runs with, as {@code --opacity-table FILE} or {@code --opacity NAME} chose it (the
 * provider's default when neither is given), with the name it is reported under.
 *
 * @param name  the model's name (the table model's when a file was given)
 * @param model the model
 */
record ChosenOpacity(String name, OpacityModel model) {

    /**
     * @param transport the discovered providers
     * @param opacity   the {@code --opacity} name, or null
     * @param table     the {@code --opacity-table} file, or null; wins over the name
     * @return the chosen model; an unknown name or a refused option is a usage error naming {@code --opacity}
     */
    static ChosenOpacity of(Transport transport, String opacity, Path table) {
        if (table != null) {
            String name = ModelNames.OPACITY_TABLE_MODEL;
            return new ChosenOpacity(name, transport.opacity(name, ModelOptions.defaults()
                    .with(ModelNames.OPACITY_TABLE_FILE, table.toAbsolutePath().toString())));
        }
        String name = opacity != null ? opacity : Catalog.defaultModel(transport, ModelFamily.OPACITY);
        return new ChosenOpacity(name, DiagnosisOptions.asOption("--opacity", name,
                () -> transport.opacity(name, ModelOptions.defaults())));
    }
}
