package org.redward.lines.internal;

import java.util.Random;

import org.redward.spectrum.Medium;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.Spectrum;

/** Invented test spectra: a log-linear grid, a continuum, Gaussian lines and Gaussian noise. */
final class Synthetic {

    static final double C = 299_792.458;

    private Synthetic() {
    }

    /** A log-linear axis of {@code n} pixels from {@code startAngstrom}, step 1e-4 in log10 (69 km/s). */
    static SpectralAxis axis(double startAngstrom, int n) {
        return SpectralAxis.logLinear(Math.log10(startAngstrom), 1e-4, n, Medium.VACUUM);
    }

    /**
     * @param lines triples (observed centre Angstrom, peak amplitude, FWHM km/s); negative amplitude = absorption
     * @param sigma noise per pixel (0 for none); ivar = 1/sigma^2 (or 1 when sigma = 0)
     */
    static Spectrum spectrum(SpectralAxis axis, double continuum, double[][] lines, double sigma, Random rnd, boolean withErrors) {
        int n = axis.size();
        double[] f = new double[n];
        double[] iv = new double[n];
        for (int i = 0; i < n; i++) {
            double w = axis.vacuumAngstrom(i);
            double y = continuum;
            for (double[] l : lines) {
                double s = l[2] / C * l[0] / (2 * Math.sqrt(2 * Math.log(2)));
                double d = (w - l[0]) / s;
                y += l[1] * Math.exp(-0.5 * d * d);
            }
            f[i] = y + (sigma > 0 ? sigma * rnd.nextGaussian() : 0);
            iv[i] = sigma > 0 ? 1 / (sigma * sigma) : 1;
        }
        return Spectrum.of(axis, f, withErrors ? iv : null, null, "invented", null);
    }
}
