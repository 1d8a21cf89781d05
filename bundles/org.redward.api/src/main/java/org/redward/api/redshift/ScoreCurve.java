package org.redward.api.redshift;

/**
 * An estimator's score as a function of trial redshift, for display and diagnosis.
 *
 * @param z trial redshifts, increasing
 * @param score the score at each trial redshift
 * @param scoreName what the score is (e.g. {@code chi2}, {@code xcorr_r}, {@code line_votes})
 * @param lowerIsBetter true when minima are solutions (chi-square), false when maxima are
 */
public record ScoreCurve(double[] z, double[] score, String scoreName, boolean lowerIsBetter) {
    public ScoreCurve {
        if (z.length != score.length) {
            throw new IllegalArgumentException("score curve: " + z.length + " redshifts and " + score.length + " scores");
        }
        z = z.clone();
        score = score.clone();
    }

    @Override
    public double[] z() {
        return z.clone();
    }

    @Override
    public double[] score() {
        return score.clone();
    }
}
