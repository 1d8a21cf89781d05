package org.redward.frames.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;
import org.redward.api.frames.Frame;
import org.redward.api.frames.FrameCorrection;
import org.redward.api.frames.FrameRequest;
import org.redward.api.frames.SolarMotion;
import org.redward.spectrum.SpectrumMetadata;

/**
 * Barycentric, CMB and Local Group corrections against REFERENCES sections 5 and 6: the SOFA
 * Earth-ephemeris test values (JSOFATest.t_epv00 = SOFA t_sofa_c.c), the derived barycentric
 * projections, the SOFA Galactic test (t_g2icrs), the Planck 2018 dipole conversion, and the
 * published Local Group formulas.
 */
class FrameReferenceTest {

    private final FrameService service = new FrameService();

    /** TT date of the SOFA test, as an MJD. */
    private static final double TEST_TT_MJD = 53411.52501161;
    /** TT - UTC in February 2005: 32 leap seconds + 32.184 s (IERS Bulletin C, common practice). */
    private static final double TT_MINUS_UTC_2005 = 64.184;

    @Test
    void sofaEarthEphemeris() {
        // REFERENCES section 5: jauEpv00(2400000.5, 53411.52501161) returns 0 and these vectors (tolerances 1e-14 / 1e-15).
        double[][] pvh = new double[2][3];
        double[][] pvb = new double[2][3];
        assertEquals(0, JSOFA.jauEpv00(2400000.5, TEST_TT_MJD, pvh, pvb));
        assertEquals(-0.7757238809297706813, pvh[0][0], 1e-14);
        assertEquals(0.5598052241363340596, pvh[0][1], 1e-14);
        assertEquals(0.2426998466481686993, pvh[0][2], 1e-14);
        assertEquals(-0.1091891824147313846e-1, pvh[1][0], 1e-15);
        assertEquals(-0.1247187268440845008e-1, pvh[1][1], 1e-15);
        assertEquals(-0.5407569418065039061e-2, pvh[1][2], 1e-15);
        assertEquals(-0.7714104440491111971, pvb[0][0], 1e-14);
        assertEquals(0.5598412061824171323, pvb[0][1], 1e-14);
        assertEquals(0.2425996277722452400, pvb[0][2], 1e-14);
        assertEquals(-0.1091874268116823295e-1, pvb[1][0], 1e-15);
        assertEquals(-0.1246525461732861538e-1, pvb[1][1], 1e-15);
        assertEquals(-0.5404773180966231279e-2, pvb[1][2], 1e-15);
    }

    @Test
    void barycentricProjections() {
        // REFERENCES section 5 (derived, C): |v_bary| = 30.179699 km/s; projections -18.905332 (0,0), -21.583050 (90,0),
        // -9.358131 (0,+90) km/s. Through the service's whole path (UTC -> TT with JSOFA, geocentric observer).
        double mjdUtc = TEST_TT_MJD - TT_MINUS_UTC_2005 / 86400.0;
        assertEquals(-18.905332, service.solarSystemVelocityKmPerS(mjdUtc, 0, 0, Double.NaN, Double.NaN, Double.NaN, false), 2e-6);
        assertEquals(-21.583050, service.solarSystemVelocityKmPerS(mjdUtc, 90, 0, Double.NaN, Double.NaN, Double.NaN, false), 2e-6);
        assertEquals(-9.358131, service.solarSystemVelocityKmPerS(mjdUtc, 0, 90, Double.NaN, Double.NaN, Double.NaN, false), 2e-6);
        SolarSystem.Velocity v = SolarSystem.observerVelocity(mjdUtc, Double.NaN, Double.NaN, Double.NaN, false);
        assertEquals(30.179699, Math.sqrt(SolarSystem.dot(v.kmPerS(), v.kmPerS())), 2e-6);
    }

