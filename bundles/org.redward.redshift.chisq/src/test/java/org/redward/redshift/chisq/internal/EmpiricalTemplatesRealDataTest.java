package org.redward.redshift.chisq.internal;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.templates.TemplateSet;
import org.redward.templates.standard.internal.StandardTemplateSet;
import org.redward.testkit.EmpiricalTemplates;
import org.redward.testkit.RealDataScore;

/**
 * "A group adds its own template set": the published empirical templates of ../shared/templates
 * (Kinney et al. 1996; Calzetti et al. 1994; Pickles 1998; Vanden Berk et al. 2001) against the
 * standard set, on the real spectra of ../shared/realdata (SDSS and LAMOST DR1 public data),
 * in process. Prints both scores and the change; the end-to-end form (templates pack, --bundles)
 * needs the template extender and the platform and is left to an integration test.
 */
class EmpiricalTemplatesRealDataTest {

    @Test
    void empiricalAgainstStandard() {
        ChiSquareEstimator e = new ChiSquareEstimator();
        TemplateSet empirical = EmpiricalTemplates.load();
        RealDataScore std = RealDataScore.run("chisq + standard", e, EstimationContext.defaults().withTemplates(new StandardTemplateSet()), System.out);
        RealDataScore emp = RealDataScore.run("chisq + empirical (" + empirical.templates().size() + " templates)", e,
                EstimationContext.defaults().withTemplates(empirical), System.out);
        System.out.printf("== change with the empirical set: redshifts %d -> %d, redshifts and classes %d -> %d of 12%n",
                std.redshiftsRight(), emp.redshiftsRight(), std.bothRight(), emp.bothRight());
        assertTrue(emp.redshiftsRight() >= 9, "the empirical set measures most real redshifts: " + emp.redshiftsRight());
    }
}
