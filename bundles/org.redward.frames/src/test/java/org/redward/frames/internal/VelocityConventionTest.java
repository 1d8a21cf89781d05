package org.redward.frames.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.redward.api.frames.Redshifts;
import org.redward.api.frames.VelocityConvention;

/**
 * Velocity conventions (FITS Standard, Greisen et al. 2006, A&A 446, 747) and multiplicative
 * composition, against the check values of REFERENCES section 4 (computed from the definitions).
 */
class VelocityConventionTest {

    @Test
    void conventionsAtZ001() {
        // REFERENCES section 4: z = 0.01 -> v_opt 2997.9246, v_rad 2968.2422, v_rel 2982.9357 km/s (4 decimals given).
        assertEquals(2997.9246, VelocityConvention.OPTICAL.velocityKmPerS(0.01), 1e-4);
        assertEquals(2968.2422, VelocityConvention.RADIO.velocityKmPerS(0.01), 1e-4);
        assertEquals(2982.9357, VelocityConvention.RELATIVISTIC.velocityKmPerS(0.01), 1e-4);
    }

    @Test
    void conventionsAtZ1() {
        // REFERENCES section 4: z = 1 -> 299792.458, 149896.229, 179875.4748 km/s.
        assertEquals(299792.458, VelocityConvention.OPTICAL.velocityKmPerS(1), 1e-9);
        assertEquals(149896.229, VelocityConvention.RADIO.velocityKmPerS(1), 1e-9);
        assertEquals(179875.4748, VelocityConvention.RELATIVISTIC.velocityKmPerS(1), 1e-4);
    }

    @Test
    void inversesRoundTrip() {
        for (VelocityConvention c : VelocityConvention.values()) {
            for (double z : new double[] {0, 1e-5, 0.01, 0.5, 1, 3, 7}) {
                assertEquals(z, c.redshift(c.velocityKmPerS(z)), 1e-12 * (1 + z), c + " z=" + z);
            }
        }
    }

    @Test
    void compositionIsMultiplicative() {
        // REFERENCES section 4: z_cos = 0.1 with v_pec = 300 km/s (v/c to first order) gives z_obs = 0.1011008;
        // adding them naively gives 0.1010007.
        double zPec = VelocityConvention.OPTICAL.redshift(300);
        assertEquals(0.1011008, Redshifts.compose(0.1, zPec), 1e-7);
        assertEquals(0.1010007, 0.1 + zPec, 1e-7);
        // Relativistic Doppler for the peculiar part differs only at order (v/c)^2.
        assertEquals(0.1011008, Redshifts.withPeculiarVelocity(0.1, 300), 1e-6);
        assertEquals(300, Redshifts.peculiarVelocityKmPerS(Redshifts.withPeculiarVelocity(0.1, 300), 0.1), 1e-9);
        assertEquals(0.1, Redshifts.remove(Redshifts.compose(0.1, 0.02), 0.02), 1e-15);
    }
}
