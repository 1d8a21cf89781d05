package org.redward.registry.internal;

import org.osgi.framework.ServiceReference;
import org.osgi.service.component.ComponentServiceObjects;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.registry.Provided;
import org.redward.api.redshift.EstimatorRegistry;
import org.redward.api.redshift.RedshiftEstimator;

/** Tracks every {@link RedshiftEstimator} service. */
@Component(service = {EstimatorRegistry.class, org.redward.api.registry.ProviderRegistry.class},
        property = Provided.FAMILY + "=" + EstimatorRegistry.FAMILY)
public final class EstimatorBroker extends Tracked<RedshiftEstimator> implements EstimatorRegistry {

    @Override
    public String family() {
        return FAMILY;
    }

    @Reference(service = RedshiftEstimator.class, cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bind(ComponentServiceObjects<RedshiftEstimator> service, ServiceReference<RedshiftEstimator> ref) {
        add(service, ref);
    }

    void unbind(ServiceReference<RedshiftEstimator> ref) {
        remove(ref);
    }
}
