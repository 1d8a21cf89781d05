package org.redward.spark;

import java.io.IOException;
import java.io.InputStream;
import java.net.URL;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Enumeration;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.jar.JarFile;
import java.util.jar.Manifest;
import java.util.stream.Stream;

import org.apache.felix.framework.FrameworkFactory;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.BundleException;
import org.osgi.framework.Constants;
import org.osgi.framework.FrameworkUtil;
import org.osgi.framework.launch.Framework;
import org.osgi.util.tracker.ServiceTracker;

/**
 * One embedded Redward platform per JVM (a Spark driver or executor): Apache Felix booted lazily
 * under a lock on first use, with the bundles of one folder installed and started. The Redward
 * API packages ({@code org.redward.api.*}, {@code org.redward.spectrum}) come from this JVM's
 * class path and are exported by the system bundle, so that the job and the bundles share the
 * same API classes; the API jars in the bundle folder are therefore skipped.
 *
 * <p>Thread-safe. A shutdown hook stops the framework and deletes its storage.
 */
public final class EmbeddedRedward {

    /** Bundles that the system bundle provides instead (their packages come from the class path). */
    static final List<String> FROM_CLASS_PATH = List.of("org.redward.api", "org.redward.spectrum", "org.apache.felix.framework");

    private static EmbeddedRedward instance;

    private final Framework framework;
    private final Path bundleFolder;
    private final List<String> problems;
    private final double bootSeconds;

    private EmbeddedRedward(Framework framework, Path bundleFolder, List<String> problems, double bootSeconds) {
        this.framework = framework;
        this.bundleFolder = bundleFolder;
        this.problems = problems;
        this.bootSeconds = bootSeconds;
    }

    /**
     * The platform of this JVM, booted from {@code bundleFolder} on first call. Later calls
     * return the same platform whatever folder they name.
     */
    public static synchronized EmbeddedRedward get(Path bundleFolder) {
        if (instance == null) {
            instance = boot(bundleFolder);
        }
        return instance;
    }

    /** Seconds the framework took to boot in this JVM. */
    public double bootSeconds() {
        return bootSeconds;
    }

    /** Bundles that failed to install or start, one line each (empty when all is well). */
    public List<String> problems() {
        return problems;
    }

