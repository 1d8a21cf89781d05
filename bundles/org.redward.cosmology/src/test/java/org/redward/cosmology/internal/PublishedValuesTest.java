package org.redward.cosmology.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.redward.api.cosmology.Cosmology;
import org.redward.api.cosmology.CosmologyParameters;

/**
 * Distances and times against published tables and closed forms. Every row number below is the
 * row of section 1 of the team's reference table (../shared/REFERENCES.md), which names the
 * paper or library test each value comes from; the tolerance is the one stated there.
 */
class PublishedValuesTest {

    private static Cosmology flat(double h0, double om) {
        return new FlrwCosmology(CosmologyParameters.builder().h0(h0).omegaMatter(om).flat().build());
    }

    private static Cosmology open(double h0, double om, double ol) {
        return new FlrwCosmology(CosmologyParameters.builder().h0(h0).omegaMatter(om).omegaDarkEnergy(ol).build());
    }

    static void rel(double expected, double actual, double tol, String what) {
        assertTrue(Math.abs(actual - expected) <= tol * Math.abs(expected),
                () -> what + ": expected " + expected + " got " + actual + " (rel " + (actual - expected) / expected + ", tol " + tol + ")");
    }

    @Test
    void row1EinsteinDeSitter() {
        // Row 1: closed forms D_C = 2 D_H (1 - (1+z)^-1/2), t = 2/3 t_H (1+z)^-3/2 (C); astropy test_lambdacdm.py asserts the same numbers.
        Cosmology c = flat(100, 1.0);
        rel(1756.1435599923, c.comovingDistanceMpc(1), 1e-9, "EdS D_C(1)");
        rel(6.5186148112, c.ageGyr(0), 1e-9, "EdS age(0)");
        rel(2.3046783685, c.ageGyr(1), 1e-9, "EdS age(1)");
        rel(4.2139364427, c.lookbackTimeGyr(1), 1e-9, "EdS t_L(1)");
    }

    @Test
    void row2DeSitter() {
        // Row 2: D_C = D_H z, t_L = t_H ln(1+z) (C; astropy special-cosmology tests).
        Cosmology c = flat(100, 0.0);
        rel(2997.92458, c.comovingDistanceMpc(1), 1e-9, "de Sitter D_C(1)");
        rel(6.7775392163, c.lookbackTimeGyr(1), 1e-9, "de Sitter t_L(1)");
        assertTrue(Double.isInfinite(c.ageGyr(0)), "de Sitter has no beginning");
    }

    @Test
    void row3Milne() {
        // Row 3: Milne closed forms (C).
        Cosmology c = open(70, 0, 0);
        rel(2968.575672, c.comovingDistanceMpc(1), 1e-9, "Milne D_C(1)");
        rel(6424.124100, c.luminosityDistanceMpc(1), 1e-9, "Milne D_L(1)");
        rel(6.984230155, c.lookbackTimeGyr(1), 1e-9, "Milne t_L(1)");
        rel(13.968460310, c.ageGyr(0), 1e-9, "Milne t0");
    }

    @Test
    void row4Mattig() {
        // Row 4: Mattig relation, Omega_m = 0.3, Omega_Lambda = 0, H0 = 70 (C).
        Cosmology c = open(70, 0.3, 0);
        rel(5872.294441, c.luminosityDistanceMpc(1), 1e-9, "Mattig D_L(1)");
        rel(24431.820692, c.luminosityDistanceMpc(3), 1e-9, "Mattig D_L(3)");
    }

    @Test
    void row5MattigQ0One() {
        // Row 5: Omega_m = 2 (q0 = 1): D_L = D_H z exactly.
        Cosmology c = open(70, 2.0, 0);
        rel(4282.7494, c.luminosityDistanceMpc(1), 1e-8, "q0=1 D_L(1) (value to 8 digits)");
        rel(CosmologyParameters.SPEED_OF_LIGHT_KM_PER_S / 70 * 2.5, c.luminosityDistanceMpc(2.5), 1e-12, "q0=1 D_L = D_H z");
    }

