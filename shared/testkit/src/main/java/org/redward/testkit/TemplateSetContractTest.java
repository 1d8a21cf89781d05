package org.redward.testkit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;
import org.redward.api.templates.TemplateSets;
import org.redward.spectrum.ObjectClass;

/**
 * The conformance kit for template sets: extend it, return your set from
 * {@link #createTemplateSet()}, and run it with JUnit 5. Our own sets run it, and so can a
 * research group against the set it ships as a bundle.
 *
 * <p>What it checks: the id is usable on the command line; the version is given; the checksum
 * follows the one rule of {@link TemplateSets#checksum(List)}, is stable across two creations
 * (determinism) and changes when any flux value, wavelength or class changes; there is at least
 * one template, the ids are unique and every class is galaxy, quasar or star; wavelengths are
 * finite, strictly increasing, plausible rest-frame Angstrom (100 to 10^6) and contiguous (no
 * step more than 5 times the typical one, as the template extender requires); flux is finite
 * and not zero everywhere; the set cannot be changed through what it returns; concurrent readers
 * see the same data. Vacuum wavelengths cannot be told from air ones in general: list known
 * features in {@link #expectedFeatures()} (with a tolerance finer than the 1.8 Angstrom
 * air-vacuum difference near H-alpha, where the sampling allows) to check them.
 *
 * <p>The set is created once for the class (and once more to check stability), since loading a
 * large set can take a while.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
public abstract class TemplateSetContractTest {

    /** A feature a template of a class must show: its peak (emission) or trough (absorption) within tolerance. */
    public record ExpectedFeature(ObjectClass objectClass, String subclassOrEmpty, String name,
            double restVacuumAngstrom, boolean emission, double searchHalfWidthAngstrom, double toleranceAngstrom, String source) {
    }

    /** A fresh instance of the set under test (called more than once). */
    protected abstract TemplateSet createTemplateSet() throws Exception;

    /** Features to locate; none by default. Name each one's source. */
    protected List<ExpectedFeature> expectedFeatures() {
        return List.of();
    }

    private TemplateSet set;

    @BeforeAll
    void create() throws Exception {
        set = createTemplateSet();
        assertNotNull(set, "createTemplateSet() returned null");
    }

    @Test
    void idIsUsableOnTheCommandLine() {
        assertNotNull(set.id());
        assertTrue(set.id().matches("[A-Za-z0-9][A-Za-z0-9._-]*"),
                "id '" + set.id() + "' must be letters, digits, '.', '_' or '-'");
    }

    @Test
    void versionIsGiven() {
        assertNotNull(set.version());
        assertFalse(set.version().isBlank(), "version is blank");
    }

    @Test
    void checksumFollowsTheRule() {
        assertTrue(set.checksum().matches("[0-9a-f]{64}"), "checksum must be 64 lower-case hex digits: " + set.checksum());
        assertEquals(TemplateSets.checksum(set.templates()), set.checksum(),
                "checksum() must be TemplateSets.checksum(templates())");
    }

    @Test
    void checksumIsStable() throws Exception {
        assertEquals(set.checksum(), createTemplateSet().checksum(), "two creations of the same set differ");
    }

    @Test
    void checksumIsSensitiveToTheData() {
        List<Template> ts = set.templates();
        Template t = ts.get(ts.size() / 2);
        double[] f = t.flux();
        int mid = f.length / 2;
        f[mid] = f[mid] == 0 ? 1e-30 : Math.nextUp(f[mid]);
        assertNotEquals(set.checksum(), TemplateSets.checksum(replace(ts, t,
                Template.of(t.id(), t.objectClass(), t.subclass(), t.restVacuumAngstrom(), f))), "one flux value changed by one ulp");
        double[] w = t.restVacuumAngstrom();
        w[w.length - 1] = Math.nextUp(w[w.length - 1]);
        assertNotEquals(set.checksum(), TemplateSets.checksum(replace(ts, t,
                Template.of(t.id(), t.objectClass(), t.subclass(), w, t.flux()))), "one wavelength changed by one ulp");
        ObjectClass other = t.objectClass() == ObjectClass.STAR ? ObjectClass.GALAXY : ObjectClass.STAR;
        assertNotEquals(set.checksum(), TemplateSets.checksum(replace(ts, t,
                Template.of(t.id(), other, t.subclass(), t.restVacuumAngstrom(), t.flux()))), "class changed");
    }

    private static List<Template> replace(List<Template> ts, Template old, Template neu) {
        List<Template> out = new ArrayList<>(ts);
        out.set(out.indexOf(old), neu);
        return out;
    }

    @Test
    void templatesAreNamedUniquelyAndClassified() {
        assertFalse(set.templates().isEmpty(), "no templates");
        Set<String> ids = new HashSet<>();
        for (Template t : set.templates()) {
            assertTrue(ids.add(t.id()), "two templates named " + t.id());
            assertTrue(t.objectClass() == ObjectClass.GALAXY || t.objectClass() == ObjectClass.QUASAR
                    || t.objectClass() == ObjectClass.STAR, t.id() + ": class " + t.objectClass() + " is not galaxy, quasar or star");
            assertNotNull(t.subclass(), t.id() + ": subclass is null");
        }
    }

    @Test
    void wavelengthsArePlausibleRestFrameAngstromWithoutGaps() {
        for (Template t : set.templates()) {
            double[] w = t.restVacuumAngstrom();
            assertTrue(w.length >= 10, t.id() + ": fewer than 10 pixels");
            assertTrue(w[0] >= 100 && w[w.length - 1] <= 1e6, String.format(Locale.ROOT,
                    "%s: %.4g to %.4g Angstrom: not rest-frame Angstrom?", t.id(), w[0], w[w.length - 1]));
            for (int i = 1; i < w.length; i++) {
                assertTrue(Double.isFinite(w[i]) && w[i] > w[i - 1], t.id() + ": wavelengths not strictly increasing at pixel " + i);
            }
            int gap = TemplateSets.firstGap(w);
            assertTrue(gap < 0, () -> String.format(Locale.ROOT, "%s: gap from %.2f to %.2f Angstrom", t.id(), w[gap], w[gap + 1]));
        }
    }

    @Test
    void fluxIsFiniteAndNotZeroEverywhere() {
        for (Template t : set.templates()) {
            boolean any = false;
            for (double v : t.flux()) {
                assertTrue(Double.isFinite(v), t.id() + ": non-finite flux");
                any |= v != 0;
            }
            assertTrue(any, t.id() + ": flux is zero everywhere");
        }
    }

    @Test
    void cannotBeChangedThroughWhatItReturns() {
        String before = set.checksum();
        List<Template> ts = set.templates();
        try {
            ts.clear();
        } catch (UnsupportedOperationException expected) {
            // an unmodifiable list is the usual answer
        }
        Template t = set.templates().get(0);
        double[] f = t.flux();
        Arrays.fill(f, 42.0);
        double[] w = t.restVacuumAngstrom();
        Arrays.fill(w, 1.0);
        assertFalse(set.templates().isEmpty(), "clearing the returned list emptied the set");
        assertNotEquals(42.0, set.templates().get(0).flux()[0], "the returned flux array is the template's own");
        assertEquals(before, TemplateSets.checksum(set.templates()), "the data changed through a returned object");
    }

    @Test
    void concurrentReadersSeeTheSameData() throws Exception {
        String expected = TemplateSets.checksum(set.templates());
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<String>> results = new ArrayList<>();
            for (int i = 0; i < 16; i++) {
                results.add(pool.submit(() -> TemplateSets.checksum(set.templates()) + "/" + set.checksum()));
            }
            for (Future<String> r : results) {
                assertEquals(expected + "/" + set.checksum(), r.get(60, TimeUnit.SECONDS));
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void expectedFeaturesAreWhereTheyShouldBe() {
        for (ExpectedFeature e : expectedFeatures()) {
            int checked = 0;
            for (Template t : set.templates()) {
                if (t.objectClass() != e.objectClass() || (!e.subclassOrEmpty().isEmpty() && !t.subclass().equals(e.subclassOrEmpty()))) {
                    continue;
                }
                double[] w = t.restVacuumAngstrom();
                double[] f = t.flux();
                int best = -1;
                for (int i = 0; i < w.length; i++) {
                    if (Math.abs(w[i] - e.restVacuumAngstrom()) <= e.searchHalfWidthAngstrom()
                            && (best < 0 || (e.emission() ? f[i] > f[best] : f[i] < f[best]))) {
                        best = i;
                    }
                }
                if (best < 0) {
                    continue;
                }
                double at = peak(w, f, best);
                checked++;
                System.out.printf(Locale.ROOT, "%s %s: %s expected at %.3f, found at %.3f Angstrom (tolerance %.2f; %s)%n",
                        set.id(), t.id(), e.name(), e.restVacuumAngstrom(), at, e.toleranceAngstrom(), e.source());
                assertEquals(e.restVacuumAngstrom(), at, e.toleranceAngstrom(), String.format(Locale.ROOT,
                        "%s: %s (%s) found at %.2f Angstrom", t.id(), e.name(), e.source(), at));
            }
            if (checked == 0) {
                fail("no template of class " + e.objectClass().key() + " covers " + e.name());
            }
        }
    }

    /** The extremum refined by a parabola through the three pixels around it (common practice). */
    private static double peak(double[] w, double[] f, int i) {
        if (i <= 0 || i >= w.length - 1) {
            return w[i];
        }
        double a = f[i - 1];
        double b = f[i];
        double c = f[i + 1];
        double d = a - 2 * b + c;
        if (d == 0) {
            return w[i];
        }
        double off = 0.5 * (a - c) / d;
        return w[i] + off * 0.5 * (w[i + 1] - w[i - 1]);
    }
}
