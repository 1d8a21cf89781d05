package org.redward.mock.internal;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.Semaphore;

import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Json;
import org.redward.api.commands.Progress;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.formats.SpectrumReader;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.EstimatorRegistry;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.registry.Provided;
import org.redward.api.templates.TemplateRegistry;
import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.Spectrum;

/** One run of the demo: the steps in order, their status and timing, and the summary. Not thread-safe. */
final class DemoRun {

    /** Estimator ids preferred as the demo's default, in order; otherwise the first installed id that is not an example. */
    static final List<String> PREFERRED_ESTIMATORS = List.of("xcorr", "pca-chi2", "chi2", "template", "lines");

    /** A step of the pipeline as reported. */
    record Step(String name, String status, String detail, double seconds) {
    }

    private final CommandContext ctx;
    private final ReaderRegistry readers;
    private final EstimatorRegistry estimators;
    private final TemplateRegistry templates;
    private final List<Step> steps = new ArrayList<>();
    private final List<String> cautions = new ArrayList<>();

    DemoRun(CommandContext ctx, ReaderRegistry readers, EstimatorRegistry estimators, TemplateRegistry templates) {
        this.ctx = ctx;
        this.readers = readers;
        this.estimators = estimators;
        this.templates = templates;
    }

    int execute(SurveyStore store, long seed, int size, boolean fresh, String estimatorId, int threads, boolean json)
            throws IOException {
        long t0 = System.nanoTime();
        PrintStream err = ctx.err();
        for (String left : store.removeLeftovers()) {
            err.println("redward demo: removed " + store.root().resolve(left) + ", left half-written by an interrupted run");
        }
        // 1. survey
        long t = System.nanoTime();
        Path survey = store.surveyFolder(seed, size);
        if (!fresh && store.hasSurvey(seed, size)) {
            steps.add(new Step("generate survey", "reused", size + " fibres in " + survey.getFileName(), secs(t)));
        } else {
            try (Progress p = ctx.progress("generating the invented survey", size)) {
                long[] last = {0};
                store.generate(seed, size, n -> {
                    synchronized (last) {
                        p.advance(n - last[0]);
                        last[0] = n;
                    }
                }, err);
            }
            steps.add(new Step("generate survey", "done", size + " fibres, " + new SurveyGenerator(seed, size).files()
                    + " Quill files", secs(t)));
        }
        List<TruthRow> truth = SurveyGenerator.readTruth(survey.resolve("truth.csv"));
        Map<String, TruthRow> truthByFibre = new LinkedHashMap<>();
        for (TruthRow r : truth) {
            truthByFibre.put(r.file() + "#" + r.row(), r);
        }
        Path results = store.partial("results");
        // 2-3. read and measure
        Optional<Provided<RedshiftEstimator>> est = chooseEstimator(estimatorId);
        List<Row> rows = readAndMeasure(survey, truthByFibre, est, threads);
        // 4-7. frames, distances, catalogue, plots (added as their bundles land)
        steps.add(new Step("frame corrections", "not available", "no frames bundle in this build", 0));
        steps.add(new Step("distances", "not available", "no cosmology bundle in this build", 0));
        steps.add(new Step("catalogue", "not available", "no catalogue writers in this build", 0));
        steps.add(new Step("plots", "not available", "no charts bundle in this build", 0));
        // 8. score and report
        Scorecard card = Scorecard.of(rows.stream().map(Row::outcome).toList());
        DemoReport report = new DemoReport(seed, size, survey, steps, card, rows, cautions, est.map(Provided::toString).orElse(""));
        report.writeMarkdown(results.resolve("report.md"));
        Path published = store.publish(results, "results");
        double total = secs(t0);
        if (json) {
            ctx.out().println(report.json(published, total));
        } else {
            report.printSummary(ctx.out(), published, total);
        }
        return 0;
    }

    private Optional<Provided<RedshiftEstimator>> chooseEstimator(String id) {
        if (id != null) {
            return Optional.of(estimators.require(id));
        }
        for (String p : PREFERRED_ESTIMATORS) {
            Optional<Provided<RedshiftEstimator>> e = estimators.find(p);
            if (e.isPresent()) {
                return e;
            }
        }
        return estimators.providers().stream().min(Comparator.comparing((Provided<RedshiftEstimator> p) -> p.id().startsWith("example") ? 1 : 0)
                .thenComparing(Provided::id));
    }

