package org.redward.redshift.chisq.internal;

import java.util.Arrays;

import org.redward.redshift.kit.FftCorrelator;
import org.redward.redshift.kit.GriddedSpectrum;

/**
 * The chi-square of the best fit of {@code sum_j a_j T_j(lambda/(1+z)) + sum_a b_a P_a(x)} to a
 * spectrum at every trial shift K of a log10-lambda grid (log10(1+z) = K step), where T_j are a
 * group's templates and P_a Legendre polynomials of the spectrum's pixel position x in [-1, 1]
 * (Glazebrook, Offer & Deeley 1998; Bolton et al. 2012). With weights w_i (inverse variance):
 *
 * <pre>
 *   chi2(K) = sum_i w_i x_i^2 - b(K)^T M(K)^-1 b(K)
 *   b_j = sum_i w_i x_i T_j(i - k)        M_jl = sum_i w_i T_j(i - k) T_l(i - k)
 *   M_ja = sum_i w_i P_a(i) T_j(i - k)    M_ab = sum_i w_i P_a(i) P_b(i),  b_a = sum_i w_i x_i P_a(i)
 * </pre>
 *
 * with k = K - (s0 - t0). Every K-dependent sum is a correlation of a spectrum-side array (w x,
 * w, w P_a) with a template-side array (T_j, T_j T_l), so all of them come from FFTs: the cost is
 * O((m^2 + m p) N log N) for m templates and p polynomial terms, against O(n_z n (m + p)^2) for
 * the direct solution at each of n_z trial redshifts. A trial shift where fewer than
 * {@code minCoverage} of the usable pixels fall on the templates' data is skipped (NaN).
 *
 * <p>Thread-safe: the only state is each thread's own reused work arrays.
 */
final class ChiSquareScan {

    private ChiSquareScan() {
    }

    /** Spectrum-side arrays and their transforms at one FFT length. */
    static final class SpectrumSide {
        final int n;
        final double xwx;
        final double[] wxHat;
        /** FFT(w): the weights alone (P_0 = 1, so wpHat[0] when there are polynomial terms). */
        final double[] wHat;
        /** wpHat[a] = FFT(w P_a). */
        final double[][] wpHat;
        final double[] usableHat;
        final double[] bPoly;
        final double[][] mPoly;
        final int usable;

        SpectrumSide(GriddedSpectrum s, int polyTerms, int n) {
            this.n = n;
            int len = s.size();
            double[][] p = legendre(len, polyTerms);
            double[] wx = new double[len];
            double[] u = new double[len];
            double sxx = 0;
            for (int i = 0; i < len; i++) {
                wx[i] = s.weight[i] * s.flux[i];
                u[i] = s.weight[i] > 0 ? 1 : 0;
                sxx += wx[i] * s.flux[i];
            }
            this.xwx = sxx;
            this.wxHat = FftCorrelator.forward(wx, n);
            this.usableHat = FftCorrelator.forward(u, n);
            this.wpHat = new double[polyTerms][];
            this.bPoly = new double[polyTerms];
            this.mPoly = new double[polyTerms][polyTerms];
            for (int a = 0; a < polyTerms; a++) {
                double[] wp = new double[len];
                for (int i = 0; i < len; i++) {
                    wp[i] = s.weight[i] * p[a][i];
                    bPoly[a] += wp[i] * s.flux[i];
                }
                for (int b = 0; b < polyTerms; b++) {
                    double sum = 0;
                    for (int i = 0; i < len; i++) {
                        sum += wp[i] * p[b][i];
                    }
                    mPoly[a][b] = sum;
                }
                wpHat[a] = FftCorrelator.forward(wp, n);
            }
            this.wHat = polyTerms > 0 ? wpHat[0] : FftCorrelator.forward(s.weight, n);
            this.usable = s.usablePixels;
        }
    }

    /** Legendre polynomials P_0..P_{terms-1} at x = 2 i/(len-1) - 1 (Bonnet's recursion). */
    static double[][] legendre(int len, int terms) {
        double[][] p = new double[terms][len];
        for (int i = 0; i < len; i++) {
            double x = len == 1 ? 0 : 2.0 * i / (len - 1) - 1;
            if (terms > 0) {
                p[0][i] = 1;
            }
            if (terms > 1) {
                p[1][i] = x;
            }
            for (int a = 2; a < terms; a++) {
                p[a][i] = ((2 * a - 1) * x * p[a - 1][i] - (a - 1) * p[a - 2][i]) / a;
            }
        }
        return p;
    }

    /** Result of a scan: chi2 per shift K in [kShiftLo, kShiftLo + chi2.length). */
    record Curve(long shiftLo, double[] chi2, int parameters) {
    }

