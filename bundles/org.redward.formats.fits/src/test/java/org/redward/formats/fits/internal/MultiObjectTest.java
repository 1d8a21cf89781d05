package org.redward.formats.fits.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.formats.SpectrumRecord;
import org.redward.spectrum.Spectrum;

import nom.tam.fits.BinaryTable;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.ImageHDU;

/** Files of many spectra (synthetic values: a format test): one per table row, one per image row. */
class MultiObjectTest {

    @TempDir
    Path dir;

    Path write(String name, nom.tam.fits.BasicHDU<?>... hdus) throws Exception {
        return TestFiles.write(dir, name, hdus);
    }

    @Test
    void oneSpectrumPerTableRowWithPositionsAndIds() throws Exception {
        int rows = 4;
        int n = 25;
        float[][] flux = new float[rows][n];
        float[][] ivar = new float[rows][n];
        for (int r = 0; r < rows; r++) {
            for (int i = 0; i < n; i++) {
                flux[r][i] = r + i;
                ivar[r][i] = 4;
            }
        }
        BinaryTableHDU t = BinaryTable.fromColumnMajor(new Object[] {flux, ivar, new double[] {10, 20, 30, 40},
            new double[] {-5, 0, 5, 10}, new String[] {"w1", "w2", "w3", "w4"}}).toHDU();
        String[] names = {"FLUX", "IVAR", "RA", "DEC", "OBJ_ID"};
        for (int i = 0; i < names.length; i++) {
            t.setColumnName(i, names[i], null);
        }
        TestFiles.addCards(t.getHeader(), "EXTNAME", "FIBRES", "CTYPE1", "AWAV", "CUNIT1", "Angstrom", "CRPIX1", 1.0,
                "CRVAL1", 5000.0, "CDELT1", 2.0);
        Path p = write("rows.fits", new nom.tam.fits.NullDataHDU(), t);
        List<SpectrumRecord> recs = TestFiles.read(p, Optional.empty());
        assertEquals(rows, recs.size());
        for (int r = 0; r < rows; r++) {
            Spectrum s = recs.get(r).spectrum().orElseThrow(() -> new AssertionError(recs.get(0).error()));
            assertEquals("w" + (r + 1), s.metadata().objectId().get());
            assertEquals(10.0 * (r + 1), s.metadata().raDeg(), 0);
            assertEquals(-5.0 + 5 * r, s.metadata().decDeg(), 0);
            assertEquals(r + 3.0, s.flux(3), 0);
            assertEquals(4.0, s.inverseVariance(3), 0);
            assertEquals(n, s.size());
            assertTrue(recs.get(r).location().contains("HDU 1 (FIBRES) row " + r));
        }
    }

    @Test
    void oneSpectrumPerImageRowWithAnInverseVarianceHdu() throws Exception {
        float[][] flux = new float[3][10];
        float[][] ivar = new float[3][10];
        for (int r = 0; r < 3; r++) {
            for (int i = 0; i < 10; i++) {
                flux[r][i] = 10 * r + i;
                ivar[r][i] = r == 1 && i == 2 ? 0 : 9;
            }
        }
        ImageHDU f = (ImageHDU) Fits.makeHDU(flux);
        TestFiles.addCards(f.getHeader(), "CTYPE1", "WAVE", "CUNIT1", "nm", "CRPIX1", 1.0, "CRVAL1", 400.0, "CDELT1", 0.5);
        ImageHDU iv = (ImageHDU) Fits.makeHDU(ivar);
        iv.getHeader().addValue("EXTNAME", "IVAR", "");
        List<SpectrumRecord> recs = TestFiles.read(write("img.fits", f, iv), Optional.empty());
        assertEquals(3, recs.size());
        Spectrum s = recs.get(1).spectrum().orElseThrow();
        assertEquals(4005.0, s.axis().vacuumAngstrom(1), 1e-9);
        assertEquals(13.0, s.flux(3), 0);
        assertTrue(s.masked(2), "ivar 0 -> masked");
        assertEquals(9.0, s.inverseVariance(3), 0);
        assertTrue(recs.get(1).location().equals("HDU 0 row 1"), recs.get(1).location());
    }
}
