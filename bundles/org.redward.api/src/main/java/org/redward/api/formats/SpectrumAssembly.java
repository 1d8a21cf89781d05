package org.redward.api.formats;

import java.util.List;

import org.redward.spectrum.Medium;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;

/**
 * Helps readers put the arrays read from a file together into a {@link Spectrum}: error arrays
 * of any kind to inverse variance, frequency axes reversed into increasing wavelength with their
 * arrays, masked regions applied, lengths checked with messages that name the arrays. Stateless
 * and thread-safe.
 */
public final class SpectrumAssembly {

    /** What an error array holds. */
    public enum ErrorKind {
        INVERSE_VARIANCE, SIGMA, VARIANCE;

        /** The inverse variance of one value of this kind (0 for non-positive or non-finite values). */
        public double toInverseVariance(double v) {
            if (!Double.isFinite(v) || v <= 0) {
                return 0.0;
            }
            switch (this) {
                case SIGMA: return 1.0 / (v * v);
                case VARIANCE: return 1.0 / v;
                default: return v;
            }
        }
    }

    private SpectrumAssembly() {
    }

    /**
     * Builds a spectrum. Frequency axes are stored in increasing wavelength, so the arrays are
     * reversed with them. Pixels inside {@code maskedRegions} (vacuum Angstrom) are masked.
     *
     * @param coordinates spectral coordinates as read, in {@code unit} and {@code medium}
     * @param errors may be null (no errors known)
     * @param mask may be null; non-zero (or NaN) means bad
     * @param maskedRegions observed-frame [from, to] ranges in vacuum Angstrom to mask; may be null
     * @param fluxName how to name the flux in messages, e.g. {@code column 'flux'}
     * @throws IllegalArgumentException naming {@code what} for mismatched lengths or a bad axis
     */
    public static Spectrum build(double[] coordinates, SpectralUnit unit, Medium medium, Sampling sampling,
            double[] flux, double[] errors, ErrorKind kind, double[] mask, String fluxUnit,
            SpectrumMetadata metadata, List<double[]> maskedRegions, String fluxName, String errorName, String maskName) {
        int n = coordinates.length;
        if (flux.length != n) {
            throw new IllegalArgumentException(fluxName + " has " + flux.length + " values but the wavelength axis has " + n);
        }
        if (errors != null && errors.length != n) {
            throw new IllegalArgumentException(errorName + " has " + errors.length + " values but the flux has " + n);
        }
        if (mask != null && mask.length != n) {
            throw new IllegalArgumentException(maskName + " has " + mask.length + " values but the flux has " + n);
        }
        double[] iv = null;
        if (errors != null) {
            iv = new double[n];
            for (int i = 0; i < n; i++) {
                iv[i] = kind.toInverseVariance(errors[i]);
            }
        }
        boolean[] bad = new boolean[n];
        if (mask != null) {
            for (int i = 0; i < n; i++) {
                bad[i] = mask[i] != 0 || Double.isNaN(mask[i]);
            }
        }
        double[] f = flux;
        if (unit.isFrequency()) {
            f = reversed(flux);
            iv = iv == null ? null : reversed(iv);
            bad = reversed(bad);
        }
        SpectralAxis axis;
        try {
            axis = SpectralAxis.of(coordinates, unit, medium, sampling);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("wavelength axis: " + e.getMessage(), e);
        }
        if (maskedRegions != null && !maskedRegions.isEmpty()) {
            for (int i = 0; i < n; i++) {
                double w = axis.vacuumAngstrom(i);
                for (double[] r : maskedRegions) {
                    if (w >= r[0] && w <= r[1]) {
                        bad[i] = true;
                    }
                }
            }
        }
        return Spectrum.of(axis, f, iv, bad, fluxUnit, metadata);
    }

    private static double[] reversed(double[] a) {
        double[] r = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            r[i] = a[a.length - 1 - i];
        }
        return r;
    }

    private static boolean[] reversed(boolean[] a) {
        boolean[] r = new boolean[a.length];
        for (int i = 0; i < a.length; i++) {
            r[i] = a[a.length - 1 - i];
        }
        return r;
    }
}
