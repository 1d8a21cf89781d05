package org.redward.cli.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

/**
 * SHA-256 digests of files kept between runs, keyed by the file's absolute path, size and
 * modification time (the rule common practice uses to skip re-reading unchanged files, as
 * build tools and file synchronisers do): a digest is reused only while all three are unchanged,
 * otherwise recomputed. Hashing every bundle jar costs a few hundred milliseconds per start;
 * a lookup costs one {@code stat}.
 *
 * <p>The file is a tab-separated list ({@code sha256, size, mtime-ms, path}); an unreadable or
 * damaged file counts as empty. Saving writes a temporary file and renames it over the old one,
 * so two runs at once never leave a torn file (the last one wins). A folder that cannot be
 * written only means the digests are computed again next time. Thread-safe.
 */
final class DigestCache {

    /** Version tag of the file name: change it when the line format changes. */
    static final String FILE_NAME = "bundle-digests-v1.tsv";

    /** What is remembered of one file (one entry per path: a changed file replaces its entry). */
    private record Stamp(long size, long modifiedMillis, String sha256) {
    }

    private final Path file;
    private final Map<String, Stamp> known = new ConcurrentHashMap<>();
    private volatile boolean changed;

    private DigestCache(Path file) {
        this.file = file;
    }

    /**
     * The cache in {@code folder} (loaded now), or one that keeps nothing if {@code folder} is null.
     */
    static DigestCache open(Path folder) {
        DigestCache c = new DigestCache(folder == null ? null : folder.resolve(FILE_NAME));
        c.load();
        return c;
    }

    /**
     * The cache folder: the property {@code redward.cache.dir} if set, else
     * {@code $XDG_CACHE_HOME/redward}, else {@code ~/.cache/redward}; null if none can be named.
     */
    static Path defaultFolder(String configured) {
        if (configured != null && !configured.isBlank()) {
            return Path.of(configured);
        }
        String xdg = System.getenv("XDG_CACHE_HOME");
        if (xdg != null && !xdg.isBlank()) {
            return Path.of(xdg, "redward");
        }
        String home = System.getProperty("user.home");
        return home == null || home.isBlank() ? null : Path.of(home, ".cache", "redward");
    }

    /**
     * The digest of {@code f}: the remembered one if its path, size and modification time are
     * unchanged, else {@code compute.apply(f)} (remembered unless it is empty).
     */
    String digest(Path f, Function<Path, String> compute) {
        String path = f.toAbsolutePath().normalize().toString();
        BasicFileAttributes a;
        try {
            a = Files.readAttributes(f, BasicFileAttributes.class);
        } catch (IOException e) {
            return compute.apply(f);
        }
        long size = a.size();
        long modified = a.lastModifiedTime().toMillis();
        Stamp s = known.get(path);
        if (s != null && s.size() == size && s.modifiedMillis() == modified) {
            return s.sha256();
        }
        String d = compute.apply(f);
        if (!d.isEmpty()) {
            known.put(path, new Stamp(size, modified, d));
            changed = true;
        }
        return d;
    }

    /** Writes the digests if any was added; silently does nothing if the folder cannot be written. */
    void save() {
        if (file == null || !changed) {
            return;
        }
        Map<String, String> lines = new TreeMap<>();
        for (Map.Entry<String, Stamp> e : known.entrySet()) {
            Stamp s = e.getValue();
            if (Files.exists(Path.of(e.getKey()))) {
                lines.put(e.getKey(), s.sha256() + '\t' + s.size() + '\t' + s.modifiedMillis() + '\t' + e.getKey());
            }
        }
        try {
            Files.createDirectories(file.getParent());
            Path tmp = Files.createTempFile(file.getParent(), FILE_NAME, ".tmp");
            try {
                Files.write(tmp, new ArrayList<>(lines.values()), StandardCharsets.UTF_8);
                try {
                    Files.move(tmp, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
                } catch (AtomicMoveNotSupportedException e) {
                    Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
                }
            } finally {
                Files.deleteIfExists(tmp);
            }
            changed = false;
        } catch (IOException | RuntimeException e) {
            // an unwritable cache folder only costs the digests again next time
        }
    }

    private void load() {
        if (file == null || !Files.isRegularFile(file)) {
            return;
        }
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException | RuntimeException e) {
            return;
        }
        for (String line : lines) {
            String[] p = line.split("\t", 4);
            if (p.length != 4 || p[0].length() != 64) {
                continue;
            }
            try {
                known.put(p[3], new Stamp(Long.parseLong(p[1]), Long.parseLong(p[2]), p[0]));
            } catch (NumberFormatException e) {
                // a damaged line is skipped
            }
        }
    }
}
