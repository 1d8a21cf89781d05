package org.redward.charts;

import java.awt.Color;
import java.awt.Font;
import java.awt.Shape;
import java.awt.geom.GeneralPath;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.Marker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.SamplingXYLineRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.Range;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;
import org.redward.spectrum.Spectrum;

/**
 * Builds the chart of one observed spectrum: flux (gaps at masked pixels) over its 1-sigma band
 * ({@code flux ± 1/sqrt(ivar)}, only when the file had errors), masked regions shaded, the sky
 * spectrum on its own right-hand axis, lines found in the spectrum marked with triangles
 * (pointing down for emission, up for absorption), and rest-frame lines drawn at a trial redshift
 * (emission solid, absorption dashed, each its own colour). The x axis is observed vacuum
 * wavelength in Angstrom.
 *
 * <p>The flux axis is scaled to the 0.5th-99.5th percentile of usable flux (with margins) so that
 * a single cosmic ray or a bad pixel does not flatten the spectrum; zooming can show the rest.
 *
 * <p>Not thread-safe; the chart it builds belongs to one thread at a time.
 */
public final class SpectrumChart {

    /** Dataset index of the found-line marks (drawn on top). */
    static final int FOUND = 0;
    /** Dataset index of the flux. */
    static final int FLUX = 1;
    /** Dataset index of the 1-sigma band. */
    static final int BAND = 2;
    /** Dataset index of the sky (right-hand axis). */
    static final int SKY = 3;

    private final Spectrum spectrum;
    private String title = "";
    private boolean errorBand = true;
    private double[] skyWavelength;
    private double[] skyFlux;
    private List<RestLine> restLines = List.of();
    private double z = Double.NaN;
    private List<FoundLine> found = List.of();

    private SpectrumChart(Spectrum spectrum) {
        this.spectrum = Objects.requireNonNull(spectrum, "spectrum");
    }

    /** A builder for this spectrum. */
    public static SpectrumChart of(Spectrum spectrum) {
        return new SpectrumChart(spectrum);
    }

    /** The chart's title (e.g. the object id and file). */
    public SpectrumChart title(String t) {
        title = t == null ? "" : t;
        return this;
    }

    /** Whether to draw the 1-sigma band (default true; never drawn when the file had no errors). */
    public SpectrumChart errorBand(boolean draw) {
        errorBand = draw;
        return this;
    }

    /**
     * A sky spectrum to draw beneath, on its own axis.
     *
     * @param wavelengthVacuumAngstrom observed vacuum wavelengths, same length as {@code sky}
     * @param sky sky flux (any unit; NaN pixels are left out)
     */
    public SpectrumChart sky(double[] wavelengthVacuumAngstrom, double[] sky) {
        if (wavelengthVacuumAngstrom.length != sky.length) {
            throw new IllegalArgumentException("sky: " + wavelengthVacuumAngstrom.length + " wavelengths and " + sky.length + " values");
        }
        skyWavelength = wavelengthVacuumAngstrom.clone();
        skyFlux = sky.clone();
        return this;
    }

    /** Rest-frame lines to draw at redshift {@code z} (NaN: draw none). */
    public SpectrumChart restLines(List<RestLine> lines, double atZ) {
        restLines = List.copyOf(lines);
        z = atZ;
        return this;
    }

    /** Lines found in the spectrum. */
    public SpectrumChart foundLines(List<FoundLine> lines) {
        found = List.copyOf(lines);
        return this;
    }

