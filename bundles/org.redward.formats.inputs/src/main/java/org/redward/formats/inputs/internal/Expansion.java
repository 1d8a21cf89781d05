package org.redward.formats.inputs.internal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/**
 * Turns the paths a user gave into the files to read: a folder is walked (sorted, hidden
 * entries skipped); a list file ({@code @FILE}, or a name ending in {@code .list} / {@code .lst})
 * gives one path a line ({@code #} starts a comment; relative paths are resolved against the
 * list's folder); a list may name further lists (up to 8 deep). Stateless.
 */
final class Expansion {

    /** One file to read; {@code fromFolder} files that no reader knows are skipped silently. */
    record Item(Path path, boolean fromFolder, String problem) {
    }

    private Expansion() {
    }

    static List<Item> expand(List<Path> inputs) {
        List<Item> out = new ArrayList<>();
        for (Path p : inputs) {
            add(p, out, 0);
        }
        return out;
    }

    private static void add(Path p, List<Item> out, int depth) {
        String name = p.toString();
        boolean at = name.startsWith("@");
        Path path = at ? Path.of(name.substring(1)) : p;
        String lower = path.getFileName() == null ? "" : path.getFileName().toString().toLowerCase(Locale.ROOT);
        if (Files.isDirectory(path)) {
            try (Stream<Path> s = Files.walk(path)) {
                s.filter(Files::isRegularFile)
                        .filter(f -> !isHidden(path.relativize(f)))
                        .sorted()
                        .forEach(f -> out.add(new Item(f, true, null)));
            } catch (IOException | RuntimeException e) {
                out.add(new Item(path, false, "folder cannot be listed: " + e.getMessage()));
            }
            return;
        }
        if (at || lower.endsWith(".list") || lower.endsWith(".lst")) {
            if (depth > 8) {
                out.add(new Item(path, false, "list files nested more than 8 deep"));
                return;
            }
            if (!Files.isRegularFile(path)) {
                out.add(new Item(path, false, "list file not found"));
                return;
            }
            try {
                Path base = path.toAbsolutePath().getParent();
                int lineNo = 0;
                for (String line : Files.readAllLines(path)) {
                    lineNo++;
                    String t = line.strip();
                    int hash = t.indexOf('#');
                    if (hash >= 0) {
                        t = t.substring(0, hash).strip();
                    }
                    if (t.isEmpty()) {
                        continue;
                    }
                    try {
                        Path q = Path.of(t);
                        add(q.isAbsolute() || base == null ? q : base.resolve(q), out, depth + 1);
                    } catch (java.nio.file.InvalidPathException e) {
                        out.add(new Item(path, false, "line " + lineNo + ": '" + t + "' is not a valid path"));
                    }
                }
            } catch (IOException | RuntimeException e) {
                out.add(new Item(path, false, "list file cannot be read: " + e.getMessage()));
            }
            return;
        }
        out.add(new Item(path, false, Files.exists(path) ? null : "file not found"));
    }

    private static boolean isHidden(Path relative) {
        for (Path part : relative) {
            if (part.toString().startsWith(".")) {
                return true;
            }
        }
        return false;
    }
}
