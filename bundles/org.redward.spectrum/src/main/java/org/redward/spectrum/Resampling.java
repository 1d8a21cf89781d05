package org.redward.spectrum;

/**
 * Flux-conserving resampling of a spectrum onto a {@link LogLambdaGrid}.
 *
 * <p>Each input pixel is treated as a bin of constant flux density whose edges lie half-way
 * between neighbouring pixel centres (the outer edges mirror the inner ones). An output pixel's
 * flux is the overlap-weighted mean of the usable input bins it covers, so that the integral of
 * flux density over any range of whole output pixels is preserved (common practice for
 * rebinning; see e.g. Carnall 2017, arXiv:1705.05165). Variances propagate as
 * {@code var_out = sum(w_i^2 var_i) / (sum w_i)^2} with {@code w_i} the overlap lengths (pixel
 * covariances introduced by rebinning are ignored). An output pixel whose usable overlap is
 * below half its width, or that lies outside the input range, is masked.
 *
 * <p>Stateless and thread-safe. Cost O(n_in + n_out).
 */
public final class Resampling {

    private Resampling() {
    }

    /** Resamples {@code spectrum} onto {@code grid}; metadata and flux unit are kept. */
    public static Spectrum toLogLambda(Spectrum spectrum, LogLambdaGrid grid) {
        int n = spectrum.size();
        double[] w = spectrum.axis().vacuumAngstrom();
        double[] f = spectrum.flux();
        double[] iv = spectrum.inverseVariance();
        boolean[] bad = spectrum.mask();
        double[] inEdges = new double[n + 1];
        if (n == 1) {
            inEdges[0] = w[0] * (1 - 1e-4);
            inEdges[1] = w[0] * (1 + 1e-4);
        } else {
            for (int i = 1; i < n; i++) {
                inEdges[i] = 0.5 * (w[i - 1] + w[i]);
            }
            inEdges[0] = w[0] - (inEdges[1] - w[0]);
            inEdges[n] = w[n - 1] + (w[n - 1] - inEdges[n - 1]);
        }
        int m = grid.size();
        double half = 0.5 * grid.log10Step();
        double[] outFlux = new double[m];
        double[] outIvar = new double[m];
        boolean[] outMask = new boolean[m];
        int j = 0;
        for (int k = 0; k < m; k++) {
            double lo = Math.pow(10.0, grid.log10StartAngstrom() + k * grid.log10Step() - half);
            double hi = Math.pow(10.0, grid.log10StartAngstrom() + k * grid.log10Step() + half);
            while (j < n && inEdges[j + 1] <= lo) {
                j++;
            }
            double sumW = 0, sumWF = 0, sumW2Var = 0;
            for (int i = j; i < n && inEdges[i] < hi; i++) {
                double overlap = Math.min(hi, inEdges[i + 1]) - Math.max(lo, inEdges[i]);
                if (overlap <= 0 || bad[i]) {
                    continue;
                }
                sumW += overlap;
                sumWF += overlap * f[i];
                sumW2Var += overlap * overlap / iv[i];
            }
            if (sumW < 0.5 * (hi - lo)) {
                outMask[k] = true;
                continue;
            }
            outFlux[k] = sumWF / sumW;
            outIvar[k] = sumW * sumW / sumW2Var;
        }
        SpectralAxis axis = SpectralAxis.of(grid.vacuumAngstrom(), SpectralUnit.ANGSTROM, Medium.VACUUM, Sampling.LOG_LINEAR);
        return Spectrum.of(axis, outFlux, spectrum.hasErrors() ? outIvar : null,
                outMask, spectrum.fluxUnit(), spectrum.metadata());
    }

}
