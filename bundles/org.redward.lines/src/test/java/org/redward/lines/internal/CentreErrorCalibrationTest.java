package org.redward.lines.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;
import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.LineSearch;
import org.redward.spectrum.SpectralAxis;

/**
 * Error calibration: for Gaussian noise of known variance, a fitted parameter lies within its
 * 1-sigma error of the truth 68.27% of the time (normal distribution; common practice). The whole
 * finder (continuum, detection, fit) runs on 2,000 invented noise realisations of one Gaussian line.
 */
class CentreErrorCalibrationTest {

    @Test
    void centreWithinItsOneSigmaErrorAbout68PercentOfTheTime() {
        SpectralAxis axis = Synthetic.axis(5000, 800);
        double centre = 5600.0;
        Random rnd = new Random(20261201L);
        MatchedFilterFinder finder = new MatchedFilterFinder();
        int trials = 2000;
        int inside = 0;
        int fluxInside = 0;
        int found = 0;
        double trueFlux = 0;
        for (int t = 0; t < trials; t++) {
            // peak 8 times the noise, FWHM 300 km/s (4.3 pixels): matched-filter S/N about 14
            var s = Synthetic.spectrum(axis, 10, new double[][] {{centre, 8.0, 300}}, 1.0, rnd, true);
            LineSearch ls = finder.find(s, FinderSettings.defaults());
            DetectedLine best = null;
            for (DetectedLine d : ls.lines()) {
                if (Math.abs(d.centreAngstrom() - centre) < 5 && (best == null || d.snr() > best.snr())) {
                    best = d;
                }
            }
            if (best == null) {
                continue;
            }
            found++;
            if (Math.abs(best.centreAngstrom() - centre) <= best.centreErrorAngstrom()) {
                inside++;
            }
            double sigmaA = 300 / Synthetic.C * centre / (2 * Math.sqrt(2 * Math.log(2)));
            trueFlux = 8.0 * sigmaA * Math.sqrt(2 * Math.PI);
            if (Math.abs(best.flux() - trueFlux) <= best.fluxError()) {
                fluxInside++;
            }
        }
        assertTrue(found >= trials * 0.999, "line found in " + found + " of " + trials);
        double frac = (double) inside / found;
        double fluxFrac = (double) fluxInside / found;
        System.out.printf("centre within 1 sigma: %.4f; flux within 1 sigma: %.4f (%d realisations)%n", frac, fluxFrac, found);
        assertEquals(0.6827, frac, 0.03, "fraction of centres within their 1-sigma error");
        assertEquals(0.6827, fluxFrac, 0.05, "fraction of fluxes within their 1-sigma error");
    }
}
