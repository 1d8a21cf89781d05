package org.redward.registry.internal;

import org.osgi.framework.ServiceReference;
import org.osgi.service.component.ComponentServiceObjects;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineListRegistry;
import org.redward.api.registry.Provided;

/** Tracks every {@link LineList} service. */
@Component(service = {LineListRegistry.class, org.redward.api.registry.ProviderRegistry.class},
        property = Provided.FAMILY + "=" + LineListRegistry.FAMILY)
public final class LineListBroker extends Tracked<LineList> implements LineListRegistry {

    @Override
    public String family() {
        return FAMILY;
    }

    @Reference(service = LineList.class, cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bind(ComponentServiceObjects<LineList> service, ServiceReference<LineList> ref) {
        add(service, ref);
    }

    void unbind(ServiceReference<LineList> ref) {
        remove(ref);
    }
}
