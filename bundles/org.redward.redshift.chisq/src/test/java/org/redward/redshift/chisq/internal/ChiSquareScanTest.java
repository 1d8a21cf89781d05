package org.redward.redshift.chisq.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.redward.api.templates.Template;
import org.redward.redshift.kit.FftCorrelator;
import org.redward.redshift.kit.GriddedSpectrum;
import org.redward.redshift.kit.GriddedTemplate;
import org.redward.spectrum.ObjectClass;
import org.redward.templates.standard.internal.StandardTemplateSet;
import org.redward.testkit.SyntheticSpectra;

/**
 * The FFT scan against the direct solution, and the small Cholesky solver against Commons Math
 * (a general-purpose reference library).
 */
class ChiSquareScanTest {

    /**
     * With 3, then 0 (no polynomial: the weights' own transform), then 5 polynomial terms, one
     * after the other on the same thread, so that the reused work arrays are grown and shrunk.
     */
    @ParameterizedTest
    @ValueSource(ints = {3, 0, 5})
    void fftScanEqualsDirectLeastSquares(int polyTerms) {
        List<GriddedTemplate> galaxies = new ArrayList<>();
        for (Template t : new StandardTemplateSet().templates()) {
            if (t.objectClass() == ObjectClass.GALAXY) {
                galaxies.add(GriddedTemplate.of(t, 1e-4));
            }
        }
        BasisGroup g = new BasisGroup(ObjectClass.GALAXY, "galaxy", galaxies, galaxies.size());
        GriddedSpectrum s = GriddedSpectrum.of(SyntheticSpectra.absorptionGalaxy(0.3, 5, 3), 1e-4, null);
        long lo = 0, hi = 4000;
        long offset = s.startIndex - g.startIndex;
        int n = FftCorrelator.lengthFor(s.size(), g.length, (int) (lo - offset), (int) (hi - offset));
        ChiSquareScan.SpectrumSide side = new ChiSquareScan.SpectrumSide(s, polyTerms, n);
        ChiSquareScan.Curve c = ChiSquareScan.scan(s, side, g, g.prepare(n), lo, hi, 0.5);
        for (long k = lo; k <= hi; k += 397) {
            double direct = ChiSquareScan.solveDirect(s, g, polyTerms, k)[g.size() + polyTerms];
            // chi2 = x'Wx - b'M^-1 b: the subtraction cancels most digits of terms of the size of
            // x'Wx, and the transforms' rounding is relative to those terms, so that is the scale
            assertEquals(direct, c.chi2()[(int) (k - lo)], 1e-9 * side.xwx, "chi2 at shift " + k);
        }
    }

    @Test
    void smallCholeskyAgreesWithCommonsMath() {
        Random r = new Random(5);
        int d = 7;
        double[][] a = new double[d][d];
        for (int i = 0; i < d; i++) {
            for (int j = 0; j < d; j++) {
                a[i][j] = r.nextGaussian();
            }
        }
        RealMatrix m = MatrixUtils.createRealMatrix(a);
        RealMatrix spd = m.multiply(m.transpose()).add(MatrixUtils.createRealIdentityMatrix(d));
        double[] b = new double[d];
        for (int i = 0; i < d; i++) {
            b[i] = r.nextGaussian();
        }
        double[] flat = new double[d * d];
        for (int i = 0; i < d; i++) {
            for (int j = 0; j < d; j++) {
                flat[i * d + j] = spd.getEntry(i, j);
            }
        }
        double[] mine = SmallCholesky.solve(flat.clone(), b, d);
        double[] ref = new CholeskyDecomposition(spd).getSolver().solve(MatrixUtils.createRealVector(b)).toArray();
        for (int i = 0; i < d; i++) {
            assertEquals(ref[i], mine[i], 1e-10 * Math.max(1, Math.abs(ref[i])));
        }
        double q = 0;
        for (int i = 0; i < d; i++) {
            q += b[i] * ref[i];
        }
        assertEquals(q, SmallCholesky.quadraticForm(flat.clone(), b, d), 1e-10 * Math.abs(q));
    }
}
