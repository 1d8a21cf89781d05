package org.redward.lines.internal;

import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.templates.TemplateSet;
import org.redward.testkit.RedshiftEstimatorContractTest;

/** The estimator conformance kit for the line-based estimator (standard list, no templates). */
class LineEstimatorContractTest extends RedshiftEstimatorContractTest {

    private static final LineRedshiftEstimator ESTIMATOR = new LineRedshiftEstimator();

    @Override
    protected RedshiftEstimator estimator() {
        return ESTIMATOR;
    }

    @Override
    protected TemplateSet templates() {
        return null;
    }
}
