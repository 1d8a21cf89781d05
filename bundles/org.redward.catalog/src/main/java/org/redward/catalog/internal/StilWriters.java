package org.redward.catalog.internal;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.osgi.service.component.annotations.Component;
import org.redward.api.catalog.Catalog;
import org.redward.api.catalog.CatalogWriter;
import org.redward.api.registry.Provided;

import uk.ac.starlink.ecsv.EcsvTableWriter;
import uk.ac.starlink.fits.FitsTableWriter;
import uk.ac.starlink.table.StarTable;
import uk.ac.starlink.table.TableSequence;
import uk.ac.starlink.table.Tables;
import uk.ac.starlink.votable.DataFormat;
import uk.ac.starlink.votable.VOTableVersion;
import uk.ac.starlink.votable.VOTableWriter;

/** The catalogue writers built on STIL (embedded): FITS binary table, VOTable 1.4, ECSV. */
final class StilWriters {

    /** STIL reports routine choices (e.g. trimmed FITS comments) at INFO on standard error: keep only warnings. */
    private static final java.util.logging.Logger STIL_LOG = java.util.logging.Logger.getLogger("uk.ac.starlink");

    static {
        STIL_LOG.setLevel(java.util.logging.Level.WARNING);
    }

    private StilWriters() {
    }

    private static OutputStream open(Path file) throws IOException {
        return new BufferedOutputStream(Files.newOutputStream(file), 1 << 16);
    }

    /**
     * FITS: an empty primary HDU, each table of the catalogue as a binary table (EXTNAME the
     * table's name in upper case, e.g. {@code REDSHIFTS}, {@code LINES}; units in TUNITn, strings
     * as fixed-width A columns, NaN for missing numbers), then a {@code PROVENANCE} binary table
     * (key, value). STIL sizes strings with a first pass over the rows.
     */
    @Component(property = {Provided.ID + "=fits", Provided.DESCRIPTION + "=FITS binary tables (units in TUNITn) with a provenance table",
            CatalogWriter.EXTENSIONS + "=fits", CatalogWriter.EXTENSIONS + "=fit", CatalogWriter.EXTENSIONS + "=fits.gz",
            CatalogWriter.MANY_TABLES + ":Boolean=true"})
    public static final class Fits implements CatalogWriter {
        @Override
        public void write(Catalog catalog, Path file) throws IOException {
            List<StarTable> tables = new ArrayList<>(StilTables.of(catalog));
            tables.add(StilTables.provenance(catalog));
            for (StarTable t : tables) {
                t.setName(t.getName().toUpperCase(java.util.Locale.ROOT)); // EXTNAME in upper case (FITS common practice)
            }
            FitsTableWriter w = new FitsTableWriter();
            w.setPrimaryType(FitsTableWriter.PrimaryType.BASIC);
            w.setWriteDate(false);
            OutputStream out = file.getFileName().toString().endsWith(".gz")
                    ? new java.util.zip.GZIPOutputStream(open(file), 1 << 16) : open(file);
            try (out) {
                w.writeStarTables(sequence(tables), out);
            }
        }
    }

    /** VOTable 1.4 (TABLEDATA): every table of the catalogue a TABLE, units and UCDs on FIELDs, the provenance as PARAMs of the first. */
    @Component(property = {Provided.ID + "=votable", Provided.DESCRIPTION + "=IVOA VOTable 1.4 (units, UCDs, provenance as PARAMs)",
            CatalogWriter.EXTENSIONS + "=vot", CatalogWriter.EXTENSIONS + "=xml", CatalogWriter.EXTENSIONS + "=votable",
            CatalogWriter.MANY_TABLES + ":Boolean=true"})
    public static final class VoTable implements CatalogWriter {
        @Override
        public void write(Catalog catalog, Path file) throws IOException {
            VOTableWriter w = new VOTableWriter(DataFormat.TABLEDATA, true, VOTableVersion.V14);
            w.setWriteDate(false);
            w.setWriteSchemaLocation(true);
            try (OutputStream out = open(file)) {
                w.writeStarTables(sequence(StilTables.of(catalog)), out);
            }
        }
    }

    /**
     * ECSV (Astropy's Enhanced Character Separated Values): units, UCDs and provenance in the YAML
     * header. One table per file: only the first table of the catalogue is written.
     */
    @Component(property = {Provided.ID + "=ecsv", Provided.DESCRIPTION + "=ECSV (units, UCDs and provenance in the YAML header)",
            CatalogWriter.EXTENSIONS + "=ecsv"})
    public static final class Ecsv implements CatalogWriter {
        @Override
        public void write(Catalog catalog, Path file) throws IOException {
            try (OutputStream out = open(file)) {
                EcsvTableWriter.SPACE_WRITER.writeStarTable(StilTables.of(catalog).get(0), out);
            }
        }
    }

    private static TableSequence sequence(List<StarTable> tables) {
        return Tables.arrayTableSequence(tables.toArray(new StarTable[0]));
    }
}
