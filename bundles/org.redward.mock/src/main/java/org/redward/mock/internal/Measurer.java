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
import org.redward.api.formats.ReaderRegistry;
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
    private final ReaderRegistry readers;
    private final TemplateRegistry templates;

    Measurer(CommandContext ctx, ReaderRegistry readers, TemplateRegistry templates) {
        this.ctx = ctx;
        this.readers = readers;
        this.templates = templates;
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
        try (Progress p = ctx.progress(label, expected * Math.max(1, usable.size()))) {
            for (Path f : files) {
                Optional<SpectrumReader> reader = chooseReader(f);
                if (reader.isEmpty()) {
                    return new Result(rows, spectra, failures, DemoRun.secs(t0), "no installed reader accepts " + f.getFileName(), notes);
                }
                String name = f.getFileName().toString();
                try (SpectrumSource src = reader.get().open(f, Optional.empty())) {
                    while (src.hasNext()) {
                        SpectrumRecord rec = src.next();
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
                } catch (IOException ex) {
                    throw new IOException(f + ": " + ex.getMessage(), ex);
                } catch (Exception ex) {
                    throw new IOException(f + ": cannot be read (" + ex.getMessage() + ")", ex);
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

    private Optional<SpectrumReader> chooseReader(Path f) throws IOException {
        byte[] head;
        try (InputStream in = Files.newInputStream(f)) {
            head = in.readNBytes(8640);
        }
        SpectrumReader best = null;
        int bestScore = 0;
        for (Provided<SpectrumReader> r : readers.providers()) {
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
