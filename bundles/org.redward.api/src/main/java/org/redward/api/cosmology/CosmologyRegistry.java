package org.redward.api.cosmology;

import org.osgi.annotation.versioning.ProviderType;
import org.redward.api.registry.ProviderRegistry;

/** The broker of named cosmological parameter sets (family {@code cosmologies}). */
@ProviderType
public interface CosmologyRegistry extends ProviderRegistry<CosmologySet> {
    /** The family name of this registry. */
    String FAMILY = "cosmologies";
    /** The id of the set used when none is named. */
    String DEFAULT_ID = "planck2018";
}
