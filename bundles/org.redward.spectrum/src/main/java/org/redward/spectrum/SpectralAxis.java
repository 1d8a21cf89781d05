package org.redward.spectrum;

import java.util.Arrays;
import java.util.Objects;

/**
 * The spectral axis of a spectrum: one vacuum wavelength in Angstrom per pixel, strictly
 * increasing, plus what the file said (unit, medium, sampling) for reporting.
 *
 * <p>Frequency axes (radio spectra) are converted to vacuum wavelength with lambda = c/nu and,
 * because frequency falls as wavelength grows, their pixels are stored in reversed order; the
 * readers reverse flux and inverse variance accordingly.
 *
 * <p>Immutable and thread-safe.
 */
public final class SpectralAxis {

    private final double[] vacuumAngstrom;
    private final SpectralUnit unitAsRead;
    private final Medium mediumAsRead;
    private final Sampling samplingAsRead;

    private SpectralAxis(double[] vacuumAngstrom, SpectralUnit unit, Medium medium, Sampling sampling) {
        this.vacuumAngstrom = vacuumAngstrom;
        this.unitAsRead = unit;
        this.mediumAsRead = medium;
        this.samplingAsRead = sampling;
    }

    /**
     * An axis from coordinates as read, in the given unit and medium. Air wavelengths are
     * converted to vacuum ({@link AirVacuum}); frequencies to vacuum wavelengths.
     *
     * @throws IllegalArgumentException if there are no pixels, a coordinate is not finite or not
     *     positive, or the coordinates are not strictly monotonic
     */
    public static SpectralAxis of(double[] coordinates, SpectralUnit unit, Medium medium, Sampling sampling) {
        Objects.requireNonNull(coordinates, "coordinates");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(medium, "medium");
        Objects.requireNonNull(sampling, "sampling");
        int n = coordinates.length;
        if (n == 0) {
            throw new IllegalArgumentException("spectral axis has no pixels");
        }
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            double c = coordinates[i];
            if (!Double.isFinite(c) || c <= 0) {
                throw new IllegalArgumentException("spectral coordinate " + c + " at pixel " + i + " is not a positive finite number");
            }
            double a = unit.toAngstrom(c);
            w[i] = medium == Medium.AIR && !unit.isFrequency() ? AirVacuum.airToVacuumAngstrom(a) : a;
        }
        if (unit.isFrequency()) {
            reverse(w);
        }
        for (int i = 1; i < n; i++) {
            if (!(w[i] > w[i - 1])) {
                throw new IllegalArgumentException("spectral axis is not strictly monotonic at pixel " + i
                        + " (" + w[i - 1] + " then " + w[i] + " Angstrom)");
            }
        }
        return new SpectralAxis(w, unit, medium, sampling);
    }

    /** A linear axis: coordinate(i) = start + i * step, in the given unit and medium. */
    public static SpectralAxis linear(double start, double step, int pixels, SpectralUnit unit, Medium medium) {
        double[] c = new double[pixels];
        for (int i = 0; i < pixels; i++) {
            c[i] = start + i * step;
        }
        return of(c, unit, medium, Sampling.LINEAR);
    }

    /** A log-linear wavelength axis: lambda(i) = 10^(log10Start + i * log10Step) Angstrom. */
    public static SpectralAxis logLinear(double log10StartAngstrom, double log10Step, int pixels, Medium medium) {
        double[] c = new double[pixels];
        for (int i = 0; i < pixels; i++) {
            c[i] = Math.pow(10.0, log10StartAngstrom + i * log10Step);
        }
        return of(c, SpectralUnit.ANGSTROM, medium, Sampling.LOG_LINEAR);
    }

    /** Number of pixels. */
    public int size() {
        return vacuumAngstrom.length;
    }

    /** Vacuum wavelength of pixel {@code i}, Angstrom. */
    public double vacuumAngstrom(int i) {
        return vacuumAngstrom[i];
    }

    /** A copy of all vacuum wavelengths, Angstrom. */
    public double[] vacuumAngstrom() {
        return vacuumAngstrom.clone();
    }

    public double minVacuumAngstrom() {
        return vacuumAngstrom[0];
    }

    public double maxVacuumAngstrom() {
        return vacuumAngstrom[vacuumAngstrom.length - 1];
    }

    /** The unit the file used. */
    public SpectralUnit unitAsRead() {
        return unitAsRead;
    }

    /** The medium the file used (the stored wavelengths are vacuum regardless). */
    public Medium mediumAsRead() {
        return mediumAsRead;
    }

    /** The sampling the file used. */
    public Sampling samplingAsRead() {
        return samplingAsRead;
    }

    private static void reverse(double[] a) {
        for (int i = 0, j = a.length - 1; i < j; i++, j--) {
            double t = a[i];
            a[i] = a[j];
            a[j] = t;
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SpectralAxis other && Arrays.equals(vacuumAngstrom, other.vacuumAngstrom)
                && unitAsRead == other.unitAsRead && mediumAsRead == other.mediumAsRead
                && samplingAsRead == other.samplingAsRead;
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(vacuumAngstrom) * 31 + Objects.hash(unitAsRead, mediumAsRead, samplingAsRead);
    }

    @Override
    public String toString() {
        return String.format(java.util.Locale.ROOT, "SpectralAxis[%d px, %.3f-%.3f A vacuum, read as %s %s %s]",
                size(), minVacuumAngstrom(), maxVacuumAngstrom(), unitAsRead.symbol(), mediumAsRead.key(), samplingAsRead.key());
    }
}
