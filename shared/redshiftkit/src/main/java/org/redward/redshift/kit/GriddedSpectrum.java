package org.redward.redshift.kit;

import java.util.Arrays;

import org.redward.spectrum.LogLambdaGrid;
import org.redward.spectrum.Resampling;
import org.redward.spectrum.Spectrum;

/**
 * An observed spectrum resampled (flux-conserving, {@link Resampling}) onto a log10-lambda grid
 * whose pixels sit on integer multiples of the step, so that a redshift is a whole number of
 * pixels plus a fraction: log10(1+z) = shift * step. Weights are inverse variances; a masked,
 * non-finite or user-masked pixel has weight 0 and flux 0.
 *
 * <p>When the file gave no errors ({@link Spectrum#hasErrors()} false) a constant inverse
 * variance is estimated from the pixel-to-pixel scatter: sigma = 1.4826 MAD(x_i - x_{i-1}) / sqrt(2)
 * (common practice for white noise), so chi-square values keep their meaning.
 *
 * <p>Immutable in practice (arrays are not exposed to callers outside this package's users by
 * convention; do not modify them). Thread-safe once built.
 */
public final class GriddedSpectrum {

    /** log10(lambda/Angstrom) of pixel 0 divided by the step (an integer). */
    public final long startIndex;
    public final double log10Step;
    public final double[] flux;
    public final double[] weight;
    public final int usablePixels;
    /** First and last pixel with weight greater than 0 (-1 when none). */
    public final int firstUsable;
    public final int lastUsable;
    public final boolean errorsEstimated;

    private GriddedSpectrum(long startIndex, double step, double[] flux, double[] weight, boolean estimated) {
        this.startIndex = startIndex;
        this.log10Step = step;
        this.flux = flux;
        this.weight = weight;
        int u = 0, first = -1, last = -1;
        for (int i = 0; i < weight.length; i++) {
            if (weight[i] > 0) {
                u++;
                if (first < 0) {
                    first = i;
                }
                last = i;
            }
        }
        this.usablePixels = u;
        this.firstUsable = first;
        this.lastUsable = last;
        this.errorsEstimated = estimated;
    }

    /**
     * Resamples {@code s} onto the aligned log grid with step {@code log10Step}; pixels inside any
     * of {@code maskedVacuumAngstrom} (observed frame, [from, to]) get weight 0.
     *
     * @return the gridded spectrum, or null when the spectrum has fewer than 2 usable pixels
     */
    public static GriddedSpectrum of(Spectrum s, double log10Step, double[][] maskedVacuumAngstrom) {
        if (s.usablePixels() < 2) {
            return null;
        }
        double[] w = s.axis().vacuumAngstrom();
        int first = -1, last = -1;
        for (int i = 0; i < s.size(); i++) {
            if (!s.masked(i)) {
                if (first < 0) {
                    first = i;
                }
                last = i;
            }
        }
        if (first == last || !(w[last] > w[first] * Math.pow(10, 4 * log10Step))) {
            return null;
        }
        LogLambdaGrid grid = LogLambdaGrid.covering(w[first], w[last], log10Step);
        Spectrum r = Resampling.toLogLambda(s, grid);
        double[] f = r.flux();
        double[] iv = r.inverseVariance();
        boolean[] m = r.mask();
        double[] lam = grid.vacuumAngstrom();
        for (int i = 0; i < f.length; i++) {
            if (m[i] || !Double.isFinite(f[i]) || !(iv[i] > 0) || !Double.isFinite(iv[i]) || inside(lam[i], maskedVacuumAngstrom)) {
                f[i] = 0;
                iv[i] = 0;
            }
        }
        boolean estimated = false;
        if (!s.hasErrors()) {
            double sigma = scatterSigma(f, iv);
            double ivar = sigma > 0 && Double.isFinite(sigma) ? 1.0 / (sigma * sigma) : 1.0;
            for (int i = 0; i < f.length; i++) {
                if (iv[i] > 0) {
                    iv[i] = ivar;
                }
            }
            estimated = true;
        }
        long start = Math.round(grid.log10StartAngstrom() / log10Step);
        GriddedSpectrum g = new GriddedSpectrum(start, log10Step, f, iv, estimated);
        return g.usablePixels < 2 ? null : g;
    }

    /** Builds directly from arrays on an aligned grid (used by tests and benchmarks). */
    public static GriddedSpectrum ofArrays(long startIndex, double log10Step, double[] flux, double[] weight) {
        return new GriddedSpectrum(startIndex, log10Step, flux.clone(), weight.clone(), false);
    }

    private static boolean inside(double lam, double[][] regions) {
        if (regions == null) {
            return false;
        }
        for (double[] r : regions) {
            if (r != null && r.length >= 2 && lam >= r[0] && lam <= r[1]) {
                return true;
            }
        }
        return false;
    }

    /** Robust white-noise sigma from first differences of usable neighbours. */
    static double scatterSigma(double[] f, double[] iv) {
        double[] d = new double[f.length];
        int k = 0;
        for (int i = 1; i < f.length; i++) {
            if (iv[i] > 0 && iv[i - 1] > 0) {
                d[k++] = f[i] - f[i - 1];
            }
        }
        if (k < 5) {
            return Double.NaN;
        }
        double[] a = Arrays.copyOf(d, k);
        double med = Stats.median(a);
        for (int i = 0; i < k; i++) {
            a[i] = Math.abs(a[i] - med);
        }
        return 1.4826 * Stats.median(a) / Math.sqrt(2.0);
    }

    public int size() {
        return flux.length;
    }

    /** Observed vacuum wavelength of pixel i, Angstrom. */
    public double vacuumAngstrom(int i) {
        return Math.pow(10.0, (startIndex + i) * log10Step);
    }

    /** Median signal-to-noise per pixel over usable pixels (|flux| * sqrt(weight)). */
    public double medianSnr() {
        double[] a = new double[usablePixels];
        int k = 0;
        for (int i = 0; i < flux.length; i++) {
            if (weight[i] > 0) {
                a[k++] = Math.abs(flux[i]) * Math.sqrt(weight[i]);
            }
        }
        return k == 0 ? 0 : Stats.median(a);
    }
}
