package org.redward.workbench.internal;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.util.function.DoubleConsumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.Range;

/**
 * An SWT canvas that draws a JFreeChart with Java2D into an off-screen image and copies its
 * pixels to the screen: screen and exported files come from the same chart model. The mouse
 * wheel zooms the x axis about the pointer (with Shift, the y axis); a left drag pans; a right
 * drag (or Ctrl + left drag) zooms to the box; a double click restores the full view; a plain
 * click reports the x value under the pointer. While dragging the chart is drawn without
 * anti-aliasing, and with it again when the button is released.
 *
 * <p>A chart can also be drawn ahead, off the UI thread ({@link #prepare}), while it is not yet
 * shown: the canvas then only turns the prepared pixels into an SWT image, so that moving to a
 * spectrum that was read ahead costs a copy, not a drawing.
 *
 * <p>UI thread only, like every SWT widget (except {@link #prepare}).
 */
final class ChartCanvas extends Canvas {

    private JFreeChart chart;
    private Range homeX;
    private Range homeY;
    private Image image;
    private boolean dirty = true;
    private ChartRenderingInfo info = new ChartRenderingInfo();
    private DoubleConsumer onClick = x -> { };
    private String emptyText = "";

    private int downX = -1;
    private int downY = -1;
    private int lastX;
    private int lastY;
    private boolean boxing;
    private boolean dragged;
    private boolean fast;
    /** Milliseconds spent in the last redraw of the chart into the image (Java2D plus copy). */
    private double lastDrawMillis;

    ChartCanvas(Composite parent) {
        super(parent, SWT.DOUBLE_BUFFERED | SWT.NO_BACKGROUND);
        addPaintListener(e -> paint(e.gc));
        addListener(SWT.Resize, e -> markDirty());
        addListener(SWT.Dispose, e -> {
            if (image != null) {
                image.dispose();
            }
        });
        addListener(SWT.MouseVerticalWheel, e -> {
            if (chart == null) {
                return;
            }
            double factor = e.count > 0 ? 0.8 : 1.25;
            zoomAt(e.x, e.y, factor, (e.stateMask & SWT.SHIFT) != 0);
        });
        addListener(SWT.MouseDown, e -> {
            if (chart == null) {
                return;
            }
            downX = lastX = e.x;
            downY = lastY = e.y;
            dragged = false;
            boxing = e.button == 3 || (e.button == 1 && (e.stateMask & SWT.CTRL) != 0);
        });
        addListener(SWT.MouseMove, e -> {
            if (downX < 0) {
                return;
            }
            if (Math.abs(e.x - downX) + Math.abs(e.y - downY) > 3) {
                dragged = true;
            }
            if (!dragged) {
                return;
            }
            if (boxing) {
                lastX = e.x;
                lastY = e.y;
                redraw();
            } else {
                pan(e.x - lastX, e.y - lastY);
                lastX = e.x;
                lastY = e.y;
            }
        });
        addListener(SWT.MouseUp, e -> {
            if (downX < 0) {
                return;
            }
            if (dragged && boxing) {
                zoomBox(downX, downY, e.x, e.y);
            } else if (!dragged && e.button == 1) {
                double x = xValueAt(e.x);
                if (Double.isFinite(x)) {
                    onClick.accept(x);
                }
            }
            downX = -1;
            boxing = false;
            if (fast) {
                fast = false;
                markDirty();
            }
        });
        addListener(SWT.MouseDoubleClick, e -> home());
    }

    /**
     * A chart drawn ahead at one size: its pixels (as SWT image data, which needs no display) and
     * the rendering info of that drawing (where the plot area is, for clicks and zooms).
     */
    record Prepared(JFreeChart chart, ImageData pixels, ChartRenderingInfo info, double drawMillis) {
    }

    /**
     * Draws a chart that no other thread touches into pixels of the given size. Any thread; the
     * chart must not be shown yet (JFreeChart is not thread-safe).
     */
    static Prepared prepare(JFreeChart c, int w, int h) {
        long t0 = System.nanoTime();
        ChartRenderingInfo inf = new ChartRenderingInfo();
        ImageData data = pixels(c, w, h, inf, false);
        return new Prepared(c, data, inf, (System.nanoTime() - t0) / 1e6);
    }

