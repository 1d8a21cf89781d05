package org.redward.cosmology.internal;

import org.redward.api.cosmology.CosmologyParameters;

/** The parameter sets this bundle publishes (each as a {@link org.redward.api.cosmology.CosmologySet} service). */
final class NamedSets {

    private NamedSets() {
    }

    /** Id of the early-universe set. */
    static final String PLANCK2018_ID = "planck2018";
    /** Id of the local distance-ladder set. */
    static final String LADDER2022_ID = "ladder2022";
    /** Id of the Einstein-de Sitter set. */
    static final String EDS_ID = "eds";

    /** CMB temperature today, K (Fixsen 2009, ApJ 707, 916; value from memory). */
    static final double T_CMB = 2.7255;
    /** Standard effective number of neutrino species (common practice). */
    static final double N_EFF = 3.046;

    /**
     * Planck Collaboration VI (2020, A&A 641, A6), Table 2, TT,TE,EE+lowE+lensing+BAO: H0 = 67.66;
     * Omega_m = 0.30966 is the table's 0.3111 without the one 0.06 eV neutrino, which is carried
     * separately (massive-neutrino density). Flat; T_CMB 2.7255 K, N_eff 3.046. Gives the table's
     * age of 13.787 Gyr.
     */
    static final CosmologyParameters PLANCK2018 = CosmologyParameters.builder().name(PLANCK2018_ID)
            .citation("Planck Collaboration VI (2020, A&A 641, A6), Table 2, TT,TE,EE+lowE+lensing+BAO: H0 = 67.66, "
                    + "Omega_m = 0.30966 (0.3111 less the neutrinos), one neutrino of 0.06 eV, flat, "
                    + "T_CMB = 2.7255 K, N_eff = 3.046; sigma(H0) = 0.42 and sigma(Omega_m) = 0.0056 are quoted from memory")
            .h0(67.66).omegaMatter(0.30966).flat().cmbTemperatureK(T_CMB).effectiveNeutrinoSpecies(N_EFF).neutrinoMassesEv(0.06)
            .sigmaH0(0.42).sigmaOmegaMatter(0.0056).build();

    /**
     * The local distance ladder: H0 = 73.04 +- 1.04 (Riess et al. 2022, ApJL 934, L7;
     * arXiv:2112.04510). The ladder does not measure Omega_m: the Planck 2018 matter density and
     * radiation are used with it, flat.
     */
    static final CosmologyParameters LADDER2022 = CosmologyParameters.builder().name(LADDER2022_ID)
            .citation("Riess et al. (2022, ApJL 934, L7; arXiv:2112.04510): H0 = 73.04 +- 1.04 from the Cepheid-SN Ia "
                    + "distance ladder; Omega_m = 0.30966, neutrinos, flatness, T_CMB and N_eff taken from the planck2018 set")
            .h0(73.04).omegaMatter(0.30966).flat().cmbTemperatureK(T_CMB).effectiveNeutrinoSpecies(N_EFF).neutrinoMassesEv(0.06)
            .sigmaH0(1.04).sigmaOmegaMatter(0.0056).build();

    /** Einstein-de Sitter: flat, matter only, no radiation; H0 = 70 by convention (change it with --h0). */
    static final CosmologyParameters EDS = CosmologyParameters.builder().name(EDS_ID)
            .citation("Einstein-de Sitter model (Omega_m = 1, no dark energy, no radiation); H0 = 70 km/s/Mpc by convention")
            .h0(70.0).omegaMatter(1.0).flat().cmbTemperatureK(0.0).build();
}
