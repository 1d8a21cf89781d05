package org.redward.workbench.internal;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.json.JSONArray;
import org.json.JSONException;
import org.json.JSONObject;
import org.redward.api.commands.Json;

/**
 * Reads a catalogue written by {@code measure} (JSON lines, or CSV with a header line) as a queue,
 * and writes the queue back as a catalogue with the verdict columns. The leading columns are
 * those of {@code measure --json} (the machine's answer, first estimator); the verdict columns
 * follow: {@code verdict}, {@code z_person}, {@code person_grade}, {@code line_named},
 * {@code note}, {@code decided_by}, {@code decided_at}, and {@code z_adopted} (the person's z when
 * decided, else the machine's).
 */
final class Catalogue {

    /** The column order of an exported catalogue. */
    static final List<String> COLUMNS = List.of("source", "index", "id", "status", "error", "z", "z_err", "class", "grade",
            "estimator", "alternatives", "verdict", "z_person", "person_grade", "line_named", "note", "decided_by",
            "decided_at", "z_adopted");

    private Catalogue() {
    }

    /** True if the file looks like a catalogue (by extension) rather than a spectrum. */
    static boolean isCatalogue(Path file) {
        String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
        return n.endsWith(".jsonl") || n.endsWith(".ndjson") || n.endsWith(".json") || n.endsWith(".csv");
    }

    /** A catalogue read: its items and one message per row or spectrum that is a problem. */
    record Read(List<QueueItem> items, List<String> problems) {
    }

    /**
     * Reads a catalogue. Relative {@code source} paths are resolved against the catalogue's folder;
     * a row whose spectrum file has moved is kept (its problem says so) so that the person sees it.
     *
     * @throws IOException if the file cannot be read or has no {@code source} column
     */
    static Read read(Path file) throws IOException {
        List<Map<String, String>> rows = file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv")
                ? readCsv(file) : readJsonLines(file);
        Path base = file.toAbsolutePath().getParent();
        List<QueueItem> items = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        int row = 0;
        for (Map<String, String> r : rows) {
            row++;
            String src = r.get("source");
            if (src == null || src.isBlank()) {
                throw new IOException(file.getFileName() + ": row " + row + " has no 'source' column value (not a catalogue of measure?)");
            }
            Path p = base.resolve(src).normalize();
            int index = parseInt(r.get("index"), 0);
            QueueItem it = new QueueItem(p, index, r.get("id"));
            String est = r.getOrDefault("estimator", "catalogue");
            boolean ok = !"failed".equals(r.get("status"));
            List<Double> alts = new ArrayList<>();
            for (String a : splitAlternatives(r.get("alternatives"))) {
                alts.add(parseDouble(a));
            }
            List<String> warnings = new ArrayList<>();
            it.answers().put(est.isBlank() ? "catalogue" : est, new MachineAnswer(est, ok, r.get("error"),
                    parseDouble(r.get("z")), parseDouble(r.get("z_err")), r.getOrDefault("class", "unknown"),
                    r.getOrDefault("grade", ""), alts, null, warnings));
            if (!Files.exists(p)) {
                String msg = file.getFileName() + " row " + row + ": spectrum file " + p + " is not there (moved?)";
                it.problem(msg);
                problems.add(msg);
            }
            items.add(it);
        }
        return new Read(items, problems);
    }

    private static List<String> splitAlternatives(String s) {
        List<String> out = new ArrayList<>();
        if (s == null || s.isBlank()) {
            return out;
        }
        String t = s.trim();
        if (t.startsWith("[")) {
            try {
                JSONArray a = new JSONArray(t);
                for (int i = 0; i < a.length(); i++) {
                    Object o = a.get(i);
                    out.add(o instanceof JSONObject jo ? String.valueOf(jo.opt("z")) : String.valueOf(o));
                }
                return out;
            } catch (JSONException e) {
                // fall through to the plain list
            }
        }
        for (String part : t.split("[;\\s]+")) {
            if (!part.isBlank()) {
                out.add(part);
            }
        }
        return out;
    }

