package org.redward.spectrum;

/** How the pixels of a spectral axis are spaced, as read from a file. */
public enum Sampling {
    /** Constant step in the axis unit. */
    LINEAR,
    /** Constant step in log10 of wavelength (or frequency). */
    LOG_LINEAR,
    /** Every pixel's coordinate tabulated explicitly. */
    TABULATED;

    public String key() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
