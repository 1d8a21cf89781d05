package org.redward.mock.internal;

import org.redward.spectrum.AirVacuum;

/**
 * The Quill pixel grid in vacuum (centres and edges) and pixel-integrated Gaussian profiles on
 * it. Immutable and thread-safe.
 */
final class Grid {

    static final double C_KM_S = 299_792.458;
    private static final double SQRT2 = Math.sqrt(2.0);

    final int n;
    final double[] air;
    final double[] vac;
    /** Vacuum pixel edges, n + 1 values. */
    final double[] edges;
    /** Line-spread sigma, vacuum Angstrom. */
    final double lsfSigma;

    private static final Grid QUILL = new Grid();

    static Grid quill() {
        return QUILL;
    }

    private Grid() {
        n = Scenario.PIXELS;
        air = new double[n];
        vac = new double[n];
        edges = new double[n + 1];
        for (int i = 0; i < n; i++) {
            air[i] = Scenario.airAngstrom(i);
            vac[i] = AirVacuum.airToVacuumAngstrom(air[i]);
        }
        for (int i = 0; i <= n; i++) {
            edges[i] = AirVacuum.airToVacuumAngstrom(Scenario.airAngstrom(i) - 0.5 * Scenario.WAVELENGTH_STEP_ANGSTROM);
        }
        lsfSigma = Scenario.LSF_FWHM_ANGSTROM / (2.0 * Math.sqrt(2.0 * Math.log(2.0)));
    }

    /** First pixel whose upper edge lies above {@code w}. */
    int pixelAtOrAbove(double w) {
        int lo = 0;
        int hi = n;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (edges[mid + 1] <= w) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /**
     * Adds {@code area * (fraction of a unit Gaussian falling in pixel i) / (pixel width)} to
     * {@code target}: a line of integrated flux {@code area} (flux-density units times Angstrom)
     * centred at {@code centre} with standard deviation {@code sigma} (vacuum Angstrom), as
     * flux density averaged over each pixel.
     */
    void addGaussian(double[] target, double centre, double sigma, double area) {
        double lo = centre - 7 * sigma;
        double hi = centre + 7 * sigma;
        if (hi < edges[0] || lo > edges[n]) {
            return;
        }
        int i0 = pixelAtOrAbove(lo);
        double prev = cdf(edges[i0], centre, sigma);
        for (int i = i0; i < n && edges[i] <= hi; i++) {
            double next = cdf(edges[i + 1], centre, sigma);
            target[i] += area * (next - prev) / (edges[i + 1] - edges[i]);
            prev = next;
        }
    }

    private static double cdf(double x, double mu, double sigma) {
        return 0.5 * (1.0 + erf((x - mu) / (SQRT2 * sigma)));
    }

    /**
     * The error function to 1.5e-7 absolute (Abramowitz &amp; Stegun 1964, eq. 7.1.26): ample for
     * a mock generator and several times faster than the exact {@code Erf.erf} of Commons Math,
     * against which {@code GridTest} checks it.
     */
    static double erf(double x) {
        double t = 1.0 / (1.0 + 0.3275911 * Math.abs(x));
        double y = 1.0 - (((((1.061405429 * t - 1.453152027) * t) + 1.421413741) * t - 0.284496736) * t + 0.254829592) * t
                * Math.exp(-x * x);
        return x >= 0 ? y : -y;
    }

    /** Total observed-frame sigma (Angstrom) of a line at {@code centre} with intrinsic velocity sigma, through the LSF. */
    double observedSigma(double centre, double sigmaKmS) {
        double s = centre * sigmaKmS / C_KM_S;
        return Math.sqrt(s * s + lsfSigma * lsfSigma);
    }
}
