package org.redward.lines.internal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.LineKind;

/**
 * Turns matched-filter candidates into fitted lines: groups candidates whose 3-sigma windows
 * overlap into blends, fits each group with {@link BlendFit}, and derives the measured
 * quantities and their errors (see {@link DetectedLine} for the definitions). One instance per
 * spectrum; not thread-safe.
 */
final class Fitter {

    private static final double SQRT_2PI = Math.sqrt(2.0 * Math.PI);

    private final double[] w;
    private final double[] r;
    private final double[] v;
    private final double[] c;
    private final FinderSettings settings;

    Fitter(double[] w, double[] r, double[] v, double[] c, double pixelKms, FinderSettings settings) {
        this.w = w;
        this.r = r;
        this.v = v;
        this.c = c;
        this.settings = settings;
    }

    /** One fitted Gaussian: amplitude, centre and width (Angstrom) with their 3x3 covariance. */
    record Line(int sign, double a, double mu, double s, double[][] cov, int blend, int pixel, double fwhmPixels,
            boolean atUpperWidth, double detectionSnr) {
        MatchedFilterFinder.Candidate asCandidate() {
            return new MatchedFilterFinder.Candidate(pixel, fwhmPixels, sign * Math.abs(detectionSnr), a);
        }
    }

    private int pixelOf(double lambda) {
        int i = Arrays.binarySearch(w, lambda);
        if (i >= 0) {
            return i;
        }
        int ins = -i - 1;
        if (ins <= 0) {
            return 0;
        }
        if (ins >= w.length) {
            return w.length - 1;
        }
        return lambda - w[ins - 1] < w[ins] - lambda ? ins - 1 : ins;
    }

    private double pixelWidth(int i) {
        return i + 1 < w.length ? w[i + 1] - w[i] : w[i] - w[i - 1];
    }

    /** Fits all candidates, close ones together. */
    List<Line> fitAll(List<MatchedFilterFinder.Candidate> candidates) {
        List<double[]> seeds = new ArrayList<>();
        for (MatchedFilterFinder.Candidate cd : candidates) {
            int p = cd.pixel();
            double sigma = Math.max(0.8, cd.fwhmPixels() / MatchedFilterFinder.FWHM_PER_SIGMA) * pixelWidth(p);
            seeds.add(new double[] {cd.amplitude(), w[p], sigma, cd.sign(), Math.abs(cd.snr())});
        }
        seeds.sort(Comparator.comparingDouble(x -> x[1]));
        List<Line> out = new ArrayList<>();
        int blendId = 0;
        int i = 0;
        while (i < seeds.size()) {
            int j = i + 1;
            double reach = seeds.get(i)[1] + 3 * seeds.get(i)[2];
            while (j < seeds.size() && seeds.get(j)[1] - 3 * seeds.get(j)[2] < reach) {
                reach = Math.max(reach, seeds.get(j)[1] + 3 * seeds.get(j)[2]);
                j++;
            }
            List<double[]> group = seeds.subList(i, j);
            List<Line> fitted = fitGroup(group, group.size() > 1 ? blendId : -1);
            if (group.size() > 1) {
                blendId++;
            }
            out.addAll(fitted);
            i = j;
        }
        return out;
    }

