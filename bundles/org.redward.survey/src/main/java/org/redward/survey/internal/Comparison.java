package org.redward.survey.internal;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.redward.api.catalog.Column;
import org.redward.api.commands.Json;
import org.redward.api.survey.MeasuredRow;

/**
 * Compares the rows of several estimators on the same spectra (rows aligned by their position
 * in the run). For each pair (A, B) and each spectrum both measured:
 * <ul>
 * <li>the rest-frame velocity difference {@code dv = c (z_B - z_A) / (1 + z_A)} in km/s
 * (common practice for redshift comparisons; c = 299 792.458 km/s exactly, SI definition);</li>
 * <li>agreement within the combined 3 sigma: {@code |z_B - z_A| <= 3 sqrt(sigma_A^2 + sigma_B^2)}
 * (undecided when either error is unknown);</li>
 * <li>a catastrophic disagreement when {@code |dv|} exceeds a threshold (default 1000 km/s, a
 * common choice for spectroscopic redshifts, not a standard).</li>
 * </ul>
 * The distribution of dv is summarised by median, robust sigma (1.4826 times the median
 * absolute deviation, the normal-consistent scale), mean, standard deviation and the 5th and
 * 95th percentiles (Apache Commons Math). Grades of A are counted against grades of B.
 *
 * <p>Not thread-safe; one comparison per instance. Memory: one double per spectrum per pair.
 */
final class Comparison {

    /** Speed of light in km/s (exact, SI definition of the metre). */
    static final double C_KM_PER_S = 299_792.458;

    private final List<String> ids;
    private final double catastrophicKmPerS;
    private final List<Pair> pairs = new ArrayList<>();
    private long spectra;
    private final long[] okCount;

    Comparison(List<String> ids, double catastrophicKmPerS) {
        this.ids = List.copyOf(ids);
        this.catastrophicKmPerS = catastrophicKmPerS;
        this.okCount = new long[ids.size()];
        for (int a = 0; a < ids.size(); a++) {
            for (int b = a + 1; b < ids.size(); b++) {
                pairs.add(new Pair(a, b));
            }
        }
    }

    /** Statistics of one pair. */
    final class Pair {
        final int a;
        final int b;
        long bothOk;
        long agree;
        long disagree;
        long undecided;
        long catastrophic;
        long classAgree;
        final DescriptiveStatistics dv = new DescriptiveStatistics();
        final List<double[]> dvAgainstZ = new ArrayList<>();
        final Map<String, Map<String, Long>> grades = new TreeMap<>();

        Pair(int a, int b) {
            this.a = a;
            this.b = b;
        }

        String name() {
            return ids.get(a) + "_vs_" + ids.get(b);
        }
    }

    /** The rest-frame velocity difference of B against A, km/s. */
    static double dvKmPerS(double zA, double zB) {
        return C_KM_PER_S * (zB - zA) / (1 + zA);
    }

    /** True, false, or null when an error is unknown: |zB - zA| within 3 sqrt(eA^2 + eB^2). */
    static Boolean agree(double zA, double eA, double zB, double eB) {
        if (!Double.isFinite(eA) || !Double.isFinite(eB)) {
            return null;
        }
        return Math.abs(zB - zA) <= 3 * Math.sqrt(eA * eA + eB * eB);
    }

