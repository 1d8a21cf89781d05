package org.redward.survey.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.jfree.chart.JFreeChart;
import org.redward.charts.ChartExport;
import org.redward.charts.HistogramChart;
import org.redward.charts.ScatterChart;

/**
 * Plots of a comparison through the platform's chart model: for each pair, dv against z of the
 * first estimator, and the histogram of dv (range: the 1st to 99th percentile, widened to at
 * least +-100 km/s, so that a few catastrophic outliers do not flatten the core; how many fall
 * outside is said in the title). PNG and SVG of each.
 */
final class ComparePlots {

    static final int WIDTH = 900;
    static final int HEIGHT = 600;

    private ComparePlots() {
    }

    /** Writes the plots into {@code dir}; returns the file names written. */
    static List<String> write(Path dir, Comparison cmp, List<String> ids) throws IOException {
        List<String> files = new ArrayList<>();
        for (Comparison.Pair p : cmp.pairs()) {
            String a = ids.get(p.a);
            String b = ids.get(p.b);
            double[] z = new double[p.dvAgainstZ.size()];
            double[] dv = new double[z.length];
            for (int i = 0; i < z.length; i++) {
                z[i] = p.dvAgainstZ.get(i)[0];
                dv[i] = p.dvAgainstZ.get(i)[1];
            }
            JFreeChart scatter = ScatterChart.create()
                    .title(String.format(Locale.ROOT, "%s against %s: %d spectra measured by both", b, a, z.length))
                    .axes("z (" + a + ")", "dv = c (z_" + b + " - z_" + a + ") / (1 + z_" + a + ")  [km/s]")
                    .points(b + " - " + a, z, dv, null, null).build();
            files.addAll(save(dir, "dv-vs-z-" + p.name(), scatter));
            double lo = p.dv.getN() > 0 ? Math.min(p.dv.getPercentile(1), -100) : -100;
            double hi = p.dv.getN() > 0 ? Math.max(p.dv.getPercentile(99), 100) : 100;
            long outside = 0;
            for (double v : dv) {
                if (v < lo || v > hi) {
                    outside++;
                }
            }
            JFreeChart hist = HistogramChart.create()
                    .title(String.format(Locale.ROOT, "dv of %s against %s (%d outside the range shown)", b, a, outside))
                    .xLabel("dv  [km/s]").bins(Math.max(10, Math.min(80, (int) Math.sqrt(z.length) * 2)), lo, hi)
                    .sample(b + " - " + a, dv).build();
            files.addAll(save(dir, "dv-histogram-" + p.name(), hist));
        }
        return files;
    }

    private static List<String> save(Path dir, String stem, JFreeChart chart) throws IOException {
        List<String> out = new ArrayList<>();
        for (String ext : new String[] {".png", ".svg"}) {
            ChartExport.write(chart, dir.resolve(stem + ext), WIDTH, HEIGHT);
            out.add(stem + ext);
        }
        return out;
    }
}
