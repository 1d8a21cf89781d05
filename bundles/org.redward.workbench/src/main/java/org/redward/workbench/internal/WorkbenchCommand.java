package org.redward.workbench.internal;

import java.lang.management.ManagementFactory;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Executor;

import org.eclipse.swt.SWT;
import org.eclipse.swt.SWTError;
import org.eclipse.swt.widgets.Display;
import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.commands.Command;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Json;
import org.redward.api.commands.PlatformInfo;
import org.redward.api.commands.UsageException;
import org.redward.api.cosmology.CosmologyCalculator;
import org.redward.api.cosmology.CosmologyRegistry;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.lines.LineFinder;
import org.redward.api.lines.LineListRegistry;
import org.redward.api.redshift.EstimatorRegistry;
import org.redward.api.registry.ProviderRegistry;
import org.redward.api.templates.TemplateRegistry;
import org.redward.cli.options.CommandOptions;

import picocli.CommandLine;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code redward workbench [FILES|FOLDERS|CATALOGUE]}: the desktop inspection workbench. The SWT
 * event loop runs on the launcher's main thread (the {@link Executor} service with
 * {@code redward.thread=main}); this command hands the window to it and returns when the window
 * closes.
 */
@Component(property = {Command.NAME + "=workbench", Command.SUMMARY + "=inspect spectra by eye and decide their redshifts (desktop)"})
public final class WorkbenchCommand implements Command {

    @Reference(target = "(redward.thread=main)")
    private Executor mainThread;
    @Reference
    private ReaderRegistry readers;
    @Reference
    private EstimatorRegistry estimators;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile TemplateRegistry templates;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile PlatformInfo platform;

    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile LineListRegistry lineLists;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile LineFinder lineFinder;

    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile CosmologyRegistry cosmologies;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile CosmologyCalculator cosmologyCalculator;

    private final List<ProviderRegistry<?>> registries = new CopyOnWriteArrayList<>();
    private BundleContext bundleContext;
    private volatile Display display;

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bindRegistry(ProviderRegistry<?> r) {
        registries.add(r);
    }

    void unbindRegistry(ProviderRegistry<?> r) {
        registries.remove(r);
    }

    @Activate
    void activate(BundleContext ctx) {
        bundleContext = ctx;
    }

    @Deactivate
    void deactivate() {
        Display d = display;
        if (d != null && !d.isDisposed()) {
            d.asyncExec(() -> {
                for (var s : d.getShells()) {
                    s.dispose();
                }
            });
            d.wake();
        }
    }