    @Test
    void row6FlatAge() {
        // Row 6: astropy test_age (H0 = 70.4, Omega_m = 0.272, flat, no radiation); tolerance 1e-8.
        Cosmology c = flat(70.4, 0.272);
        rel(13.7595458980, c.ageGyr(0), 1e-8, "age(0)");
        rel(5.97113193, c.ageGyr(1), 1e-8, "age(1)");
        rel(1.5823603509, c.ageGyr(4), 1e-8, "age(4)");
        rel(1.20553129, c.ageGyr(5), 1e-8, "age(5)");
    }

    @Test
    void row7DistanceModulus() {
        // Row 7: astropy test_distmod; tolerance 1e-6.
        Cosmology c = flat(70.4, 0.272);
        rel(44.124857, c.distanceModulusMag(1), 1e-6, "mu(1)");
        rel(48.40167258, c.distanceModulusMag(5), 1e-6, "mu(5)");
    }

    @Test
    void row8Wright2006() {
        // Row 8: Wright (2006, PASP 118, 1711) values, tolerance 1e-4 (t_L 1e-3), and the two other codes quoted by astropy test_flat_z1.
        Cosmology c = flat(70, 0.27);
        rel(3364.5, c.comovingDistanceMpc(1), 1e-4, "D_C(1) Wright");
        rel(1682.3, c.angularDiameterDistanceMpc(1), 1e-4, "D_A(1) Wright");
        rel(6729.2, c.luminosityDistanceMpc(1), 1e-4, "D_L(1) Wright");
        rel(7.841, c.lookbackTimeGyr(1), 1e-3, "t_L(1) Wright");
        rel(3364.7988, c.comovingDistanceMpc(1), 1e-6, "D_C(1) other codes");
        rel(1682.3994, c.angularDiameterDistanceMpc(1), 1e-6, "D_A(1) other codes");
        rel(6729.5976, c.luminosityDistanceMpc(1), 1e-6, "D_L(1) other codes");
    }

    @Test
    void row9FlatTable() {
        // Row 9: astropy cosmo_flat.ecsv (external code), tolerance 1e-6.
        Cosmology c = flat(70, 0.3);
        rel(1888.6254, c.transverseComovingDistanceMpc(0.5), 1e-6, "D_M(0.5)");
        rel(3303.8288, c.transverseComovingDistanceMpc(1), 1e-6, "D_M(1)");
        rel(5179.8621, c.transverseComovingDistanceMpc(2), 1e-6, "D_M(2)");
        rel(6355.6855, c.transverseComovingDistanceMpc(3), 1e-6, "D_M(3)");
        rel(1651.9144, c.angularDiameterDistanceMpc(1), 1e-6, "D_A(1)");
        rel(6607.6577, c.luminosityDistanceMpc(1), 1e-6, "D_L(1)");
    }

    @Test
    void row10ClosedTable() {
        // Row 10: astropy cosmo_closed.ecsv, Omega_m = 2, Omega_Lambda = 0.1, h = 0.7; tolerance 1e-6.
        Cosmology c = open(70, 2.0, 0.1);
        rel(2152.7954, c.transverseComovingDistanceMpc(1), 1e-6, "closed D_M(1)");
        rel(3195.9966, c.transverseComovingDistanceMpc(3), 1e-6, "closed D_M(3)");
    }

