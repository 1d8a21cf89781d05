package org.redward.api.lines;

/**
 * A line found in an observed spectrum and measured by a Gaussian fit. Every measured quantity
 * comes with its 1-sigma error from the fit covariance (NaN when the fit could not give one).
 *
 * <p>Definitions (observed frame, vacuum wavelengths):
 * <ul>
 * <li>Gaussian profile {@code A exp(-(lambda - mu)^2 / (2 s^2))} added to the continuum C;</li>
 * <li>{@code flux = A s sqrt(2 pi)} (flux-density unit of the spectrum times Angstrom; negative for absorption);</li>
 * <li>{@code fwhmKmPerS = 2 sqrt(2 ln 2) s / mu * c}, c = 299792.458 km/s, not corrected for the instrument's resolution;</li>
 * <li>{@code equivalentWidthAngstrom = flux / C(mu)}: positive for emission, negative for absorption
 *     (observed frame; divide by 1 + z for the rest frame);</li>
 * <li>{@code snr = |flux| / fluxError}; {@code detectionSnr} is the matched-filter S/N that triggered the fit.</li>
 * </ul>
 *
 * <p>Immutable and thread-safe.
 *
 * @param kind emission or absorption (never both)
 * @param centreAngstrom observed vacuum centre mu, Angstrom
 * @param centreErrorAngstrom 1-sigma error of the centre, Angstrom
 * @param fwhmKmPerS full width at half maximum, km/s
 * @param fwhmErrorKmPerS its 1-sigma error, km/s
 * @param flux integrated line flux (flux-density unit x Angstrom)
 * @param fluxError its 1-sigma error
 * @param equivalentWidthAngstrom observed-frame equivalent width, Angstrom (sign as above)
 * @param equivalentWidthErrorAngstrom its 1-sigma error (continuum error not included)
 * @param snr |flux| / fluxError
 * @param detectionSnr the matched-filter S/N at detection
 * @param continuum the continuum level at the centre (flux-density unit)
 * @param blend lines fitted together share this number (>= 0); -1 for a line fitted alone
 */
public record DetectedLine(LineKind kind, double centreAngstrom, double centreErrorAngstrom, double fwhmKmPerS,
        double fwhmErrorKmPerS, double flux, double fluxError, double equivalentWidthAngstrom,
        double equivalentWidthErrorAngstrom, double snr, double detectionSnr, double continuum, int blend) {

    /** Speed of light, km/s (exact, SI). */
    public static final double C_KM_PER_S = 299_792.458;

    public DetectedLine {
        if (kind == LineKind.BOTH || kind == null) {
            throw new IllegalArgumentException("a detected line is either emission or absorption");
        }
    }

    /** The centre's error as a velocity, km/s: c * sigma_mu / mu. */
    public double centreErrorKmPerS() {
        return C_KM_PER_S * centreErrorAngstrom / centreAngstrom;
    }

    /** True if fitted together with neighbours. */
    public boolean blended() {
        return blend >= 0;
    }
}
