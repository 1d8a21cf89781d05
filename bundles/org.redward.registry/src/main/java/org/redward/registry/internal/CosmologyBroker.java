package org.redward.registry.internal;

import org.osgi.framework.ServiceReference;
import org.osgi.service.component.ComponentServiceObjects;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.cosmology.CosmologyRegistry;
import org.redward.api.cosmology.CosmologySet;
import org.redward.api.registry.Provided;

/** Tracks every named {@link CosmologySet} service. */
@Component(service = {CosmologyRegistry.class, org.redward.api.registry.ProviderRegistry.class},
        property = Provided.FAMILY + "=" + CosmologyRegistry.FAMILY)
public final class CosmologyBroker extends Tracked<CosmologySet> implements CosmologyRegistry {

    @Override
    public String family() {
        return FAMILY;
    }

    @Reference(service = CosmologySet.class, cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bind(ComponentServiceObjects<CosmologySet> service, ServiceReference<CosmologySet> ref) {
        add(service, ref);
    }

    void unbind(ServiceReference<CosmologySet> ref) {
        remove(ref);
    }
}
