package org.redward.mock.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** Tables of the accuracy benchmark: Markdown for people, CSV for scripts. Not thread-safe. */
final class AccuracyReport {

    private final long seed;
    private final int size;
    private final double generationSeconds;
    private final Measurer.Result mock;
    private final Measurer.Result real;
    private final List<RealData> realTruth;

    AccuracyReport(long seed, int size, double generationSeconds, Measurer.Result mock, Measurer.Result real, List<RealData> realTruth) {
        this.seed = seed;
        this.size = size;
        this.generationSeconds = generationSeconds;
        this.mock = mock;
        this.real = real;
        this.realTruth = realTruth;
    }

    /** The three goals per estimator: {estimator, galaxy S/N>=5 success, top grade, its catastrophic rate, dv NMAD at S/N 8-12}. */
    List<String[]> goals() {
        List<String[]> g = new ArrayList<>();
        for (Map.Entry<String, List<Row>> e : mock.rows().entrySet()) {
            Scorecard c = Scorecard.of(e.getValue().stream().map(Row::outcome).toList());
            Scorecard.Figures gal = c.figures("galaxies S/N>=5",
                    o -> o.truth().kind().objectClass() == org.redward.spectrum.ObjectClass.GALAXY && o.truth().snrMedian() >= 5);
            String top = c.topGrade();
            Scorecard.Figures topF = c.figures("grade " + top, o -> o.measured() && o.grade().equals(top));
            Scorecard.Figures s10 = c.figures("galaxies S/N 8-12",
                    o -> o.truth().kind().objectClass() == org.redward.spectrum.ObjectClass.GALAXY && o.truth().snrMedian() >= 8
                            && o.truth().snrMedian() < 12);
            g.add(new String[] {e.getKey(), DemoReport.pct(gal.successRate()) + " of " + gal.objects() + (gal.successRate() >= 0.99 ? " (met)" : " (not met)"),
                top.isEmpty() ? "(no grades)" : top,
                DemoReport.pct(topF.catastrophicRate()) + " of " + topF.measured() + (topF.catastrophicRate() <= 0.005 ? " (met)" : " (not met)"),
                DemoReport.num(s10.dvNmad(), 1) + " km/s over " + s10.successes() + (s10.dvNmad() <= 30 ? " (met)" : " (not met)")});
        }
        return g;
    }

    void printGoals(PrintStream out) {
        out.printf(Locale.ROOT, "Accuracy on %d invented mock spectra (seed %d; survey generated or reused in %.0f s, measured in %.0f s)%n",
                mock.spectra(), seed, generationSeconds, mock.seconds());
        if (!mock.unavailable().isEmpty()) {
            out.println("  not measured: " + mock.unavailable());
            return;
        }
        out.printf(Locale.ROOT, "  %-18s %-28s %-8s %-26s %s%n", "estimator", "galaxies S/N>=5: success",
                "top grade", "top grade: catastrophic", "dv NMAD, galaxies S/N 8-12");
        out.printf(Locale.ROOT, "  %-18s %-28s %-8s %-26s %s%n", "(goal)", ">= 99%", "", "<= 0.5%", "<= 30 km/s (R ~ 2000)");
        for (String[] g : goals()) {
            out.printf(Locale.ROOT, "  %-18s %-28s %-8s %-26s %s%n", (Object[]) g);
        }
        if (real != null) {
            out.println();
            out.println("Real spectra with published redshifts:");
            for (String[] r : realRows()) {
                out.println("  " + String.join("  ", r));
            }
        }
    }

    /** Rows of the real-data table: file, class, z published, then per estimator "z (dv km/s) ok|MISS". */
    List<String[]> realRows() {
        List<String[]> out = new ArrayList<>();
        if (real == null) {
            return out;
        }
        for (RealData t : realTruth) {
            List<String> cells = new ArrayList<>(List.of(t.file(), t.objectClass().key(), String.format(Locale.ROOT, "%.5f", t.zPublished())));
            for (Map.Entry<String, List<Row>> e : real.rows().entrySet()) {
                Row r = e.getValue().stream().filter(x -> x.file.equals(t.file())).findFirst().orElse(null);
                if (r == null || !r.measured) {
                    cells.add(e.getKey() + ": " + (r == null ? "not read" : "no z" + (r.error.isEmpty() ? "" : " (" + r.error + ")")));
                    continue;
                }
                double rel = (r.z - t.zPublished()) / (1 + t.zPublished());
                cells.add(String.format(Locale.ROOT, "%s: %.5f (%+.0f km/s, %s, %s) %s", e.getKey(), r.z, rel * Grid.C_KM_S,
                        r.objectClass.key(), r.grade.isEmpty() ? "-" : r.grade, Math.abs(rel) <= t.tolerance() ? "ok" : "MISS"));
            }
            out.add(cells.toArray(new String[0]));
        }
        return out;
    }

