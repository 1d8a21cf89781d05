package org.redward.formats.fits.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.zip.GZIPOutputStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.SpectrumRecord;
import org.redward.spectrum.Spectrum;

import nom.tam.fits.BinaryTable;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.ImageHDU;
import nom.tam.util.FitsOutputStream;

/** The bad inputs of the issue, each with a clear error naming the file, HDU and column. */
class BadInputTest {

    @TempDir
    Path dir;

    /** A pixel table: columns wave, flux, ivar (rows = pixels). */
    Path pixelTable(String name, double[] wave, double[] flux, double[] ivar) throws Exception {
        BinaryTable t = BinaryTable.fromColumnMajor(new Object[] {wave, flux, ivar});
        BinaryTableHDU h = t.toHDU();
        h.setColumnName(0, "wave", null);
        h.setColumnName(1, "flux", null);
        h.setColumnName(2, "ivar", null);
        h.getHeader().addValue("EXTNAME", "SPEC", "");
        h.getHeader().addValue("TUNIT1", "Angstrom", "");
        return write(name, h);
    }

    /** A rows table: one spectrum per row, array columns wave and flux of the given lengths. */
    Path rowsTable(String name, int waveLength, int fluxLength, int rows) throws Exception {
        double[][] w = new double[rows][waveLength];
        double[][] f = new double[rows][fluxLength];
        for (int r = 0; r < rows; r++) {
            for (int i = 0; i < waveLength; i++) {
                w[r][i] = 4000 + i;
            }
        }
        BinaryTable t = BinaryTable.fromColumnMajor(new Object[] {w, f});
        BinaryTableHDU h = t.toHDU();
        h.setColumnName(0, "wavelength", null);
        h.setColumnName(1, "flux", null);
        return write(name, h);
    }

    Path write(String name, nom.tam.fits.BasicHDU<?>... hdus) throws Exception {
        Path p = dir.resolve(name);
        try (Fits f = new Fits(); FitsOutputStream out = new FitsOutputStream(Files.newOutputStream(p))) {
            for (nom.tam.fits.BasicHDU<?> h : hdus) {
                f.addHDU(h);
            }
            f.write(out);
        }
        return p;
    }

    static String error(Path p, Optional<InstrumentProfile> profile) {
        try {
            List<SpectrumRecord> r = TestFiles.read(p, profile);
            for (SpectrumRecord x : r) {
                if (!x.ok()) {
                    return x.error();
                }
            }
            return "no error";
        } catch (Exception e) {
            return e.getMessage();
        }
    }

    static InstrumentProfile profile(Map<String, String> settings) {
        return new InstrumentProfile() {
            @Override
            public String id() {
                return "test";
            }

            @Override
            public String description() {
                return "";
            }

            @Override
            public Map<String, String> settings() {
                return settings;
            }

            @Override
            public List<double[]> maskedRegionsVacuumAngstrom() {
                return List.of();
            }
        };
    }

    static void assertNames(String message, String... parts) {
        for (String p : parts) {
            assertTrue(message.contains(p), "'" + p + "' missing in: " + message);
        }
        assertFalse(message.contains("Exception"), "no exception names: " + message);
    }

    @Test
    void notFitsEmptyAndTruncated() throws Exception {
        Path text = dir.resolve("a.fits");
        Files.writeString(text, "hello\n");
        assertNames(error(text, Optional.empty()), "a.fits", "not a FITS file");
        Path empty = dir.resolve("b.fits");
        Files.write(empty, new byte[0]);
        assertNames(error(empty, Optional.empty()), "b.fits", "empty");
        Path good = pixelTable("c.fits", new double[] {4000, 4001, 4002}, new double[] {1, 2, 3}, new double[] {1, 1, 1});
        byte[] all = Files.readAllBytes(good);
        Path cut = dir.resolve("d.fits");
        Files.write(cut, java.util.Arrays.copyOf(all, 2880 + 2880 + 20));
        assertNames(error(cut, Optional.empty()), "d.fits", "HDU 1", "truncated");
        Files.write(cut, java.util.Arrays.copyOf(all, 1000));
        assertNames(error(cut, Optional.empty()), "d.fits", "HDU 0");
    }

