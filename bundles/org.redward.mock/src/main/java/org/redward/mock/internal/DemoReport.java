package org.redward.mock.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import org.redward.api.commands.Json;
import org.redward.spectrum.ObjectClass;

/** The demo's summary (terminal), report (Markdown) and JSON summary. Not thread-safe. */
final class DemoReport {

    static final String SCENARIO = "the invented Ember field, observed with the invented Quill fibre spectrograph on the "
            + "Ossel 2.6m telescope at the invented Quenta Ridge Observatory";

    private final long seed;
    private final int size;
    private final Path survey;
    private final List<DemoRun.Step> steps;
    private final Scorecard card;
    private final List<Row> rows;
    private final List<String> cautions;
    private final String estimator;

    DemoReport(long seed, int size, Path survey, List<DemoRun.Step> steps, Scorecard card, List<Row> rows,
            List<String> cautions, String estimator) {
        this.seed = seed;
        this.size = size;
        this.survey = survey;
        this.steps = steps;
        this.card = card;
        this.rows = rows;
        this.cautions = new ArrayList<>(cautions);
        this.estimator = estimator;
        addWarningsSummary();
    }

    private void addWarningsSummary() {
        // group the estimators' warnings by their wording with the numbers taken out
        Map<String, Integer> counts = new TreeMap<>();
        Map<String, String> example = new TreeMap<>();
        for (Row r : rows) {
            for (String w : r.warnings) {
                String key = w.replaceAll("[-+]?\\d+(\\.\\d+)?", "#");
                counts.merge(key, 1, Integer::sum);
                example.putIfAbsent(key, w);
            }
        }
        for (Map.Entry<String, Integer> e : counts.entrySet()) {
            cautions.add(e.getValue() == 1 ? "1 spectrum: " + example.get(e.getKey())
                    : e.getValue() + " spectra: " + example.get(e.getKey()) + " (and similar)");
        }
    }

    /** Counts by measured class and grade. */
    Map<String, Map<String, Integer>> classGrades() {
        Map<String, Map<String, Integer>> m = new LinkedHashMap<>();
        for (ObjectClass c : ObjectClass.values()) {
            m.put(c.key(), new TreeMap<>());
        }
        m.put("no redshift", new TreeMap<>());
        for (Row r : rows) {
            String cls = r.measured ? r.objectClass.key() : "no redshift";
            m.get(cls).merge(r.measured ? (r.grade.isEmpty() ? "-" : r.grade) : "-", 1, Integer::sum);
        }
        m.values().removeIf(Map::isEmpty);
        return m;
    }

    void printSummary(PrintStream out, Path results, double seconds) {
        out.println();
        out.println("Redward demo: " + SCENARIO + ".");
        out.println("Everything here is invented: simulated spectra of invented objects, seed " + seed + ".");
        out.println();
        out.printf(Locale.ROOT, "  %-20s %-14s %8s  %s%n", "step", "status", "time", "detail");
        for (DemoRun.Step s : steps) {
            out.printf(Locale.ROOT, "  %-20s %-14s %8s  %s%n", s.name(), s.status(),
                    s.seconds() > 0 ? String.format(Locale.ROOT, "%.1f s", s.seconds()) : "", s.detail());
        }
        out.println();
        out.printf(Locale.ROOT, "  %-16s %6s   %s%n", "measured class", "count", "by grade");
        for (Map.Entry<String, Map<String, Integer>> e : classGrades().entrySet()) {
            int n = e.getValue().values().stream().mapToInt(Integer::intValue).sum();
            StringBuilder g = new StringBuilder();
            for (Map.Entry<String, Integer> ge : e.getValue().entrySet()) {
                if (!ge.getKey().equals("-")) {
                    g.append(ge.getKey()).append(' ').append(ge.getValue()).append("   ");
                }
            }
            out.printf(Locale.ROOT, "  %-16s %6d   %s%n", e.getKey(), n, g.toString().trim());
        }
        out.println();
        out.println("  against the truth of the survey (success: |z - z_true|/(1+z_true) < 0.001; catastrophic: > 0.01)");
        out.printf(Locale.ROOT, "  %-14s %8s %9s %9s %13s %12s %15s%n", "true class", "objects", "measured", "success",
                "catastrophic", "class right", "dv NMAD km/s");
        for (Scorecard.Figures f : card.byClass()) {
            out.printf(Locale.ROOT, "  %-14s %8d %9d %9s %13s %12s %15s%n", f.group(), f.objects(), f.measured(),
                    pct(f.successRate()), pct(f.catastrophicRate()), pct(f.classRate()), num(f.dvNmad(), 0));
        }
        int empty = card.emptyFibres();
        Map<String, Integer> fd = card.falseDetections();
        int fdn = fd.values().stream().mapToInt(Integer::intValue).sum();
        out.printf(Locale.ROOT, "  %d fibres held no object (empty or broken); %d of them were given a redshift%s%n", empty, fdn,
                fdn > 0 ? " " + fd : "");
        if (!cautions.isEmpty()) {
            out.println();
            out.println("  cautions:");
            for (String c : cautions) {
                out.println("    - " + c);
            }
        }
        out.println();
        out.println("  survey:  " + survey);
        out.println("  results: " + results);
        try (var s = Files.list(results)) {
            s.sorted().forEach(p -> out.println("           " + p.getFileName()));
        } catch (IOException e) {
            out.println("           (cannot list: " + e.getMessage() + ")");
        }
        out.printf(Locale.ROOT, "  time:    %.1f s%n", seconds);
    }

