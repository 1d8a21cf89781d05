package org.redward.registry.internal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.CopyOnWriteArrayList;

import org.osgi.framework.Bundle;
import org.osgi.framework.ServiceReference;
import org.osgi.service.component.ComponentServiceObjects;
import org.redward.api.registry.Provided;
import org.redward.api.registry.ProviderRegistry;

/**
 * The shared body of every registry: a thread-safe list of providers kept up to date by DS
 * dynamic references. Providers are listed from their service properties; a provider's service
 * object is obtained only when a consumer asks for it ({@link Provided#service()}), so listing
 * never activates a provider (DS releases what was obtained when the provider goes away).
 * Providers without an id are ignored.
 * When two providers share an id, the one with the higher service ranking (then the lower
 * service id) wins; the other stays listed under {@link #shadowed()}.
 */
public abstract class Tracked<T> implements ProviderRegistry<T> {

    private final List<Entry<T>> entries = new CopyOnWriteArrayList<>();

    private record Entry<T>(ServiceReference<?> ref, Provided<T> provided) {
    }

    protected final void add(ComponentServiceObjects<T> service, ServiceReference<?> ref) {
        Object id = ref.getProperty(Provided.ID);
        if (id == null) {
            return;
        }
        Map<String, Object> props = new TreeMap<>();
        for (String key : ref.getPropertyKeys()) {
            props.put(key, ref.getProperty(key));
        }
        Bundle b = ref.getBundle();
        String bsn = b == null ? "?" : b.getSymbolicName();
        String version = b == null ? "?" : b.getVersion().toString();
        Object description = ref.getProperty(Provided.DESCRIPTION);
        entries.add(new Entry<>(ref, Provided.lazy(String.valueOf(id), service::getService, bsn, version,
                description == null ? "" : String.valueOf(description), props)));
    }

    protected final void remove(ServiceReference<?> ref) {
        entries.removeIf(e -> e.ref().equals(ref));
    }

    @Override
    public List<Provided<T>> providers() {
        Map<String, Entry<T>> best = new TreeMap<>();
        for (Entry<T> e : entries) {
            best.merge(e.provided().id(), e, (a, b) -> a.ref().compareTo(b.ref()) >= 0 ? a : b);
        }
        List<Provided<T>> out = new ArrayList<>();
        for (Entry<T> e : best.values()) {
            out.add(e.provided());
        }
        out.sort(Comparator.comparing(Provided::id));
        return out;
    }

    /** Providers hidden by another with the same id (for diagnostics). */
    public List<Provided<T>> shadowed() {
        List<Provided<T>> visible = providers();
        List<Provided<T>> out = new ArrayList<>();
        for (Entry<T> e : entries) {
            if (!visible.contains(e.provided())) {
                out.add(e.provided());
            }
        }
        return out;
    }
}
