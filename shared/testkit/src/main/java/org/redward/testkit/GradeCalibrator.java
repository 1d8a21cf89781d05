package org.redward.testkit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.redward.api.redshift.ConfidenceGrade;
import org.redward.api.redshift.GradeCalibration;

/**
 * Derives and checks grade calibration tables (the text format of {@link GradeCalibration}) from
 * measured solutions of known correctness. Generic: it sees only (statistic, correct) pairs, so a
 * research group can calibrate its own estimator on its own spectra of known redshift.
 *
 * <p>Derivation ({@link #derive}): bands are derived for all solutions together (rows of class
 * {@code *}) and, where a class the estimator gave has at least {@value #MIN_PER_CLASS}
 * solutions, for that class alone, since an estimator's statistic seldom means the same for a
 * quasar as for a star. Within a group the solutions are sorted by the estimator's statistic, best
 * first. From the top down, each grade in turn (firm, sound, fair, shaky) takes the widest band of
 * statistic values, starting where the previous grade ended, whose fraction of correct redshifts
 * has a one-sided 95% lower confidence bound (Wilson 1927 score interval, as computed by Apache
 * Commons Math's {@code WilsonScoreInterval}) at or above the grade's floor, both over the whole
 * band and over its lower half (so that solutions just above the band's threshold, not only the
 * band on average, are right as often as the grade says); a band edge never
 * splits equal statistic values; a grade no band qualifies for is not given. What is left below
 * is graded void. Each row states the band's lowest statistic, that lower bound (which becomes the
 * reported reliability, so a grade never promises more than was measured), the count and the raw
 * fraction.
 *
 * <p>Check ({@link #check}): on other solutions (another seed), each grade's measured fraction of
 * correct redshifts is compared with the grade's floor and its binomial standard error
 * {@code sqrt(f (1 - f) / n)} (f the floor, n the count).
 */
public final class GradeCalibrator {

    /**
     * One measured solution: the class the estimator gave (its key, e.g. {@code galaxy}), the
     * estimator's statistic and whether its redshift was correct.
     */
    public record Scored(String objectClass, double statistic, boolean correct) {
    }

    /** Fewest solutions of a class for it to get bands of its own (else it is graded by the rows for any class). */
    public static final int MIN_PER_CLASS = 100;

    /** One grade's check: its floor, the measured fraction, the count, and the shortfall in standard errors. */
    public record GradeCheck(ConfidenceGrade grade, double statedFraction, double measuredFraction, int count) {

        /** Binomial standard error of the stated fraction for this count (NaN for no count). */
        public double sigma() {
            return count == 0 ? Double.NaN : Math.sqrt(statedFraction * (1 - statedFraction) / count);
        }

        /** True if the measured fraction is no more than {@code k} standard errors below the stated one (or the grade was not given). */
        public boolean meets(double k) {
            return count == 0 || measuredFraction >= statedFraction - k * sigma() - 1e-12;
        }
    }

    /** Two-sided level of the Wilson interval whose lower end is the one-sided 95% lower bound. */
    static final double CONFIDENCE_LEVEL_TWO_SIDED = 0.90;

    private GradeCalibrator() {
    }

    /**
     * The calibration table text for {@code scored} (NaN statistics are ranked lowest).
     *
     * @param origin first header line: where the spectra come from (seed, size, estimator)
     */
    public static String derive(List<Scored> scored, String statistic, String origin) {
        StringBuilder out = new StringBuilder();
        out.append("# ").append(origin).append('\n');
        out.append("# statistic ").append(statistic).append("; ").append(GradeCalibration.CORRECT_DEFINITION)
                .append("; per class given (and * for any class), bands from the top, each the widest whose fraction correct has")
                .append(" a one-sided 95% Wilson lower bound at or above the grade's floor (firm 0.99, sound 0.95, fair 0.80, shaky 0.50)")
                .append(" over the band and over its lower half\n");
        out.append("# columns: class  lowest_statistic  reliability(lower bound)  count  measured_fraction  grade\n");
        out.append(bands(GradeCalibration.ANY_CLASS, scored));
        java.util.Map<String, List<Scored>> byClass = new java.util.TreeMap<>();
        for (Scored x : scored) {
            byClass.computeIfAbsent(x.objectClass(), k -> new ArrayList<>()).add(x);
        }
        for (java.util.Map.Entry<String, List<Scored>> e : byClass.entrySet()) {
            if (e.getValue().size() >= MIN_PER_CLASS) {
                out.append(bands(e.getKey(), e.getValue()));
            }
        }
        return out.toString();
    }

