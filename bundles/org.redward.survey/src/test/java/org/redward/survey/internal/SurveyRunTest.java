package org.redward.survey.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.catalog.Catalog;
import org.redward.api.catalog.CatalogWriter;
import org.redward.api.survey.MeasureRequest;
import org.redward.api.survey.MeasureSummary;
import org.redward.api.survey.MeasuredRow;
import org.redward.spectrum.Spectrum;

/** The run's mechanics on invented spectra: order, journal, atomic catalogue, isolation of plug-ins. */
class SurveyRunTest {

    @TempDir
    Path dir;

    /**
     * Writes every table as lines of cells, to compare catalogues: the main table's rows as they
     * are (seconds zeroed), then each further table's rows prefixed with its name.
     */
    static final class LinesWriter implements CatalogWriter {
        @Override
        public void write(Catalog catalog, Path file) throws IOException {
            List<String> lines = new ArrayList<>();
            for (int t = 0; t < catalog.tables().size(); t++) {
                var table = catalog.tables().get(t);
                int seconds = table.columnIndex("seconds");
                for (Object[] row : table.rows()) {
                    if (seconds >= 0) {
                        row[seconds] = 0.0;
                    }
                    lines.add((t == 0 ? "" : table.name() + ": ") + java.util.Arrays.toString(row));
                }
            }
            Files.write(file, lines, StandardCharsets.UTF_8);
        }
    }

    private MeasureSummary run(Estimation est, int files, int perFile, MeasureRequest req, List<MeasuredRow> rows)
            throws Exception {
        List<Path> inputs = Synthetic.files(dir, files);
        SurveyRun run = new SurveyRun(req.withInputs(List.of()), est,
                Synthetic.source(inputs, perFile), Optional.of(new LinesWriter()), List.of(),
                Map.of("product.version", "test"));
        return run.run(rows::add);
    }

    @Test
    void rowsComeInInputOrderWithFailuresAsRows() throws Exception {
        List<MeasuredRow> rows = new ArrayList<>();
        Path out = dir.resolve("cat.txt");
        MeasureSummary s = run(new Synthetic.SpikeEstimation(), 4, 100, MeasureRequest.of(List.of()).withOutput(out).withThreads(3), rows);
        assertEquals(400, s.total());
        assertEquals(8, s.failed(), "every 50th spectrum is unreadable");
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(i, rows.get(i).sequence());
        }
        MeasuredRow r = rows.get(123);
        assertTrue(r.ok());
        assertEquals(0.123, r.z(), 30 / 5000.0, "the planted redshift, within a pixel");
        assertFalse(rows.get(49).ok());
        assertTrue(rows.get(49).error().contains("column FLUX"), rows.get(49).error());
        assertEquals(400, Files.readAllLines(out).size());
        assertFalse(Files.exists(Journal.beside(out)), "journal removed after the catalogue is in place");
        assertFalse(Files.exists(out.resolveSibling(".cat.txt.part")));
    }

    @Test
    void aSliceGivesExactlyItsPartOfTheWholeRun() throws Exception {
        List<MeasuredRow> whole = new ArrayList<>();
        run(new Synthetic.SpikeEstimation(), 2, 100, MeasureRequest.of(List.of()).withThreads(2), whole);
        List<MeasuredRow> slice = new ArrayList<>();
        MeasureSummary s = run(new Synthetic.SpikeEstimation(), 2, 100, MeasureRequest.of(List.of()).withThreads(2).withSlice(70, 45), slice);
        assertEquals(45, s.total());
        assertEquals(45, slice.size());
        for (int i = 0; i < slice.size(); i++) {
            MeasuredRow a = whole.get(70 + i);
            MeasuredRow b = slice.get(i);
            assertEquals(a.sequence(), b.sequence(), "rows keep their position in the inputs");
            assertEquals(a.id(), b.id());
            assertEquals(a.ok(), b.ok());
            assertEquals(a.z(), b.z(), 0.0);
        }
        List<MeasuredRow> tail = new ArrayList<>();
        run(new Synthetic.SpikeEstimation(), 2, 100, MeasureRequest.of(List.of()).withThreads(1).withSlice(190, -1), tail);
        assertEquals(10, tail.size(), "a slice with no count runs to the end");
        assertThrows(IllegalArgumentException.class, () -> MeasureRequest.of(List.of()).withSlice(0, 0));
        assertThrows(IllegalArgumentException.class,
                () -> run(new Synthetic.SpikeEstimation(), 1, 10, MeasureRequest.of(List.of()).withSlice(1, 2)
                        .withOutput(dir.resolve("c.txt")).withResume(true), new ArrayList<>()));
    }

    @Test
    void throwingHangingAndNonsenseEstimatorsAreIsolated() throws Exception {
        Estimation bad = new Estimation() {
            final Synthetic.SpikeEstimation good = new Synthetic.SpikeEstimation();

            @Override
            public void measure(Spectrum s, MeasuredRow.Builder row) throws Exception {
                String id = s.metadata().objectId().orElseThrow();
                int n = Integer.parseInt(id.substring(4));
                switch (n % 10) {
                    case 1 -> throw new IllegalStateException("plug-in bug");
                    case 2 -> {
                        while (n >= 0) {
                            // hangs and ignores interrupts: only abandonment helps (sleeps, so as not to starve the machine)
                            try {
                                Thread.sleep(1000);
                            } catch (InterruptedException ignored) {
                                // keep hanging
                            }
                        }
                    }
                    case 3 -> row.z(Double.NaN, 0.1);
                    case 4 -> row.z(12.0, 0.1);
                    default -> good.measure(s, row);
                }
            }

            @Override
            public String id() {
                return "bad";
            }

            @Override
            public String bundle() {
                return "test.bad 0.0.1";
            }
        };
        List<MeasuredRow> rows = new ArrayList<>();
        MeasureSummary s = run(bad, 1, 30, MeasureRequest.of(List.of()).withThreads(2).withTimeLimit(Duration.ofSeconds(2)), rows);
        assertEquals(30, s.total());
        assertEquals(MeasuredRow.FAULT_THREW, rows.get(1).fault());
        assertTrue(rows.get(1).error().contains("plug-in bug") && rows.get(1).error().contains("test.bad 0.0.1"), rows.get(1).error());
        assertEquals(MeasuredRow.FAULT_TIMED_OUT, rows.get(2).fault());
        assertEquals(MeasuredRow.FAULT_NONSENSE, rows.get(3).fault());
        assertEquals(MeasuredRow.FAULT_NONSENSE, rows.get(4).fault());
        assertTrue(rows.get(5).ok());
        assertTrue(s.misbehaving().containsKey("test.bad 0.0.1"), s.misbehaving().toString());
        String account = s.misbehaving().get("test.bad 0.0.1");
        assertTrue(account.startsWith("3 threw, ") && account.contains(" timed out, 6 nonsense"), account);
    }

    @Test
    void anUnfinishedJournalIsNeverOverwritten() throws Exception {
        Path out = dir.resolve("cat.txt");
        Journal.create(Journal.beside(out), "x").close();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> run(new Synthetic.SpikeEstimation(), 1, 10,
                MeasureRequest.of(List.of()).withOutput(out), new ArrayList<>()));
        assertTrue(e.getMessage().contains("--resume"), e.getMessage());
        IllegalArgumentException f = assertThrows(IllegalArgumentException.class, () -> run(new Synthetic.SpikeEstimation(), 1, 10,
                MeasureRequest.of(List.of()).withOutput(out).withResume(true), new ArrayList<>()));
        assertTrue(f.getMessage().contains("other inputs or options"), f.getMessage());
    }
}
