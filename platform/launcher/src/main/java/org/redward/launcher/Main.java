package org.redward.launcher;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.Hashtable;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.ServiceLoader;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Function;
import java.util.jar.JarFile;
import java.util.jar.Manifest;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.BundleException;
import org.osgi.framework.Constants;
import org.osgi.framework.FrameworkUtil;
import org.osgi.framework.launch.Framework;
import org.osgi.framework.launch.FrameworkFactory;
import org.osgi.framework.wiring.FrameworkWiring;
import org.osgi.util.tracker.ServiceTracker;

/**
 * The {@code redward} launcher: boots Apache Felix with its own storage folder for this run,
 * installs the bundles of the chosen feature folders and of every {@code --bundles DIR}, starts
 * them, and hands the command line to the command dispatcher service ({@code java.util.function.Function}
 * with {@code redward.role=cli}). Exits with the command's status.
 *
 * <p>The launcher knows no Redward API type: it talks to the platform only through JDK types, so
 * no API package is ever exported twice.
 */
public final class Main {

    /** Property of the dispatcher service the launcher calls. */
    static final String CLI_FILTER = "(&(objectClass=java.util.function.Function)(redward.role=cli))";

    private Main() {
    }

    public static void main(String[] args) {
        int status;
        try {
            status = run(args, System.err);
        } catch (Throwable t) {
            System.err.println("redward: " + t);
            status = 1;
        }
        System.out.flush();
        System.err.flush();
        Runtime.getRuntime().halt(status);
    }

    static int run(String[] args, PrintStream err) throws Exception {
        StartupTrace trace = StartupTrace.fromSystemProperty();
        PrintStream traceOut = err;
        try {
            return run(args, err, trace);
        } finally {
            trace.mark("storage deleted");
            trace.print(traceOut);
        }
    }

    private static int run(String[] args, PrintStream err, StartupTrace trace) throws Exception {
        Path cwd = Paths.get("").toAbsolutePath();
        Options options;
        try {
            options = Options.parse(args, cwd);
        } catch (IllegalArgumentException e) {
            err.println("redward: " + e.getMessage());
            return 2;
        }
        if (!options.debug) {
            System.setErr(new PrintStream(new OneLineErrors(System.err), true, java.nio.charset.StandardCharsets.UTF_8));
        }
        err = System.err;
        Path home = productHome();
        Properties conf = loadConfiguration(home);
        for (Path dir : options.dropInFolders) {
            if (!Files.isDirectory(dir)) {
                err.println("redward: --bundles folder " + dir + " does not exist or is not a folder");
                return 2;
            }
        }
        List<Path> folders = new ArrayList<>();
        folders.add(home.resolve("bundles").resolve("core"));
        String command = options.commandWord();
        if (command.equals("workbench") || Boolean.parseBoolean(System.getProperty("redward.desktop", "false"))) {
            folders.add(home.resolve("bundles").resolve("desktop"));
        }
        folders.addAll(options.dropInFolders);

        Path storage = createStorage();
        Map<String, String> fw = new HashMap<>();
        fw.put(Constants.FRAMEWORK_STORAGE, storage.toString());
        fw.put(Constants.FRAMEWORK_STORAGE_CLEAN, Constants.FRAMEWORK_STORAGE_CLEAN_ONFIRSTINIT);
        fw.put("felix.log.level", options.debug ? "2" : "0");
        fw.put("ds.loglevel", options.debug ? "warn" : "error");
        fw.put("redward.home", home.toString());
        fw.put("redward.cwd", cwd.toString());
        fw.put("redward.debug", Boolean.toString(options.debug));
        fw.put("redward.version", conf.getProperty("redward.version", "unknown"));
        fw.put("redward.features", folders.size() > 1 && folders.get(1).endsWith("desktop") ? "core,desktop" : "core");
        StringBuilder drop = new StringBuilder();
        for (Path d : options.dropInFolders) {
            drop.append(drop.length() == 0 ? "" : java.io.File.pathSeparator).append(d);
        }
        fw.put("redward.dropins", drop.toString());
        for (String key : conf.stringPropertyNames()) {
            fw.putIfAbsent(key, conf.getProperty(key));
        }

        FrameworkFactory factory = ServiceLoader.load(FrameworkFactory.class).iterator().next();
        Framework framework = factory.newFramework(fw);
        try {
            trace.mark("framework created");
            framework.start();
            trace.mark("framework started");
            BundleContext context = framework.getBundleContext();
            MainThreadExecutor mainThread = new MainThreadExecutor();
            Hashtable<String, Object> props = new Hashtable<>();
            props.put("redward.thread", "main");
            context.registerService(Executor.class, mainThread, props);

            List<Bundle> installed = install(context, folders, options.debug, err);
            trace.mark("bundles installed (" + installed.size() + ")");
            // one resolution for all the bundles instead of one per start (the outcome is the same:
            // a bundle that cannot resolve stays installed and its start reports why)
            framework.adapt(FrameworkWiring.class).resolveBundles(installed);
            trace.mark("bundles resolved");
            startAll(installed, options.debug, err, trace);
            trace.mark("bundles started");
            return dispatch(context, options, mainThread, err, trace);
        } finally {
            trace.mark("command done");
            try {
                framework.stop();
                framework.waitForStop(10_000);
                trace.mark("framework stopped");
            } catch (Exception e) {
                if (options.debug) {
                    e.printStackTrace(err);
                }
            }
            deleteTree(storage);
        }
    }

