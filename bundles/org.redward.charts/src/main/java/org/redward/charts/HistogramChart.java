package org.redward.charts;

import java.util.ArrayList;
import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.data.statistics.HistogramDataset;
import org.jfree.data.statistics.HistogramType;

/**
 * Builds a histogram of one or more samples on common bins (e.g. the redshift distribution of a
 * survey, or the velocity difference between two estimators). Non-finite values are left out and
 * their count is added to the legend label. Not thread-safe.
 */
public final class HistogramChart {

    private record Sample(String label, double[] values) {
    }

    private final List<Sample> samples = new ArrayList<>();
    private String title = "";
    private String xLabel = "value";
    private int bins = 30;
    private double min = Double.NaN;
    private double max = Double.NaN;
    private boolean frequency = true;

    private HistogramChart() {
    }

    public static HistogramChart create() {
        return new HistogramChart();
    }

    public HistogramChart title(String t) {
        title = t == null ? "" : t;
        return this;
    }

    public HistogramChart xLabel(String label) {
        xLabel = label;
        return this;
    }

    /** Number of bins (at least 1) and their common range; NaN bounds follow the data. */
    public HistogramChart bins(int count, double from, double to) {
        if (count < 1) {
            throw new IllegalArgumentException("histogram: bins must be at least 1, got " + count);
        }
        bins = count;
        min = from;
        max = to;
        return this;
    }

    /** Counts per bin (default) or fraction of the sample per bin. */
    public HistogramChart fractions(boolean asFractions) {
        frequency = !asFractions;
        return this;
    }

    public HistogramChart sample(String label, double[] values) {
        samples.add(new Sample(label, values.clone()));
        return this;
    }

    public JFreeChart build() {
        HistogramDataset data = new HistogramDataset();
        data.setType(frequency ? HistogramType.FREQUENCY : HistogramType.RELATIVE_FREQUENCY);
        double lo = min;
        double hi = max;
        if (!Double.isFinite(lo) || !Double.isFinite(hi)) {
            double dlo = Double.POSITIVE_INFINITY;
            double dhi = Double.NEGATIVE_INFINITY;
            for (Sample s : samples) {
                for (double v : s.values()) {
                    if (Double.isFinite(v)) {
                        dlo = Math.min(dlo, v);
                        dhi = Math.max(dhi, v);
                    }
                }
            }
            if (!Double.isFinite(lo)) {
                lo = Double.isFinite(dlo) ? dlo : 0;
            }
            if (!Double.isFinite(hi)) {
                hi = Double.isFinite(dhi) ? dhi : 1;
            }
            if (!(hi > lo)) {
                hi = lo + 1;
            }
        }
        for (Sample s : samples) {
            double[] finite = java.util.Arrays.stream(s.values()).filter(Double::isFinite).toArray();
            int dropped = s.values().length - finite.length;
            String label = s.label() + " (n=" + finite.length + (dropped > 0 ? ", " + dropped + " without value" : "") + ")";
            if (finite.length > 0) {
                data.addSeries(label, finite, bins, lo, hi);
            }
        }
        NumberAxis x = new NumberAxis(xLabel);
        NumberAxis y = new NumberAxis(frequency ? "Count" : "Fraction");
        XYBarRenderer r = new XYBarRenderer(0.05);
        r.setBarPainter(new StandardXYBarPainter());
        r.setShadowVisible(false);
        r.setDrawBarOutline(false);
        for (int k = 0; k < samples.size(); k++) {
            r.setSeriesPaint(k, samples.size() > 1 ? ChartStyle.withAlpha((java.awt.Color) ChartStyle.series(k), 150) : ChartStyle.series(k));
        }
        XYPlot plot = new XYPlot(data, x, y, r);
        JFreeChart chart = new JFreeChart(title.isEmpty() ? null : title, ChartStyle.TITLE, plot, true);
        ChartStyle.apply(chart);
        y.setAutoRangeIncludesZero(true);
        return chart;
    }
}
