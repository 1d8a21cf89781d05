package org.redward.cosmology.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.redward.cosmology.internal.PublishedValuesTest.rel;

import org.junit.jupiter.api.Test;
import org.redward.api.cosmology.Cosmology;
import org.redward.api.cosmology.CosmologyParameters;
import org.redward.api.cosmology.DistanceColumns;
import org.redward.api.cosmology.DistanceUncertainty;
import org.redward.api.cosmology.Distances;
import org.redward.api.cosmology.InvalidCosmologyException;
import org.redward.api.cosmology.Quantity;

/** Inverses, the catalogue path, uncertainties, warnings and bad input. */
class BehaviourTest {

    private final Cosmology planck = new FlrwCosmology(NamedSets.PLANCK2018);

    @Test
    void inversesRoundTrip() {
        for (double z : new double[] {1e-4, 0.01, 0.1, 0.5, 1, 2, 6, 30, 1000}) {
            rel(z, planck.redshiftAtComovingDistance(planck.comovingDistanceMpc(z)), 1e-10, "z from D_C");
            rel(z, planck.redshiftAtLuminosityDistance(planck.luminosityDistanceMpc(z)), 1e-10, "z from D_L");
            rel(z, planck.redshiftAtLookbackTime(planck.lookbackTimeGyr(z)), z < 1e-3 ? 1e-8 : 1e-10, "z from t_L");
        }
        assertThrows(InvalidCosmologyException.class, () -> planck.redshiftAtLookbackTime(20));
        assertThrows(InvalidCosmologyException.class, () -> planck.redshiftAtComovingDistance(-1));
    }

    @Test
    void catalogueMatchesScalar() {
        double[] z = {0, 0.001, 0.05, 0.5, 1, 3, 10, Double.NaN, -0.1, 2e4};
        DistanceColumns cols = planck.distances(z);
        for (int i = 0; i < 7; i++) {
            Distances d = planck.distances(z[i]);
            assertTrue(cols.valid(i));
            for (Quantity q : Quantity.values()) {
                double a = d.get(q);
                double b = cols.get(q, i);
                assertTrue(a == b || Math.abs(a - b) <= 1e-13 * Math.abs(a), q + " at " + z[i] + ": " + a + " vs " + b);
            }
        }
        for (int i = 7; i < z.length; i++) {
            assertFalse(cols.valid(i), "row " + i);
        }
        assertTrue(cols.hubbleLawWarning(4));
        assertFalse(cols.hubbleLawWarning(1));
    }

