package org.redward.redshift.chisq.internal;

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
import org.redward.redshift.kit.Params;
import org.redward.redshift.kit.Peaks;
import org.redward.redshift.kit.SearchRanges;
import org.redward.redshift.kit.Shifts;
import org.redward.redshift.kit.TemplateBank;
import org.redward.spectrum.ObjectClass;
import org.redward.spectrum.Spectrum;

/**
 * Redshift by chi-square template fitting over a redshift grid (Glazebrook, Offer & Deeley 1998,
 * ApJ 492, 98; Bolton et al. 2012, AJ 144, 144). The spectrum is resampled onto a log10-lambda
 * grid of step 1e-4 (69 km/s per pixel); at every trial shift each class's templates plus
 * {@code poly_terms} Legendre polynomials are fitted by weighted least squares
 * ({@link ChiSquareScan}, all sums via FFT correlations). Galaxy and quasar templates are fitted
 * as one linear combination per class; each star template alone (its subclass is the type).
 *
 * <ul>
 * <li>Classes are compared by chi2 + D ln(N_usable) (the Bayesian information criterion, Schwarz
 * 1978), D = number of fitted coefficients, so a class with more templates does not win by freedom
 * alone.</li>
 * <li>The best minimum is refined by a parabola through the three chi2 values around it; sigma_z
 * = (1+z) ln(10) step sqrt(2 / chi2''), chi2'' the curvature per pixel^2 (chi2 rises by 1 at one
 * sigma), scaled by sqrt(chi2/dof) when that exceeds 1 (template mismatch) and by the square root
 * of the residuals' correlation factor (pixels that are not independent; common practice).</li>
 * <li>Alternatives: local minima of every class's curve, at redshifts distinct by more than
 * 1,000 km/s, ranked by the criterion above; deltaScore is their criterion minus the best.</li>
 * <li>Grade: from the gap (delta chi2) to the first alternative and the class given, through the
 * table {@code calibration.tsv} measured on the mock survey (see {@link GradeCalibration}).</li>
 * </ul>
 *
 * Parameters: {@code poly_terms} (3), {@code min_coverage} (0.5), {@code galaxy_z_max} (1.6),
 * {@code star_v_max_km_s} (1200). Thread-safe and deterministic; never throws for bad data.
 */
@Component(service = RedshiftEstimator.class, property = {
    Provided.ID + "=" + ChiSquareEstimator.ID,
    Provided.DESCRIPTION + "=chi-square template fitting over a redshift grid (Glazebrook et al. 1998; Bolton et al. 2012);"
            + " grades from delta chi2 per class, calibrated on the mock survey (fraction of |dz|/(1+z) < 0.001)",
    RedshiftEstimator.USES_TEMPLATES + ":Boolean=true"})
public final class ChiSquareEstimator extends EstimatorBase {

    public static final String ID = "chisq";
    static final double LOG10_STEP = 1e-4;
    static final double C_KM_S = 299_792.458;
    /** Alternatives closer than this (km/s) to a better one are the same solution. */
    static final double DISTINCT_KM_S = 1000.0;
    /** Default threshold of the broad-line statistic above which a galaxy fit becomes a quasar with host. */
    static final double BROAD_LINE_THRESHOLD = 300.0;

    private final TemplateBank.Cache<Prepared> banks = new TemplateBank.Cache<>(4);
    private final TemplateBank.Cache<BasisGroup.Prepared> transforms = new TemplateBank.Cache<>(64);

    public ChiSquareEstimator() {
        super("org.redward.redshift.chisq", "delta_chi2");
    }

    @Activate
    void activate(BundleContext context) {
        identify(context.getBundle().getSymbolicName(), context.getBundle().getVersion().toString());
    }

    @Override
    protected String id() {
        return ID;
    }

    /** A template set prepared for this estimator. */
    record Prepared(TemplateBank bank, List<BasisGroup> groups, List<BroadLineProbe> probes) {
        static Prepared of(TemplateSet set) {
            TemplateBank bank = TemplateBank.of(set, LOG10_STEP);
            List<BroadLineProbe> probes = new ArrayList<>();
            for (GriddedTemplate t : bank.templates) {
                if (t.template.objectClass() == ObjectClass.QUASAR) {
                    probes.add(BroadLineProbe.of(t, C_KM_S * (Math.pow(10, LOG10_STEP) - 1)));
                }
            }
            return new Prepared(bank, BasisGroup.of(bank.templates), probes);
        }
    }

