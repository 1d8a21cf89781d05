package org.redward.platform.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

/** Distances and frames through the assembled product: the cosmology and frames bundles inside a real Felix. */
class CosmologyIT {

    private static double number(String json, String key) {
        Matcher m = Pattern.compile("\"" + key + "\":(-?[0-9.eE+-]+)").matcher(json);
        assertTrue(m.find(), key + " missing in " + json);
        return Double.parseDouble(m.group(1));
    }

    @Test
    void distanceAgainstPublishedTable() throws Exception {
        // Reference table section 1 row 9 (astropy cosmo_flat.ecsv, an external code): flat, Omega_m = 0.3, h = 0.7,
        // D_M(1) = 3303.8288 Mpc, D_A(1) = 1651.9144, D_L(1) = 6607.6577; tolerance 1e-6.
        Product.Run r = Product.run("distance", "1", "--json", "--h0", "70", "--omega-m", "0.3", "--t-cmb", "0");
        assertEquals(0, r.status(), r.toString());
        assertEquals(3303.8288, number(r.out(), "transverse_comoving_mpc"), 3303.8288 * 1e-6);
        assertEquals(1651.9144, number(r.out(), "angular_diameter_mpc"), 1651.9144 * 1e-6);
        assertEquals(6607.6577, number(r.out(), "luminosity_mpc"), 6607.6577 * 1e-6);
    }

    @Test
    void planckAgeAndNamedSets() throws Exception {
        // Planck Collaboration VI (2020), Table 2: t0 = 13.787 Gyr.
        Product.Run r = Product.run("distance", "0", "--json", "--cosmology", "planck2018");
        assertEquals(0, r.status(), r.toString());
        assertEquals(13.787, number(r.out(), "age_gyr"), 0.0005);
        Product.Run p = Product.run("plugins", "--json");
        assertTrue(p.out().contains("\"cosmologies\":["), p.toString());
        for (String id : new String[] {"planck2018", "ladder2022", "eds"}) {
            assertTrue(p.out().contains("\"id\":\"" + id + "\""), id + ": " + p);
        }
    }

    @Test
    void cmbFrameThroughTheCommand() throws Exception {
        // Reference table section 6 (C): z_h = 0.01 at the Planck 2018 dipole apex (ra, dec) = (167.9419, -6.9443) gives
        // z_cmb = 0.0112466920; the apex position is rounded here, so 1e-8.
        Product.Run r = Product.run("distance", "0.01", "--json", "--frame", "cmb", "--observed-in", "heliocentric",
                "--ra", "167.94190", "--dec", "-6.94430");
        assertEquals(0, r.status(), r.toString());
        assertEquals(0.0112466920, number(r.out(), "z"), 1e-8);
        assertTrue(r.out().contains("\"frame\":\"cmb\""), r.toString());
    }

    @Test
    void badRedshiftInOneLine() throws Exception {
        Product.Run r = Product.run("distance", "-0.5");
        assertEquals(2, r.status(), r.toString());
        assertTrue(r.err().contains("z:"), r.toString());
        assertTrue(r.err().strip().lines().count() == 1, r.toString());
    }
}
