package org.redward.spectrum;

/** The medium in which wavelengths were measured, as read from a file. */
public enum Medium {
    /** Standard dry air (IAU convention: Morton 2000, ApJS 130, 403). */
    AIR,
    /** Vacuum. Redward holds every wavelength internally in vacuum. */
    VACUUM;

    /** Lower-case name as used in machine-readable output ({@code air}, {@code vacuum}). */
    public String key() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
