package org.redward.redshift.chisq.internal;

/**
 * Cholesky solution of small symmetric positive-definite systems (row-major d x d), written out
 * because it runs once per trial redshift and allocation-free speed matters there; Commons Math's
 * CholeskyDecomposition gives the same numbers (checked in the tests). When the matrix is not
 * positive definite a ridge of 1e-10 of its mean diagonal is added once; if that fails too the
 * result is NaN (or null). Thread-safe (no shared state).
 */
final class SmallCholesky {

    private SmallCholesky() {
    }

    /** b^T A^-1 b, or NaN. {@code a} is overwritten. */
    static double quadraticForm(double[] a, double[] b, int d) {
        return quadraticForm(a, b, d, new double[d * d], new double[d]);
    }

    /**
     * b^T A^-1 b, or NaN, without allocating: {@code saved} (length d d) and {@code y} (length d)
     * are work arrays. {@code a} is overwritten.
     */
    static double quadraticForm(double[] a, double[] b, int d, double[] saved, double[] y) {
        if (!solveLower(a, b, d, saved, y)) {
            return Double.NaN;
        }
        double s = 0;
        for (int i = 0; i < d; i++) {
            s += y[i] * y[i];
        }
        return s;
    }

    /** A^-1 b, or null. {@code a} is overwritten. */
    static double[] solve(double[] a, double[] b, int d) {
        double[] y = new double[d];
        if (!solveLower(a, b, d, new double[d * d], y)) {
            return null;
        }
        double[] x = new double[d];
        for (int i = d - 1; i >= 0; i--) {
            double s = y[i];
            for (int k = i + 1; k < d; k++) {
                s -= a[k * d + i] * x[k];
            }
            x[i] = s / a[i * d + i];
        }
        return x;
    }

    /**
     * Factorises A = L L^T in place (lower triangle) and writes L^-1 b into {@code y}; false if not
     * positive definite. {@code saved} keeps A for the one retry with a ridge.
     */
    private static boolean solveLower(double[] a, double[] b, int d, double[] saved, double[] y) {
        int len = d * d;
        System.arraycopy(a, 0, saved, 0, len);
        for (int attempt = 0; attempt < 2; attempt++) {
            if (attempt == 1) {
                System.arraycopy(saved, 0, a, 0, len);
                double tr = 0;
                for (int i = 0; i < d; i++) {
                    tr += a[i * d + i];
                }
                double ridge = 1e-10 * tr / d;
                if (!(ridge > 0)) {
                    return false;
                }
                for (int i = 0; i < d; i++) {
                    a[i * d + i] += ridge;
                }
            }
            if (factor(a, d)) {
                for (int i = 0; i < d; i++) {
                    double s = b[i];
                    for (int k = 0; k < i; k++) {
                        s -= a[i * d + k] * y[k];
                    }
                    y[i] = s / a[i * d + i];
                }
                return true;
            }
        }
        return false;
    }

    private static boolean factor(double[] a, int d) {
        for (int j = 0; j < d; j++) {
            double s = a[j * d + j];
            for (int k = 0; k < j; k++) {
                s -= a[j * d + k] * a[j * d + k];
            }
            if (!(s > 0) || !Double.isFinite(s)) {
                return false;
            }
            double l = Math.sqrt(s);
            a[j * d + j] = l;
            for (int i = j + 1; i < d; i++) {
                double t = a[i * d + j];
                for (int k = 0; k < j; k++) {
                    t -= a[i * d + k] * a[j * d + k];
                }
                a[i * d + j] = t / l;
            }
        }
        return true;
    }
}
