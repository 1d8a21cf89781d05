package org.redward.formats.fits.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.SpectrumRecord;
import org.redward.spectrum.AirVacuum;
import org.redward.spectrum.Medium;
import org.redward.spectrum.Spectrum;
import org.redward.testkit.SharedData;

/**
 * All twelve real spectra of ../shared/realdata read with the right axis. Reference: the
 * realdata folder's truth.tsv (columns file, wave_min_A, wave_max_A, npix, wave_medium,
 * flux_units only; the published redshift columns are not read), itself taken from the files'
 * public data releases (Sloan Digital Sky Survey, LAMOST DR1, and a public telescope archive for
 * 3C433.fits). truth.tsv gives the range to 0.1 Angstrom in the medium of the file; air
 * ranges are converted to vacuum here with Morton (2000).
 */
class RealDataTest {

    record Truth(String file, double min, double max, int npix, boolean air, String fluxUnits) {
    }

    static List<Truth> truth() throws Exception {
        Path dir = SharedData.realData();
        List<String> lines = Files.readAllLines(dir.resolve("truth.tsv"));
        List<String> head = List.of(lines.get(0).split("\t", -1));
        int file = head.indexOf("file");
        int min = head.indexOf("wave_min_A");
        int max = head.indexOf("wave_max_A");
        int npix = head.indexOf("npix");
        int medium = head.indexOf("wave_medium");
        int flux = head.indexOf("flux_units");
        List<Truth> out = new ArrayList<>();
        for (String l : lines.subList(1, lines.size())) {
            if (l.isBlank()) {
                continue;
            }
            String[] c = l.split("\t", -1);
            out.add(new Truth(c[file], Double.parseDouble(c[min]), Double.parseDouble(c[max]), Integer.parseInt(c[npix]),
                    c[medium].startsWith("air"), c[flux]));
        }
        return out;
    }

    static Optional<InstrumentProfile> profileFor(String file) throws Exception {
        if (file.startsWith("spec-55862")) {
            return Optional.of(SurveyProfiles.load("lamost-dr1"));
        }
        if (file.startsWith("spec-") || file.startsWith("KUG")) {
            return Optional.of(SurveyProfiles.load("sdss-coadd"));
        }
        return Optional.empty();
    }

    static List<SpectrumRecord> readAll(Path p, Optional<InstrumentProfile> profile) throws Exception {
        return TestFiles.read(p, profile);
    }

    @Test
    void twelveFilesReadWithTheirPublishedAxis() throws Exception {
        List<Truth> truth = truth();
        assertEquals(12, truth.size());
        FitsReader reader = new FitsReader();
        for (Truth t : truth) {
            Path p = SharedData.realData().resolve(t.file());
            Optional<InstrumentProfile> profile = profileFor(t.file());
            // the profile the facade would pick by matching: the same one
            byte[] head = Files.readAllBytes(p);
            if (profile.isPresent()) {
                assertEquals(90, reader.matches(p, head, profile.get()), t.file() + " matches " + profile.get().id());
                String other = profile.get().id().equals("sdss-coadd") ? "lamost-dr1" : "sdss-coadd";
                assertEquals(0, reader.matches(p, head, SurveyProfiles.load(other)), t.file() + " does not match " + other);
            }
            List<SpectrumRecord> recs = readAll(p, profile);
            assertEquals(1, recs.size(), t.file() + " holds one spectrum");
            assertTrue(recs.get(0).ok(), recs.get(0).error());
            Spectrum s = recs.get(0).spectrum().get();
            assertEquals(t.npix(), s.size(), t.file() + " pixels");
            double min = t.air() ? AirVacuum.airToVacuumAngstrom(t.min()) : t.min();
            double max = t.air() ? AirVacuum.airToVacuumAngstrom(t.max()) : t.max();
            // truth.tsv rounds to 0.1 Angstrom
            assertEquals(min, s.axis().minVacuumAngstrom(), 0.051, t.file() + " first wavelength (vacuum)");
            assertEquals(max, s.axis().maxVacuumAngstrom(), 0.051, t.file() + " last wavelength (vacuum)");
            assertEquals(t.air() ? Medium.AIR : Medium.VACUUM, s.axis().mediumAsRead(), t.file() + " medium");
            if (t.fluxUnits().startsWith("relative")) {
                assertEquals("relative flux", s.fluxUnit());
            } else if (t.fluxUnits().startsWith("1E-17")) {
                assertEquals("1e-17 erg/s/cm2/Angstrom", s.fluxUnit());
            } else {
                assertEquals(t.fluxUnits(), s.fluxUnit(), t.file() + " flux unit");
            }
            boolean errors = !t.file().equals("3C433.fits");
            assertEquals(errors, s.hasErrors(), t.file() + " has an error array");
            if (errors) {
                assertTrue(s.usablePixels() > 0.8 * s.size(), t.file() + " most pixels have ivar > 0: " + s.usablePixels());
            }
        }
    }

