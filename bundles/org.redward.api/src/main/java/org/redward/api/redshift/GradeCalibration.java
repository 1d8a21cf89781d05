package org.redward.api.redshift;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * How an estimator turns its own quality statistic (larger = better, e.g. the cross-correlation
 * r) into a {@link ConfidenceGrade} and a reliability (the fraction of correct redshifts measured
 * for that grade on spectra of known redshift). Shared by every estimator of ours and open to
 * third-party estimators, so that all grades mean the same thing.
 *
 * <p>The table is a step function per object class: rows {@code class threshold reliability
 * [count fraction grade]} (tab or blank separated, '#' comments; the first comment says where the
 * table comes from). {@code class} is the key of the class the estimator gave ({@code galaxy},
 * {@code quasar}, {@code star}, {@code unknown}) or {@code *} for any class; a row without it
 * (first token a number) is for any class. A solution is looked up in its class's rows, or in the
 * {@code *} rows if its class has none: a statistic at or above a row's threshold (and below the
 * next) gets that row's reliability; below the first row, or NaN, it gets the {@code floor} given
 * to {@link #read}. Tables derived on the mock survey have one row per grade band, the reliability
 * being the lower confidence bound of the fraction of correct redshifts measured in the band.
 *
 * <p>Correct redshift (one definition for calibration, checks and the accuracy benchmark):
 * {@code |z - z_true| / (1 + z_true) < }{@value #CORRECT_RELATIVE_ERROR} (about 300 km/s);
 * see {@link #correct}. Immutable and thread-safe.
 */
public final class GradeCalibration {

    /** A redshift is correct when {@code |z - z_true| / (1 + z_true)} is below this (common practice for "success"). */
    public static final double CORRECT_RELATIVE_ERROR = 0.001;

    /** The definition of a correct redshift, in words, for outputs that state it. */
    public static final String CORRECT_DEFINITION = "correct = |z - z_true|/(1 + z_true) < 0.001";

    private final String statistic;
    /** Per class key ({@code *} for any): {thresholds ascending, reliabilities}. */
    private final Map<String, double[][]> steps;
    private final double floorFraction;
    private final String origin;

    /** The class key of rows that apply to any class. */
    public static final String ANY_CLASS = "*";

    private GradeCalibration(String statistic, Map<String, double[][]> steps, double floorFraction, String origin) {
        this.statistic = statistic;
        this.steps = steps;
        this.floorFraction = floorFraction;
        this.origin = origin;
    }

    /**
     * @return true when {@code z} is a correct measurement of {@code zTrue} (both finite and
     *         {@code |z - zTrue| / (1 + zTrue) <} {@value #CORRECT_RELATIVE_ERROR}); NaN gives false
     */
    public static boolean correct(double z, double zTrue) {
        return Math.abs(z - zTrue) / (1 + zTrue) < CORRECT_RELATIVE_ERROR;
    }

    /**
     * Reads a table. Rows may come in any order. {@code floor} is the reliability below the first
     * row (and for NaN).
     *
     * @throws IOException if the stream fails or a row is not two or three numbers
     */
    public static GradeCalibration read(String statistic, InputStream in, double floor) throws IOException {
        Map<String, List<double[]>> rows = new TreeMap<>();
        StringBuilder origin = new StringBuilder();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            String line;
            int n = 0;
            while ((line = r.readLine()) != null) {
                n++;
                String t = line.trim();
                if (t.startsWith("#")) {
                    if (origin.length() == 0) {
                        origin.append(t.substring(1).trim());
                    }
                    continue;
                }
                if (t.isEmpty()) {
                    continue;
                }
                String[] p = t.split("\\s+");
                boolean keyed = !p[0].matches("[-+0-9.].*|Infinity|NaN");
                try {
                    int at = keyed ? 1 : 0;
                    rows.computeIfAbsent(keyed ? p[0] : ANY_CLASS, k -> new ArrayList<>())
                            .add(new double[] {Double.parseDouble(p[at]), Double.parseDouble(p[at + 1])});
                } catch (RuntimeException e) {
                    throw new IOException("grade calibration table, line " + n + ": expected '[class] threshold reliability ...', got '"
                            + t + "'");
                }
            }
        }
        return of(statistic, rows, floor, origin.toString());
    }

    /** A table from {threshold, reliability} rows (any order) per class key ({@link #ANY_CLASS} for any class). */
    public static GradeCalibration of(String statistic, Map<String, List<double[]>> rowsByClass, double floor, String origin) {
        Map<String, double[][]> steps = new TreeMap<>();
        for (Map.Entry<String, List<double[]>> e : rowsByClass.entrySet()) {
            List<double[]> sorted = new ArrayList<>(e.getValue());
            sorted.sort((a, b) -> Double.compare(a[0], b[0]));
            double[] th = new double[sorted.size()];
            double[] fr = new double[sorted.size()];
            for (int i = 0; i < th.length; i++) {
                th[i] = sorted.get(i)[0];
                fr[i] = sorted.get(i)[1];
            }
            steps.put(e.getKey(), new double[][] {th, fr});
        }
        return new GradeCalibration(statistic, Collections.unmodifiableMap(steps), floor, origin);
    }

    /** The calibrated fraction of correct redshifts for this statistic value, by the rows for any class (NaN gives the floor). */
    public double reliability(double value) {
        return reliability(ANY_CLASS, value);
    }

    /**
     * The calibrated fraction of correct redshifts for a solution of class {@code classKey} (e.g.
     * {@code ObjectClass.key()}) with this statistic value; the rows for any class serve a class
     * without rows of its own; NaN gives the floor.
     */
    public double reliability(String classKey, double value) {
        double[][] t = steps.get(classKey);
        if (t == null) {
            t = steps.get(ANY_CLASS);
        }
        double best = floorFraction;
        if (t != null) {
            for (int i = 0; i < t[0].length; i++) {
                if (value >= t[0][i]) {
                    best = t[1][i];
                }
            }
        }
        return best;
    }

    /** The grade of this statistic value (rows for any class): the highest grade whose floor its reliability reaches. */
    public ConfidenceGrade grade(double value) {
        return ConfidenceGrade.forReliability(reliability(value));
    }

    /** The grade of a solution of class {@code classKey} with this statistic value. */
    public ConfidenceGrade grade(String classKey, double value) {
        return ConfidenceGrade.forReliability(reliability(classKey, value));
    }

    /** The name of the diagnostic the table is indexed by (e.g. {@code r}). */
    public String statistic() {
        return statistic;
    }

    /** The first header comment of the table (where it comes from). */
    public String origin() {
        return origin;
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder("GradeCalibration[" + statistic);
        for (Map.Entry<String, double[][]> e : steps.entrySet()) {
            for (int i = 0; i < e.getValue()[0].length; i++) {
                b.append(String.format(Locale.ROOT, " %s>=%g:%.3f", e.getKey(), e.getValue()[0][i], e.getValue()[1][i]));
            }
        }
        return b.append(']').toString();
    }
}
