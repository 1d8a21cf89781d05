package org.redward.redshift.chisq.internal;

import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.templates.TemplateSet;
import org.redward.templates.standard.internal.StandardTemplateSet;
import org.redward.testkit.RedshiftEstimatorContractTest;

/** The estimator conformance kit for chisq with the standard set. */
class ChiSquareContractTest extends RedshiftEstimatorContractTest {

    private static final ChiSquareEstimator ESTIMATOR = new ChiSquareEstimator();
    private static final TemplateSet SET = new StandardTemplateSet();

    @Override
    protected RedshiftEstimator estimator() {
        return ESTIMATOR;
    }

    @Override
    protected TemplateSet templates() {
        return SET;
    }
}
