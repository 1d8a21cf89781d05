package org.redward.api.redshift;

import org.osgi.annotation.versioning.ProviderType;
import org.redward.api.registry.ProviderRegistry;

/** The broker of redshift estimators (family {@code estimators}). */
@ProviderType
public interface EstimatorRegistry extends ProviderRegistry<RedshiftEstimator> {
    /** The family name of this registry. */
    String FAMILY = "estimators";
}
