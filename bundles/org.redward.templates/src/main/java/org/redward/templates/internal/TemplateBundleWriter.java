package org.redward.templates.internal;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.jar.Attributes;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;
import java.util.regex.Pattern;

import org.redward.api.templates.TemplateSet;

/**
 * Writes a data-only template bundle: a jar holding a manifest with the OSGi bundle headers and
 * the {@value TemplateSet#BUNDLE_HEADER} header, the descriptor and the template files under
 * {@code templates/}. The jar is reproducible (fixed entry times, fixed order). Before it is
 * moved into place it is loaded back with {@link TemplateSetLoader}, so a set that the extender
 * would refuse is never written.
 *
 * <p>Not thread-safe (one jar per instance); cheap to create.
 */
public final class TemplateBundleWriter {

    /** The folder inside the bundle that holds the descriptor and the files. */
    public static final String FOLDER = "templates/";
    private static final Pattern VERSION = Pattern.compile("\\d+(\\.\\d+(\\.\\d+(\\.[A-Za-z0-9_-]+)?)?)?");
    private static final long ENTRY_TIME = 946_684_800_000L; // 2000-01-01, fixed for reproducible jars

    private final String id;
    private final String version;
    private final String description;
    private final Map<String, byte[]> files = new LinkedHashMap<>();
    private final Map<String, Map<String, String>> templates = new LinkedHashMap<>();
    private String handWritten;

    public TemplateBundleWriter(String id, String version, String description) {
        this.id = id;
        this.version = version;
        this.description = description;
        if (!VERSION.matcher(version).matches()) {
            throw new IllegalArgumentException("version '" + version + "' is not an OSGi version (e.g. 1.0.0)");
        }
    }

    /** A name made of the file's stem: lower-case letters, digits, '.', '_', '-', unique in this bundle. */
    public String nameFor(String fileName) {
        String stem = fileName.replaceFirst("\\.(fits|fit|fts|txt|dat|csv|tsv|asc)(\\.gz)?$", "");
        String base = stem.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9._-]+", "-").replaceAll("^[-.]+|[-.]+$", "");
        if (base.isEmpty()) {
            base = "template";
        }
        String name = base;
        for (int k = 2; templates.containsKey(name); k++) {
            name = base + "-" + k;
        }
        return name;
    }

    /**
     * Adds one template: its data file (stored under {@code templates/}) and its descriptor keys
     * ({@code class}, {@code medium}...; {@code file} is filled in here).
     */
    public void add(String name, String fileName, byte[] data, Map<String, String> keys) {
        String stored = fileName;
        for (int k = 2; files.containsKey(stored); k++) {
            stored = k + "-" + fileName;
        }
        files.put(stored, data);
        Map<String, String> t = new LinkedHashMap<>();
        t.put(Descriptor.FILE, stored);
        t.putAll(keys);
        templates.put(name, t);
    }

    /**
     * Uses a hand-written descriptor instead of one made from {@link #add} calls; its files are
     * stored under {@code templates/} at the relative paths it names.
     */
    public void useDescriptor(String text, Map<String, byte[]> filesByRelativePath) {
        handWritten = text;
        files.clear();
        files.putAll(filesByRelativePath);
    }

    /** The bundle symbolic name used for a set id. */
    public static String symbolicName(String id) {
        return "redward.templates." + id.replaceAll("[^A-Za-z0-9._-]", "_");
    }

    /** The descriptor text. */
    String descriptor() {
        Map<String, String> head = new LinkedHashMap<>();
        head.put(Descriptor.ID, id);
        head.put(Descriptor.VERSION, version);
        head.put(Descriptor.DESCRIPTION, description);
        return Descriptor.write(head, templates);
    }

    /**
     * Checks the set by loading it as the extender would, then writes the jar (atomically).
     *
     * @throws TemplateDataException if the extender would refuse the set (names the file)
     */
    public TemplateSetLoader.Loaded write(Path out) throws TemplateDataException, IOException {
        String descriptorPath = FOLDER + id + ".properties";
        byte[] descriptor = (handWritten != null ? handWritten : descriptor()).getBytes(StandardCharsets.UTF_8);
        TemplateSetLoader.Loaded loaded = TemplateSetLoader.load("set " + id, descriptorPath,
                p -> p.equals(descriptorPath) ? descriptor : p.startsWith(FOLDER) ? files.get(p.substring(FOLDER.length())) : null);
        Manifest mf = new Manifest();
        Attributes a = mf.getMainAttributes();
        a.put(Attributes.Name.MANIFEST_VERSION, "1.0");
        a.putValue("Bundle-ManifestVersion", "2");
        a.putValue("Bundle-SymbolicName", symbolicName(id));
        a.putValue("Bundle-Version", version);
        a.putValue("Bundle-Name", "Redward template set " + id);
        a.putValue("Bundle-Description", oneLine(description));
        a.putValue("Redward-Template-Checksum", loaded.set().checksum());
        a.putValue(TemplateSet.BUNDLE_HEADER, descriptorPath);
        // a data bundle is useless without the extender: say so, so that the framework can tell
        a.putValue("Require-Capability", "osgi.extender;filter:=\"(&(osgi.extender=redward.templates)(version>=1.0)(!(version>=2.0)))\"");
        Path parent = out.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        Path tmp = Files.createTempFile(parent, ".pack-", ".jar");
        try {
            try (OutputStream os = Files.newOutputStream(tmp)) {
                os.write(jarBytes(mf, descriptorPath, descriptor));
            }
            Files.move(tmp, out, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
        return loaded;
    }

    private byte[] jarBytes(Manifest mf, String descriptorPath, byte[] descriptor) throws IOException {
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try (JarOutputStream jar = new JarOutputStream(bos)) {
            JarEntry me = new JarEntry(JarFile.MANIFEST_NAME);
            me.setTime(ENTRY_TIME);
            jar.putNextEntry(me);
            mf.write(jar);
            jar.closeEntry();
            JarEntry folder = new JarEntry(FOLDER);
            folder.setTime(ENTRY_TIME);
            jar.putNextEntry(folder);
            jar.closeEntry();
            put(jar, descriptorPath, descriptor);
            for (Map.Entry<String, byte[]> e : files.entrySet()) {
                put(jar, FOLDER + e.getKey(), e.getValue());
            }
        }
        return bos.toByteArray();
    }

    private static void put(JarOutputStream jar, String name, byte[] data) throws IOException {
        JarEntry e = new JarEntry(name);
        e.setTime(ENTRY_TIME);
        jar.putNextEntry(e);
        jar.write(data);
        jar.closeEntry();
    }

    private static String oneLine(String s) {
        return s.replaceAll("\\s+", " ").trim();
    }
}
