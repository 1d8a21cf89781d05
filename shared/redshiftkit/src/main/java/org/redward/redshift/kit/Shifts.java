package org.redward.redshift.kit;

/**
 * Redshift as a shift on an aligned log10-lambda grid: log10(1+z) = shift * step.
 * Stateless and thread-safe.
 */
public final class Shifts {

    public static final double C_KM_S = 299_792.458;

    private Shifts() {
    }

    /** z of a (fractional) shift. */
    public static double z(double shift, double log10Step) {
        return Math.pow(10.0, shift * log10Step) - 1;
    }

    /** 1-sigma z error from a shift error in pixels: (1+z) ln(10) step sigma. */
    public static double zError(double z, double sigmaPixels, double log10Step) {
        return (1 + z) * Math.log(10.0) * log10Step * sigmaPixels;
    }

    /**
     * The shifts searched for a redshift range {zMin, zMax} that leave any overlap between a
     * spectrum (start index, pixels) and a template (start index, pixels).
     *
     * @return {lo, hi}; lo > hi when there is none
     */
    public static long[] range(double[] zRange, long spectrumStart, int spectrumPixels, long templateStart,
            int templatePixels, double log10Step) {
        if (!(zRange[0] < zRange[1]) || zRange[0] <= -1) {
            return new long[] {1, 0};
        }
        long lo = (long) Math.ceil(Math.log10(1 + zRange[0]) / log10Step);
        long hi = Double.isInfinite(zRange[1]) ? Long.MAX_VALUE / 4 : (long) Math.floor(Math.log10(1 + zRange[1]) / log10Step);
        long offset = spectrumStart - templateStart;
        lo = Math.max(lo, offset - templatePixels + 1);
        hi = Math.min(hi, offset + spectrumPixels - 1);
        return new long[] {lo, hi};
    }

    /** True when two redshifts differ by less than {@code kmPerS} in velocity, |dz|/(1+z) c. */
    public static boolean same(double z1, double z2, double kmPerS) {
        return Math.abs(z1 - z2) / (1 + Math.min(z1, z2)) * C_KM_S < kmPerS;
    }
}
