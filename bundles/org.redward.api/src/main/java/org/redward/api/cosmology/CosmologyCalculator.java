package org.redward.api.cosmology;

import org.osgi.annotation.versioning.ProviderType;

/**
 * The service that turns parameters into a {@link Cosmology}. Thread-safe; the cosmologies it
 * returns are immutable and may be kept and shared (building one costs a few microseconds).
 */
@ProviderType
public interface CosmologyCalculator {

    /** A cosmology for these parameters. */
    Cosmology of(CosmologyParameters parameters);
}
