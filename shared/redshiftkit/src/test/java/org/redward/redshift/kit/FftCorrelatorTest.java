package org.redward.redshift.kit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.junit.jupiter.api.Test;

/** FFT correlation (JTransforms) against the defining sum, and Parseval's energy. */
class FftCorrelatorTest {

    @Test
    void equalsDirectCorrelationAtEveryWrapFreeLag() {
        Random r = new Random(3);
        double[] x = new double[300], t = new double[500];
        for (int i = 0; i < x.length; i++) {
            x[i] = r.nextGaussian();
        }
        for (int i = 0; i < t.length; i++) {
            t[i] = r.nextGaussian();
        }
        int n = FftCorrelator.lengthFor(x.length, t.length, -499, 299);
        double[] c = FftCorrelator.correlate(FftCorrelator.forward(x, n), FftCorrelator.forward(t, n));
        for (int k = -499; k <= 299; k++) {
            double d = 0;
            for (int i = 0; i < x.length; i++) {
                int j = i - k;
                if (j >= 0 && j < t.length) {
                    d += x[i] * t[j];
                }
            }
            assertEquals(d, c[Math.floorMod(k, n)], 1e-9, "lag " + k);
        }
        double e = 0;
        for (double v : x) {
            e += v * v;
        }
        assertEquals(e, FftCorrelator.energy(FftCorrelator.forward(x, n)), 1e-9 * e);
    }

    @Test
    void scaledCorrelationIntoWorkArrayMatchesTheAllocatingOne() {
        Random r = new Random(5);
        int n = 1024;
        double[] x = new double[700], t = new double[600];
        for (int i = 0; i < x.length; i++) {
            x[i] = r.nextGaussian();
        }
        for (int i = 0; i < t.length; i++) {
            t[i] = r.nextGaussian();
        }
        double[] xh = FftCorrelator.forward(x, n), th = FftCorrelator.forward(t, n);
        double[] c = FftCorrelator.correlate(xh, th);
        double[] work = new double[n];
        java.util.Arrays.fill(work, 123.0);
        double[] d = FftCorrelator.correlate(xh, th, 0.25, work);
        double max = 0;
        for (double v : c) {
            max = Math.max(max, Math.abs(v));
        }
        for (int k = 0; k < n; k++) {
            assertEquals(0.25 * c[k], d[k], 1e-12 * max, "index " + k);
        }
    }
}
