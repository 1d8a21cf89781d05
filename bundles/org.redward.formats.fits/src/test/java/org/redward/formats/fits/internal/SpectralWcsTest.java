package org.redward.formats.fits.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.spectrum.AirVacuum;
import org.redward.spectrum.Medium;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.Spectrum;

/**
 * Spectral axes built from the definitions of FITS WCS Paper III (Greisen, Calabretta, Valdes
 * &amp; Allen 2006, A&amp;A 446, 747): pixel coordinate p (1-based), intermediate coordinate
 * w = CDELT (p - CRPIX) (or CD), linear axes x = CRVAL + w, logarithmic axes (-LOG)
 * x = CRVAL exp(w / CRVAL) (Paper III eq. 5; equation number from memory), default CUNIT m
 * for wavelength and Hz for frequency, AWAV = air and WAVE = vacuum wavelengths; CRPIX
 * defaults to 0 (FITS Standard 4.0, section 8.2).
 */
class SpectralWcsTest {

    @TempDir
    Path dir;

    Spectrum one(Path p) throws Exception {
        return TestFiles.read(p, Optional.empty()).get(0).spectrum().orElseThrow();
    }

    @Test
    void linearVacuumWavelength() throws Exception {
        Spectrum s = one(TestFiles.image1d(dir, "a.fits", TestFiles.ramp(100), "CTYPE1", "WAVE", "CUNIT1", "Angstrom",
                "CRPIX1", 1.0, "CRVAL1", 5000.0, "CDELT1", 2.0));
        assertEquals(5000.0, s.axis().vacuumAngstrom(0), 1e-9);
        assertEquals(5018.0, s.axis().vacuumAngstrom(9), 1e-9);
        assertEquals(Medium.VACUUM, s.axis().mediumAsRead());
        assertEquals(Sampling.LINEAR, s.axis().samplingAsRead());
    }

    @Test
    void referencePixelAndCdMatrix() throws Exception {
        // CRPIX1 = 50.5 and CD1_1 (which wins over CDELT1): x(p) = 6000 + 0.5 (p - 50.5)
        Spectrum s = one(TestFiles.image1d(dir, "b.fits", TestFiles.ramp(100), "CTYPE1", "WAVE", "CUNIT1", "nm",
                "CRPIX1", 50.5, "CRVAL1", 600.0, "CDELT1", 9.0, "CD1_1", 0.05));
        assertEquals(10 * (600.0 + 0.05 * (1 - 50.5)), s.axis().vacuumAngstrom(0), 1e-9);
        assertEquals(10 * (600.0 + 0.05 * (100 - 50.5)), s.axis().vacuumAngstrom(99), 1e-9);
    }

    @Test
    void defaultUnitIsMetreAndDefaultReferencePixelIsZero() throws Exception {
        Spectrum s = one(TestFiles.image1d(dir, "c.fits", TestFiles.ramp(10), "CTYPE1", "WAVE",
                "CRVAL1", 5.0e-7, "CDELT1", 1.0e-10));
        // p = 1: w = 1e-10 (1 - 0) m
        assertEquals(5001.0, s.axis().vacuumAngstrom(0), 1e-6);
    }

    @Test
    void airWavelengthsAreConvertedToVacuum() throws Exception {
        Spectrum s = one(TestFiles.image1d(dir, "d.fits", TestFiles.ramp(10), "CTYPE1", "AWAV", "CUNIT1", "Angstrom",
                "CRPIX1", 1.0, "CRVAL1", 6562.801, "CDELT1", 1.0));
        assertEquals(Medium.AIR, s.axis().mediumAsRead());
        // air 6562.801 -> vacuum 6564.614 (REFERENCES section 3, Morton 2000), to 0.01 Angstrom
        assertEquals(6564.614, s.axis().vacuumAngstrom(0), 0.01);
        assertEquals(AirVacuum.airToVacuumAngstrom(6563.801), s.axis().vacuumAngstrom(1), 1e-9);
    }

