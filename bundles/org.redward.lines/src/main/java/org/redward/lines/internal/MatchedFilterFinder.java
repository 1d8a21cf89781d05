package org.redward.lines.internal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.osgi.service.component.annotations.Component;
import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.LineFinder;
import org.redward.api.lines.LineKind;
import org.redward.api.lines.LineSearch;
import org.redward.api.registry.Provided;
import org.redward.spectrum.Spectrum;

/**
 * The line finder: a robust continuum ({@link Continuum}), matched-filter detection with
 * Gaussian kernels of several widths, and weighted Gaussian fits ({@link BlendFit}) of every
 * detection, close lines fitted together as blends.
 *
 * <p>Detection. With residual r = flux - continuum and weights v = inverse variance (0 where
 * masked), the matched filter of a Gaussian kernel g of width sigma (pixels) gives at pixel i the
 * least-squares amplitude and its S/N (Turin 1960, IRE Trans. Inf. Theory 6, 311; common practice):
 * <pre>A_i = sum_j r_{i+j} v_{i+j} g_j / sum_j v_{i+j} g_j^2,   S/N_i = sum_j r_{i+j} v_{i+j} g_j / sqrt(sum_j v_{i+j} g_j^2).</pre>
 * Kernels run from 2 to about 70 pixels FWHM (limited by the widest line allowed); a feature is a
 * candidate where |S/N| reaches the threshold and is a maximum both along the spectrum and across
 * kernel widths. After the first round of fits, the detection is run again (up to three times) on
 * what the fits leave, so that lines hidden in a blend (e.g. [N II] beside H-alpha) are found and
 * the blend refitted with them.
 *
 * <p>Noise. When the file has errors, they are inflated (never deflated) by the robust scatter of
 * the normalised residuals about the continuum; when it has none, the noise is that scatter.
 *
 * <p>Stateless and thread-safe; never throws for bad data.
 */
@Component(property = {Provided.ID + "=" + MatchedFilterFinder.ID,
        Provided.DESCRIPTION + "=robust continuum, matched-filter detection, Levenberg-Marquardt Gaussian fits of lines and blends"})
public final class MatchedFilterFinder implements LineFinder {

    public static final String ID = "matched-gauss";
    static final double C = DetectedLine.C_KM_PER_S;
    static final double FWHM_PER_SIGMA = 2.0 * Math.sqrt(2.0 * Math.log(2.0));
    /** Kernel widths (FWHM, pixels). */
    private static final double[] KERNEL_FWHM = {2.0, 3.0, 4.5, 7.0, 11.0, 17.0, 26.0, 40.0, 60.0};
    /** Fewest usable pixels a spectrum needs. */
    static final int MIN_PIXELS = 12;
    /** At most this many lines are fitted (the strongest detections). */
    static final int MAX_LINES = 40;
    /** Detection rounds on what the fits leave, after the first. */
    static final int EXTRA_ROUNDS = 3;
    /** A fitted line is kept if its flux S/N reaches this fraction of the detection threshold. */
    static final double KEEP_FRACTION = 0.6;

    @Override
    public LineSearch find(Spectrum spectrum, FinderSettings settings) {
        try {
            return search(spectrum, settings);
        } catch (RuntimeException e) {
            return LineSearch.none("line search failed on this spectrum: " + e);
        }
    }

    private LineSearch search(Spectrum s, FinderSettings settings) {
        int n = s.size();
        double[] w = s.axis().vacuumAngstrom();
        double[] f = s.flux();
        double[] iv = s.inverseVariance();
        int usable = 0;
        for (int i = 0; i < n; i++) {
            if (iv[i] > 0 && settings.isMasked(w[i])) {
                iv[i] = 0;
            }
            if (iv[i] > 0) {
                usable++;
            }
        }
        if (usable == 0) {
            return LineSearch.none("no lines: every pixel is masked or has no valid flux");
        }
        if (usable < MIN_PIXELS) {
            return LineSearch.none(String.format(Locale.ROOT,
                    "no lines: only %d usable pixels, fewer than the %d one line needs to be told from its continuum", usable, MIN_PIXELS));
        }
        List<String> statements = new ArrayList<>();
        int bin = Math.max(8, Math.min(50, usable / 6));
        Continuum.Result cont = Continuum.estimate(w, f, iv, bin, 4, 3.0);
        if (cont == null) {
            return LineSearch.none("no lines: too few usable pixels to place a continuum");
        }
        double[] c = cont.level();
        double scatter = cont.scatter();
        double scale;
        if (!(scatter > 0) || !Double.isFinite(scatter)) {
            if (!s.hasErrors()) {
                return new LineSearch(List.of(), c, 1.0, List.of("no lines: the spectrum does not scatter about its continuum at all "
                        + "(flat, or smooth) and the file gives no errors"));
            }
            scale = 1.0;
        } else if (s.hasErrors()) {
            scale = Math.max(1.0, scatter);
            if (scale > 1.2) {
                statements.add(String.format(Locale.ROOT, "errors inflated by %.2f to match the scatter about the continuum", scale));
            }
        } else {
            scale = scatter;
            statements.add(String.format(Locale.ROOT, "the file gives no errors: noise taken from the scatter about the continuum (%.3g)", scale));
        }
        double[] v = new double[n];
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = iv[i] > 0 ? iv[i] / (scale * scale) : 0.0;
            r[i] = iv[i] > 0 ? f[i] - c[i] : 0.0;
        }
        double pixelKms = medianPixelVelocity(w);
        double maxFwhmPx = Math.min(settings.maxFwhmKmPerS() / pixelKms, Math.max(4.0, 1.5 * bin));

