package org.redward.platform.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.jar.Attributes;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.testkit.SharedData;

/** The lines command, the standard line list and data-only line-list bundles inside the real product. */
class LinesIT {

    @TempDir
    Path temp;

    /**
     * spec-0266-51630-0168 (SDSS public data release; published z = 0.06740563 in truth.tsv):
     * H-alpha near 7007 A, line-based z within 100 km/s of the published one.
     */
    @Test
    void linesOfARealSpectrum() throws Exception {
        Path file = SharedData.realData().resolve("spec-0266-51630-0168.fits");
        Product.Run r = Product.run("lines", file.toString(), "--json");
        assertEquals(0, r.status(), r.toString());
        String ha = r.out().lines().filter(l -> l.contains("\"line\":\"H-alpha\"")).findFirst().orElseThrow(() -> new AssertionError(r.toString()));
        Matcher m = Pattern.compile("\"adopted_z\":([0-9.eE-]+)").matcher(ha);
        assertTrue(m.find(), ha);
        double z = Double.parseDouble(m.group(1));
        assertEquals(0.06740563, z, 100 / 299792.458 * 1.0674);
    }

    /** A research group's list as a bundle of data only: it appears as a line list and can be used by id. */
    @Test
    void dataOnlyLineListBundle() throws Exception {
        Path drop = Files.createDirectories(temp.resolve("drop"));
        Manifest mf = new Manifest();
        Attributes a = mf.getMainAttributes();
        a.put(Attributes.Name.MANIFEST_VERSION, "1.0");
        a.putValue("Bundle-ManifestVersion", "2");
        a.putValue("Bundle-SymbolicName", "org.example.lines.nebular");
        a.putValue("Bundle-Version", "1.0.0");
        a.putValue("Redward-LineLists", "lists/nebular.tsv");
        String list = "@id\tnebular-test\n@version\t2.1\n@description\tan invented group's list of three nebular lines\n"
                + "H-alpha\t6564.614\temission\t-\t-\t1\tno\tREFERENCES.md section 2\n"
                + "[N II] 6585\t6585.27\temission\t-\t-\t0.8\tno\tREFERENCES.md section 2\n"
                + "[S II] 6718\t6718.29\temission\t-\t-\t0.7\tno\tREFERENCES.md section 2\n";
        try (OutputStream o = Files.newOutputStream(drop.resolve("nebular.jar")); JarOutputStream j = new JarOutputStream(o, mf)) {
            j.putNextEntry(new JarEntry("lists/nebular.tsv"));
            j.write(list.getBytes(StandardCharsets.UTF_8));
            j.closeEntry();
        }
        Product.Run plugins = Product.run("plugins", "--json", "--bundles", drop.toString());
        assertEquals(0, plugins.status(), plugins.toString());
        assertTrue(plugins.out().contains("\"id\":\"nebular-test\""), plugins.toString());
        assertTrue(plugins.out().contains("\"id\":\"standard\""), plugins.toString());

        Path file = SharedData.realData().resolve("spec-0266-51630-0168.fits");
        Product.Run r = Product.run("lines", file.toString(), "--list", "nebular-test", "--bundles", drop.toString());
        assertEquals(0, r.status(), r.toString());
        assertTrue(r.out().contains("line list nebular-test 2.1"), r.toString());
    }
}
