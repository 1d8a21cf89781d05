package org.redward.api.registry;

import java.util.Map;
import java.util.Objects;

/**
 * One provider of a service family as seen by a {@link ProviderRegistry}: its id (the
 * {@value #ID} service property), the service object, and the bundle that registered it.
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
    private final T service;
    private final String bundleSymbolicName;
    private final String bundleVersion;
    private final String description;
    private final Map<String, Object> properties;

    private Provided(String id, T service, String bsn, String version, String description, Map<String, Object> properties) {
        this.id = id;
        this.service = service;
        this.bundleSymbolicName = bsn;
        this.bundleVersion = version;
        this.description = description;
        this.properties = properties;
    }

    public static <T> Provided<T> of(String id, T service, String bundleSymbolicName, String bundleVersion,
            String description, Map<String, Object> properties) {
        return new Provided<>(Objects.requireNonNull(id), Objects.requireNonNull(service), bundleSymbolicName,
                bundleVersion, description == null ? "" : description, Map.copyOf(properties));
    }

    public String id() { return id; }
    public T service() { return service; }
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
