package org.redward.redshift.kit;

import java.util.ArrayList;
import java.util.List;

/**
 * Local extrema of a sampled curve and their parabolic refinement. Stateless and thread-safe.
 */
public final class Peaks {

    private Peaks() {
    }

    /**
     * Indices of local maxima of {@code y} in [from, to] (inclusive; end points count when higher
     * than their one neighbour inside the range), NaN values skipped, sorted by decreasing y.
     */
    public static List<Integer> maxima(double[] y, int from, int to) {
        List<Integer> out = new ArrayList<>();
        for (int i = from; i <= to; i++) {
            double v = y[i];
            if (!Double.isFinite(v)) {
                continue;
            }
            boolean left = i == from || !Double.isFinite(y[i - 1]) || v > y[i - 1];
            boolean right = i == to || !Double.isFinite(y[i + 1]) || v >= y[i + 1];
            if (left && right) {
                out.add(i);
            }
        }
        out.sort((a, b) -> Double.compare(y[b], y[a]));
        return out;
    }

    /**
     * The vertex of the parabola through (i-1, i, i+1): offset in (-0.5, 0.5) pixels from i, the
     * value at the vertex and the second derivative (per pixel squared). Falls back to offset 0 at
     * range ends or when the three points are not curved the right way.
     *
     * @return {offset, value, secondDerivative}
     */
    public static double[] parabola(double[] y, int i, int from, int to) {
        if (i <= from || i >= to || !Double.isFinite(y[i - 1]) || !Double.isFinite(y[i + 1])) {
            return new double[] {0, y[i], Double.NaN};
        }
        double a = y[i - 1], b = y[i], c = y[i + 1];
        double d2 = a - 2 * b + c;
        if (d2 == 0) {
            return new double[] {0, b, 0};
        }
        double off = 0.5 * (a - c) / d2;
        if (Math.abs(off) > 0.5) {
            off = Math.signum(off) * 0.5;
        }
        double val = b - 0.25 * (a - c) * off;
        return new double[] {off, val, d2};
    }
}
