package org.redward.templates.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.jar.JarFile;

import org.junit.jupiter.api.Test;
import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.ObjectClass;

/** {@code templates pack} over the published templates: the bundle's shape and facts of the sources. */
class PublishedTemplatesPackTest {

    @Test
    void packedBundleIsADataOnlyBundle() throws Exception {
        try (JarFile jf = new JarFile(PublishedTemplates.jar().toFile())) {
            var a = jf.getManifest().getMainAttributes();
            assertEquals("2", a.getValue("Bundle-ManifestVersion"));
            assertEquals("redward.templates." + PublishedTemplates.ID, a.getValue("Bundle-SymbolicName"));
            assertEquals("1.0.0", a.getValue("Bundle-Version"));
            assertEquals("templates/" + PublishedTemplates.ID + ".properties", a.getValue(TemplateSet.BUNDLE_HEADER));
            assertTrue(jf.stream().noneMatch(e -> e.getName().endsWith(".class")), "a data-only bundle holds no code");
        }
        System.out.println(PublishedTemplates.packOutput());
    }

    @Test
    void classesAndCountsFollowTheSources() throws Exception {
        TemplateSet s = PublishedTemplates.set();
        // shared/templates README: 12 galaxy files (Kinney 1996, Calzetti 1994), 26 Pickles 1998 types, 1 composite
        assertEquals(12, s.templates().stream().filter(t -> t.objectClass() == ObjectClass.GALAXY).count());
        assertEquals(26, s.templates().stream().filter(t -> t.objectClass() == ObjectClass.STAR).count());
        assertEquals(1, s.templates().stream().filter(t -> t.objectClass() == ObjectClass.QUASAR).count());
    }

    @Test
    void picklesSpectraAreNormalisedNearFiveThousandFiveHundredFiftySixAngstrom() throws Exception {
        // Pickles (1998) spectra are normalised to 1 at 5556 A (shared/templates README). Single pixels there
        // stray by up to 30% in M stars (molecular bands), so the check is on the mean over 5531-5581 A air
        // (vacuum 5532.5-5582.5, Morton 2000), within 0.10: it shows that the right column and unit were read.
        TemplateSet s = PublishedTemplates.set();
        int checked = 0;
        for (Template t : s.templates()) {
            if (t.objectClass() != ObjectClass.STAR) {
                continue;
            }
            double[] w = t.restVacuumAngstrom();
            double[] f = t.flux();
            double sum = 0;
            int n = 0;
            for (int i = 0; i < w.length; i++) {
                if (w[i] >= 5532.0 && w[i] <= 5583.0) {
                    sum += f[i];
                    n++;
                }
            }
            assertEquals(1.0, sum / n, 0.10, t.id() + " mean flux near 5556 A (air)");
            checked++;
        }
        assertEquals(26, checked);
    }

    @Test
    void packingTwiceGivesTheSameChecksum() throws Exception {
        List<TemplateSetLoader.Loaded> a = TemplateSetLoader.loadJar(PublishedTemplates.jar());
        List<TemplateSetLoader.Loaded> b = TemplateSetLoader.loadJar(PublishedTemplates.jar());
        assertEquals(a.get(0).set().checksum(), b.get(0).set().checksum());
    }
}
