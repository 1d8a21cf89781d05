package org.redward.mock.internal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.Predicate;

import org.redward.spectrum.ObjectClass;

/**
 * Scores measured redshifts against the truth of a mock survey.
 *
 * <p>Definitions (stated in every output):
 * <ul>
 * <li>success: a redshift was given and {@code |z - z_true| / (1 + z_true) < 0.001} (about
 * 300 km/s);</li>
 * <li>catastrophic: a redshift was given and {@code |z - z_true| / (1 + z_true) > 0.01} (about
 * 3000 km/s): a wrong line identification or a wrong template, not a measurement error;</li>
 * <li>velocity error {@code dv = c (z - z_true) / (1 + z_true)} (the velocity difference in the
 * object's frame), over successes only; its scatter is given both as the normalised median
 * absolute deviation {@code 1.4826 median |dv - median(dv)|} (robust, common practice) and as
 * the standard deviation;</li>
 * <li>grade reliability: for each grade, the fraction of successes among the objects given that
 * grade.</li>
 * </ul>
 * Fibres without an object (empty or broken) count separately: a redshift given to one is a false
 * detection. Immutable; thread-safe.
 */
public final class Scorecard {

    /** Success threshold on |dz|/(1+z). */
    public static final double SUCCESS = org.redward.api.redshift.GradeCalibration.CORRECT_RELATIVE_ERROR;
    /** Catastrophic threshold on |dz|/(1+z). */
    public static final double CATASTROPHIC = 0.01;
    /** Edges of the S/N bins (median S/N per pixel). */
    public static final double[] SNR_EDGES = {0, 2, 5, 10, 20, Double.POSITIVE_INFINITY};

    /** One measured fibre with its truth. */
    public record Outcome(TruthRow truth, boolean measured, double z, ObjectClass objectClass, String grade,
            double reportedReliability) {

        double relativeError() {
            return (z - truth.zTopo()) / (1 + truth.zTopo());
        }

        boolean success() {
            return measured && truth.kind().hasRedshift() && Math.abs(relativeError()) < SUCCESS;
        }

        boolean catastrophic() {
            return measured && truth.kind().hasRedshift() && Math.abs(relativeError()) > CATASTROPHIC;
        }

        double dvKmPerS() {
            return Grid.C_KM_S * relativeError();
        }
    }

    /** Figures for one group of objects. */
    public record Figures(String group, int objects, int measured, int successes, int catastrophic, int classRight,
            double dvMedian, double dvNmad, double dvStd) {

        public double successRate() {
            return objects == 0 ? Double.NaN : (double) successes / objects;
        }

        public double catastrophicRate() {
            return measured == 0 ? Double.NaN : (double) catastrophic / measured;
        }

        public double classRate() {
            return measured == 0 ? Double.NaN : (double) classRight / measured;
        }
    }

    private final List<Outcome> outcomes;

    private Scorecard(List<Outcome> outcomes) {
        this.outcomes = List.copyOf(outcomes);
    }

    public static Scorecard of(List<Outcome> outcomes) {
        return new Scorecard(outcomes);
    }

    public List<Outcome> outcomes() {
        return outcomes;
    }

    /** Figures over the objects (fibres with a true redshift) that pass {@code filter}. */
    public Figures figures(String group, Predicate<Outcome> filter) {
        List<Double> dv = new ArrayList<>();
        int n = 0;
        int measured = 0;
        int ok = 0;
        int cat = 0;
        int cls = 0;
        for (Outcome o : outcomes) {
            if (!o.truth().kind().hasRedshift() || !filter.test(o)) {
                continue;
            }
            n++;
            if (o.measured()) {
                measured++;
                if (o.objectClass() == o.truth().kind().objectClass()) {
                    cls++;
                }
            }
            if (o.success()) {
                ok++;
                dv.add(o.dvKmPerS());
            }
            if (o.catastrophic()) {
                cat++;
            }
        }
        double[] a = dv.stream().mapToDouble(Double::doubleValue).toArray();
        double med = median(a);
        return new Figures(group, n, measured, ok, cat, cls, med, nmad(a), std(a));
    }

    /** Figures per true class, plus all objects. */
    public List<Figures> byClass() {
        List<Figures> f = new ArrayList<>();
        f.add(figures("all objects", o -> true));
        for (ObjectClass c : List.of(ObjectClass.GALAXY, ObjectClass.QUASAR, ObjectClass.STAR)) {
            f.add(figures(c.key(), o -> o.truth().kind().objectClass() == c));
        }
        return f;
    }