    private record Candidate(BasisGroup group, ChiSquareScan.Curve curve, int index, double chi2, double criterion) {
        double z() {
            return Shifts.z(curve.shiftLo() + index, LOG10_STEP);
        }
    }

    @Override
    protected RedshiftSolution run(Spectrum spectrum, EstimationContext ctx) {
        TemplateSet set = ctx.templates().orElse(null);
        if (set == null) {
            return RedshiftSolution.failed("the chisq estimator needs a template set and none was given");
        }
        Map<String, String> p = ctx.parameters();
        int polyTerms = (int) Params.number(p, "poly_terms", 3);
        double minCoverage = Params.number(p, "min_coverage", 0.5);
        double broadThreshold = Params.number(p, "broad_line_threshold", BROAD_LINE_THRESHOLD);
        if (polyTerms < 0 || polyTerms > 10) {
            throw new IllegalArgumentException("parameter poly_terms: " + polyTerms + " is outside 0..10");
        }
        Map<String, String> used = new LinkedHashMap<>();
        used.put("poly_terms", Integer.toString(polyTerms));
        used.put("min_coverage", Double.toString(minCoverage));
        used.put("broad_line_threshold", Double.toString(broadThreshold));
        used.put("log10_step", Double.toString(LOG10_STEP));
        used.put("z_min", Double.toString(ctx.zMin()));
        used.put("z_max", Double.toString(ctx.zMax()));
        used.putAll(p);
        Map<String, String> provenance = provenance(set, used);

        GriddedSpectrum gs = GriddedSpectrum.of(spectrum, LOG10_STEP, ctx.maskedRegionsVacuumAngstrom());
        if (gs == null || gs.usablePixels < 20) {
            return failed("no usable pixels (fewer than 20 unmasked pixels with finite flux and positive inverse variance)", provenance);
        }
        String checksum = set.checksum();
        Prepared prep = banks.get(set.id() + "|" + set.version() + "|" + checksum,
                k -> Prepared.of(set));
        if (prep.groups().isEmpty()) {
            return failed("template set " + set.id() + " has no usable template" + (prep.bank().rejected.isEmpty() ? ""
                    : " (" + String.join("; ", prep.bank().rejected) + ")"), provenance);
        }
        Map<Integer, ChiSquareScan.SpectrumSide> sides = new HashMap<>();
        List<ChiSquareScan.Curve> curves = new ArrayList<>();
        List<BasisGroup> groupOfCurve = new ArrayList<>();
        List<Candidate> candidates = new ArrayList<>();
        double lnN = Math.log(gs.usablePixels);
        for (BasisGroup g : prep.groups()) {
            long offset = gs.startIndex - g.startIndex;
            long[] shifts = Shifts.range(SearchRanges.of(g.objectClass, ctx), gs.startIndex, gs.size(), g.startIndex, g.length, LOG10_STEP);
            long shiftLo = shifts[0], shiftHi = shifts[1];
            if (shiftLo > shiftHi) {
                continue;
            }
            int n = FftCorrelator.lengthFor(gs.size(), g.length, (int) (shiftLo - offset), (int) (shiftHi - offset));
            ChiSquareScan.SpectrumSide side = sides.computeIfAbsent(n, nn -> new ChiSquareScan.SpectrumSide(gs, polyTerms, nn));
            BasisGroup.Prepared tp = transforms.get(checksum + "|" + g.name + "|" + n, k -> g.prepare(n));
            ChiSquareScan.Curve c = ChiSquareScan.scan(gs, side, g, tp, shiftLo, shiftHi, minCoverage);
            curves.add(c);
            groupOfCurve.add(g);
            double[] neg = c.chi2().clone();
            for (int i = 0; i < neg.length; i++) {
                neg[i] = -neg[i];
            }
            List<Integer> minima = Peaks.maxima(neg, 0, neg.length - 1);
            for (int i = 0; i < Math.min(8, minima.size()); i++) {
                int q = minima.get(i);
                candidates.add(new Candidate(g, c, q, c.chi2()[q], c.chi2()[q] + c.parameters() * lnN));
            }
        }
        if (candidates.isEmpty()) {
            return failed(String.format(Locale.ROOT,
                    "no template of set %s covers %.0f%% of the usable pixels (%.0f-%.0f A) at any trial redshift in [%g, %g]",
                    set.id(), 100 * minCoverage, gs.vacuumAngstrom(gs.firstUsable), gs.vacuumAngstrom(gs.lastUsable),
                    ctx.zMin(), ctx.zMax()), provenance);
        }
        candidates.sort((a, b) -> Double.compare(a.criterion(), b.criterion()));
        List<Candidate> distinct = new ArrayList<>();
        for (Candidate c : candidates) {
            boolean same = false;
            for (Candidate d : distinct) {
                if (Shifts.same(c.z(), d.z(), DISTINCT_KM_S)) {
                    same = true;
                    break;
                }
            }
            if (!same) {
                distinct.add(c);
            }
        }
        Candidate best = distinct.get(0);
        double[] refined = refine(best);
        double z = refined[0];
        double dof = Math.max(1, gs.usablePixels - best.curve().parameters());
        double chi2PerDof = best.chi2() / dof;
        double correlation = ChiSquareScan.residualCorrelationFactor(gs, best.group(), polyTerms, best.curve().shiftLo() + best.index());
        double zErr = refined[1] * Math.sqrt(Math.max(1.0, chi2PerDof) * correlation);
        double gap = distinct.size() > 1 ? distinct.get(1).criterion() - best.criterion() : Double.POSITIVE_INFINITY;
        double classGap = Double.POSITIVE_INFINITY;
        for (Candidate c : candidates) {
            if (c.group().objectClass != best.group().objectClass) {
                classGap = Math.min(classGap, c.criterion() - best.criterion());
            }
        }
        ObjectClass cls = best.group().objectClass;
        String sub = subclass(gs, best, polyTerms);
        double broad = Double.NaN;
        if (cls == ObjectClass.GALAXY && !prep.probes().isEmpty()) {
            broad = broadLineStatistic(gs, best, prep.probes(), polyTerms, chi2PerDof);
            if (broad >= broadThreshold) {
                cls = ObjectClass.QUASAR;
                sub = "broadline-with-host";
            }
        }
        double reliability = calibration.reliability(cls.key(), gap);
        RedshiftSolution.Builder b = RedshiftSolution.builder()
                .z(z, zErr)
                .objectClass(cls, sub)
                .grade(calibration.grade(cls.key(), gap).key(), reliability);
        List<Alternative> alts = new ArrayList<>();
        alts.add(new Alternative(z, zErr, best.chi2(), 0.0, best.group().objectClass, best.group().name));
        for (int i = 1; i < Math.min(6, distinct.size()); i++) {
            Candidate c = distinct.get(i);
            alts.add(new Alternative(c.z(), Double.NaN, c.chi2(), c.criterion() - best.criterion(), c.group().objectClass, c.group().name));
        }
        b.alternatives(alts);
        b.scoreCurve(curveOf(best.curve()));
        b.diagnostic("chi2", best.chi2()).diagnostic("dof", dof).diagnostic("chi2_per_dof", chi2PerDof)
                .diagnostic("delta_chi2", gap).diagnostic("class_delta_chi2", classGap)
                .diagnostic("broad_line_statistic", broad).diagnostic("residual_correlation", correlation).diagnostic("usable_pixels", gs.usablePixels).diagnostic("snr_median", gs.medianSnr());
        warnings(b, gs, best, gap, classGap, chi2PerDof, distinct);
        b.provenance(provenance);
        b.provenance("grade_calibration", calibration.origin());
        return b.build();
    }


