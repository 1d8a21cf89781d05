package org.redward.redshift.kit;

import java.util.HashMap;
import java.util.Map;

import org.jtransforms.fft.DoubleFFT_1D;

/**
 * Circular cross-correlation through real FFTs (JTransforms). With {@code X = FFT(x)} and
 * {@code T = FFT(t)} (length n, zero-padded), {@code c(k) = sum_i x(i) t(i - k)} is
 * {@code IFFT(X conj(T))}, stored at index {@code k mod n}. It equals the linear correlation for
 * every lag when {@code n >= len(x) + len(t) - 1}.
 *
 * <p>Spectra are in JTransforms' packed real format: {@code a[0] = Re X_0}, {@code a[1] = Re X_{n/2}},
 * {@code a[2k], a[2k+1] = Re, Im X_k}. Transforms are cached per thread and size (JTransforms
 * plans are reused; a per-thread copy avoids sharing any work area). Call
 * {@link #singleThreaded()} once at start-up: JTransforms' own threads cost about 4x at spectrum
 * sizes. Cost per transform O(n log n). Thread-safe.
 */
public final class FftCorrelator {

    private static final ThreadLocal<Map<Integer, DoubleFFT_1D>> PLANS = ThreadLocal.withInitial(HashMap::new);
    private static volatile boolean singleThreaded;

    private FftCorrelator() {
    }

    /** Makes JTransforms compute each transform on the calling thread (idempotent). */
    public static void singleThreaded() {
        if (!singleThreaded) {
            pl.edu.icm.jlargearrays.ConcurrencyUtils.setNumberOfThreads(1);
            singleThreaded = true;
        }
    }

    private static DoubleFFT_1D plan(int n) {
        return PLANS.get().computeIfAbsent(n, DoubleFFT_1D::new);
    }

    /** Packed FFT of {@code x} zero-padded (or placed from {@code offset}) into length n (a power of 2). */
    public static double[] forward(double[] x, int n) {
        double[] a = new double[n];
        System.arraycopy(x, 0, a, 0, Math.min(n, x.length));
        plan(n).realForward(a);
        return a;
    }

    /** Packed FFT of an array of exactly length n, in place. */
    public static double[] forwardInPlace(double[] a) {
        plan(a.length).realForward(a);
        return a;
    }

    /** {@code c(k) = sum_i x(i) t(i - k)} at index {@code k mod n}, from packed transforms of x and t. */
    public static double[] correlate(double[] xHat, double[] tHat) {
        int n = xHat.length;
        double[] c = new double[n];
        c[0] = xHat[0] * tHat[0];
        c[1] = xHat[1] * tHat[1];
        for (int k = 2; k < n; k += 2) {
            double xr = xHat[k], xi = xHat[k + 1], tr = tHat[k], ti = tHat[k + 1];
            c[k] = xr * tr + xi * ti;
            c[k + 1] = xi * tr - xr * ti;
        }
        plan(n).realInverse(c, true);
        return c;
    }

    /**
     * {@code factor * c(k)}, {@code c(k) = sum_i x(i) t(i - k)} at index {@code k mod n}, written
     * into {@code out} (length n, overwritten; may be a reused work array) and returned. The same
     * numbers as {@code factor} times {@link #correlate} (to rounding), in one pass over the
     * spectra and one unscaled inverse transform, without allocating.
     */
    public static double[] correlate(double[] xHat, double[] tHat, double factor, double[] out) {
        int n = xHat.length;
        double f = factor * 2.0 / n; // the inverse transform's own scale (JTransforms' realInverse with scale = true) folded in
        out[0] = xHat[0] * tHat[0] * f;
        out[1] = xHat[1] * tHat[1] * f;
        for (int k = 2; k < n; k += 2) {
            double xr = xHat[k], xi = xHat[k + 1], tr = tHat[k], ti = tHat[k + 1];
            out[k] = (xr * tr + xi * ti) * f;
            out[k + 1] = (xi * tr - xr * ti) * f;
        }
        plan(n).realInverse(out, false);
        return out;
    }

    /** Multiplies a packed spectrum in place by a real, even filter {@code h(k)} given for k = 0..n/2. */
    public static void filter(double[] aHat, double[] h) {
        int n = aHat.length;
        aHat[0] *= h[0];
        aHat[1] *= h[n / 2];
        for (int k = 1; k < n / 2; k++) {
            aHat[2 * k] *= h[k];
            aHat[2 * k + 1] *= h[k];
        }
    }

    /** Sum of x^2 of the real signal whose packed transform is {@code aHat} (Parseval). */
    public static double energy(double[] aHat) {
        int n = aHat.length;
        double s = aHat[0] * aHat[0] + aHat[1] * aHat[1];
        for (int k = 2; k < n; k += 2) {
            s += 2 * (aHat[k] * aHat[k] + aHat[k + 1] * aHat[k + 1]);
        }
        return s / n;
    }

    /**
     * The smallest power-of-two FFT length at which the circular correlation of a signal of
     * {@code signalPixels} with one of {@code templatePixels} equals the linear one at every lag in
     * [kLo, kHi]: the lags free of wrap-around are [signalPixels - n, n - templatePixels].
     */
    public static int lengthFor(int signalPixels, int templatePixels, int kLo, int kHi) {
        int n = Stats.nextPowerOfTwo(Math.max(signalPixels, templatePixels) + 1);
        while (kLo < signalPixels - n || kHi > n - templatePixels) {
            n <<= 1;
        }
        return n;
    }

    /** Inverse of {@link #forward} (in a new array). */
    public static double[] inverse(double[] aHat) {
        double[] a = aHat.clone();
        plan(a.length).realInverse(a, true);
        return a;
    }
}
