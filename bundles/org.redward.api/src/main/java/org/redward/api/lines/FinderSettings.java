package org.redward.api.lines;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What the {@link LineFinder} is asked to do: the detection threshold (matched-filter S/N),
 * which kinds of line to look for, regions to mask (observed frame, vacuum Angstrom; e.g. the
 * sky lines of an instrument profile) and the widest line to accept. Immutable; build modified
 * copies with the {@code with...} methods.
 */
public final class FinderSettings {

    private static final FinderSettings DEFAULT = new FinderSettings(5.0, true, true, List.of(), 25_000.0);

    private final double snrThreshold;
    private final boolean emission;
    private final boolean absorption;
    private final List<double[]> masked;
    private final double maxFwhmKmPerS;

    private FinderSettings(double snrThreshold, boolean emission, boolean absorption, List<double[]> masked, double maxFwhm) {
        this.snrThreshold = snrThreshold;
        this.emission = emission;
        this.absorption = absorption;
        this.masked = masked;
        this.maxFwhmKmPerS = maxFwhm;
    }

    /** S/N threshold 5, emission and absorption, nothing masked, lines up to 25,000 km/s FWHM. */
    public static FinderSettings defaults() {
        return DEFAULT;
    }

    /** Matched-filter S/N a feature must reach to be fitted. */
    public double snrThreshold() { return snrThreshold; }
    public boolean emission() { return emission; }
    public boolean absorption() { return absorption; }
    /** Widest line accepted (FWHM, km/s). */
    public double maxFwhmKmPerS() { return maxFwhmKmPerS; }

    /** Masked regions [from, to], observed vacuum Angstrom (copies). */
    public List<double[]> maskedRegionsVacuumAngstrom() {
        List<double[]> out = new ArrayList<>(masked.size());
        for (double[] r : masked) {
            out.add(r.clone());
        }
        return out;
    }

    /** True if the observed vacuum wavelength lies in a masked region. */
    public boolean isMasked(double vacuumAngstrom) {
        for (double[] r : masked) {
            if (vacuumAngstrom >= r[0] && vacuumAngstrom <= r[1]) {
                return true;
            }
        }
        return false;
    }

    /** @throws IllegalArgumentException if the threshold is not a positive number */
    public FinderSettings withSnrThreshold(double snr) {
        if (!(snr > 0) || !Double.isFinite(snr)) {
            throw new IllegalArgumentException("S/N threshold " + snr + " is not a positive number");
        }
        return new FinderSettings(snr, emission, absorption, masked, maxFwhmKmPerS);
    }

    /** @throws IllegalArgumentException if both are false */
    public FinderSettings withKinds(boolean findEmission, boolean findAbsorption) {
        if (!findEmission && !findAbsorption) {
            throw new IllegalArgumentException("line finder: look for emission, absorption or both, not neither");
        }
        return new FinderSettings(snrThreshold, findEmission, findAbsorption, masked, maxFwhmKmPerS);
    }

    /** @throws IllegalArgumentException if a region is not [from, to] with from &lt; to */
    public FinderSettings withMaskedRegions(List<double[]> regionsVacuumAngstrom) {
        List<double[]> copy = new ArrayList<>();
        for (double[] r : regionsVacuumAngstrom) {
            if (r.length != 2 || !(r[0] < r[1])) {
                throw new IllegalArgumentException("masked region " + java.util.Arrays.toString(r) + " is not [from, to] with from < to");
            }
            copy.add(r.clone());
        }
        return new FinderSettings(snrThreshold, emission, absorption, List.copyOf(copy), maxFwhmKmPerS);
    }

    /** @throws IllegalArgumentException if not a positive number */
    public FinderSettings withMaxFwhmKmPerS(double fwhm) {
        if (!(fwhm > 0)) {
            throw new IllegalArgumentException("largest FWHM " + fwhm + " km/s is not a positive number");
        }
        return new FinderSettings(snrThreshold, emission, absorption, masked, fwhm);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "FinderSettings[snr>=%.2f, emission=%s, absorption=%s, %d masked, fwhm<=%.0f km/s]",
                snrThreshold, emission, absorption, masked.size(), maxFwhmKmPerS);
    }
}
