package org.redward.mock.internal;

import org.jastronomy.jsofa.JSOFA;
import org.jastronomy.jsofa.JSOFAIllegalParameter;
import org.jastronomy.jsofa.JSOFAInternalError;

/**
 * The velocity of an observer on the Earth relative to the solar-system barycentre, projected on
 * a direction, used by the generator to shift spectra from the barycentric frame to the
 * telescope's (topocentric) frame. The inverse of the usual correction
 * {@code 1 + z_bary = (1 + z_topo)(1 + v.n/c)} (first order in v/c; the neglected terms are
 * below 1e-8, i.e. 3 m/s; Wright &amp; Eastman 2014, PASP 126, 838, argue for this multiplicative
 * form).
 *
 * <p>Earth's barycentric velocity from SOFA's {@code epv00} (through JSOFA), plus the diurnal
 * velocity of the site from {@code pvtob} rotated from the celestial intermediate system to
 * GCRS with {@code c2i06a}. Time scales: TT = UTC + 69.184 s (valid 2017-2026 and beyond until
 * the next leap second; an error of a minute changes v by under 1 cm/s); UT1 = UTC (error
 * below 1 s, under 0.5 m/s diurnal). Polar motion neglected. Thread-safe (stateless).
 */
public final class ObserverMotion {

    /** Astronomical unit, km (IAU 2012, exact). */
    static final double AU_KM = 149_597_870.7;
    static final double TT_MINUS_UTC_S = 69.184;

    private ObserverMotion() {
    }

    /** Earth-centre barycentric velocity, km/s, BCRS axes (ICRS). */
    public static double[] earthVelocityKmPerS(double mjdUtc) {
        double[][] pvh = new double[2][3];
        double[][] pvb = new double[2][3];
        JSOFA.jauEpv00(2400000.5, mjdUtc + TT_MINUS_UTC_S / 86400.0, pvh, pvb);
        double k = AU_KM / 86400.0;
        return new double[] {pvb[1][0] * k, pvb[1][1] * k, pvb[1][2] * k};
    }

    /** Diurnal velocity of a site, km/s, GCRS axes. */
    public static double[] siteVelocityKmPerS(double mjdUtc, double lonDeg, double latDeg, double heightM) {
        try {
            double era = JSOFA.jauEra00(2400000.5, mjdUtc);
            double[][] pv = JSOFA.jauPvtob(Math.toRadians(lonDeg), Math.toRadians(latDeg), heightM, 0, 0, 0, era);
            double[][] c2i = JSOFA.jauC2i06a(2400000.5, mjdUtc + TT_MINUS_UTC_S / 86400.0);
            double[] v = JSOFA.jauTrxp(c2i, pv[1]);
            return new double[] {v[0] / 1000.0, v[1] / 1000.0, v[2] / 1000.0};
        } catch (JSOFAIllegalParameter | JSOFAInternalError e) {
            throw new IllegalArgumentException("site " + lonDeg + ", " + latDeg + ", " + heightM + " m: " + e.getMessage(), e);
        }
    }

    /** Unit vector toward (RA, Dec), ICRS degrees. */
    public static double[] direction(double raDeg, double decDeg) {
        return JSOFA.jauS2c(Math.toRadians(raDeg), Math.toRadians(decDeg));
    }

    /**
     * The barycentric correction v.n (km/s) for a source at (RA, Dec) seen from the site at the
     * given UTC MJD: positive when the observer moves toward the source.
     */
    public static double projectedVelocityKmPerS(double mjdUtc, double raDeg, double decDeg,
            double lonDeg, double latDeg, double heightM) {
        double[] v = observerVelocityKmPerS(mjdUtc, lonDeg, latDeg, heightM);
        double[] n = direction(raDeg, decDeg);
        return v[0] * n[0] + v[1] * n[1] + v[2] * n[2];
    }

    /** Barycentric velocity of the observer (Earth plus diurnal), km/s, ICRS axes. */
    public static double[] observerVelocityKmPerS(double mjdUtc, double lonDeg, double latDeg, double heightM) {
        double[] e = earthVelocityKmPerS(mjdUtc);
        double[] s = siteVelocityKmPerS(mjdUtc, lonDeg, latDeg, heightM);
        return new double[] {e[0] + s[0], e[1] + s[1], e[2] + s[2]};
    }
}
