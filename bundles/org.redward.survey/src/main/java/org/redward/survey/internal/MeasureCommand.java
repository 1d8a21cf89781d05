package org.redward.survey.internal;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.redward.api.commands.Command;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Progress;
import org.redward.api.commands.UsageException;
import org.redward.api.survey.MeasureListener;
import org.redward.api.survey.MeasureRequest;
import org.redward.api.survey.MeasureSummary;
import org.redward.api.survey.MeasuredRow;
import org.redward.cli.options.CommandOptions;

import picocli.CommandLine;
import picocli.CommandLine.Option;
import picocli.CommandLine.Mixin;

/** {@code redward measure}: redshifts, classes, velocities, distances of many spectra into a catalogue. */
@Component(property = {Command.NAME + "=measure", Command.SUMMARY + "=redshifts, classes, velocities, distances -> catalogue"})
public final class MeasureCommand implements Command {

    static final List<String> FRAMES = List.of("bary", "helio", "cmb", "lg");

    @Reference
    SurveyService survey;

    private org.osgi.framework.BundleContext bundleContext;

    @org.osgi.service.component.annotations.Activate
    void activate(org.osgi.framework.BundleContext bc) {
        this.bundleContext = bc;
    }

    @CommandLine.Command(name = "measure", mixinStandardHelpOptions = true, sortOptions = false,
            description = {"Measure the redshift of every spectrum of the inputs into a catalogue.",
                "Inputs are files, folders (walked) and list files (.list/.lst or @FILE, one path a line).",
                "Rows are journalled as they come: after a crash, run the same command with --resume.",
                "The catalogue format follows the --out extension: .fits, .vot/.xml, .ecsv, .csv."})
    static final class Args {
        @Mixin
        RunOptions run = new RunOptions();
        @Option(names = "--estimator", paramLabel = "ID", description = "redshift estimator id (default: the product setting redward.default.estimator, chisq as shipped)")
        String estimator;
        @Option(names = "--frame", paramLabel = "FRAME", description = "velocity frame for the corrected columns: bary, helio, cmb or lg")
        String frame;
        @Option(names = "--cosmology", paramLabel = "ID", description = "named cosmology for the distances (default: planck2018)")
        String cosmology;
        @Option(names = "--out", paramLabel = "FILE", description = "catalogue file (written atomically; journal beside it until done)")
        Path out;
        @Option(names = "--resume", description = "finish the interrupted run whose journal sits beside --out")
        boolean resume;
        @Option(names = "--lines", description = "also find, measure and identify the lines of every spectrum measured ok, at its z:"
                + " a second catalogue table 'lines' (FITS extension LINES, VOTable TABLE; beside a .csv/.ecsv as FILE.lines.csv/.ecsv)")
        boolean lines;
        @Option(names = "--engine", paramLabel = "ENGINE", description = "local (default) or spark: run on Apache Spark with the survey feature")
        String engine = "local";
        @Option(names = "--master", paramLabel = "URL", description = "with --engine spark: the Spark master (default: local[*])")
        String master;
        @Option(names = "--spectra-per-task", paramLabel = "K", description = "with --engine spark: the most spectra one Spark task"
                + " measures (files are cut into slices of at most K; default 200)")
        Integer spectraPerTask;
        @Option(names = "--json", description = "one JSON object per line per spectrum on standard output")
        boolean json;
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        Args a = new Args();
        if (!CommandOptions.parse(a, arguments, ctx.out())) {
            return 0;
        }
        if (a.frame != null && !FRAMES.contains(a.frame.toLowerCase(Locale.ROOT))) {
            throw new UsageException("--frame " + a.frame + ": expected one of " + String.join(", ", FRAMES));
        }
        if ("spark".equalsIgnoreCase(a.engine)) {
            return onSpark(ctx, a);
        }
        if (!"local".equalsIgnoreCase(a.engine)) {
            throw new UsageException("--engine " + a.engine + ": expected local or spark");
        }
        MeasureRequest req = a.run.request(ctx).withEstimator(a.estimator)
                .withFrame(a.frame == null ? null : a.frame.toLowerCase(Locale.ROOT)).withCosmology(a.cosmology)
                .withOutput(a.out == null ? null : ctx.workingDirectory().resolve(a.out)).withResume(a.resume).withLines(a.lines);
        PrintStream out = ctx.out();
        MeasureListener listener = a.json ? row -> out.println(RowCodec.toJson(row))
                : a.out == null ? new TextRows(out) : MeasureListener.none();
        MeasureSummary s;
        String heap;
        try (HeapWatch watch = new HeapWatch(); Progress progress = ctx.progress("measure", -1)) {
            // the total (for the rate and time left) comes from the readers' counts, on the side: it never delays the run
            Thread counter = new Thread(() -> {
                long total = survey.expectedSpectra(req);
                if (total > 0) {
                    progress.total(total);
                }
            }, "redward-measure-count");
            counter.setDaemon(true);
            counter.start();
            MeasureListener rows = listener;
            s = survey.measure(req, new MeasureListener() {
                @Override
                public void started(long resumedRows) {
                    progress.advance(resumedRows); // the interrupted run's rows count as done
                    rows.started(resumedRows);
                }

                @Override
                public void row(MeasuredRow row) {
                    rows.row(row);
                }
            }, progress::advance);
            heap = watch.describe();
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        report(ctx.err(), s, heap, req);
        return s.total() > 0 && s.ok() == 0 ? 1 : 0;
    }

