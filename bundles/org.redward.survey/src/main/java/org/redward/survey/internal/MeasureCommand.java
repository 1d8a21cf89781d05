package org.redward.survey.internal;

import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
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

import picocli.CommandLine;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code redward measure}: redshifts, classes, velocities, distances of many spectra into a catalogue. */
@Component(property = {Command.NAME + "=measure", Command.SUMMARY + "=redshifts, classes, velocities, distances -> catalogue"})
public final class MeasureCommand implements Command {

    private org.osgi.framework.BundleContext bundleContext;

    @org.osgi.service.component.annotations.Activate
    void activate(org.osgi.framework.BundleContext bc) {
        this.bundleContext = bc;
    }

    static final List<String> FRAMES = List.of("bary", "helio", "cmb", "lg");

    @Reference
    SurveyService survey;

    @CommandLine.Command(name = "measure", mixinStandardHelpOptions = true, sortOptions = false,
            description = {"Measure the redshift of every spectrum of the inputs into a catalogue.",
                "Inputs are files, folders (walked) and list files (.list/.lst or @FILE, one path a line).",
                "Rows are journalled as they come: after a crash, run the same command with --resume.",
                "The catalogue format follows the --out extension: .fits, .vot/.xml, .ecsv, .csv."})
    static final class Args {
        @Parameters(arity = "1..*", paramLabel = "INPUTS", description = "spectrum files, folders or list files")
        List<Path> inputs = new ArrayList<>();
        @Option(names = "--estimator", paramLabel = "ID", description = "redshift estimator id (default: xcorr if installed)")
        String estimator;
        @Option(names = "--templates", paramLabel = "ID", description = "template set id (default: standard if installed)")
        String templates;
        @Option(names = "--profile", paramLabel = "ID", description = "force an instrument profile")
        String profile;
        @Option(names = "--frame", paramLabel = "FRAME", description = "velocity frame for the corrected columns: bary, helio, cmb or lg")
        String frame;
        @Option(names = "--cosmology", paramLabel = "ID", description = "named cosmology for the distances (default: planck2018)")
        String cosmology;
        @Option(names = "--out", paramLabel = "FILE", description = "catalogue file (written atomically; journal beside it until done)")
        Path out;
        @Option(names = "--threads", paramLabel = "N", description = "worker threads (default: all cores)")
        int threads;
        @Option(names = "--resume", description = "finish the interrupted run whose journal sits beside --out")
        boolean resume;
        @Option(names = "--time-limit", paramLabel = "SECONDS", description = "most time one spectrum may take (default: 60)")
        double timeLimitSeconds = 60;
        @Option(names = "--z-min", paramLabel = "Z", description = "lowest redshift searched (default: -0.005)")
        double zMin = -0.005;
        @Option(names = "--z-max", paramLabel = "Z", description = "highest redshift searched (default: 4)")
        double zMax = 4.0;
        @Option(names = "--engine", paramLabel = "ENGINE", description = "local (default) or spark: run on Apache Spark with the survey feature")
        String engine = "local";
        @Option(names = "--master", paramLabel = "URL", description = "with --engine spark: the Spark master (default: local[*])")
        String master;
        @Option(names = "--json", description = "one JSON object per line per spectrum on standard output")
        boolean json;
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        Args a = new Args();
        CommandLine cl = new CommandLine(a);
        try {
            cl.parseArgs(arguments.toArray(new String[0]));
        } catch (CommandLine.ParameterException e) {
            throw new UsageException(e.getMessage());
        }
        if (cl.isUsageHelpRequested() || cl.isVersionHelpRequested()) {
            cl.usage(ctx.out());
            return 0;
        }
        if ("spark".equalsIgnoreCase(a.engine)) {
            return onSpark(ctx, a);
        }
        if (!"local".equalsIgnoreCase(a.engine)) {
            throw new UsageException("--engine " + a.engine + ": expected local or spark");
        }
        MeasureRequest req = request(ctx, a);
        PrintStream out = ctx.out();
        MeasureListener listener = a.json ? row -> out.println(RowCodec.toJson(row))
                : a.out == null ? new TextRows(out) : MeasureListener.none();
        MeasureSummary s;
        try (Progress progress = ctx.progress("measure", -1)) {
            s = survey.measure(req, listener, progress::advance);
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        report(ctx.err(), s);
        return s.total() > 0 && s.ok() == 0 ? 1 : 0;
    }

