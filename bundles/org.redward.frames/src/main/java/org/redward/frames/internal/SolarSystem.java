package org.redward.frames.internal;

import org.jastronomy.jsofa.JSOFA;
import org.jastronomy.jsofa.JSOFAException;

/**
 * The observer's velocity relative to the solar-system barycentre or the Sun's centre, from
 * JSOFA (the Java translation of the IAU SOFA library): Earth's motion from {@code jauEpv00}
 * (Bretagnon-Francou series with the SOFA fit, valid 1900-2100), the site's diurnal motion from
 * {@code jauApco13} (Earth rotation angle, WGS84 site, no polar motion, UT1 = UTC: the neglected
 * terms change the velocity by less than 1e-4 km/s). Stateless and thread-safe.
 */
final class SolarSystem {

    /** Astronomical unit, km (IAU 2012 Resolution B2). */
    static final double AU_KM = 149597870.7;
    /** Seconds per day. */
    static final double DAY_S = 86400.0;
    /** Speed of light, km/s. */
    static final double C_KM_S = 299792.458;
    /** MJD zero point as a Julian date. */
    static final double MJD0 = 2400000.5;
    /** TT - UTC since 2017 January 1 (37 leap seconds + 32.184 s); used only if the leap-second table refuses the date. */
    static final double TT_MINUS_UTC_2017_S = 69.184;

    private SolarSystem() {
    }

    /** What {@link #observerVelocity} found: the velocity (km/s, ICRS axes) and caveats. */
    record Velocity(double[] kmPerS, String method, String note) {
    }

    /**
     * The observer's velocity, km/s, in ICRS axes.
     *
     * @param mjdUtc       exposure mid-point, UTC MJD
     * @param lonDeg       site longitude (east positive), NaN for a geocentric observer
     * @param latDeg       site geodetic latitude
     * @param heightM      site height above the WGS84 ellipsoid, m (NaN taken as 0)
     * @param heliocentric relative to the Sun's centre instead of the barycentre
     */
    static Velocity observerVelocity(double mjdUtc, double lonDeg, double latDeg, double heightM, boolean heliocentric) {
        StringBuilder note = new StringBuilder();
        double ttMjd;
        try {
            JSOFA.JulianDate tai = JSOFA.jauUtctai(MJD0, mjdUtc);
            JSOFA.JulianDate tt = JSOFA.jauTaitt(tai.djm0, tai.djm1);
            ttMjd = (tt.djm0 - MJD0) + tt.djm1;
        } catch (JSOFAException | RuntimeException e) {
            ttMjd = mjdUtc + TT_MINUS_UTC_2017_S / DAY_S;
            note.append("leap-second table refused the date; TT = UTC + 69.184 s assumed. ");
        }
        double[][] pvh = new double[2][3];
        double[][] pvb = new double[2][3];
        // TDB - TT is below 2 ms: negligible for a velocity.
        int status = JSOFA.jauEpv00(MJD0, ttMjd, pvh, pvb);
        if (status != 0) {
            note.append("date outside 1900-2100, where the Earth ephemeris is less accurate. ");
        }
        double[] earth = scale(heliocentric ? pvh[1] : pvb[1], AU_KM / DAY_S);
        String method = "JSOFA jauEpv00 Earth " + (heliocentric ? "heliocentric" : "barycentric") + " velocity";
        if (Double.isFinite(lonDeg) && Double.isFinite(latDeg)) {
            double h = Double.isFinite(heightM) ? heightM : 0.0;
            if (!Double.isFinite(heightM)) {
                note.append("site height unknown, 0 m assumed. ");
            }
            double[] diurnal = diurnal(mjdUtc, lonDeg, latDeg, h, pvb[1]);
            for (int i = 0; i < 3; i++) {
                earth[i] += diurnal[i];
            }
            method += " + site diurnal velocity (JSOFA jauApco13)";
        } else {
            note.append("site unknown: geocentric correction, the diurnal term (up to 0.47 km/s) is left out. ");
        }
        return new Velocity(earth, method, note.toString().trim());
    }

    /** The site's velocity relative to the geocentre (km/s, GCRS axes) = observer barycentric - Earth barycentric. */
    private static double[] diurnal(double mjdUtc, double lonDeg, double latDeg, double heightM, double[] earthBaryAuPerDay) {
        JSOFA.Astrom astrom = new JSOFA.Astrom();
        try {
            JSOFA.jauApco13(MJD0, mjdUtc, 0.0, Math.toRadians(lonDeg), Math.toRadians(latDeg), heightM, 0.0, 0.0, 0.0,
                    0.0, 0.0, 0.0, astrom);
        } catch (JSOFAException e) {
            throw new IllegalArgumentException("site or time refused by the SOFA routines: " + e.getMessage(), e);
        }
        double[] out = new double[3];
        for (int i = 0; i < 3; i++) {
            out[i] = astrom.v[i] * C_KM_S - earthBaryAuPerDay[i] * AU_KM / DAY_S;
        }
        return out;
    }

    /** Unit vector towards ICRS (ra, dec), degrees. */
    static double[] direction(double raDeg, double decDeg) {
        double a = Math.toRadians(raDeg);
        double d = Math.toRadians(decDeg);
        return new double[] {Math.cos(d) * Math.cos(a), Math.cos(d) * Math.sin(a), Math.sin(d)};
    }

    static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    static double[] scale(double[] v, double f) {
        return new double[] {v[0] * f, v[1] * f, v[2] * f};
    }

    /** ICRS (ra, dec) to Galactic (l, b), degrees, with JSOFA {@code jauIcrs2g}. */
    static double[] galactic(double raDeg, double decDeg) {
        JSOFA.SphericalCoordinate g = JSOFA.jauIcrs2g(Math.toRadians(raDeg), Math.toRadians(decDeg));
        double l = Math.toDegrees(g.alpha);
        return new double[] {l < 0 ? l + 360 : l, Math.toDegrees(g.delta)};
    }
}
