package org.redward.templates.internal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.redward.api.templates.Template;
import org.redward.spectrum.LogLambdaGrid;
import org.redward.spectrum.Medium;
import org.redward.spectrum.ObjectClass;
import org.redward.spectrum.Resampling;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;

/**
 * Eigen-templates of one class of objects by principal component analysis of spectra of known
 * redshift, after Glazebrook, Offer &amp; Deeley (1998, ApJ 492, 98) and Bolton et al. (2012,
 * AJ 144, 144), who fit linear combinations of such rest-frame eigenspectra.
 *
 * <p>Steps: (1) each spectrum is shifted to its rest frame ({@code lambda_rest = lambda_obs /
 * (1+z)}) and resampled, flux-conserving, onto a common rest-frame grid uniform in log10(lambda)
 * ({@link Resampling}); (2) each is scaled to unit root-mean-square flux over the pixels it
 * covers; (3) only the longest contiguous run of rest pixels covered by at least a given
 * fraction of the spectra is kept; (4) pixels a spectrum does not cover are filled iteratively
 * with its own rank-k reconstruction, starting from the mean of the others ("gappy" PCA, after
 * Everson &amp; Sirovich 1995, JOSA A 12, 1657, and Connolly &amp; Szalay 1999, AJ 117, 2052; the
 * references are from memory); (5) the singular value decomposition (Commons Math) of the
 * spectra-by-pixels matrix, without subtracting the mean, gives the components: the first
 * follows the mean spectrum, the next ones its main variations (computed through the smaller Gram
 * matrix, see {@code top}). Each component's sign is chosen
 * so that its sum is positive. Pixel errors are not used as weights (a known simplification).
 *
 * <p>Units: vacuum Angstrom; components are unit vectors (dimensionless). Masked pixels are
 * treated as not covered. Stateless and thread-safe.
 */
public final class EigenTemplates {

    /** One training spectrum: observed, with its known redshift. */
    public record Input(String name, Spectrum spectrum, double z) {
    }

    /** The components of one class, with the fraction of the summed squared singular values each carries. */
    public record Result(List<Template> templates, double[] varianceFraction, int spectraUsed, String note) {
    }

    /** At most this many refills of the gaps (gappy PCA). */
    private static final int ITERATIONS = 10;
    /** The refills stop when no filled value moves by more than this fraction of the largest. */
    private static final double CONVERGED = 1e-4;

    private EigenTemplates() {
    }

