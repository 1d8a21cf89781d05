package org.redward.catalog.internal;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.osgi.service.component.annotations.Component;
import org.redward.api.catalog.Catalog;
import org.redward.api.catalog.CatalogTable;
import org.redward.api.catalog.CatalogWriter;
import org.redward.api.catalog.Column;
import org.redward.api.registry.Provided;

/**
 * CSV (RFC 4180 quoting) with a commented header: lines starting with {@code #} give the title,
 * the provenance ({@code # key: value}) and every column with its unit, UCD and description;
 * then one line of column names and one line per row. Missing numbers are empty fields. A second
 * table, if any, follows after a blank line and its own commented header.
 */
@Component(property = {Provided.ID + "=csv", Provided.DESCRIPTION + "=CSV with a commented header (units, provenance)",
        CatalogWriter.EXTENSIONS + "=csv"})
public final class CsvCatalogWriter implements CatalogWriter {

    @Override
    public void write(Catalog catalog, Path file) throws IOException {
        try (Writer w = new BufferedWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), 1 << 16)) {
            w.write("# " + oneLine(catalog.title()) + "\n");
            for (Map.Entry<String, String> e : catalog.provenance().entrySet()) {
                w.write("# " + oneLine(e.getKey()) + ": " + oneLine(e.getValue()) + "\n");
            }
            boolean first = true;
            for (CatalogTable t : catalog.tables()) {
                if (!first) {
                    w.write("\n");
                }
                first = false;
                writeTable(t, w);
            }
        }
    }

    private static void writeTable(CatalogTable t, Writer w) throws IOException {
        List<Column> cols = t.columns();
        w.write("# table: " + oneLine(t.name()) + " (" + t.rowCount() + " rows): " + oneLine(t.description()) + "\n");
        for (Column c : cols) {
            w.write("# column " + c.name() + " [" + c.unit() + "] " + c.type().getSimpleName().toLowerCase(java.util.Locale.ROOT)
                    + (c.ucd().isEmpty() ? "" : " ucd=" + c.ucd()) + ": " + oneLine(c.description()) + "\n");
        }
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < cols.size(); i++) {
            if (i > 0) {
                sb.append(',');
            }
            sb.append(cols.get(i).name());
        }
        sb.append('\n');
        w.write(sb.toString());
        for (Object[] row : t.rows()) {
            sb.setLength(0);
            for (int i = 0; i < row.length; i++) {
                if (i > 0) {
                    sb.append(',');
                }
                cell(sb, row[i]);
            }
            sb.append('\n');
            w.write(sb.toString());
        }
    }

    static void cell(StringBuilder sb, Object v) {
        if (v == null) {
            return;
        }
        if (v instanceof Double d) {
            if (Double.isFinite(d)) {
                sb.append(Double.toString(d));
            }
            return;
        }
        String s = v.toString();
        if (s.indexOf(',') >= 0 || s.indexOf('"') >= 0 || s.indexOf('\n') >= 0 || s.indexOf('\r') >= 0) {
            sb.append('"').append(s.replace("\"", "\"\"")).append('"');
        } else {
            sb.append(s);
        }
    }

    private static String oneLine(String s) {
        return s.replace('\n', ' ').replace('\r', ' ');
    }
}
