package org.redward.api.frames;

import java.util.Locale;

/**
 * A published motion of the Sun relative to a standard of rest: a speed towards an apex in
 * Galactic coordinates. The velocity projected on a source direction n is {@code V cos(theta)}.
 * The Local Group definitions are published as such apexes or as equivalent linear formulas in
 * (l, b); {@link #cartesianKmPerS()} gives the Galactic Cartesian components. Immutable.
 */
public enum SolarMotion {
    /**
     * CMB dipole, Planck 2018 (Planck Collaboration I 2020, A&amp;A 641, A1): 369.82 km/s towards
     * (l, b) = (264.021 deg, 48.253 deg).
     */
    CMB_PLANCK2018("cmb-planck2018", 369.82, 264.021, 48.253,
            "Planck Collaboration I (2020, A&A 641, A1): 369.82 km/s towards l=264.021, b=48.253"),
    /**
     * Local Group, Yahil, Tammann &amp; Sandage (1977, ApJ 217, 903) as commonly tabulated:
     * {@code v_LG = v_h + 295 sin l cos b - 79.1 cos l cos b - 37.6 sin b}. The default.
     */
    LG_YAHIL1977("yahil1977", new double[] {-79.1, 295.0, -37.6},
            "Yahil, Tammann & Sandage (1977, ApJ 217, 903): v_h + 295 sin l cos b - 79.1 cos l cos b - 37.6 sin b"),
    /** Local Group, IAU 1976 (Trans. IAU 16B, 201): {@code v_h + 300 sin l cos b}. */
    LG_IAU1976("iau1976", new double[] {0.0, 300.0, 0.0}, "IAU (1976, Trans. IAU 16B, 201): v_h + 300 sin l cos b"),
    /** Local Group, Karachentsev &amp; Makarov (1996, AJ 111, 794): 316 km/s towards (93 deg, -4 deg). */
    LG_KARACHENTSEV1996("karachentsev1996", 316.0, 93.0, -4.0,
            "Karachentsev & Makarov (1996, AJ 111, 794): 316 km/s towards l=93, b=-4"),
    /** Local Group, Courteau &amp; van den Bergh (1999, AJ 118, 337; journal reference from memory): 306 km/s towards (99 deg, -4 deg). */
    LG_COURTEAU1999("courteau1999", 306.0, 99.0, -4.0,
            "Courteau & van den Bergh (1999, AJ 118, 337; journal reference from memory): 306 km/s towards l=99, b=-4");

    /** The Local Group definition used when none is chosen. */
    public static final SolarMotion DEFAULT_LOCAL_GROUP = LG_YAHIL1977;

    private final String key;
    private final double[] cartesian;
    private final String citation;

    SolarMotion(String key, double speedKmPerS, double lDeg, double bDeg, String citation) {
        this(key, toCartesian(speedKmPerS, lDeg, bDeg), citation);
    }

    SolarMotion(String key, double[] cartesian, String citation) {
        this.key = key;
        this.cartesian = cartesian;
        this.citation = citation;
    }

    private static double[] toCartesian(double v, double lDeg, double bDeg) {
        double l = Math.toRadians(lDeg);
        double b = Math.toRadians(bDeg);
        return new double[] {v * Math.cos(l) * Math.cos(b), v * Math.sin(l) * Math.cos(b), v * Math.sin(b)};
    }

    /** The name used on the command line, e.g. {@code yahil1977}. */
    public String key() { return key; }
    /** The published source. */
    public String citation() { return citation; }
    /** Galactic Cartesian velocity (x to l=0, y to l=90 deg, z to b=90 deg), km/s; a copy. */
    public double[] cartesianKmPerS() { return cartesian.clone(); }
    /** The speed, km/s. */
    public double speedKmPerS() { return Math.sqrt(cartesian[0] * cartesian[0] + cartesian[1] * cartesian[1] + cartesian[2] * cartesian[2]); }
    /** Apex Galactic longitude, degrees in [0, 360). */
    public double apexLongitudeDeg() { double l = Math.toDegrees(Math.atan2(cartesian[1], cartesian[0])); return l < 0 ? l + 360 : l; }
    /** Apex Galactic latitude, degrees. */
    public double apexLatitudeDeg() { return Math.toDegrees(Math.asin(cartesian[2] / speedKmPerS())); }

    /** The velocity towards a source at Galactic (l, b) in degrees, V cos(theta), km/s. */
    public double projectedKmPerS(double lDeg, double bDeg) {
        double l = Math.toRadians(lDeg);
        double b = Math.toRadians(bDeg);
        return cartesian[0] * Math.cos(l) * Math.cos(b) + cartesian[1] * Math.sin(l) * Math.cos(b) + cartesian[2] * Math.sin(b);
    }

    /** The Local Group definition with this key. */
    public static SolarMotion parseLocalGroup(String s) {
        String k = s.trim().toLowerCase(Locale.ROOT);
        for (SolarMotion m : values()) {
            if (m != CMB_PLANCK2018 && m.key.equals(k)) {
                return m;
            }
        }
        throw new IllegalArgumentException("unknown Local Group definition '" + s
                + "' (known: yahil1977 (default), iau1976, karachentsev1996, courteau1999)");
    }
}
