package org.redward.testkit;

import java.util.Random;

import org.redward.spectrum.Medium;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;

/**
 * Known-redshift synthetic spectra for conformance tests, built here independently of any
 * template set: Gaussian lines at rest vacuum wavelengths (NIST values as listed in the project's
 * reference table) on simple continua, observed on a log10-lambda grid (step 1e-4, 3,800 to
 * 9,200 A unless stated) with seeded Gaussian noise of the given S/N per pixel at the continuum.
 * Invented data for tests only. Deterministic for a seed; thread-safe.
 */
public final class SyntheticSpectra {

    // rest vacuum wavelengths, Angstrom (NIST ASD via the reference table; C III] 1908.73 and Mg II blend from memory)
    static final double LYA = 1215.67, CIV = 1549.06, CIII = 1908.73, MGII = 2798.75;
    static final double OII_A = 3727.092, OII_B = 3729.875, CA_K = 3934.777, CA_H = 3969.591, H_DELTA = 4102.892;
    static final double G_BAND = 4305.6, H_GAMMA = 4341.684, H_BETA = 4862.683, OIII_A = 4960.295, OIII_B = 5008.240;
    static final double MGB = 5174.125, NA_D = 5894.57, NII_A = 6549.86, H_ALPHA = 6564.614, NII_B = 6585.27;
    static final double SII_A = 6718.29, SII_B = 6732.67;

    private SyntheticSpectra() {
    }

    /** What kind of object a synthetic spectrum stands for. */
    public enum Kind { EMISSION_GALAXY, ABSORPTION_GALAXY, QUASAR, STAR }

    /** A synthetic spectrum of {@code kind} at redshift z. */
    public static Spectrum of(Kind kind, double z, double snr, long seed) {
        return switch (kind) {
            case EMISSION_GALAXY -> emissionGalaxy(z, snr, seed);
            case ABSORPTION_GALAXY -> absorptionGalaxy(z, snr, seed);
            case QUASAR -> quasar(z, snr, seed);
            case STAR -> aStar(z, snr, seed);
        };
    }

    /** Flat continuum with nebular lines (ratios to H-beta typical of star-forming galaxies; common practice). */
    public static Spectrum emissionGalaxy(double z, double snr, long seed) {
        double[] w = grid(3800, 9200);
        double[] f = new double[w.length];
        java.util.Arrays.fill(f, 1.0);
        double[][] lines = {{OII_A, 2.6}, {OII_B, 3.4}, {H_GAMMA, 0.94}, {H_BETA, 2}, {OIII_A, 0.8}, {OIII_B, 2.4},
            {NII_A, 0.7}, {H_ALPHA, 6}, {NII_B, 2}, {SII_A, 1}, {SII_B, 0.7}};
        for (double[] l : lines) {
            gaussian(w, f, l[0] * (1 + z), 2.5 * (1 + z), 10 * l[1]);
        }
        return noisy(w, f, snr, seed);
    }

