package org.redward.redshift.chisq.internal;

import org.redward.api.redshift.EstimationContext;
import org.redward.templates.standard.internal.StandardTemplateSet;
import org.redward.testkit.GradeCalibrator;

/**
 * Prints a grade calibration table for chisq (format of calibration.tsv) measured on synthetic
 * known-redshift spectra; run on the mock survey to replace the provisional table.
 */
public final class GradeCalibration {
    public static void main(String[] args) {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 400;
        System.out.print(GradeCalibrator.table(new ChiSquareEstimator(),
                EstimationContext.defaults().withTemplates(new StandardTemplateSet()), GradeCalibrator.synthetic(n, 2026),
                "delta_chi2", 20, "measured on " + n + " synthetic spectra (testkit SyntheticSpectra, S/N 0.3-4.3), chisq + standard"));
    }
}