    /** Builds the chart. */
    public JFreeChart build() {
        double[] wl = spectrum.axis().vacuumAngstrom();
        double[] flux = spectrum.flux();
        double[] ivar = spectrum.inverseVariance();
        boolean[] mask = spectrum.mask();
        int n = wl.length;

        XYSeries fluxSeries = new XYSeries("flux", false, true);
        for (int i = 0; i < n; i++) {
            fluxSeries.add(wl[i], mask[i] ? null : Double.valueOf(flux[i]), false);
        }
        XYSeriesCollection fluxData = new XYSeriesCollection(fluxSeries);

        NumberAxis x = new NumberAxis("Observed wavelength, vacuum (Å)");
        NumberAxis y = new NumberAxis(spectrum.fluxUnit().isBlank() ? "Flux" : "Flux (" + spectrum.fluxUnit() + ")");
        // draws at most a few points per pixel column (min and max), so a 4,000-pixel spectrum costs
        // what its width on screen costs; gaps at masked pixels are kept
        SamplingXYLineRenderer fluxRenderer = new SamplingXYLineRenderer();
        fluxRenderer.setSeriesPaint(0, ChartStyle.FLUX);
        fluxRenderer.setSeriesStroke(0, ChartStyle.THIN);
        XYPlot plot = new XYPlot(null, x, y, null);
        plot.setDataset(FLUX, fluxData);
        plot.setRenderer(FLUX, fluxRenderer);

        List<LegendItem> legend = new ArrayList<>();
        legend.add(new LegendItem("flux", null, null, null, line(), ChartStyle.THIN, ChartStyle.FLUX));

        if (errorBand && spectrum.hasErrors()) {
            plot.setDataset(BAND, band(wl, flux, ivar, mask));
            DeviationRenderer bandRenderer = new DeviationRenderer(true, false);
            bandRenderer.setAutoPopulateSeriesPaint(false);
            bandRenderer.setAutoPopulateSeriesFillPaint(false);
            bandRenderer.setDefaultPaint(ChartStyle.withAlpha(ChartStyle.ERROR_BAND, 0));
            bandRenderer.setDefaultFillPaint(ChartStyle.ERROR_BAND);
            bandRenderer.setAlpha(0.55f);
            bandRenderer.setAutoPopulateSeriesStroke(false);
            bandRenderer.setDefaultStroke(new java.awt.BasicStroke(0f));
            plot.setRenderer(BAND, bandRenderer);
            legend.add(new LegendItem("±1σ", null, null, null, new java.awt.Rectangle(0, -4, 12, 8), ChartStyle.ERROR_BAND));
        }

        if (skyWavelength != null) {
            XYSeries s = new XYSeries("sky", false, true);
            for (int i = 0; i < skyWavelength.length; i++) {
                s.add(skyWavelength[i], Double.isFinite(skyFlux[i]) ? Double.valueOf(skyFlux[i]) : null, false);
            }
            NumberAxis skyAxis = new NumberAxis("Sky");
            skyAxis.setRange(skyRange(skyFlux));
            plot.setRangeAxis(1, skyAxis);
            plot.setDataset(SKY, new XYSeriesCollection(s));
            plot.mapDatasetToRangeAxis(SKY, 1);
            SamplingXYLineRenderer skyRenderer = new SamplingXYLineRenderer();
            skyRenderer.setSeriesPaint(0, ChartStyle.withAlpha(ChartStyle.SKY, 170));
            skyRenderer.setSeriesStroke(0, ChartStyle.THIN);
            plot.setRenderer(SKY, skyRenderer);
            legend.add(new LegendItem("sky (right axis)", null, null, null, line(), ChartStyle.THIN, ChartStyle.SKY));
        }

        Range fluxRange = robustRange(flux, mask);
        y.setRange(fluxRange);
        x.setRange(wl[0], wl[n - 1]);

        {
            XYSeries em = new XYSeries("found (emission)", false, true);
            XYSeries ab = new XYSeries("found (absorption)", false, true);
            double offset = 0.04 * fluxRange.getLength();
            for (FoundLine f : found) {
                int i = nearest(wl, f.observedVacuumAngstrom());
                double local = localExtreme(flux, mask, i, f.emission());
                if (f.emission()) {
                    em.add(f.observedVacuumAngstrom(), Math.min(local + offset, fluxRange.getUpperBound() - offset), false);
                } else {
                    ab.add(f.observedVacuumAngstrom(), Math.max(local - offset, fluxRange.getLowerBound() + offset), false);
                }
            }
            XYSeriesCollection foundData = new XYSeriesCollection();
            foundData.addSeries(em);
            foundData.addSeries(ab);
            XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(false, true);
            r.setSeriesShape(0, triangle(true));
            r.setSeriesShape(1, triangle(false));
            r.setSeriesPaint(0, ChartStyle.DETECTED);
            r.setSeriesPaint(1, ChartStyle.DETECTED);
            // always present: markers of index 0 are drawn only where dataset 0 has a renderer
            plot.setDataset(FOUND, foundData);
            plot.setRenderer(FOUND, r);
            if (!found.isEmpty()) {
                legend.add(new LegendItem("line found", null, null, null, triangle(true), ChartStyle.DETECTED));
            }
        }

        for (double[] run : maskedRuns(wl, mask)) {
            IntervalMarker m = new IntervalMarker(run[0], run[1], ChartStyle.withAlpha(ChartStyle.MASKED, 150));
            plot.addDomainMarker(m, Layer.BACKGROUND);
        }
        if (hasMasked(mask)) {
            legend.add(new LegendItem("masked", null, null, null, new java.awt.Rectangle(0, -4, 12, 8), ChartStyle.MASKED));
        }
        if (!restLines.isEmpty()) {
            legend.add(new LegendItem("emission line at z", null, null, null, line(), ChartStyle.THIN, ChartStyle.EMISSION));
            legend.add(new LegendItem("absorption line at z", null, null, null, line(), ChartStyle.DASHED, ChartStyle.ABSORPTION));
        }
        LegendItemCollection items = new LegendItemCollection();
        legend.forEach(items::add);
        plot.setFixedLegendItems(items);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.REVERSE);

