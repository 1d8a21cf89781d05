package org.redward.api.survey;

import java.util.Objects;

import org.redward.api.lines.LineKind;

/**
 * One line measured in a spectrum of a survey run ({@link MeasureRequest#withLines}): found and
 * fitted by a line finder (Gaussian fit; see {@link org.redward.api.lines.DetectedLine}) and
 * identified with a line list at the row's catalogue redshift z.
 *
 * <p>Derived quantities (c = 299,792.458 km/s):
 * <ul>
 * <li>{@code offsetKmPerS = c (z_line - z) / (1 + z)}, z_line = observed / rest - 1: the line's
 *     velocity relative to the catalogue redshift (common practice); NaN when unidentified;</li>
 * <li>{@code restEquivalentWidthAngstrom = EW_observed / (1 + z)}: rest frame, positive for
 *     emission, negative for absorption; its error likewise (continuum error not included);</li>
 * <li>FWHM is not corrected for the instrument's resolution.</li>
 * </ul>
 * Errors are 1-sigma from the fit covariance (NaN when the fit gave none).
 *
 * <p>Immutable and thread-safe. Equality compares every number as {@link Double#compare} does (NaN equals NaN).
 *
 * @param name the identification as the line list writes it (e.g. {@code H-alpha}); empty when unidentified
 * @param restAngstrom rest vacuum wavelength of the identification, Angstrom; NaN when unidentified
 * @param kind emission or absorption
 * @param observedAngstrom observed vacuum centre, Angstrom
 * @param observedErrorAngstrom its 1-sigma error, Angstrom
 * @param offsetKmPerS velocity offset from the catalogue z, km/s (see above)
 * @param flux integrated line flux, in {@code fluxUnit}; negative for absorption
 * @param fluxError its 1-sigma error
 * @param fluxUnit unit of the flux as text: the spectrum's flux-density unit times Angstrom; empty when unknown
 * @param restEquivalentWidthAngstrom rest-frame equivalent width, Angstrom
 * @param restEquivalentWidthErrorAngstrom its 1-sigma error, Angstrom
 * @param fwhmKmPerS full width at half maximum, km/s
 * @param fwhmErrorKmPerS its 1-sigma error, km/s
 * @param snr |flux| / fluxError
 * @param blended true if fitted together with neighbouring lines
 */
public record MeasuredLine(String name, double restAngstrom, LineKind kind, double observedAngstrom,
        double observedErrorAngstrom, double offsetKmPerS, double flux, double fluxError, String fluxUnit,
        double restEquivalentWidthAngstrom, double restEquivalentWidthErrorAngstrom, double fwhmKmPerS,
        double fwhmErrorKmPerS, double snr, boolean blended) {

    public MeasuredLine {
        name = name == null ? "" : name;
        fluxUnit = fluxUnit == null ? "" : fluxUnit;
        Objects.requireNonNull(kind, "kind");
        if (kind == LineKind.BOTH) {
            throw new IllegalArgumentException("a measured line is either emission or absorption");
        }
    }

    /** True if the line was identified with a line of the list. */
    public boolean identified() {
        return !name.isEmpty();
    }

}
