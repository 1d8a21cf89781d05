package org.redward.workbench.internal;

/**
 * The two small formulas of the workbench's own (velocity conventions come from the frames API).
 * Pure functions; thread-safe.
 */
final class Kinematics {

    /** Speed of light in km/s (exact, SI definition). */
    static final double C_KM_PER_S = 299_792.458;

    private Kinematics() {
    }

    /**
     * Velocity difference between two redshifts of the same object in its rest frame:
     * {@code c (z2 - z1) / (1 + z1)} km/s (common practice for comparing two redshift measurements).
     */
    static double velocityDifferenceKmPerS(double z1, double z2) {
        return C_KM_PER_S * (z2 - z1) / (1 + z1);
    }

    /**
     * The redshift implied by a feature at {@code observedAngstrom} named as a line of rest
     * wavelength {@code restAngstrom} (both vacuum): {@code z = observed / rest - 1}.
     */
    static double redshiftFromLine(double observedAngstrom, double restAngstrom) {
        return observedAngstrom / restAngstrom - 1.0;
    }
}