    /**
     * Scans shifts K in [shiftLo, shiftHi] (log10(1+z) = K step).
     *
     * @param minCoverage fraction of usable pixels that must fall on template data
     */
    static Curve scan(GriddedSpectrum s, SpectrumSide side, BasisGroup g, BasisGroup.Prepared prep, long shiftLo,
            long shiftHi, double minCoverage) {
        int m = g.size();
        int p = side.bPoly.length;
        int d = m + p;
        long offset = s.startIndex - g.startIndex;
        int count = (int) (shiftHi - shiftLo + 1);
        double[] chi2 = new double[count];
        Arrays.fill(chi2, Double.NaN);
        if (count <= 0) {
            return new Curve(shiftLo, new double[0], d);
        }
        int n = side.n;
        // Every K-dependent sum, one correlation each: b_j (m), M_jl for l <= j (m(m+1)/2), M_ja
        // (m p) and the coverage (1). Each is computed into one reused work array and only the
        // scanned shifts are kept, packed per shift (row q holds the sums of shift q side by side),
        // so that the solve below reads one short contiguous row per shift and nothing of length n
        // is allocated per scan.
        int sums = m + m * (m + 1) / 2 + m * p + 1;
        Scratch w = SCRATCH.get().fit(n, count * sums, d);
        double[] work = w.work;
        double[] packed = w.packed;
        int[] index = w.index(count);
        for (int q = 0; q < count; q++) {
            index[q] = (int) Math.floorMod(shiftLo + q - offset, (long) n);
        }
        int col = 0;
        for (int a = 0; a < m; a++) {
            keep(FftCorrelator.correlate(side.wxHat, prep.t()[a], 1.0, work), index, count, packed, sums, col++);
        }
        for (int a = 0; a < m; a++) {
            for (int b = 0; b <= a; b++) {
                keep(FftCorrelator.correlate(side.wHat, prep.tt()[a][b], 1.0, work), index, count, packed, sums, col++);
            }
        }
        for (int a = 0; a < m; a++) {
            for (int c = 0; c < p; c++) {
                keep(FftCorrelator.correlate(side.wpHat[c], prep.t()[a], 1.0, work), index, count, packed, sums, col++);
            }
        }
        keep(FftCorrelator.correlate(side.usableHat, prep.coverage(), 1.0, work), index, count, packed, sums, col);
        int ttAt = m, tpAt = m + m * (m + 1) / 2, covAt = sums - 1;
        double need = minCoverage * side.usable;
        double[] mat = w.mat;
        double[] rhs = w.rhs;
        for (int q = 0; q < count; q++) {
            int row = q * sums;
            if (packed[row + covAt] < need - 0.5) {
                continue;
            }
            for (int a = 0; a < m; a++) {
                rhs[a] = packed[row + a];
                int tt = row + ttAt + a * (a + 1) / 2;
                for (int b = 0; b <= a; b++) {
                    mat[a * d + b] = packed[tt + b];
                    mat[b * d + a] = packed[tt + b];
                }
                int tp = row + tpAt + a * p;
                for (int c = 0; c < p; c++) {
                    mat[a * d + m + c] = packed[tp + c];
                    mat[(m + c) * d + a] = packed[tp + c];
                }
            }
            for (int c = 0; c < p; c++) {
                rhs[m + c] = side.bPoly[c];
                for (int e = 0; e < p; e++) {
                    mat[(m + c) * d + m + e] = side.mPoly[c][e];
                }
            }
            double explained = SmallCholesky.quadraticForm(mat, rhs, d, w.saved, w.y);
            if (Double.isFinite(explained)) {
                chi2[q] = side.xwx - explained;
            }
        }
        return new Curve(shiftLo, chi2, d);
    }

    /** Copies the scanned shifts of one correlation into column {@code col} of the packed rows. */
    private static void keep(double[] correlation, int[] index, int count, double[] packed, int sums, int col) {
        for (int q = 0, at = col; q < count; q++, at += sums) {
            packed[at] = correlation[index[q]];
        }
    }

    /** Per-thread work arrays of {@link #scan}, grown on demand and reused from scan to scan. */
    private static final ThreadLocal<Scratch> SCRATCH = ThreadLocal.withInitial(Scratch::new);

    private static final class Scratch {
        double[] work = new double[0];
        double[] packed = new double[0];
        int[] index = new int[0];
        double[] mat = new double[0];
        double[] saved = new double[0];
        double[] rhs = new double[0];
        double[] y = new double[0];

        Scratch fit(int n, int packedLength, int d) {
            if (work.length != n) {
                work = new double[n];
            }
            if (packed.length < packedLength) {
                packed = new double[packedLength];
            }
            if (mat.length != d * d) {
                mat = new double[d * d];
                saved = new double[d * d];
                rhs = new double[d];
                y = new double[d];
            }
            return this;
        }