    void write(Path dir) throws IOException {
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(dir.resolve("accuracy.md")))) {
            w.printf(Locale.ROOT, "# Redshift accuracy benchmark%n%nMock survey: %d fibres of the invented Ember field (Quill "
                    + "spectrograph, resolving power about 2000), seed %d. Simulated spectra from physical recipes that share "
                    + "nothing with the template sets; the truth is known. Success: |z - z_true|/(1+z_true) < 0.001; "
                    + "catastrophic: > 0.01; dv over successes; NMAD = 1.4826 median|dv - median dv|; S/N: median per "
                    + "pixel, noise-free.%n%n", size, seed);
            w.println("## Goals");
            w.println();
            w.println("| estimator | galaxies S/N>=5: success (goal >= 99%) | top grade | top grade: catastrophic (goal <= 0.5%) | dv NMAD, galaxies S/N 8-12 (goal <= 30 km/s) |");
            w.println("|---|---|---|---|---|");
            for (String[] g : goals()) {
                w.println("| " + String.join(" | ", g) + " |");
            }
            for (Map.Entry<String, List<Row>> e : mock.rows().entrySet()) {
                Scorecard c = Scorecard.of(e.getValue().stream().map(Row::outcome).toList());
                w.println();
                w.println("## " + (e.getKey().isEmpty() ? "(no estimator)" : e.getKey()));
                w.println();
                DemoReport.table(w, c.byClass());
                w.println();
                DemoReport.table(w, c.byClassAndSnr());
                w.println();
                w.println("Grades (reported reliability is the median the estimator gave; success is what the truth says):");
                w.println();
                w.println("| grade | objects | success | catastrophic | reported reliability |");
                w.println("|---|---:|---:|---:|---:|");
                for (Scorecard.Figures f : c.byGrade()) {
                    w.printf(Locale.ROOT, "| %s | %d | %s | %s | %s |%n", f.group(), f.measured(), DemoReport.pct(f.successRate()),
                            DemoReport.pct(f.catastrophicRate()), DemoReport.num(c.reportedReliability(f.group()), 3));
                }
                w.println();
                w.println("Fibres without an object: " + c.emptyFibres() + "; given a redshift: " + c.falseDetections());
            }
            if (real != null) {
                w.println();
                w.println("## Real spectra with published redshifts");
                w.println();
                w.println("Reference values as published with the files (see the folder's README and truth.tsv); tolerance "
                        + "|dz|/(1+z) < 0.001, at least 300 km/s for broad-line quasars, 0.001 in z where the reference is a hand-typed table.");
                w.println();
                for (String[] r : realRows()) {
                    w.println("- " + String.join(" | ", r));
                }
            }
        }
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(dir.resolve("accuracy.csv")))) {
            w.println("estimator,group,objects,measured,successes,catastrophic,class_right,success_rate,catastrophic_rate,"
                    + "dv_median_km_s,dv_nmad_km_s,dv_std_km_s");
            for (Map.Entry<String, List<Row>> e : mock.rows().entrySet()) {
                Scorecard c = Scorecard.of(e.getValue().stream().map(Row::outcome).toList());
                List<Scorecard.Figures> all = new ArrayList<>(c.byClass());
                all.addAll(c.byClassAndSnr());
                for (Scorecard.Figures f : c.byGrade()) {
                    all.add(new Scorecard.Figures("grade " + f.group(), f.objects(), f.measured(), f.successes(), f.catastrophic(),
                            f.classRight(), f.dvMedian(), f.dvNmad(), f.dvStd()));
                }
                for (Scorecard.Figures f : all) {
                    w.printf(Locale.ROOT, "%s,%s,%d,%d,%d,%d,%d,%s,%s,%s,%s,%s%n", e.getKey(), f.group(), f.objects(), f.measured(),
                            f.successes(), f.catastrophic(), f.classRight(), n(f.successRate()), n(f.catastrophicRate()),
                            n(f.dvMedian()), n(f.dvNmad()), n(f.dvStd()));
                }
            }
        }
    }

    private static String n(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.6g", v) : "";
    }
}