    private static String bands(String group, List<Scored> scored) {
        List<Scored> s = new ArrayList<>(scored);
        s.sort(Comparator.comparingDouble((Scored x) -> key(x.statistic())).reversed());
        int n = s.size();
        int[] correctBefore = new int[n + 1];
        for (int i = 0; i < n; i++) {
            correctBefore[i + 1] = correctBefore[i] + (s.get(i).correct() ? 1 : 0);
        }
        List<String> rows = new ArrayList<>();
        int start = 0;
        for (ConfidenceGrade g : ConfidenceGrade.values()) {
            if (g == ConfidenceGrade.VOID || start >= n) {
                continue;
            }
            int bestEnd = -1;
            for (int end = start + 1; end <= n; end++) {
                if (end < n && key(s.get(end - 1).statistic()) == key(s.get(end).statistic())) {
                    continue; // never split equal values
                }
                if (key(s.get(end - 1).statistic()) == Double.NEGATIVE_INFINITY) {
                    break; // NaN / -inf statistics are never graded above void
                }
                int k = correctBefore[end] - correctBefore[start];
                int mid = start + (end - start) / 2;
                int kLow = correctBefore[end] - correctBefore[mid];
                if (lowerBound(end - start, k) >= g.floor() && lowerBound(end - mid, kLow) >= g.floor()) {
                    bestEnd = end;
                }
            }
            if (bestEnd < 0) {
                continue;
            }
            int count = bestEnd - start;
            int k = correctBefore[bestEnd] - correctBefore[start];
            rows.add(row(group, s.get(bestEnd - 1).statistic(), lowerBound(count, k), count, (double) k / count, g));
            start = bestEnd;
        }
        if (start < n) {
            int count = n - start;
            int k = correctBefore[n] - correctBefore[start];
            double lb = Math.min(lowerBound(count, k), ConfidenceGrade.SHAKY.floor() - 1e-3);
            rows.add(row(group, Double.NEGATIVE_INFINITY, lb, count, (double) k / count, ConfidenceGrade.VOID));
        }
        StringBuilder out = new StringBuilder();
        for (int i = rows.size() - 1; i >= 0; i--) {
            out.append(rows.get(i));
        }
        return out.toString();
    }

    /** Per grade, best first: the floor, the measured fraction and the count of {@code graded} under {@code calibration}. */
    public static List<GradeCheck> check(List<Scored> graded, GradeCalibration calibration) {
        List<GradeCheck> out = new ArrayList<>();
        for (ConfidenceGrade g : ConfidenceGrade.values()) {
            int n = 0;
            int k = 0;
            for (Scored x : graded) {
                if (calibration.grade(x.objectClass(), x.statistic()) == g) {
                    n++;
                    k += x.correct() ? 1 : 0;
                }
            }
            out.add(new GradeCheck(g, g.floor(), n == 0 ? Double.NaN : (double) k / n, n));
        }
        return out;
    }

    /** The check as a printable table (one line per grade). */
    public static String format(String title, List<GradeCheck> checks) {
        StringBuilder b = new StringBuilder(title).append('\n');
        b.append(String.format(Locale.ROOT, "  %-6s %8s %9s %6s %7s%n", "grade", "stated", "measured", "count", "2-sigma"));
        for (GradeCheck c : checks) {
            b.append(String.format(Locale.ROOT, "  %-6s %8s %9s %6d %7s%n", c.grade().key(), ">=" + fmt(c.statedFraction()),
                    c.count() == 0 ? "-" : fmt(c.measuredFraction()), c.count(),
                    c.count() == 0 ? "-" : c.meets(2) ? "met" : "MISSED"));
        }
        return b.toString();
    }

    /** One-sided 95% lower confidence bound of a binomial fraction (Wilson score interval; 0 for no trials). */
    public static double lowerBound(int trials, int successes) {
        if (trials == 0) {
            return 0;
        }
        return new org.apache.commons.math3.stat.interval.WilsonScoreInterval()
                .createInterval(trials, successes, CONFIDENCE_LEVEL_TWO_SIDED).getLowerBound();
    }

    private static double key(double statistic) {
        return Double.isNaN(statistic) ? Double.NEGATIVE_INFINITY : statistic;
    }

    private static String row(String group, double threshold, double reliability, int count, double fraction, ConfidenceGrade g) {
        return String.format(Locale.ROOT, "%s\t%s\t%.4f\t%d\t%.4f\t%s%n", group, threshold == Double.NEGATIVE_INFINITY ? "-Infinity"
                : Double.toString(threshold), Math.max(0, reliability), count, fraction, g.key());
    }

    private static String fmt(double f) {
        return String.format(Locale.ROOT, "%.3f", f);
    }
}