        int[] index(int count) {
            if (index.length < count) {
                index = new int[count];
            }
            return index;
        }
    }

    /**
     * The best coefficients at one shift, solved directly (for reporting which template
     * dominates, and as the reference of tests and benchmarks).
     *
     * @return {coefficients..., chi2, sigma of coefficient 0}; NaN when the system is singular
     */
    static double[] solveDirect(GriddedSpectrum s, BasisGroup g, int polyTerms, long shift) {
        return solveDirect(s, g.basis, g.startIndex, g.length, polyTerms, shift);
    }

    /**
     * The correlation factor of the best-fit residuals at a shift: 1 + 2 sum_k rho_k over lags k
     * = 1..30 up to the first non-positive autocorrelation rho_k (weighted residuals r_i sqrt(w_i)).
     * Neighbouring pixels that are not independent (rebinned or smoothed data) make chi-square
     * differences look larger than they are by about this factor (common practice: effective
     * number of independent pixels N / factor).
     */
    static double residualCorrelationFactor(GriddedSpectrum s, BasisGroup g, int polyTerms, long shift) {
        double[] sol = solveDirect(s, g, polyTerms, shift);
        if (!Double.isFinite(sol[0])) {
            return 1.0;
        }
        int m = g.size(), len = s.size();
        double[][] poly = legendre(len, polyTerms);
        long offset = s.startIndex - g.startIndex;
        double[] r = new double[len];
        for (int i = 0; i < len; i++) {
            if (s.weight[i] == 0) {
                continue;
            }
            long j = i + offset - shift;
            double model = 0;
            for (int a = 0; a < m; a++) {
                model += j >= 0 && j < g.length ? sol[a] * g.basis[a][(int) j] : 0;
            }
            for (int c = 0; c < polyTerms; c++) {
                model += sol[m + c] * poly[c][i];
            }
            r[i] = (s.flux[i] - model) * Math.sqrt(s.weight[i]);
        }
        double r0 = 0;
        for (double v : r) {
            r0 += v * v;
        }
        if (!(r0 > 0)) {
            return 1.0;
        }
        double f = 1;
        for (int k = 1; k <= 30; k++) {
            double c = 0;
            for (int i = k; i < len; i++) {
                c += r[i] * r[i - k];
            }
            double rho = c / r0;
            if (rho <= 0) {
                break;
            }
            f += 2 * rho;
        }
        return f;
    }

    /** As {@link #solveDirect(GriddedSpectrum, BasisGroup, int, long)} for any basis on a grid from {@code basisStart}. */
    static double[] solveDirect(GriddedSpectrum s, double[][] basis, long basisStart, int basisLength, int polyTerms, long shift) {
        int m = basis.length;
        int d = m + polyTerms;
        int len = s.size();
        double[][] poly = legendre(len, polyTerms);
        long offset = s.startIndex - basisStart;
        double[][] cols = new double[d][len];
        for (int i = 0; i < len; i++) {
            long j = i + offset - shift;
            for (int a = 0; a < m; a++) {
                cols[a][i] = j >= 0 && j < basisLength ? basis[a][(int) j] : 0;
            }
            for (int c = 0; c < polyTerms; c++) {
                cols[m + c][i] = poly[c][i];
            }
        }
        double[] mat = new double[d * d];
        double[] rhs = new double[d];
        double xwx = 0;
        for (int i = 0; i < len; i++) {
            double w = s.weight[i];
            if (w == 0) {
                continue;
            }
            xwx += w * s.flux[i] * s.flux[i];
            for (int a = 0; a < d; a++) {
                double wa = w * cols[a][i];
                rhs[a] += wa * s.flux[i];
                for (int b = 0; b <= a; b++) {
                    mat[a * d + b] += wa * cols[b][i];
                }
            }
        }
        for (int a = 0; a < d; a++) {
            for (int b = 0; b < a; b++) {
                mat[b * d + a] = mat[a * d + b];
            }
        }
        double[] coef = SmallCholesky.solve(mat.clone(), rhs, d);
        double[] out = new double[d + 2];
        if (coef == null) {
            Arrays.fill(out, Double.NaN);
            return out;
        }
        double explained = 0;
        for (int a = 0; a < d; a++) {
            explained += coef[a] * rhs[a];
            out[a] = coef[a];
        }
        out[d] = xwx - explained;
        // 1-sigma error of the first coefficient: sqrt((M^-1)_00)
        double[] e0 = new double[d];
        e0[0] = 1;
        double[] col0 = SmallCholesky.solve(mat, e0, d);
        out[d + 1] = col0 == null ? Double.NaN : Math.sqrt(Math.max(0, col0[0]));
        return out;
    }
}
