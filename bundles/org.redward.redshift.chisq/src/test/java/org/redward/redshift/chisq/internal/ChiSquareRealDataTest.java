package org.redward.redshift.chisq.internal;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.redward.api.redshift.EstimationContext;
import org.redward.templates.standard.internal.StandardTemplateSet;
import org.redward.testkit.RealDataScore;

/**
 * The chisq estimator with the standard template set on the 12 real spectra of
 * ../shared/realdata (SDSS and LAMOST DR1 public data; published redshifts from truth.tsv;
 * tolerances 300 km/s galaxies, 100 km/s stars, 1,000 km/s broad-line quasars, 0.001 for the
 * long-slit spectrum).
 */
class ChiSquareRealDataTest {

    @Test
    void realSpectraWithTheStandardSet() {
        EstimationContext ctx = EstimationContext.defaults().withTemplates(new StandardTemplateSet());
        if (System.getProperty("poly") != null) {
            ctx = ctx.withParameters(java.util.Map.of("poly_terms", System.getProperty("poly")));
        }
        RealDataScore score = RealDataScore.run("chisq + standard", new ChiSquareEstimator(), ctx, System.out);
        score.rows().forEach(r -> System.out.println(r.entry().file() + " " + r.solution().diagnostics()));
        assertTrue(score.bothRight() >= 11, "at least 11 of 12 redshifts and classes right; got " + score.bothRight());
    }
}