    @Test
    void surveyTablesReadAlikeWithoutAProfile() throws Exception {
        for (Truth t : truth()) {
            if (!(t.file().startsWith("spec-0") || t.file().startsWith("spec-1") || t.file().startsWith("spec-2")
                    || t.file().startsWith("spec-4") || t.file().startsWith("KUG"))) {
                continue;
            }
            Path p = SharedData.realData().resolve(t.file());
            List<SpectrumRecord> recs = readAll(p, Optional.empty());
            assertEquals(1, recs.size(), t.file());
            Spectrum s = recs.get(0).spectrum().orElseThrow(() -> new AssertionError(recs.get(0).error()));
            assertEquals(t.npix(), s.size());
            assertEquals(t.min(), s.axis().minVacuumAngstrom(), 0.051);
            assertEquals(t.max(), s.axis().maxVacuumAngstrom(), 0.051);
            assertEquals(Medium.VACUUM, s.axis().mediumAsRead(), "VACUUM = T in the primary header");
            assertEquals("1E-17 erg/cm^2/s/Ang", s.fluxUnit(), "BUNIT of the primary header");
            assertTrue(s.hasErrors());
            assertTrue(s.metadata().hasSkyPosition());
        }
    }

    /**
     * The sky spectrum of spec-0266-51630-0168.fits (Sloan Digital Sky Survey public data release,
     * HDU 1 COADD, column {@code sky}, 1e-17 erg/s/cm2/Angstrom like {@code flux}; see the
     * realdata README) comes through the sdss-coadd profile pixel for pixel, as nom-tam-fits reads
     * the column directly. The brightest night-sky line, [O I] 5577.34 Angstrom in air (5578.89
     * vacuum; from memory, common practice), stands far above the sky's median there. Files
     * without a sky (LAMOST DR1 five-row images, the 3C433 long-slit image) have none.
     */
    @Test
    void skySpectrumOfASurveyCoadd() throws Exception {
        Path p = SharedData.realData().resolve("spec-0266-51630-0168.fits");
        for (Optional<InstrumentProfile> profile : List.of(Optional.of(SurveyProfiles.load("sdss-coadd")), Optional.<InstrumentProfile>empty())) {
            Spectrum s = readAll(p, profile).get(0).spectrum().orElseThrow();
            assertTrue(s.hasSky(), "sky column read" + (profile.isEmpty() ? " by its usual name" : ""));
            double[] sky = s.sky();
            float[] direct;
            try (nom.tam.fits.Fits f = new nom.tam.fits.Fits(p.toFile())) {
                nom.tam.fits.BinaryTableHDU t = (nom.tam.fits.BinaryTableHDU) f.getHDU(1);
                direct = (float[]) t.getData().getColumn(findColumn(t, "sky"));
            }
            assertEquals(direct.length, sky.length);
            for (int i = 0; i < sky.length; i++) {
                assertEquals(direct[i], sky[i], 0.0, "pixel " + i);
            }
            double[] wl = s.axis().vacuumAngstrom();
            double peak = 0;
            for (int i = 0; i < wl.length; i++) {
                if (Math.abs(wl[i] - 5578.89) < 3) {
                    peak = Math.max(peak, sky[i]);
                }
            }
            double[] sorted = sky.clone();
            java.util.Arrays.sort(sorted);
            double median = sorted[sorted.length / 2];
            assertTrue(peak > 5 * median, "[O I] 5577 night-sky line in the sky spectrum: peak " + peak + ", median " + median);
            // the object's flux is not the sky: the sky is for display only
            assertFalse(java.util.Arrays.equals(s.flux(), sky));
        }
        Spectrum lamost = readAll(SharedData.realData().resolve("spec-55862-B6212_sp06-093.fits"),
                Optional.of(SurveyProfiles.load("lamost-dr1"))).get(0).spectrum().orElseThrow();
        assertFalse(lamost.hasSky(), "the LAMOST five-row image has no sky row");
        Spectrum slit = readAll(SharedData.realData().resolve("3C433.fits"), Optional.empty()).get(0).spectrum().orElseThrow();
        assertFalse(slit.hasSky());
        assertEquals(null, slit.sky());
    }

    private static int findColumn(nom.tam.fits.BinaryTableHDU t, String name) {
        for (int i = 0; i < t.getNCols(); i++) {
            if (name.equalsIgnoreCase(t.getColumnName(i).trim())) {
                return i;
            }
        }
        throw new AssertionError("no column " + name);
    }

    @Test
    void metadataOfAFiveRowImage() throws Exception {
        Path p = SharedData.realData().resolve("spec-55862-B6212_sp06-093.fits");
        Spectrum s = readAll(p, Optional.of(SurveyProfiles.load("lamost-dr1"))).get(0).spectrum().get();
        // values as written in the file's header (RA, DEC, LONGITUD, LATITUDE, EXPTIME)
        assertEquals("55862-B6212-sp06-093", s.metadata().objectId().get());
        assertEquals(99.598963, s.metadata().raDeg(), 1e-6);
        assertEquals(27.767272, s.metadata().decDeg(), 1e-6);
        assertEquals(117.58, s.metadata().siteLongitudeDeg(), 1e-9);
        assertEquals(40.39, s.metadata().siteLatitudeDeg(), 1e-9);
        assertEquals(3600.0, s.metadata().exposureSeconds(), 0);
        assertFalse(s.metadata().extra().containsKey("fits.Z"), "the published redshift keyword is never read");
    }
}
