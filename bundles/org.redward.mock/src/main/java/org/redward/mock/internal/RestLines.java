package org.redward.mock.internal;

import org.redward.spectrum.AirVacuum;

/**
 * Rest-frame vacuum wavelengths (Angstrom) of the lines the generator puts into spectra.
 *
 * <p>Sources: the hydrogen, [O II], Ca II, [O III], Mg b, Na D, [N II], [S II] and Mg II values
 * are the NIST Atomic Spectra Database vacuum values as listed in the team's reference table
 * (checked against two third-party line lists); the others are NIST values quoted from memory
 * (marked "m"). Quasar blends (C IV, Si IV, C III], Mg II as a blend) use the composite-spectrum
 * convention of a single effective wavelength (common practice). Lines of the near-infrared Ca II
 * triplet and the metal features of cool stars were converted from their usual air values with
 * Morton (2000).
 */
public final class RestLines {

    private RestLines() {
    }

    // Hydrogen
    public static final double LY_LIMIT = 911.75;          // m
    public static final double LY_BETA = 1025.72;          // m
    public static final double LY_ALPHA = 1215.67;
    public static final double H_ALPHA = 6564.614;
    public static final double H_BETA = 4862.683;
    public static final double H_GAMMA = 4341.684;
    public static final double H_DELTA = 4102.892;
    public static final double H_EPSILON = 3971.195;       // m
    public static final double H_ZETA = 3890.151;          // m
    public static final double H_ETA = 3836.472;           // m

    // Forbidden and other nebular lines
    public static final double O2_3727 = 3727.092;
    public static final double O2_3730 = 3729.875;
    public static final double NE3_3870 = 3869.86;         // m
    public static final double NE5_3427 = 3426.84;         // m
    public static final double O3_4960 = 4960.295;
    public static final double O3_5008 = 5008.240;
    public static final double HE1_5877 = 5877.25;         // m
    public static final double O1_6302 = 6302.046;         // m
    public static final double N2_6550 = 6549.86;
    public static final double N2_6585 = 6585.27;
    public static final double S2_6718 = 6718.29;
    public static final double S2_6733 = 6732.67;

    // Ultraviolet, mostly quasar broad lines (effective blend wavelengths)
    public static final double N5_1240 = 1240.14;          // m
    public static final double SI4_1400 = 1399.8;          // m, Si IV + O IV] blend
    public static final double C4_1549 = 1549.06;          // m, doublet blend
    public static final double HE2_1640 = 1640.42;         // m
    public static final double C3_1909 = 1908.73;          // m
    public static final double MG2_2800 = 2799.94;         // m, doublet blend
    public static final double MG2_2796 = 2796.352;
    public static final double MG2_2804 = 2803.531;
    public static final double MG1_2853 = 2852.96;         // m
    public static final double FE2_2344 = 2344.21;         // m
    public static final double FE2_2383 = 2382.76;         // m
    public static final double FE2_2587 = 2586.65;         // m
    public static final double FE2_2600 = 2600.17;         // m

    // Stellar absorption features
    public static final double CA2_K = 3934.777;
    public static final double CA2_H = 3969.591;
    public static final double G_BAND = 4305.6;            // a molecular band (common practice)
    public static final double MG_B1 = 5168.761;
    public static final double MG_B2 = 5174.125;
    public static final double MG_B3 = 5185.048;
    public static final double FE_5270 = AirVacuum.airToVacuumAngstrom(5269.54);  // m, Fe I
    public static final double FE_5335 = AirVacuum.airToVacuumAngstrom(5328.04);  // m, Fe I
    public static final double NA_D2 = 5891.583;
    public static final double NA_D1 = 5897.558;
    public static final double CA2_8498 = AirVacuum.airToVacuumAngstrom(8498.02);  // m
    public static final double CA2_8542 = AirVacuum.airToVacuumAngstrom(8542.09);  // m
    public static final double CA2_8662 = AirVacuum.airToVacuumAngstrom(8662.14);  // m

    /** Heads of the red-degraded TiO bands of M stars, vacuum (air values from memory, converted). */
    public static final double[] TIO_BAND_HEADS = {
        AirVacuum.airToVacuumAngstrom(4954.6), AirVacuum.airToVacuumAngstrom(5166.9),
        AirVacuum.airToVacuumAngstrom(5448.0), AirVacuum.airToVacuumAngstrom(5847.0),
        AirVacuum.airToVacuumAngstrom(6158.0), AirVacuum.airToVacuumAngstrom(6651.0),
        AirVacuum.airToVacuumAngstrom(7053.0), AirVacuum.airToVacuumAngstrom(7666.0),
    };
}
