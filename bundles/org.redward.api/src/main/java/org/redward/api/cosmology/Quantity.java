package org.redward.api.cosmology;

/**
 * The quantities a {@link Cosmology} gives for a redshift (Hogg 1999, astro-ph/9905116), each
 * with its machine-readable key (snake_case, unit in the name) as written by {@code --json} and
 * catalogues.
 */
public enum Quantity {
    /** Line-of-sight comoving distance D_C (Hogg eq. 15), Mpc. */
    COMOVING_MPC("comoving_mpc"),
    /** Transverse comoving distance D_M (Hogg eq. 16), Mpc. */
    TRANSVERSE_COMOVING_MPC("transverse_comoving_mpc"),
    /** Angular diameter distance D_A = D_M/(1+z) (Hogg eq. 18), Mpc. */
    ANGULAR_DIAMETER_MPC("angular_diameter_mpc"),
    /** Luminosity distance D_L = (1+z) D_M (Hogg eq. 21), Mpc. */
    LUMINOSITY_MPC("luminosity_mpc"),
    /** Distance modulus 5 log10(D_L / 10 pc) (Hogg eq. 25), mag. */
    DISTANCE_MODULUS_MAG("distance_modulus_mag"),
    /** Lookback time (Hogg eq. 30), Gyr. */
    LOOKBACK_GYR("lookback_gyr"),
    /** Age of the universe at z, Gyr. */
    AGE_GYR("age_gyr"),
    /** Hubble-law distance cz/H0, Mpc: the low-z limit, misleading at high z. */
    HUBBLE_LAW_MPC("hubble_law_mpc"),
    /** (cz/H0 - D_C)/D_C. */
    HUBBLE_LAW_ERROR_VS_COMOVING("hubble_law_rel_error_vs_comoving"),
    /** (cz/H0 - D_L)/D_L. */
    HUBBLE_LAW_ERROR_VS_LUMINOSITY("hubble_law_rel_error_vs_luminosity"),
    /** (cz/H0 - D_A)/D_A. */
    HUBBLE_LAW_ERROR_VS_ANGULAR_DIAMETER("hubble_law_rel_error_vs_angular_diameter"),
    /** H(z) = H0 E(z), km/s/Mpc. */
    HUBBLE_PARAMETER_KM_S_MPC("hubble_parameter_km_s_mpc"),
    /** Proper transverse size of one arcsecond at z, D_A in kpc times pi/648000. */
    SCALE_KPC_PER_ARCSEC("scale_kpc_per_arcsec"),
    /** Total comoving volume out to z over the whole sky (Hogg eq. 29), Gpc^3. */
    COMOVING_VOLUME_GPC3("comoving_volume_gpc3"),
    /** Comoving volume per unit redshift per steradian, D_H D_M^2 / E(z) (Hogg eq. 28), Mpc^3/sr. */
    COMOVING_VOLUME_PER_DZ_PER_SR_MPC3("comoving_volume_per_dz_per_sr_mpc3");

    private final String key;

    Quantity(String key) {
        this.key = key;
    }

    /** The machine-readable key, e.g. {@code comoving_mpc}. */
    public String key() {
        return key;
    }
}
