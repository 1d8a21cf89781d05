package org.redward.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.ui.Layer;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.redward.spectrum.Medium;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;

/** Headless chart building and export. The spectra here are invented (a toy continuum with lines). */
class ChartsTest {

    private static final Path OUT = Path.of("target", "charts-test");
    private final Locale saved = Locale.getDefault();

    @AfterEach
    void restoreLocale() {
        Locale.setDefault(saved);
    }

    /** Rest lines used below: vacuum wavelengths as in the usual NIST values (from memory). */
    static final List<RestLine> LINES = List.of(
            new RestLine("[O II]", 3728.48, RestLine.Kind.EMISSION),
            new RestLine("Ca K", 3934.777, RestLine.Kind.ABSORPTION),
            new RestLine("Ca H", 3969.591, RestLine.Kind.ABSORPTION),
            new RestLine("Hβ", 4862.683, RestLine.Kind.BOTH),
            new RestLine("[O III]", 5008.240, RestLine.Kind.EMISSION),
            new RestLine("Mg b", 5176.7, RestLine.Kind.ABSORPTION),
            new RestLine("Na D", 5895.6, RestLine.Kind.ABSORPTION),
            new RestLine("Hα", 6564.614, RestLine.Kind.EMISSION));

    /** An invented log-lambda spectrum at z = 0.1 with Hα and [O III] in emission, a masked run and noise. */
    static Spectrum toySpectrum(int pixels) {
        SpectralAxis axis = SpectralAxis.logLinear(Math.log10(3800), 1e-4, pixels, Medium.VACUUM);
        double[] wl = axis.vacuumAngstrom();
        double[] f = new double[pixels];
        double[] iv = new double[pixels];
        boolean[] m = new boolean[pixels];
        java.util.Random rnd = new java.util.Random(7);
        for (int i = 0; i < pixels; i++) {
            double cont = 10 + 3 * Math.sin(wl[i] / 900);
            double line = 40 * Math.exp(-0.5 * Math.pow((wl[i] - 6564.614 * 1.1) / 4, 2))
                    + 25 * Math.exp(-0.5 * Math.pow((wl[i] - 5008.240 * 1.1) / 4, 2));
            double sigma = 1.0 + 0.3 * Math.cos(wl[i] / 300);
            f[i] = cont + line + sigma * rnd.nextGaussian();
            iv[i] = 1 / (sigma * sigma);
            m[i] = i >= 1200 && i < 1230;
        }
        return Spectrum.of(axis, f, iv, m, "1e-17 erg/s/cm2/Å", SpectrumMetadata.builder().objectId("toy-1").build());
    }

    @Test
    void restLinesAreDrawnAtOnePlusZTimesRest() {
        // observed = rest * (1 + z): the definition of z (common practice)
        assertEquals(7221.0754, new RestLine("Hα", 6564.614, RestLine.Kind.EMISSION).observedAngstrom(0.1), 1e-9);
        JFreeChart chart = SpectrumChart.of(toySpectrum(4000)).restLines(LINES, 0.1).build();
        List<RestLine> drawn = SpectrumChart.drawnRestLines(chart);
        // the toy spectrum covers 3800..9565 A: at z=0.1 [O II] (4101 A) to Hα (7221 A) all fall inside
        assertEquals(LINES.size(), drawn.size());
        for (Object o : chart.getXYPlot().getDomainMarkers(Layer.FOREGROUND)) {
            ValueMarker vm = (ValueMarker) o;
            RestLine l = LINES.stream().filter(x -> x.name().equals(vm.getLabel())).findFirst().orElseThrow();
            assertEquals(l.restVacuumAngstrom() * 1.1, vm.getValue(), 1e-9);
        }
        // moving to z = 0.5 keeps only the lines that still fall inside the spectrum
        SpectrumChart.placeRestLines(chart, LINES, 0.5);
        for (RestLine l : SpectrumChart.drawnRestLines(chart)) {
            assertTrue(l.restVacuumAngstrom() * 1.5 <= 9565.0, l.name());
        }
        assertFalse(SpectrumChart.drawnRestLines(chart).stream().anyMatch(l -> l.name().equals("Hα")));
    }

    @Test
    void restLinesAreVisibleWithoutFoundLines() {
        // regression: markers are drawn through a dataset's renderer, so one must exist even with no found lines
        int with = reddish(SpectrumChart.of(toySpectrum(4000)).restLines(LINES, 0.1).build());
        int without = reddish(SpectrumChart.of(toySpectrum(4000)).restLines(LINES, Double.NaN).build());
        assertTrue(with > without + 100, "emission-line markers drawn: " + with + " reddish pixels against " + without);
    }