    /** Figures per true class and S/N bin. */
    public List<Figures> byClassAndSnr() {
        List<Figures> f = new ArrayList<>();
        for (ObjectClass c : List.of(ObjectClass.GALAXY, ObjectClass.QUASAR, ObjectClass.STAR)) {
            for (int b = 0; b + 1 < SNR_EDGES.length; b++) {
                double lo = SNR_EDGES[b];
                double hi = SNR_EDGES[b + 1];
                f.add(figures(c.key() + " S/N " + snrLabel(lo, hi),
                        o -> o.truth().kind().objectClass() == c && o.truth().snrMedian() >= lo && o.truth().snrMedian() < hi));
            }
        }
        return f;
    }

    static String snrLabel(double lo, double hi) {
        return Double.isInfinite(hi) ? String.format(Locale.ROOT, ">=%.0f", lo) : String.format(Locale.ROOT, "%.0f-%.0f", lo, hi);
    }

    /** Per grade: {grade -> figures over the objects given that grade}, best (most reliable) first. */
    public List<Figures> byGrade() {
        Map<String, Figures> m = new TreeMap<>();
        for (Outcome o : outcomes) {
            if (o.measured()) {
                String g = o.grade().isEmpty() ? "(none)" : o.grade();
                m.computeIfAbsent(g, k -> figures(k, x -> x.measured() && k.equals(x.grade().isEmpty() ? "(none)" : x.grade())));
            }
        }
        List<Figures> f = new ArrayList<>(m.values());
        f.sort(Comparator.comparingDouble((Figures x) -> -x.successRate()).thenComparing(Figures::group));
        return f;
    }

    /**
     * The grade the estimator trusts most: the one whose solutions carry the highest median
     * reported reliability (ties and unknown reliabilities: the alphabetically first grade).
     */
    public String topGrade() {
        Map<String, List<Double>> rel = new TreeMap<>();
        for (Outcome o : outcomes) {
            if (o.measured() && !o.grade().isEmpty()) {
                rel.computeIfAbsent(o.grade(), k -> new ArrayList<>()).add(o.reportedReliability());
            }
        }
        String best = "";
        double bestRel = Double.NEGATIVE_INFINITY;
        for (Map.Entry<String, List<Double>> e : rel.entrySet()) {
            double[] a = e.getValue().stream().mapToDouble(Double::doubleValue).filter(Double::isFinite).toArray();
            double m = a.length == 0 ? Double.NEGATIVE_INFINITY : median(a);
            if (best.isEmpty() || m > bestRel) {
                best = e.getKey();
                bestRel = m;
            }
        }
        return best;
    }

    /** Median reliability the estimator reported for a grade (NaN if none). */
    public double reportedReliability(String grade) {
        double[] a = outcomes.stream().filter(o -> o.measured() && o.grade().equals(grade))
                .mapToDouble(Outcome::reportedReliability).filter(Double::isFinite).toArray();
        return median(a);
    }

    /** Fibres without an object that were nevertheless given a redshift, by grade. */
    public Map<String, Integer> falseDetections() {
        Map<String, Integer> m = new LinkedHashMap<>();
        for (Outcome o : outcomes) {
            if (!o.truth().kind().hasRedshift() && o.measured()) {
                m.merge(o.grade().isEmpty() ? "(none)" : o.grade(), 1, Integer::sum);
            }
        }
        return m;
    }

    /** Fibres without an object. */
    public int emptyFibres() {
        return (int) outcomes.stream().filter(o -> !o.truth().kind().hasRedshift()).count();
    }

    static double median(double[] a) {
        if (a.length == 0) {
            return Double.NaN;
        }
        return new org.apache.commons.math3.stat.descriptive.rank.Median().evaluate(a);
    }

    /** Normalised median absolute deviation, 1.4826 median|x - median(x)| (common practice). */
    static double nmad(double[] a) {
        if (a.length == 0) {
            return Double.NaN;
        }
        double m = median(a);
        double[] d = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            d[i] = Math.abs(a[i] - m);
        }
        return 1.4826 * median(d);
    }

    static double std(double[] a) {
        if (a.length < 2) {
            return Double.NaN;
        }
        return new org.apache.commons.math3.stat.descriptive.moment.StandardDeviation(true).evaluate(a);
    }
}
