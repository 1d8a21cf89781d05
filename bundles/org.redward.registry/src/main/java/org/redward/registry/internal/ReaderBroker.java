package org.redward.registry.internal;

import org.osgi.framework.ServiceReference;
import org.osgi.service.component.ComponentServiceObjects;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.registry.Provided;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.formats.SpectrumReader;

/** Tracks every {@link SpectrumReader} service. */
@Component(service = {ReaderRegistry.class, org.redward.api.registry.ProviderRegistry.class},
        property = Provided.FAMILY + "=" + ReaderRegistry.FAMILY)
public final class ReaderBroker extends Tracked<SpectrumReader> implements ReaderRegistry {

    @Override
    public String family() {
        return FAMILY;
    }

    @Reference(service = SpectrumReader.class, cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bind(ComponentServiceObjects<SpectrumReader> service, ServiceReference<SpectrumReader> ref) {
        add(service, ref);
    }

    void unbind(ServiceReference<SpectrumReader> ref) {
        remove(ref);
    }
}