    /** {z, sigma_z} from the parabola through the minimum and its neighbours. */
    private static double[] refine(Candidate c) {
        double[] y = c.curve().chi2().clone();
        for (int i = 0; i < y.length; i++) {
            y[i] = -y[i];
        }
        double[] v = Peaks.parabola(y, c.index(), 0, y.length - 1);
        double z = Shifts.z(c.curve().shiftLo() + c.index() + v[0], LOG10_STEP);
        double curvature = -v[2];
        double sigmaPixels = curvature > 0 ? Math.sqrt(2.0 / curvature) : 1.0;
        return new double[] {z, Shifts.zError(z, sigmaPixels, LOG10_STEP)};
    }

    private static String subclass(GriddedSpectrum gs, Candidate c, int polyTerms) {
        BasisGroup g = c.group();
        if (g.size() == 1) {
            return g.members.get(0).template.subclass();
        }
        double[] light = light(gs, g, polyTerms, c.curve().shiftLo() + c.index());
        int bestM = 0;
        for (int m = 1; m < g.primary; m++) {
            if (light[m] > light[bestM]) {
                bestM = m;
            }
        }
        GriddedTemplate t = g.members.get(bestM);
        return t.template.subclass();
    }

    /**
     * How much broad quasar lines improve the best galaxy fit at its redshift: (chi2_galaxy -
     * chi2_galaxy+probe) / max(1, chi2/dof), or 0 when the probe's amplitude is not positive.
     */
    private static double broadLineStatistic(GriddedSpectrum gs, Candidate c, List<BroadLineProbe> probes, int polyTerms,
            double chi2PerDof) {
        BasisGroup g = c.group();
        long shift = c.curve().shiftLo() + c.index();
        double best = 0;
        for (BroadLineProbe p : probes) {
            double[][] basis = new double[g.size() + 1][];
            basis[0] = p.on(g.startIndex, g.length);
            System.arraycopy(g.basis, 0, basis, 1, g.size());
            double[] sol = ChiSquareScan.solveDirect(gs, basis, g.startIndex, g.length, polyTerms, shift);
            double chi2 = sol[basis.length + polyTerms];
            if (sol[0] > 0 && Double.isFinite(chi2)) {
                best = Math.max(best, (c.chi2() - chi2) / Math.max(1.0, chi2PerDof));
            }
        }
        return best;
    }

