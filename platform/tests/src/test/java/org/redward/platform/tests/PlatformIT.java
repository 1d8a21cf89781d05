package org.redward.platform.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.jar.Attributes;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The platform as a user meets it: plugins, drop-in bundles, bad input reported in one line. */
class PlatformIT {

    @TempDir
    Path temp;

    @Test
    void pluginsListsBundlesAndServiceFamilies() throws Exception {
        Product.Run r = Product.run("plugins", "--json");
        assertEquals(0, r.status(), r.toString());
        String json = r.out().trim();
        assertTrue(json.startsWith("{") && json.endsWith("}"), r.toString());
        for (String key : new String[] {"\"bundles\"", "\"services\"", "\"symbolic_name\":\"org.redward.cli\"",
                "\"symbolic_name\":\"org.apache.felix.scr\"", "\"estimators\"", "\"readers\"", "\"sha256\""}) {
            assertTrue(json.contains(key), key + " missing in " + json);
        }
        assertFalse(json.contains("\"state\":\"installed\""), "every product bundle resolves: " + json);
    }

    @Test
    void verifyAcceptsTheProductAsBuilt() throws Exception {
        Product.Run r = Product.run("plugins", "--verify");
        assertEquals(0, r.status(), r.toString());
        assertTrue(r.out().contains("match the checksums"), r.toString());
    }

    @Test
    void dropInEstimatorAppearsAndDisappearsWithoutRebuilding() throws Exception {
        Path drop = Files.createDirectories(temp.resolve("drop"));
        Path jar = Path.of(System.getProperty("redward.example.jar"));
        Files.copy(jar, drop.resolve(jar.getFileName()));
        Product.Run with = Product.run("plugins", "--json", "--bundles", drop.toString());
        assertEquals(0, with.status(), with.toString());
        assertTrue(with.out().contains("\"id\":\"example-brightest-line\""), with.toString());
        assertTrue(with.out().contains(drop.toString()), "the drop-in folder is named as the bundle's origin");
        // the dropped-in estimator measures a real spectrum (SDSS, published z = 0.0674; see realdata/truth.tsv)
        Path spectrum = org.redward.testkit.SharedData.realData().resolve("spec-0266-51630-0168.fits");
        Product.Run measured = Product.run("measure", "--json", "--estimator", "example-brightest-line",
                "--bundles", drop.toString(), spectrum.toString());
        assertEquals(0, measured.status(), measured.toString());
        assertTrue(measured.out().contains("\"estimator\":\"example-brightest-line\""), measured.toString());
        assertTrue(measured.out().contains("\"status\":\"ok\""), measured.toString());

        Files.delete(drop.resolve(jar.getFileName()));
        Product.Run without = Product.run("plugins", "--json", "--bundles", drop.toString());
        assertEquals(0, without.status(), without.toString());
        assertFalse(without.out().contains("example-brightest-line"), without.toString());
        Product.Run gone = Product.run("measure", "--json", "--estimator", "example-brightest-line",
                "--bundles", drop.toString(), spectrum.toString());
        assertEquals(2, gone.status(), gone.toString());
        assertTrue(gone.err().contains("--estimator example-brightest-line: unknown"), gone.toString());
    }

    @Test
    void badInputGivesOneClearLineAndTheRestGoesOn() throws Exception {
        Product.Run unknown = Product.run("frobnicate");
        assertEquals(2, unknown.status());
        assertTrue(unknown.err().contains("unknown command 'frobnicate'"), unknown.toString());

        Product.Run option = Product.run("plugins", "--frobnicate");
        assertEquals(2, option.status());
        assertTrue(option.err().contains("--frobnicate"), option.toString());

        Product.Run missing = Product.run("plugins", "--bundles", temp.resolve("nowhere").toString());
        assertEquals(2, missing.status());
        assertTrue(missing.err().contains("does not exist"), missing.toString());

        Path drop = Files.createDirectories(temp.resolve("bad"));
        Files.writeString(drop.resolve("corrupt.jar"), "not a zip");
        writeJar(drop.resolve("plain.jar"), null);
        writeJar(drop.resolve("broken.jar"), "test.Missing");
        writeComponentJar(drop.resolve("component.jar"));
        Files.copy(Path.of(System.getProperty("redward.example.jar")), drop.resolve("example.jar"));
        Product.Run bad = Product.run("plugins", "--json", "--bundles", drop.toString());
        assertEquals(0, bad.status(), bad.toString());
        assertTrue(bad.err().contains("corrupt.jar: not a readable jar"), bad.toString());
        assertTrue(bad.err().contains("plain.jar: a plain jar, not an OSGi bundle"), bad.toString());
        assertTrue(bad.err().contains("test.broken 1.0.0 did not start"), bad.toString());
        assertTrue(bad.err().contains("redward: bundle test.component"), "a failing DS component is named: " + bad);
        assertTrue(bad.out().contains("example-brightest-line"), "the good bundle beside the bad ones works: " + bad);
        for (String line : (bad.err() + unknown.err() + option.err() + missing.err()).split("\n")) {
            assertFalse(line.startsWith("\tat "), "no stack trace without --debug: " + bad);
        }
    }

    @Test
    void everyCommandAnswersHelp() throws Exception {
        for (String c : new String[] {"demo", "info", "measure", "compare", "lines", "distance", "plugins", "templates", "workbench"}) {
            Product.Run r = Product.run(c, "--help");
            assertTrue(r.status() == 0 || r.status() == 3, c + ": " + r);
            if (r.status() == 3) {
                assertTrue(r.err().contains("not available in this installation"), c + ": " + r);
            } else {
                assertTrue(r.out().toLowerCase(java.util.Locale.ROOT).contains("usage"), c + ": " + r);
            }
        }
    }

    /** A bundle whose only DS component cannot be activated (its class does not exist). */
    private static void writeComponentJar(Path file) throws Exception {
        Manifest mf = new Manifest();
        Attributes a = mf.getMainAttributes();
        a.put(Attributes.Name.MANIFEST_VERSION, "1.0");
        a.putValue("Bundle-ManifestVersion", "2");
        a.putValue("Bundle-SymbolicName", "test.component");
        a.putValue("Bundle-Version", "1.0.0");
        a.putValue("Service-Component", "OSGI-INF/bad.xml");
        try (JarOutputStream out = new JarOutputStream(Files.newOutputStream(file), mf)) {
            out.putNextEntry(new java.util.jar.JarEntry("OSGI-INF/bad.xml"));
            out.write(("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                    + "<scr:component xmlns:scr=\"http://www.osgi.org/xmlns/scr/v1.3.0\" name=\"bad\" immediate=\"true\">"
                    + "<implementation class=\"test.component.Missing\"/></scr:component>\n").getBytes(java.nio.charset.StandardCharsets.UTF_8));
            out.closeEntry();
        }
    }

    private static void writeJar(Path file, String activator) throws Exception {
        Manifest mf = new Manifest();
        Attributes a = mf.getMainAttributes();
        a.put(Attributes.Name.MANIFEST_VERSION, "1.0");
        if (activator != null) {
            a.putValue("Bundle-ManifestVersion", "2");
            a.putValue("Bundle-SymbolicName", "test.broken");
            a.putValue("Bundle-Version", "1.0.0");
            a.putValue("Bundle-Activator", activator);
        }
        try (JarOutputStream out = new JarOutputStream(Files.newOutputStream(file), mf)) {
            out.flush();
        }
    }
}
