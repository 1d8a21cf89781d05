package org.redward.redshift.xcorr.internal;

import org.redward.redshift.kit.Continuum;
import org.redward.redshift.kit.FftCorrelator;
import org.redward.redshift.kit.Peaks;
import org.redward.redshift.kit.Stats;

/**
 * The numerical steps of Fourier cross-correlation (Tonry & Davis 1979, AJ 84, 1511) on a
 * log10-lambda grid. Stateless and thread-safe.
 *
 * <ol>
 * <li>Continuum removal: subtract a box-median continuum ({@link Continuum}, {@value #CONTINUUM_BOX}
 * pixels, about 17,000 km/s at step 1e-4); masked pixels become 0.</li>
 * <li>Noise weighting (our addition, common practice): each pixel is multiplied by
 * min(1, sqrt(w / median w)) so that sky-line residuals and noisy ends do not dominate.</li>
 * <li>Apodisation: a cosine bell over {@value #APODISE_FRACTION} of the usable span at each end.</li>
 * <li>Band-pass filter in Fourier space: zero below wavenumber N/400, cosine ramp to N/200, flat,
 * cosine ramp down from N/5 to N/3 (periods longer than 400 or shorter than 3 pixels removed).</li>
 * <li>Correlation c(k) = sum g(i) t(i - k) / sqrt(sum g^2 sum t^2) through FFTs.</li>
 * <li>Peak: parabola through the highest point and its neighbours; the r statistic r = h /
 * (sqrt(2) sigma_a), sigma_a^2 = (1/2W) sum_{n=1..W} [c(d+n) - c(d-n)]^2 (TD79 as restated by
 * Verschueren & David 1999, A&AS 136, 591); FWHM w of the peak by linear interpolation at half
 * height.</li>
 * <li>Error: sigma (pixels) = (3/8) w / (1 + r) (Kurtz & Mink 1998, PASP 110, 934).</li>
 * </ol>
 */
final class CrossCorrelation {

    static final int CONTINUUM_BOX = 401;
    static final double APODISE_FRACTION = 0.05;

    private CrossCorrelation() {
    }

    /** Steps 1-3 for flux with weights; returns the prepared signal (same length). */
    static double[] prepare(double[] flux, double[] weight) {
        int n = flux.length;
        double[] cont = Continuum.boxMedian(flux, weight, CONTINUUM_BOX);
        double[] pos = new double[n];
        int k = 0;
        int first = -1, last = -1;
        for (int i = 0; i < n; i++) {
            if (weight[i] > 0) {
                pos[k++] = weight[i];
                if (first < 0) {
                    first = i;
                }
                last = i;
            }
        }
        double[] g = new double[n];
        if (k == 0 || !Double.isFinite(cont[0])) {
            return g;
        }
        double medW = Stats.median(java.util.Arrays.copyOf(pos, k));
        for (int i = 0; i < n; i++) {
            if (weight[i] > 0) {
                g[i] = (flux[i] - cont[i]) * Math.min(1.0, Math.sqrt(weight[i] / medW));
            }
        }
        int span = last - first + 1;
        int taper = Math.max(1, (int) Math.round(APODISE_FRACTION * span));
        for (int j = 0; j < taper; j++) {
            double f = 0.5 * (1 - Math.cos(Math.PI * (j + 0.5) / taper));
            g[first + j] *= f;
            g[last - j] *= f;
        }
        return g;
    }

    private static final java.util.Map<Integer, double[]> BAND_PASS = new java.util.concurrent.ConcurrentHashMap<>();

    /** The band-pass filter for FFT length n, values for wavenumbers 0..n/2 (cached; do not modify). */
    static double[] bandPass(int n) {
        return BAND_PASS.computeIfAbsent(n, CrossCorrelation::makeBandPass);
    }

