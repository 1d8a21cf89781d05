package org.redward.lines.internal;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.IdentifySettings;
import org.redward.api.lines.Identification;
import org.redward.api.lines.LineSearch;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.spectrum.Spectrum;

/** Bad input gives no lines and a clear statement, never an exception (invented spectra). */
class BadInputTest {

    private final MatchedFilterFinder finder = new MatchedFilterFinder();

    private static void noLines(LineSearch ls, String expected) {
        assertTrue(ls.lines().isEmpty(), "no lines expected, got " + ls.lines());
        assertFalse(ls.statements().isEmpty(), "a statement is expected");
        assertTrue(ls.statements().get(0).startsWith("no lines"), ls.statements().toString());
        assertTrue(ls.statements().get(0).contains(expected), ls.statements().toString());
    }

    private static void estimatorFails(Spectrum s) {
        RedshiftSolution sol = new LineRedshift().estimate(s, EstimationContext.defaults(), LineListFile.standard());
        assertFalse(sol.ok());
        assertTrue(sol.error().startsWith("no lines"), sol.error());
    }

    @Test
    void flatSpectrumWithErrors() {
        Spectrum s = Synthetic.spectrum(Synthetic.axis(4000, 2000), 5, new double[0][], 0, null, true);
        noLines(finder.find(s, FinderSettings.defaults()), "nothing reaches");
        estimatorFails(s);
    }

    @Test
    void flatSpectrumWithoutErrors() {
        Spectrum s = Synthetic.spectrum(Synthetic.axis(4000, 2000), 5, new double[0][], 0, null, false);
        noLines(finder.find(s, FinderSettings.defaults()), "does not scatter");
        estimatorFails(s);
    }

    @Test
    void pureNoise() {
        for (long seed = 1; seed <= 5; seed++) {
            Spectrum s = Synthetic.spectrum(Synthetic.axis(3800, 4000), 10, new double[0][], 1.0, new Random(seed), true);
            noLines(finder.find(s, FinderSettings.defaults()), "nothing reaches S/N 5.0");
            estimatorFails(s);
        }
    }

    @Test
    void everyPixelMasked() {
        var axis = Synthetic.axis(4000, 500);
        boolean[] mask = new boolean[500];
        Arrays.fill(mask, true);
        double[] f = new double[500];
        Arrays.fill(f, 3.0);
        Spectrum s = Spectrum.of(axis, f, null, mask, "", null);
        noLines(finder.find(s, FinderSettings.defaults()), "every pixel is masked");
        estimatorFails(s);
        // masked by the settings (an instrument profile's regions) rather than by the file
        Spectrum t = Synthetic.spectrum(axis, 10, new double[][] {{4500, 5, 200}}, 0.5, new Random(1), true);
        noLines(finder.find(t, FinderSettings.defaults().withMaskedRegions(List.of(new double[] {3000, 9000}))), "every pixel is masked");
    }

    @Test
    void maskedRegionHidesALine() {
        var axis = Synthetic.axis(4000, 1500);
        Spectrum t = Synthetic.spectrum(axis, 10, new double[][] {{4500, 5, 200}, {5000, 5, 200}}, 0.5, new Random(1), true);
        LineSearch all = finder.find(t, FinderSettings.defaults());
        LineSearch masked = finder.find(t, FinderSettings.defaults().withMaskedRegions(List.of(new double[] {4490, 4510})));
        assertTrue(all.lines().stream().anyMatch(d -> Math.abs(d.centreAngstrom() - 4500) < 1));
        assertFalse(masked.lines().stream().anyMatch(d -> Math.abs(d.centreAngstrom() - 4500) < 5), masked.lines().toString());
        assertTrue(masked.lines().stream().anyMatch(d -> Math.abs(d.centreAngstrom() - 5000) < 1));
    }

    @Test
    void shorterThanOneLineWidth() {
        Spectrum s = Synthetic.spectrum(Synthetic.axis(6500, 5), 10, new double[][] {{6502, 5, 300}}, 0.1, new Random(2), true);
        noLines(finder.find(s, FinderSettings.defaults()), "usable pixels");
        estimatorFails(s);
        Spectrum one = Synthetic.spectrum(Synthetic.axis(6500, 1), 10, new double[0][], 0.1, new Random(2), true);
        noLines(finder.find(one, FinderSettings.defaults()), "usable pixels");
    }

    @Test
    void nothingToIdentify() {
        Identification id = new PairVoteIdentifier().identify(List.of(), LineListFile.standard(), IdentifySettings.defaults(), 4000, 9000);
        assertTrue(id.best().isEmpty());
        assertFalse(id.warnings().isEmpty());
    }
}