    /** Red continuum with the 4000 A break and stellar absorption features. */
    public static Spectrum absorptionGalaxy(double z, double snr, long seed) {
        double[] w = grid(3800, 9200);
        double[] f = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            double rest = w[i] / (1 + z);
            f[i] = (0.55 + 0.45 * 0.5 * (1 + Math.tanh((rest - 4000) / 30))) * Math.pow(rest / 5500, 0.5);
        }
        double[][] lines = {{CA_K, 12, 7}, {CA_H, 10, 7}, {H_DELTA, 2, 5}, {G_BAND, 5, 9}, {H_GAMMA, 2, 5}, {H_BETA, 2, 5},
            {MGB, 5, 6}, {NA_D, 4, 5}, {H_ALPHA, 1.5, 5}};
        for (double[] l : lines) {
            absorb(w, f, l[0] * (1 + z), l[2] * (1 + z), l[1] * (1 + z));
        }
        return noisy(w, f, snr, seed);
    }

    /** Power-law continuum with broad lines (sigma about 2,500 km/s) and a Lyman-alpha forest, observed 3,800 to 9,200 A. */
    public static Spectrum quasar(double z, double snr, long seed) {
        double[] w = grid(3800, 9200);
        double[] f = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            f[i] = Math.pow(w[i] / (1 + z) / 3000, -1.5);
        }
        double[][] lines = {{LYA, 90}, {CIV, 25}, {CIII, 20}, {MGII, 30}, {H_GAMMA, 12}, {H_BETA, 45}, {OIII_B, 12}, {H_ALPHA, 190}};
        for (double[] l : lines) {
            double c = l[0] * (1 + z);
            double sigma = (l[0] == OIII_B ? 400 : 2500) / 299_792.458 * c;
            double cont = Math.pow(l[0] / 3000, -1.5);
            gaussian(w, f, c, sigma, l[1] * (1 + z) * cont);
        }
        for (int i = 0; i < w.length; i++) {
            if (w[i] / (1 + z) < LYA) {
                f[i] *= 0.75; // mean Lyman-alpha forest transmission at z ~ 2-3 (common practice, rough)
            }
        }
        return noisy(w, f, snr, seed);
    }

    /** A hot star: 9,500 K Planck continuum with broad Balmer absorption and weak Ca II K. */
    public static Spectrum aStar(double z, double snr, long seed) {
        double[] w = grid(3800, 9200);
        double[] f = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            double lam = w[i] / (1 + z);
            f[i] = Math.pow(lam / 5500, -5) / Math.expm1(1.438777e8 / (lam * 9500)) * Math.expm1(1.438777e8 / (5500 * 9500));
        }
        double[] balmer = {H_ALPHA, H_BETA, H_GAMMA, H_DELTA, 3971.20, 3890.17};
        for (double b : balmer) {
            absorb(w, f, b * (1 + z), 12 * (1 + z), 12 * (1 + z));
        }
        absorb(w, f, CA_K * (1 + z), 3, 1);
        return noisy(w, f, snr, seed);
    }

    /** Vacuum wavelengths on a log10 grid of step 1e-4 from about min to max Angstrom. */
    public static double[] grid(double min, double max) {
        double a = Math.ceil(Math.log10(min) / 1e-4);
        int n = (int) (Math.floor(Math.log10(max) / 1e-4) - a) + 1;
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = Math.pow(10.0, (a + i) * 1e-4);
        }
        return w;
    }

    private static void gaussian(double[] w, double[] f, double centre, double sigma, double flux) {
        double peak = flux / (sigma * Math.sqrt(2 * Math.PI));
        for (int i = 0; i < w.length; i++) {
            double x = (w[i] - centre) / sigma;
            if (Math.abs(x) < 8) {
                f[i] += peak * Math.exp(-0.5 * x * x);
            }
        }
    }

    private static void absorb(double[] w, double[] f, double centre, double sigma, double ew) {
        double d = Math.min(0.9, ew / (sigma * Math.sqrt(2 * Math.PI)));
        for (int i = 0; i < w.length; i++) {
            double x = (w[i] - centre) / sigma;
            if (Math.abs(x) < 8) {
                f[i] *= 1 - d * Math.exp(-0.5 * x * x);
            }
        }
    }

    private static Spectrum noisy(double[] w, double[] f, double snr, long seed) {
        Random rnd = new Random(seed);
        double med = median(f);
        double sigma = med / snr;
        double[] flux = new double[f.length];
        double[] ivar = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            flux[i] = f[i] + sigma * rnd.nextGaussian();
            ivar[i] = 1.0 / (sigma * sigma);
        }
        return Spectrum.of(SpectralAxis.of(w, SpectralUnit.ANGSTROM, Medium.VACUUM, Sampling.LOG_LINEAR), flux, ivar, null,
                "arbitrary", null);
    }

    private static double median(double[] a) {
        double[] c = a.clone();
        java.util.Arrays.sort(c);
        return c[c.length / 2];
    }
}
