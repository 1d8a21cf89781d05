package org.redward.lines.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.IdentifySettings;
import org.redward.api.lines.Identification;
import org.redward.api.lines.LineKind;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineMatch;
import org.redward.api.lines.LineSearch;
import org.redward.api.lines.RedshiftHypothesis;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.spectrum.ObjectClass;
import org.redward.spectrum.Spectrum;

class IdentificationTest {

    private final LineList list = LineListFile.standard();
    private final PairVoteIdentifier identifier = new PairVoteIdentifier();

    private static DetectedLine emission(double centre, double snr) {
        return new DetectedLine(LineKind.EMISSION, centre, 0.1, 200, 10, 100, 100 / snr, 10, 10 / snr, snr, snr, 10, -1);
    }

    /**
     * H-beta observed at 6680 A implies z = 6680 / 4862.683 - 1 = 0.37373, i.e. 0.374 to three
     * decimals (common practice arithmetic; rest wavelength 4862.683 A vacuum, NIST ASD value as
     * tabulated in REFERENCES.md section 2). A lone line must not be silently identified: H-beta is
     * one candidate among several, each with its z.
     */
    @Test
    void hBetaAt6680ImpliesZ0374AmongTheCandidates() {
        Identification id = identifier.identify(List.of(emission(6680.0, 20)), list, IdentifySettings.defaults(), 3800, 9200);
        assertTrue(id.singleLine());
        LineMatch hb = id.singleLineCandidates().stream().filter(m -> m.line().name().equals("H-beta")).findFirst()
                .orElseThrow(() -> new AssertionError("H-beta is not among the candidates"));
        assertEquals(0.374, hb.z(), 0.0005);
        assertEquals(6680.0 / 4862.683 - 1.0, hb.z(), 1e-12);
        assertTrue(id.singleLineCandidates().size() >= 5, "several identities are possible for one line");
        assertTrue(id.warnings().stream().anyMatch(w -> w.contains("single line") && w.contains("ambiguous")), id.warnings().toString());
    }

    /** A known z labels the lines: H-beta and [O III] at z = 0.374. */
    @Test
    void aGivenRedshiftLabelsTheLines() {
        double z = 0.374;
        List<DetectedLine> d = List.of(emission(4862.683 * (1 + z), 10), emission(5008.240 * (1 + z), 30));
        Identification id = identifier.identify(d, list, IdentifySettings.defaults().withFixedZ(z), 3800, 9200);
        RedshiftHypothesis h = id.best().orElseThrow();
        assertEquals(z, h.z(), 0);
        assertEquals("H-beta", h.matchOf(0).line().name());
        assertEquals("[O III] 5008", h.matchOf(1).line().name());
    }

    /** Pairs vote: H-beta, [O III] 4960 and 5008 at z = 0.2 give z = 0.2 with all three matched, and no ambiguity. */
    @Test
    void pairsOfLinesAgreeOnOneRedshift() {
        double z = 0.2;
        List<DetectedLine> d = List.of(emission(4862.683 * (1 + z), 10), emission(4960.295 * (1 + z), 10),
                emission(5008.240 * (1 + z), 30), emission(7777.0, 6));
        Identification id = identifier.identify(d, list, IdentifySettings.defaults(), 3800, 9200);
        RedshiftHypothesis h = id.best().orElseThrow();
        assertEquals(z, h.z(), 2e-5);
        assertEquals(3, h.matchedCount());
        assertFalse(id.singleLine());
    }

    /** The estimator on an invented one-line spectrum warns and lists the candidate identities as alternatives. */
    @Test
    void estimatorWarnsWhenOneLineCarriesTheRedshift() {
        Spectrum s = Synthetic.spectrum(Synthetic.axis(3800, 3800), 10, new double[][] {{6680, 8, 250}}, 0.5, new Random(3), true);
        RedshiftSolution sol = new LineRedshift().estimate(s, EstimationContext.defaults(), list);
        assertTrue(sol.ok(), sol.error());
        assertTrue(sol.warnings().stream().anyMatch(w -> w.contains("single line")), sol.warnings().toString());
        assertTrue(sol.alternatives().size() >= 5, "candidate identities as alternatives");
        List<Double> zs = new ArrayList<>();
        sol.alternatives().forEach(a -> zs.add(a.z()));
        assertTrue(zs.stream().anyMatch(z -> Math.abs(z - 0.3737) < 0.0005), "H-beta's z is offered: " + zs);
    }

    /**
     * Invented H-alpha + [N II] blend at z = 0.05 (FWHM 450 km/s, so the three overlap): fitted
     * together, the [N II] flux ratio recovered within 3 sigma of the input 2.94, z recovered.
     */
    @Test
    void aBlendIsFittedTogetherAndIdentified() {
        double z = 0.05;
        double[][] lines = {
                {6549.86 * (1 + z), 10.0 / 2.94, 450}, {6564.614 * (1 + z), 30, 450}, {6585.27 * (1 + z), 10, 450},
                {4862.683 * (1 + z), 10, 180}, {5008.240 * (1 + z), 12, 180}, {4960.295 * (1 + z), 4, 180}};
        Spectrum s = Synthetic.spectrum(Synthetic.axis(3800, 3800), 20, lines, 0.4, new Random(5), true);
        LineSearch ls = new MatchedFilterFinder().find(s, FinderSettings.defaults());
        assertEquals(6, ls.lines().size(), ls.lines().toString());
        DetectedLine n2a = ls.lines().get(3);
        DetectedLine ha = ls.lines().get(4);
        DetectedLine n2b = ls.lines().get(5);
        assertTrue(ha.blended() && n2a.blended() && n2b.blended() && ha.blend() == n2b.blend(), "fitted as one blend");
        assertEquals(2.94, n2b.flux() / n2a.flux(), 3 * 2.94 * Math.hypot(n2a.fluxError() / n2a.flux(), n2b.fluxError() / n2b.flux()));
        assertEquals(6564.614 * (1 + z), ha.centreAngstrom(), 4 * ha.centreErrorAngstrom());
        RedshiftSolution sol = new LineRedshift().estimate(s, EstimationContext.defaults(), list);
        assertEquals(z, sol.z(), 3e-5);
        assertEquals(ObjectClass.GALAXY, sol.objectClass());
        assertEquals(6.0, sol.diagnostics().get("lines_matched"));
    }
}
