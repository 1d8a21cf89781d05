package org.redward.charts;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import javax.imageio.ImageIO;

import org.jfree.chart.JFreeChart;
import org.jfree.pdf.PDFDocument;
import org.jfree.pdf.PDFGraphics2D;
import org.jfree.pdf.PDFHints;
import org.jfree.pdf.Page;
import org.jfree.svg.SVGGraphics2D;

/**
 * Writes charts as PNG (Java2D raster), SVG (JFreeSVG) or PDF (JFreePDF) without a display
 * ({@code java.awt.headless=true} is enough; text needs fonts installed). PDF text is drawn as
 * vector shapes so that Greek letters and the Angstrom sign survive; SVG strokes keep their hairline
 * width in every viewer.
 *
 * <p>Thread-safe as far as the chart is: do not export a chart that another thread is changing.
 */
public final class ChartExport {

    /** Output formats, chosen from a file's extension. */
    public enum Format {
        PNG, SVG, PDF;

        /** The format for a file name's extension ({@code .png}, {@code .svg}, {@code .pdf}). */
        public static Format forFile(Path file) {
            String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
            if (name.endsWith(".png")) {
                return PNG;
            }
            if (name.endsWith(".svg")) {
                return SVG;
            }
            if (name.endsWith(".pdf")) {
                return PDF;
            }
            throw new IllegalArgumentException("chart file " + file.getFileName()
                    + ": unknown extension (use .png, .svg or .pdf)");
        }
    }

    private ChartExport() {
    }

    /** Draws the chart into a new ARGB image of {@code width} x {@code height} pixels. */
    public static BufferedImage render(JFreeChart chart, int width, int height) {
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        } finally {
            g.dispose();
        }
        return image;
    }

    /** PNG bytes of the chart. */
    public static byte[] png(JFreeChart chart, int width, int height) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ImageIO.write(render(chart, width, height), "png", out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }

    /** SVG text of the chart ({@code width} x {@code height} user units). */
    public static String svg(JFreeChart chart, int width, int height) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setCheckStrokeControlHint(false);
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        return g.getSVGDocument();
    }

    /** A one-page PDF of the chart ({@code width} x {@code height} points). */
    public static byte[] pdf(JFreeChart chart, int width, int height) {
        PDFDocument doc = new PDFDocument();
        doc.setTitle(chart.getTitle() == null ? "Redward chart" : chart.getTitle().getText());
        doc.setAuthor("Redward");
        Page page = doc.createPage(new Rectangle2D.Double(0, 0, width, height));
        PDFGraphics2D g = page.getGraphics2D();
        g.setRenderingHint(PDFHints.KEY_DRAW_STRING_TYPE, PDFHints.VALUE_DRAW_STRING_TYPE_VECTOR);
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        return doc.getPDFBytes();
    }

    /**
     * Writes the chart to a file whose extension names the format.
     *
     * @throws IllegalArgumentException for an unknown extension
     * @throws IOException if the file cannot be written
     */
    public static void write(JFreeChart chart, Path file, int width, int height) throws IOException {
        byte[] bytes = switch (Format.forFile(file)) {
            case PNG -> png(chart, width, height);
            case SVG -> svg(chart, width, height).getBytes(StandardCharsets.UTF_8);
            case PDF -> pdf(chart, width, height);
        };
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        Files.write(file, bytes);
    }
}
