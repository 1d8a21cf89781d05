package org.redward.redshift.kit;

import org.redward.api.templates.Template;
import org.redward.spectrum.LogLambdaGrid;
import org.redward.spectrum.Medium;
import org.redward.spectrum.Resampling;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;

/**
 * A rest-frame template resampled (flux-conserving) onto the aligned log10-lambda grid of the
 * analysis step. Leading and trailing runs of exact zeros (padding in some published files) are
 * treated as not covered. {@code covered[i]} is false outside the template's data. Do not modify
 * the arrays. Thread-safe once built.
 */
public final class GriddedTemplate {

    public final Template template;
    public final long startIndex;
    public final double[] flux;
    public final boolean[] covered;

    private GriddedTemplate(Template t, long startIndex, double[] flux, boolean[] covered) {
        this.template = t;
        this.startIndex = startIndex;
        this.flux = flux;
        this.covered = covered;
    }

    /** @return the gridded template, or null when it covers fewer than 4 grid pixels */
    public static GriddedTemplate of(Template t, double log10Step) {
        double[] w = t.restVacuumAngstrom();
        double[] f = t.flux();
        int lo = 0, hi = f.length - 1;
        while (lo < hi && f[lo] == 0.0) {
            lo++;
        }
        while (hi > lo && f[hi] == 0.0) {
            hi--;
        }
        if (hi - lo < 3 || !(w[hi] > w[lo] * Math.pow(10, 4 * log10Step))) {
            return null;
        }
        double[] ww = java.util.Arrays.copyOfRange(w, lo, hi + 1);
        double[] ff = java.util.Arrays.copyOfRange(f, lo, hi + 1);
        Spectrum s = Spectrum.of(SpectralAxis.of(ww, SpectralUnit.ANGSTROM, Medium.VACUUM, Sampling.TABULATED), ff, null,
                null, "", null);
        LogLambdaGrid grid = LogLambdaGrid.covering(ww[0], ww[ww.length - 1], log10Step);
        Spectrum r = Resampling.toLogLambda(s, grid);
        double[] flux = r.flux();
        boolean[] m = r.mask();
        boolean[] cov = new boolean[flux.length];
        for (int i = 0; i < flux.length; i++) {
            cov[i] = !m[i];
            if (m[i]) {
                flux[i] = 0;
            }
        }
        return new GriddedTemplate(t, Math.round(grid.log10StartAngstrom() / log10Step), flux, cov);
    }

    public int size() {
        return flux.length;
    }
}