    /**
     * @param cls the class of every input
     * @param log10Step the rest-frame grid step in log10(lambda) (e.g. 1e-4, 69 km/s)
     * @param components how many components to keep (at most the number of spectra)
     * @param minCoverage the fraction (0..1] of spectra that must cover a rest pixel for it to be kept
     * @throws IllegalArgumentException with a clear reason when the inputs cannot give templates
     */
    public static Result build(ObjectClass cls, List<Input> inputs, double log10Step, int components, double minCoverage) {
        if (inputs.size() < 2) {
            throw new IllegalArgumentException("class " + cls.key() + ": " + inputs.size() + " spectrum; need at least 2");
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Input in : inputs) {
            if (!(in.z() > -1) || !Double.isFinite(in.z())) {
                throw new IllegalArgumentException(in.name() + ": redshift " + in.z() + " is not usable");
            }
            lo = Math.min(lo, in.spectrum().axis().minVacuumAngstrom() / (1 + in.z()));
            hi = Math.max(hi, in.spectrum().axis().maxVacuumAngstrom() / (1 + in.z()));
        }
        LogLambdaGrid grid = LogLambdaGrid.covering(lo, hi, log10Step);
        int n = inputs.size();
        int m = grid.size();
        double[][] x = new double[n][];
        boolean[][] have = new boolean[n][];
        for (int s = 0; s < n; s++) {
            Input in = inputs.get(s);
            Spectrum sp = in.spectrum();
            double[] w = sp.axis().vacuumAngstrom();
            for (int i = 0; i < w.length; i++) {
                w[i] /= 1 + in.z();
            }
            Spectrum rest = Spectrum.of(SpectralAxis.of(w, SpectralUnit.ANGSTROM, Medium.VACUUM, sp.axis().samplingAsRead()),
                    sp.flux(), sp.hasErrors() ? sp.inverseVariance() : null, sp.mask(), sp.fluxUnit(), sp.metadata());
            Spectrum r = Resampling.toLogLambda(rest, grid);
            x[s] = r.flux();
            have[s] = new boolean[m];
            double sum2 = 0;
            int k = 0;
            for (int i = 0; i < m; i++) {
                have[s][i] = !r.masked(i);
                if (have[s][i]) {
                    sum2 += x[s][i] * x[s][i];
                    k++;
                }
            }
            double rms = Math.sqrt(sum2 / Math.max(k, 1));
            if (k < 10 || !(rms > 0)) {
                throw new IllegalArgumentException(in.name() + ": fewer than 10 usable pixels, or no flux, in the rest frame");
            }
            for (int i = 0; i < m; i++) {
                x[s][i] = have[s][i] ? x[s][i] / rms : 0;
            }
        }
        // the longest contiguous run of well-covered rest pixels
        int need = Math.max(2, (int) Math.ceil(minCoverage * n));
        int bestStart = -1;
        int bestLen = 0;
        for (int i = 0; i < m;) {
            if (coverage(have, i) < need) {
                i++;
                continue;
            }
            int j = i;
            while (j < m && coverage(have, j) >= need) {
                j++;
            }
            if (j - i > bestLen) {
                bestLen = j - i;
                bestStart = i;
            }
            i = j;
        }
        if (bestLen < 10) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "class %s: fewer than 10 rest-frame pixels are covered by %d of the %d spectra; lower the coverage fraction or add spectra",
                    cls.key(), need, n));
        }
        int k = Math.min(components, n);
        double[][] data = new double[n][bestLen];
        boolean[][] known = new boolean[n][bestLen];
        for (int s = 0; s < n; s++) {
            for (int i = 0; i < bestLen; i++) {
                known[s][i] = have[s][bestStart + i];
                data[s][i] = x[s][bestStart + i];
            }
        }
        for (int i = 0; i < bestLen; i++) {
            double sum = 0;
            int c = 0;
            for (int s = 0; s < n; s++) {
                if (known[s][i]) {
                    sum += data[s][i];
                    c++;
                }
            }
            for (int s = 0; s < n; s++) {
                if (!known[s][i]) {
                    data[s][i] = sum / c;
                }
            }
        }
        boolean gappy = false;
        for (boolean[] row : known) {
            for (boolean b : row) {
                gappy |= !b;
            }
        }
        Svd svd = top(data, k);
        for (int it = 0; gappy && it < ITERATIONS; it++) {
            double change = 0;
            double scale = 0;
            for (int s = 0; s < n; s++) {
                for (int i = 0; i < bestLen; i++) {
                    if (!known[s][i]) {
                        double v = 0;
                        for (int c = 0; c < svd.s().length; c++) {
                            v += svd.u()[s][c] * svd.s()[c] * svd.v()[c][i];
                        }
                        change = Math.max(change, Math.abs(v - data[s][i]));
                        scale = Math.max(scale, Math.abs(v));
                        data[s][i] = v;
                    }
                }
            }
            svd = top(data, k);
            if (change <= CONVERGED * scale) {
                break;
            }
        }
        double[] wave = Arrays.copyOfRange(grid.vacuumAngstrom(), bestStart, bestStart + bestLen);
        List<Template> out = new ArrayList<>();
        int kept = svd.s().length;
        double[] frac = new double[kept];
        for (int c = 0; c < kept; c++) {
            double[] comp = svd.v()[c].clone();
            double sum = 0;
            for (double v : comp) {
                sum += v;
            }
            if (sum < 0) {
                for (int i = 0; i < comp.length; i++) {
                    comp[i] = -comp[i];
                }
            }
            frac[c] = svd.s()[c] * svd.s()[c] / svd.total();
            String id = cls.key() + "-eigen-" + (c + 1);
            out.add(Template.of(id, cls, "eigen-" + (c + 1), wave, comp));
        }
        String note = String.format(Locale.ROOT, "class %s: %d spectra, %d components over %.1f-%.1f A rest (%d px)%s",
                cls.key(), n, kept, wave[0], wave[wave.length - 1], bestLen, gappy ? ", gaps filled by gappy PCA" : "");
        return new Result(out, frac, n, note);
    }

    /** The leading singular triplets of a matrix: u (rows x k), s (k), v (k x columns), and the sum of squares. */
    private record Svd(double[][] u, double[] s, double[][] v, double total) {
    }

    /**
     * The first {@code k} singular values and vectors of {@code x} (n x m), through the Commons
     * Math SVD of the smaller Gram matrix (X X^T when n &lt;= m, else X^T X): its singular values
     * are the squares of those of X, and the other side's vectors follow as X^T u / s (or X v / s).
     * Cost O(min(n,m)^2 max(n,m)) instead of a full SVD of X; precision is lost only in
     * components far below the first (the condition number is squared), which are not kept.
     * Components below 1e-10 of the first singular value (rank deficiency) are dropped.
     */
    private static Svd top(double[][] x, int k) {
        if (x.length > x[0].length) {
            Svd t = top(transpose(x), k);
            return new Svd(transpose(t.v()), t.s(), transpose(t.u()), t.total());
        }
        int n = x.length;
        int m = x[0].length;
        double[][] gram = new double[n][n];
        double total = 0;
        for (double[] row : x) {
            for (double v : row) {
                total += v * v;
            }
        }
        for (int a = 0; a < n; a++) {
            for (int b = a; b < n; b++) {
                double d = 0;
                double[] xa = x[a];
                double[] xb = x[b];
                for (int i = 0; i < m; i++) {
                    d += xa[i] * xb[i];
                }
                gram[a][b] = d;
                gram[b][a] = d;
            }
        }
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(gram, false));
        double[] lambda = svd.getSingularValues();
        RealMatrix vecs = svd.getU();
        int kk = Math.min(k, n);
        double first = Math.sqrt(Math.max(lambda[0], 0));
        while (kk > 0 && !(Math.sqrt(Math.max(lambda[kk - 1], 0)) > 1e-10 * first)) {
            kk--;
        }
        double[] s = new double[kk];
        double[][] u = new double[n][kk];
        double[][] v = new double[kk][m];
        for (int c = 0; c < kk; c++) {
            s[c] = Math.sqrt(lambda[c]);
            for (int r = 0; r < n; r++) {
                u[r][c] = vecs.getEntry(r, c);
            }
            for (int i = 0; i < m; i++) {
                double d = 0;
                for (int r = 0; r < n; r++) {
                    d += x[r][i] * u[r][c];
                }
                v[c][i] = d / s[c];
            }
        }
        return new Svd(u, s, v, total);
    }

    private static double[][] transpose(double[][] a) {
        double[][] t = new double[a.length == 0 ? 0 : a[0].length][a.length];
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a[i].length; j++) {
                t[j][i] = a[i][j];
            }
        }
        return t;
    }

    private static int coverage(boolean[][] have, int i) {
        int c = 0;
        for (boolean[] h : have) {
            if (h[i]) {
                c++;
            }
        }
        return c;
    }
}