    /** Adds one spectrum: the rows of every estimator for it, in the order of the ids. */
    void add(List<MeasuredRow> rows) {
        spectra++;
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).ok()) {
                okCount[i]++;
            }
        }
        for (Pair p : pairs) {
            MeasuredRow ra = rows.get(p.a);
            MeasuredRow rb = rows.get(p.b);
            p.grades.computeIfAbsent(gradeKey(ra), k -> new TreeMap<>()).merge(gradeKey(rb), 1L, Long::sum);
            if (!ra.ok() || !rb.ok()) {
                continue;
            }
            p.bothOk++;
            double dv = dvKmPerS(ra.z(), rb.z());
            p.dv.addValue(dv);
            p.dvAgainstZ.add(new double[] {ra.z(), dv});
            Boolean ag = agree(ra.z(), ra.zErr(), rb.z(), rb.zErr());
            if (ag == null) {
                p.undecided++;
            } else if (ag) {
                p.agree++;
            } else {
                p.disagree++;
            }
            if (Math.abs(dv) > catastrophicKmPerS) {
                p.catastrophic++;
            }
            if (ra.objectClass().equals(rb.objectClass())) {
                p.classAgree++;
            }
        }
    }

    private static String gradeKey(MeasuredRow r) {
        if (!r.ok()) {
            return "failed";
        }
        return r.grade().isEmpty() ? "ungraded" : r.grade();
    }

    List<Pair> pairs() {
        return pairs;
    }

    long spectra() {
        return spectra;
    }

    /** The summary as JSON: per estimator the count measured, per pair every figure. */
    Json summary(Map<String, Json> speed) {
        Json est = Json.object();
        for (int i = 0; i < ids.size(); i++) {
            Json e = Json.object().put("ok", okCount[i]).put("failed", spectra - okCount[i]);
            if (speed.containsKey(ids.get(i))) {
                e.fields().putAll(speed.get(ids.get(i)).fields());
            }
            est.put(ids.get(i), e);
        }
        List<Object> ps = new ArrayList<>();
        for (Pair p : pairs) {
            DescriptiveStatistics d = p.dv;
            double median = d.getN() > 0 ? d.getPercentile(50) : Double.NaN;
            ps.add(Json.object().put("a", ids.get(p.a)).put("b", ids.get(p.b)).put("both_ok", p.bothOk)
                    .put("agree_3sigma", p.agree).put("disagree_3sigma", p.disagree).put("undecided", p.undecided)
                    .put("agree_fraction", p.agree + p.disagree > 0 ? (double) p.agree / (p.agree + p.disagree) : Double.NaN)
                    .put("catastrophic", p.catastrophic).put("catastrophic_threshold_km_s", catastrophicKmPerS)
                    .put("catastrophic_fraction", p.bothOk > 0 ? (double) p.catastrophic / p.bothOk : Double.NaN)
                    .put("class_agree", p.classAgree)
                    .put("dv_median_km_s", median).put("dv_robust_sigma_km_s", robustSigma(d, median))
                    .put("dv_mean_km_s", d.getN() > 0 ? d.getMean() : Double.NaN)
                    .put("dv_std_km_s", d.getN() > 1 ? d.getStandardDeviation() : Double.NaN)
                    .put("dv_p05_km_s", d.getN() > 0 ? d.getPercentile(5) : Double.NaN)
                    .put("dv_p95_km_s", d.getN() > 0 ? d.getPercentile(95) : Double.NaN)
                    .put("grades", new LinkedHashMap<>(p.grades)));
        }
        return Json.object().put("spectra", spectra).put("estimators", est).put("pairs", ps);
    }

    /** 1.4826 MAD: the normal-consistent robust scale. */
    static double robustSigma(DescriptiveStatistics d, double median) {
        if (d.getN() == 0) {
            return Double.NaN;
        }
        DescriptiveStatistics dev = new DescriptiveStatistics();
        for (double v : d.getValues()) {
            dev.addValue(Math.abs(v - median));
        }
        return 1.4826 * dev.getPercentile(50);
    }

    /** Columns of the per-spectrum table. */
    List<Column> columns() {
        List<Column> c = new ArrayList<>();
        c.add(Column.ofLong("sequence", "meta.number", "0-based position of the spectrum in the run"));
        c.add(Column.ofString("source", "meta.file", "file the spectrum came from"));
        c.add(Column.ofInt("index", "meta.number", "index of the spectrum in its file"));
        c.add(Column.ofString("id", "meta.id;meta.main", "object id"));
        for (String id : ids) {
            c.add(Column.ofString("status_" + id, "meta.code.status", "ok or failed, estimator " + id));
            c.add(Column.ofDouble("z_" + id, "", "src.redshift", "redshift, estimator " + id));
            c.add(Column.ofDouble("z_err_" + id, "", "stat.error;src.redshift", "1-sigma error of z, estimator " + id));
            c.add(Column.ofString("class_" + id, "src.class", "class, estimator " + id));
            c.add(Column.ofString("grade_" + id, "meta.code.qual", "grade, estimator " + id));
        }
        for (Pair p : pairs) {
            c.add(Column.ofDouble("dv_" + p.name() + "_km_s", "km/s", "spect.dopplerVeloc;arith.diff",
                    "c (z_" + ids.get(p.b) + " - z_" + ids.get(p.a) + ") / (1 + z_" + ids.get(p.a) + ")"));
            c.add(Column.ofString("agree_" + p.name(), "meta.code",
                    "yes: within the combined 3 sigma; no: outside; empty: an error unknown or a failure"));
            c.add(Column.ofBoolean("catastrophic_" + p.name(), "meta.code", "|dv| above " + catastrophicKmPerS + " km/s"));
        }
        return c;
    }

    /** One per-spectrum row. */
    Object[] cells(List<MeasuredRow> rows) {
        List<Object> c = new ArrayList<>();
        MeasuredRow first = rows.get(0);
        c.add(first.sequence());
        c.add(first.source());
        c.add(first.index());
        c.add(first.id());
        for (MeasuredRow r : rows) {
            c.add(r.status());
            c.add(r.z());
            c.add(r.zErr());
            c.add(r.objectClass());
            c.add(r.grade());
        }
        for (Pair p : pairs) {
            MeasuredRow ra = rows.get(p.a);
            MeasuredRow rb = rows.get(p.b);
            boolean both = ra.ok() && rb.ok();
            double dv = both ? dvKmPerS(ra.z(), rb.z()) : Double.NaN;
            Boolean ag = both ? agree(ra.z(), ra.zErr(), rb.z(), rb.zErr()) : null;
            c.add(dv);
            c.add(ag == null ? "" : ag ? "yes" : "no");
            c.add(both && Math.abs(dv) > catastrophicKmPerS);
        }
        return c.toArray();
    }

    /** Zips the row streams of every estimator (they hold the same spectra in the same order). */
    static Iterable<List<MeasuredRow>> zip(List<Iterable<MeasuredRow>> streams) {
        return () -> {
            List<Iterator<MeasuredRow>> its = new ArrayList<>();
            for (Iterable<MeasuredRow> s : streams) {
                its.add(s.iterator());
            }
            return new Iterator<>() {
                @Override
                public boolean hasNext() {
                    boolean any = its.get(0).hasNext();
                    for (Iterator<MeasuredRow> it : its) {
                        if (it.hasNext() != any) {
                            throw new IllegalStateException("the estimators' runs hold different numbers of spectra");
                        }
                    }
                    return any;
                }

                @Override
                public List<MeasuredRow> next() {
                    List<MeasuredRow> out = new ArrayList<>();
                    for (Iterator<MeasuredRow> it : its) {
                        out.add(it.next());
                    }
                    long seq = out.get(0).sequence();
                    for (MeasuredRow r : out) {
                        if (r.sequence() != seq) {
                            throw new IllegalStateException(String.format(Locale.ROOT,
                                    "rows out of step: spectrum %d against %d", seq, r.sequence()));
                        }
                    }
                    return out;
                }
            };
        };
    }
}
