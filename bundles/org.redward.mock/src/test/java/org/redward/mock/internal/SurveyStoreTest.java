package org.redward.mock.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The demo's folder handling: bad folders, interrupted runs, never two runs mixed. */
class SurveyStoreTest {

    @TempDir
    Path tmp;

    @Test
    void aFolderThatCannotBeCreatedIsNamedInOneLine() throws IOException {
        Path file = Files.writeString(tmp.resolve("plain-file"), "x");
        IOException e = assertThrows(IOException.class, () -> SurveyStore.open(file.resolve("demo")));
        assertTrue(e.getMessage().contains(file.resolve("demo").toString()), e.getMessage());
        assertFalse(e.getMessage().contains("\n"));
        IOException e2 = assertThrows(IOException.class, () -> SurveyStore.open(file));
        assertTrue(e2.getMessage().contains("not a folder") || e2.getMessage().contains("cannot"), e2.getMessage());
    }

    @Test
    void twoRunsCannotWriteTheSameFolder() throws IOException {
        try (SurveyStore a = SurveyStore.open(tmp.resolve("demo"))) {
            IOException e = assertThrows(IOException.class, () -> SurveyStore.open(tmp.resolve("demo")));
            assertTrue(e.getMessage().contains("another run"), e.getMessage());
        }
        SurveyStore.open(tmp.resolve("demo")).close();
    }

    @Test
    void interruptedRunsLeaveNothingThatLooksComplete() throws IOException {
        Path root = tmp.resolve("demo");
        try (SurveyStore s = SurveyStore.open(root)) {
            // an interrupted generation: a partial folder and no survey
            Files.createDirectories(root.resolve(SurveyStore.PARTIAL + "survey-seed1-n5"));
            Files.writeString(root.resolve(SurveyStore.PARTIAL + "survey-seed1-n5").resolve("truth.csv"), "half");
            assertFalse(s.hasSurvey(1, 5));
            assertEquals(List.of(SurveyStore.PARTIAL + "survey-seed1-n5"), s.removeLeftovers());
            PrintStream quiet = new PrintStream(new ByteArrayOutputStream());
            Path survey = s.generate(1, 5, n -> { }, quiet);
            assertTrue(s.hasSurvey(1, 5));
            assertFalse(s.hasSurvey(1, 6));
            assertFalse(s.hasSurvey(2, 5));
            // a survey folder whose manifest says it is incomplete is not reused
            Files.writeString(survey.resolve(SurveyStore.MANIFEST), "complete=false\nseed=1\nsize=5\n");
            assertFalse(s.hasSurvey(1, 5));
            s.generate(1, 5, n -> { }, quiet);
            assertTrue(s.hasSurvey(1, 5));
            // results are published whole, replacing the previous run's
            Path p1 = s.partial("results");
            Files.writeString(p1.resolve("a.txt"), "run 1");
            s.publish(p1, "results");
            Path p2 = s.partial("results");
            Files.writeString(p2.resolve("b.txt"), "run 2");
            Path done = s.publish(p2, "results");
            assertTrue(Files.exists(done.resolve("b.txt")));
            assertFalse(Files.exists(done.resolve("a.txt")), "files of two runs mixed");
            assertTrue(s.removeLeftovers().isEmpty());
        }
    }
}
