package org.redward.lines.internal;

import java.util.Arrays;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.interpolation.AkimaSplineInterpolator;
import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.stat.descriptive.rank.Median;

/**
 * A continuum robust to emission lines and absorption troughs: iterative sigma clipping around a
 * smoothing fit. Each pass splits the spectrum into bins of {@code binPixels} pixels, takes the
 * median wavelength and the median flux of the bin's unclipped usable pixels as a knot (a bin
 * whose unclipped pixels are fewer than 40% of it gives no knot, so strong lines and troughs are
 * bridged), and joins the knots with an Akima spline (Akima 1970, J. ACM 17, 589; Commons Math
 * {@link AkimaSplineInterpolator}), held constant beyond the end knots. Pixels whose residual
 * exceeds {@code clip} times the robust scatter (1.4826 x median absolute deviation of the
 * normalised residuals) are clipped, with one neighbour on each side, and the fit is repeated.
 * This is common practice for continuum placement (from memory: no single paper).
 *
 * <p>Not thread-safe per instance (stateless static methods; thread-safe).
 */
final class Continuum {

    private Continuum() {
    }

    /** The continuum and the scatter of the normalised residuals about it. */
    record Result(double[] level, double scatter, int knots) {
    }

    /**
     * @param w wavelengths (increasing)
     * @param f flux
     * @param ivar inverse variance (0 = unusable)
     * @param binPixels pixels per bin (at least 5)
     * @param iterations clipping passes (at least 1)
     * @param clip clipping threshold in units of the robust scatter
     * @return the continuum at every pixel, or null if fewer than 2 knots could be made
     */
    static Result estimate(double[] w, double[] f, double[] ivar, int binPixels, int iterations, double clip) {
        int n = f.length;
        boolean[] clipped = new boolean[n];
        double[] level = null;
        double scatter = Double.NaN;
        int knots = 0;
        Median median = new Median();
        double[] bufW = new double[binPixels];
        double[] bufF = new double[binPixels];
        for (int pass = 0; pass < iterations; pass++) {
            int nb = (n + binPixels - 1) / binPixels;
            double[] kx = new double[nb];
            double[] ky = new double[nb];
            int k = 0;
            for (int b = 0; b < nb; b++) {
                int from = b * binPixels;
                int to = Math.min(n, from + binPixels);
                int m = 0;
                for (int i = from; i < to; i++) {
                    if (ivar[i] > 0 && !clipped[i]) {
                        bufW[m] = w[i];
                        bufF[m] = f[i];
                        m++;
                    }
                }
                if (m >= Math.max(3, (int) Math.ceil(0.4 * (to - from)))) {
                    kx[k] = median.evaluate(bufW, 0, m);
                    ky[k] = median.evaluate(bufF, 0, m);
                    if (k == 0 || kx[k] > kx[k - 1]) {
                        k++;
                    }
                }
            }
            if (k < 2) {
                if (level == null) {
                    return null;
                }
                break;
            }
            knots = k;
            level = evaluate(Arrays.copyOf(kx, k), Arrays.copyOf(ky, k), w);
            scatter = scatter(f, ivar, level, clipped);
            if (!(scatter > 0)) {
                break;
            }
            boolean[] next = new boolean[n];
            for (int i = 0; i < n; i++) {
                if (ivar[i] > 0 && Math.abs(f[i] - level[i]) * Math.sqrt(ivar[i]) > clip * scatter) {
                    next[i] = true;
                    if (i > 0) {
                        next[i - 1] = true;
                    }
                    if (i + 1 < n) {
                        next[i + 1] = true;
                    }
                }
            }
            clipped = next;
        }
        return new Result(level, scatter, knots);
    }

    private static double[] evaluate(double[] kx, double[] ky, double[] w) {
        UnivariateFunction fn = kx.length >= 5 ? new AkimaSplineInterpolator().interpolate(kx, ky)
                : new LinearInterpolator().interpolate(kx, ky);
        double lo = kx[0];
        double hi = kx[kx.length - 1];
        double[] out = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            double x = w[i];
            out[i] = x <= lo ? ky[0] : x >= hi ? ky[ky.length - 1] : fn.value(x);
        }
        return out;
    }

    /** 1.4826 x MAD of (f - c) sqrt(ivar) over usable, unclipped pixels; NaN if none. */
    static double scatter(double[] f, double[] ivar, double[] c, boolean[] clipped) {
        double[] z = new double[f.length];
        int m = 0;
        for (int i = 0; i < f.length; i++) {
            if (ivar[i] > 0 && (clipped == null || !clipped[i])) {
                z[m++] = (f[i] - c[i]) * Math.sqrt(ivar[i]);
            }
        }
        if (m == 0) {
            return Double.NaN;
        }
        Median median = new Median();
        double med = median.evaluate(z, 0, m);
        for (int i = 0; i < m; i++) {
            z[i] = Math.abs(z[i] - med);
        }
        return 1.4826 * median.evaluate(z, 0, m);
    }
}