    /** {@code --engine spark}: the same bundles measure the inputs inside Apache Spark; the catalogue is Parquet in --out. */
    private int onSpark(CommandContext ctx, Args a) throws Exception {
        request(ctx, a); // the same checks of the options
        if (a.resume || a.json) {
            throw new UsageException("--engine spark: " + (a.resume ? "--resume" : "--json")
                    + " is for local runs (Spark retries failed tasks itself; a rerun completes a killed job)");
        }
        java.util.List<String> job = new java.util.ArrayList<>();
        if (a.master != null) {
            job.add("--master");
            job.add(a.master);
        }
        String[][] pass = {{"--estimator", a.estimator}, {"--templates", a.templates}, {"--profile", a.profile},
                {"--frame", a.frame}, {"--cosmology", a.cosmology}, {"--time-limit-s", Double.toString(a.timeLimitSeconds)}};
        for (String[] o : pass) {
            if (o[1] != null) {
                job.add(o[0]);
                job.add(o[1]);
            }
        }
        for (Path p : a.inputs) {
            String s = p.toString();
            job.add(s.matches("^[a-zA-Z][a-zA-Z0-9+.-]*://.*") ? s : ctx.workingDirectory().resolve(p).toString());
        }
        Path out = ctx.workingDirectory().resolve(a.out == null ? Path.of("redward-spark-catalog") : a.out);
        return new SparkEngine(ctx, bundleContext::getProperty).run(job, out);
    }

    static MeasureRequest request(CommandContext ctx, Args a) {
        if (a.frame != null && !FRAMES.contains(a.frame.toLowerCase(Locale.ROOT))) {
            throw new UsageException("--frame " + a.frame + ": expected one of " + String.join(", ", FRAMES));
        }
        if (a.threads < 0) {
            throw new UsageException("--threads " + a.threads + ": must be positive");
        }
        if (!(a.timeLimitSeconds > 0)) {
            throw new UsageException("--time-limit " + a.timeLimitSeconds + ": must be positive");
        }
        if (!(a.zMin < a.zMax)) {
            throw new UsageException("--z-min " + a.zMin + " must be below --z-max " + a.zMax);
        }
        List<Path> inputs = new ArrayList<>();
        for (Path p : a.inputs) {
            String s = p.toString();
            inputs.add(s.startsWith("@") ? Path.of("@" + ctx.workingDirectory().resolve(s.substring(1)))
                    : ctx.workingDirectory().resolve(p));
        }
        return MeasureRequest.of(inputs).withEstimator(a.estimator).withTemplates(a.templates).withProfile(a.profile)
                .withFrame(a.frame == null ? null : a.frame.toLowerCase(Locale.ROOT)).withCosmology(a.cosmology)
                .withOutput(a.out == null ? null : ctx.workingDirectory().resolve(a.out)).withThreads(a.threads)
                .withResume(a.resume).withTimeLimit(Duration.ofMillis(Math.round(a.timeLimitSeconds * 1000)))
                .withRedshiftRange(a.zMin, a.zMax);
    }

    static void report(PrintStream err, MeasureSummary s) {
        err.printf(Locale.ROOT, "measured %d spectra: %d ok, %d failed%s in %.1f s (%.1f spectra/s)%n", s.total(), s.ok(),
                s.failed(), s.resumed() > 0 ? " (" + s.resumed() + " done by the interrupted run)" : "", s.seconds(),
                s.spectraPerSecond());
        s.catalog().ifPresent(c -> err.println("catalogue: " + c));
        for (Map.Entry<String, String> e : s.misbehaving().entrySet()) {
            err.println("misbehaving plug-in: " + e.getKey() + ": " + e.getValue());
        }
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
