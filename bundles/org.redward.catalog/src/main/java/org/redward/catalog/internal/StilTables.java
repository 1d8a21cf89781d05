package org.redward.catalog.internal;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

import org.redward.api.catalog.Catalog;
import org.redward.api.catalog.CatalogTable;
import org.redward.api.catalog.Column;

import uk.ac.starlink.table.AbstractStarTable;
import uk.ac.starlink.table.ColumnInfo;
import uk.ac.starlink.table.DefaultValueInfo;
import uk.ac.starlink.table.DescribedValue;
import uk.ac.starlink.table.RowSequence;
import uk.ac.starlink.table.StarTable;

/**
 * Presents catalogue tables to STIL as streaming {@link StarTable}s: each
 * {@link #getRowSequence()} iterates the table's rows afresh (nothing is held in memory),
 * columns carry their unit and UCD, and the catalogue's provenance becomes the table
 * parameters of the first table. A second table, {@code provenance}, holds the same keys and
 * values as rows, for formats that keep no parameters.
 */
final class StilTables {

    private StilTables() {
    }

    static List<StarTable> of(Catalog catalog) {
        List<StarTable> out = new ArrayList<>();
        boolean first = true;
        for (CatalogTable t : catalog.tables()) {
            Streamed s = new Streamed(t);
            if (first) {
                List<DescribedValue> params = new ArrayList<>();
                params.add(new DescribedValue(new DefaultValueInfo("title", String.class, "catalogue title"), catalog.title()));
                for (Map.Entry<String, String> e : catalog.provenance().entrySet()) {
                    params.add(new DescribedValue(new DefaultValueInfo(e.getKey(), String.class, "provenance"), e.getValue()));
                }
                s.setParameters(params);
                first = false;
            }
            out.add(s);
        }
        return out;
    }

    /** The provenance as a two-column table (key, value). */
    static StarTable provenance(Catalog catalog) {
        List<Object[]> rows = new ArrayList<>();
        for (Map.Entry<String, String> e : catalog.provenance().entrySet()) {
            rows.add(new Object[] {e.getKey(), e.getValue()});
        }
        CatalogTable t = new CatalogTable("provenance", "how the catalogue was made: product, bundles, estimator, templates, parameters, inputs",
                List.of(Column.ofString("key", "meta.id", "provenance item"), Column.ofString("value", "meta.note", "its value")),
                rows.size(), rows);
        return new Streamed(t);
    }

    static ColumnInfo info(Column c) {
        ColumnInfo ci = new ColumnInfo(c.name(), c.type(), c.description());
        if (!c.unit().isEmpty()) {
            ci.setUnitString(c.unit());
        }
        if (!c.ucd().isEmpty()) {
            ci.setUCD(c.ucd());
        }
        return ci;
    }

    /** One catalogue table as a streaming STIL table. */
    static final class Streamed extends AbstractStarTable {
        private final CatalogTable table;
        private final ColumnInfo[] infos;

        Streamed(CatalogTable table) {
            this.table = table;
            this.infos = table.columns().stream().map(StilTables::info).toArray(ColumnInfo[]::new);
            setName(table.name());
        }

        @Override
        public ColumnInfo getColumnInfo(int i) {
            return infos[i];
        }

        @Override
        public int getColumnCount() {
            return infos.length;
        }

        @Override
        public long getRowCount() {
            return table.rowCount();
        }

        @Override
        public RowSequence getRowSequence() throws IOException {
            Iterator<Object[]> it;
            try {
                it = table.rows().iterator();
            } catch (UncheckedIOException e) {
                throw e.getCause();
            }
            return new RowSequence() {
                private Object[] row;

                @Override
                public boolean next() throws IOException {
                    try {
                        if (!it.hasNext()) {
                            return false;
                        }
                        row = it.next();
                        return true;
                    } catch (UncheckedIOException e) {
                        throw e.getCause();
                    }
                }

                @Override
                public Object getCell(int i) {
                    return row[i];
                }

                @Override
                public Object[] getRow() {
                    return row;
                }

                @Override
                public void close() {
                }
            };
        }
    }
}
