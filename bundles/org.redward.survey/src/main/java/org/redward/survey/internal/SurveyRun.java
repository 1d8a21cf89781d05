package org.redward.survey.internal;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.LongConsumer;

import org.redward.api.catalog.Catalog;
import org.redward.api.catalog.CatalogTable;
import org.redward.api.catalog.CatalogWriter;
import org.redward.api.catalog.Column;
import org.redward.api.survey.MeasureListener;
import org.redward.api.survey.MeasureRequest;
import org.redward.api.survey.MeasureSummary;
import org.redward.api.survey.MeasuredRow;

/**
 * One measuring run from inputs to catalogue, free of OSGi (the service supplies the estimator,
 * the readers and the writer): expands the inputs, opens or recovers the journal, runs the
 * {@link Pipeline}, then writes the catalogue from the journal under a temporary name and moves
 * it into place atomically, and deletes the journal.
 */
final class SurveyRun {

    private final MeasureRequest request;
    private final Estimation estimation;
    private final Feed.Source feeds;
    private final Optional<CatalogWriter> writer;
    private final List<Column> derivedColumns;
    private final Map<String, String> provenance;
    private LongConsumer progress = n -> { };
    private LineStep lineStep;
    private boolean linesInMainFile = true;

    SurveyRun(MeasureRequest request, Estimation estimation, Feed.Source feeds, Optional<CatalogWriter> writer,
            List<Column> derivedColumns, Map<String, String> provenance) {
        this.request = request;
        this.estimation = estimation;
        this.feeds = feeds;
        this.writer = writer;
        this.derivedColumns = derivedColumns;
        this.provenance = provenance;
        if (request.output().isPresent() && writer.isEmpty()) {
            throw new IllegalArgumentException("no catalogue writer for " + request.output().get());
        }
    }

    /** Called with 1 for every row collected (on the collecting thread). */
    SurveyRun progress(LongConsumer p) {
        this.progress = p;
        return this;
    }

    /**
     * Measures lines too (the request must ask for them: {@link MeasureRequest#lines()}).
     *
     * @param step the line step
     * @param writerHoldsManyTables whether the catalogue writer stores the lines table in the same
     *     file (FITS, VOTable); otherwise it goes to a sibling file ({@link #linesFile})
     */
    SurveyRun lines(LineStep step, boolean writerHoldsManyTables) {
        if (!request.lines()) {
            throw new IllegalArgumentException("a line step for a request without lines");
        }
        this.lineStep = step;
        this.linesInMainFile = writerHoldsManyTables;
        return this;
    }

    /** The sibling file that holds the lines table when the format keeps one table per file: {@code cat.lines.csv}. */
    static Path linesFile(Path catalog) {
        String name = catalog.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return catalog.resolveSibling(dot > 0 ? name.substring(0, dot) + ".lines" + name.substring(dot) : name + ".lines");
    }

