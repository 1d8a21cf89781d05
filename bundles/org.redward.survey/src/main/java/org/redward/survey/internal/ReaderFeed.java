package org.redward.survey.internal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Stream;
import java.util.zip.GZIPInputStream;

import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.SpectrumReadException;
import org.redward.api.formats.SpectrumReader;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;
import org.redward.api.registry.Provided;
import org.redward.api.registry.ProviderRegistry;

/**
 * Streams the spectra of a list of files through the readers of the registry: for each file the
 * reader that sniffs it highest opens it; a file no reader accepts, or that fails to open, gives
 * one failed record (index -1) naming the file, and the feed goes on. Reading a file resumes at
 * a given file number, skipping the spectra an interrupted run already did.
 *
 * <p>Also expands inputs: a folder is walked (sorted; hidden files skipped), a file ending in
 * {@code .list} or {@code .lst} or given as {@code @FILE} holds one path a line ({@code #}
 * comments; relative paths against the list's folder).
 */
final class ReaderFeed implements Feed {

    private final ProviderRegistry<SpectrumReader> readers;
    private final Optional<InstrumentProfile> profile;
    private final List<Path> files;
    private int nextFile;
    private final int skipFile;
    private final int skipThroughIndex;
    private SpectrumSource open;
    private int openNumber = -1;

    /**
     * @param startFile first file number to read
     * @param skipThroughIndex in {@code startFile}, skip spectra with index up to this one (-1: none)
     */
    ReaderFeed(ProviderRegistry<SpectrumReader> readers, Optional<InstrumentProfile> profile, List<Path> files,
            int startFile, int skipThroughIndex) {
        this.readers = readers;
        this.profile = profile;
        this.files = files;
        this.nextFile = startFile;
        this.skipFile = startFile;
        this.skipThroughIndex = skipThroughIndex;
    }

    static List<Path> expand(List<Path> inputs) throws IOException {
        List<Path> out = new ArrayList<>();
        for (Path p : inputs) {
            String name = p.toString();
            if (name.startsWith("@")) {
                readList(Path.of(name.substring(1)), out);
            } else if (Files.isDirectory(p)) {
                try (Stream<Path> s = Files.walk(p)) {
                    s.filter(Files::isRegularFile).filter(f -> !f.getFileName().toString().startsWith("."))
                            .sorted().forEach(out::add);
                }
            } else if (isList(p)) {
                readList(p, out);
            } else {
                out.add(p);
            }
        }
        return out;
    }

    private static boolean isList(Path p) {
        String n = p.getFileName() == null ? "" : p.getFileName().toString().toLowerCase(Locale.ROOT);
        return n.endsWith(".list") || n.endsWith(".lst");
    }

    private static void readList(Path list, List<Path> out) throws IOException {
        if (!Files.isRegularFile(list)) {
            throw new IOException(list + ": list file not found");
        }
        Path base = list.toAbsolutePath().getParent();
        for (String line : Files.readAllLines(list)) {
            String t = line.strip();
            if (t.isEmpty() || t.startsWith("#")) {
                continue;
            }
            Path p = Path.of(t);
            out.addAll(expand(List.of(p.isAbsolute() ? p : base.resolve(p))));
        }
    }

    @Override
    public Item next() throws IOException {
        while (true) {
            if (open != null) {
                if (open.hasNext()) {
                    SpectrumRecord r = open.next();
                    if (openNumber == skipFile && r.index() >= 0 && r.index() <= skipThroughIndex) {
                        continue;
                    }
                    return new Item(openNumber, r);
                }
                closeOpen();
            }
            if (nextFile >= files.size()) {
                return null;
            }
            int number = nextFile++;
            Path f = files.get(number);
            try {
                open = openFile(f);
                openNumber = number;
            } catch (SpectrumReadException e) {
                return new Item(number, SpectrumRecord.failed(f, -1, "", e.getMessage()));
            } catch (RuntimeException e) {
                return new Item(number, SpectrumRecord.failed(f, -1, "", f + ": the reader failed: " + e));
            }
        }
    }

    private SpectrumSource openFile(Path f) throws SpectrumReadException {
        if (!Files.isRegularFile(f)) {
            throw new SpectrumReadException(f, "no such file");
        }
        byte[] head;
        try (InputStream in = Files.newInputStream(f)) {
            head = in.readNBytes(8640);
            if (head.length > 2 && (head[0] & 0xff) == 0x1f && (head[1] & 0xff) == 0x8b) {
                try (InputStream gz = new GZIPInputStream(Files.newInputStream(f))) {
                    head = gz.readNBytes(8640);
                }
            }
        } catch (IOException e) {
            throw new SpectrumReadException(f, "cannot be read: " + e.getMessage(), e);
        }
        Provided<SpectrumReader> best = null;
        int bestScore = 0;
        for (Provided<SpectrumReader> p : readers.providers()) {
            int s;
            try {
                s = p.service().sniff(f, head);
            } catch (RuntimeException e) {
                s = 0;
            }
            if (s > bestScore) {
                bestScore = s;
                best = p;
            }
        }
        if (best == null) {
            throw new SpectrumReadException(f, "no reader recognises this file (readers: "
                    + (readers.ids().isEmpty() ? "none" : String.join(", ", readers.ids())) + ")");
        }
        return best.service().open(f, profile);
    }

    private void closeOpen() {
        try {
            open.close();
        } catch (IOException | RuntimeException e) {
            // nothing left to read from it
        }
        open = null;
    }

    @Override
    public void close() {
        if (open != null) {
            closeOpen();
        }
    }
}
