package org.redward.redshift.xcorr.internal;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.redward.api.redshift.Alternative;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.redshift.ScoreCurve;
import org.redward.api.registry.Provided;
import org.redward.api.templates.TemplateSet;
import org.redward.api.redshift.GradeCalibration;
import org.redward.redshift.kit.EstimatorBase;
import org.redward.redshift.kit.FftCorrelator;
import org.redward.redshift.kit.GriddedSpectrum;
import org.redward.redshift.kit.GriddedTemplate;
import org.redward.redshift.kit.Peaks;
import org.redward.redshift.kit.SearchRanges;
import org.redward.redshift.kit.Shifts;
import org.redward.redshift.kit.TemplateBank;
import org.redward.spectrum.Spectrum;

/**
 * Redshift by Fourier cross-correlation against each template of a set (Tonry & Davis 1979, AJ
 * 84, 1511), on a log10-lambda grid of step 1e-4; the steps are in {@link CrossCorrelation}. The
 * template with the highest r statistic gives the redshift and the class; its other peaks and the
 * best peaks of the other templates (distinct by more than 1,000 km/s) are the alternatives, each
 * with its r. The error is the Kurtz & Mink (1998, PASP 110, 934) form (3/8) w / (1 + r), w the
 * FWHM of the correlation peak. The grade comes from r and the class given, through the table
 * {@code calibration.tsv} measured on the mock survey (see {@link GradeCalibration}).
 *
 * <p>Thread-safe and deterministic; never throws for bad data.
 */
@Component(service = RedshiftEstimator.class, property = {
    Provided.ID + "=" + CrossCorrelationEstimator.ID,
    Provided.DESCRIPTION + "=Fourier cross-correlation with each template (Tonry & Davis 1979);"
            + " grades from r per class, calibrated on the mock survey (fraction of |dz|/(1+z) < 0.001)",
    RedshiftEstimator.USES_TEMPLATES + ":Boolean=true"})
public final class CrossCorrelationEstimator extends EstimatorBase {

    public static final String ID = "xcorr";
    static final double LOG10_STEP = 1e-4;
    static final double DISTINCT_KM_S = 1000.0;
    static final int PEAKS_PER_TEMPLATE = 5;

    private final TemplateBank.Cache<TemplateBank> banks = new TemplateBank.Cache<>(4);
    /** Per template set (id|version|checksum): per FFT length, the filtered transform of each template of the bank, by index. */
    private final TemplateBank.Cache<Map<Integer, CrossCorrelation.Filtered[]>> transforms = new TemplateBank.Cache<>(4);

    public CrossCorrelationEstimator() {
        super("org.redward.redshift.xcorr", "r");
    }

    @Activate
    void activate(BundleContext context) {
        identify(context.getBundle().getSymbolicName(), context.getBundle().getVersion().toString());
    }

    @Override
    protected String id() {
        return ID;
    }

    /**
     * One correlation peak of one template; {@code searched} is the template's correlation over the
     * searched range (shared by the template's candidates), its first value at grid shift {@code firstShift}.
     */
    private record Candidate(GriddedTemplate template, CrossCorrelation.Peak peak, double shift, double z, double zError,
            double[] searched, long firstShift) {

        /** The correlation over the searched range, for display. */
        ScoreCurve curve() {
            double[] z = new double[searched.length];
            double ratio = Math.pow(10.0, LOG10_STEP);
            double onePlusZ = Math.pow(10.0, firstShift * LOG10_STEP);
            for (int q = 0; q < z.length; q++) {
                z[q] = onePlusZ - 1;
                onePlusZ *= ratio;
            }
            return new ScoreCurve(z, searched.clone(), "xcorr_normalised", false);
        }
    }

