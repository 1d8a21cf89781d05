package org.redward.api.catalog;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;

import org.osgi.annotation.versioning.ProviderType;
import org.redward.api.registry.Provided;
import org.redward.api.registry.ProviderRegistry;

/** The broker of catalogue writers (family {@code catalog-writers}). */
@ProviderType
public interface CatalogWriterRegistry extends ProviderRegistry<CatalogWriter> {

    /** The family name of this registry. */
    String FAMILY = "catalog-writers";

    /** The writer whose {@value CatalogWriter#EXTENSIONS} property lists the file's extension. */
    default Optional<Provided<CatalogWriter>> forFile(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        for (Provided<CatalogWriter> p : providers()) {
            Object ext = p.properties().get(CatalogWriter.EXTENSIONS);
            String[] list = ext instanceof String[] a ? a : ext == null ? new String[0] : new String[] {String.valueOf(ext)};
            for (String e : list) {
                if (name.endsWith("." + e.toLowerCase(Locale.ROOT))) {
                    return Optional.of(p);
                }
            }
        }
        return Optional.empty();
    }
}
