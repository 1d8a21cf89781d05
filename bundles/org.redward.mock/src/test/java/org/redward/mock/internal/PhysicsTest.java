package org.redward.mock.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;
import org.redward.spectrum.AirVacuum;

/** Checks of the generator's physical ingredients against outside sources. */
class PhysicsTest {

    @Test
    void calzettiLawMatchesItsDefinitions() {
        // Calzetti et al. (2000, ApJ 533, 682): k'(V) = R'_V = 4.05 and, since E(B-V) is the colour excess,
        // k'(B) - k'(V) = 1 (B = 4400, V = 5500 Angstrom; effective wavelengths common practice). Tolerance 0.02.
        assertEquals(4.05, Calzetti.k(5500), 0.02);
        assertEquals(1.0, Calzetti.k(4400) - Calzetti.k(5500), 0.02);
        // the two branches of eq. 4 nearly meet at 0.63 micron (published law; 0.03 from memory of its shape)
        assertEquals(Calzetti.k(6299.9), Calzetti.k(6300.1), 0.03);
        // attenuation rises to the blue
        assertTrue(Calzetti.k(1500) > Calzetti.k(3000) && Calzetti.k(3000) > Calzetti.k(8000));
    }

    @Test
    void earthBarycentricVelocityMatchesSofaReference() {
        // SOFA t_epv00 (via the team's reference table, section 5): epv00(2400000.5, 53411.52501161)
        // gives |v_bary| = 30.179699 km/s and a projection of -18.905332 km/s on (0 deg, 0 deg),
        // -21.583050 on (90, 0), -9.358131 on (0, +90); derived (C) with AU = 149597870.7 km.
        double mjdUtc = 53411.52501161 - ObserverMotion.TT_MINUS_UTC_S / 86400.0;
        double[] v = ObserverMotion.earthVelocityKmPerS(mjdUtc);
        assertEquals(30.179699, Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]), 2e-6);
        assertEquals(-18.905332, dot(v, ObserverMotion.direction(0, 0)), 2e-6);
        assertEquals(-21.583050, dot(v, ObserverMotion.direction(90, 0)), 2e-6);
        assertEquals(-9.358131, dot(v, ObserverMotion.direction(0, 90)), 2e-6);
    }

    @Test
    void diurnalSpeedIsEarthRotationAtTheSite() {
        // |v| = omega (N + h) cos(phi), WGS84 a = 6378137 m, f = 1/298.257223563, omega = 7.292115e-5 rad/s
        // (common practice; SOFA's pvtob uses a slightly different rotation rate, hence 1 mm/s).
        double a = 6378137.0;
        double f = 1 / 298.257223563;
        double e2 = f * (2 - f);
        double phi = Math.toRadians(Scenario.SITE_LATITUDE_DEG);
        double nRad = a / Math.sqrt(1 - e2 * Math.sin(phi) * Math.sin(phi));
        double expected = 7.292115e-5 * (nRad + Scenario.SITE_HEIGHT_M) * Math.cos(phi) / 1000.0;
        double[] v = ObserverMotion.siteVelocityKmPerS(61150.2, Scenario.SITE_LONGITUDE_DEG, Scenario.SITE_LATITUDE_DEG,
                Scenario.SITE_HEIGHT_M);
        assertEquals(expected, Math.sqrt(dot(v, v)), 1e-6);
        // the diurnal velocity lies in the equatorial plane (to the precession of the pole since J2000, < 0.01 rad)
        assertEquals(0, v[2] / Math.sqrt(dot(v, v)), 0.01);
    }

    @Test
    void fastErfAgreesWithCommonsMath() {
        // Abramowitz & Stegun (1964) eq. 7.1.26 quotes |error| <= 1.5e-7
        for (double x = -5; x <= 5; x += 0.01) {
            assertEquals(Erf.erf(x), Grid.erf(x), 1.5e-7, "x = " + x);
        }
    }

    @Test
    void gaussianProfilesConserveFlux() {
        Grid g = Grid.quill();
        double[] f = new double[g.n];
        g.addGaussian(f, 6000.0, 1.7, 123.4);
        double sum = 0;
        for (int i = 0; i < g.n; i++) {
            sum += f[i] * (g.edges[i + 1] - g.edges[i]);
        }
        assertEquals(123.4, sum, 1e-4);
    }

    @Test
    void skyLinesSitAtTheirPublishedWavelengths() {
        // The strongest sky line is [O I] 5577.338 Angstrom in air (Osterbrock et al. 1996, from memory); on the
        // vacuum grid it must peak at AirVacuum.airToVacuumAngstrom(5577.338) = 5578.887 (Morton 2000).
        assertEquals(5578.887, AirVacuum.airToVacuumAngstrom(5577.338), 0.002);
        Grid g = Grid.quill();
        double[] sky = Observation.sky(g, 1.0, 0.0);
        int at = g.pixelAtOrAbove(5578.887);
        double c = centroid(g, sky, at, 3);
        assertEquals(5578.887, c, 0.05);
        int na = g.pixelAtOrAbove(AirVacuum.airToVacuumAngstrom(6300.304));
        assertEquals(AirVacuum.airToVacuumAngstrom(6300.304), centroid(g, sky, na, 3), 0.05);
    }

    /** Continuum-subtracted flux-weighted centroid in +-half pixels around {@code at}. */
    static double centroid(Grid g, double[] f, int at, int half) {
        double base = Math.min(f[at - half - 3], f[at + half + 3]);
        double s = 0;
        double sw = 0;
        for (int i = at - half; i <= at + half; i++) {
            s += (f[i] - base) * g.vac[i];
            sw += f[i] - base;
        }
        return s / sw;
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }
}
