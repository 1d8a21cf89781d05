package org.redward.registry.internal;

import org.osgi.framework.ServiceReference;
import org.osgi.service.component.ComponentServiceObjects;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.lines.LineIdentifier;
import org.redward.api.lines.LineIdentifierRegistry;
import org.redward.api.registry.Provided;

/** Tracks every {@link LineIdentifier} service. */
@Component(service = {LineIdentifierRegistry.class, org.redward.api.registry.ProviderRegistry.class},
        property = Provided.FAMILY + "=" + LineIdentifierRegistry.FAMILY)
public final class LineIdentifierBroker extends Tracked<LineIdentifier> implements LineIdentifierRegistry {

    @Override
    public String family() {
        return FAMILY;
    }

    @Reference(service = LineIdentifier.class, cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bind(ComponentServiceObjects<LineIdentifier> service, ServiceReference<LineIdentifier> ref) {
        add(service, ref);
    }

    void unbind(ServiceReference<LineIdentifier> ref) {
        remove(ref);
    }
}
