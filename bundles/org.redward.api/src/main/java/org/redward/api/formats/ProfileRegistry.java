package org.redward.api.formats;

import org.osgi.annotation.versioning.ProviderType;
import org.redward.api.registry.ProviderRegistry;

/** The broker of instrument profiles (family {@code profiles}). */
@ProviderType
public interface ProfileRegistry extends ProviderRegistry<InstrumentProfile> {
    /** The family name of this registry. */
    String FAMILY = "profiles";
}
