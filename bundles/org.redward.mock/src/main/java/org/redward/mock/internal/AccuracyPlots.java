package org.redward.mock.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.redward.charts.ChartExport;
import org.redward.charts.ScatterChart;
import org.redward.spectrum.ObjectClass;

/**
 * Plots of the accuracy benchmark through the charts bundle (an optional import): success rate
 * of galaxies against S/N per estimator, and the calibration of the grades (reported
 * reliability against the success rate the truth gives).
 */
final class AccuracyPlots {

    private AccuracyPlots() {
    }

    static List<String> write(Path folder, Map<String, List<Row>> rows) throws IOException {
        List<String> files = new ArrayList<>();
        ScatterChart snr = ScatterChart.create().title("Galaxies: success rate against S/N (invented mock survey)")
                .axes("median S/N per pixel (bin centre)", "success rate (%)");
        ScatterChart cal = ScatterChart.create().title("Grade calibration: reported reliability against measured success")
                .axes("reliability reported by the estimator", "fraction of successes").identityLine(true);
        for (Map.Entry<String, List<Row>> e : rows.entrySet()) {
            Scorecard c = Scorecard.of(e.getValue().stream().map(Row::outcome).toList());
            int bins = Scorecard.SNR_EDGES.length - 1;
            double[] x = new double[bins];
            double[] y = new double[bins];
            for (int b = 0; b < bins; b++) {
                double lo = Scorecard.SNR_EDGES[b];
                double hi = Scorecard.SNR_EDGES[b + 1];
                x[b] = Double.isInfinite(hi) ? 2 * lo : 0.5 * (lo + hi);
                y[b] = 100 * c.figures("", o -> o.truth().kind().objectClass() == ObjectClass.GALAXY
                        && o.truth().snrMedian() >= lo && o.truth().snrMedian() < hi).successRate();
            }
            snr.points(e.getKey(), x, y, null, null);
            List<Scorecard.Figures> grades = c.byGrade().stream()
                    .filter(g -> Double.isFinite(c.reportedReliability(g.group()))).toList();
            if (!grades.isEmpty()) {
                double[] rx = new double[grades.size()];
                double[] ry = new double[grades.size()];
                for (int i = 0; i < grades.size(); i++) {
                    rx[i] = c.reportedReliability(grades.get(i).group());
                    ry[i] = grades.get(i).successRate();
                }
                cal.points(e.getKey(), rx, ry, null, null);
            }
        }
        ChartExport.write(snr.build(), folder.resolve("success-vs-snr.png"), 1000, 650);
        files.add("success-vs-snr.png");
        ChartExport.write(cal.build(), folder.resolve("grade-calibration.png"), 1000, 650);
        files.add("grade-calibration.png");
        return files;
    }
}