    void writeMarkdown(Path file) throws IOException {
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(file))) {
            w.println("# Redward demo report");
            w.println();
            w.println("Survey: " + SCENARIO + ". " + size + " fibres, seed " + seed
                    + ". **All objects, the instrument, the telescope and the site are invented**; the spectra are simulated "
                    + "(physical recipes, night-sky lines, noise, cosmic rays, masked pixels) and the truth is known.");
            w.println();
            w.println("Estimator: " + (estimator.isEmpty() ? "none installed" : estimator));
            w.println();
            w.println("## Steps");
            w.println();
            w.println("| step | status | time (s) | detail |");
            w.println("|---|---|---:|---|");
            for (DemoRun.Step s : steps) {
                w.printf(Locale.ROOT, "| %s | %s | %s | %s |%n", s.name(), s.status(), s.seconds() > 0 ? num(s.seconds(), 1) : "",
                        s.detail());
            }
            w.println();
            w.println("## Against the truth");
            w.println();
            w.println("Success: a redshift with |z - z_true|/(1+z_true) < 0.001; catastrophic: > 0.01; dv = c (z - z_true)/(1+z_true) "
                    + "over successes; NMAD = 1.4826 median|dv - median dv|. The measured redshift is compared with the "
                    + "topocentric truth (what the spectrum shows at the telescope).");
            w.println();
            table(w, card.byClass());
            w.println();
            w.println("### By class and median S/N per pixel");
            w.println();
            table(w, card.byClassAndSnr());
            w.println();
            w.println("### Reliability of each grade");
            w.println();
            table(w, card.byGrade());
            w.println();
            Map<String, Integer> fd = card.falseDetections();
            w.println("Fibres without an object (empty or broken): " + card.emptyFibres() + "; given a redshift: "
                    + (fd.isEmpty() ? "none" : fd) + ".");
            w.println();
            w.println("### Worst failures");
            w.println();
            w.println("| id | true kind | z true | z measured | class | grade | |dz|/(1+z) |");
            w.println("|---|---|---:|---:|---|---|---:|");
            rows.stream().filter(r -> r.truth != null && r.measured && r.truth.kind().hasRedshift())
                    .sorted((x, y) -> Double.compare(Math.abs(y.outcome().relativeError()), Math.abs(x.outcome().relativeError())))
                    .limit(12).filter(r -> Math.abs(r.outcome().relativeError()) > Scorecard.SUCCESS)
                    .forEach(r -> w.printf(Locale.ROOT, "| %s | %s | %.5f | %.5f | %s | %s | %.4f |%n", r.objectId, r.truth.kind().key(),
                            r.truth.zTopo(), r.z, r.objectClass.key(), r.grade, Math.abs(r.outcome().relativeError())));
            if (!cautions.isEmpty()) {
                w.println();
                w.println("## Cautions");
                w.println();
                for (String c : cautions) {
                    w.println("- " + c);
                }
            }
        }
    }

    static void table(PrintWriter w, List<Scorecard.Figures> figures) {
        w.println("| group | objects | measured | success | catastrophic | class right | dv median (km/s) | dv NMAD (km/s) | dv std (km/s) |");
        w.println("|---|---:|---:|---:|---:|---:|---:|---:|---:|");
        for (Scorecard.Figures f : figures) {
            w.printf(Locale.ROOT, "| %s | %d | %d | %s | %s | %s | %s | %s | %s |%n", f.group(), f.objects(), f.measured(),
                    pct(f.successRate()), pct(f.catastrophicRate()), pct(f.classRate()), num(f.dvMedian(), 1),
                    num(f.dvNmad(), 1), num(f.dvStd(), 1));
        }
    }

    Json json(Path results, double seconds) {
        List<Object> st = new ArrayList<>();
        for (DemoRun.Step s : steps) {
            st.add(Json.object().put("step", s.name()).put("status", s.status()).put("detail", s.detail()).put("seconds", s.seconds()));
        }
        List<Object> fig = new ArrayList<>();
        for (Scorecard.Figures f : card.byClass()) {
            fig.add(Json.object().put("group", f.group()).put("objects", f.objects()).put("measured", f.measured())
                    .put("success_rate", f.successRate()).put("catastrophic_rate", f.catastrophicRate())
                    .put("class_rate", f.classRate()).put("dv_nmad_km_s", f.dvNmad()));
        }
        return Json.object().put("survey", survey.toString()).put("results", results.toString()).put("seed", seed)
                .put("size", size).put("estimator", estimator).put("steps", st).put("counts", classGrades())
                .put("against_truth", fig).put("cautions", cautions).put("seconds", seconds);
    }

    static String pct(double f) {
        return Double.isFinite(f) ? String.format(Locale.ROOT, "%.1f%%", 100 * f) : "-";
    }

    static String num(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "-";
    }
}
