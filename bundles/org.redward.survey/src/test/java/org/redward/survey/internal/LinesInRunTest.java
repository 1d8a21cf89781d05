package org.redward.survey.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.json.JSONObject;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.catalog.Catalog;
import org.redward.api.catalog.CatalogTable;
import org.redward.api.catalog.CatalogWriter;
import org.redward.api.lines.LineKind;
import org.redward.api.survey.MeasureRequest;
import org.redward.api.survey.MeasureSummary;
import org.redward.api.survey.MeasuredLine;
import org.redward.api.survey.MeasuredRow;

/**
 * {@code measure --lines} on invented spectra (the run's mechanics): lines ride in the rows and
 * the journal, the catalogue gets a second table (or a sibling file), a failing line step never
 * fails a spectrum, and without lines nothing changes.
 */
class LinesInRunTest {

    @TempDir
    Path dir;

    /** Keeps what it was asked to write: every table's name and cells, per file. */
    static final class Capture implements CatalogWriter {
        final Map<String, List<String>> tablesByFile = new java.util.TreeMap<>();
        final Map<String, List<Object[]>> rowsByTable = new java.util.TreeMap<>();
        final List<Catalog> catalogs = new ArrayList<>();

        @Override
        public synchronized void write(Catalog catalog, Path file) throws IOException {
            catalogs.add(catalog);
            List<String> names = new ArrayList<>();
            for (CatalogTable t : catalog.tables()) {
                names.add(t.name());
                List<Object[]> rows = new ArrayList<>();
                t.rows().forEach(rows::add);
                assertEquals(t.rowCount(), rows.size(), "row count of table " + t.name());
                rowsByTable.put(t.name(), rows);
            }
            tablesByFile.put(file.getFileName().toString().replaceFirst("^\\.(.*)\\.part$", "$1"), names);
            Files.writeString(file, String.join(",", names));
        }
    }

    private MeasureSummary run(MeasureRequest req, Estimation est, Feed.Source src, Capture writer, LineStep step, boolean manyTables,
            List<MeasuredRow> rows) throws Exception {
        SurveyRun run = new SurveyRun(req, est, src, Optional.of(writer), List.of(), Map.of("product.version", "test"));
        if (step != null) {
            run.lines(step, manyTables);
        }
        return run.run(rows::add);
    }

    private Feed.Source lineSpectra(int count) {
        return Synthetic.source(Synthetic.files(dir, 1), count, Synthetic::lineSpectrum);
    }

    @Test
    void withoutLinesTheCatalogueHasOneTableAndNoRowCarriesLines() throws Exception {
        Capture w = new Capture();
        List<MeasuredRow> rows = new ArrayList<>();
        MeasureSummary s = run(MeasureRequest.of(List.of()).withOutput(dir.resolve("cat.fits")).withThreads(2),
                new Synthetic.PlantedEstimation(), lineSpectra(20), w, null, true, rows);
        assertEquals(Map.of("cat.fits", List.of("redshifts")), w.tablesByFile, "one table, one file");
        assertEquals(0, s.lines());
        for (MeasuredRow r : rows) {
            assertTrue(r.lines().isEmpty());
            assertFalse(RowCodec.toJson(r).toString().contains("\"lines\""), "no lines key in the journal or --json");
        }
        assertFalse(w.catalogs.get(0).provenance().containsKey("lines.finder"));
    }

    @Test
    void linesRideInTheRowsAndBecomeASecondTableKeyedBySequence() throws Exception {
        Capture w = new Capture();
        List<MeasuredRow> rows = new ArrayList<>();
        int n = 12;
        MeasureSummary s = run(MeasureRequest.of(List.of()).withOutput(dir.resolve("cat.vot")).withThreads(2).withLines(true),
                new Synthetic.PlantedEstimation(), lineSpectra(n), w, Synthetic.lineStep(), true, rows);
        assertEquals(Map.of("cat.vot", List.of("redshifts", "lines")), w.tablesByFile);
        List<Object[]> lineRows = w.rowsByTable.get("lines");
        assertEquals(s.lines(), lineRows.size());
        assertEquals(n, s.spectraWithLines(), "every spectrum has lines");
        Map<String, String> prov = w.catalogs.get(0).provenance();
        assertTrue(prov.get("lines.finder").startsWith("matched-gauss"), prov.toString());
        assertTrue(prov.get("lines.list").startsWith("standard "), prov.toString());
        for (MeasuredRow r : rows) {
            if (!r.ok()) {
                continue;
            }
            int k = Integer.parseInt(r.id().substring(4));
            double z = Synthetic.lineZ(k);
            for (String name : new String[] {"H-alpha", "[O III] 5008"}) {
                MeasuredLine l = r.lines().stream().filter(x -> x.name().equals(name)).findFirst()
                        .orElseThrow(() -> new AssertionError(r.id() + ": no " + name + " in " + r.lines()));
                // planted at rest x (1 + z) exactly (invented spectra): the fit finds it within 0.1 Angstrom
                assertEquals(l.restAngstrom() * (1 + z), l.observedAngstrom(), 0.1, name);
                assertEquals(0.0, l.offsetKmPerS(), 10.0, name);
                assertEquals(LineKind.EMISSION, l.kind());
                assertEquals("1e-17 erg/s/cm2", l.fluxUnit());
                assertTrue(l.restEquivalentWidthAngstrom() > 0, "emission: positive EW");
            }
            MeasuredLine ha = r.lines().stream().filter(x -> x.name().equals("H-alpha")).findFirst().orElseThrow();
            // planted Gaussian: flux = A sigma sqrt(2 pi) = 5 x 3 x 2.5066 = 37.6 (observed frame), rest EW = 37.6 / (1 + z)
            assertEquals(5 * 3 * Math.sqrt(2 * Math.PI), ha.flux(), 0.5);
            assertEquals(ha.flux() / (1 + z), ha.restEquivalentWidthAngstrom(), 0.5);
        }
        Object[] first = lineRows.get(0);
        assertEquals(rows.get(0).sequence(), first[0], "keyed by sequence");
        assertEquals(rows.get(0).id(), first[1], "and id");
    }

