package org.redward.api.frames;

/**
 * Redshifts compose multiplicatively: {@code (1 + z_obs) = (1 + z_1)(1 + z_2)}, e.g. a
 * cosmological redshift and a peculiar Doppler shift (Davis &amp; Scrimgeour 2014, MNRAS 442,
 * 1117), or an observed redshift and a frame correction (Wright &amp; Eastman 2014, PASP 126,
 * 838). Adding them, or adding velocities, is wrong at order z*v/c. Stateless; NaN in, NaN out.
 */
public final class Redshifts {

    /** Speed of light, km/s (exact, SI). */
    public static final double SPEED_OF_LIGHT_KM_PER_S = 299792.458;

    private Redshifts() {
    }

    /** {@code (1 + z1)(1 + z2) - 1}. */
    public static double compose(double z1, double z2) {
        return z1 + z2 + z1 * z2;
    }

    /** The part left when {@code zPart} is taken out of {@code zTotal}: {@code (1 + zTotal)/(1 + zPart) - 1}. */
    public static double remove(double zTotal, double zPart) {
        return (zTotal - zPart) / (1.0 + zPart);
    }

    /**
     * The redshift observed for a source at cosmological redshift {@code zCosmological} moving with
     * peculiar line-of-sight velocity {@code peculiarKmPerS} (relativistic Doppler; positive away).
     */
    public static double withPeculiarVelocity(double zCosmological, double peculiarKmPerS) {
        return compose(zCosmological, VelocityConvention.RELATIVISTIC.redshift(peculiarKmPerS));
    }

    /**
     * The peculiar velocity (relativistic, km/s) implied by an observed redshift and a
     * cosmological one: {@code (1 + z_pec) = (1 + z_obs)/(1 + z_cos)}.
     */
    public static double peculiarVelocityKmPerS(double zObserved, double zCosmological) {
        return VelocityConvention.RELATIVISTIC.velocityKmPerS(remove(zObserved, zCosmological));
    }
}