    @Test
    void missingHduAndMissingColumn() throws Exception {
        Path p = pixelTable("e.fits", new double[] {4000, 4001}, new double[] {1, 2}, new double[] {1, 1});
        assertNames(error(p, Optional.of(profile(Map.of("hdu", "COADD")))), "e.fits", "HDU 'COADD' (profile setting hdu) is missing",
                "HDU 1 (SPEC) table");
        assertNames(error(p, Optional.of(profile(Map.of("flux.column", "FLUXX")))), "e.fits", "HDU 1 (SPEC)",
                "column 'FLUXX' (profile setting flux.column) is missing");
        assertNames(error(p, Optional.of(profile(Map.of("hdu", "0", "layout", "table")))), "e.fits", "HDU 0", "not a binary table");
    }

    @Test
    void unknownUnitInATableColumn() throws Exception {
        Path p = pixelTable("f.fits", new double[] {4000, 4001}, new double[] {1, 2}, new double[] {1, 1});
        assertNames(error(p, Optional.of(profile(Map.of("wavelength.unit", "parsec")))), "f.fits", "HDU 1 (SPEC)",
                "column 'wave'", "unknown wavelength unit 'parsec'");
    }

    @Test
    void nanFluxAndBadInverseVarianceAreMaskedNotFatal() throws Exception {
        Path p = pixelTable("g.fits", new double[] {4000, 4001, 4002, 4003, 4004},
                new double[] {1, Double.NaN, Double.POSITIVE_INFINITY, 4, 5}, new double[] {1, 1, 1, -2, Double.NaN});
        Spectrum s = TestFiles.read(p, Optional.empty()).get(0).spectrum().orElseThrow();
        assertFalse(s.masked(0));
        for (int i = 1; i < 5; i++) {
            assertTrue(s.masked(i), "pixel " + i);
            assertEquals(0.0, s.inverseVariance(i), 0);
        }
    }

    @Test
    void nonMonotonicAndZeroLengthAxes() throws Exception {
        Path p = pixelTable("h.fits", new double[] {4000, 4002, 4001}, new double[] {1, 2, 3}, new double[] {1, 1, 1});
        assertNames(error(p, Optional.empty()), "h.fits", "HDU 1 (SPEC)", "not strictly monotonic at pixel 2");
        Path z = pixelTable("i.fits", new double[0], new double[0], new double[0]);
        assertNames(error(z, Optional.empty()), "i.fits", "HDU 1 (SPEC)", "no pixels");
        ImageHDU img = (ImageHDU) Fits.makeHDU(new float[0]);
        Path zi = write("j.fits", img);
        assertNames(error(zi, Optional.empty()), "j.fits", "no HDU holds a spectrum");
    }

    @Test
    void mismatchedArrayLengths() throws Exception {
        Path p = rowsTable("k.fits", 10, 12, 3);
        String m = error(p, Optional.empty());
        assertNames(m, "k.fits", "HDU 1 row 0", "column 'wavelength' has 10 values but column 'flux' has 12");
        // an inverse-variance HDU narrower than the flux image
        ImageHDU flux = (ImageHDU) Fits.makeHDU(new float[4][20]);
        flux.getHeader().addValue("CRVAL1", 4000.0, "");
        flux.getHeader().addValue("CDELT1", 1.0, "");
        flux.getHeader().addValue("CRPIX1", 1.0, "");
        ImageHDU ivar = (ImageHDU) Fits.makeHDU(new float[4][19]);
        ivar.getHeader().addValue("EXTNAME", "IVAR", "");
        Path q = write("l.fits", flux, ivar);
        assertNames(error(q, Optional.empty()), "l.fits", "HDU 0 row 0", "HDU 1 (IVAR) has 19 values but the flux has 20");
    }

    @Test
    void gzipThatIsNotGzip() throws Exception {
        Path p = dir.resolve("m.fits.gz");
        Files.write(p, new byte[] {0x1f, (byte) 0x8b, 8, 0, 1, 2, 3, 4, 5, 6, 7, 8, 9});
        assertNames(error(p, Optional.empty()), "m.fits.gz", "not a valid gzip stream");
        Path q = dir.resolve("n.fits.gz");
        Files.writeString(q, "plain text");
        assertNames(error(q, Optional.empty()), "n.fits.gz", "named .gz but is neither gzip nor FITS");
    }

    @Test
    void realGzipIsRead() throws Exception {
        Path p = pixelTable("o.fits", new double[] {4000, 4001}, new double[] {1, 2}, new double[] {1, 1});
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        try (OutputStream z = new GZIPOutputStream(b)) {
            z.write(Files.readAllBytes(p));
        }
        Path gz = dir.resolve("o.fits.gz");
        Files.write(gz, b.toByteArray());
        assertEquals(2, TestFiles.read(gz, Optional.empty()).get(0).spectrum().orElseThrow().size());
    }
}
