package org.redward.mock.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.AccessDeniedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Comparator;
import java.util.List;
import java.util.Properties;
import java.util.function.LongConsumer;
import java.util.stream.Stream;

/**
 * The folders of the demo and the benchmark: a generated survey is kept in
 * {@code survey-seed<S>-n<N>/} and reused; every folder is first written under a hidden
 * {@code .partial-} name and renamed into place only when complete, so an interrupted run leaves
 * nothing that a later run could mistake for a finished one (the next run removes the leftovers
 * and says so). A lock file keeps two runs from writing into the same folder at once.
 */
public final class SurveyStore implements AutoCloseable {

    static final String MANIFEST = "survey.properties";
    static final String PARTIAL = ".partial-";

    private final Path root;
    private final FileChannel lockChannel;
    private final FileLock lock;

    private SurveyStore(Path root, FileChannel ch, FileLock lock) {
        this.root = root;
        this.lockChannel = ch;
        this.lock = lock;
    }

    /**
     * Opens (creating it if needed) the output folder and takes its lock.
     *
     * @throws IOException with a one-line message naming the folder when it cannot be created or
     *     written, or another run holds it
     */
    public static SurveyStore open(Path root) throws IOException {
        try {
            Files.createDirectories(root);
        } catch (FileSystemException e) {
            throw new IOException("cannot create the output folder " + root + " (" + reason(e) + ")");
        }
        if (!Files.isDirectory(root)) {
            throw new IOException("the output folder " + root + " is not a folder");
        }
        if (!Files.isWritable(root)) {
            throw new IOException("the output folder " + root + " is not writable; choose another with --out");
        }
        Path lockFile = root.resolve(".lock");
        FileChannel ch;
        try {
            ch = FileChannel.open(lockFile, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
        } catch (FileSystemException e) {
            throw new IOException("cannot write in the output folder " + root + " (" + reason(e) + "); choose another with --out");
        }
        FileLock l;
        try {
            l = ch.tryLock();
        } catch (OverlappingFileLockException e) {
            l = null;
        }
        if (l == null) {
            ch.close();
            throw new IOException("another run is writing into " + root + "; wait for it to finish or choose another folder with --out");
        }
        return new SurveyStore(root, ch, l);
    }

    private static String reason(FileSystemException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        String r = e.getReason();
        return r == null ? e.getClass().getSimpleName() : r;
    }

    public Path root() {
        return root;
    }

    /** Removes folders left half-written by interrupted runs; returns their names. */
    public List<String> removeLeftovers() throws IOException {
        List<String> removed = new java.util.ArrayList<>();
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(root, PARTIAL + "*")) {
            for (Path p : ds) {
                deleteTree(p);
                removed.add(p.getFileName().toString());
            }
        }
        return removed;
    }

    /** The folder of the survey with this seed and size. */
    public Path surveyFolder(long seed, int size) {
        return root.resolve("survey-seed" + seed + "-n" + size);
    }

    /** True if the survey folder holds a complete survey made by this generator version. */
    public boolean hasSurvey(long seed, int size) {
        Path m = surveyFolder(seed, size).resolve(MANIFEST);
        if (!Files.isRegularFile(m)) {
            return false;
        }
        Properties p = new Properties();
        try (var in = Files.newInputStream(m)) {
            p.load(in);
        } catch (IOException e) {
            return false;
        }
        return "true".equals(p.getProperty("complete")) && String.valueOf(seed).equals(p.getProperty("seed"))
                && String.valueOf(size).equals(p.getProperty("size"))
                && SurveyGenerator.VERSION.equals(p.getProperty("generator_version"));
    }

    /**
     * Generates the survey into a partial folder and renames it into place, replacing an
     * incomplete or outdated one.
     *
     * @return the survey folder
     */
    public Path generate(long seed, int size, LongConsumer progress, PrintStream messages) throws IOException {
        Path target = surveyFolder(seed, size);
        Path tmp = root.resolve(PARTIAL + target.getFileName());
        deleteTree(tmp);
        Files.createDirectories(tmp);
        new SurveyGenerator(seed, size).write(tmp, progress);
        Properties p = new Properties();
        p.setProperty("complete", "true");
        p.setProperty("seed", Long.toString(seed));
        p.setProperty("size", Integer.toString(size));
        p.setProperty("generator_version", SurveyGenerator.VERSION);
        p.setProperty("files", Integer.toString(new SurveyGenerator(seed, size).files()));
        try (var out = Files.newOutputStream(tmp.resolve(MANIFEST))) {
            p.store(out, "Mock survey of the invented Ember field: complete");
        }
        if (Files.exists(target)) {
            messages.println("replacing the incomplete or outdated survey folder " + target);
            deleteTree(target);
        }
        Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE);
        return target;
    }

    /** A new partial folder for results named {@code name}; {@link #publish} renames it into place. */
    public Path partial(String name) throws IOException {
        Path tmp = root.resolve(PARTIAL + name);
        deleteTree(tmp);
        Files.createDirectories(tmp);
        return tmp;
    }

    /** Renames a partial folder to its final name, replacing the previous run's folder. */
    public Path publish(Path partial, String name) throws IOException {
        Path target = root.resolve(name);
        if (Files.exists(target)) {
            Path old = root.resolve(PARTIAL + "old-" + name);
            deleteTree(old);
            Files.move(target, old, StandardCopyOption.ATOMIC_MOVE);
            Files.move(partial, target, StandardCopyOption.ATOMIC_MOVE);
            deleteTree(old);
        } else {
            Files.move(partial, target, StandardCopyOption.ATOMIC_MOVE);
        }
        return target;
    }

    static void deleteTree(Path p) throws IOException {
        if (!Files.exists(p)) {
            return;
        }
        try (Stream<Path> s = Files.walk(p)) {
            for (Path x : (Iterable<Path>) s.sorted(Comparator.reverseOrder())::iterator) {
                Files.delete(x);
            }
        }
    }

    @Override
    public void close() throws IOException {
        try {
            lock.release();
        } finally {
            lockChannel.close();
        }
    }
}
