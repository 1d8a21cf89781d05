package org.redward.mock.internal;

import java.io.File;
import java.nio.file.Path;
import java.util.List;

import org.jfree.chart.ChartFactory;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/** Looks at generated fibres: {@code PlotFibresMain SURVEYDIR OUTDIR ID...}; writes one PNG per id. A developer's tool, not a test. */
public final class PlotFibresMain {
    public static void main(String[] args) throws Exception {
        Path dir = Path.of(args[0]);
        List<TruthRow> truth = SurveyGenerator.readTruth(dir.resolve("truth.csv"));
        for (int a = 2; a < args.length; a++) {
            String id = args[a];
            TruthRow t = truth.stream().filter(r -> r.objectId().equals(id)).findFirst().orElseThrow();
            float[][] s = SurveyRoundTripTest.read(dir.resolve(t.file()), t.row());
            XYSeries xs = new XYSeries("flux");
            for (int i = 0; i < s[0].length; i++) {
                if (s[2][i] > 0) {
                    xs.add(s[0][i], s[1][i]);
                }
            }
            JFreeChart c = ChartFactory.createXYLineChart(String.format(java.util.Locale.ROOT, "%s %s z=%.4f S/N=%.1f %s", id,
                    t.kind().key(), t.zTopo(), t.snrMedian(), t.parameters()), "vacuum wavelength (A)", "flux",
                    new XYSeriesCollection(xs), PlotOrientation.VERTICAL, false, false, false);
            c.getTitle().setFont(c.getTitle().getFont().deriveFont(10f));
            ChartUtils.saveChartAsPNG(new File(args[1], id + ".png"), c, 1400, 500);
        }
    }
}
