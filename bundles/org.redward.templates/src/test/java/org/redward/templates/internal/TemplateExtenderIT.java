package org.redward.templates.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.jar.JarFile;

import org.apache.felix.framework.FrameworkFactory;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.Constants;
import org.osgi.framework.ServiceReference;
import org.osgi.framework.launch.Framework;

/**
 * The extender inside a real Felix framework with Declarative Services and the built bundles:
 * a data-only bundle written by {@code templates pack} becomes a TemplateSet service in the data
 * bundle's name, goes away when the bundle goes, and a bad bundle is refused without stopping a
 * good one. API types live in the framework's class space, so this test looks only at service
 * properties (and finds services with getAllServiceReferences: the test's own copy of the API
 * classes is not the framework's).
 */
class TemplateExtenderIT {

    private static final String TEMPLATE_SET = "org.redward.api.templates.TemplateSet";

    @TempDir
    Path dir;
    private Framework framework;

    @BeforeEach
    void start() throws Exception {
        Map<String, String> cfg = new HashMap<>();
        cfg.put(Constants.FRAMEWORK_STORAGE, dir.resolve("felix").toString());
        cfg.put(Constants.FRAMEWORK_STORAGE_CLEAN, Constants.FRAMEWORK_STORAGE_CLEAN_ONFIRSTINIT);
        framework = new FrameworkFactory().newFramework(cfg);
        framework.start();
        BundleContext ctx = framework.getBundleContext();
        List<Bundle> installed = new ArrayList<>();
        for (String entry : System.getProperty("java.class.path").split(File.pathSeparator)) {
            Path p = Path.of(entry);
            String bsn = symbolicName(p);
            if (bsn != null && wanted(bsn)) {
                installed.add(ctx.installBundle("reference:" + p.toUri()));
            }
        }
        for (Bundle b : installed) {
            b.start();
        }
    }

    private static boolean wanted(String bsn) {
        return bsn.startsWith("org.redward.") || bsn.equals("org.apache.felix.scr") || bsn.startsWith("org.osgi.service.component")
                || bsn.startsWith("org.osgi.util.promise") || bsn.startsWith("org.osgi.util.function")
                || bsn.equals("info.picocli") || bsn.equals("picocli") || bsn.equals("org.apache.commons.math3");
    }

    private static String symbolicName(Path p) {
        try {
            if (Files.isDirectory(p)) {
                Path mf = p.resolve("META-INF/MANIFEST.MF");
                if (!Files.isRegularFile(mf)) {
                    return null;
                }
                try (var in = Files.newInputStream(mf)) {
                    return bsn(new java.util.jar.Manifest(in).getMainAttributes().getValue(Constants.BUNDLE_SYMBOLICNAME));
                }
            }
            if (!p.toString().endsWith(".jar") || !Files.isRegularFile(p)) {
                return null;
            }
            try (JarFile jf = new JarFile(p.toFile())) {
                return jf.getManifest() == null ? null : bsn(jf.getManifest().getMainAttributes().getValue(Constants.BUNDLE_SYMBOLICNAME));
            }
        } catch (Exception e) {
            return null;
        }
    }

    private static String bsn(String header) {
        return header == null ? null : header.split(";")[0].trim();
    }

    @AfterEach
    void stop() throws Exception {
        if (framework != null) {
            framework.stop();
            framework.waitForStop(10_000);
        }
    }

    private Path pack(String id, String content) throws Exception {
        Path f = dir.resolve(id + ".txt");
        Files.writeString(f, content, StandardCharsets.UTF_8);
        Path jar = dir.resolve(id + ".jar");
        TestContext ctx = new TestContext(dir);
        int rc = new TemplatesCommand().run(ctx, List.of("pack", f.toString(), "--id", id, "--class", "galaxy",
                "--medium", "vacuum", "--out", jar.toString()));
        assertEquals(0, rc, ctx.stderr());
        return jar;
    }