    @Test
    void barycentricCorrectionIsMultiplicative() {
        // Wright & Eastman (2014): 1 + z_B = (1 + z_obs)(1 + v.n/c) to first order (REFERENCES section 5); we apply the
        // special-relativistic gamma too, which changes z by gamma - 1 ~ 5e-9 at 30 km/s.
        double mjdUtc = TEST_TT_MJD - TT_MINUS_UTC_2005 / 86400.0;
        SpectrumMetadata m = SpectrumMetadata.builder().skyPosition(0, 0).midExposureMjdUtc(mjdUtc).build();
        FrameCorrection fc = service.correct(0.1, m, FrameRequest.BARYCENTRIC);
        assertTrue(fc.complete());
        double firstOrder = 1.1 * (1 - 18.905332 / 299792.458) - 1;
        assertEquals(firstOrder, fc.z(), 1.1e-8);
        assertTrue(fc.notes().stream().anyMatch(n -> n.contains("geocentric")), "the missing site is reported");
    }

    @Test
    void diurnalTermIsBounded() {
        // Earth's equatorial rotation speed is 0.4651 km/s (handbook value, from memory): a site on the equator adds at most that.
        double mjdUtc = 60000.25;
        double geo = service.solarSystemVelocityKmPerS(mjdUtc, 30, 10, Double.NaN, Double.NaN, Double.NaN, false);
        double maxDiff = 0;
        for (double ra = 0; ra < 360; ra += 15) {
            double g = service.solarSystemVelocityKmPerS(mjdUtc, ra, 0, Double.NaN, Double.NaN, Double.NaN, false);
            double s = service.solarSystemVelocityKmPerS(mjdUtc, ra, 0, 0.0, 0.0, 0.0, false);
            maxDiff = Math.max(maxDiff, Math.abs(s - g));
        }
        assertTrue(maxDiff > 0.40 && maxDiff < 0.4652, "diurnal term " + maxDiff);
        assertTrue(Math.abs(geo) < 31);
    }

    @Test
    void sofaGalacticTest() {
        // REFERENCES section 5, SOFA t_g2icrs: (ra, dec) <-> (l, b), tolerance 1e-14 rad.
        JSOFA.SphericalCoordinate g = JSOFA.jauIcrs2g(5.9338074302227188048671, -1.1784870613579944551541);
        assertEquals(5.5850536063818546461558, g.alpha, 1e-14);
        assertEquals(-0.7853981633974483096157, g.delta, 1e-14);
        double[] lb = SolarSystem.galactic(Math.toDegrees(5.9338074302227188048671), Math.toDegrees(-1.1784870613579944551541));
        assertEquals(Math.toDegrees(5.5850536063818546461558), lb[0], 1e-11);
        assertEquals(Math.toDegrees(-0.7853981633974483096157), lb[1], 1e-11);
    }

    @Test
    void cmbDipoleApex() {
        // REFERENCES section 6: Planck 2018 dipole (l, b) = (264.021, 48.253) is (ra, dec) = (167.942, -6.944) (cross-check C: 167.9419, -6.9443).
        JSOFA.SphericalCoordinate eq = JSOFA.jauG2icrs(Math.toRadians(264.021), Math.toRadians(48.253));
        assertEquals(167.9419, Math.toDegrees(eq.alpha), 1e-4);
        assertEquals(-6.9443, Math.toDegrees(eq.delta), 1e-4);
        SolarMotion cmb = SolarMotion.CMB_PLANCK2018;
        assertEquals(369.82, cmb.speedKmPerS(), 1e-9);
        assertEquals(264.021, cmb.apexLongitudeDeg(), 1e-9);
        assertEquals(48.253, cmb.apexLatitudeDeg(), 1e-9);
    }

