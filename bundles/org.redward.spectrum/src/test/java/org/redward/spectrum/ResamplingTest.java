package org.redward.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Flux-conserving resampling onto a log-lambda grid. The checks are properties of the method
 * (common practice for rebinning, e.g. Carnall 2017, arXiv:1705.05165): the integral of flux
 * density over whole output pixels equals the integral of the input over the same range; a
 * constant stays constant; a masked input pixel does not leak into its neighbours.
 */
class ResamplingTest {

    /** Integral of flux density over [lo, hi] for a spectrum of constant-density bins between midpoints. */
    static double integral(double[] w, double[] f, double lo, double hi) {
        int n = w.length;
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double a = i == 0 ? w[0] - (0.5 * (w[0] + w[1]) - w[0]) : 0.5 * (w[i - 1] + w[i]);
            double b = i == n - 1 ? w[n - 1] + (w[n - 1] - 0.5 * (w[n - 2] + w[n - 1])) : 0.5 * (w[i] + w[i + 1]);
            double o = Math.min(hi, b) - Math.max(lo, a);
            if (o > 0) {
                sum += o * f[i];
            }
        }
        return sum;
    }

    @Test
    void conservesFluxOverWholeOutputPixels() {
        Random r = new Random(11);
        int n = 3000;
        double[] f = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = 1 + Math.sin(i / 17.0) + 0.3 * r.nextGaussian();
        }
        SpectralAxis axis = SpectralAxis.linear(4000, 1.25, n, SpectralUnit.ANGSTROM, Medium.VACUUM);
        Spectrum s = Spectrum.of(axis, f, null, null, "", null);
        LogLambdaGrid grid = LogLambdaGrid.covering(4010, 7700, 1e-4);
        Spectrum out = Resampling.toLogLambda(s, grid);
        double[] wout = out.axis().vacuumAngstrom();
        double[] fout = out.flux();
        int k0 = 10;
        int k1 = grid.size() - 10;
        double lo = Math.pow(10, grid.log10StartAngstrom() + (k0 - 0.5) * grid.log10Step());
        double hi = Math.pow(10, grid.log10StartAngstrom() + (k1 - 0.5) * grid.log10Step());
        double sumOut = 0;
        for (int k = k0; k < k1; k++) {
            double a = Math.pow(10, grid.log10StartAngstrom() + (k - 0.5) * grid.log10Step());
            double b = Math.pow(10, grid.log10StartAngstrom() + (k + 0.5) * grid.log10Step());
            sumOut += (b - a) * fout[k];
        }
        double sumIn = integral(axis.vacuumAngstrom(), f, lo, hi);
        assertEquals(sumIn, sumOut, 1e-9 * Math.abs(sumIn), "flux integral over " + lo + "-" + hi);
        assertTrue(wout.length == grid.size());
    }

    @Test
    void constantStaysConstantAndErrorsPropagate() {
        int n = 500;
        double[] f = new double[n];
        double[] iv = new double[n];
        java.util.Arrays.fill(f, 2.5);
        java.util.Arrays.fill(iv, 4.0);
        SpectralAxis axis = SpectralAxis.linear(5000, 0.5, n, SpectralUnit.ANGSTROM, Medium.VACUUM);
        Spectrum out = Resampling.toLogLambda(Spectrum.of(axis, f, iv, null, "", null), LogLambdaGrid.covering(5002, 5240, 1e-4));
        for (int k = 0; k < out.size(); k++) {
            if (!out.masked(k)) {
                assertEquals(2.5, out.flux(k), 1e-12);
                // an output pixel of ~1.15 input pixels averages them: variance falls, ivar rises above 4
                assertTrue(out.inverseVariance(k) >= 4.0 - 1e-9);
            }
        }
    }

    @Test
    void maskedInputDoesNotLeak() {
        int n = 400;
        double[] f = new double[n];
        boolean[] m = new boolean[n];
        java.util.Arrays.fill(f, 1.0);
        for (int i = 200; i < 210; i++) {
            f[i] = 1e6;
            m[i] = true;
        }
        SpectralAxis axis = SpectralAxis.linear(6000, 0.3, n, SpectralUnit.ANGSTROM, Medium.VACUUM);
        Spectrum out = Resampling.toLogLambda(Spectrum.of(axis, f, null, m, "", null), LogLambdaGrid.covering(6001, 6118, 1e-4));
        for (int k = 0; k < out.size(); k++) {
            if (!out.masked(k)) {
                assertEquals(1.0, out.flux(k), 1e-12);
            }
        }
    }
}
