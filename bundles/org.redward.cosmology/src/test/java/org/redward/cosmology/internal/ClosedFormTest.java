package org.redward.cosmology.internal;

import static org.redward.cosmology.internal.PublishedValuesTest.rel;

import org.junit.jupiter.api.Test;
import org.redward.api.cosmology.Cosmology;
import org.redward.api.cosmology.CosmologyParameters;

/**
 * The closed forms of REFERENCES section 1 (Einstein-de Sitter, de Sitter, Milne, Mattig, flat
 * LCDM age) over a range of redshifts, to 1e-9 relative (the tolerance stated there).
 */
class ClosedFormTest {

    static final double[] ZS = {1e-6, 1e-3, 0.01, 0.05, 0.1, 0.3, 0.5, 0.77, 1, 1.5, 2, 3, 5, 7.5, 10, 20, 50, 100, 1000, 9999};
    static final double C = CosmologyParameters.SPEED_OF_LIGHT_KM_PER_S;

    @Test
    void einsteinDeSitter() {
        Cosmology c = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(1).flat().build());
        double dh = C / 70;
        for (double z : ZS) {
            rel(2 * dh * z / (Math.sqrt(1 + z) * (1 + Math.sqrt(1 + z))), c.comovingDistanceMpc(z), 1e-9, "EdS D_C(" + z + ")");
            rel(2.0 / 3.0 * c.hubbleTimeGyr() * Math.pow(1 + z, -1.5), c.ageGyr(z), 1e-9, "EdS t(" + z + ")");
        }
    }

    @Test
    void deSitter() {
        Cosmology c = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(0).flat().build());
        for (double z : ZS) {
            rel(C / 70 * z, c.comovingDistanceMpc(z), 1e-9, "de Sitter D_C(" + z + ")");
            rel(c.hubbleTimeGyr() * Math.log1p(z), c.lookbackTimeGyr(z), 1e-9, "de Sitter t_L(" + z + ")");
        }
    }

    @Test
    void milne() {
        Cosmology c = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(0).omegaDarkEnergy(0).build());
        double dh = C / 70;
        for (double z : ZS) {
            rel(dh * Math.log1p(z), c.comovingDistanceMpc(z), 1e-9, "Milne D_C(" + z + ")");
            rel(dh * z * (1 + z / 2), c.luminosityDistanceMpc(z), 1e-9, "Milne D_L(" + z + ")");
            rel(c.hubbleTimeGyr() * z / (1 + z), c.lookbackTimeGyr(z), 1e-9, "Milne t_L(" + z + ")");
        }
        rel(c.hubbleTimeGyr(), c.ageGyr(0), 1e-9, "Milne t0 = t_H");
    }

    @Test
    void mattig() {
        for (double om : new double[] {0.05, 0.3, 1.0, 2.0, 3.0}) {
            Cosmology c = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(om).omegaDarkEnergy(0).build());
            double q0 = om / 2;
            for (double z : ZS) {
                double mattig = C / (70 * q0 * q0) * (q0 * z + (q0 - 1) * (Math.sqrt(1 + 2 * q0 * z) - 1));
                rel(mattig, c.luminosityDistanceMpc(z), z < 0.01 ? 1e-7 : 1e-9, "Mattig Om=" + om + " D_L(" + z + ")");
            }
        }
    }

    @Test
    void flatLcdmAge() {
        for (double om : new double[] {0.05, 0.272, 0.3, 0.5, 0.9}) {
            Cosmology c = new FlrwCosmology(CosmologyParameters.builder().h0(67).omegaMatter(om).flat().build());
            double ol = 1 - om;
            for (double z : ZS) {
                double t = 2 * c.hubbleTimeGyr() / (3 * Math.sqrt(ol)) * asinh(Math.sqrt(ol / om) * Math.pow(1 + z, -1.5));
                rel(t, c.ageGyr(z), 1e-9, "flat LCDM Om=" + om + " age(" + z + ")");
            }
        }
    }

    private static double asinh(double x) {
        return Math.log(x + Math.sqrt(x * x + 1));
    }
}
