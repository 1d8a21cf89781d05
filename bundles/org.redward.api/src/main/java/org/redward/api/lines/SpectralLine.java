package org.redward.api.lines;

import java.util.Objects;

/**
 * One spectral line of a {@link LineList}: its name, its vacuum rest wavelength in Angstrom, its
 * kind, its doublet or multiplet group and the flux ratio physics fixes within that group (if
 * any), a weight saying how often it is strong in real spectra, and the source of the value.
 *
 * <p>Fixed ratios: a line with a finite {@code ratioToGroupReference} has a flux equal to that
 * number times the flux of the group's reference line (the line of the group whose ratio is 1).
 * For example [O III] 4960 has ratio 1/2.98 to [O III] 5008 (Storey &amp; Zeippen 2000).
 * NaN means the ratio is free (set by density, temperature or excitation).
 *
 * <p>Immutable and thread-safe.
 *
 * @param name the line's name as astronomers write it (e.g. {@code [O III] 5008}, {@code H-alpha})
 * @param vacuumAngstrom vacuum rest wavelength, Angstrom (positive)
 * @param kind emission, absorption or both
 * @param group the doublet or multiplet group this line belongs to (e.g. {@code [O III]}); empty if none
 * @param ratioToGroupReference fixed flux ratio to the group's reference line; NaN if not fixed
 * @param weight how often the line is strong in real spectra, 0 (rarely) to 1 (almost always when in range);
 *     identification prefers hypotheses that explain lines of high weight
 * @param broad true if the line is usually broad (quasar broad-line region)
 * @param source where the wavelength comes from (paper, database; "from memory" where so)
 */
public record SpectralLine(String name, double vacuumAngstrom, LineKind kind, String group, double ratioToGroupReference,
        double weight, boolean broad, String source) {

    public SpectralLine {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        if (!(vacuumAngstrom > 0) || !Double.isFinite(vacuumAngstrom)) {
            throw new IllegalArgumentException("line " + name + ": rest wavelength " + vacuumAngstrom + " is not a positive number");
        }
        if (!(weight >= 0 && weight <= 1)) {
            throw new IllegalArgumentException("line " + name + ": weight " + weight + " is not between 0 and 1");
        }
        group = group == null ? "" : group;
        source = source == null ? "" : source;
    }

    /** True if the line belongs to a doublet or multiplet group. */
    public boolean grouped() {
        return !group.isEmpty();
    }

    /** True if its flux ratio to the group's reference line is fixed by physics. */
    public boolean fixedRatio() {
        return Double.isFinite(ratioToGroupReference);
    }

    /** The observed vacuum wavelength at redshift z: lambda_obs = (1 + z) lambda_rest. */
    public double observedAngstrom(double z) {
        return (1.0 + z) * vacuumAngstrom;
    }
}
