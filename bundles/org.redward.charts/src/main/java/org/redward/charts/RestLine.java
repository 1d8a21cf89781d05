package org.redward.charts;

import java.util.Objects;

/**
 * A rest-frame spectral line to draw at a trial redshift: observed wavelength
 * {@code restVacuumAngstrom * (1 + z)} (vacuum Angstrom).
 *
 * @param name label shown beside the marker (e.g. {@code Hα}, {@code [O III]})
 * @param restVacuumAngstrom rest-frame vacuum wavelength in Angstrom (finite, positive)
 * @param kind whether the line is usually seen in emission, in absorption, or both
 */
public record RestLine(String name, double restVacuumAngstrom, Kind kind) {

    /** How a line usually shows in galaxy and quasar spectra. */
    public enum Kind {
        EMISSION, ABSORPTION, BOTH
    }

    public RestLine {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        if (!(restVacuumAngstrom > 0) || !Double.isFinite(restVacuumAngstrom)) {
            throw new IllegalArgumentException("line " + name + ": rest wavelength must be finite and positive, got " + restVacuumAngstrom);
        }
    }

    /** The observed vacuum wavelength at redshift z: {@code restVacuumAngstrom * (1 + z)}. */
    public double observedAngstrom(double z) {
        return restVacuumAngstrom * (1.0 + z);
    }
}