    MeasureSummary run(MeasureListener listener) throws IOException, InterruptedException {
        if (request.lines() && lineStep == null) {
            throw new IllegalArgumentException("--lines: no line step was given");
        }
        boolean sliced = request.sliceFirst() > 0 || request.sliceCount() >= 0;
        if (sliced && request.resume()) {
            throw new IllegalArgumentException("--resume: a run of a slice of the inputs cannot be resumed; run the slice again");
        }
        List<Path> files = feeds.expand(request.inputs());
        String fingerprint = fingerprint(files);
        Optional<Path> out = request.output().map(Path::toAbsolutePath);
        Journal journal = null;
        Journal.State state = new Journal.State(0, fingerprint);
        if (out.isPresent()) {
            Path jf = Journal.beside(out.get());
            if (Files.exists(jf)) {
                if (!request.resume()) {
                    throw new IllegalArgumentException("an unfinished run left the journal " + jf
                            + ": add --resume to finish it, or delete it to start afresh");
                }
                state = Journal.recover(jf);
                if (!state.fingerprint().equals(fingerprint)) {
                    throw new IllegalArgumentException("the journal " + jf + " belongs to a run with other inputs or options"
                            + " (estimator, templates, profile, frame, cosmology, redshift range, --lines): repeat them exactly, or delete the journal");
                }
                journal = Journal.append(jf);
            } else {
                Files.createDirectories(jf.toAbsolutePath().getParent());
                journal = Journal.create(jf, fingerprint);
            }
        } else if (request.resume()) {
            throw new IllegalArgumentException("--resume needs --out: the journal lives beside the catalogue");
        }
        listener.started(state.rows());
        int threads = request.threads() > 0 ? request.threads() : Runtime.getRuntime().availableProcessors();
        Pipeline pipeline = new Pipeline(threads, request.timeLimit(), estimation, request.zMin(), request.zMax(), lineStep);
        long[] counts = new long[4];
        long t0 = System.nanoTime();
        final Journal j = journal;
        try (Feed feed = sliced ? limit(feeds.open(request.inputs()),
                request.sliceCount() < 0 ? -1 : request.sliceFirst() + request.sliceCount())
                : feeds.open(request.inputs())) {
            pipeline.run(feed, state.rows() + request.sliceFirst(), row -> {
                if (j != null) {
                    try {
                        j.write(row);
                    } catch (IOException e) {
                        throw new UncheckedIOException(e);
                    }
                }
                counts[row.ok() ? 0 : 1]++;
                if (!row.lines().isEmpty()) {
                    counts[2] += row.lines().size();
                    counts[3]++;
                }
                listener.row(row);
                progress.accept(1);
            });
        } catch (UncheckedIOException e) {
            throw e.getCause();
        } finally {
            if (journal != null) {
                journal.close();
            }
        }
        double seconds = (System.nanoTime() - t0) * 1e-9;
        long newRows = counts[0] + counts[1];
        long ok = counts[0];
        long failed = counts[1];
        long lines = counts[2];
        long withLines = counts[3];
        if (out.isPresent()) {
            JournalCounts all = countJournal(journal.file(), request.lines());
            ok = all.ok();
            failed = all.failed();
            lines = all.lines();
            withLines = all.spectraWithLines();
            writeCatalog(out.get(), journal.file(), files, all, pipeline.misbehaving());
            Files.delete(journal.file());
        }
        return new MeasureSummary(state.rows() + newRows, ok, failed, state.rows(), seconds, out, pipeline.misbehaving(),
                lines, withLines);
    }

    /** The feed cut after {@code end} records ({@code end} below 0: not cut); reading stops there. */
    static Feed limit(Feed feed, long end) {
        if (end < 0) {
            return feed;
        }
        return new Feed() {
            private long given;

            @Override
            public org.redward.api.formats.SpectrumRecord next() throws IOException {
                if (given >= end) {
                    return null;
                }
                given++;
                return feed.next();
            }

            @Override
            public void close() {
                feed.close();
            }
        };
    }

    /** What a finished journal holds: rows ok and failed, lines, rows with lines, and the lines' flux units. */
    record JournalCounts(long ok, long failed, long lines, long spectraWithLines, java.util.Set<String> fluxUnits) {
        long rows() {
            return ok + failed;
        }
    }

    private static JournalCounts countJournal(Path jf, boolean lines) {
        long[] c = new long[4];
        java.util.Set<String> units = new java.util.TreeSet<>();
        for (MeasuredRow r : Journal.rows(jf)) {
            c[r.ok() ? 0 : 1]++;
            if (lines && !r.lines().isEmpty()) {
                c[2] += r.lines().size();
                c[3]++;
                r.lines().forEach(l -> units.add(l.fluxUnit()));
            }
        }
        return new JournalCounts(c[0], c[1], c[2], c[3], units);
    }

