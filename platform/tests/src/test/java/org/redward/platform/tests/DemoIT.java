package org.redward.platform.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The demo as a newcomer meets it, on a small invented survey: the whole job, bad input, interrupted runs. */
class DemoIT {

    @TempDir
    Path temp;

    @Test
    void smallDemoRunsTheWholeJobAndScoresItAgainstTheTruth() throws Exception {
        Product.Run r = Product.run(temp, Map.of(), 300, "demo", "--size", "40", "--seed", "3");
        assertEquals(0, r.status(), r.toString());
        for (String s : new String[] {"generate survey", "read spectra", "measure redshifts", "against the truth", "results:"}) {
            assertTrue(r.out().contains(s), s + " missing in " + r);
        }
        Path out = temp.resolve("redward-demo");
        assertTrue(Files.isRegularFile(out.resolve("survey-seed3-n40").resolve("truth.csv")));
        assertTrue(Files.isRegularFile(out.resolve("results").resolve("report.md")));
        // a second run reuses the survey and replaces the results whole
        Product.Run again = Product.run(temp, Map.of(), 300, "demo", "--size", "40", "--seed", "3", "--json");
        assertEquals(0, again.status(), again.toString());
        assertTrue(again.out().trim().startsWith("{") && again.out().contains("\"status\":\"reused\""), again.toString());
    }

    @Test
    void badSizesAndFoldersGiveOneClearLine() throws Exception {
        Product.Run zero = Product.run(temp, Map.of(), 120, "demo", "--size", "0");
        assertEquals(2, zero.status(), zero.toString());
        assertTrue(zero.err().contains("--size 0"), zero.toString());
        Product.Run huge = Product.run(temp, Map.of(), 120, "demo", "--size", "99999999");
        assertEquals(2, huge.status(), huge.toString());
        assertTrue(huge.err().contains("accuracy"), "points large surveys to the benchmark: " + huge);
        Path file = Files.writeString(temp.resolve("not-a-folder"), "x");
        Product.Run bad = Product.run(temp, Map.of(), 120, "demo", "--size", "5", "--out", file.resolve("demo").toString());
        assertEquals(1, bad.status(), bad.toString());
        assertTrue(bad.err().contains(file.resolve("demo").toString()), bad.toString());
        assertFalse(bad.err().contains("Exception"), "no stack trace: " + bad);
    }

    @Test
    void leftoversOfAnInterruptedRunAreRemovedAndNeverMixed() throws Exception {
        Path out = temp.resolve("demo");
        Path half = Files.createDirectories(out.resolve(".partial-results"));
        Files.writeString(half.resolve("stale.txt"), "from an interrupted run");
        Product.Run r = Product.run(temp, Map.of(), 300, "demo", "--size", "12", "--out", out.toString());
        assertEquals(0, r.status(), r.toString());
        assertTrue(r.err().contains("interrupted run"), r.toString());
        assertFalse(Files.exists(out.resolve("results").resolve("stale.txt")));
        assertFalse(Files.exists(half));
    }
}
