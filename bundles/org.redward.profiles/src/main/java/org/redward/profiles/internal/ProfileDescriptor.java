package org.redward.profiles.internal;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Properties;
import java.util.TreeMap;

import org.redward.api.formats.InstrumentProfile;

/**
 * An instrument profile read from a descriptor file (Java properties, UTF-8). Keys {@code id}
 * (required: letters, digits, '.', '_', '-'), {@code description}, {@code reader}, and
 * {@code mask.regions} (comma-separated {@code from-to} ranges in vacuum Angstrom) are read here;
 * every key is kept in {@link #settings()} for the reader. Immutable and thread-safe.
 */
public final class ProfileDescriptor implements InstrumentProfile {

    private final String id;
    private final String description;
    private final Map<String, String> settings;
    private final List<double[]> regions;

    private ProfileDescriptor(String id, String description, Map<String, String> settings, List<double[]> regions) {
        this.id = id;
        this.description = description;
        this.settings = settings;
        this.regions = regions;
    }

    /**
     * Parses a descriptor.
     *
     * @param source names the descriptor in error messages (e.g. bundle and path)
     * @throws IllegalArgumentException naming the source and the key at fault
     */
    public static ProfileDescriptor parse(String source, InputStream in) throws IOException {
        Properties p = new Properties();
        try (InputStreamReader r = new InputStreamReader(in, StandardCharsets.UTF_8)) {
            p.load(r);
        }
        Map<String, String> s = new TreeMap<>();
        for (String k : p.stringPropertyNames()) {
            s.put(k.trim(), p.getProperty(k).trim());
        }
        String id = s.get("id");
        if (id == null || !id.matches("[A-Za-z0-9._-]+")) {
            throw new IllegalArgumentException(source + ": key 'id' is missing or not made of letters, digits, '.', '_', '-'");
        }
        List<double[]> regions = new ArrayList<>();
        String m = s.get("mask.regions");
        if (m != null && !m.isBlank()) {
            for (String part : m.split(",")) {
                String t = part.trim();
                int dash = t.indexOf('-', 1);
                try {
                    double a = Double.parseDouble(t.substring(0, dash).trim());
                    double b = Double.parseDouble(t.substring(dash + 1).trim());
                    if (!(a > 0) || !(b > a)) {
                        throw new NumberFormatException();
                    }
                    regions.add(new double[] {a, b});
                } catch (RuntimeException e) {
                    throw new IllegalArgumentException(source + ": key 'mask.regions': '" + t
                            + "' is not a range FROM-TO in vacuum Angstrom with FROM < TO");
                }
            }
        }
        String reader = s.getOrDefault(READER, "").toLowerCase(Locale.ROOT);
        if (!reader.isEmpty()) {
            s.put(READER, reader);
        }
        return new ProfileDescriptor(id, s.getOrDefault("description", ""), Collections.unmodifiableMap(s),
                Collections.unmodifiableList(regions));
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String description() {
        return description;
    }

    @Override
    public Map<String, String> settings() {
        return settings;
    }

    @Override
    public List<double[]> maskedRegionsVacuumAngstrom() {
        List<double[]> out = new ArrayList<>();
        for (double[] r : regions) {
            out.add(r.clone());
        }
        return out;
    }

    @Override
    public String toString() {
        return "InstrumentProfile[" + id + "]";
    }
}
