package org.redward.charts;

import java.awt.BasicStroke;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.Marker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Builds the score-versus-z chart of one or more estimators on the same spectrum. Each curve has
 * its own value axis (scores of different estimators are not comparable); a curve whose best
 * solutions are minima (chi-square) is drawn on an inverted axis, so that on every curve the
 * solutions are peaks, and its axis label says so. Each curve's solutions are marked: the adopted
 * one solid, runners-up dotted and numbered (#2, #3...). A separate marker shows the redshift the
 * user is looking at now.
 *
 * <p>Not thread-safe.
 */
public final class ScoreChart {

    private record Curve(String label, double[] z, double[] score, String scoreName, boolean lowerIsBetter, double[] solutions) {
    }

    private final List<Curve> curves = new ArrayList<>();
    private String title = "";
    private double current = Double.NaN;

    private ScoreChart() {
    }

    /** An empty builder. */
    public static ScoreChart create() {
        return new ScoreChart();
    }

    public ScoreChart title(String t) {
        title = t == null ? "" : t;
        return this;
    }

    /**
     * Adds one estimator's curve.
     *
     * @param label the estimator's id (legend)
     * @param z trial redshifts, increasing
     * @param score the score at each z (NaN leaves a gap)
     * @param scoreName what the score is (axis label)
     * @param lowerIsBetter true for chi-square-like scores
     * @param solutions the ranked solutions' z, adopted first (may be empty)
     */
    public ScoreChart curve(String label, double[] z, double[] score, String scoreName, boolean lowerIsBetter, double[] solutions) {
        if (z.length != score.length) {
            throw new IllegalArgumentException("score curve " + label + ": " + z.length + " redshifts and " + score.length + " scores");
        }
        curves.add(new Curve(label, z.clone(), score.clone(), scoreName == null ? "score" : scoreName, lowerIsBetter,
                solutions == null ? new double[0] : solutions.clone()));
        return this;
    }

    /** The redshift currently chosen (a marker); NaN for none. */
    public ScoreChart current(double z) {
        current = z;
        return this;
    }

    public JFreeChart build() {
        NumberAxis x = new NumberAxis("Trial redshift z");
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(x);
        if (curves.isEmpty()) {
            NumberAxis y = new NumberAxis("score");
            plot.setRangeAxis(y);
            plot.setNoDataMessage("no score curve for this spectrum");
        }
        for (int k = 0; k < curves.size(); k++) {
            Curve c = curves.get(k);
            XYSeries s = new XYSeries(c.label(), false, true);
            double[] zz = c.z();
            double[] sc = c.score();
            for (int i = 0; i < zz.length; i++) {
                s.add(zz[i], Double.isFinite(sc[i]) ? Double.valueOf(sc[i]) : null, false);
            }
            NumberAxis y = new NumberAxis(c.label() + ": " + c.scoreName() + (c.lowerIsBetter() ? ", best up" : ""));
            y.setInverted(c.lowerIsBetter());
            y.setAutoRangeIncludesZero(false);
            plot.setRangeAxis(k, y);
            plot.setDataset(k, new XYSeriesCollection(s));
            plot.mapDatasetToRangeAxis(k, k);
            XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
            r.setDrawSeriesLineAsPath(true);
            r.setSeriesPaint(0, ChartStyle.series(k));
            r.setSeriesStroke(0, k == 0 ? ChartStyle.THIN : new BasicStroke(1.2f));
            plot.setRenderer(k, r);
            double[] sol = c.solutions();
            for (int j = 0; j < sol.length; j++) {
                if (!Double.isFinite(sol[j])) {
                    continue;
                }
                ValueMarker m = new ValueMarker(sol[j]);
                m.setPaint(j == 0 ? ChartStyle.withAlpha(ChartStyle.series(k) instanceof java.awt.Color col ? col : ChartStyle.ADOPTED, 220)
                        : ChartStyle.withAlpha(ChartStyle.RUNNER_UP, 200));
                m.setStroke(j == 0 ? new BasicStroke(1.4f) : ChartStyle.DOTTED);
                m.setLabel(String.format(Locale.ROOT, "%s%s z=%.4f", curves.size() > 1 ? c.label() + " " : "", j == 0 ? "best" : "#" + (j + 1), sol[j]));
                m.setLabelFont(ChartStyle.SMALL);
                m.setLabelPaint(ChartStyle.INK);
                m.setLabelBackgroundColor(ChartStyle.withAlpha(java.awt.Color.WHITE, 210));
                m.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
                m.setLabelTextAnchor(TextAnchor.TOP_LEFT);
                m.setLabelOffset(new RectangleInsets(2 + 12 * ((j + k * 3) % 6), 2, 0, 2));
                plot.addDomainMarker(0, m, Layer.FOREGROUND, false);
            }
        }
        JFreeChart chart = new JFreeChart(title.isEmpty() ? null : title, ChartStyle.TITLE, plot, curves.size() > 1);
        ChartStyle.apply(chart);
        markCurrent(chart, current);
        return chart;
    }

    /** Moves (or removes, with NaN) the marker of the redshift the user is looking at. */
    public static void markCurrent(JFreeChart chart, double z) {
        XYPlot plot = chart.getXYPlot();
        var markers = plot.getDomainMarkers(Layer.BACKGROUND);
        if (markers != null) {
            for (Object m : new ArrayList<>(markers)) {
                if (m instanceof CurrentMarker) {
                    plot.removeDomainMarker(0, (Marker) m, Layer.BACKGROUND, false);
                }
            }
        }
        if (Double.isFinite(z)) {
            plot.addDomainMarker(0, new CurrentMarker(z), Layer.BACKGROUND, false);
        }
        chart.fireChartChanged();
    }

    private static final class CurrentMarker extends ValueMarker {
        private static final long serialVersionUID = 1L;

        CurrentMarker(double z) {
            super(z);
            setPaint(ChartStyle.withAlpha(ChartStyle.EMISSION, 90));
            setStroke(new BasicStroke(5f));
            setLabel(String.format(Locale.ROOT, "now z=%.5f", z));
            setLabelFont(ChartStyle.SMALL);
            setLabelPaint(ChartStyle.EMISSION);
            setLabelBackgroundColor(ChartStyle.withAlpha(java.awt.Color.WHITE, 210));
            setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
            setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
            setLabelOffset(new RectangleInsets(0, 3, 3, 3));
        }
    }
}
