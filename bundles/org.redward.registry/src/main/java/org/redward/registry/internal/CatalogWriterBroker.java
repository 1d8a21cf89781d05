package org.redward.registry.internal;

import org.osgi.framework.ServiceReference;
import org.osgi.service.component.ComponentServiceObjects;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.catalog.CatalogWriter;
import org.redward.api.catalog.CatalogWriterRegistry;
import org.redward.api.registry.Provided;

/** Tracks every {@link CatalogWriter} service. */
@Component(service = {CatalogWriterRegistry.class, org.redward.api.registry.ProviderRegistry.class},
        property = Provided.FAMILY + "=" + CatalogWriterRegistry.FAMILY)
public final class CatalogWriterBroker extends Tracked<CatalogWriter> implements CatalogWriterRegistry {

    @Override
    public String family() {
        return FAMILY;
    }

    @Reference(service = CatalogWriter.class, cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bind(ComponentServiceObjects<CatalogWriter> service, ServiceReference<CatalogWriter> ref) {
        add(service, ref);
    }

    void unbind(ServiceReference<CatalogWriter> ref) {
        remove(ref);
    }
}
