package org.redward.cli.internal;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceReference;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.commands.Command;
import org.redward.api.commands.UsageException;

import picocli.CommandLine;

/**
 * Receives the command line from the launcher (as a {@code Function<String[], Integer>} service,
 * so that the launcher needs no Redward type), finds the command service the user named, runs it
 * and turns every failure into one line on standard error (stack traces only under --debug).
 */
@Component(service = Function.class, property = "redward.role=cli")
public final class Dispatcher implements Function<String[], Integer> {

    /** The commands of the product, in the order of the help text, with what each needs. */
    static final Map<String, String> PLANNED = new java.util.LinkedHashMap<>();

    static {
        PLANNED.put("demo", "run the main job on the built-in invented survey");
        PLANNED.put("info", "what the readers understood: layout, spectra, axis, units");
        PLANNED.put("measure", "redshifts, classes, velocities, distances -> catalogue");
        PLANNED.put("compare", "two or more estimators on the same spectra");
        PLANNED.put("lines", "detected lines and their identifications");
        PLANNED.put("distance", "every cosmological distance and time for z");
        PLANNED.put("plugins", "bundles, services, versions, states");
        PLANNED.put("templates", "pack files into a template-set bundle; build templates from spectra of known z");
        PLANNED.put("workbench", "the desktop inspection workbench");
    }

    private final Map<String, Registered> commands = new ConcurrentHashMap<>();
    private ConsoleContext context;

    /** A command service known by its reference only: it is activated when the user runs it, not before. */
    private record Registered(ServiceReference<Command> ref, String summary, String bundle) {
    }

    private BundleContext bundleContext;

    @Activate
    void activate(BundleContext bc) {
        this.bundleContext = bc;
        Path cwd = Path.of(prop(bc, "redward.cwd", System.getProperty("user.dir")));
        Path home = Path.of(prop(bc, "redward.home", "."));
        List<Path> drops = new ArrayList<>();
        String d = prop(bc, "redward.dropins", "");
        if (!d.isEmpty()) {
            for (String s : d.split(java.io.File.pathSeparator)) {
                drops.add(Path.of(s));
            }
        }
        boolean debug = Boolean.parseBoolean(prop(bc, "redward.debug", "false"));
        context = new ConsoleContext(System.out, System.err, cwd, home, drops, debug, System.console() != null);
    }

    private static String prop(BundleContext bc, String key, String fallback) {
        String v = bc.getProperty(key);
        return v == null ? fallback : v;
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bindCommand(ServiceReference<Command> ref) {
        Object name = ref.getProperty(Command.NAME);
        if (name != null) {
            Object summary = ref.getProperty(Command.SUMMARY);
            commands.put(String.valueOf(name), new Registered(ref, summary == null ? "" : String.valueOf(summary),
                    ref.getBundle() == null ? "" : ref.getBundle().getSymbolicName()));
        }
    }

    void unbindCommand(ServiceReference<Command> ref) {
        Object name = ref.getProperty(Command.NAME);
        if (name != null) {
            commands.computeIfPresent(String.valueOf(name), (k, v) -> v.ref().equals(ref) ? null : v);
        }
    }

    @Override
    public Integer apply(String[] args) {
        return run(Arrays.asList(args), context);
    }

    int run(List<String> args, ConsoleContext ctx) {
        PrintStream err = ctx.err();
        if (args.isEmpty() || args.get(0).equals("--help") || args.get(0).equals("-h") || args.get(0).equals("help") && args.size() == 1) {
            printHelp(ctx.out());
            return args.isEmpty() ? 2 : 0;
        }
        if (args.get(0).equals("--version")) {
            ctx.out().println("redward " + ctx.productVersion());
            return 0;
        }
        List<String> rest = new ArrayList<>(args);
        String word = rest.remove(0);
        if (word.equals("help")) {
            word = rest.remove(0);
            rest = new ArrayList<>(List.of("--help"));
        }
        if (word.startsWith("-")) {
            err.println("redward: unknown option " + word + " before the command (try: redward --help)");
            return 2;
        }
        Registered r = commands.get(word);
        if (r == null) {
            if (PLANNED.containsKey(word)) {
                err.println("redward " + word + ": not available in this installation: no bundle provides it"
                        + " (its capability is not built yet, or its bundle failed to start; see 'redward plugins')");
                return 3;
            }
            err.println("redward: unknown command '" + word + "' (commands: " + String.join(", ", available()) + ")");
            return 2;
        }
        if (rest.size() == 1 && (rest.get(0).equals("--version") || rest.get(0).equals("-V"))) {
            ctx.out().println("redward " + ctx.productVersion() + " (" + word + " from " + r.bundle() + ")");
            return 0;
        }
        try {
            Command command = bundleContext.getService(r.ref());
            if (command == null) {
                err.println("redward " + word + ": the command's bundle " + r.bundle() + " could not provide it (see 'redward plugins')");
                return 1;
            }
            try {
                return command.run(ctx, rest);
            } finally {
                bundleContext.ungetService(r.ref());
            }
        } catch (UsageException | CommandLine.ParameterException e) {
            err.println("redward " + word + ": " + e.getMessage() + " (see: redward " + word + " --help)");
            return 2;
        } catch (Exception | LinkageError e) {
            err.println("redward " + word + ": " + describe(e));
            if (ctx.debug()) {
                e.printStackTrace(err);
            } else {
                err.println("(run again with --debug for the details)");
            }
            return 1;
        }
    }

    static String describe(Throwable e) {
        String m = e.getMessage();
        String text = m == null || m.isBlank() ? e.getClass().getSimpleName() : m;
        if (e instanceof NullPointerException || e instanceof IllegalStateException && m == null) {
            text = "internal error (" + e.getClass().getSimpleName() + (m == null ? "" : ": " + m) + ")";
        }
        return text.replaceAll("\\s+", " ").trim();
    }

    private List<String> available() {
        return new ArrayList<>(new TreeMap<>(commands).keySet());
    }

    private void printHelp(PrintStream out) {
        out.println("redward: galaxy redshifts and distances");
        out.println();
        out.println("usage: redward [--bundles DIR]... [--debug] COMMAND [OPTIONS] [ARGS]");
        out.println();
        out.println("commands:");
        Map<String, String> all = new java.util.LinkedHashMap<>(PLANNED);
        for (Map.Entry<String, Registered> e : new TreeMap<>(commands).entrySet()) {
            all.put(e.getKey(), e.getValue().summary().isEmpty() ? all.getOrDefault(e.getKey(), "") : e.getValue().summary());
        }
        for (Map.Entry<String, String> e : all.entrySet()) {
            String mark = commands.containsKey(e.getKey()) ? "" : "  [not available in this installation]";
            out.printf("  %-10s %s%s%n", e.getKey(), e.getValue(), mark);
        }
        out.println();
        out.println("global options (any command):");
        out.println("  --bundles DIR   install the bundles (jars) of DIR too: your own estimators, readers, templates");
        out.println("  --debug         show stack traces and framework messages");
        out.println("  --json          (most commands) machine-readable output, one JSON object per line");
        out.println();
        out.println("'redward COMMAND --help' tells more about a command.");
    }
}
