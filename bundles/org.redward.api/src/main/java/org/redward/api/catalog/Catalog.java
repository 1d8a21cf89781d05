package org.redward.api.catalog;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * A catalogue to write: a title, the provenance (ordered key/value text: product version,
 * bundles with versions and checksums, estimator, template set and checksum, parameters, input
 * files and their checksums...) and one or more tables, the first being the main one.
 * Immutable (the tables stream their rows).
 */
public final class Catalog {

    private final String title;
    private final Map<String, String> provenance;
    private final List<CatalogTable> tables;

    private Catalog(String title, Map<String, String> provenance, List<CatalogTable> tables) {
        this.title = Objects.requireNonNull(title, "title");
        this.provenance = Collections.unmodifiableMap(new LinkedHashMap<>(provenance));
        this.tables = List.copyOf(tables);
        if (this.tables.isEmpty()) {
            throw new IllegalArgumentException("a catalogue needs at least one table");
        }
    }

    public static Catalog of(String title, Map<String, String> provenance, List<CatalogTable> tables) {
        return new Catalog(title, provenance, tables);
    }

    public String title() { return title; }
    /** Provenance keys and values, in order. Keys are short lower-case words with dots or underscores. */
    public Map<String, String> provenance() { return provenance; }
    public List<CatalogTable> tables() { return tables; }
}
