/**
 * Catalogue tables and the writers that store them (FITS binary table, VOTable, ECSV, CSV...):
 * a writer receives a {@link org.redward.api.catalog.Catalog} whose tables stream their rows, so
 * a catalogue of any size is written without holding it in memory.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.1.0")
package org.redward.api.catalog;
