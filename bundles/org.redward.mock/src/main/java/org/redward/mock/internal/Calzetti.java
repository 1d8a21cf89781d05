package org.redward.mock.internal;

/**
 * The starburst attenuation law of Calzetti et al. (2000, ApJ 533, 682, eq. 4), with
 * R'_V = 4.05:
 * <pre>
 * k'(lambda) = 2.659 (-2.156 + 1.509/x - 0.198/x^2 + 0.011/x^3) + R'_V   for 0.12 &lt;= x &lt; 0.63
 * k'(lambda) = 2.659 (-1.857 + 1.040/x) + R'_V                           for 0.63 &lt;= x &lt;= 2.20
 * </pre>
 * with x the rest wavelength in micrometres; the attenuated flux is
 * {@code F = F0 * 10^(-0.4 * E_s(B-V) * k')}. The stellar continuum colour excess is
 * {@code E_s = 0.44 E_gas} (same paper, eq. 3). Outside 0.12-2.2 micrometres the law is held at
 * its value at the nearest end (our choice, for the generator only). NaN in gives NaN out.
 * Thread-safe (stateless). The coefficients are quoted from memory of the paper.
 */
public final class Calzetti {

    public static final double RV = 4.05;
    /** Ratio of stellar to nebular colour excess (Calzetti et al. 2000, eq. 3). */
    public static final double STELLAR_TO_GAS_EXCESS = 0.44;

    private Calzetti() {
    }

    /** k'(lambda) at a rest wavelength in Angstrom. */
    public static double k(double restAngstrom) {
        double x = Math.min(2.2, Math.max(0.12, restAngstrom / 1e4));
        if (x < 0.63) {
            return 2.659 * (-2.156 + 1.509 / x - 0.198 / (x * x) + 0.011 / (x * x * x)) + RV;
        }
        return 2.659 * (-1.857 + 1.040 / x) + RV;
    }

    /** The factor 10^(-0.4 E(B-V) k') by which the flux at this rest wavelength is multiplied. */
    public static double transmission(double restAngstrom, double colourExcess) {
        return Math.pow(10.0, -0.4 * colourExcess * k(restAngstrom));
    }
}
