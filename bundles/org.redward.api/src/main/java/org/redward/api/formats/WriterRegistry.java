package org.redward.api.formats;

import java.util.Locale;
import java.util.Optional;

import org.osgi.annotation.versioning.ProviderType;
import org.redward.api.registry.Provided;
import org.redward.api.registry.ProviderRegistry;

/** The broker of spectrum writers (family {@code writers}). */
@ProviderType
public interface WriterRegistry extends ProviderRegistry<SpectrumWriter> {
    /** The family name of this registry. */
    String FAMILY = "writers";

    /** The writer whose extensions match the file name's ending, if any. */
    default Optional<Provided<SpectrumWriter>> forFileName(String fileName) {
        String n = fileName.toLowerCase(Locale.ROOT);
        for (Provided<SpectrumWriter> p : providers()) {
            for (String ext : p.service().extensions()) {
                if (n.endsWith(ext)) {
                    return Optional.of(p);
                }
            }
        }
        return Optional.empty();
    }
}