    /**
     * Shows a chart drawn ahead: if it was drawn at this canvas's size its pixels are shown as they
     * are, else it is drawn again. Its current ranges become "home".
     */
    void setChart(Prepared p) {
        setChart(p.chart(), "");
        Point size = getSize();
        if (p.pixels().width == size.x && p.pixels().height == size.y) {
            if (image != null) {
                image.dispose();
            }
            long t0 = System.nanoTime();
            image = new Image(getDisplay(), p.pixels());
            info = p.info();
            dirty = false;
            lastDrawMillis = (System.nanoTime() - t0) / 1e6;
            reusedPixels = true;
        }
    }

    /** True if the last chart shown was drawn ahead at the right size (its pixels were reused). */
    boolean reusedPixels() {
        return reusedPixels;
    }

    private boolean reusedPixels;

    /** Shows a chart (null: shows {@code emptyText} instead); its current ranges become "home". */
    void setChart(JFreeChart c, String textWhenEmpty) {
        reusedPixels = false;
        chart = c;
        emptyText = textWhenEmpty == null ? "" : textWhenEmpty;
        if (c != null) {
            XYPlot p = c.getXYPlot();
            homeX = p.getDomainAxis().getRange();
            homeY = p.getRangeAxis().getRange();
        }
        markDirty();
    }

    JFreeChart chart() { return chart; }

    /** True if the view is not the chart's full ("home") range. */
    boolean zoomed() {
        if (chart == null) {
            return false;
        }
        XYPlot p = chart.getXYPlot();
        return !p.getDomainAxis().getRange().equals(homeX) || !p.getRangeAxis().getRange().equals(homeY);
    }

    /** Called with the x value (data units) of a plain left click inside the plot. */
    void onClick(DoubleConsumer c) {
        onClick = c;
    }

    /** Redraws the chart (after its model changed). */
    void markDirty() {
        dirty = true;
        redraw();
    }

    /** Redraws the chart now (synchronously) and returns the milliseconds it took. */
    double drawNow() {
        dirty = true;
        redraw();
        update();
        return lastDrawMillis;
    }

    double lastDrawMillis() { return lastDrawMillis; }

    void home() {
        if (chart == null) {
            return;
        }
        XYPlot p = chart.getXYPlot();
        p.getDomainAxis().setRange(homeX);
        p.getRangeAxis().setRange(homeY);
        markDirty();
    }

    /** Shows only this x range (e.g. around a line). */
    void showX(double from, double to) {
        if (chart != null && to > from) {
            chart.getXYPlot().getDomainAxis().setRange(from, to);
            markDirty();
        }
    }

