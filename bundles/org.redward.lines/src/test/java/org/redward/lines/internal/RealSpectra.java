package org.redward.lines.internal;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.Header;
import nom.tam.fits.ImageHDU;
import org.redward.spectrum.Medium;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;
import org.redward.testkit.SharedData;

/**
 * Test-only readers of the public layouts in ../shared/realdata (see its README): SDSS "spec"
 * files (HDU 1 columns loglam, flux, ivar only), the LAMOST DR1 image (rows flux and inverse
 * variance, log-linear WCS) and the 1D long-slit image with a linear air-wavelength WCS. The
 * answer columns and keywords (Z, CLASS, model, line fits) are never read here; the published
 * redshift is read from truth.tsv only as the reference value.
 */
final class RealSpectra {

    private RealSpectra() {
    }

    static Path file(String name) {
        return SharedData.realData().resolve(name);
    }

    /** Published z per file name, from truth.tsv (the reference value only). */
    static Map<String, Double> publishedZ() throws IOException {
        Map<String, Double> out = new LinkedHashMap<>();
        try (BufferedReader r = Files.newBufferedReader(SharedData.realData().resolve("truth.tsv"))) {
            String header = r.readLine();
            String[] cols = header.split("\t");
            int fi = indexOf(cols, "file");
            int zi = indexOf(cols, "z_published");
            String line;
            while ((line = r.readLine()) != null) {
                String[] f = line.split("\t");
                out.put(f[fi], Double.parseDouble(f[zi]));
            }
        }
        return out;
    }

    private static int indexOf(String[] a, String s) {
        for (int i = 0; i < a.length; i++) {
            if (a[i].equals(s)) {
                return i;
            }
        }
        throw new IllegalStateException("truth.tsv has no column " + s);
    }

    static Spectrum read(String name) throws Exception {
        Path p = file(name);
        if (name.startsWith("spec-55862")) {
            return lamost(p);
        }
        if (name.equals("3C433.fits")) {
            return linearImage(p);
        }
        return sdss(p);
    }

    private static Spectrum sdss(Path p) throws Exception {
        try (Fits fits = new Fits(p.toFile())) {
            BinaryTableHDU t = (BinaryTableHDU) fits.getHDU(1);
            double[] loglam = column(t, "loglam");
            double[] flux = column(t, "flux");
            double[] ivar = column(t, "ivar");
            double[] lam = new double[loglam.length];
            for (int i = 0; i < lam.length; i++) {
                lam[i] = Math.pow(10.0, loglam[i]);
            }
            return Spectrum.of(SpectralAxis.of(lam, SpectralUnit.ANGSTROM, Medium.VACUUM, Sampling.LOG_LINEAR), flux, ivar, null,
                    "1e-17 erg/s/cm2/Angstrom", null);
        }
    }

    private static double[] column(BinaryTableHDU t, String name) throws Exception {
        int c = t.findColumn(name);
        Object o = t.getColumn(c);
        if (o instanceof float[] f) {
            double[] d = new double[f.length];
            for (int i = 0; i < f.length; i++) {
                d[i] = f[i];
            }
            return d;
        }
        return (double[]) o;
    }

    private static Spectrum lamost(Path p) throws Exception {
        try (Fits fits = new Fits(p.toFile())) {
            ImageHDU h = (ImageHDU) fits.getHDU(0);
            Header hd = h.getHeader();
            float[][] data = (float[][]) h.getKernel();
            double c0 = hd.getDoubleValue("COEFF0");
            double c1 = hd.getDoubleValue("COEFF1");
            int n = data[0].length;
            double[] flux = new double[n];
            double[] ivar = new double[n];
            for (int i = 0; i < n; i++) {
                flux[i] = data[0][i];
                ivar[i] = data[1][i];
            }
            return Spectrum.of(SpectralAxis.logLinear(c0, c1, n, Medium.VACUUM), flux, ivar, null, "relative", null);
        }
    }

    private static Spectrum linearImage(Path p) throws Exception {
        try (Fits fits = new Fits(p.toFile())) {
            ImageHDU h = (ImageHDU) fits.getHDU(0);
            Header hd = h.getHeader();
            Object k = h.getKernel();
            float[] d = k instanceof float[] f ? f : ((float[][]) k)[0];
            double crval = hd.getDoubleValue("CRVAL1");
            double cd = hd.getDoubleValue("CD1_1", hd.getDoubleValue("CDELT1"));
            double crpix = hd.getDoubleValue("CRPIX1", 1.0);
            double[] flux = new double[d.length];
            for (int i = 0; i < d.length; i++) {
                flux[i] = d[i];
            }
            return Spectrum.of(SpectralAxis.linear(crval + (1 - crpix) * cd, cd, d.length, SpectralUnit.ANGSTROM, Medium.AIR),
                    flux, null, null, "erg/cm2/s/A", null);
        }
    }
}
