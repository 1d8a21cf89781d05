package org.redward.api.catalog;

import java.io.IOException;
import java.nio.file.Path;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * Writes a {@link Catalog} in one file format. Registered as a service with the properties
 * {@value org.redward.api.registry.Provided#ID} (the format id, e.g. {@code fits}),
 * {@value org.redward.api.registry.Provided#DESCRIPTION} and {@value #EXTENSIONS} (the file-name
 * endings it writes, lower case without the dot, e.g. {@code {"vot", "xml"}}).
 *
 * <p>Contract: writes exactly the file given (callers write to a temporary name and move it into
 * place, so no half-written file ever carries the final name); streams the rows (memory
 * independent of the row count); keeps the column order, units and UCDs; stores the provenance
 * where the format has room for it. Thread-safe: several catalogues may be written at once.
 */
@ConsumerType
public interface CatalogWriter {

    /** Service property (String[]): file-name endings this writer handles, lower case, no dot. */
    String EXTENSIONS = "redward.catalog.extensions";

    /**
     * Service property (Boolean): true if the format stores every table of a catalogue in the one
     * file (FITS extensions, VOTable TABLEs). Absent or false: the format holds one table per file
     * and the writer may store only the first; a caller with further tables writes each to a
     * sibling file, its name the main file's with the table's name before the extension
     * (e.g. {@code cat.lines.csv}).
     */
    String MANY_TABLES = "redward.catalog.many-tables";

    /** Writes the catalogue to {@code file}, replacing it if present. */
    void write(Catalog catalog, Path file) throws IOException;
}
