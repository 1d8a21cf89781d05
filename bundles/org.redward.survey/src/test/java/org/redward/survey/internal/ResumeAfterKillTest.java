package org.redward.survey.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Never lose work: a run of 3,000 invented spectra is killed with SIGKILL (kill -9) at random
 * moments, then resumed until it finishes; the catalogue must equal the one of an uninterrupted
 * run, every spectrum exactly once, in the same order.
 */
class ResumeAfterKillTest {

    static final int FILES = 30;
    static final int PER_FILE = 100;
    static final int BUSY_MICROS = 100;
    static final int KILLS = 6;

    @TempDir
    Path dir;

    @Test
    void killNineAtRandomMomentsThenResumeGivesTheUninterruptedCatalogue() throws Exception {
        killAndResume(FILES, PER_FILE, false);
    }

    /** The same with {@code --lines}, on 600 invented line spectra: the lines table equals the uninterrupted run's too. */
    @Test
    void withLinesTheLinesTableOfAKilledAndResumedRunEqualsTheUninterruptedOne() throws Exception {
        List<String> lines = killAndResume(6, PER_FILE, true).stream().filter(l -> l.startsWith("lines: ")).toList();
        assertTrue(lines.size() >= 3 * 6 * PER_FILE * 9 / 10, "about three lines per spectrum: " + lines.size());
    }

    private List<String> killAndResume(int files, int perFile, boolean withLines) throws Exception {
        Path refDir = Files.createDirectory(dir.resolve("ref"));
        Path ref = refDir.resolve("cat.txt");
        long t0 = System.nanoTime();
        assertEquals(0, start(ref, files, perFile, withLines).waitFor());
        long referenceMillis = (System.nanoTime() - t0) / 1_000_000;
        List<String> expected = new ArrayList<>();
        for (String line : Files.readAllLines(ref)) {
            expected.add(line.replace(refDir.toString(), dir.resolve("run").toString()));
        }
        assertEquals(files * perFile, expected.stream().filter(l -> !l.startsWith("lines: ")).count());

        Path runDir = Files.createDirectory(dir.resolve("run"));
        Path out = runDir.resolve("cat.txt");
        Random random = new Random(20261201L);
        int kills = 0;
        int journalsSeen = 0;
        // kill at random moments (the machine may be loaded or idle: scale by the reference run); each resume
        // has less left to do, so the window shrinks with the attempts, or a quiet machine finishes before the kill
        for (int attempt = 0; attempt < KILLS + 1 && !Files.exists(out); attempt++) {
            Process p = start(out, files, perFile, withLines);
            long window = referenceMillis / (attempt + 2);
            long delay = window / 5 + (long) (random.nextDouble() * window * 0.6);
            if (attempt == KILLS) {
                assertEquals(0, p.waitFor(), "the last resume finishes");
            } else if (!p.waitFor(delay, TimeUnit.MILLISECONDS)) {
                p.destroyForcibly();
                p.waitFor();
                kills++;
                if (Files.exists(Journal.beside(out))) {
                    journalsSeen++;
                }
            }
            assertFalse(Files.exists(out) && Files.exists(out.resolveSibling(".cat.txt.part")));
        }
        assertTrue(Files.exists(out), "the run finished");
        assertTrue(kills >= 3, "killed at least three times: " + kills);
        assertTrue(journalsSeen >= 1, "a journal was left by a kill");
        List<String> actual = Files.readAllLines(out);
        assertEquals(expected.size(), actual.size(), "same number of rows");
        Set<String> seen = new HashSet<>();
        for (String line : actual) {
            assertTrue(seen.add(line), "each spectrum once: " + line);
        }
        for (int i = 0; i < expected.size(); i++) {
            assertEquals(expected.get(i), actual.get(i), "row " + i + " as in the uninterrupted run");
        }
        System.out.println("resume test" + (withLines ? " with lines" : "") + ": reference run " + referenceMillis + " ms, " + kills
                + " kills, " + journalsSeen + " journals left, " + actual.size() + " rows equal");
        return actual;
    }

    private static Process start(Path out, int files, int perFile, boolean withLines) throws Exception {
        List<String> cmd = new ArrayList<>();
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.add("-Xmx256m");
        cmd.add("-cp");
        cmd.add(System.getProperty("java.class.path"));
        cmd.add(KillableRun.class.getName());
        cmd.add(out.toString());
        cmd.add(Integer.toString(files));
        cmd.add(Integer.toString(perFile));
        cmd.add(Integer.toString(BUSY_MICROS));
        if (withLines) {
            cmd.add("lines");
        }
        return new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(new File("/dev/null")).start();
    }
}