    /** Per member: its fitted coefficient times its flux, summed over usable pixels, at one shift. */
    private static double[] light(GriddedSpectrum gs, BasisGroup g, int polyTerms, long shift) {
        double[] sol = ChiSquareScan.solveDirect(gs, g, polyTerms, shift);
        long offset = gs.startIndex - g.startIndex;
        double[] out = new double[g.size()];
        for (int m = 0; m < g.size(); m++) {
            double sum = 0;
            for (int i = 0; i < gs.size(); i++) {
                long j = i + offset - shift;
                if (gs.weight[i] > 0 && j >= 0 && j < g.length) {
                    sum += sol[m] * g.basis[m][(int) j];
                }
            }
            out[m] = sum;
        }
        return out;
    }

    private static ScoreCurve curveOf(ChiSquareScan.Curve c) {
        double[] z = new double[c.chi2().length];
        for (int i = 0; i < z.length; i++) {
            z[i] = Shifts.z(c.shiftLo() + i, LOG10_STEP);
        }
        return new ScoreCurve(z, c.chi2(), "chi2", true);
    }

    private static void warnings(RedshiftSolution.Builder b, GriddedSpectrum gs, Candidate best, double gap, double classGap,
            double chi2PerDof, List<Candidate> distinct) {
        if (distinct.size() > 1 && gap < 25) {
            Candidate r = distinct.get(1);
            b.warning(String.format(Locale.ROOT,
                    "ambiguous: the runner-up z = %.5f (%s) is only %.1f worse in chi-square; inspect before use",
                    r.z(), r.group().objectClass.key(), gap));
        }
        if (classGap < 25) {
            b.warning(String.format(Locale.ROOT, "class uncertain: another class fits only %.1f worse in chi-square", classGap));
        }
        if (chi2PerDof > 4) {
            b.warning(String.format(Locale.ROOT,
                    "poor fit (chi2/dof = %.1f): the templates do not describe this spectrum well; errors are scaled up", chi2PerDof));
        }
        int edge = Math.min(best.index(), best.curve().chi2().length - 1 - best.index());
        if (edge <= 1) {
            b.warning("the best redshift lies at the edge of the searched range: the true minimum may be outside it");
        }
        if (gs.errorsEstimated) {
            b.warning("the file gives no flux errors: noise estimated from pixel-to-pixel scatter, so chi-square, errors and grade are approximate");
        }
    }
}
