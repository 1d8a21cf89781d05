package org.redward.formats.fits.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumWriter;
import org.redward.spectrum.Medium;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;

/** Spectra written by the FITS writer read back identical (synthetic values: a format test). */
class RoundTripTest {

    static List<Spectrum> samples(int count, long seed) {
        Random r = new Random(seed);
        List<Spectrum> out = new ArrayList<>();
        for (int k = 0; k < count; k++) {
            int n = 50 + r.nextInt(200);
            SpectralAxis axis = k % 2 == 0 ? SpectralAxis.linear(3600 + r.nextDouble(), 1.7, n, SpectralUnit.ANGSTROM, Medium.AIR)
                    : SpectralAxis.logLinear(3.55, 1e-4, n, Medium.VACUUM);
            double[] f = new double[n];
            double[] iv = new double[n];
            boolean[] m = new boolean[n];
            for (int i = 0; i < n; i++) {
                f[i] = r.nextGaussian() * 1e-3 + (i == 3 ? Double.NaN : 0);
                iv[i] = r.nextDouble() < 0.05 ? 0 : r.nextDouble() * 1e6;
                m[i] = r.nextDouble() < 0.03;
            }
            SpectrumMetadata md = SpectrumMetadata.builder().objectId("obj-" + k).skyPosition(r.nextDouble() * 360, r.nextDouble() * 180 - 90)
                    .midExposureMjdUtc(60000.123456789 + k).exposureSeconds(900).site(-70.5, -30.25, 2400).instrument("bench")
                    .extra("note", "first \"quoted\" & long " + "x".repeat(90)).extra("seeing", "0.8").build();
            out.add(Spectrum.of(axis, f, k == 2 ? null : iv, m, k == 1 ? "" : "1e-17 erg/s/cm2/Angstrom", md));
        }
        return out;
    }

    static void assertSame(Spectrum a, Spectrum b) {
        assertArrayEquals(a.axis().vacuumAngstrom(), b.axis().vacuumAngstrom(), 0.0);
        assertArrayEquals(a.flux(), b.flux(), 0.0);
        assertArrayEquals(a.inverseVariance(), b.inverseVariance(), 0.0);
        assertArrayEquals(a.mask(), b.mask());
        assertEquals(a.fluxUnit(), b.fluxUnit());
        assertEquals(a.hasErrors(), b.hasErrors());
        assertEquals(a.metadata(), b.metadata());
    }

    @Test
    void fitsTablesRoundTripExactly(@TempDir Path dir) throws Exception {
        List<Spectrum> in = samples(5, 7);
        Path p = dir.resolve("out.fits");
        try (SpectrumWriter.Sink sink = new FitsTableWriter().open(p)) {
            for (Spectrum s : in) {
                sink.write(s);
            }
        }
        List<SpectrumRecord> back = TestFiles.read(p, Optional.empty());
        assertEquals(in.size(), back.size());
        for (int i = 0; i < in.size(); i++) {
            assertSame(in.get(i), back.get(i).spectrum().orElseThrow(() -> new AssertionError(back.get(0).error())));
        }
    }
}