    private void paint(GC gc) {
        Point size = getSize();
        if (size.x <= 0 || size.y <= 0) {
            return;
        }
        if (chart == null) {
            gc.setBackground(getDisplay().getSystemColor(SWT.COLOR_WHITE));
            gc.fillRectangle(0, 0, size.x, size.y);
            gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
            gc.drawText(emptyText, 12, 12, true);
            return;
        }
        if (dirty || image == null || image.getBounds().width != size.x || image.getBounds().height != size.y) {
            render(size.x, size.y);
        }
        gc.drawImage(image, 0, 0);
        if (downX >= 0 && boxing && dragged) {
            gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_DARK_BLUE));
            gc.setLineStyle(SWT.LINE_DASH);
            gc.drawRectangle(Math.min(downX, lastX), Math.min(downY, lastY), Math.abs(lastX - downX), Math.abs(lastY - downY));
        }
    }

    private void render(int w, int h) {
        long t0 = System.nanoTime();
        ImageData data = pixels(chart, w, h, info, fast);
        if (image != null) {
            image.dispose();
        }
        image = new Image(getDisplay(), data);
        dirty = false;
        lastDrawMillis = (System.nanoTime() - t0) / 1e6;
    }

    /** Draws the chart with Java2D and returns the pixels as SWT image data (no display needed). */
    private static ImageData pixels(JFreeChart chart, int w, int h, ChartRenderingInfo info, boolean fast) {
        boolean aa = chart.getAntiAlias();
        if (fast) {
            chart.setAntiAlias(false);
        }
        BufferedImage bi = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = bi.createGraphics();
        try {
            chart.draw(g, new Rectangle2D.Double(0, 0, w, h), info);
        } finally {
            g.dispose();
            chart.setAntiAlias(aa);
        }
        int[] px = ((DataBufferInt) bi.getRaster().getDataBuffer()).getData();
        // 0x00RRGGBB ints written big-endian are the bytes of a 32-bit direct SWT image (MSB first)
        byte[] bytes = new byte[w * h * 4];
        java.nio.ByteBuffer.wrap(bytes).asIntBuffer().put(px);
        return new ImageData(w, h, 32, new PaletteData(0xFF0000, 0xFF00, 0xFF), 4, bytes);
    }

    private Rectangle2D dataArea() {
        return info.getPlotInfo().getDataArea();
    }

    /** The x value (data units) at a pixel column, NaN outside the plot. */
    double xValueAt(int px) {
        if (chart == null || dataArea() == null || !dataArea().contains(px, dataArea().getCenterY())) {
            return Double.NaN;
        }
        XYPlot p = chart.getXYPlot();
        return p.getDomainAxis().java2DToValue(px, dataArea(), p.getDomainAxisEdge());
    }

    /** The pixel column of an x value (data units). */
    int pixelOfX(double x) {
        XYPlot p = chart.getXYPlot();
        return (int) Math.round(p.getDomainAxis().valueToJava2D(x, dataArea(), p.getDomainAxisEdge()));
    }

    private void zoomAt(int px, int py, double factor, boolean yAxis) {
        XYPlot p = chart.getXYPlot();
        Rectangle2D area = dataArea();
        if (area == null) {
            return;
        }
        ValueAxis axis = yAxis ? p.getRangeAxis() : p.getDomainAxis();
        RectangleEdge edge = yAxis ? p.getRangeAxisEdge() : p.getDomainAxisEdge();
        double anchor = axis.java2DToValue(yAxis ? py : px, area, edge);
        Range r = axis.getRange();
        double lo = anchor - (anchor - r.getLowerBound()) * factor;
        double hi = anchor + (r.getUpperBound() - anchor) * factor;
        if (hi > lo) {
            axis.setRange(lo, hi);
        }
        markDirty();
    }

    private void pan(int dx, int dy) {
        XYPlot p = chart.getXYPlot();
        Rectangle2D area = dataArea();
        if (area == null || area.getWidth() <= 0 || area.getHeight() <= 0) {
            return;
        }
        fast = true;
        ValueAxis x = p.getDomainAxis();
        ValueAxis y = p.getRangeAxis();
        double sx = x.getRange().getLength() / area.getWidth();
        double sy = y.getRange().getLength() / area.getHeight();
        x.setRange(x.getLowerBound() - dx * sx, x.getUpperBound() - dx * sx);
        y.setRange(y.getLowerBound() + dy * sy, y.getUpperBound() + dy * sy);
        markDirty();
    }

    private void zoomBox(int x0, int y0, int x1, int y1) {
        XYPlot p = chart.getXYPlot();
        Rectangle2D area = dataArea();
        if (area == null || Math.abs(x1 - x0) < 4 || Math.abs(y1 - y0) < 4) {
            return;
        }
        ValueAxis x = p.getDomainAxis();
        ValueAxis y = p.getRangeAxis();
        double a = x.java2DToValue(Math.min(x0, x1), area, p.getDomainAxisEdge());
        double b = x.java2DToValue(Math.max(x0, x1), area, p.getDomainAxisEdge());
        double c = y.java2DToValue(Math.max(y0, y1), area, p.getRangeAxisEdge());
        double d = y.java2DToValue(Math.min(y0, y1), area, p.getRangeAxisEdge());
        x.setRange(Math.min(a, b), Math.max(a, b));
        y.setRange(Math.min(c, d), Math.max(c, d));
        markDirty();
    }
}
