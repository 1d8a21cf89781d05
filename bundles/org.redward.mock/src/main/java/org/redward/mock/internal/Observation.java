package org.redward.mock.internal;

import java.util.Arrays;
import java.util.random.RandomGenerator;

/**
 * Observes a model spectrum through Quill: throughput, night sky (continuum and lines through the
 * line-spread function), telluric residuals, photon and read noise at a chosen median S/N per
 * pixel, imperfect sky subtraction, cosmic-ray hits (most flagged, some not), dead CCD columns
 * and broken fibres. Output is flux-calibrated (1e-17 erg/s/cm^2/Angstrom) with inverse
 * variance and a bit mask. Stateless; thread-safe given one random generator per call.
 */
final class Observation {

    /** Mask bit: cosmic ray found by the pipeline. */
    static final int MASK_COSMIC = 1;
    /** Mask bit: bad CCD column. */
    static final int MASK_BAD_COLUMN = 2;
    /** Mask bit: no light in the fibre. */
    static final int MASK_DEAD_FIBRE = 4;

    private static final double[] SKY_LINES_VAC = NightSky.vacuumWavelengths();
    private static final double[] SKY_LINE_FLUX = NightSky.strengths();

    /** What the observation wrote for one fibre. */
    static final class Result {
        final float[] flux;
        final float[] ivar;
        final byte[] mask;
        /** Median over pixels of the noise-free object S/N per pixel. */
        double snrMedian;
        /** AB magnitude of the object in a 5600-6800 Angstrom box (NaN for no object). */
        double magAb = Double.NaN;
        int cosmicHits;
        int cosmicUnflagged;

        Result(int n) {
            flux = new float[n];
            ivar = new float[n];
            mask = new byte[n];
        }
    }

    private Observation() {
    }

    /** Sky per fibre in flux units per pixel; lines shifted by {@code shiftAngstrom} and scaled. */
    static double[] sky(Grid g, double lineScale, double shiftAngstrom) {
        double[] s = new double[g.n];
        for (int i = 0; i < g.n; i++) {
            s[i] = NightSky.continuum(g.air[i]);
        }
        for (int k = 0; k < SKY_LINES_VAC.length; k++) {
            g.addGaussian(s, SKY_LINES_VAC[k] + shiftAngstrom, g.lsfSigma, SKY_LINE_FLUX[k] * lineScale);
        }
        return s;
    }

    /**
     * @param model noise-free object flux (arbitrary scale), or null for an empty fibre
     * @param targetSnr median S/N per pixel wanted for the object
     * @param skyLineScale night-to-night strength of the sky lines
     */
    static Result observe(Grid g, double[] model, double targetSnr, double skyLineScale, RandomGenerator r) {
        int n = g.n;
        double[] gain = new double[n];
        for (int i = 0; i < n; i++) {
            gain[i] = Scenario.electronsPerFluxUnit(g.air[i]);
        }
        double[] sky = sky(g, skyLineScale, 0.0);
        double rn2 = Scenario.READ_NOISE_E * Scenario.READ_NOISE_E * Scenario.EXTRACTION_ROWS;
        Result res = new Result(n);
        double[] obj = new double[n];
        if (model != null) {
            double scale = scaleForSnr(model, sky, gain, rn2, targetSnr);
            double sumF = 0;
            int cnt = 0;
            for (int i = 0; i < n; i++) {
                obj[i] = scale * model[i];
                if (g.air[i] >= 5600 && g.air[i] <= 6800) {
                    sumF += obj[i];
                    cnt++;
                }
            }
            double fnu = sumF / cnt * 1e-17 * 6200.0 * 6200.0 / 2.99792458e18;
            res.magAb = fnu > 0 ? -2.5 * Math.log10(fnu) - 48.6 : Double.NaN;
            res.snrMedian = medianSnr(obj, sky, gain, rn2, 1);
            // telluric bands, imperfectly corrected (air wavelengths of the O2 A and B bands)
            double ra = Recipes.uniform(r, 0.0, 0.12);
            double rb = Recipes.uniform(r, 0.0, 0.06);
            for (int i = 0; i < n; i++) {
                double a = g.air[i];
                obj[i] *= (1 - ra * Math.exp(-0.5 * Math.pow((a - 7615) / 14, 2)))
                        * (1 - rb * Math.exp(-0.5 * Math.pow((a - 6880) / 7, 2)));
            }
        }
        // sky model used for subtraction: slightly wrong scale and wavelength solution
        double scaleErr = 1 + 0.01 * r.nextGaussian();
        double lineErr = 1 + 0.025 * r.nextGaussian();
        double shift = 0.04 * r.nextGaussian();
        double[] skyModel = sky(g, skyLineScale * lineErr, shift);
        for (int i = 0; i < n; i++) {
            double objE = Math.max(0, obj[i]) * gain[i];
            double skyE = sky[i] * gain[i];
            double var = objE + skyE + rn2;
            double counts = objE + skyE + Math.sqrt(var) * r.nextGaussian();
            double sub = counts - skyModel[i] * scaleErr * gain[i];
            res.flux[i] = (float) (sub / gain[i]);
            res.ivar[i] = (float) (gain[i] * gain[i] / var);
        }
        cosmics(g, gain, res, r);
        badColumns(res, r);
        return res;
    }

