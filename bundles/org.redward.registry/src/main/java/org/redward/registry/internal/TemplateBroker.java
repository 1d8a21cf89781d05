package org.redward.registry.internal;

import org.osgi.framework.ServiceReference;
import org.osgi.service.component.ComponentServiceObjects;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.registry.Provided;
import org.redward.api.templates.TemplateRegistry;
import org.redward.api.templates.TemplateSet;

/** Tracks every {@link TemplateSet} service. */
@Component(service = {TemplateRegistry.class, org.redward.api.registry.ProviderRegistry.class},
        property = Provided.FAMILY + "=" + TemplateRegistry.FAMILY)
public final class TemplateBroker extends Tracked<TemplateSet> implements TemplateRegistry {

    @Override
    public String family() {
        return FAMILY;
    }

    @Reference(service = TemplateSet.class, cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bind(ComponentServiceObjects<TemplateSet> service, ServiceReference<TemplateSet> ref) {
        add(service, ref);
    }

    void unbind(ServiceReference<TemplateSet> ref) {
        remove(ref);
    }
}
