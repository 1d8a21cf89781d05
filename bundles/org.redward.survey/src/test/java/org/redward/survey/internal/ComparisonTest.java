package org.redward.survey.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.junit.jupiter.api.Test;
import org.redward.api.commands.Json;
import org.redward.api.survey.MeasuredRow;

/** The comparison's figures against formulas and a general-purpose library (invented rows). */
class ComparisonTest {

    @Test
    void velocityDifferenceIsTheRestFrameOne() {
        // dv = c (zB - zA) / (1 + zA), c = 299792.458 km/s (exact, SI definition); common practice
        assertEquals(299792.458 * 0.0001 / 1.1, Comparison.dvKmPerS(0.1, 0.1001), 1e-9);
        assertEquals(27.2538598, Comparison.dvKmPerS(0.1, 0.1001), 1e-6);
        assertEquals(0.0, Comparison.dvKmPerS(2.0, 2.0), 0.0);
    }

    @Test
    void agreementIsWithinTheCombinedThreeSigma() {
        // 3 sqrt(0.0003^2 + 0.0004^2) = 0.0015
        assertTrue(Comparison.agree(0.5, 0.0003, 0.5015, 0.0004));
        assertFalse(Comparison.agree(0.5, 0.0003, 0.50151, 0.0004));
        assertNull(Comparison.agree(0.5, Double.NaN, 0.5, 0.0004), "undecided without an error");
    }

    @Test
    void robustSigmaIsTheNormalConsistentMad() {
        // 1.4826 = 1 / Phi^-1(3/4) (normal consistency of the MAD; Rousseeuw & Croux 1993, JASA 88, 1273),
        // checked against Apache Commons Math's normal quantile
        assertEquals(1.0 / new NormalDistribution().inverseCumulativeProbability(0.75), 1.4826, 5e-5);
        DescriptiveStatistics d = new DescriptiveStatistics(new double[] {1, 2, 3, 4, 5});
        assertEquals(1.4826, Comparison.robustSigma(d, 3.0), 1e-12, "deviations 2,1,0,1,2 have median 1");
    }

    private static MeasuredRow row(long seq, boolean ok, double z, double err, String grade) {
        MeasuredRow.Builder b = MeasuredRow.builder().sequence(seq).source("field.fits", (int) seq, "").id("OBJ-" + seq);
        return ok ? b.z(z, err).objectClass("galaxy", "").grade(grade, Double.NaN).build() : b.failed("no lines").build();
    }

    @Test
    void summaryCountsAgreementCatastrophesAndGrades() {
        Comparison c = new Comparison(List.of("a", "b"), 1000);
        c.add(List.of(row(0, true, 0.1, 0.0001, "sure"), row(0, true, 0.1001, 0.0001, "sure")));
        c.add(List.of(row(1, true, 0.2, 0.0001, "sure"), row(1, true, 0.8, 0.0001, "maybe")));
        c.add(List.of(row(2, true, 0.3, 0.0001, "maybe"), row(2, false, 0, 0, "")));
        Json s = c.summary(Map.of());
        @SuppressWarnings("unchecked")
        Map<String, Object> p = ((Json) ((List<Object>) s.fields().get("pairs")).get(0)).fields();
        assertEquals(2L, p.get("both_ok"));
        assertEquals(1L, p.get("agree_3sigma"));
        assertEquals(1L, p.get("disagree_3sigma"));
        assertEquals(1L, p.get("catastrophic"));
        @SuppressWarnings("unchecked")
        Map<String, Map<String, Long>> grades = (Map<String, Map<String, Long>>) p.get("grades");
        assertEquals(1L, grades.get("maybe").get("failed"));
        assertEquals(1L, grades.get("sure").get("maybe"));
        Object[] cells = c.cells(List.of(row(1, true, 0.2, 0.0001, "sure"), row(1, true, 0.8, 0.0001, "maybe")));
        assertEquals("no", cells[cells.length - 2]);
        assertEquals(Boolean.TRUE, cells[cells.length - 1]);
    }
}
