package org.redward.api.commands;

import java.util.Collection;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/**
 * A small JSON object builder for the {@code --json} output of commands: keys keep their
 * insertion order, non-finite numbers become {@code null} (JSON has no NaN), nested maps,
 * collections, arrays of double and {@code Json} objects are written as JSON. Not thread-safe.
 *
 * <pre>out.println(Json.object().put("z", 0.1234).put("class", "galaxy"));</pre>
 */
public final class Json {

    private final Map<String, Object> fields = new LinkedHashMap<>();

    private Json() {
    }

    public static Json object() {
        return new Json();
    }

    /** Adds a field; value may be null, a String, Number, Boolean, Json, Map, Collection or double[]. */
    public Json put(String key, Object value) {
        fields.put(key, value);
        return this;
    }

    /** The fields added so far (live view, insertion order). */
    public Map<String, Object> fields() {
        return fields;
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        write(sb, fields);
        return sb.toString();
    }

    /** Writes any supported value as JSON text. */
    public static String toJson(Object value) {
        StringBuilder sb = new StringBuilder();
        write(sb, value);
        return sb.toString();
    }

    private static void write(StringBuilder sb, Object v) {
        if (v == null) {
            sb.append("null");
        } else if (v instanceof Json j) {
            write(sb, j.fields);
        } else if (v instanceof String s) {
            quote(sb, s);
        } else if (v instanceof Double || v instanceof Float) {
            double d = ((Number) v).doubleValue();
            if (!Double.isFinite(d)) {
                sb.append("null");
            } else if (d == Math.rint(d) && Math.abs(d) < 1e15) {
                // a whole number keeps one decimal (3.0, -0.0) so that it reads back as a double;
                // written directly: this runs for every number of every journalled row
                sb.append(d == 0 && 1 / d < 0 ? "-0" : Long.toString((long) d)).append(".0");
            } else {
                sb.append(Double.toString(d));
            }
        } else if (v instanceof Number || v instanceof Boolean) {
            sb.append(v);
        } else if (v instanceof double[] a) {
            sb.append('[');
            for (int i = 0; i < a.length; i++) {
                if (i > 0) {
                    sb.append(',');
                }
                write(sb, a[i]);
            }
            sb.append(']');
        } else if (v instanceof Map<?, ?> m) {
            sb.append('{');
            Iterator<? extends Map.Entry<?, ?>> it = m.entrySet().iterator();
            while (it.hasNext()) {
                Map.Entry<?, ?> e = it.next();
                quote(sb, String.valueOf(e.getKey()));
                sb.append(':');
                write(sb, e.getValue());
                if (it.hasNext()) {
                    sb.append(',');
                }
            }
            sb.append('}');
        } else if (v instanceof Collection<?> c) {
            sb.append('[');
            Iterator<?> it = c.iterator();
            while (it.hasNext()) {
                write(sb, it.next());
                if (it.hasNext()) {
                    sb.append(',');
                }
            }
            sb.append(']');
        } else if (v instanceof Enum<?> e) {
            quote(sb, e.name().toLowerCase(Locale.ROOT));
        } else {
            quote(sb, v.toString());
        }
    }

    private static void quote(StringBuilder sb, String s) {
        sb.append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"': sb.append("\\\""); break;
                case '\\': sb.append("\\\\"); break;
                case '\n': sb.append("\\n"); break;
                case '\r': sb.append("\\r"); break;
                case '\t': sb.append("\\t"); break;
                default:
                    if (c < 0x20) {
                        sb.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
                    } else {
                        sb.append(c);
                    }
            }
        }
        sb.append('"');
    }
}
