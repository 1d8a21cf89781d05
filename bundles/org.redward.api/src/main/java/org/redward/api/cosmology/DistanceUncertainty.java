package org.redward.api.cosmology;

import java.util.Locale;

/**
 * The one-sigma uncertainty of one {@link Quantity} at one redshift, split into its terms:
 * the measured redshift's error, the peculiar velocity (which makes the observed redshift differ
 * from the cosmological one: sigma_z = (1+z) sigma_v / c, from (1+z_obs) = (1+z_cos)(1+z_pec)),
 * and the uncertainties of the cosmological parameters (H0 and Omega_m, treated as independent).
 * Terms are combined in quadrature (linear propagation). Immutable.
 *
 * @param quantity           the quantity
 * @param z                  the redshift
 * @param value              the quantity's value
 * @param fromRedshift       sigma from sigma_z (same unit as value)
 * @param fromPeculiarVelocity sigma from the peculiar-velocity dispersion
 * @param fromParameters     sigma from the parameter uncertainties of the cosmology
 * @param sigmaZ             the sigma_z used
 * @param peculiarVelocityKmPerS the peculiar-velocity dispersion used, km/s
 */
public record DistanceUncertainty(Quantity quantity, double z, double value, double fromRedshift,
        double fromPeculiarVelocity, double fromParameters, double sigmaZ, double peculiarVelocityKmPerS) {

    /** Common practice: galaxy peculiar velocities are typically about 300 km/s. */
    public static final double DEFAULT_PECULIAR_VELOCITY_KM_PER_S = 300.0;

    /** The quadrature sum of the three terms. */
    public double total() {
        return Math.sqrt(fromRedshift * fromRedshift + fromPeculiarVelocity * fromPeculiarVelocity
                + fromParameters * fromParameters);
    }

    /** The name of the largest term: {@code redshift}, {@code peculiar_velocity} or {@code parameters}. */
    public String dominant() {
        if (fromPeculiarVelocity >= fromRedshift && fromPeculiarVelocity >= fromParameters) {
            return "peculiar_velocity";
        }
        return fromRedshift >= fromParameters ? "redshift" : "parameters";
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s(z=%g) = %g +- %g (z: %g, v_pec: %g, parameters: %g; dominant %s)",
                quantity.key(), z, value, total(), fromRedshift, fromPeculiarVelocity, fromParameters, dominant());
    }
}
