package org.redward.workbench.internal;

/**
 * The few velocity formulas the workbench shows directly. Pure functions; thread-safe.
 *
 * <p>Definitions (FITS Standard 3.0 Table 8.5 and Greisen et al. 2006, A&amp;A 446, 747, for the
 * optical and radio conventions; the relativistic Doppler formula is textbook physics).
 */
final class Kinematics {

    /** Speed of light in km/s (exact, SI definition). */
    static final double C_KM_PER_S = 299_792.458;

    private Kinematics() {
    }

    /** Optical convention: {@code v = c z}. km/s; NaN in, NaN out. */
    static double opticalKmPerS(double z) {
        return C_KM_PER_S * z;
    }

    /** Radio convention: {@code v = c z / (1 + z)}. km/s; NaN for z &lt;= -1. */
    static double radioKmPerS(double z) {
        return z > -1 ? C_KM_PER_S * z / (1 + z) : Double.NaN;
    }

    /** Relativistic Doppler: {@code v = c ((1+z)^2 - 1) / ((1+z)^2 + 1)}. km/s; NaN for z &lt;= -1. */
    static double relativisticKmPerS(double z) {
        if (!(z > -1)) {
            return Double.NaN;
        }
        double q = (1 + z) * (1 + z);
        return C_KM_PER_S * (q - 1) / (q + 1);
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
