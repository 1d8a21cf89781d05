package org.redward.api.lines;

import java.util.List;

/**
 * One redshift that explains some of the detected lines, with the matches that support it.
 *
 * @param z the redshift (weighted mean of the matches)
 * @param zError its 1-sigma error (inflated by the scatter of the matches when they disagree more than their errors allow)
 * @param score the identifier's figure of merit (larger is better; see {@link LineIdentifier})
 * @param matches the detected lines it explains
 * @param missing strong lines of the list (weight &gt;= 0.8) that fall inside the spectrum at this z but were not found
 */
public record RedshiftHypothesis(double z, double zError, double score, List<LineMatch> matches, List<SpectralLine> missing) {

    public RedshiftHypothesis {
        matches = List.copyOf(matches);
        missing = List.copyOf(missing);
    }

    /** Number of detected lines this hypothesis explains. */
    public int matchedCount() {
        return matches.size();
    }

    /** The match of detected line {@code detectedIndex}, or null. */
    public LineMatch matchOf(int detectedIndex) {
        for (LineMatch m : matches) {
            if (m.detectedIndex() == detectedIndex) {
                return m;
            }
        }
        return null;
    }
}