    private List<Line> fitGroup(List<double[]> group, int blend) {
        int m = group.size();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double[] sd : group) {
            lo = Math.min(lo, sd[1] - 4 * sd[2]);
            hi = Math.max(hi, sd[1] + 4 * sd[2]);
        }
        int p0 = Math.max(0, pixelOf(lo) - 3);
        int p1 = Math.min(w.length - 1, pixelOf(hi) + 3);
        int count = 0;
        for (int p = p0; p <= p1; p++) {
            if (v[p] > 0) {
                count++;
            }
        }
        if (count < 3 * m + 3) {
            return List.of();
        }
        double[] x = new double[count];
        double[] y = new double[count];
        double[] iv = new double[count];
        int q = 0;
        for (int p = p0; p <= p1; p++) {
            if (v[p] > 0) {
                x[q] = w[p];
                y[q] = r[p];
                iv[q] = v[p];
                q++;
            }
        }
        double[] start = new double[3 * m + 1];
        int[] sign = new int[m];
        double[] sMin = new double[m];
        double[] sMax = new double[m];
        for (int k = 0; k < m; k++) {
            double[] sd = group.get(k);
            int p = pixelOf(sd[1]);
            sign[k] = (int) sd[3];
            start[3 * k] = sign[k] > 0 ? Math.max(sd[0], 1e-30) : Math.min(sd[0], -1e-30);
            start[3 * k + 1] = sd[1];
            sMin[k] = 0.35 * pixelWidth(p);
            sMax[k] = Math.max(2 * sMin[k], Math.min(settings.maxFwhmKmPerS() * sd[1] / MatchedFilterFinder.C / MatchedFilterFinder.FWHM_PER_SIGMA,
                    0.5 * (x[count - 1] - x[0])));
            start[3 * k + 2] = Math.min(Math.max(sd[2], sMin[k]), sMax[k]);
        }
        BlendFit.Result res = BlendFit.fit(x, y, iv, start, sign, sMin, sMax);
        if (!res.converged() || res.covariance() == null) {
            return List.of();
        }
        double[] pp = res.params();
        double[][] cov = res.covariance();
        List<Line> out = new ArrayList<>(m);
        for (int k = 0; k < m; k++) {
            double[][] ck = new double[3][3];
            for (int a = 0; a < 3; a++) {
                for (int b = 0; b < 3; b++) {
                    ck[a][b] = cov[3 * k + a][3 * k + b];
                }
            }
            double mu = pp[3 * k + 1];
            double s = pp[3 * k + 2];
            int pix = pixelOf(mu);
            out.add(new Line(sign[k], pp[3 * k], mu, s, ck, blend, pix,
                    s * MatchedFilterFinder.FWHM_PER_SIGMA / pixelWidth(pix), s >= 0.999 * sMax[k], group.get(k)[4]));
        }
        return out;
    }

    /** The residual left by the fitted Gaussians. */
    double[] residual(List<Line> lines) {
        double[] out = r.clone();
        for (Line l : lines) {
            int p0 = pixelOf(l.mu() - 5 * l.s());
            int p1 = pixelOf(l.mu() + 5 * l.s());
            for (int p = p0; p <= p1; p++) {
                double d = (w[p] - l.mu()) / l.s();
                out[p] -= l.a() * Math.exp(-0.5 * d * d);
            }
        }
        return out;
    }

    /** Measured lines with flux S/N of at least {@code minSnr}, sorted by centre. */
    List<DetectedLine> measure(List<Line> lines, double minSnr) {
        List<DetectedLine> out = new ArrayList<>();
        int[] blendSize = new int[lines.size() + 1];
        for (Line l : lines) {
            if (l.blend() >= 0) {
                blendSize[l.blend()]++;
            }
        }
        for (Line l : lines) {
            double a = l.a();
            double mu = l.mu();
            double s = l.s();
            double va = l.cov()[0][0];
            double vmu = l.cov()[1][1];
            double vs = l.cov()[2][2];
            double cas = l.cov()[0][2];
            if (a == 0 || !(va > 0) || !(vmu > 0) || !(vs > 0) || l.atUpperWidth() || settings.isMasked(mu)) {
                continue;
            }
            double flux = a * s * SQRT_2PI;
            double fluxErr = SQRT_2PI * Math.sqrt(Math.max(0, s * s * va + a * a * vs + 2 * a * s * cas));
            double snr = Math.abs(flux) / fluxErr;
            if (!(snr >= minSnr) || !covered(mu, s)) {
                continue;
            }
            double cont = continuumAt(mu);
            double ew = cont > 0 ? flux / cont : Double.NaN;
            double ewErr = cont > 0 ? fluxErr / cont : Double.NaN;
            double k = MatchedFilterFinder.FWHM_PER_SIGMA * MatchedFilterFinder.C / mu;
            LineKind kind = l.sign() > 0 ? LineKind.EMISSION : LineKind.ABSORPTION;
            int blend = l.blend() >= 0 && blendSize[l.blend()] > 1 ? l.blend() : -1;
            out.add(new DetectedLine(kind, mu, Math.sqrt(vmu), k * s, k * Math.sqrt(vs), flux, fluxErr, ew, ewErr,
                    snr, l.detectionSnr(), cont, blend));
        }
        out.sort(Comparator.comparingDouble(DetectedLine::centreAngstrom));
        return renumberBlends(out);
    }

    /** Blend numbers 0, 1, 2... in order of wavelength; a blend left with one member becomes -1. */
    private static List<DetectedLine> renumberBlends(List<DetectedLine> lines) {
        java.util.Map<Integer, Integer> size = new java.util.HashMap<>();
        for (DetectedLine d : lines) {
            if (d.blend() >= 0) {
                size.merge(d.blend(), 1, Integer::sum);
            }
        }
        java.util.Map<Integer, Integer> ids = new java.util.HashMap<>();
        List<DetectedLine> out = new ArrayList<>(lines.size());
        for (DetectedLine d : lines) {
            int b = -1;
            if (d.blend() >= 0 && size.get(d.blend()) > 1) {
                b = ids.computeIfAbsent(d.blend(), x -> ids.size());
            }
            out.add(b == d.blend() ? d : new DetectedLine(d.kind(), d.centreAngstrom(), d.centreErrorAngstrom(), d.fwhmKmPerS(),
                    d.fwhmErrorKmPerS(), d.flux(), d.fluxError(), d.equivalentWidthAngstrom(), d.equivalentWidthErrorAngstrom(),
                    d.snr(), d.detectionSnr(), d.continuum(), b));
        }
        return out;
    }

    /** True if at least half the pixels within one sigma of the centre (and at least 2) are usable. */
    private boolean covered(double mu, double s) {
        int p0 = pixelOf(mu - Math.max(s, 0.5 * pixelWidth(pixelOf(mu))));
        int p1 = pixelOf(mu + Math.max(s, 0.5 * pixelWidth(pixelOf(mu))));
        int good = 0;
        for (int p = p0; p <= p1; p++) {
            if (v[p] > 0) {
                good++;
            }
        }
        return good >= 2 && good >= 0.5 * (p1 - p0 + 1);
    }

    private double continuumAt(double mu) {
        int i = Arrays.binarySearch(w, mu);
        if (i >= 0) {
            return c[i];
        }
        int ins = -i - 1;
        if (ins <= 0) {
            return c[0];
        }
        if (ins >= w.length) {
            return c[w.length - 1];
        }
        double t = (mu - w[ins - 1]) / (w[ins] - w[ins - 1]);
        return c[ins - 1] * (1 - t) + c[ins] * t;
    }
}
