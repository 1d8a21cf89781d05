package org.redward.api.redshift;

import org.osgi.annotation.versioning.ConsumerType;
import org.redward.spectrum.Spectrum;

/**
 * Estimates the redshift of one spectrum. Registered as a service with the properties
 * {@value org.redward.api.registry.Provided#ID} (the id users give to {@code --estimator}) and
 * {@value org.redward.api.registry.Provided#DESCRIPTION}; {@value #USES_TEMPLATES} says whether
 * it needs a template set.
 *
 * <p>Contract: never throws for bad data: a spectrum that cannot be measured gives a solution
 * with status {@link RedshiftSolution.Status#FAILED} and a reason. Must be thread-safe (the
 * platform calls it from several threads at once) and deterministic (same input, same output).
 */
@ConsumerType
public interface RedshiftEstimator {

    /** Service property (Boolean): true if the estimator needs a template set. */
    String USES_TEMPLATES = "redward.estimator.templates";

    RedshiftSolution estimate(Spectrum spectrum, EstimationContext context);
}