    private static double[] makeBandPass(int n) {
        double k1 = n / 800.0, k2 = n / 400.0, k3 = n / 5.0, k4 = n / 3.0;
        double[] h = new double[n / 2 + 1];
        for (int k = 0; k <= n / 2; k++) {
            double v;
            if (k < k1 || k > k4) {
                v = 0;
            } else if (k < k2) {
                v = 0.5 * (1 - Math.cos(Math.PI * (k - k1) / (k2 - k1)));
            } else if (k > k3) {
                v = 0.5 * (1 + Math.cos(Math.PI * (k - k3) / (k4 - k3)));
            } else {
                v = 1;
            }
            h[k] = v;
        }
        return h;
    }

    /** A filtered transform and its energy. */
    record Filtered(double[] hat, double energy) {
        static Filtered of(double[] signal, int n) {
            double[] hat = FftCorrelator.forward(signal, n);
            FftCorrelator.filter(hat, bandPass(n));
            return new Filtered(hat, FftCorrelator.energy(hat));
        }
    }

    /** Normalised correlation of a prepared spectrum with a prepared template, index k mod n (a new array). */
    static double[] correlate(Filtered g, Filtered t) {
        return correlate(g, t, new double[g.hat().length]);
    }

    /**
     * Normalised correlation into {@code work} (length n, overwritten; reuse it across templates
     * to avoid allocation), index k mod n; returns {@code work}.
     */
    static double[] correlate(Filtered g, Filtered t, double[] work) {
        double norm = Math.sqrt(g.energy() * t.energy());
        return FftCorrelator.correlate(g.hat(), t.hat(), norm > 0 ? 1.0 / norm : 1.0, work);
    }

    private static final ThreadLocal<java.util.Map<Integer, double[]>> WORK = ThreadLocal.withInitial(java.util.HashMap::new);

    /** This thread's work array of length n (reused; never hand it to another thread). */
    static double[] work(int n) {
        return WORK.get().computeIfAbsent(n, double[]::new);
    }

    private static final ThreadLocal<double[][]> LAG_WORK = ThreadLocal.withInitial(() -> new double[1][0]);

    /**
     * This thread's array of at least {@code length} for correlations laid out by lag (reused,
     * grown when needed, separate from {@link #work}); use only its first {@code length} values.
     */
    static double[] lagWork(int length) {
        double[][] holder = LAG_WORK.get();
        if (holder[0].length < length) {
            holder[0] = new double[Math.max(length, holder[0].length + holder[0].length / 2)];
        }
        return holder[0];
    }

    /** A fitted correlation peak. */
    record Peak(double lag, double height, double r, double fwhmPixels, double sigmaPixels) {
    }

    /**
     * Fits the peak at array index {@code i} of {@code c} (lags laid out contiguously in
     * [from, to], valid region for the antisymmetric noise estimate).
     */
    static Peak fit(double[] c, int i, int from, int to) {
        double[] v = Peaks.parabola(c, i, from, to);
        double h = v[1];
        int w = Math.min(Math.min(i - from, to - i), 1000);
        double r;
        if (w >= 5) {
            double s = 0;
            for (int n = 1; n <= w; n++) {
                double d = c[i + n] - c[i - n];
                s += d * d;
            }
            double sigmaA = Math.sqrt(s / (2.0 * w));
            r = sigmaA > 0 ? h / (Math.sqrt(2.0) * sigmaA) : Double.POSITIVE_INFINITY;
        } else {
            r = Double.NaN;
        }
        double half = 0.5 * h;
        double left = i, right = i;
        int j = i;
        while (j > from && c[j - 1] > half) {
            j--;
        }
        left = j > from ? j - (c[j] - half) / (c[j] - c[j - 1]) : j;
        j = i;
        while (j < to && c[j + 1] > half) {
            j++;
        }
        right = j < to ? j + (c[j] - half) / (c[j] - c[j + 1]) : j;
        double fwhm = Math.max(1.0, right - left);
        double sigma = Double.isFinite(r) ? 0.375 * fwhm / (1 + Math.max(0, r)) : fwhm;
        return new Peak(i + v[0], h, r, fwhm, sigma);
    }
}