    static void report(PrintStream err, MeasureSummary s, String heap, MeasureRequest req) {
        err.printf(Locale.ROOT, "measured %d spectra: %d ok, %d failed%s in %.1f s (%.1f spectra/s)%s%n", s.total(), s.ok(),
                s.failed(), s.resumed() > 0 ? " (" + s.resumed() + " done by the interrupted run)" : "", s.seconds(),
                s.spectraPerSecond(), req.lines() ? String.format(Locale.ROOT, "; %d line%s measured in %d spectr%s", s.lines(),
                        s.lines() == 1 ? "" : "s", s.spectraWithLines(), s.spectraWithLines() == 1 ? "um" : "a") : "");
        s.catalog().ifPresent(c -> {
            err.println("catalogue: " + c);
            if (req.lines()) {
                Path sibling = SurveyRun.linesFile(c);
                err.println("lines table: " + (java.nio.file.Files.exists(sibling) ? sibling : c + " (second table, 'lines')"));
            }
        });
        err.println(heap);
        for (Map.Entry<String, String> e : s.misbehaving().entrySet()) {
            err.println("misbehaving plug-in: " + e.getKey() + ": " + e.getValue());
        }
    }

    /** {@code --engine spark}: the same bundles measure the inputs inside Apache Spark; the catalogue is Parquet in --out. */
    private int onSpark(CommandContext ctx, Args a) throws Exception {
        a.run.request(ctx); // the same checks of the shared options
        if (a.spectraPerTask != null && a.spectraPerTask < 1) {
            throw new UsageException("--spectra-per-task " + a.spectraPerTask + ": expected a whole number >= 1");
        }
        if (a.lines) {
            throw new UsageException("--engine spark: --lines is for local runs (the Spark job writes the main table only)");
        }
        if (a.resume || a.json) {
            throw new UsageException("--engine spark: " + (a.resume ? "--resume" : "--json")
                    + " is for local runs (Spark retries failed tasks itself; a rerun completes a killed job)");
        }
        List<String> job = new java.util.ArrayList<>();
        if (a.master != null) {
            job.add("--master");
            job.add(a.master);
        }
        String[][] pass = {{"--estimator", a.estimator}, {"--templates", a.run.templates}, {"--profile", a.run.profile},
                {"--frame", a.frame}, {"--cosmology", a.cosmology}, {"--time-limit-s", Double.toString(a.run.timeLimitSeconds)},
                {"--spectra-per-task", a.spectraPerTask == null ? null : a.spectraPerTask.toString()}};
        for (String[] o : pass) {
            if (o[1] != null) {
                job.add(o[0]);
                job.add(o[1]);
            }
        }
        for (Path p : a.run.inputs) {
            String s = p.toString();
            job.add(s.matches("^[a-zA-Z][a-zA-Z0-9+.-]*://.*") ? s : ctx.workingDirectory().resolve(p).toString());
        }
        Path out = ctx.workingDirectory().resolve(a.out == null ? Path.of("redward-spark-catalog") : a.out);
        return new SparkEngine(ctx, bundleContext::getProperty).run(job, out);
    }

    /** A plain table on standard output, one line per spectrum. */
    private static final class TextRows implements MeasureListener {
        private final PrintStream out;
        private boolean header;

        TextRows(PrintStream out) {
            this.out = out;
        }

        @Override
        public void row(MeasuredRow r) {
            if (!header) {
                out.printf("%-32s %-6s %10s %10s %-8s %-8s %s%n", "id", "status", "z", "z_err", "class", "grade", "notes");
                header = true;
            }
            String notes = r.ok() ? String.join("; ", r.warnings()) : r.error();
            out.printf(Locale.ROOT, "%-32s %-6s %10.6f %10.6f %-8s %-8s %s%n", r.id(), r.status(), r.z(), r.zErr(),
                    r.objectClass(), r.grade(), notes);
        }
    }
}