    @Test
    void logarithmicWavelengthAxis() throws Exception {
        Spectrum s = one(TestFiles.image1d(dir, "e.fits", TestFiles.ramp(2001), "CTYPE1", "WAVE-LOG", "CUNIT1", "Angstrom",
                "CRPIX1", 1.0, "CRVAL1", 4000.0, "CDELT1", 0.4));
        assertEquals(4000.0, s.axis().vacuumAngstrom(0), 1e-9);
        assertEquals(4000.0 * Math.exp(0.1), s.axis().vacuumAngstrom(1000), 1e-9);
        assertEquals(4000.0 * Math.exp(0.2), s.axis().vacuumAngstrom(2000), 1e-9);
        // constant ratio between neighbours: exp(CDELT / CRVAL)
        for (int i = 1; i < 2001; i += 250) {
            assertEquals(Math.exp(1e-4), s.axis().vacuumAngstrom(i) / s.axis().vacuumAngstrom(i - 1), 1e-12);
        }
        assertEquals(Sampling.LOG_LINEAR, s.axis().samplingAsRead());
    }

    @Test
    void frequencyAxisOfTheHydrogenLine() throws Exception {
        // H I hyperfine line 1 420 405 751.768 Hz (Hellwig et al. 1970): lambda = c / nu = 21.1061140542 cm
        // (REFERENCES section 2). Frequency falls as wavelength grows: the pixels are stored reversed.
        Spectrum s = one(TestFiles.image1d(dir, "f.fits", TestFiles.ramp(5), "CTYPE1", "FREQ",
                "CRPIX1", 3.0, "CRVAL1", 1420405751.768, "CDELT1", 1000.0));
        assertEquals(21.1061140542e8, s.axis().vacuumAngstrom(2), 1.0);
        assertTrue(s.axis().vacuumAngstrom(0) < s.axis().vacuumAngstrom(4));
        assertEquals(Medium.VACUUM, s.axis().mediumAsRead());
    }

    @Test
    void olderLogLinearKeywords() throws Exception {
        // the DC-FLAG = 1 convention: x = 10^(CRVAL1 + CDELT1 (p - CRPIX1)) (common practice)
        Spectrum s = one(TestFiles.image1d(dir, "g.fits", TestFiles.ramp(10), "CTYPE1", "LINEAR", "CRPIX1", 1.0,
                "CRVAL1", 3.6, "CDELT1", 1e-4, "DC-FLAG", 1, "VACUUM", true));
        assertEquals(Math.pow(10, 3.6), s.axis().vacuumAngstrom(0), 1e-9);
        assertEquals(Math.pow(10, 3.6009), s.axis().vacuumAngstrom(9), 1e-9);
    }

    @Test
    void unsupportedAndBrokenAxesAreNamed() throws Exception {
        TestFiles.image1d(dir, "h.fits", TestFiles.ramp(10), "CTYPE1", "WAVE", "CUNIT1", "furlong", "CRVAL1", 1.0, "CDELT1", 1.0);
        String m = TestFiles.readQuietly(dir, "h.fits");
        assertTrue(m.contains("h.fits") && m.contains("HDU 0") && m.contains("unknown unit 'furlong' in CUNIT1"), m);
        TestFiles.image1d(dir, "i.fits", TestFiles.ramp(10), "CTYPE1", "VRAD", "CRVAL1", 1.0, "CDELT1", 1.0);
        m = TestFiles.readQuietly(dir, "i.fits");
        assertTrue(m.contains("CTYPE1 = 'VRAD' is not a spectral axis"), m);
        TestFiles.image1d(dir, "j.fits", TestFiles.ramp(10), "CTYPE1", "WAVE", "CRVAL1", 1.0, "CDELT1", 0.0);
        m = TestFiles.readQuietly(dir, "j.fits");
        assertTrue(m.contains("the pixel step (CDELT1/CD1_1) is zero"), m);
        TestFiles.image1d(dir, "k.fits", TestFiles.ramp(10), "CTYPE1", "WAVE", "CDELT1", 1.0);
        m = TestFiles.readQuietly(dir, "k.fits");
        assertTrue(m.contains("keyword CRVAL1 is missing"), m);
    }
}
