package org.redward.charts;

import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Builds an x-y scatter plot with optional error bars (e.g. measured against published z, or a
 * Hubble diagram of distance against z), optional model curves (drawn as lines from a function)
 * and an optional identity line y = x. Points with a non-finite x or y are left out; a
 * non-finite error draws no bar. Either axis may be logarithmic (non-positive values are then left
 * out). Not thread-safe.
 */
public final class ScatterChart {

    private record Points(String label, double[] x, double[] y, double[] xErr, double[] yErr) {
    }

    private record Curve(String label, DoubleUnaryOperator f, double from, double to) {
    }

    private final List<Points> points = new ArrayList<>();
    private final List<Curve> curves = new ArrayList<>();
    private String title = "";
    private String xLabel = "x";
    private String yLabel = "y";
    private boolean identity;
    private boolean logX;
    private boolean logY;

    private ScatterChart() {
    }

    public static ScatterChart create() {
        return new ScatterChart();
    }

    public ScatterChart title(String t) {
        title = t == null ? "" : t;
        return this;
    }

    public ScatterChart axes(String x, String y) {
        xLabel = x;
        yLabel = y;
        return this;
    }

    /**
     * Adds a set of points.
     *
     * @param xErr 1-sigma error of x per point, or null for none
     * @param yErr 1-sigma error of y per point, or null for none
     */
    public ScatterChart points(String label, double[] x, double[] y, double[] xErr, double[] yErr) {
        if (x.length != y.length || (xErr != null && xErr.length != x.length) || (yErr != null && yErr.length != x.length)) {
            throw new IllegalArgumentException("scatter " + label + ": x, y and error arrays must have the same length");
        }
        points.add(new Points(label, x.clone(), y.clone(), xErr == null ? null : xErr.clone(), yErr == null ? null : yErr.clone()));
        return this;
    }

    /** Adds a model curve y = f(x) sampled at 400 points between {@code from} and {@code to}. */
    public ScatterChart curve(String label, DoubleUnaryOperator f, double from, double to) {
        curves.add(new Curve(label, f, from, to));
        return this;
    }

    /** Draws the line y = x (for measured against true). */
    public ScatterChart identityLine(boolean draw) {
        identity = draw;
        return this;
    }

    public ScatterChart logAxes(boolean x, boolean y) {
        logX = x;
        logY = y;
        return this;
    }

    public JFreeChart build() {
        XYIntervalSeriesCollection data = new XYIntervalSeriesCollection();
        double xmin = Double.POSITIVE_INFINITY;
        double xmax = Double.NEGATIVE_INFINITY;
        for (Points p : points) {
            XYIntervalSeries s = new XYIntervalSeries(p.label(), false, true);
            for (int i = 0; i < p.x().length; i++) {
                double x = p.x()[i];
                double y = p.y()[i];
                if (!Double.isFinite(x) || !Double.isFinite(y) || (logX && x <= 0) || (logY && y <= 0)) {
                    continue;
                }
                double ex = p.xErr() == null || !Double.isFinite(p.xErr()[i]) ? 0 : Math.abs(p.xErr()[i]);
                double ey = p.yErr() == null || !Double.isFinite(p.yErr()[i]) ? 0 : Math.abs(p.yErr()[i]);
                s.add(x, x - ex, x + ex, y, y - ey, y + ey);
                xmin = Math.min(xmin, x);
                xmax = Math.max(xmax, x);
            }
            data.addSeries(s);
        }
        ValueAxis xa = logX ? logAxis(xLabel) : new NumberAxis(xLabel);
        ValueAxis ya = logY ? logAxis(yLabel) : new NumberAxis(yLabel);
        XYErrorRenderer r = new XYErrorRenderer();
        r.setDefaultLinesVisible(false);
        r.setCapLength(3);
        r.setErrorStroke(new BasicStroke(0.8f));
        for (int k = 0; k < points.size(); k++) {
            r.setSeriesPaint(k, ChartStyle.series(k));
            r.setSeriesShape(k, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
        }
        XYPlot plot = new XYPlot(data, xa, ya, r);

        XYSeriesCollection lines = new XYSeriesCollection();
        for (Curve c : curves) {
            XYSeries s = new XYSeries(c.label(), false, true);
            int n = 400;
            for (int i = 0; i <= n; i++) {
                double x = logX && c.from() > 0 ? c.from() * Math.pow(c.to() / c.from(), i / (double) n)
                        : c.from() + (c.to() - c.from()) * i / n;
                double y = c.f().applyAsDouble(x);
                s.add(x, Double.isFinite(y) && (!logY || y > 0) ? Double.valueOf(y) : null, false);
            }
            lines.addSeries(s);
        }
        if (identity && Double.isFinite(xmin)) {
            XYSeries s = new XYSeries("y = x", false, true);
            s.add(xmin, xmin);
            s.add(xmax, xmax);
            lines.addSeries(s);
        }
        if (lines.getSeriesCount() > 0) {
            XYLineAndShapeRenderer lr = new XYLineAndShapeRenderer(true, false);
            for (int k = 0; k < lines.getSeriesCount(); k++) {
                boolean isIdentity = identity && k == lines.getSeriesCount() - 1;
                lr.setSeriesPaint(k, isIdentity ? ChartStyle.INK : ChartStyle.series(points.size() + k));
                lr.setSeriesStroke(k, isIdentity ? ChartStyle.DASHED : new BasicStroke(1.3f));
            }
            plot.setDataset(1, lines);
            plot.setRenderer(1, lr);
        }
        JFreeChart chart = new JFreeChart(title.isEmpty() ? null : title, ChartStyle.TITLE, plot, true);
        ChartStyle.apply(chart);
        return chart;
    }

    private static LogAxis logAxis(String label) {
        LogAxis a = new LogAxis(label);
        a.setBase(10);
        a.setNumberFormatOverride(ChartStyle.rootFormat("0.###"));
        a.setSmallestValue(1e-6);
        // ticks at whole powers of ten only: a tick at 10^4.6 would be labelled 39810.717
        a.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        a.setMinorTickMarksVisible(true);
        a.setMinorTickCount(9);
        return a;
    }
}
