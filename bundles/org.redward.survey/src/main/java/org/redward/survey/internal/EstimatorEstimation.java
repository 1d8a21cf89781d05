package org.redward.survey.internal;

import java.util.List;

import org.redward.api.redshift.Alternative;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.registry.Provided;
import org.redward.api.survey.MeasuredRow;
import org.redward.spectrum.Spectrum;

/** Measures through one estimator service and copies its solution into the row. */
final class EstimatorEstimation implements Estimation {

    /** Alternatives kept per row (the adopted one first). */
    static final int MAX_ALTERNATIVES = 5;

    private final Provided<RedshiftEstimator> estimator;
    private final EstimationContext context;
    private final Enricher enricher;

    EstimatorEstimation(Provided<RedshiftEstimator> estimator, EstimationContext context, Enricher enricher) {
        this.estimator = estimator;
        this.context = context;
        this.enricher = enricher;
    }

    @Override
    public void measure(Spectrum spectrum, MeasuredRow.Builder row) throws Exception {
        RedshiftSolution s = estimator.service().estimate(spectrum, context);
        if (s == null) {
            throw new Nonsense("no solution at all (null)");
        }
        copy(s, row);
        if (s.ok()) {
            enricher.enrich(spectrum, s.z(), s.zError(), row);
        }
    }

    /** Copies a solution into a row (z, class, grade, alternatives, warnings, or the failure). */
    static void copy(RedshiftSolution s, MeasuredRow.Builder row) {
        if (!s.ok()) {
            row.failed(s.error().isEmpty() ? "the estimator gave no redshift" : s.error());
            row.warnings(s.warnings());
            return;
        }
        List<Alternative> alts = s.alternatives();
        row.z(s.z(), s.zError())
                .objectClass(s.objectClass().key(), s.subclass())
                .grade(s.grade(), s.reliability())
                .alternatives(alts.size() > MAX_ALTERNATIVES ? alts.subList(0, MAX_ALTERNATIVES) : alts)
                .warnings(s.warnings());
    }

    @Override
    public String id() {
        return estimator.id();
    }

    @Override
    public String bundle() {
        return estimator.bundleSymbolicName() + " " + estimator.bundleVersion();
    }
}
