package org.redward.mock.internal;

/**
 * The invented demo scenario: an invented observatory, telescope, fibre spectrograph and field.
 * None of these exist; the site coordinates are real-looking so that barycentric corrections are
 * real.
 *
 * <ul>
 * <li>Site: Quenta Ridge Observatory, longitude 66.7140 W, latitude 26.4290 S, 3105 m.</li>
 * <li>Telescope: the Ossel 2.6 m; spectrograph: Quill, a 400-fibre spectrograph with 2 arcsec
 * fibres, one CCD, 3600-9800 Angstrom (air) sampled every 1.25 Angstrom, a constant line-spread
 * FWHM of 3.3 Angstrom (resolving power about 2000 at 6600 Angstrom).</li>
 * <li>Field: "Ember", centred on RA 213.482, Dec -12.365 (ICRS degrees), radius 0.75 degrees,
 * observed on several nights of 2026.</li>
 * </ul>
 */
public final class Scenario {

    private Scenario() {
    }

    public static final String OBSERVATORY = "Quenta Ridge Observatory";
    public static final String TELESCOPE = "Ossel 2.6m";
    public static final String INSTRUMENT = "Quill";
    public static final String FIELD = "Ember";

    /** Geodetic longitude, degrees east (negative = west). */
    public static final double SITE_LONGITUDE_DEG = -66.7140;
    /** Geodetic latitude, degrees. */
    public static final double SITE_LATITUDE_DEG = -26.4290;
    /** Height above the WGS84 ellipsoid, metres. */
    public static final double SITE_HEIGHT_M = 3105.0;

    public static final double FIELD_RA_DEG = 213.482;
    public static final double FIELD_DEC_DEG = -12.365;
    public static final double FIELD_RADIUS_DEG = 0.75;

    /** First wavelength of the Quill grid, air Angstrom. */
    public static final double WAVELENGTH_START_AIR_ANGSTROM = 3600.0;
    /** Pixel step, air Angstrom. */
    public static final double WAVELENGTH_STEP_ANGSTROM = 1.25;
    /** Number of pixels: 3600 to 9800 Angstrom. */
    public static final int PIXELS = 4961;
    /** Line-spread function FWHM, Angstrom (constant along the detector, as for a grating). */
    public static final double LSF_FWHM_ANGSTROM = 3.3;
    /** Read noise per CCD pixel, electrons. */
    public static final double READ_NOISE_E = 3.2;
    /** CCD rows summed per spectral pixel in the extraction. */
    public static final int EXTRACTION_ROWS = 4;
    /** Exposure time of every Quill exposure of the demo, seconds. */
    public static final double EXPOSURE_S = 2700.0;
    /** Telescope collecting area, cm^2 (2.6 m aperture with a 0.9 m central obstruction). */
    public static final double COLLECTING_AREA_CM2 = Math.PI * (130.0 * 130.0 - 45.0 * 45.0);
    /** Fibres per Quill file (one exposure). */
    public static final int FIBRES_PER_FILE = 100;
    /** Mid-exposure MJD (UTC) of the first exposure: a night of April 2026 with the field near transit. */
    public static final double FIRST_EXPOSURE_MJD = 61150.205;

    /** Air wavelength of pixel {@code i}, Angstrom. */
    public static double airAngstrom(int i) {
        return WAVELENGTH_START_AIR_ANGSTROM + i * WAVELENGTH_STEP_ANGSTROM;
    }

    /**
     * Total throughput (atmosphere at the zenith, telescope, fibre, spectrograph, CCD) at an air
     * wavelength: an invented smooth curve peaking at 0.27 near 6000 Angstrom, falling to about a
     * third at the blue end and a quarter at the red end.
     */
    public static double throughput(double airAngstrom) {
        double blue = 1.0 / (1.0 + Math.exp(-(airAngstrom - 3950.0) / 180.0));
        double red = 1.0 / (1.0 + Math.exp((airAngstrom - 9350.0) / 260.0));
        double bump = 1.0 - 0.08 * Math.exp(-0.5 * Math.pow((airAngstrom - 7600.0) / 500.0, 2));
        return 0.29 * blue * red * bump;
    }

    /**
     * Photo-electrons collected per pixel, per unit of flux density (1e-17 erg/s/cm^2/Angstrom),
     * at an air wavelength in one exposure: area * time * step * throughput / (h c / lambda).
     */
    public static double electronsPerFluxUnit(double airAngstrom) {
        double photonErg = 6.62607015e-27 * 2.99792458e18 / airAngstrom; // h c / lambda, lambda in Angstrom
        return 1e-17 / photonErg * COLLECTING_AREA_CM2 * EXPOSURE_S * WAVELENGTH_STEP_ANGSTROM * throughput(airAngstrom);
    }
}
