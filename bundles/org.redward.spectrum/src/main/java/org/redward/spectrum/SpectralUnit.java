package org.redward.spectrum;

import java.util.Locale;
import java.util.Optional;

/**
 * Units of a spectral coordinate. Wavelength units convert to Angstrom by a factor; frequency
 * units convert to a vacuum wavelength through lambda = c / nu.
 */
public enum SpectralUnit {
    ANGSTROM("Angstrom", false, 1.0),
    NANOMETRE("nm", false, 10.0),
    MICRON("um", false, 1.0e4),
    METRE("m", false, 1.0e10),
    HERTZ("Hz", true, 1.0),
    MEGAHERTZ("MHz", true, 1.0e6),
    GIGAHERTZ("GHz", true, 1.0e9);

    /** Speed of light in vacuum, m/s (exact, SI definition). */
    public static final double SPEED_OF_LIGHT_M_PER_S = 299_792_458.0;

    private final String symbol;
    private final boolean frequency;
    private final double scale;

    SpectralUnit(String symbol, boolean frequency, double scale) {
        this.symbol = symbol;
        this.frequency = frequency;
        this.scale = scale;
    }

    /** FITS-style symbol ({@code Angstrom}, {@code nm}, {@code um}, {@code m}, {@code Hz}, ...). */
    public String symbol() {
        return symbol;
    }

    /** True for frequency units. */
    public boolean isFrequency() {
        return frequency;
    }

    /**
     * Converts a coordinate in this unit to a wavelength in Angstrom. For frequency units the
     * result is the vacuum wavelength c/nu.
     */
    public double toAngstrom(double value) {
        if (frequency) {
            double hz = value * scale;
            return SPEED_OF_LIGHT_M_PER_S / hz * 1.0e10;
        }
        return value * scale;
    }

    /** Inverse of {@link #toAngstrom(double)}. */
    public double fromAngstrom(double angstrom) {
        if (frequency) {
            double hz = SPEED_OF_LIGHT_M_PER_S / (angstrom * 1.0e-10);
            return hz / scale;
        }
        return angstrom / scale;
    }

    /**
     * Parses a unit string as found in FITS headers ({@code CUNIT1}, {@code TUNITn}) or text
     * column headers. Case-insensitive for the spelled-out forms; accepts Angstrom, A, AA,
     * angstroms, 0.1nm, nm, um, micron(s), m, Hz, kHz is not accepted.
     *
     * @return the unit, or empty if the string is not a spectral unit Redward knows
     */
    public static Optional<SpectralUnit> parse(String text) {
        if (text == null) {
            return Optional.empty();
        }
        String t = text.trim();
        switch (t) {
            case "Hz": return Optional.of(HERTZ);
            case "MHz": return Optional.of(MEGAHERTZ);
            case "GHz": return Optional.of(GIGAHERTZ);
            case "m": return Optional.of(METRE);
            case "A": return Optional.of(ANGSTROM);
            default: break;
        }
        String l = t.toLowerCase(Locale.ROOT);
        switch (l) {
            case "angstrom": case "angstroms": case "aa": case "\u00e5": case "0.1nm": case "1e-10m":
                return Optional.of(ANGSTROM);
            case "nm": case "nanometer": case "nanometers": case "nanometre": case "nanometres":
                return Optional.of(NANOMETRE);
            case "um": case "micron": case "microns": case "micrometer": case "micrometers": case "\u00b5m":
                return Optional.of(MICRON);
            case "hz": return Optional.of(HERTZ);
            case "mhz": return Optional.of(MEGAHERTZ);
            case "ghz": return Optional.of(GIGAHERTZ);
            default: return Optional.empty();
        }
    }
}
