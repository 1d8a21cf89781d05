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
 * follows the mean spectrum, the next ones its main variations. Each component's sign is chosen
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

    private static final int ITERATIONS = 10;

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
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(data, false));
        for (int it = 0; gappy && it < ITERATIONS; it++) {
            RealMatrix u = svd.getU();
            RealMatrix vt = svd.getVT();
            double[] sv = svd.getSingularValues();
            for (int s = 0; s < n; s++) {
                for (int i = 0; i < bestLen; i++) {
                    if (!known[s][i]) {
                        double v = 0;
                        for (int c = 0; c < k; c++) {
                            v += u.getEntry(s, c) * sv[c] * vt.getEntry(c, i);
                        }
                        data[s][i] = v;
                    }
                }
            }
            svd = new SingularValueDecomposition(new Array2DRowRealMatrix(data, false));
        }
        double[] sv = svd.getSingularValues();
        double total = 0;
        for (double v : sv) {
            total += v * v;
        }
        RealMatrix vt = svd.getVT();
        double[] wave = Arrays.copyOfRange(grid.vacuumAngstrom(), bestStart, bestStart + bestLen);
        List<Template> out = new ArrayList<>();
        double[] frac = new double[k];
        for (int c = 0; c < k; c++) {
            double[] comp = vt.getRow(c);
            double sum = 0;
            for (double v : comp) {
                sum += v;
            }
            if (sum < 0) {
                for (int i = 0; i < comp.length; i++) {
                    comp[i] = -comp[i];
                }
            }
            frac[c] = sv[c] * sv[c] / total;
            String id = cls.key() + "-eigen-" + (c + 1);
            out.add(Template.of(id, cls, "eigen-" + (c + 1), wave, comp));
        }
        String note = String.format(Locale.ROOT, "class %s: %d spectra, %d components over %.1f-%.1f A rest (%d px)%s",
                cls.key(), n, k, wave[0], wave[wave.length - 1], bestLen, gappy ? ", gaps filled by gappy PCA" : "");
        return new Result(out, frac, n, note);
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
