package org.redward.redshift.kit;

/**
 * A smooth continuum for a spectrum on a log-lambda grid: the median of the usable pixels in
 * consecutive boxes of {@code boxPixels}, joined by straight lines between box centres (flat
 * beyond the outer centres). Medians ignore emission and absorption lines narrower than about
 * half a box (common practice for continuum estimation). Cost O(n log box). Stateless and
 * thread-safe.
 */
public final class Continuum {

    private Continuum() {
    }

    /**
     * @param flux flux per pixel
     * @param weight weight per pixel (0 = unusable)
     * @param boxPixels box width in pixels (at least 3)
     * @return the continuum per pixel (NaN everywhere if no pixel is usable)
     */
    public static double[] boxMedian(double[] flux, double[] weight, int boxPixels) {
        int n = flux.length;
        int boxes = Math.max(1, (n + boxPixels - 1) / boxPixels);
        double[] cx = new double[boxes];
        double[] cy = new double[boxes];
        int k = 0;
        double[] buf = new double[boxPixels];
        for (int b = 0; b < boxes; b++) {
            int from = b * boxPixels, to = Math.min(n, from + boxPixels);
            int m = 0;
            double sx = 0;
            for (int i = from; i < to; i++) {
                if (weight[i] > 0) {
                    buf[m++] = flux[i];
                    sx += i;
                }
            }
            if (m >= Math.max(3, (to - from) / 4)) {
                cx[k] = sx / m;
                cy[k] = Stats.median(java.util.Arrays.copyOf(buf, m));
                k++;
            }
        }
        double[] c = new double[n];
        if (k == 0) {
            java.util.Arrays.fill(c, Double.NaN);
            return c;
        }
        int j = 0;
        for (int i = 0; i < n; i++) {
            if (i <= cx[0]) {
                c[i] = cy[0];
            } else if (i >= cx[k - 1]) {
                c[i] = cy[k - 1];
            } else {
                while (cx[j + 1] < i) {
                    j++;
                }
                double t = (i - cx[j]) / (cx[j + 1] - cx[j]);
                c[i] = cy[j] + t * (cy[j + 1] - cy[j]);
            }
        }
        return c;
    }
}