    /**
     * A service of the given type, waiting up to 15 s for it to appear.
     *
     * @throws IllegalStateException naming the bundles that failed, when the service never appears
     */
    public <T> T service(Class<T> type, String filter) {
        BundleContext bc = framework.getBundleContext();
        try {
            String f = "(&(objectClass=" + type.getName() + ")" + (filter == null ? "" : filter) + ")";
            ServiceTracker<T, T> tracker = new ServiceTracker<>(bc, FrameworkUtil.createFilter(f), null);
            tracker.open(true);
            Object found = tracker.waitForService(15_000);
            if (found != null && !type.isInstance(found)) {
                throw new IllegalStateException(type.getName() + " of the bundles (loaded by " + found.getClass().getClassLoader()
                        + ") is not the class of the job (loaded by " + type.getClassLoader() + "): the API jar is installed twice?");
            }
            T s = type.cast(found);
            if (s == null) {
                throw new IllegalStateException("no " + type.getSimpleName() + (filter == null ? "" : " " + filter)
                        + " service in the embedded platform booted from " + bundleFolder
                        + (problems.isEmpty() ? " (is its bundle in that folder?)" : "; problems: " + String.join("; ", problems))
                        + notActive());
            }
            return s;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for " + type.getName(), e);
        } catch (org.osgi.framework.InvalidSyntaxException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
    }

    /** The bundles that are not active, with the reason the framework gives when it cannot resolve them. */
    private String notActive() {
        StringBuilder sb = new StringBuilder();
        for (Bundle b : framework.getBundleContext().getBundles()) {
            if (b.getState() != Bundle.ACTIVE && b.getHeaders().get(Constants.FRAGMENT_HOST) == null) {
                String why = "";
                try {
                    b.start();
                } catch (BundleException e) {
                    why = ": " + e.getMessage();
                }
                sb.append("; bundle ").append(b.getSymbolicName()).append(" is not active").append(why);
            }
        }
        try {
            org.osgi.framework.ServiceReference<?>[] refs = framework.getBundleContext().getAllServiceReferences(null, null);
            int n = refs == null ? 0 : refs.length;
            sb.append("; ").append(n).append(" services registered");
            if (Boolean.getBoolean("redward.spark.debug") && refs != null) {
                for (org.osgi.framework.ServiceReference<?> r : refs) {
                    sb.append("\n  ").append(java.util.Arrays.toString((String[]) r.getProperty(Constants.OBJECTCLASS)))
                            .append(" from ").append(r.getBundle().getSymbolicName());
                }
            }
        } catch (org.osgi.framework.InvalidSyntaxException e) {
            // cannot happen without a filter
        }
        return sb.toString();
    }

    private static EmbeddedRedward boot(Path folder) {
        long t0 = System.nanoTime();
        if (!Files.isDirectory(folder)) {
            throw new IllegalStateException("bundle folder " + folder.toAbsolutePath() + " does not exist on this machine"
                    + " (ship it with --archives bundles.zip#bundles)");
        }
        try {
            Path storage = Files.createTempDirectory("redward-spark-felix-");
            Map<String, String> props = new HashMap<>();
            props.put(Constants.FRAMEWORK_STORAGE, storage.toString());
            props.put(Constants.FRAMEWORK_STORAGE_CLEAN, Constants.FRAMEWORK_STORAGE_CLEAN_ONFIRSTINIT);
            props.put("felix.service.urlhandlers", "false");
            props.put("felix.log.level", "1");
            props.put("ds.loglevel", "error");
            props.put(Constants.FRAMEWORK_SYSTEMPACKAGES_EXTRA, apiExports());
            Framework fw = new FrameworkFactory().newFramework(props);
            fw.start();
            List<String> problems = new ArrayList<>();
            List<Bundle> installed = new ArrayList<>();
            List<Path> jars = new ArrayList<>();
            try (DirectoryStream<Path> ds = Files.newDirectoryStream(folder, "*.jar")) {
                ds.forEach(jars::add);
            }
            jars.sort(Comparator.comparing(Path::toString));
            for (Path jar : jars) {
                String bsn = symbolicName(jar);
                if (bsn == null) {
                    problems.add(jar.getFileName() + " is not a bundle");
                    continue;
                }
                if (FROM_CLASS_PATH.contains(bsn)) {
                    continue;
                }
                try {
                    installed.add(fw.getBundleContext().installBundle(jar.toUri().toString()));
                } catch (BundleException e) {
                    problems.add(jar.getFileName() + ": " + e.getMessage());
                }
            }
            for (Bundle b : installed) {
                if (b.getHeaders().get(Constants.FRAGMENT_HOST) == null) {
                    try {
                        b.start();
                    } catch (BundleException e) {
                        problems.add("bundle " + b.getSymbolicName() + " did not start: " + e.getMessage());
                    }
                }
            }
            Runtime.getRuntime().addShutdownHook(new Thread(() -> {
                try {
                    fw.stop();
                    fw.waitForStop(10_000);
                } catch (Exception e) {
                    // the JVM is going away
                }
                deleteTree(storage);
            }, "redward-felix-stop"));
            return new EmbeddedRedward(fw, folder, List.copyOf(problems), (System.nanoTime() - t0) / 1e9);
        } catch (IOException | BundleException e) {
            throw new IllegalStateException("cannot boot the embedded platform from " + folder + ": " + e.getMessage(), e);
        }
    }

    /** The Export-Package clauses of the Redward API jars on this JVM's class path. */
    static String apiExports() throws IOException {
        Map<String, String> found = new LinkedHashMap<>();
        Enumeration<URL> manifests = EmbeddedRedward.class.getClassLoader().getResources(JarFile.MANIFEST_NAME);
        while (manifests.hasMoreElements()) {
            try (InputStream in = manifests.nextElement().openStream()) {
                Manifest mf = new Manifest(in);
                String bsn = mf.getMainAttributes().getValue(Constants.BUNDLE_SYMBOLICNAME);
                if (bsn != null && FROM_CLASS_PATH.subList(0, 2).contains(bsn.split(";")[0].trim())) {
                    found.put(bsn, mf.getMainAttributes().getValue(Constants.EXPORT_PACKAGE));
                }
            }
        }
        if (found.size() < 2) {
            throw new IllegalStateException("the Redward API jars (org.redward.api, org.redward.spectrum) are not on the class path"
                    + " (found " + found.keySet() + "); pass them with --jars");
        }
        List<String> clauses = new ArrayList<>();
        for (String header : found.values()) {
            for (String clause : splitOutsideQuotes(header, ',')) {
                List<String> parts = splitOutsideQuotes(clause, ';');
                String version = "0.0.0";
                List<String> packages = new ArrayList<>();
                for (String p : parts) {
                    String t = p.trim();
                    if (t.startsWith("version=")) {
                        version = t.substring("version=".length()).replace("\"", "");
                    } else if (!t.contains("=")) {
                        packages.add(t);
                    }
                }
                for (String pkg : packages) {
                    clauses.add(pkg + ";version=" + version);
                }
            }
        }
        return String.join(",", clauses);
    }

    static List<String> splitOutsideQuotes(String s, char separator) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean quoted = false;
        for (char c : s.toCharArray()) {
            if (c == '"') {
                quoted = !quoted;
            }
            if (c == separator && !quoted) {
                out.add(cur.toString());
                cur.setLength(0);
            } else {
                cur.append(c);
            }
        }
        if (cur.length() > 0) {
            out.add(cur.toString());
        }
        return out;
    }

    private static String symbolicName(Path jar) {
        try (JarFile jf = new JarFile(jar.toFile())) {
            Manifest mf = jf.getManifest();
            String bsn = mf == null ? null : mf.getMainAttributes().getValue(Constants.BUNDLE_SYMBOLICNAME);
            return bsn == null ? null : bsn.split(";")[0].trim();
        } catch (IOException e) {
            return null;
        }
    }

    private static void deleteTree(Path root) {
        try (Stream<Path> s = Files.walk(root)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // harmless
        }
    }
}
