package org.redward.api.cosmology;

import org.osgi.annotation.versioning.ProviderType;

/**
 * Distances and times under one set of {@link CosmologyParameters} (Hogg 1999,
 * astro-ph/9905116, extended with radiation and w0-wa dark energy). Obtain one from
 * {@link CosmologyCalculator#of(CosmologyParameters)}.
 *
 * <p>Domain: 0 &lt;= z &lt;= {@link #MAX_REDSHIFT}. A NaN, negative or too large z throws
 * {@link InvalidCosmologyException} naming {@code z} (the array method marks such rows invalid
 * instead). Units: Mpc, Gyr, km/s/Mpc, mag. Accuracy: better than 1e-10 relative against the
 * closed forms (Einstein-de Sitter, de Sitter, Milne, Mattig, flat LCDM age).
 *
 * <p>Implementations are immutable and thread-safe; every method may be called concurrently.
 */
@ProviderType
public interface Cosmology {

    /** The largest redshift accepted (beyond it, massless-neutrino radiation and this model are not trustworthy). */
    double MAX_REDSHIFT = 1.0e4;
    /** Relative error of the Hubble law beyond which the output warns (1 per cent). */
    double HUBBLE_LAW_WARNING = 0.01;

    CosmologyParameters parameters();

    /** Hubble distance c/H0, Mpc. */
    double hubbleDistanceMpc();

    /** Hubble time 1/H0, Gyr. */
    double hubbleTimeGyr();

    /** E(z) = H(z)/H0 (Hogg eq. 14 with radiation and w0-wa). */
    double efunc(double z);

    double comovingDistanceMpc(double z);

    double transverseComovingDistanceMpc(double z);

    /** Transverse comoving distance between z1 &lt;= z2 along one line of sight, D_H/sqrt(Ok) sinh(sqrt(Ok)(D_C2 - D_C1)/D_H), Mpc. */
    double transverseComovingDistanceMpc(double z1, double z2);

    double angularDiameterDistanceMpc(double z);

    /** Angular diameter distance of z2 seen from z1 (Hogg eq. 19 generalised), D_M12/(1+z2), Mpc. */
    double angularDiameterDistanceMpc(double z1, double z2);

    double luminosityDistanceMpc(double z);

    double distanceModulusMag(double z);

    double lookbackTimeGyr(double z);

    /** Age of the universe at z, Gyr; infinite for a universe without a big bang in the finite past (de Sitter). */
    double ageGyr(double z);

    /** Comoving volume within z, whole sky, Gpc^3. */
    double comovingVolumeGpc3(double z);

    /** dV_C/dz/dOmega, Mpc^3 per unit z per steradian. */
    double differentialComovingVolumeMpc3PerSr(double z);

    /** Every {@link Quantity} at z, with warnings where the Hubble law misleads. */
    Distances distances(double z);

    /**
     * The catalogue path: every quantity for every redshift, without exceptions (bad rows become
     * NaN, see {@link DistanceColumns}). Same accuracy as the scalar methods.
     */
    DistanceColumns distances(double[] z);

    /** The z whose comoving distance is {@code mpc} (0 &lt;= mpc &lt; D_C(MAX_REDSHIFT)). */
    double redshiftAtComovingDistance(double mpc);

    /** The z whose luminosity distance is {@code mpc}. */
    double redshiftAtLuminosityDistance(double mpc);

    /** The z whose lookback time is {@code gyr}. */
    double redshiftAtLookbackTime(double gyr);

    /**
     * Uncertainty of one quantity at z: from sigma_z, from a peculiar-velocity dispersion (km/s;
     * {@link DistanceUncertainty#DEFAULT_PECULIAR_VELOCITY_KM_PER_S} is common practice), and
     * from the parameter uncertainties of this cosmology (H0, Omega_m).
     */
    DistanceUncertainty uncertainty(Quantity quantity, double z, double sigmaZ, double peculiarVelocityKmPerS);
}
