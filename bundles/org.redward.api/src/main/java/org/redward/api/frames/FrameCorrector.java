package org.redward.api.frames;

import org.osgi.annotation.versioning.ProviderType;
import org.redward.spectrum.SpectrumMetadata;

/**
 * Corrects redshifts between standards of rest, multiplicatively (Wright &amp; Eastman 2014,
 * PASP 126, 838): {@code (1 + z_new) = (1 + z_old) * factor} at each step. Reads the exposure
 * mid-point (UTC MJD), the site and the sky position (ICRS) from {@link SpectrumMetadata};
 * without a site the barycentric step is geocentric (the diurnal term, at most 0.47 km/s, is
 * left out and a note says so); without time or sky position the solar-system step cannot be
 * made and the result says why. Thread-safe.
 */
@ProviderType
public interface FrameCorrector {

    /**
     * @param z        the redshift in {@code request.from()}; NaN gives NaN
     * @param metadata time, site and sky position
     */
    FrameCorrection correct(double z, SpectrumMetadata metadata, FrameRequest request);

    /**
     * The observer's barycentric (or heliocentric) velocity projected on the direction
     * (ra, dec), km/s, positive towards the source. NaN site values mean a geocentric observer.
     *
     * @param heliocentric true for the velocity relative to the Sun's centre instead of the barycentre
     */
    double solarSystemVelocityKmPerS(double mjdUtc, double raDeg, double decDeg, double siteLongitudeDeg,
            double siteLatitudeDeg, double siteHeightMetres, boolean heliocentric);
}
