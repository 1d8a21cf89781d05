package org.redward.testkit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.redward.api.lines.LineList;
import org.redward.api.lines.SpectralLine;

/**
 * The conformance kit for line lists: extend it, return your list from {@link #createLineList()},
 * and run it with JUnit 5. The standard list runs it, and so can a research group against the
 * list it ships as a data-only bundle.
 *
 * <p>What it checks: the id is usable on the command line (no blanks); a version is given; the
 * checksum is 64 lower-case hex digits and stable across two creations; there is at least one
 * line; lines are sorted by rest wavelength; names are unique; every rest wavelength is finite
 * and positive; every line names its source; weights lie in 0..1; within a group with fixed
 * ratios exactly one line is the reference (ratio 1) and all fixed ratios are positive; the list
 * cannot be changed through what it returns. Values are checked against a reference in
 * {@link #expectedRestWavelengths()} (name each value's source there).
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
public abstract class LineListContractTest {

    /** A fresh instance of the list under test (called twice). */
    protected abstract LineList createLineList() throws Exception;

    /** Line name to expected vacuum rest wavelength (Angstrom) and tolerance; none by default. */
    protected Map<String, double[]> expectedRestWavelengths() {
        return Map.of();
    }

    private LineList list;

    @BeforeAll
    void create() throws Exception {
        list = createLineList();
    }

    @Test
    void identity() throws Exception {
        assertFalse(list.id().isBlank(), "id");
        assertFalse(list.id().chars().anyMatch(Character::isWhitespace), "id '" + list.id() + "' has blanks");
        assertFalse(list.version().isBlank(), "version");
        assertTrue(list.checksum().matches("[0-9a-f]{64}"), "checksum: " + list.checksum());
        assertEquals(list.checksum(), createLineList().checksum(), "checksum stable across creations");
    }

    @Test
    void lines() {
        List<SpectralLine> lines = list.lines();
        assertFalse(lines.isEmpty(), "no lines");
        Set<String> names = new HashSet<>();
        for (int i = 0; i < lines.size(); i++) {
            SpectralLine l = lines.get(i);
            assertTrue(names.add(l.name()), "duplicate name " + l.name());
            assertTrue(Double.isFinite(l.vacuumAngstrom()) && l.vacuumAngstrom() > 0, l.name());
            assertFalse(l.source().isBlank(), l.name() + " names no source");
            assertTrue(l.weight() >= 0 && l.weight() <= 1, l.name() + " weight " + l.weight());
            if (i > 0) {
                assertTrue(l.vacuumAngstrom() >= lines.get(i - 1).vacuumAngstrom(), "not sorted at " + l.name());
            }
        }
    }

    @Test
    void fixedRatiosHaveOneReference() {
        Map<String, Integer> references = new HashMap<>();
        Map<String, Integer> fixed = new HashMap<>();
        for (SpectralLine l : list.lines()) {
            if (l.fixedRatio()) {
                assertTrue(l.grouped(), l.name() + " has a fixed ratio but no group");
                assertTrue(l.ratioToGroupReference() > 0, l.name() + " ratio " + l.ratioToGroupReference());
                fixed.merge(l.group(), 1, Integer::sum);
                if (l.ratioToGroupReference() == 1.0) {
                    references.merge(l.group(), 1, Integer::sum);
                }
            }
        }
        for (String g : fixed.keySet()) {
            assertEquals(1, references.getOrDefault(g, 0), "group " + g + " needs exactly one reference line (ratio 1)");
        }
    }

    @Test
    void immutable() {
        List<SpectralLine> lines = list.lines();
        assertThrows(UnsupportedOperationException.class, () -> lines.remove(0));
    }

    @Test
    void expectedValues() {
        for (Map.Entry<String, double[]> e : expectedRestWavelengths().entrySet()) {
            SpectralLine l = list.lines().stream().filter(x -> x.name().equals(e.getKey())).findFirst()
                    .orElseThrow(() -> new AssertionError("no line named " + e.getKey()));
            assertEquals(e.getValue()[0], l.vacuumAngstrom(), e.getValue()[1], e.getKey());
        }
    }
}