    @Override
    protected RedshiftSolution run(Spectrum spectrum, EstimationContext ctx) {
        TemplateSet set = ctx.templates().orElse(null);
        if (set == null) {
            return RedshiftSolution.failed("the xcorr estimator needs a template set and none was given");
        }
        Map<String, String> used = new LinkedHashMap<>();
        used.put("log10_step", Double.toString(LOG10_STEP));
        used.put("continuum_box_pixels", Integer.toString(CrossCorrelation.CONTINUUM_BOX));
        used.put("apodise_fraction", Double.toString(CrossCorrelation.APODISE_FRACTION));
        used.put("z_min", Double.toString(ctx.zMin()));
        used.put("z_max", Double.toString(ctx.zMax()));
        used.putAll(ctx.parameters());
        Map<String, String> provenance = provenance(set, used);

        GriddedSpectrum gs = GriddedSpectrum.of(spectrum, LOG10_STEP, ctx.maskedRegionsVacuumAngstrom());
        if (gs == null || gs.usablePixels < 20) {
            return failed("no usable pixels (fewer than 20 unmasked pixels with finite flux and positive inverse variance)", provenance);
        }
        String checksum = set.checksum();
        String bankKey = set.id() + "|" + set.version() + "|" + checksum;
        TemplateBank bank = banks.get(bankKey, k -> TemplateBank.of(set, LOG10_STEP));
        Map<Integer, CrossCorrelation.Filtered[]> transformsByLength = transforms.get(bankKey,
                k -> new java.util.concurrent.ConcurrentHashMap<>());
        if (bank.templates.isEmpty()) {
            return failed("template set " + set.id() + " has no usable template"
                    + (bank.rejected.isEmpty() ? "" : " (" + String.join("; ", bank.rejected) + ")"), provenance);
        }
        double[] g = CrossCorrelation.prepare(gs.flux, gs.weight);
        Map<Integer, CrossCorrelation.Filtered> spectrumHats = new HashMap<>();
        List<Candidate> all = new ArrayList<>();
        for (int ti = 0; ti < bank.templates.size(); ti++) {
            GriddedTemplate t = bank.templates.get(ti);
            long[] shifts = Shifts.range(SearchRanges.of(t.template.objectClass(), ctx), gs.startIndex, gs.size(), t.startIndex,
                    t.size(), LOG10_STEP);
            if (shifts[0] > shifts[1]) {
                continue;
            }
            long offset = gs.startIndex - t.startIndex;
            int kLo = (int) (shifts[0] - offset), kHi = (int) (shifts[1] - offset);
            int n = FftCorrelator.lengthFor(gs.size(), t.size(), kLo, kHi);
            CrossCorrelation.Filtered gh = spectrumHats.computeIfAbsent(n, nn -> CrossCorrelation.Filtered.of(g, nn));
            if (!(gh.energy() > 0)) {
                return failed("the spectrum has no structure left after continuum removal and filtering (flat or constant flux)",
                        provenance);
            }
            CrossCorrelation.Filtered[] slots = transformsByLength.computeIfAbsent(n, nn -> new CrossCorrelation.Filtered[bank.templates.size()]);
            CrossCorrelation.Filtered th = slots[ti];
            if (th == null) { // a race computes the same immutable value twice; harmless
                th = CrossCorrelation.Filtered.of(CrossCorrelation.prepare(t.flux, coveredWeights(t)), n);
                slots[ti] = th;
            }
            if (!(th.energy() > 0)) {
                continue;
            }
            double[] c = CrossCorrelation.correlate(gh, th, CrossCorrelation.work(n));
            // lay the wrap-free lags out contiguously: index q <-> lag k = validLo + q
            int validLo = gs.size() - n, validHi = n - t.size();
            int lags = validHi - validLo + 1;
            double[] cc = CrossCorrelation.lagWork(lags); // this thread's, reused (first `lags` values): copy what must outlive the loop
            for (int q = 0, lag = validLo; q < lags;) { // cc[q] = c[(validLo + q) mod n], in contiguous runs
                int at = Math.floorMod(lag, n);
                int len = Math.min(lags - q, n - at);
                System.arraycopy(c, at, cc, q, len);
                q += len;
                lag += len;
            }
            int from = kLo - validLo, to = kHi - validLo;
            List<Integer> maxima = Peaks.maxima(cc, from, to);
            int taken = 0;
            double[] searched = null;
            for (int q : maxima) {
                if (taken >= PEAKS_PER_TEMPLATE || !(cc[q] > 0)) {
                    break;
                }
                CrossCorrelation.Peak p = CrossCorrelation.fit(cc, q, 0, lags - 1);
                double shift = p.lag() + validLo + offset;
                double z = Shifts.z(shift, LOG10_STEP);
                if (searched == null) {
                    searched = java.util.Arrays.copyOfRange(cc, from, to + 1);
                }
                all.add(new Candidate(t, p, shift, z, Shifts.zError(z, p.sigmaPixels(), LOG10_STEP), searched, from + validLo + offset));
                taken++;
            }
        }
        if (all.isEmpty()) {
            return failed(String.format(Locale.ROOT,
                    "no template of set %s overlaps the spectrum (%.0f-%.0f A) with a positive correlation at any trial redshift in [%g, %g]",
                    set.id(), gs.vacuumAngstrom(gs.firstUsable), gs.vacuumAngstrom(gs.lastUsable), ctx.zMin(), ctx.zMax()),
                    provenance);
        }
        all.sort((a, b) -> Double.compare(rank(b), rank(a)));
        List<Candidate> distinct = new ArrayList<>();
        for (Candidate c : all) {
            if (distinct.stream().noneMatch(d -> Shifts.same(c.z(), d.z(), DISTINCT_KM_S))) {
                distinct.add(c);
            }
        }
        Candidate best = distinct.get(0);
        double r = best.peak().r();
        String cls = best.template().template.objectClass().key();
        double reliability = calibration.reliability(cls, r);
        RedshiftSolution.Builder b = RedshiftSolution.builder()
                .z(best.z(), best.zError())
                .objectClass(best.template().template.objectClass(), best.template().template.subclass())
                .grade(calibration.grade(cls, r).key(), reliability);
        List<Alternative> alts = new ArrayList<>();
        for (int i = 0; i < Math.min(6, distinct.size()); i++) {
            Candidate c = distinct.get(i);
            alts.add(new Alternative(c.z(), c.zError(), c.peak().r(), r - c.peak().r(), c.template().template.objectClass(),
                    c.template().template.subclass()));
        }
        b.alternatives(alts).scoreCurve(best.curve());
        double r2 = distinct.size() > 1 ? distinct.get(1).peak().r() : 0;
        b.diagnostic("r", r).diagnostic("peak_height", best.peak().height()).diagnostic("peak_fwhm_pixels", best.peak().fwhmPixels())
                .diagnostic("runner_up_r", r2).diagnostic("usable_pixels", gs.usablePixels).diagnostic("snr_median", gs.medianSnr());
        if (r < 4) {
            b.warning(String.format(Locale.ROOT, "weak correlation (r = %.1f): the redshift may be wrong; inspect before use", r));
        }
        if (distinct.size() > 1 && r2 > 0.85 * r) {
            Candidate c = distinct.get(1);
            b.warning(String.format(Locale.ROOT, "ambiguous: the runner-up z = %.5f (%s, r = %.1f) is nearly as strong", c.z(),
                    c.template().template.objectClass().key(), r2));
        }
        b.provenance(provenance).provenance("grade_calibration", calibration.origin());
        return b.build();
    }

    /** Ranking of peaks: the r statistic (NaN last). */
    private static double rank(Candidate c) {
        double r = c.peak().r();
        return Double.isFinite(r) ? r : Double.NEGATIVE_INFINITY;
    }

    private static double[] coveredWeights(GriddedTemplate t) {
        double[] w = new double[t.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = t.covered[i] ? 1 : 0;
        }
        return w;
    }

}
