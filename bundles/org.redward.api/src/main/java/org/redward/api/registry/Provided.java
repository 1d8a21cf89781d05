package org.redward.api.registry;

import java.util.Map;
import java.util.Objects;
import java.util.function.Supplier;

/**
 * One provider of a service family as seen by a {@link ProviderRegistry}: its id (the
 * {@value #ID} service property), the service object, and the bundle that registered it.
 *
 * <p>A registry lists providers from their service properties alone; the service object is
 * obtained on the first call of {@link #service()} (which may activate the provider), so listing
 * ids and descriptions never starts a provider. Thread-safe.
 *
 * <p>Do not keep the service object beyond the call that uses it: its bundle may go away.
 *
 * @param <T> the family's service type
 */
public final class Provided<T> {

    /** Service property every provider of every family sets: its id, unique within the family. */
    public static final String ID = "redward.id";
    /** Optional service property: a one-line human description of the provider. */
    public static final String DESCRIPTION = "redward.description";
    /** Service property set by every registry: the family it brokers (e.g. {@code estimators}). */
    public static final String FAMILY = "redward.family";

    private final String id;
    private final Supplier<T> supplier;
    private volatile T service;
    private final String bundleSymbolicName;
    private final String bundleVersion;
    private final String description;
    private final Map<String, Object> properties;

    private Provided(String id, T service, Supplier<T> supplier, String bsn, String version, String description,
            Map<String, Object> properties) {
        this.id = id;
        this.service = service;
        this.supplier = supplier;
        this.bundleSymbolicName = bsn;
        this.bundleVersion = version;
        this.description = description;
        this.properties = properties;
    }

    public static <T> Provided<T> of(String id, T service, String bundleSymbolicName, String bundleVersion,
            String description, Map<String, Object> properties) {
        return new Provided<>(Objects.requireNonNull(id), Objects.requireNonNull(service), null, bundleSymbolicName,
                bundleVersion, description == null ? "" : description, Map.copyOf(properties));
    }

    /**
     * A provider whose service object is obtained on the first call of {@link #service()} (at most
     * once: the supplier is called under a lock until it gives a service).
     *
     * @param service gives the service object, or {@code null} if the provider cannot provide it
     *        now (its activation failed, or it went away)
     */
    public static <T> Provided<T> lazy(String id, Supplier<T> service, String bundleSymbolicName, String bundleVersion,
            String description, Map<String, Object> properties) {
        return new Provided<>(Objects.requireNonNull(id), null, Objects.requireNonNull(service), bundleSymbolicName,
                bundleVersion, description == null ? "" : description, Map.copyOf(properties));
    }

    public String id() { return id; }

    /**
     * The service object (obtained now if the provider was listed lazily).
     *
     * @throws IllegalStateException naming the provider and its bundle if it cannot provide the
     *         service (its activation failed, or its bundle went away)
     */
    public T service() {
        T s = service;
        if (s == null) {
            synchronized (this) {
                s = service;
                if (s == null) {
                    s = supplier.get();
                    if (s == null) {
                        throw new IllegalStateException("provider '" + id + "' of bundle " + bundleSymbolicName + " "
                                + bundleVersion + " could not provide its service (it failed to start or went away;"
                                + " see 'redward plugins', or run with --debug)");
                    }
                    service = s;
                }
            }
        }
        return s;
    }
    public String bundleSymbolicName() { return bundleSymbolicName; }
    public String bundleVersion() { return bundleVersion; }
    public String description() { return description; }
    /** All service properties (values as registered). */
    public Map<String, Object> properties() { return properties; }

    @Override
    public String toString() {
        return id + " (" + bundleSymbolicName + " " + bundleVersion + ")";
    }
}
