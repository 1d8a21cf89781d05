package org.redward.api.formats;

import org.osgi.annotation.versioning.ProviderType;
import org.redward.api.registry.ProviderRegistry;

/** The broker of spectrum readers (family {@code readers}). */
@ProviderType
public interface ReaderRegistry extends ProviderRegistry<SpectrumReader> {
    /** The family name of this registry. */
    String FAMILY = "readers";
}
