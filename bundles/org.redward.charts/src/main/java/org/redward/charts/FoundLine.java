package org.redward.charts;

/**
 * A line found in the observed spectrum, marked where it was found.
 *
 * @param observedVacuumAngstrom centre, observed vacuum Angstrom
 * @param label short text (its identification, or empty)
 * @param snr its signal-to-noise ratio (NaN if unknown)
 * @param emission true for emission, false for absorption
 */
public record FoundLine(double observedVacuumAngstrom, String label, double snr, boolean emission) {
    public FoundLine {
        label = label == null ? "" : label;
    }
}
