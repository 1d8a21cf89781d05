package org.redward.formats.text.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.formats.SpectrumReadException;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;
import org.redward.api.formats.SpectrumWriter;
import org.redward.spectrum.AirVacuum;
import org.redward.spectrum.Medium;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;

class TextReaderTest {

    @TempDir
    Path dir;

    static List<SpectrumRecord> read(Path p) throws Exception {
        List<SpectrumRecord> out = new ArrayList<>();
        try (SpectrumSource s = new TextReader().open(p, Optional.empty())) {
            while (s.hasNext()) {
                out.add(s.next());
            }
        }
        return out;
    }

    Path write(String name, String text) throws Exception {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    @Test
    void csvWithUnitsInTheHeader() throws Exception {
        Path p = write("a.csv", "# object_id: demo-1\n# medium: air\nwavelength [nm],flux [erg/s/cm2/A],error\n"
                + "656.2801,1.5,0.5\n656.3801,2.5,0\n656.4801,NaN,0.25\n");
        assertTrue(new TextReader().sniff(p, Files.readAllBytes(p)) >= 70);
        Spectrum s = read(p).get(0).spectrum().orElseThrow();
        // air 6562.801 -> vacuum 6564.614 Angstrom (REFERENCES section 3, Morton 2000)
        assertEquals(6564.614, s.axis().vacuumAngstrom(0), 0.01);
        assertEquals(Medium.AIR, s.axis().mediumAsRead());
        assertEquals("erg/s/cm2/A", s.fluxUnit());
        assertEquals(4.0, s.inverseVariance(0), 0, "sigma 0.5 -> ivar 4");
        assertTrue(s.masked(1), "sigma 0 -> masked");
        assertTrue(s.masked(2), "NaN flux -> masked");
        assertEquals("demo-1", s.metadata().objectId().get());
    }

    @Test
    void whitespaceColumnsWithoutHeader() throws Exception {
        Path p = write("b.dat", "# plain\n4000.0  1.0  0.1\n4001.0 2.0 0.2\n\n4002.0\t3.0 0.3\n");
        assertTrue(new TextReader().sniff(p, Files.readAllBytes(p)) >= 35);
        Spectrum s = read(p).get(0).spectrum().orElseThrow();
        assertEquals(3, s.size());
        assertEquals(AirVacuum.airToVacuumAngstrom(4001.0), s.axis().vacuumAngstrom(1), 1e-9, "air assumed");
        assertEquals(25.0, s.inverseVariance(1), 1e-9);
        assertTrue(s.metadata().extra().get("redward.medium_source").startsWith("assumed"));
    }

    @Test
    void badRowsAreNamedAndTheNextSpectrumGoesOn() throws Exception {
        Path p = write("c.csv", "spectrum,wavelength_vacuum_angstrom,flux\n0,4000,1\n0,4001,x\n1,5000,1\n1,5001,2\n2,6000,1\n2,5999,1\n3,4000,1,9\n");
        List<SpectrumRecord> r = read(p);
        assertEquals(4, r.size());
        assertTrue(r.get(0).error().contains("c.csv: spectrum 0: line 3, column 'flux': 'x' is not a number"), r.get(0).error());
        assertTrue(r.get(1).ok());
        assertTrue(r.get(2).error().contains("not strictly monotonic"), r.get(2).error());
        assertTrue(r.get(3).error().contains("line 8: 4 fields, expected 3"), r.get(3).error());
    }

    @Test
    void unknownUnitEmptyAndBinaryFilesFailClearly() throws Exception {
        Path u = write("d.csv", "wavelength [furlong],flux\n1,2\n");
        SpectrumReadException e = assertThrows(SpectrumReadException.class, () -> read(u));
        assertTrue(e.getMessage().contains("d.csv: line 1 (header): column 'wavelength [furlong]': unknown wavelength unit 'furlong'"),
                e.getMessage());
        Path empty = write("e.csv", "# nothing\n");
        assertTrue(assertThrows(SpectrumReadException.class, () -> read(empty)).getMessage().contains("no data rows"));
        Path bin = dir.resolve("f.csv");
        Files.write(bin, new byte[] {(byte) 0xff, (byte) 0xfe, 0, 1, 2});
        assertEquals(0, new TextReader().sniff(bin, Files.readAllBytes(bin)));
        assertThrows(SpectrumReadException.class, () -> read(bin));
    }

    /** Spectra written by the CSV writer read back identical (synthetic values: a format test). */
    @Test
    void csvRoundTripIsExact() throws Exception {
        Random r = new Random(3);
        List<Spectrum> in = new ArrayList<>();
        for (int k = 0; k < 4; k++) {
            int n = 20 + r.nextInt(50);
            SpectralAxis axis = SpectralAxis.linear(500 + r.nextDouble(), 0.17, n, SpectralUnit.NANOMETRE, k % 2 == 0 ? Medium.AIR : Medium.VACUUM);
            double[] f = new double[n];
            double[] iv = new double[n];
            for (int i = 0; i < n; i++) {
                f[i] = r.nextGaussian() * 1e-17;
                iv[i] = r.nextDouble() < 0.1 ? -1 : r.nextDouble() * 1e34;
            }
            SpectrumMetadata md = SpectrumMetadata.builder().objectId("t" + k).skyPosition(12.5, -3.25).midExposureMjdUtc(59000.5)
                    .instrument("bench, \"line\"\nbreak").extra("k", "v\\w").build();
            in.add(Spectrum.of(axis, f, k == 3 ? null : iv, null, "1e-17 erg/s/cm2/A", md));
        }
        Path p = dir.resolve("out.csv");
        try (SpectrumWriter.Sink sink = new CsvWriter().open(p)) {
            for (Spectrum s : in) {
                sink.write(s);
            }
        }
        List<SpectrumRecord> back = read(p);
        assertEquals(in.size(), back.size());
        for (int i = 0; i < in.size(); i++) {
            Spectrum a = in.get(i);
            Spectrum b = back.get(i).spectrum().orElseThrow(() -> new AssertionError(back.get(0).error()));
            assertArrayEquals(a.axis().vacuumAngstrom(), b.axis().vacuumAngstrom(), 0.0);
            assertArrayEquals(a.flux(), b.flux(), 0.0);
            assertArrayEquals(a.inverseVariance(), b.inverseVariance(), 0.0);
            assertArrayEquals(a.mask(), b.mask());
            assertEquals(a.fluxUnit(), b.fluxUnit());
            assertEquals(a.hasErrors(), b.hasErrors());
            assertEquals(a.metadata(), b.metadata());
        }
        assertFalse(back.get(3).spectrum().get().hasErrors());
    }
}
