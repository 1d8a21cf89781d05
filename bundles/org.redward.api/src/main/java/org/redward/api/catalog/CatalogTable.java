package org.redward.api.catalog;

import java.util.List;
import java.util.Objects;

/**
 * One table of a catalogue: name, description, columns, the number of rows (known before
 * writing, as FITS needs it in the header) and the rows themselves. {@code rows} may be
 * iterated more than once (a writer may make a first pass, e.g. to size fixed-width strings)
 * and may throw {@link java.io.UncheckedIOException} while streaming. Each row is an
 * {@code Object[]} in column order with the value types of {@link Column}.
 */
public record CatalogTable(String name, String description, List<Column> columns, long rowCount, Iterable<Object[]> rows) {

    public CatalogTable {
        Objects.requireNonNull(name, "name");
        description = description == null ? "" : description;
        columns = List.copyOf(columns);
        Objects.requireNonNull(rows, "rows");
        if (rowCount < 0) {
            throw new IllegalArgumentException("table " + name + ": negative row count " + rowCount);
        }
    }

    /** The index of the column with this name, or -1. */
    public int columnIndex(String columnName) {
        for (int i = 0; i < columns.size(); i++) {
            if (columns.get(i).name().equals(columnName)) {
                return i;
            }
        }
        return -1;
    }
}
