package org.redward.formats.inputs.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.formats.SpectrumReadException;
import org.redward.api.formats.SpectrumReader;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;
import org.redward.formats.fits.internal.FitsReader;
import org.redward.testkit.SharedData;

class InputsServiceTest {

    static List<SpectrumRecord> all(SpectrumInputs inputs, List<Path> paths, ReadOptions o) {
        List<SpectrumRecord> out = new ArrayList<>();
        try (SpectrumInputs.Stream s = inputs.open(paths, o)) {
            s.forEachRemaining(out::add);
        }
        return out;
    }

    /** Source: ../shared/realdata (public survey files; see its README). */
    @Test
    void folderOfRealSpectraIsReadWithTheMatchingProfiles() throws Exception {
        InputsService in = new InputsService(Registries.readers(Map.of("fits", new FitsReader())), Registries.surveyProfiles());
        List<SpectrumRecord> recs = all(in, List.of(SharedData.realData()), ReadOptions.defaults());
        assertEquals(12, recs.size(), "README.md and truth.tsv are skipped silently: " + recs);
        for (SpectrumRecord r : recs) {
            assertTrue(r.ok(), r.error());
            assertEquals("fits", r.reader());
            String name = r.file().getFileName().toString();
            String expected = name.startsWith("spec-55862") ? "lamost-dr1" : name.startsWith("3C433") ? "" : "sdss-coadd";
            assertEquals(expected, r.profile(), name);
            assertFalse(r.layout().isEmpty());
        }
    }

    /** Source: ../shared/realdata (public survey files; see its README): counts up front equal the records read. */
    @Test
    void countsUpFrontMatchWhatIsRead(@TempDir Path dir) throws Exception {
        InputsService in = new InputsService(Registries.readers(Map.of("fits", new FitsReader())), Registries.surveyProfiles());
        List<Path> paths = List.of(SharedData.realData());
        long[] counts = in.counts(paths, ReadOptions.defaults());
        List<Path> files = in.expand(paths);
        assertEquals(files.size(), counts.length);
        for (int i = 0; i < counts.length; i++) {
            Path f = files.get(i);
            long read = all(in, List.of(f), ReadOptions.defaults()).size();
            String name = f.getFileName().toString();
            long expected = name.endsWith(".fits") || name.endsWith(".fits.gz") ? read : 0; // README.md, truth.tsv: passed over
            assertEquals(expected, counts[i], name);
        }
        Path notFits = dir.resolve("notes.fits");
        Files.writeString(notFits, "this is not FITS\n");
        long[] bad = in.counts(List.of(notFits, dir.resolve("missing.fits")), ReadOptions.defaults());
        assertEquals(-1, bad[0], "a named file no reader knows: unknown");
        assertEquals(-1, bad[1], "a missing file: unknown");
    }

    @Test
    void badFilesAreReportedAndTheBatchGoesOn(@TempDir Path dir) throws Exception {
        Path notFits = dir.resolve("notes.fits");
        Files.writeString(notFits, "this is not FITS\n");
        Path empty = dir.resolve("empty.fits");
        Files.write(empty, new byte[0]);
        Path missing = dir.resolve("missing.fits");
        Path good = SharedData.realData().resolve("3C433.fits");
        InputsService in = new InputsService(Registries.readers(Map.of("fits", new FitsReader())), Registries.surveyProfiles());
        List<SpectrumRecord> recs = all(in, List.of(notFits, empty, missing, good), ReadOptions.defaults());
        assertEquals(4, recs.size(), recs.toString());
        assertTrue(recs.get(0).error().contains("notes.fits") && recs.get(0).error().contains("not a spectrum format"), recs.get(0).error());
        assertTrue(recs.get(1).error().contains("empty"), recs.get(1).error());
        assertTrue(recs.get(2).error().contains("file not found"), recs.get(2).error());
        assertTrue(recs.get(3).ok());
    }

    @Test
    void forcedProfileAndUnknownProfile() throws Exception {
        InputsService in = new InputsService(Registries.readers(Map.of("fits", new FitsReader())), Registries.surveyProfiles());
        Path lamost = SharedData.realData().resolve("spec-55862-B6212_sp06-114.fits");
        List<SpectrumRecord> none = all(in, List.of(lamost), ReadOptions.defaults().withProfile("nope"));
        assertEquals(1, none.size());
        assertTrue(none.get(0).error().contains("no instrument profile 'nope' (available: lamost-dr1, sdss-coadd)"), none.get(0).error());
        List<SpectrumRecord> forced = all(in, List.of(lamost), ReadOptions.defaults().withProfile("lamost-dr1"));
        assertEquals(1, forced.size());
        assertEquals("lamost-dr1", forced.get(0).profile());
    }

    @Test
    void aStallingFileIsAbandonedWithinTheBound(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("slow.dat");
        Files.writeString(f, "x");
        SpectrumReader stalling = new SpectrumReader() {
            @Override
            public int sniff(Path file, byte[] head) {
                return 50;
            }

            @Override
            public SpectrumSource open(Path file, Optional<InstrumentProfile> profile) throws SpectrumReadException {
                while (true) {
                    try {
                        Thread.sleep(10_000);
                    } catch (InterruptedException e) {
                        throw new SpectrumReadException(file, "interrupted");
                    }
                }
            }
        };
        InputsService in = new InputsService(Registries.readers(Map.of("slow", stalling, "fits", new FitsReader())),
                Registries.surveyProfiles());
        long t0 = System.nanoTime();
        List<SpectrumRecord> recs = all(in, List.of(f, SharedData.realData().resolve("3C433.fits")),
                ReadOptions.defaults().withStallLimit(Duration.ofMillis(300)));
        long ms = (System.nanoTime() - t0) / 1_000_000;
        assertEquals(2, recs.size());
        assertTrue(recs.get(0).error().contains("per-file time bound"), recs.get(0).error());
        assertTrue(recs.get(1).ok());
        assertTrue(ms < 5000, "took " + ms + " ms");
    }

    @Test
    void listFilesAndAtPaths(@TempDir Path dir) throws Exception {
        Path list = dir.resolve("inputs.list");
        Files.writeString(list, "# two spectra\n" + SharedData.realData().resolve("3C433.fits") + "\n\n"
                + SharedData.realData().resolve("spec-0266-51630-0168.fits") + "  # a comment\n");
        InputsService in = new InputsService(Registries.readers(Map.of("fits", new FitsReader())), Registries.surveyProfiles());
        assertEquals(2, in.expand(List.of(list)).size());
        Path plain = dir.resolve("inputs.txt");
        Files.copy(list, plain);
        assertEquals(2, in.expand(List.of(Path.of("@" + plain))).size());
        assertEquals(2, all(in, List.of(list), ReadOptions.defaults()).size());
    }
}
