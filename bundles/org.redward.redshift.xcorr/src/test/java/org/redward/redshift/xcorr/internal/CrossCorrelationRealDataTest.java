package org.redward.redshift.xcorr.internal;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.redward.api.redshift.EstimationContext;
import org.redward.templates.standard.internal.StandardTemplateSet;
import org.redward.testkit.RealDataScore;

/**
 * The xcorr estimator with the standard template set on the 12 real spectra of
 * ../shared/realdata (SDSS and LAMOST DR1 public data; published redshifts from truth.tsv;
 * tolerances 300 km/s galaxies, 100 km/s stars, 1,000 km/s broad-line quasars, 0.001 for the
 * long-slit spectrum).
 */
class CrossCorrelationRealDataTest {

    @Test
    void realSpectraWithTheStandardSet() {
        EstimationContext ctx = EstimationContext.defaults().withTemplates(new StandardTemplateSet());
        if (System.getProperty("poly") != null) {
            ctx = ctx.withParameters(java.util.Map.of("poly_terms", System.getProperty("poly")));
        }
        RealDataScore score = RealDataScore.run("xcorr + standard", new CrossCorrelationEstimator(), ctx, System.out);
        score.rows().forEach(r -> System.out.println(r.entry().file() + " " + r.solution().diagnostics()));
        assertTrue(score.redshiftsRight() >= 9, "at least 9 of 12 redshifts right; got " + score.redshiftsRight());
    }
}
