package org.redward.api.lines;

/**
 * One detected line explained by one line of a list at a given redshift.
 *
 * @param detectedIndex index of the detected line in the list given to the identifier
 * @param line the line of the list
 * @param restAngstrom the rest wavelength used: the line's own, or, for an unresolved doublet
 *     seen as one feature, the mean of the members (see {@code note})
 * @param z the redshift this match alone implies: observed / rest - 1
 * @param zError its 1-sigma error from the centre's error
 * @param offsetKmPerS velocity offset of this line from the hypothesis redshift, km/s
 * @param note e.g. {@code unresolved doublet}; empty if none
 */
public record LineMatch(int detectedIndex, SpectralLine line, double restAngstrom, double z, double zError,
        double offsetKmPerS, String note) {

    public LineMatch {
        note = note == null ? "" : note;
    }

    /**
     * The name to show for this match: the line's own name, or, for an unresolved doublet seen as
     * one feature (a non-empty {@code note}), its group followed by {@code (unresolved)}.
     */
    public String label() {
        return note.isEmpty() ? line.name() : line.group() + " (unresolved)";
    }
}
