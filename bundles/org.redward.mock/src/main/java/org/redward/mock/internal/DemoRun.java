package org.redward.mock.internal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Json;
import org.redward.api.commands.Progress;
import org.redward.api.redshift.EstimatorRegistry;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.registry.Provided;

/** One run of the demo: the steps in order, their status and timing, and the summary. Not thread-safe. */
final class DemoRun {

    /**
     * Estimator ids preferred as the demo's default, in order (the first is the measuring
     * pipeline's default too); otherwise the first installed id that is not an example.
     */
    static final List<String> PREFERRED_ESTIMATORS = List.of("chisq", "xcorr", "lines");

    /** A step of the pipeline as reported. */
    record Step(String name, String status, String detail, double seconds) {
    }

    private final CommandContext ctx;
    private final Services services;
    private final EstimatorRegistry estimators;
    private final List<Step> steps = new ArrayList<>();
    private final List<String> cautions = new ArrayList<>();

    DemoRun(CommandContext ctx, Services services) {
        this.ctx = ctx;
        this.services = services;
        this.estimators = services.estimators();
    }

    int execute(SurveyStore store, long seed, int size, boolean fresh, String estimatorId, int threads, boolean json)
            throws IOException {
        long t0 = System.nanoTime();
        removeLeftovers(store);
        // 1. survey
        Path survey = survey(store, seed, size, fresh);
        List<TruthRow> truth = SurveyGenerator.readTruth(survey.resolve("truth.csv"));
        Map<String, TruthRow> truthByFibre = new LinkedHashMap<>();
        for (TruthRow r : truth) {
            truthByFibre.put(r.file() + "#" + r.row(), r);
        }
        Path results = store.partial("results");
        // 2-3. read and measure
        Optional<Provided<RedshiftEstimator>> est = chooseEstimator(estimatorId);
        List<Row> rows = readAndMeasure(survey, truthByFibre, est, threads);
        // 4-7. frames, distances, catalogue, plots
        DemoSteps more = new DemoSteps(cautions);
        steps.add(more.frames(services.frames(), rows));
        steps.add(more.distances(services.cosmologies(), services.calculator(), rows));
        steps.add(more.catalogue(services.writers(), rows, results,
                DemoSteps.provenance(seed, size, est.map(Provided::toString).orElse("none"))));
        steps.add(plots(results, rows));
        // 8. score and report
        Scorecard card = Scorecard.of(rows.stream().map(Row::outcome).toList());
        List<String> others = estimators.ids().stream().filter(i -> est.isEmpty() || !i.equals(est.get().id())).toList();
        if (!others.isEmpty()) {
            cautions.add("other estimators installed: " + String.join(", ", others)
                    + "; choose one with --estimator ID, or compare them all with 'redward accuracy'");
        }
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

    void removeLeftovers(SurveyStore store) throws IOException {
        for (String left : store.removeLeftovers()) {
            ctx.err().println("redward: removed " + store.root().resolve(left) + ", left half-written by an interrupted run");
        }
    }

    /** The survey folder: reused when complete (and not {@code fresh}), generated otherwise. */
    Path survey(SurveyStore store, long seed, int size, boolean fresh) throws IOException {
        long t = System.nanoTime();
        Path survey = store.surveyFolder(seed, size);
        if (!fresh && store.hasSurvey(seed, size)) {
            steps.add(new Step("generate survey", "reused", size + " fibres in " + survey.getFileName(), secs(t)));
            return survey;
        }
        try (Progress p = ctx.progress("generating the invented survey", size)) {
            long[] last = {0};
            store.generate(seed, size, n -> {
                synchronized (last) {
                    p.advance(n - last[0]);
                    last[0] = n;
                }
            }, ctx.err());
        }
        int files = new SurveyGenerator(seed, size).files();
        steps.add(new Step("generate survey", "done", size + " fibres, " + files + " Quill file" + (files == 1 ? "" : "s"), secs(t)));
        return survey;
    }

    /** {@code demo --generate-only}: the survey and where it is. */
    int generateOnly(SurveyStore store, long seed, int size, boolean fresh, boolean json) throws IOException {
        removeLeftovers(store);
        Path survey = survey(store, seed, size, fresh);
        Step s = steps.get(steps.size() - 1);
        int files = new SurveyGenerator(seed, size).files();
        if (json) {
            ctx.out().println(Json.object().put("survey", survey.toString()).put("seed", seed).put("size", size)
                    .put("status", s.status()).put("files", files).put("truth", survey.resolve("truth.csv").toString())
                    .put("seconds", s.seconds()));
        } else {
            ctx.out().printf(Locale.ROOT, "%s the invented survey: %d fibres in %d Quill file%s, seed %d (%.1f s)%n",
                    s.status().equals("reused") ? "reused" : "generated", size, files, files == 1 ? "" : "s", seed, s.seconds());
            ctx.out().println("  files and truth.csv: " + survey);
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
        Measurer.Result r = new Measurer(ctx, services).measure(files, (f, i) -> truth.get(f + "#" + i),
                est.map(List::of).orElse(List.of()), threads, truth.size(), est.isPresent() ? "reading and measuring" : "reading");
        cautions.addAll(r.notes());
        List<Row> rows = r.rows().values().iterator().next();
        if (!r.unavailable().isEmpty()) {
            steps.add(new Step("read spectra", "not available", r.unavailable(), r.seconds()));
            return rows;
        }
        steps.add(new Step("read spectra", "done", r.spectra() + " spectra from " + files.size() + " files"
                + (r.readFailures() > 0 ? ", " + r.readFailures() + " unreadable" : ""), est.isPresent() ? 0 : r.seconds()));
        if (est.isPresent() && r.rows().containsKey(est.get().id())) {
            long measured = rows.stream().filter(x -> x.measured).count();
            steps.add(new Step("measure redshifts", "done", measured + " of " + rows.size() + " with " + est.get().id() + " ("
                    + est.get().bundleSymbolicName() + " " + est.get().bundleVersion() + "), " + threads + " threads", r.seconds()));
        } else {
            steps.add(new Step("measure redshifts", "not available", est.isPresent() ? "estimator " + est.get().id()
                    + " could not run" : "no redshift estimator installed", 0));
        }
        return rows;
    }

    private Step plots(Path folder, List<Row> rows) {
        long t = System.nanoTime();
        java.util.function.DoubleUnaryOperator dl = null;
        double dh = Double.NaN;
        if (services.cosmologies() != null && services.calculator() != null) {
            var set = services.cosmologies().find(DemoSteps.COSMOLOGY);
            if (set.isPresent()) {
                var cosmo = services.calculator().of(set.get().service().parameters());
                dl = cosmo::luminosityDistanceMpc;
                dh = cosmo.hubbleDistanceMpc();
            }
        }
        try {
            List<String> files = DemoPlots.write(folder, rows, dl, dh);
            return new Step("plots", "done", String.join(", ", files) + (files.contains("hubble-diagram.png") ? ""
                    : "; no Hubble diagram without distances"), secs(t));
        } catch (NoClassDefFoundError e) {
            return new Step("plots", "not available", "no charts bundle installed", 0);
        } catch (IOException | RuntimeException e) {
            return new Step("plots", "failed", e.getMessage(), secs(t));
        }
    }

    static double secs(long t0) {
        return (System.nanoTime() - t0) / 1e9;
    }
}