    @Test
    void formatsWithOneTablePerFileGetTheLinesTableAsASiblingFile() throws Exception {
        Capture w = new Capture();
        Path out = dir.resolve("cat.csv");
        run(MeasureRequest.of(List.of()).withOutput(out).withThreads(1).withLines(true), new Synthetic.PlantedEstimation(),
                lineSpectra(3), w, Synthetic.lineStep(), false, new ArrayList<>());
        assertEquals(Map.of("cat.csv", List.of("redshifts"), "cat.lines.csv", List.of("lines")), w.tablesByFile);
        assertTrue(Files.exists(out) && Files.exists(dir.resolve("cat.lines.csv")));
        assertFalse(Files.exists(dir.resolve(".cat.lines.csv.part")));
        assertEquals("cat.lines.csv", w.catalogs.get(1).provenance().get("lines.file"), "the main file names its sibling");
        assertEquals("cat.csv", w.catalogs.get(0).provenance().get("lines.of"), "the sibling names its main file");
        assertEquals(dir.resolve("x.lines"), SurveyRun.linesFile(dir.resolve("x")));
    }

    @Test
    void rowsWithLinesRoundTripThroughTheJournalCodec() {
        MeasuredRow r = MeasuredRow.builder().sequence(7).source("/invented/f.fits", 3, "row 3").id("LIN-7").z(0.05, 1e-4)
                .lines(List.of(new MeasuredLine("H-alpha", 6564.614, LineKind.EMISSION, 6892.84, 0.05, 3.2, 37.6, 0.4,
                        "1e-17 erg/s/cm2", 35.8, 0.4, 310.0, 12.0, 94.0, true),
                        new MeasuredLine("", Double.NaN, LineKind.ABSORPTION, 5400.1, 0.3, Double.NaN, -3.0, 0.5, "", -2.9,
                                Double.NaN, 500.0, 40.0, 6.0, false)))
                .build();
        MeasuredRow back = RowCodec.parse(new JSONObject(RowCodec.toJson(r).toString()));
        assertEquals(r, back);
        assertEquals(r.lines(), back.lines());
    }

    @Test
    void aLineStepThatThrowsOrHangsLeavesTheSpectrumOkWithAWarning() throws Exception {
        LineStep bad = new LineStep() {
            @Override
            public MeasuredRow measure(org.redward.api.formats.SpectrumRecord record, org.redward.spectrum.Spectrum s, MeasuredRow row) {
                if (record.index() % 3 == 1) {
                    throw new IllegalStateException("finder bug");
                }
                if (record.index() % 3 == 2 && record.index() < 6) {
                    long until = System.nanoTime() + 30_000_000_000L;
                    while (System.nanoTime() < until) {
                        try {
                            Thread.sleep(200); // hangs and ignores interrupts, without starving the machine
                        } catch (InterruptedException ignored) {
                            // keep hanging
                        }
                    }
                }
                return row;
            }

            @Override
            public String bundle() {
                return "test.badlines 0.1.0";
            }

            @Override
            public Map<String, String> provenance() {
                return Map.of();
            }
        };
        List<MeasuredRow> rows = new ArrayList<>();
        MeasureSummary s = run(MeasureRequest.of(List.of()).withThreads(2).withLines(true).withTimeLimit(Duration.ofSeconds(1)),
                new Synthetic.PlantedEstimation(), lineSpectra(9), new Capture(), bad, true, rows);
        assertEquals(9, s.ok(), "no spectrum fails because of its lines");
        assertTrue(rows.get(1).warnings().stream().anyMatch(x -> x.contains("lines not measured") && x.contains("finder bug")
                && x.contains("test.badlines 0.1.0")), rows.get(1).warnings().toString());
        assertTrue(rows.get(2).warnings().stream().anyMatch(x -> x.contains("time limit")), rows.get(2).warnings().toString());
        assertTrue(rows.get(0).warnings().isEmpty());
        String account = s.misbehaving().get("test.badlines 0.1.0");
        assertTrue(account != null && account.startsWith("3 threw, 2 timed out"), String.valueOf(account));
    }
}
