package org.redward.mock.internal;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.redward.api.commands.Command;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.UsageException;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.redshift.EstimatorRegistry;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.registry.Provided;
import org.redward.api.templates.TemplateRegistry;
import org.redward.cli.options.CommandOptions;

import picocli.CommandLine;
import picocli.CommandLine.Option;

/**
 * {@code redward accuracy}: the accuracy benchmark. Measures a large mock survey with every
 * installed estimator (or those named) and scores each per class, per S/N bin and per grade,
 * reports the goals, and measures the real spectra of a reference folder if one is given.
 * Writes Markdown and CSV. Not part of any test run: it takes minutes.
 */
@Component(property = {Command.NAME + "=accuracy",
        Command.SUMMARY + "=accuracy benchmark: every estimator on a large mock survey (and real spectra), per class, S/N and grade"})
public final class AccuracyCommand implements Command {

    static final int MIN_SIZE = 100;

    @Reference
    private ReaderRegistry readers;
    @Reference
    private EstimatorRegistry estimators;
    @Reference
    private TemplateRegistry templates;
    @Reference(cardinality = org.osgi.service.component.annotations.ReferenceCardinality.OPTIONAL,
            policy = org.osgi.service.component.annotations.ReferencePolicy.DYNAMIC)
    private volatile org.redward.api.formats.SpectrumInputs inputs;

    @CommandLine.Command(name = "accuracy", mixinStandardHelpOptions = true, sortOptions = false,
            description = {"Measure a large invented mock survey with every installed redshift estimator and score them "
                    + "against its truth: success rate (|dz|/(1+z) < 0.001), catastrophic rate (> 0.01), velocity scatter, "
                    + "per class, per median S/N per pixel and per confidence grade (with the reliability each grade "
                    + "really has); optionally also a folder of real spectra with published redshifts (--real).",
                    "Writes accuracy.md and accuracy.csv into the output folder."})
    static final class Args {
        @Option(names = "--size", paramLabel = "N", description = "fibres in the mock survey (default: ${DEFAULT-VALUE})")
        int size = 5000;
        @Option(names = "--seed", paramLabel = "S", description = "seed of the mock survey (default: ${DEFAULT-VALUE})")
        long seed = 7;
        @Option(names = "--estimators", paramLabel = "A,B", split = ",", description = "estimator ids (default: all installed)")
        List<String> estimators;
        @Option(names = "--real", paramLabel = "DIR", description = "folder of real spectra with a truth.tsv of published redshifts")
        String real;
        @Option(names = "--out", paramLabel = "DIR", description = "output folder (default: ${DEFAULT-VALUE})")
        String out = "redward-accuracy";
        @Option(names = "--threads", paramLabel = "N", description = "measuring threads (default: the number of cores)")
        int threads = Runtime.getRuntime().availableProcessors();
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        Args a = new Args();
        if (!CommandOptions.parse(a, arguments, ctx.out())) {
            return 0;
        }
        if (a.size < MIN_SIZE || a.size > SurveyGenerator.MAX_SIZE) {
            throw new UsageException("--size " + a.size + " is outside " + MIN_SIZE + ".." + SurveyGenerator.MAX_SIZE);
        }
        if (a.threads < 1) {
            throw new UsageException("--threads " + a.threads + ": at least 1");
        }
        List<Provided<RedshiftEstimator>> chosen = new ArrayList<>();
        if (a.estimators == null) {
            chosen.addAll(estimators.providers());
        } else {
            for (String id : a.estimators) {
                try {
                    chosen.add(estimators.require(id.trim()));
                } catch (java.util.NoSuchElementException e) {
                    throw new UsageException("--estimators: " + e.getMessage());
                }
            }
        }
        if (chosen.isEmpty()) {
            ctx.err().println("redward accuracy: no redshift estimator is installed; nothing to measure");
            return 1;
        }
        Path realDir = a.real == null ? null : ctx.workingDirectory().resolve(a.real).normalize();
        if (realDir != null && !Files.isDirectory(realDir)) {
            throw new UsageException("--real " + realDir + " is not a folder");
        }
        Path out = ctx.workingDirectory().resolve(a.out).normalize();
        try (SurveyStore store = SurveyStore.open(out)) {
            Services services = Services.forMeasuring(readers, inputs, estimators, templates);
            DemoRun prep = new DemoRun(ctx, services);
            prep.removeLeftovers(store);
            long t0 = System.nanoTime();
            Path survey = prep.survey(store, a.seed, a.size, false);
            double genSeconds = DemoRun.secs(t0);
            List<TruthRow> truth = SurveyGenerator.readTruth(survey.resolve("truth.csv"));
            Map<String, TruthRow> byFibre = new HashMap<>();
            truth.forEach(t -> byFibre.put(t.file() + "#" + t.row(), t));
            List<Path> files;
            try (var s = Files.list(survey)) {
                files = s.filter(p -> p.getFileName().toString().endsWith(".fits")).sorted().toList();
            }
            Measurer m = new Measurer(ctx, services);
            Measurer.Result mock = m.measure(files, (f, i) -> byFibre.get(f + "#" + i), chosen, a.threads, truth.size(),
                    "measuring " + truth.size() + " mock spectra with " + chosen.size() + " estimator(s)");
            Measurer.Result real = null;
            List<RealData> realTruth = List.of();
            if (realDir != null) {
                realTruth = RealData.read(realDir);
                List<Path> realFiles = realTruth.stream().map(r -> realDir.resolve(r.file())).toList();
                real = m.measure(realFiles, (f, i) -> null, chosen, a.threads, -1, "measuring the real spectra");
            }
            Path partial = store.partial("results");
            AccuracyReport report = new AccuracyReport(a.seed, a.size, genSeconds, mock, real, realTruth);
            String plotNote = report.write(partial);
            Path published = store.publish(partial, "results");
            report.printGoals(ctx.out());
            ctx.out().println();
            ctx.out().println("full tables: " + published.resolve("accuracy.md") + " and accuracy.csv"
                    + (plotNote.isEmpty() ? "; plots success-vs-snr.png and grade-calibration.png" : "; " + plotNote));
            return mock.unavailable().isEmpty() ? 0 : 1;
        } catch (IOException e) {
            ctx.err().println("redward accuracy: " + e.getMessage());
            if (ctx.debug()) {
                e.printStackTrace(ctx.err());
            }
            return 1;
        }
    }
}