    @CommandLine.Command(name = "workbench", mixinStandardHelpOptions = true,
            description = {"Open spectra, folders or a catalogue written by 'measure' as a queue, inspect each spectrum with "
                + "its lines at the proposed z and the estimators' score curves, and decide by eye. Every decision is "
                + "written at once to the journal; reopening the same journal brings the decisions back."})
    static final class Args {
        @Parameters(paramLabel = "FILES", description = "spectrum files, folders, or a catalogue (.jsonl, .json, .csv)")
        List<Path> files = new ArrayList<>();
        @Option(names = "--journal", paramLabel = "FILE", description = "decisions journal (JSON lines; default: redward-decisions.jsonl in the working folder)")
        Path journal;
        @Option(names = "--estimators", split = ",", paramLabel = "A,B", description = "estimators to run and compare (default: the first two installed)")
        List<String> estimators = new ArrayList<>();
        @Option(names = "--templates", paramLabel = "ID", description = "template set for estimators that need one (default: the first installed)")
        String templates = "";
        @Option(names = "--linelist", paramLabel = "ID", description = "line list drawn and offered for naming (default: standard)")
        String lineList = "";
        @Option(names = "--cosmology", paramLabel = "ID", description = "parameter set for the distances panel (default: planck2018)")
        String cosmology = "";
        @Option(names = "--who", paramLabel = "NAME", description = "the name recorded with each decision (default: the system user)")
        String who;
        @Option(names = "--snapshot", paramLabel = "PNG", description = "open the window, draw the first spectrum, save the window as a PNG and exit")
        Path snapshot;
        @Option(names = "--export", paramLabel = "FILE", description = "when the window closes, write the queue with the verdict columns (.csv or .jsonl)")
        Path export;
        @Option(names = "--install", paramLabel = "JAR", description = "install and start this bundle jar once the window is open, as its Bundles panel does (repeatable)")
        List<Path> install = new ArrayList<>();
        @Option(names = "--size", paramLabel = "WxH", description = "window size in pixels (default: 1440x900)")
        String size = "1440x900";
        @Option(names = "--json", description = "on exit, print one JSON object: journal, spectra, decided, timings")
        boolean json;
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        long started = System.nanoTime();
        long startedEpochMs = System.currentTimeMillis();
        // the display takes about a second to come up: start it on the main thread at once, while the
        // options are read and the services looked up (not for --help or --version, which open no window)
        boolean window = arguments.stream().noneMatch(x -> x.equals("-h") || x.equals("--help") || x.equals("-V") || x.equals("--version"));
        CompletableFuture<Display> early = new CompletableFuture<>();
        long[] displayEpochMs = new long[2];
        if (window) {
            mainThread.execute(() -> {
                displayEpochMs[0] = System.currentTimeMillis();
                try {
                    // the workbench journals every decision at once, so it needs no log-out notice from a
                    // desktop session manager: skip SWT's D-Bus session-manager handshake (time at start-up)
                    if (System.getProperty(SESSION_MANAGER_OFF) == null) {
                        System.setProperty(SESSION_MANAGER_OFF, "true");
                    }
                    early.complete(Display.getCurrent() != null ? Display.getCurrent() : new Display());
                } catch (Throwable t) {
                    early.completeExceptionally(t);
                }
                displayEpochMs[1] = System.currentTimeMillis();
            });
        }
        try {
            return run(ctx, arguments, started, startedEpochMs, early, displayEpochMs);
        } finally {
            if (window) {
                // a usage error or a failure before the window opened: close the display made early
                mainThread.execute(() -> early.thenAccept(d -> {
                    if (!d.isDisposed() && d.getShells().length == 0) {
                        d.dispose();
                    }
                }));
            }
        }
    }

