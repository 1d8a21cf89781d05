package org.redward.api.registry;

import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

import org.osgi.annotation.versioning.ProviderType;

/**
 * The broker of one service family (whiteboard pattern): it tracks every provider registered
 * with an {@value Provided#ID} property as bundles come and go, and selects one by id. Commands
 * and other consumers go through a registry; they never enumerate bundles themselves.
 *
 * <p>Registries are registered with the service property {@value Provided#FAMILY}. Thread-safe:
 * the lists returned are snapshots.
 *
 * @param <T> the family's service type
 */
@ProviderType
public interface ProviderRegistry<T> {

    /** The family name, e.g. {@code estimators}, {@code readers}, {@code templates}. */
    String family();

    /** A snapshot of the current providers, sorted by id. */
    List<Provided<T>> providers();

    /** The provider with this id, if present now. */
    default Optional<Provided<T>> find(String id) {
        return providers().stream().filter(p -> p.id().equals(id)).findFirst();
    }

    /** The ids of the current providers, sorted. */
    default List<String> ids() {
        return providers().stream().map(Provided::id).collect(Collectors.toList());
    }

    /**
     * The provider with this id.
     *
     * @throws java.util.NoSuchElementException with a message listing the ids available
     */
    default Provided<T> require(String id) {
        return find(id).orElseThrow(() -> new java.util.NoSuchElementException(
                "no " + family() + " provider with id '" + id + "' (available: "
                        + (ids().isEmpty() ? "none" : String.join(", ", ids())) + ")"));
    }
}
