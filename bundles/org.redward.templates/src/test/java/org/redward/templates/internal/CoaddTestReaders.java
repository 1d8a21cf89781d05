package org.redward.templates.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.formats.SpectrumReadException;
import org.redward.api.formats.SpectrumReader;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;
import org.redward.api.registry.Provided;
import org.redward.spectrum.Medium;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;

import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;

/**
 * A minimal stand-in reader registry for tests of {@code templates build} (the real readers are
 * another bundle's): reads the published layout of SDSS "spec" files as the shared data's
 * README describes it, HDU 1 columns {@code flux}, {@code loglam} (log10 vacuum Angstrom),
 * {@code ivar}, {@code and_mask}; good pixels have ivar &gt; 0 and no and_mask bit. It reads
 * nothing else (never the published redshift, class or model).
 */
final class CoaddTestReaders implements ReaderRegistry {

    static final class CoaddReader implements SpectrumReader {
        @Override
        public int sniff(Path file, byte[] head) {
            // test-only: any FITS file; open() fails on other layouts
            return new String(head, StandardCharsets.US_ASCII).startsWith("SIMPLE  =") ? 60 : 0;
        }

        @Override
        public SpectrumSource open(Path file, Optional<InstrumentProfile> profile) throws SpectrumReadException {
            Spectrum s;
            try (Fits fits = new Fits(file.toFile())) {
                BinaryTableHDU t = (BinaryTableHDU) fits.getHDU(1);
                float[] flux = (float[]) t.getColumn("flux");
                float[] loglam = (float[]) t.getColumn("loglam");
                float[] ivar = (float[]) t.getColumn("ivar");
                int[] andMask = (int[]) t.getColumn("and_mask");
                int n = flux.length;
                double[] w = new double[n];
                double[] f = new double[n];
                double[] iv = new double[n];
                boolean[] m = new boolean[n];
                for (int i = 0; i < n; i++) {
                    w[i] = Math.pow(10.0, loglam[i]);
                    f[i] = flux[i];
                    iv[i] = ivar[i];
                    m[i] = !(ivar[i] > 0) || andMask[i] != 0;
                }
                s = Spectrum.of(SpectralAxis.of(w, SpectralUnit.ANGSTROM, Medium.VACUUM, Sampling.TABULATED), f, iv, m, "", null);
            } catch (Exception e) {
                throw new SpectrumReadException(file, "HDU 1: " + e.getMessage(), e);
            }
            Spectrum one = s;
            return new SpectrumSource() {
                private boolean done;
                @Override public String layout() { return "test: coadd table"; }
                @Override public long count() { return 1; }
                @Override public boolean hasNext() { return !done; }
                @Override public SpectrumRecord next() {
                    done = true;
                    return SpectrumRecord.ok(file, 0, "HDU 1", one);
                }
                @Override public void close() throws IOException { }
            };
        }
    }

    @Override
    public String family() {
        return FAMILY;
    }

    @Override
    public List<Provided<SpectrumReader>> providers() {
        return List.of(Provided.of("test-coadd", new CoaddReader(), "test", "0", "test reader", Map.of()));
    }
}