    private static String smooth(int n) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < n; i++) {
            sb.append(String.format(Locale.ROOT, "%.1f %.5f%n", 3000.0 + 2 * i, 1.0 + 0.1 * Math.sin(i / 10.0)));
        }
        return sb.toString();
    }

    private ServiceReference<?> find(String id) throws Exception {
        ServiceReference<?>[] refs = framework.getBundleContext().getAllServiceReferences(TEMPLATE_SET, "(redward.id=" + id + ")");
        return refs == null ? null : refs[0];
    }

    private ServiceReference<?> await(String id, boolean present) throws Exception {
        long end = System.nanoTime() + 10_000_000_000L;
        ServiceReference<?> r = find(id);
        while ((r != null) != present && System.nanoTime() < end) {
            Thread.sleep(20);
            r = find(id);
        }
        return r;
    }

    @Test
    void aPackedBundleBecomesAServiceAndGoesAwayWithIt() throws Exception {
        Path jar = pack("invented-set", smooth(2000));
        String checksum = TemplateSetLoader.loadJar(jar).get(0).set().checksum();
        Bundle data = framework.getBundleContext().installBundle("reference:" + jar.toUri());
        data.start();
        ServiceReference<?> ref = await("invented-set", true);
        assertNotNull(ref, "no TemplateSet service for the packed bundle");
        assertEquals(checksum, ref.getProperty("redward.templates.checksum"));
        assertEquals("1.0.0", ref.getProperty("redward.templates.version"));
        assertEquals("redward.templates.invented-set", ref.getBundle().getSymbolicName(), "registered in the data bundle's name");
        // the template registry of org.redward.registry sees it too
        ServiceReference<?> registry = framework.getBundleContext().getAllServiceReferences("org.redward.api.templates.TemplateRegistry", null)[0];
        Object broker = framework.getBundleContext().getService(registry);
        assertTrue(broker.getClass().getMethod("ids").invoke(broker).toString().contains("invented-set"));
        data.uninstall();
        assertEquals(null, await("invented-set", false), "the service outlived its bundle");
    }

    @Test
    void aBadBundleIsRefusedAndAGoodOneGoesOn() throws Exception {
        Path good = pack("good-set", smooth(500));
        // a valid bundle whose data file is then replaced by one with a gap, as a careless edit would do
        Path bad = pack("gappy-set", smooth(500));
        Path edited = dir.resolve("gappy-edited.jar");
        try (var in = new java.util.jar.JarInputStream(Files.newInputStream(bad));
                var out = new java.util.jar.JarOutputStream(Files.newOutputStream(edited), in.getManifest())) {
            java.util.jar.JarEntry e;
            while ((e = in.getNextJarEntry()) != null) {
                out.putNextEntry(new java.util.jar.JarEntry(e.getName()));
                if (e.getName().endsWith(".txt")) {
                    out.write(smooth(250).concat(smooth(250).replaceAll("(?m)^3", "7")).getBytes(StandardCharsets.UTF_8));
                } else {
                    out.write(in.readAllBytes());
                }
                out.closeEntry();
            }
        }
        java.io.ByteArrayOutputStream err = new java.io.ByteArrayOutputStream();
        java.io.PrintStream old = System.err;
        System.setErr(new java.io.PrintStream(err, true, StandardCharsets.UTF_8));
        try {
            Bundle b1 = framework.getBundleContext().installBundle("reference:" + edited.toUri());
            Bundle b2 = framework.getBundleContext().installBundle("reference:" + good.toUri());
            b1.start();
            b2.start();
            assertNotNull(await("good-set", true));
            Thread.sleep(200);
            assertEquals(null, find("gappy-set"));
        } finally {
            System.setErr(old);
        }
        String msg = err.toString(StandardCharsets.UTF_8);
        System.out.println("extender said: " + msg.trim());
        assertTrue(msg.contains("redward.templates.gappy-set") && msg.contains("templates/gappy-set.txt") && msg.contains("gap"), msg);
    }
}
