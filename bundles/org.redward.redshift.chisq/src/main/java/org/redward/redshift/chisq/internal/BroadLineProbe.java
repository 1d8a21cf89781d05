package org.redward.redshift.chisq.internal;

import org.redward.redshift.kit.Continuum;
import org.redward.redshift.kit.GriddedTemplate;
import org.redward.redshift.kit.Stats;

/**
 * The broad emission lines of a quasar template, isolated: the template minus its continuum (box
 * median over 301 pixels, about 20,800 km/s), then a running median over about 2,100 km/s that
 * removes narrow lines (FWHM below about 1,000 km/s) and keeps broad ones (FWHM of thousands of
 * km/s). Added to a galaxy fit it asks "are there broad lines on top of this galaxy?",
 * the defining property of a broad-line active nucleus (common practice: type 1 nuclei are
 * classified by broad permitted lines). Immutable.
 */
final class BroadLineProbe {

    final long startIndex;
    final double[] flux;

    private BroadLineProbe(long startIndex, double[] flux) {
        this.startIndex = startIndex;
        this.flux = flux;
    }

    static BroadLineProbe of(GriddedTemplate q, double pixelKmPerS) {
        int n = q.size();
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = q.covered[i] ? 1 : 0;
        }
        double[] cont = Continuum.boxMedian(q.flux, w, 301);
        double[] lines = new double[n];
        for (int i = 0; i < n; i++) {
            lines[i] = q.covered[i] ? q.flux[i] - cont[i] : 0;
        }
        // running median over ~2,100 km/s: removes narrow lines (FWHM below ~1,000 km/s), keeps broad ones
        int half = Math.max(1, (int) Math.round(1050.0 / pixelKmPerS));
        double[] out = new double[n];
        double[] buf = new double[2 * half + 1];
        for (int i = 0; i < n; i++) {
            int m = 0;
            for (int j = Math.max(0, i - half); j <= Math.min(n - 1, i + half); j++) {
                buf[m++] = lines[j];
            }
            out[i] = Stats.median(java.util.Arrays.copyOf(buf, m));
        }
        return new BroadLineProbe(q.startIndex, out);
    }

    /** This probe on another grid (start, length), zero outside its data. */
    double[] on(long gridStart, int length) {
        double[] a = new double[length];
        for (int j = 0; j < length; j++) {
            long k = gridStart + j - startIndex;
            if (k >= 0 && k < flux.length) {
                a[j] = flux[(int) k];
            }
        }
        return a;
    }
}
