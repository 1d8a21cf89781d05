package org.redward.mock.internal;

import org.redward.spectrum.AirVacuum;

/**
 * The night sky seen through one Quill fibre: a dark-sky continuum plus emission lines.
 *
 * <p>Line list (air wavelengths, Angstrom) after the night-sky atlas of Osterbrock et al. (1996,
 * PASP 108, 277) and Osterbrock et al. (1997, PASP 109, 614) for [O I] and the OH Meinel bands,
 * and the usual laboratory values of the Hg I and Na I lines of street lighting; wavelengths
 * and relative strengths are quoted from memory (the [O I] 5577 and Hg I values agree to
 * 0.01 Angstrom with a third-party compilation that cites Osterbrock &amp; Martel 1992 and the CRC
 * Handbook). Strengths are relative line fluxes in units of 1e-17 erg/s/cm^2 per fibre
 * (invented scale, chosen so that 5577 is about 20 times the continuum per Angstrom peak).
 *
 * <p>The continuum is about 21.3 AB mag per square arcsecond in the red (a dark site, common
 * practice), i.e. about 2.5e-17 erg/s/cm^2/Angstrom per 2-arcsecond fibre at 6200 Angstrom,
 * rising slowly to the red.
 */
public final class NightSky {

    private NightSky() {
    }

    /** {air wavelength, relative flux}. */
    static final double[][] LINES_AIR = {
        {4046.56, 4}, {4358.33, 10}, {5460.74, 14},                 // Hg I (light pollution)
        {5577.338, 90}, {6300.304, 28}, {6363.78, 9},               // [O I]
        {5889.95, 14}, {5895.92, 10},                               // Na I D
        {6257.96, 3}, {6287.43, 4}, {6329.75, 3}, {6498.73, 5}, {6533.04, 8}, {6553.62, 5},
        {6577.28, 6}, {6604.28, 5}, {6827.46, 6}, {6834.01, 6}, {6863.96, 10}, {6923.22, 7},
        {6948.94, 8}, {7276.41, 10}, {7316.28, 20}, {7340.89, 20}, {7358.67, 10}, {7369.25, 10},
        {7571.75, 10}, {7750.64, 20}, {7794.11, 20}, {7821.50, 25}, {7853.22, 10}, {7913.71, 25},
        {7964.65, 25}, {7993.33, 30}, {8344.60, 40}, {8399.17, 40}, {8430.17, 35}, {8465.21, 35},
        {8493.39, 30}, {8761.31, 40}, {8767.91, 40}, {8778.33, 30}, {8791.19, 30}, {8827.10, 40},
        {8885.85, 50}, {8919.53, 40}, {8958.25, 50}, {8988.47, 40}, {9001.12, 30}, {9375.97, 40},
        {9419.24, 40}, {9439.67, 40}, {9458.53, 40}, {9476.80, 40}, {9503.0, 30}, {9568.0, 35},
        {9622.0, 35}, {9701.0, 35}, {9788.0, 35},
    };

    /** The same lines at vacuum wavelengths (Morton 2000 through {@link AirVacuum}). */
    public static double[] vacuumWavelengths() {
        double[] w = new double[LINES_AIR.length];
        for (int i = 0; i < w.length; i++) {
            w[i] = AirVacuum.airToVacuumAngstrom(LINES_AIR[i][0]);
        }
        return w;
    }

    /** Relative line fluxes, same order as {@link #vacuumWavelengths()}. */
    public static double[] strengths() {
        double[] s = new double[LINES_AIR.length];
        for (int i = 0; i < s.length; i++) {
            s[i] = LINES_AIR[i][1];
        }
        return s;
    }

    /** Sky continuum per fibre, 1e-17 erg/s/cm^2/Angstrom, at an air wavelength. */
    public static double continuum(double airAngstrom) {
        return 2.5 * Math.pow(airAngstrom / 6200.0, 0.6);
    }
}
