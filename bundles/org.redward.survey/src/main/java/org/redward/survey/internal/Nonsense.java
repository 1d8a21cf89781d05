package org.redward.survey.internal;

/** An estimator answered with something that is not a solution (no solution at all, an impossible value). */
final class Nonsense extends Exception {

    private static final long serialVersionUID = 1L;

    Nonsense(String message) {
        super(message);
    }
}
