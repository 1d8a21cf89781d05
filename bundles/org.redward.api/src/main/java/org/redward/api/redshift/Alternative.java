package org.redward.api.redshift;

import org.redward.spectrum.ObjectClass;

/**
 * A ranked redshift solution: the best one or a runner-up. {@code score} is the estimator's own
 * figure of merit (its meaning is named by {@link ScoreCurve#scoreName()}); {@code deltaScore} is
 * its distance from the best solution in the estimator's sense (0 for the best).
 *
 * @param z redshift
 * @param zError 1-sigma error of z (NaN if unknown)
 * @param score the estimator's figure of merit at this solution
 * @param deltaScore how much worse than the best (0 for the best; larger is worse)
 * @param objectClass the class that gave this solution
 * @param subclass the template or subclass that gave it (may be empty)
 */
public record Alternative(double z, double zError, double score, double deltaScore, ObjectClass objectClass, String subclass) {
}
