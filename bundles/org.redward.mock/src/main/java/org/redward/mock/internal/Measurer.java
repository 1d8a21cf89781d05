package org.redward.mock.internal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.Semaphore;
import java.util.function.BiFunction;

import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Progress;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.formats.SpectrumReader;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.registry.Provided;
import org.redward.api.templates.TemplateRegistry;
import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.Spectrum;

/**
 * Reads files through the installed readers and measures every spectrum with one or more
 * estimators on a pool of threads, streaming (at most a few spectra per thread in memory).
 * Used by the demo and the accuracy benchmark. Not thread-safe; one use at a time.
 */
final class Measurer {

    /** What came out: per estimator id, one row per spectrum read, in file order. */
    record Result(Map<String, List<Row>> rows, int spectra, int readFailures, double seconds, String unavailable,
            List<String> notes) {
    }

    private final CommandContext ctx;
    private final Services services;
    private final TemplateRegistry templates;

    Measurer(CommandContext ctx, Services services) {
        this.ctx = ctx;
        this.services = services;
        this.templates = services.templates();
    }

    Result measure(List<Path> files, BiFunction<String, Integer, TruthRow> truth, List<Provided<RedshiftEstimator>> estimators,
            int threads, long expected, String label) throws IOException {
        long t0 = System.nanoTime();
        List<String> notes = new ArrayList<>();
        Map<String, EstimationContext> contexts = new LinkedHashMap<>();
        List<Provided<RedshiftEstimator>> usable = new ArrayList<>();
        for (Provided<RedshiftEstimator> e : estimators) {
            EstimationContext ec = EstimationContext.defaults();
            if (Boolean.TRUE.equals(e.properties().get(RedshiftEstimator.USES_TEMPLATES))) {
                Optional<Provided<TemplateSet>> ts = templates.providers().stream().findFirst();
                if (ts.isEmpty()) {
                    notes.add("estimator " + e.id() + " needs a template set and none is installed: skipped");
                    continue;
                }
                ec = ec.withTemplates(ts.get().service());
            }
            contexts.put(e.id(), ec);
            usable.add(e);
        }
        Map<String, List<Row>> rows = new LinkedHashMap<>();
        for (Provided<RedshiftEstimator> e : usable) {
            rows.put(e.id(), new ArrayList<>());
        }
        if (usable.isEmpty()) {
            rows.put("", new ArrayList<>());
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        Semaphore inFlight = new Semaphore(threads * 4);
        List<Future<?>> futures = new ArrayList<>();
        int spectra = 0;
        int failures = 0;
        try (Progress p = ctx.progress(label, expected < 0 ? -1 : expected * Math.max(1, usable.size()))) {
            try (Records records = records(files)) {
                if (!records.unavailable.isEmpty()) {
                    return new Result(rows, spectra, failures, DemoRun.secs(t0), records.unavailable, notes);
                }
                while (records.hasNext()) {
                    SpectrumRecord rec = records.next();
                    String name = rec.file().getFileName().toString();
                    spectra++;
                    TruthRow tr = truth.apply(name, rec.index());
                    Optional<Spectrum> sp = rec.spectrum();
                    if (!rec.ok()) {
                        failures++;
                    }
                    for (Map.Entry<String, List<Row>> e : rows.entrySet()) {
                        Row row = new Row(name, rec.index(), sp.flatMap(s -> s.metadata().objectId()).orElse(""), tr,
                                sp.map(Spectrum::metadata).orElse(null));
                        e.getValue().add(row);
                        if (!rec.ok()) {
                            row.error = rec.error();
                            p.advance(1);
                            continue;
                        }
                        if (e.getKey().isEmpty()) {
                            p.advance(1);
                            continue;
                        }
                        RedshiftEstimator est = usable.stream().filter(u -> u.id().equals(e.getKey())).findFirst().get().service();
                        EstimationContext ec = contexts.get(e.getKey());
                        Spectrum s = sp.get();
                        inFlight.acquireUninterruptibly();
                        futures.add(pool.submit(() -> {
                            try {
                                fill(row, est.estimate(s, ec));
                            } catch (RuntimeException ex) {
                                row.error = "estimator failed: " + ex;
                            } finally {
                                inFlight.release();
                                p.advance(1);
                            }
                        }));
                    }
                }
            }
            for (Future<?> fu : futures) {
                try {
                    fu.get();
                } catch (Exception ex) {
                    throw new IOException("measuring failed: " + ex.getMessage(), ex);
                }
            }
        } finally {
            pool.shutdownNow();
        }
        return new Result(rows, spectra, failures, DemoRun.secs(t0), "", notes);
    }

    /** Spectra of the files: through the reading facade when installed (profiles matched), else through the best-sniffing reader. */
    private Records records(List<Path> files) throws IOException {
        if (services.inputs() != null) {
            SpectrumInputs.Stream st = services.inputs().open(files, ReadOptions.defaults());
            return new Records(st, st::close, "");
        }
        List<SpectrumRecord> all = new ArrayList<>();
        for (Path f : files) {
            Optional<SpectrumReader> reader = chooseReader(f);
            if (reader.isEmpty()) {
                return new Records(all.iterator(), () -> { }, "no installed reader accepts " + f.getFileName());
            }
            // without the facade, one file at a time is read whole (the demo's files are small)
            try (SpectrumSource src = reader.get().open(f, Optional.empty())) {
                while (src.hasNext()) {
                    all.add(src.next());
                }
            } catch (Exception ex) {
                throw new IOException(f + ": cannot be read (" + ex.getMessage() + ")", ex);
            }
        }
        return new Records(all.iterator(), () -> { }, "");
    }

    /** An iterator of records with a close action. */
    private static final class Records implements java.util.Iterator<SpectrumRecord>, AutoCloseable {
        final java.util.Iterator<SpectrumRecord> it;
        final Runnable close;
        final String unavailable;

        Records(java.util.Iterator<SpectrumRecord> it, Runnable close, String unavailable) {
            this.it = it;
            this.close = close;
            this.unavailable = unavailable;
        }

        @Override
        public boolean hasNext() {
            return it.hasNext();
        }

        @Override
        public SpectrumRecord next() {
            return it.next();
        }

        @Override
        public void close() {
            close.run();
        }
    }

    private Optional<SpectrumReader> chooseReader(Path f) throws IOException {
        byte[] head;
        try (InputStream in = Files.newInputStream(f)) {
            head = in.readNBytes(8640);
        }
        SpectrumReader best = null;
        int bestScore = 0;
        for (Provided<SpectrumReader> r : services.readers().providers()) {
            int s = r.service().sniff(f, head);
            if (s > bestScore) {
                best = r.service();
                bestScore = s;
            }
        }
        return Optional.ofNullable(best);
    }

    static void fill(Row row, RedshiftSolution s) {
        row.estimator = s.provenance().getOrDefault("estimator", "");
        if (!s.ok()) {
            row.error = s.error();
            return;
        }
        row.measured = true;
        row.z = s.z();
        row.zErr = s.zError();
        row.objectClass = s.objectClass();
        row.grade = s.grade();
        row.reliability = s.reliability();
        row.warnings = s.warnings();
        row.alternatives = s.alternatives().size() > 3 ? List.copyOf(s.alternatives().subList(0, 3)) : s.alternatives();
    }
}