    private static int reddish(JFreeChart chart) {
        BufferedImage img = ChartExport.render(chart, 1000, 400);
        int reddish = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y);
                int r = (rgb >> 16) & 0xff;
                int g = (rgb >> 8) & 0xff;
                int b = rgb & 0xff;
                if (r > 170 && g < 140 && b < 130) {
                    reddish++;
                }
            }
        }
        return reddish;
    }

    @Test
    void maskedRunsSpanPixelMidpoints() {
        double[] wl = {1, 2, 3, 4, 5, 6};
        boolean[] m = {true, false, true, true, false, true};
        List<double[]> runs = SpectrumChart.maskedRuns(wl, m);
        assertEquals(3, runs.size());
        assertEquals(1.0, runs.get(0)[0]);
        assertEquals(1.5, runs.get(0)[1]);
        assertEquals(2.5, runs.get(1)[0]);
        assertEquals(4.5, runs.get(1)[1]);
        assertEquals(5.5, runs.get(2)[0]);
        assertEquals(6.0, runs.get(2)[1]);
    }

    @Test
    void exportsPngSvgPdfHeadlessAndTickLabelsIgnoreLocale() throws Exception {
        Locale.setDefault(Locale.GERMANY);
        Spectrum s = toySpectrum(4000);
        double[] wl = s.axis().vacuumAngstrom();
        double[] sky = new double[wl.length];
        for (int i = 0; i < sky.length; i++) {
            sky[i] = 2 + (i % 400 == 0 ? 30 : 0);
        }
        JFreeChart chart = SpectrumChart.of(s).title("toy-1 (invented)").sky(wl, sky).restLines(LINES, 0.1)
                .foundLines(List.of(new FoundLine(7221.1, "Hα", 30, true), new FoundLine(5509.1, "[O III]", 18, true)))
                .build();
        Files.createDirectories(OUT);
        for (String ext : new String[] {"png", "svg", "pdf"}) {
            Path f = OUT.resolve("spectrum." + ext);
            ChartExport.write(chart, f, 1100, 500);
            assertTrue(Files.size(f) > 1000, f.toString());
        }
        String svg = Files.readString(OUT.resolve("spectrum.svg"), StandardCharsets.UTF_8);
        assertTrue(svg.contains(">5000<"), "tick label 5000 written without grouping");
        assertFalse(svg.contains(">5.000<"), "no German grouping in tick labels");
        assertTrue(svg.contains("Å"));
        byte[] pdf = Files.readAllBytes(OUT.resolve("spectrum.pdf"));
        assertEquals("%PDF", new String(pdf, 0, 4, StandardCharsets.US_ASCII));
        BufferedImage img = ChartExport.render(chart, 400, 200);
        assertTrue(distinctColours(img) > 10, "the image is not blank");
    }

    @Test
    void scoreHistogramAndScatterBuildAndExport() throws Exception {
        double[] z = new double[500];
        double[] chi2 = new double[500];
        double[] r = new double[500];
        for (int i = 0; i < z.length; i++) {
            z[i] = i * 0.002;
            chi2[i] = 5000 - 1500 * Math.exp(-0.5 * Math.pow((z[i] - 0.1) / 0.003, 2)) - 700 * Math.exp(-0.5 * Math.pow((z[i] - 0.35) / 0.003, 2));
            r[i] = 0.2 * Math.sin(z[i] * 40) + 3 * Math.exp(-0.5 * Math.pow((z[i] - 0.1) / 0.004, 2));
        }
        JFreeChart score = ScoreChart.create().title("score against z").curve("A", z, chi2, "chi2", true, new double[] {0.1, 0.35})
                .curve("B", z, r, "r", false, new double[] {0.1}).current(0.1).build();
        ChartExport.write(score, OUT.resolve("score.png"), 900, 350);
        assertTrue(score.getXYPlot().getRangeAxis(0).isInverted(), "chi2 axis is flipped so that solutions are peaks");
        assertFalse(score.getXYPlot().getRangeAxis(1).isInverted());

        JFreeChart hist = HistogramChart.create().xLabel("Δv (km/s)").bins(20, -200, 200)
                .sample("toy", new double[] {-10, 5, 20, 30, Double.NaN, 150}).build();
        ChartExport.write(hist, OUT.resolve("hist.svg"), 600, 400);
        assertTrue(hist.getXYPlot().getDataset().getSeriesKey(0).toString().contains("1 without value"));

        JFreeChart sc = ScatterChart.create().axes("z", "distance (Mpc)").logAxes(false, false)
                .points("toy", new double[] {0.01, 0.02, 0.05}, new double[] {43, 85, 215}, null, new double[] {3, 5, 10})
                .curve("v = H0 d, H0 = 70", zz -> 299792.458 * zz / 70, 0, 0.06).identityLine(false).build();
        ChartExport.write(sc, OUT.resolve("scatter.pdf"), 600, 400);
        assertEquals(2, sc.getXYPlot().getDatasetCount());
    }

    private static int distinctColours(BufferedImage img) {
        java.util.Set<Integer> c = new java.util.HashSet<>();
        for (int y = 0; y < img.getHeight(); y += 3) {
            for (int x = 0; x < img.getWidth(); x += 3) {
                c.add(img.getRGB(x, y));
            }
        }
        return c.size();
    }
}