    /** A broken fibre: no light at all, or none on part of the detector. */
    static Result broken(Grid g, RandomGenerator r) {
        Result res = observe(g, null, 0, 1.0, r);
        int from = r.nextDouble() < 0.5 ? 0 : g.n / 3 + r.nextInt(g.n / 3);
        for (int i = from; i < g.n; i++) {
            res.flux[i] = 0f;
            res.ivar[i] = 0f;
            res.mask[i] |= MASK_DEAD_FIBRE;
        }
        return res;
    }

    private static void cosmics(Grid g, double[] gain, Result res, RandomGenerator r) {
        int hits = poisson(r, 2.5);
        for (int h = 0; h < hits; h++) {
            int at = r.nextInt(g.n);
            int width = 1 + r.nextInt(2);
            double electrons = Recipes.logUniform(r, 40, 4000);
            boolean flagged = r.nextDouble() < 0.85;
            for (int i = at; i < Math.min(g.n, at + width); i++) {
                res.flux[i] += (float) (electrons / width / gain[i]);
                if (flagged) {
                    res.mask[i] |= MASK_COSMIC;
                    res.ivar[i] = 0f;
                }
            }
            res.cosmicHits++;
            if (!flagged) {
                res.cosmicUnflagged++;
            }
        }
    }

    private static void badColumns(Result res, RandomGenerator r) {
        if (r.nextDouble() < 0.25) {
            int n = res.flux.length;
            int width = 2 + r.nextInt(12);
            int at = r.nextInt(n - width);
            for (int i = at; i < at + width; i++) {
                res.flux[i] = 0f;
                res.ivar[i] = 0f;
                res.mask[i] |= MASK_BAD_COLUMN;
            }
        }
    }

    static int poisson(RandomGenerator r, double mean) {
        double l = Math.exp(-mean);
        int k = 0;
        double p = r.nextDouble();
        while (p > l) {
            k++;
            p *= r.nextDouble();
        }
        return k;
    }

    /** The flux scale that gives the wanted median S/N per pixel (bisection in log scale, every third pixel). */
    static double scaleForSnr(double[] model, double[] sky, double[] gain, double rn2, double target) {
        int m = (model.length + 2) / 3;
        double[] signal = new double[m];
        double[] background = new double[m];
        for (int i = 0, k = 0; i < model.length; i += 3, k++) {
            signal[k] = Math.max(0, model[i]) * gain[i];
            background[k] = sky[i] * gain[i] + rn2;
        }
        double[] snr = new double[m];
        double lo = -30;
        double hi = 30;
        while (hi - lo > 1e-4) {
            double mid = 0.5 * (lo + hi);
            double s = Math.exp(mid);
            for (int k = 0; k < m; k++) {
                double o = s * signal[k];
                snr[k] = o / Math.sqrt(o + background[k]);
            }
            if (median(snr) < target) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return Math.exp(0.5 * (lo + hi));
    }

    private static double median(double[] a) {
        double[] c = a.clone();
        Arrays.sort(c);
        int k = c.length;
        return k % 2 == 1 ? c[k / 2] : 0.5 * (c[k / 2 - 1] + c[k / 2]);
    }

    /** Median noise-free S/N per pixel, over every {@code stride}-th pixel. */
    static double medianSnr(double[] obj, double[] sky, double[] gain, double rn2, int stride) {
        double[] snr = new double[(obj.length + stride - 1) / stride];
        int k = 0;
        for (int i = 0; i < obj.length; i += stride) {
            double o = Math.max(0, obj[i]) * gain[i];
            snr[k++] = o / Math.sqrt(o + sky[i] * gain[i] + rn2);
        }
        Arrays.sort(snr, 0, k);
        return k % 2 == 1 ? snr[k / 2] : 0.5 * (snr[k / 2 - 1] + snr[k / 2]);
    }
}
