package org.redward.lines.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.IdentifySettings;
import org.redward.api.lines.Identification;
import org.redward.api.lines.LineMatch;
import org.redward.api.lines.LineSearch;
import org.redward.api.lines.RedshiftHypothesis;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.spectrum.Spectrum;

/**
 * Line-based redshifts of real spectra against their published redshifts (../shared/realdata,
 * truth.tsv; sources: SDSS public data releases (spec files), LAMOST DR1, and for 3C433.fits the
 * table of the repository that published it). Only wavelength, flux and inverse variance are read.
 * Tolerances: 100 km/s for narrow-line galaxies and stars; 300 km/s for the broad-line quasar
 * (its README: narrow lines may sit a few hundred km/s from the published value); 0.001 in z for
 * 3C433 (README).
 */
class RealDataTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource({
            "spec-0266-51630-0168.fits, 100",
            "spec-0268-51633-0251.fits, 100",
            "spec-1068-52614-0006.fits, 100",
            "KUG_0028+000.fits, 100",
            "spec-0267-51608-0413.fits, 100",
            "spec-2114-53848-0443.fits, 300",
            "spec-55862-B6212_sp06-093.fits, 100",
            "spec-55862-B6212_sp06-114.fits, 100",
    })
    void lineRedshiftMatchesThePublishedOne(String file, double toleranceKmPerS) throws Exception {
        Map<String, Double> truth = RealSpectra.publishedZ();
        Spectrum s = RealSpectra.read(file);
        RedshiftSolution sol = new LineRedshift().estimate(s, EstimationContext.defaults(), LineListFile.standard());
        assertTrue(sol.ok(), file + ": " + sol.error());
        double z = truth.get(file);
        double dv = Synthetic.C * (sol.z() - z) / (1 + z);
        System.out.printf("%-32s z=%.5f +- %.5f published %.5f: %+.0f km/s, %d lines matched, class %s%n", file, sol.z(), sol.zError(), z,
                dv, sol.diagnostics().get("lines_matched").intValue(), sol.objectClass().key());
        assertEquals(0, dv, toleranceKmPerS, file + ": line-based z " + sol.z() + " against published " + z);
        assertTrue(sol.diagnostics().get("lines_matched") >= 3, "several lines agree");
    }

    /** The long-slit radio-galaxy spectrum (air wavelengths, no errors): z within 0.001 of 0.1026 (README). */
    @Test
    void radioGalaxyWithoutErrors() throws Exception {
        Spectrum s = RealSpectra.read("3C433.fits");
        RedshiftSolution sol = new LineRedshift().estimate(s, EstimationContext.defaults(), LineListFile.standard());
        assertTrue(sol.ok(), sol.error());
        assertEquals(0.1026, sol.z(), 0.001);
    }

    /** spec-0266-51630-0168: H-alpha sits near 7007 A and is identified as such, with [N II] and [S II] beside it. */
    @Test
    void hAlphaNear7007IsIdentified() throws Exception {
        Spectrum s = RealSpectra.read("spec-0266-51630-0168.fits");
        LineSearch ls = new MatchedFilterFinder().find(s, FinderSettings.defaults());
        Identification id = new PairVoteIdentifier().identify(ls.lines(), LineListFile.standard(), IdentifySettings.defaults(),
                s.axis().minVacuumAngstrom(), s.axis().maxVacuumAngstrom());
        RedshiftHypothesis best = id.best().orElseThrow();
        boolean ha = false;
        int n2 = 0;
        for (int i = 0; i < ls.lines().size(); i++) {
            DetectedLine d = ls.lines().get(i);
            LineMatch m = best.matchOf(i);
            if (m == null) {
                continue;
            }
            if (m.line().name().equals("H-alpha")) {
                assertEquals(7007, d.centreAngstrom(), 3);
                ha = true;
            }
            if (m.line().group().equals("[N II]") || m.line().group().equals("[S II]")) {
                n2++;
            }
        }
        assertTrue(ha, "H-alpha identified");
        assertTrue(n2 >= 3, "[N II] and [S II] identified: " + n2);
    }
}
