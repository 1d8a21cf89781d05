package org.redward.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Stroke;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.text.NumberFormat;
import java.util.Locale;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.TickUnitSource;
import org.jfree.chart.axis.TickUnits;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;

/**
 * Redward's own look for every chart: colours, strokes and fonts, and tick labels formatted with
 * {@link Locale#ROOT} (never "3.800" for 3800 under a German default locale). Constants only;
 * thread-safe.
 */
public final class ChartStyle {

    /** Page background. */
    public static final Color BACKGROUND = new Color(0xFBFAF7);
    /** Plot area background. */
    public static final Color PLOT_BACKGROUND = Color.WHITE;
    /** Grid lines. */
    public static final Color GRID = new Color(0xE4E1DA);
    /** Axis lines, ticks and text. */
    public static final Color INK = new Color(0x2B2B33);
    /** The measured flux. */
    public static final Color FLUX = new Color(0x1F2A44);
    /** The 1-sigma band around the flux. */
    public static final Color ERROR_BAND = new Color(0x8FB8B0);
    /** Masked (bad) pixel regions. */
    public static final Color MASKED = new Color(0xC9C3B8);
    /** Sky spectrum. */
    public static final Color SKY = new Color(0xB58A3C);
    /** Rest-frame emission lines placed at z. */
    public static final Color EMISSION = new Color(0xC2452D);
    /** Rest-frame absorption lines placed at z. */
    public static final Color ABSORPTION = new Color(0x3A5BA0);
    /** Lines found in the spectrum. */
    public static final Color DETECTED = new Color(0x2E7D4F);
    /** The adopted solution on a score curve. */
    public static final Color ADOPTED = new Color(0xC2452D);
    /** Runner-up solutions on a score curve. */
    public static final Color RUNNER_UP = new Color(0x8A6BB0);
    /** Series colours in order (first, second, ...). */
    private static final Color[] SERIES = {
        new Color(0x1F2A44), new Color(0xD07A1F), new Color(0x3A8F8A), new Color(0x9C3D72),
        new Color(0x6B7F2A), new Color(0x5A6FB8), new Color(0x8C6A4F)
    };

    /** Regular text. */
    public static final Font TEXT = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    /** Axis labels. */
    public static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    /** Titles. */
    public static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 13);
    /** Small marker labels. */
    public static final Font SMALL = new Font(Font.SANS_SERIF, Font.PLAIN, 10);

    /** Thin line. */
    public static final Stroke THIN = new BasicStroke(1.0f);
    /** Dashed thin line. */
    public static final Stroke DASHED = new BasicStroke(1.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[] {4f, 3f}, 0f);
    /** Dotted thin line. */
    public static final Stroke DOTTED = new BasicStroke(1.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[] {1.5f, 2.5f}, 0f);

    private ChartStyle() {
    }

    /** The colour of the {@code index}-th series (cycling). */
    public static Paint series(int index) {
        return SERIES[Math.floorMod(index, SERIES.length)];
    }

    /** A colour with an alpha from 0 to 255. */
    public static Color withAlpha(Color c, int alpha) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), alpha);
    }

    /** A decimal format that ignores the default locale. */
    public static NumberFormat rootFormat(String pattern) {
        return new DecimalFormat(pattern, DecimalFormatSymbols.getInstance(Locale.ROOT));
    }

    /**
     * Tick units like JFreeChart's standard ones (1, 2, 5 times powers of ten) but formatted with
     * {@link Locale#ROOT}.
     */
    public static TickUnitSource rootTickUnits() {
        TickUnits units = new TickUnits();
        for (int exp = -8; exp <= 12; exp++) {
            double p = Math.pow(10, exp);
            String pattern;
            if (exp >= 6) {
                pattern = "0.###E0";
            } else if (exp >= 0) {
                pattern = "0";
            } else if (exp >= -4) {
                pattern = "0." + "0".repeat(-exp);
            } else {
                pattern = "0.##E0";
            }
            NumberFormat f = rootFormat(pattern);
            for (double m : new double[] {1, 2, 2.5, 5}) {
                if (m == 2.5 && exp <= 0) {
                    continue;
                }
                units.add(new NumberTickUnit(m * p, f, 5));
            }
        }
        return units;
    }

    /** Applies fonts, colours and locale-free tick labels to a number axis. */
    public static void styleAxis(ValueAxis axis) {
        axis.setLabelFont(LABEL);
        axis.setTickLabelFont(TEXT);
        axis.setLabelPaint(INK);
        axis.setTickLabelPaint(INK);
        axis.setAxisLinePaint(INK);
        axis.setTickMarkPaint(INK);
        if (axis instanceof NumberAxis n) {
            n.setStandardTickUnits(rootTickUnits());
            n.setAutoRangeIncludesZero(false);
        }
    }

    /** Applies the Redward look to an XY chart (all axes, plot, title, legend). */
    public static void apply(JFreeChart chart) {
        chart.setBackgroundPaint(BACKGROUND);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        TextTitle t = chart.getTitle();
        if (t != null) {
            t.setFont(TITLE);
            t.setPaint(INK);
            t.setPosition(RectangleEdge.TOP);
            t.setHorizontalAlignment(org.jfree.chart.ui.HorizontalAlignment.LEFT);
            t.setPadding(new RectangleInsets(4, 8, 2, 8));
        }
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setItemFont(TEXT);
            legend.setItemPaint(INK);
            legend.setBackgroundPaint(BACKGROUND);
            legend.setFrame(org.jfree.chart.block.BlockBorder.NONE);
            legend.setPosition(RectangleEdge.BOTTOM);
        }
        if (chart.getPlot() instanceof XYPlot plot) {
            plot.setBackgroundPaint(PLOT_BACKGROUND);
            plot.setOutlinePaint(INK);
            plot.setDomainGridlinePaint(GRID);
            plot.setRangeGridlinePaint(GRID);
            plot.setDomainGridlineStroke(THIN);
            plot.setRangeGridlineStroke(THIN);
            plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
            for (int i = 0; i < plot.getDomainAxisCount(); i++) {
                if (plot.getDomainAxis(i) != null) {
                    styleAxis(plot.getDomainAxis(i));
                }
            }
            for (int i = 0; i < plot.getRangeAxisCount(); i++) {
                if (plot.getRangeAxis(i) != null) {
                    styleAxis(plot.getRangeAxis(i));
                }
            }
        }
    }
}