        Fitter fitter = new Fitter(w, r, v, c, pixelKms, settings);
        List<Fitter.Line> lines = fitter.fitAll(detect(r, v, settings, maxFwhmPx, List.of()));
        for (int round = 0; round < EXTRA_ROUNDS && !lines.isEmpty() && lines.size() < MAX_LINES; round++) {
            List<Candidate> more = detect(fitter.residual(lines), v, settings, maxFwhmPx, lines);
            if (more.isEmpty()) {
                break;
            }
            List<Candidate> all = new ArrayList<>();
            for (Fitter.Line l : lines) {
                all.add(l.asCandidate());
            }
            all.addAll(more.subList(0, Math.min(more.size(), MAX_LINES - lines.size())));
            lines = fitter.fitAll(all);
        }
        List<DetectedLine> out = fitter.measure(lines, settings.snrThreshold() * KEEP_FRACTION);
        if (out.isEmpty()) {
            statements.add(0, String.format(Locale.ROOT, "no lines: nothing reaches S/N %.1f above or below the continuum", settings.snrThreshold()));
        }
        return new LineSearch(out, c, scale, statements);
    }

    /** A feature found by the matched filter. */
    record Candidate(int pixel, double fwhmPixels, double snr, double amplitude) {
        int sign() {
            return snr > 0 ? 1 : -1;
        }
    }

    /**
     * Matched-filter candidates on the residual, strongest first, skipping features within half a
     * width of a line already fitted.
     */
    static List<Candidate> detect(double[] r, double[] v, FinderSettings settings, double maxFwhmPx, List<Fitter.Line> known) {
        int n = r.length;
        int nk = 0;
        while (nk < KERNEL_FWHM.length && KERNEL_FWHM[nk] <= maxFwhmPx) {
            nk++;
        }
        nk = Math.max(nk, 1);
        double[][] snr = new double[nk][];
        double[][] amp = new double[nk][];
        int[] stride = new int[nk];
        for (int k = 0; k < nk; k++) {
            double sigma = KERNEL_FWHM[k] / FWHM_PER_SIGMA;
            stride[k] = Math.max(1, (int) Math.floor(sigma / 2));
            int half = (int) Math.ceil(3 * sigma);
            double[] g = new double[2 * half + 1];
            for (int j = -half; j <= half; j++) {
                g[j + half] = Math.exp(-0.5 * j * j / (sigma * sigma));
            }
            snr[k] = new double[n];
            amp[k] = new double[n];
            for (int i = 0; i < n; i += stride[k]) {
                if (!(v[i] > 0)) {
                    continue;
                }
                double num = 0;
                double den = 0;
                int lo = Math.max(0, i - half);
                int hi = Math.min(n - 1, i + half);
                for (int p = lo; p <= hi; p++) {
                    double vp = v[p];
                    if (vp > 0) {
                        double gg = g[p - i + half];
                        num += r[p] * vp * gg;
                        den += vp * gg * gg;
                    }
                }
                if (den > 0) {
                    snr[k][i] = num / Math.sqrt(den);
                    amp[k][i] = num / den;
                }
            }
        }
        double t = settings.snrThreshold();
        List<Candidate> found = new ArrayList<>();
        for (int k = 0; k < nk; k++) {
            double[] q = snr[k];
            int st = stride[k];
            for (int i = st; i + st < n; i += st) {
                double a = q[i];
                if (Math.abs(a) < t) {
                    continue;
                }
                int sg = a > 0 ? 1 : -1;
                if ((sg > 0 && !settings.emission()) || (sg < 0 && !settings.absorption())) {
                    continue;
                }
                double m = sg * a;
                if (m < sg * q[i - st] || m < sg * q[i + st]) {
                    continue;
                }
                if (k > 0 && m < sg * snr[k - 1][snap(i, stride[k - 1], n)]) {
                    continue;
                }
                if (k + 1 < nk && m < sg * snr[k + 1][snap(i, stride[k + 1], n)]) {
                    continue;
                }
                found.add(new Candidate(i, KERNEL_FWHM[k], a, amp[k][i]));
            }
        }
        found.sort(Comparator.comparingDouble((Candidate cd) -> -Math.abs(cd.snr())));
        List<Candidate> kept = new ArrayList<>();
        for (Candidate cd : found) {
            boolean clash = false;
            for (Candidate o : kept) {
                // a weaker feature of either sign inside a stronger one is the same feature's wing
                if (Math.abs(o.pixel() - cd.pixel()) < 0.5 * (o.fwhmPixels() + cd.fwhmPixels())) {
                    clash = true;
                    break;
                }
            }
            for (Fitter.Line l : known) {
                double gap = Math.abs(l.pixel() - cd.pixel());
                // what a fitted line leaves: same sign within half its FWHM is the line itself;
                // opposite sign within its width is a mismatch of its profile, not a new line
                if ((l.sign() == cd.sign() && gap < 0.5 * l.fwhmPixels())
                        || (l.sign() != cd.sign() && gap < Math.max(l.fwhmPixels(), cd.fwhmPixels()))) {
                    clash = true;
                    break;
                }
            }
            if (!clash) {
                kept.add(cd);
                if (kept.size() >= MAX_LINES) {
                    break;
                }
            }
        }
        return kept;
    }

    /** The pixel nearest to i at which a kernel with this stride was evaluated. */
    private static int snap(int i, int stride, int n) {
        int j = (int) Math.round((double) i / stride) * stride;
        return j >= n ? j - stride : j;
    }

    /** Median velocity width of one pixel, km/s. */
    static double medianPixelVelocity(double[] w) {
        double[] d = new double[w.length - 1];
        for (int i = 0; i + 1 < w.length; i++) {
            d[i] = C * (w[i + 1] - w[i]) / w[i];
        }
        java.util.Arrays.sort(d);
        return d.length == 0 ? Double.NaN : d[d.length / 2];
    }
}