    private static List<Map<String, String>> readJsonLines(Path file) throws IOException {
        List<Map<String, String>> rows = new ArrayList<>();
        int n = 0;
        for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) {
            n++;
            if (line.isBlank()) {
                continue;
            }
            try {
                JSONObject o = new JSONObject(line);
                Map<String, String> m = new LinkedHashMap<>();
                for (String k : o.keySet()) {
                    Object v = o.get(k);
                    m.put(k, v == JSONObject.NULL ? "" : (v instanceof JSONArray a ? a.toString() : String.valueOf(v)));
                }
                rows.add(m);
            } catch (JSONException e) {
                throw new IOException(file.getFileName() + " line " + n + ": not a JSON object (" + e.getMessage() + ")");
            }
        }
        return rows;
    }

    private static List<Map<String, String>> readCsv(Path file) throws IOException {
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        List<Map<String, String>> rows = new ArrayList<>();
        List<String> header = null;
        for (String line : lines) {
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            List<String> cells = splitCsv(line);
            if (header == null) {
                header = cells;
                continue;
            }
            Map<String, String> m = new LinkedHashMap<>();
            for (int i = 0; i < header.size(); i++) {
                m.put(header.get(i).trim(), i < cells.size() ? cells.get(i) : "");
            }
            rows.add(m);
        }
        return rows;
    }

    /** Splits one CSV line (RFC 4180 quoting: "..." with "" for a quote; no line breaks inside cells). */
    static List<String> splitCsv(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < line.length() && line.charAt(i + 1) == '"') {
                        cell.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    cell.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                out.add(cell.toString());
                cell.setLength(0);
            } else {
                cell.append(c);
            }
        }
        out.add(cell.toString());
        return out;
    }

    /** One exported row, as ordered values of {@link #COLUMNS}. */
    static Map<String, Object> row(QueueItem it) {
        Map<String, Object> m = new LinkedHashMap<>();
        MachineAnswer a = it.primary();
        m.put("source", it.source().toString());
        m.put("index", it.index());
        m.put("id", it.id());
        m.put("status", a == null ? (it.problem().isEmpty() ? "not-measured" : "failed") : (a.ok() ? "ok" : "failed"));
        m.put("error", a != null && !a.ok() ? a.error() : it.problem());
        m.put("z", a == null ? Double.NaN : a.z());
        m.put("z_err", a == null ? Double.NaN : a.zError());
        m.put("class", it.objectClass());
        m.put("grade", it.machineGrade());
        m.put("estimator", a == null ? "" : a.estimator());
        List<Object> alts = new ArrayList<>();
        if (a != null) {
            for (double z : a.alternatives()) {
                alts.add(Json.object().put("z", z));
            }
        }
        m.put("alternatives", alts);
        Decision d = it.decision();
        m.put("verdict", d == null ? "" : d.verdict().key());
        m.put("z_person", d == null ? Double.NaN : d.z());
        m.put("person_grade", d == null ? "" : d.grade().key());
        m.put("line_named", d == null ? "" : d.line());
        m.put("note", d == null ? "" : d.note());
        m.put("decided_by", d == null ? "" : d.who());
        m.put("decided_at", d == null ? "" : d.when().toString());
        m.put("z_adopted", it.currentZ());
        return m;
    }

    /** Writes the queue: CSV for {@code .csv}, JSON lines otherwise. */
    static void write(List<QueueItem> items, Path out) throws IOException {
        boolean csv = out.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv");
        Path parent = out.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        try (BufferedWriter w = Files.newBufferedWriter(out, StandardCharsets.UTF_8)) {
            if (csv) {
                w.write(String.join(",", COLUMNS));
                w.newLine();
            }
            for (QueueItem it : items) {
                Map<String, Object> r = row(it);
                if (csv) {
                    List<String> cells = new ArrayList<>();
                    for (String k : COLUMNS) {
                        cells.add(csvCell(r.get(k)));
                    }
                    w.write(String.join(",", cells));
                } else {
                    Json j = Json.object();
                    r.forEach(j::put);
                    w.write(j.toString());
                }
                w.newLine();
            }
        }
    }

    private static String csvCell(Object v) {
        String s;
        if (v instanceof Double d) {
            s = Double.isFinite(d) ? Double.toString(d) : "";
        } else if (v instanceof List<?> l) {
            StringBuilder b = new StringBuilder();
            for (Object o : l) {
                Object z = o instanceof Json j ? j.fields().get("z") : o;
                b.append(b.length() == 0 ? "" : ";").append(z);
            }
            s = b.toString();
        } else {
            s = String.valueOf(v);
        }
        if (s.contains(",") || s.contains("\"") || s.contains("\n")) {
            s = "\"" + s.replace("\"", "\"\"").replace("\n", " ") + "\"";
        }
        return s;
    }

    private static int parseInt(String s, int dflt) {
        try {
            return s == null || s.isBlank() ? dflt : Integer.parseInt(s.trim());
        } catch (NumberFormatException e) {
            return dflt;
        }
    }

    private static double parseDouble(String s) {
        try {
            return s == null || s.isBlank() || s.equals("null") ? Double.NaN : Double.parseDouble(s.trim());
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }
}