        JFreeChart chart = new JFreeChart(title.isEmpty() ? null : title, ChartStyle.TITLE, plot, true);
        ChartStyle.apply(chart);
        placeRestLines(chart, restLines, z);
        return chart;
    }

    /**
     * Replaces the rest-frame line markers of a chart made by this class: each line drawn at
     * {@code rest * (1 + z)} when that falls inside the spectrum's wavelength range; none when z
     * is NaN. Cheap (no dataset changes): used when the user picks another solution.
     */
    public static void placeRestLines(JFreeChart chart, List<RestLine> lines, double z) {
        XYPlot plot = chart.getXYPlot();
        for (Layer layer : new Layer[] {Layer.FOREGROUND, Layer.BACKGROUND}) {
            var markers = plot.getDomainMarkers(layer);
            if (markers != null) {
                for (Object m : new ArrayList<>(markers)) {
                    if (m instanceof LineMarker) {
                        plot.removeDomainMarker(0, (Marker) m, layer, false);
                    }
                }
            }
        }
        if (Double.isFinite(z)) {
            XYSeriesCollection fluxData = (XYSeriesCollection) plot.getDataset(FLUX);
            XYSeries s = fluxData.getSeries(0);
            double lo = s.getMinX();
            double hi = s.getMaxX();
            List<RestLine> shown = new ArrayList<>();
            for (RestLine l : lines) {
                double w = l.observedAngstrom(z);
                if (w >= lo && w <= hi) {
                    shown.add(l);
                }
            }
            shown.sort((a, b) -> Double.compare(a.restVacuumAngstrom(), b.restVacuumAngstrom()));
            for (int k = 0; k < shown.size(); k++) {
                plot.addDomainMarker(0, new LineMarker(shown.get(k), z, k), Layer.FOREGROUND, false);
            }
        }
        plot.setNotify(true);
        chart.fireChartChanged();
    }

    /** The rest lines currently drawn, with their observed wavelengths. */
    public static List<RestLine> drawnRestLines(JFreeChart chart) {
        List<RestLine> out = new ArrayList<>();
        var markers = chart.getXYPlot().getDomainMarkers(Layer.FOREGROUND);
        if (markers != null) {
            for (Object m : markers) {
                if (m instanceof LineMarker lm) {
                    out.add(lm.line);
                }
            }
        }
        return out;
    }

    /** A domain marker for one rest line at z, styled by its kind. */
    static final class LineMarker extends ValueMarker {
        private static final long serialVersionUID = 1L;
        final transient RestLine line;

        LineMarker(RestLine line, double z, int order) {
            super(line.observedAngstrom(z));
            this.line = line;
            boolean absorption = line.kind() == RestLine.Kind.ABSORPTION;
            Color c = absorption ? ChartStyle.ABSORPTION : ChartStyle.EMISSION;
            setPaint(ChartStyle.withAlpha(c, 200));
            setStroke(absorption ? ChartStyle.DASHED : ChartStyle.THIN);
            setLabel(line.name());
            setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
            setLabelPaint(c);
            setLabelBackgroundColor(ChartStyle.withAlpha(Color.WHITE, 200));
            // emission labels hang from the top, absorption labels stand on the bottom; three
            // staggered rows keep neighbours (e.g. a doublet) from writing over each other
            int row = order % 3;
            if (absorption) {
                setLabelAnchor(RectangleAnchor.BOTTOM_LEFT);
                setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
                setLabelOffset(new RectangleInsets(0, 2, 2 + 12 * row, 2));
            } else {
                setLabelAnchor(RectangleAnchor.TOP_LEFT);
                setLabelTextAnchor(TextAnchor.TOP_RIGHT);
                setLabelOffset(new RectangleInsets(2 + 12 * row, 2, 0, 2));
            }
        }
    }

    /**
     * The 1-sigma band as one series (one polygon: cheap to draw). Over masked pixels the band
     * closes to zero width on the line joining the nearest usable pixels, so no value of a bad
     * pixel is shown.
     */
    private static YIntervalSeriesCollection band(double[] wl, double[] flux, double[] ivar, boolean[] mask) {
        YIntervalSeriesCollection c = new YIntervalSeriesCollection();
        YIntervalSeries s = new YIntervalSeries("band", false, true);
        int n = wl.length;
        int prev = -1;
        for (int i = 0; i < n; i++) {
            boolean good = !mask[i] && ivar[i] > 0;
            if (good) {
                double sigma = 1.0 / Math.sqrt(ivar[i]);
                s.add(new org.jfree.data.xy.YIntervalDataItem(wl[i], flux[i], flux[i] - sigma, flux[i] + sigma), false);
                prev = i;
                continue;
            }
            int next = i + 1;
            while (next < n && (mask[next] || !(ivar[next] > 0))) {
                next++;
            }
            double y;
            if (prev < 0 && next >= n) {
                return c;
            } else if (prev < 0) {
                y = flux[next];
            } else if (next >= n) {
                y = flux[prev];
            } else {
                y = flux[prev] + (flux[next] - flux[prev]) * (wl[i] - wl[prev]) / (wl[next] - wl[prev]);
            }
            s.add(new org.jfree.data.xy.YIntervalDataItem(wl[i], y, y, y), false);
        }
        c.addSeries(s);
        return c;
    }

    /** Wavelength intervals of masked pixels, from the midpoint before the run to the one after. */
    static List<double[]> maskedRuns(double[] wl, boolean[] mask) {
        List<double[]> runs = new ArrayList<>();
        int n = wl.length;
        int i = 0;
        while (i < n) {
            if (!mask[i]) {
                i++;
                continue;
            }
            int j = i;
            while (j + 1 < n && mask[j + 1]) {
                j++;
            }
            double from = i == 0 ? wl[0] : 0.5 * (wl[i - 1] + wl[i]);
            double to = j == n - 1 ? wl[n - 1] : 0.5 * (wl[j] + wl[j + 1]);
            runs.add(new double[] {from, to});
            i = j + 1;
        }
        return runs;
    }

    private static boolean hasMasked(boolean[] mask) {
        for (boolean b : mask) {
            if (b) {
                return true;
            }
        }
        return false;
    }

    /**
     * The flux range shown: from the 0.5th percentile of usable pixels less 8% of the 0.5-99.5
     * percentile span, up to the highest usable pixel but at most three spans above the 99.5th
     * percentile (strong emission lines stay in view, a lone cosmic ray does not flatten the
     * spectrum), plus 15% room for line labels. A spectrum with no usable pixel gives [0, 1].
     */
    static Range robustRange(double[] flux, boolean[] mask) {
        double[] v = new double[flux.length];
        int m = 0;
        for (int i = 0; i < flux.length; i++) {
            if (!mask[i] && Double.isFinite(flux[i])) {
                v[m++] = flux[i];
            }
        }
        if (m == 0) {
            return new Range(0, 1);
        }
        v = Arrays.copyOf(v, m);
        Arrays.sort(v);
        double lo = v[(int) Math.floor(0.005 * (m - 1))];
        double hi = v[(int) Math.ceil(0.995 * (m - 1))];
        double span = hi - lo;
        if (!(span > 0)) {
            span = Math.max(Math.abs(hi), 1.0);
        }
        double top = Math.min(v[m - 1], hi + 3 * span);
        top = Math.max(top, hi);
        return new Range(lo - 0.08 * span, top + 0.15 * (top - lo));
    }

    private static Range skyRange(double[] sky) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double s : sky) {
            if (Double.isFinite(s)) {
                lo = Math.min(lo, s);
                hi = Math.max(hi, s);
            }
        }
        if (!(hi > lo)) {
            return new Range(0, 1);
        }
        // the sky occupies the lower part of the plot, under the object's flux
        return new Range(lo, lo + 2.5 * (hi - lo));
    }

    private static int nearest(double[] wl, double w) {
        int i = Arrays.binarySearch(wl, w);
        if (i >= 0) {
            return i;
        }
        int ins = -i - 1;
        if (ins <= 0) {
            return 0;
        }
        if (ins >= wl.length) {
            return wl.length - 1;
        }
        return (w - wl[ins - 1] <= wl[ins] - w) ? ins - 1 : ins;
    }

    private static double localExtreme(double[] flux, boolean[] mask, int i, boolean max) {
        double best = Double.NaN;
        for (int k = Math.max(0, i - 3); k <= Math.min(flux.length - 1, i + 3); k++) {
            if (!mask[k]) {
                if (Double.isNaN(best) || (max ? flux[k] > best : flux[k] < best)) {
                    best = flux[k];
                }
            }
        }
        return Double.isNaN(best) ? flux[i] : best;
    }

    private static Shape triangle(boolean down) {
        GeneralPath p = new GeneralPath();
        float s = 5f;
        if (down) {
            p.moveTo(-s, -s);
            p.lineTo(s, -s);
            p.lineTo(0, s);
        } else {
            p.moveTo(-s, s);
            p.lineTo(s, s);
            p.lineTo(0, -s);
        }
        p.closePath();
        return p;
    }

    private static Shape line() {
        return new java.awt.geom.Line2D.Double(-7, 0, 7, 0);
    }
}