    private int run(CommandContext ctx, List<String> arguments, long started, long startedEpochMs, CompletableFuture<Display> early,
            long[] displayEpochMs) throws Exception {
        Args a = new Args();
        if (!CommandOptions.parse(a, arguments, ctx.out())) {
            return 0;
        }
        int[] wh = parseSize(a.size);
        List<String> ids = new ArrayList<>();
        for (String id : a.estimators) {
            if (estimators.find(id.trim()).isEmpty()) {
                throw new UsageException("--estimators: no estimator '" + id.trim() + "' (installed: "
                        + (estimators.ids().isEmpty() ? "none" : String.join(", ", estimators.ids())) + ")");
            }
            ids.add(id.trim());
        }
        if (ids.isEmpty()) {
            ids.addAll(estimators.ids().stream().limit(2).toList());
        }
        List<Path> files = new ArrayList<>();
        for (Path f : a.files) {
            files.add(ctx.workingDirectory().resolve(f));
        }
        Path journalFile = ctx.workingDirectory().resolve(a.journal != null ? a.journal : Path.of("redward-decisions.jsonl"));
        String who = a.who != null ? a.who : System.getProperty("user.name", "unknown");
        OsgiBackend backend = new OsgiBackend(bundleContext, readers, estimators, templates, platform, registries, who, a.templates,
                () -> lineLists, () -> lineFinder, a.lineList, () -> cosmologies, () -> cosmologyCalculator, a.cosmology);
        Path snapshot = a.snapshot == null ? null : ctx.workingDirectory().resolve(a.snapshot);
        Path export = a.export == null ? null : ctx.workingDirectory().resolve(a.export);
        List<Path> install = a.install.stream().map(p -> ctx.workingDirectory().resolve(p)).toList();

        CompletableFuture<Session.Result> done = new CompletableFuture<>();
        mainThread.execute(() -> {
            try {
                // made by the task queued before this one on the same thread: complete by now
                Display d = early.getNow(null);
                if (d == null) {
                    d = early.isCompletedExceptionally() ? early.join() : Display.getCurrent() != null ? Display.getCurrent() : new Display();
                }
                display = d;
                done.complete(new Session(d, backend, journalFile, ids, files, wh[0], wh[1], started).run(snapshot, export, install));
            } catch (java.util.concurrent.CompletionException e) {
                done.completeExceptionally(e.getCause() instanceof SWTError se ? noWindow(se) : e.getCause());
            } catch (SWTError e) {
                done.completeExceptionally(noWindow(e));
            } catch (Throwable t) {
                done.completeExceptionally(t);
            }
        });
        Session.Result r;
        try {
            r = done.get();
        } catch (ExecutionException e) {
            throw e.getCause() instanceof Exception ex ? ex : e;
        }
        double jvmMs = System.currentTimeMillis() - ManagementFactory.getRuntimeMXBean().getStartTime() - (System.nanoTime() - r.firstWindowNanos()) / 1e6;
        r.messages().forEach(m -> ctx.err().println("workbench: " + m));
        if (a.json) {
            ctx.out().println(Json.object().put("journal", journalFile.toString()).put("spectra", r.spectra()).put("decided", r.decided())
                    .put("first_window_ms_after_command", r.firstWindowMs()).put("first_window_ms_after_process_start", jvmMs)
                    .put("snapshot", snapshot == null ? null : snapshot.toString())
                    .put("timeline_epoch_ms", Json.object().put("process_start", ManagementFactory.getRuntimeMXBean().getStartTime())
                            .put("command_start", startedEpochMs).put("main_thread_start", displayEpochMs[0])
                            .put("display_ready", displayEpochMs[1]).put("window_build_start", r.timeline().buildStartEpochMs())
                            .put("window_built", r.timeline().builtEpochMs())
                            .put("window_opened", r.timeline().openedEpochMs()).put("first_paint", r.timeline().firstPaintEpochMs()))
                    .put("process_cpu_ms_at_first_paint", r.timeline().cpuMsAtFirstPaint())
                    .put("messages", r.messages())
                    .put("services", r.services().stream().map(x -> Json.object().put("family", x[0]).put("id", x[1]).put("bundle", x[2]))
                            .toList()));
        } else {
            ctx.err().printf(java.util.Locale.ROOT, "workbench: first window %.0f ms after the command started (%.0f ms after the process started); %d of %d spectra decided; journal %s%n",
                    r.firstWindowMs(), jvmMs, r.decided(), r.spectra(), journalFile);
            if (snapshot != null) {
                ctx.err().println("workbench: snapshot written to " + snapshot);
            }
        }
        return r.status();
    }

    private static IllegalStateException noWindow(SWTError e) {
        return new IllegalStateException("cannot open a window (" + e.getMessage() + "); is there a display? (DISPLAY="
                + System.getenv("DISPLAY") + ")", e);
    }

    static int[] parseSize(String s) throws UsageException {
        String[] p = s.toLowerCase(java.util.Locale.ROOT).split("x");
        try {
            if (p.length == 2) {
                int w = Integer.parseInt(p[0].trim());
                int h = Integer.parseInt(p[1].trim());
                if (w >= 400 && h >= 300 && w <= 10000 && h <= 10000) {
                    return new int[] {w, h};
                }
            }
        } catch (NumberFormatException e) {
            // fall through
        }
        throw new UsageException("--size: '" + s + "' is not WIDTHxHEIGHT in pixels (from 400x300)");
    }

    /** SWT's switch for its desktop session-manager client (read when the display is made). */
    static final String SESSION_MANAGER_OFF = "org.eclipse.swt.internal.SessionManagerDBus.disable";

    /** Keeps the SWT constant referenced (the bundle imports org.eclipse.swt). */
    static final int STYLE = SWT.NONE;
}
