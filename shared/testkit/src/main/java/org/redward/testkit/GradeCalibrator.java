package org.redward.testkit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.spectrum.Spectrum;

/**
 * Derives a grade calibration table (the text format read by the estimators' Calibration:
 * {@code threshold fraction_correct count} rows) from spectra of known redshift: the estimator
 * runs on each; solutions are sorted by a quality diagnostic (e.g. {@code delta_chi2}, {@code r});
 * the sorted list is cut into bins of equal count; each bin's row gives its lowest statistic and
 * its fraction of correct redshifts, made non-decreasing by pooling adjacent bins that violate
 * the order (pool-adjacent-violators, common practice for isotonic calibration). Run it on the
 * mock survey to replace the provisional tables.
 */
public final class GradeCalibrator {

    /** One spectrum of known redshift with its tolerance in km/s. */
    public record Known(Spectrum spectrum, double z, double toleranceKmPerS) {
    }

    private GradeCalibrator() {
    }

    /** @return the table text, with a header naming {@code origin} */
    public static String table(RedshiftEstimator estimator, EstimationContext ctx, List<Known> inputs, String diagnostic, int bins,
            String origin) {
        List<double[]> rows = new ArrayList<>();
        for (Known k : inputs) {
            RedshiftSolution s = estimator.estimate(k.spectrum(), ctx);
            double stat = s.ok() ? s.diagnostics().getOrDefault(diagnostic, Double.NaN) : Double.NEGATIVE_INFINITY;
            if (Double.isNaN(stat)) {
                stat = Double.NEGATIVE_INFINITY;
            }
            boolean right = s.ok() && Math.abs(s.z() - k.z()) / (1 + k.z()) * 299_792.458 <= k.toleranceKmPerS();
            rows.add(new double[] {stat, right ? 1 : 0});
        }
        rows.sort((a, b) -> Double.compare(a[0], b[0]));
        int n = rows.size();
        List<double[]> bin = new ArrayList<>(); // {threshold, correct, count}
        for (int b = 0; b < bins; b++) {
            int from = b * n / bins, to = (b + 1) * n / bins;
            if (to <= from) {
                continue;
            }
            double correct = 0;
            for (int i = from; i < to; i++) {
                correct += rows.get(i)[1];
            }
            bin.add(new double[] {rows.get(from)[0], correct, to - from});
        }
        boolean changed = true;
        while (changed) {
            changed = false;
            for (int i = 0; i + 1 < bin.size(); i++) {
                double[] a = bin.get(i), c = bin.get(i + 1);
                if (a[1] / a[2] > c[1] / c[2]) {
                    bin.set(i, new double[] {a[0], a[1] + c[1], a[2] + c[2]});
                    bin.remove(i + 1);
                    changed = true;
                    break;
                }
            }
        }
        StringBuilder out = new StringBuilder();
        out.append("# ").append(origin).append("; statistic ").append(diagnostic).append("; rows: threshold fraction_correct count\n");
        for (double[] b : bin) {
            if (Double.isInfinite(b[0])) {
                continue;
            }
            out.append(String.format(Locale.ROOT, "%.4g\t%.3f\t%d%n", b[0], b[1] / b[2], (int) b[2]));
        }
        return out.toString();
    }

    /** Known-redshift synthetic spectra across kinds, redshifts and S/N (for a first, optimistic table). */
    public static List<Known> synthetic(int count, long seed) {
        java.util.Random rnd = new java.util.Random(seed);
        List<Known> out = new ArrayList<>();
        SyntheticSpectra.Kind[] kinds = SyntheticSpectra.Kind.values();
        for (int i = 0; i < count; i++) {
            SyntheticSpectra.Kind k = kinds[i % kinds.length];
            double z = switch (k) {
                case STAR -> (rnd.nextDouble() - 0.5) * 0.001;
                case QUASAR -> 0.3 + 3 * rnd.nextDouble();
                default -> 0.01 + 0.6 * rnd.nextDouble();
            };
            double snr = 0.3 + 4 * rnd.nextDouble() * rnd.nextDouble();
            double tol = k == SyntheticSpectra.Kind.QUASAR ? 1000 : k == SyntheticSpectra.Kind.STAR ? 100 : 300;
            out.add(new Known(SyntheticSpectra.of(k, z, snr, seed + i), z, tol));
        }
        return out;
    }
}
