package org.redward.mock.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.catalog.CatalogWriterRegistry;
import org.redward.api.cosmology.CosmologyCalculator;
import org.redward.api.cosmology.CosmologyRegistry;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.frames.FrameCorrector;
import org.redward.api.commands.Command;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Json;
import org.redward.api.commands.Progress;
import org.redward.api.commands.UsageException;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.redshift.EstimatorRegistry;
import org.redward.api.templates.TemplateRegistry;
import org.redward.cli.options.CommandOptions;

import picocli.CommandLine;
import picocli.CommandLine.Option;

/**
 * {@code redward demo}: the whole job on the invented Ember survey. Generates the survey if
 * absent, reads it, measures it with the default estimator, corrects to the barycentric and CMB
 * frames, computes planck2018 distances, writes the catalogue, a report and plots, and scores
 * everything against the truth. Each step that needs a bundle which is not installed says so
 * and the demo goes on with the rest.
 */
@Component(property = {Command.NAME + "=demo",
        Command.SUMMARY + "=the whole job on a built-in invented survey: measure, correct, distances, catalogue, plots"})
public final class DemoCommand implements Command {

    /** Largest survey the demo accepts (the accuracy benchmark takes more). */
    static final int MAX_DEMO_SIZE = 20_000;

    @Reference
    private ReaderRegistry readers;
    @Reference
    private EstimatorRegistry estimators;
    @Reference
    private TemplateRegistry templates;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile SpectrumInputs inputs;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile FrameCorrector frames;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile CosmologyRegistry cosmologies;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile CosmologyCalculator calculator;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile CatalogWriterRegistry writers;

    @CommandLine.Command(name = "demo", mixinStandardHelpOptions = true, sortOptions = false,
            description = {"Run the whole job on a built-in invented survey (the Ember field seen by the invented Quill "
                    + "fibre spectrograph): generate it if absent, read it, measure redshifts, correct them to the "
                    + "barycentric and CMB frames, compute planck2018 distances, write a catalogue, a report and plots, "
                    + "and score the results against the survey's truth.",
                    "All objects, the instrument, the telescope and the site are invented."})
    static final class Args {
        @Option(names = "--size", paramLabel = "N", description = "number of fibres in the survey (default: ${DEFAULT-VALUE})")
        int size = 300;
        @Option(names = "--seed", paramLabel = "S", description = "seed of the survey (default: ${DEFAULT-VALUE})")
        long seed = 2026;
        @Option(names = "--out", paramLabel = "DIR", description = "output folder (default: ${DEFAULT-VALUE} in the working folder)")
        String out = "redward-demo";
        @Option(names = "--estimator", paramLabel = "ID", description = "estimator to use (default: the first of "
                + "the preferred ids that is installed)")
        String estimator;
        @Option(names = "--fresh", description = "regenerate the survey even if a complete one exists")
        boolean fresh;
        @Option(names = "--generate-only", description = "only generate the survey (Quill FITS files and truth.csv) and say where it is")
        boolean generateOnly;
        @Option(names = "--threads", paramLabel = "N", description = "measuring threads (default: the number of cores)")
        int threads = Runtime.getRuntime().availableProcessors();
        @Option(names = "--json", description = "print the summary as one JSON object")
        boolean json;
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        Args a = new Args();
        if (!CommandOptions.parse(a, arguments, ctx.out())) {
            return 0;
        }
        if (a.size < 1) {
            throw new UsageException("--size " + a.size + ": the survey needs at least 1 fibre");
        }
        if (a.size > MAX_DEMO_SIZE && !a.generateOnly) {
            throw new UsageException("--size " + a.size + " is more than the demo's limit of " + MAX_DEMO_SIZE
                    + " fibres; for large mock surveys use 'redward accuracy --size N' (or --generate-only, which has no limit)");
        }
        if (a.threads < 1) {
            throw new UsageException("--threads " + a.threads + ": at least 1");
        }
        Path out = ctx.workingDirectory().resolve(a.out).normalize();
        DemoRun run = new DemoRun(ctx, new Services(readers, inputs, estimators, templates, frames, cosmologies, calculator, writers));
        try (SurveyStore store = SurveyStore.open(out)) {
            if (a.generateOnly) {
                return run.generateOnly(store, a.seed, a.size, a.fresh, a.json);
            }
            return run.execute(store, a.seed, a.size, a.fresh, a.estimator, a.threads, a.json);
        } catch (IOException e) {
            ctx.err().println("redward demo: " + e.getMessage());
            if (ctx.debug()) {
                e.printStackTrace(ctx.err());
            }
            return 1;
        }
    }
}
