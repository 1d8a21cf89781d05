package org.redward.registry.internal;

import org.osgi.framework.ServiceReference;
import org.osgi.service.component.ComponentServiceObjects;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.registry.Provided;
import org.redward.api.formats.ProfileRegistry;
import org.redward.api.formats.InstrumentProfile;

/** Tracks every {@link InstrumentProfile} service. */
@Component(service = {ProfileRegistry.class, org.redward.api.registry.ProviderRegistry.class},
        property = Provided.FAMILY + "=" + ProfileRegistry.FAMILY)
public final class ProfileBroker extends Tracked<InstrumentProfile> implements ProfileRegistry {

    @Override
    public String family() {
        return FAMILY;
    }

    @Reference(service = InstrumentProfile.class, cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bind(ComponentServiceObjects<InstrumentProfile> service, ServiceReference<InstrumentProfile> ref) {
        add(service, ref);
    }

    void unbind(ServiceReference<InstrumentProfile> ref) {
        remove(ref);
    }
}