    private static int dispatch(BundleContext context, Options options, MainThreadExecutor mainThread, PrintStream err,
            StartupTrace trace) throws Exception {
        ServiceTracker<Object, Object> tracker = new ServiceTracker<>(context, FrameworkUtil.createFilter(CLI_FILTER), null);
        tracker.open();
        try {
            Object cli = tracker.waitForService(15_000);
            if (cli == null) {
                err.println("redward: the command dispatcher (bundle org.redward.cli) is not running; the product is incomplete");
                return 1;
            }
            trace.mark("dispatcher found");
            @SuppressWarnings("unchecked")
            Function<String[], Integer> function = (Function<String[], Integer>) cli;
            String[] commandLine = options.commandLine.toArray(new String[0]);
            AtomicInteger status = new AtomicInteger(1);
            AtomicReference<Throwable> failure = new AtomicReference<>();
            Thread worker = new Thread(() -> {
                try {
                    status.set(function.apply(commandLine));
                } catch (Throwable t) {
                    failure.set(t);
                }
            }, "redward-command");
            worker.start();
            mainThread.runUntil(() -> !worker.isAlive());
            worker.join();
            if (failure.get() != null) {
                err.println("redward: " + failure.get());
                if (options.debug) {
                    failure.get().printStackTrace(err);
                }
                return 1;
            }
            return status.get();
        } finally {
            tracker.close();
        }
    }

    /** Installs every jar of the folders, in folder order then name order; bad jars are reported and skipped. */
    static List<Bundle> install(BundleContext context, List<Path> folders, boolean debug, PrintStream err) {
        List<Bundle> out = new ArrayList<>();
        Map<String, Path> seen = new HashMap<>();
        for (Path folder : folders) {
            if (!Files.isDirectory(folder)) {
                continue;
            }
            List<Path> jars = new ArrayList<>();
            try (DirectoryStream<Path> ds = Files.newDirectoryStream(folder, "*.jar")) {
                ds.forEach(jars::add);
            } catch (IOException e) {
                err.println("redward: cannot list bundle folder " + folder + ": " + e.getMessage());
                continue;
            }
            jars.sort(Comparator.comparing(Path::toString));
            for (Path jar : jars) {
                String bsn;
                try (JarFile jf = new JarFile(jar.toFile())) {
                    Manifest mf = jf.getManifest();
                    bsn = mf == null ? null : mf.getMainAttributes().getValue(Constants.BUNDLE_SYMBOLICNAME);
                } catch (IOException e) {
                    err.println("redward: skipped " + jar + ": not a readable jar (" + e.getMessage() + ")");
                    continue;
                }
                if (bsn == null) {
                    err.println("redward: skipped " + jar + ": a plain jar, not an OSGi bundle (no Bundle-SymbolicName)");
                    continue;
                }
                String name = bsn.split(";")[0].trim();
                if (seen.containsKey(name)) {
                    err.println("redward: skipped " + jar + ": bundle " + name + " is already installed from " + seen.get(name));
                    continue;
                }
                try {
                    Bundle b = context.installBundle("reference:" + jar.toUri());
                    seen.put(name, jar);
                    out.add(b);
                } catch (BundleException | RuntimeException e) {
                    err.println("redward: skipped " + jar + ": " + oneLine(e));
                    if (debug) {
                        e.printStackTrace(err);
                    }
                }
            }
        }
        return out;
    }