    @Test
    void hubbleLawErrorAndWarning() {
        // Low-z expansion (Hogg 1999 / common practice): D_C ~ cz/H0 (1 - (1 + q0) z / 2), q0 = Om/2 - OL for LCDM.
        Cosmology c = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(0.3).flat().build());
        double q0 = 0.3 / 2 - 0.7;
        Distances d = c.distances(0.001);
        assertEquals((1 + q0) * 0.001 / 2, d.get(Quantity.HUBBLE_LAW_ERROR_VS_COMOVING), 2e-6);
        assertTrue(d.warnings().stream().noneMatch(w -> w.contains("Hubble-law")));
        Distances far = c.distances(0.5);
        assertTrue(far.warnings().stream().anyMatch(w -> w.contains("Hubble-law")), far.warnings().toString());
        assertEquals(0.0, c.distances(0).get(Quantity.HUBBLE_LAW_ERROR_VS_COMOVING));
    }

    @Test
    void uncertaintyTerms() {
        // D is proportional to c/H0 at fixed densities (Hogg 1999 eq. 15; no radiation here), so sigma_D(H0) = D sigma_H0 / H0.
        CosmologyParameters p = CosmologyParameters.builder().h0(70).omegaMatter(0.3).flat().sigmaH0(1.4).build();
        Cosmology c = new FlrwCosmology(p);
        DistanceUncertainty u = c.uncertainty(Quantity.LUMINOSITY_MPC, 1.0, 0.0, 0.0);
        rel(c.luminosityDistanceMpc(1) * 1.4 / 70, u.fromParameters(), 1e-6, "sigma from H0");
        assertEquals("parameters", u.dominant());
        // dD_C/dz = D_H / E(z) (Hogg eq. 15), and a 300 km/s peculiar velocity is sigma_z = (1+z) 300/c.
        DistanceUncertainty v = c.uncertainty(Quantity.COMOVING_MPC, 0.01, 1e-4, 300);
        double dDdz = c.hubbleDistanceMpc() / c.efunc(0.01);
        rel(dDdz * 1e-4, v.fromRedshift(), 1e-6, "sigma from z");
        rel(dDdz * 1.01 * 300 / CosmologyParameters.SPEED_OF_LIGHT_KM_PER_S, v.fromPeculiarVelocity(), 1e-6, "sigma from v_pec");
        assertEquals("peculiar_velocity", v.dominant());
        // Planck: at z = 0.5, the 0.42 km/s/Mpc of H0 (0.6%) outweighs 300 km/s (0.2% of cz at z = 0.5).
        assertEquals("parameters", planck.uncertainty(Quantity.LUMINOSITY_MPC, 0.5, 1e-4, 300).dominant());
    }

    @Test
    void badRedshifts() {
        InvalidCosmologyException e = assertThrows(InvalidCosmologyException.class, () -> planck.comovingDistanceMpc(-0.1));
        assertEquals("z", e.parameter());
        assertThrows(InvalidCosmologyException.class, () -> planck.distances(Double.NaN));
        assertThrows(InvalidCosmologyException.class, () -> planck.ageGyr(Cosmology.MAX_REDSHIFT * 2));
    }

    @Test
    void badParameters() {
        assertEquals("omega_m", assertThrows(InvalidCosmologyException.class,
                () -> CosmologyParameters.builder().omegaMatter(-0.1).build()).parameter());
        assertEquals("h0", assertThrows(InvalidCosmologyException.class,
                () -> CosmologyParameters.builder().h0(0).build()).parameter());
        assertEquals("h0", assertThrows(InvalidCosmologyException.class,
                () -> CosmologyParameters.builder().h0(Double.NaN).build()).parameter());
        assertEquals("omega_lambda", assertThrows(InvalidCosmologyException.class,
                () -> CosmologyParameters.builder().omegaMatter(0.3).omegaDarkEnergy(-0.2).build()).parameter());
        // A closed universe with no big bang (a bounce): Omega_m = 0.3, Omega_Lambda = 2.
        InvalidCosmologyException bounce = assertThrows(InvalidCosmologyException.class,
                () -> CosmologyParameters.builder().omegaMatter(0.3).omegaDarkEnergy(2).build());
        assertTrue(bounce.getMessage().contains("no big bang"), bounce.getMessage());
        assertEquals("t_cmb", assertThrows(InvalidCosmologyException.class,
                () -> CosmologyParameters.builder().cmbTemperatureK(-1).build()).parameter());
    }

    @Test
    void darkEnergyW0Wa() {
        // Constant w: Omega_de scales as (1+z)^(3(1+w)) (Linder 2003 with wa = 0); E(z)^2 checked directly.
        CosmologyParameters p = CosmologyParameters.builder().h0(70).omegaMatter(0.3).flat().w0(-0.8).build();
        Cosmology c = new FlrwCosmology(p);
        double z = 1.3;
        double e2 = 0.3 * Math.pow(1 + z, 3) + 0.7 * Math.pow(1 + z, 3 * 0.2);
        rel(Math.sqrt(e2), c.efunc(z), 1e-14, "E(z) for w = -0.8");
        // w0 = -1, wa = 0 given explicitly equals the cosmological constant.
        Cosmology lcdm = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(0.3).flat().build());
        Cosmology w = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(0.3).flat().w0(-1.0).wa(1e-12).build());
        rel(lcdm.comovingDistanceMpc(2), w.comovingDistanceMpc(2), 1e-10, "w0wa -> LCDM");
    }

    @Test
    void threadSafeConcurrentUse() throws Exception {
        double expected = planck.comovingDistanceMpc(1.234);
        Thread[] t = new Thread[4];
        boolean[] ok = new boolean[t.length];
        for (int k = 0; k < t.length; k++) {
            int kk = k;
            t[k] = new Thread(() -> {
                boolean good = true;
                for (int i = 0; i < 20000; i++) {
                    good &= planck.comovingDistanceMpc(1.234) == expected;
                }
                ok[kk] = good;
            });
            t[k].start();
        }
        for (int k = 0; k < t.length; k++) {
            t[k].join();
            assertTrue(ok[k]);
        }
    }
}