    @Test
    void row11Radiation() {
        // Row 11: astropy test_ogamma (values from Mathematica, "at least as good as 0.01%"), flat, H0 = 70, Omega_m = 0.3,
        // N_eff = 3.04; tolerance 1e-5. The row's values are those of T_CMB = 0; the same astropy test gives the T_CMB = 2.725 K
        // values below (read in astropy's test_flrw / test_cosmology source).
        Cosmology none = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(0.3).flat()
                .cmbTemperatureK(0).effectiveNeutrinoSpecies(3.04).build());
        rel(1651.91, none.angularDiameterDistanceMpc(1), 1e-5, "D_A(1), T=0");
        rel(858.205, none.angularDiameterDistanceMpc(10), 1e-5, "D_A(10), T=0");
        rel(26.8586, none.angularDiameterDistanceMpc(500), 1e-5, "D_A(500), T=0");
        rel(13.6469, none.angularDiameterDistanceMpc(1000), 1e-5, "D_A(1000), T=0");
        Cosmology c = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(0.3).flat()
                .cmbTemperatureK(2.725).effectiveNeutrinoSpecies(3.04).build());
        rel(1651.76, c.angularDiameterDistanceMpc(1), 1e-5, "D_A(1), T=2.725");
        rel(857.817, c.angularDiameterDistanceMpc(10), 1e-5, "D_A(10), T=2.725");
        rel(26.7688, c.angularDiameterDistanceMpc(500), 1e-5, "D_A(500), T=2.725");
        rel(13.5841, c.angularDiameterDistanceMpc(1000), 1e-5, "D_A(1000), T=2.725");
    }

    @Test
    void radiationClosedForm() {
        // Flat, matter + radiation, no dark energy: int_0^z dz/E = 2 (sqrt((1 + Or z)/(1 + z)) - 1)/(Or - 1)
        // (closed form quoted in the same astropy test_ogamma). Checked to 1e-9 relative.
        double or = CosmologyParameters.photonDensity(70, 2.725) * (1 + 3.04 * CosmologyParameters.NEUTRINO_PER_PHOTON);
        Cosmology c = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(1 - or).omegaDarkEnergy(0)
                .cmbTemperatureK(2.725).effectiveNeutrinoSpecies(3.04).build());
        for (double z : ClosedFormTest.ZS) {
            double dc = c.hubbleDistanceMpc() * 2 * (Math.sqrt((1 + or * z) / (1 + z)) - 1) / (or - 1);
            rel(dc, c.comovingDistanceMpc(z), 1e-9, "radiation closed form D_C(" + z + ")");
        }
    }

    @Test
    void row12BetweenTwoRedshifts() {
        // Row 12: astropy test citing Kayser, Helbig & Schramm (1997, A&A 318, 680); tolerance 1e-7.
        Cosmology c = flat(100, 0.3);
        rel(1313.2232194828466, c.transverseComovingDistanceMpc(1, 2), 1e-7, "D_M(1,2)");
    }

    @Test
    void row13ComovingVolume() {
        // Row 13: astropy test_comoving_volume (Wright 2006 value 99.019 Gpc^3); tolerance 1e-2.
        Cosmology c = open(70, 0.27, 0.0);
        rel(99.019, c.comovingVolumeGpc3(1), 1e-2, "V_C(1)");
        rel(99.032, c.comovingVolumeGpc3(1), 1e-4, "V_C(1) closed-form computation (C)");
    }

    @Test
    void planck2018Age() {
        // Planck Collaboration VI (2020), Table 2: t0 = 13.787 +- 0.020 Gyr (as cited by astropy's Planck18 file). It needs
        // radiation and the 0.06 eV neutrino: photons + three massless neutrinos give 13.8039 Gyr (checked here with scipy
        // quad, not 13.7871 as the reference table's caution says), no radiation 13.8095.
        Cosmology c = new FlrwCosmology(NamedSets.PLANCK2018);
        assertEquals(13.787, c.ageGyr(0), 0.0005);
        Cosmology massless = new FlrwCosmology(NamedSets.PLANCK2018.toBuilder().neutrinoMassesEv().build());
        rel(13.803889591977866, massless.ageGyr(0), 1e-9, "massless neutrinos, scipy quad of the same integral");
    }

    @Test
    void ladderSetHasRiessH0() {
        // Riess et al. (2022), abstract: H0 = 73.04 +- 1.04.
        assertEquals(73.04, NamedSets.LADDER2022.h0(), 0);
        assertEquals(1.04, NamedSets.LADDER2022.sigmaH0(), 0);
    }
}
