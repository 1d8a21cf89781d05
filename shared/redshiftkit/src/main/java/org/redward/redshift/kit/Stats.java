package org.redward.redshift.kit;

import org.apache.commons.math3.util.KthSelector;

/** Small robust statistics. Stateless and thread-safe. */
public final class Stats {

    private Stats() {
    }

    /**
     * Median of {@code a} (the middle value, or the mean of the two middle values for an even
     * count); NaN for an empty array. Works on a copy by selection (Commons Math's
     * {@link KthSelector}, O(n)), not a full sort: the same value as sorting gives.
     */
    public static double median(double[] a) {
        if (a.length == 0) {
            return Double.NaN;
        }
        double[] c = a.clone();
        int n = c.length;
        for (double v : c) {
            if (Double.isNaN(v)) { // selection's comparisons do not order NaN as a sort does: keep the sort's answer
                java.util.Arrays.sort(c);
                return (n & 1) == 1 ? c[n / 2] : 0.5 * (c[n / 2 - 1] + c[n / 2]);
            }
        }
        KthSelector select = new KthSelector();
        double upper = select.select(c, null, n / 2);
        return (n & 1) == 1 ? upper : 0.5 * (select.select(c, null, n / 2 - 1) + upper);
    }

    /** Next power of two not below n (n at least 1). */
    public static int nextPowerOfTwo(int n) {
        int p = 1;
        while (p < n) {
            p <<= 1;
        }
        return p;
    }
}
