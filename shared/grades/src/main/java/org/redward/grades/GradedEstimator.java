package org.redward.grades;

import java.nio.file.Path;
import java.util.List;

import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.lines.internal.LineRedshiftEstimator;
import org.redward.redshift.chisq.internal.ChiSquareEstimator;
import org.redward.redshift.xcorr.internal.CrossCorrelationEstimator;
import org.redward.templates.standard.internal.StandardTemplateSet;

/**
 * An estimator of ours with what its grades need: the context it runs in by default (the
 * standard template set where it uses templates), the diagnostic its grades are read from, and
 * where its calibration table lives in the source tree. Immutable.
 *
 * @param table path of {@code calibration.tsv} relative to the repository root
 */
public record GradedEstimator(String id, RedshiftEstimator estimator, EstimationContext context, String statistic, String table) {

    /** The statistic of a solution (NaN when absent). */
    public double statistic(RedshiftSolution s) {
        return s.diagnostics().getOrDefault(statistic, Double.NaN);
    }

    /** The table's path under {@code repo}. */
    public Path tablePath(Path repo) {
        return repo.resolve(table);
    }

    /** Our three estimators, as {@code measure} runs them by default. */
    public static List<GradedEstimator> ours() {
        EstimationContext standard = EstimationContext.defaults().withTemplates(new StandardTemplateSet());
        return List.of(
                new GradedEstimator(CrossCorrelationEstimator.ID, new CrossCorrelationEstimator(), standard, "r",
                        "bundles/org.redward.redshift.xcorr/src/main/resources/org/redward/redshift/xcorr/internal/calibration.tsv"),
                new GradedEstimator(ChiSquareEstimator.ID, new ChiSquareEstimator(), standard, "delta_chi2",
                        "bundles/org.redward.redshift.chisq/src/main/resources/org/redward/redshift/chisq/internal/calibration.tsv"),
                new GradedEstimator(LineRedshiftEstimator.ID, new LineRedshiftEstimator(), EstimationContext.defaults(), "line_score",
                        "bundles/org.redward.lines/src/main/resources/org/redward/lines/internal/calibration.tsv"));
    }
}
