package org.redward.api.lines;

import java.util.List;

/**
 * What a {@link LineFinder} found in one spectrum: the lines (sorted by centre), the continuum it
 * measured them against, and plain statements a user must read (e.g. why no line was found).
 *
 * <p>Immutable and thread-safe.
 *
 * @param lines the detected lines, sorted by increasing observed centre
 * @param continuum the estimated continuum at each pixel (flux-density unit); empty if none could be made
 * @param noiseScale factor by which the finder inflated the given errors to match the scatter it saw (1 = none)
 * @param statements things a user must be told, in words (empty if all went as expected)
 */
public record LineSearch(List<DetectedLine> lines, double[] continuum, double noiseScale, List<String> statements) {

    public LineSearch {
        lines = List.copyOf(lines);
        continuum = continuum.clone();
        statements = List.copyOf(statements);
    }

    /** No lines, with the reason. */
    public static LineSearch none(String reason) {
        return new LineSearch(List.of(), new double[0], 1.0, List.of(reason));
    }

    @Override
    public double[] continuum() {
        return continuum.clone();
    }

    public boolean empty() {
        return lines.isEmpty();
    }
}
