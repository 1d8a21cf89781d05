package org.redward.redshift.kit;

import java.util.Arrays;

/** Small robust statistics. Stateless and thread-safe. */
public final class Stats {

    private Stats() {
    }

    /** Median of {@code a} (reorders a copy); NaN for an empty array. */
    public static double median(double[] a) {
        if (a.length == 0) {
            return Double.NaN;
        }
        double[] c = a.clone();
        Arrays.sort(c);
        int n = c.length;
        return (n & 1) == 1 ? c[n / 2] : 0.5 * (c[n / 2 - 1] + c[n / 2]);
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