    private List<Row> readAndMeasure(Path survey, Map<String, TruthRow> truth, Optional<Provided<RedshiftEstimator>> est,
            int threads) throws IOException {
        List<Path> files;
        try (var s = Files.list(survey)) {
            files = s.filter(p -> p.getFileName().toString().endsWith(".fits")).sorted().toList();
        }
        List<Row> rows = new ArrayList<>();
        long tRead = System.nanoTime();
        EstimationContext ec = EstimationContext.defaults();
        if (est.isPresent() && Boolean.TRUE.equals(est.get().properties().get(RedshiftEstimator.USES_TEMPLATES))) {
            Optional<Provided<TemplateSet>> ts = templates.providers().stream().findFirst();
            if (ts.isEmpty()) {
                cautions.add("estimator " + est.get().id() + " needs a template set and none is installed");
                est = Optional.empty();
            } else {
                ec = ec.withTemplates(ts.get().service());
            }
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        Semaphore inFlight = new Semaphore(threads * 8);
        List<Future<?>> futures = new ArrayList<>();
        int readFailures = 0;
        double measureSeconds = 0;
        try (Progress p = ctx.progress(est.isPresent() ? "reading and measuring" : "reading", truth.size())) {
            for (Path f : files) {
                Optional<SpectrumReader> reader = chooseReader(f);
                if (reader.isEmpty()) {
                    steps.add(new Step("read spectra", "not available", "no installed reader accepts " + f.getFileName(), secs(tRead)));
                    return rows;
                }
                try (SpectrumSource src = reader.get().open(f, Optional.empty())) {
                    while (src.hasNext()) {
                        SpectrumRecord rec = src.next();
                        String name = f.getFileName().toString();
                        TruthRow tr = truth.get(name + "#" + rec.index());
                        Row row = new Row(name, rec.index(), rec.spectrum().flatMap(s -> s.metadata().objectId()).orElse(""),
                                tr, rec.spectrum().map(Spectrum::metadata).orElse(null));
                        rows.add(row);
                        if (!rec.ok()) {
                            row.error = rec.error();
                            readFailures++;
                            p.advance(1);
                            continue;
                        }
                        if (est.isEmpty()) {
                            p.advance(1);
                            continue;
                        }
                        Spectrum sp = rec.spectrum().get();
                        RedshiftEstimator e = est.get().service();
                        EstimationContext ctxE = ec;
                        inFlight.acquireUninterruptibly();
                        futures.add(pool.submit(() -> {
                            try {
                                fill(row, e.estimate(sp, ctxE));
                            } catch (RuntimeException ex) {
                                row.error = "estimator failed: " + ex;
                            } finally {
                                inFlight.release();
                                p.advance(1);
                            }
                        }));
                    }
                } catch (Exception ex) {
                    throw new IOException(f + ": " + ex.getMessage(), ex);
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
        measureSeconds = secs(tRead);
        steps.add(new Step("read spectra", "done", rows.size() + " spectra from " + files.size() + " files"
                + (readFailures > 0 ? ", " + readFailures + " unreadable" : ""), est.isPresent() ? 0 : measureSeconds));
        if (est.isPresent()) {
            long measured = rows.stream().filter(r -> r.measured).count();
            steps.add(new Step("measure redshifts", "done", measured + " of " + rows.size() + " with " + est.get().id() + " ("
                    + est.get().bundleSymbolicName() + " " + est.get().bundleVersion() + "), " + threads + " threads", measureSeconds));
        } else {
            steps.add(new Step("measure redshifts", "not available", "no redshift estimator installed", 0));
        }
        return rows;
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

    private static void fill(Row row, RedshiftSolution s) {
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
        row.alternatives = s.alternatives().size() > 3 ? s.alternatives().subList(0, 3) : s.alternatives();
    }

    static double secs(long t0) {
        return (System.nanoTime() - t0) / 1e9;
    }
}
