package org.redward.api.lines;

import java.util.Locale;

/** Whether a line is seen in emission, in absorption, or either (depending on the object). */
public enum LineKind {
    EMISSION, ABSORPTION, BOTH;

    /** Lower-case key used in data files and machine-readable output. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** True if a line of this kind may appear as a detected feature of kind {@code seen}. */
    public boolean admits(LineKind seen) {
        return this == BOTH || seen == BOTH || this == seen;
    }

    /**
     * Parses {@code emission}, {@code absorption} or {@code both} (case-insensitive; also the
     * one-letter forms {@code e}, {@code a}, {@code b}).
     *
     * @throws IllegalArgumentException naming the text if it is none of those
     */
    public static LineKind parse(String text) {
        String t = text == null ? "" : text.trim().toLowerCase(Locale.ROOT);
        switch (t) {
            case "emission": case "e": return EMISSION;
            case "absorption": case "a": return ABSORPTION;
            case "both": case "b": return BOTH;
            default: throw new IllegalArgumentException("line kind '" + text + "' is not emission, absorption or both");
        }
    }
}
