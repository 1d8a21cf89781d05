package org.redward.registry.internal;

import org.osgi.framework.ServiceReference;
import org.osgi.service.component.ComponentServiceObjects;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.registry.Provided;
import org.redward.api.formats.WriterRegistry;
import org.redward.api.formats.SpectrumWriter;

/** Tracks every {@link SpectrumWriter} service. */
@Component(service = {WriterRegistry.class, org.redward.api.registry.ProviderRegistry.class},
        property = Provided.FAMILY + "=" + WriterRegistry.FAMILY)
public final class WriterBroker extends Tracked<SpectrumWriter> implements WriterRegistry {

    @Override
    public String family() {
        return FAMILY;
    }

    @Reference(service = SpectrumWriter.class, cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bind(ComponentServiceObjects<SpectrumWriter> service, ServiceReference<SpectrumWriter> ref) {
        add(service, ref);
    }

    void unbind(ServiceReference<SpectrumWriter> ref) {
        remove(ref);
    }
}
