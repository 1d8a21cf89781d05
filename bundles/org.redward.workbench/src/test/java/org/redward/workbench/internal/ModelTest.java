package org.redward.workbench.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;

/** The workbench's model without a display: velocities shown, journal, catalogue cells. */
class ModelTest {

    @Test
    void velocityRowsAtZ001() {
        // team reference notes, section 4 (computed from the FITS Standard 3.0 Table 8.5 definitions):
        // z = 0.01: v_opt 2997.9246, v_rad 2968.2422, v_rel 2982.9357 km/s; shown to 0.1 km/s
        List<String[]> rows = Answers.velocityRows(0.01);
        assertEquals("2997.9 km/s", rows.get(1)[1]);
        assertEquals("2968.2 km/s", rows.get(2)[1]);
        assertEquals("2982.9 km/s", rows.get(3)[1]);
        // above z = 0.05 the Hubble-law rows carry a caution (common practice)
        assertTrue(Answers.velocityRows(0.2).get(4)[2].contains("Hubble law"));
        assertEquals("", Answers.velocityRows(0.01).get(4)[2]);
    }

    @Test
    void zFromANamedLineAndVelocityDifference() {
        // z = observed / rest - 1 (definition of z, common practice); H-alpha 6564.614 A vacuum (NIST ASD, as tabulated)
        assertEquals(0.1, Kinematics.redshiftFromLine(7221.0754, 6564.614), 1e-12);
        // c dz / (1 + z): 0.001 at z = 0.1 is 272.539 km/s (common practice)
        assertEquals(272.5386, Kinematics.velocityDifferenceKmPerS(0.1, 0.101), 1e-4);
    }

    @Test
    void journalKeepsTheLastDecisionAndSurvivesATornLine() throws Exception {
        Path f = Files.createTempFile("journal", ".jsonl");
        QueueItem it = new QueueItem(Path.of("/data/a.fits"), 2, "a");
        try (Journal j = Journal.open(f)) {
            j.append(new Decision(it.key(), Verdict.ACCEPTED, 0.1, "x", "", PersonGrade.LIKELY, "", "me", Instant.parse("2026-01-01T00:00:00Z")), it);
            j.append(new Decision(it.key(), Verdict.LINE, 0.2, "", "H-alpha", PersonGrade.SECURE, "n, \"q\"", "me", Instant.parse("2026-01-01T00:01:00Z")), it);
        }
        Files.writeString(f, "{\"key\":\"torn", java.nio.file.StandardOpenOption.APPEND);
        try (Journal j = Journal.open(f)) {
            Decision d = j.decisions().get(it.key());
            assertEquals(Verdict.LINE, d.verdict());
            assertEquals(0.2, d.z());
            assertEquals("n, \"q\"", d.note());
            assertEquals(1, j.unreadableLines());
        }
        Files.delete(f);
    }

    @Test
    void csvCellsRoundTrip() {
        assertEquals(List.of("a", "b,c", "say \"hi\"", ""), Catalogue.splitCsv("a,\"b,c\",\"say \"\"hi\"\"\","));
    }
}
