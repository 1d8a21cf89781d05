package org.redward.registry.internal;

import org.osgi.framework.ServiceReference;
import org.osgi.service.component.ComponentServiceObjects;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.lines.LineFinder;
import org.redward.api.lines.LineFinderRegistry;
import org.redward.api.registry.Provided;

/** Tracks every {@link LineFinder} service. */
@Component(service = {LineFinderRegistry.class, org.redward.api.registry.ProviderRegistry.class},
        property = Provided.FAMILY + "=" + LineFinderRegistry.FAMILY)
public final class LineFinderBroker extends Tracked<LineFinder> implements LineFinderRegistry {

    @Override
    public String family() {
        return FAMILY;
    }

    @Reference(service = LineFinder.class, cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bind(ComponentServiceObjects<LineFinder> service, ServiceReference<LineFinder> ref) {
        add(service, ref);
    }

    void unbind(ServiceReference<LineFinder> ref) {
        remove(ref);
    }
}