    static void startAll(List<Bundle> bundles, boolean debug, PrintStream err, StartupTrace trace) {
        for (Bundle b : bundles) {
            if (b.getHeaders().get(Constants.FRAGMENT_HOST) != null) {
                continue;
            }
            try {
                b.start();
                if (trace.on()) {
                    trace.mark("  started " + b.getSymbolicName());
                }
            } catch (BundleException | RuntimeException e) {
                err.println("redward: bundle " + b.getSymbolicName() + " " + b.getVersion() + " did not start: " + oneLine(e));
                if (debug) {
                    e.printStackTrace(err);
                }
            }
        }
    }

    static String oneLine(Throwable e) {
        String m = e.getMessage();
        if (m == null || m.isBlank()) {
            m = e.getClass().getSimpleName();
        }
        return m.replaceAll("\\s+", " ").trim();
    }

    static Path productHome() {
        String h = System.getProperty("redward.home");
        if (h != null) {
            return Paths.get(h).toAbsolutePath();
        }
        try {
            Path jar = Paths.get(Main.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            return jar.getParent().getParent();
        } catch (Exception e) {
            return Paths.get("").toAbsolutePath();
        }
    }

    private static Properties loadConfiguration(Path home) {
        Properties p = new Properties();
        Path f = home.resolve("conf").resolve("redward.properties");
        if (Files.isRegularFile(f)) {
            try (InputStream in = Files.newInputStream(f)) {
                p.load(in);
            } catch (IOException e) {
                System.err.println("redward: cannot read " + f + ": " + e.getMessage());
            }
        }
        return p;
    }

    /**
     * Where this run's framework storage folder goes: the property {@code redward.storage.dir} if
     * set, else a memory-backed folder if there is one ({@code $XDG_RUNTIME_DIR}, then
     * {@code /dev/shm}), else the temporary folder. The storage is small (a few files per bundle,
     * plus the libraries some bundles embed), but a disk under load took 0.1-0.3 s just to delete
     * it at exit; on a memory-backed folder creating and deleting it is nearly free.
     */
    static Path storageParent() {
        String configured = System.getProperty("redward.storage.dir");
        if (configured != null && !configured.isBlank()) {
            return Paths.get(configured);
        }
        String runtime = System.getenv("XDG_RUNTIME_DIR");
        for (String candidate : new String[] {runtime, "/dev/shm"}) {
            if (candidate != null && !candidate.isBlank()) {
                Path p = Paths.get(candidate);
                if (Files.isDirectory(p) && Files.isWritable(p) && roomy(p)) {
                    return p;
                }
            }
        }
        return temporaryFolder();
    }

    /**
     * Free space a memory-backed folder must have to be used: a run's storage is a few MiB (5 MiB
     * for {@code measure}, more with the desktop bundles), and a container's {@code /dev/shm} is
     * often only 64 MiB and shared with other programs.
     */
    static final long STORAGE_ROOM_BYTES = 64L << 20;

    private static boolean roomy(Path p) {
        try {
            return Files.getFileStore(p).getUsableSpace() >= STORAGE_ROOM_BYTES;
        } catch (IOException | RuntimeException e) {
            return false;
        }
    }

    private static Path temporaryFolder() {
        return Paths.get(System.getProperty("java.io.tmpdir"));
    }

    /** This run's storage folder under {@link #storageParent()}; in the temporary folder if that one refuses it. */
    static Path createStorage() throws IOException {
        Path parent = storageParent();
        try {
            return Files.createTempDirectory(parent, "redward-felix-");
        } catch (IOException e) {
            if (parent.equals(temporaryFolder()) || System.getProperty("redward.storage.dir") != null) {
                throw new IOException("cannot create the framework storage folder in " + parent + ": " + e.getMessage(), e);
            }
            return Files.createTempDirectory(temporaryFolder(), "redward-felix-");
        }
    }

    /** Deletes a folder tree (plain recursion: no streams or lambdas, which cost time to set up at exit). */
    private static void deleteTree(Path root) {
        deleteTree(root.toFile());
    }

    private static void deleteTree(java.io.File f) {
        java.io.File[] children = f.listFiles();
        if (children != null) {
            for (java.io.File c : children) {
                if (!Files.isSymbolicLink(c.toPath())) {
                    deleteTree(c);
                } else {
                    c.delete();
                }
            }
        }
        f.delete(); // a leftover temporary file is harmless
    }
}