    private void writeCatalog(Path out, Path journalFile, List<Path> files, JournalCounts counts, Map<String, String> misbehaving)
            throws IOException {
        CatalogLayout layout = new CatalogLayout(derivedColumns);
        Map<String, String> prov = new LinkedHashMap<>(provenance);
        prov.put("run.fingerprint", fingerprint(files));
        prov.put("run.rows", Long.toString(counts.rows()));
        if (lineStep != null) {
            prov.putAll(lineStep.provenance());
            prov.put("run.lines", Long.toString(counts.lines()));
        }
        misbehaving.forEach((b, what) -> prov.put("misbehaved." + b, what));
        inputChecksums(files, prov);
        CatalogTable table = new CatalogTable("redshifts", "one row per spectrum: redshift, class, grade, velocities, distances",
                layout.columns(), counts.rows(), layout.cells(Journal.rows(journalFile)));
        if (lineStep == null) {
            writeAtomically(Catalog.of("Redward redshift catalogue", prov, List.of(table)), out);
            return;
        }
        LineLayout lines = new LineLayout(counts.fluxUnits());
        CatalogTable lineTable = new CatalogTable(LineLayout.TABLE, LineLayout.DESCRIPTION, lines.columns(), counts.lines(),
                lines.cells(Journal.rows(journalFile)));
        if (linesInMainFile) {
            writeAtomically(Catalog.of("Redward redshift catalogue", prov, List.of(table, lineTable)), out);
            return;
        }
        // one table per file: the lines table goes first to its sibling file, then the main file (so a main file
        // in place means both are complete)
        Path sibling = linesFile(out);
        Map<String, String> lineProv = new LinkedHashMap<>(prov);
        lineProv.put("lines.of", out.getFileName().toString());
        prov.put("lines.file", sibling.getFileName().toString());
        writeAtomically(Catalog.of("Redward measured lines", lineProv, List.of(lineTable)), sibling);
        writeAtomically(Catalog.of("Redward redshift catalogue", prov, List.of(table)), out);
    }

    /** Writes under a temporary name beside {@code out} and moves it into place (atomically where the file system can). */
    private void writeAtomically(Catalog catalog, Path out) throws IOException {
        Path tmp = out.resolveSibling("." + out.getFileName() + ".part");
        try {
            writer.orElseThrow().write(catalog, tmp);
            try {
                Files.move(tmp, out, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, out, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (UncheckedIOException e) {
            throw e.getCause();
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** SHA-256 of each input file (listed when there are at most 100) and over all of them. */
    static void inputChecksums(List<Path> files, Map<String, String> prov) throws IOException {
        MessageDigest all = sha256();
        prov.put("inputs.count", Integer.toString(files.size()));
        int n = 0;
        for (Path f : files) {
            String sum = Files.isRegularFile(f) ? sha256(f) : "missing";
            all.update((sum + "  " + f + "\n").getBytes(StandardCharsets.UTF_8));
            if (files.size() <= 100) {
                prov.put("input." + n, sum + "  " + f);
            }
            n++;
        }
        prov.put("inputs.sha256", HexFormat.of().formatHex(all.digest()));
    }

    static String sha256(Path f) throws IOException {
        MessageDigest md = sha256();
        try (InputStream in = Files.newInputStream(f)) {
            byte[] buf = new byte[1 << 16];
            int n;
            while ((n = in.read(buf)) > 0) {
                md.update(buf, 0, n);
            }
        }
        return HexFormat.of().formatHex(md.digest());
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    /** Names what the run does, so that a resume with other inputs or options is refused. */
    private String fingerprint(List<Path> files) {
        MessageDigest md = sha256();
        StringBuilder sb = new StringBuilder();
        for (Path f : files) {
            sb.append(f.toAbsolutePath()).append('\n');
        }
        sb.append("estimator=").append(estimation.id()).append('\n')
                .append("templates=").append(request.templatesId().orElse("")).append('\n')
                .append("profile=").append(request.profileId().orElse("")).append('\n')
                .append("frame=").append(request.frame().orElse("")).append('\n')
                .append("cosmology=").append(request.cosmologyId().orElse("")).append('\n')
                .append("z=").append(request.zMin()).append(',').append(request.zMax()).append('\n');
        if (request.lines()) {
            sb.append("lines=on\n");
        }
        for (Column c : derivedColumns) {
            sb.append("column=").append(c.name()).append('\n');
        }
        return HexFormat.of().formatHex(md.digest(sb.toString().getBytes(StandardCharsets.UTF_8)));
    }
}
