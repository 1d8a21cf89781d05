package org.redward.templates.internal;

import java.nio.file.Path;
import java.util.List;

import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.formats.SpectrumRecord;
import org.redward.spectrum.Medium;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;

import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;

/**
 * A minimal stand-in for the reading facade in tests of {@code templates build} without a
 * framework (the real readers are other bundles'): reads the published layout of SDSS "spec"
 * files as the shared data's README describes it, HDU 1 columns {@code flux}, {@code loglam}
 * (log10 vacuum Angstrom), {@code ivar}, {@code and_mask}; good pixels have ivar &gt; 0 and no
 * and_mask bit. It reads nothing else (never the published redshift, class or model).
 */
final class CoaddTestInputs implements SpectrumInputs {

    static SpectrumRecord read(Path file) {
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
            Spectrum s = Spectrum.of(SpectralAxis.of(w, SpectralUnit.ANGSTROM, Medium.VACUUM, Sampling.TABULATED), f, iv, m, "", null);
            return SpectrumRecord.ok(file, 0, "HDU 1", s);
        } catch (Exception e) {
            return SpectrumRecord.failed(file, -1, "", file + ", HDU 1: " + e.getMessage());
        }
    }

    @Override
    public Stream open(List<Path> inputs, ReadOptions options) {
        return new Stream() {
            private int next;
            @Override public boolean hasNext() { return next < inputs.size(); }
            @Override public SpectrumRecord next() { return read(inputs.get(next++)); }
            @Override public int filesDone() { return next; }
            @Override public int files() { return inputs.size(); }
            @Override public void close() { }
        };
    }

    @Override
    public List<Path> expand(List<Path> inputs) {
        return inputs;
    }
}
