package org.redward.api.cosmology;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * A named, published set of cosmological parameters, registered as a service with
 * {@code redward.id} = its name (e.g. {@code planck2018}) so that bundles may add their own.
 */
@ConsumerType
public interface CosmologySet {

    /** The parameters, with name and citation. */
    CosmologyParameters parameters();
}