    @Test
    void cmbFrameConversion() {
        // REFERENCES section 6 (C): z_h = 0.01 at the apex -> z_cmb = 0.0112466920 (exact; 0.0112459226 first order,
        // 0.0112335867 additive); at the anti-apex 0.0087548449. Tolerance 1e-10 (values given to 10 decimals).
        JSOFA.SphericalCoordinate apex = JSOFA.jauG2icrs(Math.toRadians(264.021), Math.toRadians(48.253));
        double ra = Math.toDegrees(apex.alpha);
        double dec = Math.toDegrees(apex.delta);
        FrameRequest toCmb = FrameRequest.of(Frame.HELIOCENTRIC, Frame.CMB);
        FrameCorrection at = service.correct(0.01, SpectrumMetadata.builder().skyPosition(ra, dec).build(), toCmb);
        assertTrue(at.complete());
        assertEquals(0.0112466920, at.z(), 1e-10);
        FrameCorrection anti = service.correct(0.01, SpectrumMetadata.builder().skyPosition(ra + 180, -dec).build(), toCmb);
        assertEquals(0.0087548449, anti.z(), 1e-10);
        assertEquals(369.82, at.steps().get(0).projectedVelocityKmPerS(), 1e-6);
    }

    @Test
    void localGroupDefinitions() {
        // REFERENCES section 6 (C): at (l, b) = (90, 0): +295.000 (Yahil et al. 1977), +300.000 (IAU 1976), +314.798
        // (Karachentsev & Makarov 1996); at (0, 90): -37.600, 0, -22.043 km/s.
        assertEquals(295.000, SolarMotion.LG_YAHIL1977.projectedKmPerS(90, 0), 1e-3);
        assertEquals(300.000, SolarMotion.LG_IAU1976.projectedKmPerS(90, 0), 1e-3);
        assertEquals(314.798, SolarMotion.LG_KARACHENTSEV1996.projectedKmPerS(90, 0), 1e-3);
        assertEquals(-37.600, SolarMotion.LG_YAHIL1977.projectedKmPerS(0, 90), 1e-3);
        assertEquals(0.0, SolarMotion.LG_IAU1976.projectedKmPerS(0, 90), 1e-3);
        assertEquals(-22.043, SolarMotion.LG_KARACHENTSEV1996.projectedKmPerS(0, 90), 1e-3);
        // The implied Yahil apex is 307.7 km/s towards (105.0, -7.0) (REFERENCES section 6, C).
        assertEquals(307.7, SolarMotion.LG_YAHIL1977.speedKmPerS(), 0.05);
        assertEquals(105.0, SolarMotion.LG_YAHIL1977.apexLongitudeDeg(), 0.05);
        assertEquals(-7.0, SolarMotion.LG_YAHIL1977.apexLatitudeDeg(), 0.05);
        assertEquals(SolarMotion.LG_YAHIL1977, SolarMotion.DEFAULT_LOCAL_GROUP);
    }

    @Test
    void localGroupCorrectionFirstOrder() {
        // The Local Group definitions are first-order formulas: cz_LG ~ cz_h + V.n; the multiplicative correction agrees
        // to order z V/c.
        JSOFA.SphericalCoordinate eq = JSOFA.jauG2icrs(Math.toRadians(90), 0);
        SpectrumMetadata m = SpectrumMetadata.builder().skyPosition(Math.toDegrees(eq.alpha), Math.toDegrees(eq.delta)).build();
        FrameCorrection fc = service.correct(0.001, m, FrameRequest.of(Frame.BARYCENTRIC, Frame.LOCAL_GROUP));
        assertEquals(0.001 + 295.0 / 299792.458, fc.z(), 2e-6);
    }

    @Test
    void missingDataIsExplained() {
        FrameCorrection noTime = service.correct(0.05, SpectrumMetadata.builder().skyPosition(10, 20).build(), FrameRequest.BARYCENTRIC);
        assertFalse(noTime.complete());
        assertEquals(Frame.TOPOCENTRIC, noTime.reached());
        assertEquals(0.05, noTime.z(), 0);
        assertTrue(noTime.notes().get(0).contains("time"), noTime.notes().toString());
        FrameCorrection noPos = service.correct(0.05, SpectrumMetadata.builder().midExposureMjdUtc(59000).build(),
                FrameRequest.of(Frame.TOPOCENTRIC, Frame.CMB));
        assertFalse(noPos.complete());
        assertTrue(noPos.notes().get(0).contains("sky position"), noPos.notes().toString());
    }
}
