package org.redward.survey.internal;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;

import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.redward.api.commands.Json;

/** The short Markdown report and the terminal summary of a comparison. */
final class CompareReport {

    private CompareReport() {
    }

    static String text(List<String> ids, Comparison cmp) {
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "%d spectra, estimators %s%n", cmp.spectra(), String.join(", ", ids)));
        for (Comparison.Pair p : cmp.pairs()) {
            DescriptiveStatistics d = p.dv;
            double median = d.getN() > 0 ? d.getPercentile(50) : Double.NaN;
            sb.append(String.format(Locale.ROOT,
                    "%s vs %s: both measured %d; agree within 3 sigma %d, disagree %d, undecided %d; catastrophic %d;"
                            + " dv median %s km/s, robust sigma %s km/s%n",
                    ids.get(p.a), ids.get(p.b), p.bothOk, p.agree, p.disagree, p.undecided, p.catastrophic,
                    CompareCommand.fmt(median), CompareCommand.fmt(Comparison.robustSigma(d, median))));
        }
        return sb.toString();
    }

    static String markdown(List<String> ids, Comparison cmp, Map<String, Json> speed, List<String> plots, double catastrophic) {
        StringBuilder sb = new StringBuilder();
        sb.append("# Estimator comparison\n\n");
        sb.append(String.format(Locale.ROOT, "%d spectra measured by %s.%n%n", cmp.spectra(), String.join(", ", ids)));
        sb.append("dv = c (z_B - z_A) / (1 + z_A) is the rest-frame velocity difference of B against A. "
                + "Agreement means |z_B - z_A| <= 3 sqrt(sigma_A^2 + sigma_B^2); when either estimator gives no error the pair is undecided. "
                + String.format(Locale.ROOT, "A disagreement is catastrophic when |dv| > %.0f km/s.%n%n", catastrophic));
        sb.append("## Speed\n\n| estimator | spectra/s | seconds | misbehaving plug-ins |\n|---|---:|---:|---|\n");
        for (String id : ids) {
            Json s = speed.get(id);
            Object mis = s.fields().get("misbehaving");
            sb.append(String.format(Locale.ROOT, "| %s | %s | %s | %s |%n", id,
                    CompareCommand.fmt(((Number) s.fields().get("spectra_per_second")).doubleValue()),
                    CompareCommand.fmt(((Number) s.fields().get("seconds")).doubleValue()),
                    mis instanceof Map<?, ?> m && !m.isEmpty() ? m.toString() : "none"));
        }
        for (Comparison.Pair p : cmp.pairs()) {
            String a = ids.get(p.a);
            String b = ids.get(p.b);
            DescriptiveStatistics d = p.dv;
            double median = d.getN() > 0 ? d.getPercentile(50) : Double.NaN;
            sb.append(String.format(Locale.ROOT, "%n## %s against %s%n%n", b, a));
            sb.append("| figure | value |\n|---|---:|\n");
            row(sb, "both measured", Long.toString(p.bothOk));
            row(sb, "agree within combined 3 sigma", p.agree + pct(p.agree, p.agree + p.disagree));
            row(sb, "disagree", Long.toString(p.disagree));
            row(sb, "undecided (an error unknown)", Long.toString(p.undecided));
            row(sb, "catastrophic (|dv| > " + CompareCommand.fmt(catastrophic) + " km/s)", p.catastrophic + pct(p.catastrophic, p.bothOk));
            row(sb, "same class", p.classAgree + pct(p.classAgree, p.bothOk));
            row(sb, "dv median (km/s)", CompareCommand.fmt(median));
            row(sb, "dv robust sigma, 1.4826 MAD (km/s)", CompareCommand.fmt(Comparison.robustSigma(d, median)));
            row(sb, "dv mean (km/s)", CompareCommand.fmt(d.getN() > 0 ? d.getMean() : Double.NaN));
            row(sb, "dv standard deviation (km/s)", CompareCommand.fmt(d.getN() > 1 ? d.getStandardDeviation() : Double.NaN));
            row(sb, "dv 5th to 95th percentile (km/s)", d.getN() > 0
                    ? CompareCommand.fmt(d.getPercentile(5)) + " to " + CompareCommand.fmt(d.getPercentile(95)) : "n/a");
            sb.append(String.format(Locale.ROOT, "%nGrades of %s (rows) against grades of %s (columns):%n%n", a, b));
            TreeSet<String> cols = new TreeSet<>();
            p.grades.values().forEach(m -> cols.addAll(m.keySet()));
            sb.append("| ").append(a).append(" \\ ").append(b).append(" |");
            cols.forEach(c -> sb.append(' ').append(c).append(" |"));
            sb.append("\n|---|");
            cols.forEach(c -> sb.append("---:|"));
            sb.append('\n');
            for (Map.Entry<String, Map<String, Long>> e : p.grades.entrySet()) {
                sb.append("| ").append(e.getKey()).append(" |");
                for (String c : cols) {
                    sb.append(' ').append(e.getValue().getOrDefault(c, 0L)).append(" |");
                }
                sb.append('\n');
            }
        }
        if (!plots.isEmpty()) {
            sb.append("\n## Plots\n\n");
            for (String p : plots) {
                if (p.endsWith(".png")) {
                    sb.append("![").append(p).append("](").append(p).append(")\n\n");
                }
            }
        }
        sb.append("\nFiles: per-spectrum.csv (one row per spectrum), summary.json (these figures), rows-<estimator>.jsonl "
                + "(each estimator's rows, as `measure --json` prints them).\n");
        return sb.toString();
    }

    private static void row(StringBuilder sb, String name, String value) {
        sb.append("| ").append(name).append(" | ").append(value).append(" |\n");
    }

    private static String pct(long n, long of) {
        return of > 0 ? String.format(Locale.ROOT, " (%.1f%%)", 100.0 * n / of) : "";
    }
}
