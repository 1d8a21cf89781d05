package org.redward.testkit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.ObjectClass;

/**
 * The conformance kit every template set runs (ours, data-only bundles', third parties'): extend
 * it and return the set. It checks identity (id, version, a SHA-256 checksum that is stable),
 * unique template ids, known classes, rest-frame vacuum wavelengths in a plausible range
 * (100 A to 100 microns) and non-trivial flux, immutability, and (optionally) which classes the
 * set must cover.
 */
public abstract class TemplateSetContractTest {

    protected abstract TemplateSet templateSet();

    /** Classes the set must hold at least one template of (default: none required). */
    protected Set<ObjectClass> requiredClasses() {
        return Set.of();
    }

    @Test
    void identity() {
        TemplateSet s = templateSet();
        assertFalse(s.id() == null || s.id().isBlank(), "an id");
        assertFalse(s.version() == null || s.version().isBlank(), "a version");
        assertTrue(s.checksum() != null && s.checksum().matches("[0-9a-f]{64}"), "checksum is 64 lower-case hex digits (SHA-256): " + s.checksum());
        assertEquals(s.checksum(), templateSet().checksum(), "the checksum is stable");
        assertFalse(s.description() == null || s.description().isBlank(), "a description of where the templates come from");
    }

    @Test
    void templatesAreWellFormed() {
        List<Template> ts = templateSet().templates();
        assertFalse(ts.isEmpty(), "at least one template");
        Set<String> ids = new HashSet<>();
        Set<ObjectClass> classes = new HashSet<>();
        for (Template t : ts) {
            assertTrue(ids.add(t.id()), "duplicate template id " + t.id());
            assertNotEquals(ObjectClass.UNKNOWN, t.objectClass(), t.id() + ": a class (galaxy, quasar or star)");
            classes.add(t.objectClass());
            assertTrue(t.minRestVacuumAngstrom() >= 100 && t.maxRestVacuumAngstrom() <= 1e6,
                    t.id() + ": rest wavelengths in Angstrom between 100 and 1e6");
            double[] f = t.flux();
            double max = 0;
            for (double v : f) {
                max = Math.max(max, Math.abs(v));
            }
            assertTrue(max > 0, t.id() + ": flux is not all zero");
        }
        assertTrue(classes.containsAll(requiredClasses()), "classes " + classes + " must include " + requiredClasses());
    }

    @Test
    void immutable() {
        TemplateSet s = templateSet();
        Template t = s.templates().get(0);
        double before = t.flux()[0];
        t.flux()[0] = before + 1e6;
        assertEquals(before, s.templates().get(0).flux()[0], "returned arrays are copies");
        assertThrowsOnModify(s.templates());
    }

    private static void assertThrowsOnModify(List<Template> list) {
        try {
            list.clear();
        } catch (UnsupportedOperationException expected) {
            return;
        }
        throw new AssertionError("templates() must return an unmodifiable list");
    }
}
