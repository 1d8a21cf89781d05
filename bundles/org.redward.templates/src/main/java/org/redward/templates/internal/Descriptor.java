package org.redward.templates.internal;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Properties;

/**
 * The descriptor of a data-only template set: a Java properties file inside the bundle, named by
 * the {@code Redward-Template-Set} manifest header. Keys:
 *
 * <pre>
 * id          = my-group-templates        (required; letters, digits, '.', '_', '-')
 * version     = 1.2.0                     (default 1.0.0)
 * description = where the templates come from
 * templates   = elliptical, sb, a0v       (required: the template names, in order)
 *
 * # per template, template.NAME.KEY; a KEY without the prefix is the default for every template
 * template.elliptical.file     = elliptical.fits  (required; path relative to the descriptor's folder)
 * template.elliptical.class    = galaxy           (required: galaxy, quasar or star)
 * template.elliptical.subclass = elliptical       (default: the template name)
 * medium      = air                  (required: air or vacuum; air is converted to vacuum, Morton 2000)
 * unit        = angstrom             (angstrom, nm, um, log10-angstrom; default: the file's own unit, else angstrom)
 * trust       = 1250-9900            (optional: rest vacuum Angstrom range to keep)
 * bad-pixels  = reject               (reject or interpolate interior NaN pixels, and zeros when zero-is-bad)
 * zero-is-bad = false
 * wavelength-column, flux-column     (FITS column names or 1-based text columns; default: found by name)
 * </pre>
 *
 * Immutable once parsed; thread-safe.
 */
final class Descriptor {

    static final String ID = "id";
    static final String VERSION = "version";
    static final String DESCRIPTION = "description";
    static final String TEMPLATES = "templates";
    static final String FILE = "file";
    static final String CLASS = "class";
    static final String SUBCLASS = "subclass";
    static final String MEDIUM = "medium";
    static final String UNIT = "unit";
    static final String TRUST = "trust";
    static final String BAD_PIXELS = "bad-pixels";
    static final String ZERO_IS_BAD = "zero-is-bad";
    static final String WAVELENGTH_COLUMN = "wavelength-column";
    static final String FLUX_COLUMN = "flux-column";

    private final String path;
    private final Properties properties;

    private Descriptor(String path, Properties properties) {
        this.path = path;
        this.properties = properties;
    }

    static Descriptor parse(String path, byte[] data) throws TemplateDataException {
        Properties p = new Properties();
        try {
            p.load(new StringReader(new String(data, StandardCharsets.UTF_8)));
        } catch (IOException | IllegalArgumentException e) {
            throw new TemplateDataException("descriptor " + path + ": not a properties file (" + e.getMessage() + ")");
        }
        return new Descriptor(path, p);
    }

    String path() {
        return path;
    }

    /** The folder of the descriptor inside the bundle ("" or ending in '/'). */
    String folder() {
        int i = path.lastIndexOf('/');
        return i < 0 ? "" : path.substring(0, i + 1);
    }

    String required(String key) throws TemplateDataException {
        String v = properties.getProperty(key);
        if (v == null || v.isBlank()) {
            throw new TemplateDataException("descriptor " + path + ": the key '" + key + "' is missing");
        }
        return v.trim();
    }

    String optional(String key, String dflt) {
        String v = properties.getProperty(key);
        return v == null || v.isBlank() ? dflt : v.trim();
    }

    /** The template's own value, else the set-wide default, else {@code dflt}. */
    String of(String template, String key, String dflt) {
        String v = properties.getProperty("template." + template + "." + key);
        if (v == null || v.isBlank()) {
            v = properties.getProperty(key);
        }
        return v == null || v.isBlank() ? dflt : v.trim();
    }

    String requiredOf(String template, String key) throws TemplateDataException {
        String v = of(template, key, null);
        if (v == null) {
            throw new TemplateDataException("descriptor " + path + ": template '" + template + "' has no '" + key
                    + "' (set template." + template + "." + key + " or a set-wide " + key + ")");
        }
        return v;
    }

    List<String> templateNames() throws TemplateDataException {
        List<String> out = new ArrayList<>();
        for (String s : required(TEMPLATES).split(",")) {
            if (!s.isBlank()) {
                out.add(s.trim());
            }
        }
        return out;
    }

    /** Writes a descriptor: set-wide keys first, then one block per template, in order. */
    static String write(Map<String, String> setKeys, Map<String, Map<String, String>> templates) {
        StringBuilder sb = new StringBuilder();
        sb.append("# Redward template-set descriptor (see the contributor guide)\n");
        Map<String, String> head = new LinkedHashMap<>(setKeys);
        head.put(TEMPLATES, String.join(", ", templates.keySet()));
        for (Map.Entry<String, String> e : head.entrySet()) {
            sb.append(escape(e.getKey())).append(" = ").append(escape(e.getValue())).append('\n');
        }
        for (Map.Entry<String, Map<String, String>> t : templates.entrySet()) {
            sb.append('\n');
            for (Map.Entry<String, String> e : t.getValue().entrySet()) {
                sb.append(escape("template." + t.getKey() + "." + e.getKey())).append(" = ").append(escape(e.getValue())).append('\n');
            }
        }
        return sb.toString();
    }

    private static String escape(String s) {
        Properties one = new Properties();
        one.setProperty("k", s);
        StringWriter w = new StringWriter();
        try {
            one.store(w, null);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        for (String line : w.toString().split("\n")) {
            if (line.startsWith("k=")) {
                return line.substring(2).replace("\r", "");
            }
        }
        return s;
    }

    static String lower(String s) {
        return s.toLowerCase(Locale.ROOT);
    }
}
